package org.convgrid.engine.birth;

/**
 * The ages (s since birth) at which a star's life changes; NaN for an event that did not happen on the computed
 * track. The radiative core's end is the age of the first model that shows it (resolution: one step); the
 * radiative core's appearance and the convective core's onset and end (on the centre's stability excess, or the
 * central zone's top at the core threshold, {@link CoreLifetime}), the zero-age main sequence and the lithium levels
 * are interpolated linearly in age between the two models that bracket them, except the end of a core that lasts the
 * whole main sequence, which is the end of the main sequence (see {@code convectiveCoreEnd}), and a core gone only in
 * the track's last model, dated at that model.
 *
 * @param radiativeCore the centre first stops being convective (never for a fully convective star)
 * @param radiativeCoreEnd after that, the star is fully convective again (one zone from the centre to the surface,
 *                         {@link org.convgrid.engine.convection.StructureClass#FULLY_CONVECTIVE}) and stays so to
 *                         the end of the computed track: the age of the last such return; NaN while the track ends
 *                         with a radiative region (or the star never had a radiative core)
 * @param zeroAgeMainSequence L_nuc first reaches
 *                            {@link org.convgrid.engine.evolution.NuclearLuminosity#ZERO_AGE_FRACTION} of L, and
 *                            for good: a crossing after which the star falls back to contraction is not the
 *                            arrival ({@link ZeroAgeArrival})
 * @param convectiveCoreOnset after the radiative core appeared, a convective core first appears: a central zone
 *                            whose top lies above the core threshold and below m/M = 0.99 (higher, it is the
 *                            whole star again); a core that also vanishes before the ZAMS is a transient of the
 *                            contraction and is not reported
 * @param convectiveCoreEnd after that onset, the convective core vanishes for good: the start of the last run
 *                          of models without it, interpolated from the model before ({@link CoreLifetime}; no
 *                          central zone with its top above the core threshold any more). A core still there in the last model of the main sequence
 *                          (the last with central hydrogen at or above the end value) lasted the whole main sequence
 *                          and ends with it, at {@code centralHydrogenExhausted}, whether it vanished during the step
 *                          that crossed the end value or is still there after it: the first model without it would
 *                          lie past the main sequence, one step after the exhaustion age, reading as a core that
 *                          outlived it. A core that vanished on the main sequence keeps the age at which it vanished,
 *                          however close to the exhaustion age
 * @param coreEnvelopeMerge on the main sequence, a central convective zone first joins the convective envelope: the
 *                          first model fully convective after one with both (the "convective kissing instability"
 *                          van Saders &amp; Pinsonneault 2012, arXiv:1201.5381, found just above the fully convective
 *                          limit, where out-of-equilibrium 3He burning grows the core until it meets the envelope);
 *                          dated at that model (resolution: one step). The age depends on the time steps, the event's
 *                          occurrence much less
 * @param lithiumHalved the surface 7Li first falls to half its birth value
 * @param lithiumOnePercent the surface 7Li first falls to 1 % of its birth value (the depletion that dates young
 *                          clusters by their lithium depletion boundary), interpolated in ln 7Li
 * @param centralHydrogenExhausted the central hydrogen falls below the evolution's end value, which ends the main
 *                                 sequence ({@link org.convgrid.engine.evolution.EvolutionResult#exhaustionAge()})
 */
public record LifeEvents(double radiativeCore, double radiativeCoreEnd, double zeroAgeMainSequence,
                         double convectiveCoreOnset, double convectiveCoreEnd, double coreEnvelopeMerge,
                         double lithiumHalved,
                         double lithiumOnePercent,
                         double centralHydrogenExhausted) {

    /**
     * The same events with the age at which the central hydrogen ran out (NaN: not on the computed track), and with
     * it the end of a convective core that lasted the whole main sequence (see {@code convectiveCoreEnd}).
     */
    public LifeEvents withCentralHydrogenExhausted(double age) {
        return new LifeEvents(radiativeCore, radiativeCoreEnd, zeroAgeMainSequence, convectiveCoreOnset,
                coreEndGiven(age), coreEnvelopeMerge, lithiumHalved, lithiumOnePercent, age);
    }

    /**
     * The same events with the main sequence of another evolution of the same star: its zero-age and exhaustion
     * ages, s since birth (a main-sequence-fraction star's ages are measured against its lifetime evolution, and its
     * answers come from a second one that lands on them).
     */
    public LifeEvents withMainSequence(double zams, double exhaustion) {
        return new LifeEvents(radiativeCore, radiativeCoreEnd, zams, convectiveCoreOnset, convectiveCoreEnd,
                coreEnvelopeMerge, lithiumHalved, lithiumOnePercent, centralHydrogenExhausted)
                .withCentralHydrogenExhausted(exhaustion);
    }

    /**
     * The convective core's end once the main sequence is known to end at {@code exhaustion}. The evolution stops
     * at its first model below the end value, so a core end recorded after the exhaustion age belongs to that
     * model, and the model before it, still on the main sequence, had the core; a core with no end had it in every
     * model from its onset to the last.
     */
    private double coreEndGiven(double exhaustion) {
        // comparisons with NaN are false: without an onset or without exhaustion the end stays as recorded
        boolean coreOnMainSequence = convectiveCoreOnset < exhaustion;
        boolean vanishedOnMainSequence = convectiveCoreEnd <= exhaustion;
        return coreOnMainSequence && !vanishedOnMainSequence ? exhaustion : convectiveCoreEnd;
    }
}
