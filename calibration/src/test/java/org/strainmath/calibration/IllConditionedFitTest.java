package org.strainmath.calibration;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.math.BigDecimal;
import java.math.MathContext;

import org.junit.jupiter.api.Test;

/**
 * Calibration data that strain a naive fit: loads spanning ten decades, and loads crowded
 * together far from zero (nearly collinear columns of the design). Oracle: the straight-line
 * least-squares solution of the same double data in 50-digit decimal arithmetic,
 * slope = Sxy/Sxx and intercept = ȳ − slope·x̄ (any regression text).
 */
class IllConditionedFitTest {

    private static final MathContext DIGITS = new MathContext(50);

    private static double[] exactLine(double[] x, double[] y) {
        BigDecimal n = BigDecimal.valueOf(x.length);
        BigDecimal sx = BigDecimal.ZERO;
        BigDecimal sy = BigDecimal.ZERO;
        for (int i = 0; i < x.length; i++) {
            sx = sx.add(new BigDecimal(x[i]));
            sy = sy.add(new BigDecimal(y[i]));
        }
        BigDecimal mx = sx.divide(n, DIGITS);
        BigDecimal my = sy.divide(n, DIGITS);
        BigDecimal sxx = BigDecimal.ZERO;
        BigDecimal sxy = BigDecimal.ZERO;
        for (int i = 0; i < x.length; i++) {
            BigDecimal dx = new BigDecimal(x[i]).subtract(mx);
            sxx = sxx.add(dx.multiply(dx));
            sxy = sxy.add(dx.multiply(new BigDecimal(y[i]).subtract(my)));
        }
        BigDecimal slope = sxy.divide(sxx, DIGITS);
        return new double[] {my.subtract(slope.multiply(mx)).doubleValue(), slope.doubleValue()};
    }

    @Test
    void loadsOverTenDecadesFitAsTheExactSolution() {
        double[] loads = new double[11];
        double[] readings = new double[11];
        for (int i = 0; i < loads.length; i++) {
            loads[i] = Math.pow(10, i - 3);                 // 1e-3 ... 1e7
            readings[i] = 0.5 + 2e-4 * loads[i] + (i % 2 == 0 ? 1e-6 : -1e-6);
        }
        double[] exact = exactLine(loads, readings);
        double[] c = CalibrationFit.of(loads, readings).fit().coefficients();
        // The centred, scaled QR solution is backward stable: relative 1e-12 on the slope, and
        // on the intercept 1e-12 of the largest reading (2000), its absolute scale.
        assertThat(c[1]).isCloseTo(exact[1], within(1e-12 * Math.abs(exact[1])));
        assertThat(c[0]).isCloseTo(exact[0], within(1e-12 * 2000));
    }

    @Test
    void crowdedLoadsFarFromZeroFitAsTheExactSolution() {
        // Loads 1e6 + 0.001·i: the columns 1 and x of the design are collinear to 1e-9, so the
        // normal equations (condition about (1e6/0.003)², 1e17) would lose nearly all 16 digits;
        // centring removes that.
        double[] loads = new double[9];
        double[] readings = new double[9];
        for (int i = 0; i < loads.length; i++) {
            loads[i] = 1e6 + 1e-3 * i;
            readings[i] = 3.0 + 0.25 * (loads[i] - 1e6) + (i % 3 - 1) * 1e-7;
        }
        double[] exact = exactLine(loads, readings);
        double[] c = CalibrationFit.of(loads, readings).fit().coefficients();
        // Condition of the slope: the data's rounding (1e-16 of a reading near 3) over a load
        // span of 0.008 gives a relative 1e-12 or so; 1e-9 leaves room and still catches a
        // wrong factor.
        assertThat(c[1]).isCloseTo(exact[1], within(1e-9 * Math.abs(exact[1])));
        assertThat(c[0] + c[1] * 1e6).as("the line at the data")
                .isCloseTo(exact[0] + exact[1] * 1e6, within(1e-9));
    }
}
