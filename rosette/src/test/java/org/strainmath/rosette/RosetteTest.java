package org.strainmath.rosette;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.util.SplittableRandom;
import java.util.stream.Stream;

import org.apache.commons.math3.linear.EigenDecomposition;
import org.apache.commons.math3.linear.MatrixUtils;
import org.apache.commons.math3.linear.RealVector;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;
import org.strainmath.bridge.AdcInput;
import org.strainmath.bridge.Bridge;
import org.strainmath.bridge.StrainChannel;
import org.strainmath.bridge.StrainGauge;
import org.strainmath.material.IsotropicMaterial;
import org.strainmath.material.PlaneStrain;
import org.strainmath.quantity.Angle;
import org.strainmath.quantity.Strain;
import org.strainmath.quantity.Stress;

/** Rosette reduction: closed forms, quadrants, an independent eigen solver, invariants. */
class RosetteTest {

    private static final double MICRO = 1e-6;

    /** The reading of an ideal gauge at θ on the state (εx, εy, γ): the transformation law. */
    private static double reading(PlaneStrain e, double degrees) {
        double t = Math.toRadians(degrees);
        double c = Math.cos(t);
        double s = Math.sin(t);
        return e.exx() * c * c + e.eyy() * s * s + e.gxy() * s * c;
    }

    static Stream<Arguments> readings() {
        SplittableRandom random = new SplittableRandom(0x0E5E77E);
        return Stream.generate(() -> Arguments.of(random.nextDouble(-3000, 3000),
                random.nextDouble(-3000, 3000), random.nextDouble(-3000, 3000))).limit(200);
    }

    @ParameterizedTest(name = "a={0} b={1} c={2} µε")
    @MethodSource("readings")
    void rectangularAndDeltaEqualTheirTextbookClosedForms(double a, double b, double c) {
        // Closed forms (Dally and Riley, Experimental Stress Analysis, strain analysis
        // methods; the same in any mechanics-of-materials text), here derived from the
        // transformation equation:
        //   rectangular 0/45/90: ε1,2 = (a + c)/2 ± √(((a − c)/2)² + ((2b − a − c)/2)²)
        //   delta 0/60/120:      ε1,2 = (a + b + c)/3 ± √(((2a − b − c)/3)² + ((b − c)/√3)²)
        double scale = 3000 * MICRO * 1e-12;
        RosetteStrains rect = Rosette.rectangular().reduceMicrostrain(a, b, c);
        double rc = (a + c) / 2;
        double rr = Math.hypot((a - c) / 2, (2 * b - a - c) / 2);
        assertThat(rect.principal().e1().value()).isCloseTo((rc + rr) * MICRO, within(scale));
        assertThat(rect.principal().e2().value()).isCloseTo((rc - rr) * MICRO, within(scale));
        assertThat(rect.strain().gxy()).isCloseTo((2 * b - a - c) * MICRO, within(scale));
        RosetteStrains delta = Rosette.delta().reduceMicrostrain(a, b, c);
        double dc = (a + b + c) / 3;
        double dr = Math.hypot((2 * a - b - c) / 3, (b - c) / Math.sqrt(3));
        assertThat(delta.principal().e1().value()).isCloseTo((dc + dr) * MICRO, within(scale));
        assertThat(delta.principal().e2().value()).isCloseTo((dc - dr) * MICRO, within(scale));
        assertThat(delta.strain().exx()).isCloseTo(a * MICRO, within(scale));
        assertThat(delta.strain().gxy()).isCloseTo(2 * (b - c) / Math.sqrt(3) * MICRO, within(scale));
    }

