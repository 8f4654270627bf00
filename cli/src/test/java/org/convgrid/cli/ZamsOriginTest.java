package org.convgrid.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Path;
import java.util.List;
import org.convgrid.output.catalogue.CatalogueColumns;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * {@code origin: zams} keeps the meaning ages had before they counted from birth: the rows below were written by the
 * version before this change (commit b13c164) for the same grid without the {@code origin} key, and must come out
 * again byte for byte (production solver, default time steps). The evolved rows (0.06 Gyr) were re-frozen when
 * eps_grav took its conservative form (-du/dt - P dv/dt, time-centred work), which moved them by ~1e-4 (0.3 Msun:
 * L 0.0119434 -> 0.01194178, Newton iterations 104 -> 120; 1 Msun: L 0.7363761 -> 0.736298); the zero-age rows
 * are unchanged.
 */
class ZamsOriginTest {

    private static final String GRID = """
            title: Zero-age origin check
            mass: {values: [0.3, 1.0]}
            metallicity: {z: [0.02], y: [0.28]}
            age: {gyr: [0, 0.06], origin: zams}
            output: {dir: runs/zams}
            """;

    /**
     * Non-regression rows, frozen from the version before ages could count from birth; re-frozen on purpose when the
     * equation of state gave hydrogen's bound state its Planck-Larkin weight (1 Msun at zero age: L 0.7337 -> 0.7351
     * Lsun, envelope base r/R 0.7239 -> 0.7225; 0.3 Msun L 0.012507 -> 0.012510 Lsun) and when eps_grav took its
     * conservative form (the 0.06 Gyr rows move by ~1e-4: 1 Msun L 0.73778 -> 0.73770; 0.3 Msun Newton iterations
     * 104 -> 120). Re-frozen when a grid line's first model came to start from the line's shared zero-age ladder
     * instead of a cold start: the same equations, another mesh history, so the rows move by the discretisation only,
     * <= 1.5e-4 relative (1 Msun at zero age: L 0.73511 -> 0.7350465 Lsun, T_c 1.351821e7 -> 1.352024e7 K, envelope
     * base r/R 0.7225335 -> 0.7226881; 0.3 Msun L 0.01251018 -> 0.01251048 Lsun), against the 3e-3 of a doubled mesh
     * (MeshConvergenceTest); Newton iterations change with the start (0.3 Msun at zero age 48 -> 4, as the 0.30 Msun
     * rung is a step away; 0.06 Gyr 120 -> 76 and 68 -> 56).
     * Re-frozen when the low-temperature tables of Ferguson et al. 2005 became the default opacity (zero age:
     * 0.3 Msun Teff 3545.6 -> 3302.6 K, L 0.012510 -> 0.009842 Lsun, R 0.2964 -> 0.3030 Rsun, Newton iterations 48
     * -> 249; 1 Msun Teff 5690.4 -> 5585.1 K, L 0.73511 -> 0.72884 Lsun, R 0.8822 -> 0.9118 Rsun, envelope base r/R
     * 0.7225 -> 0.7313, its Newton iterations 37 -> 0: not investigated, presumably the model is reused from a mass
     * walk that now reaches 0.3 Msun). Re-frozen for both at once when they were merged, with the global turnover
     * time integrated exactly for v_c^2 linear in r out to the zone's boundaries: the ladder's rows again (1 Msun L
     * 0.7288428 -> 0.7289041 Lsun, Newton iterations 0 -> 25, 0.3 Msun 249 -> 4) and turnover_time_global_days
     * 37.77 -> 38.71 and 38.17 -> 38.63 days (1 Msun; the two ages now 0.2 % apart, were 1 %), 546.17 -> 546.12
     * (0.3 Msun, fully convective: no boundary to cross). Re-frozen when the Henyey relaxation came to reuse its
     * factorised Jacobian near the solution (chord steps), to return a converged state without applying its last
     * correction (below the 1e-8 tolerance) and the evolution steps to start from the parabola through the last
     * three models: every printed value stays the same; the 0.3 Msun track to 0.06 Gyr takes Newton iterations
     * 72 -> 73 (the 1 Msun track 56, unchanged). Re-frozen when the opacity tables came to read a metal fraction
     * within 1e-6 in log10(Z + 1e-4) of a tabulated Z from that Z alone (TabulatedOpacity.METALS_NODE_TOLERANCE;
     * kappa moves by a few 1e-6 at most): last digits only, <= 4e-7 relative (0.3 Msun turnover_time_global_days
     * 546.1234 -> 546.1235 at zero age and 706.9609 -> 706.9611 at 0.06 Gyr, Teff 3301.178 -> 3301.179 K at
     * 0.06 Gyr; 1 Msun env_cz_mass_msun 0.02409053 -> 0.02409052 at 0.06 Gyr); Newton iterations unchanged.
     * Re-frozen when the Jacobian came to reuse the equation of state's differenced second derivatives at points
     * that moved little (EosCurvature; the previous model's carried into each step): every printed value stays the
     * same; the 0.3 Msun track to 0.06 Gyr takes Newton iterations 73 -> 75 (the 1 Msun track 56, unchanged).
     * Re-frozen when the zero-age seeds came to extrapolate ln L instead of L (HomologySeeder.extrapolatedLuminosity)
     * and the ladder's rung +1 to start from the anchor and rung -1: every printed value stays the same; Newton
     * iterations of the zero-age models 4 -> 3 (0.3 Msun; 75 -> 74 to 0.06 Gyr) and 25 -> 21 (1 Msun; 56 -> 52).
     * Re-frozen when the grey-atmosphere nodes came to be integrated at step-size tolerance 1e-7 instead of 1e-9
     * (node error <= 4.3e-6 in ln P, against the table's own 3e-4 to 1e-2), with each node's cross derivative from the
     * difference along Teff alone and the density inversion's first neutrality solve started from the carried
     * degeneracy: the surface moves within the table's interpolation error, the rows by <= 7e-6 relative (1 Msun at
     * zero age: R 0.9117275 -> 0.9117284 Rsun, Teff 5585.495 -> 5585.492 K, env_cz_mass_msun 0.02416264 ->
     * 0.02416247, turnover_time_global_days 38.70942 -> 38.70925; at 0.06 Gyr env_cz_mass_msun 0.02409052 ->
     * 0.02409035; 0.3 Msun L 0.009842163 -> 0.009842161 Lsun, turnover_time_global_days 546.1235 -> 546.1236 at zero
     * age, 706.9611 -> 706.9614 at 0.06 Gyr); Newton iterations unchanged (4, 75, 25, 56).
     * Re-frozen when the grey atmosphere came to integrate ln rho with forward EOS calls instead of ln P_gas with the
     * EOS inverted at each call (the same equations at the same tolerance: node values move within that tolerance's
     * error, a few 1e-6 in ln P): last digits of the 0.06 Gyr rows only, <= 4e-7 relative (0.3 Msun L 0.009505464 ->
     * 0.009505463 Lsun; 1 Msun env_cz_mass_msun 0.02409035 -> 0.02409036); zero-age rows and Newton iterations
     * (3, 74, 21, 52) unchanged. Re-frozen when a zero-age-origin track's first step came to be capped at a fixed
     * 1 Myr (MainSequenceEvolver.ZERO_AGE_FIRST_STEP_CAP) instead of 0.01 x the oldest requested age (0.6 Myr for
     * this grid), so that a star's model no longer depends on the other ages asked for: the 0.06 Gyr rows move by
     * the young track's time-step error, <= 5e-5 relative in L (0.3 Msun L 0.009505463 -> 0.009505906 Lsun, R
     * 0.2980587 -> 0.2980654 Rsun, turnover_time_global_days 706.9614 -> 707.094; 1 Msun L 0.7314741 -> 0.731483
     * Lsun), Newton iterations 74 -> 66 and 52 -> 49; zero-age rows unchanged. Re-frozen when a receding central
     * convective core came to pace the main-sequence steps (CoreRecession): the 0.3 Msun star's 3He-burning core,
     * split from the envelope on the way to 0.06 Gyr, recedes in more, shorter steps, and its 0.06 Gyr row moves by
     * that time-step error, <= 1.3e-4 relative (L 0.009505906 -> 0.009504736 Lsun, R 0.2980654 -> 0.2980479 Rsun,
     * turnover_time_global_days 707.094 -> 706.7439), Newton iterations 66 -> 83; the 1 Msun rows and the zero-age
     * rows unchanged. Frozen from our own runs (first at commit b13c164), last set 2026-12-05; our output, not
     * published values.
     */
    private static final List<String> ROWS_BEFORE = List.of(
            "p0-z00-m000-a00,0.3,0.02,0.28,1.8,0.0,0.0,main_sequence,ok,,0.009842161,"
                    + "0.3030321,3302.592,4.952212,7392598.0,89.96434,0.6971044,,fully_convective,,,0.0,0.0,0.3,"
                    + "179.0309,3,schwarzschild,1.0,546.1236",
            "p0-z00-m000-a01,0.3,0.02,0.28,1.8,0.0,0.06,main_sequence,ok,,0.009504736,"
                    + "0.2980479,3301.175,4.966617,7498201.0,94.22294,0.699315,,fully_convective,,,0.0,0.0,0.3,"
                    + "185.4354,83,schwarzschild,1.0,706.7439",
            "p0-z00-m001-a00,1.0,0.02,0.28,1.8,0.0,0.0,main_sequence,ok,,0.7289039,0.9117284,"
                    + "5585.492,4.518337,1.34996e+07,81.93622,0.6993801,,conv_envelope,,,0.9758375,0.7312464,"
                    + "0.02416247,25.66424,21,schwarzschild,1.0,38.70925",
            "p0-z00-m001-a01,1.0,0.02,0.28,1.8,0.0,0.06,main_sequence,ok,,0.731483,"
                    + "0.9128314,5587.047,4.517287,1.351787e+07,82.43261,0.6950225,,conv_envelope,,,0.97591,"
                    + "0.7312436,0.02408996,25.62692,49,schwarzschild,1.0,38.63357");

