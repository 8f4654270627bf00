package org.convgrid.engine.structure;

import org.convgrid.engine.convection.ConvectiveGradient;
import org.convgrid.engine.convection.ConvectiveTransport;
import org.convgrid.engine.convection.LocalConvectionState;
import org.convgrid.engine.convection.StabilityCriterion;
import org.convgrid.engine.error.ConvgridException;
import org.convgrid.engine.error.ErrorKind;
import org.convgrid.engine.physics.PhysicsSet;
import org.convgrid.engine.physics.atmosphere.SurfaceBoundary;
import org.convgrid.engine.physics.atmosphere.SurfaceCondition;
import org.convgrid.engine.physics.eos.EosState;
import org.convgrid.engine.physics.eos.EquationOfState;
import org.convgrid.engine.physics.nuclear.BurningRate;
import org.convgrid.engine.physics.nuclear.NuclearNetwork;
import org.convgrid.engine.physics.opacity.Opacity;
import org.convgrid.engine.physics.opacity.OpacityValue;
import org.convgrid.engine.state.Composition;
import org.convgrid.engine.units.Constants;

/**
 * Simple textbook physics for testing the solver on its own (the real microphysics lives in physics.*):
 * fully ionised ideal gas + radiation, a composite Kramers/H-minus/electron-scattering opacity, power-law pp and
 * CNO rates, Bohm-Vitense mixing length in the KWW form and a one-step grey photosphere.
 */
public final class StandInPhysics {

    private StandInPhysics() {
    }

    /** The stand-in bundle with mixing length {@code alpha}. */
    public static PhysicsSet create(double alpha) {
        IdealGas eos = new IdealGas();
        CompositeOpacity opacity = new CompositeOpacity();
        return new PhysicsSet(eos, opacity, new PowerLawBurning(), new KwwMixingLength(alpha),
                StabilityCriterion.SCHWARZSCHILD, new Photosphere(eos, opacity), 0.0);
    }

    /** Ideal gas + radiation, full ionisation, closed forms (Chandrasekhar 1939; KWW ch. 13; derived). */
    public static final class IdealGas implements EquationOfState {
        @Override
        public EosState atDensity(double rho, double t, Composition c) {
            double mu = 4.0 / (3.0 + 5.0 * c.x() - c.z());
            double rk = Constants.K_B / (mu * Constants.M_U);
            double pGas = rho * rk * t;
            double pRad = Constants.A_RAD * t * t * t * t / 3.0;
            double p = pGas + pRad;
            double beta = pGas / p;
            double chiRho = beta;
            double chiT = 4.0 - 3.0 * beta;
            double cv = rk * 1.5 * (8.0 - 7.0 * beta) / beta;
            double cp = cv + p / (rho * t) * chiT * chiT / chiRho;
            double u = 1.5 * pGas / rho + 3.0 * pRad / rho;
            return new EosState(rho, t, p, u, chiRho, chiT, cp, cv, chiRho * cp / cv,
                    p * chiT / (rho * t * cp * chiRho), chiT / chiRho, mu, (1.0 + c.x()) / 2.0, -10.0, beta);
        }

        @Override
        public EosState atPressure(double p, double t, Composition c) {
            double mu = 4.0 / (3.0 + 5.0 * c.x() - c.z());
            double pGas = p - Constants.A_RAD * t * t * t * t / 3.0;
            if (!(pGas > 0.0)) {
                throw new ConvgridException(ErrorKind.OUT_OF_RANGE, "radiation pressure exceeds P", "P", p, 0, 0);
            }
            return atDensity(pGas * mu * Constants.M_U / (Constants.K_B * t), t, c);
        }
    }

    /**
     * kappa = 0.1 Z + [1/kappa_H- + 1/(kappa_es + kappa_K)]^-1 with kappa_H- = 1.1e-25 Z^0.5 rho^0.5 T^7.7,
     * kappa_K = 4e25 (1+X)(Z+0.001) rho T^-3.5, kappa_es = 0.2 (1+X) (composite fit, from
     * memory; recalled as Lamers &amp; Levesque 2017, Understanding Stellar Evolution, opacity chapter, unverified).
     */
    public static final class CompositeOpacity implements Opacity {
        @Override
        public OpacityValue rosselandMean(double rho, double t, Composition c) {
            double z = Math.max(c.z(), 1e-6);
            double hm = 1.1e-25 * Math.sqrt(z * rho) * Math.pow(t, 7.7);
            double kr = 4e25 * (1 + c.x()) * (z + 0.001) * rho * Math.pow(t, -3.5);
            double b = 0.2 * (1 + c.x()) + kr;
            double comb = hm * b / (hm + b);
            double kappa = 0.1 * z + comb;
            double w = 1.0 / ((hm + b) * (hm + b));
            double dRho = (b * b * 0.5 * hm + hm * hm * kr) * w;
            double dT = (b * b * 7.7 * hm - hm * hm * 3.5 * kr) * w;
            return new OpacityValue(kappa, dRho / kappa, dT / kappa);
        }
    }

