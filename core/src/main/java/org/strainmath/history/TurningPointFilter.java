package org.strainmath.history;

import java.util.Objects;
import java.util.OptionalDouble;

import org.strainmath.internal.Checks;
import org.strainmath.internal.Format;

/**
 * Finds the turning points (peaks and valleys) of a history as it streams, through a hysteresis
 * gate: a reversal is kept only if the history then moves more than the gate away from it, so
 * that reversals of the gate's size or less (noise, the converter's last bits) are dropped.
 *
 * <pre>
 *   the first sample is a turning point (the start of the history);
 *   until the history has moved more than the gate from it, its direction is unknown;
 *   rising:  a higher sample becomes the open peak; a sample more than the gate below the open
 *            peak confirms it as a turning point, and the history is falling;
 *   falling: the same, mirrored.
 * </pre>
 * So consecutive turning points alternate between peaks and valleys and differ by more than the
 * gate; with a gate of 0 every strict reversal is kept, and a plateau (equal samples) is no
 * reversal (its first sample stands for it). The extreme still open when the history ends is its
 * last turning point ({@link #pending()}). This is the detector of {@link RainflowCounter}, so the
 * two agree by construction. Dropping small reversals before a fatigue count is common practice
 * (no source); the form of the gate here is our own.
 *
 * <pre>
 *   TurningPointFilter filter = TurningPointFilter.withGate(5e-6);
 *   double[] peaks = new double[block.length];
 *   int found = filter.accept(block, 0, peaks, 0, block.length);   // peaks[0, found)
 * </pre>
 * Samples that are not finite are skipped and counted; positions count every sample offered,
 * skipped ones included, from 0.
 *
 * <p>Mutable: not thread-safe. Per-sample calls never throw; block calls allocate nothing.
 */
public final class TurningPointFilter {

    private final Reversals reversals;
    /** A one-sample block for {@link #accept(double)}, so that both share the block loop. */
    private final double[] one = new double[1];
    private final double[] spare = new double[1];
    private long offered;
    private long skipped;

    private TurningPointFilter(double gate) {
        this.reversals = new Reversals(gate);
    }

    /**
     * A filter with the hysteresis gate {@code gate}, in the unit of the history.
     *
     * @throws IllegalArgumentException if {@code gate} is negative or not finite
     */
    public static TurningPointFilter withGate(double gate) {
        return new TurningPointFilter(Checks.nonNegativeFinite(gate, "gate") + 0.0);
    }

    /**
     * Takes one sample; true if it confirmed a turning point, which {@link #lastTurningPoint()}
     * and {@link #lastPosition()} then give. A sample that is not finite is skipped.
     */
    public boolean accept(double sample) {
        one[0] = sample;
        return run(one, 0, spare, null, 0, 1) == 1;
    }

    /**
     * Takes {@code len} samples of {@code src} from {@code srcOff} and writes the turning points
     * they confirm to {@code dst} from {@code dstOff} (at most {@code len} of them, so
     * {@code dst} needs room for {@code len}). {@code src} and {@code dst} may be the same
     * array at the same offset: a turning point is written only at or before the sample that
     * confirms it.
     *
     * @return the number of turning points written
     * @throws NullPointerException      if an array is null
     * @throws IndexOutOfBoundsException if a range is outside its array
     */
    public int accept(double[] src, int srcOff, double[] dst, int dstOff, int len) {
        Checks.block(src, srcOff, dst, dstOff, len);
        return run(src, srcOff, dst, null, dstOff, len);
    }

    /**
     * As {@link #accept(double[], int, double[], int, int)}, and writes the position of each
     * turning point (its sample's number in the stream) to {@code positions} from
     * {@code dstOff}.
     *
     * @return the number of turning points written
     * @throws NullPointerException      if an array is null
     * @throws IndexOutOfBoundsException if a range is outside its array
     */
    public int accept(double[] src, int srcOff, double[] dst, long[] positions, int dstOff,
            int len) {
        Checks.block(src, srcOff, dst, dstOff, len);
        Objects.requireNonNull(positions, "positions");
        Objects.checkFromIndexSize(dstOff, len, positions.length);
        return run(src, srcOff, dst, positions, dstOff, len);
    }

    private int run(double[] src, int srcOff, double[] dst, long[] positions, int dstOff,
            int len) {
        Reversals r = reversals;
        r.scan(src, srcOff, srcOff + len, offered - srcOff, dst, positions, dstOff);
        offered += len;
        skipped += r.takeSkipped();
        return r.written;
    }

    /** The last turning point confirmed, or NaN before the first sample. */
    public double lastTurningPoint() {
        return reversals.phase == Reversals.EMPTY ? Double.NaN : reversals.confirmed;
    }

    /** The position of the last turning point confirmed, or −1 before the first sample. */
    public long lastPosition() {
        return reversals.phase == Reversals.EMPTY ? -1 : reversals.confirmedPosition;
    }

    /** The open extreme, the history's last turning point if it ended now; empty if none. */
    public OptionalDouble pending() {
        return reversals.hasPending() ? OptionalDouble.of(reversals.candidate)
                : OptionalDouble.empty();
    }

    /** The position of the open extreme, or −1 if there is none. */
    public long pendingPosition() {
        return reversals.hasPending() ? reversals.candidatePosition : -1;
    }

    /** The hysteresis gate. */
    public double gate() {
        return reversals.gate;
    }

    /** The samples offered, skipped ones included. */
    public long samples() {
        return offered;
    }

    /** The samples skipped because they were not finite. */
    public long skipped() {
        return skipped;
    }

    /** {@code TurningPointFilter[gate 5.0e-6, 4096 samples, 0 skipped]}. */
    @Override
    public String toString() {
        return "TurningPointFilter[gate " + Format.number(reversals.gate) + ", " + offered
                + " samples, " + skipped + " skipped]";
    }
}
