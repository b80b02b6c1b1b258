package org.strainmath.calibration;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.SplittableRandom;
import java.util.concurrent.Callable;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.TimeUnit;

import org.junit.jupiter.api.Test;
import org.strainmath.bridge.AdcInput;
import org.strainmath.bridge.Bridge;
import org.strainmath.bridge.StrainChannel;
import org.strainmath.bridge.StrainGauge;
import org.strainmath.bridge.ThermalOutput;
import org.strainmath.material.IsotropicMaterial;
import org.strainmath.material.PlaneStiffness;
import org.strainmath.quantity.Resistance;
import org.strainmath.quantity.Stress;
import org.strainmath.quantity.Temperature;
import org.strainmath.rosette.Rosette;

/**
 * Configured objects are immutable and shared: a channel, a rosette with its material, a
 * stiffness and a fit are used by eight threads at once, each converting its own blocks, and
 * every output must equal the single-threaded result bit for bit. A second part pins a few
 * outputs as exact doubles, so that a run on another JDK (CI runs JDK 17 and 25) or a change
 * that moves a bit is noticed: the pinned values are this library's own results (regression
 * values, no outside source), taken on JDK 17; the paths they cover use only IEEE arithmetic,
 * Math.sqrt (correctly rounded on every JDK) and StrictMath.
 */
class SharedConfigurationTest {

    private static final int THREADS = 8;
    private static final int N = 3 * 2048 + 17;

    private static final StrainChannel CHANNEL = StrainChannel.of(
            Bridge.quarter(StrainGauge.ofOhms(350, 2.08).withTransverseSensitivity(0.006))
                    .withThreeWireLeads(Resistance.ofOhms(1.7)),
            AdcInput.ratiometric(24, 128)).withTransverseCorrection(-0.29).zeroedByOffsetAt(-2140)
            .withThermalOutput(ThermalOutput.ofCelsius(-28.4, 2.05, -0.047, 1.6e-4),
                    Temperature.ofCelsius(22));
    private static final IsotropicMaterial STEEL =
            IsotropicMaterial.of(Stress.ofGigapascals(200), 0.29);
    private static final Rosette ROSETTE = Rosette.rectangular().withMaterial(STEEL);
    private static final PlaneStiffness STIFFNESS = STEEL.planeStressStiffness();
    private static final FitResult FIT = CalibrationFit.of(
            new double[] {0, 100, 200, 300, 400, 500, 600, 700, 800, 900, 1000},
            new double[] {0.0012, 0.2003, 0.4011, 0.6001, 0.8013, 1.0006, 1.2018, 1.4004,
                1.6021, 1.8009, 2.0022})
            .withDegree(2).fit();

    /** Everything one thread computes from the shared objects, concatenated. */
    private static double[] work(long seed) {
        SplittableRandom random = new SplittableRandom(seed);
        int[] codes = new int[N];
        double[] celsius = new double[N];
        double[][] readings = new double[3][N];
        for (int i = 0; i < N; i++) {
            // most codes within the proven range, some at the rails (NaN, counted)
            codes[i] = i % 997 == 0 ? (1 << 23) - 1 : random.nextInt(-(1 << 22), 1 << 22);
            celsius[i] = random.nextDouble(-40, 120);
            for (int g = 0; g < 3; g++) {
                readings[g][i] = random.nextDouble(-2e-3, 2e-3);
            }
        }
        double[] strain = new double[N];
        double[] e1 = new double[N];
        double[] e2 = new double[N];
        double[] vonMises = new double[N];
        double[] angle = new double[N];
        double[] sxx = new double[N];
        double[] syy = new double[N];
        double[] txy = new double[N];
        double nan = CHANNEL.toStrain(codes, 0, celsius, 0, strain, 0, N);
        nan += ROSETTE.toPrincipalStrainsAndVonMises(readings, 0, e1, e2, vonMises, 0, N);
        nan += ROSETTE.toPrincipalAngles(readings, 0, angle, 0, N);
        nan += STIFFNESS.toStress(readings[0], readings[1], readings[2], 0, sxx, syy, txy, 0, N);
        double[] loads = new double[64];
        for (int i = 0; i < loads.length; i++) {
            loads[i] = FIT.loadAt(random.nextDouble(0.01, 2.0));
        }
        List<double[]> parts = List.of(new double[] {nan}, strain, e1, e2, vonMises, angle, sxx,
                syy, txy, loads);
        double[] all = new double[parts.stream().mapToInt(p -> p.length).sum()];
        int at = 0;
        for (double[] p : parts) {
            System.arraycopy(p, 0, all, at, p.length);
            at += p.length;
        }
        return all;
    }

    @Test
    void eightThreadsOnSharedConfigurationGiveTheSingleThreadedBits() throws Exception {
        double[][] expected = new double[THREADS][];
        for (int t = 0; t < THREADS; t++) {
            expected[t] = work(100 + t);
        }
        assertThat(expected[0][0]).as("rails give counted NaN").isPositive();
        ExecutorService pool = Executors.newFixedThreadPool(THREADS);
        try {
            for (int round = 0; round < 4; round++) {
                CountDownLatch start = new CountDownLatch(1);
                List<Future<double[]>> results = new ArrayList<>();
                for (int t = 0; t < THREADS; t++) {
                    long seed = 100 + t;
                    Callable<double[]> task = () -> {
                        start.await();
                        return work(seed);
                    };
                    results.add(pool.submit(task));
                }
                start.countDown();
                for (int t = 0; t < THREADS; t++) {
                    double[] got = results.get(t).get(60, TimeUnit.SECONDS);
                    assertThat(Arrays.equals(got, expected[t]))
                            .as("round %d, thread %d", round, t).isTrue();
                }
            }
        } finally {
            pool.shutdownNow();
        }
    }

    @Test
    void pinnedOutputsAreTheSameOnEveryRunAndJdk() {
        double[] first = work(7);
        assertThat(work(7)).isEqualTo(first);
        assertThat(bits(CHANNEL.toStrain(1_234_567, 48.5))).isEqualTo("0x1.268b53e2f6a74p-9");
        assertThat(bits(ROSETTE.reduceMicrostrain(640, 515, -180).principal().e1().value()))
                .isEqualTo("0x1.7e604882484b2p-11");
        assertThat(bits(ROSETTE.reduceMicrostrain(640, 515, -180).principal().angle()
                .orElseThrow().toRadians())).isEqualTo("0x1.3702fa74fa46p-2");
        assertThat(bits(FIT.coefficients()[1])).isEqualTo("0x1.0601289cd1b9ep-9");
        assertThat(bits(FIT.loadAt(1.0))).isEqualTo("0x1.f38f6cbd28076p8");
        assertThat(Integer.toHexString(Arrays.hashCode(first))).isEqualTo("7e46a08f");
    }

    private static String bits(double x) {
        return Double.toHexString(x);
    }
}
