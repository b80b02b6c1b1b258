package org.strainmath.uncertainty;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.Collections;
import java.util.Comparator;
import java.util.List;
import java.util.Objects;
import java.util.SplittableRandom;

import org.apache.commons.math3.distribution.NormalDistribution;
import org.apache.commons.math3.distribution.TDistribution;
import org.apache.commons.math3.linear.CholeskyDecomposition;
import org.apache.commons.math3.linear.EigenDecomposition;
import org.apache.commons.math3.linear.MatrixUtils;
import org.apache.commons.math3.linear.RealMatrix;
import org.strainmath.internal.Checks;

/**
 * An uncertainty budget per JCGM 100:2008 (the GUM): a measurement model y = f(x1, ..., xN),
 * its input quantities, their correlations, and the law of propagation of uncertainty.
 *
 * <pre>
 *   UncertaintyBudget budget = UncertaintyBudget.of(x -> x[0] * 4 / x[1],
 *           InputQuantity.typeA("ratio", 1.001e-3, 1.003e-3, 0.999e-3),
 *           InputQuantity.normal("gauge factor", 2.08, 0.0208, 2));
 *   UncertaintyResult result = budget.evaluate(0.95);
 *   System.out.println(result);     // the table, sorted by contribution
 * </pre>
 *
 * <p>The method (GUM clause in brackets):
 * <pre>
 *   cᵢ = ∂f/∂xᵢ ≈ [f(x + uᵢ·eᵢ) − f(x − uᵢ·eᵢ)] / (2uᵢ)    (5.1.3, note 2: differences of ±uᵢ)
 *   u_c² = Σ cᵢ²·uᵢ² + 2·Σ_{i&lt;j} cᵢ·cⱼ·uᵢ·uⱼ·r(xᵢ, xⱼ)      (5.1.2, 5.2.2)
 *   ν_eff = u_c⁴ / Σ (cᵢ·uᵢ)⁴/νᵢ                            (G.4.1, Welch–Satterthwaite)
 *   k = t_{(1+p)/2}(ν_eff),   U = k·u_c                    (G.4.1, 6.2)
 * </pre>
 * With {@link #withSecondOrderTerms()} the next terms of the Taylor series for uncorrelated,
 * symmetric inputs are added (5.1.2, note):
 * Σᵢ Σⱼ [½·(∂²f/∂xᵢ∂xⱼ)² + (∂f/∂xᵢ)·(∂³f/∂xᵢ∂xⱼ²)]·uᵢ²·uⱼ², with the derivatives by central
 * differences of the same steps. Welch–Satterthwaite is strictly for uncorrelated inputs; with
 * correlations the budget still reports it, as the usual approximation.
 *
 * <p>{@link #monteCarlo} propagates the distributions themselves (JCGM 101:2008), seeded.
 *
 * <p>Immutable and thread-safe as long as the model is (a pure function).
 */
public final class UncertaintyBudget {

    private final MeasurementModel model;
    private final List<InputQuantity> inputs;
    private final double[][] correlation;
    private final double[] givenSensitivities;   // null: by differences
    private final boolean secondOrder;

    private UncertaintyBudget(MeasurementModel model, List<InputQuantity> inputs,
            double[][] correlation, double[] givenSensitivities, boolean secondOrder) {
        this.model = model;
        this.inputs = inputs;
        this.correlation = correlation;
        this.givenSensitivities = givenSensitivities;
        this.secondOrder = secondOrder;
    }

    /**
     * The budget of {@code model} with {@code inputs}, in the order the model reads them.
     *
     * @throws NullPointerException     if the model or an input is null
     * @throws IllegalArgumentException if there is no input, two share a name, or the model is
     *                                  not finite at the estimates
     */
    public static UncertaintyBudget of(MeasurementModel model, InputQuantity... inputs) {
        Objects.requireNonNull(model, "model");
        Objects.requireNonNull(inputs, "inputs");
        if (inputs.length == 0) {
            throw new IllegalArgumentException("inputs must hold at least one input quantity");
        }
        List<InputQuantity> list = new ArrayList<>();
        for (int i = 0; i < inputs.length; i++) {
            InputQuantity q = Objects.requireNonNull(inputs[i], "inputs[" + i + "]");
            for (InputQuantity other : list) {
                if (other.name().equals(q.name())) {
                    throw new IllegalArgumentException("input names must differ: " + q.name());
                }
            }
            list.add(q);
        }
        int n = list.size();
        double[][] r = new double[n][n];
        for (int i = 0; i < n; i++) {
            r[i][i] = 1;
        }
        UncertaintyBudget budget = new UncertaintyBudget(model, Collections.unmodifiableList(list),
                r, null, false);
        double y = budget.valueAt(budget.estimates());
        if (!Double.isFinite(y)) {
            throw new IllegalArgumentException("the model must be finite at the estimates: " + y);
        }
        return budget;
    }

