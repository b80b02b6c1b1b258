package org.strainmath.calibration;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.Test;

/**
 * Transducer performance on a small hand-checkable calibration, invented for the test: a
 * 100 kN load cell, two ascending runs and one descending, readings in mV/V.
 */
class TransducerCalibrationTest {

    private static final double[] UP = {0, 25, 50, 75, 100};
    private static final double[] DOWN = {100, 75, 50, 25, 0};
    private static final double[] ASC1 = {0.000, 0.502, 1.003, 1.502, 2.000};
    private static final double[] DESC1 = {2.000, 1.505, 1.006, 0.504, 0.001};
    private static final double[] ASC2 = {0.001, 0.503, 1.004, 1.503, 2.001};

    private static TransducerCalibration calibration(double scale) {
        return TransducerCalibration.of(100)
                .withRun(CalibrationRun.ascending(UP, times(ASC1, scale)))
                .withRun(CalibrationRun.descending(DOWN, times(DESC1, scale)))
                .withRun(CalibrationRun.ascending(UP, times(ASC2, scale)))
                .withZeroReadings(0.000 * scale, 0.0012 * scale);
    }

    private static double[] times(double[] values, double scale) {
        double[] out = new double[values.length];
        for (int i = 0; i < values.length; i++) {
            out[i] = values[i] * scale;
        }
        return out;
    }

    @Test
    void eachFigureAsWorkedOutByHand() {
        TransducerCalibration cal = calibration(1);
        // Rated output: mean of (2.000 − 0.000) and (2.001 − 0.001) = 2.000 mV/V.
        assertThat(cal.ratedOutput()).isCloseTo(2.000, within(1e-12));
        assertThat(cal.sensitivity()).isCloseTo(0.02, within(1e-14));
        assertThat(cal.zeroBalancePercent()).isCloseTo(0, within(1e-12));
        // Terminal lines 0.02·x and 0.001 + 0.02·x: worst deviation 0.003 at 50 kN → 0.15 %.
        assertThat(cal.nonlinearityTerminalPercent()).isCloseTo(0.15, within(1e-9));
        // Descending minus ascending: 0.003 at 75 and 50 kN → 0.15 %.
        assertThat(cal.hysteresisPercent()).hasValueCloseTo(0.15, within(1e-9));
        // Spread over the two ascending runs: 0.001 at every load → 0.05 %.
        assertThat(cal.repeatabilityPercent()).hasValueCloseTo(0.05, within(1e-9));
        // Zero after 0.0012 minus zero before 0 → 0.06 %.
        assertThat(cal.zeroReturnPercent()).isCloseTo(0.06, within(1e-9));
        // Line through the mean zero 0.0005 and slope 0.02: worst is the descending 1.006 at
        // 50 kN, 0.0055 off → 0.275 %.
        assertThat(cal.combinedErrorPercent()).isCloseTo(0.275, within(1e-9));
        // Best-fit line: the closed-form least-squares line of the ten ascending points
        // (any statistics text), its largest residual over the rated output.
        double[] x = new double[10];
        double[] y = new double[10];
        for (int i = 0; i < 5; i++) {
            x[i] = UP[i];
            x[i + 5] = UP[i];
            y[i] = ASC1[i];
            y[i + 5] = ASC2[i];
        }
        double mx = 50;
        double my = 0;
        for (double v : y) {
            my += v / 10;
        }
        double sxy = 0;
        double sxx = 0;
        for (int i = 0; i < 10; i++) {
            sxy += (x[i] - mx) * (y[i] - my);
            sxx += (x[i] - mx) * (x[i] - mx);
        }
        double b = sxy / sxx;
        double a = my - b * mx;
        double worst = 0;
        double rss = 0;
        for (int i = 0; i < 10; i++) {
            double r = y[i] - (a + b * x[i]);
            worst = Math.max(worst, Math.abs(r));
            rss += r * r;
        }
        assertThat(cal.nonlinearityBestFitPercent()).isCloseTo(100 * worst / 2.0, within(1e-9));
        // Lower limit factor, 2.4 × the residual standard deviation in load units (ASTM E74,
        // from memory), and the lowest load for a multiplier of 400.
        double llf = 2.4 * Math.sqrt(rss / 8) / 0.02;
        assertThat(cal.lowerLimitFactor(1)).isCloseTo(llf, within(llf * 1e-9));
        assertThat(cal.lowestLoad(400, 1)).isCloseTo(400 * llf, within(llf * 1e-6));
        assertThat(cal.toString()).startsWith("TransducerCalibration[capacity 100.0, 3 runs]")
                .contains("hysteresis            0.15 %");
    }

