package org.convgrid.cli;

import java.io.IOException;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.Callable;
import java.util.concurrent.atomic.AtomicReference;
import org.convgrid.engine.error.ConvgridException;
import org.convgrid.engine.physics.opacity.OpacityTableReader;
import org.convgrid.engine.request.OpacityChoice;
import org.convgrid.engine.request.ModelOutcome;
import org.convgrid.engine.request.ModelRequest;
import org.convgrid.engine.request.ModelStatus;
import org.convgrid.engine.request.OvershootScheme;
import org.convgrid.engine.request.PhysicsOptions;
import org.convgrid.engine.physics.atmosphere.AtmosphereChoice;
import org.convgrid.grids.yaml.PhysicsPreset;
import org.convgrid.engine.convection.StabilityCriterion;
import org.convgrid.engine.state.Composition;
import org.convgrid.engine.structure.StellarModel;
import org.convgrid.engine.units.Constants;
import org.convgrid.engine.batch.GridRequests;
import org.convgrid.engine.evolution.MainSequenceEvolver;
import org.convgrid.grids.words.MessageNumbers;
import org.convgrid.engine.birth.LifeEvents;
import org.convgrid.engine.request.Age;
import org.convgrid.engine.request.AgeOrigin;
import org.convgrid.engine.state.BirthAbundances;
import org.convgrid.engine.zams.ZeroAgeRequests;
import org.convgrid.grids.HeliumLaw;
import org.convgrid.grids.IronToMetals;
import org.convgrid.grids.MetallicityPoint;
import org.convgrid.output.IronAbundance;
import org.convgrid.output.catalogue.CatalogueWriter;
import org.convgrid.output.catalogue.OutcomeRows;
import org.convgrid.output.profile.ProfileColumns;
import org.convgrid.output.profile.ProfileWriter;
import picocli.CommandLine.ArgGroup;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.ParentCommand;

/** {@code convgrid star}: one model, its global properties and its convective zones. */
@Command(name = "star", mixinStandardHelpOptions = true,
        description = {"One model (the zero-age main sequence, or evolved to --age-gyr / --age-myr, from birth unless "
                + "--age-origin zams): its global properties, phase, surface lithium and convective zones.",
            "Exit code 3 when the model does not converge or the age lies beyond core-hydrogen exhaustion (the reason "
                + "is printed on one line)."})
final class StarCommand implements Callable<Integer> {

    /** Oldest age accepted, Gyr: the evolver's age limit. */
    static final double MAX_AGE_GYR = MainSequenceEvolver.Settings.DEFAULT.maxAge() / Constants.GYR;

    private static final double MYR_PER_GYR = 1000.0;

    /** Below this mass a failed zero-age model gets a note on the hydrogen-burning limit, Msun. */
    static final double NEAR_BURNING_LIMIT_MSUN = 0.1;

    /**
     * The lowest hydrogen-burning limit, Msun: ~0.07 at solar metallicity, higher at low Z (Chabrier &amp; Baraffe
     * 1997). A failed star below it lies below the limit, not near it.
     */
    static final double BURNING_LIMIT_LOWEST_MSUN = 0.07;

    @ParentCommand
    ConvgridMain main;

    @Option(names = "--mass", required = true, paramLabel = "M", description = "Total mass, solar masses.")
    double massMsun;

    /** The composition: Z, or [Fe/H] turned into Z; exactly one (picocli says so when both or neither come). */
    @ArgGroup(exclusive = true, multiplicity = "1")
    MetalsGiven metalsGiven;

    static final class MetalsGiven {
        @Option(names = "--z", required = true, paramLabel = "Z", description = "Initial metal mass fraction.")
        Double metals;

        @Option(names = "--fe-h-dex", required = true, paramLabel = "DEX",
                description = "Spectroscopic [Fe/H] instead of --z: Z of a solar-scaled mixture, Z/X = (Z/X)_sun "
                        + "10^[Fe/H] with X = 1 - Y - Z (no alpha enhancement).")
        Double ironDex;
    }

    @Option(names = "--solar-z-over-x", paramLabel = "RATIO",
            description = "The Sun's Z/X that --fe-h-dex is measured against (default 0.0245, Grevesse & Noels "
                    + "1993, the opacity tables' mixture).")
    Double solarRatio;

    /** Z, from --z or from --fe-h-dex. */
    private double metals;

    @Option(names = "--y", paramLabel = "Y",
            description = "Initial helium mass fraction (default: Y = 0.2471 + 1.5 Z).")
    Double helium;

