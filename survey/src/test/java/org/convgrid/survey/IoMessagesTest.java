package org.convgrid.survey;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.nio.file.AccessDeniedException;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;

/** I/O failures name their file, also where the exception a write throws does not (a full disk). */
class IoMessagesTest {

    @Test
    void aFailedAppendNamesItsFile() {
        Path file = Path.of("runs", "x", "catalogue.ecsv");
        IOException full = IoMessages.appending(file, new IOException("No space left on device"));
        assertThat(IoMessages.reason(full)).isEqualTo("cannot append to " + file.toAbsolutePath().normalize()
                + ": No space left on device");
        // an exception that names its file already is kept
        AccessDeniedException denied = new AccessDeniedException("runs/x/zones.csv");
        assertThat(IoMessages.appending(file, denied)).isSameAs(denied);
    }
}
