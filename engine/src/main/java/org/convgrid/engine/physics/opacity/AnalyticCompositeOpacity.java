package org.convgrid.engine.physics.opacity;

import java.util.Objects;
import org.convgrid.engine.error.ConvgridException;
import org.convgrid.engine.state.Composition;

/**
 * Rosseland-mean opacity from analytic terms, combined heuristically (the Rosseland mean of a sum is not the sum
 * of the means; Kippenhahn, Weigert &amp; Weiss 2012, opacity chapter):
 * <pre>
 *   kappa_abs  = (kappa_ff + kappa_bf + kappa_env) / (1 + d rho/T^2)
 *   kappa_rad  = kappa_mol + [1/kappa_H- + 1/(kappa_es + kappa_abs)]^-1
 *   1/kappa    = 1/kappa_rad + 1/kappa_cond
 * </pre>
 * The steep H^- term is capped by the interior terms through the harmonic bracket; the molecular term adds
 * below ~4000 K; conduction short-circuits radiation in degenerate matter. kappa_env
 * ({@link EnvelopeAbsorption}) adds the H/He bound-free absorption and the metal "Z bump" between ~1e4 and ~1e6 K that the Kramers terms miss. Derivatives follow by the chain
 * rule: for a sum, dln S = sum (k_i/S) dln k_i; for a harmonic sum H, dln H = sum (H/k_i) dln k_i.
 *
 * <p>The factor {@code 1/(1 + d rho/T^2)} on the absorption is the Pauli blocking of the free-electron final
 * states, written in the form Buchler &amp; Yueh 1976 use for scattering (see {@link ElectronScattering}); its
 * coefficient d = 1.68e11 (cgs) was fitted together with the bound-free guillotine ({@link KramersBoundFree}) to
 * the OPAL tables (Iglesias &amp; Rogers 1996); at the solar centre it is a 10 % reduction.
 * Accuracy against OPAL (tests; {@code reference/opacity/opal-gn93-*.txt}): within ~0.1 dex over
 * 6.2 &lt;= log T &lt;= 7.5, -2 &lt;= log R &lt;= -0.5 (main-sequence interiors); too low by up to 0.3 dex at
 * log R ~ -3 near 1e6 K; 0.15 dex rms (0.43 worst) over 4.0 &lt;= log T &lt;= 6.0, -6 &lt;= log R &lt;= -1 with the
 * envelope term (0.54 rms, 1.04 worst without it), but 0.3-0.6 dex too high at log R &gt;= -0.5 there, where the
 * Kramers terms overshoot; ~0.15 dex rms in the photospheric H^- regime 5600-8000 K where the H^- law was fitted.
 */
public final class AnalyticCompositeOpacity implements LogArgumentsOpacity {

    private final Opacity scattering;
    private final Opacity freeFree;
    private final Opacity boundFree;
    private final Opacity hydrogenMinus;
    private final Opacity molecular;
    private final Opacity conduction;
    private final Opacity envelope;
    private final double absorptionDegeneracy;

    /** Fitted Pauli-blocking coefficient d of the absorption terms, K^2 cm^3 g^-1 (see class comment). */
    public static final double FITTED_ABSORPTION_DEGENERACY = 1.68e11;

    /** No conduction: the composite is then the radiative opacity alone (conduction is not added in parallel). */
    static final Opacity NO_CONDUCTION = (density, temperature, composition) -> new OpacityValue(
            Double.POSITIVE_INFINITY, 0.0, 0.0);

    /** No envelope term: kappa_env = 0. */
    static final Opacity NO_ENVELOPE = (density, temperature, composition) -> new OpacityValue(0.0, 0.0, 0.0);

    /** The six terms with no Pauli blocking of the absorption (d = 0) and no envelope term. */
    public AnalyticCompositeOpacity(Opacity scattering, Opacity freeFree, Opacity boundFree, Opacity hydrogenMinus,
                                    Opacity molecular, Opacity conduction) {
        this(scattering, freeFree, boundFree, hydrogenMinus, molecular, conduction, 0.0);
    }

    /** The six terms with Pauli blocking of the absorption and no envelope term. */
    public AnalyticCompositeOpacity(Opacity scattering, Opacity freeFree, Opacity boundFree, Opacity hydrogenMinus,
                                    Opacity molecular, Opacity conduction, double absorptionDegeneracy) {
        this(scattering, freeFree, boundFree, NO_ENVELOPE, hydrogenMinus, molecular, conduction, absorptionDegeneracy);
    }

    /**
     * @param envelope kappa_env, added to the absorption (e.g. {@link EnvelopeAbsorption})
     * @param absorptionDegeneracy d of the factor 1/(1 + d rho/T^2) on the absorption, K^2 cm^3 g^-1, &gt;= 0
     */
    public AnalyticCompositeOpacity(Opacity scattering, Opacity freeFree, Opacity boundFree, Opacity envelope,
                                    Opacity hydrogenMinus, Opacity molecular, Opacity conduction,
                                    double absorptionDegeneracy) {
        this.absorptionDegeneracy = ConvgridException.requireInRange("absorptionDegeneracy", absorptionDegeneracy,
                0.0, 1.0e14, "K^2 cm^3 g^-1");
        this.scattering = Objects.requireNonNull(scattering);
        this.freeFree = Objects.requireNonNull(freeFree);
        this.boundFree = Objects.requireNonNull(boundFree);
        this.hydrogenMinus = Objects.requireNonNull(hydrogenMinus);
        this.molecular = Objects.requireNonNull(molecular);
        this.conduction = Objects.requireNonNull(conduction);
        this.envelope = Objects.requireNonNull(envelope);
    }

