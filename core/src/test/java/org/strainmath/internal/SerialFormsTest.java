package org.strainmath.internal;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.io.ByteArrayInputStream;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.InvalidObjectException;
import java.io.ObjectInputStream;
import java.io.ObjectOutputStream;
import java.io.Serializable;
import java.nio.ByteBuffer;
import java.util.List;
import java.util.SplittableRandom;
import java.util.function.Function;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;
import org.junit.jupiter.api.Test;
import org.strainmath.bridge.AdcInput;
import org.strainmath.bridge.Bridge;
import org.strainmath.bridge.BridgeArm;
import org.strainmath.bridge.ChannelFrames;
import org.strainmath.bridge.StrainChannel;
import org.strainmath.bridge.StrainGauge;
import org.strainmath.bridge.ThermalOutput;
import org.strainmath.fatigue.MeanStressCorrection;
import org.strainmath.fatigue.SnCurve;
import org.strainmath.fatigue.StrainLife;
import org.strainmath.fatigue.StressLife;
import org.strainmath.history.Bins;
import org.strainmath.history.Rainflow;
import org.strainmath.material.ElasticConstant;
import org.strainmath.material.IsotropicMaterial;
import org.strainmath.material.PlaneStrain;
import org.strainmath.quantity.Resistance;
import org.strainmath.quantity.Stress;
import org.strainmath.quantity.Temperature;
import org.strainmath.quantity.Voltage;
import org.strainmath.quantity.VoltageRatio;

/**
 * Every configuration type of core that a stream engine ships to another process goes through
 * Java serialization and back as an equal object that computes the same bits; a serial form
 * with a value its factory refuses is rejected.
 */
class SerialFormsTest {

    /** A configuration and what it computes, to compare bit for bit after the round trip. */
    record Case(String name, Serializable value, Function<Object, Object> behaviour) {
        @Override
        public String toString() {
            return name;
        }
    }

