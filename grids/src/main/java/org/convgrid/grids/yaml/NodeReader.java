package org.convgrid.grids.yaml;

import java.math.BigDecimal;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Optional;
import org.convgrid.grids.GridProblem;
import org.convgrid.grids.GridProblemKind;
import org.snakeyaml.engine.v2.common.ScalarStyle;
import org.snakeyaml.engine.v2.exceptions.Mark;
import org.snakeyaml.engine.v2.nodes.MappingNode;
import org.snakeyaml.engine.v2.nodes.Node;
import org.snakeyaml.engine.v2.nodes.ScalarNode;
import org.snakeyaml.engine.v2.nodes.SequenceNode;

/**
 * Typed reads of YAML nodes that never throw: each problem is recorded with its node's position and the read
 * returns null, so one pass over the file finds every problem. Numbers and booleans must be plain (unquoted)
 * scalars; numbers are read as exact decimals so that axis arithmetic does not drift.
 */
final class NodeReader {

    private final String file;
    private final java.nio.file.Path location;
    private final List<GridProblem> problems = new ArrayList<>();

    /** A reader of the file named {@code file}, whose relative file names are read from its folder. */
    NodeReader(String file) {
        this(file, null);
    }

    /**
     * @param file the name problems are reported at (as the user gave it)
     * @param location where the file is, or null for the file {@code file} names: file names inside it (a preset, an
     *                 opacity table) are relative to its folder
     */
    NodeReader(String file, java.nio.file.Path location) {
        this.file = file;
        this.location = location;
    }

    String file() {
        return file;
    }

    /**
     * The absolute folder the file's relative file names are read from. Worked out only when a file is named, so
     * that a name that is no path on this system (a manifest's, written elsewhere) fails only then, as a file the
     * grid names.
     *
     * @throws java.nio.file.InvalidPathException when the file's name is no path here
     */
    java.nio.file.Path folder() {
        java.nio.file.Path at = location != null ? location : java.nio.file.Path.of(file);
        return at.toAbsolutePath().normalize().getParent();
    }

    /** Records a problem at the start of {@code node}. */
    void problem(Node node, GridProblemKind kind, String message) {
        problem(node == null ? Optional.empty() : node.getStartMark(), kind, message);
    }

    /** Records a problem at a mark (1:1 when there is none). */
    void problem(Optional<Mark> mark, GridProblemKind kind, String message) {
        int line = mark.map(m -> m.getLine() + 1).orElse(1);
        int column = mark.map(m -> m.getColumn() + 1).orElse(1);
        problems.add(new GridProblem(file, line, column, kind, message));
    }

    /** Every problem so far, in file order. */
    List<GridProblem> problems() {
        List<GridProblem> sorted = new ArrayList<>(problems);
        sorted.sort(Comparator.comparingInt(GridProblem::line).thenComparingInt(GridProblem::column));
        return sorted;
    }

    MappingNode mapping(Node node, String what) {
        return mapping(node, what, "");
    }

    /**
     * As {@link #mapping(Node, String)}, with {@code listHint} appended when the node is a list: where a list is the
     * natural thing to write (the masses, the ages, the Z), the message says where the list goes.
     */
    MappingNode mapping(Node node, String what, String listHint) {
        if (node instanceof MappingNode map) {
            return map;
        }
        problem(node, GridProblemKind.WRONG_TYPE, what + " must be a mapping of keys to values" + got(node)
                + (node instanceof SequenceNode ? listHint : ""));
        return null;
    }

    /**
     * The top of a document, which must be a mapping. A document that is one plain text is not quoted: it is most
     * likely some other file given by mistake, whose content is none of the message's business.
     */
    MappingNode documentMapping(Node node, String what) {
        if (node instanceof ScalarNode scalar && !isNull(node)) {
            problem(node, GridProblemKind.WRONG_TYPE, what + " must be a mapping of keys to values (key: value "
                    + "lines), got plain text; is it the right file?");
            return null;
        }
        return mapping(node, what);
    }

    /** The items of a sequence, or a lone scalar as a one-item list; null (with a problem) otherwise. */
    List<Node> items(Node node, String what) {
        if (node instanceof SequenceNode sequence) {
            if (sequence.getValue().isEmpty()) {
                problem(node, GridProblemKind.WRONG_TYPE, what + " must not be an empty list");
                return null;
            }
            return sequence.getValue();
        }
        if (node instanceof ScalarNode && !isNull(node)) {
            return List.of(node);
        }
        problem(node, GridProblemKind.WRONG_TYPE, what + " must be a value or a list of values" + got(node));
        return null;
    }

