package org.strainmath.bridge;

import java.io.InvalidObjectException;
import java.io.ObjectInputStream;
import java.io.Serializable;
import java.util.Objects;

import org.strainmath.internal.Checks;
import org.strainmath.internal.Format;
import org.strainmath.internal.Kernels;
import org.strainmath.internal.SerialForms;
import org.strainmath.quantity.Strain;
import org.strainmath.quantity.Temperature;

/**
 * The thermal output of a gauge on a given material (its apparent strain with temperature), as
 * the data sheet gives it: a polynomial of up to fourth order in the data sheet's temperature
 * unit, in µε, measured with an instrument set to a reference gauge factor (commonly 2.00).
 *
 * <pre>
 *   εapp(T) = a0 + a1·T + a2·T² + a3·T³ + a4·T⁴       µε, T in °C or °F as given
 *   εapp,K(T) = εapp(T) · Kref / K                     at an instrument gauge factor K
 * </pre>
 * The scaling holds because the thermal output is a ΔR/R that the instrument divides by its
 * own gauge factor (common practice, as gauge data sheets state it; no published source at
 * hand). A polynomial in °F is converted once into one in °C by T_F = 1.8·T_C + 32.
 *
 * <p>A channel zeroed at T0 subtracts εapp,K(T) − εapp,K(T0): see {@link #zeroedAt}.
 *
 * <p>Immutable and thread-safe.
 * Serializable, for a stream engine that ships configurations to other processes: the
 * stream holds the defining values only, checked again as the factories check them.
 */
public final class ThermalOutput implements Serializable {

    /** The gauge factor thermal-output curves are usually measured with. */
    public static final double DEFAULT_REFERENCE_GAUGE_FACTOR = 2.0;

    private final double[] givenCoefficients;
    private final boolean fahrenheit;
    /** The polynomial in °C, µε, lowest order first. */
    private final double[] celsius;
    private final double referenceGaugeFactor;

    private ThermalOutput(double[] givenCoefficients, boolean fahrenheit,
            double referenceGaugeFactor) {
        this.givenCoefficients = givenCoefficients;
        this.fahrenheit = fahrenheit;
        this.referenceGaugeFactor = referenceGaugeFactor;
        this.celsius = fahrenheit ? toCelsius(givenCoefficients) : givenCoefficients.clone();
    }

    /**
     * The thermal output a0 + a1·T + ... in µε with T in °C, lowest order first.
     *
     * @throws IllegalArgumentException if there are not 1 to 5 coefficients, or one is not
     *                                  finite
     */
    public static ThermalOutput ofCelsius(double... microstrainCoefficients) {
        return new ThermalOutput(check(microstrainCoefficients), false,
                DEFAULT_REFERENCE_GAUGE_FACTOR);
    }

    /**
     * The thermal output a0 + a1·T + ... in µε with T in °F, lowest order first.
     *
     * @throws IllegalArgumentException if there are not 1 to 5 coefficients, or one is not
     *                                  finite
     */
    public static ThermalOutput ofFahrenheit(double... microstrainCoefficients) {
        return new ThermalOutput(check(microstrainCoefficients), true,
                DEFAULT_REFERENCE_GAUGE_FACTOR);
    }

    private static double[] check(double[] coefficients) {
        Objects.requireNonNull(coefficients, "microstrainCoefficients");
        if (coefficients.length < 1 || coefficients.length > 5) {
            throw new IllegalArgumentException(
                    "microstrainCoefficients must hold 1 to 5 values: " + coefficients.length);
        }
        for (int i = 0; i < coefficients.length; i++) {
            Checks.finite(coefficients[i], "microstrainCoefficients[" + i + "]");
        }
        return coefficients.clone();
    }

    /** Substitutes T_F = 1.8·T_C + 32 into a polynomial in T_F (binomial expansion). */
    private static double[] toCelsius(double[] f) {
        double[] c = new double[f.length];
        for (int n = 0; n < f.length; n++) {
            // f[n]·(1.8·T + 32)^n = f[n]·Σ_k C(n,k)·1.8^k·32^(n−k)·T^k
            for (int k = 0; k <= n; k++) {
                c[k] += f[n] * binomial(n, k) * Math.pow(1.8, k) * Math.pow(32, n - k);
            }
        }
        return c;
    }

    private static double binomial(int n, int k) {
        double b = 1;
        for (int i = 1; i <= k; i++) {
            b = b * (n - k + i) / i;
        }
        return b;
    }

    /**
     * A copy measured with an instrument set to {@code gaugeFactor} instead of 2.00.
     *
     * @throws IllegalArgumentException if {@code gaugeFactor} is not positive and finite
     */
    public ThermalOutput withReferenceGaugeFactor(double gaugeFactor) {
        Checks.positiveFinite(gaugeFactor, "gaugeFactor");
        return new ThermalOutput(givenCoefficients, fahrenheit, gaugeFactor);
    }