    /**
     * eps_pp = 2.41e6 rho X^2 T6^(-2/3) exp(-33.80 T6^(-1/3)), eps_CNO = 8.67e27 rho X X_CNO T6^(-2/3)
     * exp(-152.28 T6^(-1/3)) erg/g/s (Carroll &amp; Ostlie 2007, eqs. 10.46, 10.58, converted from SI; from memory).
     */
    public static final class PowerLawBurning implements NuclearNetwork {
        @Override
        public BurningRate burn(double rho, double t, Composition c) {
            double t6 = t / 1e6;
            double third = Math.cbrt(1.0 / t6);
            double pp = 2.41e6 * rho * c.x() * c.x() * third * third * Math.exp(-33.80 * third);
            double cno = 8.67e27 * rho * c.x() * c.cno() * third * third * Math.exp(-152.28 * third);
            double eps = pp + cno;
            double nuPp = -2.0 / 3.0 + 33.80 * third / 3.0;
            double nuCno = -2.0 / 3.0 + 152.28 * third / 3.0;
            double nu = eps > 0 ? (pp * nuPp + cno * nuCno) / eps : nuPp;
            double dh = -eps * 4.0 * Constants.M_U / (26.73 * Constants.MEV);
            return new BurningRate(eps, pp, cno, 1.0, nu, dh, 0, -dh, 0, 0, 0);
        }

        @Override
        public Composition equilibrium(double rho, double t, Composition c) {
            return c;
        }
    }

    /** Mixing length, KWW formulation (Bohm-Vitense 1958; KWW 2012 ch. 7; cubic for xi derived). */
    public record KwwMixingLength(double alpha) implements ConvectiveTransport {
        @Override
        public ConvectiveGradient gradient(LocalConvectionState s) {
            double hp = s.pressure() / (s.density() * s.gravity());
            double l = alpha * hp;
            double w = s.nablaRad() - s.nablaAd();
            if (!(s.nablaRad() > s.nablaStability())) {
                return new ConvectiveGradient(s.nablaRad(), s.nablaRad(), 0.0, l, false);
            }
            double t3 = s.temperature() * s.temperature() * s.temperature();
            double u = 3 * Constants.A_RAD * Constants.C * t3 / (s.cp() * s.density() * s.density() * s.opacity() * l * l)
                    * Math.sqrt(8 * hp / (s.gravity() * s.delta()));
            double lo = u;
            double hi = Math.sqrt(u * u + w);
            double x = hi;
            for (int i = 0; i < 100; i++) {
                double f = (x - u) * (x - u) * (x - u) + 8 * u / 9 * (x * x - u * u - w);
                double df = 3 * (x - u) * (x - u) + 16 * u / 9 * x;
                if (f > 0) {
                    hi = x;
                } else {
                    lo = x;
                }
                double next = x - f / df;
                if (!(next > lo && next < hi)) {
                    next = 0.5 * (lo + hi);
                }
                if (Math.abs(next - x) <= 1e-14 * x) {
                    x = next;
                    break;
                }
                x = next;
            }
            double nabla = s.nablaAd() + x * x - u * u;
            double v = Math.sqrt(s.gravity() * s.delta() / (8 * hp)) * l * (x - u);
            return new ConvectiveGradient(nabla, s.nablaAd() + 2 * u * (x - u), v, l, true);
        }
    }

    /**
     * T = Teff and P = (2/3)(g/kappa) + (2/3) sigma Teff^4/c at tau = 2/3 (one-step Eddington photosphere,
     * derived), kappa iterated with the pressure; derivatives by central differences.
     */
    public record Photosphere(EquationOfState eos, Opacity opacity) implements SurfaceBoundary {
        @Override
        public SurfaceCondition at(double teff, double g, Composition c) {
            double h = 1e-5;
            double p0 = lnP(teff, g, c);
            double pT = (lnP(teff * Math.exp(h), g, c) - lnP(teff * Math.exp(-h), g, c)) / (2 * h);
            double pG = (lnP(teff, g * Math.exp(h), c) - lnP(teff, g * Math.exp(-h), c)) / (2 * h);
            return new SurfaceCondition(p0, Math.log(teff), pT, pG, 1.0, 0.0);
        }

        private double lnP(double teff, double g, Composition c) {
            double prad = 2.0 / 3.0 * Constants.SIGMA_SB * Math.pow(teff, 4) / Constants.C;
            double lnP = Math.log(2.0 / 3.0 * g / 0.1 + prad);
            for (int i = 0; i < 200; i++) {
                double rho = eos.atPressure(Math.exp(lnP), teff, c).density();
                double kappa = opacity.rosselandMean(rho, teff, c).kappa();
                double next = Math.log(2.0 / 3.0 * g / kappa + prad);
                if (Math.abs(next - lnP) < 1e-13) {
                    return next;
                }
                lnP = 0.5 * (lnP + next);
            }
            throw new ConvgridException(ErrorKind.NOT_CONVERGED, "photospheric pressure did not converge", teff, g);
        }
    }
}
