package org.convgrid.engine.structure;

import java.io.PrintStream;
import java.util.Arrays;
import java.util.Locale;

import org.convgrid.engine.physics.PhysicsSet;

/**
 * Test support for probes: relaxes a guess as {@link StructureSolver} does, printing for every evaluation the
 * largest residual of each equation (interval equations mass, hydrostatic, energy, transport; the two central and
 * the two surface conditions) with the point where it lies and the top of the convective core, and for every Newton
 * correction the largest undamped change of each unknown with its point. Shows which equations and points keep a
 * relaxation from converging quadratically. Not thread-safe.
 */
public final class RelaxationTrace implements DifferenceSystem {

    private static final String[] EQUATIONS = {"mass", "hydro", "energy", "transp", "centreMass", "centreLum",
        "surfP", "surfT"};
    private static final String[] UNKNOWNS = {"lnr", "lnrho", "lnT", "L"};

    private final StructureEquations equations;
    private final PrintStream out;
    private final int n;
    private final double[] correction = new double[4];
    private final int[] correctionAt = new int[4];
    private int evaluations;

    private RelaxationTrace(StructureEquations equations, PrintStream out) {
        this.equations = equations;
        this.out = out;
        this.n = equations.points();
    }

    /**
     * Relaxes {@code guess} in thermal equilibrium with the shell compositions from {@code rule}, printing the trace.
     *
     * @return the converged model, or null when the relaxation failed (its report is printed)
     */
    public static StellarModel relax(ModelState guess, PhysicsSet physics, HenyeySolver.Settings settings,
                                     ShellComposition rule, PrintStream out) {
        StructureEquations eq = new StructureEquations(guess.mesh(), guess.compositions(), physics,
                Math.abs(guess.surfaceLuminosity()), null, ExtraEnergy.NONE, 1.0, rule);
        HenyeySolver.Result result = new HenyeySolver().solve(new RelaxationTrace(eq, out), eq.unknowns(guess),
                settings);
        out.println("  -> " + result.report());
        return result.report().converged() ? StellarModel.of(eq, result.solution(), result.report(), physics) : null;
    }

    @Override
    public int points() {
        return n;
    }

    @Override
    public int variables() {
        return equations.variables();
    }

    @Override
    public int centralConditions() {
        return equations.centralConditions();
    }

    @Override
    public void evaluate(double[] y, double[] f, BandMatrix jacobian) {
        equations.evaluate(y, f, jacobian);
        double[] largest = new double[EQUATIONS.length];
        int[] at = new int[EQUATIONS.length];
        for (int i = 0; i < f.length; i++) {
            int kind;
            int point;
            if (i < 2) {
                kind = 4 + i;
                point = 0;
            } else if (i >= f.length - 2) {
                kind = 6 + i - (f.length - 2);
                point = n - 1;
            } else {
                kind = (i - 2) % 4;
                point = (i - 2) / 4;
            }
            if (Math.abs(f[i]) > largest[kind]) {
                largest[kind] = Math.abs(f[i]);
                at[kind] = point;
            }
        }
        int coreTop = -1;
        while (coreTop + 1 < n && equations.convectionAt(coreTop + 1) != null
                && equations.convectionAt(coreTop + 1).convective()) {
            coreTop++;
        }
        StringBuilder line = new StringBuilder(String.format(Locale.ROOT, "  evaluation %2d%s residuals:",
                ++evaluations, jacobian != null ? " (Jacobian)" : ""));
        for (int e = 0; e < EQUATIONS.length; e++) {
            line.append(String.format(Locale.ROOT, " %s %.1e@%d", EQUATIONS[e], largest[e], at[e]));
        }
        out.println(line.append(" core top @").append(coreTop));
    }

    @Override
    public double correctionSize(double[] y, int index, double delta) {
        // the solver asks for every index in order after each Newton solve, then once more for the largest
        double size = equations.correctionSize(y, index, delta);
        if (index == 0) {
            Arrays.fill(correction, 0.0);
        }
        int v = index % 4;
        if (size > correction[v]) {
            correction[v] = size;
            correctionAt[v] = index / 4;
        }
        if (index == y.length - 1) {
            StringBuilder line = new StringBuilder("      correction:");
            for (int u = 0; u < UNKNOWNS.length; u++) {
                line.append(String.format(Locale.ROOT, " %s %.2e@%d", UNKNOWNS[u], correction[u], correctionAt[u]));
            }
            out.println(line);
        }
        return size;
    }
}
