package org.strainmath.calibration;

import java.util.Arrays;
import java.util.Objects;

import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.ArrayRealVector;
import org.apache.commons.math3.linear.DecompositionSolver;
import org.apache.commons.math3.linear.QRDecomposition;
import org.apache.commons.math3.linear.RealMatrix;
import org.apache.commons.math3.linear.SingularValueDecomposition;
import org.slf4j.Logger;
import org.slf4j.LoggerFactory;
import org.strainmath.internal.Checks;

/**
 * A calibration fit: a polynomial reading = c0 + c1·load + c2·load² + ... fitted by least
 * squares to (applied load, reading) points, with or without the intercept c0, optionally
 * weighted.
 *
 * <pre>
 *   FitResult fit = CalibrationFit.of(loads, readings).withDegree(2).fit();
 *   fit.coefficients();             // c0, c1, c2 in the units of the data
 *   fit.loadAt(1.234);              // the load that gives a reading, inside the calibrated range
 * </pre>
 *
 * <p><b>Method</b>: the loads are centred on their (weighted) mean and scaled by their largest
 * distance from it, u = (x − x̄)/s, so that the columns 1, u, u², u³ of the design matrix are
 * of order one; the least-squares problem is solved by the QR decomposition of that matrix
 * (Commons Math), never by the normal equations, whose condition is the square of the design's
 * (for loads up to 3e6 and degree 2, x⁴ reaches 8e25 in them). The coefficients and their
 * covariance σ²·(RᵀR)⁻¹ are then carried to the powers of the load in the user's units by the
 * exact binomial expansion of (x − x̄)ᵏ. Without an intercept the loads are scaled, not centred
 * (centring would bring an intercept back). Weights multiply the squared residuals.
 *
 * <p>Degree 1 to 3 is what calibration curves need; a higher degree follows a noise, not a
 * transducer, and is given only through {@link #withDegreeInsisting(int)}, with a warning
 * logged.
 *
 * <p>Immutable and thread-safe.
 */
public final class CalibrationFit {

    /** The highest degree {@link #withDegreeInsisting} accepts. */
    static final int MAX_DEGREE = 10;

    private final double[] loads;
    private final double[] readings;
    private final double[] weights;   // null: all 1
    private final int degree;
    private final boolean intercept;
    /** The units of the loads and the readings, for the printed result; null if not given. */
    private final String loadUnit;
    private final String readingUnit;

    private CalibrationFit(double[] loads, double[] readings, double[] weights, int degree,
            boolean intercept, String loadUnit, String readingUnit) {
        this.loads = loads;
        this.readings = readings;
        this.weights = weights;
        this.degree = degree;
        this.intercept = intercept;
        this.loadUnit = loadUnit;
        this.readingUnit = readingUnit;
    }

    /**
     * A straight-line fit with intercept of {@code readings} against {@code loads} (copied).
     *
     * @throws NullPointerException     if an array is null
     * @throws IllegalArgumentException if the lengths differ or a value is not finite
     */
    public static CalibrationFit of(double[] loads, double[] readings) {
        Objects.requireNonNull(loads, "loads");
        Objects.requireNonNull(readings, "readings");
        if (loads.length != readings.length) {
            throw new IllegalArgumentException("loads and readings must have the same length: "
                    + loads.length + " and " + readings.length);
        }
        double[] x = loads.clone();
        double[] y = readings.clone();
        for (int i = 0; i < x.length; i++) {
            finite(x[i], "loads", i);
            finite(y[i], "readings", i);
        }
        return new CalibrationFit(x, y, null, 1, true, null, null);
    }

    private static void finite(double value, String name, int index) {
        if (!Double.isFinite(value)) {
            throw new IllegalArgumentException(name + "[" + index + "] must be finite: " + value);
        }
    }