    /** Largest decimal exponent of a number in a grid file (a double reaches about 308). */
    static final int MAX_DECIMAL_EXPONENT = 300;

    BigDecimal decimal(Node node, String what) {
        String text = plainScalar(node, what, "a number");
        if (text == null) {
            return null;
        }
        try {
            BigDecimal value = new BigDecimal(text);
            // the decimal exponent; beyond a double's range nothing in a grid makes sense, and exact arithmetic on
            // such a number (1e-999999999) would not end
            long exponent = (long) value.precision() - value.scale() - 1;
            if (value.signum() != 0 && Math.abs(exponent) > MAX_DECIMAL_EXPONENT) {
                problem(node, GridProblemKind.OUT_OF_RANGE, what + " must lie between 1e-" + MAX_DECIMAL_EXPONENT
                        + " and 1e" + MAX_DECIMAL_EXPONENT + " in size, got '" + quoted(text) + "'");
                return null;
            }
            return value;
        } catch (NumberFormatException e) {
            problem(node, GridProblemKind.WRONG_TYPE, what + " must be a number, got '" + NodeReader.quoted(text) + "'");
            return null;
        }
    }

    Double number(Node node, String what) {
        BigDecimal value = decimal(node, what);
        return value == null ? null : value.doubleValue();
    }

    Integer integer(Node node, String what) {
        BigDecimal value = decimal(node, what);
        if (value == null) {
            return null;
        }
        try {
            return value.intValueExact();
        } catch (ArithmeticException e) {
            problem(node, GridProblemKind.WRONG_TYPE, what + " must be a whole number, got " + value.toPlainString());
            return null;
        }
    }

    Boolean bool(Node node, String what) {
        String text = plainScalar(node, what, "true or false");
        if (text == null) {
            return null;
        }
        if (text.equals("true") || text.equals("false")) {
            return Boolean.valueOf(text);
        }
        problem(node, GridProblemKind.WRONG_TYPE, what + " must be true or false, got '" + NodeReader.quoted(text) + "'");
        return null;
    }

    String text(Node node, String what) {
        if (node instanceof ScalarNode scalar && !isNull(node) && !scalar.getValue().isBlank()) {
            return scalar.getValue();
        }
        problem(node, GridProblemKind.WRONG_TYPE, what + " must be a non-empty text" + got(node));
        return null;
    }

    private String plainScalar(Node node, String what, String expected) {
        if (node instanceof ScalarNode scalar && !isNull(node)) {
            if (scalar.getScalarStyle() != ScalarStyle.PLAIN) {
                problem(node, GridProblemKind.WRONG_TYPE,
                        what + " must be " + expected + ", got the quoted text '" + scalar.getValue() + "'");
                return null;
            }
            return scalar.getValue();
        }
        problem(node, GridProblemKind.WRONG_TYPE, what + " must be " + expected + got(node));
        return null;
    }

    /** An empty value, ~ or null written without quotes. */
    static boolean isNull(Node node) {
        if (node instanceof ScalarNode scalar && scalar.getScalarStyle() == ScalarStyle.PLAIN) {
            String v = scalar.getValue();
            return v.isEmpty() || v.equals("~") || v.equals("null") || v.equals("Null") || v.equals("NULL");
        }
        return false;
    }

    private static String got(Node node) {
        if (node == null || isNull(node)) {
            return ", but it has no value";
        }
        if (node instanceof MappingNode) {
            return ", got a mapping";
        }
        if (node instanceof SequenceNode) {
            return ", got a list";
        }
        return ", got '" + quoted(((ScalarNode) node).getValue()) + "'";
    }

    /** A scalar as the user wrote it, for messages ("-1", not the parsed "-1.0"); "?" for anything else. */
    static String written(Node node) {
        return node instanceof ScalarNode scalar ? quoted(scalar.getValue()) : "?";
    }

    /** A value of the file as quoted in a message: at most 40 characters, control characters replaced. */
    static String quoted(String value) {
        String clean = value.replaceAll("\\p{Cntrl}", "?");
        return clean.length() <= 40 ? clean : clean.substring(0, 40) + "...";
    }
}
