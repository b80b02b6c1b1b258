package org.strainmath.fatigue;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.util.SplittableRandom;

import org.junit.jupiter.api.Test;
import org.strainmath.history.Cycles;
import org.strainmath.history.Rainflow;
import org.strainmath.history.RainflowCounter;
import org.strainmath.quantity.Stress;

/** Palmgren–Miner sums by hand, streaming against batch, and the byte form. */
class DamageSumTest {

    /** EN 1993-1-9 detail category 71 (see SnCurveTest). */
    private static final StressLife DETAIL_71 = StressLife.of(SnCurve.ofRange(
            Stress.ofMegapascals(71), 2e6, 3).withKnee(5e6, 5).withCutOffAt(1e8));

    @Test
    void minersSumOfASpectrumByHand() {
        // 10⁵ cycles of 100 MPa, 10⁶ of 60 MPa (both above Δσ_D = 52.31 MPa) and 10⁷ of 20 MPa
        // (below the cut-off Δσ_L = 28.74 MPa): D = 10⁵/(2·10⁶·0.71³) + 10⁶/(2·10⁶·(71/60)³) + 0
        // = 0.139700 + 0.301751 = 0.441451 (by hand).
        Cycles spectrum = Cycles.of(new double[] {0, 0, 0}, new double[] {100e6, 60e6, 20e6},
                new double[] {1e5, 1e6, 1e7});
        double r = 71.0 / 60;
        double expected = 1e5 / (2e6 * 0.71 * 0.71 * 0.71) + 1e6 / (2e6 * r * r * r);
        assertThat(DETAIL_71.damage(spectrum)).isCloseTo(expected, within(1e-14));
        assertThat(expected).isCloseTo(0.441451, within(5e-7));
        DamageSum sum = DETAIL_71.newDamageSum();
        spectrum.forEach(sum);
        assertThat(sum.cycles()).isEqualTo(1.11e7);
        assertThat(sum.harmlessCycles()).isEqualTo(1e7);
        assertThat(sum).hasToString("DamageSum[D = 0.441451 over 11100000.0 cycles (an estimate:"
                + " fatigue lives scatter widely)]");
    }

    @Test
    void onOneSlopeTheDamageIsThatOfTheEquivalentRange() {
        // With N·Δσ^m = N_ref·Δσ_ref^m and no knee, D = (Δσ_E / Δσ_ref)^m where Δσ_E is the
        // equivalent range at N_ref cycles (EN 1993-1-9 annex A; the identity is definition).
        SnCurve one = SnCurve.ofRange(Stress.ofMegapascals(90), 2e6, 3);
        double[] x = new double[20_000];
        SplittableRandom random = new SplittableRandom(9);
        for (int i = 0; i < x.length; i++) {
            x[i] = 40e6 * Math.sin(i * 0.01) + 15e6 * random.nextGaussian();
        }
        Cycles cycles = Rainflow.astm().count(x);
        double equivalent = cycles.equivalentRange(3, 2e6);
        double ratio = equivalent / 90e6;
        assertThat(StressLife.of(one).damage(cycles))
                .isCloseTo(ratio * ratio * ratio, within(ratio * ratio * ratio * 1e-12));
    }

    @Test
    void streamingDamageEqualsTheBatchDamageAndRestoresFromItsBytes() {
        StressLife life = DETAIL_71.withMeanStressCorrection(
                MeanStressCorrection.goodman(Stress.ofMegapascals(510)));
        double[] x = new double[50_000];
        SplittableRandom random = new SplittableRandom(5);
        for (int i = 0; i < x.length; i++) {
            x[i] = 30e6 + 50e6 * Math.sin(i * 0.003) * Math.sin(i * 0.05) + 5e6 * random.nextGaussian();
        }
        double batch = life.damage(Rainflow.astm().count(x));
        DamageSum streamed = life.newDamageSum();
        RainflowCounter counter = Rainflow.astm().newCounter(streamed);
        for (int i = 0; i < x.length; i += 4096) {
            counter.accept(x, i, Math.min(4096, x.length - i));
            if (i % (3 * 4096) == 0) {
                streamed = DamageSum.fromBytes(life, streamed.toBytes());
                counter = RainflowCounter.fromBytes(counter.toBytes(), streamed);
            }
        }
        counter.residueTo(streamed);
        // the same cycles in the same order through the same compensated sum: the same bits
        assertThat(streamed.damage()).isEqualTo(batch);
        assertThat(batch).isPositive();
        assertThatThrownBy(() -> DamageSum.fromBytes(DETAIL_71, new byte[] {1, 2}))
                .isInstanceOf(IllegalArgumentException.class);
    }

    @Test
    void sumsOfOneModelAddUp() {
        DamageSum a = DETAIL_71.newDamageSum();
        DamageSum b = DETAIL_71.newDamageSum();
        a.accept(0, 100e6, 1);
        b.accept(0, 100e6, 0.5);
        b.accept(0, 20e6, 2);      // below the cut-off: counted, harmless
        a.addAll(b);
        // By hand: 1.5 cycles of 100 MPa, N = 715 822 each (see SnCurveTest); 2 harmless cycles.
        assertThat(a.damage()).isCloseTo(1.5 / 715_822.0, within(1e-18));
        assertThat(a.cycles()).isEqualTo(3.5);
        assertThat(a.harmlessCycles()).isEqualTo(2.0);
        assertThat(a.life()).isEqualTo(DETAIL_71);
        assertThatThrownBy(() -> a.addAll(StressLife.of(SnCurve.ofRange(Stress.ofMegapascals(90),
                2e6, 3)).newDamageSum())).isInstanceOf(IllegalArgumentException.class)
                .hasMessageStartingWith("other must sum over StressLife[");
        // a cycle whose mean leaves no strength has no life: infinite damage, not an exception
        DamageSum g = DETAIL_71.withMeanStressCorrection(MeanStressCorrection.goodman(
                Stress.ofMegapascals(200))).newDamageSum();
        g.accept(200e6, 220e6, 1);
        assertThat(g.damage()).isInfinite();
    }
}
