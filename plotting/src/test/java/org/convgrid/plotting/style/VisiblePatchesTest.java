package org.convgrid.plotting.style;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;

/** Which shaded patches a legend may list (layout only, no physics): the cases seen in the demo's charts. */
class VisiblePatchesTest {

    private static final double PX_Y = 1.0 / NominalPlot.HEIGHT_PX;
    private static final double PX_X = 1.0 / NominalPlot.WIDTH_PX;

    @Test
    void aLongLineOfAPixelAndAHalfShows() {
        // a shell under the surface across several model columns, 1.9 pixels tall
        assertThat(VisiblePatches.anyVisible(List.of(new VisiblePatches.Patch(0.8, 0.9, 0.99, 0.99 + 1.9 * PX_Y)),
                VisiblePatches.BORDER_PX)).isTrue();
        assertThat(VisiblePatches.anyVisible(List.of(new VisiblePatches.Patch(0.8, 0.9, 0.5, 0.5 + PX_Y)),
                VisiblePatches.BORDER_PX)).isFalse();
    }

    @Test
    void aTallZoneInAColumnTwoPixelsWideDoesNotShowButNeighboursAddUp() {
        // a refinement model's column (0.002 Msun wide) with a small central zone 28 pixels tall
        VisiblePatches.Patch narrow = new VisiblePatches.Patch(0.3, 0.3 + 2 * PX_X, 0.0, 28 * PX_Y);
        assertThat(VisiblePatches.anyVisible(List.of(narrow), VisiblePatches.BORDER_PX)).isFalse();
        // its neighbour's column, touching it and sharing height, makes one 4-pixel patch
        VisiblePatches.Patch next = new VisiblePatches.Patch(0.3 + 2 * PX_X, 0.3 + 4 * PX_X, 0.0, 20 * PX_Y);
        assertThat(VisiblePatches.anyVisible(List.of(next, narrow), VisiblePatches.BORDER_PX)).isTrue();
        // slivers apart from each other do not add up
        VisiblePatches.Patch apart = new VisiblePatches.Patch(0.5, 0.5 + 2 * PX_X, 0.0, 20 * PX_Y);
        assertThat(VisiblePatches.anyVisible(List.of(narrow, apart), VisiblePatches.BORDER_PX)).isFalse();
    }

    @Test
    void aZoneAtTheAxisEndLosesWhatIsDrawnOverIt() {
        // the demo's 1 Msun track, Z = 0.008: a core up to m/M 0.067 is 0.030 of the 0-7 depth axis for 5 Myr
        double top = -Math.log10(1 - 0.067) / 7.0;
        List<VisiblePatches.Patch> core = new ArrayList<>();
        core.add(new VisiblePatches.Patch(0.70, 0.72, 0.0, top));
        assertThat(top * NominalPlot.HEIGHT_PX).isBetween(2.5, 3.0);
        // under the border and the burning region's 2-pixel outline: not seen
        assertThat(VisiblePatches.anyVisible(core, VisiblePatches.BORDER_PX + 2.0)).isFalse();
        // the same height away from the axis's end shows
        assertThat(VisiblePatches.anyVisible(List.of(new VisiblePatches.Patch(0.70, 0.72, 0.5, 0.5 + top)),
                VisiblePatches.BORDER_PX + 2.0)).isTrue();
    }
}
