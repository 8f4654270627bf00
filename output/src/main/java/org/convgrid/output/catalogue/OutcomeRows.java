package org.convgrid.output.catalogue;

import java.util.ArrayList;
import java.util.List;
import org.convgrid.engine.convection.ConvectiveStructure;
import org.convgrid.engine.convection.ConvectiveZone;
import org.convgrid.engine.convection.StructureClass;
import org.convgrid.engine.request.Age;
import org.convgrid.engine.request.GlobalProperties;
import org.convgrid.engine.request.ModelOutcome;
import org.convgrid.engine.request.ModelRequest;
import org.convgrid.engine.request.ModelStatus;
import org.convgrid.engine.request.SeismicScales;
import org.convgrid.engine.structure.BuoyancyTravelTime;
import org.convgrid.engine.units.Constants;
import org.convgrid.output.CsvNumbers;
import org.convgrid.output.MixedCoreEdge;
import org.convgrid.output.catalogue.CatalogueZone.ZoneKind;

/**
 * Converts engine outcomes (cgs) to catalogue rows: L / L_sun, R / R_sun (IAU 2015 nominal values), masses over
 * M_sun, ages over the Julian gigayear, times over the day, log g = log10(g). Whatever does not apply is NaN (an
 * empty cell): every column of a failed outcome, the core columns of a star without a convective core (a fully
 * convective star included: its one zone is the whole star), the envelope columns of a star without a convective
 * envelope, the g-mode period scale of a star without a g-mode cavity, the surface zone's acoustic depth of a
 * star with a radiative surface, helium's ionisation depth where no dip shows. Frequencies are written in microHz.
 * A fully convective star's envelope base is the centre (0) and its envelope mass the whole star.
 */
public final class OutcomeRows {

    private OutcomeRows() {
    }

    /** The catalogue row of one outcome. */
    public static CatalogueRow toRow(ModelOutcome outcome) {
        ModelRequest request = outcome.request();
        GlobalProperties g = outcome instanceof ModelOutcome.Solved s ? s.global() : null;
        ConvectiveStructure c = outcome instanceof ModelOutcome.Solved s ? s.convection() : null;
        double nan = Double.NaN;
        StructureClass kind = c == null ? null : c.structureClass();
        boolean core = kind == StructureClass.CONV_CORE || kind == StructureClass.CONV_CORE_AND_ENVELOPE;
        boolean envelope = kind == StructureClass.CONV_ENVELOPE || kind == StructureClass.CONV_CORE_AND_ENVELOPE
                || kind == StructureClass.FULLY_CONVECTIVE;
        ConvectiveZone innermost = c == null || c.zones().isEmpty() ? null : c.zones().get(0);
        // the very double star prints and the profile's meta carries: the same function of the same model
        SeismicScales seismic = outcome instanceof ModelOutcome.Solved s ? s.seismic() : SeismicScales.UNKNOWN;
        double pi0 = seismic.buoyancyTravelTime();
        return CatalogueRow.builder(request.modelId(), outcome.status())
                .massMsun(request.mass() / Constants.M_SUN)
                .zInit(request.initialMetals())
                .yInit(request.initialHelium())
                .mixingLength(request.physics().mixingLength())
                .overshootHp(request.physics().overshoot())
                .ageGyr(ageGyr(request.age()))
                .phase(phase(outcome))
                .statusDetail(outcome.statusDetail())
                .luminosityLsun(g == null ? nan : g.luminosity() / Constants.L_SUN)
                .radiusRsun(g == null ? nan : g.radius() / Constants.R_SUN)
                .teffK(g == null ? nan : g.effectiveTemperature())
                .logGCgs(g == null ? nan : Math.log10(g.surfaceGravity()))
                .centralTempK(g == null ? nan : g.centralTemperature())
                .centralDensityCgs(g == null ? nan : g.centralDensity())
                .centralHFrac(g == null ? nan : g.centralHydrogen())
                .surfaceLiRel(surfaceLithium(outcome))
                .structureClass(kind)
                .coreCzMassFrac(core ? clamp(innermost.outerMassFraction()) : nan)
                .coreCzRadiusFrac(core ? clamp(innermost.outerRadiusFraction()) : nan)
                .envCzBaseMassFrac(envelope ? clamp(c.envelopeBaseMassFraction()) : nan)
                .envCzBaseRadiusFrac(envelope ? clamp(c.envelopeBaseRadiusFraction()) : nan)
                .envCzMassMsun(envelope ? c.envelopeMass() / Constants.M_SUN : nan)
                .turnoverTimeDays(envelope ? c.turnoverTimeLocal() / Constants.DAY : nan)
                .zones(c == null ? List.of() : zones(c, request.mass() / Constants.M_SUN))
                .solverIterations(outcome.solverIterations())
                .criterion(request.physics().criterion())
                .opacityScale(request.physics().opacityScale())
                .turnoverTimeGlobalDays(envelope ? c.turnoverTimeGlobal() / Constants.DAY : nan)
                .coreMixedMassFrac(core ? mixedCoreTop(outcome, clamp(innermost.outerMassFraction())) : nan)
                .overshootProfile(request.physics().overshootScheme())
                .buoyancyPeriodPi0S(pi0)
                .periodSpacingL1S(Double.isNaN(pi0) ? nan : BuoyancyTravelTime.periodSpacing(pi0, 1))
                .largeSeparationUhz(seismic.largeSeparationMicrohertz())
                .surfaceCzBaseAcousticDepthS(seismic.surfaceZoneBaseAcousticDepth())
                .heIiIonisationAcousticDepthS(seismic.heliumSecondIonisationAcousticDepth())
                .momentOfInertiaGCm2(g == null ? nan : g.momentOfInertia())
                .envCzMomentOfInertiaGCm2(envelope && g != null ? g.envelopeMomentOfInertia() : nan)
                .build();
    }

