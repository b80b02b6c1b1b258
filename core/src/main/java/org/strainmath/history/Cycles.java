package org.strainmath.history;

import java.util.AbstractList;
import java.util.Arrays;
import java.util.List;
import java.util.Objects;

import org.strainmath.internal.Checks;
import org.strainmath.internal.Format;

/**
 * The cycles a rainflow count found in a history, in the order it found them: for each, the
 * two turning points in the order of the history and the count (1 for a full cycle, 0.5 for a
 * half cycle). Values are in the unit of the history (m/m for strain, Pa for stress).
 *
 * <pre>
 *   Cycles cycles = Rainflow.astm().count(history);
 *   cycles.total();                 // cycles, a half cycle counted as 0.5
 *   cycles.largestRange();
 *   cycles.equivalentRange(3);      // the constant-amplitude range of equal damage, m = 3
 *   cycles.rangeHistogram(Bins.uniform(0, 10, 10));
 * </pre>
 * Held in three primitive arrays, so that a count of millions of cycles stays compact;
 * {@link #toList()} gives {@link Cycle} records for a JShell session.
 *
 * <p>Immutable and thread-safe.
 */
public final class Cycles {

    private final double[] from;
    private final double[] to;
    private final double[] count;
    private final long skipped;

    private Cycles(double[] from, double[] to, double[] count, long skipped) {
        this.from = from;
        this.to = to;
        this.count = count;
        this.skipped = skipped;
    }

    /**
     * Cycles given as three arrays of equal length: a spectrum from elsewhere (a design load
     * spectrum, a count of another program), to bin or to assess with this library.
     *
     * @throws NullPointerException     if an array is null
     * @throws IllegalArgumentException if the lengths differ, a value is not finite, or a count
     *                                  is not positive
     */
    public static Cycles of(double[] from, double[] to, double[] counts) {
        Objects.requireNonNull(from, "from");
        Objects.requireNonNull(to, "to");
        Objects.requireNonNull(counts, "counts");
        if (to.length != from.length || counts.length != from.length) {
            throw new IllegalArgumentException("to and counts must have the length of from ("
                    + from.length + "): " + to.length + " and " + counts.length);
        }
        for (int i = 0; i < from.length; i++) {
            Checks.finite(from[i], "from[" + i + "]");
            Checks.finite(to[i], "to[" + i + "]");
            Checks.positiveFinite(counts[i], "counts[" + i + "]");
        }
        return new Cycles(from.clone(), to.clone(), counts.clone(), 0);
    }

    /** The number of entries (full and half cycles). */
    public int size() {
        return from.length;
    }

    /** The first turning point of entry {@code i}. */
    public double from(int i) {
        return from[Objects.checkIndex(i, from.length)];
    }

    /** The second turning point of entry {@code i}. */
    public double to(int i) {
        return to[Objects.checkIndex(i, to.length)];
    }

    /** The count of entry {@code i}: 1 for a full cycle, 0.5 for a half cycle. */
    public double count(int i) {
        return count[Objects.checkIndex(i, count.length)];
    }

    /** The range of entry {@code i}, |to − from|. */
    public double range(int i) {
        Objects.checkIndex(i, from.length);
        return Math.abs(to[i] - from[i]);
    }

    /** The mean of entry {@code i}, (from + to)/2. */
    public double mean(int i) {
        Objects.checkIndex(i, from.length);
        return 0.5 * (from[i] + to[i]);
    }

    /** The number of cycles, a half cycle counted as 0.5 (summed with compensation). */
    public double total() {
        return Sums.compensated(count);
    }

    /** The number of full-cycle entries (count 1). */
    public int fullCycles() {
        int n = 0;
        for (double c : count) {
            if (c == 1.0) {
                n++;
            }
        }
        return n;
    }

    /** The number of half-cycle entries (count 0.5). */
    public int halfCycles() {
        int n = 0;
        for (double c : count) {
            if (c == 0.5) {
                n++;
            }
        }
        return n;
    }

    /** The samples of the history that were not finite and were skipped (0 for {@link #of}). */
    public long skipped() {
        return skipped;
    }

    /** The largest range, 0 when there are no cycles. */
    public double largestRange() {
        double largest = 0;
        for (int i = 0; i < from.length; i++) {
            largest = Math.max(largest, Math.abs(to[i] - from[i]));
        }
        return largest;
    }

    /**
     * The equivalent constant-amplitude range for the exponent {@code m}: the range that, repeated
     * as many times as there are cycles here, gives the same Palmgren–Miner damage on an S–N
     * curve of slope m (Basquin, N·Sᵐ = constant):
     * <pre>
     *   S_eq = (Σ nᵢ·Sᵢᵐ / Σ nᵢ)^(1/m)
     * </pre>
     * with nᵢ the counts and Sᵢ the ranges (e.g. Eurocode 3, EN 1993-1-9, annex A, the
     * damage-equivalent range; the form is common practice). Computed as
     * S_max·(Σ nᵢ·(Sᵢ/S_max)ᵐ / Σ nᵢ)^(1/m), which neither overflows nor underflows for any m.
     * <i>Accuracy</i>: a few ulp per term.
     *
     * @throws IllegalArgumentException if {@code m} is not finite and positive, or there are no
     *                                  cycles
     */
    public double equivalentRange(double m) {
        Checks.positiveFinite(m, "m");
        requireCycles();
        return equivalent(m, Sums.compensated(count));
    }

