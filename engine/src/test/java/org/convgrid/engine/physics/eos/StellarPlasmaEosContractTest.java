package org.convgrid.engine.physics.eos;

import java.util.ArrayList;
import java.util.List;
import org.convgrid.engine.state.Composition;

class StellarPlasmaEosContractTest extends EquationOfStateContractTest {

    private static final EquationOfState EOS = new StellarPlasmaEos();

    @Override
    protected EquationOfState eos() {
        return EOS;
    }

    @Override
    protected List<Point> points() {
        Composition sun = Composition.scaledSolar(0.70, 0.02);
        List<Point> points = new ArrayList<>(super.points());
        points.add(new Point(1.0e-7, 1.2e4, sun));       // hydrogen ionisation zone
        points.add(new Point(1.0e-4, 6.0e4, sun));       // second helium ionisation zone
        points.add(new Point(1.0e-9, 5.0e3, sun));       // photosphere of a K dwarf: metals supply the electrons
        points.add(new Point(0.3, 3.0e4, sun));          // pressure-ionisation region of an M-dwarf envelope
        points.add(new Point(500.0, 4.0e6, sun));        // centre of a ~0.1 Msun star, eta ~ 4, Gamma ~ 0.4
        points.add(new Point(2.0e4, 5.0e6, sun));        // strongly degenerate
        points.add(new Point(1.0e-6, 3.0e3, sun));       // M-dwarf photosphere: H2 dissociating
        points.add(new Point(1.0e-4, 2.0e3, sun));       // mostly molecular
        points.add(new Point(1.0e-3, 6.0e3, sun));       // last molecules of a dense M-dwarf envelope
        points.add(new Point(1.0e-7, 6.0e2, sun));       // fully molecular, near the lower limit
        return points;
    }
}
