package org.convgrid.output.transitions;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.ArrayList;
import java.util.List;
import org.convgrid.engine.request.ModelStatus;
import org.convgrid.engine.request.OvershootScheme;
import org.convgrid.engine.convection.StabilityCriterion;
import org.convgrid.engine.convection.StructureClass;
import org.convgrid.output.Span;
import org.convgrid.output.catalogue.CatalogueRow;
import org.junit.jupiter.api.Test;

/** Synthetic catalogues: only mass, status, class and core size matter to the finder. */
class TransitionFinderTest {

    private static final StructureClass FC = StructureClass.FULLY_CONVECTIVE;
    private static final StructureClass ENV = StructureClass.CONV_ENVELOPE;
    private static final StructureClass BOTH = StructureClass.CONV_CORE_AND_ENVELOPE;

    private final TransitionFinder finder = TransitionFinder.withDefaults();

    static CatalogueRow row(double z, double mass, StructureClass c, double core, ModelStatus status) {
        return row("m" + mass, z, mass, c, core, status);
    }

    static CatalogueRow row(String modelId, double z, double mass, StructureClass c, double core,
                            ModelStatus status) {
        return CatalogueRow.builder(modelId, status).massMsun(mass).zInit(z).yInit(0.27).mixingLength(1.8)
                .overshootHp(0.0).ageGyr(0.0).structureClass(status == ModelStatus.OK ? c : null)
                .coreCzMassFrac(core).envCzBaseMassFrac(c == FC ? 0.0 : 0.5).envCzBaseRadiusFrac(0.7)
                .solverIterations(5).criterion(StabilityCriterion.SCHWARZSCHILD).opacityScale(1.0)
                .coreMixedMassFrac(core).overshootProfile(OvershootScheme.STEP).build();
    }

    static CatalogueRow ok(double mass, StructureClass c, double core) {
        return row(0.02, mass, c, core, ModelStatus.OK);
    }

    static CatalogueRow failedAt(double mass) {
        return row(0.02, mass, ENV, 0.0, ModelStatus.FAILED);
    }

    static CatalogueRow pastAt(double mass) {
        return row(0.02, mass, ENV, 0.0, ModelStatus.PAST_MAIN_SEQUENCE);
    }

    @Test
    void oneCleanCrossingOfEach() {
        List<CatalogueRow> rows = List.of(ok(0.2, FC, 1), ok(0.3, FC, 1), ok(0.4, ENV, 0), ok(1.0, ENV, 0),
                ok(1.2, BOTH, 0.05), ok(1.4, BOTH, 0.08));
        TransitionRow t = finder.find(rows).get(0);
        assertThat(t.fullyConvective().massMsun()).isEqualTo(0.3);
        assertThat(t.fullyConvective().bracket()).isEqualTo(new Span(0.3, 0.4));
        assertThat(t.fullyConvective().crossings()).hasSize(1);
        assertThat(t.convCoreOnset().massMsun()).isEqualTo(1.2);
        assertThat(t.convCoreOnset().bracket()).isEqualTo(new Span(1.0, 1.2));
        assertThat(t.transientCore()).isNull();
        assertThat(t.yInit()).isEqualTo(0.27);
        assertThat(t.method()).isEqualTo(TransitionMethod.GRID);
        assertThat(t.toleranceMsun()).isNaN();
        assertThat(t.notes()).isEmpty();
    }

    @Test
    void massesPastTheMainSequenceAreNamedAndChangeNoNumber() {
        List<CatalogueRow> searched = List.of(ok(0.2, FC, 1), ok(0.4, ENV, 0), ok(1.2, BOTH, 0.05),
                ok(1.4, BOTH, 0.08));
        List<CatalogueRow> withPast = new ArrayList<>(searched);
        withPast.add(row(0.02, 1.6, ENV, 0.0, ModelStatus.PAST_MAIN_SEQUENCE));
        withPast.add(row(0.02, 2.0, ENV, 0.0, ModelStatus.PAST_MAIN_SEQUENCE));
        withPast.add(row(0.02, 2.4, ENV, 0.0, ModelStatus.PAST_MAIN_SEQUENCE));
        TransitionRow plain = finder.find(searched).get(0);

        TransitionRow t = finder.find(withPast).get(0);

        assertThat(t.notes()).isEqualTo("1.6-2.4 Msun past the main sequence (not searched)");
        assertThat(t.fullyConvective()).isEqualTo(plain.fullyConvective());
        assertThat(t.convCoreOnset()).isEqualTo(plain.convCoreOnset());
        assertThat(t.transientCore()).isEqualTo(plain.transientCore());
        assertThat(plain.turnoff().found()).isFalse();
        assertThat(t.turnoff().bracket()).isEqualTo(new Span(1.4, 1.6));
        assertThat(t.convCoreOnset().massMsun()).isEqualTo(1.2);
    }

