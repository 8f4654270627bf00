package org.convgrid.engine.physics.eos;

import org.convgrid.engine.units.Constants;

/**
 * Scratch space of one {@link StellarPlasmaEos} call: given (rho, T) and a trial degeneracy parameter eta, evaluates
 * the charge-neutrality residual and P, u in closed form, with their analytic partial derivatives in eta, ln rho
 * and ln T at fixed eta. Not thread-safe: each thread of a {@link StellarPlasmaEos} reuses its own (see {@link #use}).
 * Splitting {@link #prepare} (all exponentials that depend on rho and T) from {@link #solveStep} (one exponential per
 * trial eta) keeps the Newton iteration cheap; {@link #evaluate} adds P, u and the partials once eta is known.
 *
 * <p>Every ionisation stage is a ratio r = K x with x = e^(eta_ref - eta - mu_C/kT), so d ln r = d ln K + d ln x,
 * with d ln K/d ln T = chi/kT (from e^(-chi/kT)) and d ln K/d ln rho = the excluded-volume term xi of the stage
 * (xi is proportional to rho); a fraction f = r/(1+r) then moves by f(1-f) d ln r, and a three-stage helium by
 * h_j (d ln w_j - sum_i h_i d ln w_i).
 *
 * <p>Hydrogen below {@link MolecularHydrogen#MAX_TEMPERATURE} is split between H+, H and H2: with r = n_H+/n_H,
 * s = 1 + r and the pairing p = n_H,tot/K_H2, the atomic fraction f0 solves 2 p f0^2 + s f0 - 1 = 0, the ionised
 * fraction is f1 = r f0 and the molecular one fm = 2 p f0^2. Differentiating the quadratic, with D = s + 4 p f0:
 * d ln f0 = -(r d ln r + 2 p f0 d ln p)/D, so d ln f1 = ((1 + 4 p f0) d ln r - 2 p f0 d ln p)/D and
 * d ln fm = (s d ln p - 2 r d ln r)/D; d ln p = d ln rho - (d ln K_H2/d ln T) d ln T (no eta dependence).
 *
 * <p>Hydrogen's bound state enters with the Planck-Larkin renormalised weight 2 (e^x - 1 - x), x = chi/kT, instead of
 * 2 e^x (Planck 1924; Larkin 1960; the form the OPAL equation of state uses, Rogers 1986, ApJ 310, 723, from
 * memory): the same at kT &lt;&lt; chi, but ~x^2 when kT &gt;&gt; chi, where a bare ground-state weight would keep
 * ~n_e lambda_e^3 of the hydrogen neutral however hot the gas (1.3 % at the base of the solar convective envelope,
 * T = 2.2e6 K, rho = 0.19). Then K_H = e^(xi_H)/(2 (e^x - 1 - x)), ionising an atom takes E_H = kT d ln K_H/d ln T,
 * and an atom carries chi - E_H above the energy zero, so P, u and the Saha balance stay one free energy.
 */
final class PlasmaPoint {

    /** 4 pi (2 m_e k/h^2)^(3/2): n_e = this T^(3/2) F_{1/2}(eta) (standard statistical mechanics, derived). */
    static final double ELECTRON_DENSITY_CONSTANT = 4.0 * Math.PI
            * Math.pow(2.0 * Constants.M_E * Constants.K_B / (Constants.H * Constants.H), 1.5);
    /** Limits that keep every Saha ratio K e^-eta finite (only reached far outside stellar conditions). */
    static final double ETA_LIMIT = 500.0;
    /**
     * Saha constants are stored relative to a reference eta, K' = K e^-eta_ref, clipped to e^(+-350), and
     * multiplied by e^(eta_ref - eta) clipped likewise: no overflow, and the clipping only touches ratios beyond
     * e^(+-300), which are saturated, as long as eta stays within ~300 of eta_ref (the solver re-references).
     */
    static final double LN_CLIP = 350.0;
    private static final double CLIP_LOW = Math.exp(-LN_CLIP);
    private static final double CLIP_HIGH = Math.exp(LN_CLIP);
    private static final double LN_HALF = Math.log(0.5);
    /** Tangent steps that sharpen {@link #ionisationGuess} at most. */
    static final int GUESS_REFINEMENTS = 2;
    /**
     * Relative change of the guessed x below which {@link #ionisationGuess} stops sharpening: ~0.01 in eta, the
     * size of the errors it ignores (degeneracy, Coulomb shift) at the points where it matters.
     */
    static final double GUESS_TOLERANCE = 0.01;
    /** Ratios below which 1 + r == 1 and from which 1 + r == r in double arithmetic (see {@link #ionisedShare}). */
    private static final double TINY_RATIO = 0x1p-53;
    private static final double HUGE_RATIO = 0x1p54;
    private static final double LN_TWO = Math.log(2.0);

