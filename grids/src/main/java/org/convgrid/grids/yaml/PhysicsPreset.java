package org.convgrid.grids.yaml;

import java.nio.file.Path;
import org.convgrid.engine.physics.atmosphere.AtmosphereChoice;
import org.convgrid.engine.error.ConvgridException;
import org.convgrid.engine.error.ErrorKind;
import org.convgrid.grids.GridFileException;

/**
 * What a physics preset written by {@code convgrid calibrate-sun} sets: the mixing length and the atmosphere it was
 * calibrated with. A grid names one with {@code physics: {preset: FILE}} ({@link PresetReader}); {@code convgrid
 * star --preset FILE} reads one on its own ({@link #read(Path)}).
 *
 * @param mixingLength mixing length, pressure scale heights
 * @param atmosphere the grey T(tau) relation the mixing length belongs to; null when the preset names none
 */
public record PhysicsPreset(double mixingLength, AtmosphereChoice atmosphere) {

    /**
     * The preset in {@code file}.
     *
     * @throws ConvgridException when the file cannot be read; a {@link GridFileException} with every problem found,
     *     each as file:line:column, when it is not a preset
     */
    public static PhysicsPreset read(Path file) {
        // a file that cannot be read has no line to point at: said plainly, as a missing grid file is
        PresetReader.FileText loaded = PresetReader.FileText.of(file);
        if (loaded.text() == null) {
            throw new ConvgridException(ErrorKind.BAD_USAGE, loaded.problem());
        }
        NodeReader reader = new NodeReader(file.toString());
        PhysicsPreset preset = PresetReader.parse(loaded.text(), reader);
        if (preset == null || !reader.problems().isEmpty()) {
            throw new GridFileException(reader.problems());
        }
        return preset;
    }
}
