package org.strainmath.fatigue;

import java.io.InvalidObjectException;
import java.io.ObjectInputStream;
import java.io.Serializable;
import java.util.Optional;
import java.util.OptionalDouble;

import org.strainmath.internal.Checks;
import org.strainmath.internal.Format;
import org.strainmath.internal.SerialForms;
import org.strainmath.quantity.Stress;

/**
 * An S–N curve in stress ranges, the form of the design codes for steel and aluminium
 * structures: Basquin's power law through a reference point, with an optional knee below which
 * a second slope applies and an optional cut-off below which a range does no damage.
 * <pre>
 *   N = N_ref · (Δσ_ref / Δσ)^m1          for Δσ ≥ Δσ_knee
 *   N = N_knee · (Δσ_knee / Δσ)^m2        for Δσ &lt; Δσ_knee, Δσ_knee = Δσ_ref·(N_ref/N_knee)^(1/m1)
 *   N = ∞                                 for Δσ &lt; Δσ_cut
 * </pre>
 * Δσ is the stress range (Pa), N the cycles to failure, m1 and m2 the (positive) slopes of the
 * curve on log–log axes. The curve is continuous at the knee. A material curve given in
 * amplitudes and reversals, σa = σf'·(2N)^b (Basquin; Dowling, <i>Mechanical Behavior of
 * Materials</i>, the stress–life equation, number from memory) is the same law with
 * Δσ_ref = 2σf', N_ref = ½ and m1 = −1/b ({@link #ofBasquin}).
 *
 * <pre>
 *   // EN 1993-1-9 (Eurocode 3), detail category 71: Δσ_C = 71 MPa at 2·10⁶ cycles, m = 3 to the
 *   // constant-amplitude fatigue limit at 5·10⁶, then m = 5 to the cut-off at 10⁸ cycles
 *   SnCurve detail71 = SnCurve.ofRange(Stress.ofMegapascals(71), 2e6, 3)
 *           .withKnee(5e6, 5).withCutOffAt(1e8);
 *   detail71.rangeAt(5e6);      // 52.3 MPa, 0.737·Δσ_C
 *   detail71.cutOff();          // 28.7 MPa, 0.549·Δσ_D
 * </pre>
 * The design codes define their own curves, detail categories, partial factors and the range
 * to use (nominal, hot-spot or notch stress); take those from the code that applies.
 * <i>Accuracy</i>: within an ulp or two of the formula. The per-cycle path
 * ({@link #cyclesToFailure(double)}) uses {@link Math#pow} (1 ulp by its specification; it may
 * differ in the last bit between JDKs), since {@code StrictMath.pow} allocated 96 bytes a call
 * on JDK 17 (measured); the rest uses {@link StrictMath}.
 *
 * <p>Immutable and thread-safe.
 * Serializable, for a stream engine that ships configurations to other processes: the
 * stream holds the defining values only, checked again as the factories check them.
 */
public final class SnCurve implements Serializable {

    private final double referenceRange;
    private final double referenceCycles;
    private final double slope;
    /** +∞ and 0 without a knee. */
    private final double kneeCycles;
    private final double kneeRange;
    /** NaN without a knee. */
    private final double secondSlope;
    /** 0 without a cut-off. */
    private final double cutOff;

    private SnCurve(double referenceRange, double referenceCycles, double slope,
            double kneeCycles, double secondSlope, double cutOff) {
        this.referenceRange = referenceRange;
        this.referenceCycles = referenceCycles;
        this.slope = slope;
        this.kneeCycles = kneeCycles;
        this.secondSlope = secondSlope;
        this.kneeRange = kneeCycles == Double.POSITIVE_INFINITY ? 0.0
                : referenceRange * StrictMath.pow(referenceCycles / kneeCycles, 1 / slope);
        this.cutOff = cutOff;
    }

    /**
     * The curve of slope {@code slope} through {@code range} at {@code cycles}: a detail
     * category Δσ_C at 2·10⁶ cycles, say.
     *
     * @throws NullPointerException     if {@code range} is null
     * @throws IllegalArgumentException if the range, the cycles or the slope is not finite and
     *                                  positive
     */
    public static SnCurve ofRange(Stress range, double cycles, double slope) {
        double r = Checks.positiveFinite(range.toPascals(), "range");
        return new SnCurve(r, Checks.positiveFinite(cycles, "cycles"),
                Checks.positiveFinite(slope, "slope"), Double.POSITIVE_INFINITY, Double.NaN, 0);
    }

