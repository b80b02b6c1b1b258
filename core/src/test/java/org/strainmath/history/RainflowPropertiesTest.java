package org.strainmath.history;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.SplittableRandom;
import java.util.TreeMap;
import java.util.stream.IntStream;
import java.util.stream.Stream;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * Rainflow counts of seeded random histories against the brute-force references of
 * {@link RainflowReference} (the standard's steps on lists, Rychlik's definition), and the
 * invariants any rainflow count keeps. Three kinds of history: distinct values, small integers
 * (ties and plateaus), and a noisy sine with NaN and infinite samples.
 */
class RainflowPropertiesTest {

    static Stream<Arguments> histories() {
        return IntStream.range(0, 60).mapToObj(seed -> {
            SplittableRandom random = new SplittableRandom(1049L * 1000 + seed);
            int kind = seed % 3;
            int n = 2 + random.nextInt(400);
            double gate = seed % 2 == 0 ? 0.0 : (kind == 1 ? 1.0 : 0.4 + random.nextDouble());
            return Arguments.of(seed, kind, gate, RainflowReference.history(random, n, kind));
        });
    }

    @ParameterizedTest(name = "seed {0}, kind {1}, gate {2}")
    @MethodSource("histories")
    void turningPointsAreThoseOfTheDefinition(int seed, int kind, double gate, double[] x) {
        List<Double> expected = RainflowReference.turningPoints(x, gate);
        assertThat(TurningPoints.of(x, gate).values())
                .containsExactly(RainflowReference.toArray(expected));
        if (gate == 0) {
            assertThat(TurningPoints.of(x).values()).containsExactly(
                    RainflowReference.toArray(RainflowReference.strictTurningPoints(x)));
        }
        double[] tp = TurningPoints.of(x, gate).values();
        for (int i = 1; i < tp.length; i++) {
            assertThat(Math.abs(tp[i] - tp[i - 1])).as("step %d exceeds the gate", i)
                    .isGreaterThan(gate);
            if (i > 1) {
                assertThat((tp[i] - tp[i - 1]) * (tp[i - 1] - tp[i - 2])).as("alternates at %d", i)
                        .isNegative();
            }
        }
    }

    @ParameterizedTest(name = "seed {0}, kind {1}, gate {2}")
    @MethodSource("histories")
    void halfCycleResidueCountsAsTheStandardsStepsOnALists(int seed, int kind, double gate,
            double[] x) {
        List<double[]> expected = RainflowReference.astm544(
                RainflowReference.turningPoints(x, gate));
        assertThat(RainflowReference.cycles(Rainflow.astm().withGate(gate).count(x)))
                .containsExactlyElementsOf(expected);
    }

    @ParameterizedTest(name = "seed {0}, kind {1}, gate {2}")
    @MethodSource("histories")
    void repeatedResidueCountsAsTheSimplifiedMethodOnTheWholeHistory(int seed, int kind,
            double gate, double[] x) {
        // The closed cycles of one pass, then the residue closed, equal 5.4.3 on everything.
        List<double[]> expected = RainflowReference.astm543(
                RainflowReference.turningPoints(x, gate), gate);
        Cycles cycles = Rainflow.astm().withGate(gate).withResidue(Rainflow.Residue.REPEATED)
                .count(x);
        assertThat(RainflowReference.sortedPairs(RainflowReference.cycles(cycles)))
                .containsExactlyElementsOf(RainflowReference.sortedPairs(expected));
        assertThat(cycles.halfCycles()).isZero();
    }

    @ParameterizedTest(name = "seed {0}, kind {1}, gate {2}")
    @MethodSource("histories")
    void repeatedResidueMatchesRychliksDefinition(int seed, int kind, double gate, double[] x) {
        List<Double> tp = RainflowReference.turningPoints(x, 0);
        if (kind != 0 || gate != 0 || tp.size() < 3) {
            return;     // the definition as coded needs distinct values and no gate
        }
        Cycles cycles = Rainflow.astm().withResidue(Rainflow.Residue.REPEATED).count(x);
        List<Double> period = new ArrayList<>();
        for (double v : cyclic(tp)) {
            period.add(v);
        }
        List<double[]> rychlik = RainflowReference.rychlikRepeated(period);
        assertThat(RainflowReference.sortedPairs(RainflowReference.cycles(cycles)))
                .containsExactlyElementsOf(RainflowReference.sortedPairs(rychlik));
    }

    /**
     * The turning points as one period: rotated to begin at the largest value, closed by it,
     * and with the non-reversals at the old join removed (by strictTurningPoints), less the
     * closing point.
     */
    private static double[] cyclic(List<Double> tp) {
        int n = tp.size();
        int k = 0;
        for (int i = 1; i < n; i++) {
            if (tp.get(i) > tp.get(k)) {
                k = i;
            }
        }
        double[] p = new double[n + 1];
        for (int j = 0; j <= n; j++) {
            p[j] = tp.get((k + j) % n);
        }
        List<Double> strict = RainflowReference.strictTurningPoints(p);
        strict.remove(strict.size() - 1);
        return RainflowReference.toArray(strict);
    }

