package org.convgrid.engine.birth;

/**
 * When a star's convective core appears and when it ends for good, from the models of one evolution in age order.
 * The onset is the first model with the core once the centre has turned radiative (a fully convective star's one
 * zone is no core); a core that comes and goes before the zero-age main sequence is a transient of the contraction
 * (seen at 10 Msun, Z = 1e-4, within the first 1e4 yr) and is forgotten. The end is the first model of the last run
 * of models without the core: a core that vanishes and comes back has not ended, as for the radiative core's end
 * (a 0.35 Msun star at Z = 0.02 lost its 3He-burning core for one step at 3.009 Gyr and had it again, to m/M 0.12,
 * at 5 Gyr: the table said it had ended while the catalogue showed it; found by a stellar-activity review).
 * Resolution: one step. One per evolution; not thread-safe.
 */
final class CoreLifetime {

    private double onset = Double.NaN;
    /** Age of the first model of the current run without the core, after its onset; NaN while the last had it. */
    private double absentSince = Double.NaN;

    /**
     * Takes the next model.
     *
     * @param age its age, s since birth
     * @param core whether it has a convective core
     * @param centreWasRadiative whether the centre has stopped being convective at this model or before
     * @param mainSequence whether the zero-age main sequence has been reached at this model or before
     */
    void observe(double age, boolean core, boolean centreWasRadiative, boolean mainSequence) {
        if (Double.isNaN(onset)) {
            if (core && centreWasRadiative) {
                onset = age;
            }
        } else if (core) {
            absentSince = Double.NaN;
        } else if (!mainSequence) {
            onset = Double.NaN;
        } else if (Double.isNaN(absentSince)) {
            absentSince = age;
        }
    }

    /** The first model with the core, s since birth; NaN when none had one. */
    double onset() {
        return onset;
    }

    /** The first model of the last run without the core, s since birth; NaN when the last model has it (or none). */
    double end() {
        return Double.isNaN(onset) ? Double.NaN : absentSince;
    }
}
