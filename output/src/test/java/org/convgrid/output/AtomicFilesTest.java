package org.convgrid.output;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class AtomicFilesTest {

    @TempDir
    Path dir;

    @Test
    void writesAndReplacesLeavingNoTemporaryFile() throws IOException {
        Path target = dir.resolve("sub/catalogue.csv");
        AtomicFiles.writeString(target, "first\n");
        AtomicFiles.write(target, out -> out.append("second, caf\u00e9\n"));
        assertThat(Files.readString(target)).isEqualTo("second, caf\u00e9\n");
        try (Stream<Path> files = Files.list(target.getParent())) {
            assertThat(files).containsExactly(target);
        }
    }

    @Test
    void failedWriteKeepsTheOldContent() throws IOException {
        Path target = dir.resolve("manifest.yaml");
        AtomicFiles.writeString(target, "old\n");
        assertThatThrownBy(() -> AtomicFiles.write(target, out -> {
            out.append("half");
            throw new IOException("disk full");
        })).hasMessageEndingWith(": disk full").hasMessageContaining("manifest.yaml");
        assertThat(Files.readString(target)).isEqualTo("old\n");
        try (Stream<Path> files = Files.list(dir)) {
            assertThat(files).containsExactly(target);
        }
    }

    @Test
    void theWrittenFileHasTheModeOfAnyNewFileUnderTheUmask() throws IOException {
        // common practice (POSIX): a new file gets 0666 less the umask; the JDK's temporary files would stay 0600
        Path plain = Files.createFile(dir.resolve("plain.txt"));
        Path target = dir.resolve("manifest.yaml");
        AtomicFiles.writeString(target, "a: 1\n");
        assertThat(Files.getPosixFilePermissions(target)).isEqualTo(Files.getPosixFilePermissions(plain));
    }

    @Test
    void aFailedWriteNamesTheTargetAndTheCauseAndLeavesNoTemporaryFile() throws IOException {
        Path target = dir.resolve("map.png");
        assertThatThrownBy(() -> AtomicFiles.writeBinary(target, out -> {
            throw new IOException("No space left on device");
        })).isInstanceOf(IOException.class).hasMessage("cannot write " + target + ": No space left on device");
        try (Stream<Path> files = Files.list(dir)) {
            assertThat(files).isEmpty();
        }
    }
}
