package org.convgrid.plotting.style;

import org.convgrid.engine.request.AgeOrigin;

/** The title of an age axis, which says where the run's ages count from and in which unit. */
public final class AgeAxisTitle {

    private AgeAxisTitle() {
    }

    /** {@code age since birth / Gyr} or {@code age since the zero-age main sequence / Gyr}. */
    public static String of(AgeOrigin origin) {
        return of(origin, AgeUnit.GYR);
    }

    /** {@code age since birth / Myr}, {@code age since the zero-age main sequence / Gyr} and so on. */
    public static String of(AgeOrigin origin, AgeUnit unit) {
        return (origin == AgeOrigin.BIRTH ? "age since birth / " : "age since the zero-age main sequence / ")
                + unit.symbol();
    }
}
