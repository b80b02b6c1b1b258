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
import org.strainmath.quantity.VoltageRatio;

/**
 * A measurement channel as it is wired: a bridge (gauge, arrangement, leads, excitation leads,
 * zero), the converter input that reads it, and the corrections of the gauge, converting raw
 * codes to corrected strain.
 *
 * <pre>
 *   r  = code · scale + offset                        converter ({@link AdcInput})
 *   ε' = exact inverse of the bridge equation at r    bridge ({@link Bridge})
 *   ε  = (f · ε' − (q(T) − q(T0))) · K / K(T)          transverse factor f, thermal output q,
 *                                                     gauge factor K(T) at the temperature
 * </pre>
 * Everything constant is composed when the channel is built: one scale and offset, the bridge's
 * coefficients, one open interval of readings that are both inside the converter's range
 * (rails excluded) and physical for the bridge, one transverse factor and one quartic in °C.
 * Per sample only that arithmetic runs; a code with no physical strain gives NaN.
 *
 * <pre>
 *   StrainChannel channel = StrainChannel.of(
 *           Bridge.quarter(gauge).withThreeWireLeads(Resistance.ofOhms(0.8)),
 *           AdcInput.ratiometric(24, 128));
 *   channel.strainAt(1_048_576);      // the strain of one code
 *   channel.toStrain(codes, 0, strain, 0, codes.length);   // a block
 * </pre>
 *
 * <p>Immutable and thread-safe.
 * Serializable, for a stream engine that ships configurations to other processes: the
 * stream holds the defining values only, checked again as the factories check them.
 */
public final class StrainChannel implements Serializable {

    /**
     * Readings within this share of the reading interval's width from either end are never
     * proven regular, so that the proof keeps a margin from the ends.
     */
    private static final double EDGE = 0x1p-16;

    private final Bridge bridge;
    private final AdcInput input;
    private final double transverseRatio;        // NaN unless set
    private final double transverseFactor;       // 1 unless set
    private final double spanFactor;             // 1 unless set
    /** transverseFactor × spanFactor: the one factor the kernels apply. */
    private final double factor;
    private final ThermalOutput thermalOutput;   // null unless set
    @SuppressWarnings("serial") // never serialized: the serial form holds the defining values
    private final Temperature zeroTemperature;   // null unless set
    @SuppressWarnings("serial") // never serialized: the serial form holds the defining values
    private final ThermalOutput.Correction thermal;
    /** Relative gauge-factor change per kelvin of the active gauges, and its reference, °C. */
    private final double drift;
    private final double driftCelsius;

    private final double scale;
    private final double offset;
    private final double low;
    private final double high;
    /**
     * The codes [provenLow, provenHigh] whose readings lie inside (low, high) on an interval
     * where the bridge's plain quotient is proven regular (Bridge.regularOn): a chunk of codes
     * within them needs neither the per-sample check nor a count of NaN. Empty (1, 0) if none.
     */
    private final int provenLow;
    private final int provenHigh;

    private StrainChannel(Bridge bridge, AdcInput input, double transverseRatio,
            ThermalOutput thermalOutput, Temperature zeroTemperature, double spanFactor) {
        this.bridge = bridge;
        this.spanFactor = spanFactor;
        this.input = input;
        this.transverseRatio = transverseRatio;
        this.thermalOutput = thermalOutput;
        this.zeroTemperature = zeroTemperature;
        this.scale = input.scale();
        this.offset = input.offset();
        // Readings inside the converter's range (rails excluded) and physical for the bridge.
        this.low = Math.max(bridge.ratioLow(), input.lowCode() * scale + offset);
        this.high = Math.min(bridge.ratioHigh(), input.highCode() * scale + offset);
        long[] proven = provenCodes(bridge, scale, offset, low, high);
        this.provenLow = (int) proven[0];
        this.provenHigh = (int) proven[1];
        StrainGauge gauge = firstActiveGauge(bridge);
        this.transverseFactor = Double.isNaN(transverseRatio) ? 1.0
                : (1 - gauge.calibrationPoissonRatio() * gauge.transverseSensitivity())
                        / (1 + gauge.transverseSensitivity() * transverseRatio);
        this.factor = transverseFactor * spanFactor;
        this.thermal = thermalOutput == null ? null
                : thermalOutput.zeroedAt(zeroTemperature, bridge.gaugeFactor());
        this.drift = thermal == null ? 0.0 : gauge.gaugeFactorDriftPerKelvin();
        this.driftCelsius = gauge.gaugeFactorReferenceCelsius();
    }

