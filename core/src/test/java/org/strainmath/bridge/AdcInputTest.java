package org.strainmath.bridge;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.util.SplittableRandom;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.strainmath.quantity.Voltage;

/**
 * Codes to output ratio. Oracle throughout: the converter relations of the class comment worked
 * by hand (a code is (c − c0)/2^(N−1) of full scale; common practice, no source).
 */
class AdcInputTest {

    private static final AdcInput RATIOMETRIC_24 = AdcInput.ratiometric(24, 128);

    @Test
    void ratiometricCodesScaleByFullScaleOverGain() {
        // 2^20 of 2^23 at gain 128: r = 2^20 / (2^23 · 128) = 1/1024 V/V, exactly.
        assertThat(RATIOMETRIC_24.toRatio(1 << 20)).isEqualTo(1.0 / 1024);
        assertThat(RATIOMETRIC_24.toRatio(-(1 << 20))).isEqualTo(-1.0 / 1024);
        assertThat(RATIOMETRIC_24.toRatio(0)).isZero();
        assertThat(RATIOMETRIC_24.ratioPerCode().toVoltsPerVolt()).isEqualTo(Math.scalb(1.0, -30));
        assertThat(RATIOMETRIC_24.isRatiometric()).isTrue();
        assertThat(RATIOMETRIC_24.bits()).isEqualTo(24);
        // A reference of half the excitation halves every ratio.
        assertThat(RATIOMETRIC_24.withReferenceRatio(0.5).toRatio(1 << 20)).isEqualTo(1.0 / 2048);
    }

    @Test
    void absoluteCodesAreDividedByGainAndExcitation() {
        // 16 bits, ±2.5 V, gain 100, 5 V excitation: code 1000 is 1000·2.5/32768 V at the
        // converter, 1/100 of it at the bridge, 1/5 of that per volt of excitation.
        AdcInput adc = AdcInput.absolute(16, 100, Voltage.ofVolts(2.5), Voltage.ofVolts(5));
        double expected = 1000 * 2.5 / 32768 / 100 / 5;
        assertThat(adc.toRatio(1000)).isCloseTo(expected, within(expected * 1e-15));
        assertThat(adc.isRatiometric()).isFalse();
    }

    @Test
    void offsetBinaryIsCentredOnHalfTheRange() {
        AdcInput twos = AdcInput.ratiometric(16, 64);
        AdcInput offsetBinary = twos.withCoding(AdcInput.Coding.OFFSET_BINARY);
        assertThat(offsetBinary.toRatio(32768)).isZero();
        assertThat(offsetBinary.toRatio(32768 + 1000)).isEqualTo(twos.toRatio(1000));
        assertThat(offsetBinary.toRatio(32768 - 1000)).isEqualTo(twos.toRatio(-1000));
        // As 16-bit words: 0x8000 + 1000 read from a short is the unsigned code 33768.
        short[] words = {(short) (32768 + 1000), (short) 1000};
        double[] ratios = new double[2];
        offsetBinary.toRatio(words, 0, ratios, 0, 1);
        twos.toRatio(words, 1, ratios, 1, 1);
        assertThat(ratios[0]).isEqualTo(ratios[1]).isEqualTo(twos.toRatio(1000));
    }

    @Test
    void theCodeOffsetIsSubtractedFirst() {
        AdcInput adc = RATIOMETRIC_24.withCodeOffset(-37);
        assertThat(adc.toRatio(-37)).isZero();
        assertThat(adc.toRatio(1000 - 37)).isEqualTo(RATIOMETRIC_24.toRatio(1000));
    }

