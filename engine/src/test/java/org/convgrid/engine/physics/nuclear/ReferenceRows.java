package org.convgrid.engine.physics.nuclear;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStreamReader;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;
import java.util.Objects;

/** Reads the comma-separated reference tables under reference/nuclear/ ('#' lines are the source header). */
final class ReferenceRows {

    private ReferenceRows() {
    }

    static List<String[]> read(String name) {
        return read(name, 0);
    }

    /** With {@code columns} &gt; 0 the last column keeps any further commas. */
    static List<String[]> read(String name, int columns) {
        var stream = Objects.requireNonNull(ReferenceRows.class.getResourceAsStream("/reference/nuclear/" + name), name);
        try (var reader = new BufferedReader(new InputStreamReader(stream, StandardCharsets.UTF_8))) {
            List<String[]> rows = new ArrayList<>();
            for (String line = reader.readLine(); line != null; line = reader.readLine()) {
                if (!line.isBlank() && !line.startsWith("#")) {
                    rows.add(line.split(",", columns));
                }
            }
            return rows;
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }
}
