package org.strainmath.history;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.util.Arrays;
import java.util.SplittableRandom;
import java.util.stream.IntStream;
import java.util.stream.Stream;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.EnumSource;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * The streaming counter gives the batch count for any split of the history into blocks and
 * single samples, across saves and restores of its state, for every residue treatment; and its
 * state form rejects what a count cannot leave behind.
 */
class RainflowCounterTest {

    static Stream<Arguments> splits() {
        return IntStream.range(0, 90).mapToObj(seed -> {
            SplittableRandom random = new SplittableRandom(20_26_12L * 100 + seed);
            int kind = seed % 3;
            int n = 1 + random.nextInt(1500);
            double gate = seed % 2 == 0 ? 0.0 : (kind == 1 ? 1.0 : 0.3 + random.nextDouble());
            Rainflow.Residue residue = Rainflow.Residue.values()[(seed / 3) % 3];
            return Arguments.of(seed, residue, gate, RainflowReference.history(random, n, kind),
                    random.split());
        });
    }

    @ParameterizedTest(name = "seed {0}, {1}, gate {2}")
    @MethodSource("splits")
    void anySplitIntoBlocksWithRestartsGivesTheBatchCount(int seed, Rainflow.Residue residue,
            double gate, double[] x, SplittableRandom random) {
        Rainflow rainflow = Rainflow.astm().withGate(gate).withResidue(residue);
        Cycles.Collector streamed = new Cycles.Collector();
        RainflowCounter counter = rainflow.newCounter(streamed);
        int skipped = 0;
        int i = 0;
        while (i < x.length) {
            int choice = random.nextInt(4);
            if (choice == 0) {
                counter.accept(x[i]);
                skipped += Double.isFinite(x[i]) ? 0 : 1;
                i++;
            } else {
                int len = Math.min(x.length - i, random.nextInt(choice == 1 ? 3 : 200));
                // a block inside a larger array, at an offset
                double[] buffer = new double[len + 7];
                System.arraycopy(x, i, buffer, 5, len);
                skipped += counter.accept(buffer, 5, len);
                i += len;
            }
            if (random.nextInt(10) == 0) {
                // the process stops and a new one goes on from the saved state
                counter = RainflowCounter.fromBytes(counter.toBytes(), streamed);
            }
            if (random.nextInt(15) == 0) {
                // a report of the count so far changes nothing
                counter.residueTo((f, t, c) -> { });
            }
        }
        counter.residueTo(streamed);
        Cycles batch = rainflow.count(x.length == 0 ? new double[] {0} : x);
        if (skipped == x.length) {
            return;     // no finite sample: the batch count refuses it, tested elsewhere
        }
        assertThat(streamed.toCycles(skipped)).isEqualTo(batch);
        assertThat(skipped).isEqualTo((int) batch.skipped());
        assertThat(counter.skipped()).isEqualTo(skipped);
        assertThat(counter.samples()).isEqualTo(x.length - skipped);
    }

    @ParameterizedTest
    @EnumSource(Rainflow.Residue.class)
    void aCounterGoesOnAfterAReportAsIfThereHadBeenNone(Rainflow.Residue residue) {
        double[] x = RainflowReference.history(new SplittableRandom(7), 3000, 0);
        Rainflow rainflow = Rainflow.astm().withResidue(residue);
        Cycles.Collector a = new Cycles.Collector();
        Cycles.Collector b = new Cycles.Collector();
        RainflowCounter plain = rainflow.newCounter(a);
        RainflowCounter reported = rainflow.newCounter(b);
        for (int i = 0; i < x.length; i += 100) {
            plain.accept(x, i, 100);
            reported.accept(x, i, 100);
            Cycles.Collector sofar = new Cycles.Collector();
            reported.residueTo(sofar);
            // a second report of the same samples gives the same residue's cycles
            Cycles.Collector again = new Cycles.Collector();
            reported.residueTo(again);
            assertThat(again.toCycles(0)).isEqualTo(sofar.toCycles(0));
            // what the consumer holds plus the residue's cycles is the count of the samples so far
            Cycles.Collector both = new Cycles.Collector();
            RainflowCounter replay = rainflow.newCounter(both);
            replay.accept(x, 0, i + 100);
            replay.residueTo(both);
            assertThat(both.toCycles(0).total()).isEqualTo(
                    b.toCycles(0).total() + sofar.toCycles(0).total());
        }
        plain.residueTo(a);
        reported.residueTo(b);
        assertThat(b.toCycles(0)).isEqualTo(a.toCycles(0));
        assertThat(reported.rainflow()).isEqualTo(rainflow);
    }

