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

    @Test
    void notesTooLongForThePlotRunBelowItButEndInsideTheImage() {
        Graphics2D g = graphics();
        // a six-age chart against [Fe/H]: legend down to 640 px, plot edge at 715, image 800 px high; at 13 points
        // these notes ran past the image's lower edge, cut mid-sentence
        ChartNotes.Layout layout = ChartNotes.layout(g, NOTES, 400, 650, 715, 793);
        var fm = g.getFontMetrics(layout.font());
        assertThat(layout.font().getSize()).isBetween(ChartNotes.SMALLEST_OVERFLOW_SIZE, ChartNotes.SMALLEST_NOTE_SIZE);
        assertThat(layout.firstBaseline() - fm.getAscent()).isGreaterThanOrEqualTo(650);
        assertThat(layout.firstBaseline() + (layout.lines().size() - 1) * fm.getHeight() + fm.getDescent())
                .isLessThanOrEqualTo(793);
        assertThat(String.join(" ", layout.lines())).isEqualTo(String.join(" ", NOTES));
    }

    @Test
    void notesThatCannotFitEndWithAnEllipsisInsideTheImage() {
        Graphics2D g = graphics();
        ChartNotes.Layout layout = ChartNotes.layout(g, NOTES, 300, 700, 715, 770);
        var fm = g.getFontMetrics(layout.font());
        assertThat(layout.font().getSize()).isEqualTo(ChartNotes.SMALLEST_OVERFLOW_SIZE);
        assertThat(layout.firstBaseline() + (layout.lines().size() - 1) * fm.getHeight() + fm.getDescent())
                .isLessThanOrEqualTo(770);
        String last = layout.lines().get(layout.lines().size() - 1);
        assertThat(last).endsWith(ChartNotes.CUT);
        assertThat(fm.stringWidth(last)).isLessThanOrEqualTo(300);
    }

    @Test
    void notesThatFitAboveThePlotEdgeEndOnIt() {
        Graphics2D g = graphics();
        ChartNotes.Layout layout = ChartNotes.layout(g, NOTES, 420, 300, 715, 793);
        var fm = g.getFontMetrics(layout.font());
        assertThat(layout.firstBaseline() + (layout.lines().size() - 1) * fm.getHeight()).isEqualTo(715);
        assertThat(layout.lines()).noneMatch(line -> line.endsWith(ChartNotes.CUT));
    }

    @Test
    void noRoomForOneLineDrawsNone() {
        assertThat(ChartNotes.layout(graphics(), NOTES, 300, 780, 715, 790).lines()).isEmpty();
    }
}
