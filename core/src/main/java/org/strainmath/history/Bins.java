package org.strainmath.history;

import java.io.InvalidObjectException;
import java.io.ObjectInputStream;
import java.io.Serializable;
import java.util.Arrays;
import java.util.Objects;

import org.strainmath.internal.Format;
import org.strainmath.internal.SerialForms;

/**
 * The bins of a histogram: {@code n} bins between {@code n + 1} strictly increasing, finite
 * edges. Bin {@code i} holds the values {@code edge(i) <= x < edge(i + 1)}; the last bin also
 * holds its upper edge, so that the largest value of a history binned up to its maximum is
 * inside.
 *
 * <pre>
 *   Bins ranges = Bins.uniform(0, 2000e-6, 20);       // 20 bins of 100 µε
 *   Bins levels = Bins.ofEdges(-1e-3, 0, 5e-4, 1e-3);  // three bins of unequal width
 *   ranges.indexOf(150e-6);                            // 1
 * </pre>
 *
 * <p>Immutable and thread-safe. Two bins are equal when their edges are.
 * Serializable, for a stream engine that ships configurations to other processes: the
 * stream holds the defining values only, checked again as the factories check them.
 */
public final class Bins implements Serializable {

    private final double[] edges;
    /** For uniform bins: low edge and width, used to find a bin without a search; else NaN. */
    private final double low;
    private final double width;
    /** 1/width, so that a lookup multiplies rather than divides. */
    private final double perWidth;

    private Bins(double[] edges, double low, double width) {
        this.edges = edges;
        this.low = low;
        this.width = width;
        this.perWidth = 1 / width;
    }

    /**
     * The bins between the given edges.
     *
     * @throws NullPointerException     if {@code edges} is null
     * @throws IllegalArgumentException if there are fewer than two edges, or an edge is not
     *                                  finite or not greater than the one before it
     */
    public static Bins ofEdges(double... edges) {
        Objects.requireNonNull(edges, "edges");
        double[] copy = increasing(edges.clone(), 2, "edges");
        return new Bins(copy, Double.NaN, Double.NaN);
    }

    /**
     * {@code count} bins of equal width from {@code low} to {@code high}; edge {@code i} is
     * {@code low + i·(high − low)/count}, the last exactly {@code high}.
     *
     * @throws IllegalArgumentException if a bound is not finite, {@code high <= low}, the width
     *                                  is too small to separate the edges, or {@code count < 1}
     */
    public static Bins uniform(double low, double high, int count) {
        if (!Double.isFinite(low)) {
            throw new IllegalArgumentException("low must be finite: " + low);
        }
        if (!Double.isFinite(high) || !(high > low)) {
            throw new IllegalArgumentException("high must be finite and > low (" + low + "): "
                    + high);
        }
        if (count < 1) {
            throw new IllegalArgumentException("count must be >= 1: " + count);
        }
        double width = (high - low) / count;
        double[] edges = new double[count + 1];
        for (int i = 0; i < count; i++) {
            edges[i] = low + i * width + 0.0;
        }
        edges[count] = high + 0.0;
        for (int i = 1; i <= count; i++) {
            if (!(edges[i] > edges[i - 1])) {
                throw new IllegalArgumentException("count must leave the edges distinct between "
                        + low + " and " + high + ": " + count);
            }
        }
        return new Bins(edges, low, width);
    }

    /** The number of bins. */
    public int count() {
        return edges.length - 1;
    }

    /** Edge {@code i}, 0 to {@link #count()}. */
    public double edge(int i) {
        Objects.checkIndex(i, edges.length);
        return edges[i];
    }

    /** The edges, a copy. */
    public double[] edges() {
        return edges.clone();
    }

    /** The lowest edge. */
    public double low() {
        return edges[0];
    }

    /** The highest edge. */
    public double high() {
        return edges[edges.length - 1];
    }

    /** The centre of bin {@code i}. */
    public double centre(int i) {
        Objects.checkIndex(i, edges.length - 1);
        return 0.5 * (edges[i] + edges[i + 1]);
    }

