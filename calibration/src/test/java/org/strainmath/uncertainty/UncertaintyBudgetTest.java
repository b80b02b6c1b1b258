package org.strainmath.uncertainty;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.strainmath.bridge.Bridge;
import org.strainmath.bridge.StrainGauge;

/** GUM budgets against closed forms, a Monte Carlo run, and the rules of the trade. */
class UncertaintyBudgetTest {

    @Test
    void aLinearModelWithACorrelationMatchesTheClosedFormAndTheMonteCarlo() {
        // y = 2x1 − 3x2 + 0.5x3, u = 0.1, 0.2, 0.4, r(x1, x2) = 0.5 (GUM 5.2.2, closed form):
        // u_c² = 4·0.01 + 9·0.04 + 0.25·0.16 + 2·2·(−3)·0.1·0.2·0.5 = 0.32.
        UncertaintyBudget budget = UncertaintyBudget.of(x -> 2 * x[0] - 3 * x[1] + 0.5 * x[2],
                InputQuantity.ofStandardUncertainty("x1", 1, 0.1),
                InputQuantity.ofStandardUncertainty("x2", 2, 0.2),
                InputQuantity.ofStandardUncertainty("x3", 4, 0.4))
                .withCorrelation("x1", "x2", 0.5);
        UncertaintyResult result = budget.evaluate(0.95);
        assertThat(result.estimate()).isCloseTo(-2, within(1e-12));
        assertThat(result.combinedStandardUncertainty()).isCloseTo(Math.sqrt(0.32), within(1e-9));
        assertThat(result.effectiveDegreesOfFreedom()).isInfinite();
        // k for 95 % and ν = ∞ is the normal quantile 1.959964 (any statistics table).
        assertThat(result.coverageFactor()).isCloseTo(1.959964, within(1e-6));
        // Monte Carlo, 10^6 seeded trials: the standard deviation of u from M draws is about
        // u/√(2M), 0.07 % of u; 0.5 % is over six of those.
        MonteCarloResult mc = budget.monteCarlo(1_000_000, 42, 0.95);
        assertThat(mc.standardUncertainty()).isCloseTo(Math.sqrt(0.32), within(Math.sqrt(0.32) * 0.005));
        assertThat(mc.estimate()).isCloseTo(-2, within(5 * Math.sqrt(0.32) / 1000));
        assertThat(mc.upper() - mc.lower()).isCloseTo(2 * 1.959964 * Math.sqrt(0.32), within(0.01));
    }

    @Test
    void typeBDistributionsGiveTheirStandardUncertaintiesAndPropagate() {
        // GUM 4.3.7 and 4.3.9: a/√3 rectangular, a/√6 triangular; arcsine a/√2.
        InputQuantity rect = InputQuantity.rectangular("resolution", 0, 0.3);
        InputQuantity tri = InputQuantity.triangular("drift", 0, 0.6);
        InputQuantity arc = InputQuantity.uShaped("ripple", 0, 0.2);
        assertThat(rect.standardUncertainty()).isCloseTo(0.3 / Math.sqrt(3), within(1e-15));
        assertThat(tri.standardUncertainty()).isCloseTo(0.6 / Math.sqrt(6), within(1e-15));
        assertThat(arc.standardUncertainty()).isCloseTo(0.2 / Math.sqrt(2), within(1e-15));
        assertThat(InputQuantity.normal("certificate", 5, 0.02, 2).standardUncertainty()).isEqualTo(0.01);
        UncertaintyBudget sum = UncertaintyBudget.of(x -> x[0] + x[1] + x[2], rect, tri, arc);
        double expected = Math.sqrt(0.03 + 0.06 + 0.02);
        assertThat(sum.evaluate(0.95).combinedStandardUncertainty()).isCloseTo(expected, within(1e-9));
        assertThat(sum.monteCarlo(400_000, 7, 0.95).standardUncertainty())
                .isCloseTo(expected, within(expected * 0.01));
    }

