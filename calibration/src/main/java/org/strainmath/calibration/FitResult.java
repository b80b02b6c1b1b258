package org.strainmath.calibration;

import java.util.Locale;

import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.apache.commons.math3.distribution.TDistribution;
import org.apache.commons.math3.linear.LUDecomposition;
import org.apache.commons.math3.linear.RealMatrix;
import org.strainmath.internal.Checks;
import org.strainmath.internal.Format;
import org.strainmath.uncertainty.InputQuantity;
import org.strainmath.uncertainty.UncertaintyBudget;

/**
 * The result of a {@link CalibrationFit}: coefficients in the user's units with their standard
 * errors and covariance, residuals, residual standard deviation, degrees of freedom, R², the
 * analysis of variance, the condition of the problem, predictions with confidence and
 * prediction intervals (Student t), and the inverse from reading to load.
 *
 * <p>Statistics per any regression text (e.g. Draper and Smith, <i>Applied Regression
 * Analysis</i>, 3rd ed., ch. 1 to 5); checked against NIST's StRD Pontius dataset:
 * <pre>
 *   σ̂² = Σ wᵢ·(yᵢ − ŷᵢ)² / (n − p)             Cov(c) = σ̂²·(AᵀWA)⁻¹
 *   R² = 1 − RSS/TSS     (TSS about the weighted mean; about zero without intercept)
 *   confidence half-width  t·√(gᵀ·Cov·g)      prediction half-width  t·√(gᵀ·Cov·g + σ̂²)
 * </pre>
 * with g = (1, x, x², ...) and t the two-sided quantile of Student's t with n − p degrees of
 * freedom (Commons Math).
 *
 * <p>Immutable and thread-safe.
 */
public final class FitResult {

    private final CalibrationFit fit;
    private final double centre;
    private final double scale;
    /** Coefficients of powers of u = (x − centre)/scale, from power {@code first}. */
    private final double[] scaled;
    /** Covariance of {@code scaled}. */
    private final double[][] scaledCovariance;
    private final double[] coefficients;
    private final double[][] covariance;
    private final double[] residuals;
    private final double residualSumOfSquares;
    private final double regressionSumOfSquares;
    private final int freedom;
    private final double condition;
    private final double rawCondition;
    private final double low;
    private final double high;

    FitResult(CalibrationFit fit, double centre, double scale, double[] scaled, RealMatrix r,
            double condition, double rawCondition) {
        this.fit = fit;
        this.centre = centre;
        this.scale = scale;
        this.scaled = scaled;
        this.condition = condition;
        this.rawCondition = rawCondition;
        double[] x = fit.loads();
        double[] y = fit.readings();
        double[] w = fit.weightsOrOnes();
        int n = x.length;
        int p = scaled.length;
        this.freedom = n - p;
        this.residuals = new double[n];
        double rss = 0;
        double sw = 0;
        double mean = 0;
        for (int i = 0; i < n; i++) {
            sw += w[i];
            mean += w[i] * y[i];
        }
        mean /= sw;
        double reg = 0;
        for (int i = 0; i < n; i++) {
            double predicted = evaluate(x[i]);
            residuals[i] = y[i] - predicted;
            rss += w[i] * residuals[i] * residuals[i];
            double about = fit.hasIntercept() ? predicted - mean : predicted;
            reg += w[i] * about * about;
        }
        this.residualSumOfSquares = rss;
        this.regressionSumOfSquares = reg;
        double variance = rss / freedom;
        RealMatrix rInverse = new LUDecomposition(r).getSolver().getInverse();
        RealMatrix unscaled = rInverse.multiply(rInverse.transpose()).scalarMultiply(variance);
        this.scaledCovariance = unscaled.getData();
        double[][] t = toUserUnits();
        this.coefficients = multiply(t, scaled);
        this.covariance = sandwich(t, scaledCovariance);
        double min = Double.POSITIVE_INFINITY;
        double max = Double.NEGATIVE_INFINITY;
        for (double load : x) {
            min = Math.min(min, load);
            max = Math.max(max, load);
        }
        this.low = min;
        this.high = max;
    }

    private int first() {
        return fit.hasIntercept() ? 0 : 1;
    }

    /**
     * The matrix T with c = T·b: Σ b_k·((x − m)/s)^k = Σ_j c_j·x^j, from the binomial
     * expansion (x − m)^k = Σ_j C(k, j)·x^j·(−m)^(k−j).
     */
    private double[][] toUserUnits() {
        int p = scaled.length;
        int first = first();
        double[][] t = new double[p][p];
        for (int col = 0; col < p; col++) {
            int k = col + first;
            double inverse = 1 / Math.pow(scale, k);
            for (int row = 0; row < p; row++) {
                int j = row + first;
                if (j <= k) {
                    t[row][col] = binomial(k, j) * Math.pow(-centre, k - j) * inverse;
                }
            }
        }
        return t;
    }

