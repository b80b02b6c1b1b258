package org.strainmath.bridge;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.strainmath.quantity.Resistance;
import org.strainmath.quantity.Voltage;

class BridgeExcitationTest {

    private static final StrainGauge GAUGE_120 = StrainGauge.ofOhms(120, 2.0);
    private static final StrainGauge GAUGE_350 = StrainGauge.ofOhms(350, 2.0).withGridArea(3.0);

    @Test
    void aQuarterBridgeGaugeAtBalanceSeesHalfTheExcitation() {
        // Common practice, no source: Vex/2 across the gauge, P = (Vex/2)²/Rg = 25/120 W at 10 V.
        Bridge quarter = Bridge.quarter(GAUGE_120);
        assertThat(quarter.powerInArmWatts(1, Voltage.ofVolts(10))).isCloseTo(25.0 / 120, within(1e-15));
        assertThat(quarter.powerInArmWatts(3, Voltage.ofVolts(10))).isCloseTo(25.0 / 120, within(1e-15));
    }

    @Test
    void leadsTakeTheirShareOfTheExcitation() {
        // Three-wire leads of 2 Ω in arms 1 and 2: I = Vex/(2·(Rg + RL)), P = I²·Rg (Ohm's law).
        Bridge threeWire = Bridge.quarter(GAUGE_120).withThreeWireLeads(Resistance.ofOhms(2));
        double current = 10.0 / (2 * 122);
        assertThat(threeWire.powerInArmWatts(1, Voltage.ofVolts(10)))
                .isCloseTo(current * current * 120, within(1e-15));
        // Excitation leads of 1 Ω each on a 120 Ω full bridge: Vb = Vex·120/122, each arm Vb/2.
        Bridge full = Bridge.fullBending(GAUGE_120).withExcitationLeads(Resistance.ofOhms(1));
        double half = 10.0 * 120 / 122 / 2;
        assertThat(full.powerInArmWatts(2, Voltage.ofVolts(10))).isCloseTo(half * half / 120, within(1e-15));
    }

    @Test
    void largestExcitationForAPowerLimit() {
        // P = Vex²/(4·Rg) <= Pmax gives Vex = 2·√(Pmax·Rg): 2·√(0.05·350) = 8.3666 V (by hand).
        assertThat(Bridge.quarter(GAUGE_350).maximumExcitationForPower(0.05).toVolts())
                .isCloseTo(2 * Math.sqrt(0.05 * 350), within(1e-12));
        assertThat(Bridge.fullAxialPoisson(GAUGE_350, 0.3).maximumExcitationForPower(0.05).toVolts())
                .isCloseTo(8.3666, within(1e-4));
        // Density 0.00155 W/mm² over 3 mm²: Pmax = 0.00465 W, Vex = 2·√(0.00465·350).
        assertThat(Bridge.quarter(GAUGE_350).maximumExcitationForPowerDensity(0.00155).toVolts())
                .isCloseTo(2 * Math.sqrt(0.00465 * 350), within(1e-12));
        // The smaller gauge limits a bridge of mixed gauges: 120 Ω next to 350 Ω.
        Bridge mixed = Bridge.of(BridgeArm.active(GAUGE_120, 1), BridgeArm.dummy(GAUGE_120),
                BridgeArm.completion(Resistance.ofOhms(350)), BridgeArm.completion(Resistance.ofOhms(350)));
        assertThat(mixed.maximumExcitationForPower(0.05).toVolts())
                .isCloseTo(2 * Math.sqrt(0.05 * 120), within(1e-12));
    }

    @Test
    void densityNeedsTheGridArea() {
        // Definition: the grid area as given; a power density needs it.
        assertThatThrownBy(() -> Bridge.quarter(GAUGE_120).maximumExcitationForPowerDensity(0.001))
                .isInstanceOf(IllegalArgumentException.class)
                .hasMessage("gridArea must be given for every gauge of the bridge: active gauge ×1.0"
                        + " (120.0 Ω, K=2.0)");
        assertThat(GAUGE_350.gridAreaSquareMillimetres()).isEqualTo(3.0);
        assertThat(GAUGE_350).hasToString("StrainGauge[350.0 Ω, K=2.0, grid 3.0 mm²]");
        assertThat(GAUGE_350).isNotEqualTo(StrainGauge.ofOhms(350, 2.0));
    }

    @ParameterizedTest
    @ValueSource(doubles = {Double.NaN, Double.POSITIVE_INFINITY, 0.0, -1.0})
    void limitsMustBePositiveAndFinite(double bad) {
        Bridge quarter = Bridge.quarter(GAUGE_350);
        assertThatThrownBy(() -> quarter.maximumExcitationForPower(bad))
                .isInstanceOf(IllegalArgumentException.class)
                .hasMessage("wattsPerGauge must be > 0 and finite: " + bad);
        assertThatThrownBy(() -> quarter.maximumExcitationForPowerDensity(bad))
                .hasMessage("wattsPerSquareMillimetre must be > 0 and finite: " + bad);
        assertThatThrownBy(() -> GAUGE_120.withGridArea(bad))
                .hasMessage("gridArea must be > 0 and finite: " + bad);
    }

    @Test
    void badArgumentsAreRejected() {
        Bridge quarter = Bridge.quarter(GAUGE_350);
        assertThatThrownBy(() -> quarter.powerInArmWatts(1, null))
                .isInstanceOf(NullPointerException.class).hasMessage("excitation");
        assertThatThrownBy(() -> quarter.powerInArmWatts(0, Voltage.ofVolts(5)))
                .isInstanceOf(IndexOutOfBoundsException.class);
    }
}
