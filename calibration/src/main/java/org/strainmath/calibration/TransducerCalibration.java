package org.strainmath.calibration;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Locale;
import java.util.Objects;
import java.util.OptionalDouble;

import org.strainmath.internal.Checks;
import org.strainmath.internal.Format;

/**
 * The performance of a strain-gauge transducer (a load cell, a pressure transducer) from its
 * calibration runs: ascending and descending loads, repeated runs, and the zero readings before
 * and after. Loads in the user's unit, readings in the transducer's (mV/V, usually); every error
 * figure is a percentage of the rated output.
 *
 * <pre>
 *   TransducerCalibration cal = TransducerCalibration.of(50)           // capacity 50 kN
 *           .withRun(CalibrationRun.ascending(loads, up))
 *           .withRun(CalibrationRun.descending(reversed, down));
 *   cal.ratedOutput();  cal.nonlinearityTerminalPercent();  cal.hysteresisPercent();
 * </pre>
 *
 * <p><b>Definitions.</b> They follow the terms of the force and load-cell standards (OIML R 60,
 * ASTM E74, ISO 376); the texts were not at hand when this was written, so each definition below
 * is from memory and is marked so. Check them against the standard that governs your work.
 * <ul>
 *   <li><i>Rated output</i> (OIML R 60 term, from memory): the reading at capacity minus the
 *       reading at zero load, averaged over the ascending runs.
 *   <li><i>Sensitivity</i>: rated output over capacity.
 *   <li><i>Zero balance</i>: the zero-load reading before loading, % of rated output.
 *   <li><i>Nonlinearity, terminal line</i> (from memory): the largest deviation of an ascending
 *       reading from the straight line through that run's zero and capacity readings.
 *   <li><i>Nonlinearity, best-fit straight line</i> (from memory): the largest deviation of an
 *       ascending reading from the least-squares line of all ascending readings.
 *   <li><i>Hysteresis</i> (from memory): the largest difference between the descending and the
 *       ascending reading at the same load, runs paired in order.
 *   <li><i>Repeatability</i> (from memory): the largest spread (maximum − minimum) of the
 *       ascending readings at one load over repeated runs; needs two ascending runs.
 *   <li><i>Zero return</i> (from memory): the zero-load reading after the runs minus the one
 *       before.
 *   <li><i>Combined error</i> (from memory): the largest deviation of any reading, ascending or
 *       descending, from the straight line through the mean ascending zero and capacity
 *       readings; it bounds nonlinearity and hysteresis together.
 *   <li><i>Lower limit factor</i> (ASTM E74, from memory: 2.4 × the standard deviation of the
 *       calibration curve's residuals, in load units): and the lowest load of the range it
 *       implies, the factor times a multiplier that the user's class gives (no class table is
 *       built in: its source text was not at hand).
 * </ul>
 *
 * <p>Immutable and thread-safe.
 */
public final class TransducerCalibration {

    private final double capacity;
    private final List<CalibrationRun> runs;
    private final double zeroBefore;   // NaN: take the first ascending run's zero
    private final double zeroAfter;    // NaN: take the last run's zero

    private TransducerCalibration(double capacity, List<CalibrationRun> runs, double zeroBefore,
            double zeroAfter) {
        this.capacity = capacity;
        this.runs = runs;
        this.zeroBefore = zeroBefore;
        this.zeroAfter = zeroAfter;
    }

    /**
     * A calibration of a transducer of rated {@code capacity} (load units), with no runs yet.
     *
     * @throws IllegalArgumentException if the capacity is not positive and finite
     */
    public static TransducerCalibration of(double capacity) {
        return new TransducerCalibration(Checks.positiveFinite(capacity, "capacity"),
                List.of(), Double.NaN, Double.NaN);
    }

    /**
     * A copy with {@code run} added after the others. An ascending run must start at zero load
     * and reach the capacity; a descending one pairs with the ascending run of the same order.
     *
     * @throws NullPointerException     if {@code run} is null
     * @throws IllegalArgumentException if an ascending run lacks the zero or the capacity load
     */
    public TransducerCalibration withRun(CalibrationRun run) {
        Objects.requireNonNull(run, "run");
        if (run.isAscending()) {
            double[] x = run.rawLoads();
            if (x[0] != 0 || x[x.length - 1] != capacity) {
                throw new IllegalArgumentException("an ascending run must go from 0 to the "
                        + "capacity " + Format.number(capacity) + ": " + run);
            }
        }
        List<CalibrationRun> more = new ArrayList<>(runs);
        more.add(run);
        return new TransducerCalibration(capacity, Collections.unmodifiableList(more), zeroBefore,
                zeroAfter);
    }