    /**
     * A copy fitting a polynomial of {@code degree} 1, 2 or 3.
     *
     * @throws IllegalArgumentException if {@code degree} is not 1 to 3
     */
    public CalibrationFit withDegree(int degree) {
        if (degree < 1 || degree > 3) {
            throw new IllegalArgumentException("degree must be 1 to 3 (use withDegreeInsisting "
                    + "for more): " + degree);
        }
        return new CalibrationFit(loads, readings, weights, degree, intercept,
                loadUnit, readingUnit);
    }

    /**
     * A copy fitting a polynomial of {@code degree} up to 10, logging a warning above 3: a
     * calibration curve of such a degree usually fits the scatter of the points, and its
     * inverse wanders between them.
     *
     * @throws IllegalArgumentException if {@code degree} is not 1 to 10
     */
    public CalibrationFit withDegreeInsisting(int degree) {
        if (degree < 1 || degree > MAX_DEGREE) {
            throw new IllegalArgumentException("degree must be 1 to " + MAX_DEGREE + ": " + degree);
        }
        if (degree > 3) {
            // The logger is looked up only when there is something to say, so that a program
            // without an SLF4J binding hears nothing from this library otherwise.
            Logger log = LoggerFactory.getLogger(CalibrationFit.class);
            log.warn("calibration fit of degree {}: above 3 a polynomial tends to follow the "
                    + "scatter of the points rather than the transducer", degree);
        }
        return new CalibrationFit(loads, readings, weights, degree, intercept,
                loadUnit, readingUnit);
    }

    /**
     * A copy that prints its result with units: {@code loadUnit} for the loads (kN, say) and
     * {@code readingUnit} for the readings (mV/V), so that each coefficient shows its own unit
     * (mV/V per kN, mV/V per kN², ...). The arithmetic does not change: the fit works in the
     * numbers given.
     *
     * @throws NullPointerException     if a unit is null
     * @throws IllegalArgumentException if a unit is blank
     */
    public CalibrationFit withUnits(String loadUnit, String readingUnit) {
        Objects.requireNonNull(loadUnit, "loadUnit");
        Objects.requireNonNull(readingUnit, "readingUnit");
        if (loadUnit.isBlank() || readingUnit.isBlank()) {
            throw new IllegalArgumentException("loadUnit and readingUnit must not be blank: \""
                    + loadUnit + "\", \"" + readingUnit + "\"");
        }
        return new CalibrationFit(loads, readings, weights, degree, intercept, loadUnit.strip(),
                readingUnit.strip());
    }

    /** The unit of the loads, or null if none was given. */
    String loadUnit() {
        return loadUnit;
    }

    /** The unit of the readings, or null if none was given. */
    String readingUnit() {
        return readingUnit;
    }

    /** A copy without the intercept: the curve passes through zero reading at zero load. */
    public CalibrationFit withoutIntercept() {
        return new CalibrationFit(loads, readings, weights, degree, false,
                loadUnit, readingUnit);
    }

    /**
     * A copy with one weight per point (copied), each positive and finite: the fit minimises
     * Σ wᵢ·(yᵢ − ŷᵢ)²; wᵢ = 1/uᵢ² for readings of standard uncertainty uᵢ.
     *
     * @throws NullPointerException     if {@code weights} is null
     * @throws IllegalArgumentException if the length differs or a weight is not positive
     */
    public CalibrationFit withWeights(double[] weights) {
        Objects.requireNonNull(weights, "weights");
        if (weights.length != loads.length) {
            throw new IllegalArgumentException("weights must have one value per point, "
                    + loads.length + ": " + weights.length);
        }
        double[] w = weights.clone();
        for (int i = 0; i < w.length; i++) {
            Checks.positiveFinite(w[i], "weights[" + i + "]");
        }
        return new CalibrationFit(loads, readings, w, degree, intercept,
                loadUnit, readingUnit);
    }

