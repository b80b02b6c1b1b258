package org.strainmath.history;

import java.nio.ByteBuffer;
import java.util.Objects;

import org.strainmath.internal.Checks;
import org.strainmath.internal.Format;
import org.strainmath.internal.StateBytes;

/**
 * The histogram of cycle ranges: for each range bin, the number of cycles (a half cycle counts
 * 0.5), the range spectrum of a history. Cycles whose range lies outside the bins are tallied
 * in {@link #outside()}, never dropped silently.
 *
 * <pre>
 *   RangeHistogram ranges = RangeHistogram.of(Bins.uniform(0, 1000e-6, 10));
 *   RainflowCounter counter = Rainflow.astm().newCounter(ranges);
 *   counter.accept(strain, 0, strain.length);
 *   ranges.count(3);           // cycles of 300 to 400 µε so far
 * </pre>
 *
 * <p>Byte form ({@link #toBytes}): tag {@code SMRH}, version, the bins (a byte 1 if uniform,
 * the edge count and edges as doubles), the counts (their number and values) and the outside
 * tally, big-endian.
 *
 * <p>Mutable: a streaming accumulator, not thread-safe. {@link #accept} neither allocates nor
 * throws.
 */
public final class RangeHistogram implements CycleConsumer {

    private static final String TAG = "SMRH";

    private final Bins bins;
    private final double[] counts;
    private double outside;

    private RangeHistogram(Bins bins, double[] counts, double outside) {
        this.bins = bins;
        this.counts = counts;
        this.outside = outside;
    }

    /**
     * An empty histogram over {@code ranges}.
     *
     * @throws NullPointerException if {@code ranges} is null
     */
    public static RangeHistogram of(Bins ranges) {
        Objects.requireNonNull(ranges, "ranges");
        return new RangeHistogram(ranges, new double[ranges.count()], 0);
    }

    /** Adds {@code count} to the bin of the range |to − from|, or to the outside tally. */
    @Override
    public void accept(double from, double to, double count) {
        int i = bins.indexOf(Math.abs(to - from));
        if (i < 0) {
            outside += count;
        } else {
            counts[i] += count;
        }
    }

    /**
     * Adds the counts of {@code other} to this one (the histograms of two parts of a history,
     * or of two windows).
     *
     * @throws NullPointerException     if {@code other} is null
     * @throws IllegalArgumentException if the bins differ
     */
    public void addAll(RangeHistogram other) {
        Objects.requireNonNull(other, "other");
        if (!other.bins.equals(bins)) {
            throw new IllegalArgumentException("other must have the bins " + bins + ": "
                    + other.bins);
        }
        for (int i = 0; i < counts.length; i++) {
            counts[i] += other.counts[i];
        }
        outside += other.outside;
    }

    /** The range bins. */
    public Bins bins() {
        return bins;
    }

    /** The cycles in bin {@code i}. */
    public double count(int i) {
        return counts[Objects.checkIndex(i, counts.length)];
    }

    /** The cycles per bin, a copy. */
    public double[] counts() {
        return counts.clone();
    }

    /** The cycles inside the bins. */
    public double total() {
        return Sums.compensated(counts);
    }

    /** The cycles whose range lay outside the bins. */
    public double outside() {
        return outside;
    }

    /**
     * The equivalent constant-amplitude range for the exponent {@code m}, as
     * {@link Cycles#equivalentRange(double)} but with each bin's cycles at its centre: an
     * approximation within half a bin width, for a histogram whose cycles are no longer at hand.
     *
     * @throws IllegalArgumentException if {@code m} is not finite and positive, or the histogram
     *                                  holds no cycle
     */
    public double equivalentRange(double m) {
        Checks.positiveFinite(m, "m");
        double total = total();
        if (!(total > 0)) {
            throw new IllegalArgumentException("histogram must hold cycles: " + total);
        }
        double largest = bins.centre(counts.length - 1);
        double[] terms = new double[counts.length];
        for (int i = 0; i < counts.length; i++) {
            terms[i] = counts[i] * StrictMath.pow(bins.centre(i) / largest, m);
        }
        return largest * StrictMath.pow(Sums.compensated(terms) / total, 1 / m);
    }

    /** The compact byte form (see the class comment). */
    public byte[] toBytes() {
        ByteBuffer b = StateBytes.writer(TAG, BinBytes.size(bins)
                + StateBytes.doublesSize(counts.length) + 8);
        BinBytes.put(b, bins);
        StateBytes.putDoubles(b, counts);
        b.putDouble(outside);
        return b.array();
    }

    /**
     * The histogram {@link #toBytes} wrote.
     *
     * @throws NullPointerException     if {@code state} is null
     * @throws IllegalArgumentException if {@code state} is not such a form
     */
    public static RangeHistogram fromBytes(byte[] state) {
        ByteBuffer b = StateBytes.reader(state, TAG);
        Bins bins = BinBytes.get(b, "bins");
        double[] counts = BinBytes.counts(b, bins.count(), "counts");
        double outside = StateBytes.getDouble(b, 0, "outside");
        StateBytes.end(b);
        return new RangeHistogram(bins, counts, outside);
    }

    /** {@code RangeHistogram[Bins[10 from 0.0 to 0.001], 152.5 cycles, 0.0 outside]}. */
    @Override
    public String toString() {
        return "RangeHistogram[" + bins + ", " + Format.number(total()) + " cycles, "
                + Format.number(outside) + " outside]";
    }
}
