package org.strainmath.history;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.util.SplittableRandom;

import org.junit.jupiter.api.Test;
import org.strainmath.bridge.AdcInput;
import org.strainmath.bridge.Bridge;
import org.strainmath.bridge.StrainChannel;
import org.strainmath.bridge.StrainGauge;
import org.strainmath.material.PlaneStress;
import org.strainmath.quantity.Angle;

/**
 * From a channel's or a rosette's output to a history: the block helpers, and the count of a
 * strain channel's kernel output, NaN samples and all.
 */
class HistoriesTest {

    @Test
    void theLargerMagnitudeKeepsItsSign() {
        // By hand: |100| > |-20|, |-80| > |50|, a tie takes s1, NaN anywhere gives NaN.
        double[] s1 = {100, 50, -10, Double.NaN, 3, Double.POSITIVE_INFINITY};
        double[] s2 = {-20, -80, 10, 5, Double.NaN, 1};
        double[] out = new double[6];
        assertThat(Histories.largerMagnitude(s1, s2, 0, out, 0, 6)).isEqualTo(3);
        assertThat(out).containsExactly(100, -80, -10, Double.NaN, Double.NaN, Double.NaN);
        // in place, into s1
        assertThat(Histories.largerMagnitude(s1, s2, 0, s1, 0, 3)).isZero();
        assertThat(s1).startsWith(100, -80, -10);
        assertThatThrownBy(() -> Histories.largerMagnitude(s1, s2, 0, s1, 1, 3))
                .isInstanceOf(IllegalArgumentException.class)
                .hasMessageStartingWith("s1 must not overlap dst");
        assertThatThrownBy(() -> Histories.largerMagnitude(null, s2, 0, out, 0, 1))
                .isInstanceOf(NullPointerException.class).hasMessage("s1");
    }

    @Test
    void theNormalStressOnAPlaneIsTheTransformationOfTheState() {
        // Oracle: PlaneStress.normalStressAt, the value API's transformation (its own tests
        // check it against Gere and Goodno); and by hand at 0° and 90°.
        SplittableRandom random = new SplittableRandom(8);
        int n = 500;
        double[] sxx = new double[n];
        double[] syy = new double[n];
        double[] txy = new double[n];
        for (int i = 0; i < n; i++) {
            sxx[i] = 2e8 * (random.nextDouble() - 0.5);
            syy[i] = 2e8 * (random.nextDouble() - 0.5);
            txy[i] = 1e8 * (random.nextDouble() - 0.5);
        }
        double[] out = new double[n];
        for (double degrees : new double[] {0, 17.5, 45, 90, 135, -60}) {
            assertThat(Histories.normalOnPlane(sxx, syy, txy, 0, Angle.ofDegrees(degrees), out, 0,
                    n)).isZero();
            for (int i = 0; i < n; i++) {
                double expected = new PlaneStress(sxx[i], syy[i], txy[i])
                        .normalStressAt(Angle.ofDegrees(degrees)).toPascals();
                assertThat(out[i]).as("%s° sample %d", degrees, i)
                        .isCloseTo(expected, within(1e-7 * 2e8));
            }
        }
        Histories.normalOnPlane(sxx, syy, txy, 0, Angle.ZERO, out, 0, n);
        assertThat(out[7]).isCloseTo(sxx[7], within(1e-6));
        Histories.normalOnPlane(sxx, syy, txy, 0, Angle.ofDegrees(90), out, 0, n);
        assertThat(out[7]).isCloseTo(syy[7], within(1e-6));
        assertThatThrownBy(() -> Histories.normalOnPlane(sxx, syy, txy, 0, null, out, 0, n))
                .isInstanceOf(NullPointerException.class).hasMessage("plane");
    }

