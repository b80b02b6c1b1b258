package org.strainmath.quantity;

import org.strainmath.internal.Checks;
import org.strainmath.internal.Format;

/**
 * A plane angle, held in radians, positive counter-clockwise (from the reference axis of a
 * rosette or a lamina, as DESIGN.md states the convention).
 *
 * <pre>
 *   Angle a = Angle.ofDegrees(45);
 *   a.toRadians();                         // 0.7853981633974483
 *   a.toString();                          // "45.0°"
 * </pre>
 *
 * <p>Immutable and thread-safe. Ordered by value; {@code equals} compares the value exactly.
 */
public final class Angle implements Comparable<Angle> {

    /** The zero angle. */
    public static final Angle ZERO = new Angle(0.0);

    private final double radians;

    private Angle(double radians) {
        this.radians = radians;
    }

    /**
     * The angle of {@code radians} rad.
     *
     * @throws IllegalArgumentException if {@code radians} is NaN or infinite
     */
    public static Angle ofRadians(double radians) {
        return new Angle(Checks.finite(radians, "radians") + 0.0);
    }

    /**
     * The angle of {@code degrees}° (π/180 rad each).
     *
     * @throws IllegalArgumentException if {@code degrees} is NaN or infinite
     */
    public static Angle ofDegrees(double degrees) {
        return ofRadians(Math.toRadians(Checks.finite(degrees, "degrees")));
    }

    /** The angle in radians. */
    public double toRadians() {
        return radians;
    }

    /** The angle in degrees. */
    public double toDegrees() {
        return Math.toDegrees(radians);
    }

    /** This angle plus {@code other}. */
    public Angle plus(Angle other) {
        return ofRadians(radians + other.radians);
    }

    /** This angle minus {@code other}. */
    public Angle minus(Angle other) {
        return ofRadians(radians - other.radians);
    }

    /** The angle of the opposite sense (clockwise for a counter-clockwise one). */
    public Angle negated() {
        return ofRadians(-radians);
    }

    @Override
    public int compareTo(Angle other) {
        return Double.compare(radians, other.radians);
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof Angle && Double.compare(((Angle) o).radians, radians) == 0;
    }

    @Override
    public int hashCode() {
        return Double.hashCode(radians);
    }

    /** The angle in degrees with six significant digits: {@code 45.0°}. */
    @Override
    public String toString() {
        return Format.number(toDegrees()) + "°";
    }
}
