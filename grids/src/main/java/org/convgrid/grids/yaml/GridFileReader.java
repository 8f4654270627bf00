package org.convgrid.grids.yaml;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.ByteBuffer;
import java.nio.charset.CharacterCodingException;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import org.convgrid.engine.request.AgeOrigin;
import org.convgrid.grids.GridProblemKind;
import org.convgrid.grids.words.MessageNumbers;
import org.convgrid.grids.AgeAxis;
import org.convgrid.grids.GridFile;
import org.convgrid.grids.GridFileException;
import org.convgrid.grids.GridHash;
import org.convgrid.grids.GridProblem;
import org.convgrid.grids.GridSpec;
import org.convgrid.grids.MetallicityPoint;
import org.convgrid.grids.PhysicsAxes;
import org.convgrid.grids.TransitionSettings;
import org.snakeyaml.engine.v2.api.LoadSettings;
import org.snakeyaml.engine.v2.api.lowlevel.Compose;
import org.snakeyaml.engine.v2.exceptions.MarkedYamlEngineException;
import org.snakeyaml.engine.v2.exceptions.YamlEngineException;
import org.snakeyaml.engine.v2.nodes.MappingNode;
import org.snakeyaml.engine.v2.nodes.Node;

/**
 * Reads a grid file (format in the README, "A grid file") into a validated {@link GridSpec}. The YAML is composed into nodes
 * and walked by hand so every problem carries its file:line:column; all problems of a file are collected and thrown
 * together as one {@link GridFileException}. Required sections: {@code mass}, {@code metallicity}. Defaults:
 * {@code title} = the file name; without an {@code age} section the zero-age main sequence alone ({@code gyr: [0]},
 * origin zams); within it {@code origin: birth} ({@code gyr:}/{@code myr:} count from birth, above 0;
 * {@code ms_fraction:} gives fractions in [0, 1] of each star's main-sequence lifetime), physics = engine defaults,
 * {@code output: {dir: runs/<file name without extension>, profiles: false}}. Thread-safe (stateless).
 */
public final class GridFileReader {

    /** Oldest age accepted, Gyr: older than the universe, so a larger value is a unit mistake. */
    public static final double MAX_AGE_GYR = 20.0;
    /**
     * Largest grid file, bytes. A grid file is a few dozen lines; the limit keeps the copy of the grid that the
     * manifest records well inside what the manifest reader accepts, so every run directory stays readable.
     */
    public static final int MAX_FILE_BYTES = 1024 * 1024;
    /** Deepest nesting of lists and mappings accepted (a grid file needs four levels). */
    public static final int MAX_NESTING_DEPTH = 64;
    /** Alias expansions allowed in one file (defends against alias bombs). */
    private static final int MAX_ALIASES = 50;

    private static final List<String> KEYS = List.of("title", "mass", "metallicity", "age", "physics", "transitions",
            "output");
    private static final List<String> TRANSITION_KEYS = List.of("refine", "tolerance_msun");
    private static final List<String> AGE_KEYS = List.of("gyr", "myr", "ms_fraction", "origin");
    /** The age keys that give the values, one per grid. */
    private static final List<String> UNIT_KEYS = List.of("gyr", "myr", "ms_fraction");
    private static final double MYR_PER_GYR = 1000.0;
    private static final List<String> OUTPUT_KEYS = List.of("dir", "profiles", "age_charts_for_masses_msun");

    /**
     * Reads and validates a grid file.
     *
     * @throws GridFileException listing every problem in the file
     * @throws UncheckedIOException when the file cannot be read
     */
    public GridFile read(Path path) {
        Optional<String> unreadable = org.convgrid.grids.InputFileCheck.problem(path, MAX_FILE_BYTES);
        if (unreadable.isPresent()) {
            throw new GridFileException(List.of(new GridProblem(path.toString(), 1, 1,
                    GridProblemKind.UNREADABLE_FILE, "cannot read the grid file: " + unreadable.get())));
        }
        try {
            return read(path.toString(), Files.readAllBytes(path));
        } catch (IOException e) {
            throw new UncheckedIOException("cannot read grid file " + path, e);
        }
    }

    /**
     * Validates grid-file bytes (UTF-8).
     *
     * @param name the file name used in problems and for the default output directory
     * @throws GridFileException listing every problem in the file
     */
    public GridFile read(String name, byte[] bytes) {
        return read(name, Path.of(name), bytes);
    }

