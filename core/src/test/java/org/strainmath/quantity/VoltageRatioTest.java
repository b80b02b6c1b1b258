package org.strainmath.quantity;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

class VoltageRatioTest {

    @Test
    void unitsConvertByDefinition() {
        // Definition: 1 mV/V = 1e-3 V/V (common practice, no source).
        assertThat(VoltageRatio.ofMillivoltsPerVolt(2).toVoltsPerVolt()).isEqualTo(0.002);
        assertThat(VoltageRatio.ofVoltsPerVolt(0.002).toMillivoltsPerVolt()).isEqualTo(2.0);
    }

    @Test
    void timesExcitationGivesTheOutputVoltage() {
        // 2 mV/V at 10 V excitation is 20 mV (definition of mV/V, common practice, no source).
        assertThat(VoltageRatio.ofMillivoltsPerVolt(2).times(Voltage.ofVolts(10)).toMillivolts())
                .isEqualTo(20.0);
    }

    @Test
    void arithmetic() {
        // By hand: 1.5 + 0.5 = 2, 1.5 − 0.5 = 1 and 0.5 × 4 = 2 mV/V.
        VoltageRatio a = VoltageRatio.ofMillivoltsPerVolt(1.5);
        VoltageRatio b = VoltageRatio.ofMillivoltsPerVolt(0.5);
        assertThat(a.plus(b)).isEqualTo(VoltageRatio.ofMillivoltsPerVolt(2));
        assertThat(a.minus(b)).isEqualTo(VoltageRatio.ofMillivoltsPerVolt(1));
        assertThat(b.multipliedBy(4)).isEqualTo(VoltageRatio.ofMillivoltsPerVolt(2));
    }

    @Test
    void equalityOrderAndText() {
        // By hand: 4.995004995e-4 V/V is 1/2002, shown as 0.4995 mV/V to four significant digits.
        assertThat(VoltageRatio.ofMillivoltsPerVolt(2)).isEqualTo(VoltageRatio.ofVoltsPerVolt(0.002))
                .hasSameHashCodeAs(VoltageRatio.ofVoltsPerVolt(0.002))
                .isGreaterThan(VoltageRatio.ZERO)
                .hasToString("2.0 mV/V")
                .isNotEqualTo(Voltage.ofMillivolts(2));
        assertThat(VoltageRatio.ofVoltsPerVolt(4.995004995004995e-4)).hasToString("0.4995 mV/V");
    }

    @Test
    void negativeZeroIsZero() {
        assertThat(VoltageRatio.ofVoltsPerVolt(-0.0)).isEqualTo(VoltageRatio.ZERO).hasSameHashCodeAs(VoltageRatio.ZERO);
    }

    @ParameterizedTest
    @ValueSource(doubles = {Double.NaN, Double.POSITIVE_INFINITY, Double.NEGATIVE_INFINITY})
    void nonFiniteValuesAreRejectedWithTheirName(double bad) {
        assertThatThrownBy(() -> VoltageRatio.ofVoltsPerVolt(bad))
                .isInstanceOf(IllegalArgumentException.class)
                .hasMessage("voltsPerVolt must be finite: " + bad);
        assertThatThrownBy(() -> VoltageRatio.ofMillivoltsPerVolt(bad))
                .hasMessage("millivoltsPerVolt must be finite: " + bad);
        assertThatThrownBy(() -> VoltageRatio.ZERO.multipliedBy(bad))
                .hasMessage("factor must be finite: " + bad);
    }
}
