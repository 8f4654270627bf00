package org.convgrid.engine.birth;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.convgrid.engine.physics.StandardPhysics;
import org.convgrid.engine.physics.eos.EosState;
import org.convgrid.engine.physics.eos.EquationOfState;
import org.convgrid.engine.physics.opacity.Opacity;
import org.convgrid.engine.state.Composition;
import org.convgrid.engine.structure.LaneEmden;
import org.convgrid.engine.units.Constants;
import org.junit.jupiter.api.Test;

/**
 * The centre of a contracting, fully convective star at the moment a published model set grows its radiative core,
 * judged with this engine's equation of state and opacity alone (no evolution): whether our centre physics puts the
 * onset where theirs does, independently of the surface (which sets how fast a star gets there).
 *
 * <p>A fully convective star has uniform entropy, so eps_grav = -T ds/dt is proportional to T and its central
 * value is (L/M) / &lt;T/T_c&gt;_m; for an n = 1.5 polytrope &lt;theta&gt;_m = 0.5306 (computed here from the
 * Lane-Emden table), so eps_c = 1.885 L/M (our own 0.3 Msun track, still fully convective at 30 Myr, has
 * eps_grav,c = 1.84 L/M, equal to T_c (L - L_nuc)/integral(T dm) to 0.03 %: {@code CentralConvectionProbe}).
 * Burning is negligible at these onsets (our eps_nuc/eps_c is below 2e-4 there). The centre is convective while
 * nabla_rad = 3 kappa P eps_c / (16 pi a c G T^4) exceeds nabla_ad.
 *
 * <p>The published states are rows of the Baraffe et al. 2015 tracks (A&amp;A 577, A42; the "tracks+structure"
 * table: log t, log L/Lsun with their Lsun = 3.839e33 erg/s, log T_c, log rho_c, and the radiative-core mass Mrad):
 * the last row with Mrad = 0 and the first with Mrad &gt; 0.
 */
class RadiativeCoreOnsetCentreTest {

    private static final double POLYTROPIC_INDEX = 1.5;
    /** The solar luminosity of the published tables, erg/s. */
    private static final double THEIR_L_SUN = 3.839e33;
    private static final double RADIATIVE_CONSTANT = 3.0 / (16.0 * Math.PI * Constants.A_RAD * Constants.C
            * Constants.G);

    private static final EquationOfState EOS = StandardPhysics.equationOfState();
    private static final Opacity OPACITY = StandardPhysics.opacity(1.0);

    /** One published row: mass (Msun), log L/Lsun, log T_c (K), log rho_c (g/cm^3). */
    private record Row(double mass, double logL, double logTc, double logRhoC) {
    }

    // Baraffe et al. 2015, tracks+structure table, 1.0 Msun: log t 6.200908 (Mrad 0) and 6.215294 (Mrad 0.0005)
    private static final Row SUN_LAST_CONVECTIVE = new Row(1.0, 0.144, 6.572, -0.0234);
    private static final Row SUN_FIRST_CORE = new Row(1.0, 0.134, 6.577, -0.0092);
    // the same table, 0.7 Msun: log t 6.579180 (Mrad 0) and 6.589996 (Mrad 0.0006)
    private static final Row K_DWARF_LAST_CONVECTIVE = new Row(0.7, -0.382, 6.600, 0.3673);
    private static final Row K_DWARF_FIRST_CORE = new Row(0.7, -0.390, 6.603, 0.3774);

    /** nabla_rad / nabla_ad at the centre of a fully convective star in the state of {@code row}. */
    private static double centralRatio(Row row, double x, double z) {
        double t = Math.pow(10.0, row.logTc());
        double rho = Math.pow(10.0, row.logRhoC());
        Composition c = Composition.scaledSolar(x, z);
        EosState s = EOS.atDensity(rho, t, c);
        double kappa = OPACITY.rosselandMean(rho, t, c).kappa();
        double lPerM = Math.pow(10.0, row.logL()) * THEIR_L_SUN / (row.mass() * Constants.M_SUN);
        double epsC = lPerM / massMeanTheta();
        double nablaRad = RADIATIVE_CONSTANT * kappa * s.pressure() * epsC / (t * t * t * t);
        return nablaRad / s.nablaAd();
    }

    /** &lt;theta&gt;_m of the n = 1.5 polytrope: integral(theta dm) / M, dm proportional to xi^2 theta^n dxi. */
    private static double massMeanTheta() {
        LaneEmden le = LaneEmden.solve(POLYTROPIC_INDEX);
        double mass = 0.0;
        double weighted = 0.0;
        for (int i = 0; i < le.size() - 1; i++) {
            double dxi = le.xi(i + 1) - le.xi(i);
            double a = le.xi(i) * le.xi(i) * Math.pow(le.theta(i), POLYTROPIC_INDEX);
            double b = le.xi(i + 1) * le.xi(i + 1) * Math.pow(le.theta(i + 1), POLYTROPIC_INDEX);
            mass += 0.5 * (a + b) * dxi;
            weighted += 0.5 * (a * le.theta(i) + b * le.theta(i + 1)) * dxi;
        }
        return weighted / mass;
    }

    @Test
    void polytropicCentralEnergyFactor() {
        // n = 1.5: <theta>_m = 0.5306 (computed independently by fourth-order Runge-Kutta at step 1e-5 in xi; the
        // table's last point lies just inside the zero, which the mass weight theta^1.5 makes negligible)
        assertThat(massMeanTheta()).isCloseTo(0.5306, within(0.002));
    }

    @Test
    void atSolarMetallicityOurCentreTurnsRadiativeWhereThePublishedModelsDo() {
        // with our grids' Z = 0.02 (X = 0.7015), the published last fully convective rows are convective and the
        // first rows with a core are at the threshold: measured 1.050 / 0.999 (1 Msun) and 1.021 / 0.991
        // (0.7 Msun); the tolerance of 3 % is about the change of the ratio over one step of the published table
        double x = 0.7015;
        double z = 0.02;
        assertThat(centralRatio(SUN_LAST_CONVECTIVE, x, z)).isBetween(1.0, 1.08);
        assertThat(centralRatio(SUN_FIRST_CORE, x, z)).isCloseTo(1.0, within(0.03));
        assertThat(centralRatio(K_DWARF_LAST_CONVECTIVE, x, z)).isBetween(1.0, 1.08);
        assertThat(centralRatio(K_DWARF_FIRST_CORE, x, z)).isCloseTo(1.0, within(0.03));
    }

    @Test
    void theCentralOpacityMakesTheOnsetSteeplyMetallicityDependent() {
        // MEASURED SENSITIVITY, not a validation: at these centres (log T 6.57-6.60, log R -1.7 to -1.4) the OPAL
        // opacity grows as ~Z^0.8 (metal bound-free absorption), so at Z = 0.015, nearer the published models'
        // own metallicity (~0.015, from memory), our microphysics puts the same published onset states 20-21 %
        // below the threshold (measured 0.795 and 0.794): taken at face value, our centres are that much more
        // radiative than theirs at equal composition, the size of the 16 % our 0.3 Msun centre falls short by
        // (LowMassBirthTest); at Z = 0.02 there is no such offset (the test above)
        // (X = 0.7137: their helium Y = 0.271, from memory). The 0.77-0.82 band is frozen from our own run
        // (2026-12-02, commit 88b76e4), not a published value.
        double x = 0.7137;
        double z = 0.015;
        assertThat(centralRatio(SUN_FIRST_CORE, x, z)).isBetween(0.77, 0.82);
        assertThat(centralRatio(K_DWARF_FIRST_CORE, x, z)).isBetween(0.77, 0.82);
    }
}
