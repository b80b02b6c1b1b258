package org.strainmath.bridge;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.util.Arrays;
import java.util.SplittableRandom;
import java.util.function.DoubleUnaryOperator;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.EnumSource;
import org.strainmath.quantity.VoltageRatio;

/** The block kernels against the scalar functions they share, bit for bit. */
class BridgeKernelTest {

    private static final int LENGTH = 5000;

    /** Realistic ratios and strains with a share of NaN, infinities and impossible values. */
    private static double[] inputs(SplittableRandom random, double typical, double impossible) {
        double[] values = new double[LENGTH];
        for (int i = 0; i < LENGTH; i++) {
            int pick = random.nextInt(20);
            if (pick == 0) {
                values[i] = Double.NaN;
            } else if (pick == 1) {
                values[i] = random.nextBoolean() ? Double.POSITIVE_INFINITY : Double.NEGATIVE_INFINITY;
            } else if (pick == 2) {
                values[i] = random.nextBoolean() ? impossible : -impossible;
            } else if (pick == 3) {
                values[i] = 0.0;
            } else {
                values[i] = random.nextDouble(-typical, typical);
            }
        }
        return values;
    }

    private static int countNaN(double[] values) {
        int count = 0;
        for (double v : values) {
            count += Double.isNaN(v) ? 1 : 0;
        }
        return count;
    }

    /** A block method of {@link Bridge}, as a method reference. */
    private interface BlockKernel {
        int convert(double[] src, int srcOff, double[] dst, int dstOff, int len);
    }

    /**
     * Converts {@code src} with the block method and with the scalar method, and asserts that
     * they agree bit for bit and that the block method counts the NaN outputs.
     */
    private static int assertBlockIsScalar(double[] src, BlockKernel block,
            DoubleUnaryOperator scalar) {
        double[] dst = new double[src.length];
        int nan = block.convert(src, 0, dst, 0, src.length);
        double[] expected = new double[src.length];
        for (int i = 0; i < src.length; i++) {
            expected[i] = scalar.applyAsDouble(src[i]);
        }
        assertThat(dst).isEqualTo(expected);
        assertThat(nan).isEqualTo(countNaN(expected));
        return nan;
    }

    @ParameterizedTest
    @EnumSource(Arrangement.class)
    void blockInverseIsTheScalarInverseBitForBit(Arrangement arrangement) {
        Bridge bridge = arrangement.build(StrainGauge.ofOhms(350, 2.1), 0.3);
        double[] src = inputs(new SplittableRandom(11), 0.02, 3.0);
        assertThat(assertBlockIsScalar(src, bridge::toStrain, bridge::toStrain))
                .isGreaterThan(LENGTH / 10);
    }

    /**
     * Both ways of counting (a min reduction in the loop, chosen on JDK 25, and a pass after it)
     * on every JDK: chunks of clean readings, where the probe alone proves the count 0, and
     * chunks with one NaN, one infinity or one impossible reading at a seeded place.
     */
    @ParameterizedTest
    @EnumSource(Arrangement.class)
    void bothWaysOfCountingGiveTheScalarInverseAndItsCount(Arrangement arrangement) {
        // Definition: the block inverse is the scalar inverse bit for bit; the count is the three
        // bad readings put in by hand.
        Bridge bridge = arrangement.build(StrainGauge.ofOhms(350, 2.1), 0.3);
        SplittableRandom random = new SplittableRandom(17);
        double[] src = new double[4 * 2048 + 100];
        for (int i = 0; i < src.length; i++) {
            src[i] = bridge.toRatio(random.nextDouble(-3e-3, 3e-3));
        }
        src[2048 + random.nextInt(2048)] = Double.NaN;
        src[2 * 2048 + random.nextInt(2048)] = Double.POSITIVE_INFINITY;
        src[3 * 2048 + random.nextInt(2048)] = 3.0;
        for (boolean probeInLoop : new boolean[] {true, false}) {
            assertThat(assertBlockIsScalar(src,
                    (a, ao, b, bo, n) -> bridge.toStrain(a, ao, b, bo, n, probeInLoop),
                    bridge::toStrain)).as("probe in loop: %s", probeInLoop).isEqualTo(3);
            double[] clean = Arrays.copyOf(src, 2048);
            assertThat(assertBlockIsScalar(clean,
                    (a, ao, b, bo, n) -> bridge.toStrain(a, ao, b, bo, n, probeInLoop),
                    bridge::toStrain)).isZero();
        }
    }

    @ParameterizedTest
    @EnumSource(Arrangement.class)
    void blockForwardIsTheScalarForwardBitForBit(Arrangement arrangement) {
        // Definition: the block forward is the scalar forward bit for bit.
        Bridge bridge = arrangement.build(StrainGauge.ofOhms(120, 2.0), 0.3);
        double[] src = inputs(new SplittableRandom(12), 0.05, 1e9);
        assertThat(assertBlockIsScalar(src, bridge::toRatio, bridge::toRatio)).isGreaterThan(0);
    }

