package org.strainmath.quantity;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

class StrainTest {

    @Test
    void unitsConvertByDefinition() {
        // Definition: 1 µε = 1e-6 m/m, 1 % = 1e-2 m/m (common practice, no source).
        assertThat(Strain.ofMicrostrain(250).value()).isEqualTo(2.5e-4);
        assertThat(Strain.of(2.5e-4).toMicrostrain()).isEqualTo(250.0);
        assertThat(Strain.ofPercent(5).toMicrostrain()).isEqualTo(50_000.0);
        assertThat(Strain.of(0.05).toPercent()).isEqualTo(5.0);
    }

    @Test
    void arithmeticKeepsUnits() {
        Strain a = Strain.ofMicrostrain(300);
        Strain b = Strain.ofMicrostrain(-100);
        // Sums in m/m round in the last bit: 1e-15 relative.
        assertThat(a.plus(b).toMicrostrain()).isCloseTo(200.0, within(200e-15));
        assertThat(a.minus(b).toMicrostrain()).isCloseTo(400.0, within(400e-15));
        assertThat(a.multipliedBy(-0.3).toMicrostrain()).isCloseTo(-90.0, within(90e-15));
        assertThat(a.negated().toMicrostrain()).isEqualTo(-300.0);
        assertThat(Strain.ZERO.isZero()).isTrue();
        assertThat(a.isZero()).isFalse();
    }

    @Test
    void equalityOrderAndText() {
        // The library's own text rule, by hand: microstrain to six significant digits.
        assertThat(Strain.ofMicrostrain(250)).isEqualTo(Strain.of(2.5e-4))
                .hasSameHashCodeAs(Strain.of(2.5e-4))
                .isNotEqualTo(Strain.ofMicrostrain(251))
                .isNotEqualTo("250 µε");
        assertThat(Strain.of(-0.0)).isEqualTo(Strain.ZERO);
        assertThat(Strain.ofMicrostrain(-1)).isLessThan(Strain.ZERO);
        assertThat(Strain.ofMicrostrain(250)).hasToString("250.0 µε");
        assertThat(Strain.ofMicrostrain(-208.33333)).hasToString("-208.333 µε");
    }

    @ParameterizedTest
    @ValueSource(doubles = {Double.NaN, Double.POSITIVE_INFINITY, Double.NEGATIVE_INFINITY})
    void nonFiniteValuesAreRejectedWithTheirName(double bad) {
        assertThatThrownBy(() -> Strain.of(bad)).isInstanceOf(IllegalArgumentException.class)
                .hasMessage("strain must be finite: " + bad);
        assertThatThrownBy(() -> Strain.ofMicrostrain(bad))
                .isInstanceOf(IllegalArgumentException.class)
                .hasMessage("microstrain must be finite: " + bad);
        assertThatThrownBy(() -> Strain.ofPercent(bad))
                .isInstanceOf(IllegalArgumentException.class)
                .hasMessage("percent must be finite: " + bad);
        assertThatThrownBy(() -> Strain.ZERO.multipliedBy(bad))
                .isInstanceOf(IllegalArgumentException.class)
                .hasMessage("factor must be finite: " + bad);
    }

    @Test
    void overflowIsRejected() {
        assertThatThrownBy(() -> Strain.of(1e300).multipliedBy(1e300))
                .isInstanceOf(IllegalArgumentException.class)
                .hasMessage("strain must be finite: Infinity");
    }
}