    @Test
    void theQuadrantRule() {
        // Quadrant rule of the rosette issue, derived from the transformation equations.
        assertAngle(Rosette.rectangular().reduceMicrostrain(100, 200, 100), 200, 0, 45);
        assertAngle(Rosette.rectangular().reduceMicrostrain(100, 0, 100), 200, 0, -45);
        assertAngle(Rosette.rectangular().reduceMicrostrain(200, 100, 0), 200, 0, 0);
        assertAngle(Rosette.rectangular().reduceMicrostrain(0, 100, 200), 200, 0, 90);
        RosetteStrains equal = Rosette.rectangular().reduceMicrostrain(100, 100, 100);
        assertThat(equal.principal().angle()).isEmpty();
        assertThat(equal.principal().hasDirection()).isFalse();
        assertThat(equal.principal()).hasToString(
                "PrincipalStrains[e1=100.0 µε, e2=100.0 µε, theta=none (equal biaxial)]");
        // Delta rosettes' equal readings carry rounding noise in the composed matrix: still
        // flagged, not a random direction.
        assertThat(Rosette.delta().reduceMicrostrain(321, 321, 321).principal().angle()).isEmpty();
    }

    private static void assertAngle(RosetteStrains r, double e1, double e2, double degrees) {
        assertThat(r.principal().e1().toMicrostrain()).isCloseTo(e1, within(1e-9));
        assertThat(r.principal().e2().toMicrostrain()).isCloseTo(e2, within(1e-9));
        assertThat(r.principal().angle()).get()
                .satisfies(a -> assertThat(a.toDegrees()).isCloseTo(degrees, within(1e-12)));
    }

    @ParameterizedTest(name = "a={0} b={1} c={2} µε")
    @MethodSource("readings")
    void principalValuesAndDirectionEqualCommonsMathsEigenDecomposition(double a, double b,
            double c) {
        // Oracle: EigenDecomposition (Commons Math) of the tensor [[εx, γ/2], [γ/2, εy]] of
        // the state the readings come from.
        PlaneStrain state = new PlaneStrain(a * MICRO, b * MICRO, c * MICRO);
        Rosette rosette = Rosette.ofDegrees(0, 60, 120);
        RosetteStrains r = rosette.reduce(Strain.of(reading(state, 0)), Strain.of(reading(state, 60)),
                Strain.of(reading(state, 120)));
        EigenDecomposition eigen = new EigenDecomposition(MatrixUtils.createRealMatrix(new double[][] {
            {state.exx(), state.gxy() / 2}, {state.gxy() / 2, state.eyy()}}));
        double[] values = eigen.getRealEigenvalues();
        int big = values[0] >= values[1] ? 0 : 1;
        double size = Math.abs(values[0]) + Math.abs(values[1]);
        assertThat(r.principal().e1().value()).isCloseTo(values[big], within(size * 1e-12));
        assertThat(r.principal().e2().value()).isCloseTo(values[1 - big], within(size * 1e-12));
        RealVector v = eigen.getEigenvector(big);
        double theta = r.principal().angle().orElseThrow().toRadians();
        // The eigenvector of ε1 is along θp (up to sign): |cross product| ≈ 0.
        double cross = v.getEntry(0) * Math.sin(theta) - v.getEntry(1) * Math.cos(theta);
        assertThat(Math.abs(cross)).isLessThan(1e-9);
        assertThat(theta).isGreaterThan(-Math.PI / 2).isLessThanOrEqualTo(Math.PI / 2);
        // Invariant: ε1 + ε2 = εx + εy.
        assertThat(r.principal().e1().value() + r.principal().e2().value())
                .isCloseTo(state.exx() + state.eyy(), within(size * 1e-12));
    }

    @ParameterizedTest(name = "a={0} b={1} c={2} µε")
    @MethodSource("readings")
    void turningTheRosetteAndItsAxisTogetherChangesNothing(double a, double b, double c) {
        // Invariant: the same physical state read by a rosette laid at φ, with its results
        // asked in axes at −φ from gauge a (the original axes), gives the same state.
        PlaneStrain state = new PlaneStrain(a * MICRO, b * MICRO, c * MICRO);
        double phi = (a + 3000) / 6000 * 170 - 85;
        Rosette turned = Rosette.ofDegrees(0, 45, 90).withReferenceAxisAt(Angle.ofDegrees(-phi));
        RosetteStrains r = turned.reduceMicrostrain(reading(state, phi) / MICRO,
                reading(state, phi + 45) / MICRO, reading(state, phi + 90) / MICRO);
        double size = 1e-12 * 6000 * MICRO;
        assertThat(r.strain().exx()).isCloseTo(state.exx(), within(size));
        assertThat(r.strain().eyy()).isCloseTo(state.eyy(), within(size));
        assertThat(r.strain().gxy()).isCloseTo(state.gxy(), within(size));
        RosetteStrains plain = Rosette.rectangular().reduceMicrostrain(reading(state, 0) / MICRO,
                reading(state, 45) / MICRO, reading(state, 90) / MICRO);
        assertThat(r.principal().e1().value()).isCloseTo(plain.principal().e1().value(), within(size));
        assertThat(r.principal().e2().value()).isCloseTo(plain.principal().e2().value(), within(size));
    }

