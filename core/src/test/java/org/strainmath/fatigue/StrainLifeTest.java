package org.strainmath.fatigue;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.util.SplittableRandom;
import java.util.stream.IntStream;
import java.util.stream.Stream;

import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;
import org.strainmath.quantity.Stress;

/**
 * The strain–life solution against Commons Math's Brent solver on the same published equations,
 * the transition life's closed form, and round trips. The constants are those of a
 * high-strength steel as tabulated for AISI 4340 in Dowling, <i>Mechanical Behavior of
 * Materials</i> (E = 207 GPa, σf' = 1758 MPa, b = −0.0977, εf' = 2.12, c = −0.774; σf' and b
 * as the book's stress-life example uses them, see TextbookExamplesTest, the other three from
 * memory): what is checked is the solution, not the steel. No worked strain-life example of a
 * textbook was at hand to check against.
 */
class StrainLifeTest {

    private static final StrainLife STEEL = StrainLife.of(Stress.ofGigapascals(207),
            Stress.ofMegapascals(1758), -0.0977, 2.12, -0.774);

    static Stream<Arguments> cycles() {
        SplittableRandom random = new SplittableRandom(1968);
        return IntStream.range(0, 60).mapToObj(i -> Arguments.of(
                Math.pow(10, -3.5 + 2.2 * random.nextDouble()),       // εa from 0.03 % to 5 %
                -400e6 + 1200e6 * random.nextDouble()));               // σm from -400 to 800 MPa
    }

    @ParameterizedTest(name = "εa = {0}, σm = {1}")
    @MethodSource("cycles")
    void morrowsSolutionIsBrentsRoot(double amplitude, double mean) {
        // Oracle: Commons Math's Brent solver on Morrow's form of Coffin–Manson–Basquin in ln(2N).
        StrainLife morrow = STEEL.withMorrowCorrection();
        double x = brent(ln -> (1758e6 - mean) / 207e9 * Math.exp(-0.0977 * ln)
                + 2.12 * Math.exp(-0.774 * ln) - amplitude);
        assertThat(morrow.reversalsToFailure(amplitude, mean))
                .isCloseTo(Math.exp(x), within(Math.exp(x) * 1e-10));
    }

    @ParameterizedTest(name = "εa = {0}, σm = {1}")
    @MethodSource("cycles")
    void smithWatsonToppersSolutionIsBrentsRoot(double amplitude, double mean) {
        // Oracle: Commons Math's Brent solver on the Smith–Watson–Topper parameter σmax·εa in
        // ln(2N).
        double peak = 207e9 * amplitude + mean;
        if (peak <= 0) {
            assertThat(STEEL.withSmithWatsonTopper().reversalsToFailure(amplitude, mean)).isInfinite();
            return;
        }
        double x = brent(ln -> 1758e6 * 1758e6 / 207e9 * Math.exp(2 * -0.0977 * ln)
                + 1758e6 * 2.12 * Math.exp((-0.0977 - 0.774) * ln) - peak * amplitude);
        assertThat(STEEL.withSmithWatsonTopper().reversalsToFailure(amplitude, mean))
                .isCloseTo(Math.exp(x), within(Math.exp(x) * 1e-10));
    }

    @ParameterizedTest(name = "εa = {0}, σm = {1}")
    @MethodSource("cycles")
    void theForwardCurveAtTheSolutionGivesTheAmplitudeBack(double amplitude, double mean) {
        StrainLife morrow = STEEL.withMorrowCorrection();
        double reversals = morrow.reversalsToFailure(amplitude, mean);
        assertThat(morrow.strainAmplitudeAt(reversals, mean))
                .isCloseTo(amplitude, within(amplitude * 1e-13));
    }

    /** The root in ln 2N of f, by Commons Math's Brent solver on a wide bracket. */
    private static double brent(java.util.function.DoubleUnaryOperator f) {
        return new BrentSolver(1e-14, 1e-15).solve(1000, f::applyAsDouble, -5, 200);
    }

    @Test
    void atTheTransitionLifeTheElasticAndPlasticStrainsAreEqual() {
        // 2N_t = (εf'·E/σf')^(1/(b − c)) (Dowling, the strain-based approach; from memory), at
        // which εa = 2·σf'/E·(2N_t)^b.
        double transition = STEEL.transitionReversals();
        double expected = Math.pow(2.12 * 207e9 / 1758e6, 1 / (-0.0977 + 0.774));
        assertThat(transition).isCloseTo(expected, within(expected * 1e-13));
        double elastic = 1758e6 / 207e9 * Math.pow(transition, -0.0977);
        assertThat(STEEL.strainAmplitudeAt(transition, 0)).isCloseTo(2 * elastic,
                within(elastic * 1e-13));
        assertThat(STEEL.reversalsToFailure(2 * elastic, 0))
                .isCloseTo(transition, within(transition * 1e-12));
    }

    @Test
    void aCycleOfAStrainHistoryTakesItsStressesAsElastic() {
        // From -0.1 % to +0.3 %: εa = 0.2 %, εm = 0.1 %, so σm = 207 MPa and σmax = 621 MPa.
        StrainLife morrow = STEEL.withMorrowCorrection();
        assertThat(morrow.cyclesToFailure(-0.001, 0.003))
                .isEqualTo(0.5 * morrow.reversalsToFailure(0.002, 207e6));
        assertThat(STEEL.cyclesToFailure(-0.001, 0.003))
                .isEqualTo(0.5 * STEEL.reversalsToFailure(0.002, 0));
        // a tensile mean shortens the life, a compressive one lengthens it
        assertThat(morrow.cyclesToFailure(-0.001, 0.003))
                .isLessThan(STEEL.cyclesToFailure(-0.001, 0.003));
        assertThat(morrow.cyclesToFailure(-0.003, 0.001))
                .isGreaterThan(STEEL.cyclesToFailure(-0.003, 0.001));
        // SWT: σmax·εa with σmax = E·0.003
        assertThat(STEEL.withSmithWatsonTopper().cyclesToFailure(-0.001, 0.003))
                .isEqualTo(0.5 * STEEL.withSmithWatsonTopper().reversalsToFailure(0.002, 207e6));
    }

