package org.convgrid.grids;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import org.convgrid.engine.request.OvershootScheme;
import org.convgrid.grids.yaml.GridFileReader;
import org.junit.jupiter.api.Test;

class OvershootSchemeKeyTest {

    private static final String GRID = """
            mass: {values: [2.0]}
            metallicity: {z: [0.02], y: [0.28]}
            physics:
              overshoot: 0.016
              overshoot_scheme: %s
            """;

    private static final String PLAIN = """
            mass: {values: [2.0]}
            metallicity: {z: [0.02], y: [0.28]}
            physics:
              overshoot: 0.016
            """;

    @Test
    void theExponentialSchemeReachesEveryModelAndTheModelHash() {
        GridSpec spec = new GridFileReader().parse("g.yaml", GRID.formatted("exponential"));
        assertThat(spec.requests().iterator().next().physics().overshootScheme())
                .isEqualTo(OvershootScheme.EXPONENTIAL);
        assertThat(spec.requests().iterator().next().physics().overshoot()).isEqualTo(0.016);
        assertThat(GridHash.canonicalModels(spec)).contains("overshoot_scheme=exponential");
    }

    @Test
    void stepIsTheDefaultAndLeavesTheModelHashAsItWas() {
        GridSpec step = new GridFileReader().parse("g.yaml", GRID.formatted("step"));
        GridSpec plain = new GridFileReader().parse("g.yaml", PLAIN);
        assertThat(step.requests().iterator().next().physics().overshootScheme()).isEqualTo(OvershootScheme.STEP);
        assertThat(plain.requests().iterator().next().physics().overshootScheme()).isEqualTo(OvershootScheme.STEP);
        assertThat(GridHash.canonicalModels(step)).isEqualTo(GridHash.canonicalModels(plain))
                .doesNotContain("overshoot_scheme");
    }

    @Test
    void anUnknownSchemeIsAProblemWithLineAndColumn() {
        assertThatThrownBy(() -> new GridFileReader().parse("g.yaml", GRID.formatted("diffusive")))
                .isInstanceOfSatisfying(GridFileException.class, e -> assertThat(e.problems()).singleElement()
                        .satisfies(p -> {
                            assertThat(p.line()).isEqualTo(5);
                            assertThat(p.column()).isEqualTo(21);
                            assertThat(p.kind()).isEqualTo(GridProblemKind.UNKNOWN_CHOICE);
                        }));
    }

    @Test
    void aListOfSchemesIsAProblem() {
        assertThatThrownBy(() -> new GridFileReader().parse("g.yaml", GRID.formatted("[step, exponential]")))
                .isInstanceOfSatisfying(GridFileException.class, e -> assertThat(e.problems()).singleElement()
                        .satisfies(p -> {
                            assertThat(p.line()).isEqualTo(5);
                            assertThat(p.kind()).isEqualTo(GridProblemKind.WRONG_TYPE);
                        }));
    }
}
