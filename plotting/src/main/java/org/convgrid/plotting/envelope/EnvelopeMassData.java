package org.convgrid.plotting.envelope;

import java.util.List;
import org.convgrid.plotting.label.PhysicsKey;

/**
 * Everything an envelope-mass chart of one metallicity and physics shows.
 *
 * @param physics the physics of every model shown
 * @param zInit the metallicity of every model shown
 * @param ages every grid age of this physics, Gyr, increasing: an age's place here picks its colour and marker, so
 *     that an age looks the same on the charts of every Z (and on the turnover charts)
 * @param lines one line per age that has a model to show, youngest first
 * @param withoutEnvelope grid models of this metallicity and physics with status ok and no convective envelope (hot
 *     stars): not drawn, so a line stops at the hottest star that has one
 * @param pastMainSequence grid models of this metallicity and physics past the main sequence at their age: not drawn
 *     either, so a line may stop short of the highest masses for that reason instead
 */
public record EnvelopeMassData(PhysicsKey physics, double zInit, List<Double> ages, List<AgeLine> lines,
                               long withoutEnvelope, long pastMainSequence) {

    public EnvelopeMassData {
        ages = List.copyOf(ages);
        lines = List.copyOf(lines);
    }

    /** How many models the chart shows (over every age). */
    public int modelCount() {
        return lines.stream().mapToInt(l -> l.points().size()).sum();
    }

    /**
     * The models of one age, by increasing mass.
     *
     * @param ageGyr the age, Gyr
     * @param points its models with a convective envelope, increasing mass
     */
    public record AgeLine(double ageGyr, List<EnvelopePoint> points) {
        public AgeLine {
            points = List.copyOf(points);
        }
    }
}
