package org.convgrid.grids.yaml;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.catchThrowableOfType;
import static org.assertj.core.api.Assertions.within;

import java.util.List;
import org.convgrid.engine.request.Age;
import org.convgrid.engine.request.AgeOrigin;
import org.convgrid.engine.request.ModelRequest;
import org.convgrid.engine.units.Constants;
import org.convgrid.grids.GridFileException;
import org.convgrid.grids.GridHash;
import org.convgrid.grids.GridProblem;
import org.convgrid.grids.GridProblemKind;
import org.convgrid.grids.GridSpec;
import org.junit.jupiter.api.Test;

/** {@code age: {myr: [...]}} and {@code origin: birth|zams}: where ages count from, and in which unit. */
class AgeOriginReaderTest {

    private static final String HEAD = """
            mass: {values: [1.0, 2.0]}
            metallicity: {z: 0.014, y: 0.27}
            """;

    private final GridFileReader reader = new GridFileReader();

    @Test
    void agesCountFromBirthUnlessTheGridSaysZams() {
        GridSpec birth = reader.parse("b.yaml", HEAD + "age: {gyr: [0.02, 0.15]}\n");
        assertThat(birth.ages().origin()).isEqualTo(AgeOrigin.BIRTH);
        assertThat(birth.ages().evolves()).isTrue();
        assertThat(birth.expand()).extracting(ModelRequest::age)
                .containsExactly(new Age.SinceBirth(0.02 * Constants.GYR), new Age.SinceBirth(0.15 * Constants.GYR),
                        new Age.SinceBirth(0.02 * Constants.GYR), new Age.SinceBirth(0.15 * Constants.GYR));

        GridSpec zams = reader.parse("z.yaml", HEAD + "age: {gyr: [0, 0.15], origin: zams}\n");
        assertThat(zams.ages().origin()).isEqualTo(AgeOrigin.ZAMS);
        assertThat(zams.expand().get(0).age()).isEqualTo(Age.ZERO_AGE);
        assertThat(zams.expand().get(1).age()).isEqualTo(new Age.SinceZeroAge(0.15 * Constants.GYR));
    }

    @Test
    void withoutAnAgeSectionTheGridIsTheZeroAgeMainSequence() {
        GridSpec spec = reader.parse("n.yaml", HEAD);
        assertThat(spec.ages().origin()).isEqualTo(AgeOrigin.ZAMS);
        assertThat(spec.expand()).extracting(ModelRequest::age).containsOnly(Age.ZERO_AGE);
        assertThat(spec.ages().evolves()).isFalse();
    }

    @Test
    void myrAreGyrOverAThousand() {
        GridSpec spec = reader.parse("m.yaml", HEAD + "age: {myr: [20, 150, 600]}\n");
        assertThat(spec.ages().fractions()).isFalse();
        assertThat(spec.agesGyr()).containsExactly(0.02, 0.15, 0.6);
        double seconds = ((Age.SinceBirth) spec.expand().get(1).age()).seconds();
        assertThat(seconds / (1.0e6 * Constants.YEAR)).isCloseTo(150.0, within(1e-9));
    }

    @Test
    void fractionsKeepTheirMeaningAndCarryTheOrigin() {
        GridSpec spec = reader.parse("f.yaml", HEAD + "age: {ms_fraction: [0, 0.5]}\n");
        assertThat(spec.expand().get(0).age()).isEqualTo(new Age.MainSequenceFraction(0.0, AgeOrigin.BIRTH));
        assertThat(spec.expand().get(0).age().isZeroAge()).as("0 from birth is evolved, not the homogeneous model")
                .isFalse();
        GridSpec zams = reader.parse("f.yaml", HEAD + "age: {ms_fraction: [0, 0.5], origin: zams}\n");
        assertThat(zams.expand().get(0).age()).isEqualTo(new Age.MainSequenceFraction(0.0, AgeOrigin.ZAMS));
    }

    @Test
    void theModelFingerprintTellsTheOriginsApartAndKeepsZamsGridsUnchanged() {
        GridSpec birth = reader.parse("b.yaml", HEAD + "age: {gyr: [0.5]}\n");
        GridSpec zams = reader.parse("z.yaml", HEAD + "age: {gyr: [0.5], origin: zams}\n");
        GridSpec myr = reader.parse("m.yaml", HEAD + "age: {myr: [500]}\n");
        assertThat(GridHash.canonicalModels(zams)).doesNotContain("origin");
        assertThat(GridHash.canonicalModels(birth)).contains("age_origin=birth\n");
        assertThat(GridHash.ofModels(birth)).isNotEqualTo(GridHash.ofModels(zams)).isEqualTo(GridHash.ofModels(myr));
    }

    @Test
    void ageZeroFromBirthIsRefusedAtItsValue() {
        List<GridProblem> problems = problems(HEAD + "age: {myr: [0, 150]}\n");
        assertThat(problems).extracting(p -> p.line() + ":" + p.column() + " " + p.kind())
                .containsExactly("3:13 OUT_OF_RANGE");
        assertThat(problems.get(0).message()).contains("from birth").contains("Myr")
                .as("a grid written when 0 meant the zero-age main sequence is told how to keep that meaning")
                .endsWith("(got 0): age 0 would be the start model; for the zero-age main sequence add origin: zams");
        assertThat(problems(HEAD + "age: {myr: [-5]}\n").get(0).message()).doesNotContain("origin: zams");
    }

    @Test
    void myrBeyondTheAgeLimitIsRefused() {
        List<GridProblem> problems = problems(HEAD + "age: {myr: [10, 25000], origin: zams}\n");
        assertThat(problems).extracting(p -> p.line() + ":" + p.column() + " " + p.kind())
                .containsExactly("3:17 OUT_OF_RANGE");
        assertThat(problems.get(0).message()).contains("must be from 0 to 20000 (got 25000)");
    }

    @Test
    void anUnknownOriginIsRefusedAtItsValue() {
        List<GridProblem> problems = problems(HEAD + "age:\n  myr: [10]\n  origin: zero_age\n");
        assertThat(problems).extracting(p -> p.line() + ":" + p.column() + " " + p.kind())
                .containsExactly("5:11 UNKNOWN_CHOICE");
        assertThat(problems.get(0).message()).contains("birth or zams").contains("zero_age");
    }

    @Test
    void twoUnitsAreRefusedAtTheSecond() {
        List<GridProblem> problems = problems(HEAD + "age:\n  gyr: [1]\n  myr: [10]\n");
        assertThat(problems).extracting(p -> p.line() + ":" + p.column() + " " + p.kind())
                .containsExactly("5:3 CONFLICT");
    }

    private List<GridProblem> problems(String text) {
        return catchThrowableOfType(() -> reader.parse("f.yaml", text), GridFileException.class).problems();
    }
}