    /**
     * Validates grid-file bytes (UTF-8) of the file at {@code location}.
     *
     * @param name the file name used in problems and for the default output directory
     * @param location where the file is: the files it names are read from its folder, and runs record it
     *                 ({@link GridFile#location})
     * @throws GridFileException listing every problem in the file
     */
    public GridFile read(String name, Path location, byte[] bytes) {
        if (bytes.length > MAX_FILE_BYTES) {
            throw new GridFileException(List.of(new GridProblem(name, 1, 1, GridProblemKind.UNREADABLE_FILE,
                    "the grid file holds " + bytes.length + " bytes, more than the limit of " + MAX_FILE_BYTES
                    + " bytes")));
        }
        String text;
        try {
            text = StandardCharsets.UTF_8.newDecoder().onMalformedInput(CodingErrorAction.REPORT)
                    .onUnmappableCharacter(CodingErrorAction.REPORT).decode(ByteBuffer.wrap(bytes)).toString();
        } catch (CharacterCodingException e) {
            throw new GridFileException(List.of(new GridProblem(name, 1, 1, GridProblemKind.SYNTAX,
                    "the file is not UTF-8 text")));
        }
        return new GridFile(name, location.toAbsolutePath().normalize().toString(), text, GridHash.ofBytes(bytes),
                parse(name, location, text));
    }

    /**
     * Validates grid-file text.
     *
     * @throws GridFileException listing every problem in the text
     */
    public GridSpec parse(String name, String text) {
        return parse(name, (Path) null, text);
    }

    /**
     * Validates grid-file text of the file at {@code location}, whose folder the files it names are read from.
     *
     * @throws GridFileException listing every problem in the text
     */
    public GridSpec parse(String name, Path location, String text) {
        NodeReader reader = new NodeReader(name, location);
        Optional<Node> root = compose(name, text, reader);
        GridSpec spec = null;
        if (root.isEmpty() && reader.problems().isEmpty()) {
            reader.problem(Optional.empty(), GridProblemKind.MISSING_KEY,
                    "the grid file is empty; it needs at least 'mass' and 'metallicity'");
        } else if (root.isPresent()) {
            spec = spec(root.get(), reader);
        }
        if (!reader.problems().isEmpty()) {
            throw new GridFileException(reader.problems());
        }
        return spec;
    }

    private static Optional<Node> compose(String name, String text, NodeReader reader) {
        LoadSettings settings = LoadSettings.builder().setLabel(name).setMaxAliasesForCollections(MAX_ALIASES)
                .setAllowRecursiveKeys(false).build();
        try {
            Optional<org.snakeyaml.engine.v2.exceptions.Mark> tooDeep = tooDeep(settings, text);
            if (tooDeep.isPresent()) {
                reader.problem(tooDeep, GridProblemKind.SYNTAX, "lists and mappings are nested more than "
                        + MAX_NESTING_DEPTH + " levels deep here; a grid file needs only a few");
                return Optional.empty();
            }
            return new Compose(settings).composeString(text);
        } catch (MarkedYamlEngineException e) {
            String context = e.getContext() == null ? "" : e.getContext() + ": ";
            reader.problem(e.getProblemMark().or(e::getContextMark), GridProblemKind.SYNTAX,
                    "YAML syntax: " + context + e.getProblem());
        } catch (YamlEngineException e) {
            reader.problem(Optional.empty(), GridProblemKind.SYNTAX, "YAML syntax: " + e.getMessage());
        }
        return Optional.empty();
    }

    /**
     * Where the nesting first exceeds {@link #MAX_NESTING_DEPTH}, found on the parser's event stream (which does not
     * recurse) before the nodes are composed (which does, and would overflow the stack on a hostile file).
     */
    static Optional<org.snakeyaml.engine.v2.exceptions.Mark> tooDeep(LoadSettings settings, String text) {
        int depth = 0;
        for (org.snakeyaml.engine.v2.events.Event event
                : new org.snakeyaml.engine.v2.api.lowlevel.Parse(settings).parseString(text)) {
            if (event instanceof org.snakeyaml.engine.v2.events.CollectionStartEvent) {
                depth++;
                if (depth > MAX_NESTING_DEPTH) {
                    return event.getStartMark();
                }
            } else if (event instanceof org.snakeyaml.engine.v2.events.CollectionEndEvent) {
                depth--;
            }
        }
        return Optional.empty();
    }

