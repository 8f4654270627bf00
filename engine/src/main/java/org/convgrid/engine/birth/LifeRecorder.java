package org.convgrid.engine.birth;

import java.util.ArrayList;
import java.util.List;

import org.convgrid.engine.convection.ConvectiveZone;
import org.convgrid.engine.convection.StructureClass;
import org.convgrid.engine.evolution.NuclearLuminosity;
import org.convgrid.engine.evolution.StepObserver;
import org.convgrid.engine.evolution.SurfaceComposition;
import org.convgrid.engine.structure.StellarModel;

/**
 * Follows the models of one evolution from birth and records, per model, its phase, L_nuc/L, surface lithium and
 * central deuterium, and the {@link LifeEvents} of the star. One recorder per evolution; not thread-safe.
 */
final class LifeRecorder implements StepObserver {

    /** The surface 7Li, over its birth value, of the lithium-depletion event (99 % burnt). */
    static final double LITHIUM_ONE_PERCENT = 0.01;

    private final double coreThreshold;
    private final List<double[]> rows = new ArrayList<>();
    private double birthLithium = Double.NaN;
    private double radiativeCore = Double.NaN;
    /** Age of the first model of the current run of fully convective models; NaN while the last model was not. */
    private double fullyConvectiveSince = Double.NaN;
    private final ZeroAgeArrival zeroAge = new ZeroAgeArrival();
    /**
     * Per model: age, 1 with a convective core, 1 once the centre has stopped being convective, the centre's
     * stability excess, the central zone's top m/M (0 without one), from which the core's ages are interpolated. The core's lifetime
     * is read from them at the end, when the zero-age main sequence is known ({@link ZeroAgeArrival} may move it
     * after the models that first seemed to reach it).
     */
    private final List<double[]> cores = new ArrayList<>();
    /** Ages of the models fully convective after one with a central convective zone and an envelope. */
    private final List<Double> merges = new ArrayList<>();
    private boolean lastHadCoreAndEnvelope;
    private double lithiumHalved = Double.NaN;
    private double lithiumOnePercent = Double.NaN;
    private double lastAge;
    private double lastLithium;
    private double lastCentreExcess;

    /** @param coreThreshold m/M that the top of a central convective zone must exceed to count as a core */
    LifeRecorder(double coreThreshold) {
        this.coreThreshold = coreThreshold;
    }

