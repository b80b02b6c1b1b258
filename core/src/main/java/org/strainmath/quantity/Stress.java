package org.strainmath.quantity;

import org.strainmath.internal.Checks;
import org.strainmath.internal.Format;

/**
 * Mechanical stress (or a modulus of elasticity) in pascals (Pa), positive in tension.
 *
 * <p>Customary US units convert exactly from their definitions (NIST SP 811, appendix B):
 * 1 lbf = 0.45359237 kg × 9.80665 m/s² = 4.4482216152605 N and 1 in = 0.0254 m, so
 * <pre>
 *   1 psi = 4.4482216152605 N / (0.0254 m)² = 6894.757293168361... Pa
 *   1 ksi = 1000 psi
 * </pre>
 *
 * <pre>
 *   Stress.ofMegapascals(80).toString();     // "80.0 MPa"
 *   Stress.ofKsi(30).toMegapascals();        // 206.8427187950...
 * </pre>
 *
 * <p>Immutable and thread-safe. Ordered by value; {@code equals} compares the value exactly.
 */
public final class Stress implements Comparable<Stress> {

    /** Zero stress. */
    public static final Stress ZERO = new Stress(0.0);

    /**
     * Pascals in one pound-force per square inch, the double nearest to the exact
     * 4.4482216152605 / 0.0254² = 6894.757293168361336... (NIST SP 811, appendix B).
     */
    public static final double PASCALS_PER_PSI = 6894.757293168362;

    private final double pascals;

    private Stress(double pascals) {
        this.pascals = pascals;
    }

    /**
     * The stress of {@code pascals} Pa.
     *
     * @throws IllegalArgumentException if {@code pascals} is NaN or infinite
     */
    public static Stress ofPascals(double pascals) {
        return new Stress(Checks.finite(pascals, "pascals") + 0.0);
    }

    /**
     * The stress of {@code kilopascals} kPa.
     *
     * @throws IllegalArgumentException if {@code kilopascals} is NaN or infinite
     */
    public static Stress ofKilopascals(double kilopascals) {
        return ofPascals(Checks.finite(kilopascals, "kilopascals") * 1e3);
    }

    /**
     * The stress of {@code megapascals} MPa (N/mm²).
     *
     * @throws IllegalArgumentException if {@code megapascals} is NaN or infinite
     */
    public static Stress ofMegapascals(double megapascals) {
        return ofPascals(Checks.finite(megapascals, "megapascals") * 1e6);
    }

    /**
     * The stress of {@code gigapascals} GPa, the usual unit of a Young's modulus.
     *
     * @throws IllegalArgumentException if {@code gigapascals} is NaN or infinite
     */
    public static Stress ofGigapascals(double gigapascals) {
        return ofPascals(Checks.finite(gigapascals, "gigapascals") * 1e9);
    }

    /**
     * The stress of {@code psi} pound-force per square inch.
     *
     * @throws IllegalArgumentException if {@code psi} is NaN or infinite
     */
    public static Stress ofPsi(double psi) {
        return ofPascals(Checks.finite(psi, "psi") * PASCALS_PER_PSI);
    }

    /**
     * The stress of {@code ksi} thousand pound-force per square inch.
     *
     * @throws IllegalArgumentException if {@code ksi} is NaN or infinite
     */
    public static Stress ofKsi(double ksi) {
        return ofPascals(Checks.finite(ksi, "ksi") * (1e3 * PASCALS_PER_PSI));
    }

    /** The stress in Pa. */
    public double toPascals() {
        return pascals;
    }

    /** The stress in kPa. */
    public double toKilopascals() {
        return pascals / 1e3;
    }

    /** The stress in MPa. */
    public double toMegapascals() {
        return pascals / 1e6;
    }

    /** The stress in GPa. */
    public double toGigapascals() {
        return pascals / 1e9;
    }

    /** The stress in psi. */
    public double toPsi() {
        return pascals / PASCALS_PER_PSI;
    }

    /** The stress in ksi. */
    public double toKsi() {
        return pascals / (1e3 * PASCALS_PER_PSI);
    }

    /** This stress plus {@code other}. */
    public Stress plus(Stress other) {
        return ofPascals(pascals + other.pascals);
    }

    /** This stress minus {@code other}. */
    public Stress minus(Stress other) {
        return ofPascals(pascals - other.pascals);
    }

    /**
     * This stress times {@code factor}.
     *
     * @throws IllegalArgumentException if {@code factor} is NaN or infinite, or the product
     *                                  overflows
     */
    public Stress multipliedBy(double factor) {
        return ofPascals(pascals * Checks.finite(factor, "factor"));
    }

    /**
     * The ratio of this stress to {@code other} (a utilisation, say).
     *
     * @throws IllegalArgumentException if {@code other} is zero
     */
    public double dividedBy(Stress other) {
        if (other.pascals == 0) {
            throw new IllegalArgumentException("other must be != 0: " + other.pascals);
        }
        return pascals / other.pascals;
    }

    /** The stress of the opposite sign. */
    public Stress negated() {
        return ofPascals(-pascals);
    }

    /** The magnitude of this stress. */
    public Stress abs() {
        return ofPascals(Math.abs(pascals));
    }

    @Override
    public int compareTo(Stress other) {
        return Double.compare(pascals, other.pascals);
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof Stress && Double.compare(((Stress) o).pascals, pascals) == 0;
    }

    @Override
    public int hashCode() {
        return Double.hashCode(pascals);
    }

    /** The stress in MPa with six significant digits: {@code 80.0 MPa}. */
    @Override
    public String toString() {
        return Format.withUnit(toMegapascals(), "MPa");
    }
}
