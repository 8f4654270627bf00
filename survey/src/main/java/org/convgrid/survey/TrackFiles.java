package org.convgrid.survey;

import java.io.IOException;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.concurrent.ConcurrentHashMap;
import java.util.concurrent.atomic.AtomicReference;
import org.convgrid.engine.batch.StarTrackSink;
import org.convgrid.engine.birth.LifeEvents;
import org.convgrid.engine.birth.TrackPoint;
import org.convgrid.engine.request.ModelRequest;
import org.convgrid.grids.ModelIdFormat;
import org.convgrid.output.AtomicFiles;
import org.convgrid.output.IronAbundance;
import org.convgrid.output.RunLayout;
import org.convgrid.output.events.LifeEventRow;
import org.convgrid.output.track.TrackWriter;

/**
 * Writes every track it receives to {@code tracks/<model_id without age>.csv} of a run directory with its zone table
 * {@code tracks/<model_id without age>.zones.csv}, atomically (a reader never sees half a file; a recomputed track
 * replaces the old one), and the life events of every star evolved from birth to the run's {@link LifeEventLog}. The
 * directory is created with the first track, so a zero-age grid leaves none. Thread-safe: each track has its own
 * files and the log serialises its rows. An I/O failure is kept by star: {@link #requireWritten} then refuses that
 * star's catalogue rows (a row kept without its track would never get it back), which stops the sweep there.
 */
public final class TrackFiles implements StarTrackSink, StarFiles {

    private final RunLayout layout;
    private final LifeEventLog events;
    private final SweepInterruption interruption;
    private final AtomicReference<IOException> failure = new AtomicReference<>();
    /** Track id to the failure that kept its files or life-events row from the disk. */
    private final Map<String, IOException> failedStars = new ConcurrentHashMap<>();

    /** @param layout the run directory whose {@code tracks} and life-events table receive the files */
    public TrackFiles(RunLayout layout) {
        this(layout, IronAbundance.DEFAULT, new SweepInterruption());
    }

    /**
     * @param layout the run directory whose {@code tracks} and life-events table receive the files
     * @param iron the Sun the grid's [Fe/H] is measured against (the life-events table's {@code fe_h_dex})
     * @param interruption the run's: each life-events row is appended through it, so that an interruption never
     *                     leaves half a row (track files are whole anyway: written under a temporary name, then renamed)
     */
    public TrackFiles(RunLayout layout, IronAbundance iron, SweepInterruption interruption) {
        this.layout = layout;
        this.events = new LifeEventLog(layout.lifeEvents(), iron);
        this.interruption = interruption;
    }

    @Override
    public void accept(ModelRequest first, List<TrackPoint> points, LifeEvents lifeEvents) {
        String id = ModelIdFormat.trackIdOf(first.modelId());
        Path target = layout.trackFile(id);
        try {
            AtomicFiles.write(target, out -> TrackWriter.write(first.mass(), points, out));
            target = layout.trackZonesFile(id);
            AtomicFiles.write(target, out -> TrackWriter.writeZones(points, out));
            if (lifeEvents != null) {
                target = layout.lifeEvents();
                double trackEnd = points.isEmpty() ? Double.NaN : points.get(points.size() - 1).age();
                LifeEventRow row = LifeEventRow.of(id, first, lifeEvents, trackEnd);
                interruption.write(() -> events.append(row));
            }
        } catch (IOException e) {
            IOException named = IoMessages.naming(target, e);
            failedStars.put(id, named);
            failure.compareAndSet(null, named);
        }
    }

    /**
     * Refuses the rows of a star whose track files or life-events row failed, with that failure's file and reason and
     * what the catalogue kept.
     */
    @Override
    public void requireWritten(ModelRequest request) throws IOException {
        IOException failed = failedStars.get(ModelIdFormat.trackIdOf(request.modelId()));
        if (failed != null) {
            throw new IOException(IoMessages.reason(failed) + "; the sweep stopped before the catalogue rows of "
                    + "that star, so every row kept has its track (make room, then continue with run --resume)",
                    failed);
        }
    }

    /** The first write failure, null when every track was written. */
    public IOException failure() {
        return failure.get();
    }
}