    static List<Case> configurations() {
        StrainGauge gauge = StrainGauge.ofOhms(350, 2.13).withTransverseSensitivity(0.012)
                .withCalibrationPoissonRatio(0.3).withGridArea(6.5)
                .withGaugeFactorTemperatureCoefficient(0.9, Temperature.ofCelsius(24));
        Bridge bridge = Bridge.fullAxialPoisson(gauge, 0.3).withThreeWireLeads(Resistance.ofOhms(0.7))
                .withExcitationLeads(Resistance.ofOhms(1.1))
                .zeroedByOffset(VoltageRatio.ofMillivoltsPerVolt(0.05));
        Bridge quarter = Bridge.quarter(StrainGauge.ofOhms(120, 2.0))
                .withArmResistance(2, Resistance.ofOhms(120.4))
                .zeroedInArm(VoltageRatio.ofMillivoltsPerVolt(-0.2), 1);
        AdcInput ratiometric = AdcInput.ratiometric(24, 128).withReferenceRatio(0.5)
                .withCodeOffset(-13.5);
        AdcInput absolute = AdcInput.absolute(16, 64, Voltage.ofMillivolts(2500), Voltage.ofVolts(5))
                .withCoding(AdcInput.Coding.OFFSET_BINARY);
        ThermalOutput curve = ThermalOutput.ofFahrenheit(-40, 2.1, -0.02, 1e-4)
                .withReferenceGaugeFactor(2.05);
        StrainChannel channel = StrainChannel.of(Bridge.quarter(gauge), ratiometric)
                .withTransverseCorrection(-0.3).withThermalOutput(curve, Temperature.ofCelsius(21))
                .withSpanCorrection(1.004);
        StrainChannel plain = StrainChannel.of(quarter, absolute);
        IsotropicMaterial material = IsotropicMaterial.fromPair(ElasticConstant.SHEAR_MODULUS, 79.3e9,
                ElasticConstant.BULK_MODULUS, 160e9).withThermalExpansion(11.7e-6);
        SnCurve sn = SnCurve.ofRange(Stress.ofMegapascals(71), 2e6, 3).withKnee(5e6, 5)
                .withCutOffAt(1e8);
        double[] ratios = new double[64];
        int[] codes = new int[64];
        SplittableRandom random = new SplittableRandom(90);
        for (int i = 0; i < 64; i++) {
            ratios[i] = 2e-3 * (random.nextDouble() - 0.5);
            codes[i] = random.nextInt(-3_000_000, 3_000_000);
        }
        double[] history = new double[500];
        for (int i = 0; i < history.length; i++) {
            history[i] = 100 * Math.sin(i * 0.1) + 30 * random.nextDouble();
        }
        return List.of(
                new Case("StrainGauge", gauge, g -> ((StrainGauge) g).gaugeFactorAt(
                        Temperature.ofCelsius(60))),
                new Case("BridgeArm", BridgeArm.active(gauge, -0.3), a -> a.toString()),
                new Case("BridgeArm completion", BridgeArm.completion(Resistance.ofOhms(350)),
                        a -> a.toString()),
                new Case("Bridge", bridge, b -> strains((Bridge) b, ratios)),
                new Case("Bridge zeroed in an arm", quarter, b -> strains((Bridge) b, ratios)),
                new Case("AdcInput ratiometric", ratiometric, a -> ((AdcInput) a).toRatio(123_456)),
                new Case("AdcInput absolute", absolute, a -> ((AdcInput) a).toRatio(40_000)),
                new Case("ThermalOutput", curve, c -> ((ThermalOutput) c).apparentStrainAt(
                        Temperature.ofCelsius(45), 2.1).value()),
                new Case("StrainChannel", channel, c -> {
                    double[] out = new double[64];
                    double[] celsius = new double[64];
                    java.util.Arrays.fill(celsius, 33.0);
                    ((StrainChannel) c).toStrain(codes, 0, celsius, 0, out, 0, 64);
                    return bits(out);
                }),
                new Case("ChannelFrames", ChannelFrames.of(channel, plain), f -> {
                    double[][] out = new double[2][32];
                    double[] celsius = new double[32];
                    java.util.Arrays.fill(celsius, 18.0);
                    ((ChannelFrames) f).toStrain(codes, 0, 32, celsius, 0, out, 0);
                    return bits(out[0]) + bits(out[1]);
                }),
                new Case("IsotropicMaterial", material, m -> ((IsotropicMaterial) m)
                        .stressInPlaneStress(new PlaneStrain(6e-4, -2e-4, 3e-4)).toString()
                        + Double.doubleToRawLongBits(((IsotropicMaterial) m)
                                .stressInPlaneStress(new PlaneStrain(6e-4, -2e-4, 3e-4)).sxx())),
                new Case("IsotropicMaterial without expansion", IsotropicMaterial.of(
                        Stress.ofGigapascals(70), 0.33), m -> m.toString()),
                new Case("Rainflow", Rainflow.astm().withGate(2.5)
                        .withResidue(Rainflow.Residue.REPEATED), r -> ((Rainflow) r).count(history)),
                new Case("Bins uniform", Bins.uniform(-0.37, 1.91, 7), b -> ((Bins) b).indexOf(0.4)),
                new Case("Bins by edges", Bins.ofEdges(-1, 0, 0.5, 3), b -> ((Bins) b).indexOf(0.7)),
                new Case("SnCurve", sn, c -> Double.doubleToRawLongBits(((SnCurve) c)
                        .cyclesToFailure(40e6))),
                new Case("SnCurve Basquin", SnCurve.ofBasquin(Stress.ofMegapascals(900), -0.09),
                        c -> ((SnCurve) c).cyclesToFailure(300e6)),
                new Case("MeanStressCorrection Goodman", MeanStressCorrection.goodman(
                        Stress.ofMegapascals(510)), c -> c.toString()),
                new Case("MeanStressCorrection SWT", MeanStressCorrection.smithWatsonTopper(),
                        c -> c.toString()),
                new Case("StressLife", StressLife.of(sn).withMeanStressCorrection(
                        MeanStressCorrection.gerber(Stress.ofMegapascals(400))),
                        l -> ((StressLife) l).cyclesToFailure(20e6, 130e6)),
                new Case("StrainLife", StrainLife.of(Stress.ofGigapascals(207),
                        Stress.ofMegapascals(1758), -0.0977, 2.12, -0.774).withMorrowCorrection(),
                        l -> Double.doubleToRawLongBits(((StrainLife) l).cyclesToFailure(-0.001,
                                0.004))));
    }

