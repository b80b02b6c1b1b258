package org.strainmath.material;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.math.BigDecimal;
import java.math.MathContext;
import java.util.SplittableRandom;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.strainmath.quantity.Angle;
import org.strainmath.quantity.Stress;

/**
 * The plane-stiffness kernel on huge and subnormal strains, against σ = Q·ε computed exactly in
 * BigDecimal (each product of two doubles and their sum are exact there; the one rounding is
 * the final conversion to double). Such strains are not physical; what is checked is that the
 * kernel never gives a wrong finite number: either the correctly rounded stress, to the
 * rounding of two additions, or an infinity or NaN where the exact stress, or a product or
 * partial sum on the way to it, is beyond the largest double.
 */
class StiffnessExtremeValuesTest {

    private static final PlaneStiffness PLY = OrthotropicLamina.of(Stress.ofGigapascals(140),
            Stress.ofGigapascals(10), 0.3, Stress.ofGigapascals(5))
            .transformedStiffness(Angle.ofDegrees(30));
    private static final BigDecimal MAX = new BigDecimal(Double.MAX_VALUE);

    @ParameterizedTest
    @ValueSource(doubles = {1e-320, 1e-300, 1e-100, 1e100, 1e280, 1e297, 1e300})
    void stressesAreExactOrNoFiniteAnswer(double scale) {
        SplittableRandom random = new SplittableRandom(Double.hashCode(scale));
        int n = 300;
        double[] exx = new double[n];
        double[] eyy = new double[n];
        double[] gxy = new double[n];
        for (int i = 0; i < n; i++) {
            exx[i] = random.nextDouble(-1, 1) * scale;
            eyy[i] = random.nextDouble(-1, 1) * scale;
            gxy[i] = random.nextDouble(-1, 1) * scale;
        }
        double[] sxx = new double[n];
        double[] syy = new double[n];
        double[] txy = new double[n];
        int nan = PLY.toStress(exx, eyy, gxy, 0, sxx, syy, txy, 0, n);
        double[][] q = PLY.toMatrix();
        int expectedNaN = 0;
        for (int i = 0; i < n; i++) {
            double[] e = {exx[i], eyy[i], gxy[i]};
            double[] got = {sxx[i], syy[i], txy[i]};
            boolean anyNaN = false;
            for (int r = 0; r < 3; r++) {
                BigDecimal exact = BigDecimal.ZERO;
                boolean productTooLarge = false;
                double bound = 0;   // Σ|q·e|, which scales the rounding of the two additions
                for (int c = 0; c < 3; c++) {
                    BigDecimal product = new BigDecimal(q[r][c]).multiply(new BigDecimal(e[c]));
                    exact = exact.add(product);
                    // the kernel adds left to right: a product or a partial sum beyond the
                    // largest double leaves no finite answer
                    productTooLarge |= product.abs().compareTo(MAX) > 0
                            || exact.abs().compareTo(MAX) > 0;
                    bound += Math.abs(q[r][c] * e[c]);
                }
                anyNaN |= Double.isNaN(got[r]);
                if (productTooLarge || exact.abs().compareTo(MAX) > 0) {
                    assertThat(Double.isFinite(got[r])).as("row %d, output %d of %s", i, r, scale)
                            .isFalse();
                } else {
                    // two roundings of additions (|error| ≤ 2·ulp of Σ|q·e|) plus the products'
                    // own, and an absolute floor of a few subnormals for the tiny scales
                    assertThat(got[r]).as("row %d, output %d of %s", i, r, scale)
                            .isCloseTo(exact.round(MathContext.DECIMAL64).doubleValue(),
                                    within(4 * Math.ulp(bound) + 4 * Double.MIN_VALUE));
                }
            }
            expectedNaN += anyNaN ? 1 : 0;
        }
        assertThat(nan).isEqualTo(expectedNaN);
    }
}
