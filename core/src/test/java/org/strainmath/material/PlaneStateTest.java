package org.strainmath.material;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.util.SplittableRandom;
import java.util.stream.Stream;

import org.apache.commons.math3.linear.EigenDecomposition;
import org.apache.commons.math3.linear.MatrixUtils;
import org.apache.commons.math3.linear.RealMatrix;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;
import org.strainmath.quantity.Angle;
import org.strainmath.quantity.Strain;
import org.strainmath.quantity.Stress;

/** Plane strain and stress states: transformation, invariants, Mohr's circle. */
class PlaneStateTest {

    /**
     * Oracle: the tensor transformation T' = R·T·Rᵀ with R the rotation of the axes by θ
     * (rows are the new base vectors), computed with Commons Math matrices; for strain the
     * tensor holds εxy = γxy/2.
     */
    private static RealMatrix rotatedTensor(double xx, double yy, double xy, double theta) {
        RealMatrix t = MatrixUtils.createRealMatrix(new double[][] {{xx, xy}, {xy, yy}});
        double c = Math.cos(theta);
        double s = Math.sin(theta);
        RealMatrix r = MatrixUtils.createRealMatrix(new double[][] {{c, s}, {-s, c}});
        return r.multiply(t).multiply(r.transpose());
    }

    static Stream<Arguments> states() {
        SplittableRandom random = new SplittableRandom(0x5EED);
        return Stream.generate(() -> Arguments.of(random.nextDouble(-3e-3, 3e-3),
                random.nextDouble(-3e-3, 3e-3), random.nextDouble(-3e-3, 3e-3),
                random.nextDouble(-360, 360))).limit(200);
    }

    @ParameterizedTest(name = "ex={0} ey={1} gxy={2} θ={3}°")
    @MethodSource("states")
    void strainTransformsAsATensorAndKeepsItsInvariants(double ex, double ey, double g,
            double degrees) {
        PlaneStrain e = new PlaneStrain(ex, ey, g);
        Angle theta = Angle.ofDegrees(degrees);
        PlaneStrain turned = e.rotatedBy(theta);
        RealMatrix oracle = rotatedTensor(ex, ey, g / 2, theta.toRadians());
        double scale = 1e-15 * 4 * 3e-3;   // a few ulp of the largest component
        assertThat(turned.exx()).isCloseTo(oracle.getEntry(0, 0), within(scale));
        assertThat(turned.eyy()).isCloseTo(oracle.getEntry(1, 1), within(scale));
        assertThat(turned.gxy()).isCloseTo(2 * oracle.getEntry(0, 1), within(2 * scale));
        assertThat(e.normalStrainAt(theta).value()).isCloseTo(turned.exx(), within(scale));
        // Invariants (any mechanics-of-materials text): the sum and Mohr's radius.
        assertThat(turned.exx() + turned.eyy()).isCloseTo(ex + ey, within(scale));
        assertThat(turned.mohrCircle().radius().value())
                .isCloseTo(e.mohrCircle().radius().value(), within(scale));
        // Principal strains: the eigenvalues of the tensor (Commons Math).
        double[] eigen = new EigenDecomposition(rotatedTensor(ex, ey, g / 2, 0)).getRealEigenvalues();
        double high = Math.max(eigen[0], eigen[1]);
        double low = Math.min(eigen[0], eigen[1]);
        assertThat(e.mohrCircle().maximum().value()).isCloseTo(high, within(scale));
        assertThat(e.mohrCircle().minimum().value()).isCloseTo(low, within(scale));
        assertThat(e.mohrCircle().maximumShear().value()).isCloseTo(high - low, within(2 * scale));
    }

