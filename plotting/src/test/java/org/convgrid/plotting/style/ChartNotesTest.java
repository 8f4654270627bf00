package org.convgrid.plotting.style;

import static org.assertj.core.api.Assertions.assertThat;

import java.awt.Font;
import java.awt.Graphics2D;
import java.awt.image.BufferedImage;
import java.util.List;
import org.junit.jupiter.api.Test;

/** Notes right of the plot keep out of the legend: set smaller when the room under it is short. */
class ChartNotesTest {

    private static final List<String> NOTES = List.of(
            "Cores from 0.381 (Z = 0.008, 150 Myr), 0.420 (Z = 0.014, 150 Myr) Msun up: the lowest of them burn where the CNO "
                    + "cycle gives under 1 % of the energy, too cool for the CNO cycle: out-of-equilibrium burning drives them (3He on the main "
                    + "sequence, 12C before it); see the notes of transitions.csv.",
            "Each Z is drawn slightly apart at its age (lowest Z left) so that markers do not hide each other.");

    private static Graphics2D graphics() {
        return new BufferedImage(10, 10, BufferedImage.TYPE_INT_ARGB).createGraphics();
    }

    @Test
    void notesWithRoomKeepTheirSize() {
        assertThat(ChartNotes.fittingFont(graphics(), NOTES, 420, 600)).isEqualTo(ChartNotes.NOTE_FONT);
    }

    @Test
    void notesShortOfRoomAreSetSmallerUntilTheyFit() {
        Graphics2D g = graphics();
        // the demo's chart against age: ~180 px between the legend (9 entries) and the plot's lower edge
        Font font = ChartNotes.fittingFont(g, NOTES, 420, 180);
        assertThat(font.getSize()).isLessThan(ChartNotes.NOTE_FONT.getSize())
                .isGreaterThanOrEqualTo(ChartNotes.SMALLEST_NOTE_SIZE);
        var fm = g.getFontMetrics(font);
        int lines = 0;
        for (String note : NOTES) {
            lines += ChartNotes.wrap(note, fm, 420).size();
        }
        assertThat((lines - 1) * fm.getHeight() + fm.getAscent()).isLessThanOrEqualTo(180);
    }

    @Test
    void noRoomAtAllGivesTheSmallestSize() {
        assertThat(ChartNotes.fittingFont(graphics(), NOTES, 420, 20).getSize())
                .isEqualTo(ChartNotes.SMALLEST_NOTE_SIZE);
    }
}
