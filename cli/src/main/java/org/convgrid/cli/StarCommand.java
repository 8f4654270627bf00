package org.convgrid.cli;

import java.io.IOException;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.Callable;
import org.convgrid.engine.physics.opacity.OpacityTableReader;
import org.convgrid.engine.request.OpacityChoice;
import org.convgrid.engine.request.ModelOutcome;
import org.convgrid.engine.request.ModelRequest;
import org.convgrid.engine.request.ModelStatus;
import org.convgrid.engine.request.PhysicsOptions;
import org.convgrid.engine.physics.atmosphere.AtmosphereChoice;
import org.convgrid.engine.convection.StabilityCriterion;
import org.convgrid.engine.state.Composition;
import org.convgrid.engine.structure.StellarModel;
import org.convgrid.engine.units.Constants;
import org.convgrid.engine.batch.GridRequests;
import org.convgrid.engine.evolution.MainSequenceEvolver;
import org.convgrid.engine.evolution.TrackSink;
import org.convgrid.engine.zams.ZeroAgeRequests;
import org.convgrid.grids.HeliumLaw;
import org.convgrid.output.AtomicFiles;
import org.convgrid.output.catalogue.CatalogueWriter;
import org.convgrid.output.catalogue.OutcomeRows;
import org.convgrid.output.profile.ProfileRows;
import org.convgrid.output.profile.ProfileWriter;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.ParentCommand;

/** {@code convgrid star}: one model, its global properties and its convective zones. */
@Command(name = "star", mixinStandardHelpOptions = true,
        description = {"One main-sequence model (zero-age, or evolved to --age-gyr): its global properties and its "
                + "convective zones.",
            "Exit code 3 when the model does not converge or the age lies beyond core-hydrogen exhaustion (the reason "
                + "is printed on one line)."})
final class StarCommand implements Callable<Integer> {

    /** Oldest age accepted, Gyr: the evolver's age limit. */
    static final double MAX_AGE_GYR = MainSequenceEvolver.Settings.DEFAULT.maxAge() / Constants.GYR;

    /** Below this mass a failed zero-age model gets a note on the hydrogen-burning limit, Msun. */
    static final double NEAR_BURNING_LIMIT_MSUN = 0.1;

    @ParentCommand
    ConvgridMain main;

    @Option(names = "--mass", required = true, paramLabel = "M", description = "Total mass, solar masses.")
    double massMsun;

    @Option(names = "--z", required = true, paramLabel = "Z", description = "Initial metal mass fraction.")
    double metals;

    @Option(names = "--y", paramLabel = "Y",
            description = "Initial helium mass fraction (default: Y = 0.2471 + 1.5 Z).")
    Double helium;

    @Option(names = "--age-gyr", defaultValue = "0", paramLabel = "A",
            description = "Age since the zero-age main sequence, Gyr (default ${DEFAULT-VALUE}: the zero-age model; "
                    + "older models are evolved from it, exit 3 past core-hydrogen exhaustion).")
    double ageGyr;

    @Option(names = "--mixing-length", defaultValue = "1.8", paramLabel = "ALPHA",
            description = "Mixing length, pressure scale heights (default ${DEFAULT-VALUE}).")
    double mixingLength;

    @Option(names = "--criterion", defaultValue = "schwarzschild", paramLabel = "schwarzschild|ledoux",
            description = "Convective stability criterion (default ${DEFAULT-VALUE}).")
    StabilityCriterion criterion;

    @Option(names = "--opacity-scale", defaultValue = "1", paramLabel = "S",
            description = "Multiplies every opacity (dimensionless; default ${DEFAULT-VALUE}).")
    double opacityScale;

    @Option(names = "--opacity-table", paramLabel = "FILE",
            description = "Use this opacity table (convgrid table layout, see README) instead of the built-in OPAL-corrected analytic one.")
    Path opacityTable;

    @Option(names = "--atmosphere", defaultValue = "krishna_swamy", paramLabel = "eddington|krishna_swamy",
            description = "Grey T(tau) relation of the surface boundary (default ${DEFAULT-VALUE}).")
    AtmosphereChoice atmosphere;

    @Option(names = "--profile", paramLabel = "FILE",
            description = "Also write one CSV row per shell (m/M, r/R, P, T, rho, L, kappa, eps, gradients, "
                    + "convective flag, convective velocity) to FILE.")
    Path profile;

    @Option(names = "--format", defaultValue = "table", paramLabel = "table|csv",
            description = "table (readable) or csv (the catalogue header and this model's row). "
                    + "Default ${DEFAULT-VALUE}.")
    OutputFormat format;

