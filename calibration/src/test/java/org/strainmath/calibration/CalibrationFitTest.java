package org.strainmath.calibration;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStreamReader;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;
import java.util.stream.Stream;

import org.apache.commons.math3.distribution.TDistribution;
import org.apache.commons.math3.stat.regression.OLSMultipleLinearRegression;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

/** Calibration fits against NIST's certified values and Commons Math's OLS regression. */
class CalibrationFitTest {

    /** The Pontius data of the test resource (NIST StRD; see its header): {loads, readings}. */
    private static double[][] pontius() throws IOException {
        List<double[]> rows = new ArrayList<>();
        try (BufferedReader in = new BufferedReader(new InputStreamReader(
                CalibrationFitTest.class.getResourceAsStream("/nist-strd-pontius.txt"),
                StandardCharsets.UTF_8))) {
            for (String line = in.readLine(); line != null; line = in.readLine()) {
                String t = line.trim();
                if (t.isEmpty() || t.startsWith("#")) {
                    continue;
                }
                String[] parts = t.split("\\s+");
                rows.add(new double[] {Double.parseDouble(parts[1]), Double.parseDouble(parts[0])});
            }
        }
        double[][] out = new double[2][rows.size()];
        for (int i = 0; i < rows.size(); i++) {
            out[0][i] = rows.get(i)[0];
            out[1][i] = rows.get(i)[1];
        }
        return out;
    }

    private static void digits(double actual, double certified, double relative) {
        assertThat(actual).isCloseTo(certified, within(Math.abs(certified) * relative));
    }

    @Test
    void pontiusMatchesTheCertifiedValuesToTenDigits() throws IOException {
        // NIST StRD Pontius, certified values (test resource header): 10 significant digits
        // asked, 1e-10 relative.
        double[][] data = pontius();
        assertThat(data[0]).hasSize(40);
        FitResult fit = CalibrationFit.of(data[0], data[1]).withDegree(2).fit();
        double[] c = fit.coefficients();
        double[] se = fit.standardErrors();
        digits(c[0], 0.673565789473684E-03, 1e-10);
        digits(c[1], 0.732059160401003E-06, 1e-10);
        digits(c[2], -0.316081871345029E-14, 1e-10);
        digits(se[0], 0.107938612033077E-03, 1e-10);
        digits(se[1], 0.157817399981659E-09, 1e-10);
        digits(se[2], 0.486652849992036E-16, 1e-10);
        digits(fit.residualStandardDeviation(), 0.205177424076185E-03, 1e-10);
        digits(fit.rSquared(), 0.999999900178537, 1e-14);
        AnovaTable anova = fit.anova();
        assertThat(anova.regressionDegrees()).isEqualTo(2);
        assertThat(anova.residualDegrees()).isEqualTo(37);
        digits(anova.regressionSumOfSquares(), 15.6040343244198, 1e-10);
        digits(anova.regressionMeanSquare(), 7.80201716220991, 1e-10);
        digits(anova.residualSumOfSquares(), 0.155761768796992E-05, 1e-10);
        digits(anova.residualMeanSquare(), 0.420977753505385E-07, 1e-10);
        digits(anova.fStatistic(), 185330865.995752, 1e-10);
        assertThat(fit.degreesOfFreedom()).isEqualTo(37);
        // Centred and scaled, the problem is well conditioned; in raw units it is not.
        assertThat(fit.conditionNumber()).isLessThan(10);
        assertThat(fit.rawConditionNumber()).isGreaterThan(1e10);
    }

    @Test
    void theThermometerCalibrationOfGumAnnexH3() {
        // JCGM 100:2008 (GUM), H.3: b(t) = y1 + y2·(t − t0), t0 = 20 °C, fitted to eleven
        // readings; printed: y1 = −0.1712 °C, u = 0.0029 °C; y2 = 0.00218, u = 0.00067;
        // r(y1, y2) = −0.930; b(30 °C) = −0.1494 °C with u = 0.0041 °C. (The issue lists the
        // data and the printed results.)
        double[] t = {21.521, 22.012, 22.512, 23.003, 23.507, 23.999, 24.513, 25.002, 25.503,
            26.010, 26.511};
        double[] b = {-0.171, -0.169, -0.166, -0.159, -0.164, -0.165, -0.156, -0.157, -0.159,
            -0.161, -0.160};
        double[] x = new double[t.length];
        for (int i = 0; i < t.length; i++) {
            x[i] = t[i] - 20;
        }
        FitResult fit = CalibrationFit.of(x, b).fit();
        double[] c = fit.coefficients();
        double[] u = fit.standardErrors();
        assertThat(c[0]).isCloseTo(-0.1712, within(0.00005));
        assertThat(u[0]).isCloseTo(0.0029, within(0.00005));
        assertThat(c[1]).isCloseTo(0.00218, within(0.000005));
        assertThat(u[1]).isCloseTo(0.00067, within(0.000005));
        double r = fit.covariance()[0][1] / (u[0] * u[1]);
        assertThat(r).isCloseTo(-0.930, within(0.0005));
        double at30 = fit.readingAt(10);
        assertThat(at30).isCloseTo(-0.1494, within(0.00005));
        // The GUM's u(b(30 °C)) is the standard uncertainty of the fitted curve, √(gᵀ·Cov·g).
        assertThat(fit.standardUncertaintyAt(10)).isCloseTo(0.0041, within(0.00005));
    }

