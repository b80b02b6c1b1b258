package org.strainmath.uncertainty;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.stream.Stream;

import org.apache.commons.math3.distribution.NormalDistribution;
import org.apache.commons.math3.distribution.TDistribution;
import org.apache.commons.math3.distribution.TriangularDistribution;
import org.apache.commons.math3.distribution.UniformRealDistribution;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * The Monte Carlo propagation (JCGM 101:2008) through the identity model, one input of each
 * distribution: the mean, standard deviation and 95 % symmetric interval of the output must be
 * those of the input distribution. Oracles: Commons Math's distributions (uniform, triangular,
 * normal, Student t) for the quantiles, and for the U-shaped (arcsine) input over x ± a its
 * closed form, quantile x + a·cos(π·(1 − P)) (JCGM 101, 6.4.6). Tolerances from the sampling
 * error of 200 000 trials: the standard deviation to 1.5 %, the interval ends to 2 % of their
 * distance from the estimate, the mean to five standard errors.
 */
class MonteCarloDistributionsTest {

    private static final int TRIALS = 200_000;

    static Stream<Arguments> inputs() {
        double x = 10.0;
        double a = 0.3;
        // typeA of six observations: ν = 5, u = s/√6
        double[] obs = {9.8, 10.1, 10.3, 9.9, 10.0, 10.2};
        InputQuantity t = InputQuantity.typeA("t", obs);
        double tScale = t.standardUncertainty();
        return Stream.of(
            Arguments.of(InputQuantity.rectangular("r", x, a), a / Math.sqrt(3),
                    new UniformRealDistribution(x - a, x + a).inverseCumulativeProbability(0.975)),
            Arguments.of(InputQuantity.triangular("tri", x, a), a / Math.sqrt(6),
                    new TriangularDistribution(x - a, x, x + a).inverseCumulativeProbability(0.975)),
            Arguments.of(InputQuantity.uShaped("u", x, a), a / Math.sqrt(2),
                    x + a * Math.cos(Math.PI * 0.025)),
            Arguments.of(InputQuantity.ofStandardUncertainty("n", x, a), a,
                    new NormalDistribution(x, a).inverseCumulativeProbability(0.975)),
            // a scaled and shifted t with ν = 5 has the standard deviation u·√(ν/(ν − 2))
            Arguments.of(t, tScale * Math.sqrt(5.0 / 3.0),
                    t.estimate() + tScale * new TDistribution(5).inverseCumulativeProbability(0.975)));
    }

    @ParameterizedTest
    @MethodSource("inputs")
    void theIdentityModelReturnsTheInputDistribution(InputQuantity input, double sd,
            double upper) {
        // Oracle: the quantiles of inputs() (Commons Math, JCGM 101 6.4.6); tolerances from the
        // sampling error, see the class comment.
        MonteCarloResult r = UncertaintyBudget.of(v -> v[0], input).monteCarlo(TRIALS, 42, 0.95);
        double x = input.estimate();
        assertThat(r.estimate()).isCloseTo(x, within(5 * sd / Math.sqrt(TRIALS)));
        assertThat(r.standardUncertainty()).isCloseTo(sd, within(0.015 * sd));
        double half = upper - x;
        assertThat(r.upper()).isCloseTo(upper, within(0.02 * half));
        assertThat(r.lower()).isCloseTo(x - half, within(0.02 * half));
        assertThat(r.trials()).isEqualTo(TRIALS);
        assertThat(r.probability()).isEqualTo(0.95);
    }

    @Test
    void correlatedNormalInputsCombineAsTheGumSays() {
        // GUM 5.2.2, eq. (16) for y = x1 ± x2: u²(y) = u1² + u2² ± 2·r·u1·u2.
        InputQuantity a = InputQuantity.ofStandardUncertainty("a", 1.0, 0.2);
        InputQuantity b = InputQuantity.ofStandardUncertainty("b", 2.0, 0.1);
        double r = 0.8;
        double sum = Math.sqrt(0.04 + 0.01 + 2 * r * 0.02);
        double difference = Math.sqrt(0.04 + 0.01 - 2 * r * 0.02);
        MonteCarloResult plus = UncertaintyBudget.of(v -> v[0] + v[1], a, b)
                .withCorrelation("a", "b", r).monteCarlo(TRIALS, 7, 0.95);
        MonteCarloResult minus = UncertaintyBudget.of(v -> v[0] - v[1], a, b)
                .withCorrelation("a", "b", r).monteCarlo(TRIALS, 7, 0.95);
        assertThat(plus.estimate()).isCloseTo(3.0, within(5 * sum / Math.sqrt(TRIALS)));
        assertThat(minus.estimate()).isCloseTo(-1.0, within(5 * difference / Math.sqrt(TRIALS)));
        assertThat(plus.standardUncertainty()).isCloseTo(sum, within(0.015 * sum));
        assertThat(minus.standardUncertainty()).isCloseTo(difference, within(0.015 * difference));
        double z = new NormalDistribution().inverseCumulativeProbability(0.975);
        assertThat(plus.upper()).isCloseTo(3.0 + z * sum, within(0.02 * z * sum));
        assertThat(minus.lower()).isCloseTo(-1.0 - z * difference, within(0.02 * z * difference));
        // the GUM evaluation of the same budgets agrees (eq. 16 exactly, linear models)
        assertThat(UncertaintyBudget.of(v -> v[0] + v[1], a, b).withCorrelation("a", "b", r)
                .evaluate(0.95).combinedStandardUncertainty()).isCloseTo(sum, within(1e-9));
        assertThat(UncertaintyBudget.of(v -> v[0] - v[1], a, b).withCorrelation("b", "a", r)
                .evaluate(0.95).combinedStandardUncertainty()).isCloseTo(difference, within(1e-9));
    }

