package org.convgrid.engine.calibration;

import org.convgrid.engine.physics.StandardPhysics;
import org.convgrid.engine.physics.eos.EosState;
import org.convgrid.engine.physics.opacity.Opacity;
import org.convgrid.engine.state.Composition;
import org.convgrid.engine.structure.StellarModel;
import org.convgrid.engine.structure.StellarProfile;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.condition.EnabledIfSystemProperty;

/**
 * Not a test: one solar track at fixed inputs (by default the calibrated ones), printing the conditions around the
 * envelope base (T, rho, P, kappa, nabla_ad, nabla_rad, X, Y, Z, L, m/M) and the opacity at the base's (T, rho)
 * for the local composition, the initial one and the neighbouring table compositions, to compare with published
 * standard solar models. Run with -Dconvgrid.probe=true (-Dprobe.alpha, -Dprobe.y, -Dprobe.zx, -Dprobe.settling).
 */
@EnabledIfSystemProperty(named = "convgrid.probe", matches = "true")
class EnvelopeBaseProbe {

    /**
     * Our microphysics at points of the published standard solar model BS05(OP) (Bahcall, Serenelli &amp; Basu 2005,
     * ApJ 621, L85; their model table: m/M, r/R, T, rho, P, L/Lsun, X, Y(4He), 3He): P, nabla_ad and kappa from our
     * equation of state and OPAL tables at their (rho, T, X, Z), and nabla_rad from their P, T, L, m with our kappa.
     */
    @Test
    void publishedModelPoints() {
        double[][] rows = {
            {0.9716053, 0.69299, 2.380e6, 2.196e-1, 7.122e13, 1.00001, 0.72988, 0.25214, 1.03e-4},
            {0.9732606, 0.70051, 2.311e6, 2.062e-1, 6.511e13, 1.00001, 0.73334, 0.24898, 1.02e-4},
            {0.9755173, 0.71128, 2.205e6, 1.890e-1, 5.718e13, 1.00001, 0.73906, 0.24375, 9.98e-5},
            {0.9759673, 0.71351, 2.182e6, 1.858e-1, 5.565e13, 1.00001, 0.74045, 0.24248, 9.93e-5},
            {0.9761549, 0.71444, 2.172e6, 1.845e-1, 5.502e13, 1.00001, 0.74045, 0.24248, 9.93e-5},
            {0.9827200, 0.75006, 1.813e6, 1.403e-1, 3.490e13, 1.00001, 0.74045, 0.24248, 9.93e-5},
            {0.9983632, 0.90205, 5.825e5, 2.504e-2, 1.976e12, 1.00000, 0.74045, 0.24248, 9.93e-5},
            {0.9997309, 0.95017, 2.712e5, 7.755e-3, 2.803e11, 1.00000, 0.74045, 0.24248, 9.93e-5},
            {0.9999396, 0.97048, 1.509e5, 3.018e-3, 5.916e10, 1.00000, 0.74045, 0.24248, 9.93e-5},
            {0.9999818, 0.98009, 9.851e4, 1.397e-3, 1.734e10, 1.00000, 0.74045, 0.24248, 9.93e-5},
            {0.9999866, 0.98195, 8.854e4, 1.145e-3, 1.266e10, 1.00000, 0.74045, 0.24248, 9.93e-5},
        };
        Opacity op = StandardPhysics.opacity(1.0);
        double lSunBs05 = 3.842e33; // BS05's solar luminosity (from memory)
        System.out.println("BS05 r/R   T          rho        P_BS05     P_ours/P_BS05 nabla_ad  kappa   nabla_rad(BS05 P,T,L,m; our kappa)");
        for (double[] r : rows) {
            double z = 1.0 - r[6] - r[7] - r[8];
            Composition c = Composition.scaledSolar(r[6], z);
            EosState e = StandardPhysics.equationOfState().atDensity(r[3], r[2], c);
            double kappa = op.rosselandMean(r[3], r[2], c).kappa();
            double m = r[0] * org.convgrid.engine.units.Constants.M_SUN;
            double nablaRad = 3.0 * kappa * r[5] * lSunBs05 * r[4] / (16.0 * Math.PI
                    * org.convgrid.engine.units.Constants.A_RAD * org.convgrid.engine.units.Constants.C
                    * org.convgrid.engine.units.Constants.G * m * Math.pow(r[2], 4));
            System.out.printf("%.5f %.4e %.4e %.4e %.5f %.5f %.3f %.5f  (X=%.5f Z=%.5f)%n", r[1], r[2], r[3], r[4],
                    e.pressure() / r[4], e.nablaAd(), kappa, nablaRad, r[6], z);
        }
    }

