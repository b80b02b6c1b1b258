package org.strainmath.benchmarks;

import java.util.ArrayList;
import java.util.List;
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
import org.strainmath.fatigue.DamageSum;
import org.strainmath.fatigue.SnCurve;
import org.strainmath.fatigue.StressLife;
import org.strainmath.history.Bins;
import org.strainmath.history.Rainflow;
import org.strainmath.history.RainflowCounter;
import org.strainmath.history.RangeHistogram;
import org.strainmath.history.TurningPointFilter;
import org.strainmath.quantity.Stress;

/**
 * The streaming rainflow counter on a strain channel's signal (a load cycle per block, a
 * vibration of a tenth of it, 5 µε RMS of noise; seeded), fed block after block as a gateway
 * feeds it, beside:
 * <ul>
 *   <li>the floor: a loop that only finds the turning points through the same gate and sums
 *       them, and nothing else;
 *   <li>the library's turning-point filter alone, writing the turning points to an array;
 *   <li>the counter with a damage sum on an S–N curve behind the histogram (one power per
 *       cycle), on the same signal read as stress;
 *   <li>the path a user would otherwise write: the same count on an {@code ArrayList<Double>}
 *       of turning points, boxed, with removal from the list.
 * </ul>
 * {@code gate} is the hysteresis gate in m/m: 0 (every reversal of the noise is a turning
 * point, the worst case) and 20 µε (four times the noise, as a user would set it). Scores are
 * per block; samples/s is the score times {@code size}.
 */
@State(Scope.Thread)
@BenchmarkMode(Mode.Throughput)
@OutputTimeUnit(TimeUnit.SECONDS)
@Warmup(iterations = 5, time = 1)
@Measurement(iterations = 5, time = 1)
@Fork(1)
public class CycleCountingBenchmark {

    @Param({"64", "4096", "1048576"})
    public int size;

    @Param({"0", "0.00002"})
    public double gate;

    double[] signal;
    double[] stress;
    double[] turningPoints;
    RangeHistogram histogram;
    RainflowCounter counter;
    RainflowCounter damageCounter;
    DamageSum damage;
    TurningPointFilter filter;

    // the floor's and the list path's state, kept across blocks as the counter keeps its own
    int direction;
    double extreme;
    long found;
    final List<Double> residue = new ArrayList<>();

    @Setup
    public void setUp() {
        signal = Signals.strain(size, 800e-6, 0x17);
        stress = new double[size];
        for (int i = 0; i < size; i++) {
            stress[i] = 200e9 * signal[i];
        }
        turningPoints = new double[size];
        histogram = RangeHistogram.of(Bins.uniform(0, 2000e-6, 40));
        Rainflow rainflow = Rainflow.astm().withGate(gate);
        counter = rainflow.newCounter(histogram);
        damage = StressLife.of(SnCurve.ofRange(Stress.ofMegapascals(71), 2e6, 3)
                .withKnee(5e6, 5).withCutOffAt(1e8)).newDamageSum();
        RangeHistogram stressRanges = RangeHistogram.of(Bins.uniform(0, 400e6, 40));
        damageCounter = rainflow.withGate(200e9 * gate).newCounter(stressRanges.andThen(damage));
        filter = TurningPointFilter.withGate(gate);
        // the first sample is the start, the first turning point, as in the library
        direction = 0;
        extreme = signal[0];
        found = 1;
        residue.clear();
        residue.add(signal[0]);
    }

    /**
     * Finds the turning points through the gate and sums them: the floor. (The first block's
     * first sample, the start, is counted in {@code setUp}.)
     */
    @Benchmark
    public double floorTurningPoints() {
        double[] x = signal;
        double g = gate;
        int d = direction;
        double e = extreme;
        double sum = 0;
        long n = found;
        for (int i = 0; i < x.length; i++) {
            double v = x[i];
            if (d > 0) {
                if (v > e) {
                    e = v;
                } else if (e - v > g) {
                    sum += e;
                    n++;
                    e = v;
                    d = -1;
                }
            } else if (d < 0) {
                if (v < e) {
                    e = v;
                } else if (v - e > g) {
                    sum += e;
                    n++;
                    e = v;
                    d = 1;
                }
            } else if (Math.abs(v - e) > g) {
                // the first move past the gate from the start sets the direction
                d = v > e ? 1 : -1;
                e = v;
            }
        }
        direction = d;
        extreme = e;
        found = n;
        return sum;
    }

    @Benchmark
    public int turningPointFilter() {
        return filter.accept(signal, 0, turningPoints, 0, size);
    }

    @Benchmark
    public int counter() {
        return counter.accept(signal, 0, size);
    }

    @Benchmark
    public int counterWithDamage() {
        return damageCounter.accept(stress, 0, size);
    }

    /** The same turning points and the same count on a boxed list: what a user would write. */
    @Benchmark
    public double listBasedCount() {
        double[] x = signal;
        double g = gate;
        List<Double> p = residue;
        RangeHistogram h = histogram;
        for (int i = 0; i < x.length; i++) {
            double v = x[i];
            double tp = Double.NaN;
            if (direction > 0) {
                if (v > extreme) {
                    extreme = v;
                } else if (extreme - v > g) {
                    tp = extreme;
                    extreme = v;
                    direction = -1;
                }
            } else if (direction < 0) {
                if (v < extreme) {
                    extreme = v;
                } else if (v - extreme > g) {
                    tp = extreme;
                    extreme = v;
                    direction = 1;
                }
            } else if (Math.abs(v - extreme) > g) {
                direction = v > extreme ? 1 : -1;
                extreme = v;
            }
            if (tp == tp) {
                p.add(tp);
                while (p.size() >= 3) {
                    int n = p.size();
                    double rx = Math.abs(p.get(n - 1) - p.get(n - 2));
                    double ry = Math.abs(p.get(n - 2) - p.get(n - 3));
                    if (rx < ry) {
                        break;
                    }
                    if (n == 3) {
                        h.accept(p.get(0), p.get(1), 0.5);
                        p.remove(0);
                    } else {
                        h.accept(p.get(n - 3), p.get(n - 2), 1.0);
                        p.remove(n - 2);
                        p.remove(n - 3);
                    }
                }
            }
        }
        return h.total();
    }
}