    @ParameterizedTest(name = "seed {0}, kind {1}, gate {2}")
    @MethodSource("histories")
    void threeAndFourPointFormsAgreeCycleForCycle(int seed, int kind, double gate, double[] x) {
        // ASTM 5.4.4 as written and the four-point form (closed cycles, then the residue's
        // ranges as half cycles) count the same cycles, pair of turning points by pair, once
        // half cycles on the same two points are added up (McInnes and Meehan, 2008,
        // "Equivalence of four-point and three-point rainflow cycle counting algorithms",
        // Int. J. Fatigue 30; from memory).
        List<Double> tp = RainflowReference.turningPoints(x, gate);
        Rainflow astm = Rainflow.astm().withGate(gate);
        assertThat(byPair(RainflowReference.cycles(astm.count(x))))
                .isEqualTo(byPair(RainflowReference.fourPoint(tp, true)));
        // The library's four-point pass (the residue discarded) is the reference's, in order.
        assertThat(RainflowReference.cycles(astm.withResidue(Rainflow.Residue.DISCARDED)
                .count(x))).containsExactlyElementsOf(RainflowReference.fourPoint(tp, false));
    }

    @ParameterizedTest(name = "seed {0}, kind {1}, gate {2}")
    @MethodSource("histories")
    void everyRangeBetweenTurningPointsIsCountedOnce(int seed, int kind, double gate,
            double[] x) {
        // A full cycle takes two ranges of the turning-point sequence, a half cycle one.
        Cycles cycles = Rainflow.astm().withGate(gate).count(x);
        int ranges = TurningPoints.of(x, gate).size() - 1;
        assertThat(2 * cycles.fullCycles() + cycles.halfCycles()).isEqualTo(ranges);
        assertThat(cycles.total()).isEqualTo(ranges / 2.0);
        assertThat(cycles.skipped()).isEqualTo(
                (int) java.util.Arrays.stream(x).filter(v -> !Double.isFinite(v)).count());
    }

    @ParameterizedTest(name = "seed {0}, kind {1}, gate {2}")
    @MethodSource("histories")
    void theResidueHasTheShapeItsFormLeaves(int seed, int kind, double gate, double[] x) {
        for (Rainflow.Residue residue : Rainflow.Residue.values()) {
            RainflowCounter counter = Rainflow.astm().withGate(gate).withResidue(residue)
                    .newCounter((f, t, c) -> { });
            counter.accept(x, 0, x.length);
            double[] r = counter.residue();
            for (int i = 2; i < r.length; i++) {
                double older = Math.abs(r[i - 1] - r[i - 2]);
                double newer = Math.abs(r[i] - r[i - 1]);
                if (residue == Rainflow.Residue.HALF_CYCLES) {
                    // strictly converging, oldest to newest (common practice, no source)
                    assertThat(newer).as("%s at %d", residue, i).isLessThan(older);
                } else if (i >= 3) {
                    // no inner range that both neighbours reach (it would have closed)
                    double oldest = Math.abs(r[i - 2] - r[i - 3]);
                    assertThat(newer >= older && oldest >= older).as("%s at %d", residue, i)
                            .isFalse();
                }
            }
            // and the byte form restores it
            RainflowCounter.fromBytes(counter.toBytes(), (f, t, c) -> { });
        }
    }

    @ParameterizedTest(name = "seed {0}, kind {1}, gate {2}")
    @MethodSource("histories")
    void levelCrossingsOfTheCountAreThoseOfTheSamples(int seed, int kind, double gate,
            double[] x) {
        if (gate != 0) {
            return;
        }
        double[] levels = {-60, -2.5, -1, 0, 0.5, 1, 3, 50};
        LevelCrossings crossings = LevelCrossings.of(levels);
        Rainflow.astm().count(x).forEach(crossings);
        // Brute force on the finite samples, in order: a rise from below L to L or above is an
        // upward crossing; a fall from L or above to below L a downward one (the definition).
        double[] finite = java.util.Arrays.stream(x).filter(Double::isFinite).toArray();
        double[] up = new double[levels.length];
        double[] down = new double[levels.length];
        for (int i = 1; i < finite.length; i++) {
            for (int k = 0; k < levels.length; k++) {
                if (finite[i - 1] < levels[k] && finite[i] >= levels[k]) {
                    up[k]++;
                }
                if (finite[i - 1] >= levels[k] && finite[i] < levels[k]) {
                    down[k]++;
                }
            }
        }
        assertThat(crossings.upCrossings()).containsExactly(up);
        assertThat(crossings.downCrossings()).containsExactly(down);
    }

    private static Map<String, Double> byPair(List<double[]> cycles) {
        Map<String, Double> map = new TreeMap<>();
        for (double[] c : cycles) {
            map.merge(key(c), c[2], Double::sum);
        }
        return map;
    }

    private static String key(double[] c) {
        return Math.min(c[0], c[1]) + ".." + Math.max(c[0], c[1]);
    }
}