    @Test
    void limitsNeverThrow() {
        StrainLife morrow = STEEL.withMorrowCorrection();
        assertThat(morrow.reversalsToFailure(0, 0)).isInfinite();
        assertThat(morrow.reversalsToFailure(Double.NaN, 0)).isNaN();
        assertThat(morrow.reversalsToFailure(0.001, Double.NaN)).isNaN();
        assertThat(morrow.reversalsToFailure(-0.001, 0)).isNaN();
        assertThat(morrow.reversalsToFailure(0.001, 1758e6)).isZero();
        assertThat(morrow.reversalsToFailure(Double.POSITIVE_INFINITY, 0)).isNaN();
        assertThat(morrow.reversalsToFailure(0.001, Double.NEGATIVE_INFINITY)).isNaN();
        assertThat(morrow.cyclesToFailure(0, Double.POSITIVE_INFINITY)).isNaN();
        assertThat(STEEL.withSmithWatsonTopper().reversalsToFailure(0.001, -500e6)).isInfinite();
        // a tiny amplitude: a very long but finite life, or infinity, never NaN
        assertThat(STEEL.reversalsToFailure(1e-9, 0)).isGreaterThan(1e40);
        assertThat(STEEL.withoutMeanStressCorrection()).isEqualTo(STEEL);
    }

    @Test
    void theConstantsReadBackAndEachDefinesTheValue() {
        // Definition: the constants as given; a curve differs from one with any constant changed
        // or another correction.
        assertThat(STEEL.modulus()).isEqualTo(Stress.ofGigapascals(207));
        assertThat(STEEL.strengthCoefficient()).isEqualTo(Stress.ofMegapascals(1758));
        assertThat(STEEL.strengthExponent()).isEqualTo(-0.0977);
        assertThat(STEEL.ductilityCoefficient()).isEqualTo(2.12);
        assertThat(STEEL.ductilityExponent()).isEqualTo(-0.774);
        StrainLife same = StrainLife.of(Stress.ofGigapascals(207), Stress.ofMegapascals(1758),
                -0.0977, 2.12, -0.774);
        assertThat(same).isEqualTo(STEEL).hasSameHashCodeAs(STEEL).isNotEqualTo("STEEL");
        for (StrainLife other : new StrainLife[] {
            StrainLife.of(Stress.ofGigapascals(200), Stress.ofMegapascals(1758), -0.0977, 2.12, -0.774),
            StrainLife.of(Stress.ofGigapascals(207), Stress.ofMegapascals(1700), -0.0977, 2.12, -0.774),
            StrainLife.of(Stress.ofGigapascals(207), Stress.ofMegapascals(1758), -0.09, 2.12, -0.774),
            StrainLife.of(Stress.ofGigapascals(207), Stress.ofMegapascals(1758), -0.0977, 2.0, -0.774),
            StrainLife.of(Stress.ofGigapascals(207), Stress.ofMegapascals(1758), -0.0977, 2.12, -0.7),
            STEEL.withMorrowCorrection(), STEEL.withSmithWatsonTopper()}) {
            assertThat(other).isNotEqualTo(STEEL);
            assertThat(other.hashCode()).isNotEqualTo(STEEL.hashCode());
        }
    }

    @Test
    void badConstantsAreRefused() {
        assertThatThrownBy(() -> StrainLife.of(Stress.ZERO, Stress.ofMegapascals(1758), -0.1, 1, -0.6))
                .isInstanceOf(IllegalArgumentException.class)
                .hasMessage("modulus must be > 0 and finite: 0.0");
        assertThatThrownBy(() -> StrainLife.of(Stress.ofGigapascals(207), Stress.ofMegapascals(1758),
                0.1, 1, -0.6)).hasMessage("strengthExponent must be in (-1.0, 0.0): 0.1");
        assertThatThrownBy(() -> StrainLife.of(Stress.ofGigapascals(207), Stress.ofMegapascals(1758),
                -0.1, Double.NaN, -0.6)).hasMessage("ductilityCoefficient must be > 0 and finite: NaN");
        assertThatThrownBy(() -> StrainLife.of(Stress.ofGigapascals(207), Stress.ofMegapascals(1758),
                -0.1, 1, -3)).hasMessage("ductilityExponent must be in (-2.0, 0.0): -3.0");
        assertThatThrownBy(() -> StrainLife.of(Stress.ofGigapascals(207), Stress.ofMegapascals(1758),
                -0.5, 1, -0.5).transitionReversals()).isInstanceOf(ArithmeticException.class);
        assertThatThrownBy(() -> STEEL.strainAmplitudeAt(0, 0))
                .hasMessage("reversals must be > 0 and finite: 0.0");
        assertThat(STEEL.withMorrowCorrection()).hasToString("StrainLife[E = 207.0 GPa, σf' = 1758.0"
                + " MPa, b = -0.0977, εf' = 2.12, c = -0.774, Morrow]");
    }
}
