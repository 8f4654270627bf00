package org.convgrid.grids.yaml;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.catchThrowableOfType;

import java.nio.charset.StandardCharsets;
import java.util.List;
import org.convgrid.engine.error.ErrorKind;
import org.convgrid.grids.GridFileException;
import org.convgrid.grids.GridProblem;
import org.convgrid.grids.GridProblemKind;
import org.junit.jupiter.api.Test;

/** Every problem of a file comes back at once, each at its 1-based line and column. */
class GridFileProblemsTest {

    private final GridFileReader reader = new GridFileReader();

    @Test
    void reportsEveryProblemWithLineAndColumn() {
        String text = """
                title: Broken
                mass:
                  from: 2.0
                  to: 1.0
                  step: -0.1
                metallicity:
                  z: [0.02, 0.12]
                  helium: {primordial: 0.25, enrichment: 1.5}
                physics:
                  mixing_length: 0
                  overshoot: -0.1
                  criterion: sideways
                  colour: blue
                output:
                  profiles: "yes"
                """;
        List<GridProblem> problems = problems(text);
        assertThat(problems).extracting(p -> p.line() + ":" + p.column()).containsExactly(
                "3:9", "5:9", "7:13", "10:18", "11:14", "12:14", "13:3", "15:13");
        assertThat(problems).extracting(GridProblem::kind).containsExactly(GridProblemKind.OUT_OF_RANGE,
                GridProblemKind.OUT_OF_RANGE, GridProblemKind.OUT_OF_RANGE, GridProblemKind.OUT_OF_RANGE,
                GridProblemKind.OUT_OF_RANGE, GridProblemKind.UNKNOWN_CHOICE, GridProblemKind.UNKNOWN_KEY,
                GridProblemKind.WRONG_TYPE);
        assertThat(problems).allSatisfy(p -> assertThat(p.file()).isEqualTo("broken.yaml"));
    }

    @Test
    void duplicateAndUnknownKeysAndMissingSections() {
        List<GridProblem> problems = problems("""
                mass: {values: [0.5, 0.5, 301]}
                mass: {values: [1]}
                ages: {gyr: 1}
                """);
        assertThat(problems).extracting(p -> p.line() + ":" + p.column() + " " + p.kind()).containsExactly(
                "1:1 MISSING_KEY", "1:22 DUPLICATE", "1:27 OUT_OF_RANGE", "2:1 DUPLICATE", "3:1 UNKNOWN_KEY");
    }

    @Test
    void compositionWithoutHydrogenIsRejected() {
        List<GridProblem> problems = problems("""
                mass: {values: [1]}
                metallicity:
                  z: [0.02, 0.05]
                  y: [0.5, 0.96]
                """);
        assertThat(problems).singleElement().satisfies(p -> {
            assertThat(p.line()).isEqualTo(4);
            assertThat(p.column()).isEqualTo(12);
            assertThat(p.kind()).isEqualTo(GridProblemKind.OUT_OF_RANGE);
        });
    }

    @Test
    void mismatchedHeliumListAndBothHeliumForms() {
        assertThat(problems("mass: {values: [1]}\nmetallicity: {z: [0.01, 0.02], y: [0.27]}\n"))
                .singleElement().extracting(GridProblem::kind).isEqualTo(GridProblemKind.CONFLICT);
        assertThat(problems("mass: {values: [1]}\nmetallicity: {z: 0.01, y: 0.27, helium: {primordial: 0.25,"
                + " enrichment: 1}}\n")).singleElement().extracting(GridProblem::kind)
                .isEqualTo(GridProblemKind.CONFLICT);
    }

    @Test
    void wrongTypesEmptyAxesAndBadCounts() {
        List<GridProblem> problems = problems("""
                mass: {from: 0.1, to: 1, count: 0}
                metallicity: {z: [], y: 0.27}
                age: {gyr: [3, 1, 25]}
                physics: [1.8]
                """);
        assertThat(problems).extracting(p -> p.line() + " " + p.kind()).containsExactly("1 OUT_OF_RANGE",
                "2 WRONG_TYPE", "3 OUT_OF_RANGE", "3 OUT_OF_RANGE", "4 WRONG_TYPE");
    }

    @Test
    void yamlSyntaxErrorCarriesItsPosition() {
        List<GridProblem> problems = problems("mass:\n  from: [0.1, 0.2\nmetallicity: {z: 0.02}\n");
        assertThat(problems).singleElement().satisfies(p -> {
            assertThat(p.kind()).isEqualTo(GridProblemKind.SYNTAX);
            assertThat(p.line()).isEqualTo(3);
            assertThat(p.column()).isEqualTo(12);
        });
    }

    @Test
    void emptyFileAndNonUtf8() {
        assertThat(problems("# nothing\n")).singleElement().extracting(GridProblem::kind)
                .isEqualTo(GridProblemKind.MISSING_KEY);
        GridFileException e = catchThrowableOfType(GridFileException.class,
                () -> reader.read("latin1.yaml", "title: caf\u00e9".getBytes(StandardCharsets.ISO_8859_1)));
        assertThat(e.problems()).singleElement().extracting(GridProblem::kind).isEqualTo(GridProblemKind.SYNTAX);
    }