    @Test
    void aPerfectlyLinearTransducerHasNoNonlinearityOrHysteresis() {
        // By hand: readings exactly proportional to load, the same up and down, have no error of
        // any kind.
        double[] up = {0, 0.5, 1.0, 1.5, 2.0};
        double[] down = {2.0, 1.5, 1.0, 0.5, 0};
        TransducerCalibration cal = TransducerCalibration.of(100)
                .withRun(CalibrationRun.ascending(UP, up))
                .withRun(CalibrationRun.descending(DOWN, down));
        assertThat(cal.nonlinearityTerminalPercent()).isZero();
        assertThat(cal.nonlinearityBestFitPercent()).isCloseTo(0, within(1e-12));
        assertThat(cal.hysteresisPercent()).hasValue(0.0);
        assertThat(cal.combinedErrorPercent()).isZero();
        assertThat(cal.repeatabilityPercent()).isEmpty();
        assertThat(cal.zeroReturnPercent()).isZero();
    }

    @Test
    void scalingTheReadingsScalesNothingInPercentOfRatedOutput() {
        // Definition: every error is in percent of rated output, so scaling the readings leaves it
        // unchanged.
        TransducerCalibration one = calibration(1);
        TransducerCalibration scaled = calibration(3.7);
        assertThat(scaled.ratedOutput()).isCloseTo(3.7 * one.ratedOutput(), within(1e-12));
        assertThat(scaled.nonlinearityTerminalPercent()).isCloseTo(one.nonlinearityTerminalPercent(), within(1e-9));
        assertThat(scaled.nonlinearityBestFitPercent()).isCloseTo(one.nonlinearityBestFitPercent(), within(1e-9));
        assertThat(scaled.hysteresisPercent().getAsDouble()).isCloseTo(one.hysteresisPercent().getAsDouble(), within(1e-9));
        assertThat(scaled.repeatabilityPercent().getAsDouble()).isCloseTo(one.repeatabilityPercent().getAsDouble(), within(1e-9));
        assertThat(scaled.combinedErrorPercent()).isCloseTo(one.combinedErrorPercent(), within(1e-9));
        assertThat(scaled.zeroReturnPercent()).isCloseTo(one.zeroReturnPercent(), within(1e-9));
    }

    @Test
    void badRunsAreRefused() {
        assertThatThrownBy(() -> CalibrationRun.ascending(new double[] {0, 50, 40, 100}, new double[4]))
                .isInstanceOf(IllegalArgumentException.class)
                .hasMessage("loads must increase within an ascending run: 50.0 then 40.0 at point 2");
        assertThatThrownBy(() -> CalibrationRun.descending(new double[] {100, 100}, new double[2]))
                .hasMessage("loads must decrease within a descending run: 100.0 then 100.0 at point 1");
        assertThatThrownBy(() -> CalibrationRun.ascending(new double[] {0, 1}, new double[] {0, Double.NaN}))
                .hasMessage("point 1 must be finite: load 1.0, reading NaN");
        assertThatThrownBy(() -> CalibrationRun.ascending(new double[] {0}, new double[] {0}))
                .hasMessage("a run needs at least two points: 1");
        assertThatThrownBy(() -> TransducerCalibration.of(100).withRun(
                CalibrationRun.ascending(new double[] {0, 50}, new double[] {0, 1})))
                .hasMessage("an ascending run must go from 0 to the capacity 100.0: "
                        + "CalibrationRun[ascending, 2 points, 0.0 to 50.0]");
        assertThatThrownBy(() -> TransducerCalibration.of(0)).hasMessage("capacity must be > 0 and finite: 0.0");
        assertThatThrownBy(() -> TransducerCalibration.of(100).ratedOutput())
                .isInstanceOf(IllegalStateException.class)
                .hasMessage("the calibration needs an ascending run");
        TransducerCalibration noReturn = TransducerCalibration.of(100)
                .withRun(CalibrationRun.ascending(UP, ASC1));
        assertThatThrownBy(noReturn::zeroReturnPercent).isInstanceOf(IllegalStateException.class)
                .hasMessage("no zero reading after the runs (no descending run ends at zero load):"
                        + " use withZeroReadings");
        assertThatThrownBy(() -> noReturn.lowestLoad(0, 1)).hasMessage("multiplier must be > 0 and finite: 0.0");
    }
}
