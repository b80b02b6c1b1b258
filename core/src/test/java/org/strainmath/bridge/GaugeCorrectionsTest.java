package org.strainmath.bridge;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.util.SplittableRandom;
import java.util.stream.Stream;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;
import org.strainmath.quantity.Strain;
import org.strainmath.quantity.Temperature;

/** Transverse sensitivity and gauge-factor mismatch corrections of a single gauge. */
class GaugeCorrectionsTest {

    private static final StrainGauge GAUGE = StrainGauge.ofOhms(350, 2.1).withTransverseSensitivity(0.02);

    @Test
    void aWorkedExampleOnAluminium() {
        // Kt = 2 %, ν0 = 0.285, uniaxial stress on aluminium (ν = 0.33), 1000 µε indicated:
        // εa = 1000·(1 − 0.285·0.02)/(1 − 0.33·0.02) = 1000·0.9943/0.9934 µε (Dally & Riley,
        // 4th ed., §6.5 form; numbers by hand).
        Strain corrected = GAUGE.correctedForTransverse(Strain.ofMicrostrain(1000), -0.33);
        assertThat(corrected.toMicrostrain()).isCloseTo(1000 * 0.9943 / 0.9934, within(1e-9));
        assertThat(GAUGE.calibrationPoissonRatio()).isEqualTo(0.285);
    }

    @Test
    void theCorrectionVanishesInUniaxialStressOnTheCalibrationMaterial() {
        // ASTM E251: the gauge factor already holds the transverse response when εt = −ν0·εa.
        for (double nu0 : new double[] {0.285, 0.3, 0.25}) {
            StrainGauge gauge = GAUGE.withCalibrationPoissonRatio(nu0);
            Strain indicated = gauge.indicatedStrain(Strain.ofMicrostrain(800), Strain.ofMicrostrain(-800 * nu0));
            assertThat(indicated.toMicrostrain()).isCloseTo(800, within(800e-14));
            assertThat(gauge.correctedForTransverse(Strain.ofMicrostrain(800), -nu0).toMicrostrain())
                    .isCloseTo(800, within(800e-14));
        }
    }

    static Stream<Arguments> fields() {
        SplittableRandom random = new SplittableRandom(0x7A);
        return Stream.generate(() -> Arguments.of(random.nextDouble(-0.05, 0.05),
                random.nextDouble(0.2, 0.35), random.nextDouble(-0.01, 0.01),
                random.nextDouble(-0.01, 0.01))).limit(200);
    }

    @ParameterizedTest(name = "Kt={0} nu0={1} ea={2} et={3}")
    @MethodSource("fields")
    void correctionsInvertTheGaugeModelExactly(double kt, double nu0, double axial, double transverse) {
        // Round trip through the forward model of indicatedStrain (ASTM E251 definitions).
        StrainGauge gauge = StrainGauge.ofOhms(120, 2.0).withTransverseSensitivity(kt)
                .withCalibrationPoissonRatio(nu0);
        Strain along = gauge.indicatedStrain(Strain.of(axial), Strain.of(transverse));
        Strain across = gauge.indicatedStrain(Strain.of(transverse), Strain.of(axial));
        assertThat(gauge.correctedForTransverse(along, transverse / axial).value())
                .isCloseTo(axial, within(Math.abs(axial) * 1e-13));
        assertThat(gauge.correctedForTransverse(along, across).value())
                .isCloseTo(axial, within(Math.abs(axial) * 1e-12 + 1e-18));
        assertThat(gauge.correctedForTransverse(across, along).value())
                .isCloseTo(transverse, within(Math.abs(transverse) * 1e-12 + 1e-18));
    }

    @Test
    void anInstrumentSetToAnotherGaugeFactor() {
        // Common practice, no source: 1000 µε indicated at K = 2.00 is 1000·2.00/2.10 µε on a
        // gauge of K = 2.10.
        assertThat(GAUGE.correctedForInstrumentGaugeFactor(Strain.ofMicrostrain(1000), 2.0)
                .toMicrostrain()).isCloseTo(1000 * 2.0 / 2.1, within(1e-10));
        assertThat(GAUGE.correctedForInstrumentGaugeFactor(Strain.ofMicrostrain(1000), 2.1)
                .toMicrostrain()).isCloseTo(1000, within(1e-12));
    }