    @Test
    void offsetsAreHonouredAndNothingOutsideIsTouched() {
        // Definition of the block convention: n samples from src[srcOffset] to dst[dstOffset],
        // nothing else written.
        Bridge bridge = Bridge.quarter(StrainGauge.ofOhms(120, 2.0));
        double[] src = {9, 9, 1e-3, -1e-3, 2e-3, 9};
        double[] dst = {7, 7, 7, 7, 7, 7, 7};
        int nan = bridge.toStrain(src, 2, dst, 3, 3);
        assertThat(nan).isZero();
        assertThat(dst[0]).isEqualTo(7.0);
        assertThat(dst[1]).isEqualTo(7.0);
        assertThat(dst[2]).isEqualTo(7.0);
        assertThat(dst[3]).isEqualTo(bridge.toStrain(1e-3));
        assertThat(dst[4]).isEqualTo(bridge.toStrain(-1e-3));
        assertThat(dst[5]).isEqualTo(bridge.toStrain(2e-3));
        assertThat(dst[6]).isEqualTo(7.0);
    }

    @Test
    void inPlaceConversionIsAllowed() {
        Bridge bridge = Bridge.fullAxialPoisson(StrainGauge.ofOhms(350, 2.0), 0.3);
        double[] data = inputs(new SplittableRandom(13), 0.01, 2.0);
        double[] expected = new double[LENGTH];
        for (int i = 0; i < LENGTH; i++) {
            expected[i] = bridge.toStrain(data[i]);
        }
        bridge.toStrain(data, 0, data, 0, LENGTH);
        assertThat(data).isEqualTo(expected);
    }

    @Test
    void emptyBlocksConvertNothing() {
        Bridge bridge = Bridge.quarter(StrainGauge.ofOhms(120, 2.0));
        assertThat(bridge.toStrain(new double[0], 0, new double[0], 0, 0)).isZero();
        assertThat(bridge.toRatio(new double[3], 3, new double[3], 3, 0)).isZero();
    }

    @Test
    void zeroedBridgesConvertBlocksLikeTheirScalars() {
        Bridge bridge = Bridge.fullAxialPoisson(StrainGauge.ofOhms(350, 2.0), 0.3)
                .zeroedByOffset(VoltageRatio.ofMillivoltsPerVolt(0.8));
        assertBlockIsScalar(inputs(new SplittableRandom(14), 0.01, 2.0), bridge::toStrain,
                bridge::toStrain);
        Bridge halfBending = Bridge.halfBending(StrainGauge.ofOhms(350, 2.0))
                .zeroedInArm(VoltageRatio.ofMillivoltsPerVolt(-1.1), 3);
        assertBlockIsScalar(inputs(new SplittableRandom(16), 0.01, 2.0), halfBending::toStrain,
                halfBending::toStrain);
    }

    @Test
    void badRangesAndNullsAreRejectedBeforeAnythingIsWritten() {
        Bridge bridge = Bridge.quarter(StrainGauge.ofOhms(120, 2.0));
        double[] a = new double[4];
        double[] b = {5, 5, 5, 5};
        assertThatThrownBy(() -> bridge.toStrain(null, 0, b, 0, 1))
                .isInstanceOf(NullPointerException.class).hasMessage("src");
        assertThatThrownBy(() -> bridge.toStrain(a, 0, null, 0, 1))
                .isInstanceOf(NullPointerException.class).hasMessage("dst");
        assertThatThrownBy(() -> bridge.toStrain(a, 1, b, 0, 4))
                .isInstanceOf(IndexOutOfBoundsException.class);
        assertThatThrownBy(() -> bridge.toStrain(a, 0, b, 2, 3))
                .isInstanceOf(IndexOutOfBoundsException.class);
        assertThatThrownBy(() -> bridge.toRatio(a, -1, b, 0, 1))
                .isInstanceOf(IndexOutOfBoundsException.class);
        assertThatThrownBy(() -> bridge.toRatio(a, 0, b, 0, -1))
                .isInstanceOf(IndexOutOfBoundsException.class);
        assertThatThrownBy(() -> bridge.toRatio(null, 0, b, 0, 1))
                .isInstanceOf(NullPointerException.class).hasMessage("src");
        assertThat(b).containsOnly(5.0);
    }

    @Test
    void scalarKernelsNeverThrow() {
        Bridge bridge = Bridge.halfOppositeArms(StrainGauge.ofOhms(120, 2.0));
        for (double bad : new double[] {Double.NaN, Double.POSITIVE_INFINITY,
            Double.NEGATIVE_INFINITY, 1e308, -1e308, Double.MIN_VALUE}) {
            double strain = bridge.toStrain(bad);
            double ratio = bridge.toRatio(bad);
            assertThat(Double.isNaN(strain) || Double.isFinite(strain)).isTrue();
            assertThat(Double.isNaN(ratio) || Double.isFinite(ratio)).isTrue();
        }
        assertThat(bridge.toStrain(Double.NaN)).isNaN();
        assertThat(bridge.toRatio(Double.NaN)).isNaN();
        assertThat(bridge.toStrain(Double.MIN_VALUE)).isPositive();
    }

    @Test
    void overlappingRangesOfOneArrayConvertAsIfCopiedFirst() {
        Bridge bridge = Bridge.halfAxialPoisson(StrainGauge.ofOhms(350, 2.0), 0.3);
        double[] original = inputs(new SplittableRandom(15), 0.01, 2.0);
        for (int shift : new int[] {-3, -1, 1, 2, 17}) {
            double[] data = original.clone();
            int srcOff = 20;
            int dstOff = srcOff + shift;
            int len = 1000;
            bridge.toStrain(data, srcOff, data, dstOff, len);
            double[] expected = new double[len];
            for (int i = 0; i < len; i++) {
                expected[i] = bridge.toStrain(original[srcOff + i]);
            }
            assertThat(java.util.Arrays.copyOfRange(data, dstOff, dstOff + len))
                    .as("shift %d", shift).isEqualTo(expected);
        }
    }
}