    private final PlasmaElements el;
    private final boolean pressureIonisation;
    private final boolean coulomb;
    private double[] abundance;
    private final double[] kFirst;
    private final double[] kInner;
    private final double[] xiNeutral;
    private final double[] xiInner;
    private final double[] fd = new double[7];
    private final CoulombTerm coulombTerm = new CoulombTerm();
    private double nuclei;
    private double yeMax;
    private double chargeRatio;

    double density;
    double lastEta;
    double temperature;
    /** Reference eta of the stored Saha constants. */
    double reference;
    /** Newton steps of the last neutrality solve (diagnostics). */
    int iterations;
    private double kT;
    /** T^(3/2) and n_e per F_{1/2}, ELECTRON_DENSITY_CONSTANT T^(3/2), of the prepared T: once per point. */
    private double t15;
    private double electronScale;
    /** The ratio x of the last {@link #solveStep}, which {@link #evaluate} completes (the same eta and shift). */
    private double stepRatio;
    private double kH;
    /**
     * Energy taken by ionising one hydrogen atom, erg: kT d ln K_H/d ln T, chi at low T, 2kT + chi/3 when kT &gt;&gt;
     * chi; and its derivative in ln T.
     */
    private double hydrogenEnergy;
    private double hydrogenEnergyT;
    private double kHe0;
    private double kHe1;
    private double xiH;
    private double xiHe0;
    private double xiHe1;
    private double heliumNeutral;
    private double dh0;
    private double dh1;
    private double dh2;
    /** n_H,tot/K_H2 (0 where molecules are ignored), d ln of it/d ln T, and a molecule's energy and its T-slope. */
    private double pairing;
    private double pairingT;
    private double moleculeEnergy;
    private double moleculeEnergyT;

    /** d ye/d ln x of the last {@link #ions}. */
    private double ionSpread;
    /** Outputs of {@link #solveStep}: residual ln n_e(FD) - ln n_e(ions), its eta-slope, ionisation fractions. */
    double residual;
    double residualSlope;
    double electrons;
    double hydrogenIonised;
    /** Fraction of the hydrogen nuclei bound in H2. */
    double hydrogenMolecular;
    double heliumSingle;
    double heliumDouble;
    /** Outputs of {@link #evaluate}: P (dyn cm^-2), u (erg g^-1) and partials at fixed eta. */
    double pressure;
    double energy;
    double residualRho;
    double residualT;
    double pressureEta;
    double pressureRho;
    double pressureT;
    double energyEta;
    double energyT;
    /** Radiation pressure a T^4/3, dyn cm^-2, set by {@link #evaluate}. */
    double radiationPressure;
    /** Free heavy particles (nuclei, atoms, ions and molecules) per atomic mass unit, set by {@link #evaluate}. */
    double heavyParticles;

    PlasmaPoint(PlasmaElements el, boolean pressureIonisation, boolean coulomb, PlasmaComposition composition) {
        this(el, pressureIonisation, coulomb);
        use(composition);
    }

    /** A scratch point with no composition yet: {@link #use} one before {@link #prepare}. */
    PlasmaPoint(PlasmaElements el, boolean pressureIonisation, boolean coulomb) {
        this.el = el;
        this.pressureIonisation = pressureIonisation;
        this.coulomb = coulomb;
        kFirst = new double[el.metalCount];
        kInner = new double[el.metalCount];
        xiNeutral = new double[el.metalCount];
        xiInner = new double[el.metalCount];
    }

