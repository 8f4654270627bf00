package org.convgrid.output.track;

import java.io.IOException;
import java.util.List;

import org.convgrid.engine.convection.ConvectiveZone;
import org.convgrid.engine.evolution.EvolutionStep;
import org.convgrid.engine.evolution.MainSequenceEvolver;
import org.convgrid.engine.units.Constants;
import org.convgrid.output.CsvNumbers;
import org.convgrid.output.Span;

/**
 * Writes the track file of one star ({@code tracks/<model_id without age>.csv}): a header row of
 * {@link TrackColumns#ALL}, then one row per accepted evolution step in increasing age, the zero-age model first.
 * Units as in the catalogue (L / L_sun, R / R_sun with the IAU 2015 nominal values, ages over the Julian gigayear, log g = log10(G M / R^2) in cgs).
 * {@code burning_zone_mass_frac} is the {@code lo-hi} extent in m/M of the points where the nuclear energy
 * generation exceeds {@link MainSequenceEvolver#BURNING_THRESHOLD} (1 %) of its maximum in the star; empty when
 * nothing burns. Numbers in the {@link CsvNumbers} form, so the same track always gives the same bytes.
 */
public final class TrackWriter {

    private TrackWriter() {
    }

    /**
     * @param mass the star's mass, g
     * @param steps the track, in increasing age
     * @param out where the text goes (lines end with {@code \n})
     */
    public static void write(double mass, List<EvolutionStep> steps, Appendable out) throws IOException {
        out.append(String.join(",", TrackColumns.ALL)).append('\n');
        for (EvolutionStep s : steps) {
            String zones = Span.join(s.convectiveZones().stream().map(TrackWriter::span).toList());
            String burning = Double.isNaN(s.burningInner()) ? ""
                    : new Span(clamp(s.burningInner()), Math.max(clamp(s.burningInner()), clamp(s.burningOuter())))
                    .toString();
            out.append(CsvNumbers.format(s.age() / Constants.GYR)).append(',')
                    .append(CsvNumbers.format(s.luminosity() / Constants.L_SUN)).append(',')
                    .append(CsvNumbers.format(s.radius() / Constants.R_SUN)).append(',')
                    .append(CsvNumbers.format(s.effectiveTemperature())).append(',')
                    .append(CsvNumbers.format(Math.log10(Constants.G * mass / (s.radius() * s.radius()))))
                    .append(',')
                    .append(CsvNumbers.format(s.centralTemperature())).append(',')
                    .append(CsvNumbers.format(s.centralDensity())).append(',')
                    .append(CsvNumbers.format(s.centralHydrogen())).append(',')
                    .append(zones).append(',')
                    .append(burning).append(',')
                    .append(CsvNumbers.format(s.timeStep() / Constants.YEAR)).append(',')
                    .append(CsvNumbers.format(s.convectiveCoreMassFraction())).append(',')
                    .append(Integer.toString(s.iterations())).append('\n');
        }
    }

    /** A zone's mass extent, clamped into [0, 1] against round-off at the centre and surface. */
    private static Span span(ConvectiveZone zone) {
        double lo = clamp(zone.innerMassFraction());
        return new Span(lo, Math.max(lo, clamp(zone.outerMassFraction())));
    }

    private static double clamp(double x) {
        return Math.min(1.0, Math.max(0.0, x));
    }
}
