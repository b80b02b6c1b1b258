package org.strainmath.material;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.util.Arrays;
import java.util.SplittableRandom;

import org.apache.commons.math3.linear.MatrixUtils;
import org.apache.commons.math3.linear.RealMatrix;
import org.junit.jupiter.api.Test;
import org.strainmath.internal.Kernels;
import org.strainmath.quantity.Angle;
import org.strainmath.quantity.Stress;

/** The in-plane stiffness: general matrices and the block kernel. */
class PlaneStiffnessTest {

    private static final PlaneStiffness STEEL = IsotropicMaterial.of(Stress.ofGigapascals(200), 0.3)
            .planeStressStiffness();
    private static final PlaneStiffness PLY = OrthotropicLamina.of(Stress.ofGigapascals(140),
            Stress.ofGigapascals(10), 0.3, Stress.ofGigapascals(5)).transformedStiffness(Angle.ofDegrees(30));

    @Test
    void complianceIsTheInverseOfTheStiffness() {
        // Oracle: Commons Math's inverse (LU) of Q; and S·Q = I.
        for (PlaneStiffness stiffness : new PlaneStiffness[] {STEEL, PLY,
            PlaneStiffness.of(50e9, 10e9, 3e9, 40e9, -2e9, 12e9)}) {
            RealMatrix q = MatrixUtils.createRealMatrix(stiffness.toMatrix());
            RealMatrix s = MatrixUtils.createRealMatrix(stiffness.toComplianceMatrix());
            RealMatrix inverse = MatrixUtils.inverse(q);
            for (int i = 0; i < 3; i++) {
                for (int j = 0; j < 3; j++) {
                    assertThat(s.getEntry(i, j)).isCloseTo(inverse.getEntry(i, j),
                            within(inverse.getNorm() * 1e-13));
                    assertThat(s.multiply(q).getEntry(i, j)).isCloseTo(i == j ? 1 : 0, within(1e-13));
                }
            }
        }
    }

    @Test
    void aMatrixThatStoresNoEnergyIsRefused() {
        assertThatThrownBy(() -> PlaneStiffness.of(10e9, 20e9, 0, 10e9, 0, 5e9))
                .isInstanceOf(IllegalArgumentException.class)
                .hasMessage("stiffness must be positive definite (Q11 > 0, Q11·Q22 − Q12² > 0,"
                        + " det Q > 0): Q11=10.0 GPa, Q12=20.0 GPa, Q16=0.0 GPa, Q22=10.0 GPa,"
                        + " Q26=0.0 GPa, Q66=5.0 GPa");
        assertThatThrownBy(() -> PlaneStiffness.of(-1, 0, 0, 1, 0, 1))
                .hasMessageStartingWith("stiffness must be positive definite");
        assertThatThrownBy(() -> PlaneStiffness.of(1, 0, 2, 1, 0, 1))
                .hasMessageStartingWith("stiffness must be positive definite");
        assertThatThrownBy(() -> PlaneStiffness.of(Double.NaN, 0, 0, 1, 0, 1))
                .hasMessage("q11 must be finite: NaN");
        assertThatThrownBy(() -> PlaneStiffness.of(1, 0, 0, 1, 0, Double.POSITIVE_INFINITY))
                .hasMessage("q66 must be finite: Infinity");
    }

