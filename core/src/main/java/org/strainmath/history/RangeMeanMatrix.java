package org.strainmath.history;

import java.nio.ByteBuffer;
import java.util.Objects;

import org.strainmath.internal.Format;
import org.strainmath.internal.StateBytes;

/**
 * The range–mean matrix of a count: the number of cycles (a half cycle counts 0.5) in each
 * pair of a range bin and a mean bin, the usual summary of a rainflow count for a mean-stress
 * correction (ASTM E1049-85, 5.4.4, speaks of the cycles' ranges and means). Cycles outside
 * either set of bins are tallied in {@link #outside()}.
 *
 * <pre>
 *   RangeMeanMatrix matrix = RangeMeanMatrix.of(Bins.uniform(0, 200e6, 20),
 *           Bins.uniform(-100e6, 100e6, 20));
 *   matrix.count(4, 11);       // cycles of 40 to 50 MPa range about a mean of 10 to 20 MPa
 * </pre>
 *
 * <p>Byte form ({@link #toBytes}): tag {@code SMRM}, version, the range bins, the mean bins,
 * the counts row by row (one row per range bin) and the outside tally, big-endian.
 *
 * <p>Mutable: a streaming accumulator, not thread-safe. {@link #accept} neither allocates nor
 * throws.
 */
public final class RangeMeanMatrix implements CycleConsumer {

    private static final String TAG = "SMRM";

    private final Bins ranges;
    private final Bins means;
    /** Row-major: range bin × mean bin. */
    private final double[] counts;
    private double outside;

    private RangeMeanMatrix(Bins ranges, Bins means, double[] counts, double outside) {
        this.ranges = ranges;
        this.means = means;
        this.counts = counts;
        this.outside = outside;
    }

    /**
     * An empty matrix over the given bins.
     *
     * @throws NullPointerException if an argument is null
     */
    public static RangeMeanMatrix of(Bins ranges, Bins means) {
        Objects.requireNonNull(ranges, "ranges");
        Objects.requireNonNull(means, "means");
        return new RangeMeanMatrix(ranges, means, new double[ranges.count() * means.count()], 0);
    }

    /** Adds {@code count} to the cell of the cycle's range and mean, or to the outside tally. */
    @Override
    public void accept(double from, double to, double count) {
        int r = ranges.indexOf(Math.abs(to - from));
        int m = means.indexOf(0.5 * (from + to));
        if (r < 0 || m < 0) {
            outside += count;
        } else {
            counts[r * means.count() + m] += count;
        }
    }

    /**
     * Adds the counts of {@code other} to this one.
     *
     * @throws NullPointerException     if {@code other} is null
     * @throws IllegalArgumentException if the bins differ
     */
    public void addAll(RangeMeanMatrix other) {
        Objects.requireNonNull(other, "other");
        if (!other.ranges.equals(ranges) || !other.means.equals(means)) {
            throw new IllegalArgumentException("other must have the bins " + ranges + " and "
                    + means + ": " + other.ranges + " and " + other.means);
        }
        for (int i = 0; i < counts.length; i++) {
            counts[i] += other.counts[i];
        }
        outside += other.outside;
    }

    /** The range bins (rows). */
    public Bins ranges() {
        return ranges;
    }

    /** The mean bins (columns). */
    public Bins means() {
        return means;
    }

    /** The cycles in range bin {@code range} and mean bin {@code mean}. */
    public double count(int range, int mean) {
        Objects.checkIndex(range, ranges.count());
        Objects.checkIndex(mean, means.count());
        return counts[range * means.count() + mean];
    }

    /** The counts, one row per range bin, a copy. */
    public double[][] counts() {
        int columns = means.count();
        double[][] rows = new double[ranges.count()][columns];
        for (int r = 0; r < rows.length; r++) {
            System.arraycopy(counts, r * columns, rows[r], 0, columns);
        }
        return rows;
    }

    /** The cycles per range bin, summed over the means: the range histogram. */
    public double[] rangeCounts() {
        int columns = means.count();
        double[] sums = new double[ranges.count()];
        double[] row = new double[columns];
        for (int r = 0; r < sums.length; r++) {
            System.arraycopy(counts, r * columns, row, 0, columns);
            sums[r] = Sums.compensated(row);
        }
        return sums;
    }

    /** The cycles inside the bins. */
    public double total() {
        return Sums.compensated(counts);
    }

    /** The cycles whose range or mean lay outside the bins. */
    public double outside() {
        return outside;
    }

    /** The compact byte form (see the class comment). */
    public byte[] toBytes() {
        ByteBuffer b = StateBytes.writer(TAG, BinBytes.size(ranges) + BinBytes.size(means)
                + StateBytes.doublesSize(counts.length) + 8);
        BinBytes.put(b, ranges);
        BinBytes.put(b, means);
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
    public static RangeMeanMatrix fromBytes(byte[] state) {
        ByteBuffer b = StateBytes.reader(state, TAG);
        Bins ranges = BinBytes.get(b, "range bins");
        Bins means = BinBytes.get(b, "mean bins");
        double[] counts = BinBytes.counts(b, ranges.count() * means.count(), "counts");
        double outside = StateBytes.getDouble(b, 0, "outside");
        StateBytes.end(b);
        return new RangeMeanMatrix(ranges, means, counts, outside);
    }

    /**
     * {@code RangeMeanMatrix[ranges Bins[20 from 0.0 to 2.0e8], means Bins[...], 152.5 cycles,
     * 0.0 outside]}.
     */
    @Override
    public String toString() {
        return "RangeMeanMatrix[ranges " + ranges + ", means " + means + ", "
                + Format.number(total()) + " cycles, " + Format.number(outside) + " outside]";
    }
}