    @Option(names = "--age-gyr", paramLabel = "A",
            description = "Age, Gyr, counted from --age-origin (without an age: the zero-age main-sequence model; "
                    + "exit 3 past core-hydrogen exhaustion).")
    Double ageGyr;

    @Option(names = "--age-myr", paramLabel = "A",
            description = "Age, Myr, counted from --age-origin (instead of --age-gyr).")
    Double ageMyr;

    @Option(names = "--age-origin", paramLabel = "birth|zams",
            description = "Where age 0 lies: birth (the default when an age is given; the star is evolved from its "
                    + "pre-main-sequence start, so a young star may still be contracting) or zams (evolved from the "
                    + "zero-age main-sequence model).")
    String ageOrigin;

    /** Null when not given: the grid's default ({@link PhysicsOptions#DEFAULT}), or the preset's. */
    @Option(names = "--mixing-length", paramLabel = "ALPHA",
            description = "Mixing length, pressure scale heights (default 1.8, or the --preset's).")
    Double mixingLength;

    /** Null when not given: the defaults of --mixing-length and --atmosphere. */
    @Option(names = "--preset", paramLabel = "FILE",
            description = "Take the mixing length and its atmosphere from a physics preset written by calibrate-sun "
                    + "(e.g. calibrated-sun.yaml), as the grid key physics: {preset: FILE} does; not with "
                    + "--mixing-length or --atmosphere.")
    Path preset;

    @Option(names = "--criterion", defaultValue = "schwarzschild", paramLabel = "schwarzschild|ledoux",
            description = "Convective stability criterion (default ${DEFAULT-VALUE}).")
    StabilityCriterion criterion;

    @Option(names = "--overshoot-hp", paramLabel = "L",
            description = "Overshoot length beyond every convective boundary, pressure scale heights (default 0): the "
                    + "grid key overshoot: L, or its length_hp.")
    Double overshootHp;

    /** Null when not given: uniform, which needs no length; a profile named without a length is an error. */
    @Option(names = "--overshoot-profile", paramLabel = "uniform|decaying|uniform-ramped",
            description = "How the overshoot mixing ends (default uniform): uniform mixes fully to --overshoot-hp; "
                    + "decaying lets it fade (e-folding length L H_P / 2), as the grid key overshoot: {profile: "
                    + "decaying, length_hp: L}; uniform-ramped mixes like uniform with a length ramped with the "
                    + "star's mass: none up to 1.2 Msun, --overshoot-hp from 2 Msun. Needs --overshoot-hp, as the "
                    + "grid key needs its length_hp.")
    String overshootProfile;

    @Option(names = "--opacity-scale", defaultValue = "1", paramLabel = "S",
            description = "Multiplies every opacity (dimensionless, above 0 and at most 100; default ${DEFAULT-VALUE}).")
    double opacityScale;

    @Option(names = "--opacity-table", paramLabel = "FILE",
            description = "Use this opacity table (convgrid table layout, see README) instead of the built-in "
                    + "ones: the OPAL GN93 tables (Iglesias & Rogers 1996), blended over log T 3.80-4.00 into the "
                    + "low-temperature tables of Ferguson et al. 2005, with analytic terms beyond both and electron "
                    + "conduction added.")
    Path opacityTable;

    /** Null when not given: krishna_swamy, or the preset's. */
    @Option(names = "--atmosphere", paramLabel = "eddington|krishna_swamy",
            description = "Grey T(tau) relation of the surface boundary (default krishna_swamy, or the --preset's).")
    AtmosphereChoice atmosphere;

    @Option(names = "--profile", paramLabel = "FILE",
            description = "Also write one CSV row per shell, centre to surface, to FILE (ECSV: a '#' header gives "
                    + "each column's unit and the star's mass, radius, age, composition, physics and constants); its "
                    + "columns (units in their names; the README explains each): " + ProfileColumns.HEADER_NAMED
                    + ".")
    Path profile;

    @Option(names = "--format", defaultValue = "table", paramLabel = "table|csv",
            description = "table (readable) or csv (the catalogue header and this model's row). "
                    + "Default ${DEFAULT-VALUE}.")
    OutputFormat format;

