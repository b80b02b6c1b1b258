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
import org.strainmath.quantity.Voltage;
import org.strainmath.quantity.VoltageRatio;

/**
 * A bridge input of a data-acquisition system: an amplifier of gain G in front of an
 * analogue-to-digital converter of N bits, read as raw codes and converted to the bridge output
 * ratio Vo/Vex.
 *
 * <pre>
 *   c      = code                      (two's complement: −2^(N−1) ... 2^(N−1) − 1)
 *   c      = code − 2^(N−1)            (offset binary: 0 ... 2^N − 1)
 *   Vadc   = (c − c0) · Vfs / 2^(N−1)  (Vfs the converter's full-scale input, ±Vfs; c0 the
 *                                       code offset)
 *   r      = Vadc / (G · Vex)          (absolute excitation of Vex)
 *   r      = (c − c0) · k / (2^(N−1) · G)   (ratiometric: Vfs = k · Vex, so Vex cancels)
 * </pre>
 * Everything is composed into one scale and one offset when the input is built:
 * r = code · scale + offset. The two end codes of the range read as NaN, since a converter at
 * its rail has saturated and the true input is unknown; so does any code outside the range.
 *
 * <pre>
 *   AdcInput adc = AdcInput.ratiometric(24, 128);       // 24 bits, gain 128, reference = Vex
 *   adc.ratioPerCode();                                 // 9.31323e-7 mV/V per code
 *   adc.toRatio(1_048_576);                             // 0.9765625 mV/V = 2^20 · 1/(2^23 · 128)
 * </pre>
 *
 * <p>Immutable and thread-safe.
 * Serializable, for a stream engine that ships configurations to other processes: the
 * stream holds the defining values only, checked again as the factories check them.
 */
public final class AdcInput implements Serializable {

    /** How the converter writes negative inputs. */
    public enum Coding {
        /** Signed codes, zero input at code 0. */
        TWOS_COMPLEMENT,
        /** Unsigned codes, zero input at code 2^(N−1). */
        OFFSET_BINARY
    }

    private final int bits;
    private final Coding coding;
    private final double gain;
    /** Full-scale input over excitation (ratiometric), or full-scale volts (absolute). */
    private final double fullScale;
    /** The excitation in volts for an absolute input; NaN for a ratiometric one. */
    private final double excitationVolts;
    private final double codeOffset;

    // composed
    private final double scale;
    private final double offset;
    private final double lowCode;
    private final double highCode;

    private AdcInput(int bits, Coding coding, double gain, double fullScale,
            double excitationVolts, double codeOffset) {
        this.bits = bits;
        this.coding = coding;
        this.gain = gain;
        this.fullScale = fullScale;
        this.excitationVolts = excitationVolts;
        this.codeOffset = codeOffset;
        double half = Math.scalb(1.0, bits - 1);
        double ratioAtFullScale = Double.isNaN(excitationVolts)
                ? fullScale / gain
                : fullScale / (gain * excitationVolts);
        this.scale = ratioAtFullScale / half;
        double zero = (coding == Coding.OFFSET_BINARY ? half : 0.0) + codeOffset;
        this.offset = -zero * scale;
        this.lowCode = coding == Coding.OFFSET_BINARY ? 0.0 : -half;
        this.highCode = coding == Coding.OFFSET_BINARY ? 2 * half - 1 : half - 1;
    }

    /**
     * A ratiometric input: the converter's full scale is the excitation itself (±Vex at the
     * converter), read in two's complement, with no code offset.
     *
     * @param bits resolution, 2 to 32
     * @param gain amplifier gain in front of the converter, positive
     * @throws IllegalArgumentException if {@code bits} is not 2 to 32 or the gain not positive
     *                                  and finite
     */
    public static AdcInput ratiometric(int bits, double gain) {
        checkBits(bits);
        Checks.positiveFinite(gain, "gain");
        return new AdcInput(bits, Coding.TWOS_COMPLEMENT, gain, 1.0, Double.NaN, 0.0);
    }