    private static StrainGauge firstActiveGauge(Bridge bridge) {
        for (int arm = 1; arm <= 4; arm++) {
            if (bridge.arm(arm).isActive()) {
                return bridge.arm(arm).gauge().orElseThrow();
            }
        }
        throw new AssertionError("a bridge has an active arm");
    }

    /**
     * The codes, as {low, high} within the int range, whose readings code·scale + offset lie in
     * the reading interval less a margin of EDGE × its width at each end, if the bridge's plain
     * quotient is regular there; {1, 0} otherwise. Rounding is monotonic, so every code between
     * the two found ends gives a reading between their readings.
     */
    private static long[] provenCodes(Bridge bridge, double scale, double offset, double low,
            double high) {
        double margin = (high - low) * EDGE;
        double lo = low + margin;
        double hi = high - margin;
        long[] none = {1, 0};
        if (!(lo < hi) || !bridge.regularOn(lo, hi)) {
            return none;
        }
        double first = scale > 0 ? lo : hi;
        double last = scale > 0 ? hi : lo;
        long a = clampToInt(Math.ceil((first - offset) / scale));
        long b = clampToInt(Math.floor((last - offset) / scale));
        while (a <= b && !within(a * scale + offset, lo, hi)) {
            a++;
        }
        while (a <= b && !within(b * scale + offset, lo, hi)) {
            b--;
        }
        return a <= b ? new long[] {a, b} : none;
    }

    private static boolean within(double r, double lo, double hi) {
        return r >= lo && r <= hi;
    }

    private static long clampToInt(double code) {
        return (long) Math.max(Integer.MIN_VALUE, Math.min(Integer.MAX_VALUE, code));
    }

    /**
     * The channel of {@code bridge} read through {@code input}, with no corrections.
     *
     * @throws NullPointerException if an argument is null
     */
    public static StrainChannel of(Bridge bridge, AdcInput input) {
        Objects.requireNonNull(bridge, "bridge");
        Objects.requireNonNull(input, "input");
        return new StrainChannel(bridge, input, Double.NaN, null, null, 1.0);
    }

    /**
     * A copy corrected for the transverse sensitivity of its gauges (their Kt and ν0), for a
     * known ratio of transverse to axial strain at the gauges (−ν in uniaxial stress), by
     * {@link StrainGauge#correctedForTransverse(Strain, double)}. Exact when every active gauge
     * lies along the measured strain (quarter, bending and opposite-arm arrangements); an
     * arrangement with Poisson gauges is refused, since each of its gauges sees another
     * transverse strain.
     *
     * @throws IllegalArgumentException if the ratio is not finite, the bridge has Poisson
     *                                  gauges, or its active gauges differ in Kt or ν0
     */
    public StrainChannel withTransverseCorrection(double transverseToAxialRatio) {
        Checks.finite(transverseToAxialRatio, "transverseToAxialRatio");
        StrainGauge first = firstActiveGauge(bridge);
        for (int arm = 1; arm <= 4; arm++) {
            BridgeArm a = bridge.arm(arm);
            if (!a.isActive()) {
                continue;
            }
            StrainGauge g = a.gauge().orElseThrow();
            if (Math.abs(a.strainMultiple()) != 1
                    || g.transverseSensitivity() != first.transverseSensitivity()
                    || g.calibrationPoissonRatio() != first.calibrationPoissonRatio()) {
                throw new IllegalArgumentException("bridge must have its active gauges along the"
                        + " measured strain, all of one kind, for a transverse correction: "
                        + bridge);
            }
        }
        if (1 + first.transverseSensitivity() * transverseToAxialRatio == 0) {
            throw new IllegalArgumentException("transverseToAxialRatio must not be -1/Kt: "
                    + transverseToAxialRatio);
        }
        return new StrainChannel(bridge, input, transverseToAxialRatio + 0.0, thermalOutput,
                zeroTemperature, spanFactor);
    }

