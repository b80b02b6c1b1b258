package org.strainmath.uncertainty;

import java.math.BigDecimal;
import java.math.MathContext;
import java.math.RoundingMode;
import java.util.List;
import java.util.Locale;

import org.strainmath.internal.Format;

/**
 * An evaluated uncertainty budget: the estimate, the combined standard uncertainty, the
 * effective degrees of freedom, the coverage factor and the expanded uncertainty, and the
 * contributions sorted from the largest.
 *
 * <p>The expanded uncertainty is reported with two significant digits, and the estimate to the
 * same decimal place, as GUM 7.2.6 advises ({@link #expandedUncertaintyRounded()},
 * {@link #estimateRounded()}); the full-precision values stay available.
 *
 * <p>Immutable and thread-safe.
 */
public final class UncertaintyResult {

    private final double estimate;
    private final double combined;
    private final double effectiveDegrees;
    private final double probability;
    private final double coverageFactor;
    private final List<Contribution> contributions;
    private final double secondOrderVariance;
    private final boolean correlated;

    UncertaintyResult(double estimate, double combined, double effectiveDegrees,
            double probability, double coverageFactor, List<Contribution> contributions,
            double secondOrderVariance, boolean correlated) {
        this.estimate = estimate;
        this.combined = combined;
        this.effectiveDegrees = effectiveDegrees;
        this.probability = probability;
        this.coverageFactor = coverageFactor;
        this.contributions = List.copyOf(contributions);
        this.secondOrderVariance = secondOrderVariance;
        this.correlated = correlated;
    }

    /** The estimate of the measurand, f at the input estimates. */
    public double estimate() {
        return estimate;
    }

    /** The combined standard uncertainty u_c. */
    public double combinedStandardUncertainty() {
        return combined;
    }

    /** The effective degrees of freedom (Welch–Satterthwaite), +∞ when every input has ∞. */
    public double effectiveDegreesOfFreedom() {
        return effectiveDegrees;
    }

    /** The coverage probability asked for. */
    public double coverageProbability() {
        return probability;
    }

    /** The coverage factor k, from Student's t with ν_eff degrees of freedom. */
    public double coverageFactor() {
        return coverageFactor;
    }

    /** The expanded uncertainty U = k·u_c, full precision. */
    public double expandedUncertainty() {
        return coverageFactor * combined;
    }

    /** U rounded to two significant digits (GUM 7.2.6). */
    public double expandedUncertaintyRounded() {
        double u = expandedUncertainty();
        if (u == 0) {
            return 0;
        }
        return new BigDecimal(u).round(new MathContext(2, RoundingMode.HALF_UP)).doubleValue();
    }

    /** The estimate rounded to the last decimal place of {@link #expandedUncertaintyRounded()}. */
    public double estimateRounded() {
        double u = expandedUncertaintyRounded();
        if (u == 0) {
            return estimate;
        }
        // Two significant digits of U: its second digit sits at 10^(floor(log10 U) − 1).
        int decimals = 1 - (int) Math.floor(Math.log10(u));
        return new BigDecimal(estimate).setScale(decimals, RoundingMode.HALF_EVEN).doubleValue();
    }

    /**
     * U to two significant digits as text, with a trailing zero kept ({@code 0.0040}, not
     * {@code 0.004}): what a report prints (GUM 7.2.6). Plain from 1e-4 to 1e9, as the
     * library's other numbers print, else with an exponent ({@code 9.9e-6}, {@code 4.0e-6}).
     */
    public String expandedUncertaintyText() {
        double u = expandedUncertainty();
        if (!(u > 0) || Double.isInfinite(u)) {
            return Double.toString(u);
        }
        BigDecimal two = new BigDecimal(u).round(new MathContext(2, RoundingMode.HALF_UP));
        if (two.doubleValue() >= 1e-4 && two.doubleValue() < 1e9) {
            return two.toPlainString();
        }
        String digits = two.unscaledValue().toString();
        int exponent = digits.length() - 1 - two.scale();
        return digits.charAt(0) + "." + (digits.length() > 1 ? digits.substring(1, 2) : "0")
                + "e" + exponent;
    }

    /**
     * The estimate as text, to the last decimal place of {@link #expandedUncertaintyText()}
     * ({@code 40.010} beside {@code 0.010}).
     */
    public String estimateText() {
        double u = expandedUncertainty();
        if (!(u > 0) || Double.isInfinite(u) || !Double.isFinite(estimate)) {
            return Double.toString(estimate);
        }
        int scale = new BigDecimal(u).round(new MathContext(2, RoundingMode.HALF_UP)).scale();
        return new BigDecimal(estimate).setScale(scale, RoundingMode.HALF_EVEN).toPlainString();
    }

    /** The part of the variance from the second-order terms (0 unless asked for). */
    public double secondOrderVariance() {
        return secondOrderVariance;
    }

    /** The contributions, the largest first. */
    public List<Contribution> contributions() {
        return contributions;
    }

    /** The budget as a table for a person, the largest contribution first. */
    @Override
    public String toString() {
        StringBuilder text = new StringBuilder();
        int width = "quantity".length();
        for (Contribution c : contributions) {
            width = Math.max(width, c.input().name().length());
        }
        String row = "  %-" + width + "s  %-12s  %-12s  %-12s  %-12s  %s%n";
        text.append(String.format(Locale.ROOT, row, "quantity", "estimate", "u", "sensitivity",
                "contribution", "share"));
        for (Contribution c : contributions) {
            text.append(String.format(Locale.ROOT, row, c.input().name(),
                    Format.number(c.input().estimate()), Format.number(c.input().standardUncertainty()),
                    Format.number(c.sensitivity()), Format.number(c.contribution()),
                    String.format(Locale.ROOT, "%.1f %%", 100 * c.share())));
        }
        text.append(String.format(Locale.ROOT,
                "  y = %s, u_c = %s, ν_eff = %s, k = %s (%s %%), U = %s: y = %s ± %s%s",
                Format.number(estimate), Format.number(combined),
                Double.isInfinite(effectiveDegrees) ? "∞" : Format.number(effectiveDegrees),
                Format.number(coverageFactor), Format.number(probability * 100),
                Format.number(expandedUncertainty()), estimateText(), expandedUncertaintyText(),
                correlated ? " (inputs correlated: shares do not add to 100 %)" : ""));
        return text.toString();
    }
}
