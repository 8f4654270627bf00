package org.convgrid.survey;

import java.util.Map;
import java.util.Optional;
import org.convgrid.engine.batch.Shard;

/**
 * Which share of a grid a run computes: {@code --shard K/N}, else a Slurm job array, else the whole grid.
 *
 * <p>Slurm: when both {@code SLURM_ARRAY_TASK_ID} and {@code SLURM_ARRAY_TASK_COUNT} are set, the task is shard
 * {@code K = (ID - MIN) / STEP + 1} of {@code N = COUNT}, with {@code SLURM_ARRAY_TASK_MIN} (0 when unset) and
 * {@code SLURM_ARRAY_TASK_STEP} (1 when unset), so {@code --array=0-7} and {@code --array=1-8} both give shards
 * 1/8 .. 8/8.
 */
public final class ShardChoice {

    static final String TASK_ID = "SLURM_ARRAY_TASK_ID";
    static final String TASK_COUNT = "SLURM_ARRAY_TASK_COUNT";
    static final String TASK_MIN = "SLURM_ARRAY_TASK_MIN";
    static final String TASK_STEP = "SLURM_ARRAY_TASK_STEP";

    private ShardChoice() {
    }

    /**
     * The shard to compute.
     *
     * @param option the {@code --shard} text, or null when not given
     * @param environment the process environment
     * @return the explicit shard, else the Slurm one, else empty
     * @throws RunSetupException when the text or the Slurm variables do not name a shard
     */
    public static Optional<Shard> choose(String option, Map<String, String> environment) {
        if (option != null) {
            return Optional.of(parse(option));
        }
        String id = environment.get(TASK_ID);
        String count = environment.get(TASK_COUNT);
        if (id == null || count == null) {
            return Optional.empty();
        }
        try {
            long min = Long.parseLong(environment.getOrDefault(TASK_MIN, "0").strip());
            long step = Long.parseLong(environment.getOrDefault(TASK_STEP, "1").strip());
            long offset = Long.parseLong(id.strip()) - min;
            int n = Integer.parseInt(count.strip());
            if (step < 1 || offset < 0 || offset % step != 0 || offset / step >= n) {
                throw new IllegalArgumentException("task outside the array");
            }
            return Optional.of(new Shard((int) (offset / step) + 1, n));
        } catch (IllegalArgumentException e) {
            throw new RunSetupException("cannot read the shard from Slurm: " + TASK_ID + "=" + id + ", "
                    + TASK_COUNT + "=" + count + ", " + TASK_MIN + "=" + environment.get(TASK_MIN) + ", "
                    + TASK_STEP + "=" + environment.get(TASK_STEP) + " (" + e.getMessage() + "); give --shard K/N");
        }
    }

    /** Reads {@code K/N} with 1 &lt;= K &lt;= N. */
    public static Shard parse(String text) {
        String[] parts = text.strip().split("/", -1);
        try {
            if (parts.length == 2) {
                return new Shard(Integer.parseInt(parts[0].strip()), Integer.parseInt(parts[1].strip()));
            }
        } catch (IllegalArgumentException e) {
            // reported below with the expected form
        }
        throw new RunSetupException("--shard must be K/N with 1 <= K <= N (for example 2/8), got '" + text + "'");
    }

    /** The manifest's form: {@code K/N}, or null for the whole grid. */
    public static String label(Shard shard) {
        return shard.count() == 1 ? null : shard.index() + "/" + shard.count();
    }
}