    /**
     * Points this scratch at another composition's constants; every other field is overwritten by the next
     * {@link #prepare}, {@link #solveStep} and {@link #evaluate}, so a reused point gives the results of a fresh one.
     */
    PlasmaPoint use(PlasmaComposition composition) {
        abundance = composition.abundance;
        nuclei = composition.nuclei;
        yeMax = composition.yeMax;
        chargeRatio = composition.chargeRatio;
        return this;
    }

    double nuclei() {
        return nuclei;
    }

    double electronsFullyIonised() {
        return yeMax;
    }

    /** Computes every rho- and T-dependent Saha constant K (n_{r+1}/n_r = K e^-eta), relative to etaReference. */
    void prepare(double rho, double t, double etaReference) {
        reference = etaReference;
        density = rho;
        temperature = t;
        kT = Constants.K_B * t;
        t15 = t * Math.sqrt(t);
        electronScale = ELECTRON_DENSITY_CONSTANT * t15;
        if (coulomb) {
            coulombTerm.prepare(rho, kT, nuclei);
        }
        double nucleusDensity = pressureIonisation ? rho * nuclei / Constants.M_U : 0.0;
        xiH = el.hydrogenVolume * nucleusDensity;
        xiHe0 = el.heliumVolume0 * nucleusDensity;
        xiHe1 = el.heliumVolume1 * nucleusDensity;
        // Ground-state weights: U(HI) = 2, U(HII) = 1, U(HeI) = 1, U(HeII) = 2, U(HeIII) = 1 (from memory).
        // Hydrogen's bound state is weighted by its Planck-Larkin renormalised Boltzmann factor (class comment).
        double hx = el.hydrogenChi / kT;
        double hDecay = Math.exp(-hx);
        // hx >= 0.158 below MAX_TEMPERATURE, so 1 - e^-hx loses no digits
        double hOpen = 1.0 - hDecay;
        double hBound = hOpen - hx * hDecay;
        kH = expK(LN_HALF - hx - Math.log(hBound) + xiH);
        hydrogenEnergy = el.hydrogenChi * hOpen / hBound;
        hydrogenEnergyT = -el.hydrogenChi * hx * hDecay * (hBound - hx * hOpen) / (hBound * hBound);
        // H2: each molecule excludes twice the atom's volume, so the occupation factors cancel in K_H2. Skipped in
        // hot gas (the switch-off leaves no molecules there), which keeps the interior cost unchanged.
        pairing = 0.0;
        if (t < MolecularHydrogen.MAX_TEMPERATURE && abundance[0] > 0.0) {
            double vibration = MolecularHydrogen.vibrationalFactor(t);
            double share = MolecularHydrogen.vibrationalShare(t, vibration);
            pairing = MolecularHydrogen.pairing(rho * abundance[0] / Constants.M_U, t, vibration);
            pairingT = -MolecularHydrogen.lnSwitchedConstantSlope(t, share);
            moleculeEnergy = MolecularHydrogen.switchedInternalEnergy(t, share)
                    - MolecularHydrogen.DISSOCIATION_ENERGY_EV * Constants.EV;
            moleculeEnergyT = MolecularHydrogen.switchedInternalEnergySlope(t, share, vibration);
        }
        kHe0 = expK(LN_TWO - el.heliumChi0 / kT + xiHe0 - xiHe1);
        kHe1 = expK(LN_HALF - el.heliumChi1 / kT + xiHe1);
        for (int m = 0; m < el.metalCount; m++) {
            xiNeutral[m] = el.neutralVolume[m] * nucleusDensity;
            xiInner[m] = el.innerVolume[m] * nucleusDensity;
            kFirst[m] = expK(el.lnWeightRatio[m] - el.firstChi[m] / kT + xiNeutral[m]);
            kInner[m] = expK(-el.innerChi[m] / kT + xiInner[m]);
        }
    }

