package org.convgrid.engine.physics.opacity;

import java.io.IOException;
import java.util.ArrayList;
import java.util.List;

/**
 * The tabulated nodes of a reference OPAL window ({@code /reference/opacity/*.txt}) inside a (log T, log R)
 * window, entries marked out of table (9.999) left out. One reader for every test that walks those tables.
 */
final class OpalTableNodes {

    /** One node: log10 T [K], log10 R, the table's log10 kappa [cm^2/g], and the density it stands for. */
    record Node(double logT, double logR, double logKappa) {
        double temperature() {
            return Math.pow(10.0, logT);
        }

        double density() {
            return Math.pow(10.0, logR) * Math.pow(temperature() * 1e-6, 3);
        }
    }

    private OpalTableNodes() {
    }

    static List<Node> in(String table, double logTMin, double logTMax, double logRMin, double logRMax)
            throws IOException {
        List<String[]> rows = AnalyticCompositeOpacityTest.rows("/reference/opacity/" + table);
        String[] header = rows.get(0);
        List<Node> nodes = new ArrayList<>();
        for (String[] row : rows.subList(1, rows.size())) {
            double logT = Double.parseDouble(row[0]);
            if (logT < logTMin - 1e-9 || logT > logTMax + 1e-9) {
                continue;
            }
            for (int j = 1; j < header.length; j++) {
                double logR = Double.parseDouble(header[j]);
                double logK = Double.parseDouble(row[j]);
                if (logR < logRMin - 1e-9 || logR > logRMax + 1e-9 || logK > AnalyticCompositeOpacityTest.OUT_OF_TABLE) {
                    continue;
                }
                nodes.add(new Node(logT, logR, logK));
            }
        }
        return nodes;
    }
}
