package org.strainmath.bridge;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.math.BigDecimal;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.strainmath.quantity.Resistance;
import org.strainmath.quantity.Strain;
import org.strainmath.quantity.VoltageRatio;

class BridgeZeroingTest {

    private static final StrainGauge GAUGE = StrainGauge.ofOhms(120, 2.0);
    private static final BridgeArm COMPLETION = BridgeArm.completion(Resistance.ofOhms(120));

    /** A quarter bridge whose active gauge is off its nominal resistance. */
    private static Bridge offNominal(double gaugeOhms) {
        return Bridge.of(BridgeArm.active(StrainGauge.ofOhms(gaugeOhms, 2.0), 1), COMPLETION,
                COMPLETION, COMPLETION);
    }

    @ParameterizedTest
    @ValueSource(ints = {1, 2, 3, 4})
    void exactZeroingRecoversTheArmThatCausedTheUnbalance(int arm) {
        // The true bridge: arm `arm` 0.4 % high; its unstrained reading from ExactBridge.
        BridgeArm[] arms = {BridgeArm.active(GAUGE, 1), COMPLETION, COMPLETION, COMPLETION};
        arms[arm - 1] = arm == 1
                ? BridgeArm.active(StrainGauge.ofOhms(120.48, 2.0), 1)
                : BridgeArm.completion(Resistance.ofOhms(120.48));
        Bridge truth = Bridge.of(arms[0], arms[1], arms[2], arms[3]);
        VoltageRatio initial = VoltageRatio.ofVoltsPerVolt(ExactBridge.ratio(truth, 0).doubleValue());

        Bridge zeroed = Bridge.quarter(GAUGE).zeroedInArm(initial, arm);
        assertThat(zeroed.arm(arm).nominalResistance().toOhms()).isCloseTo(120.48, within(120.48e-13));
        assertThat(zeroed.toStrain(initial.toVoltsPerVolt())).isCloseTo(0.0, within(1e-17));
        for (double e : new double[] {-0.01, 1e-3, 0.02}) {
            double reading = ExactBridge.ratio(truth, e).doubleValue();
            assertThat(zeroed.toStrain(reading)).isCloseTo(e, within(Math.abs(e) * 1e-12));
        }
        assertThat(zeroed.isBalanced()).isFalse();
    }

    @Test
    void offsetZeroingReadsZeroAtTheInitialReadingAndShiftsTheOutput() {
        Bridge quarter = Bridge.quarter(GAUGE);
        VoltageRatio initial = VoltageRatio.ofMillivoltsPerVolt(1.0);
        Bridge zeroed = quarter.zeroedByOffset(initial);
        assertThat(zeroed.zeroOutput().toVoltsPerVolt()).isCloseTo(1e-3, within(1e-18));
        assertThat(zeroed.toStrain(1e-3)).isCloseTo(0.0, within(1e-18));
        assertThat(zeroed.isBalanced()).isTrue();
        // The output is the nominal output plus the offset (definition of the offset method).
        for (double e : new double[] {-0.01, 1e-3, 0.02}) {
            assertThat(zeroed.toRatio(e)).isCloseTo(quarter.toRatio(e) + 1e-3, within(1e-17));
            assertThat(zeroed.toStrain(zeroed.toRatio(e))).isCloseTo(e, within(Math.abs(e) * 1e-12));
        }
        // Zeroing again replaces the first zeroing rather than adding to it.
        Bridge again = zeroed.zeroedByOffset(VoltageRatio.ofMillivoltsPerVolt(-0.5));
        assertThat(again.toStrain(-0.5e-3)).isCloseTo(0.0, within(1e-18));
    }