    private static double binomial(int n, int k) {
        double result = 1;
        for (int i = 1; i <= k; i++) {
            result = result * (n - k + i) / i;
        }
        return result;
    }

    private static double[] multiply(double[][] t, double[] v) {
        double[] out = new double[t.length];
        for (int i = 0; i < t.length; i++) {
            double sum = 0;
            for (int j = 0; j < v.length; j++) {
                sum += t[i][j] * v[j];
            }
            out[i] = sum;
        }
        return out;
    }

    private static double[][] sandwich(double[][] t, double[][] c) {
        int p = t.length;
        double[][] out = new double[p][p];
        for (int i = 0; i < p; i++) {
            for (int j = 0; j < p; j++) {
                double sum = 0;
                for (int a = 0; a < p; a++) {
                    for (int b = 0; b < p; b++) {
                        sum += t[i][a] * c[a][b] * t[j][b];
                    }
                }
                out[i][j] = sum;
            }
        }
        return out;
    }

    /** The fitted reading at {@code load}, from the centred and scaled form (Horner). */
    private double evaluate(double load) {
        double u = (load - centre) / scale;
        double sum = 0;
        for (int k = scaled.length - 1; k >= 0; k--) {
            sum = sum * u + scaled[k];
        }
        return first() == 0 ? sum : sum * u;
    }

    /** g(u) = (u^first, u^(first+1), ...). */
    private double[] basis(double load) {
        double u = (load - centre) / scale;
        double[] g = new double[scaled.length];
        double power = first() == 0 ? 1 : u;
        for (int j = 0; j < g.length; j++) {
            g[j] = power;
            power *= u;
        }
        return g;
    }

    private double predictionVariance(double load) {
        double[] g = basis(load);
        double sum = 0;
        for (int i = 0; i < g.length; i++) {
            for (int j = 0; j < g.length; j++) {
                sum += g[i] * scaledCovariance[i][j] * g[j];
            }
        }
        return sum;
    }

    // ---------------------------------------------------------------- statistics

    /**
     * The coefficients c0, c1, ... of reading = Σ c_j·load^j in the units of the data, from the
     * constant term (c0 = 0 is not listed without an intercept: the array starts at c1).
     */
    public double[] coefficients() {
        return coefficients.clone();
    }

    /** The standard errors of {@link #coefficients()}, the square roots of the covariance's diagonal. */
    public double[] standardErrors() {
        double[] out = new double[coefficients.length];
        for (int i = 0; i < out.length; i++) {
            out[i] = Math.sqrt(covariance[i][i]);
        }
        return out;
    }

    /** The covariance matrix of {@link #coefficients()} (a new array). */
    public double[][] covariance() {
        double[][] out = new double[covariance.length][];
        for (int i = 0; i < out.length; i++) {
            out[i] = covariance[i].clone();
        }
        return out;
    }

    /** The residuals reading − fitted reading, one per point (a new array). */
    public double[] residuals() {
        return residuals.clone();
    }

    /** The residual standard deviation σ̂ = √(RSS/(n − p)), in reading units (unit weight). */
    public double residualStandardDeviation() {
        return Math.sqrt(residualSumOfSquares / freedom);
    }

    /** The residual degrees of freedom, n − p. */
    public int degreesOfFreedom() {
        return freedom;
    }

    /** R² = 1 − RSS/TSS (TSS about the mean with an intercept, about zero without). */
    public double rSquared() {
        return regressionSumOfSquares / (regressionSumOfSquares + residualSumOfSquares);
    }

    /** The analysis of variance. */
    public AnovaTable anova() {
        return new AnovaTable(regressionSumOfSquares, scaled.length - (fit.hasIntercept() ? 1 : 0),
                residualSumOfSquares, freedom);
    }

    /**
     * The 2-norm condition number of the design matrix as it was solved (loads centred and
     * scaled): the factor by which relative errors in the readings may grow in the coefficients.
     */
    public double conditionNumber() {
        return condition;
    }

    /**
     * The condition number of the design in the user's units (columns 1, x, x², ...), for
     * information: what the normal equations would have squared.
     */
    public double rawConditionNumber() {
        return rawCondition;
    }

    /** The lowest calibrated load. */
    public double lowestLoad() {
        return low;
    }

