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
import org.strainmath.material.IsotropicMaterial;
import org.strainmath.material.PlaneStiffness;
import org.strainmath.material.PlaneStrain;
import org.strainmath.material.PlaneStress;
import org.strainmath.quantity.Stress;

/**
 * Strain arrays to stress arrays in plane stress (Hooke's law, isotropic steel), beside:
 * <ul>
 *   <li>the arithmetic floor: the same nine multiply-adds per sample over the same arrays,
 *       without the NaN count (no division, no square root);
 *   <li>the value-object path: {@code material.stressInPlaneStress(new PlaneStrain(...))} per
 *       sample.
 * </ul>
 * Scores are per block; samples/s is the score times {@code size}.
 */
@State(Scope.Thread)
@BenchmarkMode(Mode.Throughput)
@OutputTimeUnit(TimeUnit.SECONDS)
@Warmup(iterations = 5, time = 1)
@Measurement(iterations = 5, time = 1)
@Fork(1)
public class StressBenchmark {

    @Param({"64", "4096", "1048576"})
    public int size;

    IsotropicMaterial steel;
    PlaneStiffness stiffness;
    double[] exx;
    double[] eyy;
    double[] gxy;
    double[] sxx;
    double[] syy;
    double[] txy;
    double[][] q;

    @Setup
    public void setUp() {
        steel = IsotropicMaterial.of(Stress.ofGigapascals(200), 0.30);
        stiffness = steel.planeStressStiffness();
        exx = Signals.strain(size, 1200e-6, 0x5A);
        eyy = Signals.strain(size, -400e-6, 0x5B);
        gxy = Signals.strain(size, 600e-6, 0x5C);
        sxx = new double[size];
        syy = new double[size];
        txy = new double[size];
        q = stiffness.toMatrix();
    }

    @Benchmark
    public double[] floorNineMultiplyAdds() {
        double[] ex = exx;
        double[] ey = eyy;
        double[] g = gxy;
        double[] sx = sxx;
        double[] sy = syy;
        double[] t = txy;
        double a11 = q[0][0];
        double a12 = q[0][1];
        double a16 = q[0][2];
        double a22 = q[1][1];
        double a26 = q[1][2];
        double a66 = q[2][2];
        for (int i = 0; i < ex.length; i++) {
            double x = ex[i];
            double y = ey[i];
            double z = g[i];
            sx[i] = a11 * x + a12 * y + a16 * z;
            sy[i] = a12 * x + a22 * y + a26 * z;
            t[i] = a16 * x + a26 * y + a66 * z;
        }
        return sx;
    }

    @Benchmark
    public int planeStressBlock() {
        return stiffness.toStress(exx, eyy, gxy, 0, sxx, syy, txy, 0, size);
    }

    @Benchmark
    public double[] planeStressValueObjects() {
        for (int i = 0; i < size; i++) {
            PlaneStress s = steel.stressInPlaneStress(new PlaneStrain(exx[i], eyy[i], gxy[i]));
            sxx[i] = s.sxx();
            syy[i] = s.syy();
            txy[i] = s.txy();
        }
        return sxx;
    }
}
