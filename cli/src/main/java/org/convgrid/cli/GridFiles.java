package org.convgrid.cli;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import org.convgrid.grids.GridFile;
import org.convgrid.grids.InputFileCheck;
import org.convgrid.grids.yaml.GridFileReader;
import org.convgrid.survey.IoMessages;

/** Reads the grid file named on the command line; its problems reach the user through {@link FailureHandler}. */
final class GridFiles {

    private GridFiles() {
    }

    /**
     * @param given the path as typed (problems name it so)
     * @throws UsageException when the file cannot be read
     * @throws org.convgrid.grids.GridFileException listing every problem in the file
     */
    static GridFile read(Path given, CommandContext context) {
        Path file = context.resolve(given);
        java.util.Optional<String> unreadable = InputFileCheck.problem(file, GridFileReader.MAX_FILE_BYTES);
        if (unreadable.isPresent() && !Files.exists(file)) {
            throw new UsageException("grid file " + given + " not found");
        }
        if (unreadable.isPresent()) {
            throw new UsageException("cannot read grid file " + given + ": " + unreadable.get());
        }
        byte[] bytes;
        try {
            bytes = Files.readAllBytes(file);
        } catch (IOException e) {
            throw new UsageException("cannot read grid file " + given + ": " + IoMessages.reason(e));
        }
        return new GridFileReader().read(given.toString(), file, bytes);
    }
}
