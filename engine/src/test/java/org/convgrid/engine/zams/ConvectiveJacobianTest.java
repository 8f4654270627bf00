package org.convgrid.engine.zams;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.convgrid.engine.physics.PhysicsSet;
import org.convgrid.engine.structure.DifferenceJacobian;
import org.convgrid.engine.structure.ExtraEnergy;
import org.convgrid.engine.structure.ModelState;
import org.convgrid.engine.structure.StellarModel;
import org.convgrid.engine.structure.StructureEquations;
import org.junit.jupiter.api.Test;

/**
 * The structure Jacobian at the convective points of zero-age models (the 1 Msun convective envelope, the
 * 1.5 Msun convective core), where the transport rows come from the chain rule through the mixing-length slopes,
 * against central differences of the residuals through the real microphysics (common practice for checking a
 * Newton Jacobian). The one-sided differences of nabla_ad, c_P and delta inside the analytic entries, and the
 * differences themselves, leave between 1e-7 and 1e-6 of a row's largest entry (measured); 1e-5 is asked.
 */
class ConvectiveJacobianTest {

    /** Step of the central differences in ln r, ln rho, ln T (relative for L). */
    private static final double H = 1.0e-5;
    private static final double TOLERANCE = 1.0e-5;

    @Test
    void convectiveEnvelopeOfTheSun() {
        assertThat(checkedConvectivePoints(1.0)).isGreaterThan(10);
    }

    @Test
    void convectiveCoreOfA1point5SolarMassStar() {
        assertThat(checkedConvectivePoints(1.5)).isGreaterThan(10);
    }

    /** Checks every Jacobian entry of the columns of convective points; returns how many points it checked. */
    private static int checkedConvectivePoints(double massInSun) {
        PhysicsSet physics = ZamsFixtures.physics(ZamsFixtures.PROTOSOLAR);
        StellarModel model = ZamsFixtures.model(ZamsFixtures.PROTOSOLAR, massInSun).model();
        ModelState state = model.state();
        int n = state.size();
        StructureEquations eq = new StructureEquations(state.mesh(), state.compositions(), physics,
                state.surfaceLuminosity(), null, ExtraEnergy.NONE);
        double[] y = eq.unknowns(state);
        DifferenceJacobian check = DifferenceJacobian.at(eq, y);
        int checked = 0;
        for (int k = 1; k < n - 1; k += 3) {
            // well inside a zone (both neighbours convective), so the differences do not cross its edge
            if (!(model.profile().convective(k - 1) && model.profile().convective(k)
                    && model.profile().convective(k + 1))) {
                continue;
            }
            checked++;
            for (int j = 0; j < 4; j++) {
                int col = eq.column(k, j);
                double h = j == 3 ? H * Math.max(Math.abs(y[col]), 1.0e-3) : H;
                double[] fd = check.column(col, h);
                for (int row = check.firstRow(col); row <= check.lastRow(col); row++) {
                    assertThat(check.analytic().get(row, col))
                            .as("%s Msun: row %d, point %d, unknown %d", massInSun, row, k, j)
                            .isCloseTo(fd[row], within(TOLERANCE * check.rowScale(row)));
                }
            }
        }
        return checked;
    }
}
