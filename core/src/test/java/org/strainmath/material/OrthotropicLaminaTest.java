package org.strainmath.material;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.util.SplittableRandom;
import java.util.stream.Stream;

import org.apache.commons.math3.linear.MatrixUtils;
import org.apache.commons.math3.linear.RealMatrix;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;
import org.strainmath.quantity.Angle;
import org.strainmath.quantity.Stress;

/** The orthotropic lamina in plane stress. */
class OrthotropicLaminaTest {

    private static final OrthotropicLamina CARBON = OrthotropicLamina.of(Stress.ofGigapascals(181),
            Stress.ofGigapascals(10.3), 0.28, Stress.ofGigapascals(7.17));

    /**
     * Oracle: Q̄ = T⁻¹·Q·R·T·R⁻¹ (Jones, Mechanics of Composite Materials, 2nd ed., § 2.6,
     * eq. 2.84), with T the stress transformation from x, y to 1, 2 and R = diag(1, 1, 2) the
     * Reuter matrix, computed with Commons Math matrices: an independent route to eq. 2.85
     * (equation numbers from memory).
     */
    private static RealMatrix transformedByMatrices(PlaneStiffness reduced, double theta) {
        double m = Math.cos(theta);
        double n = Math.sin(theta);
        RealMatrix t = MatrixUtils.createRealMatrix(new double[][] {
            {m * m, n * n, 2 * m * n}, {n * n, m * m, -2 * m * n}, {-m * n, m * n, m * m - n * n}});
        RealMatrix r = MatrixUtils.createRealDiagonalMatrix(new double[] {1, 1, 2});
        RealMatrix q = MatrixUtils.createRealMatrix(reduced.toMatrix());
        return MatrixUtils.inverse(t).multiply(q).multiply(r).multiply(t)
                .multiply(MatrixUtils.inverse(r));
    }

    @Test
    void reducedStiffnessOfACarbonEpoxyPly() {
        // A carbon/epoxy ply from a published ply-data table, E1 = 181, E2 = 10.3, ν12 = 0.28,
        // G12 = 7.17 GPa, gives
        // Q11 = 181.8, Q22 = 10.35, Q12 = 2.897, Q66 = 7.17 GPa (Tsai and Hahn, Introduction to
        // Composite Materials, ply data table; values from memory, to their four digits).
        double[][] q = CARBON.reducedStiffness().toMatrix();
        assertThat(q[0][0] / 1e9).isCloseTo(181.8, within(0.05));
        assertThat(q[1][1] / 1e9).isCloseTo(10.35, within(0.005));
        assertThat(q[0][1] / 1e9).isCloseTo(2.897, within(0.0005));
        assertThat(q[2][2] / 1e9).isEqualTo(7.17);
        assertThat(q[0][2]).isZero();
        // The formulas of the class comment, exactly: Q11 = E1/(1 − ν12ν21).
        double nu21 = 0.28 * 10.3 / 181;
        assertThat(q[0][0]).isCloseTo(181e9 / (1 - 0.28 * nu21), within(181e9 * 1e-15));
        // Reciprocity ν12/E1 = ν21/E2.
        assertThat(CARBON.nu12() / CARBON.e1().toPascals())
                .isCloseTo(CARBON.nu21() / CARBON.e2().toPascals(), within(1e-27));
        assertThat(CARBON).hasToString("OrthotropicLamina[E1=181.0 GPa, E2=10.3 GPa, ν12=0.28,"
                + " ν21=0.0159337, G12=7.17 GPa]");
    }

    static Stream<Arguments> angles() {
        SplittableRandom random = new SplittableRandom(0xB1A5);
        return Stream.generate(() -> Arguments.of(random.nextDouble(-180, 180))).limit(100);
    }

    @ParameterizedTest(name = "θ={0}°")
    @MethodSource("angles")
    void transformedStiffnessMatchesTheMatrixProductAndItsInvariants(double degrees) {
        Angle theta = Angle.ofDegrees(degrees);
        double[][] bar = CARBON.transformedStiffness(theta).toMatrix();
        RealMatrix oracle = transformedByMatrices(CARBON.reducedStiffness(), theta.toRadians());
        double scale = 181e9 * 1e-14;   // a few ulp of Q11, the largest entry
        for (int i = 0; i < 3; i++) {
            for (int j = 0; j < 3; j++) {
                assertThat(bar[i][j]).as("Q̄%d%d", i + 1, j + 1)
                        .isCloseTo(oracle.getEntry(i, j), within(scale));
            }
        }
        // Invariants of the transformation (Tsai and Pagano; Jones, § 2.9): Q̄11 + Q̄22 + 2Q̄12
        // and Q̄66 − Q̄12 are the same at every angle.
        double[][] q = CARBON.reducedStiffness().toMatrix();
        assertThat(bar[0][0] + bar[1][1] + 2 * bar[0][1])
                .isCloseTo(q[0][0] + q[1][1] + 2 * q[0][1], within(scale));
        assertThat(bar[2][2] - bar[0][1]).isCloseTo(q[2][2] - q[0][1], within(scale));
        // Stresses in material axes two ways: Q·(ε turned into 1, 2), and (Q̄·ε) turned.
        PlaneStrain strain = PlaneStrain.ofMicrostrain(900, -300, 450);
        PlaneStress direct = CARBON.stressInMaterialAxes(strain, theta);
        PlaneStress viaBar = CARBON.transformedStiffness(theta).stressOf(strain).rotatedBy(theta);
        assertThat(direct.sxx()).isCloseTo(viaBar.sxx(), within(1e-3));
        assertThat(direct.syy()).isCloseTo(viaBar.syy(), within(1e-3));
        assertThat(direct.txy()).isCloseTo(viaBar.txy(), within(1e-3));
        assertThat(CARBON.strainInMaterialAxes(strain, theta)).isEqualTo(strain.rotatedBy(theta));
    }

