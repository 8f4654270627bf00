package org.convgrid.engine.overshoot;

import java.util.Optional;
import java.util.function.IntToDoubleFunction;
import org.convgrid.engine.units.Constants;

/**
 * {@link StepOvershoot} whose length grows with the star's mass: alpha_ov(M) = alpha x min(1, max(0,
 * (M - {@value #RAMP_START_MSUN} Msun) / ({@value #RAMP_FULL_MSUN} - {@value #RAMP_START_MSUN} Msun))), none up to
 * 1.2 Msun, the full alpha from 2.0 Msun. The shape follows the mass dependence Claret &amp; Torres found by fitting
 * detached eclipsing binaries (2016, A&amp;A 592, A15, arXiv:1606.00834, step overshoot; 2018, ApJ 859, 100,
 * arXiv:1804.03148, diffusive: the parameter rises from about zero at 1.2 Msun to a plateau from about 2 Msun); the
 * linear rise between is a choice.
 *
 * <p>Why it exists: with one alpha_ov at every mass, uniform overshoot keeps alive the small convective cores that
 * out-of-equilibrium 3He and 12C burning make in stars below ~1.2 Msun, by mixing unburnt fuel into them from above.
 * Measured at alpha_ov = 0.2 (Z = 0.02, from birth): every star of 0.5-1.5 Msun still had a convective core at 1 Gyr
 * (m/M 0.028 at 0.8 Msun, none without overshoot) and 1 Msun kept one to 4.57 Gyr, where published solar models have
 * a radiative core. Stateless.
 *
 * @param alpha alpha_ov from {@value #RAMP_FULL_MSUN} Msun up, pressure scale heights (0: no overshoot)
 */
public record MassRampedStepOvershoot(double alpha) implements Overshoot {

    /** The grid-file name of this scheme. */
    public static final String LABEL = "uniform-ramped";
    /** Stars of this mass and below get no overshoot, Msun. */
    public static final double RAMP_START_MSUN = 1.2;
    /** Stars of this mass and above get the full alpha_ov, Msun. */
    public static final double RAMP_FULL_MSUN = 2.0;

    @Override
    public String label() {
        return LABEL;
    }

    @Override
    public double parameter() {
        return alpha;
    }

    /** {@link #alphaAt}. */
    @Override
    public double parameterAt(double massMsun) {
        return alphaAt(massMsun);
    }

    /** alpha_ov for a star of {@code massMsun}, pressure scale heights. */
    public double alphaAt(double massMsun) {
        double share = (massMsun - RAMP_START_MSUN) / (RAMP_FULL_MSUN - RAMP_START_MSUN);
        return alpha * Math.min(1.0, Math.max(0.0, share));
    }

    /** {@link StepOvershoot#mixedPoints} at the length of the star {@code previous} is. */
    @Override
    public boolean[] mixedPoints(IntToDoubleFunction massAt, boolean[] convective, OvershootProfile previous) {
        return stepFor(previous).mixedPoints(massAt, convective, previous);
    }

    /** {@link StepOvershoot#mixedCoreTop} at the length of the star {@code profile} is. */
    @Override
    public double mixedCoreTop(OvershootProfile profile) {
        return stepFor(profile).mixedCoreTop(profile);
    }

    /** The step overshoot at {@link #alphaAt} the star's mass (the profile's outermost point). */
    private StepOvershoot stepFor(OvershootProfile profile) {
        return new StepOvershoot(alphaAt(profile.mass(profile.size() - 1) / Constants.M_SUN));
    }

    /** Mixes instantaneously, like {@link StepOvershoot}; no diffusion. */
    @Override
    public Optional<double[]> diffusion(OvershootProfile previous, double mixingLength) {
        return Optional.empty();
    }
}
