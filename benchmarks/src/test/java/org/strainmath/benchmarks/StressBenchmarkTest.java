package org.strainmath.benchmarks;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.Test;

/** The stress benchmark's three paths compute the same stresses. */
class StressBenchmarkTest {

    @Test
    void blockFloorAndValueObjectsAgree() {
        StressBenchmark benchmark = new StressBenchmark();
        benchmark.size = 4096;
        benchmark.setUp();
        assertThat(benchmark.planeStressBlock()).isZero();
        double[] block = benchmark.sxx.clone();
        double[] floor = benchmark.floorNineMultiplyAdds().clone();
        double[] values = benchmark.planeStressValueObjects();
        assertThat(floor).isEqualTo(block);
        assertThat(values).isEqualTo(block);
        // Oracle: Hooke's law in plane stress, σx = E/(1 − ν²)·(εx + ν·εy) (any mechanics of
        // materials text), on the seeded signal.
        for (int i = 0; i < block.length; i++) {
            double expected = 200e9 / (1 - 0.09) * (benchmark.exx[i] + 0.3 * benchmark.eyy[i]);
            assertThat(block[i]).isCloseTo(expected, within(Math.abs(expected) * 1e-13 + 1e-6));
        }
    }
}
