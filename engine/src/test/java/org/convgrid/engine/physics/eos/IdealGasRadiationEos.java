package org.convgrid.engine.physics.eos;

import org.convgrid.engine.error.ConvgridException;
import org.convgrid.engine.error.ErrorKind;
import org.convgrid.engine.state.Composition;
import org.convgrid.engine.state.MetalMixture;
import org.convgrid.engine.units.Constants;

/**
 * Fully ionised ideal gas of ions and non-degenerate electrons plus black-body radiation, in closed form
 * (Chandrasekhar 1939; Kippenhahn, Weigert &amp; Weiss 2012, ch. 13): P = rho k T/(mu m_u) + a T^4/3,
 * u = (3/2) P_gas/rho + a T^4/rho, chi_rho = beta, chi_T = 4 - 3 beta,
 * c_V = (3/2) k/(mu m_u) + 4 a T^3/rho. The energy zero is the fully ionised plasma (no ionisation energy).
 * Meant for polytrope and solver tests and as a fast reference; it ignores degeneracy and ionisation.
 */
public final class IdealGasRadiationEos implements EquationOfState {

    private final Nuclides nuclides;

    /** Metals in the Grevesse &amp; Sauval 1998 mixture. */
    public IdealGasRadiationEos() {
        this(MetalMixture.GS98);
    }

    public IdealGasRadiationEos(MetalMixture mixture) {
        this.nuclides = new Nuclides(mixture);
    }

    @Override
    public EosState atDensity(double density, double temperature, Composition composition) {
        ConvgridException.requireInRange("density", density, Double.MIN_NORMAL, Double.MAX_VALUE, "g cm^-3");
        ConvgridException.requireInRange("temperature", temperature, Double.MIN_NORMAL, Double.MAX_VALUE, "K");
        double ye = nuclides.electronsFullyIonised(composition);
        double particles = nuclides.nuclei(composition) + ye;
        double rk = Constants.K_B / Constants.M_U;
        double gasPressure = density * rk * temperature * particles;
        double aT3 = Constants.A_RAD * temperature * temperature * temperature;
        double radiationPressure = aT3 * temperature / 3.0;
        double pressure = gasPressure + radiationPressure;
        double beta = gasPressure / pressure;
        double energy = 1.5 * gasPressure / density + aT3 * temperature / density;
        double cv = 1.5 * rk * particles + 4.0 * aT3 / density;
        return ThermoIdentities.complete(density, temperature, pressure, energy, beta, 4.0 - 3.0 * beta, cv,
                1.0 / particles, ye, boltzmannEta(density, temperature, ye), beta);
    }

    /** Rho from P = P_gas + a T^4/3 solved exactly; fails when radiation alone exceeds the pressure. */
    @Override
    public EosState atPressure(double pressure, double temperature, Composition composition) {
        ConvgridException.requireInRange("temperature", temperature, Double.MIN_NORMAL, Double.MAX_VALUE, "K");
        double radiationPressure = Constants.A_RAD * Math.pow(temperature, 4) / 3.0;
        double gasPressure = pressure - radiationPressure;
        if (!(gasPressure > 0.0)) {
            throw new ConvgridException(ErrorKind.OUT_OF_RANGE, String.format(
                    "pressure %s dyn cm^-2 does not exceed the radiation pressure %s dyn cm^-2 at T = %s K",
                    pressure, radiationPressure, temperature), "pressure", pressure, radiationPressure,
                    Double.MAX_VALUE);
        }
        double particles = nuclides.nuclei(composition) + nuclides.electronsFullyIonised(composition);
        double density = gasPressure * Constants.M_U / (Constants.K_B * temperature * particles);
        return atDensity(density, temperature, composition);
    }

    /** Non-degenerate limit of the electron chemical potential: n_e = 2 (2 pi m_e k T/h^2)^(3/2) e^eta. */
    static double boltzmannEta(double density, double temperature, double electronsPerBaryon) {
        double quantumDensity = 2.0 * Math.pow(2.0 * Math.PI * Constants.M_E * Constants.K_B * temperature
                / (Constants.H * Constants.H), 1.5);
        return Math.log(density * electronsPerBaryon / Constants.M_U / quantumDensity);
    }
}
