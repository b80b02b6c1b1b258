package org.strainmath.history;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.util.SplittableRandom;

import org.junit.jupiter.api.Test;

/** The streaming turning-point filter: blocks, positions, in place, and the batch form. */
class TurningPointFilterTest {

    @Test
    void theClassCommentsExample() {
        // By hand, with a gate of 0.5: 2 → 1.9 and -1 → -0.5 are reversals within the gate.
        TurningPoints tp = TurningPoints.of(new double[] {0, 2, 1.9, 5, -1, -0.5, -3}, 0.5);
        assertThat(tp.values()).containsExactly(0, 5, -3);
        assertThat(tp.indices()).containsExactly(0, 3, 6);
        assertThat(tp).hasToString("TurningPoints[3 of 7 samples, gate 0.5]");
    }

    @Test
    void blocksGiveWhatSingleSamplesGiveWithPositionsThatCountSkippedSamples() {
        double[] x = RainflowReference.history(new SplittableRandom(11), 2000, 2);
        TurningPointFilter single = TurningPointFilter.withGate(3);
        double[] expected = new double[x.length];
        long[] expectedPositions = new long[x.length];
        int n = 0;
        for (double v : x) {
            if (single.accept(v)) {
                expected[n] = single.lastTurningPoint();
                expectedPositions[n++] = single.lastPosition();
            }
        }
        TurningPointFilter blocks = TurningPointFilter.withGate(3);
        double[] got = new double[x.length];
        long[] positions = new long[x.length];
        int m = 0;
        for (int i = 0; i < x.length; i += 333) {
            int len = Math.min(333, x.length - i);
            m += blocks.accept(x, i, got, positions, m, len);
        }
        assertThat(m).isEqualTo(n);
        for (int k = 0; k < n; k++) {
            assertThat(got[k]).isEqualTo(expected[k]);
            assertThat(positions[k]).isEqualTo(expectedPositions[k]);
            assertThat(x[(int) positions[k]]).as("the sample at the position").isEqualTo(got[k]);
        }
        assertThat(blocks.samples()).isEqualTo(x.length);
        assertThat(blocks.skipped()).isEqualTo(single.skipped()).isPositive();
        assertThat(blocks.pending()).isEqualTo(single.pending());
        assertThat(x[(int) blocks.pendingPosition()]).isEqualTo(blocks.pending().getAsDouble());
    }

    @Test
    void inPlaceTheTurningPointsOverwriteTheSamples() {
        // By hand: the reversals of 0 1 2 1 0 3 −1 −1 2 are 0 2 0 3 −1, with 2 pending as the last
        // point.
        double[] x = {0, 1, 2, 1, 0, 3, -1, -1, 2};
        double[] copy = x.clone();
        TurningPointFilter filter = TurningPointFilter.withGate(0);
        int n = filter.accept(x, 0, x, 0, x.length);
        assertThat(java.util.Arrays.copyOf(x, n)).containsExactly(0, 2, 0, 3, -1);
        assertThat(filter.pending().getAsDouble()).isEqualTo(2);
        TurningPoints points = TurningPoints.of(copy);
        assertThat(points.values()).containsExactly(0, 2, 0, 3, -1, 2);
        // By hand: where each lies in the history (the first of the two equal -1 samples)
        assertThat(points.indices()).containsExactly(0, 2, 4, 5, 6, 8);
        assertThat(points.value(3)).isEqualTo(3.0);
        assertThat(points.index(3)).isEqualTo(5);
        assertThat(points.gate()).isZero();
        assertThat(TurningPoints.of(copy, 1.5).gate()).isEqualTo(1.5);
        assertThat(filter).hasToString("TurningPointFilter[gate 0.0, 9 samples, 0 skipped]");
    }

    @Test
    void beforeTheFirstSampleThereIsNothingAndBadArgumentsAreRefused() {
        TurningPointFilter filter = TurningPointFilter.withGate(1);
        assertThat(filter.lastTurningPoint()).isNaN();
        assertThat(filter.lastPosition()).isEqualTo(-1);
        assertThat(filter.pending()).isEmpty();
        assertThat(filter.pendingPosition()).isEqualTo(-1);
        assertThat(filter.accept(Double.NaN)).isFalse();
        assertThat(filter.accept(0.5)).isTrue();
        assertThat(filter.accept(1.2)).isFalse();     // within the gate of the start: no direction
        assertThat(filter.pending()).isEmpty();
        assertThatThrownBy(() -> TurningPointFilter.withGate(-0.1))
                .hasMessage("gate must be >= 0 and finite: -0.1");
        assertThatThrownBy(() -> filter.accept(new double[2], 0, new double[1], 0, 2))
                .isInstanceOf(IndexOutOfBoundsException.class);
        assertThatThrownBy(() -> filter.accept(new double[2], 0, new double[2], null, 0, 2))
                .isInstanceOf(NullPointerException.class).hasMessage("positions");
        assertThatThrownBy(() -> TurningPoints.of(new double[] {Double.NaN, Double.NaN}))
                .hasMessage("history must hold a finite sample: 2 samples, 2 not finite");
    }
}