    @Test
    void oneMassPastTheMainSequenceIsNamedAlone() {
        List<CatalogueRow> rows = List.of(ok(0.2, FC, 1), ok(0.4, ENV, 0), ok(1.2, BOTH, 0.05),
                row(0.02, 1.4, ENV, 0.0, ModelStatus.PAST_MAIN_SEQUENCE));
        assertThat(finder.find(rows).get(0).notes()).isEqualTo("1.4 Msun past the main sequence (not searched)");
    }

    @Test
    void noCrossingLeavesTheMassEmptyAndSaysWhy() {
        TransitionRow allFc = finder.find(List.of(ok(0.1, FC, 1), ok(0.2, FC, 1))).get(0);
        assertThat(allFc.fullyConvective().found()).isFalse();
        assertThat(allFc.fullyConvective().massMsun()).isNaN();
        assertThat(allFc.convCoreOnset().found()).isFalse();
        assertThat(allFc.notes()).contains("fully convective at every usable mass",
                "no convective core at any usable mass");
        TransitionRow massive = finder.find(List.of(ok(1.5, BOTH, 0.1), ok(2.0, BOTH, 0.15))).get(0);
        assertThat(massive.notes()).contains("no fully convective model at any usable mass",
                "convective core at every usable mass");
    }

    @Test
    void severalCrossingsAreAllReported() {
        // flicker: FC, not, FC, not -> limit is the highest fully convective mass below a non-FC neighbour
        List<CatalogueRow> rows = List.of(ok(0.30, FC, 1), ok(0.32, ENV, 0), ok(0.34, FC, 1), ok(0.36, ENV, 0),
                ok(1.10, BOTH, 0.01), ok(1.15, ENV, 0), ok(1.20, BOTH, 0.03));
        TransitionRow t = finder.find(rows).get(0);
        assertThat(t.fullyConvective().crossings()).containsExactly(new Span(0.30, 0.32), new Span(0.32, 0.34),
                new Span(0.34, 0.36));
        assertThat(t.fullyConvective().massMsun()).isEqualTo(0.34);
        assertThat(t.convCoreOnset().crossings()).containsExactly(new Span(0.36, 1.10), new Span(1.10, 1.15),
                new Span(1.15, 1.20));
        // the lasting core starts at 1.20; the core of 1.10 alone is the transient window
        assertThat(t.convCoreOnset().massMsun()).isEqualTo(1.20);
        assertThat(t.transientCore()).isEqualTo(new Span(1.10, 1.10));
        assertThat(t.notes()).contains("fully convective changes 3 times with mass")
                .doesNotContain("convective core changes");
    }

    @Test
    void failedModelsAtTheBracketAreSkippedAndCounted() {
        List<CatalogueRow> rows = List.of(ok(0.30, FC, 1), failedAt(0.32), failedAt(0.34), ok(0.36, ENV, 0),
                ok(1.0, ENV, 0), failedAt(1.1), ok(1.2, BOTH, 0.04), failedAt(1.3));
        TransitionRow t = finder.find(rows).get(0);
        assertThat(t.fullyConvective().bracket()).isEqualTo(new Span(0.30, 0.36));
        assertThat(t.fullyConvective().skippedInBracket()).isEqualTo(2);
        assertThat(t.convCoreOnset().bracket()).isEqualTo(new Span(1.0, 1.2));
        assertThat(t.convCoreOnset().skippedInBracket()).isEqualTo(1);
        // said by their catalogue status, singular or plural as the count asks
        assertThat(t.notes().split("; ")).contains("fully convective bracket widened past 2 failed models",
                "convective core bracket widened past 1 failed model");
        assertThat(t.notes()).doesNotContain("(s)");
    }

