package org.strainmath.bridge;

import java.util.Objects;

import org.strainmath.internal.Checks;
import org.strainmath.internal.Format;
import org.strainmath.quantity.Resistance;
import org.strainmath.quantity.Temperature;

/**
 * One lead wire of a bridge connection, from its length, cross-section and conductor material:
 * <pre>
 *   R(20 °C) = ρ20 · L / A
 *   R(T)     = R(20 °C) · (1 + α20 · (T − 20 °C))
 *
 *   ρ20  resistivity at 20 °C, Ω·mm²/m
 *   L    length of this one wire, m
 *   A    conductor cross-section, mm²
 *   α20  temperature coefficient of resistance at 20 °C, 1/K
 * </pre>
 * The linear temperature law holds to a fraction of a per cent for copper from about −50 °C to
 * 150 °C. Annealed copper per IEC 60028 (the International Annealed Copper Standard) is the
 * named default: ρ20 = 1/58 Ω·mm²/m = 0.017241 Ω·mm²/m and α20 = 0.00393 /K (both from
 * memory, not checked against the standard's text).
 *
 * <pre>
 *   LeadWire.copper(10, 0.14).resistance();     // 1.23153 Ω
 *   bridge.withThreeWireLeads(LeadWire.copper(10, 0.14).resistance());
 * </pre>
 *
 * <p>Immutable and thread-safe.
 */
public final class LeadWire {

    /** Resistivity of annealed copper at 20 °C, Ω·mm²/m (IEC 60028: 1/58; from memory). */
    public static final double COPPER_RESISTIVITY = 1.0 / 58;

    /**
     * Temperature coefficient of annealed copper's resistance at 20 °C, 1/K (IEC 60028; from
     * memory).
     */
    public static final double COPPER_TEMPERATURE_COEFFICIENT = 0.00393;

    private static final double REFERENCE_CELSIUS = 20.0;

    private final double lengthMetres;
    private final double crossSectionSquareMillimetres;
    private final double resistivity;
    private final double temperatureCoefficient;

    private LeadWire(double lengthMetres, double crossSectionSquareMillimetres,
            double resistivity, double temperatureCoefficient) {
        this.lengthMetres = lengthMetres;
        this.crossSectionSquareMillimetres = crossSectionSquareMillimetres;
        this.resistivity = resistivity;
        this.temperatureCoefficient = temperatureCoefficient;
    }

    /**
     * An annealed copper wire of {@code lengthMetres} m and {@code crossSectionSquareMillimetres}
     * mm² (IEC 60028 data).
     *
     * @throws IllegalArgumentException if the length is negative, the cross-section not
     *                                  positive, or either is not finite
     */
    public static LeadWire copper(double lengthMetres, double crossSectionSquareMillimetres) {
        return of(lengthMetres, crossSectionSquareMillimetres, COPPER_RESISTIVITY,
                COPPER_TEMPERATURE_COEFFICIENT);
    }

    /**
     * A wire of any conductor: {@code resistivity} in Ω·mm²/m at 20 °C and
     * {@code temperatureCoefficient} in 1/K at 20 °C.
     *
     * @throws IllegalArgumentException if the length is negative, the cross-section or the
     *                                  resistivity not positive, or any value not finite
     */
    public static LeadWire of(double lengthMetres, double crossSectionSquareMillimetres,
            double resistivity, double temperatureCoefficient) {
        Checks.nonNegativeFinite(lengthMetres, "lengthMetres");
        Checks.positiveFinite(crossSectionSquareMillimetres, "crossSectionSquareMillimetres");
        Checks.positiveFinite(resistivity, "resistivity");
        Checks.finite(temperatureCoefficient, "temperatureCoefficient");
        return new LeadWire(lengthMetres, crossSectionSquareMillimetres, resistivity,
                temperatureCoefficient);
    }

    /** The resistance of this wire at 20 °C. */
    public Resistance resistance() {
        return Resistance.ofOhms(resistivity * lengthMetres / crossSectionSquareMillimetres);
    }

    /**
     * The resistance of this wire at {@code temperature}, by the linear law of the class
     * comment.
     *
     * @throws NullPointerException     if {@code temperature} is null
     * @throws IllegalArgumentException if the law gives a negative resistance (far outside its
     *                                  range)
     */
    public Resistance resistanceAt(Temperature temperature) {
        Objects.requireNonNull(temperature, "temperature");
        double factor = 1 + temperatureCoefficient * (temperature.toCelsius() - REFERENCE_CELSIUS);
        if (!(factor >= 0)) {
            throw new IllegalArgumentException("temperature must keep the resistance positive"
                    + " under the linear law: " + temperature);
        }
        return resistance().multipliedBy(factor);
    }

    /** The length of this one wire, m. */
    public double lengthMetres() {
        return lengthMetres;
    }

    /** The conductor cross-section, mm². */
    public double crossSectionSquareMillimetres() {
        return crossSectionSquareMillimetres;
    }

    /** {@code LeadWire[10.0 m, 0.14 mm², 1.23153 Ω at 20 °C]}. */
    @Override
    public String toString() {
        return "LeadWire[" + Format.withUnit(lengthMetres, "m") + ", "
                + Format.withUnit(crossSectionSquareMillimetres, "mm²") + ", " + resistance()
                + " at 20 °C]";
    }
}
