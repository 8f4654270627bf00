package org.convgrid.engine.physics.atmosphere;

import java.lang.management.ManagementFactory;
import java.lang.management.ThreadMXBean;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.function.Supplier;

import org.convgrid.engine.error.ConvgridException;
import org.convgrid.engine.physics.StandardPhysics;
import org.convgrid.engine.physics.eos.EosAtComposition;
import org.convgrid.engine.physics.eos.EosState;
import org.convgrid.engine.physics.eos.EquationOfState;
import org.convgrid.engine.physics.opacity.Opacity;
import org.convgrid.engine.physics.opacity.OpacityAtComposition;
import org.convgrid.engine.physics.opacity.OpacityValue;
import org.convgrid.engine.request.PhysicsOptions;
import org.convgrid.engine.state.Composition;
import org.convgrid.engine.zams.ZeroAgeRequests;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.condition.EnabledIfSystemProperty;

/**
 * What the grey-atmosphere nodes of the standard physics cost and how accurate they are, over the nodes the
 * 200-model zero-age grid (benchmarks/grids/two-hundred-zero-age.yaml) visits: the default table's nodes at log Teff
 * 3.30-4.63 and log g 3.55-5.65 (the band its zero-age surfaces and their cross-derivative neighbours cover, 170-173
 * nodes per composition of the 41 x 7 here), at the grid's compositions (Z = {@code probe.z}, default
 * 0.004,0.01,0.02,0.03; Y = 0.2471 + 1.5 Z). For each tolerance of {@code probe.tolerances} (default 1e-9..1e-5) it
 * prints the EOS and opacity calls per node, thread CPU per node (least of {@code probe.repeats}, default 2) and how
 * far the node values and derivatives lie from a {@code probe.reference} (default 1e-11) integration; then the table
 * interpolation error at two points per cell (u, v = 0.43, 0.57, as AtmosphereTableTest, and 0.2, 0.8) against the reference
 * direct integration, the figure the node error must stay far below. Run with -Dconvgrid.probe=true.
 */
@EnabledIfSystemProperty(named = "convgrid.probe", matches = "true")
class AtmosphereNodeProbe {

    private static final ThreadMXBean THREADS = ManagementFactory.getThreadMXBean();
    /** probe.former=true: time the former gas-pressure integration (inverting the EOS at each call) instead. */
    private static final boolean FORMER = Boolean.getBoolean("probe.former");

