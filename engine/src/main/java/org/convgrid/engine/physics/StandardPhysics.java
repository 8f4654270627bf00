package org.convgrid.engine.physics;

import org.convgrid.engine.convection.MixingLengthTheory;
import org.convgrid.engine.error.ConvgridException;
import org.convgrid.engine.error.ErrorKind;
import org.convgrid.engine.physics.atmosphere.AtmosphereTable;
import org.convgrid.engine.physics.atmosphere.GreyAtmosphere;
import org.convgrid.engine.physics.atmosphere.SurfaceBoundary;
import org.convgrid.engine.physics.atmosphere.SurfaceCondition;
import org.convgrid.engine.physics.atmosphere.TemperatureTauRelation;
import org.convgrid.engine.physics.eos.EquationOfState;
import org.convgrid.engine.physics.eos.StellarPlasmaEos;
import org.convgrid.engine.physics.nuclear.HydrogenBurningNetwork;
import org.convgrid.engine.physics.nuclear.NuclearNetwork;
import org.convgrid.engine.physics.opacity.AnalyticCompositeOpacity;
import org.convgrid.engine.physics.opacity.Opacity;
import org.convgrid.engine.physics.opacity.OpalGn93Opacity;
import org.convgrid.engine.physics.opacity.ScaledOpacity;
import org.convgrid.engine.request.OpacityChoice;
import org.convgrid.engine.request.PhysicsOptions;
import org.convgrid.engine.state.Composition;

/**
 * The default physics of zero-age and main-sequence models: {@link StellarPlasmaEos},
 * the OPAL GN93 tables with analytic edges and conduction ({@link OpalGn93Opacity}, read at first use) or a
 * user table (times the options' opacity factor),
 * {@link HydrogenBurningNetwork}, {@link MixingLengthTheory} with the options' alpha, the options' stability
 * criterion, and a grey atmosphere tabulated for the surface composition (each node integrated when first
 * needed), below the table's gravities (young stars high on their Hayashi tracks) a second table on the same
 * spacing, and the direct integration where neither has an answer. Every component is immutable and
 * thread-safe, so the stateless ones are shared.
 */
public final class StandardPhysics {

    private static final EquationOfState EOS = new StellarPlasmaEos();
    private static final Opacity ANALYTIC = AnalyticCompositeOpacity.standard();
    private static final NuclearNetwork NUCLEAR = new HydrogenBurningNetwork();

    private StandardPhysics() {
    }

    /** Ideal ions, radiation, electrons of any degeneracy, Saha ionisation with pressure ionisation, Coulomb term. */
    public static EquationOfState equationOfState() {
        return EOS;
    }

    /** The OPAL GN93 tables with their analytic edges, multiplied by {@code factor} (1 = as published). */
    public static Opacity opacity(double factor) {
        return ScaledOpacity.of(OpalGn93Opacity.shipped(), factor);
    }

    /**
     * The analytic composite alone ({@link AnalyticCompositeOpacity#standard()}), multiplied by {@code factor}:
     * no table, so it answers at any composition, but only to its stated accuracy (0.1-0.6 dex off OPAL in
     * envelopes, see its class comment).
     */
    public static Opacity analyticOpacity(double factor) {
        return ScaledOpacity.of(ANALYTIC, factor);
    }

    /**
     * The opacity the options ask for: a user table already read, or the OPAL GN93 tables; times the
     * opacity factor.
     */
    public static Opacity opacity(PhysicsOptions options) {
        return ScaledOpacity.of(options.opacity().opacity(), options.opacityScale());
    }

    /** pp chains and CNO cycle with Salpeter screening. */
    public static NuclearNetwork nuclearNetwork() {
        return NUCLEAR;
    }

    /**
     * @param options mixing length, overshoot, criterion, opacity factor and table
     * @param surfaceComposition the composition the atmosphere table is built for (a homogeneous star's
     *                           initial composition); the table answers for that composition whatever it is
     *                           asked with
     */
    public static PhysicsSet create(PhysicsOptions options, Composition surfaceComposition) {
        Opacity opacity = opacity(options);
        TemperatureTauRelation relation = options.atmosphere().relation();
        GreyAtmosphere atmosphere = new GreyAtmosphere(EOS, opacity, relation, relation.photosphericDepth());
        SurfaceBoundary table = new AtmosphereTable(atmosphere).tabulate(surfaceComposition);
        SurfaceBoundary lowGravity = new AtmosphereTable(atmosphere, AtmosphereTable.LOW_GRAVITY_TEFF_AXIS,
                AtmosphereTable.LOW_GRAVITY_AXIS).tabulate(surfaceComposition);
        return new PhysicsSet(EOS, opacity, NUCLEAR, new MixingLengthTheory(options.mixingLength()),
                options.criterion(), new TableWithFallback(table, new TableWithFallback(lowGravity, atmosphere)),
                options.overshootModel());
    }

    /**
     * The table where it answers; the fallback outside it or in a cell with a missing node (which happens where
     * the table's own integration failed at one node). The two agree to the table's interpolation error (its
     * figures in {@link AtmosphereTable}). A direct integration costs about as much as the EOS of a whole model, so
     * each Newton iteration of a surface outside every table pays twice (1 Msun start model, log g 2.0: 4.2 ms per
     * iteration, 1.6 ms with the low-gravity table, measured).
     */
    private record TableWithFallback(SurfaceBoundary table, SurfaceBoundary direct) implements SurfaceBoundary {
        @Override
        public SurfaceCondition at(double effectiveTemperature, double gravity, Composition composition) {
            try {
                return table.at(effectiveTemperature, gravity, composition);
            } catch (ConvgridException e) {
                if (e.kind() != ErrorKind.OFF_TABLE) {
                    throw e;
                }
                return direct.at(effectiveTemperature, gravity, composition);
            }
        }
    }
}
