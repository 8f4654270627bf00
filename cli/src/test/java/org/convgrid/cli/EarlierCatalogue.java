package org.convgrid.cli;

import java.util.List;

/**
 * Catalogues as earlier versions wrote them, made from one of this version's: columns are only ever added at the end,
 * so an earlier catalogue is this one without its last columns (their header entries and their cells).
 */
final class EarlierCatalogue {

    private EarlierCatalogue() {
    }

    /**
     * The catalogue {@code text} without the column {@code firstLacking} and every column after it, its first
     * {@code rows} rows only.
     */
    static String lackingFrom(String text, String firstLacking, int rows) {
        List<String> lines = List.of(text.split("\n"));
        String names = lines.stream().filter(l -> !l.startsWith("#")).findFirst().orElseThrow();
        List<String> columns = List.of(names.split(",", -1));
        int kept = columns.indexOf(firstLacking);
        if (kept < 0) {
            throw new IllegalArgumentException("no column " + firstLacking + " in " + names);
        }
        List<String> dropped = columns.subList(kept, columns.size());
        StringBuilder out = new StringBuilder();
        int row = -1;
        for (String line : lines) {
            if (line.startsWith("#")) {
                if (dropped.stream().noneMatch(c -> line.contains("{name: " + c + ","))) {
                    out.append(line).append('\n');
                }
            } else if (row++ < rows) {
                // the dropped columns are numbers and words without commas: cut at the commas from the end
                int cut = line.length();
                for (int i = 0; i < dropped.size(); i++) {
                    cut = line.lastIndexOf(',', cut - 1);
                }
                out.append(line, 0, cut).append('\n');
            }
        }
        return out.toString();
    }
}