    @ParameterizedTest(name = "sx={0} sy={1} txy={2} θ={3}°")
    @MethodSource("states")
    void stressTransformsAsATensorAndKeepsItsInvariants(double sx, double sy, double t,
            double degrees) {
        // Oracle: the tensor rotation R·σ·Rᵀ and its eigenvalues in Commons Math (RealMatrix,
        // EigenDecomposition).
        PlaneStress s = new PlaneStress(sx * 1e11, sy * 1e11, t * 1e11);
        Angle theta = Angle.ofDegrees(degrees);
        PlaneStress turned = s.rotatedBy(theta);
        RealMatrix oracle = rotatedTensor(s.sxx(), s.syy(), s.txy(), theta.toRadians());
        double scale = 1e-15 * 4 * 3e8;
        assertThat(turned.sxx()).isCloseTo(oracle.getEntry(0, 0), within(scale));
        assertThat(turned.syy()).isCloseTo(oracle.getEntry(1, 1), within(scale));
        assertThat(turned.txy()).isCloseTo(oracle.getEntry(0, 1), within(scale));
        assertThat(s.normalStressAt(theta).toPascals()).isCloseTo(turned.sxx(), within(scale));
        assertThat(turned.sxx() + turned.syy()).isCloseTo(s.sxx() + s.syy(), within(scale));
        assertThat(turned.mohrCircle().radius().toPascals())
                .isCloseTo(s.mohrCircle().radius().toPascals(), within(scale));
        double[] eigen = new EigenDecomposition(rotatedTensor(s.sxx(), s.syy(), s.txy(), 0))
                .getRealEigenvalues();
        assertThat(s.mohrCircle().maximum().toPascals())
                .isCloseTo(Math.max(eigen[0], eigen[1]), within(scale));
        assertThat(s.mohrCircle().maximumShear().toPascals())
                .isCloseTo(Math.abs(eigen[0] - eigen[1]) / 2, within(scale));
    }

    @Test
    void zeroAndHalfTurnsAreTheIdentity() {
        PlaneStrain e = PlaneStrain.ofMicrostrain(800, -200, 600);
        PlaneStress s = PlaneStress.ofMegapascals(120, -40, 30);
        for (double degrees : new double[] {0, 180, -180, 360, 540}) {
            assertThat(e.rotatedBy(Angle.ofDegrees(degrees))).as("%s°", degrees).isEqualTo(e);
            assertThat(s.rotatedBy(Angle.ofDegrees(degrees))).as("%s°", degrees).isEqualTo(s);
        }
        // A quarter turn swaps the normal components and reverses the shear (to an ulp).
        PlaneStrain quarter = e.rotatedBy(Angle.ofDegrees(90));
        assertThat(quarter.exx()).isCloseTo(e.eyy(), within(1e-19));
        assertThat(quarter.eyy()).isCloseTo(e.exx(), within(1e-19));
        assertThat(quarter.gxy()).isCloseTo(-e.gxy(), within(1e-19));
    }

    @Test
    void textbookSpecialCases() {
        // Pure shear turned by 45° is biaxial tension and compression of the same size, and
        // uniaxial stress turned by 45° is σ/2, σ/2 with shear −σ/2 (any mechanics-of-materials
        // text, the stress transformation equations). Tolerance 1e-7 Pa: a few ulp of 50 MPa.
        PlaneStress shear = PlaneStress.ofMegapascals(0, 0, 50).rotatedBy(Angle.ofDegrees(45));
        assertThat(shear.sxx()).isCloseTo(50e6, within(1e-7));
        assertThat(shear.syy()).isCloseTo(-50e6, within(1e-7));
        assertThat(shear.txy()).isCloseTo(0, within(1e-7));
        PlaneStress uniaxial = PlaneStress.ofMegapascals(100, 0, 0).rotatedBy(Angle.ofDegrees(45));
        assertThat(uniaxial.sxx()).isCloseTo(50e6, within(1e-7));
        assertThat(uniaxial.txy()).isCloseTo(-50e6, within(1e-7));
        // Strain: εx' at 45° of (εx, εy, γ) is (εx + εy + γ)/2, the 45° gauge of a rectangular
        // rosette (common practice, no source).
        PlaneStrain e = PlaneStrain.ofMicrostrain(800, -200, 600);
        assertThat(e.normalStrainAt(Angle.ofDegrees(45)).toMicrostrain()).isCloseTo(600, within(1e-10));
        assertThat(e.mohrCircle()).hasToString("MohrStrainCircle[centre=300.0 µε, radius=583.095 µε]");
        assertThat(e.mohrCircle().maximum().toMicrostrain()).isCloseTo(300 + Math.sqrt(340000), within(1e-10));
        assertThat(PlaneStress.ofMegapascals(120, -40, 30).mohrCircle())
                .hasToString("MohrStressCircle[centre=40.0 MPa, radius=85.44 MPa]");
    }

