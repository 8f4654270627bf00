package org.convgrid.grids;

import java.util.Objects;

/**
 * A grid file as read: its name, where it is, its text (for the run manifest), the SHA-256 of its bytes and the spec
 * it holds.
 *
 * @param name the file name as given to the reader (problems name it so)
 * @param location the file's absolute, normalised path: a run's manifest records it, so that a command reading the
 *                 run later ({@code merge}, {@code transitions}, {@code plot}) finds the files the grid names by
 *                 paths relative to its folder (a preset, an opacity table) from any working directory
 * @param text the file's text
 * @param fileSha256 lower-case hex SHA-256 of the file's bytes
 * @param spec the validated grid
 */
public record GridFile(String name, String location, String text, String fileSha256, GridSpec spec) {

    public GridFile {
        Objects.requireNonNull(name, "name");
        Objects.requireNonNull(location, "location");
        Objects.requireNonNull(text, "text");
        Objects.requireNonNull(fileSha256, "fileSha256");
        Objects.requireNonNull(spec, "spec");
    }

    /** The fingerprint of the models only; see {@link GridHash#ofModels}. */
    public String modelsSha256() {
        return GridHash.ofModels(spec);
    }
}
