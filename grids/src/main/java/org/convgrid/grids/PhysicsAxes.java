package org.convgrid.grids;

import java.util.ArrayList;
import java.util.List;
import org.convgrid.engine.convection.StabilityCriterion;
import org.convgrid.engine.physics.atmosphere.AtmosphereChoice;
import org.convgrid.engine.request.OpacityChoice;
import org.convgrid.engine.request.OvershootScheme;
import org.convgrid.engine.request.PhysicsOptions;

/**
 * The physics options a grid varies; each is a list of one or more values. Their product is the physics axis of the
 * grid, enumerated with mixing length outermost, then overshoot, criterion and opacity factor innermost.
 *
 * @param mixingLengths alpha values, pressure scale heights, each &gt; 0
 * @param overshoots overshoot parameters, each &gt;= 0: alpha_ov (pressure scale heights) for the step scheme, f for
 *                   the exponential one
 * @param criteria stability criteria
 * @param opacityScales opacity multipliers, each &gt; 0
 * @param opacity the built-in opacity or a user table (read once, its path resolved against the grid file's
 *                folder)
 * @param atmosphere the grey T(tau) relation of the surface boundary (one value for the whole grid)
 * @param overshootScheme step or exponential overshoot (one value for the whole grid)
 */
public record PhysicsAxes(List<Double> mixingLengths, List<Double> overshoots, List<StabilityCriterion> criteria,
                          List<Double> opacityScales, OpacityChoice opacity, AtmosphereChoice atmosphere,
                          OvershootScheme overshootScheme) {

    /** Axes with step overshoot. */
    public PhysicsAxes(List<Double> mixingLengths, List<Double> overshoots, List<StabilityCriterion> criteria,
                       List<Double> opacityScales, OpacityChoice opacity, AtmosphereChoice atmosphere) {
        this(mixingLengths, overshoots, criteria, opacityScales, opacity, atmosphere, OvershootScheme.STEP);
    }

    /** Axes with the default atmosphere. */
    public PhysicsAxes(List<Double> mixingLengths, List<Double> overshoots, List<StabilityCriterion> criteria,
                       List<Double> opacityScales, OpacityChoice opacity) {
        this(mixingLengths, overshoots, criteria, opacityScales, opacity, AtmosphereChoice.DEFAULT);
    }

    /** Axes with the built-in opacity. */
    public PhysicsAxes(List<Double> mixingLengths, List<Double> overshoots, List<StabilityCriterion> criteria,
                       List<Double> opacityScales) {
        this(mixingLengths, overshoots, criteria, opacityScales, OpacityChoice.BUILT_IN);
    }

    /** One value per axis: the engine defaults. */
    public static final PhysicsAxes DEFAULT = new PhysicsAxes(List.of(PhysicsOptions.DEFAULT.mixingLength()),
            List.of(PhysicsOptions.DEFAULT.overshoot()), List.of(PhysicsOptions.DEFAULT.criterion()),
            List.of(PhysicsOptions.DEFAULT.opacityScale()));

    public PhysicsAxes {
        mixingLengths = nonEmpty(mixingLengths, "mixing_length");
        overshoots = nonEmpty(overshoots, "overshoot");
        criteria = nonEmpty(criteria, "criterion");
        opacityScales = nonEmpty(opacityScales, "opacity_scale");
        if (overshootScheme == null) {
            throw new IllegalArgumentException("the overshoot profile must not be null");
        }
        if (opacity == null) {
            throw new IllegalArgumentException("opacity must not be null");
        }
    }

    /** The path of the user opacity table; empty for the built-in opacity. */
    public String opacityTable() {
        return opacity.source();
    }

    /** Number of physics combinations. */
    public int size() {
        return mixingLengths.size() * overshoots.size() * criteria.size() * opacityScales.size();
    }

    /** Every combination, in the documented order; index i of this list is the {@code p} index of model ids. */
    public List<PhysicsOptions> combinations() {
        List<PhysicsOptions> all = new ArrayList<>(size());
        for (double alpha : mixingLengths) {
            for (double overshoot : overshoots) {
                for (StabilityCriterion criterion : criteria) {
                    for (double factor : opacityScales) {
                        all.add(new PhysicsOptions(alpha, overshoot, criterion, factor, opacity, atmosphere,
                                overshootScheme));
                    }
                }
            }
        }
        return List.copyOf(all);
    }

    private static <T> List<T> nonEmpty(List<T> values, String name) {
        if (values.isEmpty()) {
            throw new IllegalArgumentException(name + " needs at least one value");
        }
        return List.copyOf(values);
    }
}
