package org.strainmath.history;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.util.SplittableRandom;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/** Bins, the histograms of a count, level crossings, and their byte forms. */
class HistogramsTest {

    /** The standard's example history (ASTM E1049-85, points A to I; from memory). */
    private static final double[] ASTM = {-2, 1, -3, 5, -1, 3, -4, 4, -2};

    @Test
    void binsHoldTheirLowerEdgeAndTheLastBinItsUpperEdge() {
        // By hand: bins of width 2 from 0 to 10; each bin holds its lower edge, the last also its
        // upper edge.
        Bins uniform = Bins.uniform(0, 10, 5);
        assertThat(uniform.edges()).containsExactly(0, 2, 4, 6, 8, 10);
        assertThat(uniform.indexOf(0)).isZero();
        assertThat(uniform.indexOf(1.999)).isZero();
        assertThat(uniform.indexOf(2)).isEqualTo(1);
        assertThat(uniform.indexOf(10)).isEqualTo(4);
        assertThat(uniform.indexOf(10.000001)).isEqualTo(-1);
        assertThat(uniform.indexOf(-0.0)).isZero();
        assertThat(uniform.indexOf(Double.NaN)).isEqualTo(-1);
        assertThat(uniform.centre(2)).isEqualTo(5.0);
        Bins edges = Bins.ofEdges(-1, 0, 0.5, 3);
        assertThat(edges.indexOf(-1)).isZero();
        assertThat(edges.indexOf(0)).isEqualTo(1);
        assertThat(edges.indexOf(0.49)).isEqualTo(1);
        assertThat(edges.indexOf(3)).isEqualTo(2);
        assertThat(edges.indexOf(Double.NEGATIVE_INFINITY)).isEqualTo(-1);
        assertThat(uniform).hasToString("Bins[5 from 0.0 to 10.0]");
        assertThat(edges).hasToString("Bins[edges -1.0, 0.0, 0.5, 3.0]");
        assertThat(Bins.ofEdges(0, 2, 4, 6, 8, 10)).isEqualTo(uniform).hasSameHashCodeAs(uniform);
    }

    @ParameterizedTest
    @ValueSource(ints = {1, 3, 7, 10, 20, 64, 1000})
    void uniformBinsFindTheBinTheEdgesSay(int count) {
        // Every uniform lookup agrees with a plain search over the same edges (definition).
        SplittableRandom random = new SplittableRandom(count);
        Bins bins = Bins.uniform(-0.37, 1.91, count);
        double[] e = bins.edges();
        for (int k = 0; k < 2000; k++) {
            double x = k < e.length ? e[k] : -0.5 + 2.6 * random.nextDouble();
            int expected = -1;
            for (int i = 0; i + 1 < e.length; i++) {
                if (x >= e[i] && (x < e[i + 1] || (i + 2 == e.length && x == e[i + 1]))) {
                    expected = i;
                }
            }
            assertThat(bins.indexOf(x)).as("x = %s", x).isEqualTo(expected);
        }
    }

    @Test
    void badBinsAreRefusedWithTheValue() {
        assertThatThrownBy(() -> Bins.ofEdges(1)).isInstanceOf(IllegalArgumentException.class)
                .hasMessage("edges must hold at least 2 values: 1");
        assertThatThrownBy(() -> Bins.ofEdges(0, 1, 1))
                .hasMessage("edges must be strictly increasing: edges[2] = 1.0 after 1.0");
        assertThatThrownBy(() -> Bins.ofEdges(0, Double.NaN))
                .hasMessage("edges must be finite: edges[1] = NaN");
        assertThatThrownBy(() -> Bins.ofEdges(0, Double.POSITIVE_INFINITY))
                .hasMessage("edges must be finite: edges[1] = Infinity");
        assertThatThrownBy(() -> Bins.ofEdges((double[]) null))
                .isInstanceOf(NullPointerException.class).hasMessage("edges");
        assertThatThrownBy(() -> Bins.uniform(0, 0, 3)).hasMessage("high must be finite and > low (0.0): 0.0");
        assertThatThrownBy(() -> Bins.uniform(Double.NaN, 1, 3)).hasMessage("low must be finite: NaN");
        assertThatThrownBy(() -> Bins.uniform(0, Double.POSITIVE_INFINITY, 3))
                .hasMessage("high must be finite and > low (0.0): Infinity");
        assertThatThrownBy(() -> Bins.uniform(0, 1, 0)).hasMessage("count must be >= 1: 0");
        assertThatThrownBy(() -> Bins.uniform(1, Math.nextUp(1.0), 4))
                .hasMessageStartingWith("count must leave the edges distinct");
    }

