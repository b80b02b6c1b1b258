package org.strainmath.bridge;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.EnumSource;
import org.junit.jupiter.params.provider.ValueSource;
import org.strainmath.quantity.Resistance;
import org.strainmath.quantity.Strain;
import org.strainmath.quantity.Voltage;
import org.strainmath.quantity.VoltageRatio;

class BridgeTest {

    private static final StrainGauge GAUGE_120 = StrainGauge.ofOhms(120, 2.0);
    private static final StrainGauge GAUGE_350 = StrainGauge.ofOhms(350, 2.1);

    @Test
    void quarterBridgeAt250MicrostrainAnd12VoltsGivesAbout1point5Millivolts() {
        // Common practice, no source: 120 Ω, K = 2, 250 µε, 12 V excitation: about 1.5 mV.
        Voltage out = Bridge.quarter(GAUGE_120)
                .outputVoltage(Strain.ofMicrostrain(250), Voltage.ofVolts(12));
        assertThat(out.toMillivolts()).isCloseTo(1.5, within(1.5e-3));
        // Exactly K·ε/(4 + 2·K·ε)·Vex = 12·5e-4/4.001 V (closed form, Arrangement.QUARTER).
        assertThat(out.toVolts()).isCloseTo(12 * 5e-4 / 4.001, within(1.5e-3 * 1e-14));
    }

    @Test
    void quarterBridgeNonlinearityIsAboutATenthOfAPercentPer1000Microstrain() {
        // Common practice, no source: about 0.1 % per 1000 µε at K = 2, the linearised reading
        // low in tension and high in compression.
        Bridge quarter = Bridge.quarter(GAUGE_120);
        assertThat(quarter.nonlinearityError(Strain.ofMicrostrain(1000)))
                .isCloseTo(-0.001, within(0.001 * 0.01));
        assertThat(quarter.nonlinearityError(Strain.ofMicrostrain(2000)))
                .isCloseTo(-0.002, within(0.002 * 0.01));
        assertThat(quarter.nonlinearityError(Strain.ofMicrostrain(-1000)))
                .isCloseTo(0.001, within(0.001 * 0.01));
        // Closed form −K·ε/(2 + K·ε) (derived from the quarter-bridge output, by hand).
        assertThat(quarter.nonlinearityError(Strain.ofMicrostrain(1000)))
                .isCloseTo(-0.002 / 2.002, within(1e-3 * 1e-13));
        assertThat(quarter.nonlinearityError(Strain.ZERO)).isZero();
    }

    @Test
    void quarterBridgeInverseIsTheTextbookForm() {
        // Dally & Riley, Experimental Stress Analysis, 4th ed.: ε = 4·r / (K·(1 − 2·r)) for a
        // quarter bridge (as recalled from memory; re-derived from the bridge equation).
        Bridge quarter = Bridge.quarter(GAUGE_120);
        for (double r : new double[] {1e-3, -1e-3, 2.5e-2, -0.3, 0.45}) {
            double expected = 4 * r / (2.0 * (1 - 2 * r));
            assertThat(quarter.toStrain(r)).as("r = %s", r)
                    .isCloseTo(expected, within(Math.abs(expected) * 1e-14));
        }
        assertThat(quarter.strainAt(VoltageRatio.ofMillivoltsPerVolt(0.4995)).toMicrostrain())
                .isCloseTo(4 * 4.995e-4 / (2 * (1 - 9.99e-4)) * 1e6, within(1e-9));
        // The linearised inverse 4·r/K (common practice, no source).
        assertThat(quarter.linearisedStrainAt(VoltageRatio.ofMillivoltsPerVolt(0.4995))
                .toMicrostrain()).isCloseTo(999.0, within(1e-9));
    }

    @ParameterizedTest
    @EnumSource(Arrangement.class)
    void everyArrangementMatchesItsClosedForm(Arrangement arrangement) {
        // Oracle: each arrangement's closed form in Arrangement (textbook forms, re-derived by
        // hand).
        double nu = 0.3;
        Bridge bridge = arrangement.build(GAUGE_350, nu);
        for (double micro : new double[] {-50_000, -2000, -1, 1e-6, 3, 1000, 50_000}) {
            double e = micro * 1e-6;
            double expected = arrangement.closedForm(2.1, nu, e);
            assertThat(bridge.toRatio(e)).as("%s at %s µε", arrangement, micro)
                    .isCloseTo(expected, within(Math.abs(expected) * 1e-13));
        }
    }

