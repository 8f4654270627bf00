package org.convgrid.output;

import org.convgrid.engine.request.OvershootScheme;

/**
 * The {@code overshoot_profile} cell of the catalogue, transitions and life-events tables: the profile's grid-file
 * name ({@code uniform}, {@code uniform-ramped}, {@code decaying}), so that {@code overshoot_hp} beside it can be
 * read (alpha_ov, alpha_ov from 2 Msun, or f). Empty where a table written before the column names none.
 */
public final class OvershootProfileCell {

    private OvershootProfileCell() {
    }

    /** The cell for {@code profile}; empty for null (unknown). */
    public static String format(OvershootScheme profile) {
        return profile == null ? "" : profile.label();
    }

    /**
     * The profile a cell names; null for an empty cell.
     *
     * @throws IllegalArgumentException for a name no profile has
     */
    public static OvershootScheme parse(String cell) {
        if (cell.isEmpty()) {
            return null;
        }
        OvershootScheme profile = OvershootScheme.fromLabel(cell);
        if (profile == null) {
            throw new IllegalArgumentException("unknown overshoot profile '" + cell + "' (known: "
                    + OvershootScheme.labels() + ")");
        }
        return profile;
    }
}