    @Test
    void theRangeHistogramOfTheStandardsExampleIsTable4() {
        // ASTM E1049-85 Table 4 (from memory): 3: 0.5, 4: 1.5, 6: 0.5, 8: 1.0, 9: 0.5.
        RangeHistogram h = Rainflow.astm().count(ASTM).rangeHistogram(Bins.uniform(0.5, 10.5, 10));
        assertThat(h.counts()).containsExactly(0, 0, 0.5, 1.5, 0, 0.5, 0, 1.0, 0.5, 0);
        assertThat(h.total()).isEqualTo(4.0);
        assertThat(h.outside()).isZero();
        assertThat(h).hasToString("RangeHistogram[Bins[10 from 0.5 to 10.5], 4.0 cycles, 0.0 outside]");
    }

    @Test
    void theMatricesPutEachCycleInItsCell() {
        Cycles cycles = Rainflow.astm().count(ASTM);
        RangeMeanMatrix rm = cycles.rangeMeanMatrix(Bins.uniform(0, 10, 10), Bins.uniform(-2, 2, 4));
        // By hand: E-F is range 4 about 1 → row 4, column 3; D-G range 9 about 0.5 → row 9, col 2;
        // A-B range 3 about -0.5 → row 3, column 1; H-I range 6 about 1 → row 6, column 3.
        assertThat(rm.count(4, 3)).isEqualTo(1.0);
        assertThat(rm.count(9, 2)).isEqualTo(0.5);
        assertThat(rm.count(3, 1)).isEqualTo(0.5);
        assertThat(rm.count(6, 3)).isEqualTo(0.5);
        assertThat(rm.rangeCounts()).containsExactly(
                cycles.rangeHistogram(Bins.uniform(0, 10, 10)).counts());
        assertThat(rm.total()).isEqualTo(4.0);
        FromToMatrix ft = cycles.fromToMatrix(Bins.uniform(-5, 5, 10));
        // E-F from -1 (bin 4) to 3 (bin 8); D-G from 5 (bin 9, the closed top) to -4 (bin 1)
        assertThat(ft.count(4, 8)).isEqualTo(1.0);
        assertThat(ft.count(9, 1)).isEqualTo(0.5);
        assertThat(ft.total()).isEqualTo(4.0);
        double[][] rows = ft.counts();
        assertThat(rows[4][8]).isEqualTo(1.0);
    }

    @Test
    void batchBinsMustCoverTheCountAndStreamingTalliesWhatFallsOutside() {
        // ASTM E1049-85 §5.4.4 example (as in RainflowAstmExampleTest): of its 4 cycles, the half
        // cycle of range 9 lies outside bins up to 8.
        Cycles cycles = Rainflow.astm().count(ASTM);
        assertThatThrownBy(() -> cycles.rangeHistogram(Bins.uniform(0, 8, 8)))
                .isInstanceOf(IllegalArgumentException.class)
                .hasMessage("ranges must cover every cycle: range 9.0 of cycle 4 lies outside"
                        + " Bins[8 from 0.0 to 8.0]");
        assertThatThrownBy(() -> cycles.rangeMeanMatrix(Bins.uniform(0, 10, 10), Bins.uniform(0, 2, 2)))
                .hasMessage("means must cover every cycle: mean -0.5 of cycle 0 lies outside"
                        + " Bins[2 from 0.0 to 2.0]");
        assertThatThrownBy(() -> cycles.fromToMatrix(Bins.uniform(-3, 3, 6)))
                .hasMessage("levels must cover every cycle: to 5.0 of cycle 3 lies outside"
                        + " Bins[6 from -3.0 to 3.0]");
        RangeHistogram streamed = RangeHistogram.of(Bins.uniform(0, 8, 8));
        cycles.forEach(streamed);
        assertThat(streamed.outside()).isEqualTo(0.5);
        assertThat(streamed.total()).isEqualTo(3.5);
    }

