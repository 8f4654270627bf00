package org.convgrid.cli;

import java.io.PrintWriter;
import java.util.List;
import java.util.Locale;
import java.util.regex.Pattern;
import org.convgrid.engine.physics.atmosphere.AtmosphereChoice;
import org.convgrid.engine.request.Age;
import org.convgrid.engine.request.GlobalProperties;
import org.convgrid.engine.request.ModelOutcome;
import org.convgrid.engine.convection.ConvectiveStructure;
import org.convgrid.engine.state.Composition;
import org.convgrid.engine.units.Constants;
import org.convgrid.grids.words.Counts;
import org.convgrid.plotting.label.SliceLabels;
import org.convgrid.plotting.zones.ZoneKind;
import org.convgrid.output.catalogue.CatalogueRow;
import org.convgrid.output.catalogue.CatalogueZone;
import org.convgrid.output.catalogue.ZoneTable;
import org.convgrid.output.catalogue.OutcomeRows;

/** The readable form of one model for {@code convgrid star}: a block of properties, then the zone list. */
final class StarReport {

    private static final Pattern ONE_ITERATION = Pattern.compile("\\bafter 1 iterations\\b");

    private StarReport() {
    }

    /** The report of one outcome; its seismic scales are the ones its catalogue row carries. */
    static void write(ModelOutcome outcome, Composition composition, PrintWriter out) {
        var r = outcome.request();
        String title;
        if (r.age() instanceof Age.SinceBirth since) {
            title = "Model at " + SliceLabels.age(since.seconds() / Constants.GYR) + " since birth";
        } else if (r.age() instanceof Age.SinceZeroAge since && since.seconds() > 0.0) {
            // below 1 Gyr in Myr, as the charts and the report give ages: a young star's "0.15 Gyr" read oddly
            title = "Model at " + SliceLabels.age(since.seconds() / Constants.GYR) + " since the zero-age main "
                    + "sequence";
        } else {
            title = "Zero-age model";
        }
        out.printf(Locale.ROOT, "%s: %.4f Msun, X = %.4f, Y = %.4f, Z = %s (initial)%n", title,
                r.mass() / Constants.M_SUN, composition.x(), composition.y(), metalsText(composition.z()));
        out.printf(Locale.ROOT, "Physics: mixing length %.3f Hp, %s, %s, opacity x %.3g%s%s%n",
                r.physics().mixingLength(), org.convgrid.cli.run.OvershootWords.describe(r.physics(),
                        r.mass() / Constants.M_SUN),
                r.physics().criterion().name().toLowerCase(Locale.ROOT), r.physics().opacityScale(),
                r.physics().usesOpacityTable() ? " (table " + r.physics().opacityTable() + ")" : "",
                // the default is not named, so the line reads as before for it
                r.physics().atmosphere() == AtmosphereChoice.DEFAULT ? ""
                        : ", " + r.physics().atmosphere().label() + " atmosphere");
        if (!(outcome instanceof ModelOutcome.Solved solved)) {
            out.printf(Locale.ROOT, "Status: %s (%s)%n", outcome.status().label(), detail(outcome));
            return;
        }
        GlobalProperties g = solved.global();
        ConvectiveStructure c = solved.convection();
        out.println();
        line(out, "luminosity", g.luminosity() / Constants.L_SUN, "Lsun");
        line(out, "radius", g.radius() / Constants.R_SUN, "Rsun");
        line(out, "effective temperature", g.effectiveTemperature(), "K");
        line(out, "log surface gravity", Math.log10(g.surfaceGravity()), "cgs");
        line(out, "central temperature", g.centralTemperature(), "K");
        line(out, "central density", g.centralDensity(), "g/cm^3");
        line(out, "central hydrogen", g.centralHydrogen(), "");
        CatalogueRow row = OutcomeRows.toRow(outcome);
        out.printf(Locale.ROOT, "  %-32s %s%n", "phase", row.phase().replace('_', ' '));
        line(out, "surface lithium / birth value", row.surfaceLiRel(), "");
        out.println();
        out.printf(Locale.ROOT, "  %-32s %s%n", "structure", c.structureClass().label().replace('_', ' '));
        // the catalogue's reading of the zones: "-" where a quantity does not apply (a fully convective star has
        // no core, its one zone reaching the centre is reported as the envelope)
        line(out, "convective core, top", row.coreCzMassFrac(), "m/M");
        line(out, "convective core, top", row.coreCzRadiusFrac(), "r/R");
        line(out, "convective core, mixed to", row.coreMixedMassFrac(), "m/M");
        line(out, "convective envelope, base", row.envCzBaseMassFrac(), "m/M");
        line(out, "convective envelope, base", row.envCzBaseRadiusFrac(), "r/R");
        line(out, "convective envelope, mass", row.envCzMassMsun(), "Msun");
        line(out, "turnover time, local", row.turnoverTimeDays(), "days");
        line(out, "turnover time, global", row.turnoverTimeGlobalDays(), "days");
        out.println();
        // the g-mode period scale gamma Dor and SPB observers compare with (asymptotic; see the README's caveats)
        line(out, "buoyancy travel time Pi_0", row.buoyancyPeriodPi0S(), "s");
        line(out, "dipole period spacing Delta Pi_1", row.periodSpacingL1S(), "s");
        // the p-mode scales of solar-like oscillators: Delta nu and where the envelope's glitch lies
        line(out, "asymptotic Delta nu = 1/(2T)", row.largeSeparationUhz(), "uHz");
        line(out, "surface zone, acoustic depth", row.surfaceCzBaseAcousticDepthS(), "s");
        line(out, "He II dip, acoustic depth", row.heIiIonisationAcousticDepthS(), "s");
        out.println();
        // what spin-evolution models need beside the turnover time
        line(out, "moment of inertia", row.momentOfInertiaGCm2(), "g cm^2");
        line(out, "convective envelope, inertia", row.envCzMomentOfInertiaGCm2(), "g cm^2");
        out.println();
        // the zones as zones.csv lists them, with their kind (without it a reader could not tell a central zone below
        // the core threshold from a core, nor see the mass of a surface zone whose m/M ends both print 1.000000)
        List<CatalogueZone> zones = row.zones();
        out.printf(Locale.ROOT, "Convective zones (%d):%n", zones.size());
        if (zones.isEmpty()) {
            out.println("  none: radiative throughout");
        }
        out.printf(Locale.ROOT, "  %4s  %-21s  %-21s  %-12s  %s%n", "#", "m/M from - to", "r/R from - to",
                "mass (Msun)", "kind");
        for (int i = 0; i < zones.size(); i++) {
            CatalogueZone z = zones.get(i);
            out.printf(Locale.ROOT, "  %4d  %9.6f - %-9.6f  %9.6f - %-9.6f  %-12.4g  %s%n", i + 1, z.massFracInner(),
                    z.massFracOuter(), z.radiusFracInner(), z.radiusFracOuter(), ZoneTable.zoneMass(z, row.massMsun()),
                    kindWords(z));
        }
        out.println();
        out.printf(Locale.ROOT, "Solved in %s.%n", Counts.of(outcome.solverIterations(), "Newton iteration"));
    }

