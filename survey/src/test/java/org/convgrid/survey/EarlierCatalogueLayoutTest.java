package org.convgrid.survey;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.io.IOException;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Collectors;
import org.convgrid.engine.request.ModelStatus;
import org.convgrid.engine.request.OvershootScheme;
import org.convgrid.output.IronAbundance;
import org.convgrid.output.catalogue.CatalogueColumns;
import org.convgrid.output.catalogue.CatalogueReader;
import org.convgrid.output.catalogue.CatalogueRow;
import org.convgrid.output.catalogue.CatalogueWriter;
import org.junit.jupiter.api.Test;

/**
 * The one decision on a catalogue that {@code run --resume}, {@code merge} and {@code transitions --refine} continue:
 * this version's layout is taken as it is, an earlier one (this version's first columns) is rewritten in this
 * version's, anything else is refused in one wording that names the file and what could not be done.
 */
class EarlierCatalogueLayoutTest {

    private static final Path FILE = Path.of("runs", "a", "catalogue.ecsv");
    private static final IronAbundance IRON = IronAbundance.DEFAULT;
    private static final CatalogueRow ROW = CatalogueRow.builder("p0-z00-m000-a00", ModelStatus.OK).massMsun(1.0)
            .zInit(0.014).yInit(0.2681).mixingLength(1.8).overshootHp(0.0).ageGyr(0.15).solverIterations(12)
            .overshootProfile(OvershootScheme.EXPONENTIAL).build();

    private static String current() throws IOException {
        StringBuilder out = new StringBuilder(RunDirectory.catalogueHeader(IRON));
        CatalogueWriter.continuing(out, IRON).write(ROW);
        return out.toString();
    }

    /** The catalogue as a version that wrote none of the columns from {@code firstLacking} on would have written it. */
    private static String lackingFrom(String firstLacking) throws IOException {
        int kept = CatalogueColumns.HEADER.indexOf(firstLacking);
        List<String> dropped = CatalogueColumns.HEADER.subList(kept, CatalogueColumns.HEADER.size());
        String header = current().lines().filter(l -> l.startsWith("#"))
                .filter(l -> dropped.stream().noneMatch(c -> l.contains("{name: " + c + ",")))
                .collect(Collectors.joining("\n", "", "\n"));
        return header + String.join(",", CatalogueColumns.HEADER.subList(0, kept)) + "\n"
                + String.join(",", CatalogueWriter.cells(ROW, IRON).subList(0, kept)) + "\n";
    }

    @Test
    void theCurrentLayoutIsTakenAsItIs() throws IOException {
        String text = current();
        assertThat(EarlierCatalogueLayout.inCurrentLayout(FILE, text, OvershootScheme.STEP, IRON, "continue it"))
                .isSameAs(text);
    }

    @Test
    void anEarlierLayoutIsRewrittenInThisOnesWithTheGridsProfile() throws IOException {
        String earlier = lackingFrom(CatalogueColumns.OVERSHOOT_PROFILE);
        String upgraded = EarlierCatalogueLayout.inCurrentLayout(FILE, earlier, OvershootScheme.EXPONENTIAL, IRON,
                "merge it");
        assertThat(upgraded).startsWith(RunDirectory.catalogueHeader(IRON)).isNotEqualTo(earlier);
        CatalogueRow back = CatalogueReader.readCompleteLines(upgraded).get(0);
        assertThat(back.modelId()).isEqualTo(ROW.modelId());
        assertThat(back.overshootProfile()).isEqualTo(OvershootScheme.EXPONENTIAL);
    }

    @Test
    void anyOtherLayoutIsRefusedInOneWordingNamingFileAndAction() throws IOException {
        String swapped = lackingFrom(CatalogueColumns.OVERSHOOT_PROFILE)
                .replaceFirst("model_id,mass_msun", "mass_msun,model_id");
        for (String action : List.of("continue it", "merge it", "append the refinement's models to it")) {
            assertThatThrownBy(() -> EarlierCatalogueLayout.inCurrentLayout(FILE, swapped, OvershootScheme.STEP, IRON,
                    action)).isInstanceOf(RunSetupException.class).hasMessage(FILE + " is not a catalogue this "
                    + "version writes or can bring to its layout (its columns must be the first of this version's, "
                    + "in order); cannot " + action);
        }
        assertThatThrownBy(() -> EarlierCatalogueLayout.inCurrentLayout(FILE, "mass,teff\n1.0,5772\n",
                OvershootScheme.STEP, IRON, "merge it")).isInstanceOf(RunSetupException.class);
    }
}
