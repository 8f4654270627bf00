package org.convgrid.engine.birth;

import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;

import org.convgrid.engine.evolution.EvolutionResult;
import org.convgrid.engine.evolution.MainSequenceEvolver;
import org.convgrid.engine.units.Constants;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.condition.EnabledIfSystemProperty;

/**
 * Robustness from birth, the measurement of issue 15: masses 0.1-10 Msun every {@code probe.dex} (0.05) dex times
 * Z in {1e-4, 0.004, 0.02, 0.04}, each from birth to core-hydrogen exhaustion or {@code probe.maxgyr} (15) Gyr,
 * default physics and steps, on {@code probe.threads} (1) threads. A track finishes when it ends by exhaustion
 * or at the age limit; anything else (start model refused, step or retry budget used) is a failure and is listed.
 * Tracks are started in a strided order so that a run cut short still samples the whole plane. Not a CI test: it
 * takes an hour or more (run with -Dconvgrid.probe=true, niced).
 */
@EnabledIfSystemProperty(named = "convgrid.probe", matches = "true")
class BirthRobustnessProbe {

    private static final double[] METALLICITIES = {1.0e-4, 0.004, 0.02, 0.04};
    /** A stride prime to the number of tracks, so the order visits every part of the plane early. */
    private static final int STRIDE = 37;

    @Test
    void everyMassAndMetallicityFromBirthToExhaustion() throws Exception {
        double dex = Double.parseDouble(System.getProperty("probe.dex", "0.05"));
        double maxGyr = Double.parseDouble(System.getProperty("probe.maxgyr", "15"));
        int threads = Integer.parseInt(System.getProperty("probe.threads", "1"));
        int steps = (int) Math.round(2.0 / dex);
        // -Dprobe.z=0.04 and -Dprobe.masses=1.26,2.0 re-run a part of the plane (e.g. the tracks that failed)
        double[] zs = System.getProperty("probe.z") == null ? METALLICITIES
                : java.util.Arrays.stream(System.getProperty("probe.z").split(",")).mapToDouble(Double::parseDouble)
                        .toArray();
        List<double[]> cases = new ArrayList<>();
        for (double z : zs) {
            if (System.getProperty("probe.masses") != null) {
                for (String m : System.getProperty("probe.masses").split(",")) {
                    cases.add(new double[] {Double.parseDouble(m), z});
                }
                continue;
            }
            for (int i = 0; i <= steps; i++) {
                cases.add(new double[] {Math.pow(10.0, -1.0 + i * dex), z});
            }
        }
        int n = cases.size();
        int stride = n % STRIDE == 0 ? STRIDE + 2 : STRIDE;
        List<double[]> order = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            order.add(cases.get((int) ((long) i * stride % n)));
        }
        ExecutorService pool = Executors.newFixedThreadPool(threads);
        List<Future<String>> results = new ArrayList<>();
        for (double[] c : order) {
            results.add(pool.submit(() -> {
                String line = run(c[0], c[1], maxGyr);
                System.out.println(line);
                System.out.flush();
                return line;
            }));
        }
        int finished = 0;
        List<String> failures = new ArrayList<>();
        for (Future<String> f : results) {
            String line = f.get();
            if (line.startsWith("ok")) {
                finished++;
            } else {
                failures.add(line);
            }
        }
        pool.shutdown();
        System.out.printf("finished (exhaustion or %.0f Gyr): %d of %d%n", maxGyr, finished, n);
        failures.forEach(l -> System.out.println("  " + l));
    }

    private static String run(double mass, double z, double maxGyr) {
        long t0 = System.nanoTime();
        String line;
        try {
            MainSequenceEvolver.Settings d = MainSequenceEvolver.Settings.DEFAULT;
            MainSequenceEvolver.Settings s = new MainSequenceEvolver.Settings(d.maxCentralHydrogenChange(),
                    d.exhaustionFraction(), d.maxLuminosityChange(), d.maxGrowth(), d.endCentralHydrogen(),
                    maxGyr * Constants.GYR, d.stepBudget(), d.retryBudget());
            BirthTrack t = new BirthEvolution(BirthTracks.physics(z), s)
                    .evolve(mass * Constants.M_SUN, BirthTracks.birth(z), new double[0]);
            EvolutionResult r = t.result();
            boolean ok = r.end() != EvolutionResult.EndReason.FAILED;
            line = String.format("%s M %.4f Z %.4g: %s at %.4g Gyr, ZAMS %.4g Myr, %d steps %s", ok ? "ok  " : "FAIL",
                    mass, z, r.end(), r.endAge() / Constants.GYR, t.events().zeroAgeMainSequence() / BirthTracks.MYR,
                    t.points().size(), r.detail());
        } catch (RuntimeException e) {
            line = String.format("FAIL M %.4f Z %.4g: %s", mass, z, e);
        }
        return line + String.format(" (%.1f s)", (System.nanoTime() - t0) * 1e-9);
    }
}
