package org.convgrid.cli;

import java.nio.file.Files;
import java.nio.file.Path;

/**
 * Checks that a file or directory the command will write can be written, before anything is computed: a
 * destination that is refused only after minutes of work wastes them.
 */
final class OutputTargets {

    private OutputTargets() {
    }

    /**
     * A file to be written (replaced when it exists): it must not be a directory, and its nearest existing folder
     * must be a writable directory.
     *
     * @throws UsageException naming the option and the file otherwise
     */
    static void requireWritableFile(String option, Path file) {
        if (file.getFileName() != null && file.getFileName().toString().equals("-")) {
            // '-' reads as standard output in many tools; here it wrote a file named '-' in the working directory
            throw new UsageException(option + " takes a file name; '-' (standard output) is not one it writes to: "
                    + "give a file, e.g. " + option + " model.csv");
        }
        if (Files.isDirectory(file)) {
            throw new UsageException(option + " " + file + " is a directory; give a file name");
        }
        if (Files.exists(file) && !Files.isRegularFile(file)) {
            throw new UsageException(option + " " + file + " exists and is not a regular file");
        }
        requireCreatableBelow(option, file);
    }

    /**
     * A directory to be created or used: when it exists it must be a writable directory, otherwise its nearest
     * existing folder must be one.
     *
     * @throws UsageException naming the option and the directory otherwise
     */
    static void requireWritableDirectory(String option, Path directory) {
        if (Files.exists(directory)) {
            if (!Files.isDirectory(directory)) {
                throw new UsageException(option + " " + directory + " exists and is not a directory");
            }
            if (!Files.isWritable(directory)) {
                throw new UsageException(option + " " + directory + " is not writable");
            }
            return;
        }
        requireCreatableBelow(option, directory);
    }

    private static void requireCreatableBelow(String option, Path target) {
        Path folder = target.toAbsolutePath().getParent();
        while (folder != null && !Files.exists(folder)) {
            folder = folder.getParent();
        }
        if (folder == null) {
            return;
        }
        if (!Files.isDirectory(folder)) {
            throw new UsageException(option + " " + target + " cannot be created: " + folder + " is not a directory");
        }
        if (!Files.isWritable(folder) || kernelFileSystem(folder)) {
            throw new UsageException(option + " " + target + " cannot be created: " + folder + " is not writable");
        }
    }

    /** The kernel's pseudo file systems: their folders look writable to root, but no file can be made in them. */
    private static boolean kernelFileSystem(Path folder) {
        try {
            String type = Files.getFileStore(folder).type();
            return type.equals("proc") || type.equals("sysfs") || type.equals("cgroup2") || type.equals("devpts");
        } catch (java.io.IOException e) {
            return false;
        }
    }
}