    /**
     * A copy corrected for the thermal output {@code curve} of its gauge, relative to
     * {@code zeroTemperature}, the temperature at which the channel was zeroed, and scaled to
     * the bridge's gauge factor. Conversions then need the temperature of each sample, and a
     * gauge-factor temperature coefficient of the gauges
     * ({@link StrainGauge#withGaugeFactorTemperatureCoefficient}) is applied as well:
     * <pre>
     *   ε = (f·ε' − (q(T) − q(T0))) · K / K(T)
     * </pre>
     * exact for the bridge, whose equation depends on K·ε only, when all active gauges share the
     * coefficient.
     *
     * @throws NullPointerException if an argument is null
     */
    public StrainChannel withThermalOutput(ThermalOutput curve, Temperature zeroTemperature) {
        Objects.requireNonNull(curve, "curve");
        Objects.requireNonNull(zeroTemperature, "zeroTemperature");
        return new StrainChannel(bridge, input, transverseRatio, curve, zeroTemperature, spanFactor);
    }

    /**
     * A copy whose strains are multiplied by {@code factor}, the span correction that a shunt
     * check gives (expected over measured equivalent strain; see the calibration module's
     * shunt check). Applied with the transverse factor, before the thermal correction; replaces
     * an earlier span correction.
     *
     * @throws IllegalArgumentException if {@code factor} is not positive and finite
     */
    public StrainChannel withSpanCorrection(double factor) {
        return new StrainChannel(bridge, input, transverseRatio, thermalOutput, zeroTemperature,
                Checks.positiveFinite(factor, "factor"));
    }

    /**
     * The transverse-sensitivity factor the channel applies,
     * (1 − ν0·Kt)/(1 + Kt·εt/εa), or 1 without that correction.
     */
    public double transverseFactor() {
        return transverseFactor;
    }

    /** The transverse-to-axial strain ratio εt/εa of the transverse correction, if one is set. */
    public java.util.OptionalDouble transverseRatio() {
        return Double.isNaN(transverseRatio) ? java.util.OptionalDouble.empty()
                : java.util.OptionalDouble.of(transverseRatio);
    }

    /** The span correction factor (1 unless one was set). */
    public double spanCorrection() {
        return spanFactor;
    }

    /**
     * A copy zeroed by offset at the reading {@code code} of the unstrained channel
     * ({@link Bridge#zeroedByOffset}).
     *
     * @throws IllegalArgumentException if the code has no reading or no physical strain
     */
    public StrainChannel zeroedByOffsetAt(long code) {
        return withBridge(bridge.zeroedByOffset(zeroReading(code)));
    }

    /**
     * A copy zeroed exactly at the reading {@code code} of the unstrained channel, attributing
     * the unbalance to arm {@code arm} ({@link Bridge#zeroedInArm}).
     *
     * @throws IndexOutOfBoundsException if {@code arm} is not 1 to 4
     * @throws IllegalArgumentException  if the code has no reading, or the arm cannot explain it
     */
    public StrainChannel zeroedInArmAt(long code, int arm) {
        return withBridge(bridge.zeroedInArm(zeroReading(code), arm));
    }

