package org.convgrid.output.transitions;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Collectors;
import org.convgrid.engine.convection.ConvectiveZoneFinder;
import org.convgrid.engine.convection.StructureClass;
import org.convgrid.engine.request.ModelStatus;
import org.convgrid.output.Span;
import org.convgrid.output.catalogue.CatalogueRow;

/**
 * Reads the transition masses off a catalogue, per {@link Slice}.
 *
 * <p>Only usable models count: status ok with a structure class. Within a slice they are taken in increasing mass,
 * and every change of state between neighbours is a crossing. The fully convective limit is the lower end of the
 * highest crossing out of full convection: the highest mass that is still fully convective. A model has a
 * convective core when it is not fully convective and {@code core_cz_mass_frac} exceeds
 * {@link #coreMassFractionThreshold()}. The convective-core onset is the upper end of the last crossing into a core
 * when the highest usable masses have one: the mass above which every model keeps a core. The transient window is
 * the lowest run of cored models that coreless ones follow (the small central cores just above the fully
 * convective limit): its lowest and highest masses. Unusable models between two usable neighbours are skipped,
 * widening the bracket; the estimate counts them. Slices come out in order of first appearance, which for a
 * catalogue in grid order is physics, then Z, then age. The method is {@code refined} when an end of a reported
 * bracket (or of a crossing that bounds the transient window) is a model that a refinement added
 * ({@link RefinedModelIds}), {@code grid} otherwise, so recomputing the table from a refined catalogue gives the
 * refined answer again; the tolerance is the caller's to add ({@link TransitionRow#withTolerance}).
 *
 * <p>The core search leaves out the coreless models at the top of a slice whose central hydrogen is nearly gone
 * (below {@link #RECEDED_CORE_CENTRAL_H}): a convective core shrinks as hydrogen runs out and vanishes in the last
 * contraction before exhaustion (Kippenhahn, Weigert &amp; Weiss 2012, Stellar Structure and Evolution, 2nd ed.,
 * on main-sequence stars with convective cores; from memory, chapter not checked), so those stars say nothing about the mass at which cores set in, and counting them would leave every
 * slice that reaches its turn-off without one. Such a slice's note names them.
 *
 * <p>Models past the main sequence are not searched at all (no structure is kept for them), so a slice that holds
 * some says which masses in its notes: its "core in every star above" means up to the highest main-sequence mass.
 *
 * <p>The main-sequence turn-off is read off the statuses alone, among the models with status ok or
 * {@code past_main_sequence} in increasing mass (failed and unconverged ones skipped, widening the bracket): the
 * lower end of the highest crossing from ok to past the main sequence, the highest mass still on the main sequence
 * at the slice's age, as the fully convective limit is the last mass still fully convective. A slice without a
 * model past the main sequence has no turn-off, and no note says so (every young slice is one); a slice whose
 * statuses change more than once with mass (models on the main sequence above ones past it) says so in its notes.
 *
 * <p>The lithium depletion boundary ({@link LithiumDepletionBoundary}) is read off the surface lithium of the usable
 * models that follow it: the highest mass that keeps more than 1 % of its birth lithium below the lowest one that
 * has burnt 99 % of it.
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

    /**
     * Central hydrogen mass fraction below which a coreless model at the top of a slice is taken to have lost its
     * core to hydrogen exhaustion. Our choice: measured on birth tracks (convgrid run, 0.8-2.4 Msun, Z = 0.001 and
     * 0.02, 1 and 2 Gyr), cores persisted down to X_c = 0.045 and the one coreless model at the top of a slice had
     * X_c = 1.4e-4.
     */
    public static final double RECEDED_CORE_CENTRAL_H = 0.01;

    /**
     * The share of the centre's nuclear energy from the CNO cycle ({@link CentralCnoShare}) below which a convective
     * core cannot be the CNO cycle's: 1 %. A cycle that releases under a hundredth of the energy there cannot be what
     * concentrates it enough to make the centre convective, so what drives such a core is burning out of equilibrium:
     * 3He on the young main sequence, 12C before the zero-age main sequence. A reader of {@code conv_core_onset_msun}
     * who takes it for the CNO-core onset is told (it has been read so). It replaced a fixed 12 MK, which is
     * right only near solar Z: at Z = 0.02 the share is 0.05 % at 12 MK and 1 % near 14.5 MK (ours, {@code convgrid
     * probe} at rho 80 g/cm^3, X 0.7: 0.05 % at 12 MK, 0.57 % at 14 MK, 4.2 % at 16 MK), but at [Fe/H] = -2 the cores
     * of 0.75-1.2 Msun at 1 Gyr sit above 12 MK (up to 19.3 MK) with 0.6 % at most, and all of them end before 1.7 Gyr
     * in stars that live 2.7-12 Gyr (a grid run on 2026-12-05).
     */
    public static final double COOL_CORE_CNO_SHARE = 0.01;
    /** {@link #COOL_CORE_CNO_SHARE} in the words of the notes and the charts. */
    public static final String COOL_CORE_SHARE_WORDS = Math.round(100.0 * COOL_CORE_CNO_SHARE) + " %";

    /** The words of the note {@link #COOL_CORE_CNO_SHARE} adds, by which a reader of the notes finds it. */
    public static final String COOL_CORES_WORDS = "too cool for the CNO cycle";
    /**
     * How the notes introduce the other windows of cores, after the reported one; {@link #otherWindowsNoted} reads
     * them back. Their masses are written as {@link MassRangeText} writes them, fixed point, so that the reader needs
     * no exponents.
     */
    private static final String TRANSIENT_ONE_WORDS = "; the lowest window of cores is the transient one";
    /** As {@link #TRANSIENT_ONE_WORDS} when cores also lie below the fully convective limit (named among the others). */
    private static final String TRANSIENT_ABOVE_WORDS = "; the lowest window of cores above the fully convective limit "
            + "is the transient one";
    private static final String OTHER_WINDOWS_WORDS = ", others at ";
    /** How the notes name cores below the fully convective limit when no window lies above it. */
    private static final String CORES_BELOW_WORDS = "; cores below the fully convective limit at ";
    private static final String MASS = "\\d+(?:\\.\\d+)?";
    private static final String RANGE = MASS + "(?:-" + MASS + ")?";
    private static final Pattern OTHER_WINDOWS = Pattern.compile("(?:" + Pattern.quote(TRANSIENT_ONE_WORDS) + "|"
            + Pattern.quote(TRANSIENT_ABOVE_WORDS) + ")" + Pattern.quote(OTHER_WINDOWS_WORDS) + "(" + RANGE + "(?:, "
            + RANGE + ")*) Msun");

    /** What drives such cores, in the notes and the charts' caveat alike. */
    public static final String COOL_CORES_CAUSE = "out-of-equilibrium burning drives them (3He on the main sequence, "
            + "12C before it)";

    /** Whether a row can tell whether it keeps its lithium: status ok with a surface lithium value. */
    public static boolean followsLithium(CatalogueRow row) {
        return LithiumDepletionBoundary.followsLithium(row);
    }

    /** Whether a slice's notes say that its lowest mass has burnt its lithium (the boundary lies below the grid). */
    public static boolean notesLithiumBelowGrid(String notes) {
        return notes != null && notes.contains(LithiumDepletionBoundary.BELOW_GRID_WORDS);
    }

    /** Whether a slice's notes say that cores above its onset are too cool for the CNO cycle. */
    public static boolean notesCoolCores(String notes) {
        return notes != null && notes.contains(COOL_CORES_WORDS);
    }

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

    /**
     * Whether a row keeps more than 1 % of its birth lithium (the low side of the lithium depletion boundary); false
     * for a row without a lithium value, so ask it of rows that {@link #followsLithium} only.
     */
    public static boolean keepsLithium(CatalogueRow row) {
        return LithiumDepletionBoundary.keepsLithium(row);
    }

    /** Whether a row has a convective core under this finder's threshold. */
    public boolean hasConvectiveCore(CatalogueRow row) {
        return !isFullyConvective(row) && row.coreCzMassFrac() > coreMassFractionThreshold;
    }

    private TransitionRow find(Slice slice, List<CatalogueRow> members) {
        List<CatalogueRow> byMass = new ArrayList<>(members);
        byMass.sort(Comparator.comparingDouble(CatalogueRow::massMsun));
        double yInit = byMass.get(0).yInit();
        TransitionEstimate turnoff = MainSequenceTurnoff.of(byMass);
        List<CatalogueRow> usable = byMass.stream().filter(r -> r.isOk() && r.structureClass() != null).toList();
        TransitionMethod turnoffMethod = turnoff.found() && endsAtRefinedModel(turnoff.bracket(), byMass)
                ? TransitionMethod.REFINED : TransitionMethod.GRID;
        if (usable.isEmpty()) {
            List<String> notes = new ArrayList<>(List.of("no usable model in this slice"));
            MainSequenceTurnoff.describe(turnoff, byMass, notes);
            return new TransitionRow(slice, yInit, TransitionEstimate.NONE, TransitionEstimate.NONE, null, turnoff,
                    LithiumDepletion.NONE, turnoffMethod, Double.NaN, String.join("; ", notes));
        }
        LithiumDepletion lithium = LithiumDepletionBoundary.of(byMass);
        List<String> notes = new ArrayList<>();
        List<Span> fcCrossings = StateCrossings.of(usable, TransitionFinder::isFullyConvective);
        TransitionEstimate fc = StateCrossings.estimate(byMass, fcCrossings,
                StateCrossings.leaving(fcCrossings, usable, TransitionFinder::isFullyConvective, true), true);
        List<CatalogueRow> coreSearch = withoutRecededCores(usable);
        List<Span> coreCrossings = StateCrossings.of(coreSearch, this::hasConvectiveCore);
        boolean coredAtTop = hasConvectiveCore(coreSearch.get(coreSearch.size() - 1));
        TransitionEstimate core = coredAtTop && !coreCrossings.isEmpty()
                ? StateCrossings.estimate(byMass, coreCrossings, coreCrossings.size() - 1, false)
                : new TransitionEstimate(Double.NaN, null, coreCrossings, 0);
        Span window = transientWindow(coreSearch, coreCrossings, fc);
        describeFullyConvective(fc, usable, byMass, notes);
        describeCore(core, fc, window, coredAtTop, coreSearch, coreSearch.size() < usable.size(), byMass, notes);
        describeRecededCores(usable.subList(coreSearch.size(), usable.size()), notes);
        describePastMainSequence(byMass, notes);
        MainSequenceTurnoff.describe(turnoff, byMass, notes);
        LithiumDepletionBoundary.describe(lithium, byMass, notes);
        TransitionRow row = new TransitionRow(slice, yInit, fc, core, window, TransitionMethod.GRID, Double.NaN, "");
        List<Span> reported = new ArrayList<>(row.transientCoreCrossings());
        if (fc.found()) {
            reported.add(fc.bracket());
        }
        if (core.found()) {
            reported.add(core.bracket());
        }
        if (lithium.found()) {
            reported.add(lithium.boundary().bracket());
        }
        TransitionMethod method = turnoffMethod == TransitionMethod.REFINED
                || reported.stream().anyMatch(span -> endsAtRefinedModel(span, usable))
                ? TransitionMethod.REFINED : TransitionMethod.GRID;
        return new TransitionRow(slice, yInit, fc, core, window, turnoff, lithium, method, Double.NaN,
                String.join("; ", notes));
    }

    /**
     * The usable models without the coreless ones at the top whose central hydrogen is below
     * {@link #RECEDED_CORE_CENTRAL_H}; all of them when that would leave none.
     */
    private List<CatalogueRow> withoutRecededCores(List<CatalogueRow> usable) {
        int end = usable.size();
        while (end > 0 && !hasConvectiveCore(usable.get(end - 1))
                && usable.get(end - 1).centralHFrac() < RECEDED_CORE_CENTRAL_H) {
            end--;
        }
        return end == 0 ? usable : usable.subList(0, end);
    }

    /**
     * The lowest run of cored models above the fully convective limit (anywhere when there is no limit) entered from
     * below and left again above: from the upper end of its crossing into a core to the lower end of its crossing
     * out; null when there is none. The table's window is the one just above the limit; runs below it (a star with a
     * core, fully convective again above it: the stars near the limit cycle) are named in the notes instead.
     */
    private Span transientWindow(List<CatalogueRow> usable, List<Span> coreCrossings, TransitionEstimate fc) {
        for (int i = 0; i + 1 < coreCrossings.size(); i++) {
            double entry = coreCrossings.get(i).hi();
            boolean into = usable.stream().anyMatch(r -> r.massMsun() == entry && hasConvectiveCore(r));
            if (into && (!fc.found() || entry > fc.massMsun())) {
                return new Span(entry, coreCrossings.get(i + 1).lo());
            }
        }
        return null;
    }

    private static boolean endsAtRefinedModel(Span span, List<CatalogueRow> rows) {
        return rows.stream().anyMatch(r -> RefinedModelIds.isRefined(r.modelId())
                && (r.massMsun() == span.lo() || r.massMsun() == span.hi()));
    }

    private static void describeFullyConvective(TransitionEstimate fc, List<CatalogueRow> usable,
                                                List<CatalogueRow> byMass, List<String> notes) {
        if (!fc.found()) {
            long count = usable.stream().filter(TransitionFinder::isFullyConvective).count();
            notes.add(count == usable.size() ? "fully convective at every usable mass"
                    : count == 0 ? "no fully convective model at any usable mass"
                    : "fully convective only in an unexpected mass order");
        }
        if (fc.crossings().size() > 1) {
            notes.add("fully convective changes " + StateCrossings.timesInWords(fc.crossings().size()) + " with mass");
        }
        if (fc.skippedInBracket() > 0) {
            notes.add("fully convective bracket widened past " + SkippedModelsText.of(byMass, fc.bracket()));
        }
    }

    private void describeCore(TransitionEstimate core, TransitionEstimate fc, Span window, boolean coredAtTop,
                              List<CatalogueRow> searched, boolean someLeftOut, List<CatalogueRow> byMass,
                              List<String> notes) {
        long cored = searched.stream().filter(this::hasConvectiveCore).count();
        if (!core.found()) {
            notes.add(cored == searched.size()
                    ? "convective core at every usable mass" + (someLeftOut ? " searched" : "")
                    : cored == 0 ? "no convective core at any usable mass"
                    : "no mass above which every star has a convective core: the highest usable masses have none");
        }
        // a clean slice crosses once (no window) or three times (window, then the lasting core)
        int expected = (window == null ? 0 : 2) + (coredAtTop ? 1 : 0);
        if (core.crossings().size() > expected) {
            boolean coresBelow = fc.found() && searched.stream().anyMatch(r -> r.massMsun() < fc.massMsun()
                    && hasConvectiveCore(r));
            notes.add("convective core changes " + StateCrossings.timesInWords(core.crossings().size()) + " with mass"
                    + (window != null ? (coresBelow ? TRANSIENT_ABOVE_WORDS : TRANSIENT_ONE_WORDS)
                    + otherWindows(searched, window, core)
                    : coresBelow ? CORES_BELOW_WORDS + coresBelowText(searched, fc) + " Msun" : ""));
        }
        if (core.skippedInBracket() > 0) {
            notes.add("convective core bracket widened past " + SkippedModelsText.of(byMass, core.bracket()));
        }
        if (core.found()) {
            describeCoolCores(searched.stream().filter(r -> r.massMsun() >= core.massMsun() && hasConvectiveCore(r)
                    && CentralCnoShare.of(r) < COOL_CORE_CNO_SHARE).toList(), notes);
        }
    }

    /**
     * Says which of the cores above the onset are too cool at the centre for the CNO cycle
     * ({@link #COOL_CORE_CNO_SHARE}), so that the onset is not read as the CNO-core onset.
     */
    private static void describeCoolCores(List<CatalogueRow> cool, List<String> notes) {
        if (cool.isEmpty()) {
            return;
        }
        Span masses = new Span(cool.get(0).massMsun(), cool.get(cool.size() - 1).massMsun());
        notes.add("the cores at " + MassRangeText.of(masses) + " Msun sit in centres where the CNO cycle gives under "
                + COOL_CORE_SHARE_WORDS + " of the energy, " + COOL_CORES_WORDS + ": " + COOL_CORES_CAUSE);
    }

    /**
     * ", others at 0.8, 0.95-1.1 Msun": the runs of cored models other than the transient window below the lasting
     * core (above the window, and below it where cores lie under the fully convective limit), so that a window the
     * reported one hides behind a single coreless model can be seen; empty when none.
     *
     * @param searched the models of the core search, in increasing mass
     */
    private String otherWindows(List<CatalogueRow> searched, Span window, TransitionEstimate core) {
        double lasting = core.found() ? core.massMsun() : Double.POSITIVE_INFINITY;
        List<Span> runs = coredRuns(searched, m -> (m > window.hi() || m < window.lo()) && m < lasting);
        return runs.isEmpty() ? "" : OTHER_WINDOWS_WORDS + runs.stream().map(MassRangeText::of)
                .collect(Collectors.joining(", ")) + " Msun";
    }

    /** The runs of cored models below the fully convective limit, as {@link MassRangeText} writes them. */
    private String coresBelowText(List<CatalogueRow> searched, TransitionEstimate fc) {
        return coredRuns(searched, m -> m < fc.massMsun()).stream().map(MassRangeText::of)
                .collect(Collectors.joining(", "));
    }

    /** The unbroken runs of cored models among {@code searched} (in increasing mass) whose mass {@code counts}. */
    private List<Span> coredRuns(List<CatalogueRow> searched, java.util.function.DoublePredicate counts) {
        List<Span> runs = new ArrayList<>();
        Span run = null;
        for (CatalogueRow r : searched) {
            double m = r.massMsun();
            if (counts.test(m) && hasConvectiveCore(r)) {
                run = run == null ? new Span(m, m) : new Span(run.lo(), m);
            } else if (run != null) {
                runs.add(run);
                run = null;
            }
        }
        if (run != null) {
            runs.add(run);
        }
        return runs;
    }

    /**
     * The other windows of cores a slice's notes name ({@link #otherWindows}: cored runs other than the transient
     * window below the lasting core, those below the fully convective limit too), read back so that a chart can draw
     * them beside the reported window; empty when the notes name none. The demo's Z = 0.014, 600 Myr slice reports 0.314-0.323 Msun and names 0.3266-0.575
     * behind one coreless model at 0.325.
     */
    public static List<Span> otherWindowsNoted(String notes) {
        Matcher m = notes == null ? null : OTHER_WINDOWS.matcher(notes);
        if (m == null || !m.find()) {
            return List.of();
        }
        List<Span> out = new ArrayList<>();
        for (String part : m.group(1).split(", ")) {
            String[] ends = part.split("-");
            double lo = Double.parseDouble(ends[0]);
            out.add(new Span(lo, ends.length == 1 ? lo : Double.parseDouble(ends[1])));
        }
        return out;
    }

    /**
     * Names the masses past the main sequence, each unbroken run of them on its own ("1.6-2.4 Msun past the main
     * sequence (not searched)"): every transition of the slice was read below them.
     */
    private static void describePastMainSequence(List<CatalogueRow> byMass, List<String> notes) {
        List<Span> runs = new ArrayList<>();
        int start = -1;
        for (int i = 0; i <= byMass.size(); i++) {
            boolean past = i < byMass.size() && byMass.get(i).status() == ModelStatus.PAST_MAIN_SEQUENCE;
            if (past && start < 0) {
                start = i;
            } else if (!past && start >= 0) {
                runs.add(new Span(byMass.get(start).massMsun(), byMass.get(i - 1).massMsun()));
                start = -1;
            }
        }
        if (!runs.isEmpty()) {
            notes.add(String.join(", ", runs.stream().map(MassRangeText::of).toList())
                    + " Msun past the main sequence (not searched)");
        }
    }

    private static void describeRecededCores(List<CatalogueRow> receded, List<String> notes) {
        if (receded.isEmpty()) {
            return;
        }
        double lo = receded.get(0).massMsun();
        double hi = receded.get(receded.size() - 1).massMsun();
        notes.add("the core search leaves out " + (receded.size() == 1 ? "the model" : receded.size() + " models")
                + " at " + MassRangeText.of(new Span(lo, hi)) + " Msun, coreless with central hydrogen below "
                + RECEDED_CORE_CENTRAL_H + ": cores recede as hydrogen runs out");
    }
}