    static Stream<Arguments> randomData() {
        SplittableRandom random = new SplittableRandom(0xF17);
        return Stream.generate(() -> {
            int n = 8 + random.nextInt(30);
            int degree = 1 + random.nextInt(3);
            double[] x = new double[n];
            double[] y = new double[n];
            double[] w = new double[n];
            for (int i = 0; i < n; i++) {
                x[i] = random.nextDouble(-5, 20);
                y[i] = 0.3 - 1.2 * x[i] + 0.05 * x[i] * x[i] + random.nextGaussian() * 0.2;
                w[i] = random.nextDouble(0.5, 2);
            }
            return Arguments.of(x, y, w, degree, random.nextBoolean());
        }).limit(60);
    }

    @ParameterizedTest(name = "[{index}] degree {3}, intercept {4}")
    @MethodSource("randomData")
    void matchesCommonsMathOrdinaryLeastSquares(double[] x, double[] y, double[] w, int degree,
            boolean intercept) {
        // Oracle: Commons Math OLSMultipleLinearRegression on the raw powers of x (well
        // conditioned here), weighted by scaling each row with √w; 1e-10 relative.
        int first = intercept ? 0 : 1;
        int p = degree + 1 - first;
        double[][] design = new double[x.length][p];
        double[] yy = new double[x.length];
        for (int i = 0; i < x.length; i++) {
            double root = Math.sqrt(w[i]);
            for (int j = 0; j < p; j++) {
                design[i][j] = root * Math.pow(x[i], j + first);
            }
            yy[i] = root * y[i];
        }
        OLSMultipleLinearRegression ols = new OLSMultipleLinearRegression();
        ols.setNoIntercept(true);
        ols.newSampleData(yy, design);
        double[] expected = ols.estimateRegressionParameters();
        double[] expectedErrors = ols.estimateRegressionParametersStandardErrors();
        CalibrationFit config = CalibrationFit.of(x, y).withDegree(degree).withWeights(w);
        FitResult fit = (intercept ? config : config.withoutIntercept()).fit();
        double[] c = fit.coefficients();
        double[] se = fit.standardErrors();
        double scale = 0;
        for (double v : expected) {
            scale = Math.max(scale, Math.abs(v));
        }
        for (int j = 0; j < p; j++) {
            assertThat(c[j]).isCloseTo(expected[j], within(scale * 1e-10));
            assertThat(se[j]).isCloseTo(expectedErrors[j], within(expectedErrors[j] * 1e-10));
        }
        assertThat(fit.residualStandardDeviation())
                .isCloseTo(Math.sqrt(ols.estimateErrorVariance()), within(1e-10));
    }

    @Test
    void intervalsOfAStraightLineFollowTheTextbookForms() {
        // Straight line (Draper and Smith, Applied Regression Analysis, ch. 1): at x0,
        // CI half-width t·s·√(1/n + (x0 − x̄)²/Sxx), PI half-width t·s·√(1 + 1/n + (x0 − x̄)²/Sxx).
        double[] x = {0, 1, 2, 3, 4, 5, 6, 7};
        double[] y = {0.02, 1.01, 1.97, 3.05, 3.98, 5.03, 5.96, 7.04};
        FitResult fit = CalibrationFit.of(x, y).fit();
        double mean = 3.5;
        double sxx = 42;
        double s = fit.residualStandardDeviation();
        double t = new TDistribution(6).inverseCumulativeProbability(0.975);
        double x0 = 6.5;
        Interval ci = fit.confidenceInterval(x0, 0.95);
        Interval pi = fit.predictionInterval(x0, 0.95);
        assertThat(ci.halfWidth()).isCloseTo(t * s * Math.sqrt(1.0 / 8 + (x0 - mean) * (x0 - mean) / sxx), within(1e-14));
        assertThat(pi.halfWidth()).isCloseTo(t * s * Math.sqrt(1 + 1.0 / 8 + (x0 - mean) * (x0 - mean) / sxx), within(1e-14));
        assertThat(ci.estimate()).isEqualTo(fit.readingAt(x0));
        assertThat(ci.lower()).isLessThan(ci.estimate());
        assertThat(pi.upper() - pi.lower()).isCloseTo(2 * pi.halfWidth(), within(1e-15));
        // Inverse of a straight line: exact.
        assertThat(fit.loadAt(fit.readingAt(2.25))).isCloseTo(2.25, within(1e-14));
    }