    @Test
    void offsetZeroingErrorAgreesWithItsDocumentedSecondOrderEstimate() {
        // Truth: the active gauge is high, so that the unstrained reading is r0. Oracle for the
        // readings: ExactBridge (50 digits). Documented estimate (derived by hand from the
        // bridge equation, second order): relative error ≈ −r0·(4·r0 + K·ε).
        for (double r0 : new double[] {1e-3, 2e-3, 1e-2}) {
            double t = 0.5 + r0;
            Bridge truth = offNominal(t * 120 / (1 - t));
            Bridge zeroed = Bridge.quarter(GAUGE)
                    .zeroedByOffset(VoltageRatio.ofVoltsPerVolt(ExactBridge.ratio(truth, 0).doubleValue()));
            for (double e : new double[] {1e-3, 5e-3}) {
                double read = zeroed.toStrain(ExactBridge.ratio(truth, e).doubleValue());
                double error = (read - e) / e;
                double estimate = -r0 * (4 * r0 + 2.0 * e);
                assertThat(error).as("r0 %s, e %s", r0, e)
                        .isCloseTo(estimate, within(Math.abs(estimate) * 0.05));
            }
        }
    }

    @Test
    void offsetZeroingIsExactWhenTheUnbalanceIsInTheOtherDivider() {
        // Arm 4 high: the divider R1/(R1 + R2) that carries the gauge is unchanged, so the output
        // change is the nominal one (bridge equation, by hand).
        Bridge truth = Bridge.of(BridgeArm.active(GAUGE, 1), COMPLETION, COMPLETION,
                BridgeArm.completion(Resistance.ofOhms(121)));
        Bridge zeroed = Bridge.quarter(GAUGE)
                .zeroedByOffset(VoltageRatio.ofVoltsPerVolt(ExactBridge.ratio(truth, 0).doubleValue()));
        double e = 2e-3;
        assertThat(zeroed.toStrain(ExactBridge.ratio(truth, e).doubleValue()))
                .isCloseTo(e, within(e * 1e-12));
    }

    @Test
    void bothMethodsAgreeForSmallUnbalanceAndDifferForLarge() {
        // Common practice, no source: an offset zero is as good as a zero in the arm for a small
        // unbalance and not for a large one. The bounds bracket what this bridge gives (2.4e-7
        // relative at r0 = 1e-4, 4.2e-4 at r0 = 1e-2, computed once) with a margin each way.
        Bridge quarter = Bridge.quarter(GAUGE);
        for (double r0 : new double[] {1e-4, 1e-2}) {
            VoltageRatio initial = VoltageRatio.ofVoltsPerVolt(r0);
            Bridge exact = quarter.zeroedInArm(initial, 1);
            Bridge offset = quarter.zeroedByOffset(initial);
            double reading = exact.toRatio(1e-3);
            double difference = Math.abs(offset.toStrain(reading) - 1e-3) / 1e-3;
            if (r0 < 1e-3) {
                assertThat(difference).isLessThan(1e-6);
            } else {
                assertThat(difference).isGreaterThan(1e-4);
            }
        }
    }

    @Test
    void impossibleInitialReadingsAreRejected() {
        Bridge quarter = Bridge.quarter(GAUGE);
        assertThatThrownBy(() -> quarter.zeroedByOffset(VoltageRatio.ofVoltsPerVolt(0.7)))
                .isInstanceOf(IllegalArgumentException.class)
                .hasMessage("initialReading must be in the physical output range (-500.0 mV/V,"
                        + " 454.545 mV/V) of the unzeroed bridge: 700.0 mV/V");
        assertThatThrownBy(() -> quarter.zeroedInArm(VoltageRatio.ofVoltsPerVolt(0.5), 1))
                .isInstanceOf(IllegalArgumentException.class)
                .hasMessage("initialReading cannot be explained by arm 1 with a positive"
                        + " resistance: 500.0 mV/V");
        assertThatThrownBy(() -> quarter.zeroedInArm(VoltageRatio.ofVoltsPerVolt(-0.5), 3))
                .hasMessage("initialReading cannot be explained by arm 3 with a positive"
                        + " resistance: -500.0 mV/V");
        assertThatThrownBy(() -> quarter.zeroedInArm(VoltageRatio.ZERO, 0))
                .isInstanceOf(IndexOutOfBoundsException.class);
        assertThatThrownBy(() -> quarter.zeroedInArm(VoltageRatio.ZERO, 5))
                .isInstanceOf(IndexOutOfBoundsException.class);
        assertThatThrownBy(() -> quarter.zeroedInArm(null, 1))
                .isInstanceOf(NullPointerException.class).hasMessage("initialReading");
        assertThatThrownBy(() -> quarter.zeroedByOffset(null))
                .isInstanceOf(NullPointerException.class).hasMessage("initialReading");
    }

