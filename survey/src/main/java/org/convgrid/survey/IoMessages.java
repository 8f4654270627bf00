package org.convgrid.survey;

import java.io.IOException;
import java.nio.file.AccessDeniedException;
import java.nio.file.FileAlreadyExistsException;
import java.nio.file.FileSystemException;
import java.nio.file.NoSuchFileException;
import java.nio.file.NotDirectoryException;

/** One-line, human wording of I/O failures (the NIO exceptions' own messages are often just a path). */
public final class IoMessages {

    private IoMessages() {
    }

    /**
     * An append that failed, named by its file: a write's own exception (a full disk) carries no file name. A
     * file-system exception, which names its file already, is returned as it is.
     */
    public static IOException appending(java.nio.file.Path file, IOException e) {
        // file-system exceptions name their file; a closed channel (an interrupt) is a kind the callers test for
        if (e instanceof FileSystemException || e instanceof java.nio.channels.ClosedChannelException) {
            return e;
        }
        return new IOException("cannot append to " + file.toAbsolutePath().normalize() + ": " + reason(e), e);
    }

    /**
     * A failed write of {@code file}, named by it once: a message that already says which file could not be written
     * or appended to is kept as it is.
     */
    public static IOException naming(java.nio.file.Path file, IOException e) {
        String reason = reason(e);
        if (reason.startsWith("cannot write ") || reason.startsWith("cannot append to ")) {
            return e;
        }
        return new IOException("cannot write " + file.toAbsolutePath().normalize() + ": " + reason, e);
    }

    /** Why an I/O operation failed, naming the file when known. */
    public static String reason(IOException e) {
        if (e instanceof FileSystemException fs) {
            String file = fs.getFile() == null ? "" : fs.getFile();
            String why;
            if (e instanceof NoSuchFileException) {
                why = "no such file or directory";
            } else if (e instanceof AccessDeniedException) {
                why = "permission denied";
            } else if (e instanceof FileAlreadyExistsException) {
                why = "already exists";
            } else if (e instanceof NotDirectoryException) {
                why = "not a directory";
            } else {
                why = fs.getReason() == null ? e.getClass().getSimpleName() : fs.getReason();
            }
            return file.isEmpty() ? why : file + ": " + why;
        }
        return e.getMessage() == null ? e.getClass().getSimpleName() : e.getMessage();
    }
}
