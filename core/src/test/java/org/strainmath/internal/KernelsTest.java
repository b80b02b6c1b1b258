package org.strainmath.internal;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.SplittableRandom;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

class KernelsTest {

    private static int slowCount(double[] a, int off, int len) {
        int n = 0;
        for (int i = off; i < off + len; i++) {
            n += Double.isNaN(a[i]) ? 1 : 0;
        }
        return n;
    }

    @ParameterizedTest
    @ValueSource(ints = {0, 1, 7, 8, 9, 63, 64, 65, 1000})
    void countsExactlyWhateverTheLengthAndWhereverTheNaNs(int len) {
        SplittableRandom random = new SplittableRandom(len);
        for (int trial = 0; trial < 50; trial++) {
            double[] a = new double[len + 5];
            for (int i = 0; i < a.length; i++) {
                int pick = random.nextInt(40);
                a[i] = pick == 0 ? Double.NaN
                        : pick == 1 ? Double.POSITIVE_INFINITY
                        : pick == 2 ? -Double.MAX_VALUE
                        : random.nextDouble(-1, 1);
            }
            int off = random.nextInt(6);
            int n = Math.min(len, a.length - off);
            assertThat(Kernels.countNaN(a, off, n)).isEqualTo(slowCount(a, off, n));
        }
    }

    @Test
    void infinitiesAndOverflowingSumsAreNotCountedAsNaN() {
        // Definition: only NaN is counted (IEEE 754: ±∞ and MAX_VALUE are numbers).
        assertThat(Kernels.countNaN(new double[] {Double.POSITIVE_INFINITY, Double.NEGATIVE_INFINITY},
                0, 2)).isZero();
        double[] big = new double[16];
        java.util.Arrays.fill(big, Double.MAX_VALUE);
        assertThat(Kernels.countNaN(big, 0, 16)).isZero();
        big[9] = Double.NaN;
        assertThat(Kernels.countNaN(big, 0, 16)).isEqualTo(1);
        assertThat(Kernels.countNaN(big, 10, 6)).isZero();
    }

    @Test
    void rowsAreCountedOnceWhateverColumnHoldsTheNaN() {
        // Oracle: a plain loop over the rows (common practice, no source).
        double[] a = new double[40];
        double[] b = new double[40];
        double[] c = new double[40];
        assertThat(Kernels.countNaNRows(a, b, c, 0, 40)).isZero();
        a[3] = Double.NaN;
        b[3] = Double.NaN;
        b[17] = Double.NaN;
        c[39] = Double.NaN;
        c[20] = Double.POSITIVE_INFINITY;
        assertThat(Kernels.countNaNRows(a, b, c, 0, 40)).isEqualTo(3);
        assertThat(Kernels.countNaNRows(a, b, c, 4, 36)).isEqualTo(2);
        assertThat(Kernels.countNaNRows(a, b, c, 18, 21)).isZero();
        // The two-array form: rows 3 and 17 (c is not read).
        assertThat(Kernels.countNaNRows(a, b, 0, 40)).isEqualTo(2);
        assertThat(Kernels.countNaNRows(a, b, 4, 36)).isEqualTo(1);
        assertThat(Kernels.countNaNRows(c, c, 0, 40)).isEqualTo(1);
        assertThat(Kernels.countNaNRows(new double[8], new double[8], 0, 8)).isZero();
    }

    @Test
    void sameIndexSourceCopiesOnlyWhenTheOffsetsDiffer() {
        double[] src = {1, 2, 3, 4};
        double[] dst = new double[6];
        assertThat(Kernels.sameIndexSource(src, 1, dst, 1, 2)).isSameAs(src);
        assertThat(dst).containsOnly(0.0);
        assertThat(Kernels.sameIndexSource(src, 1, dst, 3, 3)).isSameAs(dst);
        assertThat(dst).containsExactly(0, 0, 0, 2, 3, 4);
    }
}
