package org.convgrid.grids;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import org.convgrid.engine.physics.atmosphere.AtmosphereChoice;
import org.convgrid.grids.yaml.GridFileReader;
import org.junit.jupiter.api.Test;

class AtmosphereKeyTest {

    private static final String GRID = """
            mass: {values: [1.0]}
            metallicity: {z: [0.02], y: [0.28]}
            physics:
              atmosphere: %s
            """;

    @Test
    void theKrishnaSwamyRelationReachesEveryModelAndTheModelHash() {
        GridSpec spec = new GridFileReader().parse("g.yaml", GRID.formatted("krishna_swamy"));
        assertThat(spec.requests().iterator().next().physics().atmosphere()).isEqualTo(AtmosphereChoice.KRISHNA_SWAMY);
        assertThat(GridHash.canonicalModels(spec)).contains("atmosphere=krishna_swamy");
        GridSpec eddington = new GridFileReader().parse("g.yaml", GRID.formatted("eddington"));
        assertThat(eddington.requests().iterator().next().physics().atmosphere()).isEqualTo(AtmosphereChoice.EDDINGTON);
    }

    @Test
    void anUnknownRelationIsAProblemWithLineAndColumn() {
        assertThatThrownBy(() -> new GridFileReader().parse("g.yaml", GRID.formatted("grey")))
                .isInstanceOfSatisfying(GridFileException.class, e -> assertThat(e.problems()).singleElement()
                        .satisfies(p -> {
                            assertThat(p.line()).isEqualTo(4);
                            assertThat(p.column()).isEqualTo(15);
                            assertThat(p.kind()).isEqualTo(GridProblemKind.UNKNOWN_CHOICE);
                        }));
    }
}
