package org.convgrid.plotting;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.convgrid.output.CsvNumbers;
import org.convgrid.output.Span;
import org.convgrid.output.catalogue.CatalogueRow;
import org.convgrid.output.track.Track;

/**
 * Synthetic evolution track files matching {@link TestRuns}: surface values from {@link TestRuns#row} at each age,
 * zones that move with age the way main-sequence stars' do (a solar-mass envelope that deepens, an early transient
 * core near 1 Msun, a core that shrinks above about 1.1 Msun, hydrogen burning that turns into a thick shell
 * near exhaustion). Shapes only, from memory, nothing under test.
 */
public final class TestTracks {

    public static final String HEADER = "age_gyr,phase,luminosity_lsun,radius_rsun,teff_k,log_g_cgs,central_temp_k,"
            + "central_density_cgs,central_h_frac,surface_li_rel,central_cz_top_mass_frac,env_cz_base_mass_frac,"
            + "conv_zone_count,burning_inner_mass_frac,burning_outer_mass_frac,solver_iterations";

    private TestTracks() {
    }

    /** The track file text of mass {@code m} and metallicity {@code z}, {@code steps} steps to core-H exhaustion. */
    public static String text(double m, double z, int steps) {
        double lifetime = 10.0 * Math.pow(m, -2.5);
        double fcLimit = 0.35 + 2.0 * (z - 0.014);
        double coreOnset = 1.1 + 6.0 * (z - 0.014);
        StringBuilder b = new StringBuilder(HEADER).append('\n');
        for (int k = 0; k <= steps; k++) {
            double f = k / (double) steps;
            // Steps crowd towards the start, as evolution codes take short first steps.
            double age = lifetime * f * f * 0.5 + lifetime * f * 0.5;
            double share = age / lifetime;
            CatalogueRow r = TestRuns.row("x", m, z, age, false);
            List<Span> zones = new ArrayList<>();
            if (m <= fcLimit) {
                zones.add(new Span(0, 1));
            } else {
                if (m >= coreOnset) {
                    zones.add(new Span(0, round(Math.min(0.25, 0.02 + 0.16 * (m - coreOnset)) * (1 - 0.6 * share))));
                } else if (m > 1.0 - 0.01 && share < 0.03) {
                    zones.add(new Span(0, round(0.04 * (1 - share / 0.03))));
                }
                if (m < 1.5) {
                    double base0 = 1.0 - 0.6 * Math.exp(-(m - fcLimit) / 0.17);
                    // Deepens by up to a factor 3 in mass, never below 5 % of the star.
                    zones.add(new Span(round(Math.max(0.05, 1.0 - (1.0 - base0) * (1 + 2 * share * share))), 1));
                }
            }
            double burnHi = round(m < 1.3 ? 0.45 - 0.1 * share : 0.12 - 0.04 * share);
            double burnLo = share > 0.85 ? round(0.4 * burnHi * (share - 0.85) / 0.15) : 0.0;
            // the zones through the track's own central and surface columns (these tracks have no shells)
            double centralTop = !zones.isEmpty() && zones.get(0).lo() == 0 ? zones.get(0).hi() : Double.NaN;
            Span last = zones.isEmpty() ? null : zones.get(zones.size() - 1);
            double envelopeBase = last != null && last.hi() == 1 ? last.lo() : Double.NaN;
            b.append(String.join(",", CsvNumbers.format(age), "main_sequence", CsvNumbers.format(r.luminosityLsun()),
                    CsvNumbers.format(r.radiusRsun()), CsvNumbers.format(r.teffK()), CsvNumbers.format(r.logGCgs()),
                    CsvNumbers.format(r.centralTempK()), CsvNumbers.format(r.centralDensityCgs()),
                    CsvNumbers.format(r.centralHFrac()), "", CsvNumbers.format(centralTop),
                    CsvNumbers.format(envelopeBase), Integer.toString(zones.size()), CsvNumbers.format(burnLo),
                    CsvNumbers.format(burnHi), Integer.toString(5 + k % 3))).append('\n');
        }
        return b.toString();
    }

    /** Writes one track file per (mass, Z) of the ok-or-not catalogue {@code rows} into {@code runDir/tracks}. */
    public static void write(Path runDir, List<CatalogueRow> rows, int steps) throws IOException {
        Path dir = Files.createDirectories(runDir.resolve("tracks"));
        for (CatalogueRow r : rows) {
            Path file = dir.resolve(Track.trackIdOf(r.modelId()) + ".csv");
            if (!Files.exists(file)) {
                Files.writeString(file, text(r.massMsun(), r.zInit(), steps));
            }
        }
    }

    private static double round(double v) {
        return Math.round(v * 1e6) / 1e6;
    }
}