    /** The overshoot's mixed edge above the core, never below the core's own top ({@link MixedCoreEdge}). */
    private static double mixedCoreTop(ModelOutcome outcome, double coreTop) {
        return MixedCoreEdge.of(((ModelOutcome.Solved) outcome).mixedCoreMassFraction(), coreTop);
    }

    /**
     * The evolutionary phase of a solved model ({@code pre_main_sequence} or {@code main_sequence}, as its
     * evolution found it); empty when the outcome has no model.
     */
    static String phase(ModelOutcome outcome) {
        if (!(outcome instanceof ModelOutcome.Solved s)) {
            return "";
        }
        return s.stage().preMainSequence() ? CatalogueRow.PRE_MAIN_SEQUENCE : CatalogueRow.MAIN_SEQUENCE;
    }

    /**
     * Surface 7Li over its birth value; NaN (empty) when the outcome has no model or its evolution did not follow
     * lithium (models evolved from the zero-age main sequence).
     */
    static double surfaceLithium(ModelOutcome outcome) {
        return outcome instanceof ModelOutcome.Solved s ? s.stage().surfaceLithium() : Double.NaN;
    }

    /**
     * The {@code age_gyr} a row of a request of this age is written with: Gyr since the age's own origin (birth or the
     * zero-age main sequence; the run has one); NaN (not applicable) for a fraction no solver resolved.
     */
    public static double ageGyr(Age age) {
        if (age instanceof Age.SinceZeroAge since) {
            return since.seconds() / Constants.GYR;
        }
        return age instanceof Age.SinceBirth since ? since.seconds() / Constants.GYR : Double.NaN;
    }

    /**
     * Every zone with its kind, centre outwards, without the zones that are empty at the catalogue's
     * precision: both their m/M ends and their r/R ends would be written as the same number. A zone empty in m/M
     * alone is kept: the hydrogen and helium ionisation zones of A stars hold ~1e-10 to 1e-8 of the mass, so both
     * their m/M ends are written 1.0, yet they span up to ~1 % of the radius with tens of mesh points (measured:
     * 1.8 Msun, Z = 0.02, 600 Myr: r/R 0.9908-0.9941 and 0.9986-1), and pulsation work needs them. Every zone
     * carries its own mass, not the difference of its written ends: those keep seven digits of m/M, so a thin
     * envelope whose base is written 0.999998 would get one significant digit (1.3 Msun, Z = 0.01, 50 Myr: 2.6e-06
     * Msun from its ends, 2.537907e-06 its own). The envelope (or whole star) takes the very value of the catalogue's
     * env_cz_mass_msun, so that the two files never disagree in a digit.
     */
    static List<CatalogueZone> zones(ConvectiveStructure c, double starMassMsun) {
        double envelopeMassMsun = c.envelopeMass() / Constants.M_SUN;
        List<ConvectiveZone> all = c.zones();
        StructureClass kind = c.structureClass();
        List<CatalogueZone> zones = new ArrayList<>(all.size());
        for (int i = 0; i < all.size(); i++) {
            ConvectiveZone z = all.get(i);
            double lo = clamp(z.innerMassFraction());
            double hi = Math.max(lo, clamp(z.outerMassFraction()));
            double rLo = clamp(z.innerRadiusFraction());
            double rHi = Math.max(rLo, clamp(z.outerRadiusFraction()));
            if (writtenAlike(lo, hi) && writtenAlike(rLo, rHi)) {
                continue;
            }
            boolean first = i == 0 && z.innerMassFraction() <= 0.0;
            ZoneKind zoneKind;
            if (kind == StructureClass.FULLY_CONVECTIVE) {
                zoneKind = ZoneKind.WHOLE_STAR;
            } else if (first && (kind == StructureClass.CONV_CORE || kind == StructureClass.CONV_CORE_AND_ENVELOPE)) {
                zoneKind = ZoneKind.CORE;
            } else if (i == all.size() - 1 && (kind == StructureClass.CONV_ENVELOPE
                    || kind == StructureClass.CONV_CORE_AND_ENVELOPE)) {
                zoneKind = ZoneKind.ENVELOPE;
            } else {
                zoneKind = ZoneKind.SHELL;
            }
            boolean envelope = zoneKind == ZoneKind.ENVELOPE || zoneKind == ZoneKind.WHOLE_STAR;
            double ownMassMsun = envelope ? envelopeMassMsun : (hi - lo) * starMassMsun;
            zones.add(new CatalogueZone(zoneKind, lo, hi, rLo, rHi, ownMassMsun));
        }
        return zones;
    }

    private static boolean writtenAlike(double a, double b) {
        return CsvNumbers.format(a).equals(CsvNumbers.format(b));
    }

    /** A fraction clamped into [0, 1] against round-off at the centre and surface. */
    private static double clamp(double fraction) {
        return Math.min(1.0, Math.max(0.0, fraction));
    }
}
