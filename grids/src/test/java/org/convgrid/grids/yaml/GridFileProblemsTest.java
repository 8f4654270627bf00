package org.convgrid.grids.yaml;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.catchThrowableOfType;

import java.nio.charset.StandardCharsets;
import java.util.List;
import org.convgrid.grids.GridFileException;
import org.convgrid.grids.GridProblem;
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
        assertThat(problems.get(0).message()).contains("from (2.0) is larger than to (1.0)");
        assertThat(problems.get(1).message()).contains("step must be > 0");
        assertThat(problems.get(2).message()).contains("z must lie in [0, 0.1)", "0.12");
        assertThat(problems.get(3).message()).contains("mixing_length");
        assertThat(problems.get(4).message()).contains("overshoot");
        assertThat(problems.get(5).message()).contains("schwarzschild or ledoux", "sideways");
        assertThat(problems.get(6).message()).contains("unknown key 'colour'");
        assertThat(problems.get(7).message()).contains("quoted");
        assertThat(problems).allSatisfy(p -> assertThat(p.file()).isEqualTo("broken.yaml"));
    }

    @Test
    void duplicateAndUnknownKeysAndMissingSections() {
        List<GridProblem> problems = problems("""
                mass: {values: [0.5, 0.5, 301]}
                mass: {values: [1]}
                ages: {gyr: 1}
                """);
        assertThat(problems).extracting(GridProblem::toString).containsExactly(
                "broken.yaml:1:1: the grid file needs a 'metallicity' section",
                "broken.yaml:1:22: duplicate mass value 0.5",
                "broken.yaml:1:27: mass value must lie in (0, 300], got 301.0",
                "broken.yaml:2:1: duplicate key 'mass' in the grid file (first given on line 1)",
                "broken.yaml:3:1: unknown key 'ages' in the grid file; allowed: title, mass, metallicity, age,"
                        + " physics, output");
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
            assertThat(p.message()).contains("leaves no hydrogen");
        });
    }

    @Test
    void mismatchedHeliumListAndBothHeliumForms() {
        assertThat(problems("mass: {values: [1]}\nmetallicity: {z: [0.01, 0.02], y: [0.27]}\n"))
                .singleElement().extracting(GridProblem::message).asString().contains("y has 1 values but z has 2");
        assertThat(problems("mass: {values: [1]}\nmetallicity: {z: 0.01, y: 0.27, helium: {primordial: 0.25,"
                + " enrichment: 1}}\n")).singleElement().extracting(GridProblem::message).asString()
                .contains("exactly one of 'helium'");
    }

    @Test
    void wrongTypesEmptyAxesAndBadCounts() {
        List<GridProblem> problems = problems("""
                mass: {from: 0.1, to: 1, count: 0}
                metallicity: {z: [], y: 0.27}
                age: {gyr: [3, 1, 25]}
                physics: [1.8]
                """);
        assertThat(problems).extracting(GridProblem::message).satisfiesExactly(
                m -> assertThat(m).contains("count must lie in [1, 100000], got 0"),
                m -> assertThat(m).contains("z must not be an empty list"),
                m -> assertThat(m).contains("ages must increase: 1.0 follows 3.0"),
                m -> assertThat(m).contains("age must lie in [0, 20], got 25.0"),
                m -> assertThat(m).contains("physics must be a mapping", "got a list"));
    }

    @Test
    void yamlSyntaxErrorCarriesItsPosition() {
        List<GridProblem> problems = problems("mass:\n  from: [0.1, 0.2\nmetallicity: {z: 0.02}\n");
        assertThat(problems).singleElement().satisfies(p -> {
            assertThat(p.message()).startsWith("YAML syntax");
            assertThat(p.line()).isEqualTo(3);
            assertThat(p.column()).isEqualTo(12);
        });
    }

    @Test
    void emptyFileAndNonUtf8() {
        assertThat(problems("# nothing\n")).singleElement().extracting(GridProblem::message).asString()
                .contains("empty");
        GridFileException e = catchThrowableOfType(GridFileException.class,
                () -> reader.read("latin1.yaml", "title: caf\u00e9".getBytes(StandardCharsets.ISO_8859_1)));
        assertThat(e.problems()).singleElement().extracting(GridProblem::message).asString().contains("UTF-8");
    }

    @Test
    void exceptionMessageListsEveryProblemCompilerStyle() {
        GridFileException e = catchThrowableOfType(GridFileException.class,
                () -> reader.parse("g.yaml", "mass: 1\nmetallicity: 2\n"));
        assertThat(e.getMessage()).contains("g.yaml:1:7: mass must be a mapping", "g.yaml:2:14: metallicity");
    }

    private List<GridProblem> problems(String text) {
        GridFileException e = catchThrowableOfType(GridFileException.class, () -> reader.parse("broken.yaml", text));
        assertThat(e).as("expected problems in:%n%s", text).isNotNull();
        return e.problems();
    }
}
