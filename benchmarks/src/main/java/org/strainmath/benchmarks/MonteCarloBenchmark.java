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
import org.strainmath.bridge.Bridge;
import org.strainmath.bridge.StrainGauge;
import org.strainmath.uncertainty.InputQuantity;
import org.strainmath.uncertainty.MonteCarloResult;
import org.strainmath.uncertainty.UncertaintyBudget;

/**
 * The Monte Carlo propagation (JCGM 101) of a strain-channel model: per trial, a gauge factor,
 * a reading (Type A, a Student t draw) and a scale (rectangular) are drawn and a quarter bridge
 * with that gauge factor is inverted. The score is per propagation of {@code trials} trials;
 * the cost per trial is its inverse over {@code trials}. Most of it is the construction of the
 * bridge each trial (the model rebuilds it), which is what a user's model would do too.
 */
@State(Scope.Thread)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Warmup(iterations = 5, time = 1)
@Measurement(iterations = 5, time = 1)
@Fork(1)
public class MonteCarloBenchmark {

    @Param({"10000"})
    public int trials;

    UncertaintyBudget rebuilt;
    UncertaintyBudget scaled;

    @Setup
    public void setUp() {
        InputQuantity[] inputs = {InputQuantity.normal("gauge factor", 2.08, 0.0208, 2),
            InputQuantity.typeA("reading mV/V", 0.5212, 0.5208, 0.5215, 0.5210, 0.5213),
            InputQuantity.rectangular("scale", 1e-3, 0.0005e-3)};
        rebuilt = UncertaintyBudget.of(
                x -> Bridge.quarter(StrainGauge.ofOhms(350, x[0])).toStrain(x[1] * x[2]), inputs);
        // The same model written without rebuilding: the bridge depends on K·ε only, so
        // ε(K) = ε(K0)·K0/K exactly.
        Bridge nominal = Bridge.quarter(StrainGauge.ofOhms(350, 2.08));
        scaled = UncertaintyBudget.of(x -> nominal.toStrain(x[1] * x[2]) * 2.08 / x[0], inputs);
    }

    @Benchmark
    public MonteCarloResult rebuildingTheBridgePerTrial() {
        return rebuilt.monteCarlo(trials, 11, 0.95);
    }

    @Benchmark
    public MonteCarloResult scalingTheStrainPerTrial() {
        return scaled.monteCarlo(trials, 11, 0.95);
    }
}