    @Test
    void exceptionMessageListsEveryProblemCompilerStyle() {
        GridFileException e = catchThrowableOfType(GridFileException.class,
                () -> reader.parse("g.yaml", "mass: 1\nmetallicity: 2\n"));
        assertThat(e.kind()).isEqualTo(ErrorKind.BAD_GRID_FILE);
        assertThat(e.problems()).extracting(GridProblem::kind).containsOnly(GridProblemKind.WRONG_TYPE);
        // one compiler-style line per problem: file:line:column: message
        assertThat(e.getMessage().lines()).hasSize(2).satisfiesExactly(l -> assertThat(l).startsWith("g.yaml:1:7: "),
                l -> assertThat(l).startsWith("g.yaml:2:14: "));
    }

    @Test
    void aRefineThatIsNoBooleanIsReportedWithTheFilesOtherProblems() {
        // 'refine: maybe' was unboxed into a NullPointerException, reported as an internal error that hid the rest
        List<GridProblem> found = problems("""
                mass: [1.0]
                metallicity: {z: [0.02]}
                transitions: {refine: maybe, tolerance_msun: -1}
                output: {profiles: perhaps}
                """);
        assertThat(found).filteredOn(p -> p.line() >= 3).extracting(GridProblem::line)
                .containsExactlyInAnyOrder(3, 3, 4);
        assertThat(found).anySatisfy(p -> assertThat(p.message()).contains("transitions refine"));
    }

    @Test
    void aListWhereASectionIsExpectedSaysWhereTheListGoes() {
        // a list is the natural first guess for masses, Z and ages: the message shows the key it goes under
        List<GridProblem> problems = problems("""
                mass: [0.3, 0.5]
                metallicity: [0.02]
                age: [10, 100]
                """);
        assertThat(problems).extracting(GridProblem::message).containsExactly(
                "mass must be a mapping of keys to values, got a list; a list of masses goes under values: "
                        + "mass: {values: [0.3, 0.5, 1.0]}",
                "metallicity must be a mapping of keys to values, got a list; a list of Z goes under z, beside its "
                        + "helium: metallicity: {z: [0.014, 0.02], helium: {primordial: 0.2471, enrichment: 1.5}} "
                        + "(or y: [...], one Y per Z)",
                "age must be a mapping of keys to values, got a list; a list of ages goes under myr or gyr: "
                        + "age: {myr: [10, 100]}");
        // a value that is neither gets no hint
        assertThat(problems("mass: 0.3\nmetallicity: {z: 0.02, y: 0.28}\n")).extracting(GridProblem::message)
                .containsExactly("mass must be a mapping of keys to values, got '0.3'");
    }

    @Test
    void valuesAlikeInChartNamesAreRefused() {
        // z: [0.02, 0.020001] and mixing_length: [1.8, 1.80001]: charts named alike overwrote each other
        List<GridProblem> problems = problems("""
                mass: {values: [1]}
                metallicity: {z: [0.02, 0.020001], y: [0.28, 0.28]}
                physics: {mixing_length: [1.8, 1.80001]}
                age: {myr: [100, 100.01]}
                """);
        assertThat(problems).extracting(GridProblem::kind).containsOnly(GridProblemKind.DUPLICATE).hasSize(3);
        // ages are named in Myr below 1 Gyr, else in Gyr: 1000.4 and 1000.5 Myr both read "1 Gyr"
        assertThat(problems("""
                mass: {values: [1]}
                metallicity: {z: [0.02], y: [0.28]}
                age: {myr: [1000.4, 1000.5]}
                """)).extracting(GridProblem::message).singleElement().asString()
                .contains("both read as 1 Gyr in chart names");
        // a grid in [Fe/H] is named by the Z it gives
        assertThat(problems("""
                mass: {values: [1]}
                metallicity: {fe_h_dex: [0.0, 0.00001], helium: {primordial: 0.2471, enrichment: 1.5}}
                """)).extracting(GridProblem::message).singleElement().asString()
                .contains("in chart names, as the Z of fe_h_dex = 0 does");
        assertThat(problems).extracting(GridProblem::message).contains("z 0.020001 reads as 0.02 in chart names and "
                + "legends, as an earlier value does (they carry 4 significant digits): make the values differ within "
                + "their first 4 digits");
        // values that differ within four digits stay
        new GridFileReader().parse("ok.yaml", """
                mass: {values: [1]}
                metallicity: {z: [0.0141, 0.0142], y: [0.28, 0.28]}
                physics: {mixing_length: [1.801, 1.802]}
                """);
    }

    private List<GridProblem> problems(String text) {
        GridFileException e = catchThrowableOfType(GridFileException.class, () -> reader.parse("broken.yaml", text));
        assertThat(e).as("expected problems in:%n%s", text).isNotNull();
        return e.problems();
    }
}