    @Test
    void zeroAndHalfTurnsGiveTheReducedStiffness() {
        // Definition: the transformation is the identity at 0° and 180°, and swaps Q11 and Q22 at
        // 90° (by hand from the rotation).
        double[][] q = CARBON.reducedStiffness().toMatrix();
        assertThat(CARBON.transformedStiffness(Angle.ZERO).toMatrix()).isDeepEqualTo(q);
        double[][] half = CARBON.transformedStiffness(Angle.ofDegrees(180)).toMatrix();
        for (int i = 0; i < 3; i++) {
            for (int j = 0; j < 3; j++) {
                assertThat(half[i][j]).isCloseTo(q[i][j], within(181e9 * 1e-15));
            }
        }
        double[][] quarter = CARBON.transformedStiffness(Angle.ofDegrees(90)).toMatrix();
        assertThat(quarter[0][0]).isCloseTo(q[1][1], within(181e9 * 1e-15));
        assertThat(quarter[1][1]).isCloseTo(q[0][0], within(181e9 * 1e-15));
    }

    @ParameterizedTest(name = "θ={0}°")
    @MethodSource("angles")
    void anIsotropicLaminaIsTheIsotropicMaterialAtEveryAngle(double degrees) {
        // E1 = E2 = E, G12 = E/(2(1 + ν)): Q and Q̄ reduce to the isotropic plane-stress
        // stiffness (the isotropic case of the lamina relations, Jones § 2.6).
        IsotropicMaterial aluminium = IsotropicMaterial.of(Stress.ofGigapascals(70), 0.33);
        OrthotropicLamina lamina = OrthotropicLamina.of(aluminium.youngsModulus(),
                aluminium.youngsModulus(), 0.33, aluminium.shearModulus());
        double[][] iso = aluminium.planeStressStiffness().toMatrix();
        double[][] bar = lamina.transformedStiffness(Angle.ofDegrees(degrees)).toMatrix();
        for (int i = 0; i < 3; i++) {
            for (int j = 0; j < 3; j++) {
                assertThat(bar[i][j]).isCloseTo(iso[i][j], within(80e9 * 1e-14));
            }
        }
        double[][] q = lamina.reducedStiffness().toMatrix();
        for (int i = 0; i < 3; i++) {
            for (int j = 0; j < 3; j++) {
                // 1 − ν12·ν21 against (1 − ν)(1 + ν): equal to an ulp.
                assertThat(q[i][j]).isCloseTo(iso[i][j], within(80e9 * 1e-15));
            }
        }
    }

    @Test
    void unstableOrMalformedLaminaeAreRefused() {
        // By hand: e1/e2 = 10/40 = 0.25 < 0.6² = 0.36; with e1 = e2, ν21 = ν12·e2/e1 = ν12.
        Stress e = Stress.ofGigapascals(10);
        assertThatThrownBy(() -> OrthotropicLamina.of(Stress.ofGigapascals(10), Stress.ofGigapascals(40), 0.6, e))
                .isInstanceOf(IllegalArgumentException.class)
                .hasMessage("nu12 0.6 with e1 10000.0 MPa and e2 40000.0 MPa gives no stable lamina:"
                        + " it needs nu12² < e1/e2 = 0.25");
        assertThatThrownBy(() -> OrthotropicLamina.of(Stress.ZERO, e, 0.3, e))
                .hasMessage("e1 must be > 0 and finite: 0.0");
        assertThatThrownBy(() -> OrthotropicLamina.of(e, Stress.ofPascals(-1), 0.3, e))
                .hasMessage("e2 must be > 0 and finite: -1.0");
        assertThatThrownBy(() -> OrthotropicLamina.of(e, e, 0.3, Stress.ZERO))
                .hasMessage("g12 must be > 0 and finite: 0.0");
        assertThatThrownBy(() -> OrthotropicLamina.of(e, e, Double.NaN, e))
                .hasMessage("nu12 must be finite: NaN");
        assertThatThrownBy(() -> OrthotropicLamina.of(null, e, 0.3, e))
                .isInstanceOf(NullPointerException.class).hasMessage("e1");
        assertThat(OrthotropicLamina.of(e, e, -0.9, e).nu21()).isEqualTo(-0.9);
    }

    @Test
    void equality() {
        OrthotropicLamina same = OrthotropicLamina.of(Stress.ofGigapascals(181),
                Stress.ofGigapascals(10.3), 0.28, Stress.ofGigapascals(7.17));
        assertThat(CARBON).isEqualTo(same).hasSameHashCodeAs(same)
                .isNotEqualTo(OrthotropicLamina.of(Stress.ofGigapascals(181),
                        Stress.ofGigapascals(10.3), 0.29, Stress.ofGigapascals(7.17)))
                .isNotEqualTo("a ply");
        assertThat(CARBON.g12()).isEqualTo(Stress.ofGigapascals(7.17));
    }
}
