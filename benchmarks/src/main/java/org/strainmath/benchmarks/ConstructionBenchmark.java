package org.strainmath.benchmarks;

import java.util.SplittableRandom;
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
import org.strainmath.calibration.CalibrationFit;
import org.strainmath.calibration.FitResult;
import org.strainmath.rosette.Rosette;

/**
 * How configuration cost grows with its size: a quadratic calibration fit of {@code points}
 * seeded points (QR of an n × 3 design and the statistics), and the construction of a rosette
 * of {@code gauges} gauges at spread angles (the 50-digit least-squares inversion). Both run at
 * configuration time, never per sample. Average time per construction.
 */
@State(Scope.Thread)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MICROSECONDS)
@Warmup(iterations = 5, time = 1)
@Measurement(iterations = 5, time = 1)
@Fork(1)
public class ConstructionBenchmark {

    @Param({"3", "10", "100", "1000"})
    public int size;

    double[] loads;
    double[] readings;
    double[] angles;

    @Setup
    public void setUp() {
        SplittableRandom random = new SplittableRandom(0xC0);
        int points = Math.max(size, 4);
        loads = new double[points];
        readings = new double[points];
        for (int i = 0; i < points; i++) {
            loads[i] = 50.0 * i / (points - 1);
            readings[i] = 0.04 * loads[i] - 2e-6 * loads[i] * loads[i] + 1e-4 * random.nextGaussian();
        }
        int gauges = Math.max(3, Math.min(size, 64));
        angles = new double[gauges];
        for (int j = 0; j < gauges; j++) {
            angles[j] = 180.0 * j / gauges;
        }
    }

    @Benchmark
    public FitResult quadraticFit() {
        return CalibrationFit.of(loads, readings).withDegree(2).fit();
    }

    @Benchmark
    public Rosette rosetteOfGauges() {
        return Rosette.ofDegrees(angles);
    }
}
