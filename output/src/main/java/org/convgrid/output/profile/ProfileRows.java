package org.convgrid.output.profile;

import java.util.ArrayList;
import java.util.List;
import org.convgrid.engine.physics.eos.EosState;
import org.convgrid.engine.structure.AcousticTravelTime;
import org.convgrid.engine.structure.BuoyancyFrequency;
import org.convgrid.engine.structure.StellarModel;
import org.convgrid.engine.structure.StellarProfile;

/** The shells of a solved model as profile rows, centre to surface. */
public final class ProfileRows {

    private ProfileRows() {
    }

    public static List<ProfileRow> of(StellarModel model) {
        StellarProfile p = model.profile();
        int n = p.size();
        double mass = p.mass(n - 1);
        double radius = p.radius(n - 1);
        double[] buoyancySquared = BuoyancyFrequency.squaredOf(model);
        double[] soundSpeed = AcousticTravelTime.soundSpeeds(model);
        List<ProfileRow> rows = new ArrayList<>(n);
        for (int k = 0; k < n; k++) {
            EosState eos = p.eosState(k);

            rows.add(new ProfileRow(p.mass(k) / mass, p.radius(k) / radius, p.pressure(k), p.temperature(k),
                    p.density(k), p.luminosity(k), p.opacity(k), p.eps(k), p.nabla(k), p.nablaAd(k), p.nablaRad(k),
                    p.convective(k), p.convectiveVelocity(k), p.radius(k), eos.gamma1(), soundSpeed[k],
                    p.hydrogen(k), eos.mu(),
                    model.state().composition(k).he3(), buoyancySquared[k],
                    model.state().mesh().exteriorFraction(k)));
        }
        return rows;
    }
}
