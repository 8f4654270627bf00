package org.convgrid.output.transitions;

import java.util.List;
import java.util.Objects;
import org.convgrid.engine.request.OvershootScheme;
import org.convgrid.output.Span;

/**
 * One row of {@code transitions.csv}.
 *
 * @param slice the metallicity, age and physics
 * @param yInit initial helium mass fraction of the slice
 * @param fullyConvective the highest mass that is still fully convective
 * @param convCoreOnset the mass above which every model keeps a convective core (the upper end of the last crossing
 *     into a core); its crossings are every change of the core state with mass
 * @param transientCore the lowest and highest mass of the window of small central cores just above the fully
 *     convective limit (cored models with coreless ones above them), null when there is none
 * @param turnoff the main-sequence turn-off: the highest mass with status ok below a model past the main sequence;
 *     its crossings are every change between the two statuses with mass ({@link TransitionEstimate#NONE} when the
 *     slice has no model past the main sequence or none on it)
 * @param lithiumDepletion the lithium depletion boundary: the highest mass that keeps more than 1 % of its birth
 *     lithium below the lowest one that keeps 1 % or less; its crossings are every change from keeping to depleted
 *     with increasing mass (not back: heavier stars keep their lithium again), the boundary the lowest of them; not
 *     found when lithium is not followed, or no such mass pair lies in the slice; with the luminosity of the star at
 *     it
 * @param method grid or refined
 * @param toleranceMsun the width the refinement narrowed the brackets to, solar masses; NaN for {@code grid}
 * @param notes short remarks (no transition, widened brackets, flickering, stopped bisections), empty when none
 */
public record TransitionRow(Slice slice, double yInit, TransitionEstimate fullyConvective,
                            TransitionEstimate convCoreOnset, Span transientCore, TransitionEstimate turnoff,
                            LithiumDepletion lithiumDepletion, TransitionMethod method, double toleranceMsun,
                            String notes) {

    public TransitionRow {
        Objects.requireNonNull(slice, "slice");
        Objects.requireNonNull(fullyConvective, "fullyConvective");
        Objects.requireNonNull(convCoreOnset, "convCoreOnset");
        Objects.requireNonNull(turnoff, "turnoff");
        Objects.requireNonNull(lithiumDepletion, "lithiumDepletion");
        Objects.requireNonNull(method, "method");
        notes = notes == null ? "" : notes;
    }

    /** A row of a slice without a lithium depletion boundary (lithium not followed, or none among its masses). */
    public TransitionRow(Slice slice, double yInit, TransitionEstimate fullyConvective,
                         TransitionEstimate convCoreOnset, Span transientCore, TransitionEstimate turnoff,
                         TransitionMethod method, double toleranceMsun, String notes) {
        this(slice, yInit, fullyConvective, convCoreOnset, transientCore, turnoff, LithiumDepletion.NONE, method,
                toleranceMsun, notes);
    }

    /** A row of a slice without a turn-off (every model on the main sequence) nor a lithium depletion boundary. */
    public TransitionRow(Slice slice, double yInit, TransitionEstimate fullyConvective,
                         TransitionEstimate convCoreOnset, Span transientCore, TransitionMethod method,
                         double toleranceMsun, String notes) {
        this(slice, yInit, fullyConvective, convCoreOnset, transientCore, TransitionEstimate.NONE, method,
                toleranceMsun, notes);
    }

    /**
     * The two crossings that bound the transient window (into the window's cores, out of them), in mass order;
     * empty when there is no window or the crossings are unknown (a row read back from a file).
     */
    public List<Span> transientCoreCrossings() {
        if (transientCore == null) {
            return List.of();
        }
        return convCoreOnset.crossings().stream()
                .filter(c -> c.hi() == transientCore.lo() || c.lo() == transientCore.hi()).toList();
    }

    /** The same row with other notes. */
    public TransitionRow withNotes(String other) {
        return new TransitionRow(slice, yInit, fullyConvective, convCoreOnset, transientCore, turnoff, lithiumDepletion,
                method, toleranceMsun, other);
    }

    /** The same row with a tolerance, kept only when the row is refined (a grid row has none). */
    public TransitionRow withTolerance(double tolerance) {
        return new TransitionRow(slice, yInit, fullyConvective, convCoreOnset, transientCore, turnoff, lithiumDepletion,
                method, method == TransitionMethod.REFINED ? tolerance : Double.NaN, notes);
    }

    /**
     * The same row with {@code profile} as its slice's overshoot profile when the slice names none (a table written
     * before the column, read with its run's manifest).
     */
    public TransitionRow withOvershootProfileIfUnknown(OvershootScheme profile) {
        if (slice.overshootProfile() != null) {
            return this;
        }
        Slice named = new Slice(slice.zInit(), slice.ageGyr(), slice.mixingLength(), slice.overshootHp(),
                slice.criterion(), slice.opacityScale(), profile);
        return new TransitionRow(named, yInit, fullyConvective, convCoreOnset, transientCore, turnoff, lithiumDepletion,
                method, toleranceMsun, notes);
    }
}