    @Test
    void exactZeroingOfAnActiveArmKeepsItsGauge() {
        Bridge zeroed = Bridge.halfBending(GAUGE).zeroedInArm(VoltageRatio.ofMillivoltsPerVolt(2), 2);
        BridgeArm arm = zeroed.arm(2);
        assertThat(arm.isActive()).isTrue();
        assertThat(arm.strainMultiple()).isEqualTo(-1.0);
        assertThat(arm.gauge().orElseThrow().gaugeFactor()).isEqualTo(2.0);
        // R1/(R1 + R2) = 1/2 + r0 with R1 = 120 Ω: R2 = 120·(1 − t)/t (by hand).
        double t = 0.5 + 2e-3;
        assertThat(arm.nominalResistance().toOhms()).isCloseTo(120 * (1 - t) / t, within(1e-11));
        assertThat(new BigDecimal(zeroed.zeroOutput().toVoltsPerVolt()).doubleValue())
                .isCloseTo(2e-3, within(1e-17));
        assertThat(zeroed.strainAt(zeroed.outputAt(Strain.ofMicrostrain(800))).toMicrostrain())
                .isCloseTo(800.0, within(800e-12));
    }

    @org.junit.jupiter.params.ParameterizedTest
    @org.junit.jupiter.params.provider.EnumSource(Arrangement.class)
    void zeroedBridgesOfEveryArrangementRoundTripAndLineariseFromTheirZero(Arrangement arrangement) {
        // Oracles: the round trip itself, and the definitions of the linearised strain
        // (r − r0)/(dr/dε) and of the nonlinearity error (ε_lin − ε)/ε evaluated from 50-digit
        // readings of the zeroed bridge (ExactBridge plus the offset, or with the solved arm).
        Bridge nominal = arrangement.build(StrainGauge.ofOhms(350, 2.1), 0.3);
        VoltageRatio initial = VoltageRatio.ofMillivoltsPerVolt(1.7);
        for (Bridge zeroed : new Bridge[] {nominal.zeroedByOffset(initial),
            nominal.zeroedInArm(initial, 1), nominal.zeroedInArm(initial, 4)}) {
            assertThat(zeroed.zeroOutput().toVoltsPerVolt()).isCloseTo(1.7e-3, within(1e-17));
            assertThat(zeroed.linearisedStrainAt(initial).value()).isCloseTo(0.0, within(1e-15));
            double slope = zeroed.sensitivity().toVoltsPerVolt() * 1e3;
            for (double e : new double[] {-0.02, -1e-4, 3e-4, 0.03}) {
                double reading = zeroed.toRatio(e);
                assertThat(zeroed.toStrain(reading)).as("%s", zeroed)
                        .isCloseTo(e, within(Math.abs(e) * 1e-11));
                double linearised = (reading - 1.7e-3) / slope;
                assertThat(zeroed.linearisedStrainAt(VoltageRatio.ofVoltsPerVolt(reading)).value())
                        .isCloseTo(linearised, within(Math.abs(linearised) * 1e-12));
                assertThat(zeroed.nonlinearityError(Strain.of(e)))
                        .isCloseTo((linearised - e) / e, within(1e-9));
            }
        }
    }

    @Test
    void rezeroingChecksTheReadingAgainstTheUnzeroedRange() {
        // The unzeroed quarter bridge reads at most 20/44 V/V (ε = 10, closed form); a first
        // offset of 5 mV/V must not widen what a second zeroing accepts.
        Bridge once = Bridge.quarter(GAUGE).zeroedByOffset(VoltageRatio.ofMillivoltsPerVolt(5));
        assertThatThrownBy(() -> once.zeroedByOffset(VoltageRatio.ofVoltsPerVolt(0.46)))
                .isInstanceOf(IllegalArgumentException.class)
                .hasMessage("initialReading must be in the physical output range (-500.0 mV/V,"
                        + " 454.545 mV/V) of the unzeroed bridge: 460.0 mV/V");
        assertThat(once.zeroedByOffset(VoltageRatio.ofVoltsPerVolt(-0.4999)).toStrain(-0.4999))
                .isCloseTo(0.0, within(1e-15));
    }
}
