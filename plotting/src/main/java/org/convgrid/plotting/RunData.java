package org.convgrid.plotting;

import java.io.IOException;
import java.io.Reader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.convgrid.engine.request.OvershootScheme;
import org.convgrid.output.IronAbundance;
import org.convgrid.output.RunLayout;
import org.convgrid.output.Span;
import org.convgrid.output.catalogue.CatalogueReader;
import org.convgrid.output.catalogue.CatalogueRow;
import org.convgrid.output.manifest.RunManifest;
import org.convgrid.output.manifest.RunManifestReader;
import org.convgrid.output.profile.ProfileReader;
import org.convgrid.output.profile.ProfileRow;
import org.convgrid.output.track.Track;
import org.convgrid.output.track.TrackReader;
import org.convgrid.output.track.TrackTimeline;
import org.convgrid.output.transitions.TransitionFinder;
import org.convgrid.output.transitions.TransitionReader;
import org.convgrid.output.transitions.TransitionRow;
import org.convgrid.plotting.label.AgeGroups;
import org.convgrid.plotting.label.MetallicityNames;
import org.convgrid.plotting.label.PhysicsKey;
import org.convgrid.plotting.tracks.TrackOrigin;
import org.convgrid.plotting.tracks.TrackedModel;

/**
 * What the charts and the report read from a run directory (file names: {@link RunLayout}).
 *
 * @param catalogue every catalogue row, in file order
 * @param transitions the rows of transitions.csv, or, when that file is absent, found from the catalogue
 * @param transitionsFromFile whether {@code transitions} came from transitions.csv
 * @param manifest the manifest, null when manifest.yaml is absent
 * @param radiusZones convective intervals in r/R by model id, from profiles/ (empty when there are none); the r/R
 *     maps use them only for models whose zones zones.csv does not list
 * @param tracks the evolution tracks in tracks/, by track id (empty when there are none)
 * @param timelines where each track's life stages lie, by track id (absent: {@link TrackTimeline#UNKNOWN})
 */
