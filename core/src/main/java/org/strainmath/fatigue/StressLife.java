package org.strainmath.fatigue;

import java.io.InvalidObjectException;
import java.io.ObjectInputStream;
import java.io.Serializable;
import java.util.Objects;

import org.strainmath.internal.SerialForms;
import org.strainmath.quantity.Stress;

/**
 * Stress-based fatigue life of a cycle: an {@link SnCurve} in ranges, read at the equivalent
 * fully reversed range of a {@link MeanStressCorrection}.
 * <pre>
 *   σa = |to − from|/2,  σm = (from + to)/2            the cycle (Pa)
 *   σar = correction(σa, σm)                          equivalent fully reversed amplitude
 *   N = curve(2·σar)                                  cycles to failure
 * </pre>
 *
 * <pre>
 *   StressLife life = StressLife.of(SnCurve.ofRange(Stress.ofMegapascals(71), 2e6, 3)
 *           .withKnee(5e6, 5).withCutOffAt(1e8));      // no correction: ranges, as the codes use
 *   double damage = life.damage(Rainflow.astm().count(stressHistory));
 * </pre>
 *
 * <p>Immutable and thread-safe.
 * Serializable, for a stream engine that ships configurations to other processes: the
 * stream holds the defining values only, checked again as the factories check them.
 */
public final class StressLife implements Serializable, FatigueLife {

    private final SnCurve curve;
    private final MeanStressCorrection correction;

    private StressLife(SnCurve curve, MeanStressCorrection correction) {
        this.curve = curve;
        this.correction = correction;
    }

    /**
     * The life on {@code curve} with no mean-stress correction.
     *
     * @throws NullPointerException if {@code curve} is null
     */
    public static StressLife of(SnCurve curve) {
        return new StressLife(Objects.requireNonNull(curve, "curve"), MeanStressCorrection.none());
    }

    /**
     * A copy with the mean-stress correction {@code correction}.
     *
     * @throws NullPointerException if {@code correction} is null
     */
    public StressLife withMeanStressCorrection(MeanStressCorrection correction) {
        return new StressLife(curve, Objects.requireNonNull(correction, "correction"));
    }

    /** The S–N curve. */
    public SnCurve curve() {
        return curve;
    }

    /** The mean-stress correction. */
    public MeanStressCorrection correction() {
        return correction;
    }

    /**
     * The cycles to failure of a cycle between the stresses {@code from} and {@code to} (Pa).
     * Never throws: NaN for an argument that is not finite, +∞ below the curve's cut-off, 0
     * where the mean leaves no strength.
     */
    @Override
    public double cyclesToFailure(double from, double to) {
        if (from - from != 0 || to - to != 0) {
            return Double.NaN;
        }
        double amplitude = 0.5 * Math.abs(to - from);
        double mean = 0.5 * (from + to);
        double equivalent = correction.equivalentAmplitude(amplitude, mean);
        if (equivalent == Double.POSITIVE_INFINITY) {
            return 0.0;          // the mean has used up the strength: no life
        }
        return curve.cyclesToFailure(2 * equivalent);
    }

    /**
     * The cycles to failure of a cycle of {@code range} about {@code mean}.
     *
     * @throws NullPointerException     if an argument is null
     * @throws IllegalArgumentException if {@code range} is negative
     */
    public double cyclesToFailure(Stress range, Stress mean) {
        double r = Objects.requireNonNull(range, "range").toPascals();
        if (!(r >= 0)) {
            throw new IllegalArgumentException("range must be >= 0: " + range);
        }
        double m = Objects.requireNonNull(mean, "mean").toPascals();
        return cyclesToFailure(m - 0.5 * r, m + 0.5 * r);
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof StressLife && ((StressLife) o).curve.equals(curve)
                && ((StressLife) o).correction.equals(correction);
    }

    @Override
    public int hashCode() {
        return 31 * curve.hashCode() + correction.hashCode();
    }

    /** {@code StressLife[SnCurve[...], Goodman (σu = 400.0 MPa)]}. */
    @Override
    public String toString() {
        return "StressLife[" + curve + ", " + correction + "]";
    }

    // ---------------------------------------------------------------- serial form

    private static final long serialVersionUID = 1L;

    /** Writes the serial form ({@link Serial}): the defining values only. */
    private Object writeReplace() {
        return new Serial(curve, correction);
    }

    /** A stream must hold the serial form, never the fields of this class. */
    private void readObject(ObjectInputStream in) throws InvalidObjectException {
        throw SerialForms.proxyRequired("StressLife");
    }

    /**
     * The serial form of a StressLife: its defining values, rebuilt on reading through the checks
     * of the factories.
     */
    private static final class Serial implements Serializable {
        private static final long serialVersionUID = 1L;
        private final SnCurve curve;
        private final MeanStressCorrection correction;

        Serial(SnCurve curve, MeanStressCorrection correction) {
            this.curve = curve;
            this.correction = correction;
        }

        private Object readResolve() throws InvalidObjectException {
            return SerialForms.rebuild("StressLife", () -> {
                return of(curve).withMeanStressCorrection(correction);
            });
        }
    }
}
