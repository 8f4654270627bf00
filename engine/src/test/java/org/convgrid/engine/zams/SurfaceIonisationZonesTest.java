package org.convgrid.engine.zams;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.List;
import org.convgrid.engine.convection.ConvectiveStructure;
import org.convgrid.engine.convection.ConvectiveZone;
import org.convgrid.engine.convection.StructureClass;
import org.convgrid.engine.structure.StellarModel;
import org.convgrid.engine.structure.StellarProfile;
import org.junit.jupiter.api.Test;

/**
 * The thin surface convection zones of a hot star, as the structure mesh resolves them. zones.csv once dropped them
 * because both their m/M ends round to 1.0 at the file's seven digits; here they are checked where they come from.
 */
class SurfaceIonisationZonesTest {

    @Test
    void aThreeSolarMassZeroAgeStarHasHydrogenAndHeliumIonisationZonesInsideTheMesh() {
        StellarModel model = ZamsFixtures.model(ZamsFixtures.PROTOSOLAR, 3.0).model();
        ConvectiveStructure c = model.convection();
        StellarProfile p = model.profile();
        assertThat(c.structureClass()).isEqualTo(StructureClass.CONV_CORE);
        List<ConvectiveZone> surface = c.zones().stream().filter(z -> z.innerRadiusFraction() > 0.99).toList();
        // A and late B stars have a convectively unstable hydrogen (and first helium) ionisation zone at
        // T ~ 1-2e4 K and a second helium ionisation zone at T ~ 4-5e4 K, the seat of the kappa mechanism
        // (Cox 1980, Theory of Stellar Pulsation, ch. 10; Kippenhahn, Weigert & Weiss 2012, ch. 41; from memory)
        assertThat(surface).hasSizeGreaterThanOrEqualTo(2);
        assertThat(surface).anySatisfy(z -> assertThat(temperatureRange(p, z)).satisfies(
                t -> assertThat(t[0]).isLessThan(2.0e4), t -> assertThat(t[1]).isGreaterThan(1.0e4)));
        assertThat(surface).anySatisfy(z -> assertThat(temperatureRange(p, z)).satisfies(
                t -> assertThat(t[0]).isLessThan(5.0e4), t -> assertThat(t[1]).isGreaterThan(4.0e4)));
        for (ConvectiveZone z : surface) {
            // thinner than the seven digits of zones.csv can tell from m/M = 1 (our model's numbers, not published)
            assertThat(1.0 - z.innerMassFraction()).isLessThan(5e-8);
            assertThat(z.outerRadiusFraction()).isGreaterThan(z.innerRadiusFraction());
            // resolved by the structure mesh, not a one-point flicker: at least three convective points
            assertThat(pointsInside(p, z)).isGreaterThanOrEqualTo(3);
        }
    }

    /** Lowest and highest mesh temperature, K, inside the zone's radius span. */
    private static double[] temperatureRange(StellarProfile p, ConvectiveZone z) {
        double lo = Double.POSITIVE_INFINITY;
        double hi = Double.NEGATIVE_INFINITY;
        double radius = p.radius(p.size() - 1);
        for (int k = 0; k < p.size(); k++) {
            double x = p.radius(k) / radius;
            if (x >= z.innerRadiusFraction() && x <= z.outerRadiusFraction()) {
                lo = Math.min(lo, p.temperature(k));
                hi = Math.max(hi, p.temperature(k));
            }
        }
        return new double[] {lo, hi};
    }

    private static int pointsInside(StellarProfile p, ConvectiveZone z) {
        double radius = p.radius(p.size() - 1);
        int n = 0;
        for (int k = 0; k < p.size(); k++) {
            double x = p.radius(k) / radius;
            if (x >= z.innerRadiusFraction() && x <= z.outerRadiusFraction() && p.convective(k)) {
                n++;
            }
        }
        return n;
    }
}