    /**
     * Basquin's curve of a material in amplitudes, σa = σf'·(2N)^b, with the fatigue strength
     * coefficient σf' and exponent b of a data sheet (fully reversed loading).
     *
     * @throws NullPointerException     if {@code coefficient} is null
     * @throws IllegalArgumentException if σf' is not positive, or b is not in (−1, 0)
     */
    public static SnCurve ofBasquin(Stress coefficient, double exponent) {
        double s = Checks.positiveFinite(coefficient.toPascals(), "coefficient");
        if (!(exponent < 0 && exponent > -1)) {
            throw new IllegalArgumentException("exponent must be in (-1, 0): " + exponent);
        }
        return new SnCurve(2 * s, 0.5, -1 / exponent, Double.POSITIVE_INFINITY, Double.NaN, 0);
    }

    /**
     * A copy whose slope becomes {@code secondSlope} below the range at {@code cycles} (the
     * constant-amplitude fatigue limit of the design codes, where variable-amplitude loading
     * follows a shallower line: m = 5 in EN 1993-1-9 and DNV-RP-C203).
     *
     * @throws IllegalArgumentException if {@code cycles} or {@code secondSlope} is not finite
     *                                  and positive
     */
    public SnCurve withKnee(double cycles, double secondSlope) {
        return new SnCurve(referenceRange, referenceCycles, slope,
                Checks.positiveFinite(cycles, "cycles"),
                Checks.positiveFinite(secondSlope, "secondSlope"), cutOff);
    }

    /**
     * A copy in which ranges below {@code range} do no damage (a cut-off limit, or a fatigue
     * limit for constant-amplitude loading).
     *
     * @throws NullPointerException     if {@code range} is null
     * @throws IllegalArgumentException if {@code range} is not positive
     */
    public SnCurve withCutOff(Stress range) {
        return new SnCurve(referenceRange, referenceCycles, slope, kneeCycles, secondSlope,
                Checks.positiveFinite(range.toPascals(), "range"));
    }

    /**
     * A copy in which ranges below the curve's range at {@code cycles} do no damage: 10⁸ for
     * the cut-off of EN 1993-1-9; the knee's cycles for a fatigue limit there.
     *
     * @throws IllegalArgumentException if {@code cycles} is not finite and positive
     */
    public SnCurve withCutOffAt(double cycles) {
        Checks.positiveFinite(cycles, "cycles");
        return new SnCurve(referenceRange, referenceCycles, slope, kneeCycles, secondSlope,
                rangeOnLines(cycles));
    }

    /**
     * The cycles to failure at {@code range}: +∞ below the cut-off and for a range of 0.
     *
     * @throws NullPointerException if {@code range} is null
     * @throws IllegalArgumentException if {@code range} is negative
     */
    public double cyclesToFailure(Stress range) {
        return cyclesToFailure(Checks.nonNegativeFinite(range.toPascals(), "range"));
    }

    /**
     * The cycles to failure at the range {@code pascals}, the per-cycle path of a damage sum:
     * never throws; NaN for a range that is negative or not finite, +∞ below the cut-off and
     * for 0.
     */
    public double cyclesToFailure(double pascals) {
        if (!(pascals >= 0) || pascals == Double.POSITIVE_INFINITY) {
            return Double.NaN;
        }
        if (pascals < cutOff || pascals == 0) {
            return Double.POSITIVE_INFINITY;
        }
        if (pascals >= kneeRange) {
            return referenceCycles * Math.pow(referenceRange / pascals, slope);
        }
        return kneeCycles * Math.pow(kneeRange / pascals, secondSlope);
    }

    /**
     * The range at which the curve's sloped lines give {@code cycles} to failure (the cut-off
     * aside): the inverse of {@link #cyclesToFailure(double)} above the cut-off.
     *
     * @throws IllegalArgumentException if {@code cycles} is not finite and positive
     */
    public Stress rangeAt(double cycles) {
        return Stress.ofPascals(rangeOnLines(Checks.positiveFinite(cycles, "cycles")));
    }

    private double rangeOnLines(double cycles) {
        if (cycles <= kneeCycles) {
            return referenceRange * StrictMath.pow(referenceCycles / cycles, 1 / slope);
        }
        return kneeRange * StrictMath.pow(kneeCycles / cycles, 1 / secondSlope);
    }

    /** The reference range Δσ_ref. */
    public Stress referenceRange() {
        return Stress.ofPascals(referenceRange);
    }

