package org.strainmath.history;

import java.util.Arrays;
import java.util.Objects;

import org.strainmath.internal.Format;

/**
 * The turning points (peaks and valleys) of a whole history through a hysteresis gate, with
 * the index of each in the history's array: what {@link TurningPointFilter} finds, with the open
 * extreme at the end taken as the last turning point.
 *
 * <pre>
 *   TurningPoints tp = TurningPoints.of(new double[] {0, 2, 1.9, 5, -1, -0.5, -3}, 0.5);
 *   tp.values();    // [0.0, 5.0, -3.0]   (2 → 1.9 and -1 → -0.5 are within the gate)
 *   tp.indices();   // [0, 3, 6]
 * </pre>
 *
 * <p>Immutable and thread-safe.
 */
public final class TurningPoints {

    private final double[] values;
    private final int[] indices;
    private final double gate;
    private final int samples;

    private TurningPoints(double[] values, int[] indices, double gate, int samples) {
        this.values = values;
        this.indices = indices;
        this.gate = gate;
        this.samples = samples;
    }

    /**
     * Every strict reversal of {@code history} (a gate of 0).
     *
     * @throws NullPointerException     if {@code history} is null
     * @throws IllegalArgumentException if it holds no finite sample
     */
    public static TurningPoints of(double[] history) {
        return of(history, 0.0);
    }

    /**
     * The turning points of {@code history} through the gate {@code gate}; samples that are not
     * finite are skipped.
     *
     * @throws NullPointerException     if {@code history} is null
     * @throws IllegalArgumentException if {@code gate} is negative or not finite, or the history
     *                                  holds no finite sample
     */
    public static TurningPoints of(double[] history, double gate) {
        Objects.requireNonNull(history, "history");
        TurningPointFilter filter = TurningPointFilter.withGate(gate);
        double[] values = new double[history.length + 1];
        long[] positions = new long[history.length + 1];
        int n = filter.accept(history, 0, values, positions, 0, history.length);
        if (filter.skipped() == history.length) {
            throw new IllegalArgumentException("history must hold a finite sample: "
                    + history.length + " samples, " + filter.skipped() + " not finite");
        }
        if (filter.pending().isPresent()) {
            values[n] = filter.pending().getAsDouble();
            positions[n] = filter.pendingPosition();
            n++;
        }
        int[] indices = new int[n];
        for (int i = 0; i < n; i++) {
            indices[i] = (int) positions[i];
        }
        return new TurningPoints(Arrays.copyOf(values, n), indices, filter.gate(),
                history.length);
    }

    /** The number of turning points. */
    public int size() {
        return values.length;
    }

    /** Turning point {@code i}. */
    public double value(int i) {
        return values[Objects.checkIndex(i, values.length)];
    }

    /** The index in the history of turning point {@code i}. */
    public int index(int i) {
        return indices[Objects.checkIndex(i, indices.length)];
    }

    /** The turning points, a copy. */
    public double[] values() {
        return values.clone();
    }

    /** Their indices in the history, a copy. */
    public int[] indices() {
        return indices.clone();
    }

    /** The gate they were found with. */
    public double gate() {
        return gate;
    }

    /** {@code TurningPoints[3 of 7 samples, gate 0.5]}. */
    @Override
    public String toString() {
        return "TurningPoints[" + values.length + " of " + samples + " samples, gate "
                + Format.number(gate) + "]";
    }
}
