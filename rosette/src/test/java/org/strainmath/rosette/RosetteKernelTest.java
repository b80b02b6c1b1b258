package org.strainmath.rosette;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.util.SplittableRandom;
import java.util.stream.Stream;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;
import org.junit.jupiter.api.Test;
import org.strainmath.bridge.StrainGauge;
import org.strainmath.internal.Kernels;
import org.strainmath.material.IsotropicMaterial;
import org.strainmath.quantity.Strain;
import org.strainmath.quantity.Stress;

/** The block kernels are the value API, bit for bit, at any offsets and in place. */
class RosetteKernelTest {

    private static final IsotropicMaterial STEEL = IsotropicMaterial.of(Stress.ofGigapascals(200), 0.3);

    static Stream<Rosette> rosettes() {
        StrainGauge grid = StrainGauge.ofOhms(350, 2.1).withTransverseSensitivity(0.02);
        return Stream.of(Rosette.rectangular(), Rosette.delta().withGaugeData(grid),
                Rosette.tee(), Rosette.ofDegrees(0, 30, 75, 120, 160))
                .map(r -> r.withMaterial(STEEL));
    }

    @ParameterizedTest
    @MethodSource("rosettes")
    void everyKernelIsTheValueApiBitForBit(Rosette rosette) {
        int n = rosette.gaugeCount();
        int len = Kernels.CHUNK + 50;
        SplittableRandom random = new SplittableRandom(0x7A5 + n);
        double[][] in = new double[n][len + 3];
        for (double[] column : in) {
            for (int i = 0; i < column.length; i++) {
                column[i] = random.nextDouble(-2e-3, 2e-3);
            }
        }
        in[0][3 + 10] = Double.NaN;
        for (int j = 0; j < n; j++) {
            in[j][3 + 20] = 5e-4;   // equal readings: equal-biaxial, no angle
        }
        int src = 3;
        for (int dst : new int[] {3, 1}) {   // the same offset, and another one
            double[] e1 = new double[len + 3];
            double[] e2 = new double[len + 3];
            double[] angle = new double[len + 3];
            double[] ex = new double[len + 3];
            double[] ey = new double[len + 3];
            double[] g = new double[len + 3];
            double[] s1 = new double[len + 3];
            double[] s2 = new double[len + 3];
            double[] vm = new double[len + 3];
            double[] tr = new double[len + 3];
            assertThat(rosette.toPrincipalStrains(in, src, e1, e2, dst, len)).isEqualTo(1);
            assertThat(rosette.toPrincipalAngles(in, src, angle, dst, len)).isEqualTo(2);
            assertThat(rosette.toStrainState(in, src, ex, ey, g, dst, len)).isEqualTo(1);
            assertThat(rosette.toPrincipalStresses(in, src, s1, s2, dst, len)).isEqualTo(1);
            assertThat(rosette.toVonMises(in, src, vm, dst, len)).isEqualTo(1);
            assertThat(rosette.toTresca(in, src, tr, dst, len)).isEqualTo(1);
            double[] f1 = new double[len + 3];
            double[] f2 = new double[len + 3];
            double[] fvm = new double[len + 3];
            assertThat(rosette.toPrincipalStrainsAndVonMises(in, src, f1, f2, fvm, dst, len)).isEqualTo(1);
            assertThat(f1).isEqualTo(e1);
            assertThat(f2).isEqualTo(e2);
            assertThat(fvm).isEqualTo(vm);
            for (int i = 0; i < len; i++) {
                if (i == 10) {
                    assertThat(e1[dst + i]).isNaN();
                    assertThat(vm[dst + i]).isNaN();
                    continue;
                }
                Strain[] readings = new Strain[n];
                for (int j = 0; j < n; j++) {
                    readings[j] = Strain.of(in[j][src + i]);
                }
                RosetteStrains r = rosette.reduce(readings);
                RosetteStresses s = r.stresses();
                int k = dst + i;
                assertThat(e1[k]).isEqualTo(r.principal().e1().value());
                assertThat(e2[k]).isEqualTo(r.principal().e2().value());
                assertThat(ex[k]).isEqualTo(r.strain().exx());
                assertThat(ey[k]).isEqualTo(r.strain().eyy());
                assertThat(g[k]).isEqualTo(r.strain().gxy());
                assertThat(s1[k]).isEqualTo(s.principal().s1().toPascals());
                assertThat(s2[k]).isEqualTo(s.principal().s2().toPascals());
                assertThat(vm[k]).isEqualTo(s.vonMises().toPascals());
                assertThat(tr[k]).isEqualTo(s.tresca().toPascals());
                if (r.principal().angle().isPresent()) {
                    assertThat(angle[k]).isEqualTo(r.principal().angle().get().toRadians());
                } else {
                    assertThat(i).isEqualTo(20);
                    assertThat(angle[k]).isNaN();
                }
            }
        }
    }

    @Test
    void inPlaceAtOneOffsetGivesTheSameNumbers() {
        Rosette rosette = Rosette.rectangular();
        double[][] in = {{1e-3, -2e-4}, {5e-4, 7e-4}, {-3e-4, 2e-4}};
        double[] e1 = new double[2];
        double[] e2 = new double[2];
        rosette.toPrincipalStrains(in, 0, e1, e2, 0, 2);
        double[][] copy = {in[0].clone(), in[1].clone(), in[2].clone()};
        rosette.toPrincipalStrains(copy, 0, copy[0], copy[1], 0, 2);
        assertThat(copy[0]).isEqualTo(e1);
        assertThat(copy[1]).isEqualTo(e2);
    }

    @Test
    void badBlocksAreRefused() {
        Rosette rosette = Rosette.rectangular();
        double[][] in = {new double[4], new double[4], new double[4]};
        double[] a = new double[4];
        double[] b = new double[4];
        assertThatThrownBy(() -> rosette.toPrincipalStrains(new double[][] {a, b}, 0, a, b, 0, 4))
                .isInstanceOf(IllegalArgumentException.class)
                .hasMessage("readings must hold one array per gauge, 3: 2");
        assertThatThrownBy(() -> rosette.toPrincipalStrains(in, 0, a, a, 0, 4))
                .hasMessage("e1 and e2 must be different arrays");
        assertThatThrownBy(() -> rosette.toPrincipalStrains(in, 0, a, null, 0, 4))
                .isInstanceOf(NullPointerException.class).hasMessage("e2");
        assertThatThrownBy(() -> rosette.toPrincipalStrains(in, 0, in[1], b, 1, 3))
                .hasMessage("e1 is also an input array and needs dstOff == srcOff: 1 != 0");
        assertThatThrownBy(() -> rosette.toPrincipalStrains(in, 1, a, b, 0, 4))
                .isInstanceOf(IndexOutOfBoundsException.class)
                .hasMessage("readings[0] has 4 values for 4 from 1");
        assertThatThrownBy(() -> rosette.toPrincipalStrains(in, 0, a, new double[3], 0, 4))
                .isInstanceOf(IndexOutOfBoundsException.class)
                .hasMessage("e2 has 3 values for 4 from 0");
        assertThatThrownBy(() -> rosette.toPrincipalStrains(new double[][] {a, null, b}, 0, a, b, 0, 4))
                .isInstanceOf(NullPointerException.class).hasMessage("readings[1]");
        assertThatThrownBy(() -> rosette.toVonMises(in, 0, a, 0, 4))
                .isInstanceOf(IllegalStateException.class)
                .hasMessage("the rosette has no material: use withMaterial first");
        assertThat(rosette.toPrincipalStrains(in, 0, a, b, 0, 0)).isZero();
    }
}
