package org.convgrid.survey;

import java.io.IOException;
import java.nio.ByteBuffer;
import java.nio.channels.FileChannel;
import java.nio.channels.FileLock;
import java.nio.channels.OverlappingFileLockException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardOpenOption;
import java.util.OptionalLong;

/**
 * Ownership of a run directory by one process: an operating-system lock ({@link FileChannel#tryLock()}) on the file
 * {@link #FILE_NAME} inside it, held from before the directory is checked until the command ends. The operating system
 * releases it when the process ends in any way (kill -9 included), so a lock can never outlive its holder.
 *
 * <p>The holder writes its process id into the file so that a refused process can name it, and empties the file when
 * it releases the lock normally. A file that still holds a process id while its lock is free was therefore left by a
 * process that ended without releasing it (killed, or the machine stopped): {@link #staleHolder()} reports that id,
 * and the caller tells the user before going on. The file itself is never deleted: deleting it would let two
 * processes lock two different files of the same name.
 */
public final class RunLock implements AutoCloseable {

    /** The lock file inside a run directory. */
    public static final String FILE_NAME = ".convgrid.lock";

    /** Longest lock-file content read back (a process id and a line end). */
    private static final int MAX_CONTENT_BYTES = 64;

    private final Path file;
    private final FileChannel channel;
    private final FileLock lock;
    private final OptionalLong staleHolder;
    private final Path createdTop;

    private RunLock(Path file, FileChannel channel, FileLock lock, OptionalLong staleHolder, Path createdTop) {
        this.file = file;
        this.createdTop = createdTop;
        this.channel = channel;
        this.lock = lock;
        this.staleHolder = staleHolder;
    }

    /**
     * Takes the lock of {@code directory}, creating the directory when it is missing.
     *
     * @throws RunSetupException when another process holds it (the message names the directory and the holder's
     *                           process id when known); nothing was changed
     * @throws IOException when the lock file cannot be created or locked
     */
    public static RunLock acquire(Path directory) throws IOException {
        Path root = directory.toAbsolutePath().normalize();
        if (Files.exists(root) && !Files.isDirectory(root)) {
            throw new RunSetupException(root + " exists and is not a directory");
        }
        Path createdTop = RunDirectory.topMissing(root);
        try {
            Files.createDirectories(root);
        } catch (IOException e) {
            // the user named a directory that cannot be made (under /proc, below a file...): a usage problem
            throw new RunSetupException("cannot create run directory " + root + ": " + IoMessages.reason(e));
        }
        Path file = root.resolve(FILE_NAME);
        FileChannel channel;
        try {
            channel = FileChannel.open(file, StandardOpenOption.CREATE, StandardOpenOption.READ,
                    StandardOpenOption.WRITE);
        } catch (IOException e) {
            throw new IOException("cannot lock run directory " + root + ": " + IoMessages.reason(e), e);
        }
        try {
            FileLock lock;
            try {
                lock = channel.tryLock();
            } catch (OverlappingFileLockException e) {
                lock = null; // this process already holds it (another command in the same JVM)
            }
            if (lock == null) {
                OptionalLong holder = holder(channel);
                channel.close();
                throw new RunSetupException(root + " is in use by " + (holder.isPresent()
                        ? "process " + holder.getAsLong() : "another process") + " (lock file " + FILE_NAME
                        + "); wait for it to finish or choose another directory");
            }
            OptionalLong stale = holder(channel);
            byte[] pid = (ProcessHandle.current().pid() + "\n").getBytes(StandardCharsets.US_ASCII);
            channel.truncate(0);
            channel.write(ByteBuffer.wrap(pid), 0);
            channel.force(false);
            if (!Files.exists(file)) {
                // the previous holder removed the directory it had created for nothing: this lock guards no file
                lock.release();
                channel.close();
                throw new RunSetupException(root + " was removed by another process while this one waited for it; "
                        + "run the command again");
            }
            return new RunLock(file, channel, lock, stale, createdTop);
        } catch (IOException | RuntimeException e) {
            if (channel.isOpen()) {
                channel.close();
            }
            if (e instanceof IOException io && !(e instanceof java.nio.channels.ClosedChannelException)) {
                throw new IOException("cannot lock run directory " + root + ": " + IoMessages.reason(io), io);
            }
            throw e;
        }
    }

    /**
     * The process id a previous holder left in the file when it ended without releasing the lock, empty when the
     * file was new or released normally.
     */
    public OptionalLong staleHolder() {
        return staleHolder;
    }

    /** The lock file. */
    public Path file() {
        return file;
    }

    /**
     * Empties the file (a normal release) and releases the lock. When {@link #acquire} created the directory and
     * nothing but the lock file is in it (the command was refused), the directories it created are removed again,
     * so a refused command leaves nothing behind.
     */
    @Override
    public void close() throws IOException {
        try {
            if (channel.isOpen()) {
                channel.truncate(0);
            }
            if (createdTop != null && onlyTheLockFile()) {
                RunDirectory.deleteTree(createdTop);
            }
        } finally {
            try {
                if (lock.isValid()) {
                    lock.release();
                }
            } finally {
                channel.close();
            }
        }
    }

    private boolean onlyTheLockFile() throws IOException {
        try (var entries = Files.list(file.getParent())) {
            return entries.allMatch(file::equals);
        }
    }

    /** The process id in the file, empty when the file holds none. */
    private static OptionalLong holder(FileChannel channel) throws IOException {
        ByteBuffer buffer = ByteBuffer.allocate(MAX_CONTENT_BYTES);
        channel.read(buffer, 0);
        String text = new String(buffer.array(), 0, buffer.position(), StandardCharsets.US_ASCII).strip();
        if (text.isEmpty() || text.length() > 19 || !text.chars().allMatch(Character::isDigit)) {
            return OptionalLong.empty();
        }
        return OptionalLong.of(Long.parseLong(text));
    }
}