    private static GridSpec spec(Node root, NodeReader reader) {
        MappingNode map = reader.documentMapping(root, "the grid file");
        if (map == null) {
            return null;
        }
        MappingFields fields = new MappingFields(map, "the grid file", KEYS, reader);
        String title = fields.has("title") ? reader.text(fields.value("title"), "title") : baseName(reader.file());
        List<Double> masses = null;
        List<MetallicityPoint> metallicities = null;
        for (String required : List.of("mass", "metallicity")) {
            if (!fields.has(required)) {
                reader.problem(map, GridProblemKind.MISSING_KEY, "the grid file needs a '" + required + "' section");
            }
        }
        if (fields.has("mass")) {
            masses = MassAxisReader.read(fields.value("mass"), reader);
        }
        if (fields.has("metallicity")) {
            metallicities = MetallicityReader.read(fields.value("metallicity"), reader);
        }
        AgeAxis ages = fields.has("age") ? ages(fields.value("age"), reader) : AgeAxis.gyr(List.of(0.0));
        PhysicsAxes physics = PhysicsReader.read(fields.value("physics"), reader);
        String outputDir = "runs/" + baseName(reader.file());
        Boolean profiles = Boolean.FALSE;
        if (fields.has("output")) {
            MappingNode output = reader.mapping(fields.value("output"), "output");
            MappingFields out = output == null ? null : new MappingFields(output, "output", OUTPUT_KEYS, reader);
            if (out != null && out.has("dir")) {
                outputDir = reader.text(out.value("dir"), "output dir");
                if (outputDir != null && !validPath(outputDir)) {
                    reader.problem(out.value("dir"), GridProblemKind.WRONG_TYPE,
                            "output dir is not a valid directory name (a NUL character?)");
                    outputDir = null;
                }
            }
            if (out != null && out.has("profiles")) {
                profiles = reader.bool(out.value("profiles"), "output profiles");
            }
            // only validated here: the chart drawer reads the chosen masses from the grid text in the manifest
            if (out != null && out.has("age_charts_for_masses_msun")
                    && AxisValues.distinct(out.value("age_charts_for_masses_msun"),
                    "output age_charts_for_masses_msun", Range.aboveZero(MassAxisReader.MAX_MASS_MSUN), reader) == null) {
                outputDir = null;
            }
        }
        TransitionSettings transitions = fields.has("transitions")
                ? transitions(fields.value("transitions"), reader) : TransitionSettings.DEFAULT;
        if (title == null || masses == null || metallicities == null || ages == null || physics == null
                || outputDir == null || profiles == null || transitions == null) {
            return null;
        }
        return new GridSpec(title, masses, metallicities, ages, physics, outputDir, profiles, transitions);
    }

    /** {@code transitions: {refine: true, tolerance_msun: 0.002}}, each key optional. */
    private static TransitionSettings transitions(Node node, NodeReader reader) {
        MappingNode map = reader.mapping(node, "transitions");
        if (map == null) {
            return null;
        }
        MappingFields fields = new MappingFields(map, "transitions", TRANSITION_KEYS, reader);
        // boxed defaults: with a primitive one, the conditional's type is primitive and a value the reader refused
        // (null, already reported) was unboxed into a NullPointerException, an "internal error" that hid the file's
        // other problems ('refine: maybe')
        Boolean refine = fields.has("refine") ? reader.bool(fields.value("refine"), "transitions refine")
                : Boolean.valueOf(TransitionSettings.DEFAULT.refine());
        Double tolerance = fields.has("tolerance_msun")
                ? reader.number(fields.value("tolerance_msun"), "transitions tolerance_msun")
                : Double.valueOf(TransitionSettings.DEFAULT.toleranceMsun());
        if (tolerance != null && !(tolerance > 0.0 && Double.isFinite(tolerance))) {
            reader.problem(fields.value("tolerance_msun"), GridProblemKind.OUT_OF_RANGE,
                    "transitions tolerance_msun must be a positive mass in Msun (got "
                    + NodeReader.written(fields.value("tolerance_msun")) + ")");
            tolerance = null;
        }
        return refine == null || tolerance == null ? null : new TransitionSettings(refine, tolerance);
    }

