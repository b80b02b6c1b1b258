package org.strainmath.bridge;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.util.SplittableRandom;

import org.junit.jupiter.api.Test;
import org.strainmath.quantity.Resistance;
import org.strainmath.quantity.Strain;
import org.strainmath.quantity.Temperature;
import org.strainmath.quantity.VoltageRatio;

/** Whole channels: codes to corrected strain, on an invented channel of our own. */
class StrainChannelTest {

    private static final StrainGauge GAUGE = StrainGauge.ofOhms(350, 2.1).withTransverseSensitivity(0.015);
    private static final Bridge WIRED = Bridge.quarter(GAUGE).withThreeWireLeads(Resistance.ofOhms(1.5))
            .withExcitationLeads(Resistance.ofOhms(0.5));
    private static final AdcInput ADC = AdcInput.ratiometric(24, 128);
    private static final int ZERO_CODE = 3000;

    /**
     * Oracle: the strain whose exact wired reading (ExactBridge.wiredRatio, 50 digits) plus the
     * zero shift equals the code's ratio, found by bisection; independent of the library's
     * composed coefficients and root formula.
     */
    private static double oracleStrain(double ratio, double shift) {
        double lo = -0.05;
        double hi = 0.05;
        for (int i = 0; i < 200 && lo < hi; i++) {
            double mid = 0.5 * (lo + hi);
            if (mid == lo || mid == hi) {
                break;
            }
            if (ExactBridge.wiredRatio(WIRED, mid).doubleValue() + shift < ratio) {
                lo = mid;
            } else {
                hi = mid;
            }
        }
        return 0.5 * (lo + hi);
    }

    @Test
    void codesConvertToTheExactStrainThroughTheWholeChain() {
        // Whole-chain check of the signal-chain issue: 24-bit codes back to strain to 1e-9.
        StrainChannel channel = StrainChannel.of(WIRED, ADC).zeroedByOffsetAt(ZERO_CODE);
        double shift = ADC.toRatio(ZERO_CODE) - ExactBridge.wiredRatio(WIRED, 0).doubleValue();
        for (int code : new int[] {-2_000_000, -1000, ZERO_CODE + 5, 40_000, 1_500_000, 4_000_000}) {
            double expected = oracleStrain(ADC.toRatio(code), shift);
            assertThat(channel.toStrain(code)).as("code %d", code)
                    .isCloseTo(expected, within(Math.abs(expected) * 1e-9 + 1e-17));
        }
        assertThat(channel.toStrain(ZERO_CODE)).isCloseTo(0.0, within(1e-17));
    }

    @Test
    void correctionsApplyInOrderAndTheBlockIsTheScalarBitForBit() {
        ThermalOutput curve = ThermalOutput.ofCelsius(-30, 2.1, -0.045, 1.5e-4);
        StrainChannel channel = StrainChannel.of(WIRED, ADC).zeroedInArmAt(ZERO_CODE, 1)
                .withTransverseCorrection(-0.3)
                .withThermalOutput(curve, Temperature.ofCelsius(21));
        // Transverse factor (1 − ν0·Kt)/(1 + Kt·ρ) (StrainGauge.correctedForTransverse).
        double factor = (1 - 0.285 * 0.015) / (1 - 0.015 * 0.3);
        StrainChannel plain = StrainChannel.of(WIRED, ADC).zeroedInArmAt(ZERO_CODE, 1);
        double thermal = curve.apparentStrainAt(Temperature.ofCelsius(60), 2.1).value()
                - curve.apparentStrainAt(Temperature.ofCelsius(21), 2.1).value();
        assertThat(channel.toStrain(900_000, 60.0))
                .isCloseTo(plain.toStrain(900_000) * factor - thermal, within(1e-15));

        SplittableRandom random = new SplittableRandom(3);
        int n = 5000;
        int[] codes = new int[n];
        double[] celsius = new double[n];
        for (int i = 0; i < n; i++) {
            codes[i] = random.nextInt(-(1 << 23), 1 << 23);
            celsius[i] = random.nextDouble(-20, 120);
        }
        codes[10] = (1 << 23) - 1;
        codes[11] = -(1 << 23);
        double[] out = new double[n + 3];
        int nan = channel.toStrain(codes, 0, celsius, 0, out, 3, n);
        double[] expected = new double[n];
        int expectedNaN = 0;
        for (int i = 0; i < n; i++) {
            expected[i] = channel.toStrain(codes[i], celsius[i]);
            expectedNaN += Double.isNaN(expected[i]) ? 1 : 0;
        }
        assertThat(java.util.Arrays.copyOfRange(out, 3, n + 3)).isEqualTo(expected);
        assertThat(nan).isEqualTo(expectedNaN).isGreaterThanOrEqualTo(2);
        assertThat(channel.strainAt(900_000, Temperature.ofCelsius(60)).value())
                .isEqualTo(channel.toStrain(900_000, 60.0));
    }

