package org.strainmath.benchmarks;

import java.util.concurrent.TimeUnit;

import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.EigenDecomposition;
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
import org.strainmath.material.IsotropicMaterial;
import org.strainmath.quantity.Stress;
import org.strainmath.rosette.Rosette;

/**
 * A rectangular rosette on steel, readings to ε1, ε2 and von Mises (and the principal angle),
 * beside:
 * <ul>
 *   <li>the arithmetic floor: two square roots per sample over the same three inputs and into
 *       two outputs, and nothing else;
 *   <li>the path a user would otherwise write: per sample, the strain state by hand and Commons
 *       Math's {@code EigenDecomposition} of the 2×2 strain tensor, then von Mises.
 * </ul>
 * Scores are per block; samples/s is the score times {@code size}.
 */
@State(Scope.Thread)
@BenchmarkMode(Mode.Throughput)
@OutputTimeUnit(TimeUnit.SECONDS)
@Warmup(iterations = 5, time = 1)
@Measurement(iterations = 5, time = 1)
@Fork(1)
public class RosetteBenchmark {

    @Param({"64", "4096", "1048576"})
    public int size;

    Rosette rosette;
    double[][] readings;
    double[] e1;
    double[] e2;
    double[] vonMises;
    double[] angle;
    double modulus;
    double poisson;

    @Setup
    public void setUp() {
        IsotropicMaterial steel = IsotropicMaterial.of(Stress.ofGigapascals(200), 0.30);
        rosette = Rosette.rectangular().withMaterial(steel);
        readings = new double[][] {Signals.strain(size, 900e-6, 0xA1),
            Signals.strain(size, 300e-6, 0xB2), Signals.strain(size, -250e-6, 0xC3)};
        e1 = new double[size];
        e2 = new double[size];
        vonMises = new double[size];
        angle = new double[size];
        modulus = 200e9;
        poisson = 0.30;
    }

    @Benchmark
    public double[] floorTwoSquareRoots() {
        double[] a = readings[0];
        double[] b = readings[1];
        double[] c = readings[2];
        double[] x = e1;
        double[] y = vonMises;
        for (int i = 0; i < a.length; i++) {
            double p = a[i];
            double q = b[i];
            double r = c[i];
            x[i] = Math.sqrt(p * p + q * q);
            y[i] = Math.sqrt(q * q + r * r);
        }
        return y;
    }

    @Benchmark
    public double[] floorOneSquareRoot() {
        double[] a = readings[0];
        double[] b = readings[1];
        double[] c = readings[2];
        double[] x = e1;
        double[] y = e2;
        for (int i = 0; i < a.length; i++) {
            double p = a[i];
            double q = b[i];
            double r = c[i];
            double root = Math.sqrt(p * p + q * q);
            x[i] = r + root;
            y[i] = r - root;
        }
        return y;
    }

    @Benchmark
    public int principalStrains() {
        return rosette.toPrincipalStrains(readings, 0, e1, e2, 0, size);
    }

    @Benchmark
    public int principalAndVonMises() {
        return rosette.toPrincipalStrainsAndVonMises(readings, 0, e1, e2, vonMises, 0, size);
    }

    @Benchmark
    public int principalVonMisesAndAngle() {
        return principalAndVonMises() + rosette.toPrincipalAngles(readings, 0, angle, 0, size);
    }

    @Benchmark
    public double[] eigenDecompositionPerSample() {
        double[] a = readings[0];
        double[] b = readings[1];
        double[] c = readings[2];
        double q = modulus / (1 - poisson * poisson);
        for (int i = 0; i < a.length; i++) {
            double ex = a[i];
            double ey = c[i];
            double half = (2 * b[i] - a[i] - c[i]) / 2;
            double[] values = new EigenDecomposition(new Array2DRowRealMatrix(
                    new double[][] {{ex, half}, {half, ey}})).getRealEigenvalues();
            double p1 = Math.max(values[0], values[1]);
            double p2 = Math.min(values[0], values[1]);
            double s1 = q * (p1 + poisson * p2);
            double s2 = q * (p2 + poisson * p1);
            e1[i] = p1;
            e2[i] = p2;
            vonMises[i] = Math.sqrt(s1 * s1 - s1 * s2 + s2 * s2);
        }
        return vonMises;
    }
}
