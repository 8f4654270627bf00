package org.convgrid.plotting.zones;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Map;
import org.convgrid.engine.convection.StructureClass;
import org.convgrid.engine.request.ModelStatus;
import org.convgrid.output.Span;
import org.convgrid.output.catalogue.CatalogueRow;
import org.convgrid.output.catalogue.CatalogueZone;
import org.convgrid.output.transitions.Slice;
import org.convgrid.output.transitions.TransitionEstimate;
import org.convgrid.output.transitions.TransitionRow;
import org.convgrid.plotting.label.SliceLabels;

/**
 * Builds the data of a convective-zone map from the rows of one slice: a pure function, no drawing.
 *
 * <p>Each model owns a column of the mass axis that runs between the geometric midpoints to its neighbours (the
 * axis is logarithmic, so the column is centred on the model there); the outermost columns are as wide on their
 * open side as on the other. Every convective zone of a usable model (status ok) becomes one rectangle over
 * that column, of the kind zones.csv gives it; a model past the main sequence gets a full-height PAST_MAIN_SEQUENCE
 * column and any other model without a usable result a NO_RESULT one, so that a gap is never mistaken for a
 * radiative star.
 *
 * <p>Both maps draw the same zones, those zones.csv lists: in m/M from {@code mass_frac_inner} to
 * {@code mass_frac_outer}, in r/R from {@code radius_frac_inner} to {@code radius_frac_outer} (cores and shells
 * included). Only a model whose zones zones.csv does not list although its structure class says it has some (a run
 * directory without zones.csv) falls back, in r/R, to its profile file when there is one, else to the catalogue's
 * core and envelope columns, and the map says that its shells are not drawn.
 */
public final class ZoneMap {

    /** Note shown on an r/R map that drew some model from the catalogue's columns, for want of its zones.csv rows. */
    public static final String NO_ZONE_LIST_NOTE =
            "Some models have no rows in zones.csv: their convective shells are not drawn (cores and envelopes are "
                    + "from the catalogue).";

    private ZoneMap() {
    }

    /** A map in m/M; {@code transitions} may be null when the slice has none. */
    public static ZoneMapData inMass(Slice slice, List<CatalogueRow> rows, TransitionRow transitions) {
        return build(slice, rows, transitions, ZoneAxis.MASS_FRACTION, Map.of());
    }

    /**
     * A map in r/R.
     *
     * @param radiusZonesById convective intervals in r/R by model id, from profile files: used only for a model whose
     *     zones zones.csv does not list (see the class comment)
     */
    public static ZoneMapData inRadius(Slice slice, List<CatalogueRow> rows, TransitionRow transitions,
                                       Map<String, List<Span>> radiusZonesById) {
        return build(slice, rows, transitions, ZoneAxis.RADIUS_FRACTION, radiusZonesById);
    }

    /**
     * A map in m/M of one main-sequence fraction of an {@code ms_fraction} grid: {@code members} are the rows of one
     * Z and physics at that fraction, each star at its own age. No transition markers: transitions.csv finds them
     * across the masses of one age in Gyr, which holds one star of such a grid.
     */
    public static ZoneMapData inMassAtFraction(double msFraction, List<CatalogueRow> members) {
        return build(fractionSlice(members), SliceLabels.msFraction(msFraction), members, null,
                ZoneAxis.MASS_FRACTION, Map.of());
    }

    /** As {@link #inMassAtFraction}, in r/R ({@code radiusZonesById}: as for {@link #inRadius}). */
    public static ZoneMapData inRadiusAtFraction(double msFraction, List<CatalogueRow> members,
                                                 Map<String, List<Span>> radiusZonesById) {
        return build(fractionSlice(members), SliceLabels.msFraction(msFraction), members, null,
                ZoneAxis.RADIUS_FRACTION, radiusZonesById);
    }

