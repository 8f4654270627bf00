package org.convgrid.grids;

import java.util.List;
import java.util.stream.Collectors;
import org.convgrid.engine.error.ConvgridException;
import org.convgrid.engine.error.ErrorKind;

/**
 * A grid file that cannot be used ({@link ErrorKind#BAD_GRID_FILE}); carries every problem found in it, in file
 * order, and its message is one {@code file:line:column: message} line per problem.
 */
public final class GridFileException extends ConvgridException {

    private static final long serialVersionUID = 1L;

    private final transient List<GridProblem> problems;

    /** @param problems at least one problem */
    public GridFileException(List<GridProblem> problems) {
        super(ErrorKind.BAD_GRID_FILE, describe(problems));
        if (problems.isEmpty()) {
            throw new IllegalArgumentException("a grid file exception needs at least one problem");
        }
        this.problems = List.copyOf(problems);
    }

    /** Every problem, ordered by line then column. */
    public List<GridProblem> problems() {
        return problems;
    }

    private static String describe(List<GridProblem> problems) {
        return problems.stream().map(GridProblem::toString).collect(Collectors.joining(System.lineSeparator()));
    }
}
