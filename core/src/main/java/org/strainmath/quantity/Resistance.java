package org.strainmath.quantity;

import org.strainmath.internal.Checks;
import org.strainmath.internal.Format;

/**
 * Electrical resistance in ohms (Ω), never negative. Zero is allowed: a lead wire may be
 * modelled as ideal.
 *
 * <pre>
 *   Resistance.ofOhms(350).toString();          // "350.0 Ω"
 *   Resistance.ofKiloohms(174.65).toOhms();     // 174650.0
 *   Resistance.ofOhms(120).inParallelWith(Resistance.ofKiloohms(59.88)); // 119.76 Ω
 * </pre>
 *
 * <p>Immutable and thread-safe. Ordered by value; {@code equals} compares the value exactly.
 */
public final class Resistance implements Comparable<Resistance> {

    /** Zero resistance (an ideal wire). */
    public static final Resistance ZERO = new Resistance(0.0);

    private final double ohms;

    private Resistance(double ohms) {
        this.ohms = ohms;
    }

    /**
     * The resistance of {@code ohms} Ω.
     *
     * @throws IllegalArgumentException if {@code ohms} is negative, NaN or infinite
     */
    public static Resistance ofOhms(double ohms) {
        return new Resistance(Checks.nonNegativeFinite(ohms, "ohms") + 0.0);
    }

    /**
     * The resistance of {@code kiloohms} kΩ.
     *
     * @throws IllegalArgumentException if {@code kiloohms} is negative, NaN or infinite
     */
    public static Resistance ofKiloohms(double kiloohms) {
        return ofOhms(Checks.nonNegativeFinite(kiloohms, "kiloohms") * 1e3);
    }

    /**
     * The resistance of {@code megaohms} MΩ.
     *
     * @throws IllegalArgumentException if {@code megaohms} is negative, NaN or infinite
     */
    public static Resistance ofMegaohms(double megaohms) {
        return ofOhms(Checks.nonNegativeFinite(megaohms, "megaohms") * 1e6);
    }

    /** The resistance in Ω. */
    public double toOhms() {
        return ohms;
    }

    /** The resistance in kΩ. */
    public double toKiloohms() {
        return ohms / 1e3;
    }

    /** The resistance in MΩ. */
    public double toMegaohms() {
        return ohms / 1e6;
    }

    /** This resistance in series with {@code other}: R + R'. */
    public Resistance plus(Resistance other) {
        return ofOhms(ohms + other.ohms);
    }

    /**
     * This resistance in parallel with {@code other}: R·R' / (R + R'), and zero if either is
     * zero.
     */
    public Resistance inParallelWith(Resistance other) {
        if (ohms == 0 || other.ohms == 0) {
            return ZERO;
        }
        return ofOhms(ohms * other.ohms / (ohms + other.ohms));
    }

    /**
     * This resistance times {@code factor}.
     *
     * @throws IllegalArgumentException if {@code factor} is negative, NaN or infinite
     */
    public Resistance multipliedBy(double factor) {
        return ofOhms(ohms * Checks.nonNegativeFinite(factor, "factor"));
    }

    /** Whether this resistance is zero. */
    public boolean isZero() {
        return ohms == 0;
    }

    @Override
    public int compareTo(Resistance other) {
        return Double.compare(ohms, other.ohms);
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof Resistance && Double.compare(((Resistance) o).ohms, ohms) == 0;
    }

    @Override
    public int hashCode() {
        return Double.hashCode(ohms);
    }

    /** The resistance in Ω, kΩ or MΩ, whichever reads best: {@code 350.0 Ω}, {@code 174.65 kΩ}. */
    @Override
    public String toString() {
        if (ohms >= 1e6) {
            return Format.withUnit(toMegaohms(), "MΩ");
        }
        if (ohms >= 1e3) {
            return Format.withUnit(toKiloohms(), "kΩ");
        }
        return Format.withUnit(ohms, "Ω");
    }
}
