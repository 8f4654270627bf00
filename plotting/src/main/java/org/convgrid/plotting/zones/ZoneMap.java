package org.convgrid.plotting.zones;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Map;
import org.convgrid.engine.convection.StructureClass;
import org.convgrid.engine.request.ModelStatus;
import org.convgrid.output.Span;
import org.convgrid.output.catalogue.CatalogueRow;
import org.convgrid.output.transitions.Slice;
import org.convgrid.output.transitions.TransitionEstimate;
import org.convgrid.output.transitions.TransitionRow;

/**
 * Builds the data of a convective-zone map from the rows of one slice: a pure function, no drawing.
 *
 * <p>Each model owns a column of the mass axis that runs between the geometric midpoints to its neighbours (the
 * axis is logarithmic, so the column is centred on the model there); the outermost columns are as wide on their
 * open side as on the other. Every convective interval of a usable model (status ok) becomes one rectangle over
 * that column; a model past the main sequence gets a full-height PAST_MAIN_SEQUENCE column and any other model without a
 * usable result a NO_RESULT one, so that a gap is never
 * mistaken for a radiative star.
 *
 * <p>In m/M the intervals are the catalogue's {@code conv_zones_mass_frac}. In r/R the catalogue only has the
 * envelope base radius: the envelope is drawn from {@code env_cz_base_radius_frac} to 1, a fully convective star
 * from 0 to 1, and cores and shells, whose radii the catalogue does not hold, are left out with a note, unless
 * the caller passes the model's intervals in r/R read from its profile file.
 */
public final class ZoneMap {

    /** Note shown on an r/R map that leaves out cores or shells. */
    public static final String CORE_RADIUS_NOTE =
            "Core radius not in catalogue: convective cores and shells are not drawn (write profiles to see them).";

    private ZoneMap() {
    }

    /** A map in m/M; {@code transitions} may be null when the slice has none. */
    public static ZoneMapData inMass(Slice slice, List<CatalogueRow> rows, TransitionRow transitions) {
        return build(slice, rows, transitions, ZoneAxis.MASS_FRACTION, Map.of());
    }

    /**
     * A map in r/R.
     *
     * @param radiusZonesById convective intervals in r/R by model id, from profile files; models missing here fall
     *     back to what the catalogue supports
     */
    public static ZoneMapData inRadius(Slice slice, List<CatalogueRow> rows, TransitionRow transitions,
                                       Map<String, List<Span>> radiusZonesById) {
        return build(slice, rows, transitions, ZoneAxis.RADIUS_FRACTION, radiusZonesById);
    }

    private static ZoneMapData build(Slice slice, List<CatalogueRow> rows, TransitionRow transitions,
                                     ZoneAxis axis, Map<String, List<Span>> radiusZonesById) {
        List<CatalogueRow> byMass = rows.stream().filter(r -> Slice.of(r).equals(slice))
                .sorted(Comparator.comparingDouble(CatalogueRow::massMsun)).toList();
        if (byMass.isEmpty()) {
            throw new IllegalArgumentException("no catalogue row in slice " + slice);
        }
        double[] edges = columnEdges(byMass.stream().mapToDouble(CatalogueRow::massMsun).toArray());
        List<ZoneRect> rects = new ArrayList<>();
        boolean omitted = false;
        for (int i = 0; i < byMass.size(); i++) {
            CatalogueRow row = byMass.get(i);
            if (!row.isOk()) {
                rects.add(new ZoneRect(row.modelId(), row.massMsun(), edges[i], edges[i + 1], 0.0, 1.0,
                        row.status() == ModelStatus.PAST_MAIN_SEQUENCE ? ZoneKind.PAST_MAIN_SEQUENCE
                                : ZoneKind.NO_RESULT));
                continue;
            }
            List<Span> zones;
            if (axis == ZoneAxis.MASS_FRACTION) {
                zones = row.convZones();
            } else if (radiusZonesById.containsKey(row.modelId())) {
                zones = radiusZonesById.get(row.modelId());
            } else {
                zones = radiusZonesFromCatalogue(row);
                omitted |= zones.size() < row.convZones().size();
            }
            for (Span z : zones) {
                rects.add(new ZoneRect(row.modelId(), row.massMsun(), edges[i], edges[i + 1], z.lo(), z.hi(),
                        ZoneKind.of(z.lo(), z.hi())));
            }
        }
        return new ZoneMapData(slice, axis, rects, markers(transitions), edges[0], edges[edges.length - 1],
                omitted ? List.of(CORE_RADIUS_NOTE) : List.of());
    }

    /** What the catalogue supports in r/R: the whole star when fully convective, else the envelope only. */
    static List<Span> radiusZonesFromCatalogue(CatalogueRow row) {
        boolean whole = row.structureClass() == StructureClass.FULLY_CONVECTIVE
                || row.convZones().size() == 1 && ZoneKind.of(row.convZones().get(0).lo(),
                row.convZones().get(0).hi()) == ZoneKind.WHOLE_STAR;
        if (whole) {
            return List.of(new Span(0.0, 1.0));
        }
        double base = row.envCzBaseRadiusFrac();
        return Double.isFinite(base) && base < 1.0 ? List.of(new Span(Math.max(base, 0.0), 1.0)) : List.of();
    }

    /**
     * Column edges for sorted masses: geometric midpoints between neighbours, the outer edges mirrored. Equal
     * masses (should not occur within one slice) share a column.
     */
    static double[] columnEdges(double[] masses) {
        int n = masses.length;
        double[] edges = new double[n + 1];
        if (n == 1) {
            edges[0] = masses[0] / SINGLE_COLUMN_HALF_WIDTH;
            edges[1] = masses[0] * SINGLE_COLUMN_HALF_WIDTH;
            return edges;
        }
        for (int i = 1; i < n; i++) {
            edges[i] = Math.sqrt(masses[i - 1] * masses[i]);
        }
        edges[0] = masses[0] * masses[0] / edges[1];
        edges[n] = masses[n - 1] * masses[n - 1] / edges[n - 1];
        return edges;
    }

    /** Half-width factor of a lone column on the log axis (10 per cent either side). */
    private static final double SINGLE_COLUMN_HALF_WIDTH = 1.1;

    private static List<TransitionMarker> markers(TransitionRow t) {
        List<TransitionMarker> markers = new ArrayList<>(2);
        if (t != null) {
            add(markers, TransitionMarker.Kind.FULLY_CONVECTIVE_LIMIT, t.fullyConvective(), t.toleranceMsun());
            add(markers, TransitionMarker.Kind.CONV_CORE_ONSET, t.convCoreOnset(), t.toleranceMsun());
        }
        return markers;
    }

    private static void add(List<TransitionMarker> markers, TransitionMarker.Kind kind, TransitionEstimate e,
                            double toleranceMsun) {
        if (e.found() && Double.isFinite(e.massMsun())) {
            markers.add(new TransitionMarker(kind, e.massMsun(), e.bracket(), toleranceMsun));
        }
    }
}