    @Test
    void welchSatterthwaiteAndTheCoverageFactor() {
        // y = x1 + x2; x1 the mean of 5 readings (ν = 4), x2 normal with ν = ∞.
        // ν_eff = u_c⁴/(u1⁴/4) (GUM G.4.1). By hand: mean 10.1, squared deviations
        // 0 + 0.04 + 0.04 + 0.01 + 0.01 = 0.1, s² = 0.1/4 = 0.025, u1² = s²/5.
        InputQuantity a = InputQuantity.typeA("repeat", 10.1, 10.3, 9.9, 10.0, 10.2);
        InputQuantity b = InputQuantity.ofStandardUncertainty("reference", 0, 0.05);
        assertThat(a.estimate()).isCloseTo(10.1, within(1e-12));
        assertThat(a.standardUncertainty()).isCloseTo(Math.sqrt(0.025 / 5), within(1e-12));
        assertThat(a.degreesOfFreedom()).isEqualTo(4);
        UncertaintyResult r = UncertaintyBudget.of(x -> x[0] + x[1], a, b).evaluate(0.95);
        double u1 = Math.sqrt(0.025 / 5);
        double uc2 = u1 * u1 + 0.0025;
        assertThat(r.effectiveDegreesOfFreedom()).isCloseTo(uc2 * uc2 / (u1 * u1 * u1 * u1 / 4), within(1e-9));
        // A Type A input alone with ν = 4: k = t(0.975; 4) = 2.7764 (standard t table, from memory).
        UncertaintyResult alone = UncertaintyBudget.of(x -> x[0], a).evaluate(0.95);
        assertThat(alone.coverageFactor()).isCloseTo(2.7764, within(0.0001));
        // ν from the relative uncertainty of the uncertainty: 25 % → ν = 8 (GUM G.4.2).
        assertThat(b.withRelativeUncertaintyOfUncertainty(0.25).degreesOfFreedom()).isCloseTo(8, within(1e-12));
    }

    @Test
    void theExpandedUncertaintyIsReportedWithTwoSignificantDigits() {
        // GUM 7.2.6: U with at most two significant digits, y to the same decimal place.
        UncertaintyResult r = UncertaintyBudget.of(x -> x[0],
                InputQuantity.ofStandardUncertainty("x", 100.02147, 0.006317)).evaluate(0.95);
        assertThat(r.expandedUncertainty()).isCloseTo(1.959964 * 0.006317, within(1e-8));
        assertThat(r.expandedUncertaintyRounded()).isEqualTo(0.012);
        assertThat(r.estimateRounded()).isEqualTo(100.021);
        assertThat(r.toString()).contains("y = 100.021 ± 0.012");
        assertThat(r.expandedUncertaintyText()).isEqualTo("0.012");
        assertThat(r.estimateText()).isEqualTo("100.021");
    }

    @ParameterizedTest
    @CsvSource({
        // u, estimate -> U text, estimate text, with k = 2 (normal, 95.45 %). By hand: U = 2u
        // to two significant digits, a trailing zero kept, y to U's last place (GUM 7.2.6).
        "0.002, 40.0104, 0.0040, 40.0104",
        "0.005, 40.0104, 0.010, 40.010",
        "0.0249, 3.14159, 0.050, 3.142",
        "0.26, 12.346, 0.52, 12.35",
        "4.9, 1234.5, 9.8, 1234.5",
        "6.0, 1234.5, 12, 1234",
        "260, 123456, 520, 123460",
        "0.00000198, 0.000512, 4.0e-6, 0.0005120",
        "2.0e9, 1.0e10, 4.0e9, 10000000000",
    })
    void theExpandedUncertaintyPrintsItsTwoSignificantDigits(double u, double estimate,
            String expandedText, String estimateText) {
        UncertaintyResult r = UncertaintyBudget.of(x -> x[0],
                InputQuantity.ofStandardUncertainty("x", estimate, u)).evaluate(0.954499736103642);
        assertThat(r.coverageFactor()).isCloseTo(2, within(1e-9));
        assertThat(r.expandedUncertaintyText()).isEqualTo(expandedText);
        assertThat(r.estimateText()).isEqualTo(estimateText);
        assertThat(r.toString()).contains(estimateText + " ± " + expandedText);
    }

    @Test
    void aOnePercentGaugeFactorToleranceIsAOnePercentStrainUncertainty() {
        // Common practice, no source: for a strain from a bridge reading, a gauge-factor
        // tolerance of 1 % is a 1 % strain uncertainty when it dominates the budget.
        UncertaintyBudget channel = UncertaintyBudget.of(
                x -> Bridge.quarter(StrainGauge.ofOhms(350, x[0])).toStrain(x[1]),
                InputQuantity.ofStandardUncertainty("gauge factor", 2.08, 0.0208),
                InputQuantity.ofStandardUncertainty("reading", 0.52e-3, 1e-9));
        UncertaintyResult r = channel.evaluate(0.95);
        assertThat(r.combinedStandardUncertainty() / Math.abs(r.estimate())).isCloseTo(0.01, within(2e-5));
        assertThat(r.contributions().get(0).input().name()).isEqualTo("gauge factor");
        assertThat(r.contributions().get(0).share()).isGreaterThan(0.999);
        assertThat(r.toString()).startsWith("  quantity      estimate").contains("gauge factor");
    }

