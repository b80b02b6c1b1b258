package org.strainmath.history;

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
 * <p>Callers pass finite samples only. Mutable; not thread-safe.
 */
final class Reversals {

    static final int EMPTY = 0;
    static final int FLAT = 1;
    static final int RISING = 2;
    static final int FALLING = 3;

    final double gate;
    int phase = EMPTY;
    /** The open extreme since the last turning point (FLAT: the start itself). */
    double candidate;
    long candidatePosition;
    /** The turning point the last {@link #offer} confirmed. */
    double confirmed;
    long confirmedPosition;

    Reversals(double gate) {
        this.gate = gate;
    }

    /**
     * Takes the finite sample {@code x} at {@code position}; true when it confirms a turning
     * point, which is then in {@link #confirmed} and {@link #confirmedPosition}.
     */
    boolean offer(double x, long position) {
        switch (phase) {
            case RISING:
                if (x > candidate) {
                    candidate = x;
                    candidatePosition = position;
                    return false;
                }
                if (candidate - x > gate) {
                    confirm(FALLING, x, position);
                    return true;
                }
                return false;
            case FALLING:
                if (x < candidate) {
                    candidate = x;
                    candidatePosition = position;
                    return false;
                }
                if (x - candidate > gate) {
                    confirm(RISING, x, position);
                    return true;
                }
                return false;
            case FLAT:
                if (x - candidate > gate) {
                    phase = RISING;
                    candidate = x;
                    candidatePosition = position;
                } else if (candidate - x > gate) {
                    phase = FALLING;
                    candidate = x;
                    candidatePosition = position;
                }
                return false;
            default:
                phase = FLAT;
                candidate = x;
                candidatePosition = position;
                confirmed = x;
                confirmedPosition = position;
                return true;
        }
    }

    private void confirm(int next, double x, long position) {
        confirmed = candidate;
        confirmedPosition = candidatePosition;
        phase = next;
        candidate = x;
        candidatePosition = position;
    }

    /** Whether an open candidate would end the history as its last turning point. */
    boolean hasPending() {
        return phase == RISING || phase == FALLING;
    }

    void reset() {
        phase = EMPTY;
        candidate = 0;
        candidatePosition = 0;
        confirmed = 0;
        confirmedPosition = 0;
    }
}
