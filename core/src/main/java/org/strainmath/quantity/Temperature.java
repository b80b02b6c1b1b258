package org.strainmath.quantity;

import org.strainmath.internal.Checks;
import org.strainmath.internal.Format;

/**
 * A thermodynamic temperature, kept in kelvin (K), made from and read in K, °C or °F, whichever
 * the data sheet uses.
 *
 * <pre>
 *   T(K) = T(°C) + 273.15
 *   T(°C) = (T(°F) − 32) × 5/9
 * </pre>
 * (ISO 80000-5; NIST SP 811, appendix B.)
 *
 * <pre>
 *   Temperature.ofCelsius(23).toString();       // "23.0 °C"
 *   Temperature.ofFahrenheit(212).toCelsius();  // 100.0
 * </pre>
 *
 * <p>Immutable and thread-safe. Ordered by value; {@code equals} compares the kelvin value
 * exactly, so that a temperature made in °F may differ from the "same" one made in °C in the
 * last bit.
 */
public final class Temperature implements Comparable<Temperature> {

    private static final double CELSIUS_OFFSET = 273.15;

    private final double kelvin;

    private Temperature(double kelvin) {
        this.kelvin = kelvin;
    }

    /**
     * The temperature of {@code kelvin} K.
     *
     * @throws IllegalArgumentException if {@code kelvin} is negative, NaN or infinite
     */
    public static Temperature ofKelvin(double kelvin) {
        return new Temperature(Checks.nonNegativeFinite(kelvin, "kelvin") + 0.0);
    }

    /**
     * The temperature of {@code celsius} °C.
     *
     * @throws IllegalArgumentException if {@code celsius} is below −273.15, NaN or infinite
     */
    public static Temperature ofCelsius(double celsius) {
        Checks.atLeastFinite(celsius, -CELSIUS_OFFSET, "celsius");
        return new Temperature(Math.max(0.0, celsius + CELSIUS_OFFSET));
    }

    /**
     * The temperature of {@code fahrenheit} °F.
     *
     * @throws IllegalArgumentException if {@code fahrenheit} is below −459.67, NaN or infinite
     */
    public static Temperature ofFahrenheit(double fahrenheit) {
        Checks.atLeastFinite(fahrenheit, -459.67, "fahrenheit");
        return new Temperature(Math.max(0.0, (fahrenheit - 32) * 5 / 9 + CELSIUS_OFFSET));
    }

    /** The temperature in K. */
    public double toKelvin() {
        return kelvin;
    }

    /** The temperature in °C. */
    public double toCelsius() {
        return kelvin - CELSIUS_OFFSET;
    }

    /** The temperature in °F. */
    public double toFahrenheit() {
        return (kelvin - CELSIUS_OFFSET) * 9 / 5 + 32;
    }

    /** This temperature minus {@code other}, in kelvin (equal to the difference in °C). */
    public double kelvinAbove(Temperature other) {
        return kelvin - other.kelvin;
    }

    @Override
    public int compareTo(Temperature other) {
        return Double.compare(kelvin, other.kelvin);
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof Temperature && Double.compare(((Temperature) o).kelvin, kelvin) == 0;
    }

    @Override
    public int hashCode() {
        return Double.hashCode(kelvin);
    }

    /** The temperature in °C with six significant digits: {@code 23.0 °C}. */
    @Override
    public String toString() {
        return Format.withUnit(toCelsius(), "°C");
    }
}