    static java.util.stream.Stream<Bridge> everyInverseForm() {
        // One bridge of each form of the inverse: linear, first degree, quadratic.
        return java.util.stream.Stream.of(Bridge.halfBending(GAUGE), WIRED,
                Bridge.halfOppositeArms(GAUGE).withExcitationLeads(Resistance.ofOhms(0.5)));
    }

    @org.junit.jupiter.params.ParameterizedTest
    @org.junit.jupiter.params.provider.MethodSource("everyInverseForm")
    void provenAndCheckedChunksGiveTheScalarBitForBit(Bridge bridge) {
        // Oracle: the scalar toStrain(long) of the same channel. A chunk of codes proven inside
        // the regular interval takes the plain loop without a count, any other chunk the checked
        // loop and a count; both must match the scalar, and so must the path that never proves.
        StrainChannel channel = StrainChannel.of(bridge, ADC).withTransverseCorrection(-0.25);
        if (bridge == WIRED) {
            channel = channel.zeroedByOffsetAt(ZERO_CODE);
        }
        SplittableRandom random = new SplittableRandom(41);
        int chunk = org.strainmath.internal.Kernels.CHUNK;
        int n = 2 * chunk + 77;
        int[] codes = new int[n + 5];
        for (int i = 0; i < codes.length; i++) {
            // the first chunk within half the range (proven), the rest over all of it
            int half = i < chunk + 5 ? 1 << 22 : 1 << 23;
            codes[i] = random.nextInt(-half, half);
        }
        codes[chunk + 100] = (1 << 23) - 1;
        assertThat(channel.proven(-(1 << 22), 1 << 22)).isTrue();
        assertThat(channel.proven(-(1 << 22), (1 << 23) - 1)).isFalse();
        double[] expected = new double[n];
        int expectedNaN = 0;
        for (int i = 0; i < n; i++) {
            expected[i] = channel.toStrain(codes[i + 5]);
            expectedNaN += Double.isNaN(expected[i]) ? 1 : 0;
        }
        assertThat(expectedNaN).isPositive();
        for (StrainChannel.Proof proof : StrainChannel.Proof.values()) {
            double[] out = new double[n + 2];
            int nan = channel.convert(codes, 5, null, 0, out, 2, n, proof);
            assertThat(java.util.Arrays.copyOfRange(out, 2, n + 2)).as("proof: %s", proof)
                    .isEqualTo(expected);
            assertThat(nan).isEqualTo(expectedNaN);
        }
    }

    static java.util.stream.Stream<org.junit.jupiter.params.provider.Arguments> thermalPaths() {
        // Each form of the inverse, with and without a drifting gauge factor, with the
        // temperatures at the output's offset and at another one.
        java.util.stream.Stream.Builder<org.junit.jupiter.params.provider.Arguments> cases =
                java.util.stream.Stream.builder();
        for (boolean drifting : new boolean[] {false, true}) {
            StrainGauge gauge = drifting
                    ? GAUGE.withGaugeFactorTemperatureCoefficient(1.1, Temperature.ofCelsius(23))
                    : GAUGE;
            Bridge[] bridges = {Bridge.halfBending(gauge),
                Bridge.quarter(gauge).withThreeWireLeads(Resistance.ofOhms(1.5)),
                Bridge.halfOppositeArms(gauge).withExcitationLeads(Resistance.ofOhms(0.5))};
            for (Bridge bridge : bridges) {
                for (int celsiusOff : new int[] {2, 9}) {
                    cases.add(org.junit.jupiter.params.provider.Arguments.of(bridge, drifting,
                            celsiusOff));
                }
            }
        }
        return cases.build();
    }

