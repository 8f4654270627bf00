package org.convgrid.cli;

import java.io.IOException;
import java.util.concurrent.Callable;
import org.convgrid.engine.physics.MicrophysicsPoint;
import org.convgrid.engine.physics.StandardPhysics;
import org.convgrid.engine.physics.opacity.OpalGn93Opacity;
import org.convgrid.engine.state.Composition;
import org.convgrid.output.probe.MicrophysicsPointWriter;
import org.convgrid.grids.words.MessageNumbers;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

/** {@code convgrid probe}: the engine's microphysics at one point. */
@Command(name = "probe", mixinStandardHelpOptions = true,
        description = {"The microphysics at one point: equation of state, Rosseland-mean opacity and hydrogen "
                + "burning, as the structure solver uses them.",
            "Y = 1 - X - Z; metals in the scaled-solar (Grevesse & Sauval 1998) mixture; 3He and the CN "
                + "isotopes at their local equilibrium abundances where they burn."})
final class ProbeCommand implements Callable<Integer> {

    @Spec
    CommandSpec spec;

    @Option(names = "--temp-k", required = true, paramLabel = "T", description = "Temperature, K.")
    double temperature;

    @Option(names = "--density-cgs", required = true, paramLabel = "RHO", description = "Density, g/cm^3.")
    double density;

    @Option(names = "--x", required = true, paramLabel = "X", description = "Hydrogen mass fraction.")
    double hydrogen;

    @Option(names = "--z", required = true, paramLabel = "Z", description = "Metal mass fraction.")
    double metals;

    @Option(names = "--opacity-scale", defaultValue = "1", paramLabel = "S",
            description = "Multiplies the opacity (dimensionless, above 0 and at most 100; default ${DEFAULT-VALUE}).")
    double opacityScale;

    @Option(names = "--format", defaultValue = "table", paramLabel = "table|csv",
            description = "Output format: table (readable) or csv (header row, then one row). Default ${DEFAULT-VALUE}.")
    OutputFormat format;

    @Override
    public Integer call() throws IOException {
        requireWithin("--temp-k", temperature, MIN_TEMPERATURE_K, MAX_TEMPERATURE_K, "K");
        requireWithin("--density-cgs", density, MIN_DENSITY_CGS, MAX_DENSITY_CGS, "g/cm^3");
        // the range star allows; beyond it the opacity factor fails deep in the physics
        if (!(opacityScale > 0 && opacityScale <= 100)) {
            throw new UsageException("--opacity-scale must be above 0 and at most 100 (got "
                    + MessageNumbers.format(opacityScale) + ")");
        }
        if (!(hydrogen >= 0 && hydrogen <= 1 && metals >= 0 && metals < 0.1 && hydrogen + metals <= 1)) {
            throw new UsageException(String.format(
                    "need 0 <= X <= 1, 0 <= Z < 0.1 and X + Z <= 1; got X = %s, Z = %s", hydrogen, metals));
        }
        Composition composition = Composition.scaledSolar(hydrogen, metals);
        MicrophysicsPoint point;
        try {
            point = MicrophysicsPoint.evaluate(StandardPhysics.equationOfState(),
                    StandardPhysics.opacity(opacityScale), StandardPhysics.nuclearNetwork(), density, temperature,
                    composition);
        } catch (org.convgrid.engine.error.ConvgridException e) {
            throw new UsageException(String.format(java.util.Locale.ROOT, "the microphysics is not defined at "
                    + "T = %.4g K, rho = %.4g g/cm^3 (X = %s, Z = %s)", temperature, density, hydrogen, metals));
        }
        // the tables StandardPhysics.opacity scales, asked at the composition the opacity was evaluated at
        String source = OpalGn93Opacity.shipped().source(density, temperature, point.composition());
        MicrophysicsPointWriter writer = new MicrophysicsPointWriter();
        if (format == OutputFormat.CSV) {
            writer.writeCsv(point, source, spec.commandLine().getOut());
        } else {
            writer.writeTable(point, source, spec.commandLine().getOut());
        }
        spec.commandLine().getOut().flush();
        return ExitCodes.OK;
    }

    /**
     * The points the probe answers for: the temperatures and densities of main-sequence stars from the photosphere
     * to the centre, with margin (common practice); outside them the equation of state gives no finite answer.
     */
    static final double MIN_TEMPERATURE_K = 1.0e3;
    static final double MAX_TEMPERATURE_K = 1.0e9;
    static final double MIN_DENSITY_CGS = 1.0e-14;
    static final double MAX_DENSITY_CGS = 1.0e7;

    private static void requireWithin(String option, double value, double low, double high, String unit) {
        if (!(value >= low && value <= high)) {
            throw new UsageException(option + " must be from " + MessageNumbers.format(low) + " to "
                    + MessageNumbers.format(high) + " " + unit + " (got " + MessageNumbers.format(value) + ")");
        }
    }
}