public record RunData(List<CatalogueRow> catalogue, List<TransitionRow> transitions, boolean transitionsFromFile,
                      RunManifest manifest, Map<String, List<Span>> radiusZones, List<Track> tracks,
                      Map<String, TrackTimeline> timelines) {

    /** Relative difference up to which a track's mass is its catalogue model's. */
    static final double TRACK_MASS_TOLERANCE = 1e-4;

    public RunData {
        catalogue = List.copyOf(catalogue);
        transitions = List.copyOf(transitions);
        radiusZones = Map.copyOf(radiusZones);
        tracks = List.copyOf(tracks);
        timelines = Map.copyOf(timelines);
    }

    /** A run whose tracks do not record their phases. */
    public RunData(List<CatalogueRow> catalogue, List<TransitionRow> transitions, boolean transitionsFromFile,
                   RunManifest manifest, Map<String, List<Span>> radiusZones, List<Track> tracks) {
        this(catalogue, transitions, transitionsFromFile, manifest, radiusZones, tracks, Map.of());
    }

    /** Where the life stages of track {@code trackId} lie. */
    public TrackTimeline timeline(String trackId) {
        return timelines.getOrDefault(trackId, TrackTimeline.UNKNOWN);
    }

    /**
     * The Sun the run's [Fe/H] is measured against and whether its grid gave [Fe/H]: its manifest's (which says it
     * for runs written before it was recorded too), the default one without a manifest.
     */
    public IronAbundance ironAbundance() {
        return manifest == null ? IronAbundance.DEFAULT : manifest.ironAbundance();
    }

    /** How the charts and the report name the run's metallicities: with their [Fe/H] when the grid gave [Fe/H]. */
    public MetallicityNames metallicityNames() {
        return MetallicityNames.of(ironAbundance(), catalogue);
    }

    /**
     * How the charts group the run's models by age: by main-sequence fraction when its grid (the manifest's grid
     * text) gives {@code ms_fraction} ages, else by age in Gyr (also without a manifest: the catalogue alone does
     * not name the fractions).
     */
    public AgeGroups ageGroups() {
        return new AgeGroups(GridChoices.of(manifest).msFractions());
    }

    /** Whether the run has evolution tracks. */
    public boolean hasTracks() {
        return !tracks.isEmpty();
    }

    /**
     * The tracks whose mass, Z and physics the catalogue names, in catalogue order of their first model. A track
     * belongs to a model when its id is the model's track id and its mass ({@link Track#massMsun}) is the model's:
     * ids come from grid indices, so a track left by another grid can carry the id of a star of another mass, and
     * must never be drawn as this one.
     */
    public List<TrackedModel> trackedModels() {
        Map<String, Track> byId = new HashMap<>();
        tracks.forEach(t -> byId.put(t.trackId(), t));
        Map<String, TrackedModel> found = new java.util.LinkedHashMap<>();
        for (CatalogueRow r : catalogue) {
            String id = Track.trackIdOf(r.modelId());
            Track t = byId.get(id);
            if (t != null && !found.containsKey(id) && sameMass(t, r.massMsun())) {
                found.put(id, new TrackedModel(new TrackOrigin(id, r.massMsun(), r.zInit(), PhysicsKey.of(r)), t));
            }
        }
        return List.copyOf(found.values());
    }

    /**
     * Whether a track is of a star of this mass: within {@link #TRACK_MASS_TOLERANCE} of it, far above what the
     * track file's rounding leaves (~2e-6) and far below the spacing of any grid's masses.
     */
    static boolean sameMass(Track track, double massMsun) {
        return track.massMsun().stream().anyMatch(m -> Math.abs(m - massMsun) <= TRACK_MASS_TOLERANCE * massMsun);
    }

    /** Reads a run directory; catalogue.ecsv must exist, everything else is optional. */
    public static RunData read(Path runDir) throws IOException {
        RunLayout layout = new RunLayout(runDir);
        Path manifestFile = layout.manifest();
        RunManifest manifest = Files.isRegularFile(manifestFile)
                ? RunManifestReader.read(Files.readString(manifestFile, StandardCharsets.UTF_8)) : null;
        // tables written before they named the overshoot profile: the run's one profile, from its manifest, so that
        // the charts' words agree with the report's physics rows
        OvershootScheme runProfile = manifest == null || manifest.physics().isEmpty() ? null
                : manifest.physics().get(0).overshootScheme();
        List<CatalogueRow> catalogue = CatalogueReader.readWithZones(layout.catalogue(), layout.zones()).stream()
                .map(r -> runProfile == null ? r : r.withOvershootProfileIfUnknown(runProfile)).toList();
        Path transitionsFile = layout.transitions();
        boolean fromFile = Files.isRegularFile(transitionsFile);
        List<TransitionRow> transitions;
        if (fromFile) {
            try (Reader in = Files.newBufferedReader(transitionsFile, StandardCharsets.UTF_8)) {
                transitions = TransitionReader.read(in).stream()
                        .map(t -> runProfile == null ? t : t.withOvershootProfileIfUnknown(runProfile)).toList();
            }
        } else {
            transitions = TransitionFinder.withDefaults().find(catalogue);
        }
        List<Track> tracks = TrackReader.readAll(layout.tracks());
        Map<String, TrackTimeline> timelines = new HashMap<>();
        for (Track t : tracks) {
            timelines.put(t.trackId(), TrackTimeline.of(t.steps()));
        }
        return new RunData(catalogue, transitions, fromFile, manifest, radiusZones(layout, catalogue), tracks,
                timelines);
    }

    private static Map<String, List<Span>> radiusZones(RunLayout layout, List<CatalogueRow> catalogue)
            throws IOException {
        Path dir = layout.profiles();
        Map<String, List<Span>> zones = new HashMap<>();
        if (!Files.isDirectory(dir)) {
            return zones;
        }
        for (CatalogueRow row : catalogue) {
            Path file = layout.profileFile(row.modelId());
            if (row.isOk() && Files.isRegularFile(file)) {
                try (Reader in = Files.newBufferedReader(file, StandardCharsets.UTF_8)) {
                    zones.put(row.modelId(), convectiveRadii(ProfileReader.read(in)));
                }
            }
        }
        return zones;
    }

    /**
     * The convective runs of a profile (centre to surface) as r/R intervals: a run starts at its first convective
     * shell (at 0 when that is the centre) and ends at its last one (at 1 when that is the surface shell).
     */
    static List<Span> convectiveRadii(List<ProfileRow> shells) {
        List<Span> spans = new ArrayList<>();
        int start = -1;
        for (int i = 0; i <= shells.size(); i++) {
            boolean convective = i < shells.size() && shells.get(i).convective();
            if (convective && start < 0) {
                start = i;
            } else if (!convective && start >= 0) {
                double lo = start == 0 ? 0.0 : shells.get(start).radiusFrac();
                double hi = i == shells.size() ? 1.0 : shells.get(i - 1).radiusFrac();
                spans.add(new Span(Math.max(lo, 0.0), Math.min(Math.max(hi, lo), 1.0)));
                start = -1;
            }
        }
        return spans;
    }
}
