package org.convgrid.survey;

import java.nio.file.Path;
import org.convgrid.grids.GridFileException;
import org.convgrid.grids.GridProblem;
import org.convgrid.grids.GridProblemKind;
import org.convgrid.grids.GridSpec;
import org.convgrid.grids.yaml.GridFileReader;
import org.convgrid.output.manifest.RunManifest;

/**
 * The grid a run's manifest quotes, read again with the files it names (a preset, an opacity table): first from the
 * folder the grid file was in when the run read it ({@link RunManifest#gridLocation}), so that a command run from
 * another directory finds them; failing that, relative to the grid file's name as typed, from the working directory,
 * so that a project moved or copied elsewhere (a run brought home from a cluster) still reads them from its top.
 */
public final class RecordedGrid {

    private RecordedGrid() {
    }

    /**
     * @throws GridFileException when the text cannot be read either way: the problems met at the recorded location,
     *                           those naming a file also saying where else it was looked for
     */
    public static GridSpec of(RunManifest manifest) {
        GridFileReader reader = new GridFileReader();
        if (manifest.gridLocation().isEmpty()) {
            return reader.parse(manifest.gridFile(), manifest.gridText());
        }
        GridFileException atLocation;
        try {
            return reader.parse(manifest.gridFile(), Path.of(manifest.gridLocation()), manifest.gridText());
        } catch (GridFileException e) {
            atLocation = e;
        } catch (java.nio.file.InvalidPathException e) {
            // a location written on another system (a Windows path read here): the name as typed may still serve
            return reader.parse(manifest.gridFile(), manifest.gridText());
        }
        if (atLocation.problems().stream().allMatch(p -> p.kind() == GridProblemKind.UNREADABLE_FILE)) {
            try {
                return reader.parse(manifest.gridFile(), manifest.gridText());
            } catch (GridFileException typed) {
                // fall through: the recorded location's problems name the files where the run read them
            }
        }
        throw new GridFileException(atLocation.problems().stream().map(p -> p.kind() != GridProblemKind.UNREADABLE_FILE
                ? p : new GridProblem(p.file(), p.line(), p.column(), p.kind(), p.message() + " (the grid text "
                + "quoted by the run's manifest, read where the grid file was, " + manifest.gridLocation()
                + ", and relative to " + manifest.gridFile() + " from the working directory)")).toList());
    }
}