    @Test
    void aFailedModelBetweenNeighboursOfOneStateIsNoCrossing() {
        List<CatalogueRow> rows = List.of(ok(0.2, FC, 1), failedAt(0.25), ok(0.3, FC, 1), ok(0.4, ENV, 0),
                failedAt(0.45));
        TransitionRow t = finder.find(rows).get(0);
        assertThat(t.fullyConvective().crossings()).containsExactly(new Span(0.3, 0.4));
        assertThat(t.fullyConvective().skippedInBracket()).isZero();
        assertThat(t.notes()).doesNotContain("widened");
    }

    @Test
    void theMethodIsRefinedWhenABracketEndIsARefinementModel() {
        CatalogueRow refinedEnd = CatalogueRow.builder("p0-z00-r003-a00", ModelStatus.OK).massMsun(0.3125)
                .zInit(0.02).yInit(0.27).mixingLength(1.8).overshootHp(0.0).ageGyr(0.0)
                .phase(CatalogueRow.MAIN_SEQUENCE).structureClass(ENV).envCzBaseMassFrac(0.5).envCzBaseRadiusFrac(0.7)
                .solverIterations(5).criterion(StabilityCriterion.SCHWARZSCHILD).opacityScale(1.0)
                .overshootProfile(OvershootScheme.STEP).build();
        List<CatalogueRow> grid = List.of(ok(0.3, FC, 1), ok(0.4, ENV, 0), ok(1.0, ENV, 0), ok(1.2, BOTH, 0.05));
        assertThat(finder.find(grid).get(0).method()).isEqualTo(TransitionMethod.GRID);
        List<CatalogueRow> refined = new ArrayList<>(grid);
        refined.add(refinedEnd);
        TransitionRow t = finder.find(refined).get(0);
        assertThat(t.fullyConvective().bracket()).isEqualTo(new Span(0.3, 0.3125));
        assertThat(t.method()).isEqualTo(TransitionMethod.REFINED);
    }

    @Test
    void tinyCoresBelowTheThresholdDoNotCount() {
        List<CatalogueRow> rows = List.of(ok(1.0, ENV, 0), ok(1.1, BOTH, 5e-4), ok(1.2, BOTH, 0.02));
        assertThat(finder.find(rows).get(0).convCoreOnset().massMsun()).isEqualTo(1.2);
        assertThat(new TransitionFinder(1e-4).find(rows).get(0).convCoreOnset().massMsun()).isEqualTo(1.1);
    }

    /** A usable model with its central hydrogen mass fraction set (the other rows leave it NaN). */
    static CatalogueRow withCentralH(double mass, StructureClass c, double core, double centralH) {
        CatalogueRow r = ok(mass, c, core);
        return r.toBuilder().centralHFrac(centralH).build();
    }

    /** A usable model with its central temperature set, K (the other rows leave it NaN). */
    /** A model at Z = 0.02 whose centre is at {@code centralT}, 80 g/cm^3 and X = 0.7 (a young main sequence's). */
    static CatalogueRow withCentralT(double mass, StructureClass c, double core, double centralT) {
        return withCentre(0.02, mass, c, core, centralT, 80.0, 0.7);
    }

    static CatalogueRow withCentre(double z, double mass, StructureClass c, double core, double centralT,
                                   double centralRho, double centralX) {
        CatalogueRow r = row(z, mass, c, core, ModelStatus.OK);
        return r.toBuilder().centralTempK(centralT).centralDensityCgs(centralRho).centralHFrac(centralX).build();
    }