    @Test
    void theResidueHoldsTheTurningPointsNoCycleClosed() {
        // By hand, ASTM E1049-85 5.4.4's rule on 0 5 1 4 2: 1-4 (range 3) is smaller than 5-1
        // (range 4), and 5-1 smaller than 0-5 (range 5), so no cycle closes; 0, 5, 1, 4 are
        // confirmed turning points and 2, the last sample, is the open extreme.
        RainflowCounter counter = Rainflow.astm().newCounter((f, t, c) -> { });
        counter.accept(new double[] {0, 5, 1, 4, 2}, 0, 5);
        assertThat(counter.residue()).containsExactly(0, 5, 1, 4);
        assertThat(counter.residueSize()).isEqualTo(4);
        assertThat(counter.turningPoints()).isEqualTo(4);
        assertThat(counter.samples()).isEqualTo(5);
        // By hand: 6 turns 2 into a valley; 4-2 (range 2) is smaller than 1-4 (3), so nothing
        // closes and 6 is the open extreme.
        counter.accept(6);
        assertThat(counter.residue()).containsExactly(0, 5, 1, 4, 2);
        counter.reset();
        assertThat(counter.residueSize()).isZero();
        assertThat(counter.turningPoints()).isZero();
    }

    @Test
    void theStateIsCompactAndRestoresEveryField() {
        RainflowCounter counter = Rainflow.astm().withGate(0.25)
                .withResidue(Rainflow.Residue.REPEATED).newCounter((f, t, c) -> { });
        counter.accept(new double[] {0, 3, -2, Double.NaN, 2.5, 1}, 0, 6);
        byte[] state = counter.toBytes();
        // 51 bytes and 8 per residue point (the class comment): residue 0, 3, -2, 2.5
        assertThat(counter.residue()).containsExactly(0, 3, -2, 2.5);
        assertThat(state).hasSize(51 + 8 * 4);
        RainflowCounter back = RainflowCounter.fromBytes(state, (f, t, c) -> { });
        assertThat(back.toBytes()).isEqualTo(state);
        assertThat(back.rainflow()).isEqualTo(counter.rainflow());
        assertThat(back).hasToString(counter.toString()).hasToString(
                "RainflowCounter[5 samples, 1 skipped, 4 turning points, residue of 4;"
                + " Rainflow[ASTM E1049-85 5.4.4, gate 0.25, residue closed as a repeating"
                + " history (5.4.3)]]");
    }

    @Test
    void aStateThatNoCountLeavesIsRefused() {
        RainflowCounter counter = Rainflow.astm().newCounter((f, t, c) -> { });
        counter.accept(new double[] {0, 5, 1, 4, 2}, 0, 5);
        byte[] good = counter.toBytes();
        assertThat(counter.residue()).containsExactly(0, 5, 1, 4);

        assertThatThrownBy(() -> RainflowCounter.fromBytes(Arrays.copyOf(good, 10), (f, t, c) -> { }))
                .isInstanceOf(IllegalArgumentException.class).hasMessageContaining("ends early");
        byte[] tag = good.clone();
        tag[0] = 'X';
        assertThatThrownBy(() -> RainflowCounter.fromBytes(tag, (f, t, c) -> { }))
                .isInstanceOf(IllegalArgumentException.class)
                .hasMessage("state must begin with the tag SMRC: XMRC");
        byte[] version = good.clone();
        version[4] = 9;
        assertThatThrownBy(() -> RainflowCounter.fromBytes(version, (f, t, c) -> { }))
                .hasMessage("state must be of format version 1: 9");
        byte[] longer = Arrays.copyOf(good, good.length + 1);
        assertThatThrownBy(() -> RainflowCounter.fromBytes(longer, (f, t, c) -> { }))
                .hasMessage("state must end after its fields: 1 bytes left over");
        // residue 0, 5, 1, 4 with its last point made 6: the range 1 → 6 reaches 5 → 1, a cycle
        // the three-point count would have taken
        byte[] closes = good.clone();
        java.nio.ByteBuffer.wrap(closes).putDouble(closes.length - 8, 6.0);
        assertThatThrownBy(() -> RainflowCounter.fromBytes(closes, (f, t, c) -> { }))
                .isInstanceOf(IllegalArgumentException.class)
                .hasMessageContaining("residue[3] = 6.0");
        byte[] nan = good.clone();
        java.nio.ByteBuffer.wrap(nan).putDouble(6, Double.NaN);       // the gate
        assertThatThrownBy(() -> RainflowCounter.fromBytes(nan, (f, t, c) -> { }))
                .hasMessage("state must hold a finite gate >= 0.0: NaN");
        assertThatThrownBy(() -> RainflowCounter.fromBytes(null, (f, t, c) -> { }))
                .isInstanceOf(NullPointerException.class).hasMessage("state");
        assertThatThrownBy(() -> RainflowCounter.fromBytes(good, null))
                .isInstanceOf(NullPointerException.class).hasMessage("consumer");
    }