    @Test
    void anOverdeterminedRosetteFitsByLeastSquares() {
        PlaneStrain state = PlaneStrain.ofMicrostrain(640, -210, 385);
        Rosette four = Rosette.ofDegrees(0, 45, 90, 135);
        Strain[] exact = new Strain[4];
        for (int j = 0; j < 4; j++) {
            exact[j] = Strain.of(reading(state, 45 * j));
        }
        RosetteStrains r = four.reduce(exact);
        assertThat(r.residualRms().value()).isLessThan(1e-18);
        assertThat(r.strain().exx()).isCloseTo(state.exx(), within(1e-18));
        // A disturbance d on gauge d: for 0/45/90/135 the least-squares fit shares it out as
        // residuals (d/4)·(−1, 1, −1, 1) (ε0 + ε90 = ε45 + ε135 is the one redundancy), so the
        // RMS over the one degree of freedom is |d|/2. Derived, common practice, no source.
        exact[3] = exact[3].plus(Strain.ofMicrostrain(8));
        RosetteStrains noisy = four.reduce(exact);
        assertThat(noisy.residuals().get(3).toMicrostrain()).isCloseTo(2, within(1e-9));
        assertThat(noisy.residuals().get(0).toMicrostrain()).isCloseTo(-2, within(1e-9));
        assertThat(noisy.residualRms().toMicrostrain()).isCloseTo(4, within(1e-9));
        assertThat(noisy.toString()).contains("residual RMS 4.0 µε");
    }

    @Test
    void transverseSensitivityRoundTripsThroughTheGaugeModel() {
        // Forward: each grid reads (εa + Kt·εt)/(1 − ν0·Kt) (ASTM E251 definition; the model of
        // StrainGauge.indicatedStrain). The corrected rosette must give the state back.
        StrainGauge grid = StrainGauge.ofOhms(350, 2.1).withTransverseSensitivity(0.03);
        PlaneStrain state = PlaneStrain.ofMicrostrain(1018, 224, -1527);
        for (Rosette plain : new Rosette[] {Rosette.rectangular(), Rosette.delta()}) {
            double[] angles = plain.angles().stream().mapToDouble(Angle::toDegrees).toArray();
            Strain[] indicated = new Strain[3];
            for (int j = 0; j < 3; j++) {
                double along = reading(state, angles[j]);
                double across = reading(state, angles[j] + 90);
                indicated[j] = grid.indicatedStrain(Strain.of(along), Strain.of(across));
            }
            RosetteStrains corrected = plain.withGaugeData(grid).reduce(indicated);
            assertThat(corrected.strain().exx()).isCloseTo(state.exx(), within(1e-17));
            assertThat(corrected.strain().eyy()).isCloseTo(state.eyy(), within(1e-17));
            assertThat(corrected.strain().gxy()).isCloseTo(state.gxy(), within(1e-17));
        }
        // The rectangular rosette's coupled correction in closed form (derived from the same
        // model; the form Dally and Riley give): ε0 = (1 − ν0Kt)(ε0' − Kt·ε90')/(1 − Kt²).
        double kt = 0.03;
        double nu0 = 0.285;
        double a = 1000e-6;
        double c = -300e-6;
        RosetteStrains r = Rosette.rectangular().withGaugeData(grid).reduce(Strain.of(a),
                Strain.of(200e-6), Strain.of(c));
        assertThat(r.strain().exx()).isCloseTo((1 - nu0 * kt) * (a - kt * c) / (1 - kt * kt), within(1e-18));
        assertThat(r.strain().eyy()).isCloseTo((1 - nu0 * kt) * (c - kt * a) / (1 - kt * kt), within(1e-18));
    }

