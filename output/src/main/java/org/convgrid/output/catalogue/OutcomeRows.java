package org.convgrid.output.catalogue;

import java.util.List;
import org.convgrid.engine.request.Age;
import org.convgrid.engine.request.GlobalProperties;
import org.convgrid.engine.request.ModelOutcome;
import org.convgrid.engine.request.ModelRequest;
import org.convgrid.engine.convection.ConvectiveStructure;
import org.convgrid.engine.convection.ConvectiveZone;
import org.convgrid.engine.units.Constants;
import org.convgrid.output.Span;

/**
 * Converts engine outcomes (cgs) to catalogue rows: L / L_sun, R / R_sun (IAU 2015 nominal values), masses over
 * M_sun, ages over the Julian gigayear, times over the day, log g = log10(g). Missing parts of a failed outcome
 * become "not applicable".
 */
public final class OutcomeRows {

    private OutcomeRows() {
    }

    /** The catalogue row of one outcome. */
    public static CatalogueRow toRow(ModelOutcome outcome) {
        ModelRequest request = outcome.request();
        GlobalProperties g = outcome instanceof ModelOutcome.Solved s ? s.global() : null;
        ConvectiveStructure c = outcome instanceof ModelOutcome.Solved s ? s.convection() : null;
        double nan = Double.NaN;
        List<Span> zones = c == null ? List.of() : c.zones().stream().map(OutcomeRows::span).toList();
        return new CatalogueRow(request.modelId(), request.mass() / Constants.M_SUN, request.initialMetals(),
                request.initialHelium(), request.physics().mixingLength(), request.physics().overshoot(),
                ageGyr(request.age()), outcome.status(), outcome.statusDetail(),
                g == null ? nan : g.luminosity() / Constants.L_SUN,
                g == null ? nan : g.radius() / Constants.R_SUN,
                g == null ? nan : g.effectiveTemperature(),
                g == null ? nan : Math.log10(g.surfaceGravity()),
                g == null ? nan : g.centralTemperature(),
                g == null ? nan : g.centralDensity(),
                g == null ? nan : g.centralHydrogen(),
                c == null ? null : c.structureClass(),
                c == null ? nan : c.coreMassFraction(),
                c == null ? nan : c.envelopeBaseMassFraction(),
                c == null ? nan : c.envelopeBaseRadiusFraction(),
                c == null ? nan : c.envelopeMass() / Constants.M_SUN,
                c == null ? nan : c.turnoverTimeLocal() / Constants.DAY,
                zones, outcome.solverIterations(), request.physics().criterion(),
                request.physics().opacityFactor(),
                c == null ? nan : c.turnoverTimeGlobal() / Constants.DAY);
    }

    /** Gyr since the zero-age main sequence; NaN (not applicable) for a fraction no solver resolved. */
    private static double ageGyr(Age age) {
        return age instanceof Age.SinceZeroAge since ? since.seconds() / Constants.GYR : Double.NaN;
    }

    /** A zone's mass extent, clamped into [0, 1] against round-off at the centre and surface. */
    private static Span span(ConvectiveZone zone) {
        double lo = Math.min(1.0, Math.max(0.0, zone.innerMassFraction()));
        double hi = Math.min(1.0, Math.max(lo, zone.outerMassFraction()));
        return new Span(lo, hi);
    }
}