    @Test
    void railCodesAndImpossibleCodesHaveNoRatio() {
        // A converter at its rail has saturated: both end codes read NaN, and so do codes that
        // N bits cannot hold (common practice, no source).
        int top = (1 << 23) - 1;
        assertThat(RATIOMETRIC_24.toRatio(top)).isNaN();
        assertThat(RATIOMETRIC_24.toRatio(-(1 << 23))).isNaN();
        assertThat(RATIOMETRIC_24.toRatio(top - 1)).isFinite();
        assertThat(RATIOMETRIC_24.toRatio(-(1 << 23) + 1)).isFinite();
        assertThat(RATIOMETRIC_24.toRatio(1 << 23)).isNaN();
        assertThat(RATIOMETRIC_24.toRatio(Integer.MIN_VALUE)).isNaN();
        AdcInput offsetBinary = AdcInput.ratiometric(12, 1).withCoding(AdcInput.Coding.OFFSET_BINARY);
        assertThat(offsetBinary.toRatio(0)).isNaN();
        assertThat(offsetBinary.toRatio(4095)).isNaN();
        assertThat(offsetBinary.toRatio(-1)).isNaN();
        assertThat(offsetBinary.toRatio(4094)).isFinite();
        AdcInput full32 = AdcInput.ratiometric(32, 1);
        assertThat(full32.toRatio(Integer.MAX_VALUE)).isNaN();
        assertThat(full32.toRatio(Integer.MAX_VALUE - 1)).isCloseTo(1.0, within(1e-9));
    }

    @Test
    void resolutionInStrainPerCodeAndNoise() {
        // Quarter bridge, K = 2: dr/dε = K/4 = 0.5, so one code of 2^-30 V/V is 2^-29 strain,
        // 0.00186 µε; 3 codes RMS of noise are 3 × that.
        Bridge quarter = Bridge.quarter(StrainGauge.ofOhms(350, 2.0));
        assertThat(RATIOMETRIC_24.strainPerCode(quarter).value())
                .isCloseTo(Math.scalb(1.0, -29), within(1e-24));
        assertThat(RATIOMETRIC_24.strainNoise(quarter, 3).value())
                .isCloseTo(3 * Math.scalb(1.0, -29), within(1e-24));
        assertThatThrownBy(() -> RATIOMETRIC_24.strainNoise(quarter, -1))
                .hasMessage("rmsCodes must be >= 0 and finite: -1.0");
        assertThatThrownBy(() -> RATIOMETRIC_24.strainPerCode(null))
                .isInstanceOf(NullPointerException.class).hasMessage("bridge");
    }

    @Test
    void blocksAreTheScalarFunctionBitForBit() {
        // Definition: the block conversion is the scalar conversion bit for bit, with its NaN
        // count.
        SplittableRandom random = new SplittableRandom(24);
        int[] codes = new int[3000];
        short[] words = new short[3000];
        for (int i = 0; i < codes.length; i++) {
            codes[i] = random.nextInt(-(1 << 24), 1 << 24);
            words[i] = (short) random.nextInt(-32768, 32768);
        }
        codes[5] = (1 << 23) - 1;
        double[] out = new double[codes.length];
        int nan = RATIOMETRIC_24.toRatio(codes, 0, out, 0, codes.length);
        double[] expected = new double[codes.length];
        int expectedNaN = 0;
        for (int i = 0; i < codes.length; i++) {
            expected[i] = RATIOMETRIC_24.toRatio(codes[i]);
            expectedNaN += Double.isNaN(expected[i]) ? 1 : 0;
        }
        assertThat(out).isEqualTo(expected);
        assertThat(nan).isEqualTo(expectedNaN).isGreaterThan(1000);

        AdcInput sixteen = AdcInput.ratiometric(16, 32);
        nan = sixteen.toRatio(words, 0, out, 0, words.length);
        expectedNaN = 0;
        for (int i = 0; i < words.length; i++) {
            expected[i] = sixteen.toRatio(words[i]);
            expectedNaN += Double.isNaN(expected[i]) ? 1 : 0;
        }
        assertThat(out).isEqualTo(expected);
        assertThat(nan).isEqualTo(expectedNaN);
    }

    @Test
    void aWholeChainFromCodesToStrain() {
        // Invented channel: 350 Ω full axial Poisson bridge, 24-bit ratiometric input, gain 128.
        // A code computed from a known strain through the forward model, rounded to the nearest
        // code, converts back to that strain within half a code's worth of strain.
        Bridge bridge = Bridge.fullAxialPoisson(StrainGauge.ofOhms(350, 2.1), 0.3);
        double halfCode = RATIOMETRIC_24.strainPerCode(bridge).value() / 2;
        for (double micro : new double[] {-1500, -1, 0.5, 250, 1800}) {
            double strain = micro * 1e-6;
            long code = Math.round(bridge.toRatio(strain)
                    / RATIOMETRIC_24.ratioPerCode().toVoltsPerVolt());
            double back = bridge.toStrain(RATIOMETRIC_24.toRatio(code));
            assertThat(back).isCloseTo(strain, within(halfCode * 1.01));
        }
    }

