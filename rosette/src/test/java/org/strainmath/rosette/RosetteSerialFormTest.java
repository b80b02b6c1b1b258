package org.strainmath.rosette;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.io.ByteArrayInputStream;
import java.io.ByteArrayOutputStream;
import java.io.InvalidObjectException;
import java.io.ObjectInputStream;
import java.io.ObjectOutputStream;
import java.nio.ByteBuffer;

import org.junit.jupiter.api.Test;
import org.strainmath.bridge.StrainGauge;
import org.strainmath.material.IsotropicMaterial;
import org.strainmath.quantity.Angle;
import org.strainmath.quantity.Stress;

/** A rosette goes through Java serialization and back as an equal one that computes the same bits. */
class RosetteSerialFormTest {

    @Test
    void aConfiguredRosetteComesBackEqualAndComputesTheSameBits() throws Exception {
        Rosette rosette = Rosette.rectangular()
                .withMeasuredAngles(Angle.ofDegrees(0.4), Angle.ofDegrees(45.2), Angle.ofDegrees(89.7))
                .withGaugeData(StrainGauge.ofOhms(350, 2.08).withTransverseSensitivity(0.011))
                .withReferenceAxisAt(Angle.ofDegrees(10))
                .withMaterial(IsotropicMaterial.of(Stress.ofGigapascals(200), 0.3));
        for (Rosette r : new Rosette[] {rosette, Rosette.delta().withClockwiseNumbering(),
            Rosette.tee(), Rosette.ofDegrees(0, 30, 60, 90)}) {
            Rosette copy = (Rosette) read(write(r));
            assertThat(copy).isEqualTo(r).hasSameHashCodeAs(r).hasToString(r.toString());
            assertThat(copy.reductionMatrix()).isDeepEqualTo(r.reductionMatrix());
        }
        double[][] readings = {{5e-4, 6e-4, 7e-4}, {2e-4, 1e-4, 0}, {-1e-4, -3e-4, 2e-4}};
        double[] s1 = new double[3];
        double[] s2 = new double[3];
        double[] c1 = new double[3];
        double[] c2 = new double[3];
        rosette.toPrincipalStresses(readings, 0, s1, s2, 0, 3);
        ((Rosette) read(write(rosette))).toPrincipalStresses(readings, 0, c1, c2, 0, 3);
        assertThat(c1).isEqualTo(s1);
        assertThat(c2).isEqualTo(s2);
    }

    @Test
    void aSerialFormWithAnAngleThatIsNotFiniteIsRejected() throws Exception {
        byte[] stream = write(Rosette.ofDegrees(0, 60, 120.75));
        byte[] angle = ByteBuffer.allocate(8).putDouble(Math.toRadians(120.75)).array();
        int at = -1;
        for (int i = 0; i + 8 <= stream.length && at < 0; i++) {
            if (java.util.Arrays.equals(stream, i, i + 8, angle, 0, 8)) {
                at = i;
            }
        }
        assertThat(at).isPositive();
        ByteBuffer.wrap(stream).putDouble(at, Double.POSITIVE_INFINITY);
        assertThatThrownBy(() -> read(stream)).isInstanceOf(InvalidObjectException.class)
                .hasMessage("serial form of Rosette must hold valid values: nominal[2] must be"
                        + " finite: Infinity");
    }

    private static byte[] write(Object value) throws Exception {
        ByteArrayOutputStream bytes = new ByteArrayOutputStream();
        try (ObjectOutputStream out = new ObjectOutputStream(bytes)) {
            out.writeObject(value);
        }
        return bytes.toByteArray();
    }

    private static Object read(byte[] stream) throws Exception {
        try (ObjectInputStream in = new ObjectInputStream(new ByteArrayInputStream(stream))) {
            return in.readObject();
        }
    }
}
