package org.convgrid.engine.physics.opacity;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.io.IOException;
import java.io.StringReader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * The converter from the published OPAL file layout (Iglesias &amp; Rogers 1996, ApJ 464, 943; GN93hz file dated
 * 10/03/95) to our table layout, and the one-off entry point that writes the shipped resource:
 * <pre>
 *   ./mvnw -q -B -ntp -pl engine test -Dtest=OpalFileConversionTest -Dconvgrid.opal.raw=FILE
 * </pre>
 * ({@code -Dconvgrid.opal.raw=windows} re-creates the interim set from the two windows; optional
 * {@code -Dconvgrid.opal.second=FILE}, an independent second transcription, is compared cell by cell first; optional
 * {@code -Dconvgrid.opal.out=FILE}, default the engine's {@code src/main/resources} copy). It fails, writing
 * nothing, when any check finds a problem.
 */
class OpalFileConversionTest {

    static final String RAW = System.getProperty("convgrid.opal.raw", "");
    static final Path OUT = Path.of(System.getProperty("convgrid.opal.out",
            "src/main/resources" + OpalGn93Opacity.RESOURCE));

    @Test
    void writesTheShippedTablesWhenAsked() throws IOException {
        assumeTrue(!RAW.isEmpty(), "set -Dconvgrid.opal.raw=FILE (or windows) to convert");
        boolean windows = RAW.equals("windows");
        if (RAW.equals("synthetic")) {
            // a rehearsal only: writes the synthetic stand-in's raw text next to OUT, then stops
            Files.writeString(OUT.resolveSibling("synthetic-GN93hz.txt"), SyntheticOpalFile.text());
            return;
        }
        String rawText = windows ? OpalFileConverter.windowsAsRawFile()
                : Files.readString(Path.of(RAW), StandardCharsets.ISO_8859_1);
        List<OpalFileConverter.RawTable> raw = OpalFileConverter.parse(new StringReader(rawText));
        String second = System.getProperty("convgrid.opal.second", "");
        if (!second.isEmpty()) {
            List<OpalFileConverter.RawTable> other = OpalFileConverter.parse(Files.newBufferedReader(Path.of(second),
                    StandardCharsets.ISO_8859_1));
            assertThat(OpalFileConverter.compare(raw, other)).as("differences between the two transcriptions")
                    .isEmpty();
        }
        String source = windows
                ? "INTERIM: only the windows of tables 47 and 73 shipped earlier in this repository"
                + " (reference/opacity/opal-gn93-x035-z002.txt, opal-gn93-x070-z002.txt); to be replaced by the full"
                + " file, see OpalFileConversionTest."
                : System.getProperty("convgrid.opal.source",
                        "the published file, transcribed from a public copy into " + Path.of(RAW).getFileName() + ".");
        String text = OpalFileConverter.write(OpalFileConverter.convert(raw, windows
                        ? "OPAL GN93hz, interim: tables 47 and 73 only" : "OPAL GN93hz (Iglesias & Rogers 1996)"),
                OpalFileConverter.provenance(raw, source, "10/03/95"));
        TabulatedOpacity back = OpalFileConverter.readBack(text);
        assertThat(OpalFileConverter.verify(raw, back)).as("conversion problems").isEmpty();
        if (!windows) {
            assertThat(raw).as("tables in the GN93hz file (Iglesias & Rogers 1996)").hasSize(OpalFileConverter.FULL_FILE_TABLES);
            assertThat(OpalFileConverter.numbering(raw)).isEmpty();
        }
        Files.createDirectories(OUT.toAbsolutePath().getParent());
        Files.writeString(OUT, text, StandardCharsets.UTF_8);
        assertThat(OpalFileConverter.verify(raw, OpacityTableReader.read(OUT))).isEmpty();
    }

    @Test
    void aStandInWithTheFullFilesLayoutConvertsAndVerifies() throws IOException {
        // layout of the GN93hz file (Iglesias & Rogers 1996): 126 tables numbered 1..126, 70 log T rows 3.75-8.70,
        // blank right-hand cells at high log T; values synthetic (SyntheticOpalFile)
        List<OpalFileConverter.RawTable> raw = OpalFileConverter.parse(new StringReader(SyntheticOpalFile.text()));
        assertThat(raw).hasSize(OpalFileConverter.FULL_FILE_TABLES);
        assertThat(OpalFileConverter.numbering(raw)).isEmpty();
        TabulatedOpacity back = OpalFileConverter.readBack(OpalFileConverter.write(
                OpalFileConverter.convert(raw, "synthetic"), OpalFileConverter.provenance(raw, "test", "none")));
        assertThat(OpalFileConverter.verify(raw, back)).isEmpty();
        assertThat(back.logTemperatures()).hasSize(70).startsWith(3.75).endsWith(8.7);
        assertThat(back.metallicities()).hasSize(13);
    }

    @Test
    void everyCellOfThePublishedWindowsSurvivesTheConversion() throws IOException {
        // Iglesias & Rogers 1996, GN93hz tables 47 (X = 0.35) and 73 (X = 0.70), Z = 0.02, as shipped windows
        List<OpalFileConverter.RawTable> raw = OpalFileConverter.parse(
                new StringReader(OpalFileConverter.windowsAsRawFile()));
        assertThat(raw).extracting(OpalFileConverter.RawTable::number).containsExactly(47, 73);
        TabulatedOpacity back = OpalFileConverter.readBack(OpalFileConverter.write(
                OpalFileConverter.convert(raw, "windows"), OpalFileConverter.provenance(raw, "test", "10/03/95")));
        assertThat(OpalFileConverter.verify(raw, back)).isEmpty();
        // X = 0.70, Z = 0.02 at log T 7.20, log R = 1.0 is 9.999 in the published table: not in table
        int row = java.util.Arrays.binarySearch(back.logTemperatures(), 7.2);
        assertThat(back.logKappa(1, row, 18)).isNaN();
        assertThat(back.logKappa(1, row, 17)).isEqualTo(1.027);
    }

    @Test
    void blankTrailingColumnsAndSummaryLinesAreRead() throws IOException {
        // the layout of the published file: a summary header without rows, then a table whose last row stops early
        String text = """
                TABLE #  1 $G&N'93 Solar$ X=0.0000 Y=1.0000 Z=0.0000 dXc=0.0000 dXo=0.0000
                TABLE #  2 $G&N'93 Solar$ X=0.7000 Y=0.2800 Z=0.0200 dXc=0.0000 dXo=0.0000
                TABLE #  1 $G&N'93 Solar$ X=0.0000 Y=1.0000 Z=0.0000 dXc=0.0000 dXo=0.0000

                                  log R

                logT  -8.0   -7.5   -7.0

                3.75  9.999 -1.000 -0.900
                3.80 -1.100 -1.050
                """;
        List<OpalFileConverter.RawTable> raw = OpalFileConverter.parse(new StringReader(text));
        assertThat(raw).hasSize(1);
        assertThat(raw.get(0).logKappa()[0][0]).isNaN();
        assertThat(raw.get(0).logKappa()[1][2]).isNaN();
        assertThat(raw.get(0).logKappa()[1][1]).isEqualTo(-1.05);
    }

    @Test
    void aTypingSlipIsFlaggedAndTheWindowsHaveNone() throws IOException {
        // Iglesias & Rogers 1996 tables 47 and 73: smooth rows, no flag; one digit changed: flagged
        List<OpalFileConverter.RawTable> raw = OpalFileConverter.parse(
                new StringReader(OpalFileConverter.windowsAsRawFile()));
        for (OpalFileConverter.RawTable t : raw) {
            assertThat(OpalFileConverter.isolatedJumps(t)).isEmpty();
        }
        String slipped = OpalFileConverter.windowsAsRawFile().replace("  1.587  1.699", "  1.587  2.699");
        List<String> flags = new ArrayList<>();
        OpalFileConverter.parse(new StringReader(slipped)).forEach(t -> flags.addAll(OpalFileConverter.isolatedJumps(t)));
        assertThat(flags).hasSize(1).first().asString().contains("log T 4.00", "log R -1.5");
    }

    @Test
    void aGapInTheTableNumbersAndADifferentTranscriptionAreReported() throws IOException {
        String windows = OpalFileConverter.windowsAsRawFile();
        List<OpalFileConverter.RawTable> raw = OpalFileConverter.parse(new StringReader(windows));
        assertThat(OpalFileConverter.numbering(raw)).first().asString().contains("table 47 at place 1");
        List<OpalFileConverter.RawTable> other = OpalFileConverter.parse(
                new StringReader(windows.replace("  1.587  1.699", "  1.587  1.698")));
        assertThat(OpalFileConverter.compare(raw, other)).singleElement().asString().contains("1.699", "1.698");
        assertThatThrownBy(() -> OpalFileConverter.parse(new StringReader(
                "TABLE # 1 X=0.7000 Y=0.2800 Z=0.0200\nlogT -8.0\n3.75 1.0 2.0\n")))
                .isInstanceOf(IllegalArgumentException.class);
    }
}
