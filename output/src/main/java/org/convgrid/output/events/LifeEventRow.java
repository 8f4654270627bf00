package org.convgrid.output.events;

import java.util.Objects;
import org.convgrid.engine.birth.LifeEvents;
import org.convgrid.engine.request.ModelRequest;
import org.convgrid.engine.request.OvershootScheme;
import org.convgrid.engine.units.Constants;

/**
 * One star's row of {@code life_events.csv}, in the file's units; NaN (an empty cell) for an event that did not
 * happen on the computed track.
 *
 * @param trackId the star's model id without its age part (its track file's name)
 * @param massMsun M / M_sun
 * @param zInit initial metal mass fraction
 * @param yInit initial helium mass fraction
 * @param mixingLength alpha, pressure scale heights
 * @param overshootHp overshoot length, pressure scale heights (alpha_ov, or f for the decaying profile)
 * @param overshootProfile the profile {@code overshootHp} is the length of; null in a table written before the column
 * @param radiativeCoreMyr the centre first stops being convective, Myr since birth (never: fully convective)
 * @param radiativeCoreEndMyr the star is fully convective again, for good: its last return to full convection,
 *        Myr since birth (NaN while the track ends with a radiative region)
 * @param zamsMyr the zero-age main sequence is reached, Myr since birth
 * @param convCoreOnsetMyr a lasting convective core first appears, Myr since birth
 * @param convCoreEndMyr that core vanishes, Myr since birth
 * @param coreEnvelopeMergeMyr on the main sequence, a central convective zone first joins the convective envelope,
 *        Myr since birth (NaN in a table written before the column existed)
 * @param liHalvedMyr the surface lithium falls to half its birth value, Myr since birth
 * @param liOnePercentMyr the surface lithium falls to 1 % of its birth value, Myr since birth (NaN in a table
 *        written before the column existed)
 * @param centralHExhaustedMyr the central hydrogen runs out (the end of the main sequence), Myr since birth
 * @param trackEndMyr the last age the computed track reached, Myr since birth: an empty event cell means "not by
 *        this age" (NaN in a table written before the column existed)
 */
public record LifeEventRow(String trackId, double massMsun, double zInit, double yInit, double mixingLength,
                           double overshootHp, OvershootScheme overshootProfile, double radiativeCoreMyr,
                           double radiativeCoreEndMyr, double zamsMyr, double convCoreOnsetMyr,
                           double convCoreEndMyr, double coreEnvelopeMergeMyr, double liHalvedMyr,
                           double liOnePercentMyr,
                           double centralHExhaustedMyr,
                           double trackEndMyr) {

    private static final double MYR = 1.0e6 * Constants.YEAR;

    public LifeEventRow {
        Objects.requireNonNull(trackId, "trackId");
    }

    /**
     * The row of a star.
     *
     * @param trackId the star's track id
     * @param first the star's first request (mass, composition, physics)
     * @param events its life events, s since birth
     * @param trackEnd the age of the track's last step, s since birth
     */
    public static LifeEventRow of(String trackId, ModelRequest first, LifeEvents events, double trackEnd) {
        return new LifeEventRow(trackId, first.mass() / Constants.M_SUN, first.initialMetals(),
                first.initialHelium(), first.physics().mixingLength(), first.physics().overshoot(),
                first.physics().overshootScheme(),
                events.radiativeCore() / MYR, events.radiativeCoreEnd() / MYR, events.zeroAgeMainSequence() / MYR,
                events.convectiveCoreOnset() / MYR, events.convectiveCoreEnd() / MYR,
                events.coreEnvelopeMerge() / MYR, events.lithiumHalved() / MYR,
                events.lithiumOnePercent() / MYR, events.centralHydrogenExhausted() / MYR, trackEnd / MYR);
    }

    /**
     * The same row with {@code profile} as its overshoot profile when it names none (a row of a table an earlier
     * version began, in a run of the same grid, whose one profile is the row's).
     */
    public LifeEventRow withOvershootProfileIfUnknown(OvershootScheme profile) {
        return overshootProfile != null ? this : new LifeEventRow(trackId, massMsun, zInit, yInit, mixingLength,
                overshootHp, profile, radiativeCoreMyr, radiativeCoreEndMyr, zamsMyr, convCoreOnsetMyr,
                convCoreEndMyr, coreEnvelopeMergeMyr, liHalvedMyr, liOnePercentMyr, centralHExhaustedMyr, trackEndMyr);
    }
}
