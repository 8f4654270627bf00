package org.convgrid.engine.physics.opacity;

import java.util.ArrayList;
import java.util.List;
import org.convgrid.engine.state.Composition;

/**
 * Contract (finite-difference derivatives) of the OPAL tables (Iglesias &amp; Rogers 1996, ApJ 464, 943) joined to
 * the low-temperature tables of Ferguson et al. 2005 (ApJ 623, 585), away from the joins, where the slope changes by
 * design: points within 1e-3 dex of a table edge or of the end of a fade are left out, and so are points on a row of
 * the low-temperature tables (0.01 dex apart below log T 3.5), where the centred difference straddles a curvature
 * jump of the Hermite interpolant larger than the tolerance.
 */
class OpalGn93WithCoolTablesContractTest extends OpacityContractTest {

    static final OpalGn93Opacity OPACITY = OpalGn93Opacity.shipped();

    @Override
    Opacity opacity() {
        return OPACITY;
    }

    @Override
    double derivativeTolerance() {
        // C1 Hermite interpolant: the centred difference straddles curvature jumps at nodes (as for every table)
        return 2.0e-3;
    }

    @Override
    List<double[]> points() {
        List<double[]> p = new ArrayList<>();
        for (double[] q : super.points()) {
            double logT = Math.log10(q[1]);
            double logR = Math.log10(q[0]) - 3.0 * (logT - 6.0);
            Composition c = Composition.scaledSolar(q[2], q[3]);
            boolean nearJoin = OpalGn93OpacityTest.nearJoin(OPACITY, logT, logR, c, 3.25);
            for (double row : OPACITY.coolTable().logTemperatures()) {
                nearJoin |= logT < OpalGn93Opacity.BLEND_TO_LOG_T && Math.abs(logT - row) < 1e-6;
            }
            if (!nearJoin) {
                p.add(q);
            }
        }
        return p;
    }
}