    /**
     * A copy with zero-load readings taken before and after the runs (otherwise the first
     * ascending run's first reading and the last descending run's final zero-load reading
     * serve).
     *
     * @throws IllegalArgumentException if a reading is not finite
     */
    public TransducerCalibration withZeroReadings(double before, double after) {
        return new TransducerCalibration(capacity, runs, Checks.finite(before, "before"),
                Checks.finite(after, "after"));
    }

    private List<CalibrationRun> ascending() {
        List<CalibrationRun> out = new ArrayList<>();
        for (CalibrationRun run : runs) {
            if (run.isAscending()) {
                out.add(run);
            }
        }
        if (out.isEmpty()) {
            throw new IllegalStateException("the calibration needs an ascending run");
        }
        return out;
    }

    private List<CalibrationRun> descending() {
        List<CalibrationRun> out = new ArrayList<>();
        for (CalibrationRun run : runs) {
            if (!run.isAscending()) {
                out.add(run);
            }
        }
        return out;
    }

    /** The rated capacity. */
    public double capacity() {
        return capacity;
    }

    /** The runs, in the order they were added. */
    public List<CalibrationRun> runs() {
        return runs;
    }

    /**
     * The rated output: capacity reading minus zero reading, mean over the ascending runs.
     *
     * @throws IllegalStateException if there is no ascending run
     */
    public double ratedOutput() {
        double sum = 0;
        List<CalibrationRun> up = ascending();
        for (CalibrationRun run : up) {
            double[] y = run.rawReadings();
            sum += y[y.length - 1] - y[0];
        }
        return sum / up.size();
    }

    /** The sensitivity, rated output over capacity. */
    public double sensitivity() {
        return ratedOutput() / capacity;
    }

    /** The zero balance: the zero reading before loading, % of rated output. */
    public double zeroBalancePercent() {
        return percent(before());
    }

    private double before() {
        return Double.isNaN(zeroBefore) ? ascending().get(0).rawReadings()[0] : zeroBefore;
    }

    private double after() {
        if (!Double.isNaN(zeroAfter)) {
            return zeroAfter;
        }
        List<CalibrationRun> down = descending();
        if (!down.isEmpty()) {
            CalibrationRun last = down.get(down.size() - 1);
            double[] x = last.rawLoads();
            if (x[x.length - 1] == 0) {
                return last.rawReadings()[x.length - 1];
            }
        }
        throw new IllegalStateException("no zero reading after the runs (no descending run "
                + "ends at zero load): use withZeroReadings");
    }

    private double percent(double reading) {
        return 100 * reading / ratedOutput();
    }

    /** Nonlinearity against each ascending run's terminal line, % of rated output. */
    public double nonlinearityTerminalPercent() {
        double worst = 0;
        for (CalibrationRun run : ascending()) {
            double[] x = run.rawLoads();
            double[] y = run.rawReadings();
            double slope = (y[y.length - 1] - y[0]) / capacity;
            for (int i = 0; i < x.length; i++) {
                worst = Math.max(worst, Math.abs(y[i] - (y[0] + slope * x[i])));
            }
        }
        return percent(worst);
    }

    /** The loads and readings of every ascending run, one after the other: {loads, readings}. */
    private double[][] ascendingPoints() {
        List<CalibrationRun> up = ascending();
        int n = 0;
        for (CalibrationRun run : up) {
            n += run.rawLoads().length;
        }
        double[][] points = new double[2][n];
        int k = 0;
        for (CalibrationRun run : up) {
            int m = run.rawLoads().length;
            System.arraycopy(run.rawLoads(), 0, points[0], k, m);
            System.arraycopy(run.rawReadings(), 0, points[1], k, m);
            k += m;
        }
        return points;
    }

    /** Nonlinearity against the best-fit straight line of all ascending readings, % of rated output. */
    public double nonlinearityBestFitPercent() {
        double[][] points = ascendingPoints();
        double[] x = points[0];
        double[] y = points[1];
        if (x.length < 3) {
            return 0;   // a line through two points is exact
        }
        double[] residuals = CalibrationFit.of(x, y).fit().residuals();
        double worst = 0;
        for (double r : residuals) {
            worst = Math.max(worst, Math.abs(r));
        }
        return percent(worst);
    }

