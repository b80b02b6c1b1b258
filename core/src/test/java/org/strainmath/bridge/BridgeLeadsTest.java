package org.strainmath.bridge;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.math.BigDecimal;
import java.util.SplittableRandom;
import java.util.stream.Stream;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;
import org.strainmath.quantity.Resistance;
import org.strainmath.quantity.VoltageRatio;

/** Lead wires in the arms and in the excitation, modelled exactly in the bridge equation. */
class BridgeLeadsTest {

    private static final StrainGauge GAUGE = StrainGauge.ofOhms(350, 2.0);
    private static final Resistance TWO_OHMS = Resistance.ofOhms(2);

    /** Oracle: {@link ExactBridge#wiredRatio}, 50 digits from the arm and lead resistances. */
    private static BigDecimal exact(Bridge bridge, double strain) {
        return ExactBridge.wiredRatio(bridge, strain);
    }

    @Test
    void threeWireQuarterBridgeKeepsItsBalanceAndLosesRgOverRgPlusRl() {
        // Dally & Riley, Experimental Stress Analysis; Window, Strain Gauge Technology: the
        // three-wire factor Rg/(Rg + RL); for 350 Ω and 2 Ω per lead 0.994318181818 (the value
        // the signal-chain issue quotes).
        Bridge bridge = Bridge.quarter(GAUGE).withThreeWireLeads(TWO_OHMS);
        assertThat(bridge.leadDesensitisation()).isCloseTo(0.994318181818, within(1e-12));
        assertThat(bridge.leadDesensitisation()).isCloseTo(350.0 / 352, within(1e-15));
        assertThat(bridge.isBalanced()).isTrue();
        assertThat(bridge.leadZeroOffset().toVoltsPerVolt()).isZero();
    }

    @Test
    void twoWireQuarterBridgeLosesRgOverRgPlusTwoRlWhenBalancedWithItsLeads() {
        // Dally & Riley; Window: the two-wire factor Rg/(Rg + 2RL) = 0.988700564972 for 350 Ω
        // and 2 Ω per lead. It holds for a bridge balanced with the leads in circuit: completion
        // arm 2 of 354 Ω. With the leads' unbalance left in, the exact factor is (Rg/(Rg+RL))²
        // (bridge equation, by hand), equal to first order in RL/Rg.
        Bridge reference = Bridge.quarter(GAUGE);
        Bridge balanced = Bridge.of(BridgeArm.active(GAUGE, 1),
                BridgeArm.completion(Resistance.ofOhms(354)),
                BridgeArm.completion(Resistance.ofOhms(350)),
                BridgeArm.completion(Resistance.ofOhms(350))).withTwoWireLeads(TWO_OHMS);
        assertThat(balanced.isBalanced()).isTrue();
        assertThat(balanced.sensitivity().toVoltsPerVolt() / reference.sensitivity().toVoltsPerVolt())
                .isCloseTo(0.988700564972, within(1e-12));

        Bridge unbalanced = reference.withTwoWireLeads(TWO_OHMS);
        assertThat(unbalanced.leadDesensitisation()).isCloseTo(Math.pow(350.0 / 352, 2), within(1e-15));
        // Zero output RL/(2·(Rg + RL)) = 2/704 V/V (bridge equation, by hand).
        assertThat(unbalanced.leadZeroOffset().toVoltsPerVolt()).isCloseTo(2.0 / 704, within(1e-17));
        assertThat(unbalanced.isBalanced()).isFalse();
    }

    @Test
    void fullBridgeWithoutRemoteSenseSeesItsExcitationReducedByRbOverRbPlusTwoRl() {
        // Window, Strain Gauge Technology: Rb/(Rb + 2RL) without remote sense; Rb = 350 Ω for a
        // full bridge of 350 Ω arms.
        Bridge bridge = Bridge.fullAxialPoisson(GAUGE, 0.3).withExcitationLeads(TWO_OHMS);
        assertThat(bridge.leadDesensitisation()).isCloseTo(350.0 / 354, within(1e-15));
        assertThat(bridge.excitationLeads().toOhms()).isEqualTo(4.0);
        assertThat(bridge.isBalanced()).isTrue();
        Bridge sensed = bridge.withExcitationLeads(Resistance.ZERO);
        assertThat(sensed.leadDesensitisation()).isEqualTo(1.0);
        // A full bending bridge keeps Rb constant, so it stays exactly linear with the leads.
        assertThat(Bridge.fullBending(GAUGE).withExcitationLeads(TWO_OHMS).isLinear()).isTrue();
    }

    @Test
    void theExactModelReducesToTheTextbookFactorsAtSmallStrain() {
        // The ratio of outputs with and without leads at 1e-9 strain equals the small-strain
        // factor to about 1e-9 (the next term is of the order of K·ε).
        double e = 1e-9;
        Bridge quarter = Bridge.quarter(GAUGE);
        assertThat(quarter.withThreeWireLeads(TWO_OHMS).toRatio(e) / quarter.toRatio(e))
                .isCloseTo(350.0 / 352, within(1e-8));
        Bridge full = Bridge.fullAxialPoisson(GAUGE, 0.3);
        assertThat(full.withExcitationLeads(TWO_OHMS).toRatio(e) / full.toRatio(e))
                .isCloseTo(350.0 / 354, within(1e-8));
    }

