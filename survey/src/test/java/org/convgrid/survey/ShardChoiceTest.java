package org.convgrid.survey;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.util.Map;
import java.util.Optional;
import org.convgrid.engine.batch.Shard;
import org.junit.jupiter.api.Test;

class ShardChoiceTest {

    @Test
    void explicitShardIsParsedAndChecked() {
        assertThat(ShardChoice.choose("3/8", Map.of())).contains(new Shard(3, 8));
        assertThat(ShardChoice.choose(" 1 / 1 ", Map.of())).contains(Shard.ALL);
        for (String bad : new String[] {"0/4", "5/4", "2", "a/b", "1/2/3", ""}) {
            assertThatThrownBy(() -> ShardChoice.parse(bad)).isInstanceOf(RunSetupException.class)
                    .hasMessageContaining("K/N");
        }
    }

    @Test
    void slurmArraysZeroBasedOneBasedAndStepped() {
        assertThat(ShardChoice.choose(null, Map.of())).isEmpty();
        assertThat(ShardChoice.choose(null, Map.of("SLURM_ARRAY_TASK_ID", "3"))).isEmpty();
        // --array=0-7: MIN 0
        assertThat(ShardChoice.choose(null, Map.of("SLURM_ARRAY_TASK_ID", "0", "SLURM_ARRAY_TASK_COUNT", "8",
                "SLURM_ARRAY_TASK_MIN", "0"))).contains(new Shard(1, 8));
        // MIN unset: taken as 0
        assertThat(ShardChoice.choose(null, Map.of("SLURM_ARRAY_TASK_ID", "7", "SLURM_ARRAY_TASK_COUNT", "8")))
                .contains(new Shard(8, 8));
        // --array=1-8
        assertThat(ShardChoice.choose(null, Map.of("SLURM_ARRAY_TASK_ID", "8", "SLURM_ARRAY_TASK_COUNT", "8",
                "SLURM_ARRAY_TASK_MIN", "1"))).contains(new Shard(8, 8));
        // --array=10-40:10 gives tasks 10, 20, 30, 40
        assertThat(ShardChoice.choose(null, Map.of("SLURM_ARRAY_TASK_ID", "30", "SLURM_ARRAY_TASK_COUNT", "4",
                "SLURM_ARRAY_TASK_MIN", "10", "SLURM_ARRAY_TASK_STEP", "10"))).contains(new Shard(3, 4));
        assertThat(ShardChoice.choose("2/3", Map.of("SLURM_ARRAY_TASK_ID", "0", "SLURM_ARRAY_TASK_COUNT", "8")))
                .isEqualTo(Optional.of(new Shard(2, 3)));
    }

    @Test
    void slurmTaskOutsideItsArrayIsRefused() {
        assertThatThrownBy(() -> ShardChoice.choose(null, Map.of("SLURM_ARRAY_TASK_ID", "8",
                "SLURM_ARRAY_TASK_COUNT", "8"))).isInstanceOf(RunSetupException.class)
                .hasMessageContaining("SLURM_ARRAY_TASK_ID=8").hasMessageContaining("--shard");
        assertThatThrownBy(() -> ShardChoice.choose(null, Map.of("SLURM_ARRAY_TASK_ID", "x",
                "SLURM_ARRAY_TASK_COUNT", "8"))).isInstanceOf(RunSetupException.class);
    }

    @Test
    void manifestLabelIsNullForTheWholeGrid() {
        assertThat(ShardChoice.label(Shard.ALL)).isNull();
        assertThat(ShardChoice.label(new Shard(2, 5))).isEqualTo("2/5");
    }
}
