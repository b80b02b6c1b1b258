package org.strainmath.bridge;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.math.BigDecimal;
import java.util.SplittableRandom;
import java.util.stream.Stream;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * Seeded properties of every named arrangement: gauge factors 1.5 to 4.5, Poisson ratios 0 to
 * 0.5, strains from −50 000 to +50 000 µε, with a share of log-uniform small strains and of
 * strains within 1e-9 of zero. Each case is an argument of its own, so that a failure names
 * the case and re-runs identically (fixed seed).
 */
class BridgePropertiesTest {

    private static final long SEED = 0x5747_2026L;
    private static final int CASES_PER_ARRANGEMENT = 150;

    static Stream<Arguments> cases() {
        SplittableRandom random = new SplittableRandom(SEED);
        Stream.Builder<Arguments> cases = Stream.builder();
        for (Arrangement arrangement : Arrangement.values()) {
            for (int i = 0; i < CASES_PER_ARRANGEMENT; i++) {
                double k = random.nextDouble(1.5, 4.5);
                double nu = random.nextDouble(0.0, 0.5);
                double ohms = random.nextBoolean() ? 120 : random.nextDouble(60, 5000);
                double strain;
                switch (i % 3) {
                    case 0:
                        strain = random.nextDouble(-0.05, 0.05);
                        break;
                    case 1:
                        strain = Math.copySign(Math.pow(10, random.nextDouble(-15, Math.log10(0.05))),
                                random.nextBoolean() ? 1 : -1);
                        break;
                    default:
                        strain = random.nextDouble(-1e-9, 1e-9);
                        break;
                }
                cases.add(Arguments.of(arrangement, k, nu, ohms, strain));
            }
        }
        return cases.build();
    }

    @ParameterizedTest(name = "{0} K={1} nu={2} R={3} e={4}")
    @MethodSource("cases")
    void forwardEqualsTheBridgeEquationIn50Digits(Arrangement arrangement, double k, double nu,
            double ohms, double strain) {
        // Oracle: ExactBridge, the bridge equation from the four arm resistances, 50 digits.
        Bridge bridge = arrangement.build(StrainGauge.ofOhms(ohms, k), nu);
        BigDecimal exact = ExactBridge.ratio(bridge, strain);
        double ratio = bridge.toRatio(strain);
        if (exact.signum() == 0) {
            assertThat(ratio).isZero();
        } else {
            double relative = new BigDecimal(ratio).subtract(exact)
                    .divide(exact, ExactBridge.DIGITS_50).abs().doubleValue();
            assertThat(relative).isLessThanOrEqualTo(1e-13);
        }
    }

    @ParameterizedTest(name = "{0} K={1} nu={2} R={3} e={4}")
    @MethodSource("cases")
    void inverseOfForwardReturnsTheStrain(Arrangement arrangement, double k, double nu,
            double ohms, double strain) {
        // Definition: the inverse undoes the forward, to 1e-12 relative (rounding of both, by
        // hand).
        Bridge bridge = arrangement.build(StrainGauge.ofOhms(ohms, k), nu);
        double back = bridge.toStrain(bridge.toRatio(strain));
        assertThat(back).isCloseTo(strain, within(Math.max(1e-12 * Math.abs(strain), 1e-18)));
    }

    @ParameterizedTest(name = "{0} K={1} nu={2} R={3} e={4}")
    @MethodSource("cases")
    void inverseOfTheExactOutputIsTheStrain(Arrangement arrangement, double k, double nu,
            double ohms, double strain) {
        // The inverse alone, fed the correctly rounded exact output (oracle: ExactBridge).
        Bridge bridge = arrangement.build(StrainGauge.ofOhms(ohms, k), nu);
        double ratio = ExactBridge.ratio(bridge, strain).doubleValue();
        assertThat(bridge.toStrain(ratio))
                .isCloseTo(strain, within(Math.max(1e-12 * Math.abs(strain), 1e-18)));
    }

    @ParameterizedTest(name = "{0} K={1} nu={2} R={3} e={4}")
    @MethodSource("cases")
    void outputIsOddInStrainOnlyForLinearArrangements(Arrangement arrangement, double k,
            double nu, double ohms, double strain) {
        // Symmetry (common practice, no source): a linear bridge gives r(−ε) = −r(ε); every other
        // arrangement reads more in compression than in tension, |r(−ε)| > |r(ε)| for ε > 0.
        Bridge bridge = arrangement.build(StrainGauge.ofOhms(ohms, k), nu);
        double e = Math.abs(strain);
        double up = bridge.toRatio(e);
        double down = bridge.toRatio(-e);
        if (arrangement.linear) {
            assertThat(down).isEqualTo(-up);
        } else if (e > 1e-6) {
            assertThat(-down).isGreaterThan(up);
        }
    }

    static Stream<Arguments> wholeRangeCases() {
        SplittableRandom random = new SplittableRandom(SEED + 1);
        Stream.Builder<Arguments> cases = Stream.builder();
        for (Arrangement arrangement : Arrangement.values()) {
            for (int i = 0; i < 40; i++) {
                cases.add(Arguments.of(arrangement, random.nextDouble(1.5, 4.5),
                        random.nextDouble(0.0, 0.5), random.nextDouble(0.0, 1.0)));
            }
        }
        return cases.build();
    }

    @ParameterizedTest(name = "{0} K={1} nu={2} at {3} of the range")
    @MethodSource("wholeRangeCases")
    void inverseHoldsOverTheWholePhysicalRange(Arrangement arrangement, double k, double nu,
            double fraction) {
        // Far beyond any gauge's limit, up to the ends of the model's range (an arm resistance
        // near zero, or |ε| near 10), where the quadratic's B may change sign: the root form must
        // stay accurate there too. Oracle: ExactBridge (50 digits) for the reading. Tolerance
        // 1e-11 relative: within the range's inner 98 % the inverse is well conditioned.
        Bridge bridge = arrangement.build(StrainGauge.ofOhms(350, k), nu);
        double low = bridge.strainLow();
        double high = bridge.strainHigh();
        double strain = low + (high - low) * (0.01 + 0.98 * fraction);
        double ratio = ExactBridge.ratio(bridge, strain).doubleValue();
        assertThat(bridge.toStrain(ratio))
                .isCloseTo(strain, within(Math.max(1e-11 * Math.abs(strain), 1e-18)));
    }
}