    @Override
    public Integer call() throws IOException {
        metals = metals();
        PhysicsOptions options = options();
        Age age = age();
        double y = helium != null ? helium : HeliumLaw.DEFAULT.helium(metals);
        // as a grid's metallicity section does: an error only where no hydrogen is left; an untested Y warns
        if (!(y >= 0 && y + metals < 1.0)) {
            throw new UsageException("--y " + MessageNumbers.format(y) + " with --z " + MessageNumbers.format(metals)
                    + " leaves no hydrogen (need Y >= 0 and X = 1 - Y - Z > 0)");
        }
        if (profile != null) {
            OutputTargets.requireWritableFile("--profile", main.context().resolve(profile));
        }
        if (metalsGiven.ironDex != null) {
            // the tables give Z and Y only: say on the error stream what the [Fe/H] became
            main.err().println("convgrid: [Fe/H] " + MessageNumbers.format(metalsGiven.ironDex) + " against solar Z/X "
                    + MessageNumbers.format(iron().solarMetalsToHydrogen()) + ": Z = " + MessageNumbers.format(metals)
                    + ", Y = " + MessageNumbers.format(y));
        }
        // given as [Fe/H], the warning says the [Fe/H] too; the helium law is the default one unless --y fixes Y
        TestedRange.print(metalsGiven.ironDex == null ? TestedRange.warnings(massMsun, metals, y, age)
                : TestedRange.warnings(massMsun, new MetallicityPoint(metals, y, metalsGiven.ironDex, iron(),
                        helium == null ? HeliumLaw.DEFAULT : null), age), main.err());
        TestedRange.print(OvershootAdvice.warnings(massMsun, age, options), main.err());
        String id = String.format(java.util.Locale.ROOT, "star-m%.4f-z%s", massMsun, StarReport.metalsText(metals));
        ModelRequest request = new ModelRequest(id, massMsun * Constants.M_SUN, metals, y, age, options);
        Composition composition = request.age().origin() == AgeOrigin.BIRTH
                ? BirthAbundances.of(1.0 - y - metals, metals) : ZeroAgeRequests.initialComposition(request);
        // the star's life events, for the note on a core that has joined the envelope (one star, one call)
        AtomicReference<LifeEvents> lifeEvents = new AtomicReference<>();
        // a physics failure while the model is built is a failed row with its reason (GridRequests), as in a grid
        GridRequests.Answer answer = new GridRequests((first, points, events) -> lifeEvents.set(events),
                MainSequenceEvolver.Settings.DEFAULT).answers(List.of(request)).get(0);
        ModelOutcome outcome = answer.outcome();
        if (format == OutputFormat.CSV) {
            // fe_h_dex against the Sun --fe-h-dex was measured against (the default one with --z)
            IronAbundance ironColumn = new IronAbundance(iron().solarMetalsToHydrogen(), metalsGiven.ironDex != null);
            try (CatalogueWriter writer = CatalogueWriter.startingWithHeader(main.out(), ironColumn)) {
                writer.write(OutcomeRows.toRow(outcome));
            }
        } else {
            StarReport.write(outcome, composition, main.out());
        }
        main.out().flush();
        String merged = mergeNote(lifeEvents.get(), outcome);
        if (merged != null) {
            main.err().println(merged);
        }
        if (outcome.status() != ModelStatus.OK) {
            String what = outcome.status() == ModelStatus.PAST_MAIN_SEQUENCE ? "past the main sequence"
                    : "model " + outcome.status().label().replace('_', ' ');
            main.err().println("convgrid: " + what + ": " + StarReport.detail(outcome));
            if (outcome.status() == ModelStatus.NOT_CONVERGED && massMsun < NEAR_BURNING_LIMIT_MSUN) {
                main.err().println(burningLimitNote(massMsun));
            }
            if (profile != null) {
                main.err().println("convgrid: no profile written to " + main.context().resolve(profile)
                        + ": there is no model to write");
            }
            return ExitCodes.SOME_MODELS_FAILED;
        }
        if (profile != null) {
            StellarModel model = answer.model();
            Path target = main.context().resolve(profile);
            ProfileWriter.writeFile(target, outcome.request(), model, false, ToolVersion.current(),
                    ToolVersion.commit());
            main.err().println("profile: " + model.profile().size() + " shells written to " + target);
        }
        return ExitCodes.OK;
    }

    /**
     * A note for a star whose central convective core joined its envelope on the main sequence by the model's age
     * (life_events.csv's {@code core_envelope_merge_myr}): just above the fully convective limit the core grows,
     * meets the envelope and splits off again (the convective kissing instability of van Saders &amp; Pinsonneault
     * 2012, arXiv:1201.5381), and which phase a given age shows depends on the time steps; null otherwise.
     */
    static String mergeNote(LifeEvents events, ModelOutcome outcome) {
        // the row's age counts from birth for a star evolved from birth, the only kind with life events
        double ageSeconds = OutcomeRows.toRow(outcome).ageGyr() * Constants.GYR;
        if (events == null || !(events.coreEnvelopeMerge() <= ageSeconds)) {
            return null;
        }
        return "convgrid: note: this star's central convective core joined its envelope at "
                + MessageNumbers.format(1.0e3 * events.coreEnvelopeMerge() / Constants.GYR) + " Myr, as 3He "
                + "burning grew it (just above the fully convective limit; van Saders & Pinsonneault 2012): such a "
                + "star can split and merge again, and whether this age shows it fully convective or with a core "
                + "depends on the time steps (README, Limits, in detail)";
    }

