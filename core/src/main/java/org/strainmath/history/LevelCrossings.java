package org.strainmath.history;

import java.nio.ByteBuffer;
import java.util.Arrays;
import java.util.Objects;

import org.strainmath.internal.Format;
import org.strainmath.internal.StateBytes;

/**
 * Level-crossing counts (ASTM E1049-85, 5.1): for each of a set of levels, how often the history
 * crossed it upwards and downwards. A level L is crossed upwards by a rise from a value below L
 * to one at or above it (a &lt; L ≤ b), downwards by a fall from at or above L to below it.
 *
 * <p>Fed with the cycles of a rainflow count, as a {@link CycleConsumer}: each full cycle
 * crosses every level inside its range once upwards and once downwards, each half cycle once in
 * its own direction. Rainflow counting removes each closed loop from inside the span of its
 * neighbours, so these counts, fed with the residue as half cycles
 * ({@link Rainflow.Residue#HALF_CYCLES}), equal the crossings of the history's turning points
 * themselves: with a gate of 0, those of the samples.
 *
 * <pre>
 *   LevelCrossings crossings = LevelCrossings.of(-500e-6, 0, 500e-6);
 *   Rainflow.astm().count(history).forEach(crossings);
 *   crossings.upCrossings();              // per level
 *   crossings.countsAbout(0);             // ASTM E1049 5.1.1: up above 0, down below it
 * </pre>
 * An entry of {@link Cycles#of} with a count other than 0.5 stands for that many full cycles.
 *
 * <p>Byte form ({@link #toBytes}): tag {@code SMLC}, version, the levels, the upward and the
 * downward counts (each as a length and doubles), big-endian.
 *
 * <p>Mutable: a streaming accumulator, not thread-safe. {@link #accept} neither allocates nor
 * throws.
 */
public final class LevelCrossings implements CycleConsumer {

    private static final String TAG = "SMLC";

    private final double[] levels;
    private final double[] up;
    private final double[] down;

    private LevelCrossings(double[] levels, double[] up, double[] down) {
        this.levels = levels;
        this.up = up;
        this.down = down;
    }

    /**
     * No crossings yet of the given levels.
     *
     * @throws NullPointerException     if {@code levels} is null
     * @throws IllegalArgumentException if there is no level, or a level is not finite or not
     *                                  greater than the one before it
     */
    public static LevelCrossings of(double... levels) {
        Objects.requireNonNull(levels, "levels");
        double[] copy = checked(levels.clone());
        return new LevelCrossings(copy, new double[copy.length], new double[copy.length]);
    }

    private static double[] checked(double[] levels) {
        return Bins.increasing(levels, 1, "levels");
    }

    /** Adds the crossings of one cycle (see the class comment). */
    @Override
    public void accept(double from, double to, double count) {
        double low = Math.min(from, to);
        double high = Math.max(from, to);
        // levels with low < L <= high
        int first = firstAbove(low);
        int end = firstAbove(high);
        if (count == 0.5) {
            double[] side = to > from ? up : down;
            for (int k = first; k < end; k++) {
                side[k] += 1;
            }
        } else {
            for (int k = first; k < end; k++) {
                up[k] += count;
                down[k] += count;
            }
        }
    }

    /** The index of the first level greater than x (levels.length if none, 0 for NaN). */
    private int firstAbove(double x) {
        int lo = 0;
        int hi = levels.length;
        while (lo < hi) {
            int mid = (lo + hi) >>> 1;
            if (levels[mid] <= x) {
                lo = mid + 1;
            } else {
                hi = mid;
            }
        }
        return lo;
    }

    /**
     * Adds the crossings of {@code other} to these.
     *
     * @throws NullPointerException     if {@code other} is null
     * @throws IllegalArgumentException if the levels differ
     */
    public void addAll(LevelCrossings other) {
        Objects.requireNonNull(other, "other");
        if (!Arrays.equals(other.levels, levels)) {
            throw new IllegalArgumentException("other must have the levels "
                    + Arrays.toString(levels) + ": " + Arrays.toString(other.levels));
        }
        for (int i = 0; i < levels.length; i++) {
            up[i] += other.up[i];
            down[i] += other.down[i];
        }
    }

    /** The levels, a copy. */
    public double[] levels() {
        return levels.clone();
    }

    /** The upward crossings per level, a copy. */
    public double[] upCrossings() {
        return up.clone();
    }

    /** The downward crossings per level, a copy. */
    public double[] downCrossings() {
        return down.clone();
    }

    /**
     * The counts of ASTM E1049-85, 5.1.1, about {@code reference}: per level, the upward
     * crossings of a level at or above the reference and the downward crossings of a level
     * below it.
     *
     * @throws IllegalArgumentException if {@code reference} is not finite
     */
    public double[] countsAbout(double reference) {
        if (!Double.isFinite(reference)) {
            throw new IllegalArgumentException("reference must be finite: " + reference);
        }
        double[] counts = new double[levels.length];
        for (int i = 0; i < levels.length; i++) {
            counts[i] = levels[i] >= reference ? up[i] : down[i];
        }
        return counts;
    }

    /** The compact byte form (see the class comment). */
    public byte[] toBytes() {
        int n = levels.length;
        ByteBuffer b = StateBytes.writer(TAG, 3 * StateBytes.doublesSize(n));
        StateBytes.putDoubles(b, levels);
        StateBytes.putDoubles(b, up);
        StateBytes.putDoubles(b, down);
        return b.array();
    }

    /**
     * The crossings {@link #toBytes} wrote.
     *
     * @throws NullPointerException     if {@code state} is null
     * @throws IllegalArgumentException if {@code state} is not such a form
     */
    public static LevelCrossings fromBytes(byte[] state) {
        ByteBuffer b = StateBytes.reader(state, TAG);
        double[] levels = StateBytes.getDoubles(b, Double.NEGATIVE_INFINITY, "levels");
        try {
            checked(levels);
        } catch (IllegalArgumentException e) {
            throw new IllegalArgumentException("state must hold valid levels: " + e.getMessage(),
                    e);
        }
        double[] up = BinBytes.counts(b, levels.length, "upward crossings");
        double[] down = BinBytes.counts(b, levels.length, "downward crossings");
        StateBytes.end(b);
        return new LevelCrossings(levels, up, down);
    }

    /** {@code LevelCrossings[3 levels from -5.0e-4 to 5.0e-4, 12.0 up, 12.0 down]}. */
    @Override
    public String toString() {
        return "LevelCrossings[" + levels.length + (levels.length == 1 ? " level at "
                : " levels from ") + Format.number(levels[0])
                + (levels.length == 1 ? "" : " to " + Format.number(levels[levels.length - 1]))
                + ", " + Format.number(Sums.compensated(up)) + " up, "
                + Format.number(Sums.compensated(down)) + " down]";
    }
}
