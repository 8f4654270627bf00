package org.convgrid.plotting.style;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import javax.imageio.IIOException;
import org.junit.jupiter.api.Test;

/** The image encoder's own wrapper hides the operating system's reason; the reason is what the user is told. */
class ChartFilesOsReasonTest {

    @Test
    void theEncodersWrapperGivesWayToTheOperatingSystemsReason() {
        IOException os = new IOException("File too large");
        assertThat(ChartFiles.withOsReason(new IIOException("I/O error writing PNG file!", os))).isSameAs(os);
        IOException plain = new IOException("No space left on device");
        assertThat(ChartFiles.withOsReason(plain)).isSameAs(plain);
    }
}