    /**
     * A starting eta for the neutrality solve at the prepared (rho, T) that accounts for incomplete ionisation:
     * with non-degenerate electrons, n_e m_u/rho = Q/x (x as in {@link #ratio}, Q = sqrt(pi)/2 n_Q m_u e^eta_ref/rho),
     * and the true root x* is at least each of the roots obtained by over-estimating the ions' electrons: all
     * species fully ionised (Q/x = ye_max); every stage in its weak-ionisation limit (ye <= S x, S the sum of
     * a K); hydrogen exact and everything else fully ionised (a quadratic). The largest of these lower bounds is
     * taken; it is exact for neutral gas ionised by metals and for pure hydrogen.
     *
     * <p>Where it lies above the fully ionised root by more than {@link #GUESS_TOLERANCE} (partial ionisation
     * by several donors, as in a K-dwarf photosphere at 5000 K, where Mg, Fe and Si give about 42, 27 and 18 % of
     * the electrons and the bound above is 1.6 off in eta), it is sharpened by up to {@link #GUESS_REFINEMENTS}
     * tangent steps: each stage's ionised fraction is concave in x, so the tangent of ye(x) at a lower bound x0,
     * ye(x0) + ye'(x0) (x - x0), over-estimates the ions' electrons and its crossing with Q/x (a quadratic) is
     * again a lower bound, converging quadratically on the root; helium's second stage and the molecules are
     * only nearly concave, so every step is also kept within [x0, Q/ye(x0)], which always holds the root (ye
     * grows with x). Each step is one pass over the species without an exponential; two bring the K-dwarf
     * photosphere within ~0.01 of the root, and the Newton iteration then needs three steps instead of five.
     * The result is returned as eta = eta_ref - ln x. Degeneracy and the Coulomb shift are ignored: the Newton
     * iteration corrects them.
     *
     * @param start the caller's own start, which it keeps unless this guess lies below it (the guess being a
     *     bound on eta from above): the bound is sharpened only then, so a warm start from a solved neighbour
     *     pays nothing for it
     */
    double ionisationGuess(double start) {
        double q = 0.5 * Math.sqrt(Math.PI) * ELECTRON_DENSITY_CONSTANT * t15 * Constants.M_U
                / density * Math.exp(reference);
        double hydrogen = abundance[0];
        // With molecules, r f0(r) <= r f0(0): the weak-ionisation bound of hydrogen uses the atoms left at r = 0.
        double atoms = pairing > 0.0 ? 2.0 / (1.0 + Math.sqrt(1.0 + 8.0 * pairing)) : 1.0;
        double linear = hydrogen * kH * atoms + abundance[1] * kHe0;
        for (int m = 0; m < el.metalCount; m++) {
            linear += abundance[2 + m] * (kFirst[m] + (el.charge[m] - 1) * kInner[m]);
        }
        double x = Math.max(q / yeMax, Math.sqrt(q / linear));
        // Q/x = a k x/(1 + k x) + rest: (a + rest) k x^2 + (rest - Q k) x - Q = 0.
        double rest = yeMax - hydrogen;
        double b = rest - q * kH;
        double twoA = 2.0 * yeMax * kH;
        double root = b < 0.0 ? (-b + Math.sqrt(b * b + 2.0 * twoA * q)) / twoA
                : 2.0 * q / (b + Math.sqrt(b * b + 2.0 * twoA * q));
        if (root > x) {
            x = root;
        }
        double bound = reference - Math.log(x);
        if (!(bound < start)) {
            return bound;
        }
        double fullyIonised = q / yeMax;
        for (int i = 0; i < GUESS_REFINEMENTS && x > fullyIonised * (1.0 + GUESS_TOLERANCE); i++) {
            double ye = ions(x);
            if (!(ye > 0.0)) {
                break;
            }
            // tangent ye(x0) + s (X - x0) with s = spread/x0: s X^2 + c X - Q = 0, c = ye(x0) - spread
            double slope = ionSpread / x;
            double c = ye - ionSpread;
            double d = Math.sqrt(c * c + 4.0 * slope * q);
            double next = c < 0.0 ? (d - c) / (2.0 * slope) : 2.0 * q / (c + d);
            next = Math.min(next, q / ye);
            if (!(next > x * (1.0 + GUESS_TOLERANCE))) {
                if (next > x) {
                    x = next;
                }
                break;
            }
            x = next;
        }
        return reference - Math.log(x);
    }

