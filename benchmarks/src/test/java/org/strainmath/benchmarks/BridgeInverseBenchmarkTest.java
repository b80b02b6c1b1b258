package org.strainmath.benchmarks;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.Test;

/**
 * The benchmark compares like with like: its block kernels and its value-object paths compute
 * the same strains from the same seeded inputs, and those inputs are a realistic signal.
 */
class BridgeInverseBenchmarkTest {

    private static BridgeInverseBenchmark prepared(int size) {
        BridgeInverseBenchmark benchmark = new BridgeInverseBenchmark();
        benchmark.size = size;
        benchmark.setUp();
        return benchmark;
    }

    @Test
    void blockAndValueObjectPathsGiveTheSameStrains() {
        BridgeInverseBenchmark benchmark = prepared(4096);
        assertThat(benchmark.quarterBlock()).isZero();
        double[] block = benchmark.out.clone();
        double[] values = benchmark.quarterValueObjects().clone();
        assertThat(block).isEqualTo(values);

        assertThat(benchmark.fullAxialPoissonBlock()).isZero();
        block = benchmark.out.clone();
        values = benchmark.fullAxialPoissonValueObjects().clone();
        assertThat(block).isEqualTo(values);
    }

    @Test
    void inputsRoundTripToTheSeededSignal() {
        // The inputs are the seeded strain signal through each bridge's forward kernel, so the
        // inverse must give the signal back (to 1e-12 relative, the bridge's own round trip).
        BridgeInverseBenchmark benchmark = prepared(4096);
        double[] signal = Signals.strain(4096, 1500e-6, 0x5EED);
        benchmark.fullAxialPoissonBlock();
        for (int i = 0; i < signal.length; i++) {
            assertThat(benchmark.out[i]).isCloseTo(signal[i], within(1e-12 * Math.abs(signal[i]) + 1e-18));
        }
    }

    @Test
    void signalIsSeededAndRealistic() {
        double[] a = Signals.strain(1 << 16, 1500e-6, 7);
        double[] b = Signals.strain(1 << 16, 1500e-6, 7);
        assertThat(a).isEqualTo(b);
        double peak = 0;
        for (double x : a) {
            peak = Math.max(peak, Math.abs(x));
        }
        // Load cycle 1500 µε plus a tenth of it in vibration plus 5 µε RMS noise (Signals).
        assertThat(peak).isBetween(1500e-6, 1700e-6);
        assertThat(Signals.strain(1 << 16, 1500e-6, 8)).isNotEqualTo(a);
    }
}