    /** The Z and physics the members share, without an age (NaN): each member has its own. */
    private static Slice fractionSlice(List<CatalogueRow> members) {
        if (members.isEmpty()) {
            throw new IllegalArgumentException("no catalogue row at this main-sequence fraction");
        }
        Slice first = Slice.of(members.get(0));
        Slice slice = new Slice(first.zInit(), Double.NaN, first.mixingLength(), first.overshootHp(),
                first.criterion(), first.opacityScale(), first.overshootProfile());
        if (members.stream().map(Slice::of).anyMatch(s -> !sameButAge(s, slice))) {
            throw new IllegalArgumentException("rows of several Z or physics at one main-sequence fraction");
        }
        return slice;
    }

    private static boolean sameButAge(Slice a, Slice ageless) {
        return new Slice(a.zInit(), Double.NaN, a.mixingLength(), a.overshootHp(), a.criterion(), a.opacityScale(),
                a.overshootProfile()).equals(ageless);
    }

    private static ZoneMapData build(Slice slice, List<CatalogueRow> rows, TransitionRow transitions,
                                     ZoneAxis axis, Map<String, List<Span>> radiusZonesById) {
        List<CatalogueRow> members = rows.stream().filter(r -> Slice.of(r).equals(slice)).toList();
        if (members.isEmpty()) {
            throw new IllegalArgumentException("no catalogue row in slice " + slice);
        }
        return build(slice, SliceLabels.age(slice.ageGyr()), members, transitions, axis, radiusZonesById);
    }

    private static ZoneMapData build(Slice slice, String age, List<CatalogueRow> members, TransitionRow transitions,
                                     ZoneAxis axis, Map<String, List<Span>> radiusZonesById) {
        List<CatalogueRow> byMass = members.stream().sorted(Comparator.comparingDouble(CatalogueRow::massMsun))
                .toList();
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
            if (axis == ZoneAxis.MASS_FRACTION || !zoneListMissing(row)) {
                for (CatalogueZone z : row.zones()) {
                    Span extent = axis == ZoneAxis.MASS_FRACTION ? new Span(z.massFracInner(), z.massFracOuter())
                            : new Span(z.radiusFracInner(), z.radiusFracOuter());
                    rects.add(new ZoneRect(row.modelId(), row.massMsun(), edges[i], edges[i + 1], extent.lo(),
                            extent.hi(), ZoneKind.of(z)));
                }
            } else {
                List<Span> fallback = radiusZonesById.containsKey(row.modelId())
                        ? radiusZonesById.get(row.modelId()) : radiusZonesFromCatalogue(row);
                omitted |= !radiusZonesById.containsKey(row.modelId());
                for (Span z : fallback) {
                    rects.add(new ZoneRect(row.modelId(), row.massMsun(), edges[i], edges[i + 1], z.lo(),
                            z.hi(), ZoneKind.of(z.lo(), z.hi())));
                }
            }
        }
        return new ZoneMapData(slice, age, axis, rects, markers(transitions), edges[0], edges[edges.length - 1],
                omitted ? List.of(NO_ZONE_LIST_NOTE) : List.of());
    }

    /**
     * Whether zones.csv left this usable model's zones out: it lists none although the structure class says the
     * star has a convective zone (a run directory without zones.csv). A radiative star rightly has none.
     */
    static boolean zoneListMissing(CatalogueRow row) {
        return row.zones().isEmpty() && row.structureClass() != null
                && row.structureClass() != StructureClass.RADIATIVE;
    }

    /**
     * What the catalogue's columns give in r/R: the whole star when fully convective, else the core (up to
     * {@code core_cz_radius_frac}) and the envelope (from {@code env_cz_base_radius_frac}); shells it does not hold.
     */
    static List<Span> radiusZonesFromCatalogue(CatalogueRow row) {
        if (row.structureClass() == StructureClass.FULLY_CONVECTIVE) {
            return List.of(new Span(0.0, 1.0));
        }
        List<Span> zones = new ArrayList<>(2);
        double core = row.coreCzRadiusFrac();
        if (Double.isFinite(core) && core > 0.0) {
            zones.add(new Span(0.0, Math.min(core, 1.0)));
        }
        double base = row.envCzBaseRadiusFrac();
        if (Double.isFinite(base) && base < 1.0) {
            zones.add(new Span(Math.max(base, 0.0), 1.0));
        }
        return zones;
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