    /** The highest calibrated load. */
    public double highestLoad() {
        return high;
    }

    // ---------------------------------------------------------------- prediction

    /**
     * The fitted reading at {@code load}.
     *
     * @throws IllegalArgumentException if {@code load} is not finite
     */
    public double readingAt(double load) {
        return evaluate(Checks.finite(load, "load"));
    }

    /**
     * The standard uncertainty of the fitted (mean) reading at {@code load}, √(gᵀ·Cov·g), from
     * the coefficients' covariance (GUM H.3 gives it for its thermometer calibration).
     *
     * @throws IllegalArgumentException if {@code load} is not finite
     */
    public double standardUncertaintyAt(double load) {
        return Math.sqrt(predictionVariance(Checks.finite(load, "load")));
    }

    /**
     * The confidence interval of the mean reading at {@code load}, at {@code probability}.
     *
     * @throws IllegalArgumentException if {@code load} is not finite or the probability not in (0, 1)
     */
    public Interval confidenceInterval(double load, double probability) {
        return interval(load, probability, false);
    }

    /**
     * The prediction interval of one new reading (of unit weight) at {@code load}, at
     * {@code probability}.
     *
     * @throws IllegalArgumentException if {@code load} is not finite or the probability not in (0, 1)
     */
    public Interval predictionInterval(double load, double probability) {
        return interval(load, probability, true);
    }

    private Interval interval(double load, double probability, boolean newReading) {
        Checks.finite(load, "load");
        Checks.inOpenInterval(probability, 0, 1, "probability");
        double t = new TDistribution(null, freedom).inverseCumulativeProbability(0.5 + probability / 2);
        double variance = predictionVariance(load)
                + (newReading ? residualSumOfSquares / freedom : 0);
        return new Interval(evaluate(load), t * Math.sqrt(variance), probability);
    }

    // ---------------------------------------------------------------- inverse

    /**
     * The load that gives {@code reading}, inside the calibrated range.
     *
     * @throws IllegalArgumentException if the reading is not finite or lies outside what the
     *                                  calibrated range gives
     * @throws ArithmeticException      if the curve is not monotonic over the calibrated range
     */
    public double loadAt(double reading) {
        return loadAt(reading, false);
    }

    /**
     * The load that gives {@code reading}: exact for a straight line; otherwise the root of
     * ŷ(x) − reading by Brent's method (Commons Math, safeguarded bisection and interpolation)
     * within the calibrated range, or, with {@code extrapolate}, within that range widened by
     * its own span on each side. The curve must be monotonic where the root is searched.
     *
     * @throws IllegalArgumentException if the reading is not finite or outside the searched range
     * @throws ArithmeticException      if the curve is not monotonic there
     */
    public double loadAt(double reading, boolean extrapolate) {
        Checks.finite(reading, "reading");
        double span = high - low;
        double from = extrapolate ? low - span : low;
        double to = extrapolate ? high + span : high;
        if (fit.degree() == 1) {
            double u = fit.hasIntercept() ? (reading - scaled[0]) / scaled[1] : reading / scaled[0];
            double load = centre + scale * u;
            checkInside(load, from, to, reading, extrapolate);
            return load;
        }
        checkMonotonic(from, to);
        double atFrom = evaluate(from) - reading;
        double atTo = evaluate(to) - reading;
        if (atFrom == 0) {
            return from;
        }
        if (atTo == 0) {
            return to;
        }
        if (Math.signum(atFrom) == Math.signum(atTo)) {
            throw new IllegalArgumentException("reading " + Format.number(reading) + " lies outside "
                    + "the readings of the " + (extrapolate ? "widened " : "calibrated ")
                    + "range [" + Format.number(evaluate(from)) + ", " + Format.number(evaluate(to))
                    + "]" + (extrapolate ? "" : "; pass extrapolate = true to search beyond it"));
        }
        // Relative accuracy 1e-15, absolute 1e-15 of the range's magnitude.
        BrentSolver solver = new BrentSolver(1e-15,
                1e-15 * Math.max(Math.abs(from), Math.abs(to)) + Double.MIN_NORMAL, 0);
        return solver.solve(200, x -> evaluate(x) - reading, from, to);
    }

    private void checkInside(double load, double from, double to, double reading,
            boolean extrapolate) {
        if (!(load >= from && load <= to)) {
            throw new IllegalArgumentException("reading " + Format.number(reading) + " gives load "
                    + Format.number(load) + ", outside the " + (extrapolate ? "widened " : "calibrated ")
                    + "range [" + Format.number(from) + ", " + Format.number(to) + "]"
                    + (extrapolate ? "" : "; pass extrapolate = true to allow it"));
        }
    }

