package org.strainmath.history;

import org.strainmath.internal.Kernels;

/**
 * The reversal detector with a hysteresis gate that both {@link TurningPointFilter} and
 * {@link RainflowCounter} run per sample: one small state machine, so that the two find the same
 * turning points by construction.
 *
 * <pre>
 *   the first sample is a turning point (the start of the history);
 *   until the signal has moved more than the gate from it, the direction is unknown;
 *   rising:  a higher sample becomes the candidate peak; a sample more than the gate below the
 *            candidate confirms it as a turning point, and the signal is falling;
 *   falling: the same, mirrored.
 * </pre>
 * So consecutive confirmed turning points alternate, and differ by more than the gate; with a
 * gate of 0 every strict reversal is kept and plateaus (equal samples) are not reversals. The
 * candidate still open when the history ends is its last turning point.
 *
 * <p>Mutable; not thread-safe.
 */
final class Reversals {

    static final int EMPTY = 0;
    static final int FLAT = 1;
    static final int RISING = 2;
    static final int FALLING = 3;

    /** The bits of an exponent field that is all ones (NaN or an infinity). */
    private static final long EXPONENT = 0x7FF0_0000_0000_0000L;
    /** One in the lowest exponent bit: added to an all-ones exponent, it sets the sign bit. */
    private static final long EXPONENT_ONE = 0x0010_0000_0000_0000L;

    final double gate;
    int phase = EMPTY;
    /** The open extreme since the last turning point (FLAT: the start itself). */
    double candidate;
    long candidatePosition;
    /** The turning point the last {@link #scan} confirmed. */
    double confirmed;
    long confirmedPosition;
    /** The turning points the last {@link #scan} wrote. */
    int written;
    /** Samples that were not finite, skipped by scans since the last {@link #takeSkipped}. */
    private int skipped;
    /** Negative after {@link #plain} exactly when a sample of its chunk was not finite. */
    private long plainFlags;

    Reversals(double gate) {
        this.gate = gate;
    }

    /**
     * Runs the detector over {@code x[from, end)} and writes the turning points it confirms to
     * {@code tp} from {@code off} (and their positions to {@code where}, unless it is null);
     * {@code tp} needs room for {@code end − from} of them, at most one per sample.
     * {@link #written} then says how many were written, and {@link #confirmed} and
     * {@link #confirmedPosition} hold the last. Samples that are not finite are skipped and
     * tallied. The position of {@code x[j]} is {@code positionBase + j}.
     *
     * <p>For a caller who wants no positions written, chunk by chunk through {@link #plain},
     * which has no finite test per sample, and again through {@link #checked} for a chunk that
     * held a sample that is not finite (a NaN from a kernel, or an infinity). The two loops
     * differ by the finite test and the writes of positions only; both exist because C2 of
     * JDK 17 ran the loop that stores turning points about three times slower with one more
     * branch per sample (the finite test, or a bound on the output), and a branch-free finite
     * pass before the loop cost as much as the loop (measured with JMH, 2026-12-03, side by
     * side).
     */
    void scan(double[] x, int from, int end, long positionBase, double[] tp, long[] where,
            int off) {
        int n = off;
        int i = from;
        if (phase == EMPTY) {
            // the first finite sample: the start of the history, its first turning point
            while (i < end && x[i] - x[i] != 0) {
                skipped++;
                i++;
            }
            if (i == end) {
                written = 0;
                return;
            }
            phase = FLAT;
            candidate = x[i];
            candidatePosition = positionBase + i;
            confirmed = x[i];
            confirmedPosition = positionBase + i;
            tp[n] = x[i];
            if (where != null) {
                where[n] = positionBase + i;
            }
            n++;
            i++;
        }
        if (where != null) {
            n = checked(x, i, end, positionBase, tp, where, n);
        } else {
            for (; i < end; i += Kernels.CHUNK) {
                int stop = Math.min(end, i + Kernels.CHUNK);
                int p = phase;
                double c = candidate;
                long cpos = candidatePosition;
                double last = confirmed;
                long lastPos = confirmedPosition;
                int m = plain(x, i, stop, positionBase, tp, n);
                if (plainFlags < 0) {
                    // a sample was not finite: do the chunk again, checked
                    phase = p;
                    candidate = c;
                    candidatePosition = cpos;
                    confirmed = last;
                    confirmedPosition = lastPos;
                    m = checked(x, i, stop, positionBase, tp, null, n);
                }
                n = m;
            }
        }
        written = n - off;
    }