    /**
     * Exactly one of {@code gyr} (ages in Gyr), {@code myr} (ages in Myr) and {@code ms_fraction} (fractions of each
     * star's lifetime), and an optional {@code origin}: {@code birth} (the default) or {@code zams}. Ages from birth
     * must be above 0 (age 0 is the start model, whose details are a choice, not a result).
     */
    private static AgeAxis ages(Node node, NodeReader reader) {
        MappingNode map = reader.mapping(node, "age", "; a list of ages goes under myr or gyr: age: {myr: [10, 100]}");
        if (map == null) {
            return null;
        }
        MappingFields fields = new MappingFields(map, "age", AGE_KEYS, reader);
        AgeOrigin origin = AgeOrigin.BIRTH;
        if (fields.has("origin")) {
            String text = reader.text(fields.value("origin"), "age origin");
            origin = text == null ? null : AgeOrigin.ofLabel(text);
            if (text != null && origin == null) {
                reader.problem(fields.value("origin"), GridProblemKind.UNKNOWN_CHOICE,
                        "age origin must be birth or zams, got '" + NodeReader.quoted(text) + "'");
            }
        }
        List<String> given = UNIT_KEYS.stream().filter(fields::has).toList();
        if (given.size() > 1) {
            reader.problem(fields.key(given.get(1)), GridProblemKind.CONFLICT,
                    "age takes one of 'gyr', 'myr' and 'ms_fraction', not both '" + given.get(0) + "' and '"
                    + given.get(1) + "'");
            return null;
        }
        if (given.isEmpty()) {
            reader.problem(map, GridProblemKind.MISSING_KEY,
                    "age needs 'gyr' or 'myr', the ages in Gyr or Myr since the origin (birth unless "
                    + "'origin: zams'), or 'ms_fraction', fractions of each star's main-sequence lifetime "
                    + "(0 = ZAMS, 1 = core-hydrogen exhaustion)");
            return null;
        }
        if (given.get(0).equals("ms_fraction")) {
            List<Double> fractions = AxisValues.increasingNamed(fields.value("ms_fraction"), "main-sequence fraction",
                    "main-sequence fractions", Range.closed(0.0, 1.0), reader);
            return fractions == null || origin == null ? null : AgeAxis.msFractions(fractions, origin);
        }
        boolean myr = given.get(0).equals("myr");
        double scale = myr ? MYR_PER_GYR : 1.0;
        // grids written before ages counted from birth meant the zero-age main sequence by 0: say how to keep that
        Range range = origin == AgeOrigin.BIRTH ? Range.aboveZero(MAX_AGE_GYR * scale).noteAtExcludedLow(
                "age 0 would be the start model; for the zero-age main sequence add origin: zams")
                : Range.closed(0.0, MAX_AGE_GYR * scale);
        String unit = (origin == AgeOrigin.BIRTH ? " from birth" : "") + (myr ? " in Myr" : " in Gyr");
        List<Double> ages = AxisValues.increasing(fields.value(given.get(0)), "age" + unit, "ages" + unit, range,
                reader);
        if (ages == null || origin == null) {
            return null;
        }
        List<Double> gyr = ages.stream().map(a -> a / scale).toList();
        // charts name an age in Myr below 1 Gyr, else in Gyr, at four significant digits: 1000.4 and 1000.5 Myr
        // both read "1 Gyr", and charts of the two ages overwrote each other
        java.util.Map<String, Double> named = new java.util.HashMap<>();
        for (double age : gyr) {
            String name = age > 0.0 && age < 1.0 ? AxisValues.chartName(age * MYR_PER_GYR) + " Myr"
                    : AxisValues.chartName(age) + " Gyr";
            Double earlier = named.putIfAbsent(name, age);
            if (earlier != null) {
                reader.problem(fields.value(given.get(0)), GridProblemKind.DUPLICATE, "ages " + MessageNumbers.format(
                        earlier * scale) + " and " + MessageNumbers.format(age * scale) + unit + " both read as "
                        + name + " in chart names and legends (" + AxisValues.CHART_DIGITS + " significant digits, "
                        + "Myr below 1 Gyr): make them differ within those digits");
                return null;
            }
        }
        return AgeAxis.gyr(gyr, origin);
    }

    private static boolean validPath(String text) {
        try {
            Path.of(text);
            return true;
        } catch (java.nio.file.InvalidPathException e) {
            return false;
        }
    }

    /** The file name without directories and without its .yaml or .yml extension. */
    static String baseName(String file) {
        Path fileName = Path.of(file).getFileName();
        String base = fileName == null ? file : fileName.toString();
        return base.replaceFirst("\\.(yaml|yml)$", "");
    }
}
