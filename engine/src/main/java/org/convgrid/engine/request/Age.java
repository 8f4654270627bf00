package org.convgrid.engine.request;

/**
 * The age a request asks for. Each variant says from where and in what it is counted, so no solver has to be told
 * how to read a bare number; a new origin (for instance the time since birth) is one more variant.
 */
public sealed interface Age permits Age.SinceZeroAge, Age.MainSequenceFraction {

    /** The zero-age main sequence itself. */
    Age ZERO_AGE = new SinceZeroAge(0.0);

    /** Whether this age asks for the zero-age model itself (no evolution). */
    boolean isZeroAge();

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
    }

    /**
     * A fraction f of the star's own main-sequence lifetime t_MS (the age at which central hydrogen falls below the
     * evolution's end value); the model is computed at t = f t_MS, f = 0 being the zero-age model and f = 1 the
     * exhaustion point itself.
     *
     * @param fraction f, dimensionless; a solver answers values outside [0, 1] as failed
     */
    record MainSequenceFraction(double fraction) implements Age {
        @Override
        public boolean isZeroAge() {
            return fraction == 0.0;
        }
    }
}
