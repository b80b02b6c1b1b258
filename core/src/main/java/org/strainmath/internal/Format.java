package org.strainmath.internal;

import java.math.BigDecimal;
import java.math.MathContext;
import java.math.RoundingMode;

/**
 * Formats numbers for a person at a JShell prompt: six significant digits, no trailing zeros,
 * at least one decimal, plain notation between 1e-4 and 1e9 and scientific outside it.
 * Locale-independent ({@code .} as the decimal separator).
 *
 * <p>Stateless; thread-safe.
 */
public final class Format {

    private static final MathContext SIX_DIGITS = new MathContext(6, RoundingMode.HALF_EVEN);

    private Format() {
    }

    /**
     * Formats {@code x} as described in the class comment: {@code 250.0}, {@code -208.333},
     * {@code 0.06}, {@code 1.5e-12}.
     */
    public static String number(double x) {
        if (!Double.isFinite(x)) {
            return Double.toString(x);
        }
        if (x == 0) {
            return (1 / x < 0) ? "-0.0" : "0.0";
        }
        BigDecimal rounded = new BigDecimal(x).round(SIX_DIGITS).stripTrailingZeros();
        double magnitude = Math.abs(rounded.doubleValue());
        if (magnitude >= 1e-4 && magnitude < 1e9) {
            String plain = rounded.toPlainString();
            return plain.indexOf('.') < 0 ? plain + ".0" : plain;
        }
        String unscaled = rounded.unscaledValue().abs().toString();
        int exponent = unscaled.length() - 1 - rounded.scale();
        String mantissa = unscaled.length() == 1
                ? unscaled + ".0"
                : unscaled.charAt(0) + "." + unscaled.substring(1);
        return (rounded.signum() < 0 ? "-" : "") + mantissa + "e" + exponent;
    }

    /** Formats {@code x} followed by a space and {@code unit}: {@code 250.0 µε}. */
    public static String withUnit(double x, String unit) {
        return number(x) + " " + unit;
    }
}