    @ParameterizedTest
    @EnumSource(Arrangement.class)
    void bridgeFactorSensitivityAndLinearity(Arrangement arrangement) {
        double nu = 0.285;
        Bridge bridge = arrangement.build(GAUGE_350, nu);
        double n = arrangement.bridgeFactor(nu);
        assertThat(bridge.bridgeFactor()).isCloseTo(n, within(n * 1e-15));
        // Sensitivity K·N/4 per unit strain, i.e. K·N/4 mV/V per 1000 µε (common practice).
        assertThat(bridge.sensitivity().toMillivoltsPerVolt())
                .isCloseTo(2.1 * n / 4, within(2.1 * n / 4 * 1e-15));
        assertThat(bridge.gaugeFactor()).isEqualTo(2.1);
        assertThat(bridge.isLinear()).isEqualTo(arrangement.linear);
        assertThat(bridge.isBalanced()).isTrue();
        assertThat(bridge.zeroOutput()).isEqualTo(VoltageRatio.ZERO);
        double error = bridge.nonlinearityError(Strain.ofMicrostrain(5000));
        if (arrangement.linear) {
            assertThat(error).isZero();
        } else {
            assertThat(error).isNegative();
        }
    }

    @Test
    void linearArrangementsAreProportionalToTheLastBit() {
        // Full bending: r = K·ε exactly (closed form); the kernel's only rounding is the product.
        Bridge full = Bridge.fullBending(GAUGE_120);
        for (double e : new double[] {1e-9, 3.7e-4, -2.2e-2}) {
            assertThat(full.toRatio(e)).isCloseTo(2 * e, within(Math.ulp(2 * e) * 2));
            assertThat(full.toStrain(2 * e)).isCloseTo(e, within(Math.ulp(e) * 2));
        }
    }

    @Test
    void nonlinearityErrorMatchesTheExactOutputOfEveryArrangement() {
        // Independent computation: ε_lin = r_exact(ε)/(dr/dε), r_exact from 50-digit BigDecimal.
        for (Arrangement arrangement : Arrangement.values()) {
            Bridge bridge = arrangement.build(GAUGE_350, 0.3);
            double slope = 2.1 * arrangement.bridgeFactor(0.3) / 4;
            for (double e : new double[] {-0.03, -1e-3, 2e-3, 0.04}) {
                double linearised = ExactBridge.ratio(bridge, e).doubleValue() / slope;
                double expected = (linearised - e) / e;
                assertThat(bridge.nonlinearityError(Strain.of(e)))
                        .as("%s at %s", arrangement, e)
                        .isCloseTo(expected, within(1e-12));
            }
        }
    }

    @Test
    void generalBridgeWithUnequalArmsIsUnbalancedAndExact() {
        // Oracle: the bridge equation in 50-digit BigDecimal (ExactBridge), independent of the
        // library.
        Bridge bridge = Bridge.of(BridgeArm.active(GAUGE_350, 1),
                BridgeArm.completion(Resistance.ofOhms(351)),
                BridgeArm.completion(Resistance.ofOhms(349.5)),
                BridgeArm.active(StrainGauge.ofOhms(350, 2.05), -0.3));
        assertThat(bridge.isBalanced()).isFalse();
        assertThat(bridge.isLinear()).isFalse();
        double zero = ExactBridge.ratio(bridge, 0).doubleValue();
        assertThat(bridge.zeroOutput().toVoltsPerVolt()).isCloseTo(zero, within(Math.abs(zero) * 1e-15));
        for (double e : new double[] {-0.02, -1e-4, 1e-4, 0.02}) {
            double exact = ExactBridge.ratio(bridge, e).doubleValue();
            assertThat(bridge.toRatio(e)).isCloseTo(exact, within(Math.abs(exact) * 1e-13));
            assertThat(bridge.toStrain(bridge.toRatio(e))).isCloseTo(e, within(Math.abs(e) * 1e-11));
        }
    }