    @org.junit.jupiter.params.ParameterizedTest
    @org.junit.jupiter.params.provider.MethodSource("thermalPaths")
    void theThermalKernelIsTheScalarBitForBitAndNonFiniteTemperaturesGiveNaN(Bridge bridge,
            boolean drifting, int celsiusOff) {
        // Oracle: the scalar toStrain(long, double) of the same channel, which a proven chunk
        // computes in one loop with the thermal output, an unproven chunk in passes. A NaN or
        // infinite temperature must give NaN and be counted, in either kind of chunk.
        StrainChannel channel = StrainChannel.of(bridge, ADC).withTransverseCorrection(-0.25)
                .withThermalOutput(ThermalOutput.ofCelsius(-28, 2.0, -0.05, 1.7e-4, -3e-7),
                        Temperature.ofCelsius(22));
        assertThat(channel.toStrain(40_000, Double.POSITIVE_INFINITY)).isNaN();
        assertThat(channel.toStrain(40_000, Double.NEGATIVE_INFINITY)).isNaN();
        assertThat(channel.toStrain(40_000, Double.NaN)).isNaN();
        SplittableRandom random = new SplittableRandom(drifting ? 5 : 6);
        int chunk = org.strainmath.internal.Kernels.CHUNK;
        int n = 3 * chunk + 41;
        int[] codes = new int[n];
        double[] celsius = new double[n + celsiusOff];
        for (int i = 0; i < n; i++) {
            // chunks 0 and 1 proven, chunk 2 and the tail over the whole range
            int half = i < 2 * chunk ? 1 << 22 : 1 << 23;
            codes[i] = random.nextInt(-half, half);
            celsius[i + celsiusOff] = random.nextDouble(-50, 200);
        }
        // chunk 0 stays finite; chunk 1 (proven) and 2 (not) hold non-finite temperatures
        celsius[chunk + 7 + celsiusOff] = Double.NaN;
        celsius[chunk + 300 + celsiusOff] = Double.POSITIVE_INFINITY;
        celsius[2 * chunk + 9 + celsiusOff] = Double.NEGATIVE_INFINITY;
        codes[2 * chunk + 20] = (1 << 23) - 1;
        double[] expected = new double[n];
        int expectedNaN = 0;
        for (int i = 0; i < n; i++) {
            expected[i] = channel.toStrain(codes[i], celsius[i + celsiusOff]);
            expectedNaN += Double.isNaN(expected[i]) ? 1 : 0;
        }
        assertThat(expectedNaN).isGreaterThanOrEqualTo(4);
        for (StrainChannel.Proof proof : StrainChannel.Proof.values()) {
            double[] out = new double[n + 2];
            int nan = channel.convert(codes, 0, celsius, celsiusOff, out, 2, n, proof);
            assertThat(java.util.Arrays.copyOfRange(out, 2, n + 2)).as("proof: %s", proof)
                    .isEqualTo(expected);
            assertThat(nan).isEqualTo(expectedNaN);
        }
        double[] same = new double[n + celsiusOff];
        assertThat(channel.toStrain(codes, 0, celsius, celsiusOff, same, celsiusOff, n))
                .isEqualTo(expectedNaN);
        assertThat(java.util.Arrays.copyOfRange(same, celsiusOff, n + celsiusOff))
                .isEqualTo(expected);
    }

