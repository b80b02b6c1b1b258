package org.strainmath.bridge;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.strainmath.quantity.Temperature;

class LeadWireTest {

    @Test
    void copperFollowsTheAnnealedCopperStandard() {
        // IEC 60028 (values from memory): ρ20 = 1/58 Ω·mm²/m, α20 = 0.00393 /K.
        // 10 m of 0.14 mm²: 10/(58·0.14) = 1.231527... Ω (hand computation).
        LeadWire wire = LeadWire.copper(10, 0.14);
        assertThat(wire.resistance().toOhms()).isCloseTo(10 / (58 * 0.14), within(1e-14));
        assertThat(wire.resistance().toOhms()).isCloseTo(1.2315, within(1e-4));
        // At 70 °C: × (1 + 0.00393·50) = × 1.1965.
        assertThat(wire.resistanceAt(Temperature.ofCelsius(70)).toOhms())
                .isCloseTo(10 / (58 * 0.14) * 1.1965, within(1e-12));
        assertThat(wire.resistanceAt(Temperature.ofCelsius(20))).isEqualTo(wire.resistance());
        assertThat(wire).hasToString("LeadWire[10.0 m, 0.14 mm², 1.23153 Ω at 20 °C]");
        assertThat(wire.lengthMetres()).isEqualTo(10.0);
        assertThat(wire.crossSectionSquareMillimetres()).isEqualTo(0.14);
    }

    @Test
    void aThreeWireQuarterBridgeOnFiftyMetresOfCopper() {
        // 50 m of 0.25 mm² copper: RL = 50/(58·0.25) = 3.448 Ω; the three-wire factor
        // Rg/(Rg + RL) for 350 Ω (Dally & Riley; Window).
        double lead = 50 / (58 * 0.25);
        Bridge bridge = Bridge.quarter(StrainGauge.ofOhms(350, 2.0))
                .withThreeWireLeads(LeadWire.copper(50, 0.25).resistance());
        assertThat(bridge.leadDesensitisation()).isCloseTo(350 / (350 + lead), within(1e-14));
    }

    @Test
    void otherConductorsAndZeroLength() {
        // By hand: R = ρ·L/A = 0.0178 Ω·mm²/m × 2 m / 0.5 mm² = 0.0712 Ω; zero length, zero ohms.
        LeadWire nickelPlated = LeadWire.of(2, 0.5, 0.0178, 0.0039);
        assertThat(nickelPlated.resistance().toOhms()).isCloseTo(0.0712, within(1e-15));
        assertThat(LeadWire.copper(0, 0.5).resistance().isZero()).isTrue();
    }

    @ParameterizedTest
    @ValueSource(doubles = {Double.NaN, Double.POSITIVE_INFINITY, -1})
    void badDimensionsAreRejected(double bad) {
        assertThatThrownBy(() -> LeadWire.copper(bad, 0.14))
                .isInstanceOf(IllegalArgumentException.class)
                .hasMessage("lengthMetres must be >= 0 and finite: " + bad);
        assertThatThrownBy(() -> LeadWire.copper(10, bad))
                .hasMessage("crossSectionSquareMillimetres must be > 0 and finite: " + bad);
        assertThatThrownBy(() -> LeadWire.of(10, 0.14, bad, 0.0039))
                .hasMessage("resistivity must be > 0 and finite: " + bad);
    }

    @Test
    void badTemperatureDataAreRejected() {
        assertThatThrownBy(() -> LeadWire.of(10, 0.14, 0.0172, Double.NaN))
                .hasMessage("temperatureCoefficient must be finite: NaN");
        assertThatThrownBy(() -> LeadWire.copper(10, 0.14).resistanceAt(null))
                .isInstanceOf(NullPointerException.class).hasMessage("temperature");
        assertThatThrownBy(() -> LeadWire.of(10, 0.14, 0.0172, 0.1)
                .resistanceAt(Temperature.ofCelsius(5)))
                .isInstanceOf(IllegalArgumentException.class)
                .hasMessage("temperature must keep the resistance positive under the linear law:"
                        + " 5.0 °C");
    }
}