    @Test
    void nodeCostAndErrorAgainstTolerance() {
        double[] zs = doubles(System.getProperty("probe.z", "0.004,0.01,0.02,0.03"));
        double[] tolerances = doubles(System.getProperty("probe.tolerances", "1e-9,1e-8,1e-7,1e-6,1e-5"));
        double referenceTolerance = Double.parseDouble(System.getProperty("probe.reference", "1e-11"));
        int repeats = Integer.parseInt(System.getProperty("probe.repeats", "2"));
        Opacity opacity = StandardPhysics.opacity(PhysicsOptions.DEFAULT);
        TemperatureTauRelation relation = PhysicsOptions.DEFAULT.atmosphere().relation();
        TableAxis tx = AtmosphereTable.DEFAULT_TEFF_AXIS;
        TableAxis ty = AtmosphereTable.DEFAULT_GRAVITY_AXIS;
        for (double z : zs) {
            Composition c = ZeroAgeRequests.initialComposition(z, 0.2471 + 1.5 * z);
            List<double[]> nodes = new ArrayList<>();
            for (int i = 0; i <= 40; i++) {
                for (int j = 3; j <= 9; j++) {
                    nodes.add(new double[] {Math.pow(10, tx.node(i)), Math.pow(10, ty.node(j))});
                }
            }
            Counting counted = new Counting(StandardPhysics.equationOfState(), opacity);
            GreyAtmosphere reference = new GreyAtmosphere(counted, counted.opacity, relation, relation.photosphericDepth(),
                    referenceTolerance);
            SurfaceCondition[] exact = new SurfaceCondition[nodes.size()];
            for (int k = 0; k < nodes.size(); k++) {
                exact[k] = at(reference, nodes.get(k), c);
            }
            System.out.printf(Locale.ROOT, "Z = %s: %d nodes, reference tolerance %.0e: %.0f EOS calls per node%n",
                    z, nodes.size(), referenceTolerance, (double) counted.eosCalls / nodes.size());
            for (double tolerance : tolerances) {
                SurfaceBoundary atm = FORMER ? new GasPressureGreyAtmosphere(counted, counted.opacity, relation,
                        relation.photosphericDepth(), tolerance) : new GreyAtmosphere(counted, counted.opacity, relation,
                        relation.photosphericDepth(), tolerance);
                double leastCpu = Double.MAX_VALUE;
                double eosShare = 0.0;
                double opacityShare = 0.0;
                long calls = 0;
                double dp = 0.0;
                double dTeff = 0.0;
                double dG = 0.0;
                for (int r = 0; r < repeats; r++) {
                    counted.reset();
                    long c0 = THREADS.getCurrentThreadCpuTime();
                    for (int k = 0; k < nodes.size(); k++) {
                        SurfaceCondition s = at(atm, nodes.get(k), c);
                        if (s != null && exact[k] != null) {
                            dp = Math.max(dp, Math.abs(s.lnPressure() - exact[k].lnPressure()));
                            dTeff = Math.max(dTeff, Math.abs(s.dlnPDlnTeff() - exact[k].dlnPDlnTeff()));
                            dG = Math.max(dG, Math.abs(s.dlnPDlnG() - exact[k].dlnPDlnG()));
                        }
                    }
                    double cpu = (THREADS.getCurrentThreadCpuTime() - c0) * 1e-9;
                    if (cpu < leastCpu) {
                        leastCpu = cpu;
                        eosShare = counted.eosNanos * 1e-9 / cpu;
                        opacityShare = counted.opacityNanos * 1e-9 / cpu;
                    }
                    calls = counted.eosCalls;
                }
                System.out.printf(Locale.ROOT, "  tolerance %.0e: %6.0f EOS+opacity calls/node, %.3f ms/node "
                                + "(EOS %.0f %%, opacity %.0f %%); max |d ln P| %.1e, |d dlnP/dlnTeff| %.1e, "
                                + "|d dlnP/dlng| %.1e%n", tolerance, (double) calls / nodes.size(),
                        leastCpu * 1e3 / nodes.size(), 100 * eosShare, 100 * opacityShare, dp, dTeff, dG);
            }
            interpolationError(c, opacity, relation, referenceTolerance, tolerances);
        }
    }

    /** Mid-cell error of tables built at each tolerance, against the reference direct integration. */
    private static void interpolationError(Composition c, Opacity opacity, TemperatureTauRelation relation,
                                           double referenceTolerance, double[] tolerances) {
        EquationOfState eos = StandardPhysics.equationOfState();
        GreyAtmosphere reference = new GreyAtmosphere(eos, opacity, relation, relation.photosphericDepth(),
                referenceTolerance);
        TableAxis tx = AtmosphereTable.DEFAULT_TEFF_AXIS;
        TableAxis ty = AtmosphereTable.DEFAULT_GRAVITY_AXIS;
        List<double[]> points = new ArrayList<>();
        List<SurfaceCondition> direct = new ArrayList<>();
        // two points per cell: near its middle (as AtmosphereTableTest) and near a corner, where the corners' cross
        // derivatives weigh more
        double[][] positions = {{0.43, 0.57}, {0.2, 0.8}};
        for (int i = 0; i < 40; i++) {
            for (int j = 3; j < 9; j++) {
                for (double[] uv : positions) {
                    double[] point = {Math.pow(10, tx.node(i) + uv[0] * tx.step()),
                            Math.pow(10, ty.node(j) + uv[1] * ty.step())};
                    SurfaceCondition s = at(reference, point, c);
                    if (s != null) {
                        points.add(point);
                        direct.add(s);
                    }
                }
            }
        }
        List<Double> all = new ArrayList<>();
        all.add(referenceTolerance);
        for (double t : tolerances) {
            all.add(t);
        }
        for (double tolerance : all) {
            SurfaceBoundary table = new AtmosphereTable(new GreyAtmosphere(eos, opacity, relation,
                    relation.photosphericDepth(), tolerance)).tabulate(c);
            double worst = 0.0;
            double[] worstAt = {Double.NaN, Double.NaN};
            double worstCool = 0.0;
            double sum = 0.0;
            double dTeff = 0.0;
            double dG = 0.0;
            int n = 0;
            for (int k = 0; k < points.size(); k++) {
                SurfaceCondition s = at(table, points.get(k), c);
                if (s == null) {
                    continue;
                }
                double d = Math.abs(s.lnPressure() - direct.get(k).lnPressure());
                dTeff = Math.max(dTeff, Math.abs(s.dlnPDlnTeff() - direct.get(k).dlnPDlnTeff()));
                dG = Math.max(dG, Math.abs(s.dlnPDlnG() - direct.get(k).dlnPDlnG()));
                sum += d;
                n++;
                if (points.get(k)[0] < Math.pow(10, 3.45)) {
                    worstCool = Math.max(worstCool, d);
                } else if (d > worst) {
                    worst = d;
                    worstAt = points.get(k);
                }
            }
            System.out.printf(Locale.ROOT, "  table from tolerance %.0e: %d in-cell points, |d ln P| mean %.2e, "
                    + "max %.2e at log Teff >= 3.45 (at log Teff %.3f, log g %.3f), max %.2e below; max |d dlnP/dlnTeff| "
                    + "%.3f, |d dlnP/dlng| %.3f%n", tolerance, n, sum / n, worst, Math.log10(worstAt[0]),
                    Math.log10(worstAt[1]), worstCool, dTeff, dG);
        }
    }

