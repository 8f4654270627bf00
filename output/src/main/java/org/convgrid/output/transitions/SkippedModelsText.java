package org.convgrid.output.transitions;

import java.util.ArrayList;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import org.convgrid.engine.request.ModelStatus;
import org.convgrid.output.Span;
import org.convgrid.output.catalogue.CatalogueRow;

/**
 * The models a transition's bracket was widened past, in words by their catalogue status ("1 failed model", "2 models
 * that did not converge and 1 failed model"): a reader of the notes learns what they were without looking them up.
 */
final class SkippedModelsText {

    private SkippedModelsText() {
    }

    /**
     * @param byMass every model of the slice
     * @param bracket the bracket; the models strictly inside it are described
     * @return the words, empty when no model lies inside
     */
    static String of(List<CatalogueRow> byMass, Span bracket) {
        Map<ModelStatus, Long> byStatus = new EnumMap<>(ModelStatus.class);
        long withoutClass = 0;
        for (CatalogueRow r : byMass) {
            if (r.massMsun() > bracket.lo() && r.massMsun() < bracket.hi()) {
                if (r.isOk()) {
                    withoutClass++;
                } else {
                    byStatus.merge(r.status(), 1L, Long::sum);
                }
            }
        }
        List<String> parts = new ArrayList<>();
        byStatus.forEach((status, count) -> parts.add(describe(status, count)));
        if (withoutClass > 0) {
            // an ok row the finder cannot use: its structure_class cell is empty
            parts.add(models(withoutClass, "", " without a structure class"));
        }
        if (parts.size() <= 1) {
            return String.join("", parts);
        }
        return String.join(", ", parts.subList(0, parts.size() - 1)) + " and " + parts.get(parts.size() - 1);
    }

    private static String describe(ModelStatus status, long count) {
        return switch (status) {
            case FAILED -> models(count, "failed ", "");
            case NOT_CONVERGED -> models(count, "", " that did not converge");
            case PAST_MAIN_SEQUENCE -> models(count, "", " beyond the main sequence");
            case OK -> models(count, "", "");
        };
    }

    private static String models(long count, String before, String after) {
        return count + " " + before + (count == 1 ? "model" : "models") + after;
    }
}
