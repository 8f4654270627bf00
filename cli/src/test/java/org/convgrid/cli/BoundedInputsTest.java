package org.convgrid.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Inputs that once read without end or allocated without bound (a device, a named pipe, a table declaring two
 * billion values or 65536 x 65536 blocks) exit 2 at once: each within 10 s in a JVM of 256 MB.
 */
class BoundedInputsTest {

    private static final long LIMIT_MILLIS = 10_000;

    @TempDir
    Path work;

    private static final String GRID = """
            mass: {from: 0.5, to: 1.0, step: 0.1}
            metallicity: {z: [0.02], helium: {primordial: 0.2485, enrichment: 1.5}}
            physics:
            """;

    private Path grid(String name, String physicsLine) throws Exception {
        return Files.writeString(work.resolve(name), GRID + "  " + physicsLine + "\n");
    }

    private Path table(String name, String axes) throws Exception {
        return Files.writeString(work.resolve(name), "convgrid-opacity-table 1\nname hostile\n" + axes + "\nend\n");
    }

    @Test
    void devicesPipesAndHugeDeclaredTablesExit2QuicklyInASmallHeap() throws Exception {
        Path fifo = work.resolve("pipe.yaml");
        boolean haveFifo = new ProcessBuilder("mkfifo", fifo.toString()).start().waitFor() == 0;
        table("huge-axis.txt", "log10_temperature 2000000000 1 2 3");
        table("huge-blocks.txt", "log10_temperature 1 4.0\nlog10_r 1 -3.0\nhydrogen 65536 "
                + "0.1 ".repeat(3) + "\nmetals 65536 0.01");
        List<String> lines = new ArrayList<>(List.of(
                "check|" + grid("zero-preset.yaml", "preset: /dev/zero"),
                "check|" + grid("zero-table.yaml", "opacity_table: /dev/zero"),
                "check|" + grid("huge-axis.yaml", "opacity_table: huge-axis.txt"),
                "check|" + grid("huge-blocks.yaml", "opacity_table: huge-blocks.txt"),
                "check|/dev/zero",
                "star|--mass|1|--z|0.02|--opacity-table|/dev/zero",
                "star|--mass|1|--z|0.02|--opacity-table|" + work.resolve("huge-axis.txt")));
        if (haveFifo) {
            lines.add("check|" + fifo);
            lines.add("check|" + grid("pipe-preset.yaml", "preset: pipe.yaml"));
        }
        String java = Path.of(System.getProperty("java.home"), "bin", "java").toString();
        List<String> command = new ArrayList<>(List.of(java, "-Xmx256m", "-cp", System.getProperty("java.class.path"),
                BoundedInputsMain.class.getName()));
        command.addAll(lines);
        Path out = work.resolve("child.out");
        Process child = new ProcessBuilder(command).directory(work.toFile()).redirectErrorStream(true)
                .redirectOutput(out.toFile()).start();
        boolean ended = child.waitFor(120, TimeUnit.SECONDS);
        if (!ended) {
            child.destroyForcibly();
        }
        assertThat(ended).as("the child ended; it printed: %s", Files.readString(out)).isTrue();
        List<String> results = Files.readAllLines(out);
        assertThat(results).as(String.join("\n", results)).hasSize(lines.size());
        for (int i = 0; i < lines.size(); i++) {
            String[] r = results.get(i).split("\t", 3);
            assertThat(r[0]).as("exit code of %s: %s", lines.get(i), results.get(i)).isEqualTo("2");
            assertThat(Long.parseLong(r[1])).as("ms for %s", lines.get(i)).isLessThan(LIMIT_MILLIS);
            assertThat(r[2]).doesNotContainPattern("[A-Za-z]+(Exception|Error)\\b");
        }
        assertThat(results.get(0)).contains("preset").contains("not a regular file");
        assertThat(results.get(2)).contains("log10_temperature declares 2000000000 values");
        assertThat(results.get(3)).contains("hydrogen declares 65536 values");
    }
}