    @Test
    void aDriftingGaugeFactorThatVanishesGivesNaNAndIsCounted() {
        // Definition (StrainChannel's class comment): ε = ε'·K/K(T), K(T) = K·(1 + c·(T − Tref)).
        // With c = 1.1 %/100 K, K(T) is 0 at Tref − 1/c, an absurd but finite temperature; at
        // zero strain the quotient is 0/0. The proven fused loop must count it as the scalar
        // path reports it.
        StrainGauge drifting = GAUGE.withGaugeFactorTemperatureCoefficient(1.1,
                Temperature.ofCelsius(23));
        StrainChannel channel = StrainChannel.of(Bridge.halfBending(drifting), ADC)
                .withThermalOutput(ThermalOutput.ofCelsius(0.0), Temperature.ofCelsius(23));
        double vanishing = 23 - 1 / 1.1e-4;
        int[] codes = {0, 0, 1000};
        double[] celsius = {vanishing, 23, 23};
        double[] out = new double[3];
        int nan = channel.toStrain(codes, 0, celsius, 0, out, 0, 3);
        for (int i = 0; i < 3; i++) {
            assertThat(Double.doubleToRawLongBits(out[i]))
                    .isEqualTo(Double.doubleToRawLongBits(channel.toStrain(codes[i], celsius[i])));
        }
        assertThat(out[0]).isNaN();
        assertThat(nan).isEqualTo(1);
    }

    @Test
    void temperaturesThatOverlapTheOutputAreRefused() {
        StrainChannel channel = StrainChannel.of(WIRED, ADC)
                .withThermalOutput(ThermalOutput.ofCelsius(-28, 2.0), Temperature.ofCelsius(22));
        double[] shared = new double[20];
        int[] codes = new int[10];
        assertThatThrownBy(() -> channel.toStrain(codes, 0, shared, 5, shared, 0, 10))
                .isInstanceOf(IllegalArgumentException.class)
                .hasMessage("celsius must not overlap dst: celsius[5, 15) and dst[0, 10) of the"
                        + " same array");
        assertThat(channel.toStrain(codes, 0, shared, 10, shared, 0, 10)).isZero();
        ChannelFrames frames = ChannelFrames.of(channel, channel);
        double[][] rows = {new double[10], shared};
        assertThatThrownBy(() -> frames.toStrain(new int[20], 0, 10, shared, 3, rows, 0))
                .isInstanceOf(IllegalArgumentException.class)
                .hasMessageStartingWith("celsiusPerFrame must not overlap dst[1]: ");
    }

    @Test
    void aChannelWithoutCorrectionsIsTheConverterThenTheBridge() {
        StrainChannel channel = StrainChannel.of(WIRED, ADC);
        int[] codes = {0, 123_456, -654_321};
        double[] out = new double[3];
        assertThat(channel.toStrain(codes, 0, out, 0, 3)).isZero();
        // Equal to the two steps within a few ulp: the channel's reading interval is the
        // intersection of the converter's and the bridge's, so its mask rounds differently.
        for (int i = 0; i < 3; i++) {
            double twoSteps = WIRED.toStrain(ADC.toRatio(codes[i]));
            assertThat(out[i]).isCloseTo(twoSteps, within(Math.abs(twoSteps) * 1e-15));
        }
        assertThat(channel.strainAt(123_456)).isEqualTo(Strain.of(out[1]));
        assertThat(channel.needsTemperature()).isFalse();
        assertThat(channel.bridge()).isSameAs(WIRED);
        assertThat(channel.input()).isSameAs(ADC);
    }

    @Test
    void misuseIsRefusedWithAReason() {
        StrainChannel thermal = StrainChannel.of(WIRED, ADC)
                .withThermalOutput(ThermalOutput.ofCelsius(1, 1), Temperature.ofCelsius(20));
        assertThat(thermal.needsTemperature()).isTrue();
        assertThatThrownBy(() -> thermal.strainAt(1000))
                .isInstanceOf(IllegalStateException.class)
                .hasMessage("the channel corrects for thermal output: give the temperatures");
        assertThatThrownBy(() -> thermal.toStrain(new int[1], 0, new double[1], 0, 1))
                .isInstanceOf(IllegalStateException.class);
        StrainChannel plain = StrainChannel.of(WIRED, ADC);
        assertThatThrownBy(() -> plain.strainAt((1 << 23) - 1))
                .isInstanceOf(IllegalArgumentException.class)
                .hasMessage("code must give a physical strain (inside the converter's range and"
                        + " the bridge's): 8388607");
        assertThatThrownBy(() -> plain.zeroedByOffsetAt(1L << 30))
                .hasMessage("code must be inside the converter's range, rails excluded: 1073741824");
        assertThatThrownBy(() -> StrainChannel.of(Bridge.fullAxialPoisson(GAUGE, 0.3), ADC)
                .withTransverseCorrection(-0.3))
                .isInstanceOf(IllegalArgumentException.class)
                .hasMessageStartingWith("bridge must have its active gauges along the measured strain");
        assertThatThrownBy(() -> plain.withTransverseCorrection(Double.NaN))
                .hasMessage("transverseToAxialRatio must be finite: NaN");
        assertThatThrownBy(() -> StrainChannel.of(null, ADC))
                .isInstanceOf(NullPointerException.class).hasMessage("bridge");
        assertThatThrownBy(() -> StrainChannel.of(WIRED, null))
                .isInstanceOf(NullPointerException.class).hasMessage("input");
        assertThatThrownBy(() -> plain.toStrain(new int[2], 0, new double[1], 0, new double[2], 0, 2))
                .isInstanceOf(IndexOutOfBoundsException.class);
        assertThatThrownBy(() -> plain.toStrain((int[]) null, 0, new double[1], 0, 1))
                .isInstanceOf(NullPointerException.class).hasMessage("codes");
    }

