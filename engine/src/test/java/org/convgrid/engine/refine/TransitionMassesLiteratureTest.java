package org.convgrid.engine.refine;

import static org.assertj.core.api.Assertions.assertThat;

import org.convgrid.engine.request.ModelOutcome;
import org.convgrid.engine.request.ModelRequest;
import org.convgrid.engine.request.ModelStatus;
import org.convgrid.engine.request.PhysicsOptions;
import org.convgrid.engine.convection.StructureClass;
import org.convgrid.engine.units.Constants;
import org.junit.jupiter.api.Test;

/**
 * The two convective transitions of the zero-age main sequence at Z = 0.02 with the standard physics lie inside
 * the published ranges: each range's ends are solved and must fall on opposite sides of the transition, so the
 * transition mass is inside the range whatever its exact value (the refined values are in the README).
 */
class TransitionMassesLiteratureTest {

    private static final double Z = 0.02;
    private static final double Y = 0.2471 + 1.5 * Z;
    private static final double CORE_THRESHOLD = 1.0e-4;

    private final MassLine line = new ZamsMassLines().open(PhysicsOptions.DEFAULT, Z, Y);

    private ModelOutcome solve(double mass) {
        ModelOutcome o = line.solve(new ModelRequest("t", mass * Constants.M_SUN, Z, Y, 0.0, PhysicsOptions.DEFAULT));
        assertThat(o.status()).as("%s Msun: %s", mass, o.statusDetail()).isEqualTo(ModelStatus.OK);
        return o;
    }

    @Test
    void fullyConvectiveLimitLiesBetweenPointTwoEightAndPointFourTwoSolarMasses() {
        // Chabrier & Baraffe 1997 (A&A 327, 1039) and van Saders & Pinsonneault 2012 (ApJ 751, 98): stars below
        // ~0.35 Msun are fully convective; the accepted range 0.28-0.42 Msun (measured: 0.3388)
        assertThat(solve(0.28).solved().convection().structureClass()).isEqualTo(StructureClass.FULLY_CONVECTIVE);
        assertThat(solve(0.42).solved().convection().structureClass()).isNotEqualTo(StructureClass.FULLY_CONVECTIVE);
    }

    @Test
    void zeroAgeFullyConvectiveLimitAtSolarMetallicityIsFrozen() {
        // NON-REGRESSION: the refined zero-age limit at Z = 0.02 (grids/transition-reference.yaml, tolerance 0.002
        // Msun) is 0.3388 Msun, ~0.01 below the published ~0.35 (Chabrier & Baraffe 1997, A&A 327, 1039). It was
        // 0.3675, ~0.02 above, while the analytic cool opacity (0.3-0.5 dex under the low-temperature tables of
        // Ferguson et al. 2005) made M-dwarf surfaces hotter; with those tables as the default it moved to 0.3388.
        // Its centres were not the cause: at Z = 0.02 our centre physics reproduces the published radiative-core
        // onset of contracting 0.7 and 1 Msun stars (birth RadiativeCoreOnsetCentreTest). 0.336 and 0.342 Msun
        // bracket it; a physics change that moves the limit by more than ~0.003 Msun fails here and is re-frozen on
        // purpose. Frozen from our own run, last set 2026-12-02 (commit f6d99c0).
        assertThat(solve(0.336).solved().convection().structureClass()).isEqualTo(StructureClass.FULLY_CONVECTIVE);
        assertThat(solve(0.342).solved().convection().structureClass()).isNotEqualTo(StructureClass.FULLY_CONVECTIVE);
    }

    @Test
    void lastingConvectiveCoreAppearsBetweenOneAndOnePointThreeFiveSolarMasses() {
        // Woo & Demarque 2001 (AJ 122, 1602): at solar Z a convective core appears between ~1.1 and 1.2 Msun;
        // the accepted range 1.0-1.35 Msun (measured: 1.14, above the 3He-driven cores just over the fully
        // convective limit, which end by 0.45 Msun at this Z)
        assertThat(solve(1.0).solved().convection().coreMassFraction()).isLessThanOrEqualTo(CORE_THRESHOLD);
        assertThat(solve(1.35).solved().convection().coreMassFraction()).isGreaterThan(CORE_THRESHOLD);
    }
}
