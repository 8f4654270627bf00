package org.convgrid.engine.birth;

import java.util.ArrayList;
import java.util.List;

import org.convgrid.engine.convection.ConvectiveZone;
import org.convgrid.engine.convection.StabilityCriterion;
import org.convgrid.engine.evolution.AgedModel;
import org.convgrid.engine.evolution.MainSequenceEvolver;
import org.convgrid.engine.physics.PhysicsSet;
import org.convgrid.engine.physics.StandardPhysics;
import org.convgrid.engine.physics.opacity.Opacity;
import org.convgrid.engine.physics.opacity.OpacityValue;
import org.convgrid.engine.physics.opacity.OpalGn93Opacity;
import org.convgrid.engine.request.OpacityChoice;
import org.convgrid.engine.request.PhysicsOptions;
import org.convgrid.engine.state.Composition;
import org.convgrid.engine.structure.StellarProfile;
import org.convgrid.engine.units.Constants;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.condition.EnabledIfSystemProperty;

/**
 * What sets pre-main-sequence lithium burning: Teff, L, R, T_c, the base of the convective envelope (m/M and its
 * temperature) and the surface lithium at 0.5-1000 Myr of one track from birth (run with -Dconvgrid.probe=true;
 * -Dprobe.mass=1 -Dprobe.z=0.02 -Dprobe.myr=100 -Dprobe.alpha=1.8). {@code -Dprobe.coolDex=0.4} is a diagnosis
 * only: it raises the OPAL tables without the cool tables (the former default) by that many dex below log T 3.70, faded out by log T 3.80 (smoothstep), which
 * is roughly where and by how much the analytic cool opacity falls short of the published low-temperature tables
 * ({@code CoolOpacityAgainstLowTemperatureTablesTest}); the interior is untouched.
 */
@EnabledIfSystemProperty(named = "convgrid.probe", matches = "true")
class PreMainSequenceProbe {

    private static final double[] AGES_MYR = {0.5, 1, 2, 3, 5, 10, 20, 50, 100, 200, 500, 1000};
    private static final double FULL_BELOW = 3.70;
    private static final double NONE_ABOVE = 3.80;

    @Test
    void track() {
        double m = Double.parseDouble(System.getProperty("probe.mass", "1"));
        double z = Double.parseDouble(System.getProperty("probe.z", "0.02"));
        double endMyr = Double.parseDouble(System.getProperty("probe.myr", "100"));
        double alpha = Double.parseDouble(System.getProperty("probe.alpha", "1.8"));
        double coolDex = Double.parseDouble(System.getProperty("probe.coolDex", "0"));
        Composition birth = BirthTracks.birth(z);
        OpacityChoice opacity = coolDex == 0.0 ? OpacityChoice.BUILT_IN
                : OpacityChoice.table("cool opacity raised by " + coolDex + " dex", raisedBelow(coolDex));
        PhysicsOptions options = new PhysicsOptions(alpha, 0.0, StabilityCriterion.SCHWARZSCHILD, 1.0, opacity);
        PhysicsSet physics = StandardPhysics.create(options, birth);
        MainSequenceEvolver.Settings d = MainSequenceEvolver.Settings.DEFAULT;
        MainSequenceEvolver.Settings s = new MainSequenceEvolver.Settings(d.maxCentralHydrogenChange(),
                d.exhaustionFraction(), d.maxLuminosityChange(), d.maxGrowth(), d.endCentralHydrogen(),
                endMyr * BirthTracks.MYR, d.stepBudget(), d.retryBudget());
        BirthEvolution evolution = new BirthEvolution(new StartModelBuilder(physics),
                new MainSequenceEvolver(physics, s), BirthEvolution.DEFAULT_CORE_THRESHOLD);
        List<Double> ages = new ArrayList<>();
        for (double a : AGES_MYR) {
            if (a <= endMyr) {
                ages.add(a * BirthTracks.MYR);
            }
        }
        BirthTrack t = evolution.evolve(m * Constants.M_SUN, birth,
                ages.stream().mapToDouble(Double::doubleValue).toArray());
        for (AgedModel answer : t.models()) {
            var g = answer.model().global();
            List<ConvectiveZone> zones = answer.model().convection().zones();
            double base = zones.isEmpty() ? Double.NaN : zones.get(zones.size() - 1).innerMassFraction();
            System.out.printf("%8.2f Myr  Teff %5.0f K  L %.4f  R %.4f  Tc %.4e  envelope base m/M %.4f at %.4e K"
                            + "  first zone from m/M %.4f  log Li/Li0 %.3f%n",
                    answer.age() / BirthTracks.MYR, g.effectiveTemperature(), g.luminosity() / Constants.L_SUN,
                    g.radius() / Constants.R_SUN, g.centralTemperature(), base,
                    temperatureAt(answer.model().profile(), base),
                    zones.isEmpty() ? Double.NaN : zones.get(0).innerMassFraction(),
                    Math.log10(t.surfaceLithiumAt(answer)));
        }
        LifeEvents e = t.events();
        System.out.printf("radiative core %.3f Myr, ZAMS %.2f Myr, lithium halved %.2f Myr%n",
                e.radiativeCore() / BirthTracks.MYR, e.zeroAgeMainSequence() / BirthTracks.MYR,
                e.lithiumHalved() / BirthTracks.MYR);
    }

    private static double temperatureAt(StellarProfile p, double massFraction) {
        int n = p.size();
        double total = p.mass(n - 1);
        for (int k = 0; k < n; k++) {
            if (p.mass(k) / total >= massFraction) {
                return p.temperature(k);
            }
        }
        return Double.NaN;
    }

    /** The built-in opacity times 10^(dex w), w a smoothstep from 1 below log T 3.70 to 0 above 3.80. */
    private static Opacity raisedBelow(double dex) {
        Opacity base = OpalGn93Opacity.withoutCoolTables();
        double width = NONE_ABOVE - FULL_BELOW;
        return (rho, temperature, composition) -> {
            OpacityValue v = base.rosselandMean(rho, temperature, composition);
            double u = Math.min(1.0, Math.max(0.0, (NONE_ABOVE - Math.log10(temperature)) / width));
            double w = u * u * (3.0 - 2.0 * u);
            double dwDlnT = -6.0 * u * (1.0 - u) / (width * Math.log(10.0));
            return new OpacityValue(v.kappa() * Math.pow(10.0, dex * w), v.dlnKappaDlnRho(),
                    v.dlnKappaDlnT() + dex * Math.log(10.0) * dwDlnT);
        };
    }
}