    private VoltageRatio zeroReading(long code) {
        double ratio = input.toRatio(code);
        if (ratio != ratio) {
            throw new IllegalArgumentException("code must be inside the converter's range, rails"
                    + " excluded: " + code);
        }
        return VoltageRatio.ofVoltsPerVolt(ratio);
    }

    private StrainChannel withBridge(Bridge zeroed) {
        return new StrainChannel(zeroed, input, transverseRatio, thermalOutput, zeroTemperature,
                spanFactor);
    }

    /** The bridge of this channel. */
    public Bridge bridge() {
        return bridge;
    }

    /** The converter input of this channel. */
    public AdcInput input() {
        return input;
    }

    /** Whether conversions need a temperature per sample (a thermal output is set). */
    public boolean needsTemperature() {
        return thermal != null;
    }

    // ---------------------------------------------------------------- value API

    /**
     * The corrected strain of one {@code code}.
     *
     * @throws IllegalStateException    if the channel needs a temperature
     * @throws IllegalArgumentException if the code has no physical strain
     */
    public Strain strainAt(long code) {
        checkNoTemperatureNeeded();
        return checked(toStrain(code), code);
    }

    /**
     * The corrected strain of one {@code code} read at {@code temperature}.
     *
     * @throws NullPointerException     if {@code temperature} is null
     * @throws IllegalArgumentException if the code has no physical strain
     */
    public Strain strainAt(long code, Temperature temperature) {
        Objects.requireNonNull(temperature, "temperature");
        return checked(toStrain(code, temperature.toCelsius()), code);
    }

    private static Strain checked(double strain, long code) {
        if (strain != strain) {
            throw new IllegalArgumentException("code must give a physical strain (inside the"
                    + " converter's range and the bridge's): " + code);
        }
        return Strain.of(strain);
    }

    private void checkNoTemperatureNeeded() {
        if (thermal != null) {
            throw new IllegalStateException(
                    "the channel corrects for thermal output: give the temperatures");
        }
    }

    // ---------------------------------------------------------------- kernels

    /**
     * The corrected strain (m/m) of {@code code}; NaN if it has none. The same function as the
     * block method, bit for bit. Never throws; without temperatures the thermal correction, if
     * set, is not applied (use {@link #toStrain(long, double)}).
     */
    public double toStrain(long code) {
        return bridge.channelStrain(code * scale + offset, low, high, factor);
    }

    /**
     * The corrected strain (m/m) of {@code code} read at {@code celsius} °C. The same function
     * as the block method, bit for bit. Never throws.
     */
    public double toStrain(long code, double celsius) {
        double strain = toStrain(code);
        if (thermal == null) {
            return strain;
        }
        return gaugeFactorAt(thermal.correct(strain, celsius), celsius, drift, driftCelsius);
    }

    /**
     * ε·K/K(T) = ε / (1 + c·(T − Tref)): the bridge equation depends on K·ε only, so a gauge
     * factor that follows temperature rescales the strain exactly when all active gauges share
     * it.
     */
    private static double gaugeFactorAt(double strain, double celsius, double drift,
            double reference) {
        return strain / (1.0 + drift * (celsius - reference));
    }

    /**
     * Converts {@code len} codes from {@code codes[codesOff...]} to corrected strains (m/m) in
     * {@code dst[dstOff...]}. Allocation-free.
     *
     * @return the number of outputs set to NaN
     * @throws IllegalStateException     if the channel needs temperatures
     * @throws NullPointerException      if an array is null
     * @throws IndexOutOfBoundsException if a range is outside its array
     */
    public int toStrain(int[] codes, int codesOff, double[] dst, int dstOff, int len) {
        checkNoTemperatureNeeded();
        return convert(codes, codesOff, null, 0, dst, dstOff, len);
    }

