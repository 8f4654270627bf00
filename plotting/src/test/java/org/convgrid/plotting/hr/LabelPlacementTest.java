package org.convgrid.plotting.hr;

import static org.assertj.core.api.Assertions.assertThat;

import java.awt.geom.Rectangle2D;
import java.util.List;
import org.junit.jupiter.api.Test;

/** Where the HR diagram's age labels go (layout only, no physics). */
class LabelPlacementTest {

    private static final Rectangle2D PLOT = new Rectangle2D.Double(100, 100, 600, 600);

    @Test
    void aLabelGoesRightOfItsPointWhenThatIsFree() {
        List<Rectangle2D> boxes = LabelPlacement.place(List.of(new LabelPlacement.Wanted(300, 300, 60, 20)),
                List.of(), PLOT);
        assertThat(boxes.get(0)).isEqualTo(new Rectangle2D.Double(310, 290, 60, 20));
    }

    @Test
    void ageLabelsNeverCoverAMassLabelAMarkerOrEachOther() {
        // the demo's crowded bright end: three isochrones ending within a few pixels, a mass label left of them and
        // the markers of the other metallicities right of them
        Rectangle2D massLabel = new Rectangle2D.Double(215, 295, 45, 25);
        List<Rectangle2D> taken = List.of(massLabel, new Rectangle2D.Double(306, 284, 13, 13),
                new Rectangle2D.Double(330, 300, 13, 13), new Rectangle2D.Double(312, 262, 13, 13));
        List<LabelPlacement.Wanted> wanted = List.of(new LabelPlacement.Wanted(300, 290, 70, 25),
                new LabelPlacement.Wanted(302, 300, 70, 25), new LabelPlacement.Wanted(298, 310, 60, 25));
        List<Rectangle2D> boxes = LabelPlacement.place(wanted, taken, PLOT);
        for (int i = 0; i < boxes.size(); i++) {
            Rectangle2D box = boxes.get(i);
            assertThat(PLOT.contains(box)).isTrue();
            assertThat(taken).noneMatch(box::intersects);
            for (int j = 0; j < i; j++) {
                assertThat(box.intersects(boxes.get(j))).as("labels %d and %d", i, j).isFalse();
            }
        }
    }

    @Test
    void aLabelStaysInsideThePlot() {
        // a point at the plot's right edge: the label goes to its left
        Rectangle2D box = LabelPlacement.place(List.of(new LabelPlacement.Wanted(695, 400, 60, 20)), List.of(), PLOT)
                .get(0);
        assertThat(PLOT.contains(box)).isTrue();
        assertThat(box.getMaxX()).isLessThan(695);
    }
}
