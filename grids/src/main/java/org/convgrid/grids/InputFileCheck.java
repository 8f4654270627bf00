package org.convgrid.grids;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Optional;

/**
 * Whether a file named by the user may be read whole: only a regular file no larger than a stated size. A device
 * such as /dev/zero or a named pipe would be read forever (or block), and a file far larger than any real input is a
 * mistake that would only exhaust the memory. The reason is worded for the user and never quotes the file.
 */
public final class InputFileCheck {

    private InputFileCheck() {
    }

    /**
     * @param file the file
     * @param maxBytes the largest size accepted
     * @return why the file cannot be read, empty when it can
     */
    public static Optional<String> problem(Path file, long maxBytes) {
        try {
            if (!Files.exists(file)) {
                return Optional.of("no such file");
            }
            if (Files.isDirectory(file)) {
                return Optional.of("it is a directory, not a file");
            }
            if (!Files.isRegularFile(file)) {
                return Optional.of("it is not a regular file (a device or a pipe?)");
            }
            if (!Files.isReadable(file)) {
                return Optional.of("permission denied");
            }
            long size = Files.size(file);
            if (size > maxBytes) {
                return Optional.of("it holds " + size + " bytes, more than the limit of " + maxBytes + " bytes");
            }
            return Optional.empty();
        } catch (IOException | SecurityException e) {
            return Optional.of("the file could not be examined");
        }
    }
}
