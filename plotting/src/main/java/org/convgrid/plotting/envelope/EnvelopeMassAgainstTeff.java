package org.convgrid.plotting.envelope;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import org.convgrid.engine.convection.StructureClass;
import org.convgrid.engine.request.ModelStatus;
import org.convgrid.output.catalogue.CatalogueRow;
import org.convgrid.output.transitions.RefinedModelIds;
import org.convgrid.plotting.label.PhysicsKey;

/** Builds the envelope-mass-against-Teff data of one metallicity and physics from the catalogue: a pure function. */
public final class EnvelopeMassAgainstTeff {

    private EnvelopeMassAgainstTeff() {
    }

    /**
     * The chart data of the rows of physics {@code physics} and metallicity {@code zInit}: per age, the grid models
     * with status ok, an effective temperature and a convective envelope ({@code env_cz_mass_msun} above zero), by
     * mass. Left out: models of another physics or Z, any status but ok (those past the main sequence counted),
     * models without an envelope (counted), and the transition refinement's models, which crowd near the transition
     * masses (as on the turnover charts). Not for grids whose ages are fractions of each star's lifetime, where one
     * such age holds stars of many ages: the run's charts leave them out.
     */
    public static EnvelopeMassData build(PhysicsKey physics, double zInit, List<CatalogueRow> rows) {
        List<CatalogueRow> gridRows = rows.stream()
                .filter(r -> PhysicsKey.of(r).equals(physics) && !RefinedModelIds.isRefined(r.modelId())).toList();
        List<CatalogueRow> mine = gridRows.stream().filter(r -> r.zInit() == zInit).toList();
        List<Double> ages = gridRows.stream().map(CatalogueRow::ageGyr).distinct().sorted().toList();
        List<EnvelopeMassData.AgeLine> lines = new ArrayList<>();
        for (double age : ages) {
            List<EnvelopePoint> points = mine.stream().filter(r -> r.ageGyr() == age && r.isOk())
                    .filter(r -> Double.isFinite(r.teffK()) && hasEnvelope(r))
                    .map(r -> new EnvelopePoint(r.modelId(), r.massMsun(), r.teffK(), r.envCzMassMsun(),
                            r.structureClass() == StructureClass.FULLY_CONVECTIVE))
                    .sorted(Comparator.comparingDouble(EnvelopePoint::massMsun)).toList();
            if (!points.isEmpty()) {
                lines.add(new EnvelopeMassData.AgeLine(age, points));
            }
        }
        long withoutEnvelope = mine.stream().filter(r -> r.isOk() && !hasEnvelope(r)).count();
        long pastMainSequence = mine.stream().filter(r -> r.status() == ModelStatus.PAST_MAIN_SEQUENCE).count();
        return new EnvelopeMassData(physics, zInit, ages, lines, withoutEnvelope, pastMainSequence);
    }

    /** Whether a model has a convective envelope (an empty cell reads NaN, which is not above zero). */
    private static boolean hasEnvelope(CatalogueRow r) {
        return r.envCzMassMsun() > 0;
    }
}