    /**
     * Z as the header and the model id write it: five decimals, as before, down to 1e-4 (the tested range's
     * lowest Z); below, three significant digits, so that Z = 4e-6 does not read (or name a model) as Z = 0.
     */
    static String metalsText(double z) {
        return z == 0.0 || z >= 1.0e-4 ? String.format(Locale.ROOT, "%.5f", z)
                : String.format(Locale.ROOT, "%.3g", z);
    }

    /**
     * A failed model's reason for people: "after 1 iteration", not the solver's "after 1 iterations". The
     * catalogue's status_detail keeps the solver's words, so that the file of a run does not change.
     */
    static String detail(ModelOutcome outcome) {
        return ONE_ITERATION.matcher(outcome.statusDetail()).replaceAll("after 1 iteration");
    }

    /**
     * zones.csv's zone_kind in words, read as the zone maps read it ({@link ZoneKind#of(CatalogueZone)}: a shell that
     * starts at the centre is a central zone below the core threshold); a shell reaching r/R 0.99 is said to lie near
     * the surface.
     */
    static String kindWords(CatalogueZone z) {
        return switch (ZoneKind.of(z)) {
            case CORE -> "core";
            case ENVELOPE -> "envelope";
            case WHOLE_STAR -> "whole star";
            case SMALL_CENTRAL -> "central, below the core threshold";
            case SHELL -> z.radiusFracOuter() >= 0.99 ? "shell, near the surface" : "shell";
            case PAST_MAIN_SEQUENCE, NO_RESULT -> throw new IllegalArgumentException("not a zone kind: " + z);
        };
    }

    private static void line(PrintWriter out, String name, double value, String unit) {
        String text = Double.isNaN(value) ? "-" : String.format(Locale.ROOT, "%.6g", value);
        out.printf(Locale.ROOT, "  %-32s %-14s %s%n", name, text, unit);
    }
}