    @Test
    void badInputIsRejected() {
        assertThatThrownBy(() -> GAUGE.withCalibrationPoissonRatio(0.5))
                .isInstanceOf(IllegalArgumentException.class)
                .hasMessage("poissonRatio must be in (-1.0, 0.5): 0.5");
        assertThatThrownBy(() -> GAUGE.correctedForTransverse(Strain.ZERO, Double.NaN))
                .hasMessage("transverseToAxialRatio must be finite: NaN");
        assertThatThrownBy(() -> GAUGE.correctedForTransverse(Strain.ZERO, -50))
                .hasMessage("transverseToAxialRatio must not be -1/Kt: -50.0");
        assertThatThrownBy(() -> GAUGE.correctedForInstrumentGaugeFactor(Strain.ZERO, 0))
                .hasMessage("instrumentGaugeFactor must be > 0 and finite: 0.0");
        assertThatThrownBy(() -> GAUGE.correctedForTransverse(null, 0.3))
                .isInstanceOf(NullPointerException.class).hasMessage("indicated");
        assertThatThrownBy(() -> GAUGE.correctedForTransverse(Strain.ZERO, (Strain) null))
                .isInstanceOf(NullPointerException.class).hasMessage("indicatedAcross");
        assertThatThrownBy(() -> GAUGE.indicatedStrain(null, Strain.ZERO))
                .isInstanceOf(NullPointerException.class).hasMessage("axial");
        assertThatThrownBy(() -> GAUGE.correctedForInstrumentGaugeFactor(null, 2))
                .isInstanceOf(NullPointerException.class).hasMessage("indicated");
        assertThat(GAUGE.withCalibrationPoissonRatio(0.3)).isNotEqualTo(GAUGE);
    }

    @Test
    void theGaugeFactorFollowsItsTemperatureCoefficient() {
        // Data-sheet form (common practice, no source): +1.1 %/100 K from 2.10 at 23 °C gives
        // 2.10·(1 + 0.011·77/100) at 100 °C, and 2.10·(1 − 0.011·0.73) at −50 °C.
        StrainGauge gauge = GAUGE.withGaugeFactorTemperatureCoefficient(1.1, Temperature.ofCelsius(23));
        assertThat(gauge.gaugeFactorAt(Temperature.ofCelsius(100)))
                .isCloseTo(2.1 * (1 + 0.011 * 0.77), within(1e-14));
        assertThat(gauge.gaugeFactorAt(Temperature.ofCelsius(-50)))
                .isCloseTo(2.1 * (1 - 0.011 * 0.73), within(1e-14));
        assertThat(gauge.gaugeFactorAt(Temperature.ofCelsius(23))).isCloseTo(2.1, within(1e-15));
        assertThat(GAUGE.gaugeFactorAt(Temperature.ofCelsius(150))).isEqualTo(2.1);
        // Copies keep the coefficient.
        assertThat(gauge.withTransverseSensitivity(0.01).gaugeFactorAt(Temperature.ofCelsius(100)))
                .isEqualTo(gauge.gaugeFactorAt(Temperature.ofCelsius(100)));
        assertThat(gauge).isNotEqualTo(GAUGE);
        assertThatThrownBy(() -> GAUGE.withGaugeFactorTemperatureCoefficient(Double.NaN,
                Temperature.ofCelsius(23))).hasMessage("percentPer100Kelvin must be finite: NaN");
        assertThatThrownBy(() -> GAUGE.withGaugeFactorTemperatureCoefficient(1, null))
                .isInstanceOf(NullPointerException.class).hasMessage("reference");
        assertThatThrownBy(() -> GAUGE.withGaugeFactorTemperatureCoefficient(-50,
                Temperature.ofCelsius(0)).gaugeFactorAt(Temperature.ofCelsius(300)))
                .isInstanceOf(IllegalArgumentException.class)
                .hasMessage("temperature must keep the gauge factor positive: 300.0 °C");
    }
}