    /**
     * Converts {@code len} codes with the temperature of each sample in °C,
     * {@code celsius[celsiusOff...]}, to corrected strains (m/m). Allocation-free. A
     * temperature that is not finite gives NaN; {@code celsius} must not overlap {@code dst}.
     *
     * @return the number of outputs set to NaN
     * @throws NullPointerException      if an array is null
     * @throws IndexOutOfBoundsException if a range is outside its array
     * @throws IllegalArgumentException  if {@code celsius} overlaps {@code dst}
     */
    public int toStrain(int[] codes, int codesOff, double[] celsius, int celsiusOff,
            double[] dst, int dstOff, int len) {
        Objects.requireNonNull(celsius, "celsius");
        Objects.checkFromIndexSize(celsiusOff, len, celsius.length);
        Checks.disjoint(celsius, celsiusOff, "celsius", dst, dstOff, "dst", len);
        return convert(codes, codesOff, celsius, celsiusOff, dst, dstOff, len);
    }

    /**
     * Converts {@code len} 16-bit codes from {@code codes[codesOff...]}, read as the converter
     * writes them (unsigned for offset binary), to corrected strains (m/m). Allocation-free;
     * the same function as {@link #toStrain(long)} of the code's value.
     *
     * @return the number of outputs set to NaN
     * @throws IllegalStateException     if the channel needs temperatures
     * @throws NullPointerException      if an array is null
     * @throws IndexOutOfBoundsException if a range is outside its array
     */
    public int toStrain(short[] codes, int codesOff, double[] dst, int dstOff, int len) {
        checkNoTemperatureNeeded();
        Checks.block(Objects.requireNonNull(codes, "codes").length, codesOff, dst, dstOff, len);
        final double s = scale;
        final double o = offset;
        final int mask = input.isOffsetBinary() ? 0xFFFF : -1;
        int nan = 0;
        for (int done = 0; done < len; done += Kernels.CHUNK) {
            int start = dstOff + done;
            int stop = start + Math.min(Kernels.CHUNK, len - done);
            int min = Integer.MAX_VALUE;
            int max = Integer.MIN_VALUE;
            for (int i = start, k = codesOff + done; i < stop; i++, k++) {
                int code = codes[k] & mask;
                min = Math.min(min, code);
                max = Math.max(max, code);
                dst[i] = code * s + o;
            }
            nan += finish(dst, start, stop, null, 0, proven(min, max));
        }
        return nan;
    }

    private int convert(int[] codes, int codesOff, double[] celsius, int celsiusOff,
            double[] dst, int dstOff, int len) {
        return convert(codes, codesOff, celsius, celsiusOff, dst, dstOff, len,
                Kernels.REDUCTIONS_IN_LOOP ? Proof.IN_LOOP : Proof.PASS_BEFORE);
    }

    /** How the int[] kernel proves a chunk of codes regular; package-private for tests. */
    enum Proof {
        /** Never: every chunk takes the checked path (the reference for tests). */
        NONE,
        /** A min/max pass over the codes before the plain loop (JDK 17 to 24). */
        PASS_BEFORE,
        /** The plain loop takes the codes' least and greatest itself; redo if outside (JDK 25). */
        IN_LOOP
    }

