package org.strainmath.history;

import java.nio.ByteBuffer;
import java.util.Objects;

import org.strainmath.internal.Format;
import org.strainmath.internal.StateBytes;

/**
 * The from–to matrix of a count: the number of cycles (a half cycle counts 0.5) whose first
 * turning point lies in level bin {@code i} and whose second lies in level bin {@code j}. Unlike
 * the range–mean matrix it keeps the direction of each cycle: one that starts at a valley
 * (from &lt; to) lies above the diagonal, one that starts at a peak below it. Cycles with a
 * turning point outside the bins are tallied in {@link #outside()}.
 *
 * <pre>
 *   FromToMatrix matrix = FromToMatrix.of(Bins.uniform(-1000e-6, 1000e-6, 16));
 *   matrix.count(3, 12);       // cycles from level bin 3 to level bin 12
 * </pre>
 *
 * <p>Byte form ({@link #toBytes}): tag {@code SMFT}, version, the level bins, the counts row by
 * row (one row per "from" bin) and the outside tally, big-endian.
 *
 * <p>Mutable: a streaming accumulator, not thread-safe. {@link #accept} neither allocates nor
 * throws.
 */
public final class FromToMatrix implements CycleConsumer {

    private static final String TAG = "SMFT";

    private final Bins levels;
    private final double[] counts;
    private double outside;

    private FromToMatrix(Bins levels, double[] counts, double outside) {
        this.levels = levels;
        this.counts = counts;
        this.outside = outside;
    }

    /**
     * An empty matrix over {@code levels} on both axes.
     *
     * @throws NullPointerException if {@code levels} is null
     */
    public static FromToMatrix of(Bins levels) {
        Objects.requireNonNull(levels, "levels");
        return new FromToMatrix(levels, new double[levels.count() * levels.count()], 0);
    }

    /** Adds {@code count} to the cell of the cycle's two turning points, or to the outside tally. */
    @Override
    public void accept(double from, double to, double count) {
        int f = levels.indexOf(from);
        int t = levels.indexOf(to);
        if (f < 0 || t < 0) {
            outside += count;
        } else {
            counts[f * levels.count() + t] += count;
        }
    }

    /**
     * Adds the counts of {@code other} to this one.
     *
     * @throws NullPointerException     if {@code other} is null
     * @throws IllegalArgumentException if the bins differ
     */
    public void addAll(FromToMatrix other) {
        Objects.requireNonNull(other, "other");
        if (!other.levels.equals(levels)) {
            throw new IllegalArgumentException("other must have the bins " + levels + ": "
                    + other.levels);
        }
        for (int i = 0; i < counts.length; i++) {
            counts[i] += other.counts[i];
        }
        outside += other.outside;
    }

    /** The level bins of both axes. */
    public Bins levels() {
        return levels;
    }

    /** The cycles from level bin {@code from} to level bin {@code to}. */
    public double count(int from, int to) {
        Objects.checkIndex(from, levels.count());
        Objects.checkIndex(to, levels.count());
        return counts[from * levels.count() + to];
    }

    /** The counts, one row per "from" bin, a copy. */
    public double[][] counts() {
        int n = levels.count();
        double[][] rows = new double[n][n];
        for (int r = 0; r < n; r++) {
            System.arraycopy(counts, r * n, rows[r], 0, n);
        }
        return rows;
    }

    /** The cycles inside the bins. */
    public double total() {
        return Sums.compensated(counts);
    }

    /** The cycles with a turning point outside the bins. */
    public double outside() {
        return outside;
    }

    /** The compact byte form (see the class comment). */
    public byte[] toBytes() {
        ByteBuffer b = StateBytes.writer(TAG, BinBytes.size(levels)
                + StateBytes.doublesSize(counts.length) + 8);
        BinBytes.put(b, levels);
        StateBytes.putDoubles(b, counts);
        b.putDouble(outside);
        return b.array();
    }

    /**
     * The matrix {@link #toBytes} wrote.
     *
     * @throws NullPointerException     if {@code state} is null
     * @throws IllegalArgumentException if {@code state} is not such a form
     */
    public static FromToMatrix fromBytes(byte[] state) {
        ByteBuffer b = StateBytes.reader(state, TAG);
        Bins levels = BinBytes.get(b, "level bins");
        double[] counts = BinBytes.counts(b, levels.count() * levels.count(), "counts");
        double outside = StateBytes.getDouble(b, 0, "outside");
        StateBytes.end(b);
        return new FromToMatrix(levels, counts, outside);
    }

    /** {@code FromToMatrix[Bins[16 from -0.001 to 0.001], 152.5 cycles, 0.0 outside]}. */
    @Override
    public String toString() {
        return "FromToMatrix[" + levels + ", " + Format.number(total()) + " cycles, "
                + Format.number(outside) + " outside]";
    }
}
