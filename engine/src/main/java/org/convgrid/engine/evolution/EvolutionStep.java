package org.convgrid.engine.evolution;

import java.util.List;
import java.util.Objects;

import org.convgrid.engine.convection.ConvectiveZone;
import org.convgrid.engine.request.SeismicScales;

/**
 * Summary of one accepted evolution step (one row of a track), cgs units.
 *
 * @param age time since the zero-age main sequence, s
 * @param timeStep the step that led here, s (0 for the zero-age model)
 * @param luminosity surface luminosity, erg s^-1
 * @param radius cm
 * @param effectiveTemperature K
 * @param centralTemperature K
 * @param centralDensity g cm^-3
 * @param centralHydrogen central hydrogen mass fraction
 * @param convectiveZones every convective zone (m/M and r/R boundaries), centre outwards
 * @param burningInner m/M of the innermost point where eps_nuc exceeds
 *                     {@link MainSequenceEvolver#BURNING_THRESHOLD} times its maximum
 * @param burningOuter m/M of the outermost such point
 * @param iterations Newton iterations of the structure relaxation of this step (failed tries included)
 * @param seismic the seismic scales of the step's model: Pi_0, the acoustic radius, the glitch depths ({@link
 *     org.convgrid.engine.structure.ModelSeismicScales#of})
 * @param mixedCoreTop m/M up to which the evolution's overshoot mixes the central convective zone
 *     ({@link org.convgrid.engine.overshoot.Overshoot#mixedCoreTop}, the catalogue's {@code core_mixed_mass_frac}); NaN
 *     when it mixes no further than the zone, or when there is no central zone
 * @param turnoverTimeLocal the convective envelope's local turnover time, s, as the catalogue's ({@link
 *     org.convgrid.engine.convection.ConvectiveStructure#turnoverTimeLocal}); NaN without an envelope
 * @param turnoverTimeGlobal the integral of dr / v_c across the envelope, s; NaN without an envelope
 * @param momentOfInertia the step's moment of inertia, g cm^2; NaN when not known
 * @param envelopeMomentOfInertia the convective envelope's part of it, g cm^2; NaN without an envelope
 */
public record EvolutionStep(double age, double timeStep, double luminosity, double radius,
                            double effectiveTemperature, double centralTemperature, double centralDensity,
                            double centralHydrogen, List<ConvectiveZone> convectiveZones, double burningInner,
                            double burningOuter, int iterations, SeismicScales seismic, double mixedCoreTop,
                            double turnoverTimeLocal, double turnoverTimeGlobal, double momentOfInertia,
                            double envelopeMomentOfInertia) {


    public EvolutionStep {
        convectiveZones = List.copyOf(convectiveZones);
        Objects.requireNonNull(seismic, "seismic");
    }

    /** A step whose seismic scales, mixed core top, turnover times and inertia are unknown (made without its model). */
    public EvolutionStep(double age, double timeStep, double luminosity, double radius,
                         double effectiveTemperature, double centralTemperature, double centralDensity,
                         double centralHydrogen, List<ConvectiveZone> convectiveZones, double burningInner,
                         double burningOuter, int iterations) {
        this(age, timeStep, luminosity, radius, effectiveTemperature, centralTemperature, centralDensity,
                centralHydrogen, convectiveZones, burningInner, burningOuter, iterations, SeismicScales.UNKNOWN,
                Double.NaN, Double.NaN, Double.NaN, Double.NaN, Double.NaN);
    }

    /** m/M at the top of the convective core, 0 when the centre is radiative. */
    public double convectiveCoreMassFraction() {
        return !convectiveZones.isEmpty() && convectiveZones.get(0).innerMassFraction() == 0.0
                ? convectiveZones.get(0).outerMassFraction() : 0.0;
    }
}
