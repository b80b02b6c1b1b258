package org.strainmath.benchmarks;

import java.util.concurrent.TimeUnit;

import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OperationsPerInvocation;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Param;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;
import org.strainmath.bridge.Bridge;
import org.strainmath.bridge.StrainGauge;
import org.strainmath.quantity.VoltageRatio;

/**
 * The block inverse of the bridge equation (output ratio to strain) for a quarter bridge (first
 * degree, one division per sample) and a full axial Poisson bridge (quadratic, one division and
 * one square root per sample), beside:
 * <ul>
 *   <li>the arithmetic floor: a loop of one division per sample, {@code a / (b + x)}, and one of
 *       one division and one square root, the least any exact inverse of these bridges can do;
 *   <li>the path a user would otherwise write: one value object per sample through
 *       {@link Bridge#strainAt(VoltageRatio)}.
 * </ul>
 * Throughput is per sample ({@link OperationsPerInvocation} is not usable with a {@link Param}
 * size, so scores are per block; divide by {@code size}, as {@code docs/performance.md} does).
 * Run with {@code -prof gc} for the allocation per block.
 */
@State(Scope.Thread)
@BenchmarkMode(Mode.Throughput)
@OutputTimeUnit(TimeUnit.SECONDS)
@Warmup(iterations = 5, time = 1)
@Measurement(iterations = 5, time = 1)
@Fork(1)
public class BridgeInverseBenchmark {

    @Param({"64", "4096", "1048576"})
    public int size;

    Bridge quarter;
    Bridge fullAxialPoisson;
    double[] quarterRatios;
    double[] poissonRatios;
    double[] out;
    double a;
    double b;

    @Setup
    public void setUp() {
        quarter = Bridge.quarter(StrainGauge.ofOhms(350, 2.1));
        fullAxialPoisson = Bridge.fullAxialPoisson(StrainGauge.ofOhms(350, 2.1), 0.3);
        double[] strain = Signals.strain(size, 1500e-6, 0x5EED);
        quarterRatios = new double[size];
        poissonRatios = new double[size];
        quarter.toRatio(strain, 0, quarterRatios, 0, size);
        fullAxialPoisson.toRatio(strain, 0, poissonRatios, 0, size);
        out = new double[size];
        a = 4.0 / 2.1;
        b = 1.0;
    }

    @Benchmark
    public double[] floorOneDivision() {
        double[] x = quarterRatios;
        double[] y = out;
        double p = a;
        double q = b;
        for (int i = 0; i < x.length; i++) {
            y[i] = p / (q + x[i]);
        }
        return y;
    }

    @Benchmark
    public double[] floorDivisionAndSquareRoot() {
        double[] x = poissonRatios;
        double[] y = out;
        double p = a;
        double q = b;
        for (int i = 0; i < x.length; i++) {
            y[i] = p / (q + Math.sqrt(q + x[i]));
        }
        return y;
    }

    @Benchmark
    public int quarterBlock() {
        return quarter.toStrain(quarterRatios, 0, out, 0, size);
    }

    @Benchmark
    public int fullAxialPoissonBlock() {
        return fullAxialPoisson.toStrain(poissonRatios, 0, out, 0, size);
    }

    @Benchmark
    public double[] quarterValueObjects() {
        double[] x = quarterRatios;
        double[] y = out;
        for (int i = 0; i < x.length; i++) {
            y[i] = quarter.strainAt(VoltageRatio.ofVoltsPerVolt(x[i])).value();
        }
        return y;
    }

    @Benchmark
    public double[] fullAxialPoissonValueObjects() {
        double[] x = poissonRatios;
        double[] y = out;
        for (int i = 0; i < x.length; i++) {
            y[i] = fullAxialPoisson.strainAt(VoltageRatio.ofVoltsPerVolt(x[i])).value();
        }
        return y;
    }
}