    /**
     * Helium mass fractions accepted: from below the primordial value (0.2485, Aver et al. 2015, from memory) to
     * above the helium-rich populations of globular clusters (Y about 0.38-0.40, Piotto et al. 2007, from memory);
     * outside, the zero-age solver has no physical model to find.
     */
    static final double MIN_HELIUM = 0.2;
    static final double MAX_HELIUM = 0.45;

    @Override
    public Integer call() throws IOException {
        PhysicsOptions options = options();
        double y = helium != null ? helium : HeliumLaw.DEFAULT.helium(metals);
        if (!(y >= MIN_HELIUM && y <= MAX_HELIUM)) {
            throw new UsageException("--y must lie in [" + MIN_HELIUM + ", " + MAX_HELIUM + "] (helium mass "
                    + "fraction: no star has less than the primordial value, about 0.245, and the most helium-rich "
                    + "populations known reach about 0.4), got " + y);
        }
        if (profile != null) {
            OutputTargets.requireWritableFile("--profile", main.context().resolve(profile));
        }
        String id = String.format(java.util.Locale.ROOT, "star-m%.4f-z%.5f", massMsun, metals);
        ModelRequest request = new ModelRequest(id, massMsun * Constants.M_SUN, metals, y, ageGyr * Constants.GYR,
                options);
        Composition composition = ZeroAgeRequests.initialComposition(request);
        GridRequests.Answer answer = new GridRequests(TrackSink.NONE).answers(List.of(request)).get(0);
        ModelOutcome outcome = answer.outcome();
        if (format == OutputFormat.CSV) {
            try (CatalogueWriter writer = CatalogueWriter.startingWithHeader(main.out())) {
                writer.write(OutcomeRows.toRow(outcome));
            }
        } else {
            StarReport.write(outcome, composition, main.out());
        }
        main.out().flush();
        if (outcome.status() != ModelStatus.OK) {
            String what = outcome.status() == ModelStatus.PAST_MAIN_SEQUENCE ? "past the main sequence"
                    : "model " + outcome.status().label().replace('_', ' ');
            main.err().println("convgrid: " + what + ": " + outcome.statusDetail());
            if (outcome.status() == ModelStatus.NOT_CONVERGED && massMsun < NEAR_BURNING_LIMIT_MSUN) {
                main.err().println("convgrid: note: " + massMsun + " Msun is near the hydrogen-burning limit "
                        + "(~0.07-0.09 Msun, higher at low Z: Chabrier & Baraffe 1997), below which no zero-age "
                        + "main sequence exists; our models reach down to ~0.08 Msun at Z = 0.02 and ~0.095 Msun "
                        + "at Z = 1e-4");
            }
            return ExitCodes.SOME_MODELS_FAILED;
        }
        if (profile != null) {
            StellarModel model = answer.model();
            Path target = main.context().resolve(profile);
            AtomicFiles.write(target, out -> ProfileWriter.write(ProfileRows.of(model), out));
            main.err().println("profile: " + model.profile().size() + " shells written to " + target);
        }
        return ExitCodes.OK;
    }

    private PhysicsOptions options() {
        if (!(massMsun > 0 && massMsun <= 300)) {
            throw new UsageException("--mass must lie in (0, 300] solar masses, got " + massMsun);
        }
        if (!(metals >= 0 && metals < 0.1)) {
            throw new UsageException("--z must lie in [0, 0.1), got " + metals);
        }
        if (!(ageGyr >= 0 && ageGyr <= MAX_AGE_GYR)) {
            throw new UsageException("--age-gyr must lie in [0, " + MAX_AGE_GYR + "] Gyr, got " + ageGyr);
        }
        if (!(mixingLength > 0 && mixingLength < 10)) {
            throw new UsageException("--mixing-length must lie in (0, 10) pressure scale heights, got " + mixingLength);
        }
        if (!(opacityScale > 0 && opacityScale <= 100)) {
            throw new UsageException("--opacity-scale must lie in (0, 100], got " + opacityScale);
        }
        OpacityChoice table = OpacityChoice.BUILT_IN;
        if (opacityTable != null) {
            Path resolved = main.context().resolve(opacityTable);
            try {
                table = OpacityChoice.table(resolved.toString(), OpacityTableReader.read(resolved));
            } catch (org.convgrid.engine.error.ConvgridException e) {
                // a bad table is bad input, as the same table named in a grid file is
                throw new UsageException("--opacity-table: " + e.getMessage());
            }
        }
        return new PhysicsOptions(mixingLength, 0.0, criterion, opacityScale, table, atmosphere);
    }
}
