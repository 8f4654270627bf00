package org.convgrid.output.track;

import java.io.IOException;
import java.util.List;

import org.convgrid.engine.birth.TrackPoint;
import org.convgrid.engine.convection.ConvectiveZone;
import org.convgrid.engine.convection.ConvectiveZoneFinder;
import org.convgrid.engine.evolution.EvolutionStep;
import org.convgrid.engine.evolution.MainSequenceEvolver;
import org.convgrid.engine.structure.BuoyancyTravelTime;
import org.convgrid.engine.units.Constants;
import org.convgrid.output.CsvNumbers;
import org.convgrid.output.MixedCoreEdge;

/**
 * Writes the track file of one star ({@code tracks/<model_id without age>.csv}): a header row of
 * {@link TrackColumns#ALL}, then one row per accepted evolution step in increasing age, the first model first; and
 * its zone table ({@code tracks/<model_id without age>.zones.csv}, {@link TrackColumns#ZONES}): one row per
 * convective zone of every step, centre outwards. Units as in the catalogue (L / L_sun, R / R_sun with the IAU 2015
 * nominal values, ages over the Julian gigayear, log g = log10(G M / R^2) in cgs). The burning region is the extent in
 * m/M of the points where the nuclear energy generation exceeds {@link MainSequenceEvolver#BURNING_THRESHOLD} (1 %)
 * of its maximum in the star; empty when nothing burns. The envelope and a fully convective star follow the
 * catalogue's rules: a surface zone is an envelope when its top lies within
 * {@link ConvectiveZoneFinder#DEFAULT_SURFACE_SKIN_MASS_FRACTION} of the surface and it holds at least
 * {@link ConvectiveZoneFinder#DEFAULT_MIN_ENVELOPE_MASS_FRACTION} of the mass; one zone from the centre that is
 * also the envelope makes the star fully convective (central top 1, envelope base 0). The central zone is any zone
 * holding the centre, however small (the catalogue's core also needs the run's core threshold). The g-mode period
 * scale (Pi_0 and Delta Pi_1) and the p-mode scales (Delta nu, the acoustic depths of the surface zone's base and
 * of helium's second ionisation) are the catalogue's, of each step's model. Numbers in the
 * {@link CsvNumbers} form, so the same track always gives the same bytes.
 */
public final class TrackWriter {

    private TrackWriter() {
    }