    private static String strains(Bridge bridge, double[] ratios) {
        double[] out = new double[ratios.length];
        bridge.toStrain(ratios, 0, out, 0, ratios.length);
        return bits(out);
    }

    private static String bits(double[] values) {
        StringBuilder s = new StringBuilder();
        for (double v : values) {
            s.append(Long.toHexString(Double.doubleToRawLongBits(v))).append(' ');
        }
        return s.toString();
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("configurations")
    void aConfigurationComesBackEqualAndComputesTheSameBits(Case c) throws Exception {
        Object copy = roundTrip(c.value());
        assertThat(copy).hasSameClassAs(c.value());
        assertThat(copy.toString()).isEqualTo(c.value().toString());
        assertThat(c.behaviour().apply(copy)).isEqualTo(c.behaviour().apply(c.value()));
        if (overridesEquals(c.value().getClass())) {
            assertThat(copy).isEqualTo(c.value()).hasSameHashCodeAs(c.value());
        }
        // A second trip gives the same bytes: the form holds the defining values only.
        assertThat(serialize(copy)).isEqualTo(serialize(c.value()));
    }

    @Test
    void aSerialFormWithAValueItsFactoryRefusesIsRejected() throws Exception {
        // The gauge factor 2.123456789 as its eight bytes in the stream, replaced by a NaN's.
        byte[] stream = serialize(StrainGauge.ofOhms(350, 2.123456789));
        byte[] factor = ByteBuffer.allocate(8).putDouble(2.123456789).array();
        int at = indexOf(stream, factor);
        assertThat(at).isPositive();
        ByteBuffer.wrap(stream).putDouble(at, Double.NaN);
        assertThatThrownBy(() -> deserialize(stream)).isInstanceOf(InvalidObjectException.class)
                .hasMessage("serial form of StrainGauge must hold valid values: gaugeFactor must"
                        + " be > 0 and finite: NaN");
        // And a curve whose slope was made negative.
        byte[] curve = serialize(SnCurve.ofRange(Stress.ofMegapascals(71), 2e6, 3.25));
        int slope = indexOf(curve, ByteBuffer.allocate(8).putDouble(3.25).array());
        ByteBuffer.wrap(curve).putDouble(slope, -3.25);
        assertThatThrownBy(() -> deserialize(curve)).isInstanceOf(InvalidObjectException.class)
                .hasMessageEndingWith("slope must be > 0 and finite: -3.25");
    }

    @Test
    void theStreamHoldsTheSerialFormNotTheComposedFields() throws Exception {
        String text = new String(serialize(Bridge.quarter(StrainGauge.ofOhms(350, 2.0))),
                java.nio.charset.StandardCharsets.ISO_8859_1);
        assertThat(text).contains("org.strainmath.bridge.Bridge$Serial").doesNotContain("ratioLow");
    }

    private static boolean overridesEquals(Class<?> type) throws NoSuchMethodException {
        return type.getMethod("equals", Object.class).getDeclaringClass() == type;
    }

    private static int indexOf(byte[] haystack, byte[] needle) {
        outer:
        for (int i = 0; i + needle.length <= haystack.length; i++) {
            for (int j = 0; j < needle.length; j++) {
                if (haystack[i + j] != needle[j]) {
                    continue outer;
                }
            }
            return i;
        }
        return -1;
    }

    static byte[] serialize(Object value) throws IOException {
        ByteArrayOutputStream bytes = new ByteArrayOutputStream();
        try (ObjectOutputStream out = new ObjectOutputStream(bytes)) {
            out.writeObject(value);
        }
        return bytes.toByteArray();
    }

    static Object deserialize(byte[] stream) throws IOException, ClassNotFoundException {
        try (ObjectInputStream in = new ObjectInputStream(new ByteArrayInputStream(stream))) {
            return in.readObject();
        }
    }

    static Object roundTrip(Object value) throws IOException, ClassNotFoundException {
        return deserialize(serialize(value));
    }
}
