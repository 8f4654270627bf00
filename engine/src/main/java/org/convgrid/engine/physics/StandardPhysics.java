package org.convgrid.engine.physics;

import org.convgrid.engine.batch.PhysicsOptions;
import org.convgrid.engine.convection.MixingLengthTheory;
import org.convgrid.engine.physics.atmosphere.AtmosphereTable;
import org.convgrid.engine.physics.atmosphere.GreyAtmosphere;
import org.convgrid.engine.physics.eos.EquationOfState;
import org.convgrid.engine.physics.eos.StellarPlasmaEos;
import org.convgrid.engine.physics.nuclear.HydrogenBurningNetwork;
import org.convgrid.engine.physics.nuclear.NuclearNetwork;
import org.convgrid.engine.physics.opacity.AnalyticCompositeOpacity;
import java.nio.file.Path;
import org.convgrid.engine.physics.opacity.Opacity;
import org.convgrid.engine.physics.opacity.OpacityTableReader;
import org.convgrid.engine.physics.opacity.ScaledOpacity;

/**
 * convgrid's default physics: the stellar-plasma equation of state, the analytic composite opacity, the
 * hydrogen-burning network, mixing-length convection and a tabulated grey Eddington atmosphere. Every component
 * is immutable and thread-safe, so the instances are shared.
 */
public final class StandardPhysics {

    private static final EquationOfState EOS = new StellarPlasmaEos();
    private static final Opacity OPACITY = AnalyticCompositeOpacity.standard();
    private static final NuclearNetwork NUCLEAR = new HydrogenBurningNetwork();

    private StandardPhysics() {
    }

    /** Ideal ions, radiation, electrons of any degeneracy, Saha ionisation with pressure ionisation, Coulomb term. */
    public static EquationOfState equationOfState() {
        return EOS;
    }

    /** The analytic composite Rosseland mean multiplied by {@code factor} (1 = as published). */
    public static Opacity opacity(double factor) {
        return ScaledOpacity.of(OPACITY, factor);
    }

    /** pp chains and CNO cycle with Salpeter screening. */
    public static NuclearNetwork nuclearNetwork() {
        return NUCLEAR;
    }

    /**
     * The whole bundle for one set of physics options; a user opacity table, when named, is read here.
     *
     * @throws org.convgrid.engine.error.ConvgridException BAD_DATA when the table cannot be read
     */
    public static PhysicsSet create(PhysicsOptions options) {
        Opacity opacity = options.usesOpacityTable()
                ? ScaledOpacity.of(OpacityTableReader.read(Path.of(options.opacityTable())), options.opacityFactor())
                : opacity(options.opacityFactor());
        return new PhysicsSet(EOS, opacity, NUCLEAR, new MixingLengthTheory(options.mixingLength()),
                options.criterion(), new AtmosphereTable(new GreyAtmosphere(EOS, opacity)), options.overshoot());
    }
}
