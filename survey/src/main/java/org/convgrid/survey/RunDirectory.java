package org.convgrid.survey;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardOpenOption;
import java.util.Comparator;
import java.util.List;
import java.util.Optional;
import java.util.stream.Stream;
import org.convgrid.engine.batch.Shard;
import org.convgrid.output.AtomicFiles;
import org.convgrid.output.OutputFormatException;
import org.convgrid.output.RunLayout;
import org.convgrid.output.IronAbundance;
import org.convgrid.output.catalogue.CatalogueWriter;
import org.convgrid.output.catalogue.ZoneTable;
import org.convgrid.output.manifest.RunManifest;
import org.convgrid.output.manifest.RunManifestReader;

/**
 * One run directory (file names: {@link RunLayout}) and its creation. A new directory is created
 * all-or-nothing: when the directory, the start manifest or the catalogue header cannot be written, whatever this
 * class created is removed again, so a refused run leaves nothing behind.
 */
public final class RunDirectory {

    private final RunLayout layout;

    public RunDirectory(Path root) {
        this.layout = new RunLayout(root);
    }

    /** The file names of the directory. */
    public RunLayout layout() {
        return layout;
    }

    public Path root() {
        return layout.root();
    }

    public Path catalogue() {
        return layout.catalogue();
    }

    public Path zones() {
        return layout.zones();
    }

    public Path transitions() {
        return layout.transitions();
    }

    public Path manifest() {
        return layout.manifest();
    }

    public Path tracks() {
        return layout.tracks();
    }

    /**
     * Where a run writes when no directory is given: the grid's output directory, or for shard K of N
     * {@code <output dir>-shard-K-of-N} ({@link #forShard}).
     *
     * @param outputDir the grid's {@code output.dir}
     * @param shard the shard, null for the whole grid
     */
    public static Path defaultPath(String outputDir, Shard shard) {
        return forShard(Path.of(outputDir), shard);
    }

    /**
     * The directory shard K of N writes to when the run is given {@code dir} (the grid's {@code output.dir} or
     * {@code --out}): {@code <dir>-shard-K-of-N}, so that every task of a job array can run the same command line
     * and shards of one grid never share (and so never refuse, resume or delete) one directory. A directory already
     * named for this very shard is taken as it is, so the {@code --out} an interrupted shard names for its resume
     * works with or without the shard given again. The whole grid (null, or 1 of 1) writes to {@code dir} itself.
     *
     * @param dir the directory given, normalized (its last name gets the suffix)
     * @param shard the shard, null for the whole grid
     * @throws RunSetupException when {@code dir} has no name to add the suffix to (a file system root)
     */
    public static Path forShard(Path dir, Shard shard) {
        if (shard == null || shard.count() == 1) {
            return dir;
        }
        String suffix = shardSuffix(shard);
        Path name = dir.getFileName();
        if (name == null || name.toString().isEmpty() || name.toString().equals(".")
                || name.toString().equals("..")) {
            throw new RunSetupException("cannot name shard " + shard.index() + "/" + shard.count()
                    + "'s directory after '" + dir + "' (it becomes <directory>" + suffix + "): give --out a "
                    + "directory with a name, such as runs/grid");
        }
        return name.toString().endsWith(suffix) ? dir : dir.resolveSibling(name + suffix);
    }

    /** What a shard adds to its directory's name: {@code -shard-K-of-N}. */
    static String shardSuffix(Shard shard) {
        return "-shard-" + shard.index() + "-of-" + shard.count();
    }

    /**
     * The manifest of an earlier run in this directory when it is readable and measured a positive median seconds per
     * model; empty otherwise (an unreadable manifest only means no measured cost).
     */
    public Optional<RunManifest> measuredRun() {
        try {
            if (Files.isRegularFile(manifest())) {
                RunManifest run = RunManifestReader.read(Files.readString(manifest()));
                double median = run.medianSecondsPerModel();
                return Double.isFinite(median) && median > 0 ? Optional.of(run) : Optional.empty();
            }
        } catch (IOException | OutputFormatException e) {
            // no measured cost: the caller falls back to its default
        }
        return Optional.empty();
    }

