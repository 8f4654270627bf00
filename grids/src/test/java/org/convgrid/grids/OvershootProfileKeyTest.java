package org.convgrid.grids;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import org.convgrid.engine.request.OvershootScheme;
import org.convgrid.grids.yaml.GridFileReader;
import org.junit.jupiter.api.Test;

class OvershootProfileKeyTest {

    private static final String GRID = """
            mass: {values: [2.0]}
            metallicity: {z: [0.02], y: [0.28]}
            physics:
              overshoot: {profile: %s, length_hp: 0.016}
            """;

    private static final String PLAIN = """
            mass: {values: [2.0]}
            metallicity: {z: [0.02], y: [0.28]}
            physics:
              overshoot: 0.016
            """;

    @Test
    void theDecayingProfileReachesEveryModelAndTheModelHash() {
        GridSpec spec = new GridFileReader().parse("g.yaml", GRID.formatted("decaying"));
        assertThat(spec.requests().iterator().next().physics().overshootScheme())
                .isEqualTo(OvershootScheme.EXPONENTIAL);
        assertThat(spec.requests().iterator().next().physics().overshoot()).isEqualTo(0.016);
        assertThat(GridHash.canonicalModels(spec)).contains("overshoot_profile=decaying");
    }

    @Test
    void theMassRampedProfileReachesEveryModelAndTheModelHash() {
        GridSpec spec = new GridFileReader().parse("g.yaml", GRID.formatted("uniform-ramped"));
        assertThat(spec.requests().iterator().next().physics().overshootScheme())
                .isEqualTo(OvershootScheme.MASS_RAMPED_STEP);
        assertThat(GridHash.canonicalModels(spec)).contains("overshoot_profile=uniform-ramped");
    }

    @Test
    void uniformIsTheDefaultAndAPlainNumberMeansIt() {
        GridSpec uniform = new GridFileReader().parse("g.yaml", GRID.formatted("uniform"));
        GridSpec plain = new GridFileReader().parse("g.yaml", PLAIN);
        assertThat(uniform.requests().iterator().next().physics().overshootScheme()).isEqualTo(OvershootScheme.STEP);
        assertThat(plain.requests().iterator().next().physics().overshootScheme()).isEqualTo(OvershootScheme.STEP);
        assertThat(GridHash.canonicalModels(uniform)).isEqualTo(GridHash.canonicalModels(plain))
                .doesNotContain("overshoot_profile");
    }

    @Test
    void anUnknownProfileIsAProblemWithLineAndColumn() {
        assertThatThrownBy(() -> new GridFileReader().parse("g.yaml", GRID.formatted("diffusive")))
                .isInstanceOfSatisfying(GridFileException.class, e -> assertThat(e.problems()).singleElement()
                        .satisfies(p -> {
                            assertThat(p.line()).isEqualTo(4);
                            assertThat(p.column()).isEqualTo(24);
                            assertThat(p.kind()).isEqualTo(GridProblemKind.UNKNOWN_CHOICE);
                            assertThat(p.message()).contains("uniform, decaying or uniform-ramped");
                        }));
    }

    @Test
    void theOldKeyNamesAreErrorsThatNameTheNewOnes() {
        String old = """
                mass: {values: [2.0]}
                metallicity: {z: [0.02], y: [0.28]}
                physics:
                  overshoot: 0.016
                  overshoot_scheme: exponential
                  opacity_factor: 1.2
                """;
        assertThatThrownBy(() -> new GridFileReader().parse("g.yaml", old))
                .isInstanceOfSatisfying(GridFileException.class, e -> assertThat(e.problems()).hasSize(2)
                        .allSatisfy(p -> assertThat(p.kind()).isEqualTo(GridProblemKind.RENAMED_KEY))
                        .anySatisfy(p -> {
                            assertThat(p.line()).isEqualTo(5);
                            assertThat(p.message()).contains("overshoot: {profile: uniform|uniform-ramped|decaying, length_hp");
                        })
                        .anySatisfy(p -> {
                            assertThat(p.line()).isEqualTo(6);
                            assertThat(p.column()).isEqualTo(3);
                            assertThat(p.message()).contains("write opacity_scale");
                        }));
    }
}
