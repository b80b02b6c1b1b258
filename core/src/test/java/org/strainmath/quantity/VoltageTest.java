package org.strainmath.quantity;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

class VoltageTest {

    @Test
    void unitsConvertByDefinition() {
        // Definition: the SI prefixes m = 1e-3 and µ = 1e-6 (SI Brochure, 9th ed.).
        assertThat(Voltage.ofMillivolts(1.5).toVolts()).isEqualTo(0.0015);
        assertThat(Voltage.ofMicrovolts(250).toMillivolts()).isCloseTo(0.25, within(1e-16));
        assertThat(Voltage.ofVolts(0.0015).toMicrovolts()).isCloseTo(1500.0, within(1e-12));
    }

    @Test
    void arithmeticAndRatios() {
        // By hand: 10 ± 2 V, 2 mV × 100 = 0.2 V, 3 mV / 10 V = 0.3 mV/V.
        Voltage ten = Voltage.ofVolts(10);
        assertThat(ten.plus(Voltage.ofVolts(2)).toVolts()).isEqualTo(12.0);
        assertThat(ten.minus(Voltage.ofVolts(2)).toVolts()).isEqualTo(8.0);
        assertThat(Voltage.ofMillivolts(2).multipliedBy(100).toVolts()).isEqualTo(0.2);
        VoltageRatio ratio = Voltage.ofMillivolts(3).ratioTo(ten);
        assertThat(ratio.toMillivoltsPerVolt()).isCloseTo(0.3, within(1e-15));
        assertThatThrownBy(() -> ten.ratioTo(Voltage.ZERO))
                .isInstanceOf(IllegalArgumentException.class)
                .hasMessage("reference must be != 0: 0.0");
    }

    @Test
    void textPicksTheReadableUnit() {
        assertThat(Voltage.ofVolts(12)).hasToString("12.0 V");
        assertThat(Voltage.ofMillivolts(-1.5)).hasToString("-1.5 mV");
        assertThat(Voltage.ofMicrovolts(12.5)).hasToString("12.5 µV");
        assertThat(Voltage.ZERO).hasToString("0.0 V");
        assertThat(Voltage.ofVolts(1)).hasToString("1.0 V");
        assertThat(Voltage.ofMillivolts(1)).hasToString("1.0 mV");
        assertThat(Voltage.ofVolts(-0.0)).isEqualTo(Voltage.ZERO);
    }

    @Test
    void equalityAndOrder() {
        assertThat(Voltage.ofMillivolts(1000)).isEqualTo(Voltage.ofVolts(1))
                .hasSameHashCodeAs(Voltage.ofVolts(1))
                .isLessThan(Voltage.ofVolts(1.5))
                .isNotEqualTo(Resistance.ofOhms(1));
    }

    @ParameterizedTest
    @ValueSource(doubles = {Double.NaN, Double.POSITIVE_INFINITY, Double.NEGATIVE_INFINITY})
    void nonFiniteValuesAreRejectedWithTheirName(double bad) {
        assertThatThrownBy(() -> Voltage.ofVolts(bad))
                .isInstanceOf(IllegalArgumentException.class)
                .hasMessage("volts must be finite: " + bad);
        assertThatThrownBy(() -> Voltage.ofMillivolts(bad))
                .hasMessage("millivolts must be finite: " + bad);
        assertThatThrownBy(() -> Voltage.ofMicrovolts(bad))
                .hasMessage("microvolts must be finite: " + bad);
        assertThatThrownBy(() -> Voltage.ZERO.multipliedBy(bad))
                .hasMessage("factor must be finite: " + bad);
    }
}
