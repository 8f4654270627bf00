package org.convgrid.engine.physics.atmosphere;

import org.convgrid.engine.error.ConvgridException;
import org.convgrid.engine.error.ErrorKind;
import org.convgrid.engine.physics.eos.EosState;
import org.convgrid.engine.physics.eos.EquationOfState;
import org.convgrid.engine.state.Composition;
import org.convgrid.engine.units.Constants;

/**
 * Test double: ideal gas of fixed mean molecular weight plus radiation, closed forms
 * (Chandrasekhar 1939; KWW 2012 ch. 13).
 */
record TestIdealGasEos(double mu) implements EquationOfState {

    @Override
    public EosState atDensity(double density, double temperature, Composition composition) {
        double pGas = density * Constants.K_B * temperature / (mu * Constants.M_U);
        return state(density, temperature, pGas);
    }

    @Override
    public EosState atPressure(double pressure, double temperature, Composition composition) {
        double pGas = pressure - Constants.A_RAD * Math.pow(temperature, 4) / 3.0;
        if (!(pGas > 0.0)) {
            throw new ConvgridException(ErrorKind.OUT_OF_RANGE, "radiation pressure exceeds total pressure",
                    "pressure", pressure, 0.0, Double.POSITIVE_INFINITY);
        }
        return state(pGas * mu * Constants.M_U / (Constants.K_B * temperature), temperature, pGas);
    }

    private EosState state(double rho, double t, double pGas) {
        double pRad = Constants.A_RAD * Math.pow(t, 4) / 3.0;
        double p = pGas + pRad;
        double beta = pGas / p;
        double chiRho = beta;
        double chiT = 4.0 - 3.0 * beta;
        double cv = Constants.K_B / (mu * Constants.M_U) * 1.5 * (8.0 - 7.0 * beta) / beta;
        double cp = cv + p / (rho * t) * chiT * chiT / chiRho;
        double gamma1 = chiRho * cp / cv;
        double nablaAd = p * chiT / (rho * t * cp * chiRho);
        return new EosState(rho, t, p, 1.5 * pGas / rho + 3.0 * pRad / rho, chiRho, chiT, cp, cv, gamma1, nablaAd,
                chiT / chiRho, mu, 0.0, -10.0, beta);
    }
}
