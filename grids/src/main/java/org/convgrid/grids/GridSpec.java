package org.convgrid.grids;

import java.util.ArrayList;
import java.util.Iterator;
import java.util.List;
import java.util.NoSuchElementException;
import java.util.Objects;
import org.convgrid.engine.request.ModelRequest;
import org.convgrid.engine.request.PhysicsOptions;
import org.convgrid.engine.units.Constants;
import org.convgrid.grids.words.MessageNumbers;

/**
 * A model grid as the grid file describes it, validated. Values are in the grid file's units (solar masses, Gyr);
 * {@link #requestAt(long)} converts to the engine's cgs.
 *
 * <p>Grid order, outermost axis first: physics combination, metallicity, mass, age. Each (physics, Z) line is thus
 * walked in increasing mass, so the scheduler can seed each model from its lower-mass neighbour, and the ages of one
 * track are contiguous, so one evolution run yields them in order. The index of a model in this order is
 * {@code ((p * nZ + z) * nM + m) * nA + a}.
 *
 * @param title free text
 * @param massesMsun total masses, solar masses, strictly increasing
 * @param metallicities initial compositions, strictly increasing in Z
 * @param ages the age axis, strictly increasing: Gyr since the ZAMS, or fractions of each star's main-sequence
 *             lifetime (then every request asks for an {@link org.convgrid.engine.request.Age.MainSequenceFraction})
 * @param physics the physics axes
 * @param outputDir the run directory as written in the file (relative paths are the caller's to resolve)
 * @param profiles whether one profile file per model is wanted
 * @param transitions whether and how finely {@code run} refines the transition masses
 */
