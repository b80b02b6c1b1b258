package org.strainmath.bridge;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.util.SplittableRandom;

import org.junit.jupiter.api.Test;
import org.strainmath.quantity.Strain;
import org.strainmath.quantity.Temperature;

/**
 * Thermal output polynomials. The curve below is invented for the tests (a shape typical of a
 * self-temperature-compensated foil gauge on steel: a few µε near room temperature, tens of µε
 * at the ends), evaluated by hand.
 */
class ThermalOutputTest {

    // εapp(T) = −30 + 2.1·T − 0.045·T² + 1.5e-4·T³ µε, T in °C (invented).
    private static final ThermalOutput CURVE = ThermalOutput.ofCelsius(-30, 2.1, -0.045, 1.5e-4);

    @Test
    void thePolynomialIsEvaluatedInTheDataSheetUnit() {
        // At 100 °C: −30 + 210 − 450 + 150 = −120 µε (by hand).
        assertThat(CURVE.apparentStrainAt(Temperature.ofCelsius(100)).toMicrostrain())
                .isCloseTo(-120, within(1e-9));
        // Read at K = 2.10 instead of 2.00: × 2.00/2.10.
        assertThat(CURVE.apparentStrainAt(Temperature.ofCelsius(100), 2.1).toMicrostrain())
                .isCloseTo(-120 * 2.0 / 2.1, within(1e-9));
        assertThat(CURVE.withReferenceGaugeFactor(2.1)
                .apparentStrainAt(Temperature.ofCelsius(100), 2.1).toMicrostrain())
                .isCloseTo(-120, within(1e-9));
        assertThat(CURVE.referenceGaugeFactor()).isEqualTo(2.0);
    }

    @Test
    void aFahrenheitCurveGivesTheSameStrainAsItsCelsiusEquivalent() {
        // The same curve written in °F: substitute T_C = (T_F − 32)/1.8 by hand for a
        // quadratic: εapp = 5 + 0.9·T_C − 0.01·T_C²  ⇔  in T_F the coefficients below.
        double b0 = 5 - 0.9 * 32 / 1.8 - 0.01 * 32 * 32 / (1.8 * 1.8);
        double b1 = 0.9 / 1.8 + 0.01 * 2 * 32 / (1.8 * 1.8);
        double b2 = -0.01 / (1.8 * 1.8);
        ThermalOutput inF = ThermalOutput.ofFahrenheit(b0, b1, b2);
        ThermalOutput inC = ThermalOutput.ofCelsius(5, 0.9, -0.01);
        for (double c : new double[] {-40, 0, 23, 150}) {
            Temperature t = Temperature.ofCelsius(c);
            assertThat(inF.apparentStrainAt(t).toMicrostrain())
                    .isCloseTo(inC.apparentStrainAt(t).toMicrostrain(), within(1e-9));
        }
    }

    @Test
    void aChannelZeroedAtRoomTemperatureSubtractsTheChangeSinceThen() {
        ThermalOutput.Correction correction = CURVE.zeroedAt(Temperature.ofCelsius(23), 2.0);
        double atZero = CURVE.apparentStrainAt(Temperature.ofCelsius(23)).value();
        double atHot = CURVE.apparentStrainAt(Temperature.ofCelsius(100)).value();
        // Measured = true + (εapp(T) − εapp(T0)); corrected must give the true strain back.
        double trueStrain = 450e-6;
        Strain measured = Strain.of(trueStrain + atHot - atZero);
        assertThat(correction.correct(measured, Temperature.ofCelsius(100)).value())
                .isCloseTo(trueStrain, within(1e-15));
        assertThat(correction.correct(Strain.of(trueStrain), Temperature.ofCelsius(23)).value())
                .isCloseTo(trueStrain, within(1e-18));
        assertThat(correction).hasToString("ThermalOutput.Correction[zeroed at 23.0 °C, K=2.0]");
    }

    @Test
    void blocksAreTheScalarFunctionBitForBit() {
        // Definition: the block correction is the scalar correction bit for bit, with its NaN
        // count.
        ThermalOutput.Correction correction = CURVE.zeroedAt(Temperature.ofCelsius(20), 2.1);
        SplittableRandom random = new SplittableRandom(5);
        double[] strain = new double[3000];
        double[] celsius = new double[3000];
        for (int i = 0; i < strain.length; i++) {
            strain[i] = random.nextDouble(-2e-3, 2e-3);
            celsius[i] = random.nextDouble(-50, 200);
        }
        celsius[7] = Double.NaN;
        double[] out = new double[strain.length];
        int nan = correction.correct(strain, 0, celsius, 0, out, 0, strain.length);
        double[] expected = new double[strain.length];
        for (int i = 0; i < strain.length; i++) {
            expected[i] = correction.correct(strain[i], celsius[i]);
        }
        assertThat(out).isEqualTo(expected);
        assertThat(nan).isEqualTo(1);
        correction.correct(strain, 0, celsius, 0, strain, 0, strain.length);
        assertThat(strain).isEqualTo(expected);
    }

    @Test
    void textAndBadInput() {
        assertThat(CURVE).hasToString(
                "ThermalOutput[-30.0 + 2.1·T - 0.045·T² + 0.00015·T³ µε, T in °C, at K=2.0]");
        assertThatThrownBy(ThermalOutput::ofCelsius)
                .isInstanceOf(IllegalArgumentException.class)
                .hasMessage("microstrainCoefficients must hold 1 to 5 values: 0");
        assertThatThrownBy(() -> ThermalOutput.ofFahrenheit(1, 2, 3, 4, 5, 6))
                .hasMessage("microstrainCoefficients must hold 1 to 5 values: 6");
        assertThatThrownBy(() -> ThermalOutput.ofCelsius(1, Double.NaN))
                .hasMessage("microstrainCoefficients[1] must be finite: NaN");
        assertThatThrownBy(() -> ThermalOutput.ofCelsius((double[]) null))
                .isInstanceOf(NullPointerException.class).hasMessage("microstrainCoefficients");
        assertThatThrownBy(() -> CURVE.zeroedAt(Temperature.ofCelsius(20), 0))
                .hasMessage("gaugeFactor must be > 0 and finite: 0.0");
        assertThatThrownBy(() -> CURVE.apparentStrainAt(null))
                .isInstanceOf(NullPointerException.class).hasMessage("temperature");
        assertThatThrownBy(() -> CURVE.withReferenceGaugeFactor(-2))
                .hasMessage("gaugeFactor must be > 0 and finite: -2.0");
        ThermalOutput.Correction correction = CURVE.zeroedAt(Temperature.ofCelsius(20), 2);
        assertThatThrownBy(() -> correction.correct(new double[2], 0, null, 0, new double[2], 0, 2))
                .isInstanceOf(NullPointerException.class).hasMessage("celsius");
        assertThatThrownBy(() -> correction.correct(new double[2], 0, new double[1], 0, new double[2], 0, 2))
                .isInstanceOf(IndexOutOfBoundsException.class);
    }
}