    /** The cycles N_ref at the reference range. */
    public double referenceCycles() {
        return referenceCycles;
    }

    /** The slope m1 above the knee. */
    public double slope() {
        return slope;
    }

    /** The cycles at the knee, if there is one. */
    public OptionalDouble kneeCycles() {
        return Double.isNaN(secondSlope) ? OptionalDouble.empty() : OptionalDouble.of(kneeCycles);
    }

    /** The slope m2 below the knee, if there is one. */
    public OptionalDouble secondSlope() {
        return Double.isNaN(secondSlope) ? OptionalDouble.empty() : OptionalDouble.of(secondSlope);
    }

    /** The range below which no damage is done, if there is one. */
    public Optional<Stress> cutOff() {
        return cutOff == 0 ? Optional.empty() : Optional.of(Stress.ofPascals(cutOff));
    }

    @Override
    public boolean equals(Object o) {
        if (!(o instanceof SnCurve)) {
            return false;
        }
        SnCurve c = (SnCurve) o;
        return Double.compare(c.referenceRange, referenceRange) == 0
                && Double.compare(c.referenceCycles, referenceCycles) == 0
                && Double.compare(c.slope, slope) == 0
                && Double.compare(c.kneeCycles, kneeCycles) == 0
                && Double.compare(c.secondSlope, secondSlope) == 0
                && Double.compare(c.cutOff, cutOff) == 0;
    }

    @Override
    public int hashCode() {
        long h = Double.hashCode(referenceRange);
        for (double x : new double[] {referenceCycles, slope, kneeCycles, secondSlope, cutOff}) {
            h = 31 * h + Double.hashCode(x);
        }
        return Long.hashCode(h);
    }

    /**
     * {@code SnCurve[71.0 MPa at 2.0e6 cycles, m = 3.0; m = 5.0 below 52.3 MPa (5.0e6 cycles);
     * no damage below 28.7 MPa]}.
     */
    @Override
    public String toString() {
        StringBuilder s = new StringBuilder("SnCurve[")
                .append(Stress.ofPascals(referenceRange)).append(" at ")
                .append(Format.number(referenceCycles)).append(" cycles, m = ")
                .append(Format.number(slope));
        if (!Double.isNaN(secondSlope)) {
            s.append("; m = ").append(Format.number(secondSlope)).append(" below ")
                    .append(Stress.ofPascals(kneeRange)).append(" (")
                    .append(Format.number(kneeCycles)).append(" cycles)");
        }
        if (cutOff > 0) {
            s.append("; no damage below ").append(Stress.ofPascals(cutOff));
        }
        return s.append(']').toString();
    }

    // ---------------------------------------------------------------- serial form

    private static final long serialVersionUID = 1L;

    /** Writes the serial form ({@link Serial}): the defining values only. */
    private Object writeReplace() {
        return new Serial(referenceRange, referenceCycles, slope, kneeCycles, secondSlope, cutOff);
    }

    /** A stream must hold the serial form, never the fields of this class. */
    private void readObject(ObjectInputStream in) throws InvalidObjectException {
        throw SerialForms.proxyRequired("SnCurve");
    }

    /**
     * The serial form of a SnCurve: its defining values, rebuilt on reading through the checks
     * of the factories.
     */
    private static final class Serial implements Serializable {
        private static final long serialVersionUID = 1L;
        private final double referenceRange;
        private final double referenceCycles;
        private final double slope;
        private final double kneeCycles;
        private final double secondSlope;
        private final double cutOff;

        Serial(double referenceRange, double referenceCycles, double slope, double kneeCycles, double secondSlope, double cutOff) {
            this.referenceRange = referenceRange;
            this.referenceCycles = referenceCycles;
            this.slope = slope;
            this.kneeCycles = kneeCycles;
            this.secondSlope = secondSlope;
            this.cutOff = cutOff;
        }

        private Object readResolve() throws InvalidObjectException {
            return SerialForms.rebuild("SnCurve", () -> {
                SnCurve c = new SnCurve(Checks.positiveFinite(referenceRange, "range"),
                        Checks.positiveFinite(referenceCycles, "cycles"),
                        Checks.positiveFinite(slope, "slope"), Double.POSITIVE_INFINITY,
                        Double.NaN, 0);
                if (!Double.isNaN(secondSlope)) {
                    c = c.withKnee(kneeCycles, secondSlope);
                }
                return cutOff == 0 ? c : c.withCutOff(Stress.ofPascals(cutOff));
            });
        }
    }
}