    static Stream<Arguments> wiredCases() {
        SplittableRandom random = new SplittableRandom(0x1EAD);
        Stream.Builder<Arguments> cases = Stream.builder();
        for (Arrangement arrangement : Arrangement.values()) {
            for (int i = 0; i < 25; i++) {
                cases.add(Arguments.of(arrangement, random.nextDouble(1.8, 4.5),
                        random.nextDouble(0, 10), random.nextDouble(0, 10),
                        random.nextDouble(0, 10), random.nextDouble(-0.05, 0.05)));
            }
        }
        return cases.build();
    }

    @ParameterizedTest(name = "{0} K={1} arm1 {2} Ω arm2 {3} Ω excitation {4} Ω e={5}")
    @MethodSource("wiredCases")
    void wiredBridgesMatchTheExactEquationAndRoundTrip(Arrangement arrangement, double k,
            double lead1, double lead2, double excitation, double strain) {
        // Leads 0 to 10 Ω, gauge factors 1.8 to 4.5, ±50 000 µε (the signal-chain issue's ranges).
        Bridge bridge = arrangement.build(StrainGauge.ofOhms(350, k), 0.3)
                .withLeadInArm(1, Resistance.ofOhms(lead1))
                .withLeadInArm(2, Resistance.ofOhms(lead2))
                .withExcitationLeads(Resistance.ofOhms(excitation / 2));
        BigDecimal oracle = exact(bridge, strain);
        double ratio = bridge.toRatio(strain);
        double relative = new BigDecimal(ratio).subtract(oracle)
                .divide(oracle, ExactBridge.DIGITS_50).abs().doubleValue();
        assertThat(relative).isLessThanOrEqualTo(1e-12);
        assertThat(bridge.toStrain(ratio)).isCloseTo(strain, within(Math.abs(strain) * 1e-10));
        // Zeroed by offset at its own zero, the wired bridge reads zero strain there.
        Bridge zeroed = bridge.zeroedByOffset(bridge.zeroOutput());
        assertThat(zeroed.toStrain(bridge.zeroOutput().toVoltsPerVolt())).isCloseTo(0, within(1e-15));
    }

    @Test
    void exactZeroingWorksWithTheLeadsInCircuit() {
        // The truth: the gauge 0.3 % high, two-wire leads, excitation leads. Oracle: exact().
        BridgeArm completion = BridgeArm.completion(Resistance.ofOhms(350));
        Bridge truth = Bridge.of(BridgeArm.active(StrainGauge.ofOhms(351.05, 2.0), 1), completion,
                completion, completion).withTwoWireLeads(TWO_OHMS)
                .withExcitationLeads(Resistance.ofOhms(1.5));
        Bridge model = Bridge.quarter(GAUGE).withTwoWireLeads(TWO_OHMS)
                .withExcitationLeads(Resistance.ofOhms(1.5));
        VoltageRatio initial = VoltageRatio.ofVoltsPerVolt(exact(truth, 0).doubleValue());
        Bridge zeroed = model.zeroedInArm(initial, 1);
        assertThat(zeroed.arm(1).nominalResistance().toOhms()).isCloseTo(351.05, within(351.05e-12));
        for (double e : new double[] {-0.01, 2e-3}) {
            assertThat(zeroed.toStrain(exact(truth, e).doubleValue()))
                    .isCloseTo(e, within(Math.abs(e) * 1e-11));
        }
    }

    @Test
    void leadsShowOnTheBridgeSheetAndAreValidated() {
        // By hand: a three-wire lead puts one lead in arms 1 and 2 and none in arm 3; the two
        // excitation leads of 0.5 Ω add to 1 Ω; no leads leave the sensitivity at 1 and the zero at
        // 0.
        Bridge bridge = Bridge.quarter(GAUGE).withThreeWireLeads(TWO_OHMS)
                .withExcitationLeads(Resistance.ofOhms(0.5));
        assertThat(bridge.toString()).endsWith("; leads: arm 1 2.0 Ω, arm 2 2.0 Ω, excitation 1.0 Ω]");
        assertThat(bridge.leadInArm(3)).isEqualTo(Resistance.ZERO);
        assertThatThrownBy(() -> bridge.withLeadInArm(0, TWO_OHMS))
                .isInstanceOf(IndexOutOfBoundsException.class);
        assertThatThrownBy(() -> bridge.leadInArm(5)).isInstanceOf(IndexOutOfBoundsException.class);
        assertThatThrownBy(() -> bridge.withLeadInArm(1, null))
                .isInstanceOf(NullPointerException.class).hasMessage("lead");
        assertThatThrownBy(() -> bridge.withTwoWireLeads(null)).hasMessage("perLead");
        assertThatThrownBy(() -> bridge.withThreeWireLeads(null)).hasMessage("perLead");
        assertThatThrownBy(() -> bridge.withExcitationLeads(null)).hasMessage("perLead");
        assertThat(Bridge.quarter(GAUGE).leadDesensitisation()).isEqualTo(1.0);
        assertThat(Bridge.quarter(GAUGE).leadZeroOffset()).isEqualTo(VoltageRatio.ZERO);
    }
}
