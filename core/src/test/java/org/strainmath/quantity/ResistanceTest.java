package org.strainmath.quantity;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

class ResistanceTest {

    @Test
    void unitsConvertByDefinition() {
        // Definition: the SI prefixes k = 1e3 and M = 1e6 (SI Brochure, 9th ed.).
        assertThat(Resistance.ofKiloohms(174.65).toOhms()).isEqualTo(174_650.0);
        assertThat(Resistance.ofMegaohms(1.2).toKiloohms()).isEqualTo(1200.0);
        assertThat(Resistance.ofOhms(2.5e6).toMegaohms()).isEqualTo(2.5);
    }

    @Test
    void seriesAndParallel() {
        Resistance gauge = Resistance.ofOhms(120);
        assertThat(gauge.plus(Resistance.ofOhms(2)).toOhms()).isEqualTo(122.0);
        // Parallel resistance R·Rs/(R + Rs): 120 Ω ∥ 59 880 Ω = 119.76 Ω (hand computation).
        assertThat(gauge.inParallelWith(Resistance.ofOhms(59_880)).toOhms())
                .isCloseTo(119.76, within(119.76e-14));
        assertThat(gauge.inParallelWith(Resistance.ZERO)).isEqualTo(Resistance.ZERO);
        assertThat(Resistance.ZERO.inParallelWith(gauge).isZero()).isTrue();
        assertThat(gauge.multipliedBy(0.5).toOhms()).isEqualTo(60.0);
    }

    @Test
    void textPicksTheReadableUnit() {
        // The library's own text rule, by hand: Ω below 1 kΩ, kΩ below 1 MΩ, MΩ above.
        assertThat(Resistance.ofOhms(350)).hasToString("350.0 Ω");
        assertThat(Resistance.ofOhms(174_650)).hasToString("174.65 kΩ");
        assertThat(Resistance.ofMegaohms(2)).hasToString("2.0 MΩ");
        assertThat(Resistance.ZERO).hasToString("0.0 Ω");
        assertThat(Resistance.ofOhms(1000)).hasToString("1.0 kΩ");
        assertThat(Resistance.ofOhms(999.9)).hasToString("999.9 Ω");
        assertThat(Resistance.ofMegaohms(1)).hasToString("1.0 MΩ");
        assertThat(Resistance.ofOhms(-0.0)).isEqualTo(Resistance.ZERO);
        assertThat(Resistance.ofOhms(1).isZero()).isFalse();
    }

    @Test
    void equalityAndOrder() {
        assertThat(Resistance.ofKiloohms(1)).isEqualTo(Resistance.ofOhms(1000))
                .hasSameHashCodeAs(Resistance.ofOhms(1000))
                .isGreaterThan(Resistance.ofOhms(999))
                .isNotEqualTo(Voltage.ofVolts(1000));
    }

    @ParameterizedTest
    @ValueSource(doubles = {Double.NaN, Double.POSITIVE_INFINITY, Double.NEGATIVE_INFINITY, -1})
    void badValuesAreRejectedWithTheirName(double bad) {
        assertThatThrownBy(() -> Resistance.ofOhms(bad))
                .isInstanceOf(IllegalArgumentException.class)
                .hasMessage("ohms must be >= 0 and finite: " + bad);
        assertThatThrownBy(() -> Resistance.ofKiloohms(bad))
                .hasMessage("kiloohms must be >= 0 and finite: " + bad);
        assertThatThrownBy(() -> Resistance.ofMegaohms(bad))
                .hasMessage("megaohms must be >= 0 and finite: " + bad);
        assertThatThrownBy(() -> Resistance.ZERO.multipliedBy(bad))
                .hasMessage("factor must be >= 0 and finite: " + bad);
    }
}
