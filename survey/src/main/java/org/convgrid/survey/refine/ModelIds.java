package org.convgrid.survey.refine;

import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.convgrid.survey.RunSetupException;

/** Reads grid indices back from catalogue model ids ({@code p<i>-z<i>-m<i>-a<i>} or refinement ids). */
final class ModelIds {

    private static final Pattern PREFIX = Pattern.compile("p(\\d+)-z(\\d+)-[mr]\\d+-a\\d+");

    private ModelIds() {
    }

    /**
     * The physics and metallicity indices of a model id.
     *
     * @throws RunSetupException when the id is not one convgrid writes
     */
    static int[] physicsAndMetallicity(String modelId) {
        Matcher m = PREFIX.matcher(modelId);
        if (!m.matches()) {
            throw new RunSetupException("model id '" + modelId + "' is not one convgrid writes; the catalogue was "
                    + "edited");
        }
        return new int[] {Integer.parseInt(m.group(1)), Integer.parseInt(m.group(2))};
    }
}
