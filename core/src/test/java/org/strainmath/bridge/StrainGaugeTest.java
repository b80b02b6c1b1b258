package org.strainmath.bridge;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.strainmath.quantity.Resistance;
import org.strainmath.quantity.Strain;

class StrainGaugeTest {

    @Test
    void a120OhmGaugeAt250MicrostrainChangesBy60Milliohms() {
        // Common practice, no source: ΔR = R·K·ε = 120 Ω × 2 × 250e-6 = 0.06 Ω.
        StrainGauge gauge = StrainGauge.ofOhms(120, 2.0);
        assertThat(gauge.resistanceChangeInOhms(Strain.ofMicrostrain(250)))
                .isCloseTo(0.06, within(0.06e-15));
        assertThat(gauge.relativeResistanceChange(Strain.ofMicrostrain(250))).isEqualTo(5e-4);
        assertThat(gauge.resistanceAt(Strain.ofMicrostrain(250)).toOhms())
                .isCloseTo(120.06, within(120.06e-15));
    }

    @Test
    void dataIsKeptAndCopiedWithOneChange() {
        // Definition: the values as given, kept by each copy; the text is the library's own.
        StrainGauge gauge = StrainGauge.of(Resistance.ofOhms(350), 2.1)
                .withTransverseSensitivity(0.012);
        assertThat(gauge.nominalResistance()).isEqualTo(Resistance.ofOhms(350));
        assertThat(gauge.gaugeFactor()).isEqualTo(2.1);
        assertThat(gauge.transverseSensitivity()).isEqualTo(0.012);
        StrainGauge other = gauge.withGaugeFactor(2.05).withNominalResistance(Resistance.ofOhms(120));
        assertThat(other.gaugeFactor()).isEqualTo(2.05);
        assertThat(other.nominalResistance().toOhms()).isEqualTo(120.0);
        assertThat(other.transverseSensitivity()).isEqualTo(0.012);
        assertThat(gauge).hasToString("StrainGauge[350.0 Ω, K=2.1, Kt=1.2 %]");
        assertThat(StrainGauge.ofOhms(120, 2)).hasToString("StrainGauge[120.0 Ω, K=2.0]");
    }

    @Test
    void gaugesWithTheSameDataAreEqual() {
        StrainGauge gauge = StrainGauge.ofOhms(350, 2.1).withTransverseSensitivity(0.01);
        assertThat(gauge).isEqualTo(StrainGauge.of(Resistance.ofOhms(350), 2.1)
                .withTransverseSensitivity(0.01))
                .hasSameHashCodeAs(StrainGauge.ofOhms(350, 2.1).withTransverseSensitivity(0.01))
                .isNotEqualTo(StrainGauge.ofOhms(350, 2.1))
                .isNotEqualTo(StrainGauge.ofOhms(350, 2.0).withTransverseSensitivity(0.01))
                .isNotEqualTo(StrainGauge.ofOhms(120, 2.1).withTransverseSensitivity(0.01))
                .isNotEqualTo("350 Ω");
    }

    @ParameterizedTest
    @ValueSource(doubles = {Double.NaN, Double.POSITIVE_INFINITY, Double.NEGATIVE_INFINITY, 0.0, -2.0})
    void gaugeFactorMustBePositiveAndFinite(double bad) {
        assertThatThrownBy(() -> StrainGauge.ofOhms(120, bad))
                .isInstanceOf(IllegalArgumentException.class)
                .hasMessage("gaugeFactor must be > 0 and finite: " + bad);
        assertThatThrownBy(() -> StrainGauge.ofOhms(120, 2).withGaugeFactor(bad))
                .hasMessage("gaugeFactor must be > 0 and finite: " + bad);
    }

    @ParameterizedTest
    @ValueSource(doubles = {Double.NaN, Double.POSITIVE_INFINITY, Double.NEGATIVE_INFINITY, 0.0, -120.0})
    void resistanceMustBePositiveAndFinite(double bad) {
        assertThatThrownBy(() -> StrainGauge.ofOhms(bad, 2))
                .isInstanceOf(IllegalArgumentException.class)
                .hasMessage("ohms must be > 0 and finite: " + bad);
    }

    @Test
    void zeroResistanceAndNullAreRejected() {
        assertThatThrownBy(() -> StrainGauge.of(Resistance.ZERO, 2))
                .hasMessage("nominalResistance must be > 0 and finite: 0.0");
        assertThatThrownBy(() -> StrainGauge.of(null, 2))
                .isInstanceOf(NullPointerException.class).hasMessage("nominalResistance");
        StrainGauge gauge = StrainGauge.ofOhms(120, 2);
        assertThatThrownBy(() -> gauge.withNominalResistance(null))
                .isInstanceOf(NullPointerException.class).hasMessage("resistance");
        assertThatThrownBy(() -> gauge.withNominalResistance(Resistance.ZERO))
                .hasMessage("resistance must be > 0 and finite: 0.0");
    }

    @ParameterizedTest
    @ValueSource(doubles = {Double.NaN, Double.POSITIVE_INFINITY, -1.0, 1.0})
    void transverseSensitivityMustBeAFractionBelowOne(double bad) {
        assertThatThrownBy(() -> StrainGauge.ofOhms(120, 2).withTransverseSensitivity(bad))
                .isInstanceOf(IllegalArgumentException.class)
                .hasMessage("kt must be in (-1.0, 1.0): " + bad);
    }

    @Test
    void noPositiveResistanceAtOrBelowMinusOneOverK() {
        StrainGauge gauge = StrainGauge.ofOhms(120, 2);
        assertThatThrownBy(() -> gauge.resistanceAt(Strain.of(-0.5)))
                .isInstanceOf(IllegalArgumentException.class)
                .hasMessage("strain must be > -1/gaugeFactor = -500000.0 µε: -500000.0 µε");
    }
}