    @Test
    void theInverseOfACurveStaysInsideTheCalibratedRangeUnlessAsked() throws IOException {
        double[][] data = pontius();
        FitResult fit = CalibrationFit.of(data[0], data[1]).withDegree(2).fit();
        for (double load : new double[] {150_000, 777_777, 2_999_999}) {
            assertThat(fit.loadAt(fit.readingAt(load))).isCloseTo(load, within(load * 1e-12));
        }
        double beyond = fit.readingAt(3_300_000);
        assertThatThrownBy(() -> fit.loadAt(beyond))
                .isInstanceOf(IllegalArgumentException.class)
                .hasMessageContaining("outside the readings of the calibrated range")
                .hasMessageEndingWith("pass extrapolate = true to search beyond it");
        assertThat(fit.loadAt(beyond, true)).isCloseTo(3_300_000, within(1e-3));
        assertThat(fit.lowestLoad()).isEqualTo(150_000);
        assertThat(fit.highestLoad()).isEqualTo(3_000_000);
        // A curve whose slope changes sign inside the range has no single inverse.
        double[] x = {0, 1, 2, 3, 4, 5};
        double[] y = {0, 3, 4, 4.1, 3.2, 1.9};
        FitResult hump = CalibrationFit.of(x, y).withDegree(2).fit();
        assertThatThrownBy(() -> hump.loadAt(3.0)).isInstanceOf(ArithmeticException.class)
                .hasMessageStartingWith("the fitted curve is not monotonic over [0.0, 5.0]");
        // Degree 1: outside the range, refused unless asked.
        FitResult line = CalibrationFit.of(new double[] {0, 1, 2}, new double[] {0, 1.1, 1.9}).fit();
        assertThatThrownBy(() -> line.loadAt(5)).hasMessageEndingWith("pass extrapolate = true to allow it");
        assertThat(line.loadAt(2.5, true)).isCloseTo((2.5 - line.coefficients()[0]) / line.coefficients()[1], within(1e-12));
    }

    @Test
    void theLoadBudgetIsTheFirstOrderClosedForm() throws IOException {
        // u(x)² = (u(r)² + u_fit(x)²)/(dŷ/dx)² (GUM 5.1.2 applied to x = ŷ⁻¹(r − δ)).
        double[][] data = pontius();
        FitResult fit = CalibrationFit.of(data[0], data[1]).withDegree(2).fit();
        org.strainmath.uncertainty.InputQuantity reading =
                org.strainmath.uncertainty.InputQuantity.ofStandardUncertainty("deflection", 1.2, 2e-4);
        org.strainmath.uncertainty.UncertaintyResult r = fit.loadBudget(reading).evaluate(0.95);
        double load = fit.loadAt(1.2);
        double slope = fit.slopeAt(load);
        double expected = Math.sqrt(4e-8 + Math.pow(fit.standardUncertaintyAt(load), 2)) / slope;
        assertThat(r.estimate()).isCloseTo(load, within(load * 1e-12));
        assertThat(r.combinedStandardUncertainty()).isCloseTo(expected, within(expected * 1e-6));
        // The slope of Pontius' quadratic: c1 + 2·c2·x.
        double[] c = fit.coefficients();
        assertThat(slope).isCloseTo(c[1] + 2 * c[2] * load, within(Math.abs(slope) * 1e-10));
        assertThat(r.contributions()).hasSize(2);
    }