    @Test
    void dividersPullingAgainstEachOtherLimitTheRangeToTheMonotonicBranch() {
        // Arm 1 sees +ε (K = 2), the adjacent arm 4 sees +ε/2: r = (1 + 2ε)/(2 + 2ε) −
        // (1 + ε)/(2 + ε), whose derivative vanishes at ε = √2 (by hand). Beyond it two strains
        // give one output, so the bridge reports no physical strain there.
        StrainGauge gauge = StrainGauge.ofOhms(120, 2.0);
        BridgeArm completion = BridgeArm.completion(Resistance.ofOhms(120));
        Bridge bridge = Bridge.of(BridgeArm.active(gauge, 1), completion, completion,
                BridgeArm.active(gauge, 0.5));
        double turn = Math.sqrt(2);
        assertThat(bridge.toRatio(turn * 0.999)).isFinite();
        assertThat(bridge.toRatio(turn * 1.001)).isNaN();
        double peak = ExactBridge.ratio(bridge, turn).doubleValue();
        assertThat(bridge.toStrain(peak * 1.0001)).isNaN();
        double nearPeak = bridge.toRatio(1.0);
        assertThat(bridge.toStrain(nearPeak)).isCloseTo(1.0, within(1e-12));
        assertThat(bridge.toStrain(bridge.toRatio(-0.3))).isCloseTo(-0.3, within(1e-14));
    }

    @Test
    void outputsOutsideThePhysicalRangeHaveNoStrain() {
        Bridge quarter = Bridge.quarter(GAUGE_120);
        // Quarter bridge: r = R1/(R1 + R) − 1/2 lies in (−1/2, 1/2) for R1 in (0, ∞); the model
        // stops at ε = 10, where r = K·ε/(4 + 2·K·ε) = 20/44 (closed form).
        assertThat(quarter.toStrain(-0.5)).isNaN();
        assertThat(quarter.toStrain(20.0 / 44 * 0.9999)).isFinite();
        assertThat(quarter.toStrain(20.0 / 44 * 1.0001)).isNaN();
        assertThat(quarter.toStrain(0.5)).isNaN();
        assertThat(quarter.toStrain(-0.4999)).isCloseTo(-0.5, within(1e-3));
        assertThatThrownBy(() -> quarter.strainAt(VoltageRatio.ofVoltsPerVolt(0.6)))
                .isInstanceOf(IllegalArgumentException.class)
                .hasMessage("ratio must be in the physical output range (-500.0 mV/V, 454.545 mV/V)"
                        + " of this bridge: 600.0 mV/V");
        // The gauge has no positive resistance at or below −1/K = −500 000 µε.
        assertThat(quarter.toRatio(-0.5)).isNaN();
        assertThat(quarter.toRatio(-0.4999)).isFinite();
        assertThatThrownBy(() -> quarter.outputAt(Strain.ofMicrostrain(-600_000)))
                .isInstanceOf(IllegalArgumentException.class)
                .hasMessage("strain must be in the physical range (-500000.0 µε, 10000000.0 µε) of"
                        + " this bridge: -600000.0 µε");
        assertThat(quarter.toRatio(9.999)).isFinite();
        assertThat(quarter.toRatio(10.0)).isNaN();
        assertThatThrownBy(() -> quarter.nonlinearityError(Strain.ofMicrostrain(-600_000)))
                .isInstanceOf(IllegalArgumentException.class)
                .hasMessageStartingWith("strain must be in the physical range");
    }

    @Test
    void halfBendingRangeEndsWhereEitherGaugeReachesZeroResistance() {
        // +ε and −ε arms: R(1 ± K·ε) > 0 for |ε| < 1/K; r = K·ε/2 in (−1/2, 1/2).
        Bridge half = Bridge.halfBending(StrainGauge.ofOhms(350, 2.0));
        assertThat(half.toRatio(0.4999)).isCloseTo(0.4999, within(1e-15));
        assertThat(half.toRatio(0.5)).isNaN();
        assertThat(half.toRatio(-0.5)).isNaN();
        assertThat(half.toStrain(0.4999)).isCloseTo(0.4999, within(1e-15));
        assertThat(half.toStrain(0.5)).isNaN();
    }

    @Test
    void valueApiAndKernelAgree() {
        Bridge bridge = Bridge.fullAxialPoisson(GAUGE_350, 0.3);
        Strain strain = Strain.ofMicrostrain(1234.5);
        VoltageRatio out = bridge.outputAt(strain);
        assertThat(out.toVoltsPerVolt()).isEqualTo(bridge.toRatio(strain.value()));
        assertThat(bridge.strainAt(out).value()).isEqualTo(bridge.toStrain(out.toVoltsPerVolt()));
        assertThat(bridge.outputVoltage(strain, Voltage.ofVolts(5)))
                .isEqualTo(out.times(Voltage.ofVolts(5)));
    }

