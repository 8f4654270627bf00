package org.convgrid.engine.zams;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

import org.convgrid.engine.state.Composition;
import org.convgrid.engine.structure.SolveFailedException;

/**
 * Zero-age models of one line of constant composition and physics at fixed rung masses
 * M_k = {@link ZamsTrack#ANCHOR_MASS} exp(k {@link #RUNG_SPACING}), k = 0, +-1, +-2, ..., built on first use and
 * shared by every chunk of the line, so that a chunk starts one short homology step from two rungs instead of a cold
 * start (slow, and at some masses failing into a walk from the anchor mass that every such chunk paid again).
 *
 * <p>Rung 0 is the cold start at the anchor mass; rung k is walked ({@link ZamsTrack}) from rungs k -+ 1 and
 * k -+ 2, the two next to it on the anchor's side, rung -1 from the anchor alone and rung +1 from the anchor and rung
 * -1 (from the anchor alone, the global homology seed of 1.35 Msun ran out its iterations and the walk took two half
 * steps: 41-71 Newton iterations on the lines of 0.1-20 Msun at Z = 0.004-0.03; from the two 11-20, or 40 at
 * Z = 0.004 where the step is still halved once, LadderCostProbe). Every rung is therefore a pure function of the line,
 * whichever chunk or thread asks for it first, and a grid gives the same catalogue at any thread count. A rung that does not
 * converge ends its side of the ladder (the walk towards the masses beyond it starts from the last rung). Thread-safe:
 * each side is built under its own lock and read without it, the rungs are immutable.
 */
public final class ZamsLadder {

    /** ln M between rungs: one full homology step. */
    public static final double RUNG_SPACING = ZamsTrack.MAX_STEP;
    /** Tolerance on rung indices, so that a mass on a rung (up to rounding) counts as on it. */
    private static final double ON_RUNG = 1.0e-9;

    private final ZamsBuilder builder;
    private final Composition composition;
    private final Side below = new Side(-1);
    private final Side above = new Side(+1);
    private boolean anchorTried;
    private ZamsModel anchor;

    /**
     * @param builder the line's builder
     * @param composition the line's homogeneous initial composition
     */
    public ZamsLadder(ZamsBuilder builder, Composition composition) {
        this.builder = builder;
        this.composition = composition;
    }

    /**
     * The converged rungs to start a walk to {@code mass} (g) from: the rung nearest to it on the anchor's side
     * (never beyond it, so no rung is built outside the masses asked for) and the next one, towards the anchor or,
     * from rung 0, towards the mass, so the two bracket it. Fewer when rungs failed; empty when the anchor itself
     * did not converge.
     */
    public List<ZamsModel> startFor(double mass) {
        double x = rungCoordinate(mass);
        int k = nearestRungTowardsAnchor(x);
        Side side = x < 0 ? below : above;
        if (k == 0) {
            ZamsModel centre = anchor();
            if (centre == null) {
                return List.of();
            }
            if (Math.abs(x) < ON_RUNG) {
                return List.of(centre);
            }
            return side.rung(1).map(r -> List.of(centre, r)).orElse(List.of(centre));
        }
        List<ZamsModel> built = side.upTo(k);
        int n = built.size();
        if (n >= 2) {
            return List.of(built.get(n - 2), built.get(n - 1));
        }
        ZamsModel centre = anchor();
        if (centre == null) {
            return List.of();
        }
        return n == 0 ? List.of(centre) : List.of(centre, built.get(0));
    }

