package org.convgrid.engine.structure;

import org.convgrid.engine.convection.ConvectiveGradient;
import org.convgrid.engine.overshoot.OvershootProfile;
import org.convgrid.engine.physics.eos.EosState;
import org.convgrid.engine.units.Constants;

/**
 * Per-shell quantities of a solved model, centre (index 0) to surface, cgs units. Immutable.
 */
public final class StellarProfile implements OvershootProfile {

    private final double[] mass;
    private final double[] radius;
    private final double[] pressure;
    private final double[] temperature;
    private final double[] density;
    private final double[] luminosity;
    private final double[] opacity;
    private final double[] eps;
    private final double[] nabla;
    private final double[] nablaAd;
    private final double[] nablaRad;
    private final double[] stabilityExcess;
    private final boolean[] convective;
    private final double[] convectiveVelocity;
    private final double[] scaleHeight;
    private final double[] hydrogen;
    private final double[] internalEnergy;
    /** The equation of state's answer at each point, from the solver's last evaluation (it gave P and u). */
    private final EosState[] eos;
    /** The equation of state's second derivatives the solver's Jacobian last used at each point (null: none). */
    private final EosCurvature[] curvature;

    StellarProfile(StructureEquations eq, double[] y) {
        int n = eq.points();
        MassMesh mesh = eq.mesh();
        mass = new double[n];
        radius = new double[n];
        pressure = new double[n];
        temperature = new double[n];
        density = new double[n];
        luminosity = new double[n];
        opacity = new double[n];
        eps = new double[n];
        nabla = new double[n];
        nablaAd = new double[n];
        nablaRad = new double[n];
        stabilityExcess = new double[n];
        convective = new boolean[n];
        convectiveVelocity = new double[n];
        scaleHeight = new double[n];
        hydrogen = new double[n];
        internalEnergy = new double[n];
        eos = new EosState[n];
        curvature = new EosCurvature[n];
        ModelState state = eq.state(y);
        for (int k = 0; k < n; k++) {
            EosState s = eq.eosAt(k);
            mass[k] = mesh.mass(k);
            radius[k] = Math.exp(y[4 * k]);
            pressure[k] = s.pressure();
            temperature[k] = s.temperature();
            density[k] = s.density();
            luminosity[k] = y[4 * k + 3] * eq.luminosityScale();
            opacity[k] = eq.opacityAt(k).kappa();
            eps[k] = eq.epsNuclearAt(k);
            nabla[k] = eq.nablaAt(k);
            nablaAd[k] = s.nablaAd();
            nablaRad[k] = eq.nablaRadAt(k);
            stabilityExcess[k] = nablaRad[k] - eq.nablaStabilityAt(k);
            ConvectiveGradient g = eq.convectionAt(k);
            convective[k] = g != null && g.convective();
            convectiveVelocity[k] = g == null ? 0.0 : g.velocity();
            scaleHeight[k] = s.pressure() * radius[k] * radius[k] / (s.density() * Constants.G * mass[k]);
            hydrogen[k] = state.composition(k).x();
            internalEnergy[k] = s.internalEnergy();
            eos[k] = s;
            curvature[k] = eq.curvatureAt(k);
        }
    }

    public int size() {
        return mass.length;
    }

    /** m, g. */
    public double mass(int k) {
        return mass[k];
    }

    /** r, cm. */
    public double radius(int k) {
        return radius[k];
    }

    /** P, dyn cm^-2. */
    public double pressure(int k) {
        return pressure[k];
    }

    /** T, K. */
    public double temperature(int k) {
        return temperature[k];
    }

    /** rho, g cm^-3. */
    public double density(int k) {
        return density[k];
    }

    /** Specific internal energy (ionisation energy included), erg g^-1, of the equation-of-state call that gave P. */
    public double internalEnergy(int k) {
        return internalEnergy[k];
    }

    /**
     * The equation of state's whole answer at point k (the call that gave P and u): a nearby state from which a
     * later solve at this point starts its own iteration ({@link StructureSolver#relax(ModelState, ExtraEnergy,
     * double[], HenyeySolver.Settings, EosState[])}).
     */
    public EosState eosState(int k) {
        return eos[k];
    }

    /**
     * The equation of state's second derivatives the solver's Jacobian last used at point k, or null: a later
     * solve on the same mesh reuses them while the point stays near ({@link StructureSolver#relax(ModelState,
     * ExtraEnergy, double[], HenyeySolver.Settings, EosState[], EosCurvature[])}).
     */
    public EosCurvature eosCurvature(int k) {
        return curvature[k];
    }

    /** {@link #eosState} of every point (a copy): the states a later solve on this mesh starts from. */
    public EosState[] eosStates() {
        return eos.clone();
    }

    /** {@link #eosCurvature} of every point (a copy; null entries where none was used). */
    public EosCurvature[] eosCurvatures() {
        return curvature.clone();
    }

    /** L, erg s^-1. */
    public double luminosity(int k) {
        return luminosity[k];
    }

    /** Rosseland-mean opacity, cm^2 g^-1. */
    public double opacity(int k) {
        return opacity[k];
    }

    /** Nuclear energy generation, erg g^-1 s^-1. */
    public double eps(int k) {
        return eps[k];
    }

    /** Actual gradient dlnT/dlnP. */
    public double nabla(int k) {
        return nabla[k];
    }

    public double nablaAd(int k) {
        return nablaAd[k];
    }

    public double nablaRad(int k) {
        return nablaRad[k];
    }

    /** nabla_rad minus the stability limit (nabla_ad or nabla_L): positive where convective. */
    public double stabilityExcess(int k) {
        return stabilityExcess[k];
    }

    public boolean convective(int k) {
        return convective[k];
    }

    /** Mixing-length convective velocity, cm s^-1 (0 where stable). */
    public double convectiveVelocity(int k) {
        return convectiveVelocity[k];
    }

    /** Pressure scale height P/(rho g), cm. */
    public double pressureScaleHeight(int k) {
        return scaleHeight[k];
    }

    /** Hydrogen mass fraction. */
    @Override
    public double hydrogen(int k) {
        return hydrogen[k];
    }

    public double[] masses() {
        return mass.clone();
    }

    /** Density per point, g cm^-3. */
    public double[] densities() {
        return density.clone();
    }

    /** Temperature per point, K. */
    public double[] temperatures() {
        return temperature.clone();
    }

    /** Pressure per point, dyn cm^-2. */
    public double[] pressures() {
        return pressure.clone();
    }

    /** Specific internal energy per point, erg g^-1. */
    public double[] internalEnergies() {
        return internalEnergy.clone();
    }

    /** Whether each point is convective. */
    public boolean[] convectiveFlags() {
        return convective.clone();
    }

    public double[] radii() {
        return radius.clone();
    }

    public double[] stabilityExcesses() {
        return stabilityExcess.clone();
    }

    public double[] convectiveVelocities() {
        return convectiveVelocity.clone();
    }

    public double[] pressureScaleHeights() {
        return scaleHeight.clone();
    }
}