    /** The instrument gauge factor the curve was measured with. */
    public double referenceGaugeFactor() {
        return referenceGaugeFactor;
    }

    /**
     * The apparent strain at {@code temperature}, as the curve gives it (at the reference
     * gauge factor).
     *
     * @throws NullPointerException if {@code temperature} is null
     */
    public Strain apparentStrainAt(Temperature temperature) {
        return apparentStrainAt(temperature, referenceGaugeFactor);
    }

    /**
     * The apparent strain at {@code temperature} read by an instrument set to
     * {@code gaugeFactor}: εapp(T)·Kref/K.
     *
     * @throws NullPointerException     if {@code temperature} is null
     * @throws IllegalArgumentException if {@code gaugeFactor} is not positive and finite
     */
    public Strain apparentStrainAt(Temperature temperature, double gaugeFactor) {
        Objects.requireNonNull(temperature, "temperature");
        Checks.positiveFinite(gaugeFactor, "gaugeFactor");
        return Strain.of(polynomial(celsius, temperature.toCelsius()) * 1e-6
                * referenceGaugeFactor / gaugeFactor);
    }

    private static double polynomial(double[] c, double t) {
        double sum = 0;
        for (int i = c.length - 1; i >= 0; i--) {
            sum = sum * t + c[i];
        }
        return sum;
    }

    /**
     * The correction for a channel zeroed at {@code zeroTemperature} and read at
     * {@code gaugeFactor}: it subtracts εapp,K(T) − εapp,K(T0) from each strain.
     *
     * @throws NullPointerException     if {@code zeroTemperature} is null
     * @throws IllegalArgumentException if {@code gaugeFactor} is not positive and finite
     */
    public Correction zeroedAt(Temperature zeroTemperature, double gaugeFactor) {
        Objects.requireNonNull(zeroTemperature, "zeroTemperature");
        Checks.positiveFinite(gaugeFactor, "gaugeFactor");
        double scale = 1e-6 * referenceGaugeFactor / gaugeFactor;
        double[] q = new double[5];
        for (int i = 0; i < celsius.length; i++) {
            q[i] = celsius[i] * scale;
        }
        q[0] -= polynomial(celsius, zeroTemperature.toCelsius()) * scale;
        return new Correction(q, zeroTemperature, gaugeFactor);
    }

    /**
     * {@code ThermalOutput[-12.0 + 1.5·T - 0.02·T² µε, T in °C, at K=2.0]}.
     */
    @Override
    public String toString() {
        StringBuilder text = new StringBuilder("ThermalOutput[");
        for (int i = 0; i < givenCoefficients.length; i++) {
            double a = givenCoefficients[i];
            String magnitude = Format.number(Math.abs(a));
            if (i == 0) {
                text.append(Format.number(a));
            } else {
                text.append(a < 0 ? " - " : " + ").append(magnitude).append("·T")
                        .append(i == 1 ? "" : i == 2 ? "²" : i == 3 ? "³" : "⁴");
            }
        }
        return text.append(" µε, T in ").append(fahrenheit ? "°F" : "°C").append(", at K=")
                .append(Format.number(referenceGaugeFactor)).append(']').toString();
    }

    /**
     * The thermal-output correction of one channel: zeroed at a temperature, read at a gauge
     * factor, composed into one quartic in °C.
     *
     * <pre>
     *   ε = ε_measured − (q0 + q1·T + q2·T² + q3·T³ + q4·T⁴)      T in °C
     * </pre>
     *
     * <p>Immutable and thread-safe.
     */
    public static final class Correction {

        private final double q0;
        private final double q1;
        private final double q2;
        private final double q3;
        private final double q4;
        private final Temperature zeroTemperature;
        private final double gaugeFactor;

        private Correction(double[] q, Temperature zeroTemperature, double gaugeFactor) {
            this.q0 = q[0];
            this.q1 = q[1];
            this.q2 = q[2];
            this.q3 = q[3];
            this.q4 = q[4];
            this.zeroTemperature = zeroTemperature;
            this.gaugeFactor = gaugeFactor;
        }

        /**
         * {@code strain} corrected for the thermal output at {@code temperature}.
         *
         * @throws NullPointerException if an argument is null
         */
        public Strain correct(Strain strain, Temperature temperature) {
            Objects.requireNonNull(strain, "strain");
            Objects.requireNonNull(temperature, "temperature");
            return Strain.of(correct(strain.value(), temperature.toCelsius()));
        }

        /**
         * The strain (m/m) corrected at {@code celsius} °C; NaN in, or a temperature that is
         * not finite, gives NaN out. The same function as the block method, bit for bit. Never
         * throws.
         */
        public double correct(double strain, double celsius) {
            return apply(strain, celsius, q0, q1, q2, q3, q4);
        }

