package org.strainmath.material;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.util.SplittableRandom;
import java.util.stream.Stream;

import org.apache.commons.math3.linear.LUDecomposition;
import org.apache.commons.math3.linear.MatrixUtils;
import org.apache.commons.math3.linear.RealMatrix;
import org.apache.commons.math3.linear.RealVector;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;
import org.strainmath.quantity.Strain;
import org.strainmath.quantity.Stress;
import org.strainmath.quantity.Temperature;

/** Hooke's law in plane stress and plane strain, and free thermal strain. */
class HookesLawTest {

    /**
     * Oracle: the generalised Hooke's law of an isotropic solid (any elasticity text, e.g.
     * Timoshenko and Goodier, Theory of Elasticity, § 3),
     * εx = (σx − ν(σy + σz))/E, εy = (σy − ν(σx + σz))/E, εz = (σz − ν(σx + σy))/E, γxy = τxy/G,
     * as a compliance matrix in the unknowns (σx, σy, σz, τxy), with the condition σz = 0
     * (plane stress) or εz = 0 (plane strain) as the third equation, solved by LU (Commons Math).
     */
    private static double[] solveThreeDimensional(double e, double nu, double g, double ex,
            double ey, double gxy, boolean planeStrain) {
        // Every equation times E, so that the pivots are of order 1 (LU's singularity threshold
        // is absolute).
        double[][] a = {
            {1, -nu, -nu, 0},
            {-nu, 1, -nu, 0},
            planeStrain ? new double[] {-nu, -nu, 1, 0} : new double[] {0, 0, 1, 0},
            {0, 0, 0, e / g}};
        RealMatrix matrix = MatrixUtils.createRealMatrix(a);
        RealVector rhs = MatrixUtils.createRealVector(new double[] {e * ex, e * ey, 0, e * gxy});
        return new LUDecomposition(matrix).getSolver().solve(rhs).toArray();
    }

    static Stream<Arguments> cases() {
        SplittableRandom random = new SplittableRandom(0x400C);
        return Stream.generate(() -> Arguments.of(random.nextDouble(1e9, 400e9),
                random.nextDouble(-0.8, 0.49), random.nextDouble(-2e-3, 2e-3),
                random.nextDouble(-2e-3, 2e-3), random.nextDouble(-2e-3, 2e-3))).limit(200);
    }

    @ParameterizedTest(name = "E={0} ν={1} e=({2}, {3}, {4})")
    @MethodSource("cases")
    void planeStressMatchesTheThreeDimensionalLawAndRoundTrips(double e, double nu, double ex,
            double ey, double gxy) {
        IsotropicMaterial material = IsotropicMaterial.fromPair(ElasticConstant.YOUNGS_MODULUS, e,
                ElasticConstant.POISSONS_RATIO, nu);
        PlaneStrain strain = new PlaneStrain(ex, ey, gxy);
        PlaneStress stress = material.stressInPlaneStress(strain);
        double g = material.shearModulus().toPascals();
        double[] oracle = solveThreeDimensional(e, nu, g, ex, ey, gxy, false);
        // Tolerance: the LU solution is good to ~1e-15 of the largest stress times the
        // condition of the system, at most ~1/(1 − 2ν) ≈ 50 here; 1e-12 covers it.
        double scale = Math.max(Math.abs(oracle[0]), Math.max(Math.abs(oracle[1]), Math.abs(oracle[3])));
        assertThat(stress.sxx()).isCloseTo(oracle[0], within(scale * 1e-12));
        assertThat(stress.syy()).isCloseTo(oracle[1], within(scale * 1e-12));
        assertThat(stress.txy()).isCloseTo(oracle[3], within(scale * 1e-12));
        // Round trip strain → stress → strain to 1e-12 relative (of the largest component).
        PlaneStrain back = material.strainInPlaneStress(stress);
        double size = Math.max(Math.abs(ex), Math.max(Math.abs(ey), Math.abs(gxy)));
        assertThat(back.exx()).isCloseTo(ex, within(size * 1e-12));
        assertThat(back.eyy()).isCloseTo(ey, within(size * 1e-12));
        assertThat(back.gxy()).isCloseTo(gxy, within(size * 1e-12));
        // εz = −ν/(1 − ν)(εx + εy), and the same from the stresses, −ν/E (σx + σy).
        double ez = -nu / (1 - nu) * (ex + ey);
        assertThat(material.outOfPlaneStrainInPlaneStress(strain).value())
                .isCloseTo(ez, within(size * 1e-14));
        assertThat(material.outOfPlaneStrainInPlaneStress(stress).value())
                .isCloseTo(ez, within(size * 1e-12));
    }

