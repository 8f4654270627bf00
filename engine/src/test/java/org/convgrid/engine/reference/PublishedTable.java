package org.convgrid.engine.reference;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStreamReader;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;
import java.util.Objects;

/**
 * The data rows of a published table shipped as a test resource: comma-separated, its provenance in leading
 * {@code #} lines, then one line of column names, then the rows (no quoting: numbers and plain words only). Shared by
 * the tests that compare with published tracks, so that each reads only its own columns.
 */
public final class PublishedTable {

    private PublishedTable() {
    }

    /** The cells of every data row of the resource at {@code path} (beside {@code owner}'s class), in file order. */
    public static List<String[]> rows(Class<?> owner, String path) {
        var stream = Objects.requireNonNull(owner.getResourceAsStream(path), path);
        List<String[]> rows = new ArrayList<>();
        try (var in = new BufferedReader(new InputStreamReader(stream, StandardCharsets.UTF_8))) {
            boolean header = true;
            for (String line = in.readLine(); line != null; line = in.readLine()) {
                if (line.startsWith("#") || line.isBlank()) {
                    continue;
                }
                if (header) {
                    header = false;
                    continue;
                }
                rows.add(line.split(","));
            }
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        return rows;
    }
}
