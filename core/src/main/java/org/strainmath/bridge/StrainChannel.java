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
    /** The block kernel, composed from the above and the converter. */
    private final ChannelKernel kernel;

    private StrainChannel(Bridge bridge, AdcInput input, double transverseRatio,
            ThermalOutput thermalOutput, Temperature zeroTemperature, double spanFactor) {
        this.bridge = bridge;
        this.spanFactor = spanFactor;
        this.input = input;
        this.transverseRatio = transverseRatio;
        this.thermalOutput = thermalOutput;
        this.zeroTemperature = zeroTemperature;
        StrainGauge gauge = firstActiveGauge(bridge);
        this.transverseFactor = Double.isNaN(transverseRatio) ? 1.0
                : (1 - gauge.calibrationPoissonRatio() * gauge.transverseSensitivity())
                        / (1 + gauge.transverseSensitivity() * transverseRatio);
        this.factor = transverseFactor * spanFactor;
        this.thermal = thermalOutput == null ? null
                : thermalOutput.zeroedAt(zeroTemperature, bridge.gaugeFactor());
        double scale = input.scale();
        double offset = input.offset();
        // Readings inside the converter's range (rails excluded) and physical for the bridge.
        double low = Math.max(bridge.ratioLow(), input.lowCode() * scale + offset);
        double high = Math.min(bridge.ratioHigh(), input.highCode() * scale + offset);
        this.kernel = new ChannelKernel(bridge, scale, offset, low, high, factor, thermal,
                thermal == null ? 0.0 : gauge.gaugeFactorDriftPerKelvin(),
                gauge.gaugeFactorReferenceCelsius(), input.isOffsetBinary());
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
        return kernel.strain(code);
    }

    /**
     * The corrected strain (m/m) of {@code code} read at {@code celsius} °C. The same function
     * as the block method, bit for bit. Never throws.
     */
    public double toStrain(long code, double celsius) {
        return kernel.strain(code, celsius);
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
        return kernel.convertShorts(codes, codesOff, dst, dstOff, len);
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
     * The int[] kernel ({@link ChannelKernel}) with the way of proving a chunk regular chosen:
     * all give the same bits, and the tests compare every one with the scalar path.
     */
    int convert(int[] codes, int codesOff, double[] celsius, int celsiusOff, double[] dst,
            int dstOff, int len, Proof proof) {
        Checks.block(Objects.requireNonNull(codes, "codes").length, codesOff, dst, dstOff, len);
        return kernel.convert(codes, codesOff, celsius, celsiusOff, dst, dstOff, len, proof);
    }

    /** Whether codes from min to max all lie within the proven codes; package-private for tests. */
    boolean proven(int min, int max) {
        return kernel.proven(min, max);
    }

    /**
     * Converts column {@code column} of {@code frameCount} interleaved frames of
     * {@code channelsPerFrame} codes each, starting at {@code framesOff}, into
     * {@code dst[dstOff...]}; for {@link ChannelFrames}, which has checked the ranges.
     */
    int convertColumn(int[] frames, int framesOff, int channelsPerFrame, int column,
            double[] celsiusPerFrame, int celsiusOff, double[] dst, int dstOff, int frameCount) {
        return kernel.convertColumn(frames, framesOff, channelsPerFrame, column, celsiusPerFrame,
                celsiusOff, dst, dstOff, frameCount);
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
