package org.strainmath.quantity;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

class TemperatureTest {

    @Test
    void scalesConvertByDefinition() {
        // ISO 80000-5 and NIST SP 811 B.9: T/K = t/°C + 273.15, t/°C = (t/°F − 32)·5/9.
        assertThat(Temperature.ofCelsius(23).toKelvin()).isEqualTo(296.15);
        assertThat(Temperature.ofFahrenheit(212).toCelsius()).isCloseTo(100.0, within(1e-12));
        assertThat(Temperature.ofFahrenheit(-40).toCelsius()).isCloseTo(-40.0, within(1e-12));
        assertThat(Temperature.ofCelsius(37).toFahrenheit()).isCloseTo(98.6, within(1e-12));
        assertThat(Temperature.ofKelvin(0).toFahrenheit()).isCloseTo(-459.67, within(1e-12));
        assertThat(Temperature.ofCelsius(-273.15).toKelvin()).isEqualTo(0.0);
        assertThat(Temperature.ofFahrenheit(-459.67).toKelvin()).isCloseTo(0.0, within(1e-12));
    }

    @Test
    void differencesAreInKelvin() {
        // Definition: a difference of 1 °C is a difference of 1 K (ISO 80000-5).
        assertThat(Temperature.ofCelsius(80).kelvinAbove(Temperature.ofCelsius(20)))
                .isCloseTo(60.0, within(1e-12));
    }

    @Test
    void equalityOrderAndText() {
        assertThat(Temperature.ofCelsius(0)).isEqualTo(Temperature.ofKelvin(273.15))
                .hasSameHashCodeAs(Temperature.ofKelvin(273.15))
                .isLessThan(Temperature.ofCelsius(1))
                .isNotEqualTo(Strain.ZERO);
        assertThat(Temperature.ofCelsius(23)).hasToString("23.0 °C");
        assertThat(Temperature.ofKelvin(-0.0)).isEqualTo(Temperature.ofKelvin(0));
    }

    @ParameterizedTest
    @ValueSource(doubles = {Double.NaN, Double.POSITIVE_INFINITY, Double.NEGATIVE_INFINITY})
    void nonFiniteValuesAreRejectedWithTheirName(double bad) {
        assertThatThrownBy(() -> Temperature.ofKelvin(bad))
                .isInstanceOf(IllegalArgumentException.class)
                .hasMessage("kelvin must be >= 0 and finite: " + bad);
        assertThatThrownBy(() -> Temperature.ofCelsius(bad))
                .hasMessage("celsius must be >= -273.15 and finite: " + bad);
        assertThatThrownBy(() -> Temperature.ofFahrenheit(bad))
                .hasMessage("fahrenheit must be >= -459.67 and finite: " + bad);
    }

    @Test
    void belowAbsoluteZeroIsRejected() {
        assertThatThrownBy(() -> Temperature.ofKelvin(-0.01))
                .hasMessage("kelvin must be >= 0 and finite: -0.01");
        assertThatThrownBy(() -> Temperature.ofCelsius(-274))
                .hasMessage("celsius must be >= -273.15 and finite: -274.0");
        assertThatThrownBy(() -> Temperature.ofFahrenheit(-460))
                .hasMessage("fahrenheit must be >= -459.67 and finite: -460.0");
    }
}
