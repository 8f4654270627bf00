package org.convgrid.plotting.hr;

import static org.assertj.core.api.Assertions.assertThat;

import java.awt.Dimension;
import java.util.ArrayList;
import java.util.List;
import org.convgrid.engine.convection.StructureClass;
import org.junit.jupiter.api.Test;

/**
 * Where an isochrone's age label goes: where it stands apart from the other ages' isochrones. Made-up lines on a
 * plot of 1000 px per dex of log Teff and 100 per dex of log L (shapes only, nothing under test); the young family
 * merges at its hot end and fans out at its cool end, as a grid's 1-200 Myr isochrones did.
 */
class AgeLabelAnchorTest {

    private static final AgeLabelAnchor.Scale SCALE = new AgeLabelAnchor.Scale(1000, 100);
    private static final Dimension LABEL = new Dimension(80, 25);

    /** Five masses from a shared hot end (log L 2) down to a cool end that lies 0.5 dex lower for each older age. */
    private static List<HrDiagramData.ZeroAgeLine> fanningAtTheCoolEnd(int ages) {
        List<HrDiagramData.ZeroAgeLine> lines = new ArrayList<>();
        for (int a = 0; a < ages; a++) {
            List<HrPoint> points = new ArrayList<>();
            for (int m = 0; m < 5; m++) {
                double share = m / 4.0;
                double coolL = -1.0 - 0.5 * a;
                points.add(new HrPoint("m" + m + "a" + a, 0.1 + share * 2.9, 0.02, 0.001 * (a + 1),
                        3.5 + 0.5 * share, coolL + (2.0 - coolL) * share, StructureClass.CONV_ENVELOPE));
            }
            lines.add(new HrDiagramData.ZeroAgeLine(0.02, 0.001 * (a + 1), points));
        }
        return lines;
    }

    @Test
    void youngIsochronesAreLabelledAtTheirCoolEnds() {
        List<HrDiagramData.ZeroAgeLine> lines = fanningAtTheCoolEnd(6);
        for (HrDiagramData.ZeroAgeLine line : lines) {
            HrPoint anchor = AgeLabelAnchor.of(line, lines, SCALE, LABEL);
            assertThat(anchor.massMsun()).as("age %s", line.age()).isEqualTo(0.1);
            assertThat(AgeLabelAnchor.atLowMassEnd(anchor, line)).isTrue();
        }
    }

    @Test
    void coolEndsThatMeetSendTheLabelToTheHotEnd() {
        // two ages that share their cool end (2 px apart, as the demo's 150 and 600 Myr at 0.2 Msun) and part at
        // the hot end, 1 dex apart there
        List<HrPoint> young = List.of(new HrPoint("y0", 0.2, 0.02, 0.15, 3.5, -2.3, StructureClass.FULLY_CONVECTIVE),
                new HrPoint("y1", 2.0, 0.02, 0.15, 3.95, 1.3, StructureClass.CONV_CORE));
        List<HrPoint> old = List.of(new HrPoint("o0", 0.2, 0.02, 0.6, 3.499, -2.31, StructureClass.FULLY_CONVECTIVE),
                new HrPoint("o1", 2.0, 0.02, 0.6, 3.9, 0.3, StructureClass.CONV_CORE));
        List<HrDiagramData.ZeroAgeLine> lines = List.of(new HrDiagramData.ZeroAgeLine(0.02, 0.15, young),
                new HrDiagramData.ZeroAgeLine(0.02, 0.6, old));
        HrPoint anchor = AgeLabelAnchor.of(lines.get(1), lines, SCALE, LABEL);
        assertThat(anchor.modelId()).isEqualTo("o1");
        assertThat(AgeLabelAnchor.atHighMassEnd(anchor, lines.get(1))).isTrue();
    }

    @Test
    void aLineThroughTheRoomRightOfTheCoolEndKeepsTheLabelAway() {
        // the other age's line runs right through where the label would go, 5 px below the end
        List<HrPoint> mine = List.of(new HrPoint("a0", 0.1, 0.02, 0.01, 3.5, -2.0, StructureClass.FULLY_CONVECTIVE),
                new HrPoint("a1", 1.0, 0.02, 0.01, 3.8, 1.0, StructureClass.CONV_ENVELOPE));
        List<HrPoint> crossing = List.of(
                new HrPoint("c0", 0.1, 0.02, 0.03, 3.4, -2.05, StructureClass.FULLY_CONVECTIVE),
                new HrPoint("c1", 1.0, 0.02, 0.03, 3.6, -2.05, StructureClass.CONV_ENVELOPE));
        HrDiagramData.ZeroAgeLine line = new HrDiagramData.ZeroAgeLine(0.02, 0.01, mine);
        assertThat(AgeLabelAnchor.roomRightIsFree(mine.get(0),
                List.of(new HrDiagramData.ZeroAgeLine(0.02, 0.03, crossing)), SCALE, LABEL)).isFalse();
        assertThat(AgeLabelAnchor.of(line, List.of(line, new HrDiagramData.ZeroAgeLine(0.02, 0.03, crossing)), SCALE,
                LABEL).modelId()).isEqualTo("a1");
    }
}
