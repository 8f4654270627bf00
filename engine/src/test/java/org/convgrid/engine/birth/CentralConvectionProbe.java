package org.convgrid.engine.birth;

import org.convgrid.engine.convection.StabilityCriterion;
import org.convgrid.engine.evolution.AgedModel;
import org.convgrid.engine.evolution.MainSequenceEvolver;
import org.convgrid.engine.physics.PhysicsSet;
import org.convgrid.engine.physics.StandardPhysics;
import org.convgrid.engine.physics.opacity.Opacity;
import org.convgrid.engine.physics.opacity.OpacityValue;
import org.convgrid.engine.request.OpacityChoice;
import org.convgrid.engine.request.PhysicsOptions;
import org.convgrid.engine.state.Composition;
import org.convgrid.engine.structure.StellarProfile;
import org.convgrid.engine.units.Constants;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.condition.EnabledIfSystemProperty;

/**
 * What decides whether the centre of a low-mass star is convective on its way from birth: at each age, the
 * central nabla_rad / nabla_ad and its factors (opacity, eps_nuc, eps_grav = L(m_0)/m_0 - eps_nuc, P/T^4), the
 * central 3He and log R = log rho - 3 log T6 (where the opacity table is read), and the energy check of a fully
 * convective star: with the entropy uniform, eps_grav = -T ds/dt is proportional to T, so its central value should
 * be T_c (L - L_nuc)/integral(T dm) (meaningful only while the star is fully convective); then the last fully
 * convective step and the first with a radiative centre (run with -Dconvgrid.probe=true; -Dprobe.mass=0.3
 * -Dprobe.z=0.02).
 */
@EnabledIfSystemProperty(named = "convgrid.probe", matches = "true")
class CentralConvectionProbe {

    private static final double[] AGES_MYR = {5, 10, 20, 30, 35, 38, 40, 45, 50, 60, 80, 100, 110, 150, 200, 300,
        500, 1000};

    @Test
    void centre() {
        double m = Double.parseDouble(System.getProperty("probe.mass", "0.3"));
        double z = Double.parseDouble(System.getProperty("probe.z", "0.02"));
        BirthTrack t = BirthTracks.track(m, z, 1000, 1.0, AGES_MYR);
        System.out.println("  age_Myr   Tc         rho_c    logR    X_c      He3_c     kappa   eps_nuc  eps_grav"
                + "  isentropic_eps_grav  L/M      nab_rad  nab_ad   ratio   m0/M     first_conv_m/M");
        for (AgedModel a : t.models()) {
            StellarProfile p = a.model().profile();
            Composition c = a.model().state().composition(0);
            double l0m0 = p.luminosity(0) / p.mass(0);
            double epsGrav = l0m0 - p.eps(0);
            double lNuc = p.eps(0) * p.mass(0);
            double tdm = p.temperature(0) * p.mass(0);
            for (int k = 0; k < p.size() - 1; k++) {
                double dm = p.mass(k + 1) - p.mass(k);
                lNuc += 0.5 * (p.eps(k) + p.eps(k + 1)) * dm;
                tdm += 0.5 * (p.temperature(k) + p.temperature(k + 1)) * dm;
            }
            double total = p.mass(p.size() - 1);
            double lum = p.luminosity(p.size() - 1);
            double isentropic = p.temperature(0) * (lum - lNuc) / tdm;
            int k = 0;
            while (k < p.size() && !p.convective(k)) {
                k++;
            }
            double t6 = p.temperature(0) / 1.0e6;
            System.out.printf("%8.1f  %.4e  %7.3f  %6.3f  %.5f  %.3e  %6.3f  %.4f   %.4f    %.4f              "
                            + "%.4f   %.4f   %.4f   %.4f  %.2e  %.4f%n",
                    a.age() / BirthTracks.MYR, p.temperature(0), p.density(0),
                    Math.log10(p.density(0)) - 3.0 * Math.log10(t6), c.x(), c.he3(), p.opacity(0), p.eps(0),
                    epsGrav, isentropic, lum / total, p.nablaRad(0), p.nablaAd(0), p.nablaRad(0) / p.nablaAd(0),
                    p.mass(0) / total, k < p.size() ? p.mass(k) / total : Double.NaN);
        }
        onset(t);
        LifeEvents e = t.events();
        System.out.printf("radiative core %.3f Myr, ZAMS %.2f Myr (%s Msun, Z = %s)%n",
                e.radiativeCore() / BirthTracks.MYR, e.zeroAgeMainSequence() / BirthTracks.MYR, m, z);
    }

    /** The last fully convective step and the first with a radiative centre: age, surface and centre. */
    private static void onset(BirthTrack t) {
        TrackPoint before = null;
        for (TrackPoint p : t.points()) {
            boolean coreless = !p.step().convectiveZones().isEmpty()
                    && p.step().convectiveZones().get(0).innerMassFraction() == 0.0;
            if (!coreless) {
                print("last fully convective", before);
                print("first radiative centre", p);
                return;
            }
            before = p;
        }
        System.out.println("centre convective at every step");
    }