    @Test
    void textReadsAsAChannelSheet() {
        assertThat(RATIOMETRIC_24).hasToString(
                "AdcInput[24 bits, two's complement, gain 128.0, ratiometric, 9.31323e-7 mV/V per code]");
        assertThat(AdcInput.absolute(16, 100, Voltage.ofVolts(2.5), Voltage.ofVolts(5))
                .withCoding(AdcInput.Coding.OFFSET_BINARY).withCodeOffset(3).toString())
                .isEqualTo("AdcInput[16 bits, offset binary, gain 100.0, ±2.5 V at 5.0 V,"
                        + " code offset 3.0, 0.000152588 mV/V per code]");
    }

    @ParameterizedTest
    @ValueSource(ints = {Integer.MIN_VALUE, 0, 1, 33})
    void bitsMustBeTwoToThirtyTwo(int bad) {
        assertThatThrownBy(() -> AdcInput.ratiometric(bad, 1))
                .isInstanceOf(IllegalArgumentException.class)
                .hasMessage("bits must be in [2, 32]: " + bad);
    }

    @ParameterizedTest
    @ValueSource(doubles = {Double.NaN, Double.POSITIVE_INFINITY, 0.0, -1.0})
    void gainsScalesAndExcitationsMustBePositive(double bad) {
        assertThatThrownBy(() -> AdcInput.ratiometric(24, bad))
                .hasMessage("gain must be > 0 and finite: " + bad);
        if (Double.isFinite(bad)) {
            assertThatThrownBy(() -> AdcInput.absolute(16, 1, Voltage.ofVolts(bad), Voltage.ofVolts(5)))
                    .hasMessage("fullScale must be > 0 and finite: " + bad);
            assertThatThrownBy(() -> AdcInput.absolute(16, 1, Voltage.ofVolts(2.5), Voltage.ofVolts(bad)))
                    .hasMessage("excitation must be > 0 and finite: " + bad);
        }
        assertThatThrownBy(() -> RATIOMETRIC_24.withReferenceRatio(bad))
                .hasMessage("ratio must be > 0 and finite: " + bad);
    }

    @Test
    void otherBadInput() {
        AdcInput absolute = AdcInput.absolute(16, 1, Voltage.ofVolts(2.5), Voltage.ofVolts(5));
        assertThatThrownBy(() -> absolute.withReferenceRatio(0.5))
                .isInstanceOf(IllegalArgumentException.class)
                .hasMessageStartingWith("ratio applies to a ratiometric input only:");
        assertThatThrownBy(() -> RATIOMETRIC_24.withCodeOffset(Double.NaN))
                .hasMessage("codeOffset must be finite: NaN");
        assertThatThrownBy(() -> RATIOMETRIC_24.withCoding(null))
                .isInstanceOf(NullPointerException.class).hasMessage("coding");
        assertThatThrownBy(() -> AdcInput.absolute(16, 1, null, Voltage.ofVolts(5)))
                .isInstanceOf(NullPointerException.class).hasMessage("fullScale");
        assertThatThrownBy(() -> RATIOMETRIC_24.toRatio((int[]) null, 0, new double[1], 0, 1))
                .isInstanceOf(NullPointerException.class).hasMessage("src");
        assertThatThrownBy(() -> RATIOMETRIC_24.toRatio(new short[2], 0, null, 0, 1))
                .isInstanceOf(NullPointerException.class).hasMessage("dst");
        assertThatThrownBy(() -> RATIOMETRIC_24.toRatio(new int[2], 1, new double[2], 0, 2))
                .isInstanceOf(IndexOutOfBoundsException.class);
        assertThatThrownBy(() -> RATIOMETRIC_24.toRatio(new short[2], 0, new double[1], 0, 2))
                .isInstanceOf(IndexOutOfBoundsException.class);
    }
}