    @Test
    void everyAccumulatorRestoresFromItsBytes() {
        Cycles cycles = Rainflow.astm().count(RainflowReference.history(new SplittableRandom(3), 500, 0));
        RangeHistogram h = RangeHistogram.of(Bins.uniform(0, 3, 12));
        RangeMeanMatrix rm = RangeMeanMatrix.of(Bins.ofEdges(0, 0.5, 1, 4), Bins.uniform(-20, 20, 16));
        FromToMatrix ft = FromToMatrix.of(Bins.uniform(-20, 20, 8));
        LevelCrossings lc = LevelCrossings.of(-5, 0, 5);
        cycles.forEach(h.andThen(rm).andThen(ft).andThen(lc));
        assertThat(RangeHistogram.fromBytes(h.toBytes()).toBytes()).isEqualTo(h.toBytes());
        assertThat(RangeHistogram.fromBytes(h.toBytes()).counts()).containsExactly(h.counts());
        assertThat(RangeMeanMatrix.fromBytes(rm.toBytes()).counts()).isDeepEqualTo(rm.counts());
        assertThat(FromToMatrix.fromBytes(ft.toBytes()).counts()).isDeepEqualTo(ft.counts());
        assertThat(LevelCrossings.fromBytes(lc.toBytes()).upCrossings())
                .containsExactly(lc.upCrossings());
        assertThat(RangeHistogram.fromBytes(h.toBytes()).bins()).isEqualTo(h.bins());
        assertThatThrownBy(() -> RangeHistogram.fromBytes(rm.toBytes()))
                .isInstanceOf(IllegalArgumentException.class)
                .hasMessage("state must begin with the tag SMRH: SMRM");
        byte[] negative = h.toBytes();
        java.nio.ByteBuffer.wrap(negative).putDouble(negative.length - 16, -1.0);
        assertThatThrownBy(() -> RangeHistogram.fromBytes(negative))
                .hasMessage("state must hold a finite counts >= 0.0: -1.0");
    }

    @Test
    void histogramsOfTwoPartsAddUp() {
        // By hand: 1 + 0.5 cycles of range 3 in bin 3; the range 12 lies outside bins up to 10.
        RangeHistogram a = RangeHistogram.of(Bins.uniform(0, 10, 10));
        RangeHistogram b = RangeHistogram.of(Bins.uniform(0, 10, 10));
        a.accept(0, 3, 1);
        b.accept(0, 3, 0.5);
        b.accept(0, 12, 1);
        a.addAll(b);
        assertThat(a.count(3)).isEqualTo(1.5);
        assertThat(a.outside()).isEqualTo(1);
        assertThatThrownBy(() -> a.addAll(RangeHistogram.of(Bins.uniform(0, 10, 5))))
                .hasMessage("other must have the bins Bins[10 from 0.0 to 10.0]: Bins[5 from 0.0 to 10.0]");
    }

