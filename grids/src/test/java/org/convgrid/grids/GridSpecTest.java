package org.convgrid.grids;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.util.ArrayList;
import java.util.List;
import java.util.stream.IntStream;
import org.convgrid.engine.request.Age;
import org.convgrid.engine.request.ModelRequest;
import org.convgrid.engine.convection.StabilityCriterion;
import org.convgrid.engine.units.Constants;
import org.junit.jupiter.api.Test;

class GridSpecTest {

    private static final PhysicsAxes TWO_ALPHAS = new PhysicsAxes(List.of(1.6, 2.0), List.of(0.0),
            List.of(StabilityCriterion.SCHWARZSCHILD), List.of(1.0));

    private static GridSpec small() {
        return new GridSpec("t", List.of(0.5, 1.0, 1.5), List.of(new MetallicityPoint(0.01, 0.26),
                new MetallicityPoint(0.02, 0.28)), List.of(0.0, 1.0), TWO_ALPHAS, "runs/t", false);
    }

    @Test
    void expandsPhysicsThenMetallicityThenMassThenAge() {
        List<ModelRequest> all = small().expand();
        assertThat(all).hasSize(2 * 2 * 3 * 2);
        assertThat(all).extracting(ModelRequest::modelId).startsWith(
                "p0-z00-m000-a00", "p0-z00-m000-a01", "p0-z00-m001-a00", "p0-z00-m001-a01");
        assertThat(all.get(6).modelId()).isEqualTo("p0-z01-m000-a00");
        assertThat(all.get(12).modelId()).isEqualTo("p1-z00-m000-a00");
        assertThat(all.get(12).physics().mixingLength()).isEqualTo(2.0);
        // ids sort in grid order
        List<String> ids = new ArrayList<>(all.stream().map(ModelRequest::modelId).toList());
        List<String> sorted = new ArrayList<>(ids);
        sorted.sort(null);
        assertThat(sorted).isEqualTo(ids);
    }

    @Test
    void requestsAreInCgs() {
        ModelRequest r = small().expand().get(3); // p0 z00 m001 a01
        assertThat(r.mass()).isEqualTo(1.0 * Constants.M_SUN);
        assertThat(r.age()).isEqualTo(new Age.SinceZeroAge(1.0 * Constants.GYR));
        assertThat(r.initialMetals()).isEqualTo(0.01);
        assertThat(r.initialHelium()).isEqualTo(0.26);
    }

    @Test
    void randomAccessMatchesIteration() {
        GridSpec spec = small();
        List<ModelRequest> all = spec.expand();
        IntStream.range(0, all.size()).forEach(i -> assertThat(spec.requestAt(i)).isEqualTo(all.get(i)));
        assertThatThrownBy(() -> spec.requestAt(all.size())).isInstanceOf(IndexOutOfBoundsException.class);
    }

    @Test
    void sameGridGivesSameIds() {
        assertThat(small().expand()).isEqualTo(small().expand());
    }

    @Test
    void largeGridIsCountedAndWalkedLazily() {
        List<Double> masses = IntStream.rangeClosed(1, 2000).mapToObj(i -> i * 0.001).toList();
        List<MetallicityPoint> zs = IntStream.range(0, 50).mapToObj(i -> new MetallicityPoint(i * 0.001, 0.25))
                .toList();
        List<Double> ages = IntStream.range(0, 11).mapToObj(i -> i * 1.0).toList();
        GridSpec big = new GridSpec("big", masses, zs, ages, TWO_ALPHAS, "runs/big", false);
        assertThat(big.count()).isEqualTo(2L * 50 * 2000 * 11);
        assertThatThrownBy(big::expand).isInstanceOf(IllegalStateException.class);
        long walked = 0;
        ModelRequest last = null;
        for (ModelRequest r : big.requests()) {
            walked++;
            last = r;
        }
        assertThat(walked).isEqualTo(big.count());
        assertThat(last.modelId()).isEqualTo("p1-z49-m1999-a10");
        assertThat(big.requestAt(big.count() - 1)).isEqualTo(last);
        assertThat(big.estimateSeconds(ModelCost.constant(2.0), 4)).isEqualTo(big.count() * 2.0 / 4);
    }

    @Test
    void sliceIdIsTheModelIdWithoutItsMass() {
        assertThat(ModelIdFormat.sliceIdOf("p0-z01-m023-a02")).isEqualTo("p0-z01-a02");
        assertThat(ModelIdFormat.sliceIdOf("p0-z01-m999-a02")).isEqualTo(ModelIdFormat.sliceIdOf("p0-z01-m000-a02"));
        assertThat(ModelIdFormat.sliceIdOf("p0-z01-r007-a02")).as("a refinement id names no grid mass").isNull();
        assertThat(ModelIdFormat.sliceIdOf("p0-z01-m023")).as("a track id has no age").isNull();
    }

    @Test
    void trackIdIsTheModelIdWithoutItsAge() {
        assertThat(ModelIdFormat.trackIdOf("p0-z01-m023-a02")).isEqualTo("p0-z01-m023");
        assertThat(ModelIdFormat.forAxes(12, 1, 1000, 1).modelId(3, 0, 999, 0)).isEqualTo("p03-z00-m999-a00");
        assertThat(ModelIdFormat.forAxes(1, 1, 1001, 1).modelId(0, 0, 7, 0)).isEqualTo("p0-z00-m0007-a00");
    }

    @Test
    void modelsHashIgnoresTitleAndOutputButNotAxes() {
        GridSpec a = small();
        GridSpec renamed = new GridSpec("other", a.massesMsun(), a.metallicities(), a.agesGyr(), a.physics(),
                "elsewhere", true);
        GridSpec moved = new GridSpec("t", List.of(0.5, 1.0, 1.6), a.metallicities(), a.agesGyr(), a.physics(),
                "runs/t", false);
        assertThat(GridHash.ofModels(renamed)).isEqualTo(GridHash.ofModels(a));
        assertThat(GridHash.ofModels(moved)).isNotEqualTo(GridHash.ofModels(a));
        // SHA-256 of "abc", FIPS 180-2 appendix B.1
        assertThat(GridHash.ofBytes("abc".getBytes(java.nio.charset.StandardCharsets.US_ASCII)))
                .isEqualTo("ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad");
    }
}