    /**
     * The int[] kernel. Per chunk, the codes' least and greatest values decide the path: inside
     * the proven codes, one vectorised loop with one division per sample and no count; else the
     * readings, the checked inverse and a count of the NaN it gave. {@code proof} says how the
     * least and greatest are found: by a pass before the loop, or by the loop itself, which
     * then hands a chunk with a code outside to the checked path, which overwrites what the
     * loop wrote (see {@link Kernels#REDUCTIONS_IN_LOOP}). All give the same bits; the tests
     * compare every one with the scalar path.
     */
    int convert(int[] codes, int codesOff, double[] celsius, int celsiusOff, double[] dst,
            int dstOff, int len, Proof proof) {
        Checks.block(Objects.requireNonNull(codes, "codes").length, codesOff, dst, dstOff, len);
        final int shift = codesOff - dstOff;
        final boolean withThermal = thermal != null && celsius != null;
        int nan = 0;
        for (int done = 0; done < len; done += Kernels.CHUNK) {
            int start = dstOff + done;
            int stop = start + Math.min(Kernels.CHUNK, len - done);
            boolean converted;
            if (proof == Proof.NONE) {
                converted = false;
            } else if (proof == Proof.IN_LOOP) {
                if (withThermal) {
                    int counted = fusedWithThermal(codes, shift, celsius, celsiusOff - dstOff,
                            dst, start, stop, true);
                    converted = counted >= 0;
                    nan += Math.max(counted, 0);
                } else {
                    converted = bridge.codesToStrainPlainWithin(codes, shift, scale, offset,
                            dst, start, stop, factor, provenLow, provenHigh);
                }
            } else if (proven(codes, start + shift, stop + shift)) {
                if (withThermal) {
                    nan += fusedWithThermal(codes, shift, celsius, celsiusOff - dstOff, dst,
                            start, stop, false);
                } else {
                    bridge.codesToStrainPlain(codes, shift, scale, offset, dst, start, stop,
                            factor);
                }
                converted = true;
            } else {
                converted = false;
            }
            if (!converted) {
                codesToReadings(codes, shift, dst, start, stop);
                nan += finish(dst, start, stop, celsius, celsiusOff - dstOff, false);
            }
        }
        return nan;
    }

    /**
     * A chunk with the thermal correction, converted in one loop (the bridge inverse less the
     * thermal output) that reads each temperature at the output's own index (copied into dst
     * first when the offsets differ, since C2 does not vectorise two double arrays read and
     * written at different unknown offsets). With {@code boundsInLoop} the loop also takes the
     * codes' least and greatest and this returns −1 if one lay outside the proven codes (the
     * caller redoes the chunk by the checked path; the temperatures are read from
     * {@code celsius}, which is disjoint from dst); without, the caller has proven the codes.
     * Otherwise it returns the count of NaN outputs. Without a drifting gauge factor, only a
     * temperature that is not finite (the loop reports it) leads to a count, after those
     * samples are set to NaN as the scalar path sets them.
     */
    private int fusedWithThermal(int[] codes, int shift, double[] celsius, int celsiusShift,
            double[] dst, int start, int stop, boolean boundsInLoop) {
        double[] t = celsius;
        if (celsiusShift != 0) {
            System.arraycopy(celsius, start + celsiusShift, dst, start, stop - start);
            t = dst;
        }
        int status;
        if (boundsInLoop) {
            status = bridge.codesToStrainLessThermalWithin(codes, shift, scale, offset, t, dst,
                    start, stop, factor, thermal, provenLow, provenHigh);
            if (status == Bridge.CODES_OUTSIDE) {
                return -1;
            }
        } else {
            status = bridge.codesToStrainLessThermal(codes, shift, scale, offset, t, dst, start,
                    stop, factor, thermal) ? Bridge.PROVEN : Bridge.PROVEN_NON_FINITE_TEMPERATURE;
        }
        boolean finite = status == Bridge.PROVEN;
        if (drift != 0.0) {
            gaugeFactorInPlace(dst, celsius, celsiusShift, start, stop);
        }
        if (!finite) {
            for (int i = start; i < stop; i++) {
                if (!Double.isFinite(celsius[i + celsiusShift])) {
                    dst[i] = Double.NaN;
                }
            }
        }
        // With a drifting gauge factor, 1 + c·(T − Tref) can reach 0 at an absurd but finite
        // temperature, so such a chunk is counted even when every temperature is finite.
        return finite && drift == 0.0 ? 0 : Kernels.countNaN(dst, start, stop - start);
    }

    /** Whether every code of codes[from, to) lies within the proven codes. */
    private boolean proven(int[] codes, int from, int to) {
        int min = Integer.MAX_VALUE;
        int max = Integer.MIN_VALUE;
        for (int i = from; i < to; i++) {
            int code = codes[i];
            min = Math.min(min, code);
            max = Math.max(max, code);
        }
        return proven(min, max);
    }

