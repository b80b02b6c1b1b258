package org.strainmath.benchmarks;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.Test;

/** The rosette benchmark's kernel and eigen paths compute the same results. */
class RosetteBenchmarkTest {

    @Test
    void kernelAndEigenPathsAgree() {
        RosetteBenchmark benchmark = new RosetteBenchmark();
        benchmark.size = 4096;
        benchmark.setUp();
        assertThat(benchmark.principalVonMisesAndAngle()).isZero();
        double[] e1 = benchmark.e1.clone();
        double[] vm = benchmark.vonMises.clone();
        benchmark.eigenDecompositionPerSample();
        // Oracle: Commons Math's eigen decomposition, to 1e-12 of the sizes involved.
        for (int i = 0; i < e1.length; i++) {
            assertThat(benchmark.e1[i]).isCloseTo(e1[i], within(1e-15));
            assertThat(benchmark.vonMises[i]).isCloseTo(vm[i], within(Math.abs(vm[i]) * 1e-11 + 1e-3));
        }
    }
}