    @Test
    void matricesAndCrossingsOfTwoPartsAddUp() {
        // By hand: bins of width 1; the cell each cycle falls in, what lies outside, and the sum
        // of two parts.
        Bins ranges = Bins.uniform(0, 10, 10);
        Bins means = Bins.uniform(-5, 5, 10);
        RangeMeanMatrix a = RangeMeanMatrix.of(ranges, means);
        RangeMeanMatrix b = RangeMeanMatrix.of(ranges, means);
        a.accept(-1, 3, 1);        // range 4 (row 4) about 1 (column 6)
        b.accept(-1, 3, 0.5);
        b.accept(0, 12, 1);        // range 12: outside
        b.accept(8, 9, 0.5);       // mean 8.5: outside
        a.addAll(b);
        assertThat(a.count(4, 6)).isEqualTo(1.5);
        assertThat(a.total()).isEqualTo(1.5);
        assertThat(a.outside()).isEqualTo(1.5);
        assertThat(a.ranges()).isEqualTo(ranges);
        assertThat(a.means()).isEqualTo(means);
        assertThatThrownBy(() -> a.addAll(RangeMeanMatrix.of(ranges, Bins.uniform(-5, 5, 5))))
                .isInstanceOf(IllegalArgumentException.class);

        FromToMatrix f = FromToMatrix.of(means);
        FromToMatrix g = FromToMatrix.of(means);
        f.accept(-1, 3, 1);        // from bin 4 to bin 8
        g.accept(-1, 3, 0.5);
        g.accept(-6, 3, 1);        // from -6: outside
        f.addAll(g);
        assertThat(f.count(4, 8)).isEqualTo(1.5);
        assertThat(f.total()).isEqualTo(1.5);
        assertThat(f.outside()).isEqualTo(1.0);
        assertThat(f.levels()).isEqualTo(means);
        assertThatThrownBy(() -> f.addAll(FromToMatrix.of(Bins.uniform(-5, 5, 5))))
                .isInstanceOf(IllegalArgumentException.class);

        // A rising half cycle from -1 to 3 crosses 0 and 2 upwards once; a full cycle between
        // -3 and 1 crosses -2 and 0 once each way.
        LevelCrossings up = LevelCrossings.of(-2, 0, 2);
        LevelCrossings more = LevelCrossings.of(-2, 0, 2);
        up.accept(-1, 3, 0.5);
        more.accept(-3, 1, 1);
        up.addAll(more);
        assertThat(up.upCrossings()).containsExactly(1, 2, 1);
        assertThat(up.downCrossings()).containsExactly(1, 1, 0);
        assertThat(up.levels()).containsExactly(-2, 0, 2);
        // about 0 (the class comment's rule): upward crossings at and above it, downward below
        assertThat(up.countsAbout(0)).containsExactly(1, 2, 1);
        assertThat(up.countsAbout(0.5)).containsExactly(1, 1, 1);
        assertThatThrownBy(() -> up.addAll(LevelCrossings.of(-2, 0, 3)))
                .isInstanceOf(IllegalArgumentException.class);
    }

    @Test
    void equivalentRangesByHand() {
        // By hand: 10⁵ cycles of 100 and 10⁶ of 50, m = 3: Σ n·S³ = 10¹¹ + 1.25·10¹¹ =
        // 2.25·10¹¹; over 1.1·10⁶ cycles S_eq = (204 545.45...)^(1/3) = 58.946...; at 2·10⁶
        // cycles (112 500)^(1/3) = 48.27...
        Cycles spectrum = Cycles.of(new double[] {0, 0}, new double[] {100, 50},
                new double[] {1e5, 1e6});
        assertThat(spectrum.equivalentRange(3)).isCloseTo(Math.cbrt(2.25e11 / 1.1e6), within(1e-12));
        assertThat(spectrum.equivalentRange(3, 2e6)).isCloseTo(Math.cbrt(112_500.0), within(1e-12));
        // a constant-amplitude spectrum is its own equivalent, for any m (definition)
        Cycles constant = Cycles.of(new double[] {1, -1}, new double[] {-1, 1}, new double[] {3, 4});
        assertThat(constant.equivalentRange(5.5)).isCloseTo(2.0, within(1e-15));
        // the histogram's estimate from bin centres is within half a bin of the exact value
        RangeHistogram h = spectrum.rangeHistogram(Bins.uniform(0, 120, 24));
        assertThat(h.equivalentRange(3)).isCloseTo(spectrum.equivalentRange(3), within(2.5));
        assertThatThrownBy(() -> spectrum.equivalentRange(0)).hasMessage("m must be > 0 and finite: 0.0");
        assertThatThrownBy(() -> spectrum.equivalentRange(Double.NaN)).hasMessage("m must be > 0 and finite: NaN");
        assertThatThrownBy(() -> spectrum.equivalentRange(3, Double.POSITIVE_INFINITY))
                .hasMessage("referenceCycles must be > 0 and finite: Infinity");
        assertThatThrownBy(() -> Rainflow.astm().count(new double[] {1}).equivalentRange(3))
                .hasMessage("cycles must not be empty: 0 cycles");
        // ranges up to 10³⁰⁰ with m = 8 neither overflow nor lose the answer
        Cycles huge = Cycles.of(new double[] {0}, new double[] {1e300}, new double[] {2});
        assertThat(huge.equivalentRange(8)).isEqualTo(1e300);
    }

