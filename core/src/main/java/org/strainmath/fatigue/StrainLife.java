package org.strainmath.fatigue;

import java.io.InvalidObjectException;
import java.io.ObjectInputStream;
import java.io.Serializable;
import java.util.Objects;

import org.strainmath.internal.Checks;
import org.strainmath.internal.Format;
import org.strainmath.internal.SerialForms;
import org.strainmath.quantity.Stress;

/**
 * Strain-based fatigue life: the Coffin–Manson–Basquin strain–life curve, with Morrow's or
 * the Smith–Watson–Topper mean-stress correction, solved per cycle for the reversals to
 * failure 2N (Dowling, <i>Mechanical Behavior of Materials</i>, the strain-based approach,
 * equation forms as there, numbers from memory; Morrow 1968 in the SAE <i>Fatigue Design
 * Handbook</i>; Smith, Watson and Topper 1970, J. Materials 5):
 * <pre>
 *   εa = σf'/E · (2N)^b + εf' · (2N)^c                         fully reversed
 *   εa = (σf' − σm)/E · (2N)^b + εf' · (2N)^c                  Morrow
 *   σmax·εa = σf'²/E · (2N)^(2b) + σf'·εf' · (2N)^(b+c)        Smith–Watson–Topper
 * </pre>
 * εa is the strain amplitude (m/m), σm the mean and σmax the peak stress of the cycle (Pa), E
 * the modulus, σf' and b the fatigue strength coefficient and exponent, εf' and c the fatigue
 * ductility coefficient and exponent, from the material's data sheet (b and c negative).
 *
 * <p><b>The cycle's stresses.</b> A rainflow count of a strain history gives strains; read as a
 * {@link FatigueLife} this model takes the stresses at the gauge as elastic, σm = E·εm and
 * σmax = E·εmax. That holds while the material at the gauge stays elastic, as it does on most
 * structures a strain gauge watches; where it yields (a notch root) the mean relaxes, and a
 * notch analysis with the cyclic stress–strain curve (Neuber's rule, Masing's hysteresis) is
 * needed, which this class does not do. {@link #reversalsToFailure} takes the mean stress of a
 * cycle directly for a caller who has it.
 *
 * <p><b>Solution.</b> The right-hand side, as a function of x = ln 2N, is a sum of two
 * decreasing exponentials, convex; Newton's method started at the larger of the two one-term
 * solutions (where the sum exceeds the target) climbs to the root from one side without
 * overshoot. <i>Accuracy</i>: 2N to a few parts in 10¹⁴ (checked against Commons Math's Brent
 * solver in the tests). The per-cycle solution uses {@link Math}'s exp and log (1 ulp by their
 * specification, possibly another last bit on another JDK), which allocate nothing where
 * {@code StrictMath}'s did on JDK 17 (measured).
 *
 * <pre>
 *   StrainLife steel = StrainLife.of(Stress.ofGigapascals(200), Stress.ofMegapascals(1700),
 *           -0.09, 0.6, -0.6).withMorrowCorrection();      // invented constants
 *   steel.reversalsToFailure(0.004, 100e6);                // 2N at εa = 0.4 % about 100 MPa
 * </pre>
 *
 * <p>Immutable and thread-safe.
 * Serializable, for a stream engine that ships configurations to other processes: the
 * stream holds the defining values only, checked again as the factories check them.
 */
public final class StrainLife implements Serializable, FatigueLife {

    private enum Correction {
        NONE("fully reversed"), MORROW("Morrow"), SMITH_WATSON_TOPPER("Smith–Watson–Topper");

        final String label;

        Correction(String label) {
            this.label = label;
        }
    }

    private static final int MAX_ITERATIONS = 100;

    private final double modulus;
    private final double strengthCoefficient;
    private final double strengthExponent;
    private final double ductilityCoefficient;
    private final double ductilityExponent;
    private final Correction correction;

    private StrainLife(double modulus, double strengthCoefficient, double strengthExponent,
            double ductilityCoefficient, double ductilityExponent, Correction correction) {
        this.modulus = modulus;
        this.strengthCoefficient = strengthCoefficient;
        this.strengthExponent = strengthExponent;
        this.ductilityCoefficient = ductilityCoefficient;
        this.ductilityExponent = ductilityExponent;
        this.correction = correction;
    }