    /**
     * The note for a model of less than {@link #NEAR_BURNING_LIMIT_MSUN} that did not converge. It said "near" for
     * any such mass, 0.0005 Msun too: below the limit's range the mass is below it.
     */
    static String burningLimitNote(double massMsun) {
        return "convgrid: note: " + MessageNumbers.format(massMsun) + " Msun is "
                + (massMsun < BURNING_LIMIT_LOWEST_MSUN ? "below" : "near") + " the hydrogen-burning limit "
                + "(~0.07-0.09 Msun, higher at low Z: Chabrier & Baraffe 1997), below which no zero-age main "
                + "sequence exists; our models reach down to ~0.08 Msun at Z = 0.02 and ~0.095 Msun at Z = 1e-4";
    }

    /**
     * The age asked for: none is the zero-age main-sequence model; an age counts from birth unless
     * {@code --age-origin zams}. Age 0 from birth is refused (the start model, whose details are a choice).
     */
    private Age age() {
        if (ageGyr != null && ageMyr != null) {
            throw new UsageException("--age-gyr and --age-myr exclude each other: give the age in one unit");
        }
        AgeOrigin origin = AgeOrigin.BIRTH;
        if (ageOrigin != null) {
            origin = AgeOrigin.ofLabel(ageOrigin.strip().toLowerCase(java.util.Locale.ROOT));
            if (origin == null) {
                throw new UsageException("--age-origin must be birth or zams, got '" + ageOrigin + "'");
            }
        }
        if (ageGyr == null && ageMyr == null) {
            if (ageOrigin != null && origin == AgeOrigin.BIRTH) {
                throw new UsageException("--age-origin birth needs an age (--age-gyr or --age-myr); without one "
                        + "star gives the zero-age main-sequence model");
            }
            return Age.ZERO_AGE;
        }
        String option = ageGyr != null ? "--age-gyr" : "--age-myr";
        double gyr = ageGyr != null ? ageGyr : ageMyr / MYR_PER_GYR;
        double shown = ageGyr != null ? ageGyr : ageMyr;
        double max = ageGyr != null ? MAX_AGE_GYR : MAX_AGE_GYR * MYR_PER_GYR;
        String unit = ageGyr != null ? " Gyr" : " Myr";
        if (origin == AgeOrigin.BIRTH && !(gyr > 0 && gyr <= MAX_AGE_GYR)) {
            throw new UsageException(option + " must be above 0 and at most " + MessageNumbers.format(max) + unit
                    + " from birth (got " + MessageNumbers.format(shown) + "): age 0 is the pre-main-sequence start "
                    + "model; --age-origin zams counts from the zero-age main sequence");
        }
        if (!(gyr >= 0 && gyr <= MAX_AGE_GYR)) {
            throw new UsageException(option + " must be from 0 to " + MessageNumbers.format(max) + unit + " (got "
                    + MessageNumbers.format(shown) + ")");
        }
        return origin == AgeOrigin.BIRTH ? new Age.SinceBirth(gyr * Constants.GYR)
                : new Age.SinceZeroAge(gyr * Constants.GYR);
    }

    /** Z from --z, or from --fe-h-dex with the star's helium (--y, or the default law, which itself depends on Z). */
    private double metals() {
        Double ironDex = metalsGiven.ironDex;
        if (solarRatio != null && ironDex == null) {
            throw new UsageException("--solar-z-over-x is the Sun's Z/X that --fe-h-dex is measured against; "
                    + "with --z it means nothing");
        }
        if (ironDex == null) {
            return metalsGiven.metals;
        }
        // the grid file's ranges (MetallicityReader)
        if (!(ironDex >= IronToMetals.MIN_IRON_DEX && ironDex <= IronToMetals.MAX_IRON_DEX)) {
            throw new UsageException("--fe-h-dex must be from " + MessageNumbers.format(IronToMetals.MIN_IRON_DEX)
                    + " to " + MessageNumbers.format(IronToMetals.MAX_IRON_DEX) + " (got "
                    + MessageNumbers.format(ironDex) + ")");
        }
        if (solarRatio != null
                && !(solarRatio >= IronToMetals.MIN_SOLAR_RATIO && solarRatio <= IronToMetals.MAX_SOLAR_RATIO)) {
            throw new UsageException("--solar-z-over-x must be from " + MessageNumbers.format(
                    IronToMetals.MIN_SOLAR_RATIO) + " to " + MessageNumbers.format(IronToMetals.MAX_SOLAR_RATIO)
                    + " (got " + MessageNumbers.format(solarRatio) + ")");
        }
        IronToMetals iron = iron();
        double z = helium != null ? iron.metals(ironDex, helium) : iron.metals(ironDex, HeliumLaw.DEFAULT);
        if (!(z >= 0 && z < MetallicityPoint.MAX_Z)) {
            // said "--z must be ... (got 0.2151143)" of an option the user did not give
            throw new UsageException("--fe-h-dex " + MessageNumbers.format(ironDex) + " " + iron.zOutsideRange(z));
        }
        return z;
    }