    @Test
    void aChannelsKernelOutputCountsAsTheStrainItMeasures() {
        // A quarter bridge read by a 24-bit converter; codes made from a known strain history
        // through the bridge's forward equation (the library's own, checked against the
        // textbook bridge equation in its tests); a few codes at the converter's rail, which
        // the channel returns as NaN. The count of the channel's output must be the count of
        // the known history, to within the strain of two codes, with the NaN samples skipped.
        Bridge bridge = Bridge.quarter(StrainGauge.ofOhms(350, 2.1));
        AdcInput adc = AdcInput.ratiometric(24, 128);
        StrainChannel channel = StrainChannel.of(bridge, adc);
        double perCode = adc.ratioPerCode().toVoltsPerVolt();
        SplittableRandom random = new SplittableRandom(2024);
        int n = 20_000;
        double[] truth = new double[n];
        int[] codes = new int[n];
        int rails = 0;
        for (int i = 0; i < n; i++) {
            truth[i] = 600e-6 * Math.sin(i * 0.013) * Math.sin(i * 0.0011) + 40e-6 * Math.sin(i * 0.3);
            codes[i] = (int) Math.round(bridge.toRatio(truth[i]) / perCode);
            if (random.nextInt(500) == 0) {
                codes[i] = (1 << 23) - 1;            // the rail: no strain
                truth[i] = Double.NaN;
                rails++;
            }
        }
        double[] strain = new double[n];
        int bad = 0;
        Rainflow rainflow = Rainflow.astm().withGate(2e-6);
        RangeHistogram measured = RangeHistogram.of(Bins.uniform(0, 1400e-6, 14));
        RainflowCounter counter = rainflow.newCounter(measured);
        for (int i = 0; i < n; i += 1000) {
            bad += channel.toStrain(codes, i, strain, i, 1000);
            assertThat(counter.accept(strain, i, 1000)).isEqualTo(count(strain, i, 1000));
        }
        counter.residueTo(measured);
        assertThat(bad).isEqualTo(rails).isPositive();
        assertThat(counter.skipped()).isEqualTo(rails);
        Cycles expected = rainflow.count(truth);
        Cycles got = rainflow.count(strain);
        assertThat(got.size()).isEqualTo(expected.size());
        // a code is about 4·r/K of strain in a quarter bridge (r the ratio per code; the
        // linearised bridge equation, common practice, no source)
        double twoCodes = 2 * 4 * perCode / 2.1;
        for (int i = 0; i < got.size(); i++) {
            assertThat(got.range(i)).isCloseTo(expected.range(i), within(twoCodes));
        }
        assertThat(measured.counts()).containsExactly(got.rangeHistogram(Bins.uniform(0, 1400e-6,
                14)).counts());
    }

    private static int count(double[] a, int off, int len) {
        int n = 0;
        for (int i = off; i < off + len; i++) {
            n += Double.isNaN(a[i]) ? 1 : 0;
        }
        return n;
    }

    @Test
    void blockArgumentsOfThePlaneNormalAreCheckedAndNaNIsCounted() {
        // By hand at 45° (cos 90° = 0, sin 90° = 1): σn = (σx + σy)/2 + τxy = (2 + 4)/2 + 3 = 6;
        // a NaN sample gives NaN and is counted.
        double[] sxx = {2, Double.NaN, 2};
        double[] syy = {4, 4, 4};
        double[] txy = {3, 3, 3};
        double[] out = new double[3];
        assertThat(Histories.normalOnPlane(sxx, syy, txy, 0, Angle.ofDegrees(45), out, 0, 3))
                .isEqualTo(1);
        assertThat(out[0]).isCloseTo(6.0, within(1e-15));
        assertThat(out[1]).isNaN();
        assertThatThrownBy(() -> Histories.normalOnPlane(sxx, syy, txy, 1, Angle.ZERO, out, 0, 3))
                .isInstanceOf(IndexOutOfBoundsException.class);
        assertThatThrownBy(() -> Histories.normalOnPlane(sxx, syy, txy, 0, Angle.ZERO, out, 1, 3))
                .isInstanceOf(IndexOutOfBoundsException.class);
        assertThatThrownBy(() -> Histories.normalOnPlane(sxx, syy, new double[2], 0, Angle.ZERO,
                out, 0, 3)).isInstanceOf(IndexOutOfBoundsException.class);
        double[] shared = {2, 4, 3, 0};
        for (double[] input : new double[][] {sxx, syy, txy}) {
            double[] x = input == sxx ? shared : sxx;
            double[] y = input == syy ? shared : syy;
            double[] t = input == txy ? shared : txy;
            assertThatThrownBy(() -> Histories.normalOnPlane(x, y, t, 0, Angle.ZERO, shared, 1, 3))
                    .isInstanceOf(IllegalArgumentException.class)
                    .hasMessageContaining("must not overlap dst");
        }
        assertThatThrownBy(() -> Histories.largerMagnitude(new double[3], new double[3], 0,
                new double[2], 0, 3)).isInstanceOf(IndexOutOfBoundsException.class);
        assertThatThrownBy(() -> Histories.largerMagnitude(new double[3], new double[2], 0,
                new double[3], 0, 3)).isInstanceOf(IndexOutOfBoundsException.class);
        double[] s2 = {1, 2, 3, 4};
        assertThatThrownBy(() -> Histories.largerMagnitude(new double[4], s2, 0, s2, 1, 3))
                .isInstanceOf(IllegalArgumentException.class)
                .hasMessageStartingWith("s2 must not overlap dst");
    }
}
