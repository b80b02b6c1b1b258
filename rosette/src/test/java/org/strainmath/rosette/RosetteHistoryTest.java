package org.strainmath.rosette;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.SplittableRandom;

import org.junit.jupiter.api.Test;
import org.strainmath.history.Cycles;
import org.strainmath.history.Histories;
import org.strainmath.history.Rainflow;
import org.strainmath.material.IsotropicMaterial;
import org.strainmath.material.PlaneStrain;
import org.strainmath.material.PlaneStress;
import org.strainmath.quantity.Angle;
import org.strainmath.quantity.Stress;

/**
 * A rosette's readings to a stress history to count: under proportional loading (one principal
 * direction, here 30° from gauge a, and a stress that reverses through zero) the signed larger
 * principal stress and the normal stress on the principal plane are the applied stress itself,
 * so their counts are the count of that stress (definition; the readings are made from it with
 * the strain transformation and Hooke's law in plane stress, whose library forms are checked
 * against textbooks in their own tests).
 */
class RosetteHistoryTest {

    private static final IsotropicMaterial STEEL = IsotropicMaterial.of(Stress.ofGigapascals(200),
            0.3);

    @Test
    void proportionalLoadingCountsTheAppliedStress() {
        int n = 6000;
        SplittableRandom random = new SplittableRandom(30);
        double[] applied = new double[n];
        double[][] readings = new double[3][n];
        Angle direction = Angle.ofDegrees(30);
        for (int i = 0; i < n; i++) {
            applied[i] = 120e6 * Math.sin(i * 0.01) + 30e6 * Math.sin(i * 0.23)
                    + 2e6 * random.nextGaussian();
            // uniaxial stress along 30°: σx', 0, 0 in axes turned by 30°, back to x, y
            PlaneStress state = new PlaneStress(applied[i], 0, 0).rotatedBy(direction.negated());
            PlaneStrain strain = STEEL.strainInPlaneStress(state);
            for (int g = 0; g < 3; g++) {
                readings[g][i] = strain.normalStrainAt(Angle.ofDegrees(45 * g)).value();
            }
        }
        Rosette rosette = Rosette.rectangular().withMaterial(STEEL);
        double[] s1 = new double[n];
        double[] s2 = new double[n];
        assertThat(rosette.toPrincipalStresses(readings, 0, s1, s2, 0, n)).isZero();
        double[] larger = new double[n];
        assertThat(Histories.largerMagnitude(s1, s2, 0, larger, 0, n)).isZero();

        double[] exx = new double[n];
        double[] eyy = new double[n];
        double[] gxy = new double[n];
        rosette.toStrainState(readings, 0, exx, eyy, gxy, 0, n);
        double[] sxx = new double[n];
        double[] syy = new double[n];
        double[] txy = new double[n];
        STEEL.planeStressStiffness().toStress(exx, eyy, gxy, 0, sxx, syy, txy, 0, n);
        double[] onPlane = new double[n];
        assertThat(Histories.normalOnPlane(sxx, syy, txy, 0, direction, onPlane, 0, n)).isZero();

        Rainflow rainflow = Rainflow.astm().withGate(1e6);
        Cycles expected = rainflow.count(applied);
        for (double[] history : new double[][] {larger, onPlane}) {
            Cycles got = rainflow.count(history);
            assertThat(got.size()).isEqualTo(expected.size());
            for (int i = 0; i < got.size(); i++) {
                assertThat(got.from(i)).isCloseTo(expected.from(i), within(1.0));   // Pa
                assertThat(got.to(i)).isCloseTo(expected.to(i), within(1.0));
                assertThat(got.count(i)).isEqualTo(expected.count(i));
            }
        }
    }
}