    @Test
    void theSecondOrderTermOfAProduct() {
        // y = x1·x2, independent normal inputs: the exact variance is
        // x2²u1² + x1²u2² + u1²u2² (GUM 5.1.2, note; the last term is the second-order one).
        UncertaintyBudget product = UncertaintyBudget.of(x -> x[0] * x[1],
                InputQuantity.ofStandardUncertainty("x1", 2, 0.1),
                InputQuantity.ofStandardUncertainty("x2", 3, 0.2)).withSecondOrderTerms();
        UncertaintyResult r = product.evaluate(0.95);
        assertThat(r.combinedStandardUncertainty()).isCloseTo(Math.sqrt(9 * 0.01 + 4 * 0.04 + 0.01 * 0.04), within(1e-9));
        assertThat(r.secondOrderVariance()).isCloseTo(0.0004, within(1e-10));
        assertThat(product.monteCarlo(400_000, 3, 0.95).standardUncertainty())
                .isCloseTo(r.combinedStandardUncertainty(), within(r.combinedStandardUncertainty() * 0.01));
    }

    @Test
    void badInputIsRefused() {
        assertThatThrownBy(() -> InputQuantity.ofStandardUncertainty("x", 1, -0.1))
                .hasMessage("standardUncertainty must be >= 0 and finite: -0.1");
        assertThatThrownBy(() -> InputQuantity.ofStandardUncertainty("x", 1, Double.NaN))
                .hasMessage("standardUncertainty must be >= 0 and finite: NaN");
        assertThatThrownBy(() -> InputQuantity.normal("x", 1, 0.1, 0)).hasMessage("coverageFactor must be > 0 and finite: 0.0");
        assertThatThrownBy(() -> InputQuantity.typeA("x", 1.0)).hasMessage("a Type A evaluation needs at least two observations: 1");
        InputQuantity a = InputQuantity.ofStandardUncertainty("a", 1, 0.1);
        InputQuantity b = InputQuantity.ofStandardUncertainty("b", 1, 0.1);
        InputQuantity c = InputQuantity.ofStandardUncertainty("c", 1, 0.1);
        UncertaintyBudget budget = UncertaintyBudget.of(x -> x[0] + x[1] + x[2], a, b, c);
        assertThatThrownBy(() -> budget.withCorrelation("a", "b", 1.5)).hasMessage("correlation r must be in [-1, 1]: 1.5");
        assertThatThrownBy(() -> budget.withCorrelation("a", "z", 0.1)).hasMessage("no input named z");
        // r12 = r13 = 0.9 and r23 = −0.9 cannot hold together: not positive semi-definite.
        assertThatThrownBy(() -> budget.withCorrelation("a", "b", 0.9).withCorrelation("a", "c", 0.9)
                .withCorrelation("b", "c", -0.9))
                .hasMessageStartingWith("the correlation matrix must be positive semi-definite;");
        assertThatThrownBy(() -> UncertaintyBudget.of(x -> Math.log(x[0]), InputQuantity.ofStandardUncertainty("x", -1, 0.1)))
                .hasMessage("the model must be finite at the estimates: NaN");
        assertThatThrownBy(() -> UncertaintyBudget.of(x -> x[0], a, a)).hasMessage("input names must differ: a");
        assertThatThrownBy(() -> budget.evaluate(1.0)).hasMessage("probability must be in (0.0, 1.0): 1.0");
        assertThatThrownBy(() -> budget.monteCarlo(10, 1, 0.95)).hasMessage("trials must be >= 100: 10");
        assertThatThrownBy(() -> budget.withCorrelation("a", "b", 0.2).withSecondOrderTerms().evaluate(0.95))
                .isInstanceOf(IllegalStateException.class);
        assertThat(a.toString()).isEqualTo("InputQuantity[a = 1.0, u = 0.1, normal, ν = ∞]");
    }
}
