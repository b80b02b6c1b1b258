package org.strainmath.benchmarks;

import static org.assertj.core.api.Assertions.assertThat;

import org.junit.jupiter.api.Test;
import org.strainmath.history.Bins;
import org.strainmath.history.Cycles;
import org.strainmath.history.Rainflow;
import org.strainmath.history.RangeHistogram;

/** The cycle-counting benchmark's paths find the same turning points and count the same cycles. */
class CycleCountingBenchmarkTest {

    @Test
    void floorFilterCounterAndListAgree() {
        for (double gate : new double[] {0, 20e-6}) {
            CycleCountingBenchmark b = new CycleCountingBenchmark();
            b.size = 4096;
            b.gate = gate;
            b.setUp();
            // Two blocks, as a gateway feeds them.
            b.floorTurningPoints();
            b.floorTurningPoints();
            int filtered = b.turningPointFilter() + b.turningPointFilter();
            assertThat(b.found).as("gate %s", gate).isEqualTo(filtered);
            assertThat(b.counter()).isZero();
            assertThat(b.counter()).isZero();
            double[] twice = new double[2 * b.size];
            System.arraycopy(b.signal, 0, twice, 0, b.size);
            System.arraycopy(b.signal, 0, twice, b.size, b.size);
            // Oracle: the batch count of the same samples, less its residue, in the same bins.
            Cycles closed = Rainflow.astm().withGate(gate).count(twice);
            RangeHistogram expected = RangeHistogram.of(Bins.uniform(0, 2000e-6, 40));
            RangeHistogram residue = RangeHistogram.of(Bins.uniform(0, 2000e-6, 40));
            closed.forEach(expected);
            b.counter.residueTo(residue);
            assertThat(b.histogram.total() + residue.total()).isEqualTo(expected.total());
            assertThat(b.histogram.total()).isPositive();
            // The list path, on a fresh histogram, counts the same closed and half cycles.
            CycleCountingBenchmark list = new CycleCountingBenchmark();
            list.size = 4096;
            list.gate = gate;
            list.setUp();
            list.listBasedCount();
            assertThat(list.listBasedCount()).isEqualTo(b.histogram.total());
            b.counterWithDamage();
            assertThat(b.damage.damage()).isPositive();
        }
    }
}
