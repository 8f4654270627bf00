package org.convgrid.survey;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.ArrayList;
import java.util.List;
import org.convgrid.engine.batch.Shard;
import org.convgrid.engine.convection.StabilityCriterion;
import org.convgrid.grids.GridSpec;
import org.convgrid.grids.MetallicityPoint;
import org.convgrid.grids.PhysicsAxes;
import org.junit.jupiter.api.Test;

/** A shard's model count comes from the axes and equals the requests it owns. */
class ShardPlanTest {

    private static GridSpec grid(int masses, int metallicities, int ages, List<Double> alphas) {
        List<Double> m = new ArrayList<>();
        for (int i = 0; i < masses; i++) {
            m.add(0.1 + 0.05 * i);
        }
        List<MetallicityPoint> z = new ArrayList<>();
        for (int i = 0; i < metallicities; i++) {
            z.add(new MetallicityPoint(0.001 * (i + 1), 0.25 + 0.001 * i));
        }
        List<Double> a = new ArrayList<>();
        for (int i = 0; i < ages; i++) {
            a.add(0.1 * i);
        }
        PhysicsAxes physics = new PhysicsAxes(alphas, List.of(0.0), List.of(StabilityCriterion.SCHWARZSCHILD),
                List.of(1.0));
        return new GridSpec("t", m, z, a, physics, "runs/t", false);
    }

    @Test
    void theCountFromTheAxesEqualsTheRequestsEveryShardOwns() {
        for (GridSpec g : List.of(grid(20, 3, 3, List.of(1.8)), grid(7, 5, 1, List.of(1.6, 2.0)),
                grid(8, 4, 2, List.of(1.8)), grid(1, 2, 4, List.of(1.8)), grid(33, 1, 1, List.of(1.5, 1.8, 2.1)))) {
            for (int count = 1; count <= 7; count++) {
                long total = 0;
                for (int index = 1; index <= count; index++) {
                    ShardPlan plan = new ShardPlan(g, new Shard(index, count), 8);
                    assertThat(plan.count()).as("shard %d/%d of %d models", index, count, g.count())
                            .isEqualTo(plan.walkedCount());
                    total += plan.count();
                }
                assertThat(total).isEqualTo(g.count());
            }
        }
    }

    @Test
    void aHugeGridIsCountedAtOnce() {
        List<Double> masses = new ArrayList<>();
        for (int i = 0; i < 100_000; i++) {
            masses.add(0.1 + 1e-5 * i);
        }
        List<Double> ages = new ArrayList<>();
        for (int i = 0; i < 1_000; i++) {
            ages.add(1e-3 * i);
        }
        GridSpec huge = new GridSpec("huge", masses, List.of(new MetallicityPoint(0.02, 0.28),
                new MetallicityPoint(0.01, 0.26)), ages, new PhysicsAxes(List.of(1.8), List.of(0.0),
                List.of(StabilityCriterion.SCHWARZSCHILD), List.of(1.0)), "runs/huge", false);
        long start = System.nanoTime();
        long a = new ShardPlan(huge, new Shard(1, 3), 8).count();
        long b = new ShardPlan(huge, new Shard(2, 3), 8).count();
        long c = new ShardPlan(huge, new Shard(3, 3), 8).count();
        assertThat(a + b + c).isEqualTo(200_000_000L);
        // 2e8 models: walking them would take minutes; the axes answer in well under a second
        assertThat((System.nanoTime() - start) / 1e9).isLessThan(1.0);
    }
}