    /** The manifest of the run in this directory when it is readable; empty otherwise. */
    public Optional<RunManifest> readableManifest() {
        try {
            if (Files.isRegularFile(manifest())) {
                return Optional.of(RunManifestReader.read(Files.readString(manifest())));
            }
        } catch (IOException | OutputFormatException | IllegalArgumentException e) {
            // unreadable: the caller says what it can without it
        }
        return Optional.empty();
    }

    /**
     * Whether the catalogue holds models the transition refinement added (ids with {@code -r}); false when it cannot
     * be read.
     */
    public boolean holdsRefinedModels() {
        try (java.util.stream.Stream<String> lines = Files.lines(catalogue())) {
            return lines.filter(l -> !l.startsWith("#")).map(l -> l.split(",", 2)[0])
                    .anyMatch(org.convgrid.output.transitions.RefinedModelIds::isRefined);
        } catch (IOException | java.io.UncheckedIOException e) {
            return false;
        }
    }

    /** Whether a catalogue or a manifest is already there. */
    public boolean holdsRun() {
        return Files.exists(catalogue()) || Files.exists(manifest())
                || Files.exists(root().resolve(RunLayout.CATALOGUE_V1));
    }

    /**
     * The files here that a run writes (tables, report, tracks, profiles, charts, temporary files), which
     * {@link #clear} would remove; none in an empty directory or one holding only the user's files.
     */
    public List<Path> earlierRunFiles() throws IOException {
        return EarlierRunFiles.find(layout);
    }

    /** {@link #earlierRunFiles} in a few words for a message: {@code zones.csv, report.html, 12 files in tracks/}. */
    public String describe(List<Path> files) {
        return EarlierRunFiles.describe(layout, files);
    }

    /**
     * The catalogue's header lines, with their line end, exactly as {@link CatalogueWriter} writes them for a run
     * whose [Fe/H] is measured against {@code iron}'s Sun (the one column description that depends on the run).
     */
    public static String catalogueHeader(IronAbundance iron) {
        StringBuilder header = new StringBuilder();
        try {
            CatalogueWriter.startingWithHeader(header, iron).flush();
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        return header.toString();
    }

    /**
     * Creates the directory (and missing parents), writes the start manifest and a catalogue holding only its
     * header. On failure removes what it created and throws one message naming the directory and the reason.
     */
    public void create(String manifestYaml, IronAbundance iron) throws IOException {
        Path top = topMissing(root());
        try {
            Files.createDirectories(root());
            AtomicFiles.writeString(manifest(), manifestYaml);
            Files.writeString(catalogue(), catalogueHeader(iron), StandardCharsets.UTF_8, StandardOpenOption.CREATE_NEW,
                    StandardOpenOption.WRITE);
            Files.writeString(zones(), ZoneTable.headerLine(), StandardCharsets.UTF_8, StandardOpenOption.CREATE,
                    StandardOpenOption.TRUNCATE_EXISTING, StandardOpenOption.WRITE);
        } catch (IOException e) {
            undo(top);
            throw new IOException("cannot create run directory " + root() + ": " + IoMessages.reason(e), e);
        }
    }

    /**
     * Removes every file an earlier run wrote here (tables, manifest, report, tracks, profiles, charts, temporary
     * files), keeping the lock file and files convgrid does not write, for {@code --force}: see
     * {@link EarlierRunFiles}.
     *
     * @return how many files were removed
     */
    public int clear() throws IOException {
        return EarlierRunFiles.remove(layout);
    }

    private void undo(Path top) {
        try {
            if (top != null) {
                deleteTree(top);
            } else {
                Files.deleteIfExists(catalogue());
                Files.deleteIfExists(zones());
                Files.deleteIfExists(manifest());
            }
        } catch (IOException | UncheckedIOException e) {
            // best effort: the original failure is what the user needs to see
        }
    }

    /** The highest ancestor of {@code dir} (or dir itself) that does not exist yet, null when dir exists. */
    static Path topMissing(Path dir) {
        Path top = null;
        for (Path p = dir; p != null && !Files.exists(p); p = p.getParent()) {
            top = p;
        }
        return top;
    }

    /** Deletes a tree this class created (no symbolic links are followed). */
    static void deleteTree(Path top) throws IOException {
        if (!Files.exists(top)) {
            return;
        }
        try (Stream<Path> all = Files.walk(top)) {
            for (Path p : all.sorted(Comparator.reverseOrder()).toList()) {
                Files.deleteIfExists(p);
            }
        }
    }
}
