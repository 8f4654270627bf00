package org.convgrid.output.profile;

import java.util.LinkedHashMap;
import java.util.Locale;
import java.util.Map;
import org.convgrid.engine.request.Age;
import org.convgrid.engine.request.ModelRequest;
import org.convgrid.engine.request.PhysicsOptions;
import org.convgrid.engine.request.SeismicScales;
import org.convgrid.engine.structure.BuoyancyTravelTime;
import org.convgrid.engine.structure.ModelSeismicScales;
import org.convgrid.engine.structure.StellarModel;
import org.convgrid.engine.structure.StellarProfile;
import org.convgrid.engine.units.Constants;

/**
 * Which star a profile file holds, written as the {@code meta} mapping of its ECSV header: an oscillation code needs
 * the total mass and G to make frequencies dimensionless, and a reader of the file alone needs the age, composition,
 * physics and constants it came from, and an asteroseismologist the g-mode period scale. The key names are spelled
 * here only.
 *
 * @param modelId the model's id (a grid's model id, {@code star-m...} for {@code star}, {@code calibrated-sun})
 * @param mass total mass, g: the M of mass_frac
 * @param radius photospheric radius, cm: the R of radius_frac
 * @param luminosity surface luminosity, erg s^-1
 * @param effectiveTemperature K
 * @param ageGyr age, Gyr, counted from {@code ageOrigin}
 * @param ageOrigin {@code birth} or {@code zams}
 * @param initialMetals initial Z
 * @param initialHelium initial Y
 * @param physics the physics options the model was computed with
 * @param settling whether helium and metals settled (calibrate-sun only; grids and star evolve without it)
 * @param toolVersion the convgrid version that wrote the file
 * @param toolCommit the git commit it was built from
 * @param seismic the model's seismic scales ({@link ModelSeismicScales}): Pi_0 (NaN, and its keys left out, for a star
 *     with no g-mode cavity), the acoustic radius, the acoustic depths of the surface zone's base and of helium's
 *     second ionisation (each NaN and left out where it has no meaning)
 */