    @Test
    void theChannelSheetNamesEveryPiece() {
        StrainChannel channel = StrainChannel.of(WIRED, ADC).withTransverseCorrection(-0.3)
                .withThermalOutput(ThermalOutput.ofCelsius(-30, 2.1), Temperature.ofCelsius(21));
        // Expected sheet written out by hand from the parts (common practice, no source):
        // 24-bit ratiometric at gain 128 is 2^-23/128 V/V per code; leads 1.5 Ω in arms 1 and
        // 2 and 0.5 Ω per excitation lead.
        assertThat(channel.toString()).isEqualTo(String.join("\n",
                "StrainChannel",
                "  gauge       350.0 Ω, K=2.1, Kt=1.5 %",
                "  bridge      quarter bridge, " + WIRED.sensitivity() + " per 1000 µε",
                "  arms        arm 1: active gauge ×1.0 (350.0 Ω, K=2.1); arm 2: completion"
                        + " resistor 350.0 Ω; arm 3: completion resistor 350.0 Ω; arm 4:"
                        + " completion resistor 350.0 Ω",
                "  leads       arm 1 1.5 Ω, arm 2 1.5 Ω, excitation 1.0 Ω; desensitisation "
                        + org.strainmath.internal.Format.number(WIRED.leadDesensitisation()),
                "  converter   24 bits, two's complement, gain 128.0, ratiometric,"
                        + " 9.31323e-7 mV/V per code",
                "  transverse  εt/εa = -0.3, factor "
                        + org.strainmath.internal.Format.number((1 - 0.285 * 0.015) / (1 - 0.015 * 0.3)),
                "  span        not corrected",
                "  thermal     -30.0 + 2.1·T µε, T in °C, at K=2.0; zeroed at 21.0 °C",
                "  zero        output at zero strain 0.0 mV/V",
                "  resolution  " + ADC.strainPerCode(WIRED) + " per code"));
        assertThat(channel.withSpanCorrection(1.0125).toString()).contains("  span        ×1.0125\n");
        assertThat(channel.zeroedByOffsetAt(ZERO_CODE).toString())
                .contains("  zero        offset " + VoltageRatio.ofVoltsPerVolt(ADC.toRatio(ZERO_CODE))
                        + " subtracted");
    }

    @Test
    void sixteenBitWordsConvertLikeTheirCodes() {
        AdcInput sixteen = AdcInput.ratiometric(16, 64).withCoding(AdcInput.Coding.OFFSET_BINARY);
        StrainChannel channel = StrainChannel.of(WIRED, sixteen);
        short[] words = {(short) 32768, (short) 40000, (short) 65535, (short) 1000};
        double[] out = new double[4];
        assertThat(channel.toStrain(words, 0, out, 0, 4)).isEqualTo(1);
        assertThat(out[0]).isEqualTo(channel.toStrain(32768));
        assertThat(out[1]).isEqualTo(channel.toStrain(40000));
        assertThat(out[2]).isNaN();   // the rail
        assertThat(out[3]).isEqualTo(channel.toStrain(1000));
        assertThat(out[0]).isCloseTo(0.0, within(1e-6));
    }