public record GridSpec(String title, List<Double> massesMsun, List<MetallicityPoint> metallicities,
                       AgeAxis ages, PhysicsAxes physics, String outputDir, boolean profiles,
                       TransitionSettings transitions) {

    /** Largest grid {@link #expand()} materialises; iterate {@link #requests()} beyond it. */
    public static final long MAX_EXPANDED = 1_000_000L;

    public GridSpec {
        Objects.requireNonNull(title, "title");
        Objects.requireNonNull(outputDir, "outputDir");
        massesMsun = increasing(massesMsun, "mass");
        metallicities = List.copyOf(metallicities);
        Objects.requireNonNull(ages, "ages");
        ages = ages.withValues(increasing(ages.values(), "age"));
        Objects.requireNonNull(physics, "physics");
        Objects.requireNonNull(transitions, "transitions");
        if (metallicities.isEmpty()) {
            throw new IllegalArgumentException("metallicity axis is empty");
        }
    }

    /** A grid with the default transition settings. */
    public GridSpec(String title, List<Double> massesMsun, List<MetallicityPoint> metallicities, AgeAxis ages,
                    PhysicsAxes physics, String outputDir, boolean profiles) {
        this(title, massesMsun, metallicities, ages, physics, outputDir, profiles, TransitionSettings.DEFAULT);
    }

    /** A grid with ages in Gyr. */
    public GridSpec(String title, List<Double> massesMsun, List<MetallicityPoint> metallicities, List<Double> agesGyr,
                    PhysicsAxes physics, String outputDir, boolean profiles) {
        this(title, massesMsun, metallicities, AgeAxis.gyr(agesGyr), physics, outputDir, profiles);
    }

    /**
     * The ages in Gyr.
     *
     * @throws IllegalStateException when the grid gives its ages as main-sequence fractions
     */
    public List<Double> agesGyr() {
        if (ages.fractions()) {
            throw new IllegalStateException("this grid gives its ages as main-sequence fractions: " + ages.values());
        }
        return ages.values();
    }

    /**
     * Whether the grid file gave its compositions as [Fe/H] ({@code fe_h_dex}); then the run's charts and report name
     * each one's [Fe/H] beside its Z.
     */
    public boolean givesIron() {
        return metallicities.get(0).givenAsIron();
    }

    /**
     * The Sun the run's tables measure [Fe/H] ({@code fe_h_dex}) against: the grid's {@code solar_z_over_x} when it
     * gives [Fe/H], else {@link IronToMetals#GN93}.
     */
    public IronToMetals ironReference() {
        return metallicities.get(0).ironReference();
    }

    /** Number of models, without expanding the grid. */
    public long count() {
        return (long) physics.size() * metallicities.size() * massesMsun.size() * ages.values().size();
    }

    /** The id format of this grid. */
    public ModelIdFormat idFormat() {
        return ModelIdFormat.forAxes(physics.size(), metallicities.size(), massesMsun.size(), ages.values().size());
    }

    /** The model at position {@code index} of the grid order, in cgs. */
    public ModelRequest requestAt(long index) {
        if (index < 0 || index >= count()) {
            throw new IndexOutOfBoundsException("model " + index + " of " + count());
        }
        int a = (int) (index % ages.values().size());
        long rest = index / ages.values().size();
        int m = (int) (rest % massesMsun.size());
        rest /= massesMsun.size();
        int z = (int) (rest % metallicities.size());
        int p = (int) (rest / metallicities.size());
        return request(idFormat(), p, z, m, a, physics.combinations().get(p));
    }

    /** Every model in grid order, created lazily: nothing grid-sized is held. */
    public Iterable<ModelRequest> requests() {
        return GridIterator::new;
    }

    /**
     * Every model in grid order as a list.
     *
     * @throws IllegalStateException when the grid has more than {@link #MAX_EXPANDED} models
     */
    public List<ModelRequest> expand() {
        if (count() > MAX_EXPANDED) {
            throw new IllegalStateException(count() + " models exceed " + MAX_EXPANDED + "; iterate requests()");
        }
        List<ModelRequest> all = new ArrayList<>((int) count());
        requests().forEach(all::add);
        return all;
    }

    /**
     * A rough wall-clock estimate for the whole grid.
     *
     * @param cost seconds one model takes on one thread
     * @param threads worker threads, &gt;= 1
     * @return seconds
     */
    public double estimateSeconds(ModelCost cost, int threads) {
        if (threads < 1) {
            throw new IllegalArgumentException("threads must be >= 1, got " + threads);
        }
        double total = 0.0;
        for (ModelRequest request : requests()) {
            total += cost.seconds(request);
        }
        return total / threads;
    }

    private ModelRequest request(ModelIdFormat ids, int p, int z, int m, int a, PhysicsOptions options) {
        MetallicityPoint point = metallicities.get(z);
        return new ModelRequest(ids.modelId(p, z, m, a), massesMsun.get(m) * Constants.M_SUN, point.z(),
                point.y(), ages.requestAge(a), options);
    }

    private static List<Double> increasing(List<Double> values, String name) {
        if (values.isEmpty()) {
            throw new IllegalArgumentException(name + " axis is empty");
        }
        for (int i = 1; i < values.size(); i++) {
            if (!(values.get(i) > values.get(i - 1))) {
                throw new IllegalArgumentException(name + " values must increase strictly: "
                        + MessageNumbers.format(values.get(i)) + " follows "
                        + MessageNumbers.format(values.get(i - 1)));
            }
        }
        return List.copyOf(values);
    }

    /** Walks the grid order with four counters; the innermost (age) turns fastest. */
    private final class GridIterator implements Iterator<ModelRequest> {
        private final List<PhysicsOptions> options = physics.combinations();
        private final ModelIdFormat ids = idFormat();
        private int p;
        private int z;
        private int m;
        private int a;

        @Override
        public boolean hasNext() {
            return p < options.size();
        }

        @Override
        public ModelRequest next() {
            if (!hasNext()) {
                throw new NoSuchElementException();
            }
            ModelRequest request = request(ids, p, z, m, a, options.get(p));
            advance();
            return request;
        }

        private void advance() {
            if (++a < ages.values().size()) {
                return;
            }
            a = 0;
            if (++m < massesMsun.size()) {
                return;
            }
            m = 0;
            if (++z < metallicities.size()) {
                return;
            }
            z = 0;
            p++;
        }
    }
}