    @Test
    void toStringReadsAsABridgeSheet() {
        assertThat(Bridge.quarter(GAUGE_120)).hasToString("quarter bridge, 0.5 mV/V per 1000 µε"
                + " [arm 1: active gauge ×1.0 (120.0 Ω, K=2.0); arm 2: completion resistor 120.0 Ω;"
                + " arm 3: completion resistor 120.0 Ω; arm 4: completion resistor 120.0 Ω]");
        assertThat(Bridge.fullAxialPoisson(GAUGE_350, 0.3).toString())
                .startsWith("full bridge, axial with Poisson gauges, 1.365 mV/V per 1000 µε")
                .contains("arm 2: active gauge ×-0.3 (350.0 Ω, K=2.1)");
        assertThat(Bridge.quarter(GAUGE_120).zeroedByOffset(VoltageRatio.ofMillivoltsPerVolt(1.25))
                .toString()).contains("zero offset 1.25 mV/V");
    }

    @Test
    void armsAreNumberedOneToFour() {
        Bridge bridge = Bridge.quarterWithDummy(GAUGE_120);
        assertThat(bridge.arm(1).isActive()).isTrue();
        assertThat(bridge.arm(2).isDummy()).isTrue();
        assertThat(bridge.arm(3).isCompletion()).isTrue();
        assertThatThrownBy(() -> bridge.arm(0)).isInstanceOf(IndexOutOfBoundsException.class);
        assertThatThrownBy(() -> bridge.arm(5)).isInstanceOf(IndexOutOfBoundsException.class);
    }

    @Test
    void poissonRatioOfZeroLeavesADummyGauge() {
        // By hand: with ν = 0 the Poisson arm sees no strain, so only arm 1 counts: bridge factor
        // 1.
        Bridge bridge = Bridge.halfAxialPoisson(GAUGE_120, 0.0);
        assertThat(bridge.arm(2).isDummy()).isTrue();
        assertThat(bridge.bridgeFactor()).isEqualTo(1.0);
    }

    @ParameterizedTest
    @ValueSource(doubles = {Double.NaN, Double.POSITIVE_INFINITY, Double.NEGATIVE_INFINITY, -1.0,
        0.5, 0.7})
    void poissonRatioOutsideMinusOneToOneHalfIsRejected(double bad) {
        String message = "poissonRatio must be in (-1.0, 0.5): " + bad;
        assertThatThrownBy(() -> Bridge.halfAxialPoisson(GAUGE_120, bad))
                .isInstanceOf(IllegalArgumentException.class).hasMessage(message);
        assertThatThrownBy(() -> Bridge.fullAxialPoisson(GAUGE_120, bad)).hasMessage(message);
        assertThatThrownBy(() -> Bridge.fullBendingPoisson(GAUGE_120, bad)).hasMessage(message);
    }

    @Test
    void nullsAreRejectedWithTheirName() {
        BridgeArm arm = BridgeArm.completion(Resistance.ofOhms(120));
        assertThatThrownBy(() -> Bridge.quarter(null))
                .isInstanceOf(NullPointerException.class).hasMessage("gauge");
        assertThatThrownBy(() -> Bridge.fullBending(null))
                .isInstanceOf(NullPointerException.class).hasMessage("gauge");
        assertThatThrownBy(() -> Bridge.of(arm, arm, null, arm))
                .isInstanceOf(NullPointerException.class).hasMessage("arm3");
        Bridge quarter = Bridge.quarter(GAUGE_120);
        assertThatThrownBy(() -> quarter.outputAt(null)).hasMessage("strain");
        assertThatThrownBy(() -> quarter.strainAt(null)).hasMessage("ratio");
        assertThatThrownBy(() -> quarter.linearisedStrainAt(null)).hasMessage("ratio");
        assertThatThrownBy(() -> quarter.nonlinearityError(null)).hasMessage("strain");
        assertThatThrownBy(() -> quarter.outputVoltage(Strain.ZERO, null))
                .hasMessage("excitation");
    }

    @Test
    void aBridgeWhoseOutputCannotChangeIsRejected() {
        // Two equal gauges seeing the same strain in one divider: R1/(R1 + R2) stays 1/2.
        BridgeArm same = BridgeArm.active(GAUGE_120, 1);
        BridgeArm completion = BridgeArm.completion(Resistance.ofOhms(120));
        assertThatThrownBy(() -> Bridge.of(same, same, completion, completion))
                .isInstanceOf(IllegalArgumentException.class)
                .hasMessageStartingWith("arms must give an output that changes with strain:");
        assertThatThrownBy(() -> Bridge.of(completion, completion, completion, completion))
                .isInstanceOf(IllegalArgumentException.class)
                .hasMessageStartingWith("arms must give an output that changes with strain:");
    }
}