    /**
     * The curve of a material's strain–life constants, with no mean-stress correction.
     *
     * @param modulus              Young's modulus E
     * @param strengthCoefficient  the fatigue strength coefficient σf'
     * @param strengthExponent     the fatigue strength exponent b, in (−1, 0)
     * @param ductilityCoefficient the fatigue ductility coefficient εf' (m/m), &gt; 0
     * @param ductilityExponent    the fatigue ductility exponent c, in (−2, 0)
     * @throws NullPointerException     if a stress is null
     * @throws IllegalArgumentException if a constant is out of its range
     */
    public static StrainLife of(Stress modulus, Stress strengthCoefficient,
            double strengthExponent, double ductilityCoefficient, double ductilityExponent) {
        double e = Checks.positiveFinite(Objects.requireNonNull(modulus, "modulus").toPascals(),
                "modulus");
        double s = Checks.positiveFinite(Objects.requireNonNull(strengthCoefficient,
                "strengthCoefficient").toPascals(), "strengthCoefficient");
        Checks.inOpenInterval(strengthExponent, -1, 0, "strengthExponent");
        Checks.positiveFinite(ductilityCoefficient, "ductilityCoefficient");
        Checks.inOpenInterval(ductilityExponent, -2, 0, "ductilityExponent");
        return new StrainLife(e, s, strengthExponent, ductilityCoefficient, ductilityExponent,
                Correction.NONE);
    }

    /** A copy with Morrow's mean-stress correction, σf' − σm in the elastic term. */
    public StrainLife withMorrowCorrection() {
        return with(Correction.MORROW);
    }

    /** A copy with the Smith–Watson–Topper parameter σmax·εa. */
    public StrainLife withSmithWatsonTopper() {
        return with(Correction.SMITH_WATSON_TOPPER);
    }

    /** A copy with no mean-stress correction. */
    public StrainLife withoutMeanStressCorrection() {
        return with(Correction.NONE);
    }

    private StrainLife with(Correction c) {
        return new StrainLife(modulus, strengthCoefficient, strengthExponent,
                ductilityCoefficient, ductilityExponent, c);
    }

    /**
     * The strain amplitude of the curve at {@code reversals} (2N) for the mean stress
     * {@code meanStress} (Pa): the forward equation (with Morrow's σf' − σm when that correction
     * is set; for the others the mean does not enter).
     *
     * @throws IllegalArgumentException if {@code reversals} is not finite and positive, or
     *                                  {@code meanStress} is not finite
     */
    public double strainAmplitudeAt(double reversals, double meanStress) {
        Checks.positiveFinite(reversals, "reversals");
        Checks.finite(meanStress, "meanStress");
        double elastic = correction == Correction.MORROW
                ? strengthCoefficient - meanStress : strengthCoefficient;
        return elastic / modulus * StrictMath.pow(reversals, strengthExponent)
                + ductilityCoefficient * StrictMath.pow(reversals, ductilityExponent);
    }

    /**
     * The reversals to failure 2N of a cycle of strain amplitude {@code strainAmplitude} (m/m)
     * whose mean stress is {@code meanStress} (Pa); with the Smith–Watson–Topper correction its
     * peak stress is taken as E·εa + σm. Never throws: NaN for an argument that is not finite
     * or a negative amplitude; +∞ for an amplitude of 0 or a cycle whose peak stress is not
     * tensile (SWT); 0 for a mean at or beyond σf' (Morrow).
     */
    public double reversalsToFailure(double strainAmplitude, double meanStress) {
        if (!(strainAmplitude >= 0) || strainAmplitude == Double.POSITIVE_INFINITY
                || meanStress - meanStress != 0) {
            return Double.NaN;
        }
        if (strainAmplitude == 0) {
            return Double.POSITIVE_INFINITY;
        }
        double b = strengthExponent;
        double c = ductilityExponent;
        switch (correction) {
            case MORROW: {
                double elastic = strengthCoefficient - meanStress;
                if (!(elastic > 0)) {
                    return 0.0;
                }
                return solve(elastic / modulus, b, ductilityCoefficient, c, strainAmplitude);
            }
            case SMITH_WATSON_TOPPER: {
                double peak = modulus * strainAmplitude + meanStress;
                if (!(peak > 0)) {
                    return Double.POSITIVE_INFINITY;
                }
                return solve(strengthCoefficient * strengthCoefficient / modulus, 2 * b,
                        strengthCoefficient * ductilityCoefficient, b + c,
                        peak * strainAmplitude);
            }
            default:
                return solve(strengthCoefficient / modulus, b, ductilityCoefficient, c,
                        strainAmplitude);
        }
    }

    /**
     * The reversals r with a·r^p + q·r^s = y, for a, q, y &gt; 0 and p, s &lt; 0: Newton's
     * method on x = ln r from the larger one-term root, where the sum is at least y; the
     * function is convex and decreasing in x, so the iterates rise monotonically to the root.
     */
    private static double solve(double a, double p, double q, double s, double y) {
        double x = Math.max(Math.log(y / a) / p, Math.log(y / q) / s);
        for (int i = 0; i < MAX_ITERATIONS; i++) {
            double u = a * Math.exp(p * x);
            double v = q * Math.exp(s * x);
            double f = u + v - y;
            if (!(f > 0)) {
                break;
            }
            double step = f / (p * u + s * v);      // f' < 0, so step < 0
            double next = x - step;
            if (!(next > x) || Double.isInfinite(next)) {
                break;
            }
            x = next;
        }
        return Math.exp(x);
    }