    @ParameterizedTest(name = "E={0} ν={1} e=({2}, {3}, {4})")
    @MethodSource("cases")
    void planeStrainMatchesTheThreeDimensionalLawAndRoundTrips(double e, double nu, double ex,
            double ey, double gxy) {
        IsotropicMaterial material = IsotropicMaterial.fromPair(ElasticConstant.YOUNGS_MODULUS, e,
                ElasticConstant.POISSONS_RATIO, nu);
        PlaneStrain strain = new PlaneStrain(ex, ey, gxy);
        PlaneStress stress = material.stressInPlaneStrain(strain);
        double[] oracle = solveThreeDimensional(e, nu, material.shearModulus().toPascals(), ex, ey,
                gxy, true);
        // Plane strain is worse conditioned near ν = 0.5 (K → ∞): 1e-12 × 1/(1 − 2ν).
        double scale = Math.max(Math.abs(oracle[0]), Math.max(Math.abs(oracle[1]), Math.abs(oracle[3])))
                * 1e-12 / (1 - 2 * nu);
        assertThat(stress.sxx()).isCloseTo(oracle[0], within(scale));
        assertThat(stress.syy()).isCloseTo(oracle[1], within(scale));
        assertThat(stress.txy()).isCloseTo(oracle[3], within(scale));
        assertThat(material.outOfPlaneStressInPlaneStrain(strain).toPascals())
                .isCloseTo(oracle[2], within(scale + Math.abs(oracle[2]) * 1e-12));
        assertThat(material.outOfPlaneStressInPlaneStrain(stress).toPascals())
                .isCloseTo(oracle[2], within(scale + Math.abs(oracle[2]) * 1e-12));
        PlaneStrain back = material.strainInPlaneStrain(stress);
        double size = Math.max(Math.abs(ex), Math.max(Math.abs(ey), Math.abs(gxy)));
        assertThat(back.exx()).isCloseTo(ex, within(size * 1e-12 / (1 - 2 * nu)));
        assertThat(back.eyy()).isCloseTo(ey, within(size * 1e-12 / (1 - 2 * nu)));
        assertThat(back.gxy()).isCloseTo(gxy, within(size * 1e-12));
    }

    @Test
    void uniaxialStressInSteel() {
        // A bar in uniaxial stress: εy = −ν·εx gives σx = E·εx, σy = 0 (Hooke's law, any
        // mechanics-of-materials text). 500 µε in 200 GPa steel is 100 MPa.
        IsotropicMaterial steel = IsotropicMaterial.of(Stress.ofGigapascals(200), 0.30);
        PlaneStress s = steel.stressInPlaneStress(PlaneStrain.ofMicrostrain(500, -150, 0));
        assertThat(s.sxx()).isCloseTo(100e6, within(1e-6));
        assertThat(s.syy()).isCloseTo(0, within(1e-6));
        assertThat(s.txy()).isZero();
        // Pure shear: τ = G·γ; 200 µε at G = 76.923 GPa is 15.3846 MPa.
        assertThat(steel.stressInPlaneStress(PlaneStrain.ofMicrostrain(0, 0, 200)).txy())
                .isCloseTo(200e-6 * 200e9 / 2.6, within(1e-6));
        assertThat(steel.planeStressStiffness()).hasToString("PlaneStiffness[Q11=219.78 GPa,"
                + " Q12=65.9341 GPa, Q16=0.0 GPa, Q22=219.78 GPa, Q26=0.0 GPa, Q66=76.9231 GPa]");
        assertThat(steel.planeStrainStiffness().toMatrix()[0][0])
                .isEqualTo(steel.pWaveModulus().toPascals());
    }

    @Test
    void freeThermalStrainIsRemovedFromBothNormalStrains() {
        // α·ΔT (definition of the coefficient of linear expansion). 12e-6/K over 50 K is 600 µε.
        IsotropicMaterial steel = IsotropicMaterial.of(Stress.ofGigapascals(200), 0.30)
                .withThermalExpansion(12e-6);
        Temperature cold = Temperature.ofCelsius(20);
        Temperature hot = Temperature.ofCelsius(70);
        assertThat(steel.freeThermalStrain(cold, hot).toMicrostrain()).isCloseTo(600, within(1e-9));
        PlaneStrain total = PlaneStrain.ofMicrostrain(700, 550, 80);
        PlaneStrain mechanical = steel.mechanicalStrain(total, cold, hot);
        assertThat(mechanical.exx() * 1e6).isCloseTo(100, within(1e-9));
        assertThat(mechanical.eyy() * 1e6).isCloseTo(-50, within(1e-9));
        assertThat(mechanical.gxy()).isEqualTo(total.gxy());
        assertThat(steel.mechanicalStrain(Strain.ofMicrostrain(600), cold, hot).toMicrostrain())
                .isCloseTo(0, within(1e-9));
        // A plate restrained in its plane and heated: εmech = −αΔT both ways, so
        // σ = −E·α·ΔT/(1 − ν) (Timoshenko and Goodier, Theory of Elasticity, thermal stress
        // in a restrained plate): −200e9·12e-6·50/0.7 = −171.428571 MPa.
        PlaneStress restrained = steel.stressInPlaneStress(steel.mechanicalStrain(PlaneStrain.ZERO, cold, hot));
        assertThat(restrained.sxx()).isCloseTo(-200e9 * 12e-6 * 50 / 0.7, within(1e-3));
        assertThat(restrained.syy()).isCloseTo(restrained.sxx(), within(1e-6));
        IsotropicMaterial plain = IsotropicMaterial.of(Stress.ofGigapascals(200), 0.30);
        assertThatThrownBy(() -> plain.freeThermalStrain(cold, hot))
                .isInstanceOf(IllegalStateException.class)
                .hasMessage("no coefficient of thermal expansion: use withThermalExpansion first");
    }
}
