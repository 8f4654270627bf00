package org.convgrid.engine.calibration;

import org.convgrid.engine.units.Constants;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.condition.EnabledIfSystemProperty;

/** Not a test: prints every trial of a solar calibration. Run with -Dconvgrid.probe=true. */
@EnabledIfSystemProperty(named = "convgrid.probe", matches = "true")
class CalibrationProbe {

    @Test
    void calibrate() {
        long t0 = System.nanoTime();
        CalibratedSun sun = new SolarCalibration(CalibrationSettings.DEFAULT).calibrate(t -> System.out.printf(
                "%7.2f s alpha=%.5f Y=%.5f Z=%.5f lnR=%+.3e lnL=%+.3e Lzams=%.4f steps=%d%n",
                (System.nanoTime() - t0) / 1e9, t.mixingLength(), t.helium(), t.metals(), t.radiusResidual(),
                t.luminosityResidual(), t.zeroAgeLuminosity() / Constants.L_SUN, t.evolution().steps().size()));
        System.out.printf("alpha=%.5f Y=%.5f Z=%.5f rcz=%.4f Tc=%.4e rhoc=%.2f Lzams/L=%.4f life=%.3f evols=%d "
                        + "newton=%d resid=%.2e %.2e time=%.1f s%n", sun.mixingLength(), sun.helium(), sun.metals(),
                sun.envelopeBaseRadiusFraction(), sun.centralTemperature(), sun.centralDensity(),
                sun.zeroAgeLuminosity() / Constants.L_SUN, sun.exhaustionAge() / Constants.GYR, sun.evolutions(),
                sun.newtonSteps(), sun.radiusResidual(), sun.luminosityResidual(), (System.nanoTime() - t0) / 1e9);
    }
}