    private static SurfaceCondition at(SurfaceBoundary atm, double[] node, Composition c) {
        try {
            return atm.at(node[0], node[1], c);
        } catch (ConvgridException e) {
            return null;
        }
    }

    private static double[] doubles(String list) {
        String[] parts = list.split(",");
        double[] out = new double[parts.length];
        for (int i = 0; i < parts.length; i++) {
            out[i] = Double.parseDouble(parts[i].trim());
        }
        return out;
    }

    /** The standard EOS, counting and timing the atmosphere's calls (one thread), with {@link #opacity}. */
    private static final class Counting implements EquationOfState {
        private final EquationOfState eos;
        final Opacity opacity;
        long eosCalls;
        long eosNanos;
        long opacityNanos;

        Counting(EquationOfState eos, Opacity opacity) {
            this.eos = eos;
            this.opacity = new TimedOpacity(opacity);
        }

        void reset() {
            eosCalls = 0;
            eosNanos = 0;
            opacityNanos = 0;
        }

        /** One EOS call, counted and timed into {@link #eosCalls} and {@link #eosNanos}. */
        private EosState timed(Supplier<EosState> call) {
            eosCalls++;
            long t0 = System.nanoTime();
            EosState s = call.get();
            eosNanos += System.nanoTime() - t0;
            return s;
        }

        @Override
        public EosState atDensity(double density, double temperature, Composition composition) {
            return timed(() -> eos.atDensity(density, temperature, composition));
        }

        @Override
        public EosAtComposition atComposition(Composition composition) {
            EosAtComposition bound = eos.atComposition(composition);
            return (density, temperature, nearby) -> timed(() -> bound.atDensity(density, temperature, nearby));
        }

        @Override
        public EosState atPressure(double pressure, double temperature, Composition composition) {
            return timed(() -> eos.atPressure(pressure, temperature, composition));
        }

        @Override
        public EosState atPressure(double pressure, double temperature, Composition composition, EosState nearby) {
            return timed(() -> eos.atPressure(pressure, temperature, composition, nearby));
        }

        /** The opacity, timed into {@link #opacityNanos}. */
        private final class TimedOpacity implements Opacity {
            private final Opacity inner;

            TimedOpacity(Opacity inner) {
                this.inner = inner;
            }

            @Override
            public OpacityValue rosselandMean(double density, double temperature, Composition composition) {
                long t0 = System.nanoTime();
                OpacityValue k = inner.rosselandMean(density, temperature, composition);
                opacityNanos += System.nanoTime() - t0;
                return k;
            }

            @Override
            public OpacityAtComposition atComposition(Composition composition) {
                OpacityAtComposition bound = inner.atComposition(composition);
                return (density, temperature) -> {
                    long t0 = System.nanoTime();
                    OpacityValue k = bound.rosselandMean(density, temperature);
                    opacityNanos += System.nanoTime() - t0;
                    return k;
                };
            }
        }
    }
}
