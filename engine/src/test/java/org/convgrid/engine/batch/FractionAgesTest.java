package org.convgrid.engine.batch;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

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
 * Ages as fractions of the main-sequence lifetime ({@link Age.MainSequenceFraction}), Z = 0.0188, Y = 0.275, time-step
 * limits three times the default to keep the test fast.
 */
class FractionAgesTest {

    private static final MainSequenceEvolver.Settings COARSE = MainSequenceEvolver.Settings.DEFAULT.scaled(3.0);

    private static ModelRequest request(String id, double massInSun, double fraction) {
        return new ModelRequest(id, massInSun * Constants.M_SUN, 0.0188, 0.275,
                new Age.MainSequenceFraction(fraction), PhysicsOptions.DEFAULT);
    }

    private static List<ModelOutcome> solve(Map<String, List<EvolutionStep>> tracks) {
        GridRequests solver = new GridRequests((first, steps) -> tracks.put(first.modelId(), steps), COARSE);
        return solver.solve(List.of(request("m0-a0", 1.0, 0.0), request("m0-a1", 1.0, 0.5),
                request("m0-a2", 1.0, 1.0)));
    }

    /** The resolved age an outcome carries, s. */
    private static double seconds(ModelOutcome o) {
        return ((Age.SinceZeroAge) o.request().age()).seconds();
    }

    @Test
    void aSunLikeStarIsAnsweredAtZeroHalfAndAllOfItsLifetimeReproducibly() {
        Map<String, List<EvolutionStep>> tracks = new ConcurrentHashMap<>();
        List<ModelOutcome> out = solve(tracks);

        assertThat(out).extracting(o -> o.request().modelId()).containsExactly("m0-a0", "m0-a1", "m0-a2");
        assertThat(out).allSatisfy(o -> assertThat(o.status()).as(o.statusDetail()).isEqualTo(ModelStatus.OK));
        double lifetime = seconds(out.get(2));
        assertThat(seconds(out.get(0))).isZero();
        // the rows carry resolved ages in s: f = 0.5 lands exactly on half of the f = 1 (exhaustion) age
        assertThat(seconds(out.get(1))).isEqualTo(0.5 * lifetime);
        // f = 1 is the exhaustion point: central X at the end value 1e-4, to within the landing run's own steps
        assertThat(out.get(2).solved().global().centralHydrogen()).isBetween(0.2e-4, 3.0e-4);
        assertThat(out.get(1).solved().global().centralHydrogen()).isBetween(0.1, 0.6);
        // the Sun's core-hydrogen lifetime is about 10 Gyr (from memory, e.g. Sackmann, Boothroyd & Kraemer 1993,
        // ApJ 418, 457: X_c exhausted near 9-10 Gyr); loose bounds for Z = 0.0188 and coarse steps
        assertThat(lifetime / Constants.GYR).isBetween(7.0, 13.0);
        // the track is the landing run's: it ends on the exhaustion age and passes through the half-life model
        List<EvolutionStep> track = tracks.get("m0-a0");
        assertThat(track.get(track.size() - 1).age()).isEqualTo(lifetime);
        assertThat(track).anySatisfy(s -> assertThat(s.age()).isEqualTo(0.5 * lifetime));

        List<ModelOutcome> again = solve(new ConcurrentHashMap<>());
        for (int i = 0; i < out.size(); i++) {
            assertThat(again.get(i).request()).isEqualTo(out.get(i).request());
            assertThat(again.get(i).solved().global()).isEqualTo(out.get(i).solved().global());
        }
    }

    @Test
    void fromBirthTheFractionZeroRowLiesAtTheLifeEventsZamsOnTheMainSequence() {
        // the ages are measured against one evolution (the lifetime's) and answered by a second (landing on them);
        // the life events and phases take the first's ZAMS and exhaustion, so that life_events.csv gives the ages the
        // fractions were measured against (22.93 against 22.38 Myr after the ZAMS rule changed)
        java.util.concurrent.atomic.AtomicReference<org.convgrid.engine.birth.LifeEvents> events =
                new java.util.concurrent.atomic.AtomicReference<>();
        GridRequests solver = new GridRequests((first, points, e) -> events.set(e), COARSE);
        List<ModelOutcome> out = solver.solve(List.of(
                birthRequest("m0-a0", 0.0), birthRequest("m0-a1", 0.5)));
        assertThat(out).allSatisfy(o -> assertThat(o.status()).as(o.statusDetail()).isEqualTo(ModelStatus.OK));
        double zams = events.get().zeroAgeMainSequence();
        double exhaustion = events.get().centralHydrogenExhausted();
        assertThat(((Age.SinceBirth) out.get(0).request().age()).seconds()).isEqualTo(zams);
        assertThat(((Age.SinceBirth) out.get(1).request().age()).seconds())
                .isCloseTo(zams + 0.5 * (exhaustion - zams), within(1e-6 * exhaustion));
        assertThat(out).allSatisfy(o -> assertThat(o.solved().stage().preMainSequence()).isFalse());
    }

    private static ModelRequest birthRequest(String id, double fraction) {
        return new ModelRequest(id, 1.5 * Constants.M_SUN, 0.0188, 0.275,
                new Age.MainSequenceFraction(fraction, org.convgrid.engine.request.AgeOrigin.BIRTH),
                PhysicsOptions.DEFAULT);
    }

    @Test
    void zeroFractionsNeedNoLifetimeAndNonFractionsAreRefused() {
        Map<String, List<EvolutionStep>> tracks = new ConcurrentHashMap<>();
        GridRequests solver = new GridRequests((first, steps) -> tracks.put(first.modelId(), steps), COARSE);
        List<ModelOutcome> zams = solver.solve(List.of(request("m0-a0", 0.8, 0.0)));
        assertThat(zams.get(0).status()).isEqualTo(ModelStatus.OK);
        assertThat(seconds(zams.get(0))).isZero();
        assertThat(tracks).isEmpty();

        List<ModelOutcome> wrong = solver.solve(List.of(request("m0-a0", 1.0, 0.0),
                request("m0-a1", 1.0, 4.57 * Constants.GYR)));
        assertThat(wrong).allSatisfy(o -> {
            assertThat(o.status()).isEqualTo(ModelStatus.FAILED);
            assertThat(o.statusDetail()).contains("not a main-sequence fraction");
            assertThat(seconds(o)).isNaN();
        });
    }
}
