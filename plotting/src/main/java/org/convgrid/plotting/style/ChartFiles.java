package org.convgrid.plotting.style;

import java.io.IOException;
import java.nio.file.Path;
import org.convgrid.output.AtomicFiles;
import org.knowm.xchart.BitmapEncoder;
import org.knowm.xchart.VectorGraphicsEncoder;
import org.knowm.xchart.XYChart;

/** Writes a chart to disk atomically (temporary file, then rename): PNG always, SVG or PDF on request. */
public final class ChartFiles {

    /** Vector formats XChart can write with the libraries it brings along (VectorGraphics2D, PDFBox Graphics2D). */
    public enum VectorFormat {
        SVG("svg", VectorGraphicsEncoder.VectorGraphicsFormat.SVG),
        PDF("pdf", VectorGraphicsEncoder.VectorGraphicsFormat.PDF);

        private final String extension;
        private final VectorGraphicsEncoder.VectorGraphicsFormat encoderFormat;

        VectorFormat(String extension, VectorGraphicsEncoder.VectorGraphicsFormat encoderFormat) {
            this.extension = extension;
            this.encoderFormat = encoderFormat;
        }

        /** File name extension, without the dot. */
        public String extension() {
            return extension;
        }
    }

    private ChartFiles() {
    }

    /** Writes {@code chart} as a PNG of the chart's size. */
    public static void writePng(XYChart chart, Path target) throws IOException {
        AtomicFiles.writeBinary(target, out -> {
            try {
                BitmapEncoder.saveBitmap(chart, out, BitmapEncoder.BitmapFormat.PNG);
            } catch (IOException e) {
                throw withOsReason(e);
            }
        });
    }

    /**
     * The innermost I/O exception of {@code e}: the image encoder wraps the operating system's "File too large" or
     * "No space left on device" in its own "I/O error writing PNG file!", which tells a user nothing (31
     * warnings, no reason).
     */
    static IOException withOsReason(IOException e) {
        IOException innermost = e;
        for (Throwable t = e.getCause(); t != null && t != t.getCause(); t = t.getCause()) {
            if (t instanceof IOException io && io.getMessage() != null) {
                innermost = io;
            }
        }
        return innermost;
    }

    /** Writes {@code chart} as a vector file. */
    public static void writeVector(XYChart chart, Path target, VectorFormat format) throws IOException {
        AtomicFiles.writeBinary(target, out -> VectorGraphicsEncoder.saveVectorGraphic(chart, out,
                format.encoderFormat));
    }
}
