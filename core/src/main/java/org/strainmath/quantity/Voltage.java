package org.strainmath.quantity;

import org.strainmath.internal.Checks;
import org.strainmath.internal.Format;

/**
 * An electrical voltage in volts (V), of either sign.
 *
 * <pre>
 *   Voltage.ofVolts(12).toString();              // "12.0 V"
 *   Voltage.ofMillivolts(1.5).toMicrovolts();    // 1500.0
 *   Voltage.ofMillivolts(3).ratioTo(Voltage.ofVolts(10)); // 0.3 mV/V
 * </pre>
 *
 * <p>Immutable and thread-safe. Ordered by value; {@code equals} compares the value exactly.
 */
public final class Voltage implements Comparable<Voltage> {

    /** Zero volts. */
    public static final Voltage ZERO = new Voltage(0.0);

    private final double volts;

    private Voltage(double volts) {
        this.volts = volts;
    }

    /**
     * The voltage of {@code volts} V.
     *
     * @throws IllegalArgumentException if {@code volts} is NaN or infinite
     */
    public static Voltage ofVolts(double volts) {
        return new Voltage(Checks.finite(volts, "volts") + 0.0);
    }

    /**
     * The voltage of {@code millivolts} mV.
     *
     * @throws IllegalArgumentException if {@code millivolts} is NaN or infinite
     */
    public static Voltage ofMillivolts(double millivolts) {
        return ofVolts(Checks.finite(millivolts, "millivolts") / 1e3);
    }

    /**
     * The voltage of {@code microvolts} µV.
     *
     * @throws IllegalArgumentException if {@code microvolts} is NaN or infinite
     */
    public static Voltage ofMicrovolts(double microvolts) {
        return ofVolts(Checks.finite(microvolts, "microvolts") / 1e6);
    }

    /** The voltage in V. */
    public double toVolts() {
        return volts;
    }

    /** The voltage in mV. */
    public double toMillivolts() {
        return volts * 1e3;
    }

    /** The voltage in µV. */
    public double toMicrovolts() {
        return volts * 1e6;
    }

    /** This voltage plus {@code other}. */
    public Voltage plus(Voltage other) {
        return ofVolts(volts + other.volts);
    }

    /** This voltage minus {@code other}. */
    public Voltage minus(Voltage other) {
        return ofVolts(volts - other.volts);
    }

    /**
     * This voltage times {@code factor} (an amplifier gain, say).
     *
     * @throws IllegalArgumentException if {@code factor} is NaN or infinite
     */
    public Voltage multipliedBy(double factor) {
        return ofVolts(volts * Checks.finite(factor, "factor"));
    }

    /**
     * This voltage as a ratio to {@code reference}: the bridge output ratio Vo/Vex when this is
     * the output voltage and {@code reference} the excitation.
     *
     * @throws IllegalArgumentException if {@code reference} is zero
     */
    public VoltageRatio ratioTo(Voltage reference) {
        if (reference.volts == 0) {
            throw new IllegalArgumentException("reference must be != 0: " + reference.volts);
        }
        return VoltageRatio.ofVoltsPerVolt(volts / reference.volts);
    }

    @Override
    public int compareTo(Voltage other) {
        return Double.compare(volts, other.volts);
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof Voltage && Double.compare(((Voltage) o).volts, volts) == 0;
    }

    @Override
    public int hashCode() {
        return Double.hashCode(volts);
    }

    /** The voltage in V, mV or µV, whichever reads best: {@code 12.0 V}, {@code 1.49813 mV}. */
    @Override
    public String toString() {
        double magnitude = Math.abs(volts);
        if (magnitude >= 1 || magnitude == 0) {
            return Format.withUnit(volts, "V");
        }
        if (magnitude >= 1e-3) {
            return Format.withUnit(toMillivolts(), "mV");
        }
        return Format.withUnit(toMicrovolts(), "µV");
    }
}
