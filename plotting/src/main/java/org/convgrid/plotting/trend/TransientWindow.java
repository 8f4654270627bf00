package org.convgrid.plotting.trend;

import java.util.ArrayList;
import java.util.List;
import org.convgrid.output.Span;
import org.convgrid.output.transitions.TransitionFinder;
import org.convgrid.output.transitions.TransitionRow;

/**
 * A window of small central cores in one slice: the one transitions.csv reports (just above the fully convective
 * limit), or another that its notes name (above it, or below the limit where stars near it cycle).
 *
 * @param zInit initial metal mass fraction
 * @param ageGyr age, Gyr
 * @param masses lowest and highest mass of the window, solar masses
 */
public record TransientWindow(double zInit, double ageGyr, Span masses) {

    /**
     * Every window of a slice: the reported one, then the others its notes name, so that a window hidden behind a
     * single coreless model is drawn too (the demo's Z = 0.014, 600 Myr slice reports 0.314-0.323 Msun and names
     * 0.3266-0.575; drawn alone, the first made that slice look nearly free of the cores its neighbours in Z show).
     * Empty when the slice has no window.
     */
    public static List<TransientWindow> allOf(TransitionRow row) {
        if (row.transientCore() == null) {
            return List.of();
        }
        List<TransientWindow> out = new ArrayList<>();
        out.add(new TransientWindow(row.slice().zInit(), row.slice().ageGyr(), row.transientCore()));
        for (Span other : TransitionFinder.otherWindowsNoted(row.notes())) {
            out.add(new TransientWindow(row.slice().zInit(), row.slice().ageGyr(), other));
        }
        return out;
    }
}
