package org.strainmath.bridge;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.math.BigDecimal;
import java.math.MathContext;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * The bridge at the edges of its range: nearly balanced, near the gauge's limits and beyond,
 * subnormal and huge inputs. The oracle of each check is the quarter bridge's closed form
 * evaluated in 50-digit decimal arithmetic: r = K·ε/(4 + 2·K·ε), so ε = 4·r/(K·(1 − 2·r))
 * (the bridge equation with R1 = R·(1 + K·ε) and three equal arms; common practice, no source).
 */
class NumericalEdgeCasesTest {

    private static final MathContext DIGITS = new MathContext(50);
    private static final double K = 2.1;
    private static final Bridge QUARTER = Bridge.quarter(StrainGauge.ofOhms(350, K));

    private static double exactStrain(double ratio) {
        BigDecimal r = new BigDecimal(ratio);
        BigDecimal k = new BigDecimal(K);
        return r.multiply(BigDecimal.valueOf(4)).divide(
                k.multiply(BigDecimal.ONE.subtract(r.multiply(BigDecimal.valueOf(2)))), DIGITS)
                .doubleValue();
    }

    private static double exactRatio(double strain) {
        BigDecimal e = new BigDecimal(strain);
        BigDecimal ke = new BigDecimal(K).multiply(e);
        return ke.divide(BigDecimal.valueOf(4).add(ke.multiply(BigDecimal.valueOf(2))), DIGITS)
                .doubleValue();
    }

    @ParameterizedTest
    @ValueSource(doubles = {1e-6, 1e-9, 1e-12, 1e-15, -1e-12, 1e-18, 1e-100, 1e-290})
    void aNearlyBalancedBridgeKeepsItsRelativeAccuracy(double ratio) {
        // Down to 1e-290 V/V the inverse is a few ulp from the exact value: the arithmetic mask
        // multiplies by a factor near 0.5 and no intermediate underflows. 4 ulp is the budget of
        // the five roundings of the first-degree inverse.
        double exact = exactStrain(ratio);
        assertThat(QUARTER.toStrain(ratio)).isCloseTo(exact, within(4 * Math.ulp(exact)));
    }

    @ParameterizedTest
    @ValueSource(doubles = {Double.MIN_VALUE, 1e-320, 2.2e-308})
    void subnormalReadingsGiveAStrainWithinASubnormalOfTheExactOne(double ratio) {
        // Below about 1e-300 V/V the product with the mask can underflow: the result may lose
        // its relative accuracy, but its absolute error stays below 1e-300 m/m, far below any
        // strain a gauge can resolve (about 1e-7), and it is never NaN.
        double strain = QUARTER.toStrain(ratio);
        assertThat(strain).isNotNaN().isCloseTo(exactStrain(ratio), within(1e-300));
    }

    @ParameterizedTest
    @ValueSource(doubles = {-0.05, -0.02, -5e-3, 5e-3, 0.02, 0.05, 0.1, 0.4})
    void strainsUpToTheGaugesLimitsRoundTripExactly(double strain) {
        // ±50 000 µε and beyond: forward against the closed form, and back.
        double ratio = QUARTER.toRatio(strain);
        assertThat(ratio).isCloseTo(exactRatio(strain), within(4 * Math.ulp(ratio)));
        assertThat(QUARTER.toStrain(ratio)).isCloseTo(strain, within(1e-14 * Math.abs(strain)));
    }

    @Test
    void beyondThePhysicalRangeTheAnswerIsNoStrainNotAWrongOne() {
        // A gauge resistance cannot reach zero: ε = −1/K and below have no physical reading, and
        // a quarter-bridge reading at or beyond ±1/2 V/V (the limits of R1/(R1 + R2) − 1/2) has
        // no physical strain; nor has a NaN or infinite input.
        assertThat(QUARTER.toRatio(-1.0 / K)).isNaN();
        assertThat(QUARTER.toRatio(-1.0)).isNaN();
        assertThat(QUARTER.toRatio(11.0)).as("beyond the model's 10 m/m").isNaN();
        for (double r : new double[] {-0.5, 0.5, 0.6, -3, 1e300, Double.POSITIVE_INFINITY,
                Double.NEGATIVE_INFINITY, Double.NaN}) {
            assertThat(QUARTER.toStrain(r)).as("%s V/V", r).isNaN();
        }
        double[] block = {0.5, 1e-3, Double.NaN, -0.7};
        assertThat(QUARTER.toStrain(block, 0, block, 0, 4)).isEqualTo(3);
        assertThat(block[1]).isCloseTo(exactStrain(1e-3), within(4 * Math.ulp(block[1])));
    }

    @Test
    void hugeButPhysicalReadingsNearTheRangeEndStayFinite() {
        // Just inside the physical range the strain is large but finite and matches the exact
        // closed form to 1e-14 relative (the relative condition number of ε(r) there,
        // 1/(1 − 2r), is about 11.5 at the 10 m/m end); the last double below the end is
        // still a number.
        double end = QUARTER.ratioHigh();
        double inside = Math.nextDown(end);
        double strain = QUARTER.toStrain(inside);
        assertThat(strain).isFinite().isCloseTo(exactStrain(inside), within(1e-14 * strain));
    }
}