    /**
     * An input with absolute excitation: the converter reads ±{@code fullScale} volts (its
     * input range, often its reference voltage) and the bridge is powered with
     * {@code excitation}, read in two's complement, with no code offset.
     *
     * @throws NullPointerException     if an argument is null
     * @throws IllegalArgumentException if {@code bits} is not 2 to 32, or the gain, the full
     *                                  scale or the excitation is not positive and finite
     */
    public static AdcInput absolute(int bits, double gain, Voltage fullScale, Voltage excitation) {
        checkBits(bits);
        Checks.positiveFinite(gain, "gain");
        Objects.requireNonNull(fullScale, "fullScale");
        Objects.requireNonNull(excitation, "excitation");
        Checks.positiveFinite(fullScale.toVolts(), "fullScale");
        Checks.positiveFinite(excitation.toVolts(), "excitation");
        return new AdcInput(bits, Coding.TWOS_COMPLEMENT, gain, fullScale.toVolts(),
                excitation.toVolts(), 0.0);
    }

    private static void checkBits(int bits) {
        if (bits < 2 || bits > 32) {
            throw new IllegalArgumentException("bits must be in [2, 32]: " + bits);
        }
    }

    /**
     * A copy whose ratiometric full scale is {@code ratio} times the excitation (1 unless the
     * reference is derived from the excitation through a divider).
     *
     * @throws IllegalArgumentException if this input is not ratiometric or {@code ratio} is not
     *                                  positive and finite
     */
    public AdcInput withReferenceRatio(double ratio) {
        Checks.positiveFinite(ratio, "ratio");
        if (!isRatiometric()) {
            throw new IllegalArgumentException(
                    "ratio applies to a ratiometric input only: " + this);
        }
        return new AdcInput(bits, coding, gain, ratio, excitationVolts, codeOffset);
    }

    /** A copy that reads codes in {@code coding}. */
    public AdcInput withCoding(Coding coding) {
        Objects.requireNonNull(coding, "coding");
        return new AdcInput(bits, coding, gain, fullScale, excitationVolts, codeOffset);
    }

    /**
     * A copy with the code offset {@code codeOffset}, in codes: the code (in signed terms) the
     * converter reads at zero input, subtracted before scaling.
     *
     * @throws IllegalArgumentException if {@code codeOffset} is not finite
     */
    public AdcInput withCodeOffset(double codeOffset) {
        Checks.finite(codeOffset, "codeOffset");
        return new AdcInput(bits, coding, gain, fullScale, excitationVolts, codeOffset + 0.0);
    }

    /** The composed scale: V/V per code. */
    double scale() {
        return scale;
    }

    /** The composed offset: V/V at code 0. */
    double offset() {
        return offset;
    }

    /** The lowest code of the range (a rail). */
    double lowCode() {
        return lowCode;
    }

    /** The highest code of the range (a rail). */
    double highCode() {
        return highCode;
    }

    /** Whether codes are offset binary (unsigned, zero at mid-range). */
    boolean isOffsetBinary() {
        return coding == Coding.OFFSET_BINARY;
    }

    /** Whether the converter's reference follows the excitation. */
    public boolean isRatiometric() {
        return Double.isNaN(excitationVolts);
    }

    /** The resolution in bits. */
    public int bits() {
        return bits;
    }

    /** The output ratio of one code step (one LSB). */
    public VoltageRatio ratioPerCode() {
        return VoltageRatio.ofVoltsPerVolt(scale);
    }

    /**
     * The strain of one code step on {@code bridge}, at small strain: the ratio per code over
     * the bridge's sensitivity dr/dε (µε/LSB is what a gateway team asks for).
     *
     * @throws NullPointerException if {@code bridge} is null
     */
    public Strain strainPerCode(Bridge bridge) {
        Objects.requireNonNull(bridge, "bridge");
        return Strain.of(scale / (bridge.sensitivity().toVoltsPerVolt() * 1e3));
    }

    /**
     * The RMS strain noise on {@code bridge} for an RMS noise of {@code rmsCodes} codes at the
     * converter, at small strain.
     *
     * @throws NullPointerException     if {@code bridge} is null
     * @throws IllegalArgumentException if {@code rmsCodes} is negative or not finite
     */
    public Strain strainNoise(Bridge bridge, double rmsCodes) {
        Checks.nonNegativeFinite(rmsCodes, "rmsCodes");
        return strainPerCode(bridge).multipliedBy(rmsCodes);
    }

    /**
     * The output ratio (V/V) of {@code code}; NaN for an end code of the range (the converter
     * saturated) or a code outside it. The same function as the block methods, bit for bit.
     */
    public double toRatio(long code) {
        return ratio(code, scale, offset, lowCode, highCode);
    }

