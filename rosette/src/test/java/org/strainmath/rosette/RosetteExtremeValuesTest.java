package org.strainmath.rosette;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.math.BigDecimal;
import java.math.MathContext;
import java.util.SplittableRandom;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * Principal strains of a rectangular rosette from huge and subnormal readings, against the
 * reduction computed in BigDecimal with 40 digits: εx = ε0, εy = ε90, γ = 2ε45 − ε0 − ε90,
 * ε1,2 = (εx + εy)/2 ± √(((εx − εy)/2)² + (γ/2)²) (the transformation equations; any
 * mechanics-of-materials text). Readings beyond about 1e154 square to more than the largest
 * double inside the radius; the kernel must then give an infinity (no finite answer), never a
 * wrong finite number. Below that, the result is exact to a few ulps of the readings' size;
 * below about 1e-154 the squares underflow and only the sum ε1 + ε2 stays exact.
 */
class RosetteExtremeValuesTest {

    private static final MathContext DIGITS = new MathContext(40);

    @ParameterizedTest
    @ValueSource(doubles = {1e-315, 1e-300, 1e-160, 1e100, 1e150, 1e160, 1e300})
    void principalStrainsAreExactOrInfinite(double scale) {
        Rosette rosette = Rosette.rectangular();
        SplittableRandom random = new SplittableRandom(Double.hashCode(scale));
        int n = 200;
        double[][] readings = new double[3][n];
        for (int j = 0; j < 3; j++) {
            for (int i = 0; i < n; i++) {
                readings[j][i] = random.nextDouble(-1, 1) * scale;
            }
        }
        double[] e1 = new double[n];
        double[] e2 = new double[n];
        int nan = rosette.toPrincipalStrains(readings, 0, e1, e2, 0, n);
        int expectedNaN = 0;
        for (int i = 0; i < n; i++) {
            BigDecimal a = new BigDecimal(readings[0][i]);
            BigDecimal b = new BigDecimal(readings[1][i]);
            BigDecimal c = new BigDecimal(readings[2][i]);
            BigDecimal half = new BigDecimal("0.5");
            BigDecimal centre = a.add(c).multiply(half);
            BigDecimal d = a.subtract(c).multiply(half);
            BigDecimal h = b.multiply(BigDecimal.valueOf(2)).subtract(a).subtract(c).multiply(half);
            BigDecimal squared = d.multiply(d).add(h.multiply(h));
            BigDecimal radius = squared.signum() == 0 ? BigDecimal.ZERO : squared.sqrt(DIGITS);
            double exact1 = centre.add(radius).doubleValue();
            double exact2 = centre.subtract(radius).doubleValue();
            double size = Math.abs(readings[0][i]) + Math.abs(readings[1][i])
                    + Math.abs(readings[2][i]);
            boolean squaresOverflow = squared.compareTo(new BigDecimal(Double.MAX_VALUE)) > 0;
            expectedNaN += Double.isNaN(e1[i]) || Double.isNaN(e2[i]) ? 1 : 0;
            if (squaresOverflow) {
                assertThat(e1[i]).as("row %d at %s", i, scale).isEqualTo(Double.POSITIVE_INFINITY);
                assertThat(e2[i]).as("row %d at %s", i, scale).isEqualTo(Double.NEGATIVE_INFINITY);
            } else if (scale < 1e-150) {
                // The squares underflow (below about 1e-154 they are subnormal or zero), so the
                // radius can be lost entirely: each strain is then within the readings' size of
                // the exact one, and their sum, which needs no square, stays exact.
                assertThat(e1[i]).isGreaterThanOrEqualTo(e2[i]);
                assertThat(e1[i]).isCloseTo(exact1, within(size));
                assertThat(e2[i]).isCloseTo(exact2, within(size));
                assertThat(e1[i] + e2[i]).isCloseTo(centre.multiply(BigDecimal.valueOf(2))
                        .doubleValue(), within(4 * Math.ulp(size) + 4 * Double.MIN_VALUE));
            } else {
                double tolerance = 8 * Math.ulp(size);
                assertThat(e1[i]).as("row %d at %s", i, scale).isCloseTo(exact1, within(tolerance));
                assertThat(e2[i]).as("row %d at %s", i, scale).isCloseTo(exact2, within(tolerance));
            }
        }
        assertThat(nan).isEqualTo(expectedNaN).isZero();
    }
}