    @Override
    public void accepted(double age, double timeStep, StellarModel model) {
        double fraction = NuclearLuminosity.fraction(model);
        var surface = SurfaceComposition.of(model);
        if (rows.isEmpty()) {
            birthLithium = surface.li7();
        }
        double lithium = birthLithium > 0.0 ? surface.li7() / birthLithium : Double.NaN;
        List<ConvectiveZone> zones = model.convection().zones();
        // the centre is radiative when no zone starts there; a central zone reaching the surface layers is the
        // whole star (a thin radiative atmosphere above it does not make it a core)
        boolean radiativeCentre = zones.isEmpty() || zones.get(0).innerMassFraction() > 0.0;
        boolean core = !radiativeCentre && zones.get(0).outerMassFraction() < SurfaceComposition.ENVELOPE_TOP
                && zones.get(0).outerMassFraction() > coreThreshold;
        // the radiative core's end is the star's return to full convection, whichever way the radiative region
        // goes (the envelope's base sinking to the centre, or a central zone growing out to meet the envelope), and
        // only a return that lasts counts: a later radiative region forgets it
        boolean fullyConvective = model.convection().structureClass() == StructureClass.FULLY_CONVECTIVE;
        if (!fullyConvective) {
            fullyConvectiveSince = Double.NaN;
        } else if (Double.isNaN(fullyConvectiveSince)) {
            fullyConvectiveSince = age;
        }
        if (fullyConvective && lastHadCoreAndEnvelope) {
            merges.add(age);
        }
        // a central zone below the surface layers and at least one zone above it (the envelope): any size of
        // central zone counts, since a 3He-driven core that meets the envelope may have been under the core threshold
        lastHadCoreAndEnvelope = !radiativeCentre && !fullyConvective && zones.size() > 1
                && zones.get(0).outerMassFraction() < SurfaceComposition.ENVELOPE_TOP
                && zones.get(zones.size() - 1).outerMassFraction() >= SurfaceComposition.ENVELOPE_TOP;
        if (!rows.isEmpty()) {
            if (Double.isNaN(radiativeCore) && radiativeCentre) {
                // the centre turns radiative when its nabla_rad falls below the stability limit: interpolated
                // between the two models, so that the age does not depend on where the step happened to end
                double excess = centreExcess(model);
                radiativeCore = lastCentreExcess > 0.0 && excess <= 0.0
                        ? AgeCrossing.of(lastAge, lastCentreExcess, age, excess, 0.0) : age;
            }
            cores.add(new double[] {age, core ? 1.0 : 0.0, Double.isNaN(radiativeCore) ? 0.0 : 1.0,
                    centreExcess(model), radiativeCentre ? 0.0 : zones.get(0).outerMassFraction()});
            if (Double.isNaN(lithiumHalved) && lithium <= 0.5) {
                lithiumHalved = AgeCrossing.of(lastAge, lastLithium, age, lithium, 0.5);
            }
            if (Double.isNaN(lithiumOnePercent) && lithium <= LITHIUM_ONE_PERCENT) {
                // in ln 7Li: the burning at the envelope's base takes a fixed share of what is left per unit time,
                // so the abundance falls about exponentially between two models; linear in the abundance would
                // date the 1 % level early by up to a fraction of the step
                lithiumOnePercent = lastLithium > 0.0 && lithium > 0.0
                        ? AgeCrossing.of(lastAge, Math.log(lastLithium), age, Math.log(lithium),
                                Math.log(LITHIUM_ONE_PERCENT))
                        : age;
            }
        }
        zeroAge.observe(age, fraction, model.global().centralHydrogen());
        // the phase (second entry) is set in rows(), once the zero-age main sequence is known
        rows.add(new double[] {age, 0.0, fraction, lithium, model.state().composition(0).h2()});
        lastAge = age;
        lastLithium = lithium;
        lastCentreExcess = centreExcess(model);
    }

    /** nabla_rad minus the stability limit at the centre (positive: convective). */
    private static double centreExcess(StellarModel model) {
        return model.profile().stabilityExcess(0);
    }

    /** The events seen in the models; the end of the main sequence is the evolution's to add. */
    LifeEvents events() {
        double radiativeCoreEnd = Double.isNaN(radiativeCore) ? Double.NaN : fullyConvectiveSince;
        double zams = zeroAge.age();
        CoreLifetime convectiveCore = new CoreLifetime(coreThreshold);
        for (double[] c : cores) {
            // comparisons with NaN are false: no zero-age main sequence, no model on it
            convectiveCore.observe(c[0], c[3], c[4], c[1] > 0.5, c[2] > 0.5, c[0] >= zams);
        }
        // comparisons with NaN are false: no zero-age main sequence, no merge on it
        double merge = merges.stream().filter(age -> age >= zams).findFirst().orElse(Double.NaN);
        return new LifeEvents(radiativeCore, radiativeCoreEnd, zams, convectiveCore.onset(), convectiveCore.end(),
                merge, lithiumHalved, lithiumOnePercent, Double.NaN);
    }

    /**
     * Per recorded model: age, 1 on the main sequence (at or after the zero-age main sequence as dated at the end of
     * the track), L_nuc/L, surface lithium, central deuterium.
     */
    List<double[]> rows() {
        double zams = zeroAge.age();
        for (double[] r : rows) {
            r[1] = r[0] >= zams ? 1.0 : 0.0;
        }
        return rows;
    }
}
