package org.strainmath.bridge;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.SplittableRandom;
import java.util.stream.Stream;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;
import org.strainmath.quantity.Resistance;

/**
 * The proof that lets a channel skip its per-sample check and its NaN count: where
 * {@link Bridge#regularOn} says yes, the plain quotient must be finite at every reading, and a
 * proven code must have a finite strain. A wrong yes would hide a NaN in the count, so the tests
 * hunt for one where it is most likely: at random intervals of the whole physical range, with
 * readings drawn up to the ends.
 */
class ChannelProofTest {

    static Stream<Arguments> bridges() {
        StrainGauge g = StrainGauge.ofOhms(350, 2.1);
        Stream.Builder<Arguments> all = Stream.builder();
        for (Arrangement a : Arrangement.values()) {
            all.add(Arguments.of(a.name(), a.build(g, 0.3), true));
            all.add(Arguments.of(a.name() + " with leads",
                    a.build(g, 0.3).withExcitationLeads(Resistance.ofOhms(3)), true));
        }
        all.add(Arguments.of("three-wire quarter",
                Bridge.quarter(g).withThreeWireLeads(Resistance.ofOhms(5)), true));
        all.add(Arguments.of("two-wire quarter, K = 4.5", Bridge.quarter(StrainGauge.ofOhms(120, 4.5))
                .withTwoWireLeads(Resistance.ofOhms(10)), true));
        // Arms of unlike multiples: the output turns back at a strain inside the model's limit
        // (here within +0.3 m/m, at about 7.5 mV/V), where the quadratic's discriminant reaches
        // zero at the end of the range. Not everyday bridges: only the soundness is checked.
        all.add(Arguments.of("opposite arms ×1.2 and ×−1.7", Bridge.of(BridgeArm.active(g, 1.2),
                BridgeArm.completion(Resistance.ofOhms(350)), BridgeArm.active(g, -1.7),
                BridgeArm.completion(Resistance.ofOhms(350))), false));
        all.add(Arguments.of("adjacent arms ×−1.7 and ×0.85", Bridge.of(BridgeArm.active(g, -1.7),
                BridgeArm.active(g, 0.85), BridgeArm.completion(Resistance.ofOhms(350)),
                BridgeArm.completion(Resistance.ofOhms(350))), false));
        return all.build();
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("bridges")
    void aRegularIntervalHasAFiniteQuotientAtEveryReading(String name, Bridge bridge,
            boolean everyday) {
        // Definition: a proven-regular interval gives a finite strain at every reading inside it.
        SplittableRandom random = new SplittableRandom(name.hashCode());
        double low = bridge.ratioLow();
        double high = bridge.ratioHigh();
        int regular = 0;
        for (int trial = 0; trial < 400; trial++) {
            double a = low + (high - low) * edgeWeighted(random);
            double b = low + (high - low) * edgeWeighted(random);
            double lo = Math.min(a, b);
            double hi = Math.max(a, b);
            if (!(lo > low && hi < high) || !bridge.regularOn(lo, hi)) {
                continue;
            }
            regular++;
            for (int k = 0; k < 200; k++) {
                double r = k == 0 ? lo : k == 1 ? hi
                        : Math.min(hi, Math.max(lo, lo + (hi - lo) * edgeWeighted(random)));
                double strain = bridge.channelStrain(r, low, high, 1.0);
                assertThat(strain).as("%s at %s V/V in [%s, %s]", name, r, lo, hi).isFinite();
            }
        }
        if (everyday) {
            assertThat(regular).as("intervals proven regular").isGreaterThan(40);
        }
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("bridges")
    void theLastReadingsBeforeEachEndAreRegularOnlyWhereTheQuotientIsFinite(String name,
            Bridge bridge, boolean everyday) {
        // Where the output turns back, the discriminant is zero at the end of the range and a
        // few ulps inside it rounds below zero: every one of the last 20 000 doubles before
        // each end, taken as an interval of its own, is checked.
        double low = bridge.ratioLow();
        double high = bridge.ratioHigh();
        double up = low;
        double down = high;
        for (int k = 0; k < 20_000; k++) {
            up = Math.nextUp(up);
            down = Math.nextDown(down);
            for (double r : new double[] {up, down}) {
                if (bridge.regularOn(r, r)) {
                    assertThat(bridge.channelStrain(r, low, high, 1.0)).as("%s at %s V/V", name, r)
                            .isFinite();
                }
            }
        }
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("bridges")
    void theConvertersRangeIsProvenAndEveryProvenCodeHasAFiniteStrain(String name, Bridge bridge,
            boolean everyday) {
        // A 24-bit converter at gain 128 reads ±7.8 mV/V, well inside the physical range of the
        // everyday bridges: its codes, less the margin at the rails, are proven.
        StrainChannel channel = StrainChannel.of(bridge, AdcInput.ratiometric(24, 128));
        int rail = 1 << 23;
        assertThat(channel.proven(-rail + 512, rail - 512)).isEqualTo(everyday);
        assertThat(channel.proven(-rail, 0)).isFalse();
        assertThat(channel.proven(0, rail - 1)).isFalse();
        SplittableRandom random = new SplittableRandom(7);
        for (int k = 0; k < 20_000; k++) {
            int code = random.nextInt(-rail, rail);
            if (channel.proven(code, code)) {
                assertThat(channel.toStrain(code)).as("%s, code %d", name, code).isFinite();
            }
        }
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("bridges")
    void anIntervalBeyondThePhysicalRangeIsNotRegular(String name, Bridge bridge,
            boolean everyday) {
        // Past the physical range the quadratic's discriminant or the first-degree denominator
        // reaches zero somewhere (the bridge output turns back or diverges); a linear bridge has
        // neither, and its plain quotient is finite everywhere.
        double low = bridge.ratioLow();
        double high = bridge.ratioHigh();
        double width = high - low;
        boolean wide = bridge.regularOn(low - 100 * width, high + 100 * width);
        if (bridge.isLinear()) {
            assertThat(wide).isTrue();
        } else {
            assertThat(wide).isFalse();
        }
        if (!everyday) {
            // Just past the turning point: no real root (the quotient is NaN), though the
            // denominator's sign may hold, so that the discriminant check has to refuse it.
            double beyondHigh = bridge.channelStrain(high + width * 1e-4, low, high + width, 1.0);
            double beyondLow = bridge.channelStrain(low - width * 1e-4, low - width, high, 1.0);
            // (the opposite-arms bridge turns back past its high end; the adjacent-arms bridge
            // has a real root past both ends, so its range ends for another reason)
            assertThat(Double.isNaN(beyondHigh) || Double.isNaN(beyondLow))
                    .isEqualTo(name.startsWith("opposite"));
            if (Double.isNaN(beyondHigh)) {
                assertThat(bridge.regularOn(high + width * 1e-6, high + width * 1e-3)).isFalse();
            }
            if (Double.isNaN(beyondLow)) {
                assertThat(bridge.regularOn(low - width * 1e-3, low - width * 1e-6)).isFalse();
            }
        }
        assertThat(bridge.regularOn(high, low)).isFalse();
        assertThat(bridge.regularOn(Double.NaN, high)).isFalse();
        assertThat(bridge.regularOn(low, Double.POSITIVE_INFINITY)).isFalse();
    }

    /** A uniform deviate in [0, 1) with extra weight within 1e-17 .. 1e-3 of either end (down to the last ulps). */
    private static double edgeWeighted(SplittableRandom random) {
        double u = random.nextDouble();
        if (u < 0.5) {
            return u * 2;
        }
        double near = Math.pow(10, -3 - 14 * random.nextDouble());
        return u < 0.75 ? near : 1 - near;
    }
}