    @Test
    void clockwiseNumberingMirrorsTheAngles() {
        // A rosette numbered clockwise reads gauge b at −45°: the same readings give the
        // mirror image, γxy of the opposite sign (transformation law).
        RosetteStrains ccw = Rosette.rectangular().reduceMicrostrain(500, 300, -100);
        RosetteStrains cw = Rosette.rectangular().withClockwiseNumbering().reduceMicrostrain(500, 300, -100);
        assertThat(cw.strain().gxy()).isCloseTo(-ccw.strain().gxy(), within(1e-18));
        assertThat(cw.principal().angle().orElseThrow().toDegrees())
                .isCloseTo(-ccw.principal().angle().orElseThrow().toDegrees(), within(1e-12));
        assertThat(Rosette.rectangular().withClockwiseNumbering().toString()).contains("numbered clockwise");
    }

    @Test
    void aMisalignedRosetteUsesItsMeasuredAngles() {
        // Readings of a state by grids at 3°, 51°, 96° (a misaligned rectangular rosette):
        // reduced with the measured angles, the state comes back; with the nominal ones it
        // does not (sensitivity to misalignment, a known hazard, common practice).
        PlaneStrain state = PlaneStrain.ofMicrostrain(130, 140, -360);
        double[] actual = {3, 51, 96};
        double[] r = new double[3];
        for (int j = 0; j < 3; j++) {
            r[j] = reading(state, actual[j]) / MICRO;
        }
        Rosette measured = Rosette.rectangular().withMeasuredAngles(Angle.ofDegrees(3),
                Angle.ofDegrees(51), Angle.ofDegrees(96));
        assertThat(measured.reduceMicrostrain(r).strain().gxy()).isCloseTo(state.gxy(), within(1e-15));
        assertThat(Math.abs(Rosette.rectangular().reduceMicrostrain(r).strain().gxy() - state.gxy()))
                .isGreaterThan(5e-6);
        assertThat(measured.toString()).contains("(measured)");
    }

    @Test
    void aTeeRosetteAssumesItsAxesPrincipal() {
        // Two gauges along known principal axes: ε1, ε2 are the readings (any text, the tee
        // rosette). With a transverse sensitivity, the 0/90 coupled correction.
        RosetteStrains r = Rosette.tee().reduceMicrostrain(600, -180);
        assertThat(r.strain().gxy()).isZero();
        assertThat(r.principal().e1().toMicrostrain()).isCloseTo(600, within(1e-9));
        assertThat(r.principal().angle().orElseThrow().toDegrees()).isCloseTo(0, within(1e-12));
        assertThat(r.residualRms()).isEqualTo(Strain.ZERO);
        StrainGauge grid = StrainGauge.ofOhms(120, 2.0).withTransverseSensitivity(0.02);
        RosetteStrains corrected = Rosette.tee().withGaugeData(grid).reduceMicrostrain(600, -180);
        assertThat(corrected.strain().exx())
                .isCloseTo((1 - 0.285 * 0.02) * (600e-6 + 0.02 * 180e-6) / (1 - 0.0004), within(1e-18));
    }

    @Test
    void aWorkedExampleWithStresses() {
        // Philpot, MecMovies M13.6 (companion to Mechanics of Materials: An Integrated
        // Learning System), "Principal stresses from rosette data": εx = 770 µε, εy = −350 µε,
        // γxy = 1940 µrad on aluminium, E = 70 GPa, ν = 0.33. Printed: G = 26,316 MPa,
        // σy = −7.53 MPa, τxy = 51.05 MPa, εp1, εp2 = 1,330.04 µε, −910.04 µε,
        // tan 2θp = 1.732. A rectangular rosette (gauge a along x, c along y) with those
        // strains reads εa = 770, εb = (770 − 350 + 1940)/2 = 1180, εc = −350 µε.
        IsotropicMaterial aluminium = IsotropicMaterial.of(Stress.ofGigapascals(70), 0.33);
        Rosette rosette = Rosette.rectangular().withMaterial(aluminium);
        RosetteStrains strains = rosette.reduceMicrostrain(770, 1180, -350);
        assertThat(strains.principal().e1().toMicrostrain()).isCloseTo(1330.04, within(0.005));
        assertThat(strains.principal().e2().toMicrostrain()).isCloseTo(-910.04, within(0.005));
        double theta = strains.principal().angle().orElseThrow().toRadians();
        assertThat(Math.tan(2 * theta)).isCloseTo(1.732, within(0.0005));
        assertThat(aluminium.shearModulus().toMegapascals()).isCloseTo(26316, within(0.5));
        RosetteStresses s = rosette.stressesOfMicrostrain(770, 1180, -350);
        assertThat(s.stress().syy() / 1e6).isCloseTo(-7.53, within(0.005));
        assertThat(s.stress().txy() / 1e6).isCloseTo(51.05, within(0.005));
    }

