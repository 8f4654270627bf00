package org.convgrid.engine.birth;

/**
 * When a star's convective core appears and when it ends for good, from the models of one evolution in age order.
 * The onset is the first model with the core once the centre has turned radiative (a fully convective star's one
 * zone is no core); a core that comes and goes before the zero-age main sequence is a transient of the contraction
 * (seen at 10 Msun, Z = 1e-4, within the first 1e4 yr) and is forgotten. The end is the first model of the last run
 * of models without the core: a core that vanishes and comes back has not ended, as for the radiative core's end
 * (a 0.35 Msun star at Z = 0.02 lost its 3He-burning core for one step at 3.009 Gyr and had it again, to m/M 0.12,
 * at 5 Gyr: the table said it had ended while the catalogue showed it).
 *
 * <p>Both ages are interpolated between that model and the one before it ({@link #between}), as the radiative core's
 * appearance is: dated at the model itself, an event was late by up to one step, and steps of old low-mass stars reach
 * ~1 Gyr, so a core of a grid with ages 5 and 10 Gyr ended at "5000.0" or "10000.0" Myr, the ages the steps were cut
 * at. One per evolution; not thread-safe.
 */
final class CoreLifetime {

    private final double coreThreshold;
    private double onset = Double.NaN;
    /** When the current run without the core began, after its onset (interpolated); NaN while the last had it. */
    private double absentSince = Double.NaN;
    /** The age of that run's first model itself. */
    private double firstAbsentModel = Double.NaN;
    private double lastAge = Double.NaN;
    private double lastCentreExcess = Double.NaN;
    private double lastCentralZoneTop = Double.NaN;

    /** @param coreThreshold m/M that the top of a central convective zone must exceed to count as a core */
    CoreLifetime(double coreThreshold) {
        this.coreThreshold = coreThreshold;
    }

    /**
     * Takes the next model.
     *
     * @param age its age, s since birth
     * @param centreExcess nabla_rad minus the stability limit at its centre (positive: the centre is convective)
     * @param centralZoneTop m/M at the top of its central convective zone, 0 when the centre is radiative
     * @param core whether it has a convective core
     * @param centreWasRadiative whether the centre has stopped being convective at this model or before
     * @param mainSequence whether the zero-age main sequence has been reached at this model or before
     */
    void observe(double age, double centreExcess, double centralZoneTop, boolean core, boolean centreWasRadiative,
                 boolean mainSequence) {
        if (Double.isNaN(onset)) {
            if (core && centreWasRadiative) {
                onset = between(age, centreExcess, centralZoneTop);
            }
        } else if (core) {
            absentSince = Double.NaN;
            firstAbsentModel = Double.NaN;
        } else if (!mainSequence) {
            onset = Double.NaN;
        } else if (Double.isNaN(absentSince)) {
            absentSince = between(age, centreExcess, centralZoneTop);
            firstAbsentModel = age;
        }
        lastAge = age;
        lastCentreExcess = centreExcess;
        lastCentralZoneTop = centralZoneTop;
    }

    /**
     * The age, between the last model and this one, at which the core appeared or vanished: where the centre's
     * stability excess crosses zero when the centre changed between convective and radiative (the same crossing as
     * the radiative core's appearance, smooth in age), else where the central zone's top crosses the core threshold
     * in ln(top) (a zone that grew past it or shrank below it); this model's age when neither changed (the first model, or a
     * whole-star zone that became a core).
     */
    private double between(double age, double centreExcess, double centralZoneTop) {
        if (Double.isNaN(lastAge)) {
            return age;
        }
        if ((lastCentreExcess > 0.0) != (centreExcess > 0.0)) {
            return AgeCrossing.of(lastAge, lastCentreExcess, age, centreExcess, 0.0);
        }
        if ((lastCentralZoneTop > coreThreshold) != (centralZoneTop > coreThreshold)) {
            // in ln(top): a small core grows or fades by a factor per unit time more than by an amount, and the
            // steps of old low-mass stars are ~1 Gyr long; both tops are above 0 here, as
            // the centre stayed convective
            return lastCentralZoneTop > 0.0 && centralZoneTop > 0.0
                    ? AgeCrossing.of(lastAge, Math.log(lastCentralZoneTop), age, Math.log(centralZoneTop),
                            Math.log(coreThreshold))
                    : AgeCrossing.of(lastAge, lastCentralZoneTop, age, centralZoneTop, coreThreshold);
        }
        return age;
    }

    /** The model with the core's appearance, interpolated as above, s since birth; NaN when none had one. */
    double onset() {
        return onset;
    }

    /**
     * When the last run without the core began, interpolated as above, s since birth; NaN when the last model has the
     * core (or none had one). A core gone only in the last model has not been seen to stay gone: its end is that
     * model's age, uninterpolated, so that it equals the track's end and reads as provisional (the core may come back
     * beyond the computed track, as the 3He-burning cores of 0.34 and 0.44 Msun at Z = 0.02 may after 5 Gyr).
     */
    double end() {
        if (Double.isNaN(onset)) {
            return Double.NaN;
        }
        return firstAbsentModel == lastAge ? firstAbsentModel : absentSince;
    }
}
