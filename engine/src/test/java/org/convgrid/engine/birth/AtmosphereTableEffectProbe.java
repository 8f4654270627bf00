package org.convgrid.engine.birth;

import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import org.convgrid.engine.evolution.AgedModel;
import org.convgrid.engine.evolution.MainSequenceEvolver;
import org.convgrid.engine.physics.PhysicsSet;
import org.convgrid.engine.physics.StandardPhysics;
import org.convgrid.engine.physics.atmosphere.GreyAtmosphere;
import org.convgrid.engine.physics.atmosphere.TemperatureTauRelation;
import org.convgrid.engine.request.GlobalProperties;
import org.convgrid.engine.request.PhysicsOptions;
import org.convgrid.engine.units.Constants;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.condition.EnabledIfSystemProperty;

/**
 * What the atmosphere table's interpolation does to young stars: the same tracks from birth with the standard
 * physics (the tabulated grey atmosphere) and with the grey atmosphere integrated directly at every surface
 * evaluation, compared in L, R and Teff at ages of {@code probe.ages} Myr (default 1,3,10,30,100) for masses
 * {@code probe.masses} (default 0.1,0.3,0.6,1.0 Msun) at Z = {@code probe.z} (default 0.02). The table's ln P error is
 * largest in the cool low-gravity cells such stars cross (1.2e-2 near log Teff 3.48, log g 3.75; AtmosphereTable's
 * figures). Run with -Dconvgrid.probe=true.
 */
@EnabledIfSystemProperty(named = "convgrid.probe", matches = "true")
class AtmosphereTableEffectProbe {

    @Test
    void youngStarsWithTheTableAndWithDirectIntegration() {
        double z = Double.parseDouble(System.getProperty("probe.z", "0.02"));
        double[] masses = doubles(System.getProperty("probe.masses", "0.1,0.3,0.6,1.0"));
        double[] agesMyr = doubles(System.getProperty("probe.ages", "1,3,10,30,100"));
        PhysicsSet tabled = BirthTracks.physics(z);
        TemperatureTauRelation relation = PhysicsOptions.DEFAULT.atmosphere().relation();
        PhysicsSet direct = new PhysicsSet(tabled.eos(), tabled.opacity(), tabled.nuclear(), tabled.convection(),
                tabled.criterion(), new GreyAtmosphere(StandardPhysics.equationOfState(), tabled.opacity(), relation,
                relation.photosphericDepth()), tabled.overshoot());
        double[] ages = Arrays.stream(agesMyr).map(a -> a * BirthTracks.MYR).toArray();
        double end = Arrays.stream(agesMyr).max().orElseThrow() * 1.01;
        for (double m : masses) {
            List<AgedModel> withTable = evolve(tabled, m, z, ages, end);
            List<AgedModel> withDirect = evolve(direct, m, z, ages, end);
            for (int i = 0; i < ages.length; i++) {
                GlobalProperties a = withTable.get(i).model().global();
                GlobalProperties b = withDirect.get(i).model().global();
                System.out.printf(Locale.ROOT, "M %.2f Z %s age %6.1f Myr: log Teff %.4f log g %.3f; table - direct:"
                                + " dR/R %+.2e, dL/L %+.2e, dTeff/Teff %+.2e%n", m, z, agesMyr[i],
                        Math.log10(b.effectiveTemperature()), Math.log10(b.surfaceGravity()),
                        a.radius() / b.radius() - 1.0, a.luminosity() / b.luminosity() - 1.0,
                        a.effectiveTemperature() / b.effectiveTemperature() - 1.0);
            }
        }
    }

    private static List<AgedModel> evolve(PhysicsSet physics, double massInSun, double z, double[] ages,
                                          double endMyr) {
        MainSequenceEvolver.Settings d = MainSequenceEvolver.Settings.DEFAULT;
        MainSequenceEvolver.Settings s = new MainSequenceEvolver.Settings(d.maxCentralHydrogenChange(),
                d.exhaustionFraction(), d.maxLuminosityChange(), d.maxGrowth(), d.endCentralHydrogen(),
                endMyr * BirthTracks.MYR, d.stepBudget(), d.retryBudget());
        BirthEvolution evolution = new BirthEvolution(physics, s);
        return evolution.evolve(massInSun * Constants.M_SUN, BirthTracks.birth(z), ages).models();
    }

    private static double[] doubles(String list) {
        return Arrays.stream(list.split(",")).mapToDouble(v -> Double.parseDouble(v.trim())).toArray();
    }
}