    @Test
    void coresTooCoolForTheCnoCycleAreNamedAboveTheOnset() {
        // the shape of the demo's Z = 0.008, 150 Myr slice: every star from 0.38 Msun up has a core, but below
        // ~1 Msun the CNO cycle gives their centres under 1 % of the energy (COOL_CORE_CNO_SHARE's Javadoc; shares
        // from the network as `convgrid probe` gives them at 80 g/cm^3, X 0.7, Z 0.02: 0.57 % at 14.0 MK, 5.5 % at
        // 16.3 MK). Such a core cannot be the CNO cycle's: a cycle giving a hundredth of the energy cannot be what
        // makes the centre convective (the CNO-core onset near 1.1-1.2 Msun at solar Z: Kippenhahn, Weigert & Weiss
        // 2012, ch. 22; from memory)
        List<CatalogueRow> rows = List.of(withCentralT(0.2, FC, 1, 6.0e6), withCentralT(0.3, ENV, 0, 7.2e6),
                withCentralT(0.4, BOTH, 0.01, 8.0e6),
                withCentralT(0.8, BOTH, 0.02, 11.9e6), withCentralT(1.0, BOTH, 0.03, 14.0e6),
                withCentralT(1.2, BOTH, 0.06, 16.3e6));
        TransitionRow t = finder.find(rows).get(0);
        assertThat(t.convCoreOnset().massMsun()).isEqualTo(0.4);
        assertThat(t.notes()).isEqualTo("the cores at 0.4-1 Msun sit in centres where the CNO cycle gives under 1 % "
                + "of the energy, too cool for the CNO cycle: out-of-equilibrium burning drives them (3He on the main "
                + "sequence, 12C before it)");
        // hot centres above the onset: nothing to say
        List<CatalogueRow> hot = List.of(withCentralT(0.2, FC, 1, 6.0e6), withCentralT(1.0, ENV, 0, 14.0e6),
                withCentralT(1.2, BOTH, 0.06, 16.3e6));
        assertThat(finder.find(hot).get(0).notes()).isEmpty();
    }

    @Test
    void atLowMetallicityCoresInCentresHotterThanTheSunsAreStillNamedWhenThePpChainDrivesThem() {
        // [Fe/H] = -2 (Z = 1.843e-4), the shape of a run's 1 Gyr slice: cores from 0.35 Msun up, the 1.2 Msun one
        // at 19.3 MK with X_c 0.5 (CNO share 0.63 % at 60 g/cm^3), all of them gone by 1.7 Gyr; the cycle's rate scales with its
        // catalysts, so at this Z it takes ~23 MK for a few per cent (6.3 % at 23 MK, 50 g/cm^3). A fixed 12 MK named
        // only the cores up to 0.7 Msun and let the rest read as CNO cores
        double z = 1.843e-4;
        List<CatalogueRow> rows = List.of(withCentre(z, 0.3, FC, 1, 7.0e6, 150.0, 0.75),
                withCentre(z, 0.35, BOTH, 0.1, 8.0e6, 140.0, 0.75), withCentre(z, 0.7, BOTH, 0.01, 11.9e6, 110.0, 0.7),
                withCentre(z, 1.0, BOTH, 0.02, 16.0e6, 80.0, 0.6), withCentre(z, 1.2, BOTH, 0.03, 19.3e6, 60.0, 0.5),
                withCentre(z, 1.6, BOTH, 0.08, 23.0e6, 50.0, 0.5));
        TransitionRow t = finder.find(rows).get(0);
        assertThat(t.convCoreOnset().massMsun()).isEqualTo(0.35);
        assertThat(t.notes()).startsWith("the cores at 0.35-1.2 Msun sit in centres where the CNO cycle gives under 1 %");
        // the same centres at Z = 0.02 are the CNO cycle's from 16 MK (4.2 %): only the cooler two are named
        List<CatalogueRow> solar = rows.stream().map(r -> withCentre(0.02, r.massMsun(), r.structureClass(),
                r.coreCzMassFrac(), r.centralTempK(), r.centralDensityCgs(), r.centralHFrac())).toList();
        assertThat(finder.find(solar).get(0).notes()).startsWith("the cores at 0.35-0.7 Msun sit in centres");
        // Z = 0: no catalysts, no share to judge a core by, and no claim that burning out of equilibrium drives it
        List<CatalogueRow> metalFree = rows.stream().map(r -> withCentre(0.0, r.massMsun(), r.structureClass(),
                r.coreCzMassFrac(), r.centralTempK(), r.centralDensityCgs(), r.centralHFrac())).toList();
        assertThat(finder.find(metalFree).get(0).notes()).doesNotContain(TransitionFinder.COOL_CORES_WORDS);
    }

