package org.strainmath.uncertainty;

import java.util.Objects;

import org.strainmath.internal.Checks;
import org.strainmath.internal.Format;

/**
 * One input quantity of a measurement model: its estimate, its standard uncertainty, its
 * degrees of freedom and the distribution that describes it.
 *
 * <pre>
 *   InputQuantity.typeA("reading", 1.0012, 1.0009, 1.0015, 1.0011);    // mean, s/√n, ν = n − 1
 *   InputQuantity.normal("gauge factor", 2.08, 0.0208, 2);              // U = 1 % at k = 2
 *   InputQuantity.rectangular("resolution", 0, 0.5e-6);                  // ± half a digit
 * </pre>
 *
 * <p>Immutable and thread-safe.
 */
public final class InputQuantity {

    private final String name;
    private final double estimate;
    private final double uncertainty;
    private final double degrees;        // +∞ when known exactly
    private final Distribution distribution;

    private InputQuantity(String name, double estimate, double uncertainty, double degrees,
            Distribution distribution) {
        this.name = Objects.requireNonNull(name, "name");
        this.estimate = Checks.finite(estimate, "estimate");
        this.uncertainty = Checks.nonNegativeFinite(uncertainty, "standardUncertainty");
        this.degrees = degrees;
        this.distribution = distribution;
    }

    /**
     * A Type A evaluation (GUM 4.2): the mean of {@code observations}, the experimental
     * standard deviation of the mean s/√n, and n − 1 degrees of freedom.
     *
     * @throws IllegalArgumentException if there are fewer than two observations or one is not finite
     */
    public static InputQuantity typeA(String name, double... observations) {
        Objects.requireNonNull(observations, "observations");
        int n = observations.length;
        if (n < 2) {
            throw new IllegalArgumentException("a Type A evaluation needs at least two "
                    + "observations: " + n);
        }
        double mean = 0;
        for (int i = 0; i < n; i++) {
            mean += Checks.finite(observations[i], "observations[" + i + "]") / n;
        }
        double sum = 0;
        for (double x : observations) {
            sum += (x - mean) * (x - mean);
        }
        double s = Math.sqrt(sum / (n - 1));
        return new InputQuantity(name, mean, s / Math.sqrt(n), n - 1, Distribution.STUDENT_T);
    }

    /**
     * A normal Type B input from an expanded uncertainty and its coverage factor (a
     * certificate's U at k): u = U/k (GUM 4.3.3), with infinite degrees of freedom.
     *
     * @throws IllegalArgumentException if U is negative or k not positive
     */
    public static InputQuantity normal(String name, double estimate, double expanded,
            double coverageFactor) {
        Checks.nonNegativeFinite(expanded, "expanded");
        Checks.positiveFinite(coverageFactor, "coverageFactor");
        return new InputQuantity(name, estimate, expanded / coverageFactor,
                Double.POSITIVE_INFINITY, Distribution.NORMAL);
    }

    /**
     * A normal input of standard uncertainty {@code standardUncertainty}, infinite degrees of
     * freedom.
     *
     * @throws IllegalArgumentException if the uncertainty is negative or not finite
     */
    public static InputQuantity ofStandardUncertainty(String name, double estimate,
            double standardUncertainty) {
        return new InputQuantity(name, estimate, standardUncertainty, Double.POSITIVE_INFINITY,
                Distribution.NORMAL);
    }

    /** A rectangular input over estimate ± {@code halfWidth}: u = a/√3 (GUM 4.3.7). */
    public static InputQuantity rectangular(String name, double estimate, double halfWidth) {
        return new InputQuantity(name, estimate,
                Checks.nonNegativeFinite(halfWidth, "halfWidth") / Math.sqrt(3),
                Double.POSITIVE_INFINITY, Distribution.RECTANGULAR);
    }

    /** A triangular input over estimate ± {@code halfWidth}: u = a/√6 (GUM 4.3.9). */
    public static InputQuantity triangular(String name, double estimate, double halfWidth) {
        return new InputQuantity(name, estimate,
                Checks.nonNegativeFinite(halfWidth, "halfWidth") / Math.sqrt(6),
                Double.POSITIVE_INFINITY, Distribution.TRIANGULAR);
    }

    /** A U-shaped (arcsine) input over estimate ± {@code halfWidth}: u = a/√2. */
    public static InputQuantity uShaped(String name, double estimate, double halfWidth) {
        return new InputQuantity(name, estimate,
                Checks.nonNegativeFinite(halfWidth, "halfWidth") / Math.sqrt(2),
                Double.POSITIVE_INFINITY, Distribution.U_SHAPED);
    }

    /**
     * A copy with {@code degrees} of freedom (positive; +∞ for a value known exactly).
     *
     * @throws IllegalArgumentException if {@code degrees} is not positive
     */
    public InputQuantity withDegreesOfFreedom(double degrees) {
        if (!(degrees > 0)) {
            throw new IllegalArgumentException("degrees must be > 0: " + degrees);
        }
        return new InputQuantity(name, estimate, uncertainty, degrees, distribution);
    }

    /**
     * A copy whose degrees of freedom follow from the relative uncertainty of its uncertainty,
     * ν = ½·(Δu/u)⁻² (GUM G.4.2, eq. G.3): 25 % gives ν = 8.
     *
     * @throws IllegalArgumentException if {@code relative} is not positive
     */
    public InputQuantity withRelativeUncertaintyOfUncertainty(double relative) {
        Checks.positiveFinite(relative, "relative");
        return withDegreesOfFreedom(0.5 / (relative * relative));
    }

    /** The name, as the budget table shows it. */
    public String name() {
        return name;
    }

    /** The estimate. */
    public double estimate() {
        return estimate;
    }

    /** The standard uncertainty. */
    public double standardUncertainty() {
        return uncertainty;
    }

    /** The degrees of freedom, {@link Double#POSITIVE_INFINITY} when the value is known exactly. */
    public double degreesOfFreedom() {
        return degrees;
    }

    /** The distribution. */
    public Distribution distribution() {
        return distribution;
    }

    /** {@code InputQuantity[gauge factor = 2.08, u = 0.0104, normal, ν = ∞]}. */
    @Override
    public String toString() {
        return "InputQuantity[" + name + " = " + Format.number(estimate) + ", u = "
                + Format.number(uncertainty) + ", " + distribution.name().toLowerCase(java.util.Locale.ROOT)
                + ", ν = " + (Double.isInfinite(degrees) ? "∞" : Format.number(degrees)) + "]";
    }
}
