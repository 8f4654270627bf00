package org.convgrid.grids.yaml;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.stream.Collectors;
import java.util.stream.IntStream;
import org.convgrid.grids.GridFileException;
import org.convgrid.grids.GridProblem;
import org.convgrid.grids.GridProblemKind;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.Timeout;
import org.junit.jupiter.api.io.TempDir;

/** The limits that keep a hostile grid file from exhausting time, memory or the stack. */
class GridFileBoundsTest {

    private static final String REST = """
            metallicity: {z: [0.02], helium: {primordial: 0.2485, enrichment: 1.5}}
            """;

    @TempDir
    Path dir;

    private static GridProblem onlyProblem(String text) {
        try {
            new GridFileReader().parse("bounds.yaml", text);
        } catch (GridFileException e) {
            assertThat(e.problems()).hasSize(1);
            return e.problems().get(0);
        }
        throw new AssertionError("no problem reported");
    }

    @Test
    @Timeout(60)
    void aValuesListLongerThanTheAxisLimitIsRefusedAndTheDuplicateCheckIsNotQuadratic() {
        String many = IntStream.range(0, MassAxisReader.MAX_AXIS_POINTS + 1)
                .mapToObj(i -> Double.toString(0.1 + i * 1e-6)).collect(Collectors.joining(", "));
        GridProblem tooMany = onlyProblem("mass: {values: [" + many + "]}\n" + REST);
        assertThat(tooMany.kind()).isEqualTo(GridProblemKind.OUT_OF_RANGE);
        assertThat(tooMany.message()).contains("more than the limit of " + MassAxisReader.MAX_AXIS_POINTS);
        // the longest list allowed, with a repeat at the very end: found at once (a quadratic scan took minutes)
        String longest = IntStream.range(0, MassAxisReader.MAX_AXIS_POINTS - 1)
                .mapToObj(i -> Double.toString(0.1 + i * 1e-6)).collect(Collectors.joining(", ")) + ", 0.1";
        GridProblem repeat = onlyProblem("mass: {values: [" + longest + "]}\n" + REST);
        assertThat(repeat.kind()).isEqualTo(GridProblemKind.DUPLICATE);
    }

    @Test
    void valuesTheTablesWouldWriteAlikeAreDuplicates() {
        // 0.5 and 0.50000001 both write as 0.5 (7 significant digits): two catalogue rows a reader cannot tell
        // apart, and one transitions.csv line for two metallicities
        GridProblem mass = onlyProblem("mass: {values: [0.5, 0.50000001]}\n" + REST);
        assertThat(mass.kind()).isEqualTo(GridProblemKind.DUPLICATE);
        assertThat(mass.message()).contains("duplicate mass value 0.50000001").contains("7 significant digits");
        // values apart in the seventh digit stay distinct
        assertThat(new GridFileReader().parse("g.yaml", "mass: {values: [0.5, 0.5000001]}\n" + REST).massesMsun())
                .hasSize(2);
    }

    @Test
    void deeplyNestedYamlIsAProblemWithItsPositionNotAStackOverflow() {
        GridProblem deep = onlyProblem("title: x\nextra: " + "[".repeat(50_000) + "]".repeat(50_000) + "\n" + REST);
        assertThat(deep.kind()).isEqualTo(GridProblemKind.SYNTAX);
        // the file's own top mapping is the first level, so the bracket that goes too deep is the 64th, in column 71
        assertThat(deep.line() + ":" + deep.column()).isEqualTo("2:" + (7 + GridFileReader.MAX_NESTING_DEPTH));
        assertThat(deep.message()).contains("nested more than " + GridFileReader.MAX_NESTING_DEPTH);
    }

    @Test
    void numbersBeyondADoublesRangeAreRefusedBeforeAnyArithmetic() {
        GridProblem tiny = onlyProblem("mass: {from: 0.5, to: 1.0, step: 1e-999999999}\n" + REST);
        assertThat(tiny.message()).contains("mass step must lie between 1e-300 and 1e300");
        assertThat(tiny.line() + ":" + tiny.column()).isEqualTo("1:34");
    }

    @Test
    void aGridFileOverTheSizeLimitIsRefusedWhenItIsRead() throws Exception {
        Path big = dir.resolve("big.yaml");
        Files.writeString(big, "# pad\n".repeat(GridFileReader.MAX_FILE_BYTES / 6 + 1) + "mass: {values: [1]}\n" + REST,
                StandardCharsets.UTF_8);
        assertThatThrownBy(() -> new GridFileReader().read(big)).isInstanceOf(GridFileException.class)
                .hasMessageContaining("more than the limit of " + GridFileReader.MAX_FILE_BYTES + " bytes");
    }

    @Test
    void aDirectoryOrADeviceIsNotReadAsAGridFile() {
        assertThatThrownBy(() -> new GridFileReader().read(dir)).isInstanceOf(GridFileException.class)
                .hasMessageContaining("it is a directory, not a file");
        assertThatThrownBy(() -> new GridFileReader().read(Path.of("/dev/zero")))
                .isInstanceOf(GridFileException.class).hasMessageContaining("not a regular file");
    }
}