    /**
     * A copy with the correlation coefficient {@code r} between the inputs named {@code a}
     * and {@code b} (GUM 5.2.2).
     *
     * @throws IllegalArgumentException if a name is unknown, the two are the same, r is not in
     *                                  [−1, 1], or the correlations are no longer positive
     *                                  semi-definite
     */
    public UncertaintyBudget withCorrelation(String a, String b, double r) {
        Objects.requireNonNull(a, "a");
        Objects.requireNonNull(b, "b");
        int i = indexOf(a);
        int j = indexOf(b);
        if (i == j) {
            throw new IllegalArgumentException("a correlation needs two different inputs: " + a);
        }
        if (!(r >= -1 && r <= 1)) {
            throw new IllegalArgumentException("correlation r must be in [-1, 1]: " + r);
        }
        double[][] next = new double[correlation.length][];
        for (int k = 0; k < next.length; k++) {
            next[k] = correlation[k].clone();
        }
        next[i][j] = r;
        next[j][i] = r;
        double smallest = Arrays.stream(new EigenDecomposition(MatrixUtils.createRealMatrix(next))
                .getRealEigenvalues()).min().orElse(0);
        if (smallest < -1e-12) {
            throw new IllegalArgumentException("the correlation matrix must be positive "
                    + "semi-definite; with r(" + a + ", " + b + ") = " + r
                    + " its smallest eigenvalue is " + smallest);
        }
        return new UncertaintyBudget(model, inputs, next, givenSensitivities, secondOrder);
    }

    /**
     * A copy with the sensitivity coefficients given (one per input) instead of computed.
     *
     * @throws IllegalArgumentException if the count differs or a value is not finite
     */
    public UncertaintyBudget withSensitivities(double... coefficients) {
        Objects.requireNonNull(coefficients, "coefficients");
        if (coefficients.length != inputs.size()) {
            throw new IllegalArgumentException("coefficients must be one per input, "
                    + inputs.size() + ": " + coefficients.length);
        }
        for (int i = 0; i < coefficients.length; i++) {
            Checks.finite(coefficients[i], "coefficients[" + i + "]");
        }
        return new UncertaintyBudget(model, inputs, correlation, coefficients.clone(), secondOrder);
    }

    /**
     * A copy that adds the second-order terms of GUM 5.1.2, note, for a model that is
     * significantly nonlinear (uncorrelated inputs only).
     */
    public UncertaintyBudget withSecondOrderTerms() {
        return new UncertaintyBudget(model, inputs, correlation, givenSensitivities, true);
    }

    private int indexOf(String name) {
        for (int i = 0; i < inputs.size(); i++) {
            if (inputs.get(i).name().equals(name)) {
                return i;
            }
        }
        throw new IllegalArgumentException("no input named " + name);
    }

    /** The inputs, in the model's order. */
    public List<InputQuantity> inputs() {
        return inputs;
    }

    private double[] estimates() {
        double[] x = new double[inputs.size()];
        for (int i = 0; i < x.length; i++) {
            x[i] = inputs.get(i).estimate();
        }
        return x;
    }

    private double valueAt(double[] x) {
        return model.evaluate(x.clone());
    }

    private double step(int i) {
        double u = inputs.get(i).standardUncertainty();
        return u > 0 ? u : Math.max(Math.abs(inputs.get(i).estimate()), 1) * 1e-8;
    }

    private double shifted(double[] x, int i, double di, int j, double dj) {
        double[] z = x.clone();
        z[i] += di;
        z[j] += dj;
        return model.evaluate(z);
    }

    private double[] sensitivities(double[] x) {
        if (givenSensitivities != null) {
            return givenSensitivities.clone();
        }
        double[] c = new double[x.length];
        for (int i = 0; i < x.length; i++) {
            double h = step(i);
            c[i] = (shifted(x, i, h, i, 0) - shifted(x, i, -h, i, 0)) / (2 * h);
        }
        return c;
    }

