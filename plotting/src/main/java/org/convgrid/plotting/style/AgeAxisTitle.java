package org.convgrid.plotting.style;

import org.convgrid.engine.request.AgeOrigin;

/** The title of an age axis, which says where the run's ages count from. */
public final class AgeAxisTitle {

    private AgeAxisTitle() {
    }

    /** {@code age since birth / Gyr} or {@code age since the zero-age main sequence / Gyr}. */
    public static String of(AgeOrigin origin) {
        return origin == AgeOrigin.BIRTH ? "age since birth / Gyr" : "age since the zero-age main sequence / Gyr";
    }
}
