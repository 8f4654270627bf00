package org.convgrid.output;

import java.io.IOException;
import java.io.OutputStream;
import java.io.Writer;
import java.nio.channels.Channels;
import java.nio.channels.FileChannel;
import java.nio.charset.StandardCharsets;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.StandardOpenOption;

/**
 * Replaces files atomically: the content goes to a temporary file in the target's directory, is forced to disk,
 * then renamed over the target, so a reader (or a crash) never sees a half-written file. Where the file system
 * cannot rename atomically, a plain replacing move is used.
 */
public final class AtomicFiles {

    /** Writes the content of a text file. */
    @FunctionalInterface
    public interface TextBody {
        void write(Writer out) throws IOException;
    }

    /** Writes the content of a binary file. */
    @FunctionalInterface
    public interface BinaryBody {
        void write(OutputStream out) throws IOException;
    }

    /**
     * Ending of every temporary file: {@code .<target name>.<random>.convgrid.tmp} beside its target. The word marks it
     * as ours: a cleaner that matched any {@code .<name>.<word>.tmp} would take a user's {@code .catalogue.ecsv.backup.tmp}
     * for one.
     */
    private static final String TEMPORARY_SUFFIX = ".convgrid.tmp";
    /** A temporary file's name: a dot, the target's name, a dot, a random unsigned long in base 36, the suffix. */
    private static final java.util.regex.Pattern TEMPORARY_NAME =
            java.util.regex.Pattern.compile("\\..+\\.[0-9a-z]{1,13}\\.convgrid\\.tmp");

    private AtomicFiles() {
    }

    /**
     * Whether a file is one of the temporary files this class writes before the rename: one left behind by a process
     * that was killed mid-write is a partial copy of a file convgrid owns, never the user's.
     */
    public static boolean isTemporary(Path file) {
        return TEMPORARY_NAME.matcher(file.getFileName().toString()).matches();
    }

    /**
     * The file a temporary file of this class was to become (beside it), empty when {@code file} is no such
     * temporary file: lets a cleaner remove only the temporaries of files it owns.
     */
    public static java.util.Optional<Path> targetOfTemporary(Path file) {
        if (!isTemporary(file)) {
            return java.util.Optional.empty();
        }
        String name = file.getFileName().toString();
        String withoutSuffix = name.substring(1, name.length() - TEMPORARY_SUFFIX.length());
        return java.util.Optional.of(file.resolveSibling(withoutSuffix.substring(0, withoutSuffix.lastIndexOf('.'))));
    }

    /** Writes UTF-8 text through {@code body}, then moves it into place. */
    public static void write(Path target, TextBody body) throws IOException {
        writeBinary(target, out -> {
            Writer writer = Channels.newWriter(Channels.newChannel(out), StandardCharsets.UTF_8);
            body.write(writer);
            writer.flush();
        });
    }

    /** Writes a string as UTF-8. */
    public static void writeString(Path target, CharSequence text) throws IOException {
        write(target, out -> out.append(text));
    }

    /** Writes bytes through {@code body} (for example a PNG), then moves them into place. */
    public static void writeBinary(Path target, BinaryBody body) throws IOException {
        Path absolute = target.toAbsolutePath();
        Path dir = absolute.getParent();
        Files.createDirectories(dir);
        Path temp = newTemporary(dir, absolute.getFileName().toString());
        try {
            try (FileChannel channel = FileChannel.open(temp, StandardOpenOption.WRITE);
                 OutputStream out = Channels.newOutputStream(channel)) {
                body.write(out);
                out.flush();
                channel.force(true);
            } catch (IOException | RuntimeException e) {
                // name the file the user knows, not the temporary one (which is removed below)
                throw new IOException("cannot write " + absolute + ": " + (e.getMessage() == null
                        ? "the write failed" : e.getMessage()), e);
            }
            try {
                Files.move(temp, absolute, StandardCopyOption.ATOMIC_MOVE, StandardCopyOption.REPLACE_EXISTING);
            } catch (AtomicMoveNotSupportedException e) {
                Files.move(temp, absolute, StandardCopyOption.REPLACE_EXISTING);
            }
        } finally {
            Files.deleteIfExists(temp);
        }
    }

    /**
     * A new empty temporary file beside the target. It is created without explicit permissions, so the process's
     * umask applies as it does to every other output (a temporary file of the JDK's would stay 0600 after the rename
     * and keep collaborators from reading the run).
     */
    private static Path newTemporary(Path dir, String targetName) throws IOException {
        for (int attempt = 0; ; attempt++) {
            Path temp = dir.resolve("." + targetName + "." + Long.toUnsignedString(
                    java.util.concurrent.ThreadLocalRandom.current().nextLong(), 36) + TEMPORARY_SUFFIX);
            try {
                FileChannel.open(temp, StandardOpenOption.CREATE_NEW, StandardOpenOption.WRITE).close();
                return temp;
            } catch (java.nio.file.FileAlreadyExistsException e) {
                if (attempt >= 100) {
                    throw e;
                }
            }
        }
    }
}