    static java.util.stream.Stream<org.junit.jupiter.params.provider.Arguments> thermalCases() {
        SplittableRandom random = new SplittableRandom(0x7E);
        return java.util.stream.Stream.generate(() -> org.junit.jupiter.params.provider.Arguments.of(
                random.nextDouble(-50, 200), random.nextDouble(-50, 200),
                random.nextDouble(1.8, 4.5), random.nextDouble(-3e-3, 3e-3))).limit(100);
    }

    @org.junit.jupiter.params.ParameterizedTest(name = "T0={0} T={1} K={2} e={3}")
    @org.junit.jupiter.params.provider.MethodSource("thermalCases")
    void thermalCorrectionUndoesItsForwardModel(double zeroCelsius, double celsius, double k,
            double strain) {
        // Forward model (ThermalOutput class comment): the channel reads the true strain plus
        // (εapp(T) − εapp(T0))·2.00/K; the correction must give the true strain back.
        ThermalOutput curve = ThermalOutput.ofCelsius(-30, 2.1, -0.045, 1.5e-4, -2e-7);
        double apparent = (curve.apparentStrainAt(Temperature.ofCelsius(celsius)).value()
                - curve.apparentStrainAt(Temperature.ofCelsius(zeroCelsius)).value()) * 2.0 / k;
        ThermalOutput.Correction correction = curve.zeroedAt(Temperature.ofCelsius(zeroCelsius), k);
        assertThat(correction.correct(strain + apparent, celsius))
                .isCloseTo(strain, within(1e-12));
    }

    @Test
    void aTemperatureDependentGaugeFactorRescalesTheStrainExactly() {
        // Oracle: a bridge built with the gauge factor the coefficient gives at 120 °C reads the
        // same code as the strain K(T)/K times smaller: the bridge equation depends on K·ε only
        // (arms R0·(1 + K·m·ε)), so the channel's rescaling must match that bridge to 1e-13.
        StrainGauge drifting = GAUGE.withGaugeFactorTemperatureCoefficient(1.2, Temperature.ofCelsius(23));
        double hotK = drifting.gaugeFactorAt(Temperature.ofCelsius(120));
        ThermalOutput flat = ThermalOutput.ofCelsius(0.0);
        StrainChannel channel = StrainChannel.of(Bridge.quarter(drifting).withThreeWireLeads(
                Resistance.ofOhms(1.5)), ADC).withThermalOutput(flat, Temperature.ofCelsius(23));
        Bridge hot = Bridge.quarter(GAUGE.withGaugeFactor(hotK)).withThreeWireLeads(Resistance.ofOhms(1.5));
        for (int code : new int[] {-900_000, 70_000, 2_000_000}) {
            double expected = hot.toStrain(ADC.toRatio(code));
            assertThat(channel.toStrain(code, 120.0))
                    .isCloseTo(expected, within(Math.abs(expected) * 1e-13));
            double atReference = Bridge.quarter(GAUGE).withThreeWireLeads(Resistance.ofOhms(1.5))
                    .toStrain(ADC.toRatio(code));
            assertThat(channel.toStrain(code, 23.0))
                    .isCloseTo(atReference, within(Math.abs(atReference) * 1e-13));
        }
        int[] codes = {-900_000, 70_000, 2_000_000};
        double[] celsius = {120, 23, 60};
        double[] out = new double[3];
        channel.toStrain(codes, 0, celsius, 0, out, 0, 3);
        for (int i = 0; i < 3; i++) {
            assertThat(out[i]).isEqualTo(channel.toStrain(codes[i], celsius[i]));
        }
    }

    static java.util.stream.Stream<org.junit.jupiter.params.provider.Arguments> driftCases() {
        SplittableRandom random = new SplittableRandom(0xD21F7);
        return java.util.stream.Stream.generate(() -> org.junit.jupiter.params.provider.Arguments.of(
                random.nextDouble(1.8, 4.5), random.nextDouble(-2, 2), random.nextDouble(-50, 200),
                random.nextDouble(-50, 200), random.nextDouble(0, 10),
                random.nextInt(-3_000_000, 3_000_000))).limit(100);
    }

