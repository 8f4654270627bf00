package org.convgrid.plotting.turnover;

import java.util.List;
import org.convgrid.plotting.label.PhysicsKey;

/**
 * Everything a turnover-time chart of one metallicity and physics shows.
 *
 * @param physics the physics of every model shown
 * @param zInit the metallicity of every model shown
 * @param ages every grid age of this physics, Gyr, increasing: an age's place here picks its colour and marker, so
 *     that an age looks the same on the charts of every Z, even where it has no line
 * @param lines one line per age that has a model to show, youngest first
 * @param limits the fully convective limit of each age that has a line, where transitions.csv found one
 * @param pastMainSequence grid models of this metallicity and physics past the main sequence at their age: not drawn,
 *     so a line stops short of the highest masses
 */
public record TurnoverData(PhysicsKey physics, double zInit, List<Double> ages, List<AgeLine> lines,
                           List<FullyConvectiveLimit> limits, long pastMainSequence) {

    public TurnoverData {
        ages = List.copyOf(ages);
        lines = List.copyOf(lines);
        limits = List.copyOf(limits);
    }

    /** How many models the chart shows (over every age). */
    public int modelCount() {
        return lines.stream().mapToInt(l -> l.points().size()).sum();
    }

    /**
     * The models of one age, by increasing mass.
     *
     * @param ageGyr the age, Gyr
     * @param points its models with a turnover time, increasing mass
     */
    public record AgeLine(double ageGyr, List<TurnoverPoint> points) {
        public AgeLine {
            points = List.copyOf(points);
        }
    }

    /**
     * Where the stars of one age stop being fully convective: the structure, and with it the point where the local
     * time is taken, changes there, so the curves may jump.
     *
     * @param ageGyr the age, Gyr
     * @param massMsun the highest mass that is still fully convective, solar masses
     */
    public record FullyConvectiveLimit(double ageGyr, double massMsun) {
    }
}