    /**
     * The cycles to failure N of a cycle between the strains {@code from} and {@code to}
     * (m/m), with the stresses at the gauge taken as elastic (see the class comment):
     * εa = |to − from|/2, σm = E·(from + to)/2. Never throws; NaN for an argument that is not
     * finite.
     */
    @Override
    public double cyclesToFailure(double from, double to) {
        if (from - from != 0 || to - to != 0) {
            return Double.NaN;
        }
        double amplitude = 0.5 * Math.abs(to - from);
        double mean = correction == Correction.NONE ? 0.0 : modulus * 0.5 * (from + to);
        return 0.5 * reversalsToFailure(amplitude, mean);
    }

    /**
     * The transition life 2N_t, where the elastic and plastic strain amplitudes of the fully
     * reversed curve are equal: 2N_t = (εf'·E/σf')^(1/(b − c)) (Dowling, the strain-based
     * approach, number from memory).
     *
     * @throws ArithmeticException if b = c, when the two lines are parallel
     */
    public double transitionReversals() {
        if (strengthExponent == ductilityExponent) {
            throw new ArithmeticException("the elastic and plastic lines are parallel: b = c = "
                    + strengthExponent);
        }
        return StrictMath.pow(ductilityCoefficient * modulus / strengthCoefficient,
                1 / (strengthExponent - ductilityExponent));
    }

    /** Young's modulus E. */
    public Stress modulus() {
        return Stress.ofPascals(modulus);
    }

    /** The fatigue strength coefficient σf'. */
    public Stress strengthCoefficient() {
        return Stress.ofPascals(strengthCoefficient);
    }

    /** The fatigue strength exponent b. */
    public double strengthExponent() {
        return strengthExponent;
    }

    /** The fatigue ductility coefficient εf'. */
    public double ductilityCoefficient() {
        return ductilityCoefficient;
    }

    /** The fatigue ductility exponent c. */
    public double ductilityExponent() {
        return ductilityExponent;
    }

    @Override
    public boolean equals(Object o) {
        if (!(o instanceof StrainLife)) {
            return false;
        }
        StrainLife s = (StrainLife) o;
        return Double.compare(s.modulus, modulus) == 0
                && Double.compare(s.strengthCoefficient, strengthCoefficient) == 0
                && Double.compare(s.strengthExponent, strengthExponent) == 0
                && Double.compare(s.ductilityCoefficient, ductilityCoefficient) == 0
                && Double.compare(s.ductilityExponent, ductilityExponent) == 0
                && s.correction == correction;
    }

    @Override
    public int hashCode() {
        long h = correction.hashCode();
        for (double x : new double[] {modulus, strengthCoefficient, strengthExponent,
            ductilityCoefficient, ductilityExponent}) {
            h = 31 * h + Double.hashCode(x);
        }
        return Long.hashCode(h);
    }

    /**
     * {@code StrainLife[E = 200.0 GPa, σf' = 1700.0 MPa, b = -0.09, εf' = 0.6, c = -0.6,
     * Morrow]}.
     */
    @Override
    public String toString() {
        return "StrainLife[E = " + Format.withUnit(modulus / 1e9, "GPa") + ", σf' = "
                + Stress.ofPascals(strengthCoefficient) + ", b = "
                + Format.number(strengthExponent) + ", εf' = "
                + Format.number(ductilityCoefficient) + ", c = "
                + Format.number(ductilityExponent) + ", " + correction.label + "]";
    }

    // ---------------------------------------------------------------- serial form

    private static final long serialVersionUID = 1L;

    /** Writes the serial form ({@link Serial}): the defining values only. */
    private Object writeReplace() {
        return new Serial(modulus, strengthCoefficient, strengthExponent,
                ductilityCoefficient, ductilityExponent, correction.name());
    }

    /** A stream must hold the serial form, never the fields of this class. */
    private void readObject(ObjectInputStream in) throws InvalidObjectException {
        throw SerialForms.proxyRequired("StrainLife");
    }

    /**
     * The serial form of a StrainLife: its defining values, rebuilt on reading through the checks
     * of the factories.
     */
    private static final class Serial implements Serializable {
        private static final long serialVersionUID = 1L;
        private final double modulus;
        private final double strengthCoefficient;
        private final double strengthExponent;
        private final double ductilityCoefficient;
        private final double ductilityExponent;
        private final String correction;

        Serial(double modulus, double strengthCoefficient, double strengthExponent, double ductilityCoefficient, double ductilityExponent, String correction) {
            this.modulus = modulus;
            this.strengthCoefficient = strengthCoefficient;
            this.strengthExponent = strengthExponent;
            this.ductilityCoefficient = ductilityCoefficient;
            this.ductilityExponent = ductilityExponent;
            this.correction = correction;
        }

        private Object readResolve() throws InvalidObjectException {
            return SerialForms.rebuild("StrainLife", () -> {
                return of(Stress.ofPascals(modulus), Stress.ofPascals(strengthCoefficient),
                        strengthExponent, ductilityCoefficient, ductilityExponent)
                        .with(Correction.valueOf(correction));
            });
        }
    }
}
