package org.convgrid.engine.birth;

import static org.assertj.core.api.Assertions.assertThat;

import org.convgrid.engine.convection.StabilityCriterion;
import org.convgrid.engine.evolution.MainSequenceEvolver;
import org.convgrid.engine.physics.StandardPhysics;
import org.convgrid.engine.request.PhysicsOptions;
import org.convgrid.engine.state.BirthAbundances;
import org.convgrid.engine.state.Composition;
import org.convgrid.engine.units.Constants;
import org.junit.jupiter.api.Test;

/**
 * The main-sequence merge of a central convective zone with the envelope ({@link LifeEvents#coreEnvelopeMerge()}):
 * found just above the fully convective limit, where van Saders &amp; Pinsonneault 2012 (arXiv:1201.5381, abstract)
 * report that out-of-equilibrium 3He burning grows a core "until it touches the surface convection zone", and not
 * where a core simply recedes.
 */
class CoreEnvelopeMergeTest {

    private static final double GYR = 1.0e9 * Constants.YEAR;

    /** The life events of a star evolved from birth to 4 Gyr, where a grid whose oldest age is 4 Gyr stops it. */
    private static LifeEvents eventsTo4Gyr(double massMsun) {
        double z = 0.02;
        double y = 0.2471 + 1.5 * z;
        Composition birth = BirthAbundances.of(1.0 - y - z, z);
        var physics = StandardPhysics.create(new PhysicsOptions(1.8, 0.0, StabilityCriterion.SCHWARZSCHILD, 1.0),
                birth);
        MainSequenceEvolver.Settings d = MainSequenceEvolver.Settings.DEFAULT;
        var to4Gyr = new MainSequenceEvolver.Settings(d.maxCentralHydrogenChange(), d.exhaustionFraction(),
                d.maxLuminosityChange(), d.maxGrowth(), d.endCentralHydrogen(), 4.0 * GYR, d.stepBudget(),
                d.retryBudget());
        return new BirthEvolution(physics, to4Gyr).evolve(massMsun * Constants.M_SUN, birth,
                new double[] {4.0 * GYR}).events();
    }

    @Test
    void aStarJustAboveTheFullyConvectiveLimitHasItsCoreJoinTheEnvelope() {
        // 0.35 Msun, Z = 0.02 (our limit there 0.32-0.34 Msun): the core grows and joins the envelope at 2.7-3.5
        // Gyr as the step history goes (the requested ages shape it; every step under 3.1 Myr gives 2.7 Gyr: README,
        // Limits, in detail): the age is the steps', the event is the star's
        LifeEvents events = eventsTo4Gyr(0.35);
        assertThat(events.coreEnvelopeMerge()).isGreaterThan(events.zeroAgeMainSequence())
                .isGreaterThan(1.0 * GYR).isLessThanOrEqualTo(4.0 * GYR);
    }

    @Test
    void aMergeBeforeTheZeroAgeMainSequenceIsNotThisEvent() {
        // 0.31 Msun, Z = 0.02: the core it grows while contracting joins the envelope at ~233 Myr, before its ZAMS
        // (~315 Myr), and the star stays fully convective: that is the radiative core's end, not a main-sequence merge
        LifeEvents events = eventsTo4Gyr(0.31);
        assertThat(events.radiativeCoreEnd()).isLessThan(events.zeroAgeMainSequence());
        assertThat(events.coreEnvelopeMerge()).isNaN();
    }

    @Test
    void aCoreThatRecedesDoesNotMerge() {
        // 0.5 Msun, Z = 0.02: its 3He-driven core shrinks away by ~1.1 Gyr under a deep radiative zone
        LifeEvents events = eventsTo4Gyr(0.5);
        assertThat(events.convectiveCoreEnd()).isLessThan(2.0 * GYR);
        assertThat(events.coreEnvelopeMerge()).isNaN();
    }
}