    /**
     * The Newton part at this eta for the prepared (rho, T): residual, its full eta-slope (Coulomb shift
     * included), free electrons and the H and He fractions. Leaves fd and the Coulomb term set for
     * {@link #evaluate}.
     */
    void solveStep(double eta) {
        double yeFd = electronSide(eta);
        double ye = ions(stepRatio);
        double spread = ionSpread;
        ye = Math.max(ye, Double.MIN_NORMAL);
        residual = Math.log(yeFd / ye);
        // d ln x/d eta = -(1 + d(mu_C/kT)/d eta), and d ln ye/d ln x = spread/ye.
        residualSlope = fd[4] / fd[1] + spread / ye * (1.0 + coulombTerm.shiftEta);
        electrons = yeFd;
    }

    /**
     * The state at an eta the neutrality solve has accepted without its residual: the electron side and the
     * Coulomb term as {@link #solveStep} sets them, the helium fractions {@link #evaluate} reads, and then
     * {@link #evaluate} itself (which sets the hydrogen fractions too); the residual fields are left unset.
     */
    void completeAt(double eta) {
        double yeFd = electronSide(eta);
        heliumFractions(stepRatio);
        electrons = yeFd;
        evaluate();
    }

    /**
     * The electron side at eta, shared by {@link #solveStep} and {@link #completeAt}: the Fermi-Dirac integrals in
     * fd, the Coulomb term and the ratio x in {@link #stepRatio}; returns the free electrons per u.
     */
    private double electronSide(double eta) {
        FermiDirac.withSlopes(eta, fd);
        double yeFd = electronScale * fd[1] * Constants.M_U / density;
        if (coulomb && yeFd > 0.0) {
            coulombTerm.evaluate(fd, yeFd, chargeRatio);
        } else {
            coulombTerm.clear();
        }
        stepRatio = ratio(eta);
        return yeFd;
    }

    /**
     * Free electrons per u of the ions at ratio x (see {@link #ratio}), with their spread d ye/d ln x in
     * {@link #ionSpread}, and the H and He fractions: the ion side of the neutrality balance, shared by
     * {@link #solveStep} and {@link #ionisationGuess}.
     */
    private double ions(double x) {
        double ye = 0.0;
        double spread = 0.0;

        double r = kH * x;
        double a = abundance[0];
        double f1;
        if (pairing > 0.0) {
            double s = 1.0 + r;
            double f0 = 2.0 / (s + Math.sqrt(s * s + 8.0 * pairing));
            f1 = r * f0;
            spread += a * f1 * (1.0 + 4.0 * pairing * f0) / (s + 4.0 * pairing * f0);
            hydrogenMolecular = 2.0 * pairing * f0 * f0;
        } else {
            f1 = r / (1.0 + r);
            spread += a * f1 * (1.0 - f1);
            hydrogenMolecular = 0.0;
        }
        ye += a * f1;
        hydrogenIonised = f1;

        heliumFractions(x);
        a = abundance[1];
        double mean = heliumSingle + 2.0 * heliumDouble;
        ye += a * mean;
        spread += a * (heliumSingle + 4.0 * heliumDouble - mean * mean);

        for (int m = 0; m < el.metalCount; m++) {
            double g1 = ionisedShare(kFirst[m] * x);
            double y = ionisedShare(kInner[m] * x);
            int sites = el.charge[m] - 1;
            a = abundance[2 + m];
            ye += a * (g1 + sites * y);
            spread += a * (g1 * (1.0 - g1) + sites * y * (1.0 - y));
        }
        ionSpread = spread;
        return ye;
    }

