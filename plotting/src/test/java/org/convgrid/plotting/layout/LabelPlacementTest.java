package org.convgrid.plotting.layout;

import static org.assertj.core.api.Assertions.assertThat;

import java.awt.geom.Line2D;
import java.awt.geom.Rectangle2D;
import java.util.List;
import org.junit.jupiter.api.Test;

/** Where chart labels go (layout only, no physics). */
class LabelPlacementTest {

    private static final Rectangle2D PLOT = new Rectangle2D.Double(100, 100, 600, 600);

    @Test
    void aLabelThatMustNameOneOfSeveralNearbyMarkersAlwaysGetsALeader() {
        // an HR diagram's mass label: a model of each other Z lies a few pixels away, so even on a free plot the
        // label sits a ring past the leader distance and points at its own model
        LabelPlacement.Placed p = LabelPlacement.place(List.of(new LabelPlacement.Wanted(300, 300, 60, 20, 6.5,
                LabelPlacement.WITH_LEADER_PX)), new Obstacles(), PLOT).get(0);
        assertThat(p.leader()).isNotNull();
        assertThat(p.leader().getP1().distance(300, 300)).isGreaterThan(LabelPlacement.LEADER_BEYOND_PX);
    }

    @Test
    void aLabelGoesRightOfItsPointWhenThatIsFree() {
        List<LabelPlacement.Placed> placed = LabelPlacement.place(List.of(new LabelPlacement.Wanted(300, 300, 60, 20,
                6)), new Obstacles(), PLOT);
        assertThat(placed.get(0).box()).isEqualTo(new Rectangle2D.Double(310, 290, 60, 20));
        assertThat(placed.get(0).leader()).isNull();
        assertThat(placed.get(0).free()).isTrue();
    }

    @Test
    void labelsNeverCoverAMarkerAnotherLabelOrEachOther() {
        // the HR diagram's crowded bright end: three isochrones ending within a few pixels, a mass label left of
        // them and the markers of the other metallicities right of them
        Obstacles taken = new Obstacles().addBox(new Rectangle2D.Double(215, 295, 45, 25))
                .addBox(new Rectangle2D.Double(306, 284, 13, 13)).addBox(new Rectangle2D.Double(330, 300, 13, 13))
                .addBox(new Rectangle2D.Double(312, 262, 13, 13));
        List<LabelPlacement.Wanted> wanted = List.of(new LabelPlacement.Wanted(300, 290, 70, 25, 6),
                new LabelPlacement.Wanted(302, 300, 70, 25, 6), new LabelPlacement.Wanted(298, 310, 60, 25, 6));
        assertClear(LabelPlacement.place(wanted, taken, PLOT), taken);
    }

    @Test
    void aLabelDoesNotSitOnALineThroughItsPoint() {
        // a marker on a line running left to right through it, with a second line just above: the first free place
        // is above or below, not on either line
        Obstacles lines = new Obstacles().addSegment(new Line2D.Double(100, 400, 700, 400))
                .addSegment(new Line2D.Double(100, 380, 700, 380)).addMarker(400, 400, 13);
        List<LabelPlacement.Placed> placed = LabelPlacement.place(List.of(new LabelPlacement.Wanted(400, 400, 60, 20,
                6.5)), lines, PLOT);
        assertClear(placed, lines);
        assertThat(placed.get(0).box().getMinY()).isGreaterThan(400);
    }

    @Test
    void aLabelThatHadToMoveFarGetsALeaderToItsMarker() {
        // a block of markers all around the point: the label lands beyond it, joined to the point by a line that
        // stops at the marker's rim
        Obstacles crowd = new Obstacles();
        for (int dx = -60; dx <= 60; dx += 15) {
            for (int dy = -45; dy <= 45; dy += 15) {
                crowd.addMarker(400 + dx, 400 + dy, 13);
            }
        }
        LabelPlacement.Placed p = LabelPlacement.place(List.of(new LabelPlacement.Wanted(400, 400, 60, 20, 6.5)),
                crowd, PLOT).get(0);
        assertClear(List.of(p), crowd);
        assertThat(p.leader()).isNotNull();
        assertThat(p.leader().getP2().distance(400, 400)).isCloseTo(LabelPlacement.LEADER_STOP_SHARE * 6.5, org.assertj.core.api.Assertions.within(1e-9));
    }

    @Test
    void aLeaderGoesRoundOtherMarkersWhenItCan() {
        // a wall of markers on the right and above and below of the point, open to the left: the label goes left,
        // its leader (if any) crossing no marker
        Obstacles wall = new Obstacles();
        for (int dy = -90; dy <= 90; dy += 15) {
            wall.addMarker(430, 400 + dy, 13);
        }
        for (int dx = -60; dx <= 30; dx += 15) {
            wall.addMarker(400 + dx, 385, 13).addMarker(400 + dx, 415, 13);
        }
        LabelPlacement.Placed p = LabelPlacement.place(List.of(new LabelPlacement.Wanted(400, 400, 60, 20, 6.5)),
                wall, PLOT).get(0);
        assertClear(List.of(p), wall);
        if (p.leader() != null) {
            assertThat(wall.boxes()).noneMatch(b -> !b.contains(400, 400) && b.intersectsLine(p.leader()));
        }
        assertThat(p.box().getMaxX()).isLessThan(400);
    }

    @Test
    void aLabelStaysInsideThePlot() {
        // a point at the plot's right edge: the label goes to its left
        Rectangle2D box = LabelPlacement.place(List.of(new LabelPlacement.Wanted(695, 400, 60, 20, 6)),
                new Obstacles(), PLOT).get(0).box();
        assertThat(PLOT.contains(box)).isTrue();
        assertThat(box.getMaxX()).isLessThan(695);
    }

    /** Every label inside the plot, free, clear of every obstacle and of every other label. */
    static void assertClear(List<LabelPlacement.Placed> placed, Obstacles obstacles) {
        for (int i = 0; i < placed.size(); i++) {
            Rectangle2D box = placed.get(i).box();
            assertThat(PLOT.contains(box)).isTrue();
            assertThat(placed.get(i).free()).isTrue();
            assertThat(obstacles.hit(box)).as("label %d covers an obstacle", i).isFalse();
            for (int j = 0; j < i; j++) {
                assertThat(box.intersects(placed.get(j).box())).as("labels %d and %d", i, j).isFalse();
            }
        }
    }
}
