package org.convgrid.grids.yaml;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.nio.file.Path;
import java.util.List;
import org.convgrid.engine.request.AgeOrigin;
import org.convgrid.engine.request.PhysicsOptions;
import org.convgrid.engine.convection.StabilityCriterion;
import org.convgrid.grids.GridFile;
import org.convgrid.grids.GridSpec;
import org.convgrid.grids.MetallicityPoint;
import org.junit.jupiter.api.Test;

class GridFileReaderTest {

    private final GridFileReader reader = new GridFileReader();

    @Test
    void readsTheDemoClusterGrid() {
        GridFile file = reader.read(Path.of("demo-cluster.yaml"));
        GridSpec spec = file.spec();
        assertThat(spec.count()).isEqualTo(90);
        // myr: [20, 150, 600] from birth
        assertThat(spec.agesGyr()).containsExactly(0.02, 0.15, 0.6);
        assertThat(spec.ages().origin()).isEqualTo(AgeOrigin.BIRTH);
        assertThat(spec.massesMsun()).hasSize(10).startsWith(0.2, 0.4, 0.6).endsWith(2.0);
        // Y = 0.2471 + 1.5 Z: the law written in the file
        assertThat(spec.metallicities().get(1).y()).isCloseTo(0.2471 + 1.5 * 0.014, within(1e-15));
        assertThat(spec.outputDir()).isEqualTo("runs/demo-cluster");
        assertThat(file.fileSha256()).hasSize(64);
        assertThat(file.text()).contains("Lanternfield 7");
    }

    @Test
    void readsTheTransitionReferenceGrid() {
        GridSpec spec = reader.read(Path.of("transition-reference.yaml")).spec();
        assertThat(spec.massesMsun()).hasSize(39).contains(0.36, 0.55, 0.85, 1.18);
        assertThat(spec.metallicities()).extracting(MetallicityPoint::z).first().isEqualTo(1e-4);
        assertThat(spec.metallicities()).extracting(MetallicityPoint::z).last().isEqualTo(0.04);
        assertThat(spec.count()).isEqualTo(312);
        assertThat(spec.agesGyr()).containsExactly(0.0);
    }

    @Test
    void stepAxisUsesExactDecimalsAndIncludesTheEnd() {
        GridSpec spec = parse("mass: {from: 0.1, to: 0.7, step: 0.05}\nmetallicity: {z: 0.02, y: [0.28]}\n");
        // 0.1 + 4 * 0.05 in binary floating point is 0.30000000000000004; decimals give the written value
        assertThat(spec.massesMsun()).hasSize(13).contains(0.3, 0.35).endsWith(0.7);
    }

    @Test
    void stepThatDoesNotReachTheEndStopsBelowIt() {
        GridSpec spec = parse("mass: {from: 1, to: 2, step: 0.3}\nmetallicity: {z: 0.02, y: 0.28}\n");
        assertThat(spec.massesMsun()).containsExactly(1.0, 1.3, 1.6, 1.9);
    }

    @Test
    void countAxisLinearAndLog() {
        GridSpec linear = parse("mass: {from: 0.5, to: 1.5, count: 5}\nmetallicity: {z: 0.02, y: 0.28}\n");
        assertThat(linear.massesMsun()).containsExactly(0.5, 0.75, 1.0, 1.25, 1.5);
        GridSpec log = parse("mass: {from: 0.1, to: 10, count: 3, spacing: log}\nmetallicity: {z: 0.02, y: 0.28}\n");
        assertThat(log.massesMsun().get(0)).isEqualTo(0.1);
        assertThat(log.massesMsun().get(1)).isCloseTo(1.0, within(1e-14));
        assertThat(log.massesMsun().get(2)).isEqualTo(10.0);
    }

    @Test
    void defaultsAndPhysicsAxes() {
        GridSpec spec = parse("""
                mass: {values: [0.3, 1.0]}
                metallicity: {z: [0.001, 0.02], y: [0.25, 0.28]}
                physics:
                  mixing_length: [1.6, 2.0]
                  criterion: [schwarzschild, ledoux]
                """);
        assertThat(spec.title()).isEqualTo("test");
        assertThat(spec.outputDir()).isEqualTo("runs/test");
        assertThat(spec.profiles()).isFalse();
        assertThat(spec.agesGyr()).containsExactly(0.0);
        assertThat(spec.physics().combinations()).containsExactly(
                new PhysicsOptions(1.6, 0.0, StabilityCriterion.SCHWARZSCHILD, 1.0),
                new PhysicsOptions(1.6, 0.0, StabilityCriterion.LEDOUX, 1.0),
                new PhysicsOptions(2.0, 0.0, StabilityCriterion.SCHWARZSCHILD, 1.0),
                new PhysicsOptions(2.0, 0.0, StabilityCriterion.LEDOUX, 1.0));
        assertThat(spec.count()).isEqualTo(2 * 2 * 4);
        assertThat(spec.metallicities()).containsExactly(new MetallicityPoint(0.001, 0.25),
                new MetallicityPoint(0.02, 0.28));
    }

    @Test
    void explicitOutputAndAges() {
        GridSpec spec = parse("""
                title: Ages
                mass: {values: [1.0]}
                metallicity: {z: 0.014, helium: {primordial: 0.25, enrichment: 2}}
                age: {gyr: [0, 1.0, 4.57], origin: zams}
                output: {dir: somewhere/else, profiles: true}
                """);
        assertThat(spec.agesGyr()).isEqualTo(List.of(0.0, 1.0, 4.57));
        assertThat(spec.outputDir()).isEqualTo("somewhere/else");
        assertThat(spec.profiles()).isTrue();
        assertThat(spec.metallicities().get(0).y()).isCloseTo(0.278, within(1e-15));
    }

    private GridSpec parse(String text) {
        return reader.parse("test.yaml", text);
    }
}