    /** Whether codes from min to max all lie within the proven codes; package-private for tests. */
    boolean proven(int min, int max) {
        return min >= provenLow && max <= provenHigh;
    }

    private void codesToReadings(int[] codes, int shift, double[] dst, int start, int stop) {
        final double s = scale;
        final double o = offset;
        for (int i = start; i < stop; i++) {
            dst[i] = codes[i + shift] * s + o;
        }
    }

    /**
     * Converts column {@code column} of {@code frameCount} interleaved frames of
     * {@code channelsPerFrame} codes each, starting at {@code framesOff}, into
     * {@code dst[dstOff...]}; for {@link ChannelFrames}, which has checked the ranges.
     */
    int convertColumn(int[] frames, int framesOff, int channelsPerFrame, int column,
            double[] celsiusPerFrame, int celsiusOff, double[] dst, int dstOff, int frameCount) {
        final double s = scale;
        final double o = offset;
        int nan = 0;
        int k = framesOff + column;
        for (int done = 0; done < frameCount; done += Kernels.CHUNK) {
            int start = dstOff + done;
            int stop = start + Math.min(Kernels.CHUNK, frameCount - done);
            int min = Integer.MAX_VALUE;
            int max = Integer.MIN_VALUE;
            for (int i = start; i < stop; i++, k += channelsPerFrame) {
                int code = frames[k];
                min = Math.min(min, code);
                max = Math.max(max, code);
                dst[i] = code * s + o;
            }
            nan += finish(dst, start, stop, celsiusPerFrame, celsiusOff - dstOff,
                    proven(min, max));
        }
        return nan;
    }

    /**
     * The bridge inverse with the channel's factor, and the thermal correction, of the
     * readings dst[start, stop) in place; returns the count of NaN there.
     */
    private int finish(double[] dst, int start, int stop, double[] celsius, int shift,
            boolean proven) {
        bridge.readingsToStrain(dst, start, stop, low, high, factor, proven);
        return corrected(dst, start, stop, celsius, shift, proven);
    }

    /**
     * The thermal correction of dst[start, end) in place, when the channel has one and
     * temperatures are given (celsius[i + shift] for dst[i]); returns the count of NaN there,
     * which is 0 without counting when the strains were proven regular and nothing followed.
     */
    private int corrected(double[] dst, int start, int stop, double[] celsius, int shift,
            boolean proven) {
        if (thermal != null && celsius != null) {
            thermal.correctInPlace(dst, celsius, shift, start, stop);
            if (drift != 0.0) {
                gaugeFactorInPlace(dst, celsius, shift, start, stop);
            }
        } else if (proven) {
            return 0;
        }
        return Kernels.countNaN(dst, start, stop - start);
    }

    private void gaugeFactorInPlace(double[] dst, double[] celsius, int shift, int start,
            int end) {
        final double c = drift;
        final double reference = driftCelsius;
        if (shift == 0) {
            for (int i = start; i < end; i++) {
                dst[i] = gaugeFactorAt(dst[i], celsius[i], c, reference);
            }
        } else {
            for (int i = start; i < end; i++) {
                dst[i] = gaugeFactorAt(dst[i], celsius[i + shift], c, reference);
            }
        }
    }

