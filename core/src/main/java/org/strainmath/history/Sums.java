package org.strainmath.history;

/** Compensated summation for the counts and damage terms of this package. Stateless. */
final class Sums {

    private Sums() {
    }

    /**
     * The sum of {@code a} by Neumaier's variant of Kahan summation (Neumaier, 1974): the
     * rounding error of each addition is kept and added back at the end, so that a sum of
     * millions of small terms keeps its last digits whatever their order of size.
     */
    static double compensated(double[] a) {
        double sum = 0;
        double compensation = 0;
        for (double x : a) {
            double t = sum + x;
            compensation += Math.abs(sum) >= Math.abs(x) ? (sum - t) + x : (x - t) + sum;
            sum = t;
        }
        return sum + compensation;
    }
}