    @Test
    void theResidueStaysSmallOnALongRealisticSignal() {
        // Ten million samples of a noisy load signal (seeded): the residue is bounded by the
        // signal's range, not by its length.
        SplittableRandom random = new SplittableRandom(42);
        double[] block = new double[10_000];
        RainflowCounter counter = Rainflow.astm().withGate(0.05).newCounter((f, t, c) -> { });
        int largest = 0;
        for (int b = 0; b < 1000; b++) {
            for (int i = 0; i < block.length; i++) {
                double t = (b * block.length + i) * 1e-3;
                block[i] = Math.sin(t) + 0.3 * Math.sin(7.3 * t) + 0.02 * random.nextGaussian();
            }
            counter.accept(block, 0, block.length);
            largest = Math.max(largest, counter.residueSize());
        }
        assertThat(counter.samples()).isEqualTo(10_000_000);
        assertThat(largest).isLessThan(40);
    }

    @Test
    void blockArgumentsAreChecked() {
        RainflowCounter counter = Rainflow.astm().newCounter((f, t, c) -> { });
        assertThatThrownBy(() -> counter.accept(null, 0, 1)).isInstanceOf(NullPointerException.class)
                .hasMessage("src");
        assertThatThrownBy(() -> counter.accept(new double[3], 2, 2))
                .isInstanceOf(IndexOutOfBoundsException.class);
        assertThatThrownBy(() -> counter.residueTo(null)).isInstanceOf(NullPointerException.class)
                .hasMessage("out");
        assertThatThrownBy(() -> Rainflow.astm().newCounter(null))
                .isInstanceOf(NullPointerException.class).hasMessage("consumer");
        // NaN and infinities are skipped and counted, never thrown
        assertThat(counter.accept(new double[] {Double.NaN, 1, Double.POSITIVE_INFINITY,
            Double.NEGATIVE_INFINITY}, 0, 4)).isEqualTo(3);
        counter.accept(Double.NaN);
        assertThat(counter.skipped()).isEqualTo(4);
        counter.reset();
        assertThat(counter.samples()).isZero();
        assertThat(counter.residueSize()).isZero();
    }

    @Test
    void batchArgumentsAreChecked() {
        assertThatThrownBy(() -> Rainflow.astm().count(new double[0]))
                .isInstanceOf(IllegalArgumentException.class)
                .hasMessage("history must hold a finite sample: 0 samples, 0 not finite");
        assertThatThrownBy(() -> Rainflow.astm().count(new double[] {Double.NaN}))
                .hasMessage("history must hold a finite sample: 1 samples, 1 not finite");
        assertThatThrownBy(() -> Rainflow.astm().withGate(-1))
                .hasMessage("gate must be >= 0 and finite: -1.0");
        assertThatThrownBy(() -> Rainflow.astm().withGate(Double.NaN))
                .hasMessage("gate must be >= 0 and finite: NaN");
        assertThatThrownBy(() -> Rainflow.astm().withGate(Double.POSITIVE_INFINITY))
                .hasMessage("gate must be >= 0 and finite: Infinity");
        assertThatThrownBy(() -> Rainflow.astm().withResidue(null))
                .isInstanceOf(NullPointerException.class).hasMessage("residue");
        // one sample, or a constant history: no cycles, not an error
        assertThat(Rainflow.astm().count(new double[] {3}).size()).isZero();
        assertThat(Rainflow.astm().count(new double[] {3, 3, 3}).size()).isZero();
    }
}