    @Test
    void aDeltaWorkedExampleReducesToThePrintedEquations() {
        // Philpot, MecMovies M13.5, "Strain measurement with rosettes": a delta rosette
        // (gauges at 0°, 60°, 120°) reads εa = 800, εb = −200, εc = 625 µε; the printed
        // reduction gives εx = εa and the two equations
        //   −200 = 800(0.25) + 0.75·εy + 0.433·γxy,   625 = 800(0.25) + 0.75·εy − 0.433·γxy.
        RosetteStrains r = Rosette.delta().reduceMicrostrain(800, -200, 625);
        double ey = r.strain().eyy() / MICRO;
        double g = r.strain().gxy() / MICRO;
        assertThat(r.strain().exx() / MICRO).isCloseTo(800, within(1e-9));
        // The printed coefficients are rounded to 3 digits: 0.433 is sin 60°·cos 60° = √3/4.
        double k = Math.sqrt(3) / 4;
        assertThat(800 * 0.25 + 0.75 * ey + k * g).isCloseTo(-200, within(1e-9));
        assertThat(800 * 0.25 + 0.75 * ey - k * g).isCloseTo(625, within(1e-9));
    }

    @Test
    void aDeltaWorkedExampleGivesThePrintedPrincipalStrains() {
        // Hibbeler, Mechanics of Materials, the worked example on strain rosettes in the
        // chapter on strain transformation (Example 10.8 in the 8th edition; the example
        // number, the edition and the figures below are from memory): a 60° rosette (gauges a,
        // b, c at 0°, 60°, 120°) reads εa = 60, εb = 135, εc = 264 (10^-6). Printed:
        // εx = 60, εy = 246, γxy = −149 (10^-6); ε1 = 272, ε2 = 33.9 (10^-6). The same figures
        // follow by hand from the transformation equations (εy = 246 exactly, γxy = −148.96,
        // ε1 = 272.15, ε2 = 33.85), which is the check that the memory is right.
        RosetteStrains r = Rosette.delta().reduceMicrostrain(60, 135, 264);
        assertThat(r.strain().exx() / MICRO).isCloseTo(60, within(1e-9));
        assertThat(r.strain().eyy() / MICRO).isCloseTo(246, within(1e-9));
        assertThat(r.strain().gxy() / MICRO).isCloseTo(-149, within(0.5));
        assertThat(r.principal().e1().toMicrostrain()).isCloseTo(272, within(0.5));
        assertThat(r.principal().e2().toMicrostrain()).isCloseTo(33.9, within(0.05));
    }

