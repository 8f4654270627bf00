package org.convgrid.engine.request;

import java.util.Objects;
import java.util.function.Supplier;
import org.convgrid.engine.physics.opacity.Opacity;
import org.convgrid.engine.physics.opacity.OpalGn93Opacity;

/**
 * The opacity a grid chose, before the grid's opacity factor: the built-in one or a user table. Two choices are equal
 * when they name the same source, so a table read twice (by the grid reader and from a run's manifest) is the same
 * choice. Immutable in effect and thread-safe: a table named by a manifest is read on first use, once.
 */
public final class OpacityChoice {

    /** The OPAL GN93 tables with their analytic edges ({@link OpalGn93Opacity#shipped()}), read on first use. */
    public static final OpacityChoice BUILT_IN = new OpacityChoice("", null, OpalGn93Opacity::shipped);

    private final String source;
    private final Supplier<Opacity> reader;
    private volatile Opacity opacity;

    private OpacityChoice(String source, Opacity opacity, Supplier<Opacity> reader) {
        this.source = Objects.requireNonNull(source, "source; use \"\" for the built-in opacity");
        this.opacity = opacity;
        this.reader = reader;
    }

    /** A table already read (the grid reader reads and checks it with the grid file). */
    public static OpacityChoice table(String path, Opacity table) {
        return new OpacityChoice(path, Objects.requireNonNull(table, "table"), null);
    }

    /**
     * A table named by a finished run (its manifest), read when a model first needs it, so that a run whose table
     * has moved can still be listed and plotted.
     */
    public static OpacityChoice tableAt(String path, Supplier<Opacity> read) {
        if (path.isEmpty()) {
            throw new IllegalArgumentException("a user opacity table needs its path");
        }
        return new OpacityChoice(path, null, Objects.requireNonNull(read, "read"));
    }

    /** Where the opacity comes from, as the manifest records it: empty for the built-in one, else the table's path. */
    public String source() {
        return source;
    }

    /** Whether this is a user table rather than the built-in opacity. */
    public boolean isTable() {
        return !source.isEmpty();
    }

    /** The opacity itself. */
    public Opacity opacity() {
        Opacity read = opacity;
        if (read == null) {
            synchronized (this) {
                read = opacity;
                if (read == null) {
                    read = Objects.requireNonNull(reader.get(), "opacity table");
                    opacity = read;
                }
            }
        }
        return read;
    }

    @Override
    public boolean equals(Object other) {
        return other instanceof OpacityChoice o && o.source.equals(source);
    }

    @Override
    public int hashCode() {
        return source.hashCode();
    }

    @Override
    public String toString() {
        return source.isEmpty() ? "built-in opacity" : "opacity table " + source;
    }
}