    @Test
    void coresThatRecededNearHydrogenExhaustionDoNotHideTheOnset() {
        // a slice at its turn-off (the shape of a Z = 0.02, 1 Gyr birth-track slice): cores from 1.2 up, and the
        // highest main-sequence model, X_c = 1.4e-4, has lost its core as stars do just before exhaustion
        // (Kippenhahn, Weigert & Weiss 2012, on main-sequence stars with convective cores; from memory)
        List<CatalogueRow> rows = List.of(withCentralH(1.0, ENV, 0, 0.6), withCentralH(1.2, BOTH, 0.02, 0.5),
                withCentralH(1.5, BOTH, 0.07, 0.2), withCentralH(1.6, ENV, 0, 1.4e-4));
        TransitionRow t = finder.find(rows).get(0);
        assertThat(t.convCoreOnset().massMsun()).isEqualTo(1.2);
        assertThat(t.convCoreOnset().crossings()).containsExactly(new Span(1.0, 1.2));
        assertThat(t.transientCore()).isNull();
        assertThat(t.notes()).isEqualTo("no fully convective model at any usable mass; the core search leaves out "
                + "the model at 1.6 Msun, coreless with central hydrogen below 0.01: cores recede as hydrogen runs "
                + "out");
        // with hydrogen left the same coreless top model is a real gap in the cores: no onset, and said so
        List<CatalogueRow> young = List.of(rows.get(0), rows.get(1), rows.get(2), withCentralH(1.6, ENV, 0, 0.3));
        TransitionRow y = finder.find(young).get(0);
        assertThat(y.convCoreOnset().found()).isFalse();
        assertThat(y.notes()).contains("the highest usable masses have none").doesNotContain("leaves out");
    }

    @Test
    void coresAtEveryMassSearchedSaySoWithoutCountingTheOnesLeftOut() {
        // the Z = 0.001, 1 Gyr birth-track slice: cores from 0.8 to 1.5 Msun, 1.6 Msun coreless at X_c = 1.4e-4
        TransitionRow t = finder.find(List.of(withCentralH(0.8, BOTH, 0.01, 0.7), withCentralH(1.5, BOTH, 0.045, 0.19),
                withCentralH(1.6, ENV, 0, 1.4e-4))).get(0);
        assertThat(t.convCoreOnset().found()).isFalse();
        assertThat(t.notes()).contains("convective core at every usable mass searched; the core search leaves out "
                + "the model at 1.6 Msun");
    }

    @Test
    void aSliceWhoseOnlyModelsLostTheirCoresSaysNoCore() {
        TransitionRow t = finder.find(List.of(withCentralH(1.6, ENV, 0, 1e-4), withCentralH(1.7, ENV, 0, 5e-5)))
                .get(0);
        assertThat(t.convCoreOnset().found()).isFalse();
        assertThat(t.notes()).contains("no convective core at any usable mass").doesNotContain("leaves out");
    }

    @Test
    void oneCrossingIsCountedOnceAndNamesNoWindowThatIsNotThere() {
        // cores at every mass but the highest, which still burns hydrogen: one crossing, out of the cores
        TransitionRow t = finder.find(List.of(withCentralH(0.8, BOTH, 0.01, 0.7), withCentralH(1.0, ENV, 0, 0.6)))
                .get(0);
        assertThat(t.notes()).contains("convective core changes once with mass")
                .doesNotContain("transient one");
    }

    @Test
    void oneRowPerSliceInOrderOfFirstAppearanceWithMassesSorted() {
        List<CatalogueRow> rows = new ArrayList<>();
        rows.add(row(0.001, 0.4, ENV, 0, ModelStatus.OK));
        rows.add(row(0.001, 0.3, FC, 1, ModelStatus.OK));
        rows.add(row(0.02, 0.2, FC, 1, ModelStatus.OK));
        rows.add(row(0.02, 0.3, ENV, 0, ModelStatus.OK));
        rows.add(row(0.03, 0.3, ENV, 0, ModelStatus.FAILED));
        List<TransitionRow> found = finder.find(rows);
        assertThat(found).extracting(t -> t.slice().zInit()).containsExactly(0.001, 0.02, 0.03);
        assertThat(found.get(0).fullyConvective().massMsun()).isEqualTo(0.3);
        assertThat(found.get(1).fullyConvective().massMsun()).isEqualTo(0.2);
        assertThat(found.get(2).notes()).isEqualTo("no usable model in this slice");
    }
}
