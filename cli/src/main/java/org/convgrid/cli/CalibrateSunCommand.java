package org.convgrid.cli;

import java.io.IOException;
import java.nio.file.Path;
import java.util.Locale;
import java.util.concurrent.Callable;
import org.convgrid.grids.words.MessageNumbers;
import org.convgrid.engine.calibration.CalibratedSun;
import org.convgrid.engine.calibration.CalibrationSettings;
import org.convgrid.engine.calibration.SolarCalibration;
import org.convgrid.engine.physics.atmosphere.AtmosphereChoice;
import org.convgrid.engine.units.Constants;
import org.convgrid.output.AtomicFiles;
import org.convgrid.output.profile.ProfileWriter;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.ParentCommand;

/** {@code convgrid calibrate-sun}: the mixing length and initial helium of a 1 Msun model matching the Sun. */
@Command(name = "calibrate-sun", mixinStandardHelpOptions = true,
        description = {"Find the mixing length and initial helium that give a 1 Msun model the Sun's radius and "
                + "luminosity (IAU 2015 nominal values) at its age, and the initial Z/X that leaves the envelope at "
                + "the present Z/X after helium and metals have settled. Prints them and writes a physics preset "
                + "for grid files (and, with --profile, the calibrated model's profile).",
            "Takes a dozen or more full evolutions (about a minute)."})
final class CalibrateSunCommand implements Callable<Integer> {

    /** Oldest age accepted, Gyr (older than the Universe is not a Sun). */
    static final double MAX_AGE_GYR = 13.0;

    /**
     * Youngest age accepted, Gyr: 1 Myr after the zero-age main sequence. A younger "Sun" has not left its zero-age
     * model, which is no calibration of the Sun; such an age is a slip (Myr typed for Gyr, a lost decimal) that
     * would otherwise cost a minute of evolutions before anyone noticed.
     */
    static final double MIN_AGE_GYR = 0.001;

    @ParentCommand
    ConvgridMain main;

    @Option(names = "--age-gyr", defaultValue = "4.57", paramLabel = "A",
            description = "Age of the Sun since the zero-age main sequence, Gyr, from " + MIN_AGE_GYR + " to "
                    + MAX_AGE_GYR + " (default ${DEFAULT-VALUE}); unlike star's --age-gyr, which counts from birth "
                    + "unless --age-origin zams.")
    double ageGyr;

    @Option(names = "--z-over-x", defaultValue = "0.0245", paramLabel = "RATIO",
            description = "Present surface metal-to-hydrogen mass ratio Z/X, dimensionless (default "
                    + "${DEFAULT-VALUE}, Grevesse & Noels 1993, the mixture of the OPAL opacity tables; "
                    + "Grevesse & Sauval 1998: 0.0231).")
    double metalsToHydrogen;

    @Option(names = "--format", defaultValue = "table", paramLabel = "table|csv",
            description = "table (readable) or csv: a header row and one row of mixing_length, y_init, z_init (the "
                    + "calibrated values), then the other catalogue columns of the calibrated model (model_id to "
                    + "solver_iterations and any after them; each column once), then "
                    + SolarCalibrationReport.ZAMS_LUMINOSITY_LSUN + " (Lsun), "
                    + SolarCalibrationReport.MS_LIFETIME_GYR + " (Gyr), " + SolarCalibrationReport.Z_OVER_X_INIT
                    + ", " + SolarCalibrationReport.Y_SURFACE + " and " + SolarCalibrationReport.Z_OVER_X_SURFACE
                    + " (the envelope at the Sun's age). Default ${DEFAULT-VALUE}.")
    OutputFormat format;

    @Option(names = "--atmosphere", defaultValue = "krishna_swamy", paramLabel = "eddington|krishna_swamy",
            description = "Grey T(tau) relation of the surface boundary; the calibrated mixing length belongs to it "
                    + "and the preset records it (default ${DEFAULT-VALUE}).")
    AtmosphereChoice atmosphere;

    @Option(names = "--no-settling", negatable = false,
            description = "Keep the composition free of microscopic diffusion (by default helium and metals settle "
                    + "and the initial Z/X is found so that the envelope ends at the given present Z/X).")
    boolean noSettling;

    @Option(names = "--preset", defaultValue = "calibrated-sun.yaml", paramLabel = "FILE",
            description = "Physics preset file to write (YAML; default ${DEFAULT-VALUE} in the current directory).")
    Path preset;

    @Option(names = "--profile", paramLabel = "FILE",
            description = "Also write the calibrated solar model (at the calibrated age, settled as calibrated) to "
                    + "FILE, one row per shell, centre to surface, with the columns and ECSV header of star "
                    + "--profile. star with the preset's values is not this model: it evolves without settling.")
    Path profile;

    @Override
    public Integer call() throws IOException {
        if (!(ageGyr >= MIN_AGE_GYR && ageGyr <= MAX_AGE_GYR)) {
            throw new UsageException("--age-gyr must be from " + MessageNumbers.format(MIN_AGE_GYR) + " to "
                    + MessageNumbers.format(MAX_AGE_GYR) + " Gyr (got " + MessageNumbers.format(ageGyr) + "): the "
                    + "Sun's age since the zero-age main sequence, 4.57 by default");
        }
        if (!(metalsToHydrogen > 0 && metalsToHydrogen < 0.1)) {
            throw new UsageException("--z-over-x must be above 0 and below 0.1 (got "
                    + MessageNumbers.format(metalsToHydrogen) + ")");
        }
        Path target = main.context().resolve(preset);
        OutputTargets.requireWritableFile("--preset", target);
        Path profileTarget = profile == null ? null : main.context().resolve(profile);
        if (profileTarget != null) {
            OutputTargets.requireWritableFile("--profile", profileTarget);
            if (profileTarget.toAbsolutePath().normalize().equals(target.toAbsolutePath().normalize())) {
                throw new UsageException("--profile and --preset both name " + target + "; give two files");
            }
        }
        CalibrationSettings settings = CalibrationSettings.DEFAULT.withAge(ageGyr * Constants.GYR)
                .withMetalsToHydrogen(metalsToHydrogen).withAtmosphere(atmosphere).withSettling(!noSettling);
        int[] count = {0};
        CalibratedSun sun = new SolarCalibration(settings).calibrate(t -> {
            main.err().println(String.format(Locale.ROOT, "evolution %d: alpha = %.5f, Y = %.5f: "
                    + "ln(R/R_sun) = %+.3e, ln(L/L_sun) = %+.3e", ++count[0], t.mixingLength(), t.helium(),
                    t.radiusResidual(), t.luminosityResidual()));
            main.err().flush();
        });
        if (format == OutputFormat.CSV) {
            SolarCalibrationReport.writeCsv(sun, main.out());
        } else {
            SolarCalibrationReport.writeTable(sun, !noSettling, main.out());
        }
        main.out().flush();
        AtomicFiles.writeString(target, SolarCalibrationReport.preset(sun, atmosphere, !noSettling, ToolVersion.current()));
        main.err().println("preset: mixing length " + String.format(Locale.ROOT, "%.5f", sun.mixingLength())
                + " written to " + target);
        if (profileTarget != null) {
            ProfileWriter.writeFile(profileTarget, sun.sun().request(), sun.model(), !noSettling,
                    ToolVersion.current(), ToolVersion.commit());
            main.err().println("profile: " + sun.model().profile().size() + " shells written to " + profileTarget);
        }
        return ExitCodes.OK;
    }
}
