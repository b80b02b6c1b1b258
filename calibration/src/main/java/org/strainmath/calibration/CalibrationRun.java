package org.strainmath.calibration;

import java.util.Arrays;
import java.util.Objects;

/**
 * One run of a transducer calibration: the applied loads in the order they were applied and
 * the reading at each, either ascending (loads strictly increasing) or descending (strictly
 * decreasing).
 *
 * <p>Immutable and thread-safe.
 */
public final class CalibrationRun {

    private final double[] loads;
    private final double[] readings;
    private final boolean ascending;

    private CalibrationRun(double[] loads, double[] readings, boolean ascending) {
        this.loads = loads;
        this.readings = readings;
        this.ascending = ascending;
    }

    /**
     * An ascending run (copied).
     *
     * @throws NullPointerException     if an array is null
     * @throws IllegalArgumentException if the lengths differ, there are fewer than two points,
     *                                  a value is not finite, or the loads do not increase
     */
    public static CalibrationRun ascending(double[] loads, double[] readings) {
        return of(loads, readings, true);
    }

    /**
     * A descending run (copied).
     *
     * @throws NullPointerException     if an array is null
     * @throws IllegalArgumentException as {@link #ascending}, with the loads decreasing
     */
    public static CalibrationRun descending(double[] loads, double[] readings) {
        return of(loads, readings, false);
    }

    private static CalibrationRun of(double[] loads, double[] readings, boolean ascending) {
        Objects.requireNonNull(loads, "loads");
        Objects.requireNonNull(readings, "readings");
        if (loads.length != readings.length) {
            throw new IllegalArgumentException("loads and readings must have the same length: "
                    + loads.length + " and " + readings.length);
        }
        if (loads.length < 2) {
            throw new IllegalArgumentException("a run needs at least two points: " + loads.length);
        }
        double[] x = loads.clone();
        double[] y = readings.clone();
        for (int i = 0; i < x.length; i++) {
            if (!Double.isFinite(x[i]) || !Double.isFinite(y[i])) {
                throw new IllegalArgumentException("point " + i + " must be finite: load " + x[i]
                        + ", reading " + y[i]);
            }
            if (i > 0 && !(ascending ? x[i] > x[i - 1] : x[i] < x[i - 1])) {
                throw new IllegalArgumentException("loads must " + (ascending ? "increase" : "decrease")
                        + " within " + (ascending ? "an ascending" : "a descending") + " run: "
                        + x[i - 1] + " then " + x[i] + " at point " + i);
            }
        }
        return new CalibrationRun(x, y, ascending);
    }

    /** The loads (a new array). */
    public double[] loads() {
        return loads.clone();
    }

    /** The readings (a new array). */
    public double[] readings() {
        return readings.clone();
    }

    /** Whether the loads increase. */
    public boolean isAscending() {
        return ascending;
    }

    /** The reading at {@code load}, NaN if the run has no point there. */
    double readingAt(double load) {
        for (int i = 0; i < loads.length; i++) {
            if (loads[i] == load) {
                return readings[i];
            }
        }
        return Double.NaN;
    }

    double[] rawLoads() {
        return loads;
    }

    double[] rawReadings() {
        return readings;
    }

    /** {@code CalibrationRun[ascending, 5 points, 0.0 to 100.0]}. */
    @Override
    public String toString() {
        return "CalibrationRun[" + (ascending ? "ascending" : "descending") + ", " + loads.length
                + " points, " + loads[0] + " to " + loads[loads.length - 1] + "]";
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof CalibrationRun && ((CalibrationRun) o).ascending == ascending
                && Arrays.equals(((CalibrationRun) o).loads, loads)
                && Arrays.equals(((CalibrationRun) o).readings, readings);
    }

    @Override
    public int hashCode() {
        return 31 * Arrays.hashCode(loads) + Arrays.hashCode(readings) + (ascending ? 1 : 0);
    }
}
