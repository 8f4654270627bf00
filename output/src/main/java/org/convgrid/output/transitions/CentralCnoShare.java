package org.convgrid.output.transitions;

import org.convgrid.engine.physics.StandardPhysics;
import org.convgrid.engine.physics.nuclear.BurningRate;
import org.convgrid.engine.physics.nuclear.NuclearNetwork;
import org.convgrid.engine.state.Composition;
import org.convgrid.output.catalogue.CatalogueRow;

/**
 * The share of a model's central nuclear energy release that the CNO cycle gives, eps_CNO / (eps_pp + eps_CNO), from
 * the catalogue's centre (temperature, density, hydrogen) and the model's Z with its C, N and O in the scaled-solar
 * proportions, 3He and the CN isotopes at their local equilibrium: what {@code convgrid probe} reports for that point. It says whether a
 * convective core can be the CNO cycle's at the model's own metallicity, where a fixed central temperature cannot: at
 * Z = 0.02 the share passes 1 % near 14.5 MK, at Z = 1.8e-4 ([Fe/H] = -2) not until ~20 MK (the 1.2 Msun star of
 * such a grid at 1 Gyr, 19.3 MK, gets 0.6 %), because the cycle's rate scales with its catalysts.
 */
public final class CentralCnoShare {

    private CentralCnoShare() {
    }

    /**
     * The share, 0 to 1; NaN when the row lacks a centre (not ok, an edited cell), nothing burns there, or Z = 0: a
     * star without the cycle's catalysts has no share to judge its core by (its cores, at any temperature, are not
     * "too cool" for a cycle that cannot run).
     */
    public static double of(CatalogueRow row) {
        double t = row.centralTempK();
        double rho = row.centralDensityCgs();
        double x = row.centralHFrac();
        double z = row.zInit();
        if (!(t > 0.0 && rho > 0.0 && x > 0.0 && z > 0.0 && x + z <= 1.0)) {
            return Double.NaN;
        }
        NuclearNetwork network = StandardPhysics.nuclearNetwork();
        // matter that has been burning: 3He and the CN isotopes at their local equilibrium, as probe evaluates it
        Composition burning = network.equilibrium(rho, t, Composition.scaledSolar(x, z));
        BurningRate rate = network.burn(rho, t, burning);
        double total = rate.epsPp() + rate.epsCno();
        return total > 0.0 ? rate.epsCno() / total : Double.NaN;
    }
}
