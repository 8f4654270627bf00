package org.convgrid.survey;

import org.convgrid.grids.GridSpec;
import org.convgrid.output.IronAbundance;

/**
 * The [Fe/H] a grid's run tables give ({@code fe_h_dex}): measured against the grid's Sun (its
 * {@code solar_z_over_x}, or the default one for a grid given in Z), named in charts when the grid gave [Fe/H].
 */
public final class GridIronAbundance {

    private GridIronAbundance() {
    }

    /** The run tables' [Fe/H] reference for {@code grid}. */
    public static IronAbundance of(GridSpec grid) {
        return new IronAbundance(grid.ironReference().solarMetalsToHydrogen(), grid.givesIron());
    }
}