public record ProfileMeta(String modelId, double mass, double radius, double luminosity, double effectiveTemperature,
                          double ageGyr, String ageOrigin, double initialMetals, double initialHelium,
                          PhysicsOptions physics, boolean settling, String toolVersion, String toolCommit,
                          SeismicScales seismic) {

    public static final String MODEL_ID = "model_id";
    public static final String MASS_G = "mass_g";
    public static final String MASS_MSUN = "mass_msun";
    public static final String RADIUS_CM = "radius_cm";
    public static final String RADIUS_RSUN = "radius_rsun";
    public static final String LUMINOSITY_CGS = "luminosity_cgs";
    public static final String LUMINOSITY_LSUN = "luminosity_lsun";
    public static final String TEFF_K = "teff_k";
    public static final String AGE_GYR = "age_gyr";
    public static final String AGE_ORIGIN = "age_origin";
    public static final String X_INIT = "x_init";
    public static final String Y_INIT = "y_init";
    public static final String Z_INIT = "z_init";
    public static final String MIXING_LENGTH = "mixing_length";
    public static final String OVERSHOOT_HP = "overshoot_hp";
    public static final String OVERSHOOT_PROFILE = "overshoot_profile";
    /**
     * The overshoot parameter this star was mixed with: overshoot_hp itself, except under uniform-ramped, whose
     * overshoot_hp is the length from 2 Msun up (alpha_ov for the uniform profiles, f for the decaying one).
     */
    public static final String OVERSHOOT_APPLIED = "overshoot_applied";
    public static final String CRITERION = "criterion";
    public static final String OPACITY_SCALE = "opacity_scale";
    /** Present only when the model used a user opacity table: its path. */
    public static final String OPACITY_TABLE = "opacity_table";
    public static final String ATMOSPHERE = "atmosphere";
    public static final String SETTLING = "settling";
    public static final String GRAVITATIONAL_CONSTANT_CGS = "gravitational_constant_cgs";
    public static final String SOLAR_MASS_G = "solar_mass_g";
    public static final String SOLAR_RADIUS_CM = "solar_radius_cm";
    public static final String SOLAR_LUMINOSITY_CGS = "solar_luminosity_cgs";
    public static final String TOOL_VERSION = "tool_version";
    public static final String TOOL_COMMIT = "tool_commit";
    /** Pi_0 = 2 pi^2 / (integral of N dr / r where N^2 > 0), s; absent for a fully convective star. */
    public static final String BUOYANCY_PERIOD_PI0_S = "buoyancy_period_pi0_s";
    /** The asymptotic dipole g-mode period spacing Pi_0 / sqrt 2, s; absent with Pi_0. */
    public static final String PERIOD_SPACING_L1_S = "period_spacing_l1_s";
    /** The asymptotic large separation 1 / (2 integral of dr / c), microHz; the catalogue's column of that name. */
    public static final String LARGE_SEPARATION_UHZ = "large_separation_uhz";
    /** The acoustic depth of the surface convection zone's base, s; absent when the surface is radiative. */
    public static final String SURFACE_CZ_BASE_ACOUSTIC_DEPTH_S = "surface_cz_base_acoustic_depth_s";
    /** The acoustic depth of helium's second-ionisation dip of Gamma1, s; absent without a dip. */
    public static final String HE_II_IONISATION_ACOUSTIC_DEPTH_S = "he_ii_ionisation_acoustic_depth_s";

    /**
     * The meta of a solved model.
     *
     * @param request the request the model answers, its age resolved (a main-sequence fraction as the time it stands
     *     for)
     */
    public static ProfileMeta of(ModelRequest request, StellarModel model, boolean settling, String toolVersion,
                                 String toolCommit) {
        StellarProfile p = model.profile();
        int surface = p.size() - 1;
        Age age = request.age();
        double seconds = age instanceof Age.SinceZeroAge since ? since.seconds()
                : age instanceof Age.SinceBirth since ? since.seconds() : Double.NaN;
        return new ProfileMeta(request.modelId(), p.mass(surface), p.radius(surface), p.luminosity(surface),
                model.global().effectiveTemperature(), seconds / Constants.GYR, age.origin().label(),
                request.initialMetals(), request.initialHelium(), request.physics(), settling, toolVersion,
                toolCommit, ModelSeismicScales.of(model));
    }

    /** The mapping as written: the star, its age and composition, the physics, the constants, the tool. */
    public Map<String, Object> entries() {
        Map<String, Object> m = new LinkedHashMap<>();
        m.put(MODEL_ID, modelId);
        m.put(MASS_G, mass);
        m.put(MASS_MSUN, mass / Constants.M_SUN);
        m.put(RADIUS_CM, radius);
        m.put(RADIUS_RSUN, radius / Constants.R_SUN);
        m.put(LUMINOSITY_CGS, luminosity);
        m.put(LUMINOSITY_LSUN, luminosity / Constants.L_SUN);
        m.put(TEFF_K, effectiveTemperature);
        m.put(AGE_GYR, ageGyr);
        m.put(AGE_ORIGIN, ageOrigin);
        m.put(X_INIT, 1.0 - initialHelium - initialMetals);
        m.put(Y_INIT, initialHelium);
        m.put(Z_INIT, initialMetals);
        m.put(MIXING_LENGTH, physics.mixingLength());
        m.put(OVERSHOOT_HP, physics.overshoot());
        m.put(OVERSHOOT_PROFILE, physics.overshootScheme().label());
        // to 12 significant digits: the ramp's arithmetic leaves rounding noise (0.10000000000000003 for 0.1)
        m.put(OVERSHOOT_APPLIED, new java.math.BigDecimal(physics.overshootScheme().model(physics.overshoot())
                .parameterAt(mass / Constants.M_SUN)).round(new java.math.MathContext(12)).doubleValue());
        m.put(CRITERION, physics.criterion().name().toLowerCase(Locale.ROOT));
        m.put(OPACITY_SCALE, physics.opacityScale());
        if (physics.usesOpacityTable()) {
            m.put(OPACITY_TABLE, physics.opacityTable());
        }
        m.put(ATMOSPHERE, physics.atmosphere().label());
        m.put(SETTLING, settling);
        m.put(GRAVITATIONAL_CONSTANT_CGS, Constants.G);
        m.put(SOLAR_MASS_G, Constants.M_SUN);
        m.put(SOLAR_RADIUS_CM, Constants.R_SUN);
        m.put(SOLAR_LUMINOSITY_CGS, Constants.L_SUN);
        m.put(TOOL_VERSION, toolVersion);
        m.put(TOOL_COMMIT, toolCommit);
        // after the tool's keys, so that the keys of earlier profiles keep their places
        double pi0 = seismic.buoyancyTravelTime();
        if (!Double.isNaN(pi0)) {
            m.put(BUOYANCY_PERIOD_PI0_S, pi0);
            m.put(PERIOD_SPACING_L1_S, BuoyancyTravelTime.periodSpacing(pi0, 1));
        }
        // after Pi_0's keys, for the same reason; the catalogue's very doubles (OutcomeRows)
        double largeSeparationUhz = seismic.largeSeparationMicrohertz();
        if (!Double.isNaN(largeSeparationUhz)) {
            m.put(LARGE_SEPARATION_UHZ, largeSeparationUhz);
        }
        if (!Double.isNaN(seismic.surfaceZoneBaseAcousticDepth())) {
            m.put(SURFACE_CZ_BASE_ACOUSTIC_DEPTH_S, seismic.surfaceZoneBaseAcousticDepth());
        }
        if (!Double.isNaN(seismic.heliumSecondIonisationAcousticDepth())) {
            m.put(HE_II_IONISATION_ACOUSTIC_DEPTH_S, seismic.heliumSecondIonisationAcousticDepth());
        }
        return m;
    }
}
