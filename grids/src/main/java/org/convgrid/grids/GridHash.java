package org.convgrid.grids;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.HexFormat;
import org.convgrid.engine.request.AgeOrigin;
import org.convgrid.engine.request.OvershootScheme;
import org.convgrid.engine.physics.atmosphere.AtmosphereChoice;

/**
 * SHA-256 fingerprints of a grid. {@link #ofBytes} fingerprints the file exactly as read; {@link #ofModels}
 * fingerprints only what decides the models (axes and physics, not title, comments, layout or output settings), so
 * a resumed run can accept an edited comment yet refuse a changed axis.
 */
public final class GridHash {

    private GridHash() {
    }

    /** Lower-case hex SHA-256 of a file's bytes. */
    public static String ofFile(String path) {
        try {
            return ofBytes(Files.readAllBytes(Path.of(path)));
        } catch (IOException e) {
            throw new UncheckedIOException("cannot read " + path, e);
        }
    }

    /** SHA-256 of the bytes, lower-case hex. */
    public static String ofBytes(byte[] bytes) {
        try {
            return HexFormat.of().formatHex(MessageDigest.getInstance("SHA-256").digest(bytes));
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("every Java platform provides SHA-256", e);
        }
    }

    /** Lower-case hex SHA-256 of {@link #canonicalModels(GridSpec)}. */
    public static String ofModels(GridSpec spec) {
        return ofBytes(canonicalModels(spec).getBytes(StandardCharsets.UTF_8));
    }

    /** A text form of the axes that decide the models, one axis per line, values in Java's shortest round-trip form. */
    public static String canonicalModels(GridSpec spec) {
        StringBuilder text = new StringBuilder();
        text.append("mass_msun=").append(spec.massesMsun()).append('\n');
        text.append("z_y=");
        spec.metallicities().forEach(p -> text.append('[').append(p.z()).append(',').append(p.y()).append(']'));
        text.append('\n');
        // Gyr grids keep their original line, so the fingerprints of existing runs do not change.
        text.append(spec.ages().fractions() ? "age_ms_fraction=" : "age_gyr=").append(spec.ages().values())
                .append('\n');
        // ages from birth are other models; zero-age-origin grids keep their fingerprint without this line
        if (spec.ages().origin() == AgeOrigin.BIRTH) {
            text.append("age_origin=birth\n");
        }
        PhysicsAxes physics = spec.physics();
        text.append("mixing_length=").append(physics.mixingLengths()).append('\n');
        text.append("overshoot=").append(physics.overshoots()).append('\n');
        text.append("criterion=").append(physics.criteria()).append('\n');
        text.append("opacity_scale=").append(physics.opacityScales()).append('\n');
        if (physics.overshootScheme() != OvershootScheme.STEP) {
            // step grids keep their original lines, so the fingerprints of existing runs do not change
            text.append("overshoot_profile=").append(physics.overshootScheme().label()).append('\n');
        }
        if (physics.atmosphere() != AtmosphereChoice.EDDINGTON) {
            text.append("atmosphere=").append(physics.atmosphere().label()).append('\n');
        }
        if (!physics.opacityTable().isEmpty()) {
            // The table's content decides the models, not its name: hash the bytes.
            text.append("opacity_table=").append(ofFile(physics.opacityTable())).append('\n');
        }
        return text.toString();
    }
}