    @Test
    void theBlockIsTheScalarBitForBitAtAnyOffsetAndInPlace() {
        SplittableRandom random = new SplittableRandom(0xC0DE);
        int n = Kernels.CHUNK * 2 + 33;
        double[] ex = new double[n + 4];
        double[] ey = new double[n + 4];
        double[] g = new double[n + 4];
        for (int i = 0; i < n + 4; i++) {
            ex[i] = random.nextDouble(-3e-3, 3e-3);
            ey[i] = random.nextDouble(-3e-3, 3e-3);
            g[i] = random.nextDouble(-3e-3, 3e-3);
        }
        ex[7] = Double.NaN;
        g[100] = Double.POSITIVE_INFINITY;
        for (PlaneStiffness stiffness : new PlaneStiffness[] {STEEL, PLY}) {
            double[] sx = new double[n + 1];
            double[] sy = new double[n + 1];
            double[] t = new double[n + 1];
            int nan = stiffness.toStress(ex, ey, g, 3, sx, sy, t, 1, n);
            int expectedNaN = 0;
            double[][] q = stiffness.toMatrix();
            for (int i = 0; i < n; i++) {
                double x = ex[i + 3];
                double y = ey[i + 3];
                double z = g[i + 3];
                if (Double.isFinite(x) && Double.isFinite(y) && Double.isFinite(z)) {
                    // Finite samples: the value API, bit for bit.
                    PlaneStress expected = stiffness.stressOf(new PlaneStrain(x, y, z));
                    assertThat(sx[i + 1]).isEqualTo(expected.sxx());
                    assertThat(sy[i + 1]).isEqualTo(expected.syy());
                    assertThat(t[i + 1]).isEqualTo(expected.txy());
                    continue;
                }
                // NaN or infinite samples, which the value API refuses: the same products.
                double[] row = {q[0][0] * x + q[0][1] * y + q[0][2] * z,
                    q[1][0] * x + q[1][1] * y + q[1][2] * z, q[2][0] * x + q[2][1] * y + q[2][2] * z};
                assertThat(new double[] {sx[i + 1], sy[i + 1], t[i + 1]}).isEqualTo(row);
                expectedNaN += Double.isNaN(row[0]) || Double.isNaN(row[1]) || Double.isNaN(row[2]) ? 1 : 0;
            }
            // NaN strain: NaN stresses; infinite shear strain: NaN where a zero entry of Q
            // multiplies it (the isotropic Q16), infinite stresses otherwise (the ply).
            assertThat(nan).isEqualTo(expectedNaN).isEqualTo(stiffness == STEEL ? 2 : 1);
            // In place, at one offset: the same numbers.
            double[] a = ex.clone();
            double[] b = ey.clone();
            double[] c = g.clone();
            assertThat(stiffness.toStress(a, b, c, 3, a, b, c, 3, n)).isEqualTo(expectedNaN);
            assertThat(Arrays.copyOfRange(a, 3, n + 3)).isEqualTo(Arrays.copyOfRange(sx, 1, n + 1));
            assertThat(Arrays.copyOfRange(c, 3, n + 3)).isEqualTo(Arrays.copyOfRange(t, 1, n + 1));
        }
    }

    @Test
    void badBlocksAreRefused() {
        double[] a = new double[4];
        double[] b = new double[4];
        double[] c = new double[4];
        double[] d = new double[4];
        double[] e = new double[4];
        double[] f = new double[4];
        assertThatThrownBy(() -> STEEL.toStress(a, b, c, 0, d, d, f, 0, 4))
                .isInstanceOf(IllegalArgumentException.class)
                .hasMessage("sxx, syy and txy must be three different arrays");
        assertThatThrownBy(() -> STEEL.toStress(a, b, c, 0, d, e, a, 1, 3))
                .isInstanceOf(IllegalArgumentException.class)
                .hasMessage("an output that is also an input array needs dstOff == srcOff: 1 != 0");
        assertThatThrownBy(() -> STEEL.toStress(a, b, c, 1, d, e, f, 0, 4))
                .isInstanceOf(IndexOutOfBoundsException.class);
        assertThatThrownBy(() -> STEEL.toStress(a, b, c, 0, d, e, f, 0, -1))
                .isInstanceOf(IndexOutOfBoundsException.class);
        assertThatThrownBy(() -> STEEL.toStress(a, null, c, 0, d, e, f, 0, 4))
                .isInstanceOf(NullPointerException.class).hasMessage("eyy");
        assertThatThrownBy(() -> STEEL.toStress(a, b, c, 0, d, e, null, 0, 4))
                .isInstanceOf(NullPointerException.class).hasMessage("txy");
        assertThat(STEEL.toStress(a, b, c, 0, d, e, f, 0, 0)).isZero();
        // Different arrays at different offsets are fine.
        assertThat(STEEL.toStress(a, b, c, 1, d, e, f, 0, 3)).isZero();
        assertThat(d[0]).isCloseTo(0, within(0.0));
    }
}