    private static void print(String what, TrackPoint p) {
        var s = p.step();
        System.out.printf("%s: %.3f Myr (log t %.4f)  L %.4f Lsun (log %.3f)  R %.4f Rsun  Teff %.0f K  log Tc %.4f"
                        + "  log rho_c %.4f  L_nuc/L %.3f%n", what, p.age() / BirthTracks.MYR,
                Math.log10(p.age() / Constants.YEAR), s.luminosity() / Constants.L_SUN,
                Math.log10(s.luminosity() / Constants.L_SUN), s.radius() / Constants.R_SUN, s.effectiveTemperature(),
                Math.log10(s.centralTemperature()), Math.log10(s.centralDensity()), p.nuclearFraction());
    }

    /**
     * For each mass of -Dprobe.masses (comma separated, Msun), from birth to 1 Gyr: when the centre first and last
     * is radiative and the largest radiative core (m/M of the innermost convective point).
     */
    @Test
    void window() {
        String list = System.getProperty("probe.masses", "");
        double z = Double.parseDouble(System.getProperty("probe.z", "0.02"));
        double scale = Double.parseDouble(System.getProperty("probe.centreScale", "1"));
        for (String token : list.split(",")) {
            if (token.isBlank()) {
                continue;
            }
            double m = Double.parseDouble(token.trim());
            BirthTrack t = scale == 1.0 ? BirthTracks.track(m, z, 1000, 1.0, 1000) : scaledInterior(m, z, scale);
            double first = Double.NaN;
            double last = Double.NaN;
            double largest = 0.0;
            for (TrackPoint p : t.points()) {
                var zones = p.step().convectiveZones();
                double inner = zones.isEmpty() ? 1.0 : zones.get(0).innerMassFraction();
                if (inner > 0.0) {
                    if (Double.isNaN(first)) {
                        first = p.age();
                    }
                    last = p.age();
                    largest = Math.max(largest, inner);
                }
            }
            System.out.printf("interior opacity x %s: ", scale);
            System.out.printf("%.3f Msun Z %s: radiative centre %.1f - %.1f Myr, largest m/M %.4f, ZAMS %.1f Myr%n",
                    m, z, first / BirthTracks.MYR, last / BirthTracks.MYR, largest,
                    t.events().zeroAgeMainSequence() / BirthTracks.MYR);
        }
    }

    private static final double SCALED_ABOVE_LOG_T = 6.3;
    private static final double UNSCALED_BELOW_LOG_T = 6.0;

    /**
     * A diagnosis only (-Dprobe.centreScale=1.2): the track from birth to 1 Gyr with the built-in opacity multiplied
     * by scale^w, w a smoothstep from 0 below log T 6.0 to 1 above 6.3, so the centre sees the scaled opacity and
     * the surface layers do not.
     */
    private static BirthTrack scaledInterior(double m, double z, double scale) {
        Opacity base = StandardPhysics.opacity(1.0);
        double width = SCALED_ABOVE_LOG_T - UNSCALED_BELOW_LOG_T;
        Opacity scaled = (rho, temperature, composition) -> {
            OpacityValue v = base.rosselandMean(rho, temperature, composition);
            double u = Math.min(1.0, Math.max(0.0, (Math.log10(temperature) - UNSCALED_BELOW_LOG_T) / width));
            double w = u * u * (3.0 - 2.0 * u);
            double dwDlnT = 6.0 * u * (1.0 - u) / (width * Math.log(10.0));
            return new OpacityValue(v.kappa() * Math.pow(scale, w), v.dlnKappaDlnRho(),
                    v.dlnKappaDlnT() + Math.log(scale) * dwDlnT);
        };
        Composition birth = BirthTracks.birth(z);
        PhysicsOptions options = new PhysicsOptions(PhysicsOptions.DEFAULT.mixingLength(), 0.0,
                StabilityCriterion.SCHWARZSCHILD, 1.0, OpacityChoice.table("interior opacity x " + scale, scaled));
        PhysicsSet physics = StandardPhysics.create(options, birth);
        MainSequenceEvolver.Settings d = MainSequenceEvolver.Settings.DEFAULT;
        MainSequenceEvolver.Settings s = new MainSequenceEvolver.Settings(d.maxCentralHydrogenChange(),
                d.exhaustionFraction(), d.maxLuminosityChange(), d.maxGrowth(), d.endCentralHydrogen(),
                1000 * BirthTracks.MYR, d.stepBudget(), d.retryBudget());
        BirthEvolution evolution = new BirthEvolution(new StartModelBuilder(physics),
                new MainSequenceEvolver(physics, s), BirthEvolution.DEFAULT_CORE_THRESHOLD);
        return evolution.evolve(m * Constants.M_SUN, birth, new double[] {1000 * BirthTracks.MYR});
    }
}