    /**
     * The equivalent constant-amplitude range for the exponent {@code m} at
     * {@code referenceCycles}: the range that, applied that many times, gives the damage of
     * these cycles on an S–N curve of slope m, S_eq = (Σ nᵢ·Sᵢᵐ / N_ref)^(1/m). Design codes
     * quote it at 2·10⁶ cycles (EN 1993-1-9, the equivalent range Δσ_E,2).
     *
     * @throws IllegalArgumentException if {@code m} or {@code referenceCycles} is not finite
     *                                  and positive, or there are no cycles
     */
    public double equivalentRange(double m, double referenceCycles) {
        Checks.positiveFinite(m, "m");
        Checks.positiveFinite(referenceCycles, "referenceCycles");
        requireCycles();
        return equivalent(m, referenceCycles);
    }

    private double equivalent(double m, double cycles) {
        double largest = largestRange();
        if (largest == 0) {
            return 0;
        }
        double[] terms = new double[from.length];
        for (int i = 0; i < terms.length; i++) {
            terms[i] = count[i] * StrictMath.pow(Math.abs(to[i] - from[i]) / largest, m);
        }
        return largest * StrictMath.pow(Sums.compensated(terms) / cycles, 1 / m);
    }

    private void requireCycles() {
        if (from.length == 0) {
            throw new IllegalArgumentException("cycles must not be empty: 0 cycles");
        }
    }

    /** Passes every cycle, in order, to {@code consumer} (a histogram, a damage sum). */
    public void forEach(CycleConsumer consumer) {
        Objects.requireNonNull(consumer, "consumer");
        for (int i = 0; i < from.length; i++) {
            consumer.accept(from[i], to[i], count[i]);
        }
    }

    /**
     * The histogram of the ranges in {@code ranges}.
     *
     * @throws NullPointerException     if {@code ranges} is null
     * @throws IllegalArgumentException if a range lies outside the bins
     */
    public RangeHistogram rangeHistogram(Bins ranges) {
        RangeHistogram h = RangeHistogram.of(ranges);
        for (int i = 0; i < from.length; i++) {
            requireInside(ranges, range(i), "ranges", "range", i);
        }
        forEach(h);
        return h;
    }

    /**
     * The range–mean matrix of these cycles.
     *
     * @throws NullPointerException     if a bin argument is null
     * @throws IllegalArgumentException if a range or a mean lies outside its bins
     */
    public RangeMeanMatrix rangeMeanMatrix(Bins ranges, Bins means) {
        RangeMeanMatrix m = RangeMeanMatrix.of(ranges, means);
        for (int i = 0; i < from.length; i++) {
            requireInside(ranges, range(i), "ranges", "range", i);
            requireInside(means, mean(i), "means", "mean", i);
        }
        forEach(m);
        return m;
    }

    /**
     * The from–to matrix of these cycles, both turning points binned in {@code levels}.
     *
     * @throws NullPointerException     if {@code levels} is null
     * @throws IllegalArgumentException if a turning point lies outside the bins
     */
    public FromToMatrix fromToMatrix(Bins levels) {
        FromToMatrix m = FromToMatrix.of(levels);
        for (int i = 0; i < from.length; i++) {
            requireInside(levels, from[i], "levels", "from", i);
            requireInside(levels, to[i], "levels", "to", i);
        }
        forEach(m);
        return m;
    }

    private static void requireInside(Bins bins, double x, String name, String what, int i) {
        if (bins.indexOf(x) < 0) {
            throw new IllegalArgumentException(name + " must cover every cycle: " + what + " "
                    + x + " of cycle " + i + " lies outside " + bins);
        }
    }

    /** The cycles as records, a view. */
    public List<Cycle> toList() {
        return new AbstractList<>() {
            @Override
            public Cycle get(int i) {
                return new Cycle(from(i), to[i], count[i]);
            }

            @Override
            public int size() {
                return from.length;
            }
        };
    }

    /** Whether both hold the same cycles in the same order (the skipped count aside). */
    @Override
    public boolean equals(Object o) {
        if (!(o instanceof Cycles)) {
            return false;
        }
        Cycles c = (Cycles) o;
        return Arrays.equals(from, c.from) && Arrays.equals(to, c.to)
                && Arrays.equals(count, c.count);
    }

    @Override
    public int hashCode() {
        return 31 * (31 * Arrays.hashCode(from) + Arrays.hashCode(to)) + Arrays.hashCode(count);
    }

    /** {@code Cycles[1 full and 6 half, total 4.0, largest range 9.0]}. */
    @Override
    public String toString() {
        return "Cycles[" + fullCycles() + " full and " + halfCycles() + " half"
                + (fullCycles() + halfCycles() < size() ? " and " + (size() - fullCycles()
                        - halfCycles()) + " other" : "")
                + ", total " + Format.number(total()) + ", largest range "
                + Format.number(largestRange()) + "]";
    }

    /** Collects cycles into growing arrays; {@link #toCycles} trims them. Not thread-safe. */
    static final class Collector implements CycleConsumer {
        private double[] from = new double[64];
        private double[] to = new double[64];
        private double[] count = new double[64];
        private int size;

        @Override
        public void accept(double f, double t, double c) {
            if (size == from.length) {
                int n = 2 * size;
                from = Arrays.copyOf(from, n);
                to = Arrays.copyOf(to, n);
                count = Arrays.copyOf(count, n);
            }
            from[size] = f;
            to[size] = t;
            count[size] = c;
            size++;
        }

        Cycles toCycles(long skipped) {
            return new Cycles(Arrays.copyOf(from, size), Arrays.copyOf(to, size),
                    Arrays.copyOf(count, size), skipped);
        }
    }
}
