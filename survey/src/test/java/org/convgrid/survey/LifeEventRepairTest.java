package org.convgrid.survey;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.nio.file.Files;
import java.nio.file.Path;
import org.convgrid.engine.birth.LifeEvents;
import org.convgrid.engine.request.ModelRequest;
import org.convgrid.engine.request.OvershootScheme;
import org.convgrid.engine.request.PhysicsOptions;
import org.convgrid.engine.units.Constants;
import org.convgrid.output.IronAbundance;
import org.convgrid.output.OutputFormatException;
import org.convgrid.output.events.LifeEventReader;
import org.convgrid.output.events.LifeEventRow;
import org.convgrid.output.events.LifeEventWriter;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * life_events.csv after a disk filled briefly: the first append created the file but wrote
 * nothing, later appends saw it existed and skipped the header, and every resume and plot then failed with an
 * internal error. The header is decided by the content; a headerless table of today's rows gets it back; anything
 * else is a damaged file, named.
 */
class LifeEventRepairTest {

    private static final double MYR = 1.0e6 * Constants.YEAR;

    @TempDir
    Path dir;

    private static LifeEventRow star(String id) {
        ModelRequest first = new ModelRequest(id + "-a00", Constants.M_SUN, 0.02, 0.28, 0.0, PhysicsOptions.DEFAULT);
        return LifeEventRow.of(id, first, new LifeEvents(1.0 * MYR, Double.NaN, 30.0 * MYR, Double.NaN, Double.NaN,
                Double.NaN, Double.NaN, Double.NaN, Double.NaN), 300.0 * MYR);
    }

    @Test
    void anEmptyTableLeftByAFailedFirstAppendGetsItsHeader() throws Exception {
        Path file = Files.createFile(dir.resolve("life_events.csv"));
        new LifeEventLog(file, IronAbundance.DEFAULT).append(star("p0-z00-m000"));
        assertThat(Files.readAllLines(file).get(0)).isEqualTo(LifeEventWriter.header().strip());
        assertThat(LifeEventReader.read(file)).extracting(LifeEventRow::trackId).containsExactly("p0-z00-m000");
    }

    /**
     * Repaired on its own (as a resume does before it reads the table), an empty table or one whose header was cut
     * short gets the header and reads as a table of no rows (the resume had stopped on it as "damaged").
     */
    @Test
    void anEmptyOrCutHeaderTableIsRepairedToAReadableEmptyTable() throws Exception {
        Path empty = Files.createFile(dir.resolve("empty.csv"));
        Path cut = dir.resolve("cut.csv");
        Files.writeString(cut, LifeEventWriter.header().substring(0, 40));
        for (Path file : new Path[] {empty, cut}) {
            LifeEventLog.repair(file, IronAbundance.DEFAULT);
            assertThat(Files.readString(file)).isEqualTo(LifeEventWriter.header());
            assertThat(LifeEventReader.read(file)).isEmpty();
        }
    }

    @Test
    void aHeaderlessTableIsRebuiltAndKeepsItsRowsOnAppendAndOnTidy() throws Exception {
        Path file = dir.resolve("life_events.csv");
        Files.writeString(file, LifeEventWriter.line(star("p0-z00-m001"), IronAbundance.DEFAULT)
                + LifeEventWriter.line(star("p0-z00-m000"), IronAbundance.DEFAULT));
        new LifeEventLog(file, IronAbundance.DEFAULT).append(star("p0-z00-m002"));
        assertThat(LifeEventReader.read(file)).extracting(LifeEventRow::trackId)
                .containsExactly("p0-z00-m001", "p0-z00-m000", "p0-z00-m002");

        Path other = dir.resolve("other.csv");
        Files.writeString(other, LifeEventWriter.line(star("p0-z00-m001"), IronAbundance.DEFAULT)
                + LifeEventWriter.line(star("p0-z00-m000"), IronAbundance.DEFAULT));
        LifeEventLog.tidy(other, OvershootScheme.STEP, IronAbundance.DEFAULT);
        assertThat(LifeEventReader.read(other)).extracting(LifeEventRow::trackId)
                .containsExactly("p0-z00-m000", "p0-z00-m001");
    }

    @Test
    void aRowCutShortByAFullDiskIsDroppedBeforeTheNextAppend() throws Exception {
        Path file = dir.resolve("life_events.csv");
        String whole = LifeEventWriter.header() + LifeEventWriter.line(star("p0-z00-m000"), IronAbundance.DEFAULT);
        Files.writeString(file, whole + "p0-z00-m001,1.0,0.0");
        new LifeEventLog(file, IronAbundance.DEFAULT).append(star("p0-z00-m002"));
        assertThat(Files.readString(file)).startsWith(whole);
        assertThat(LifeEventReader.read(file)).extracting(LifeEventRow::trackId)
                .containsExactly("p0-z00-m000", "p0-z00-m002");
    }

    @Test
    void aHeaderlessTableOfOtherLinesIsADamagedFileNamedWithItsLine() throws Exception {
        Path file = dir.resolve("life_events.csv");
        Files.writeString(file, LifeEventWriter.line(star("p0-z00-m000"), IronAbundance.DEFAULT) + "garbage,,\n");
        assertThatThrownBy(() -> LifeEventLog.repair(file, IronAbundance.DEFAULT))
                .isInstanceOf(OutputFormatException.class)
                .hasMessageContaining(file.toString()).hasMessageContaining("no header line")
                .hasMessageContaining("line 2 has 3 cells");
        assertThatThrownBy(() -> LifeEventReader.read(file)).isInstanceOf(OutputFormatException.class)
                .hasMessageContaining(file.toString()).hasMessageContaining("first line is not the column names");
    }
}