    @Test
    void correlationsAtTheEndsOfTheirRangeAreAccepted() {
        InputQuantity a = InputQuantity.ofStandardUncertainty("a", 1.0, 0.2);
        InputQuantity b = InputQuantity.ofStandardUncertainty("b", 2.0, 0.1);
        UncertaintyBudget budget = UncertaintyBudget.of(v -> v[0] + v[1], a, b);
        // GUM 5.2.2, eq. (16): fully correlated inputs add their uncertainties, fully
        // anti-correlated ones subtract them.
        assertThat(budget.withCorrelation("a", "b", 1.0).evaluate(0.95)
                .combinedStandardUncertainty()).isCloseTo(0.3, within(1e-9));
        assertThat(budget.withCorrelation("a", "b", -1.0).evaluate(0.95)
                .combinedStandardUncertainty()).isCloseTo(0.1, within(1e-9));
        org.assertj.core.api.Assertions.assertThatThrownBy(
                () -> budget.withCorrelation("a", "b", Math.nextUp(1.0)))
                .isInstanceOf(IllegalArgumentException.class);
        org.assertj.core.api.Assertions.assertThatThrownBy(
                () -> budget.withCorrelation("a", "b", Math.nextDown(-1.0)))
                .isInstanceOf(IllegalArgumentException.class);
    }

    @Test
    void secondOrderTermsFollowGum512Note() {
        // GUM 5.1.2, note: u²(y) adds Σi Σj [½(∂²f/∂xi∂xj)² + ∂f/∂xi·∂³f/∂xi∂xj²]·u²(xi)·u²(xj).
        // y = x1·x2 at (0, 0): the first-order u is 0 and the second order gives u1·u2.
        InputQuantity a = InputQuantity.ofStandardUncertainty("a", 0.0, 0.3);
        InputQuantity b = InputQuantity.ofStandardUncertainty("b", 0.0, 0.2);
        UncertaintyResult product = UncertaintyBudget.of(v -> v[0] * v[1], a, b)
                .withSecondOrderTerms().evaluate(0.95);
        assertThat(product.combinedStandardUncertainty()).isCloseTo(0.06, within(1e-9));
        assertThat(product.secondOrderVariance()).isCloseTo(0.0036, within(1e-10));
        // (No cubic in one input here: the budget's sensitivities are central differences
        // over ±u, as GUM 5.1.3, note 2 allows, which for x³ add u²·f'''/6 to the derivative;
        // the models here have exact central differences.)
        // y = x1²·x2 at (1, 2), u1 = 0.1, u2 = 0.2: the mixed terms count once per order of
        // i and j. ∂²f/∂x1² = 2x2 = 4, ∂²f/∂x1∂x2 = 2x1 = 2, ∂³f/∂x1∂x2² = 0,
        // ∂³f/∂x2∂x1² = 2, ∂³f/∂x1³ = 0, c1 = 2x1x2 = 4, c2 = x1² = 1.
        // i=j=1: ½·16·u1⁴; i=1,j=2: ½·4·u1²u2²; i=2,j=1: (½·4 + 1·2)·u2²u1²; i=j=2: 0.
        double u1 = 0.1;
        double u2 = 0.2;
        double expected = 8 * Math.pow(u1, 4) + 2 * u1 * u1 * u2 * u2 + 4 * u1 * u1 * u2 * u2;
        UncertaintyResult mixed = UncertaintyBudget.of(v -> v[0] * v[0] * v[1],
                InputQuantity.ofStandardUncertainty("p", 1.0, u1),
                InputQuantity.ofStandardUncertainty("q", 2.0, u2)).withSecondOrderTerms()
                .evaluate(0.95);
        assertThat(mixed.secondOrderVariance()).isCloseTo(expected, within(1e-10));
    }
}