    @org.junit.jupiter.params.ParameterizedTest(name = "K={0} c={1} %/100K Tref={2} T={3} RL={4} code={5}")
    @org.junit.jupiter.params.provider.MethodSource("driftCases")
    void aDriftingGaugeFactorIsUndoneOverRealisticRanges(double k, double percentPer100K,
            double referenceCelsius, double celsius, double leadOhms, int code) {
        // Oracle as above: the bridge built with K(T) = K·(1 + c·(T − Tref)) (the data sheet's
        // definition of the coefficient, common practice, no source) reads the code as the
        // channel must; the channel rescales its strain to match it to 1e-12 relative.
        StrainGauge drifting = StrainGauge.ofOhms(350, k).withGaugeFactorTemperatureCoefficient(
                percentPer100K, Temperature.ofCelsius(referenceCelsius));
        Resistance lead = Resistance.ofOhms(leadOhms);
        StrainChannel channel = StrainChannel.of(Bridge.quarter(drifting).withThreeWireLeads(lead),
                ADC).withThermalOutput(ThermalOutput.ofCelsius(0.0), Temperature.ofCelsius(20));
        double kAtT = k * (1 + percentPer100K / 100 / 100 * (celsius - referenceCelsius));
        double expected = Bridge.quarter(StrainGauge.ofOhms(350, kAtT)).withThreeWireLeads(lead)
                .toStrain(ADC.toRatio(code));
        assertThat(channel.toStrain(code, celsius))
                .isCloseTo(expected, within(Math.abs(expected) * 1e-12 + 1e-18));
    }

    @org.junit.jupiter.params.ParameterizedTest
    @org.junit.jupiter.params.provider.EnumSource(StrainChannel.Proof.class)
    void aSpanCorrectionScalesTheBridgeStrainBeforeTheThermalCorrection(StrainChannel.Proof proof) {
        // Definition (common practice, no source): the corrected strain is factor × the strain
        // the channel gave, before thermal output is subtracted; both kernel paths agree.
        ThermalOutput curve = ThermalOutput.ofCelsius(-30, 2.1, -0.045);
        StrainChannel plain = StrainChannel.of(WIRED, ADC).withTransverseCorrection(-0.3)
                .zeroedByOffsetAt(ZERO_CODE);
        StrainChannel spanned = plain.withSpanCorrection(1.02);
        assertThat(spanned.spanCorrection()).isEqualTo(1.02);
        assertThat(plain.spanCorrection()).isEqualTo(1.0);
        assertThat(plain.transverseFactor()).isEqualTo((1 - 0.285 * 0.015) / (1 - 0.015 * 0.3));
        assertThat(StrainChannel.of(WIRED, ADC).transverseFactor()).isEqualTo(1.0);
        assertThat(plain.transverseRatio()).hasValue(-0.3);
        assertThat(StrainChannel.of(WIRED, ADC).transverseRatio()).isEmpty();
        for (int code : new int[] {-400_000, 50_000, 2_000_000}) {
            assertThat(spanned.toStrain(code)).isCloseTo(plain.toStrain(code) * 1.02,
                    within(Math.abs(plain.toStrain(code)) * 1e-15));
        }
        StrainChannel both = spanned.withThermalOutput(curve, Temperature.ofCelsius(21));
        double thermal = curve.apparentStrainAt(Temperature.ofCelsius(70), 2.1).value()
                - curve.apparentStrainAt(Temperature.ofCelsius(21), 2.1).value();
        assertThat(both.toStrain(900_000, 70.0))
                .isCloseTo(plain.toStrain(900_000) * 1.02 - thermal, within(1e-15));
        int[] codes = {-400_000, 50_000, 2_000_000, 900_000};
        double[] out = new double[4];
        spanned.convert(codes, 0, null, 0, out, 0, 4, proof);
        for (int i = 0; i < 4; i++) {
            assertThat(out[i]).isEqualTo(spanned.toStrain(codes[i]));
        }
        assertThatThrownBy(() -> plain.withSpanCorrection(0)).hasMessage("factor must be > 0 and finite: 0.0");
        assertThatThrownBy(() -> plain.withSpanCorrection(Double.NaN)).hasMessage("factor must be > 0 and finite: NaN");
    }
}