    /**
     * Our equation of state's terms at the BS05 envelope base (the table's P, T, rho, X, Y there), against a fully
     * ionised ideal gas (atomic masses 1.00783 and 4.0026 u; metals 0.5 electron and 1/16 nucleus per u).
     */
    @Test
    void equationOfStateTermsAtTheBase() {
        double t = 2.182e6;
        double rho = 0.1858;
        double x = 0.74045;
        double z = 1.0 - x - 0.24248 - 9.93e-5;
        Composition c = Composition.scaledSolar(x, z);
        double ideal = rho * org.convgrid.engine.units.Constants.K_B * t / org.convgrid.engine.units.Constants.M_U
                * (2 * x / 1.00783 + 3 * (1 - x - z) / 4.0026 + 0.56 * z)
                + org.convgrid.engine.units.Constants.A_RAD * Math.pow(t, 4) / 3;
        var variants = new java.util.LinkedHashMap<String, org.convgrid.engine.physics.eos.StellarPlasmaEos>();
        variants.put("default", new org.convgrid.engine.physics.eos.StellarPlasmaEos());
        variants.put("no Coulomb", new org.convgrid.engine.physics.eos.StellarPlasmaEos(
                org.convgrid.engine.state.MetalMixture.GS98, true, false));
        variants.put("no pressure ionisation", new org.convgrid.engine.physics.eos.StellarPlasmaEos(
                org.convgrid.engine.state.MetalMixture.GS98, false, true));
        variants.put("ideal Saha", org.convgrid.engine.physics.eos.StellarPlasmaEos.idealSaha());
        System.out.printf("fully ionised ideal P = %.5e, BS05 P = 5.565e13 (%.4f of ideal)%n", ideal, 5.565e13 / ideal);
        for (var v : variants.entrySet()) {
            EosState e = v.getValue().atDensity(rho, t, c);
            var ion = v.getValue().ionisation(rho, t, c);
            System.out.printf("%-24s P/P_ideal=%.5f nabla_ad=%.5f gamma1=%.5f electrons/u=%.5f (full %.5f) eta=%.3f%n",
                    v.getKey(), e.pressure() / ideal, e.nablaAd(), e.gamma1(), ion.electronsPerBaryon(),
                    x / 1.00783 + 2 * (1 - x - z) / 4.0026 + 0.5 * z, ion.eta());
        }
    }

    /**
     * How the settled envelope depends on the time steps: one track per -Dprobe.stepscales (comma-separated factors
     * on every change limit of the evolution) at the inputs of {@link #base}.
     */
    @Test
    void stepDependence() {
        double alpha = Double.parseDouble(System.getProperty("probe.alpha", "1.759363"));
        double y = Double.parseDouble(System.getProperty("probe.y", "0.2737973"));
        double zx = Double.parseDouble(System.getProperty("probe.zx", "0.02699989"));
        for (String f : System.getProperty("probe.stepscales", "1,0.5").split(",")) {
            CalibrationSettings d = CalibrationSettings.DEFAULT.withMetalsToHydrogen(zx);
            CalibrationSettings s = new CalibrationSettings(d.age(), d.metalsToHydrogen(), d.startMixingLength(),
                    d.startHelium(), d.tolerance(), d.evolutionBudget(), d.evolution().scaled(Double.parseDouble(f)),
                    d.atmosphere(), true);
            SolarTrial t = new SolarTrack(s).run(alpha, y, false);
            var env = EnvelopeComposition.of(t.model());
            System.out.printf("step scale %s: steps=%d Ys=%.5f rcz=%.5f lnR=%+.5f lnL=%+.5f%n", f,
                    t.evolution().steps().size(), env.y(), t.model().convection().envelopeBaseRadiusFraction(),
                    t.radiusResidual(), t.luminosityResidual());
        }
    }

