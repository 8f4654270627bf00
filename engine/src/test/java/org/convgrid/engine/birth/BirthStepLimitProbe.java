package org.convgrid.engine.birth;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;

import org.convgrid.engine.evolution.MainSequenceEvolver;
import org.convgrid.engine.evolution.NuclearLuminosity;
import org.convgrid.engine.evolution.PreMainSequenceLimits;
import org.convgrid.engine.evolution.StepObserver;
import org.convgrid.engine.evolution.SurfaceComposition;
import org.convgrid.engine.physics.PhysicsSet;
import org.convgrid.engine.state.Composition;
import org.convgrid.engine.units.Constants;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.condition.EnabledIfSystemProperty;

/**
 * Where the steps of a track from birth to core-hydrogen exhaustion go: per step, the change of every quantity the
 * step control limits over its limit, computed from the accepted models; the step is counted against the limit
 * that set its length (the largest ratio of the step before, or the growth factor when no ratio reached it),
 * tallied per decade of age (run with -Dconvgrid.probe=true; -Dprobe.mass, -Dprobe.z, -Dprobe.coarse).
 */
@EnabledIfSystemProperty(named = "convgrid.probe", matches = "true")
class BirthStepLimitProbe {

    private static final String[] NAMES = {"lnL", "lnR", "lnTc", "D", "Li", "C12/He3", "share", "Xc", "growth"};

    @Test
    void bindingLimitPerDecade() {
        double mass = Double.parseDouble(System.getProperty("probe.mass", "1"));
        double z = Double.parseDouble(System.getProperty("probe.z", "0.02"));
        double coarse = Double.parseDouble(System.getProperty("probe.coarse", "1"));
        PhysicsSet physics = BirthTracks.physics(z);
        MainSequenceEvolver.Settings settings = MainSequenceEvolver.Settings.DEFAULT.scaled(coarse);
        PreMainSequenceLimits young = PreMainSequenceLimits.DEFAULT.scaled(coarse);
        MainSequenceEvolver evolver = new MainSequenceEvolver(physics, settings).withPreMainSequenceLimits(young);
        long s0 = System.nanoTime();
        StartModel start = new StartModelBuilder(physics).build(mass * Constants.M_SUN, BirthTracks.birth(z));
        System.out.printf("start model: %.2f s, %d iterations%n", (System.nanoTime() - s0) * 1e-9,
                start.iterations());
        // per model: age, h, L, R, Tc, Xc, D_c, Li_surface, C12_c, He3_c, L_nuc/L, iterations, centre convective
        List<double[]> rows = new ArrayList<>();
        StepObserver observer = (age, h, model) -> {
            var g = model.global();
            Composition c = model.state().composition(0);
            rows.add(new double[] {age, h, g.luminosity(), g.radius(), g.centralTemperature(), g.centralHydrogen(),
                c.h2(), SurfaceComposition.of(model).li7(), c.c12(), c.he3(), NuclearLuminosity.fraction(model),
                model.report().iterations(), model.profile().stabilityExcess(0) > 0.0 ? 1.0 : 0.0});
        };
        long t0 = System.nanoTime();
        var result = evolver.evolve(start.model(), new double[] {0.0}, observer);
        double seconds = (System.nanoTime() - t0) * 1e-9;
        double startD = rows.get(0)[6];
        double startLi = rows.get(0)[7];
        Map<Integer, int[]> perDecade = new TreeMap<>();
        Map<Integer, int[]> iterations = new TreeMap<>();
        // -Dprobe.detail=FROM,TO (yr): every step in that age window with its ratios
        String[] window = System.getProperty("probe.detail", "-1,-1").split(",");
        double detailFrom = Double.parseDouble(window[0]) * Constants.YEAR;
        double detailTo = Double.parseDouble(window[1]) * Constants.YEAR;
        boolean isYoung = rows.get(0)[10] < NuclearLuminosity.ZERO_AGE_FRACTION;
        int youngSteps = 0;
        for (int i = 1; i < rows.size(); i++) {
            double[] a = rows.get(i - 1);
            double[] b = rows.get(i);
            double[] r = ratios(a, b, isYoung, young, settings, startD, startLi);
            int binding = NAMES.length - 1;
            double growth = isYoung ? young.maxGrowth() : settings.maxGrowth();
            double max = 0.0;
            for (int k = 0; k < r.length; k++) {
                if (r[k] > max) {
                    max = r[k];
                    binding = k;
                }
            }
            // the next step is h * min(growth, 0.9 / max): record what set the step after this one
            if (0.9 / Math.max(max, 1e-3) >= growth) {
                binding = NAMES.length - 1;
            }
            if (b[0] >= detailFrom && b[0] <= detailTo) {
                System.out.printf("%.4e yr h %.3e f %.5f it %2d binding %-7s", b[0] / Constants.YEAR,
                        b[1] / Constants.YEAR, b[10], (int) b[11], NAMES[binding]);
                for (int k = 0; k < r.length; k++) {
                    System.out.printf(" %s %.2f", NAMES[k], r[k]);
                }
                System.out.println();
            }
            if (i + 1 < rows.size()) {
                int dec = (int) Math.floor(Math.log10(rows.get(i + 1)[0] / Constants.YEAR));
                perDecade.computeIfAbsent(dec, k -> new int[NAMES.length + 1])[binding]++;
                perDecade.get(dec)[NAMES.length]++;
                int[] it = iterations.computeIfAbsent(dec, k -> new int[2]);
                it[0] += (int) rows.get(i + 1)[11];
                it[1]++;
            }
            if (isYoung) {
                youngSteps++;
            }
            isYoung = isYoung && b[10] < NuclearLuminosity.ZERO_AGE_FRACTION;
        }
        int newton = 0;
        for (var step : result.steps()) {
            newton += step.iterations();
        }
        System.out.printf("M %.2f Z %.3f coarse %.2f: %d steps (%d before the ZAMS), %d Newton iterations (rejected "
                + "steps included), %.1f s, end %s at %.4g Gyr%n", mass, z, coarse, rows.size() - 1, youngSteps,
                newton, seconds, result.end(), result.endAge() / Constants.GYR);
        double zamsAge = Double.NaN;
        for (double[] row : rows) {
            if (row[10] >= NuclearLuminosity.ZERO_AGE_FRACTION) {
                zamsAge = row[0];
                break;
            }
        }
        // to 12 digits, to show that a change of the starting guess changes the work and not the solution
        System.out.printf("first model at L_nuc/L >= %.2f: %.12e s; end %.12e s; last model: surface 7Li %.12e, "
                + "L %.12e erg/s%n", NuclearLuminosity.ZERO_AGE_FRACTION, zamsAge, result.endAge(),
                rows.get(rows.size() - 1)[7], rows.get(rows.size() - 1)[2]);
        System.out.print("log age yr | steps |");
        for (String n : NAMES) {
            System.out.printf(" %7s", n);
        }
        System.out.println(" | Newton/step");
        for (var e : perDecade.entrySet()) {
            int[] c = e.getValue();
            System.out.printf("%10d | %5d |", e.getKey(), c[NAMES.length]);
            for (int k = 0; k < NAMES.length; k++) {
                System.out.printf(" %7d", c[k]);
            }
            int[] it = iterations.get(e.getKey());
            System.out.printf(" | %.2f%n", (double) it[0] / it[1]);
        }
    }

