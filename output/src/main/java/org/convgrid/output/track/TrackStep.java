package org.convgrid.output.track;

import java.util.List;
import org.convgrid.output.Span;

/**
 * One evolution step of a track file, in the file's units; NaN means the cell was empty or the column absent.
 *
 * @param ageGyr age since the run's origin (birth or the zero-age main sequence), Gyr
 * @param phase {@code pre_main_sequence} or {@code main_sequence}; empty when the file gives none
 * @param luminosityLsun L / L_sun
 * @param radiusRsun R / R_sun
 * @param teffK effective temperature, K
 * @param logGCgs log10 of the surface gravity in cm s^-2
 * @param centralTempK central temperature, K
 * @param centralDensityCgs central density, g cm^-3
 * @param centralHFrac central hydrogen mass fraction
 * @param surfaceLiRel surface 7Li over its birth value
 * @param convZones every convective zone in m/M, centre outwards
 * @param burningZone the hydrogen-burning region in m/M (energy generation above the writer's threshold), null
 *     when the file gives none
 * @param nuclearLuminosityFrac L_nuc / L; NaN when the file gives none (tracks from the zero-age main sequence)
 * @param periodSpacingL1S the dipole g-mode period spacing Delta Pi_1, s; NaN without a g-mode cavity or when the file
 *     has no such column (written before it)
 */
public record TrackStep(double ageGyr, String phase, double luminosityLsun, double radiusRsun, double teffK,
                        double logGCgs, double centralTempK, double centralDensityCgs, double centralHFrac,
                        double surfaceLiRel, List<Span> convZones, Span burningZone, double nuclearLuminosityFrac,
                        double periodSpacingL1S) {

    /** A step without L_nuc / L and without a period spacing. */
    public TrackStep(double ageGyr, String phase, double luminosityLsun, double radiusRsun, double teffK,
                     double logGCgs, double centralTempK, double centralDensityCgs, double centralHFrac,
                     double surfaceLiRel, List<Span> convZones, Span burningZone) {
        this(ageGyr, phase, luminosityLsun, radiusRsun, teffK, logGCgs, centralTempK, centralDensityCgs, centralHFrac,
                surfaceLiRel, convZones, burningZone, Double.NaN, Double.NaN);
    }

    public TrackStep {
        convZones = List.copyOf(convZones);
        phase = phase == null ? "" : phase;
    }

    /** Whether the step places the star in the HR diagram (positive L and Teff). */
    public boolean hasSurface() {
        return luminosityLsun > 0 && teffK > 0;
    }

    /** The same step with other convective zones (those of the zone table). */
    TrackStep withZones(List<Span> zones) {
        return new TrackStep(ageGyr, phase, luminosityLsun, radiusRsun, teffK, logGCgs, centralTempK,
                centralDensityCgs, centralHFrac, surfaceLiRel, zones, burningZone, nuclearLuminosityFrac,
                periodSpacingL1S);
    }
}
