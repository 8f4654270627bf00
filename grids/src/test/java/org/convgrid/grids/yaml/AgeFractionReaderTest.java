package org.convgrid.grids.yaml;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.catchThrowableOfType;

import java.util.List;
import org.convgrid.engine.request.Age;
import org.convgrid.engine.request.ModelRequest;
import org.convgrid.grids.GridFileException;
import org.convgrid.grids.GridHash;
import org.convgrid.grids.GridProblem;
import org.convgrid.grids.GridProblemKind;
import org.convgrid.grids.GridSpec;
import org.junit.jupiter.api.Test;

/** {@code age: {ms_fraction: [...]}}: ages as fractions of each star's main-sequence lifetime. */
class AgeFractionReaderTest {

    private static final String HEAD = """
            mass: {values: [1.0, 2.0]}
            metallicity: {z: 0.014, y: 0.27}
            """;

    private final GridFileReader reader = new GridFileReader();

    @Test
    void fractionsBecomeAnAxisWhoseRequestsCarryTheBareFraction() {
        GridSpec spec = reader.parse("f.yaml", HEAD + "age: {ms_fraction: [0, 0.25, 0.5, 0.9], origin: zams}\n");
        assertThat(spec.ages().fractions()).isTrue();
        assertThat(spec.ages().values()).containsExactly(0.0, 0.25, 0.5, 0.9);
        assertThat(spec.ages().evolves()).isTrue();
        assertThat(spec.count()).isEqualTo(8);
        List<ModelRequest> all = spec.expand();
        assertThat(all).extracting(ModelRequest::age)
                .containsExactly(fractions(0.0, 0.25, 0.5, 0.9, 0.0, 0.25, 0.5, 0.9));
        assertThat(all.get(1).modelId()).isEqualTo("p0-z00-m000-a01");
        assertThatThrownBy(spec::agesGyr).isInstanceOf(IllegalStateException.class).hasMessageContaining("fractions");
    }

    @Test
    void theModelFingerprintTellsFractionsFromGyrAndKeepsGyrGridsUnchanged() {
        GridSpec fractions = reader.parse("f.yaml", HEAD + "age: {ms_fraction: [0, 0.5]}\n");
        GridSpec gyr = reader.parse("g.yaml", HEAD + "age: {gyr: [0, 0.5], origin: zams}\n");
        assertThat(GridHash.canonicalModels(gyr)).contains("age_gyr=[0.0, 0.5]\n");
        assertThat(GridHash.canonicalModels(fractions)).contains("age_ms_fraction=[0.0, 0.5]\n")
                .doesNotContain("age_gyr");
        assertThat(GridHash.ofModels(fractions)).isNotEqualTo(GridHash.ofModels(gyr));
    }

    @Test
    void bothKeysAreRefusedAtTheSecond() {
        List<GridProblem> problems = problems(HEAD + """
                age:
                  gyr: [1]
                  ms_fraction: [0.5]
                """);
        assertThat(problems).extracting(p -> p.line() + ":" + p.column() + " " + p.kind())
                .containsExactly("5:3 CONFLICT");
    }

    @Test
    void fractionsOutsideZeroToOneOrOutOfOrderAreRefusedEachAtItsValue() {
        List<GridProblem> problems = problems(HEAD + "age: {ms_fraction: [-0.1, 0.5, 1.2, 0.4]}\n");
        assertThat(problems).extracting(p -> p.line() + ":" + p.column()).containsExactly("3:21", "3:32", "3:37");
        assertThat(problems).extracting(GridProblem::kind).containsOnly(GridProblemKind.OUT_OF_RANGE);
    }

    @Test
    void anEmptyAgeSectionNamesBothKeys() {
        List<GridProblem> problems = problems(HEAD + "age: {}\n");
        assertThat(problems).singleElement().extracting(GridProblem::kind).isEqualTo(GridProblemKind.MISSING_KEY);
    }

    private List<GridProblem> problems(String text) {
        return catchThrowableOfType(() -> reader.parse("f.yaml", text), GridFileException.class).problems();
    }

    private static Age[] fractions(double... values) {
        return java.util.Arrays.stream(values).mapToObj(Age.MainSequenceFraction::new).toArray(Age[]::new);
    }
}
