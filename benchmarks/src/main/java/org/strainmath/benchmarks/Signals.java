package org.strainmath.benchmarks;

import java.util.SplittableRandom;

/**
 * Seeded, realistic test signals for the benchmarks: what a strain channel on a loaded member
 * records, a slow load cycle with vibration and white noise on top.
 */
final class Signals {

    private Signals() {
    }

    /**
     * {@code n} strains (m/m): a load cycle of {@code amplitude} over the block, a vibration of a
     * tenth of it at a higher frequency, and Gaussian noise of 5 µε RMS. Same seed, same signal.
     */
    static double[] strain(int n, double amplitude, long seed) {
        SplittableRandom random = new SplittableRandom(seed);
        double[] strain = new double[n];
        double cycle = 2 * Math.PI / Math.max(n, 1);
        double vibration = 2 * Math.PI * 37.0 / 4096;
        for (int i = 0; i < n; i++) {
            strain[i] = amplitude * Math.sin(cycle * i)
                    + 0.1 * amplitude * Math.sin(vibration * i)
                    + 5e-6 * gaussian(random);
        }
        return strain;
    }

    /** A standard normal deviate by the Box–Muller transform. */
    private static double gaussian(SplittableRandom random) {
        double u = 1.0 - random.nextDouble();
        double v = random.nextDouble();
        return Math.sqrt(-2 * Math.log(u)) * Math.cos(2 * Math.PI * v);
    }
}