    @Test
    void degenerateGeometriesAreRefusedNamingTheAngles() {
        assertThatThrownBy(() -> Rosette.ofDegrees(0, 180, 45))
                .isInstanceOf(IllegalArgumentException.class)
                .hasMessage("gauges a and b lie along one direction (0° or 180° apart), which "
                        + "leaves the strain state undetermined: 0.0°, 180.0°, 45.0°");
        assertThatThrownBy(() -> Rosette.ofDegrees(10, 50, 10))
                .hasMessageStartingWith("gauges a and c lie along one direction");
        assertThatThrownBy(() -> Rosette.ofDegrees(0, 90))
                .hasMessage("degrees must give at least three gauges: 0.0°, 90.0°");
        assertThatThrownBy(() -> Rosette.ofAngles(Angle.ZERO, Angle.ofDegrees(90)))
                .hasMessage("angles must give at least three gauges: 0.0°, 90.0°");
        assertThatThrownBy(() -> Rosette.rectangular().withMeasuredAngles(Angle.ZERO, Angle.ZERO))
                .hasMessage("actual must give one angle per gauge, 3: 2");
        assertThatThrownBy(() -> Rosette.rectangular().reduceMicrostrain(1, 2))
                .hasMessage("readings must give one strain per gauge, 3: 2");
        assertThatThrownBy(() -> Rosette.rectangular().reduceMicrostrain(1, Double.NaN, 2))
                .hasMessage("readings[1] must be finite: NaN");
        assertThatThrownBy(() -> Rosette.rectangular().stressesOfMicrostrain(1, 2, 3))
                .isInstanceOf(IllegalStateException.class)
                .hasMessage("the rosette has no material: use withMaterial first");
        assertThatThrownBy(() -> Rosette.rectangular().withGaugeData(StrainGauge.ofOhms(120, 2),
                StrainGauge.ofOhms(120, 2))).hasMessage("gauges must be one for all grids or one per grid, 3: 2");
        assertThatThrownBy(() -> Rosette.ofDegrees(Double.NaN, 1, 2)).hasMessage("degrees must be finite: NaN");
        assertThatThrownBy(() -> Rosette.rectangular().withMaterial(null))
                .isInstanceOf(NullPointerException.class).hasMessage("material");
    }

    @Test
    void aGridIsCorrectedForTransverseSensitivityOnTheRosetteOrTheChannelNotBoth() {
        // Definition: correcting on both divides the cross-sensitivity out twice.
        StrainGauge grid = StrainGauge.ofOhms(350, 2.08).withTransverseSensitivity(0.012);
        AdcInput adc = AdcInput.ratiometric(24, 128);
        StrainChannel plain = StrainChannel.of(Bridge.quarter(grid), adc);
        StrainChannel corrected = plain.withTransverseCorrection(-0.3);
        Rosette withData = Rosette.rectangular().withGaugeData(grid);
        assertThat(withData.checkChannels(plain, plain, plain)).isSameAs(withData);
        assertThat(Rosette.rectangular().checkChannels(corrected, corrected, corrected))
                .isEqualTo(Rosette.rectangular());
        assertThat(Rosette.rectangular().withGaugeData(StrainGauge.ofOhms(350, 2.08))
                .checkChannels(corrected)).isNotNull();
        assertThatThrownBy(() -> withData.checkChannels(plain, corrected, plain))
                .isInstanceOf(IllegalArgumentException.class)
                .hasMessage("channels[1] must not correct for transverse sensitivity: the rosette's"
                        + " gauge data already does (correct on the rosette only): -0.3");
        assertThatThrownBy(() -> withData.checkChannels(plain, null))
                .isInstanceOf(NullPointerException.class).hasMessage("channels[1]");
    }

    @Test
    void textForAPerson() {
        assertThat(Rosette.rectangular()).hasToString("Rosette[rectangular, gauges at 0.0°, 45.0°, 90.0°]");
        assertThat(Rosette.delta().withGaugeData(StrainGauge.ofOhms(350, 2).withTransverseSensitivity(0.01)))
                .hasToString("Rosette[delta, gauges at 0.0°, 60.0°, 120.0°, transverse sensitivity corrected]");
        assertThat(Rosette.rectangular().reduceMicrostrain(100, 200, 100).principal())
                .hasToString("PrincipalStrains[e1=200.0 µε, e2=0.0 µε, theta=45.0°]");
        assertThat(Rosette.rectangular()).isEqualTo(Rosette.rectangular())
                .hasSameHashCodeAs(Rosette.rectangular()).isNotEqualTo(Rosette.delta());
        double[][] m = Rosette.rectangular().reductionMatrix();
        // Rectangular: εx = a, εy = c, γ = 2b − a − c (transformation law), exactly.
        assertThat(m).isDeepEqualTo(new double[][] {{1, 0, 0}, {0, 0, 1}, {-1, 2, -1}});
    }
}
