package org.convgrid.output.transitions;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.function.Predicate;
import org.convgrid.engine.convection.ConvectiveZoneFinder;
import org.convgrid.engine.convection.StructureClass;
import org.convgrid.output.Span;
import org.convgrid.output.catalogue.CatalogueRow;

/**
 * Reads the two convective transition masses off a catalogue, per {@link Slice} (method {@code grid}).
 *
 * <p>Only usable models count: status ok with a structure class. Within a slice they are taken in increasing mass,
 * and every change of state between neighbours is a crossing (all are listed, so flickering shows). The fully
 * convective limit is the lower end of the highest crossing from fully convective to not: the highest mass that is
 * still fully convective. The convective-core onset is the upper end of the lowest crossing from no core to a core:
 * the lowest mass with a convective core. A model has a convective core when it is not fully convective and
 * {@code core_cz_mass_frac} exceeds {@link #coreMassFractionThreshold()}. Unusable models between two usable
 * neighbours are skipped, widening the bracket; the estimate counts them. Slices come out in order of first
 * appearance, which for a catalogue in grid order is physics, then Z, then age. The method is {@code refined} when an
 * end of either bracket is a model that a refinement added ({@link RefinedModelIds}), {@code grid} otherwise, so
 * recomputing the table from a refined catalogue gives the refined answer again.
 *
 * @param coreMassFractionThreshold smallest m/M of a convective core that counts as a core, in [0, 1)
 */
public record TransitionFinder(double coreMassFractionThreshold) {

    /**
     * Default core threshold: the one the engine classifies with ({@link ConvectiveZoneFinder}), so that a star is
     * cored or coreless alike in the catalogue and in the transitions.
     */
    public static final double DEFAULT_CORE_MASS_FRACTION_THRESHOLD =
            ConvectiveZoneFinder.DEFAULT_MIN_CORE_MASS_FRACTION;

    public TransitionFinder {
        if (!(coreMassFractionThreshold >= 0.0 && coreMassFractionThreshold < 1.0)) {
            throw new IllegalArgumentException("core threshold must lie in [0, 1), got " + coreMassFractionThreshold);
        }
    }

    /** A finder with the default threshold. */
    public static TransitionFinder withDefaults() {
        return new TransitionFinder(DEFAULT_CORE_MASS_FRACTION_THRESHOLD);
    }

    /** One row per slice of the catalogue. */
    public List<TransitionRow> find(List<CatalogueRow> catalogue) {
        Map<Slice, List<CatalogueRow>> slices = new LinkedHashMap<>();
        for (CatalogueRow row : catalogue) {
            slices.computeIfAbsent(Slice.of(row), s -> new ArrayList<>()).add(row);
        }
        List<TransitionRow> rows = new ArrayList<>(slices.size());
        slices.forEach((slice, members) -> rows.add(find(slice, members)));
        return rows;
    }

    /** Whether a row is fully convective. */
    public static boolean isFullyConvective(CatalogueRow row) {
        return row.structureClass() == StructureClass.FULLY_CONVECTIVE;
    }

    /** Whether a row has a convective core under this finder's threshold. */
    public boolean hasConvectiveCore(CatalogueRow row) {
        return !isFullyConvective(row) && row.coreCzMassFrac() > coreMassFractionThreshold;
    }

    private TransitionRow find(Slice slice, List<CatalogueRow> members) {
        List<CatalogueRow> byMass = new ArrayList<>(members);
        byMass.sort(Comparator.comparingDouble(CatalogueRow::massMsun));
        List<CatalogueRow> usable = byMass.stream().filter(r -> r.isOk() && r.structureClass() != null).toList();
        List<String> notes = new ArrayList<>();
        if (usable.isEmpty()) {
            return new TransitionRow(slice, TransitionEstimate.NONE, TransitionEstimate.NONE, TransitionMethod.GRID,
                    "no usable model in this slice");
        }
        TransitionEstimate fc = estimate(byMass, usable, TransitionFinder::isFullyConvective, true);
        TransitionEstimate core = estimate(byMass, usable, r -> !hasConvectiveCore(r), false);
        describe("fully convective", fc, usable, TransitionFinder::isFullyConvective, notes);
        describe("convective core", core, usable, this::hasConvectiveCore, notes);
        TransitionMethod method = endsAtRefinedModel(fc, usable) || endsAtRefinedModel(core, usable)
                ? TransitionMethod.REFINED : TransitionMethod.GRID;
        return new TransitionRow(slice, fc, core, method, String.join("; ", notes));
    }

    /** Whether a bracket end of the estimate is a model a refinement added. */
    private static boolean endsAtRefinedModel(TransitionEstimate estimate, List<CatalogueRow> usable) {
        return estimate.found() && usable.stream().anyMatch(r -> RefinedModelIds.isRefined(r.modelId())
                && (r.massMsun() == estimate.bracket().lo() || r.massMsun() == estimate.bracket().hi()));
    }

    /**
     * Crossings of {@code lowSide} (the state below the transition) between usable neighbours; the transition is
     * the highest (takeHighest, reported at its lower end) or lowest (reported at its upper end) downward crossing.
     */
    private static TransitionEstimate estimate(List<CatalogueRow> all, List<CatalogueRow> usable,
                                               Predicate<CatalogueRow> lowSide, boolean takeHighest) {
        List<Span> crossings = new ArrayList<>();
        int chosen = -1;
        for (int i = 0; i + 1 < usable.size(); i++) {
            boolean below = lowSide.test(usable.get(i));
            if (below != lowSide.test(usable.get(i + 1))) {
                crossings.add(new Span(usable.get(i).massMsun(), usable.get(i + 1).massMsun()));
                if (below && (takeHighest || chosen < 0)) {
                    chosen = i;
                }
            }
        }
        if (chosen < 0) {
            return new TransitionEstimate(Double.NaN, null, crossings, 0);
        }
        double lo = usable.get(chosen).massMsun();
        double hi = usable.get(chosen + 1).massMsun();
        int skipped = (int) all.stream().filter(r -> r.massMsun() > lo && r.massMsun() < hi).count();
        return new TransitionEstimate(takeHighest ? lo : hi, new Span(lo, hi), crossings, skipped);
    }

    private static void describe(String what, TransitionEstimate estimate, List<CatalogueRow> usable,
                                 Predicate<CatalogueRow> state, List<String> notes) {
        if (!estimate.found()) {
            long count = usable.stream().filter(state).count();
            notes.add(count == usable.size() ? what + " at every usable mass"
                    : count == 0 ? "no " + what + " at any usable mass"
                    : what + " only in an unexpected mass order");
        }
        if (estimate.crossings().size() > 1) {
            notes.add(what + " changes " + estimate.crossings().size() + " times with mass");
        }
        if (estimate.skippedInBracket() > 0) {
            notes.add(what + " bracket widened past " + estimate.skippedInBracket() + " unusable model(s)");
        }
    }
}