    /**
     * Completes the state at the eta of the last {@link #solveStep}: P, u and their partials in eta, ln rho and
     * ln T at fixed eta, and the residual's partials in ln rho and ln T. The step's ratio x serves again: completing
     * the Coulomb term leaves its shift, hence x, as the step set them.
     */
    void evaluate() {
        double t = temperature;
        double rho = density;
        double perMass = kT / Constants.M_U;
        double betaChi = 1.0 / kT;
        CoulombTerm c = coulombTerm;
        c.completeState();
        double x = stepRatio;
        double lxEta = -(1.0 + c.shiftEta);
        double lxRho = -c.shiftRho;
        double lxT = -c.shiftT;
        // Accumulators: value, d/d eta, d/d ln rho, d/d ln T of ye, ionisation energy and excluded volume.
        double ye = 0.0;
        double yeEta = 0.0;
        double yeRho = 0.0;
        double yeT = 0.0;
        double ion = 0.0;
        double ionEta = 0.0;
        double ionT = 0.0;
        double ex = 0.0;
        double exEta = 0.0;
        double exRho = 0.0;
        double exT = 0.0;

        // Hydrogen: d(a f1) = w d ln r + wp d ln p, d(a fm) = wm d ln r + wmp d ln p (see the class comment);
        // molecules (a fm/2 per m_u) replace two atoms by one particle and carry the energy E_m each.
        double r = kH * x;
        double a = abundance[0];
        double f1;
        double f0;
        double fm = 0.0;
        double w;
        double wp = 0.0;
        double wm = 0.0;
        double wmp = 0.0;
        if (pairing > 0.0) {
            double s = 1.0 + r;
            f0 = 2.0 / (s + Math.sqrt(s * s + 8.0 * pairing));
            f1 = r * f0;
            fm = 2.0 * pairing * f0 * f0;
            double pf = pairing * f0;
            double inv = 1.0 / (s + 4.0 * pf);
            w = a * f1 * (1.0 + 4.0 * pf) * inv;
            wp = -2.0 * a * f1 * pf * inv;
            wm = -2.0 * a * fm * r * inv;
            wmp = a * fm * s * inv;
        } else {
            f1 = r / (1.0 + r);
            f0 = 1.0 / (1.0 + r);
            w = a * f1 * f0;
        }
        double chi = el.hydrogenChi;
        // atoms carry chi - E_H relative to the energy zero (atoms at rest in the ground state): 0 when kT << chi
        double excitation = chi - hydrogenEnergy;
        double lrT = hydrogenEnergy * betaChi + lxT;
        double lrRho = xiH + lxRho;
        double f1Rho = w * lrRho + wp;
        double f1T = w * lrT + wp * pairingT;
        double fmT = wm * lrT + wmp * pairingT;
        ye += a * f1;
        yeEta += w * lxEta;
        yeRho += f1Rho;
        yeT += f1T;
        ion += a * f1 * chi + a * f0 * excitation;
        ionEta += (w * chi - (w + wm) * excitation) * lxEta;
        ionT += f1T * chi - (f1T + fmT) * excitation + a * f0 * -hydrogenEnergyT;
        // the same arithmetic as ions(), so a state completed without a last residual reports the same fractions
        hydrogenIonised = f1;
        hydrogenMolecular = fm;
        ex += a * (f0 + fm) * xiH;
        exEta -= w * xiH * lxEta;
        exRho += a * (f0 + fm) * xiH - f1Rho * xiH;
        exT -= f1T * xiH;
        double mol = 0.5 * a * fm;
        double molEta = 0.5 * wm * lxEta;
        double molRho = 0.5 * (wm * lrRho + wmp);
        double molT = 0.5 * (wm * lrT + wmp * pairingT);

        double h0 = heliumNeutral;
        double h1 = heliumSingle;
        double h2 = heliumDouble;
        double chi0 = el.heliumChi0;
        double chi01 = el.heliumChi0 + el.heliumChi1;
        a = abundance[1];
        ye += a * (h1 + 2.0 * h2);
        ion += a * (h1 * chi0 + h2 * chi01);
        double exHe = a * (h0 * xiHe0 + h1 * xiHe1);
        ex += exHe;
        // Statistical weights w_1 = K0 x, w_2 = K0 K1 x^2 relative to He0: pass their log-partials.
        heliumShift(lxEta, 2.0 * lxEta);
        yeEta += a * (dh1 + 2.0 * dh2);
        ionEta += a * (dh1 * chi0 + dh2 * chi01);
        exEta += a * (dh0 * xiHe0 + dh1 * xiHe1);
        heliumShift(xiHe0 - xiHe1 + lxRho, xiHe0 + 2.0 * lxRho);
        yeRho += a * (dh1 + 2.0 * dh2);
        exRho += exHe + a * (dh0 * xiHe0 + dh1 * xiHe1);
        heliumShift(chi0 * betaChi + lxT, chi01 * betaChi + 2.0 * lxT);
        yeT += a * (dh1 + 2.0 * dh2);
        ionT += a * (dh1 * chi0 + dh2 * chi01);
        exT += a * (dh0 * xiHe0 + dh1 * xiHe1);

        // The metals' stages, two per metal (the first, weight wf, and the inner sites, wi): each stage's terms
        // are its weight times (chi beta + lxT), (xi + lxRho) or lxEta, so the loop gathers the weights' moments in
        // chi and xi and the shared factors are applied once after it (a third of the operations of per-stage sums).
        double sumW = 0.0;
        double sumWChi = 0.0;
        double sumWXi = 0.0;
        double sumWChiChi = 0.0;
        double sumWXiChi = 0.0;
        double sumWXiXi = 0.0;
        double metalYe = 0.0;
        double metalIon = 0.0;
        double metalEx = 0.0;
        for (int m = 0; m < el.metalCount; m++) {
            a = abundance[2 + m];
            int sites = el.charge[m] - 1;
            double rf = kFirst[m] * x;
            double g0 = neutralShare(rf);
            double g1 = rf * g0;
            double ri = kInner[m] * x;
            double y0 = neutralShare(ri);
            double y = ri * y0;
            double wf = a * g1 * g0;
            double wi = a * sites * y * y0;
            double chiF = el.firstChi[m];
            double chiI = el.innerChi[m];
            double xiN = xiNeutral[m];
            double xiI = xiInner[m];
            double cf = wf * chiF;
            double ci = wi * chiI;
            double vf = wf * xiN;
            double vi = wi * xiI;
            sumW += wf + wi;
            sumWChi += cf + ci;
            sumWXi += vf + vi;
            sumWChiChi += cf * chiF + ci * chiI;
            sumWXiChi += vf * chiF + vi * chiI;
            sumWXiXi += vf * xiN + vi * xiI;
            double ionisedSites = sites * y;
            metalYe += a * (g1 + ionisedSites);
            metalIon += a * (g1 * chiF + ionisedSites * chiI);
            metalEx += a * (g0 * xiN + sites * y0 * xiI);
        }
        ye += metalYe;
        yeEta += sumW * lxEta;
        yeRho += sumWXi + sumW * lxRho;
        yeT += sumWChi * betaChi + sumW * lxT;
        ion += metalIon;
        ionEta += sumWChi * lxEta;
        ionT += sumWChiChi * betaChi + sumWChi * lxT;
        ex += metalEx;
        exEta -= sumWXi * lxEta;
        exRho += metalEx - sumWXiXi - sumWXi * lxRho;
        exT -= sumWXiChi * betaChi + sumWXi * lxT;
        ye = Math.max(ye, Double.MIN_NORMAL);

        double electronPressure = (2.0 / 3.0) * ELECTRON_DENSITY_CONSTANT * kT * t15 * fd[2];
        double aT4 = Constants.A_RAD * t * t * t * t;
        double heavy = nuclei - mol;
        heavyParticles = heavy;
        double ideal = rho * perMass * (heavy + ex);
        radiationPressure = aT4 / 3.0;
        pressure = ideal + electronPressure + radiationPressure + c.pressure;
        energy = 1.5 * perMass * heavy + 1.5 * electronPressure / rho + aT4 / rho + ion / Constants.M_U + c.energy
                + mol * moleculeEnergy / Constants.M_U;

        double electronPressureEta = electronPressure * fd[5] / fd[2];
        pressureEta = rho * perMass * (exEta - molEta) + electronPressureEta + c.pressureEta;
        pressureRho = ideal + rho * perMass * (exRho - molRho) + c.pressureRho;
        pressureT = ideal + rho * perMass * (exT - molT) + 2.5 * electronPressure + (4.0 / 3.0) * aT4 + c.pressureT;
        energyEta = 1.5 * electronPressureEta / rho + ionEta / Constants.M_U + c.energyEta
                + molEta * (moleculeEnergy - 1.5 * kT) / Constants.M_U;
        energyT = 1.5 * perMass * heavy + 3.75 * electronPressure / rho + 4.0 * aT4 / rho + ionT / Constants.M_U
                + c.energyT + (molT * (moleculeEnergy - 1.5 * kT) + mol * moleculeEnergyT) / Constants.M_U;
        residualSlope = fd[4] / fd[1] - yeEta / ye;
        residualRho = -1.0 - yeRho / ye;
        residualT = 1.5 - yeT / ye;
    }


