package org.strainmath.quantity;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.math.BigDecimal;
import java.math.MathContext;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

class StressTest {

    @Test
    void psiIsTheExactQuotientOfItsDefinitions() {
        // NIST SP 811 (2008), appendix B: 1 lbf = 0.45359237 kg × 9.80665 m/s² (exact),
        // 1 in = 0.0254 m (exact). 50-digit BigDecimal oracle.
        BigDecimal poundForce = new BigDecimal("0.45359237").multiply(new BigDecimal("9.80665"));
        BigDecimal squareInch = new BigDecimal("0.0254").pow(2);
        double exact = poundForce.divide(squareInch, new MathContext(50)).doubleValue();
        assertThat(Stress.PASCALS_PER_PSI).isEqualTo(exact);
        // The value the foundation issue quotes, 6894.757293168 Pa, agrees to 1e-12 relative.
        assertThat(Stress.ofPsi(1).toPascals()).isCloseTo(6894.757293168, within(6894.76e-12));
    }

    @Test
    void unitsConvertByDefinition() {
        assertThat(Stress.ofMegapascals(80).toPascals()).isEqualTo(8e7);
        assertThat(Stress.ofKilopascals(2.5).toPascals()).isEqualTo(2500.0);
        assertThat(Stress.ofGigapascals(200).toMegapascals()).isEqualTo(200_000.0);
        assertThat(Stress.ofPascals(2e11).toGigapascals()).isEqualTo(200.0);
        assertThat(Stress.ofPascals(5e4).toKilopascals()).isEqualTo(50.0);
        // 30 ksi = 30 000 psi = 206.842718795... MPa (NIST SP 811 factor).
        assertThat(Stress.ofKsi(30).toMegapascals()).isCloseTo(206.84271879505084,
                within(1e-12 * 206.8));
        assertThat(Stress.ofKsi(30).toPsi()).isCloseTo(30_000.0, within(30_000e-15));
        assertThat(Stress.ofPsi(1500).toKsi()).isCloseTo(1.5, within(1.5e-15));
    }

    @Test
    void arithmeticKeepsUnits() {
        // By hand: sums, a product and a quotient of megapascal values exact in binary.
        Stress a = Stress.ofMegapascals(120);
        Stress b = Stress.ofMegapascals(-40);
        assertThat(a.plus(b).toMegapascals()).isEqualTo(80.0);
        assertThat(a.minus(b).toMegapascals()).isEqualTo(160.0);
        assertThat(a.multipliedBy(1.5).toMegapascals()).isEqualTo(180.0);
        assertThat(a.dividedBy(Stress.ofMegapascals(240))).isEqualTo(0.5);
        assertThat(b.negated()).isEqualTo(Stress.ofMegapascals(40));
        assertThat(b.abs()).isEqualTo(Stress.ofMegapascals(40));
        assertThatThrownBy(() -> a.dividedBy(Stress.ZERO))
                .isInstanceOf(IllegalArgumentException.class)
                .hasMessage("other must be != 0: 0.0");
    }

    @Test
    void equalityOrderAndText() {
        assertThat(Stress.ofMegapascals(80)).isEqualTo(Stress.ofPascals(8e7))
                .hasSameHashCodeAs(Stress.ofPascals(8e7))
                .isGreaterThan(Stress.ofMegapascals(79))
                .hasToString("80.0 MPa")
                .isNotEqualTo(Strain.ZERO);
    }

    @Test
    void negativeZeroIsZero() {
        assertThat(Stress.ofPascals(-0.0)).isEqualTo(Stress.ZERO).hasSameHashCodeAs(Stress.ZERO);
    }

    @ParameterizedTest
    @ValueSource(doubles = {Double.NaN, Double.POSITIVE_INFINITY, Double.NEGATIVE_INFINITY})
    void nonFiniteValuesAreRejectedWithTheirName(double bad) {
        assertThatThrownBy(() -> Stress.ofPascals(bad)).hasMessage("pascals must be finite: " + bad);
        assertThatThrownBy(() -> Stress.ofKilopascals(bad))
                .hasMessage("kilopascals must be finite: " + bad);
        assertThatThrownBy(() -> Stress.ofMegapascals(bad))
                .hasMessage("megapascals must be finite: " + bad);
        assertThatThrownBy(() -> Stress.ofGigapascals(bad))
                .hasMessage("gigapascals must be finite: " + bad);
        assertThatThrownBy(() -> Stress.ofPsi(bad)).hasMessage("psi must be finite: " + bad);
        assertThatThrownBy(() -> Stress.ofKsi(bad)).hasMessage("ksi must be finite: " + bad);
        assertThatThrownBy(() -> Stress.ZERO.multipliedBy(bad))
                .isInstanceOf(IllegalArgumentException.class)
                .hasMessage("factor must be finite: " + bad);
    }
}