    /**
     * Hysteresis: the largest |descending − ascending| reading at a common load, runs paired
     * in order, % of rated output; empty without a descending run.
     */
    public OptionalDouble hysteresisPercent() {
        List<CalibrationRun> up = ascending();
        List<CalibrationRun> down = descending();
        if (down.isEmpty()) {
            return OptionalDouble.empty();
        }
        double worst = 0;
        for (int k = 0; k < down.size() && k < up.size(); k++) {
            CalibrationRun d = down.get(k);
            for (int i = 0; i < d.rawLoads().length; i++) {
                double a = up.get(k).readingAt(d.rawLoads()[i]);
                if (!Double.isNaN(a)) {
                    worst = Math.max(worst, Math.abs(d.rawReadings()[i] - a));
                }
            }
        }
        return OptionalDouble.of(percent(worst));
    }

    /**
     * Repeatability: the largest spread of the ascending readings at one load over the runs,
     * % of rated output; empty with fewer than two ascending runs.
     */
    public OptionalDouble repeatabilityPercent() {
        List<CalibrationRun> up = ascending();
        if (up.size() < 2) {
            return OptionalDouble.empty();
        }
        double worst = 0;
        for (double load : up.get(0).rawLoads()) {
            double min = Double.POSITIVE_INFINITY;
            double max = Double.NEGATIVE_INFINITY;
            int seen = 0;
            for (CalibrationRun run : up) {
                double r = run.readingAt(load);
                if (!Double.isNaN(r)) {
                    min = Math.min(min, r);
                    max = Math.max(max, r);
                    seen++;
                }
            }
            if (seen >= 2) {
                worst = Math.max(worst, max - min);
            }
        }
        return OptionalDouble.of(percent(worst));
    }

    /**
     * Zero return: the zero reading after the runs minus the one before, % of rated output.
     *
     * @throws IllegalStateException if no zero reading after the runs is known
     */
    public double zeroReturnPercent() {
        return percent(after() - before());
    }

    /**
     * Combined error: the largest deviation of any reading from the line through the mean
     * ascending zero and capacity readings, % of rated output.
     */
    public double combinedErrorPercent() {
        List<CalibrationRun> up = ascending();
        double zero = 0;
        for (CalibrationRun run : up) {
            zero += run.rawReadings()[0];
        }
        zero /= up.size();
        double slope = ratedOutput() / capacity;
        double worst = 0;
        for (CalibrationRun run : runs) {
            for (int i = 0; i < run.rawLoads().length; i++) {
                worst = Math.max(worst, Math.abs(run.rawReadings()[i]
                        - (zero + slope * run.rawLoads()[i])));
            }
        }
        return percent(worst);
    }

    /**
     * The lower limit factor of ASTM E74 (from memory): 2.4 × the standard deviation of the
     * residuals of a calibration curve of {@code degree} fitted to the ascending readings,
     * converted to load units by the sensitivity.
     *
     * @throws IllegalArgumentException if the degree is not 1 to 3 or the points too few
     */
    public double lowerLimitFactor(int degree) {
        double[][] points = ascendingPoints();
        FitResult fit = CalibrationFit.of(points[0], points[1]).withDegree(degree).fit();
        return 2.4 * fit.residualStandardDeviation() / Math.abs(sensitivity());
    }

    /**
     * The lowest load of the range the lower limit factor allows, {@code multiplier} × LLF (the
     * multiplier of the user's class of use, e.g. from ASTM E74); the range runs to the capacity.
     *
     * @throws IllegalArgumentException if the multiplier is not positive
     */
    public double lowestLoad(double multiplier, int degree) {
        return Checks.positiveFinite(multiplier, "multiplier") * lowerLimitFactor(degree);
    }

    /** The figures as a table for a person. */
    @Override
    public String toString() {
        StringBuilder text = new StringBuilder(String.format(Locale.ROOT,
                "TransducerCalibration[capacity %s, %d runs]%n", Format.number(capacity),
                runs.size()));
        text.append(String.format(Locale.ROOT, "  rated output          %s%n",
                Format.number(ratedOutput())));
        text.append(String.format(Locale.ROOT, "  zero balance          %s %%%n",
                Format.number(zeroBalancePercent())));
        text.append(String.format(Locale.ROOT, "  nonlinearity terminal %s %%%n",
                Format.number(nonlinearityTerminalPercent())));
        text.append(String.format(Locale.ROOT, "  nonlinearity best fit %s %%%n",
                Format.number(nonlinearityBestFitPercent())));
        text.append(String.format(Locale.ROOT, "  hysteresis            %s%n",
                optional(hysteresisPercent())));
        text.append(String.format(Locale.ROOT, "  repeatability         %s%n",
                optional(repeatabilityPercent())));
        text.append(String.format(Locale.ROOT, "  combined error        %s %%",
                Format.number(combinedErrorPercent())));
        return text.toString();
    }

    private static String optional(OptionalDouble value) {
        return value.isPresent() ? Format.number(value.getAsDouble()) + " %" : "not measured";
    }
}
