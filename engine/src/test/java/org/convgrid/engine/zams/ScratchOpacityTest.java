package org.convgrid.engine.zams;

import org.convgrid.engine.physics.opacity.AnalyticCompositeOpacity;
import org.convgrid.engine.physics.eos.StellarPlasmaEos;
import org.convgrid.engine.state.Composition;
import org.junit.jupiter.api.Test;

class ScratchOpacityTest {
    @Test
    void k() {
        var op = AnalyticCompositeOpacity.standard();
        var eos = new StellarPlasmaEos();
        System.out.println("centre " + op.rosselandMean(150, 1.57e7, Composition.scaledSolar(0.35, 0.02)));
        System.out.println("zams centre " + op.rosselandMean(80, 1.36e7, Composition.scaledSolar(0.70, 0.02)));
        System.out.println("bcz " + op.rosselandMean(0.19, 2.2e6, Composition.scaledSolar(0.70, 0.02)));
        Composition c = Composition.scaledSolar(0.70, 0.02);
        for (double t : new double[] {3000, 4000, 5000, 6000, 8000, 1e4, 2e4, 1e5, 1e6}) {
            for (double rho : new double[] {1e-8, 1e-6, 1e-4, 1e-2, 1}) {
                try {
                    System.out.printf("T=%.0f rho=%.0e kappa=%.3e%n", t, rho, op.rosselandMean(rho, t, c).kappa());
                } catch (RuntimeException e) {
                    System.out.println(e.getMessage());
                }
            }
        }
        long t0 = System.nanoTime();
        double s = 0;
        for (int i = 0; i < 100000; i++) {
            s += eos.atDensity(1 + i * 1e-5, 1e7, c).pressure();
        }
        System.out.printf("eos interior %.2f us%n", (System.nanoTime() - t0) / 1e5 / 1e3);
        t0 = System.nanoTime();
        for (int i = 0; i < 100000; i++) {
            s += eos.atDensity(1e-7 * (1 + i * 1e-5), 8000, c).pressure();
        }
        System.out.printf("eos envelope %.2f us%n", (System.nanoTime() - t0) / 1e5 / 1e3);
        t0 = System.nanoTime();
        for (int i = 0; i < 100000; i++) {
            s += op.rosselandMean(1e-7 * (1 + i * 1e-5), 8000, c).kappa();
        }
        System.out.printf("opacity %.2f us%n", (System.nanoTime() - t0) / 1e5 / 1e3);
        var nuc = new org.convgrid.engine.physics.nuclear.HydrogenBurningNetwork();
        t0 = System.nanoTime();
        for (int i = 0; i < 100000; i++) {
            s += nuc.burn(80 * (1 + i * 1e-5), 1.4e7, c).eps();
        }
        System.out.printf("burn %.2f us%n", (System.nanoTime() - t0) / 1e5 / 1e3);
        t0 = System.nanoTime();
        for (int i = 0; i < 100000; i++) {
            s += nuc.equilibrium(80 * (1 + i * 1e-5), 1.4e7, c).h1();
        }
        System.out.printf("equilibrium %.2f us %s%n", (System.nanoTime() - t0) / 1e5 / 1e3, s);
    }
}