    @Test
    void badDataIsRefusedBeforeAnythingIsComputed() {
        assertThatThrownBy(() -> CalibrationFit.of(new double[] {1, 2}, new double[] {1}))
                .hasMessage("loads and readings must have the same length: 2 and 1");
        assertThatThrownBy(() -> CalibrationFit.of(new double[] {1, Double.NaN}, new double[] {1, 2}))
                .hasMessage("loads[1] must be finite: NaN");
        assertThatThrownBy(() -> CalibrationFit.of(new double[] {1, 2, 3}, new double[] {1, 2, 3})
                .withDegree(2).fit())
                .isInstanceOf(IllegalArgumentException.class)
                .hasMessage("a fit of 3 coefficients needs more than 3 points (one degree of freedom at least): 3");
        assertThatThrownBy(() -> CalibrationFit.of(new double[] {2, 2, 2, 2}, new double[] {1, 2, 3, 4}).fit())
                .isInstanceOf(ArithmeticException.class).hasMessage("the design is singular: every load is 2.0");
        assertThatThrownBy(() -> CalibrationFit.of(new double[] {1, 1, 2, 2, 1}, new double[] {1, 2, 3, 4, 5})
                .withDegree(2).fit())
                .isInstanceOf(ArithmeticException.class)
                .hasMessage("the design is singular: 2 distinct loads cannot fix 3 coefficients");
        assertThatThrownBy(() -> CalibrationFit.of(new double[0], new double[0]).withDegree(4))
                .hasMessage("degree must be 1 to 3 (use withDegreeInsisting for more): 4");
        assertThatThrownBy(() -> CalibrationFit.of(new double[0], new double[0]).withDegreeInsisting(11))
                .hasMessage("degree must be 1 to 10: 11");
        assertThatThrownBy(() -> CalibrationFit.of(new double[] {1}, new double[] {1}).withWeights(new double[] {0}))
                .hasMessage("weights[0] must be > 0 and finite: 0.0");
        assertThatThrownBy(() -> CalibrationFit.of(new double[] {1}, new double[] {1}).withWeights(new double[2]))
                .hasMessage("weights must have one value per point, 1: 2");
        FitResult fit = CalibrationFit.of(new double[] {0, 1, 2}, new double[] {0, 1.1, 1.9}).fit();
        assertThatThrownBy(() -> fit.confidenceInterval(1, 1.0)).hasMessage("probability must be in (0.0, 1.0): 1.0");
        assertThatThrownBy(() -> fit.readingAt(Double.NaN)).hasMessage("load must be finite: NaN");
    }

    @Test
    void aHighDegreeIsGivenOnlyWhenInsistedOn() {
        double[] x = {0, 1, 2, 3, 4, 5, 6, 7, 8, 9};
        double[] y = new double[x.length];
        for (int i = 0; i < x.length; i++) {
            y[i] = 1 + x[i] + 0.01 * Math.pow(x[i], 4);
        }
        FitResult quartic = CalibrationFit.of(x, y).withDegreeInsisting(4).fit();
        // Exact data of degree 4: the residuals vanish (to rounding).
        assertThat(quartic.coefficients()[4]).isCloseTo(0.01, within(1e-12));
        assertThat(quartic.residualStandardDeviation()).isLessThan(1e-12);
        assertThat(CalibrationFit.of(x, y).withDegree(3).withoutIntercept().toString())
                .isEqualTo("CalibrationFit[degree 3 without intercept, 10 points]");
    }

    @Test
    void aFitPrintsEachCoefficientInItsOwnUnit() {
        // By hand: the readings 0.5 + 2x + 0.1x² exactly, so the coefficients are 0.5, 2 and 0.1.
        double[] kn = {0, 1, 2, 3, 4, 5};
        double[] mvPerV = new double[kn.length];
        for (int i = 0; i < kn.length; i++) {
            mvPerV[i] = 0.5 + 2 * kn[i] + 0.1 * kn[i] * kn[i];
        }
        CalibrationFit plain = CalibrationFit.of(kn, mvPerV).withDegree(2);
        FitResult fit = plain.withUnits(" kN", "mV/V ").fit();
        assertThat(fit.coefficients()).containsExactly(plain.fit().coefficients());
        String[] lines = fit.toString().split("\\R");
        assertThat(lines[0]).isEqualTo("FitResult[degree 2 with intercept, 6 points, 3 degrees of"
                + " freedom; load in kN, reading in mV/V]");
        assertThat(lines[1]).startsWith("  term  coefficient").endsWith("unit");
        assertThat(lines[2]).startsWith("  x^0 ").endsWith(" mV/V");
        assertThat(lines[3]).startsWith("  x^1 ").endsWith(" mV/V per kN");
        assertThat(lines[4]).startsWith("  x^2 ").endsWith(" mV/V per kN²");
        assertThat(lines[5]).startsWith("  residual standard deviation ").contains(" mV/V, R² ");
        // Units survive the other settings, and the text without them is as before.
        assertThat(plain.withUnits("kN", "mV/V").withoutIntercept().fit().toString())
                .contains("x^1").contains("mV/V per kN").doesNotContain("x^0");
        assertThat(plain.fit().toString()).doesNotContain("unit").doesNotContain("load in");
        assertThatThrownBy(() -> plain.withUnits("kN", " ")).isInstanceOf(IllegalArgumentException.class)
                .hasMessage("loadUnit and readingUnit must not be blank: \"kN\", \" \"");
        assertThatThrownBy(() -> plain.withUnits(null, "mV/V")).isInstanceOf(NullPointerException.class)
                .hasMessage("loadUnit");
    }
}