    /**
     * Evaluates the budget with a coverage probability {@code probability} (0.95 usually).
     *
     * @throws IllegalArgumentException if the probability is not in (0, 1), or the model gives
     *                                  NaN near the estimates
     * @throws IllegalStateException    if second-order terms are asked with correlated inputs
     */
    public UncertaintyResult evaluate(double probability) {
        Checks.inOpenInterval(probability, 0, 1, "probability");
        double[] x = estimates();
        double y = valueAt(x);
        double[] c = sensitivities(x);
        int n = x.length;
        double variance = 0;
        double[] u = new double[n];
        for (int i = 0; i < n; i++) {
            u[i] = inputs.get(i).standardUncertainty();
            if (!Double.isFinite(c[i])) {
                throw new IllegalArgumentException("the model gives no finite sensitivity to "
                        + inputs.get(i).name() + " near the estimates: " + c[i]);
            }
        }
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < n; j++) {
                variance += c[i] * c[j] * u[i] * u[j] * correlation[i][j];
            }
        }
        double secondOrderVariance = 0;
        if (secondOrder) {
            for (int i = 0; i < n; i++) {
                for (int j = 0; j < n; j++) {
                    if (i != j && correlation[i][j] != 0) {
                        throw new IllegalStateException("second-order terms hold for "
                                + "uncorrelated inputs only");
                    }
                }
            }
            secondOrderVariance = secondOrder(x, c, u);
            variance += secondOrderVariance;
        }
        double combined = Math.sqrt(variance);
        double denominator = 0;
        for (int i = 0; i < n; i++) {
            double term = c[i] * u[i];
            double nu = inputs.get(i).degreesOfFreedom();
            if (!Double.isInfinite(nu)) {
                denominator += term * term * term * term / nu;
            }
        }
        double effective = denominator == 0 ? Double.POSITIVE_INFINITY
                : variance * variance / denominator;
        double quantile = 0.5 + probability / 2;
        double k = Double.isInfinite(effective)
                ? new NormalDistribution(null, 0, 1).inverseCumulativeProbability(quantile)
                : new TDistribution(null, effective).inverseCumulativeProbability(quantile);
        List<Contribution> rows = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            double part = c[i] * u[i];
            rows.add(new Contribution(inputs.get(i), c[i], Math.abs(part),
                    variance == 0 ? 0 : part * part / variance));
        }
        rows.sort(Comparator.comparingDouble(Contribution::contribution).reversed());
        return new UncertaintyResult(y, combined, effective, probability, k, rows,
                secondOrderVariance, hasCorrelations());
    }

    private boolean hasCorrelations() {
        for (int i = 0; i < correlation.length; i++) {
            for (int j = 0; j < correlation.length; j++) {
                if (i != j && correlation[i][j] != 0) {
                    return true;
                }
            }
        }
        return false;
    }

    /** GUM 5.1.2, note: the fourth-order terms in the u's, derivatives by central differences. */
    private double secondOrder(double[] x, double[] c, double[] u) {
        int n = x.length;
        double sum = 0;
        for (int i = 0; i < n; i++) {
            double hi = step(i);
            for (int j = 0; j < n; j++) {
                double hj = step(j);
                double fij;
                double fijj;
                if (i == j) {
                    double f0 = shifted(x, i, 0, i, 0);
                    fij = (shifted(x, i, hi, i, 0) - 2 * f0 + shifted(x, i, -hi, i, 0)) / (hi * hi);
                    fijj = (shifted(x, i, 2 * hi, i, 0) - 2 * shifted(x, i, hi, i, 0)
                            + 2 * shifted(x, i, -hi, i, 0) - shifted(x, i, -2 * hi, i, 0))
                            / (2 * hi * hi * hi);
                } else {
                    fij = (shifted(x, i, hi, j, hj) - shifted(x, i, hi, j, -hj)
                            - shifted(x, i, -hi, j, hj) + shifted(x, i, -hi, j, -hj))
                            / (4 * hi * hj);
                    // ∂³f/∂xi∂xj²: the xi-difference of the second xj-difference.
                    double plus = shifted(x, i, hi, j, hj) - 2 * shifted(x, i, hi, j, 0)
                            + shifted(x, i, hi, j, -hj);
                    double minus = shifted(x, i, -hi, j, hj) - 2 * shifted(x, i, -hi, j, 0)
                            + shifted(x, i, -hi, j, -hj);
                    fijj = (plus - minus) / (2 * hi * hj * hj);
                }
                sum += (0.5 * fij * fij + c[i] * fijj) * u[i] * u[i] * u[j] * u[j];
            }
        }
        return sum;
    }

    /**
     * The Monte Carlo propagation of the input distributions through the model (JCGM 101:2008,
     * clause 7), with {@code trials} draws from a {@link SplittableRandom} seeded with
     * {@code seed}: the mean, the standard deviation, and the probabilistically symmetric
     * coverage interval at {@code probability} (7.7). Correlated inputs must be normal; they
     * are drawn through the Cholesky factor of their covariance.
     *
     * @throws IllegalArgumentException if trials &lt; 100 or the probability is not in (0, 1)
     * @throws IllegalStateException    if a correlated input is not normal, or the model gives
     *                                  NaN for a draw
     */
    public MonteCarloResult monteCarlo(int trials, long seed, double probability) {
        if (trials < 100) {
            throw new IllegalArgumentException("trials must be >= 100: " + trials);
        }
        Checks.inOpenInterval(probability, 0, 1, "probability");
        int n = inputs.size();
        double[] x = estimates();
        RealMatrix lower = null;
        if (hasCorrelations()) {
            for (InputQuantity q : inputs) {
                if (q.distribution() != Distribution.NORMAL) {
                    throw new IllegalStateException("correlated inputs must be normal for the "
                            + "Monte Carlo propagation: " + q);
                }
            }
            double[][] cov = new double[n][n];
            for (int i = 0; i < n; i++) {
                for (int j = 0; j < n; j++) {
                    cov[i][j] = correlation[i][j] * inputs.get(i).standardUncertainty()
                            * inputs.get(j).standardUncertainty();
                }
                cov[i][i] += 1e-300;
            }
            lower = new CholeskyDecomposition(MatrixUtils.createRealMatrix(cov), 1e-12, 0).getL();
        }
        SplittableRandom random = new SplittableRandom(seed);
        double[] y = new double[trials];
        double[] z = new double[n];
        double[] draw = new double[n];
        for (int t = 0; t < trials; t++) {
            if (lower != null) {
                for (int i = 0; i < n; i++) {
                    z[i] = random.nextGaussian();
                }
                for (int i = 0; i < n; i++) {
                    double sum = 0;
                    for (int j = 0; j <= i; j++) {
                        sum += lower.getEntry(i, j) * z[j];
                    }
                    draw[i] = x[i] + sum;
                }
            } else {
                for (int i = 0; i < n; i++) {
                    draw[i] = sample(inputs.get(i), random);
                }
            }
            y[t] = model.evaluate(draw.clone());
            if (Double.isNaN(y[t])) {
                throw new IllegalStateException("the model gave NaN for the draw "
                        + Arrays.toString(draw));
            }
        }
        double mean = 0;
        for (double v : y) {
            mean += v / trials;
        }
        double sum = 0;
        for (double v : y) {
            sum += (v - mean) * (v - mean);
        }
        Arrays.sort(y);
        int low = (int) Math.floor((1 - probability) / 2 * trials);
        int high = Math.min(trials - 1, (int) Math.ceil((1 + probability) / 2 * trials) - 1);
        return new MonteCarloResult(mean, Math.sqrt(sum / (trials - 1)), y[low], y[high],
                probability, trials);
    }

    /** One draw from the input's distribution (JCGM 101, 6.4). */
    private static double sample(InputQuantity q, SplittableRandom random) {
        double x = q.estimate();
        double u = q.standardUncertainty();
        switch (q.distribution()) {
            case RECTANGULAR:
                return x + u * Math.sqrt(3) * (2 * random.nextDouble() - 1);
            case TRIANGULAR:
                return x + u * Math.sqrt(6) * (random.nextDouble() + random.nextDouble() - 1);
            case U_SHAPED:
                return x + u * Math.sqrt(2) * Math.cos(Math.PI * random.nextDouble());
            case STUDENT_T: {
                // x̄ + (s/√n)·t_ν, t_ν = Z/√(χ²_ν/ν) (JCGM 101, 6.4.9.7).
                int nu = (int) Math.round(q.degreesOfFreedom());
                double chi = 0;
                for (int k = 0; k < nu; k++) {
                    double g = random.nextGaussian();
                    chi += g * g;
                }
                return x + u * random.nextGaussian() / Math.sqrt(chi / nu);
            }
            default:
                return x + u * random.nextGaussian();
        }
    }
}
