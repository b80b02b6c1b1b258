package org.strainmath.fatigue;

import java.io.InvalidObjectException;
import java.io.ObjectInputStream;
import java.io.Serializable;
import java.util.Objects;

import org.strainmath.internal.Checks;
import org.strainmath.internal.SerialForms;
import org.strainmath.quantity.Stress;

/**
 * A mean-stress correction: the fully reversed stress amplitude σar that does the damage of a
 * cycle of amplitude σa about the mean σm, to be read on a curve measured at zero mean
 * (Dowling, <i>Mechanical Behavior of Materials</i>, the chapter on mean-stress effects;
 * equation forms as there, numbers from memory):
 * <pre>
 *   none                   σar = σa
 *   Goodman                σar = σa / (1 − σm/σu)                 σu: ultimate tensile strength
 *   Gerber                 σar = σa / (1 − (σm/σu)²)
 *   Morrow                 σar = σa / (1 − σm/σf')                σf': fatigue strength coefficient
 *   Smith–Watson–Topper    σar = √(σmax·σa),  σmax = σm + σa      (σmax &gt; 0)
 * </pre>
 * Limits, per cycle, never an exception: a tensile mean at or beyond σu (Goodman, Gerber) or
 * σf' (Morrow) gives σar = +∞, a cycle with no life; SWT gives σar = 0 (no damage) for
 * σmax ≤ 0. Goodman and Gerber give no credit for a compressive mean (σar = σa for σm &lt; 0),
 * the usual conservative reading of those diagrams in machine design (common practice, no
 * source); Morrow and SWT apply as written for either sign.
 *
 * <p>Which correction fits depends on the material and the data behind the curve: design codes
 * for welded structures use ranges without a correction (residual stresses make the applied mean
 * of little account); Goodman is conservative for most ductile metals in tension, Gerber less so;
 * Morrow and SWT suit strain-life and stress-life data of metals. Immutable, thread-safe and
 * serializable (its kind and strength only).
 */
public final class MeanStressCorrection implements Serializable {

    private enum Kind {
        NONE("no mean-stress correction"),
        GOODMAN("Goodman"),
        GERBER("Gerber"),
        MORROW("Morrow"),
        SMITH_WATSON_TOPPER("Smith–Watson–Topper");

        final String label;

        Kind(String label) {
            this.label = label;
        }
    }

    private static final MeanStressCorrection NONE = new MeanStressCorrection(Kind.NONE, 0);
    private static final MeanStressCorrection SWT =
            new MeanStressCorrection(Kind.SMITH_WATSON_TOPPER, 0);

    private final Kind kind;
    /** σu or σf', Pa; 0 where the correction has none. */
    private final double strength;

    private MeanStressCorrection(Kind kind, double strength) {
        this.kind = kind;
        this.strength = strength;
    }

    /** No correction: σar = σa. */
    public static MeanStressCorrection none() {
        return NONE;
    }

    /**
     * Goodman's line with the ultimate tensile strength {@code ultimate}.
     *
     * @throws NullPointerException     if {@code ultimate} is null
     * @throws IllegalArgumentException if {@code ultimate} is not positive
     */
    public static MeanStressCorrection goodman(Stress ultimate) {
        return new MeanStressCorrection(Kind.GOODMAN,
                Checks.positiveFinite(Objects.requireNonNull(ultimate, "ultimate").toPascals(),
                        "ultimate"));
    }

    /**
     * Gerber's parabola with the ultimate tensile strength {@code ultimate}.
     *
     * @throws NullPointerException     if {@code ultimate} is null
     * @throws IllegalArgumentException if {@code ultimate} is not positive
     */
    public static MeanStressCorrection gerber(Stress ultimate) {
        return new MeanStressCorrection(Kind.GERBER,
                Checks.positiveFinite(Objects.requireNonNull(ultimate, "ultimate").toPascals(),
                        "ultimate"));
    }

    /**
     * Morrow's correction with the fatigue strength coefficient {@code coefficient} (σf' of
     * the material's Basquin or strain-life constants).
     *
     * @throws NullPointerException     if {@code coefficient} is null
     * @throws IllegalArgumentException if {@code coefficient} is not positive
     */
    public static MeanStressCorrection morrow(Stress coefficient) {
        return new MeanStressCorrection(Kind.MORROW, Checks.positiveFinite(
                Objects.requireNonNull(coefficient, "coefficient").toPascals(), "coefficient"));
    }