    /**
     * Converts {@code len} codes from {@code src[srcOff...]} to output ratios (V/V) in
     * {@code dst[dstOff...]}. Allocation-free; the same function as {@link #toRatio(long)}.
     *
     * @return the number of outputs set to NaN (saturated or impossible codes)
     * @throws NullPointerException      if an array is null
     * @throws IndexOutOfBoundsException if a range is outside its array
     */
    public int toRatio(int[] src, int srcOff, double[] dst, int dstOff, int len) {
        Checks.block(Objects.requireNonNull(src, "src").length, srcOff, dst, dstOff, len);
        final double s = scale;
        final double o = offset;
        final double low = lowCode;
        final double high = highCode;
        for (int i = 0; i < len; i++) {
            dst[dstOff + i] = ratio(src[srcOff + i], s, o, low, high);
        }
        return Kernels.countNaN(dst, dstOff, len);
    }

    /**
     * Converts {@code len} 16-bit codes from {@code src[srcOff...]}; as
     * {@link #toRatio(int[], int, double[], int, int)}. For an offset-binary converter the
     * {@code short} holds the code's 16 bits, read as unsigned.
     *
     * @return the number of outputs set to NaN
     * @throws NullPointerException      if an array is null
     * @throws IndexOutOfBoundsException if a range is outside its array
     */
    public int toRatio(short[] src, int srcOff, double[] dst, int dstOff, int len) {
        Checks.block(Objects.requireNonNull(src, "src").length, srcOff, dst, dstOff, len);
        final double s = scale;
        final double o = offset;
        final double low = lowCode;
        final double high = highCode;
        final int mask = isOffsetBinary() ? 0xFFFF : -1;
        for (int i = 0; i < len; i++) {
            dst[dstOff + i] = ratio(src[srcOff + i] & mask, s, o, low, high);
        }
        return Kernels.countNaN(dst, dstOff, len);
    }

    /** code·scale + offset, and NaN unless low < code < high (as in the bridge kernels). */
    private static double ratio(double code, double scale, double offset, double low,
            double high) {
        double g = (code - low) * (high - code);
        g = g + Math.abs(g);
        return (code * scale + offset) * (g / g);
    }

    /**
     * {@code AdcInput[24 bits, two's complement, gain 128.0, ratiometric, 9.31323e-7 mV/V per
     * code]}.
     */
    @Override
    public String toString() {
        String excitation = isRatiometric()
                ? (fullScale == 1 ? "ratiometric" : "ratiometric ×" + Format.number(fullScale))
                : "±" + Voltage.ofVolts(fullScale) + " at " + Voltage.ofVolts(excitationVolts);
        String zero = codeOffset == 0 ? "" : ", code offset " + Format.number(codeOffset);
        return "AdcInput[" + bits + " bits, "
                + (coding == Coding.TWOS_COMPLEMENT ? "two's complement" : "offset binary")
                + ", gain " + Format.number(gain) + ", " + excitation + zero + ", "
                + ratioPerCode() + " per code]";
    }

    // ---------------------------------------------------------------- serial form

    private static final long serialVersionUID = 1L;

    /** Writes the serial form ({@link Serial}): the defining values only. */
    private Object writeReplace() {
        return new Serial(bits, coding, gain, fullScale, excitationVolts, codeOffset);
    }

    /** A stream must hold the serial form, never the fields of this class. */
    private void readObject(ObjectInputStream in) throws InvalidObjectException {
        throw SerialForms.proxyRequired("AdcInput");
    }

    /**
     * The serial form of a AdcInput: its defining values, rebuilt on reading through the checks
     * of the factories.
     */
    private static final class Serial implements Serializable {
        private static final long serialVersionUID = 1L;
        private final int bits;
        private final Coding coding;
        private final double gain;
        private final double fullScale;
        private final double excitationVolts;
        private final double codeOffset;

        Serial(int bits, Coding coding, double gain, double fullScale, double excitationVolts, double codeOffset) {
            this.bits = bits;
            this.coding = coding;
            this.gain = gain;
            this.fullScale = fullScale;
            this.excitationVolts = excitationVolts;
            this.codeOffset = codeOffset;
        }

        private Object readResolve() throws InvalidObjectException {
            return SerialForms.rebuild("AdcInput", () -> {
                AdcInput input = Double.isNaN(excitationVolts)
                        ? ratiometric(bits, gain).withReferenceRatio(fullScale)
                        : absolute(bits, gain, Voltage.ofVolts(fullScale),
                                Voltage.ofVolts(excitationVolts));
                return input.withCoding(coding).withCodeOffset(codeOffset);
            });
        }
    }
}
