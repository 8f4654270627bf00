package org.convgrid.engine.request;

import java.util.Objects;

/**
 * The age a request asks for. Each variant says from where and in what it is counted, so no solver has to be told
 * how to read a bare number: {@link SinceZeroAge} and {@link SinceBirth} are times from their origin,
 * {@link MainSequenceFraction} a fraction of the main-sequence lifetime reported from a chosen origin.
 */
public sealed interface Age permits Age.SinceZeroAge, Age.SinceBirth, Age.MainSequenceFraction {

    /** The zero-age main sequence itself. */
    Age ZERO_AGE = new SinceZeroAge(0.0);

    /** Whether this age asks for the homogeneous zero-age model itself (no evolution). */
    boolean isZeroAge();

    /** Where this age counts from (a resolved fraction: the origin its age is reported from). */
    AgeOrigin origin();

    /**
     * Time since the zero-age main sequence.
     *
     * @param seconds s, &gt;= 0 (NaN when a fraction could not be turned into a time)
     */
    record SinceZeroAge(double seconds) implements Age {
        @Override
        public boolean isZeroAge() {
            return seconds == 0.0;
        }

        @Override
        public AgeOrigin origin() {
            return AgeOrigin.ZAMS;
        }
    }

    /**
     * Time since birth: the star is evolved from its pre-main-sequence start model, so a young age may find it
     * still contracting. Never the homogeneous zero-age model.
     *
     * @param seconds s, &gt;= 0 (NaN when a fraction could not be turned into a time)
     */
    record SinceBirth(double seconds) implements Age {
        @Override
        public boolean isZeroAge() {
            return false;
        }

        @Override
        public AgeOrigin origin() {
            return AgeOrigin.BIRTH;
        }
    }

    /**
     * A fraction f of the star's own main-sequence lifetime t_MS (the age at which central hydrogen falls below the
     * evolution's end value, counted from the zero-age main sequence); f = 0 is the zero-age main sequence and f = 1
     * the exhaustion point itself, whatever the origin. With origin {@link AgeOrigin#ZAMS} the model is the
     * homogeneous zero-age model evolved to t = f t_MS; with {@link AgeOrigin#BIRTH} the star is evolved from birth
     * and the model lies at t_ZAMS + f t_MS since birth (t_ZAMS: its own arrival on the main sequence).
     *
     * @param fraction f, dimensionless; a solver answers values outside [0, 1] as failed
     * @param origin where the resolved age counts from
     */
    record MainSequenceFraction(double fraction, AgeOrigin origin) implements Age {

        public MainSequenceFraction {
            Objects.requireNonNull(origin, "origin");
        }

        /** A fraction of a star evolved from its zero-age model. */
        public MainSequenceFraction(double fraction) {
            this(fraction, AgeOrigin.ZAMS);
        }

        @Override
        public boolean isZeroAge() {
            return fraction == 0.0 && origin == AgeOrigin.ZAMS;
        }
    }

    /**
     * A time since {@code origin}.
     *
     * @param seconds s
     */
    static Age since(AgeOrigin origin, double seconds) {
        return origin == AgeOrigin.BIRTH ? new SinceBirth(seconds) : new SinceZeroAge(seconds);
    }
}