    /** The Smith–Watson–Topper parameter, √(σmax·σa). */
    public static MeanStressCorrection smithWatsonTopper() {
        return SWT;
    }

    /**
     * The equivalent fully reversed amplitude (Pa) of a cycle of {@code amplitude} about
     * {@code mean} (Pa): the per-cycle path of a damage sum, which never throws; NaN for an
     * argument that is not finite or a negative amplitude.
     */
    public double equivalentAmplitude(double amplitude, double mean) {
        if (!(amplitude >= 0) || amplitude == Double.POSITIVE_INFINITY || mean - mean != 0) {
            return Double.NaN;
        }
        switch (kind) {
            case GOODMAN:
                return mean <= 0 ? amplitude : reduced(amplitude, 1 - mean / strength);
            case GERBER:
                return mean <= 0 ? amplitude
                        : reduced(amplitude, 1 - (mean / strength) * (mean / strength));
            case MORROW:
                return reduced(amplitude, 1 - mean / strength);
            case SMITH_WATSON_TOPPER:
                double maximum = mean + amplitude;
                return maximum > 0 ? Math.sqrt(maximum * amplitude) : 0.0;
            default:
                return amplitude;
        }
    }

    /** σa / f, and +∞ (no life) where the mean has used up the strength (f ≤ 0). */
    private static double reduced(double amplitude, double f) {
        return f > 0 ? amplitude / f : Double.POSITIVE_INFINITY;
    }

    /**
     * The equivalent fully reversed amplitude of a cycle of {@code amplitude} about
     * {@code mean}.
     *
     * @throws NullPointerException     if an argument is null
     * @throws IllegalArgumentException if {@code amplitude} is negative
     */
    public Stress equivalentAmplitude(Stress amplitude, Stress mean) {
        double a = Checks.nonNegativeFinite(Objects.requireNonNull(amplitude, "amplitude")
                .toPascals(), "amplitude");
        double m = Objects.requireNonNull(mean, "mean").toPascals();
        double r = equivalentAmplitude(a, m);
        if (!Double.isFinite(r)) {
            throw new IllegalArgumentException("mean must leave the material a fatigue strength"
                    + " under " + this + ": " + mean);
        }
        return Stress.ofPascals(r);
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof MeanStressCorrection && ((MeanStressCorrection) o).kind == kind
                && Double.compare(((MeanStressCorrection) o).strength, strength) == 0;
    }

    @Override
    public int hashCode() {
        return 31 * kind.hashCode() + Double.hashCode(strength);
    }

    /** {@code Goodman (σu = 400.0 MPa)}, {@code Smith–Watson–Topper}. */
    @Override
    public String toString() {
        switch (kind) {
            case GOODMAN:
            case GERBER:
                return kind.label + " (σu = " + Stress.ofPascals(strength) + ")";
            case MORROW:
                return kind.label + " (σf' = " + Stress.ofPascals(strength) + ")";
            default:
                return kind.label;
        }
    }

    // ---------------------------------------------------------------- serial form

    private static final long serialVersionUID = 1L;

    /** Writes the serial form ({@link Serial}): the defining values only. */
    private Object writeReplace() {
        return new Serial(kind.name(), strength);
    }

    /** A stream must hold the serial form, never the fields of this class. */
    private void readObject(ObjectInputStream in) throws InvalidObjectException {
        throw SerialForms.proxyRequired("MeanStressCorrection");
    }

    /**
     * The serial form of a MeanStressCorrection: its defining values, rebuilt on reading through the checks
     * of the factories.
     */
    private static final class Serial implements Serializable {
        private static final long serialVersionUID = 1L;
        private final String kind;
        private final double strength;

        Serial(String kind, double strength) {
            this.kind = kind;
            this.strength = strength;
        }

        private Object readResolve() throws InvalidObjectException {
            return SerialForms.rebuild("MeanStressCorrection", () -> {
                switch (Kind.valueOf(kind)) {
                    case GOODMAN:
                        return goodman(Stress.ofPascals(strength));
                    case GERBER:
                        return gerber(Stress.ofPascals(strength));
                    case MORROW:
                        return morrow(Stress.ofPascals(strength));
                    case SMITH_WATSON_TOPPER:
                        return smithWatsonTopper();
                    default:
                        return none();
                }
            });
        }
    }
}