    /** x = e^(eta_ref - eta - mu_C/kT), clipped (see {@link #LN_CLIP}). */
    private double ratio(double eta) {
        return Math.exp(Math.max(-LN_CLIP, Math.min(LN_CLIP, reference - eta - coulombTerm.shift)));
    }

    /**
     * r/(1 + r), the ionised share of a two-state stage with ratio r, without the division where it is not needed:
     * below 2^-53 the sum 1 + r rounds to 1, so the quotient is r exactly, and from 2^54 up (where 1 is below half
     * an ulp of r) it rounds to r, so the quotient is 1 exactly (bitwise the value of the division). Cool gas has
     * many such stages: the inner sites of every metal in a photosphere (K ~ e^-600 at 5000 K) and, cooler still,
     * the first stages of high potential (neon at 3000 K).
     */
    private static double ionisedShare(double r) {
        if (r < TINY_RATIO) {
            return r;
        }
        if (r >= HUGE_RATIO) {
            return 1.0;
        }
        return r / (1.0 + r);
    }

    /** 1/(1 + r), the neutral share, exactly 1 below 2^-53 without the division (see {@link #ionisedShare}). */
    private static double neutralShare(double r) {
        return r < TINY_RATIO ? 1.0 : 1.0 / (1.0 + r);
    }

