package org.convgrid.cli;

import java.io.IOException;
import java.util.concurrent.Callable;
import org.convgrid.engine.physics.MicrophysicsPoint;
import org.convgrid.engine.physics.StandardPhysics;
import org.convgrid.engine.state.Composition;
import org.convgrid.output.probe.MicrophysicsPointWriter;
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
            description = "Multiplies the opacity (dimensionless; default ${DEFAULT-VALUE}).")
    double opacityScale;

    @Option(names = "--format", defaultValue = "table", paramLabel = "table|csv",
            description = "Output format: table (readable) or csv (header row, then one row). Default ${DEFAULT-VALUE}.")
    OutputFormat format;

    @Override
    public Integer call() throws IOException {
        requirePositive("--temp-k", temperature);
        requirePositive("--density-cgs", density);
        requirePositive("--opacity-scale", opacityScale);
        if (!(hydrogen >= 0 && hydrogen <= 1 && metals >= 0 && metals < 0.1 && hydrogen + metals <= 1)) {
            throw new UsageException(String.format(
                    "need 0 <= X <= 1, 0 <= Z < 0.1 and X + Z <= 1; got X = %s, Z = %s", hydrogen, metals));
        }
        Composition composition = Composition.scaledSolar(hydrogen, metals);
        MicrophysicsPoint point = MicrophysicsPoint.evaluate(StandardPhysics.equationOfState(),
                StandardPhysics.opacity(opacityScale), StandardPhysics.nuclearNetwork(), density, temperature,
                composition);
        MicrophysicsPointWriter writer = new MicrophysicsPointWriter();
        if (format == OutputFormat.CSV) {
            writer.writeCsv(point, spec.commandLine().getOut());
        } else {
            writer.writeTable(point, spec.commandLine().getOut());
        }
        spec.commandLine().getOut().flush();
        return ExitCodes.OK;
    }

    private static void requirePositive(String option, double value) {
        if (!(value > 0) || Double.isInfinite(value)) {
            throw new UsageException(option + " must be a positive number, got " + value);
        }
    }
}
