package org.convgrid.engine.batch;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.List;
import java.util.Map;
import java.util.concurrent.ConcurrentHashMap;

import org.convgrid.engine.evolution.EvolutionStep;
import org.convgrid.engine.evolution.MainSequenceEvolver;
import org.convgrid.engine.request.Age;
import org.convgrid.engine.request.ModelOutcome;
import org.convgrid.engine.request.ModelRequest;
import org.convgrid.engine.request.ModelStatus;
import org.convgrid.engine.request.PhysicsOptions;
import org.convgrid.engine.units.Constants;
import org.junit.jupiter.api.Test;

/**
 * Grid requests in age (Z = 0.0188, Y = 0.275, standard physics), with time-step limits three times the default to keep
 * the test fast: each mass is evolved once, lands on every requested age, and hands its track over.
 */
class GridRequestsTest {

    private static final double GYR = Constants.GYR;

    private static ModelRequest request(String id, double massInSun, double ageInGyr) {
        return new ModelRequest(id, massInSun * Constants.M_SUN, 0.0188, 0.275, ageInGyr * GYR,
                PhysicsOptions.DEFAULT);
    }

    @Test
    void oneChunkAnswersEveryAgeOfEveryMassAndHandsOverOneTrackPerMass() {
        Map<String, List<EvolutionStep>> tracks = new ConcurrentHashMap<>();
        GridRequests solver = new GridRequests((first, steps) -> tracks.put(first.modelId(), steps),
                MainSequenceEvolver.Settings.DEFAULT.scaled(3.0));
        List<ModelOutcome> out = solver.solve(List.of(request("m0-a0", 1.0, 0.0), request("m0-a1", 1.0, 1.0),
                request("m0-a2", 1.0, 5.0), request("m1-a0", 2.0, 0.0), request("m1-a1", 2.0, 3.0)));

        assertThat(out).extracting(o -> o.request().modelId())
                .containsExactly("m0-a0", "m0-a1", "m0-a2", "m1-a0", "m1-a1");
        assertThat(out.subList(0, 4)).allSatisfy(o -> assertThat(o.status()).as(o.statusDetail())
                .isEqualTo(ModelStatus.OK));
        // the Sun brightens on the main sequence (Sackmann, Boothroyd & Kraemer 1993, ApJ 418, 457, Table 2:
        // L grows monotonically from the ZAMS); central hydrogen falls as it burns
        assertThat(out.get(1).solved().global().luminosity()).isGreaterThan(out.get(0).solved().global().luminosity());
        assertThat(out.get(2).solved().global().luminosity()).isGreaterThan(out.get(1).solved().global().luminosity());
        assertThat(out.get(2).solved().global().centralHydrogen())
                .isLessThan(out.get(1).solved().global().centralHydrogen());
        // a 2 Msun star leaves the main sequence after ~1 Gyr (Schaller et al. 1992, A&A Suppl. 96, 269, Table 47:
        // H-burning lifetime 1.1 Gyr at Z = 0.02), so 3 Gyr is past it
        assertThat(out.get(4).status()).isEqualTo(ModelStatus.PAST_MAIN_SEQUENCE);
        assertThat(out.get(4).statusDetail()).startsWith("core hydrogen exhausted").contains("Gyr");
        assertThat(out.get(4).solverIterations()).as("no model solved past exhaustion")
                .isEqualTo(ModelOutcome.NO_MODEL_SOLVED);

        // one track per mass, named by the star's first request, from age 0 in increasing age, ending at the
        // oldest requested age (1 Msun) or at exhaustion (2 Msun)
        assertThat(tracks.keySet()).containsExactlyInAnyOrder("m0-a0", "m1-a0");
        List<EvolutionStep> sun = tracks.get("m0-a0");
        assertThat(sun.get(0).age()).isZero();
        for (int i = 1; i < sun.size(); i++) {
            assertThat(sun.get(i).age()).isGreaterThan(sun.get(i - 1).age());
        }
        assertThat(sun.get(sun.size() - 1).age()).isEqualTo(5.0 * GYR);
        assertThat(sun).anySatisfy(s -> assertThat(s.age()).isEqualTo(1.0 * GYR));
        assertThat(tracks.get("m1-a0").get(tracks.get("m1-a0").size() - 1).centralHydrogen())
                .isLessThan(MainSequenceEvolver.Settings.DEFAULT.endCentralHydrogen());
    }