    @Test
    void valuesAndTextForAPerson() {
        // By hand: Mohr's circle of (120, −40, 30) MPa has centre 40 and radius √(80² + 30²) =
        // √7300 MPa.
        PlaneStrain e = PlaneStrain.of(Strain.ofMicrostrain(800), Strain.ofMicrostrain(-200),
                Strain.ofMicrostrain(600));
        assertThat(e).hasToString("PlaneStrain[exx=800.0 µε, eyy=-200.0 µε, gxy=600.0 µε]");
        assertThat(e.normalX()).isEqualTo(Strain.ofMicrostrain(800));
        assertThat(e.normalY()).isEqualTo(Strain.ofMicrostrain(-200));
        assertThat(e.shearXY()).isEqualTo(Strain.ofMicrostrain(600));
        assertThat(e.plus(e).minus(e)).isEqualTo(e);
        assertThat(PlaneStrain.ZERO.mohrCircle().radius()).isEqualTo(Strain.ZERO);
        PlaneStress s = PlaneStress.of(Stress.ofMegapascals(120), Stress.ofMegapascals(-40),
                Stress.ofMegapascals(30));
        assertThat(s).hasToString("PlaneStress[sxx=120.0 MPa, syy=-40.0 MPa, txy=30.0 MPa]");
        assertThat(s.normalX()).isEqualTo(Stress.ofMegapascals(120));
        assertThat(s.normalY()).isEqualTo(Stress.ofMegapascals(-40));
        assertThat(s.shearXY()).isEqualTo(Stress.ofMegapascals(30));
        assertThat(s.plus(s).minus(s)).isEqualTo(s);
        assertThat(s.mohrCircle().minimum().toMegapascals()).isCloseTo(40 - Math.sqrt(7300), within(1e-9));
    }

    @Test
    void badComponentsAreRefused() {
        assertThatThrownBy(() -> new PlaneStrain(Double.NaN, 0, 0)).hasMessage("exx must be finite: NaN");
        assertThatThrownBy(() -> new PlaneStrain(0, Double.POSITIVE_INFINITY, 0))
                .hasMessage("eyy must be finite: Infinity");
        assertThatThrownBy(() -> PlaneStrain.ofMicrostrain(0, 0, Double.NEGATIVE_INFINITY))
                .hasMessage("gxy must be finite: -Infinity");
        assertThatThrownBy(() -> new PlaneStress(0, 0, Double.NaN)).hasMessage("txy must be finite: NaN");
        assertThatThrownBy(() -> PlaneStress.ofMegapascals(Double.NaN, 0, 0)).hasMessage("sxx must be finite: NaN");
        assertThatThrownBy(() -> new PlaneStress(0, Double.NaN, 0)).hasMessage("syy must be finite: NaN");
        assertThatThrownBy(() -> new MohrStrainCircle(Strain.ZERO, Strain.of(-1e-6)))
                .hasMessage("radius must be >= 0: -1.0 µε");
        assertThatThrownBy(() -> new MohrStressCircle(Stress.ZERO, Stress.ofMegapascals(-1)))
                .hasMessage("radius must be >= 0: -1.0 MPa");
        assertThatThrownBy(() -> new MohrStressCircle(null, Stress.ZERO))
                .isInstanceOf(NullPointerException.class).hasMessage("centre");
        assertThatThrownBy(() -> PlaneStrain.ZERO.rotatedBy(null)).isInstanceOf(NullPointerException.class);
    }
}