    /** Each limited change of the step a -> b over its limit (index as {@link #NAMES}); 0 where it does not apply. */
    private static double[] ratios(double[] a, double[] b, boolean isYoung,
                                   PreMainSequenceLimits young, MainSequenceEvolver.Settings settings,
                                   double startD, double startLi) {
        double[] r = new double[NAMES.length - 1];
        double dLnL = Math.abs(Math.log(b[2] / a[2]));
        double xc = a[5];
        double xcLimit = xc > 0.1 ? settings.maxCentralHydrogenChange()
                : Math.min(settings.maxCentralHydrogenChange(), settings.exhaustionFraction() * xc);
        r[7] = Math.max(0.0, xc - b[5]) / xcLimit;
        if (!isYoung) {
            r[0] = dLnL / settings.maxLuminosityChange();
            return r;
        }
        boolean centre = a[12] > 0.0;
        r[0] = dLnL / young.structureLimit(young.maxLuminosityChange(), a[10], centre);
        r[1] = Math.abs(Math.log(b[3] / a[3])) / young.structureLimit(young.maxRadiusChange(), a[10], centre);
        r[2] = Math.abs(Math.log(b[4] / a[4]))
                / young.structureLimit(young.maxCentralTemperatureChange(), a[10], centre);
        if (a[6] > PreMainSequenceLimits.DEUTERIUM_FLOOR * startD && a[6] > 0.0) {
            r[3] = (a[6] - b[6]) / a[6] / young.maxDeuteriumBurnt();
        }
        if (a[7] > PreMainSequenceLimits.LITHIUM_FLOOR * startLi && a[7] > 0.0) {
            r[4] = (a[7] - b[7]) / a[7] / young.maxLithiumBurnt();
        }
        double change = 0.0;
        if (a[8] > 0.0 && b[8] > 0.0) {
            change = Math.abs(Math.log(b[8] / a[8]));
        }
        if (a[9] > 0.0 && b[9] > 0.0) {
            change = Math.max(change, Math.abs(Math.log(b[9] / a[9])));
        }
        r[5] = change / young.maxCentralBurningChange();
        double floor = 1.0 - NuclearLuminosity.ZERO_AGE_FRACTION;
        double shareA = Math.max(1.0 - a[10], floor);
        double shareB = Math.max(1.0 - b[10], floor);
        r[6] = Math.abs(Math.log(shareB / shareA)) / young.maxContractionShareChange();
        return r;
    }
}
