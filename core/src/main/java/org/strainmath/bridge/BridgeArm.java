package org.strainmath.bridge;

import java.io.InvalidObjectException;
import java.io.ObjectInputStream;
import java.io.Serializable;
import java.util.Objects;
import java.util.Optional;

import org.strainmath.internal.Checks;
import org.strainmath.internal.Format;
import org.strainmath.internal.SerialForms;
import org.strainmath.quantity.Resistance;

/**
 * One arm of a Wheatstone bridge: a completion resistor, a dummy gauge (a gauge that sees no
 * strain, for temperature compensation) or an active gauge that sees a fixed multiple of the
 * measured strain.
 *
 * <p>The multiple states what the gauge sees in the arrangement: 1 for a gauge along the
 * measured strain, −1 for a gauge on the opposite face in bending, −ν for a Poisson gauge
 * across an axially loaded member. The resistance of the arm at the measured strain ε is
 * <pre>
 *   R(ε) = R0 · (1 + K · m · ε)
 *
 *   R0  nominal resistance of the resistor or gauge, Ω
 *   K   gauge factor (0 for a completion resistor or a dummy gauge)
 *   m   strain multiple, dimensionless
 * </pre>
 *
 * <p>Immutable and thread-safe; equal to another arm of the same kind and data.
 * Serializable, for a stream engine that ships configurations to other processes: the
 * stream holds the defining values only, checked again as the factories check them.
 */
public final class BridgeArm implements Serializable {

    @SuppressWarnings("serial") // never serialized: the serial form holds the defining values
    private final Resistance nominalResistance;
    private final StrainGauge gauge;     // null for a completion resistor
    private final double strainMultiple; // 0 for a completion resistor or a dummy gauge

    private BridgeArm(Resistance nominalResistance, StrainGauge gauge, double strainMultiple) {
        this.nominalResistance = nominalResistance;
        this.gauge = gauge;
        this.strainMultiple = strainMultiple;
    }

    /**
     * A fixed completion resistor of {@code resistance}.
     *
     * @throws NullPointerException     if {@code resistance} is null
     * @throws IllegalArgumentException if {@code resistance} is zero
     */
    public static BridgeArm completion(Resistance resistance) {
        Objects.requireNonNull(resistance, "resistance");
        Checks.positiveFinite(resistance.toOhms(), "resistance");
        return new BridgeArm(resistance, null, 0.0);
    }

    /**
     * A dummy gauge: {@code gauge} mounted where it sees no strain.
     *
     * @throws NullPointerException if {@code gauge} is null
     */
    public static BridgeArm dummy(StrainGauge gauge) {
        Objects.requireNonNull(gauge, "gauge");
        return new BridgeArm(gauge.nominalResistance(), gauge, 0.0);
    }

    /**
     * An active gauge that sees {@code strainMultiple} times the measured strain.
     *
     * @throws NullPointerException     if {@code gauge} is null
     * @throws IllegalArgumentException if {@code strainMultiple} is zero, NaN or infinite (a
     *                                  gauge that sees no strain is a {@link #dummy dummy})
     */
    public static BridgeArm active(StrainGauge gauge, double strainMultiple) {
        Objects.requireNonNull(gauge, "gauge");
        Checks.finite(strainMultiple, "strainMultiple");
        if (strainMultiple == 0) {
            throw new IllegalArgumentException(
                    "strainMultiple must be != 0 (use a dummy gauge): " + strainMultiple);
        }
        return new BridgeArm(gauge.nominalResistance(), gauge, strainMultiple);
    }

    /** The unstrained resistance of this arm. */
    public Resistance nominalResistance() {
        return nominalResistance;
    }

    /** The gauge in this arm; empty for a completion resistor. */
    public Optional<StrainGauge> gauge() {
        return Optional.ofNullable(gauge);
    }

    /** The multiple of the measured strain this arm sees; 0 unless it is active. */
    public double strainMultiple() {
        return strainMultiple;
    }

    /** Whether this arm holds a gauge that sees strain. */
    public boolean isActive() {
        return strainMultiple != 0;
    }

    /** Whether this arm holds a gauge that sees no strain. */
    public boolean isDummy() {
        return gauge != null && strainMultiple == 0;
    }

    /** Whether this arm is a completion resistor. */
    public boolean isCompletion() {
        return gauge == null;
    }

    /** The gauge factor of this arm's gauge as it enters the bridge: K, or 0 if not active. */
    double effectiveGaugeFactor() {
        return isActive() ? gauge.gaugeFactor() : 0.0;
    }

    /**
     * A copy of this arm whose unstrained resistance is {@code resistance}; a gauge keeps its
     * gauge factor and strain multiple.
     */
    BridgeArm withNominalResistance(Resistance resistance) {
        if (gauge == null) {
            return completion(resistance);
        }
        return new BridgeArm(resistance, gauge.withNominalResistance(resistance), strainMultiple);
    }

    /** Equal when kind, resistance, gauge and strain multiple are equal. */
    @Override
    public boolean equals(Object o) {
        if (!(o instanceof BridgeArm)) {
            return false;
        }
        BridgeArm other = (BridgeArm) o;
        return nominalResistance.equals(other.nominalResistance)
                && Objects.equals(gauge, other.gauge)
                && Double.compare(strainMultiple, other.strainMultiple) == 0;
    }

    @Override
    public int hashCode() {
        return Objects.hash(nominalResistance, gauge, strainMultiple);
    }

    /**
     * {@code active gauge ×1.0 (120.0 Ω, K=2.0)}, {@code dummy gauge (120.0 Ω, K=2.0)} or
     * {@code completion resistor 120.0 Ω}.
     */
    @Override
    public String toString() {
        if (gauge == null) {
            return "completion resistor " + nominalResistance;
        }
        String data = "(" + nominalResistance + ", K=" + Format.number(gauge.gaugeFactor()) + ")";
        if (strainMultiple == 0) {
            return "dummy gauge " + data;
        }
        return "active gauge ×" + Format.number(strainMultiple) + " " + data;
    }

    // ---------------------------------------------------------------- serial form

    private static final long serialVersionUID = 1L;

    /** Writes the serial form ({@link Serial}): the defining values only. */
    private Object writeReplace() {
        return new Serial(nominalResistance.toOhms(), gauge, strainMultiple);
    }

    /** A stream must hold the serial form, never the fields of this class. */
    private void readObject(ObjectInputStream in) throws InvalidObjectException {
        throw SerialForms.proxyRequired("BridgeArm");
    }

    /**
     * The serial form of a BridgeArm: its defining values, rebuilt on reading through the checks
     * of the factories.
     */
    private static final class Serial implements Serializable {
        private static final long serialVersionUID = 1L;
        private final double ohms;
        private final StrainGauge gauge;
        private final double multiple;

        Serial(double ohms, StrainGauge gauge, double multiple) {
            this.ohms = ohms;
            this.gauge = gauge;
            this.multiple = multiple;
        }

        private Object readResolve() throws InvalidObjectException {
            return SerialForms.rebuild("BridgeArm", () -> {
                Checks.positiveFinite(ohms, "resistance");
                Checks.finite(multiple, "strainMultiple");
                if (gauge == null && multiple != 0) {
                    throw new IllegalArgumentException("strainMultiple must be 0 for a completion"
                            + " resistor: " + multiple);
                }
                return new BridgeArm(Resistance.ofOhms(ohms), gauge, multiple);
            });
        }
    }
}