    /** The derivative keeps its sign over [from, to]: checked on a fine grid and at the ends. */
    private void checkMonotonic(double from, double to) {
        int steps = 1000;
        double sign = 0;
        for (int i = 0; i <= steps; i++) {
            double x = from + (to - from) * i / steps;
            double slope = derivative(x);
            if (slope != 0) {
                if (sign != 0 && Math.signum(slope) != sign) {
                    throw new ArithmeticException("the fitted curve is not monotonic over ["
                            + Format.number(from) + ", " + Format.number(to)
                            + "]: its slope changes sign near " + Format.number(x));
                }
                sign = Math.signum(slope);
            }
        }
    }

    /**
     * The uncertainty budget of a load measured with this calibration: the load x that gives
     * {@code reading}, x = ŷ⁻¹(r − δ), with two inputs, the reading (as given) and δ, the
     * uncertainty of the fitted curve at that load ({@link #standardUncertaintyAt}, with the
     * fit's n − p degrees of freedom). To first order (GUM 5.1.2)
     * <pre>
     *   u(x)² = (u(r)² + u_fit(x)²) / (dŷ/dx)²
     * </pre>
     * The load must lie inside the calibrated range (see {@link #loadAt(double)}).
     *
     * @throws NullPointerException     if {@code reading} is null
     * @throws IllegalArgumentException if the reading lies outside the calibrated range
     */
    public UncertaintyBudget loadBudget(InputQuantity reading) {
        double load = loadAt(reading.estimate());
        InputQuantity curve = InputQuantity.ofStandardUncertainty("calibration curve", 0,
                standardUncertaintyAt(load)).withDegreesOfFreedom(freedom);
        return UncertaintyBudget.of(x -> loadAt(x[0] - x[1], true), reading, curve);
    }

    /** The slope dŷ/dx of the fitted curve at {@code load}. */
    public double slopeAt(double load) {
        return derivative(Checks.finite(load, "load"));
    }

    /** dŷ/dx = (1/s)·Σ k·b_k·u^(k−1) over the powers k of u in the fit. */
    private double derivative(double load) {
        double u = (load - centre) / scale;
        int first = first();
        double sum = 0;
        double power = 1;
        for (int k = 1; k < scaled.length + first; k++) {
            sum += k * scaled[k - first] * power;
            power *= u;
        }
        return sum / scale;
    }

    /**
     * The fit as a table for a person:
     * <pre>
     * FitResult[degree 2 with intercept, 40 points, 37 degrees of freedom]
     *   term  coefficient        standard error
     *   x^0   6.73566e-4         1.07939e-4
     *   ...
     *   residual standard deviation 2.05177e-4, R² 0.9999999
     * </pre>
     */
    @Override
    public String toString() {
        String load = fit.loadUnit();
        String reading = fit.readingUnit();
        StringBuilder text = new StringBuilder(String.format(Locale.ROOT,
                "FitResult[degree %d %s intercept, %d points, %d degrees of freedom%s]%n",
                fit.degree(), fit.hasIntercept() ? "with" : "without", residuals.length, freedom,
                load == null ? "" : "; load in " + load + ", reading in " + reading));
        double[] errors = standardErrors();
        if (load == null) {
            text.append(String.format(Locale.ROOT, "  %-5s %-18s %s%n", "term", "coefficient",
                    "standard error"));
        } else {
            text.append(String.format(Locale.ROOT, "  %-5s %-18s %-18s %s%n", "term",
                    "coefficient", "standard error", "unit"));
        }
        for (int i = 0; i < coefficients.length; i++) {
            int power = i + first();
            if (load == null) {
                text.append(String.format(Locale.ROOT, "  x^%-3d %-18s %s%n", power,
                        Format.number(coefficients[i]), Format.number(errors[i])));
            } else {
                String unit = power == 0 ? reading : reading + " per " + load + switch (power) {
                    case 1 -> "";
                    case 2 -> "²";
                    case 3 -> "³";
                    default -> "^" + power;
                };
                text.append(String.format(Locale.ROOT, "  x^%-3d %-18s %-18s %s%n", power,
                        Format.number(coefficients[i]), Format.number(errors[i]), unit));
            }
        }
        text.append(String.format(Locale.ROOT,
                "  residual standard deviation %s%s, R² %s, condition %s (scaled), %s (raw)",
                Format.number(residualStandardDeviation()), reading == null ? "" : " " + reading,
                Double.toString(rSquared()), Format.number(condition), Format.number(rawCondition)));
        return text.toString();
    }
}