    /**
     * The bin that holds {@code x}, or −1 if {@code x} lies outside the edges or is NaN. Never
     * throws; allocation-free. For uniform bins an estimate from the width, corrected against
     * the edges; otherwise a binary search.
     */
    public int indexOf(double x) {
        int last = edges.length - 1;
        if (!(x >= edges[0] && x <= edges[last])) {
            return -1;
        }
        int i;
        if (width == width) {
            i = (int) ((x - low) * perWidth);
            i = Math.max(0, Math.min(last - 1, i));
            while (i > 0 && x < edges[i]) {
                i--;
            }
            while (i < last - 1 && x >= edges[i + 1]) {
                i++;
            }
            return i;
        }
        i = Arrays.binarySearch(edges, x);
        if (i >= 0) {
            return Math.min(i, last - 1);
        }
        return -i - 2;
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof Bins && Arrays.equals(((Bins) o).edges, edges);
    }

    @Override
    public int hashCode() {
        return Arrays.hashCode(edges);
    }

    /**
     * {@code Bins[20 from 0.0 to 0.002]} for uniform bins, {@code Bins[edges -0.001, 0.0,
     * 0.0005, 0.001]} otherwise.
     */
    @Override
    public String toString() {
        if (width == width) {
            return "Bins[" + count() + " from " + Format.number(low()) + " to "
                    + Format.number(high()) + "]";
        }
        StringBuilder s = new StringBuilder("Bins[edges ");
        for (int i = 0; i < edges.length; i++) {
            s.append(i == 0 ? "" : ", ").append(Format.number(edges[i]));
        }
        return s.append(']').toString();
    }

    /**
     * Returns {@code a}, each value made +0.0 where it was −0.0, if it holds at least
     * {@code least} finite values in strictly increasing order: the check of bin edges and of
     * crossing levels.
     *
     * @throws IllegalArgumentException otherwise, naming {@code name} and the value
     */
    static double[] increasing(double[] a, int least, String name) {
        if (a.length < least) {
            throw new IllegalArgumentException(name + " must hold at least " + least + " value"
                    + (least == 1 ? "" : "s") + ": " + a.length);
        }
        for (int i = 0; i < a.length; i++) {
            if (!Double.isFinite(a[i])) {
                throw new IllegalArgumentException(name + " must be finite: " + name + "[" + i
                        + "] = " + a[i]);
            }
            if (i > 0 && !(a[i] > a[i - 1])) {
                throw new IllegalArgumentException(name + " must be strictly increasing: " + name
                        + "[" + i + "] = " + a[i] + " after " + a[i - 1]);
            }
            a[i] += 0.0;
        }
        return a;
    }

    /** The edges as they are, for the histograms of this package (not copied). */
    double[] edgeArray() {
        return edges;
    }

    /** Rebuilds bins from stored edges: uniform ones as {@link #uniform}, others by edges. */
    static Bins restore(double[] edges, boolean uniform) {
        if (uniform) {
            Bins u = uniform(edges[0], edges[edges.length - 1], edges.length - 1);
            if (Arrays.equals(u.edges, edges)) {
                return u;
            }
        }
        return ofEdges(edges);
    }

    boolean isUniform() {
        return width == width;
    }

    // ---------------------------------------------------------------- serial form

    private static final long serialVersionUID = 1L;

    /** Writes the serial form ({@link Serial}): the defining values only. */
    private Object writeReplace() {
        return new Serial(edges.clone(), isUniform());
    }

    /** A stream must hold the serial form, never the fields of this class. */
    private void readObject(ObjectInputStream in) throws InvalidObjectException {
        throw SerialForms.proxyRequired("Bins");
    }

    /**
     * The serial form of a Bins: its defining values, rebuilt on reading through the checks
     * of the factories.
     */
    private static final class Serial implements Serializable {
        private static final long serialVersionUID = 1L;
        private final double[] edges;
        private final boolean uniform;

        Serial(double[] edges, boolean uniform) {
            this.edges = edges;
            this.uniform = uniform;
        }

        private Object readResolve() throws InvalidObjectException {
            return SerialForms.rebuild("Bins", () -> {
                return restore(edges.clone(), uniform);
            });
        }
    }
}