    /**
     * The detector without a finite test per sample, no positions written: see {@link #scan}.
     * In place of the test it ORs (bits & exponent) + one exponent unit over the samples, a
     * sum whose sign bit is set exactly for NaN and the infinities (their exponent is all ones),
     * so that the chunk can be done again checked: integer arithmetic with no branch, which left
     * this loop at the floor's speed where a branch did not.
     */
    private int plain(double[] x, int i, int end, long positionBase, double[] tp, int n) {
        int d = direction();
        double c = candidate;
        long cpos = candidatePosition;
        int ci = -1;                       // the candidate's index in x, or -1: it is cpos
        double last = confirmed;
        long lastPos = confirmedPosition;
        double g = gate;
        long flags = 0;
        for (; i < end; i++) {
            double v = x[i];
            flags |= (Double.doubleToRawLongBits(v) & EXPONENT) + EXPONENT_ONE;
            if (d > 0) {
                if (v > c) {
                    c = v;
                    ci = i;
                } else if (c - v > g) {
                    tp[n++] = c;
                    last = c;
                    lastPos = ci < 0 ? cpos : positionBase + ci;
                    c = v;
                    ci = i;
                    d = -1;
                }
            } else if (d < 0) {
                if (v < c) {
                    c = v;
                    ci = i;
                } else if (v - c > g) {
                    tp[n++] = c;
                    last = c;
                    lastPos = ci < 0 ? cpos : positionBase + ci;
                    c = v;
                    ci = i;
                    d = 1;
                }
            } else if (Math.abs(v - c) > g) {
                // the first move past the gate from the start sets the direction
                d = v > c ? 1 : -1;
                c = v;
                ci = i;
            }
        }
        store(d, c, ci < 0 ? cpos : positionBase + ci, last, lastPos);
        plainFlags = flags;
        return n;
    }

    /** The detector with the finite test and the positions: see {@link #scan}. */
    private int checked(double[] x, int i, int end, long positionBase, double[] tp,
            long[] where, int n) {
        int d = direction();
        double c = candidate;
        long cpos = candidatePosition;
        int ci = -1;
        double last = confirmed;
        long lastPos = confirmedPosition;
        double g = gate;
        int bad = 0;
        for (; i < end; i++) {
            double v = x[i];
            if (v - v != 0) {
                bad++;
            } else if (d > 0) {
                if (v > c) {
                    c = v;
                    ci = i;
                } else if (c - v > g) {
                    last = c;
                    lastPos = ci < 0 ? cpos : positionBase + ci;
                    tp[n] = c;
                    if (where != null) {
                        where[n] = lastPos;
                    }
                    n++;
                    c = v;
                    ci = i;
                    d = -1;
                }
            } else if (d < 0) {
                if (v < c) {
                    c = v;
                    ci = i;
                } else if (v - c > g) {
                    last = c;
                    lastPos = ci < 0 ? cpos : positionBase + ci;
                    tp[n] = c;
                    if (where != null) {
                        where[n] = lastPos;
                    }
                    n++;
                    c = v;
                    ci = i;
                    d = 1;
                }
            } else if (Math.abs(v - c) > g) {
                d = v > c ? 1 : -1;
                c = v;
                ci = i;
            }
        }
        store(d, c, ci < 0 ? cpos : positionBase + ci, last, lastPos);
        skipped += bad;
        return n;
    }

    /** +1 rising, −1 falling, 0 before the first move (FLAT). */
    private int direction() {
        return phase == RISING ? 1 : phase == FALLING ? -1 : 0;
    }

    private void store(int d, double c, long cpos, double last, long lastPos) {
        phase = d > 0 ? RISING : d < 0 ? FALLING : FLAT;
        candidate = c;
        candidatePosition = cpos;
        confirmed = last;
        confirmedPosition = lastPos;
    }

    /** The samples skipped since the last call, and starts the tally again. */
    int takeSkipped() {
        int n = skipped;
        skipped = 0;
        return n;
    }

    /** Whether an open candidate would end the history as its last turning point. */
    boolean hasPending() {
        return phase == RISING || phase == FALLING;
    }

    void reset() {
        phase = EMPTY;
        written = 0;
        skipped = 0;
        candidate = 0;
        candidatePosition = 0;
        confirmed = 0;
        confirmedPosition = 0;
    }
}