        /**
         * Corrects {@code len} strains (m/m) from {@code strain[strainOff...]} with the
         * temperatures in °C of {@code celsius[celsiusOff...]} into {@code dst[dstOff...]}.
         * Allocation-free; {@code dst} may be {@code strain} with the same offset, and must not
         * overlap {@code celsius}.
         *
         * @return the number of NaN outputs
         * @throws NullPointerException      if an array is null
         * @throws IndexOutOfBoundsException if a range is outside its array
         * @throws IllegalArgumentException  if {@code dst} overlaps {@code celsius}
         */
        public int correct(double[] strain, int strainOff, double[] celsius, int celsiusOff,
                double[] dst, int dstOff, int len) {
            Objects.requireNonNull(strain, "strain");
            Objects.requireNonNull(celsius, "celsius");
            Objects.checkFromIndexSize(celsiusOff, len, celsius.length);
            Checks.block(strain, strainOff, dst, dstOff, len);
            Checks.disjoint(celsius, celsiusOff, "celsius", dst, dstOff, "dst", len);
            final double c0 = q0;
            final double c1 = q1;
            final double c2 = q2;
            final double c3 = q3;
            final double c4 = q4;
            for (int i = 0; i < len; i++) {
                dst[dstOff + i] = apply(strain[strainOff + i], celsius[celsiusOff + i],
                        c0, c1, c2, c3, c4);
            }
            return Kernels.countNaN(dst, dstOff, len);
        }

        /** The coefficient of T^k of the composed quartic, k from 0 to 4, for the kernels. */
        double coefficient(int k) {
            return k == 0 ? q0 : k == 1 ? q1 : k == 2 ? q2 : k == 3 ? q3 : q4;
        }

        /**
         * Corrects dst[start, end) in place with the temperatures celsius[i + celsiusShift]. A
         * plain double loop, so without the finiteness probe of the channel's fused int[] loop:
         * that probe slowed every plain double loop it was tried in (bridge inverse, plane
         * stress, rosette; this loop itself was not measured with it), and the caller counts
         * NaN in a pass of its own.
         */
        void correctInPlace(double[] dst, double[] celsius, int celsiusShift, int start,
                int end) {
            final double c0 = q0;
            final double c1 = q1;
            final double c2 = q2;
            final double c3 = q3;
            final double c4 = q4;
            if (celsiusShift == 0) {
                // One index for both arrays, so that C2 vectorises the loop (see Kernels).
                for (int i = start; i < end; i++) {
                    dst[i] = apply(dst[i], celsius[i], c0, c1, c2, c3, c4);
                }
            } else {
                for (int i = start; i < end; i++) {
                    dst[i] = apply(dst[i], celsius[i + celsiusShift], c0, c1, c2, c3, c4);
                }
            }
        }

        /**
         * strain − q(t), times (t − t + 1), which is exactly 1 for a finite t and NaN
         * otherwise: an infinite temperature gives NaN, not an infinite strain.
         */
        private static double apply(double strain, double t, double c0, double c1, double c2,
                double c3, double c4) {
            return (strain - polynomial(t, c0, c1, c2, c3, c4)) * (t - t + 1.0);
        }

        /**
         * q(t) by Horner's rule: the one expression that every path evaluates (small enough
         * that C2 inlines it into the kernels' loops, which stay vectorised).
         */
        static double polynomial(double t, double c0, double c1, double c2, double c3,
                double c4) {
            return c0 + t * (c1 + t * (c2 + t * (c3 + t * c4)));
        }

        /** {@code ThermalOutput.Correction[zeroed at 23.0 °C, K=2.1]}. */
        @Override
        public String toString() {
            return "ThermalOutput.Correction[zeroed at " + zeroTemperature + ", K="
                    + Format.number(gaugeFactor) + "]";
        }
    }

    // ---------------------------------------------------------------- serial form

    private static final long serialVersionUID = 1L;

    /** Writes the serial form ({@link Serial}): the defining values only. */
    private Object writeReplace() {
        return new Serial(givenCoefficients.clone(), fahrenheit, referenceGaugeFactor);
    }

    /** A stream must hold the serial form, never the fields of this class. */
    private void readObject(ObjectInputStream in) throws InvalidObjectException {
        throw SerialForms.proxyRequired("ThermalOutput");
    }

    /**
     * The serial form of a ThermalOutput: its defining values, rebuilt on reading through the checks
     * of the factories.
     */
    private static final class Serial implements Serializable {
        private static final long serialVersionUID = 1L;
        private final double[] coefficients;
        private final boolean fahrenheit;
        private final double referenceGaugeFactor;

        Serial(double[] coefficients, boolean fahrenheit, double referenceGaugeFactor) {
            this.coefficients = coefficients;
            this.fahrenheit = fahrenheit;
            this.referenceGaugeFactor = referenceGaugeFactor;
        }

        private Object readResolve() throws InvalidObjectException {
            return SerialForms.rebuild("ThermalOutput", () -> {
                ThermalOutput curve = fahrenheit ? ofFahrenheit(coefficients.clone())
                        : ofCelsius(coefficients.clone());
                return curve.withReferenceGaugeFactor(referenceGaugeFactor);
            });
        }
    }
}
