package org.convgrid.plotting.kippenhahn;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.stream.IntStream;
import org.convgrid.output.Span;
import org.convgrid.output.track.Track;
import org.convgrid.output.track.TrackStep;
import org.convgrid.output.track.TrackTimeline;
import org.convgrid.plotting.tracks.TrackOrigin;

/**
 * Builds zones-against-age data from one track: a pure function, no drawing. Step i's convective intervals and
 * burning region are held from its age to step i+1's age, so what is shaded at an age is the structure of the
 * last step computed at or before it. Steps without a finite age are left out; steps at the age of the step before
 * them would give zero-width rectangles and are left out too (the later one wins). A step's burning region is left
 * out when the track says nuclear burning gives less than {@link #MIN_NUCLEAR_SHARE} of the star's luminosity.
 */
public final class Kippenhahn {

    /**
     * The least share of the star's luminosity that nuclear burning must give for a step's burning region to be
     * drawn. The track's region is where eps_nuc exceeds 1 % of its peak, which is defined whatever the peak: on the
     * pre-main sequence of 1 Msun (about 1-20 Myr) it spans m/M 0-0.6 while L_nuc / L is 1e-7 to 1e-3, and the
     * star shines by contraction. 1 %, as the region's own threshold; steps without L_nuc / L (tracks from the
     * zero-age main sequence, which burn hydrogen throughout) are drawn as before.
     */
    public static final double MIN_NUCLEAR_SHARE = 0.01;
    /** Note printed on a chart whose track gives L_nuc / L: what the hatching shows. */
    public static final String BURNING_NOTE = "Hatched: where eps_nuc exceeds 1 % of its peak, at ages when nuclear "
            + "burning gives at least 1 % of L (at other ages the star shines by contraction).";
    /** Note printed when a track has fewer than two steps at distinct ages. */
    public static final String TOO_SHORT_NOTE = "The track has fewer than two steps: nothing to shade.";

    private Kippenhahn() {
    }

    /** The chart data of {@code track}, whose mass, Z and physics are {@code origin}, its life stages its own. */
    public static KippenhahnData build(TrackOrigin origin, Track track) {
        return build(origin, track, TrackTimeline.of(track.steps()));
    }

    /** The chart data of {@code track} ({@code origin}: its mass, Z and physics) with its life stages. */
    public static KippenhahnData build(TrackOrigin origin, Track track, TrackTimeline timeline) {
        List<TrackStep> all = track.steps();
        // Indices into the file, sorted by age, keeping the last step of equal ages.
        List<Integer> order = IntStream.range(0, all.size()).filter(i -> Double.isFinite(all.get(i).ageGyr()))
                .boxed().sorted(Comparator.comparingDouble(i -> all.get(i).ageGyr())).toList();
        List<Integer> kept = new ArrayList<>();
        for (int i : order) {
            if (!kept.isEmpty() && all.get(kept.get(kept.size() - 1)).ageGyr() == all.get(i).ageGyr()) {
                kept.set(kept.size() - 1, i);
            } else {
                kept.add(i);
            }
        }
        List<AgeRect> zones = new ArrayList<>();
        List<AgeRect> burning = new ArrayList<>();
        for (int k = 0; k + 1 < kept.size(); k++) {
            int i = kept.get(k);
            TrackStep step = all.get(i);
            double left = step.ageGyr();
            double right = all.get(kept.get(k + 1)).ageGyr();
            for (Span z : step.convZones()) {
                zones.add(new AgeRect(i, left, right, z.lo(), z.hi()));
            }
            Span b = step.burningZone();
            // NaN (no L_nuc / L in the file) keeps the region: such a track starts on the main sequence
            boolean burnsForReal = !(step.nuclearLuminosityFrac() < MIN_NUCLEAR_SHARE);
            if (b != null && b.hi() > b.lo() && burnsForReal) {
                burning.add(new AgeRect(i, left, right, b.lo(), b.hi()));
            }
        }
        double ageMin = kept.isEmpty() ? 0.0 : all.get(kept.get(0)).ageGyr();
        double ageMax = kept.isEmpty() ? 0.0 : all.get(kept.get(kept.size() - 1)).ageGyr();
        List<String> notes = new ArrayList<>();
        if (kept.size() < 2) {
            notes.add(TOO_SHORT_NOTE);
        }
        if (all.stream().anyMatch(step -> Double.isFinite(step.nuclearLuminosityFrac()))) {
            notes.add(BURNING_NOTE);
        }
        return new KippenhahnData(origin, ageMin, ageMax, zones, burning, notes, timeline);
    }
}