    @Test
    void base() {
        double alpha = Double.parseDouble(System.getProperty("probe.alpha", "1.759363"));
        double y = Double.parseDouble(System.getProperty("probe.y", "0.2737973"));
        double zx = Double.parseDouble(System.getProperty("probe.zx", "0.02699989"));
        boolean settling = Boolean.parseBoolean(System.getProperty("probe.settling", "true"));
        CalibrationSettings s = CalibrationSettings.DEFAULT.withMetalsToHydrogen(zx).withSettling(settling);
        SolarTrial t = new SolarTrack(s).run(alpha, y, false);
        StellarModel m = t.model();
        StellarProfile p = m.profile();
        double rTot = p.radius(p.size() - 1);
        double mTot = p.mass(p.size() - 1);
        double rcz = m.convection().envelopeBaseRadiusFraction();
        System.out.printf("alpha=%.4f Y0=%.4f Z/X0=%.5f settling=%b lnR=%+.5f lnL=%+.5f rcz=%.5f mcz=%.5f points=%d%n",
                alpha, y, zx, settling, t.radiusResidual(), t.luminosityResidual(), rcz,
                m.convection().envelopeBaseMassFraction(), p.size());
        System.out.println("   k   r/R      m/M       T          rho        P          logR    kappa    nab_ad  nab_rad"
                + "  nabla   X       Y       Z       L/Ls");
        for (int k = 0; k < p.size(); k++) {
            double r = p.radius(k) / rTot;
            if (r < 0.60 || r > 0.80) {
                continue;
            }
            Composition c = m.state().composition(k);
            double logR = Math.log10(p.density(k)) - 3 * Math.log10(p.temperature(k) / 1e6);
            System.out.printf("%4d %.5f %.6f %.4e %.4e %.4e %7.3f %8.3f %.5f %.5f %.5f %.5f %.5f %.5f %.4f%n", k, r,
                    p.mass(k) / mTot, p.temperature(k), p.density(k), p.pressure(k), logR, p.opacity(k),
                    p.nablaAd(k), p.nablaRad(k), p.nabla(k), c.x(), c.y(), c.z(), p.luminosity(k) / 3.828e33);
        }
        // opacity at the point nearest the base, for several compositions
        int kb = 0;
        for (int k = 0; k < p.size(); k++) {
            if (Math.abs(p.radius(k) / rTot - rcz) < Math.abs(p.radius(kb) / rTot - rcz)) {
                kb = k;
            }
        }
        double rho = p.density(kb);
        double temp = p.temperature(kb);
        Composition local = m.state().composition(kb);
        Opacity op = StandardPhysics.opacity(1.0);
        System.out.printf("at k=%d T=%.4e rho=%.4e: kappa local(X=%.4f Z=%.5f)=%.3f%n", kb, temp, rho, local.x(),
                local.z(), op.rosselandMean(rho, temp, local).kappa());
        double[] xs = {0.70, 0.72, 0.7227, 0.74, 0.75, 0.80};
        double[] zs = {0.01, 0.015, 0.017, 0.018, 0.019, 0.02, 0.03};
        StringBuilder h = new StringBuilder("  X\\Z  ");
        for (double z : zs) {
            h.append(String.format(" %7.3f", z));
        }
        System.out.println(h);
        for (double x : xs) {
            StringBuilder row = new StringBuilder(String.format("%6.4f ", x));
            for (double z : zs) {
                row.append(String.format(" %7.3f", Math.log10(op.rosselandMean(rho, temp,
                        Composition.scaledSolar(x, z)).kappa())));
            }
            System.out.println(row);
        }
        EosState e = StandardPhysics.equationOfState().atDensity(rho, temp, local);
        System.out.printf("EOS at base: nabla_ad=%.5f gamma1=%.5f P=%.4e%n", e.nablaAd(), e.gamma1(), e.pressure());
    }
}
