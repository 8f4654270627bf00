package org.convgrid.engine.physics.opacity;

import java.util.Objects;
import org.convgrid.engine.state.Composition;

/**
 * Rosseland-mean opacity from analytic terms, combined heuristically (the Rosseland mean of a sum is not the sum
 * of the means; Kippenhahn, Weigert &amp; Weiss 2012, opacity chapter):
 * <pre>
 *   kappa_abs  = kappa_ff + kappa_bf
 *   kappa_rad  = kappa_mol + [1/kappa_H- + 1/(kappa_es + kappa_abs)]^-1
 *   1/kappa    = 1/kappa_rad + 1/kappa_cond
 * </pre>
 * The steep H^- term is capped by the interior terms through the harmonic bracket; the molecular term adds
 * below ~4000 K; conduction short-circuits radiation in degenerate matter. Derivatives follow by the chain
 * rule: for a sum, dln S = sum (k_i/S) dln k_i; for a harmonic sum H, dln H = sum (H/k_i) dln k_i.
 * Accuracy against published tables: see {@code reference/opacity/solar-interior-opal.txt} and the tests
 * (factor-level below 1e5 K, where hydrogen/helium bound-free and metal lines are missing; ~10 % along the
 * solar radiative interior, to which the bound-free guillotine was fitted).
 */
public final class AnalyticCompositeOpacity implements Opacity {

    private final Opacity scattering;
    private final Opacity freeFree;
    private final Opacity boundFree;
    private final Opacity hydrogenMinus;
    private final Opacity molecular;
    private final Opacity conduction;

    public AnalyticCompositeOpacity(Opacity scattering, Opacity freeFree, Opacity boundFree, Opacity hydrogenMinus,
                                    Opacity molecular, Opacity conduction) {
        this.scattering = Objects.requireNonNull(scattering);
        this.freeFree = Objects.requireNonNull(freeFree);
        this.boundFree = Objects.requireNonNull(boundFree);
        this.hydrogenMinus = Objects.requireNonNull(hydrogenMinus);
        this.molecular = Objects.requireNonNull(molecular);
        this.conduction = Objects.requireNonNull(conduction);
    }

    /** The recommended set: Buchler-Yueh scattering, Kramers with the fitted guillotine, H^-, Bell-Lin, conduction. */
    public static AnalyticCompositeOpacity standard() {
        return new AnalyticCompositeOpacity(new ElectronScattering(), new KramersFreeFree(), new KramersBoundFree(),
                new HydrogenMinus(), new MolecularOpacity(), new ElectronConduction());
    }

    @Override
    public OpacityValue rosselandMean(double density, double temperature, Composition composition) {
        OpacityValue es = scattering.rosselandMean(density, temperature, composition);
        OpacityValue ff = freeFree.rosselandMean(density, temperature, composition);
        OpacityValue bf = boundFree.rosselandMean(density, temperature, composition);
        OpacityValue hm = hydrogenMinus.rosselandMean(density, temperature, composition);
        OpacityValue mol = molecular.rosselandMean(density, temperature, composition);
        OpacityValue cond = conduction.rosselandMean(density, temperature, composition);

        // interior sum A = es + ff + bf
        double a = es.kappa() + ff.kappa() + bf.kappa();
        double aRho = (es.kappa() * es.dlnKappaDlnRho() + ff.kappa() * ff.dlnKappaDlnRho()
                + bf.kappa() * bf.dlnKappaDlnRho()) / a;
        double aT = (es.kappa() * es.dlnKappaDlnT() + ff.kappa() * ff.dlnKappaDlnT()
                + bf.kappa() * bf.dlnKappaDlnT()) / a;
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
        // conduction in parallel
        double c = cond.kappa();
        double total = rad * c / (rad + c);
        double wc = rad / (rad + c);
        return new OpacityValue(total, wc * cond.dlnKappaDlnRho() + (1.0 - wc) * radRho,
                wc * cond.dlnKappaDlnT() + (1.0 - wc) * radT);
    }
}