    /**
     * The rungs {@link #startFor} reaches for {@code mass} (g), as signed rung indices in build order: 0 (the anchor),
     * then +-1, +-2, ... on the mass's side, up to the nearest rung on the anchor's side of it (to rung +-1 when that
     * is the anchor), with rung -1 before rung +1 (which is seeded from it). Calling {@link #startFor} on the
     * {@link #rungMass} of each, in this order, builds exactly them.
     */
    public static int[] rungsFor(double mass) {
        double x = rungCoordinate(mass);
        int k = nearestRungTowardsAnchor(x);
        int sign = x < 0 ? -1 : +1;
        int last = k == 0 && Math.abs(x) >= ON_RUNG ? 1 : k;
        int below = sign > 0 && last >= 1 ? 1 : 0;
        int[] rungs = new int[last + 1 + below];
        if (below == 1) {
            rungs[1] = -1;
        }
        for (int i = 1; i <= last; i++) {
            rungs[i + below] = sign * i;
        }
        return rungs;
    }

    /** Where {@code mass} (g) lies on the ladder, in rungs from the anchor (signed, fractional). */
    private static double rungCoordinate(double mass) {
        return Math.log(mass / ZamsTrack.ANCHOR_MASS) / RUNG_SPACING;
    }

    /** The index (unsigned) of the last rung at or inside {@code x}, a mass on a rung to round-off counting as on it. */
    private static int nearestRungTowardsAnchor(double x) {
        return (int) Math.floor(Math.abs(x) + ON_RUNG);
    }

    /** The mass (g) of rung {@code index} (signed; 0 is the anchor). */
    public static double rungMass(int index) {
        return ZamsTrack.ANCHOR_MASS * Math.exp(index * RUNG_SPACING);
    }

    private synchronized ZamsModel anchor() {
        if (!anchorTried) {
            anchorTried = true;
            try {
                anchor = builder.coldStart(ZamsTrack.ANCHOR_MASS, composition);
            } catch (SolveFailedException e) {
                anchor = null;
            }
        }
        return anchor;
    }

    /** One side of the ladder: rungs 1, 2, ... (index i holds rung i + 1), in the direction {@code sign}. */
    private final class Side {
        private final int sign;
        /** The rungs built so far, replaced (never changed) under the lock when one is added. */
        private volatile List<ZamsModel> rungs = List.of();
        private volatile boolean ended;

        Side(int sign) {
            this.sign = sign;
        }

        /** Rung {@code k} (k >= 1), if it converged. */
        Optional<ZamsModel> rung(int k) {
            List<ZamsModel> built = upTo(k);
            return built.size() >= k ? Optional.of(built.get(k - 1)) : Optional.empty();
        }

        /**
         * Rungs 1..k of this side as far as they converge, built first where missing, one rung per hold of the lock.
         * Rungs already built are read without the lock, so a request whose rungs are there returns at once, even
         * while another thread is building the next one.
         */
        List<ZamsModel> upTo(int k) {
            while (true) {
                // ended first: once it is set no rung is added, so the list read after it is the final one
                boolean over = ended;
                List<ZamsModel> built = rungs;
                if (over || built.size() >= k) {
                    return built.subList(0, Math.min(k, built.size()));
                }
                synchronized (this) {
                    if (!ended && rungs.size() < k) {
                        buildNext();
                    }
                }
            }
        }

        /** Walks rung size + 1 from the two rungs before it (rung 0 being the anchor); ends the side if it fails. */
        private void buildNext() {
            ZamsModel centre = anchor();
            if (centre == null) {
                ended = true;
                return;
            }
            int next = rungs.size() + 1;
            ZamsTrack walk = new ZamsTrack(builder, composition);
            walk.add(next == 1 ? centre : rungs.get(next - 2));
            if (next >= 2) {
                walk.add(next == 2 ? centre : rungs.get(next - 3));
            } else if (sign > 0) {
                // the other side's first rung: locks are only ever taken above, then below
                below.rung(1).ifPresent(walk::add);
            }
            ZamsResult r = walk.solve(rungMass(sign * next));
            if (r.converged()) {
                List<ZamsModel> longer = new ArrayList<>(rungs);
                longer.add(r.model());
                rungs = List.copyOf(longer);
            } else {
                ended = true;
            }
        }
    }
}
