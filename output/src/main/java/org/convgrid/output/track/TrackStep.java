package org.convgrid.output.track;

import java.util.List;
import org.convgrid.output.Span;

/**
 * One evolution step of a track file, in the file's units; NaN means the cell was empty or the column absent.
 *
 * @param ageGyr age since the zero-age main sequence, Gyr
 * @param luminosityLsun L / L_sun
 * @param radiusRsun R / R_sun
 * @param teffK effective temperature, K
 * @param logGCgs log10 of the surface gravity in cm s^-2
 * @param centralTempK central temperature, K
 * @param centralDensityCgs central density, g cm^-3
 * @param centralHFrac central hydrogen mass fraction
 * @param convZones every convective zone in m/M, centre outwards
 * @param burningZone the hydrogen-burning region in m/M (energy generation above the writer's threshold), null
 *     when the file gives none
 */
public record TrackStep(double ageGyr, double luminosityLsun, double radiusRsun, double teffK, double logGCgs,
                        double centralTempK, double centralDensityCgs, double centralHFrac, List<Span> convZones,
                        Span burningZone) {

    public TrackStep {
        convZones = List.copyOf(convZones);
    }

    /** Whether the step places the star in the HR diagram (positive L and Teff). */
    public boolean hasSurface() {
        return luminosityLsun > 0 && teffK > 0;
    }
}