    /**
     * Fits the polynomial.
     *
     * @throws IllegalArgumentException if there are not more points than coefficients
     * @throws ArithmeticException      if the design is singular (too few distinct loads)
     */
    public FitResult fit() {
        int n = loads.length;
        int p = degree + (intercept ? 1 : 0);
        if (n <= p) {
            throw new IllegalArgumentException("a fit of " + p + " coefficients needs more than "
                    + p + " points (one degree of freedom at least): " + n);
        }
        double[] w = weights == null ? filled(n, 1.0) : weights;
        double centre = 0;
        if (intercept) {
            double sw = 0;
            for (int i = 0; i < n; i++) {
                centre += w[i] * loads[i];
                sw += w[i];
            }
            centre /= sw;
        }
        double scale = 0;
        for (double x : loads) {
            scale = Math.max(scale, Math.abs(x - centre));
        }
        if (!(scale > 0)) {
            throw new ArithmeticException("the design is singular: every load is " + loads[0]);
        }
        int first = intercept ? 0 : 1;
        double[][] design = new double[n][p];
        double[] y = new double[n];
        for (int i = 0; i < n; i++) {
            double root = Math.sqrt(w[i]);
            double u = (loads[i] - centre) / scale;
            double power = first == 0 ? 1 : u;
            for (int j = 0; j < p; j++) {
                design[i][j] = root * power;
                power *= u;
            }
            y[i] = root * readings[i];
        }
        RealMatrix a = new Array2DRowRealMatrix(design, false);
        QRDecomposition qr = new QRDecomposition(a);
        DecompositionSolver solver = qr.getSolver();
        RealMatrix rr = qr.getR();
        double largest = 0;
        double smallest = Double.POSITIVE_INFINITY;
        for (int j = 0; j < p; j++) {
            largest = Math.max(largest, Math.abs(rr.getEntry(j, j)));
            smallest = Math.min(smallest, Math.abs(rr.getEntry(j, j)));
        }
        // Columns of order one: a diagonal of R that small relative to the largest means a
        // column that the others (nearly) make, a rank-deficient design.
        if (!(smallest > 1e-13 * largest)) {
            throw new ArithmeticException("the design is singular: " + distinct(loads)
                    + " distinct loads cannot fix " + p + " coefficients");
        }
        double[] b = solver.solve(new ArrayRealVector(y, false)).toArray();
        RealMatrix r = rr.getSubMatrix(0, p - 1, 0, p - 1);
        double condition = new SingularValueDecomposition(r).getConditionNumber();
        double rawCondition = rawCondition(first, p);
        return new FitResult(this, centre, scale, b, r, condition, rawCondition);
    }

    private double rawCondition(int first, int p) {
        double[][] raw = new double[loads.length][p];
        for (int i = 0; i < loads.length; i++) {
            double power = first == 0 ? 1 : loads[i];
            for (int j = 0; j < p; j++) {
                raw[i][j] = power;
                power *= loads[i];
            }
        }
        return new SingularValueDecomposition(new Array2DRowRealMatrix(raw, false))
                .getConditionNumber();
    }

    private static int distinct(double[] values) {
        return (int) Arrays.stream(values).distinct().count();
    }

    private static double[] filled(int n, double value) {
        double[] out = new double[n];
        Arrays.fill(out, value);
        return out;
    }

    double[] loads() {
        return loads;
    }

    double[] readings() {
        return readings;
    }

    /** The weights, all 1 when none were given (a new array). */
    double[] weightsOrOnes() {
        return weights == null ? filled(loads.length, 1.0) : weights.clone();
    }

    int degree() {
        return degree;
    }

    boolean hasIntercept() {
        return intercept;
    }

    /** {@code CalibrationFit[degree 2 with intercept, 40 points]}. */
    @Override
    public String toString() {
        return "CalibrationFit[degree " + degree + (intercept ? " with" : " without")
                + " intercept, " + loads.length + " points" + (weights == null ? "" : ", weighted")
                + "]";
    }
}