    @Test
    void aZeroAgeChunkEvolvesNothingAndHandsOverNoTrack() {
        Map<String, List<EvolutionStep>> tracks = new ConcurrentHashMap<>();
        List<ModelOutcome> out = new GridRequests((first, steps) -> tracks.put(first.modelId(), steps),
                MainSequenceEvolver.Settings.DEFAULT)
                .solve(List.of(request("m0-a0", 0.8, 0.0), request("m1-a0", 0.9, 0.0)));
        assertThat(out).allSatisfy(o -> assertThat(o.status()).isEqualTo(ModelStatus.OK));
        assertThat(tracks).isEmpty();
    }

    @Test
    void groundworkNamesTheLadderRungsAChunkStartsFromAndSharesThemAcrossItsLine() {
        GridRequests solver = new GridRequests((first, steps) -> { });
        // ln(0.4) / 0.3 = -3.05: the anchor, then rungs 1 to 3 below it
        List<SharedStep> low = solver.groundwork(List.of(request("a", 0.4, 0.0), request("b", 0.5, 0.0)));
        List<SharedStep> lower = solver.groundwork(List.of(request("c", 0.35, 0.0), request("d", 0.38, 0.0)));
        assertThat(low).hasSize(4);
        assertThat(lower).hasSize(4);
        assertThat(lower).extracting(SharedStep::key).isEqualTo(low.stream().map(SharedStep::key).toList());

        ModelRequest otherZ = new ModelRequest("e", 0.4 * Constants.M_SUN, 0.01, 0.26, 0.0, PhysicsOptions.DEFAULT);
        ModelRequest otherZ2 = new ModelRequest("f", 0.5 * Constants.M_SUN, 0.01, 0.26, 0.0, PhysicsOptions.DEFAULT);
        assertThat(solver.groundwork(List.of(otherZ, otherZ2))).extracting(SharedStep::key)
                .doesNotContainAnyElementsOf(low.stream().map(SharedStep::key).toList());
        // one mass keeps its own cold start; stars from birth start elsewhere
        assertThat(solver.groundwork(List.of(request("g", 0.4, 0.0), request("h", 0.4, 1.0)))).isEmpty();
        assertThat(solver.groundwork(List.of(request("i", 0.4, 0.0).withAge(new Age.SinceBirth(GYR)),
                request("j", 0.5, 0.0).withAge(new Age.SinceBirth(GYR))))).isEmpty();
    }

    @Test
    void aZeroAgeModelThePhysicsCannotBuildFailsItsOwnRowsWithTheReason() {
        // an opacity a billion times too small leaves the equation of state without a solution while the zero-age
        // model is built: the exception left answers() and failed the whole chunk; now each star's rows are failed
        // with the reason, as star reports them too
        PhysicsOptions opaqueless = new PhysicsOptions(1.8, 0.0,
                org.convgrid.engine.convection.StabilityCriterion.SCHWARZSCHILD, 1e-9);
        List<ModelOutcome> out = new GridRequests((first, steps) -> { }).solve(List.of(
                new ModelRequest("m0-a0", Constants.M_SUN, 0.0188, 0.275, 0.0, opaqueless),
                new ModelRequest("m1-a0", 1.2 * Constants.M_SUN, 0.0188, 0.275, 0.0, opaqueless)));
        assertThat(out).hasSize(2).allSatisfy(o -> {
            assertThat(o.status()).isEqualTo(ModelStatus.FAILED);
            assertThat(o.statusDetail()).startsWith("zero-age model not built: ");
        });
    }
}