    /**
     * @param mass the star's mass, g
     * @param points the track, in increasing age
     * @param out where the text goes (lines end with {@code \n})
     */
    public static void write(double mass, List<TrackPoint> points, Appendable out) throws IOException {
        out.append(String.join(",", TrackColumns.ALL)).append('\n');
        for (TrackPoint p : points) {
            EvolutionStep s = p.step();
            List<ConvectiveZone> zones = s.convectiveZones();
            ConvectiveZone central = !zones.isEmpty() && zones.get(0).innerMassFraction() <= 0.0 ? zones.get(0) : null;
            ConvectiveZone surface = zones.isEmpty() ? null : envelope(zones.get(zones.size() - 1));
            // one zone from the centre to within the skin of the surface: fully convective, top 1 as documented
            boolean fullyConvective = central != null && central == surface;
            boolean burns = !Double.isNaN(s.burningInner());
            double burnLo = burns ? clamp(s.burningInner()) : Double.NaN;
            double pi0 = s.seismic().buoyancyTravelTime();
            out.append(CsvNumbers.format(s.age() / Constants.GYR)).append(',')
                    .append(p.phase().label()).append(',')
                    .append(CsvNumbers.format(s.luminosity() / Constants.L_SUN)).append(',')
                    .append(CsvNumbers.format(s.radius() / Constants.R_SUN)).append(',')
                    .append(CsvNumbers.format(s.effectiveTemperature())).append(',')
                    .append(CsvNumbers.format(Math.log10(Constants.G * mass / (s.radius() * s.radius()))))
                    .append(',')
                    .append(CsvNumbers.format(s.centralTemperature())).append(',')
                    .append(CsvNumbers.format(s.centralDensity())).append(',')
                    .append(CsvNumbers.format(s.centralHydrogen())).append(',')
                    .append(CsvNumbers.format(p.surfaceLithium())).append(',')
                    .append(CsvNumbers.format(central == null ? Double.NaN
                            : fullyConvective ? 1.0 : clamp(central.outerMassFraction())))
                    .append(',')
                    .append(CsvNumbers.format(surface == null ? Double.NaN : clamp(surface.innerMassFraction())))
                    .append(',')
                    .append(Integer.toString(zones.size())).append(',')
                    .append(CsvNumbers.format(burnLo)).append(',')
                    .append(CsvNumbers.format(burns ? Math.max(burnLo, clamp(s.burningOuter())) : Double.NaN))
                    .append(',')
                    .append(CsvNumbers.format(p.nuclearFraction())).append(',')
                    .append(CsvNumbers.format(s.timeStep() / Constants.YEAR)).append(',')
                    .append(Integer.toString(s.iterations())).append(',')
                    .append(CsvNumbers.format(pi0)).append(',')
                    .append(CsvNumbers.format(Double.isNaN(pi0) ? Double.NaN
                            : BuoyancyTravelTime.periodSpacing(pi0, 1))).append(',')
                    .append(CsvNumbers.format(central == null || fullyConvective ? Double.NaN
                            : MixedCoreEdge.of(s.mixedCoreTop(), clamp(central.outerMassFraction())))).append(',')
                    .append(CsvNumbers.format(s.seismic().largeSeparationMicrohertz())).append(',')
                    .append(CsvNumbers.format(s.seismic().surfaceZoneBaseAcousticDepth())).append(',')
                    .append(CsvNumbers.format(s.seismic().heliumSecondIonisationAcousticDepth())).append(',')
                    .append(CsvNumbers.format(s.turnoverTimeLocal() / Constants.DAY)).append(',')
                    .append(CsvNumbers.format(s.turnoverTimeGlobal() / Constants.DAY)).append(',')
                    .append(CsvNumbers.format(s.momentOfInertia())).append(',')
                    .append(CsvNumbers.format(s.envelopeMomentOfInertia())).append('\n');
        }
    }

    /**
     * The zone table of a track: one row per convective zone of every step, steps in file order, zones centre
     * outwards; extents clamped into [0, 1] against round-off at the centre and surface.
     */
    public static void writeZones(List<TrackPoint> points, Appendable out) throws IOException {
        out.append(String.join(",", TrackColumns.ZONES)).append('\n');
        for (int i = 0; i < points.size(); i++) {
            EvolutionStep s = points.get(i).step();
            String age = CsvNumbers.format(s.age() / Constants.GYR);
            List<ConvectiveZone> zones = s.convectiveZones();
            for (int k = 0; k < zones.size(); k++) {
                ConvectiveZone z = zones.get(k);
                double lo = clamp(z.innerMassFraction());
                double rLo = clamp(z.innerRadiusFraction());
                out.append(Integer.toString(i)).append(',').append(age).append(',').append(Integer.toString(k))
                        .append(',').append(CsvNumbers.format(lo)).append(',')
                        .append(CsvNumbers.format(Math.max(lo, clamp(z.outerMassFraction())))).append(',')
                        .append(CsvNumbers.format(rLo)).append(',')
                        .append(CsvNumbers.format(Math.max(rLo, clamp(z.outerRadiusFraction())))).append('\n');
            }
        }
    }

    /** The outermost zone when it is a convective envelope by the catalogue's rule; null otherwise. */
    private static ConvectiveZone envelope(ConvectiveZone outermost) {
        return ConvectiveZoneFinder.isEnvelope(outermost, ConvectiveZoneFinder.DEFAULT_SURFACE_SKIN_MASS_FRACTION,
                ConvectiveZoneFinder.DEFAULT_MIN_ENVELOPE_MASS_FRACTION) ? outermost : null;
    }

    private static double clamp(double x) {
        return Math.min(1.0, Math.max(0.0, x));
    }
}