    /**
     * The channel sheet: one line per piece in the order a technician wires them, e.g.
     * <pre>
     * StrainChannel
     *   gauge       350.0 Ω, K=2.08, Kt=0.6 %
     *   bridge      quarter bridge, 0.517451 mV/V per 1000 µε
     *   arms        arm 1: active gauge ×1.0 (350.0 Ω, K=2.08); arm 2: completion resistor ...
     *   leads       arm 1 1.72414 Ω, arm 2 1.72414 Ω; desensitisation 0.995098
     *   converter   24 bits, two's complement, gain 128.0, ratiometric, 9.31323e-7 mV/V per code
     *   transverse  εt/εa = -0.29, factor 1.00003
     *   span        not corrected
     *   thermal     -28.4 + 2.05·T - 0.047·T² µε, T in °C, at K=2.0; zeroed at 22.0 °C
     *   zero        offset -0.00199303 mV/V subtracted
     *   resolution  0.00179983 µε per code
     * </pre>
     */
    @Override
    public String toString() {
        StringBuilder text = new StringBuilder("StrainChannel");
        line(text, "gauge", inside(firstActiveGauge(bridge).toString()));
        line(text, "bridge", bridge.arrangementText());
        line(text, "arms", bridge.armsText());
        String leads = bridge.leadsText();
        line(text, "leads", leads.isEmpty() ? "none"
                : leads + "; desensitisation " + Format.number(bridge.leadDesensitisation()));
        line(text, "converter", inside(input.toString()));
        line(text, "transverse", Double.isNaN(transverseRatio) ? "not corrected"
                : "εt/εa = " + Format.number(transverseRatio) + ", factor "
                        + Format.number(transverseFactor));
        line(text, "span", spanFactor == 1.0 ? "not corrected"
                : "×" + Format.number(spanFactor));
        line(text, "thermal", thermal == null ? "not corrected"
                : inside(thermalOutput.toString()) + "; zeroed at " + zeroTemperature);
        double zero = bridge.zeroingOffset();
        line(text, "zero", zero == 0
                ? "output at zero strain " + bridge.zeroOutput()
                : "offset " + VoltageRatio.ofVoltsPerVolt(zero) + " subtracted");
        line(text, "resolution", input.strainPerCode(bridge) + " per code");
        return text.toString();
    }

    private static void line(StringBuilder text, String label, String value) {
        text.append("\n  ").append(label).append(" ".repeat(12 - label.length())).append(value);
    }

    /** The contents of a {@code Name[...]} text. */
    private static String inside(String text) {
        return text.substring(text.indexOf('[') + 1, text.length() - 1);
    }

    // ---------------------------------------------------------------- serial form

    private static final long serialVersionUID = 1L;

    /** Writes the serial form ({@link Serial}): the defining values only. */
    private Object writeReplace() {
        return new Serial(bridge, input, transverseRatio, thermalOutput,
                zeroTemperature == null ? Double.NaN : zeroTemperature.toKelvin(), spanFactor);
    }

    /** A stream must hold the serial form, never the fields of this class. */
    private void readObject(ObjectInputStream in) throws InvalidObjectException {
        throw SerialForms.proxyRequired("StrainChannel");
    }

    /**
     * The serial form of a StrainChannel: its defining values, rebuilt on reading through the checks
     * of the factories.
     */
    private static final class Serial implements Serializable {
        private static final long serialVersionUID = 1L;
        private final Bridge bridge;
        private final AdcInput input;
        private final double transverseRatio;
        private final ThermalOutput thermalOutput;
        private final double zeroKelvin;
        private final double spanFactor;

        Serial(Bridge bridge, AdcInput input, double transverseRatio, ThermalOutput thermalOutput, double zeroKelvin, double spanFactor) {
            this.bridge = bridge;
            this.input = input;
            this.transverseRatio = transverseRatio;
            this.thermalOutput = thermalOutput;
            this.zeroKelvin = zeroKelvin;
            this.spanFactor = spanFactor;
        }

        private Object readResolve() throws InvalidObjectException {
            return SerialForms.rebuild("StrainChannel", () -> {
                StrainChannel c = of(bridge, input);
                if (!Double.isNaN(transverseRatio)) {
                    c = c.withTransverseCorrection(transverseRatio);
                }
                if (thermalOutput != null) {
                    c = c.withThermalOutput(thermalOutput, Temperature.ofKelvin(zeroKelvin));
                }
                return spanFactor == 1.0 ? c : c.withSpanCorrection(spanFactor);
            });
        }
    }
}
