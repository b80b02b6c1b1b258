package org.strainmath.benchmarks;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.Test;

/** The channel benchmark compares like with like, on a realistic signal. */
class ChannelBenchmarkTest {

    @Test
    void blockAndValueObjectPathsAgreeAndTheSignalIsRecovered() {
        ChannelBenchmark benchmark = new ChannelBenchmark();
        benchmark.size = 4096;
        benchmark.setUp();
        assertThat(benchmark.channelBlockWithThermalOutput()).isZero();
        double[] block = benchmark.out.clone();
        // The value path passes each temperature through Temperature (kept in kelvin), which
        // rounds °C in the last bit: equal to 1e-17 absolute, far below one code (2e-9).
        double[] values = benchmark.channelValueObjects();
        for (int i = 0; i < block.length; i++) {
            assertThat(values[i]).isCloseTo(block[i], within(1e-17));
        }
        assertThat(benchmark.channelBlock()).isZero();
        // Without the thermal correction the channel gives the seeded signal back, times the
        // transverse factor, within the quantisation of 24-bit codes (0.002 µε per code).
        double[] signal = Signals.strain(4096, 1500e-6, 0xC0DE);
        double factor = (1 - 0.285 * 0.006) / (1 - 0.006 * 0.29);
        for (int i = 0; i < signal.length; i++) {
            assertThat(benchmark.out[i]).isCloseTo(signal[i] * factor, within(0.01e-6));
        }
    }
}
