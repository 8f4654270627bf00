package org.convgrid.plotting.zones;

import org.convgrid.output.Span;

/**
 * A transition mass marked on a zone map by a vertical line, as transitions.csv gives it.
 *
 * @param kind which transition
 * @param massMsun where the line is drawn, solar masses
 * @param bracket the two models that bracket it, solar masses
 * @param toleranceMsun the refinement's tolerance, solar masses; NaN for a value read off the grid
 */
public record TransitionMarker(Kind kind, double massMsun, Span bracket, double toleranceMsun) {

    /**
     * The transitions of transitions.csv (README, "Transition masses"). Zone maps mark the first two; the
     * transition charts draw the turn-off and the lithium depletion boundary too.
     */
    public enum Kind {
        FULLY_CONVECTIVE_LIMIT("fully convective limit", "fully convective\nup to "),
        /** The lowest mass above which every star of the slice has a convective core at its age. */
        CONV_CORE_ONSET("core in every star above", "core in every star\nabove "),
        /** The highest mass still on the main sequence at the slice's age. */
        MAIN_SEQUENCE_TURNOFF("main-sequence turn-off", "on the main sequence\nup to "),
        /** The highest mass that keeps over 1 % of its birth lithium below the stars that have burnt it. */
        LITHIUM_DEPLETION_BOUNDARY("lithium depletion boundary", "lithium kept\nup to ");

        private final String label;
        private final String legendPrefix;

        Kind(String label, String legendPrefix) {
            this.label = label;
            this.legendPrefix = legendPrefix;
        }

        /**
         * A two-line legend entry ending with the given mass text. The first line is the longer one: XChart
         * indents the lines of a two-line entry, and a longer second line ran past the legend box and the image's
         * right edge ("core from 1.188 M\u2609", demo, Z = 0.02, 600 Myr).
         */
        public String legendLabel(String mass) {
            return legendPrefix + mass;
        }

        /** In words, for legends. */
        public String label() {
            return label;
        }
    }
}
