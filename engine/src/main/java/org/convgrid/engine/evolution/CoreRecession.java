package org.convgrid.engine.evolution;

import java.util.List;

import org.convgrid.engine.convection.ConvectiveZone;
import org.convgrid.engine.structure.StellarModel;

/**
 * Paces main-sequence steps by how fast a central convective zone recedes. Each step mixes the zones of the model
 * it starts from ({@link ConvectiveMixing}) for the whole step, so while a core recedes every step still mixes and
 * burns, as one composition, the shell the core has just left; in a small core kept convective by the 3He it mixes
 * in from its cooler edge, that shell's 3He keeps the core alive, and the longer the step the longer it lives.
 * Measured (SmallCoreConvergenceProbe, 0.5 Msun from birth, Z = 0.02, 1000 points, 500 for the 3.1 Myr cap, before
 * this pacing): the core's end came at 2.56 / 1.97 / 1.31 / 1.12 / 1.09 Gyr with no step cap (the growth limit let
 * the steps reach 170-400 Myr) and with steps capped at 200 / 50 / 12.5 / 3.1 Myr, its top at 1 Gyr at m/M 0.0215 /
 * 0.0192 / 0.0123 / 0.0060 / 0.0048; 0.6 Msun's core ended at 0.83 / 0.73 / 0.62 / 0.48 / 0.41 Gyr. The mesh did not
 * matter (500 / 1000 / 2000 points: 2.55 / 2.56 / 2.55 Gyr), nor the change limits, which these steps do not
 * reach. A shrinking core's relative recession per step, {@link #MAX_RELATIVE_RECESSION}, bounds that lag (our
 * choice, measured; common practice limits the change of the convective boundaries per step in some form, no single
 * source): with 0.05 the ends are 1.14 Gyr (0.5 Msun) and 0.42 Gyr (0.6 Msun), and at Z = 0.008 1.55 and 0.54 Gyr
 * against 1.43 and 0.52 with 3.1 Myr steps; 0.025 gave 1.10 / 0.41 / 1.48 / 0.52 Gyr for a third more steps (250
 * instead of 186 to 8 Gyr; 126 without the pacing). Growth is not paced: a core that reaches a richer zone takes it in
 * at once, however short the step. Pacing growth as well (3.5 % per step, tried 2026-12-05) brought the merge and
 * split ages of 0.34-0.35 Msun stars, whose core joins the envelope and splits off again, within 2-7 % of those with
 * 3.1 Myr steps, but took 0.34 Msun from 126 to 580 steps to 8 Gyr, and a core top that jitters (decaying overshoot)
 * shrank the steps until the step budget ran out; the README states those cycles' step dependence instead.
 * Stateless.
 */
final class CoreRecession {

    /** Largest fall of the central zone's top per step, as a fraction of its size (or of {@link #SIZE_FLOOR}). */
    static final double MAX_RELATIVE_RECESSION = 0.05;
    /**
     * m/M below which a core's recession is measured against this size instead of its own: without it the steps
     * of a core shrinking to nothing would shrink without bound (ten times the core threshold, 1e-3).
     */
    static final double SIZE_FLOOR = 0.01;
    /**
     * The shortest step the pacing asks for, as a fraction of the age. A core of 1.25-1.4 Msun with decaying overshoot
     * (f = 0.016, Z = 0.02) has a top that saws down and up by one mesh cell, ~10 % of its size, every four or five
     * steps however short they are; paced without a floor its steps shrank to ~0.03 Myr and the track spent its
     * 3000-step budget before 130 Myr (1.3 Msun from birth: X_c = 0.69). With 0.003 it reaches core-hydrogen
     * exhaustion at 4.18 Gyr in 1495 steps (0.005: 954 steps, but its last steps then spend their retries at X_c =
     * 1.7e-4); the 3He-driven cores this pacing is for keep their step-converged ends (0.5 Msun: steps of 3 Myr at
     * 1 Gyr, where the 3.1 Myr cap gave the converged end, SmallCoreStepConvergenceTest). Our choice, measured.
     */
    static final double MIN_STEP_AGE_FRACTION = 0.003;

    private CoreRecession() {
    }

    /**
     * How far the central zone's top fell from {@code before} to {@code after}, over the limit: 0 when it grew, when
     * {@code before} had no core, and when the core has joined the envelope in {@code after} (the star fully
     * convective again, no core left to lag behind).
     */
    static double ratio(StellarModel before, StellarModel after) {
        double a = centralZoneTop(before);
        double b = centralZoneTop(after);
        return a > b && !FullyConvectiveMesh.holds(after)
                ? (a - b) / Math.max(a, SIZE_FLOOR) / MAX_RELATIVE_RECESSION : 0.0;
    }

    /**
     * m/M at the top of the zone that starts at the centre; 0 when the centre is radiative or the zone reaches the
     * surface layers (a fully convective star has no core to recede).
     */
    static double centralZoneTop(StellarModel model) {
        List<ConvectiveZone> zones = model.convection().zones();
        if (zones.isEmpty() || zones.get(0).innerMassFraction() > 0.0) {
            return 0.0;
        }
        double top = zones.get(0).outerMassFraction();
        return top < SurfaceComposition.ENVELOPE_TOP ? top : 0.0;
    }
}