    @TempDir
    Path dir;

    @Test
    void zeroAgeOriginReproducesTheRowsOfBefore() throws Exception {
        Path grid = CliHarness.writeGrid(dir, "zams.yaml", GRID);
        CliHarness harness = CliHarness.real(dir);
        CliHarness.Execution e = harness.execute("run", "--no-refine", grid.toString(), "--out", "zams", "--quiet");
        assertThat(e.code()).as(e.err()).isZero();
        List<String> rows = CliHarness.tableLines(dir.resolve("zams/catalogue.ecsv"));
        // the catalogue has since gained core_mixed_mass_frac (empty: these stars have no core), overshoot_profile
        // and fe_h_dex (log10(0.02 / 0.70 / 0.0245) = 0.0668 against the default Sun), then the g-mode period scale
        // (buoyancy_period_pi0_s, period_spacing_l1_s: empty for the fully convective 0.3 Msun, GModePeriodColumnsTest
        // checks their values) and the p-mode scales (large_separation_uhz, surface_cz_base_acoustic_depth_s,
        // AcousticColumnsTest), cut off here
        int pi0 = CatalogueColumns.HEADER.indexOf(CatalogueColumns.BUOYANCY_PERIOD_PI0_S);
        List<String> data = rows.subList(1, rows.size());
        assertThat(data.stream().map(row -> String.join(",", List.of(row.split(",", -1)).subList(0, pi0))))
                .containsExactlyElementsOf(ROWS_BEFORE.stream().map(row -> row + ",,uniform,0.0668").toList());
        assertThat(data).filteredOn(row -> row.contains(",fully_convective,")).hasSize(2)
                .allSatisfy(row -> assertThat(List.of(row.split(",", -1)).subList(pi0, pi0 + 2))
                        .containsExactly("", ""));
        assertThat(dir.resolve("zams/life_events.csv")).doesNotExist();
    }
}