    /**
     * The recommended set: Buchler-Yueh scattering, Kramers free-free and bound-free with the fitted guillotine and
     * Pauli blocking, the OPAL-fitted envelope term (H/He bound-free and Z bump), the OPAL-fitted H^- law, Bell-Lin
     * molecules, conduction.
     */
    public static AnalyticCompositeOpacity standard() {
        return new AnalyticCompositeOpacity(new ElectronScattering(), new KramersFreeFree(), new KramersBoundFree(),
                new EnvelopeAbsorption(), new HydrogenMinus(), new MolecularOpacity(), new ElectronConduction(), FITTED_ABSORPTION_DEGENERACY);
    }

    /** {@link #standard()} without conduction: its radiative part, which the tables' edges are joined to. */
    public static AnalyticCompositeOpacity standardRadiative() {
        return new AnalyticCompositeOpacity(new ElectronScattering(), new KramersFreeFree(), new KramersBoundFree(),
                new EnvelopeAbsorption(), new HydrogenMinus(), new MolecularOpacity(), NO_CONDUCTION,
                FITTED_ABSORPTION_DEGENERACY);
    }

    @Override
    public OpacityValue rosselandMean(double density, double temperature, Composition composition) {
        return rosselandMean(density, temperature, Math.log(density), Math.log(temperature), composition);
    }

    /** The composite with ln rho and ln T taken once for all its terms. */
    @Override
    public OpacityValue rosselandMean(double density, double temperature, double lnDensity, double lnTemperature,
                                      Composition composition) {
        OpacityValue es = LogArgumentsOpacity.evaluate(scattering, density, temperature, lnDensity, lnTemperature,
                composition);
        OpacityValue ff = freeFree.rosselandMean(density, temperature, composition);
        OpacityValue bf = LogArgumentsOpacity.evaluate(boundFree, density, temperature, lnDensity, lnTemperature,
                composition);
        OpacityValue env = LogArgumentsOpacity.evaluate(envelope, density, temperature, lnDensity, lnTemperature,
                composition);
        OpacityValue hm = LogArgumentsOpacity.evaluate(hydrogenMinus, density, temperature, lnDensity,
                lnTemperature, composition);
        OpacityValue mol = molecular.rosselandMean(density, temperature, composition);

        // absorption (ff + bf) times the Pauli-blocking factor 1/(1 + D), D = d rho/T^2
        double deg = absorptionDegeneracy * density / (temperature * temperature);
        double blocking = 1.0 / (1.0 + deg);
        double ffK = ff.kappa() * blocking;
        double bfK = bf.kappa() * blocking;
        double envK = env.kappa() * blocking;
        double blockRho = -deg * blocking;
        double blockT = 2.0 * deg * blocking;
        // interior sum A = es + ff + bf + env
        double a = es.kappa() + ffK + bfK + envK;
        double aRho = (es.kappa() * es.dlnKappaDlnRho() + ffK * (ff.dlnKappaDlnRho() + blockRho)
                + bfK * (bf.dlnKappaDlnRho() + blockRho) + envK * (env.dlnKappaDlnRho() + blockRho)) / a;
        double aT = (es.kappa() * es.dlnKappaDlnT() + ffK * (ff.dlnKappaDlnT() + blockT)
                + bfK * (bf.dlnKappaDlnT() + blockT) + envK * (env.dlnKappaDlnT() + blockT)) / a;
        // harmonic bracket B = (1/H + 1/A)^-1; weights B/H = A/(H+A), B/A = H/(H+A)
        double h = hm.kappa();
        double b = h * a / (h + a);
        double wh = a / (h + a);
        double bRho = wh * hm.dlnKappaDlnRho() + (1.0 - wh) * aRho;
        double bT = wh * hm.dlnKappaDlnT() + (1.0 - wh) * aT;
        // radiative: molecules add
        double rad = mol.kappa() + b;
        double radRho = (mol.kappa() * mol.dlnKappaDlnRho() + b * bRho) / rad;
        double radT = (mol.kappa() * mol.dlnKappaDlnT() + b * bT) / rad;
        if (conduction == NO_CONDUCTION) {
            return new OpacityValue(rad, radRho, radT);
        }
        // conduction in parallel
        OpacityValue cond = conduction.rosselandMean(density, temperature, composition);
        double c = cond.kappa();
        double total = rad * c / (rad + c);
        double wc = rad / (rad + c);
        return new OpacityValue(total, wc * cond.dlnKappaDlnRho() + (1.0 - wc) * radRho,
                wc * cond.dlnKappaDlnT() + (1.0 - wc) * radT);
    }
}
