package org.strainmath.quantity;

import org.strainmath.internal.Checks;
import org.strainmath.internal.Format;

/**
 * Normal or engineering shear strain, dimensionless (m/m), positive in tension.
 *
 * <pre>
 *   Strain s = Strain.ofMicrostrain(250);   // 250 µε = 2.5e-4 m/m
 *   s.value();                              // 2.5E-4
 *   s.toString();                           // "250.0 µε"
 * </pre>
 *
 * <p>Immutable and thread-safe. Ordered by value; {@code equals} compares the value exactly.
 */
public final class Strain implements Comparable<Strain> {

    /** Zero strain. */
    public static final Strain ZERO = new Strain(0.0);

    private static final double MICROSTRAIN_PER_UNIT = 1e6;

    private final double value;

    private Strain(double value) {
        this.value = value;
    }

    /**
     * The strain {@code strain} in m/m (2.5e-4 is 250 µε).
     *
     * @throws IllegalArgumentException if {@code strain} is NaN or infinite
     */
    public static Strain of(double strain) {
        return new Strain(Checks.finite(strain, "strain") + 0.0);
    }

    /**
     * The strain of {@code microstrain} µε (1 µε = 1e-6 m/m).
     *
     * @throws IllegalArgumentException if {@code microstrain} is NaN or infinite
     */
    public static Strain ofMicrostrain(double microstrain) {
        return of(Checks.finite(microstrain, "microstrain") / MICROSTRAIN_PER_UNIT);
    }

    /**
     * The strain of {@code percent} % (1 % = 0.01 m/m = 10 000 µε).
     *
     * @throws IllegalArgumentException if {@code percent} is NaN or infinite
     */
    public static Strain ofPercent(double percent) {
        return of(Checks.finite(percent, "percent") / 100);
    }

    /** The strain in m/m. */
    public double value() {
        return value;
    }

    /** The strain in µε. */
    public double toMicrostrain() {
        return value * MICROSTRAIN_PER_UNIT;
    }

    /** The strain in %. */
    public double toPercent() {
        return value * 100;
    }

    /** This strain plus {@code other}. */
    public Strain plus(Strain other) {
        return of(value + other.value);
    }

    /** This strain minus {@code other}. */
    public Strain minus(Strain other) {
        return of(value - other.value);
    }

    /**
     * This strain times {@code factor} (a Poisson ratio, a bridge factor...).
     *
     * @throws IllegalArgumentException if {@code factor} is NaN or infinite, or the product
     *                                  overflows
     */
    public Strain multipliedBy(double factor) {
        return of(value * Checks.finite(factor, "factor"));
    }

    /** The strain of the opposite sign. */
    public Strain negated() {
        return of(-value);
    }

    /** Whether this strain is zero. */
    public boolean isZero() {
        return value == 0;
    }

    @Override
    public int compareTo(Strain other) {
        return Double.compare(value, other.value);
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof Strain && Double.compare(((Strain) o).value, value) == 0;
    }

    @Override
    public int hashCode() {
        return Double.hashCode(value);
    }

    /** The strain in µε with six significant digits: {@code 250.0 µε}. */
    @Override
    public String toString() {
        return Format.withUnit(toMicrostrain(), "µε");
    }
}
