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
 * them would give zero-width rectangles and are left out too (the later one wins).
 */
public final class Kippenhahn {

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
            if (b != null && b.hi() > b.lo()) {
                burning.add(new AgeRect(i, left, right, b.lo(), b.hi()));
            }
        }
        double ageMin = kept.isEmpty() ? 0.0 : all.get(kept.get(0)).ageGyr();
        double ageMax = kept.isEmpty() ? 0.0 : all.get(kept.get(kept.size() - 1)).ageGyr();
        List<String> notes = kept.size() < 2 ? List.of(TOO_SHORT_NOTE) : List.of();
        return new KippenhahnData(origin, ageMin, ageMax, zones, burning, notes, timeline);
    }
}
