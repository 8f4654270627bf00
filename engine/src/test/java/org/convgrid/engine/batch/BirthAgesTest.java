package org.convgrid.engine.batch;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.List;

import org.convgrid.engine.evolution.MainSequenceEvolver;
import org.convgrid.engine.request.Age;
import org.convgrid.engine.request.AgeOrigin;
import org.convgrid.engine.request.ModelOutcome;
import org.convgrid.engine.request.ModelRequest;
import org.convgrid.engine.request.ModelStatus;
import org.convgrid.engine.request.PhysicsOptions;
import org.convgrid.engine.units.Constants;
import org.junit.jupiter.api.Test;

/**
 * Requests counted from birth that cannot be answered are refused before anything is evolved, each with its reason;
 * a star's ages must all count from birth (the origin lives in each request's age, so a mixed star is a bad chunk).
 */
class BirthAgesTest {

    private static ModelRequest request(String id, Age age) {
        return new ModelRequest(id, Constants.M_SUN, 0.02, 0.28, age, PhysicsOptions.DEFAULT);
    }

    private final GridRequests solver = new GridRequests(StarTrackSink.NONE, MainSequenceEvolver.Settings.DEFAULT);

    @Test
    void aStarWhoseAgesMixOriginsFailsAsAWholeWithoutEvolving() {
        List<ModelOutcome> out = solver.solve(List.of(request("a0", new Age.SinceBirth(1e6 * Constants.YEAR)),
                request("a1", new Age.SinceZeroAge(1e8 * Constants.YEAR))));
        assertThat(out).extracting(ModelOutcome::status).containsOnly(ModelStatus.FAILED);
        assertThat(out.get(0).statusDetail()).contains("a1").contains("not a time since birth");
    }

    @Test
    void anUnknownTimeSinceBirthIsRefused() {
        List<ModelOutcome> out = solver.solve(List.of(request("a0", new Age.SinceBirth(Double.NaN))));
        assertThat(out).singleElement().extracting(ModelOutcome::status).isEqualTo(ModelStatus.FAILED);
    }

    @Test
    void aFractionOutsideZeroToOneFromBirthIsRefusedWithAnUnknownAge() {
        List<ModelOutcome> out = solver.solve(List.of(
                request("a0", new Age.MainSequenceFraction(0.5, AgeOrigin.BIRTH)),
                request("a1", new Age.MainSequenceFraction(1.5, AgeOrigin.BIRTH))));
        assertThat(out).extracting(ModelOutcome::status).containsOnly(ModelStatus.FAILED);
        assertThat(out.get(1).statusDetail()).contains("not a main-sequence fraction in [0, 1] from birth");
        assertThat(out).allSatisfy(o -> assertThat(o.request().age()).isInstanceOfSatisfying(Age.SinceBirth.class,
                a -> assertThat(a.seconds()).isNaN()));
    }

    @Test
    void theOriginOfEveryVariant() {
        assertThat(new Age.SinceBirth(1.0).origin()).isEqualTo(AgeOrigin.BIRTH);
        assertThat(new Age.SinceBirth(0.0).isZeroAge()).as("birth is not the zero-age model").isFalse();
        assertThat(Age.ZERO_AGE.origin()).isEqualTo(AgeOrigin.ZAMS);
        assertThat(new Age.MainSequenceFraction(0.0).isZeroAge()).isTrue();
        assertThat(new Age.MainSequenceFraction(0.0, AgeOrigin.BIRTH).isZeroAge()).isFalse();
        assertThat(AgeOrigin.ofLabel("birth")).isEqualTo(AgeOrigin.BIRTH);
        assertThat(AgeOrigin.ofLabel("Birth")).isNull();
    }

    @Test
    void aStarOutlivingTheAgeLimitStillAnswersFractionZeroAtItsZeroAgeMainSequence() {
        // 0.8 Msun at Z = 0.014 keeps core hydrogen beyond the 20 Gyr limit (its lifetime is some 25-30 Gyr at solar
        // metallicity: the main-sequence lifetime scales roughly as M^-2.5, 10 Gyr for the Sun; common practice, no
        // single source), so fraction 0.5 has no age; fraction 0, the zero-age main sequence, does
        List<ModelOutcome> out = solver.solve(List.of(
                new ModelRequest("f0", 0.8 * Constants.M_SUN, 0.014, 0.2681,
                        new Age.MainSequenceFraction(0.0, AgeOrigin.BIRTH), PhysicsOptions.DEFAULT),
                new ModelRequest("f1", 0.8 * Constants.M_SUN, 0.014, 0.2681,
                        new Age.MainSequenceFraction(0.5, AgeOrigin.BIRTH), PhysicsOptions.DEFAULT)));
        assertThat(out.get(0).status()).as(out.get(0).statusDetail()).isEqualTo(ModelStatus.OK);
        assertThat(out.get(0).request().age()).isInstanceOfSatisfying(Age.SinceBirth.class,
                a -> assertThat(a.seconds() / Constants.YEAR).isBetween(2e7, 2e8));
        assertThat(out.get(0).solved().stage().preMainSequence()).isFalse();
        assertThat(out.get(1).status()).isEqualTo(ModelStatus.NOT_CONVERGED);
        assertThat(out.get(1).statusDetail()).contains("main-sequence lifetime unknown");
    }
}