    @Test
    void levelCrossingsAboutAReferenceAreTheStandardsCounts() {
        // ASTM E1049-85 5.1.1: above the reference, upward crossings; below it, downward ones.
        LevelCrossings lc = LevelCrossings.of(-3, -1, 0, 2, 4);
        Rainflow.astm().count(ASTM).forEach(lc);
        // By hand on A..I (-2, 1, -3, 5, -1, 3, -4, 4, -2): rises A-B, C-D, E-F, G-H cross
        // L upward when a < L <= b; falls B-C, D-E, F-G, H-I downward when b < L <= a.
        // Up: L=-3 G-H; -1 A-B C-D G-H; 0 all four; 2 C-D E-F G-H; 4 C-D G-H.
        // Down: L=-3 F-G; -1 B-C F-G H-I; 0 all four; 2 D-E F-G H-I; 4 D-E H-I.
        assertThat(lc.countsAbout(0)).containsExactly(1, 3, 4, 3, 2);
        assertThat(lc.upCrossings()).containsExactly(1, 3, 4, 3, 2);
        assertThat(lc.downCrossings()).containsExactly(1, 3, 4, 3, 2);
        assertThatThrownBy(() -> lc.countsAbout(Double.NaN)).hasMessage("reference must be finite: NaN");
        assertThatThrownBy(() -> LevelCrossings.of()).hasMessage("levels must hold at least 1 value: 0");
        assertThatThrownBy(() -> LevelCrossings.of(0, 0))
                .hasMessage("levels must be strictly increasing: levels[1] = 0.0 after 0.0");
        assertThat(lc).hasToString("LevelCrossings[5 levels from -3.0 to 4.0, 13.0 up, 13.0 down]");
    }

    @Test
    void cyclesGivenByHandAreValidated() {
        // Definition: range = |to − from| = 8, mean = (from + to)/2 = 1, amplitude = range/2 = 4.
        assertThatThrownBy(() -> Cycles.of(new double[1], new double[2], new double[1]))
                .hasMessage("to and counts must have the length of from (1): 2 and 1");
        assertThatThrownBy(() -> Cycles.of(new double[] {0}, new double[] {1}, new double[] {0}))
                .hasMessage("counts[0] must be > 0 and finite: 0.0");
        assertThatThrownBy(() -> Cycles.of(new double[] {Double.NaN}, new double[] {1}, new double[] {1}))
                .hasMessage("from[0] must be finite: NaN");
        assertThatThrownBy(() -> new Cycle(0, Double.POSITIVE_INFINITY, 1))
                .hasMessage("to must be finite: Infinity");
        Cycle c = new Cycle(-3, 5, 0.5);
        assertThat(c.range()).isEqualTo(8);
        assertThat(c.mean()).isEqualTo(1);
        assertThat(c.amplitude()).isEqualTo(4);
        assertThat(c.isHalf()).isTrue();
    }
}