    /** He0, He+ and He++ fractions at ratio x; the ratio product saturates to pure He++ / He+ beyond 1e300. */
    private void heliumFractions(double x) {
        double r0 = kHe0 * x;
        double r01 = r0 * kHe1 * x;
        if (r01 < 1e300) {
            double norm = 1.0 / (1.0 + r0 + r01);
            heliumNeutral = norm;
            heliumSingle = r0 * norm;
            heliumDouble = r01 * norm;
        } else {
            heliumNeutral = 0.0;
            heliumSingle = 1.0 / (kHe1 * x);
            heliumDouble = 1.0 - heliumSingle;
        }
    }

    /** Changes of the helium fractions, d h_j = h_j (d ln w_j - sum_i h_i d ln w_i), w_0 = 1. */
    private void heliumShift(double lnW1, double lnW2) {
        double mean = heliumSingle * lnW1 + heliumDouble * lnW2;
        dh0 = -heliumNeutral * mean;
        dh1 = heliumSingle * (lnW1 - mean);
        dh2 = heliumDouble * (lnW2 - mean);
    }

    /** e^(lnK - eta_ref) clipped to e^(+-LN_CLIP); stages beyond the clip skip the exponential (same value). */
    private double expK(double lnK) {
        double arg = lnK - reference;
        if (arg <= -LN_CLIP) {
            return CLIP_LOW;
        }
        if (arg >= LN_CLIP) {
            return CLIP_HIGH;
        }
        return Math.exp(arg);
    }
}
