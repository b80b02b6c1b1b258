package org.strainmath.quantity;

import org.strainmath.internal.Checks;
import org.strainmath.internal.Format;

/**
 * A ratio of two voltages, kept in V/V and shown in mV/V: the output of a Wheatstone bridge
 * relative to its excitation, Vo/Vex, and the sensitivity of a transducer.
 *
 * <pre>
 *   VoltageRatio r = VoltageRatio.ofMillivoltsPerVolt(2.0);   // 0.002 V/V
 *   r.times(Voltage.ofVolts(10));                            // 20.0 mV
 *   r.toString();                                            // "2.0 mV/V"
 * </pre>
 *
 * <p>Immutable and thread-safe. Ordered by value; {@code equals} compares the value exactly.
 */
public final class VoltageRatio implements Comparable<VoltageRatio> {

    /** A ratio of zero: a balanced bridge. */
    public static final VoltageRatio ZERO = new VoltageRatio(0.0);

    private final double voltsPerVolt;

    private VoltageRatio(double voltsPerVolt) {
        this.voltsPerVolt = voltsPerVolt;
    }

    /**
     * The ratio of {@code voltsPerVolt} V/V.
     *
     * @throws IllegalArgumentException if {@code voltsPerVolt} is NaN or infinite
     */
    public static VoltageRatio ofVoltsPerVolt(double voltsPerVolt) {
        return new VoltageRatio(Checks.finite(voltsPerVolt, "voltsPerVolt") + 0.0);
    }

    /**
     * The ratio of {@code millivoltsPerVolt} mV/V.
     *
     * @throws IllegalArgumentException if {@code millivoltsPerVolt} is NaN or infinite
     */
    public static VoltageRatio ofMillivoltsPerVolt(double millivoltsPerVolt) {
        return ofVoltsPerVolt(Checks.finite(millivoltsPerVolt, "millivoltsPerVolt") / 1e3);
    }

    /** The ratio in V/V. */
    public double toVoltsPerVolt() {
        return voltsPerVolt;
    }

    /** The ratio in mV/V. */
    public double toMillivoltsPerVolt() {
        return voltsPerVolt * 1e3;
    }

    /** The voltage this ratio gives at {@code excitation}: Vo = (Vo/Vex)·Vex. */
    public Voltage times(Voltage excitation) {
        return Voltage.ofVolts(voltsPerVolt * excitation.toVolts());
    }

    /** This ratio plus {@code other}. */
    public VoltageRatio plus(VoltageRatio other) {
        return ofVoltsPerVolt(voltsPerVolt + other.voltsPerVolt);
    }

    /** This ratio minus {@code other}. */
    public VoltageRatio minus(VoltageRatio other) {
        return ofVoltsPerVolt(voltsPerVolt - other.voltsPerVolt);
    }

    /**
     * This ratio times {@code factor}.
     *
     * @throws IllegalArgumentException if {@code factor} is NaN or infinite
     */
    public VoltageRatio multipliedBy(double factor) {
        return ofVoltsPerVolt(voltsPerVolt * Checks.finite(factor, "factor"));
    }

    @Override
    public int compareTo(VoltageRatio other) {
        return Double.compare(voltsPerVolt, other.voltsPerVolt);
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof VoltageRatio
                && Double.compare(((VoltageRatio) o).voltsPerVolt, voltsPerVolt) == 0;
    }

    @Override
    public int hashCode() {
        return Double.hashCode(voltsPerVolt);
    }

    /** The ratio in mV/V with six significant digits: {@code 0.499500 mV/V} shows as {@code 0.4995 mV/V}. */
    @Override
    public String toString() {
        return Format.withUnit(toMillivoltsPerVolt(), "mV/V");
    }
}
