package org.strainmath.history;

import org.strainmath.internal.Checks;
import org.strainmath.internal.Format;

/**
 * One counted cycle of a history: its two turning points in the order of the history and its
 * count, 1 for a full cycle (from → to → from) or 0.5 for a half cycle (from → to). Values are
 * in the unit of the history (m/m for strain, Pa for stress).
 *
 * <pre>
 *   Cycle c = new Cycle(-3, 5, 0.5);
 *   c.range();   // 8.0
 *   c.mean();    // 1.0
 * </pre>
 *
 * <p>Immutable and thread-safe (a record).
 *
 * @param from  the first turning point
 * @param to    the second turning point
 * @param count the number of cycles this entry stands for, usually 1 or 0.5
 */
public record Cycle(double from, double to, double count) {

    /**
     * Validates the cycle.
     *
     * @throws IllegalArgumentException if a value is not finite or {@code count} is not
     *                                  positive
     */
    public Cycle {
        Checks.finite(from, "from");
        Checks.finite(to, "to");
        Checks.positiveFinite(count, "count");
    }

    /** The range |to − from|. */
    public double range() {
        return Math.abs(to - from);
    }

    /** The amplitude, half the range. */
    public double amplitude() {
        return 0.5 * Math.abs(to - from);
    }

    /** The mean (from + to)/2. */
    public double mean() {
        return 0.5 * (from + to);
    }

    /** Whether this is a half cycle (count 0.5). */
    public boolean isHalf() {
        return count == 0.5;
    }

    /** {@code Cycle[from=-3.0, to=5.0, count=0.5]}, six significant digits. */
    @Override
    public String toString() {
        return "Cycle[from=" + Format.number(from) + ", to=" + Format.number(to) + ", count="
                + Format.number(count) + "]";
    }
}