    /** The solar Z/X [Fe/H] is measured against: --solar-z-over-x, else the default. */
    private IronToMetals iron() {
        return solarRatio == null ? IronToMetals.GN93 : new IronToMetals(solarRatio);
    }

    private PhysicsOptions options() {
        if (!(massMsun > 0 && massMsun <= 300)) {
            throw new UsageException("--mass must be above 0 and at most 300 solar masses (got "
                    + MessageNumbers.format(massMsun) + ")");
        }
        if (!(metals >= 0 && metals < 0.1)) {
            throw new UsageException("--z must be at least 0 and below 0.1 (got " + MessageNumbers.format(metals)
                    + ")");
        }
        if (preset != null && (mixingLength != null || atmosphere != null)) {
            // the preset's mixing length belongs to its atmosphere: one of them changed alone is another physics
            throw new UsageException("--preset sets the mixing length and its atmosphere; give --preset or "
                    + (mixingLength != null ? "--mixing-length" : "--atmosphere") + ", not both");
        }
        double alpha = mixingLength != null ? mixingLength : PhysicsOptions.DEFAULT.mixingLength();
        AtmosphereChoice surface = atmosphere != null ? atmosphere : AtmosphereChoice.DEFAULT;
        if (preset != null) {
            try {
                PhysicsPreset read = PhysicsPreset.read(main.context().resolve(preset));
                alpha = read.mixingLength();
                surface = read.atmosphere() != null ? read.atmosphere() : surface;
            } catch (ConvgridException e) {
                // a file that is not a preset is bad input, as the same file named in a grid is
                throw new UsageException("--preset: " + e.getMessage());
            }
        }
        if (!(alpha > 0 && alpha < 10)) {
            throw new UsageException((preset != null ? "--preset " + preset + ": its mixing_length" : "--mixing-length")
                    + " must be above 0 and below 10 pressure scale heights (got " + MessageNumbers.format(alpha) + ")");
        }
        if (!(opacityScale > 0 && opacityScale <= 100)) {
            throw new UsageException("--opacity-scale must be above 0 and at most 100 (got "
                    + MessageNumbers.format(opacityScale) + ")");
        }
        OpacityChoice table = OpacityChoice.BUILT_IN;
        if (opacityTable != null) {
            Path resolved = main.context().resolve(opacityTable);
            try {
                table = OpacityChoice.table(resolved.toString(), OpacityTableReader.read(resolved));
            } catch (ConvgridException e) {
                // a bad table is bad input, as the same table named in a grid file is
                throw new UsageException("--opacity-table: " + e.getMessage());
            }
        }
        // the grid's words, so that star and a grid file name a profile the same way
        String profileName = overshootProfile == null ? OvershootScheme.STEP.label()
                : overshootProfile.strip().toLowerCase(java.util.Locale.ROOT);
        OvershootScheme scheme = OvershootScheme.fromLabel(profileName);
        if (scheme == null) {
            throw new UsageException("--overshoot-profile must be " + OvershootScheme.labels() + ", got '"
                    + overshootProfile + "'");
        }
        if (overshootProfile != null && overshootHp == null) {
            // the grid file refuses {profile: decaying} without length_hp alike; silently mixing nothing was worse
            throw new UsageException("--overshoot-profile " + profileName + " needs --overshoot-hp L, the overshoot "
                    + "length in pressure scale heights");
        }
        double length = overshootHp == null ? 0.0 : overshootHp;
        if (!(length >= 0 && Double.isFinite(length))) {
            throw new UsageException("--overshoot-hp must be at least 0 pressure scale heights (got "
                    + MessageNumbers.format(length) + ")");
        }
        return new PhysicsOptions(alpha, length, criterion, opacityScale, table, surface, scheme);
    }
}
