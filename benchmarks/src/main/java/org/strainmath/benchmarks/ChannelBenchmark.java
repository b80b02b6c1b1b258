package org.strainmath.benchmarks;

import java.util.concurrent.TimeUnit;

import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Param;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;
import org.strainmath.bridge.AdcInput;
import org.strainmath.bridge.Bridge;
import org.strainmath.bridge.StrainChannel;
import org.strainmath.bridge.StrainGauge;
import org.strainmath.bridge.ThermalOutput;
import org.strainmath.quantity.Resistance;
import org.strainmath.quantity.Temperature;

/**
 * The whole chain of a channel, 24-bit codes to corrected strain, for a three-wire quarter
 * bridge with a transverse correction, with and without the thermal-output correction, beside:
 * <ul>
 *   <li>the arithmetic floor: from the same {@code int} codes, one multiply-add and one
 *       division per sample;
 *   <li>the value-object path: {@code channel.strainAt(code, temperature)} per sample.
 * </ul>
 * Scores are per block; samples/s is the score times {@code size}.
 */
@State(Scope.Thread)
@BenchmarkMode(Mode.Throughput)
@OutputTimeUnit(TimeUnit.SECONDS)
@Warmup(iterations = 5, time = 1)
@Measurement(iterations = 5, time = 1)
@Fork(1)
public class ChannelBenchmark {

    @Param({"64", "4096", "1048576"})
    public int size;

    StrainChannel plain;
    StrainChannel thermal;
    int[] codes;
    double[] celsius;
    double[] out;
    Temperature[] temperatures;
    double a;
    double b;
    double c;

    @Setup
    public void setUp() {
        StrainGauge gauge = StrainGauge.ofOhms(350, 2.08).withTransverseSensitivity(0.006);
        Bridge bridge = Bridge.quarter(gauge).withThreeWireLeads(Resistance.ofOhms(1.7));
        AdcInput adc = AdcInput.ratiometric(24, 128);
        plain = StrainChannel.of(bridge, adc).withTransverseCorrection(-0.29).zeroedByOffsetAt(-2140);
        thermal = plain.withThermalOutput(ThermalOutput.ofCelsius(-28.4, 2.05, -0.047, 1.6e-4),
                Temperature.ofCelsius(22));
        double[] strain = Signals.strain(size, 1500e-6, 0xC0DE);
        double perCode = adc.ratioPerCode().toVoltsPerVolt();
        codes = new int[size];
        celsius = new double[size];
        temperatures = new Temperature[size];
        for (int i = 0; i < size; i++) {
            codes[i] = (int) Math.round(bridge.toRatio(strain[i]) / perCode) - 2140;
            celsius[i] = 22 + 15 * Math.sin(2 * Math.PI * i / Math.max(size, 1));
            temperatures[i] = Temperature.ofCelsius(celsius[i]);
        }
        out = new double[size];
        a = perCode;
        b = 4.0 / 2.08;
        c = 1.0;
    }

    @Benchmark
    public double[] floorMultiplyAddAndDivision() {
        int[] x = codes;
        double[] y = out;
        double p = a;
        double q = b;
        double r = c;
        for (int i = 0; i < x.length; i++) {
            y[i] = q / (r + x[i] * p);
        }
        return y;
    }

    @Benchmark
    public int channelBlock() {
        return plain.toStrain(codes, 0, out, 0, size);
    }

    @Benchmark
    public int channelBlockWithThermalOutput() {
        return thermal.toStrain(codes, 0, celsius, 0, out, 0, size);
    }

    @Benchmark
    public double[] channelValueObjects() {
        int[] x = codes;
        double[] y = out;
        for (int i = 0; i < x.length; i++) {
            y[i] = thermal.strainAt(x[i], temperatures[i]).value();
        }
        return y;
    }
}
