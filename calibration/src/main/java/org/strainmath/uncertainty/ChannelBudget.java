package org.strainmath.uncertainty;

import java.util.ArrayList;
import java.util.List;
import java.util.Objects;

import org.strainmath.bridge.Bridge;
import org.strainmath.bridge.StrainChannel;
import org.strainmath.internal.Checks;
import org.strainmath.quantity.Resistance;

/**
 * A ready-made uncertainty budget for the strain a configured {@link StrainChannel} reads from
 * one converter code. Each source is an input of the model, entered as the data sheets give it:
 *
 * <ul>
 *   <li><i>gauge factor</i>: a tolerance in % at a coverage factor (normal). The bridge equation
 *       depends on K·ε only, so the strain scales as K0/K exactly;
 *   <li><i>gain</i>: the accuracy of the amplifier and converter span, in % (rectangular
 *       half-width), which scales the reading;
 *   <li><i>excitation</i>: for a converter that measures absolute voltage, the accuracy of the
 *       excitation in % (rectangular), which scales the reading likewise;
 *   <li><i>resolution</i>: ± half a code (rectangular), always in the budget;
 *   <li><i>noise</i>: an RMS noise in codes (normal);
 *   <li><i>lead resistance</i>: a relative uncertainty of every lead, in % (normal); the bridge is
 *       rebuilt with the leads scaled, through its exact equation;
 *   <li><i>temperature</i>: for a channel with a thermal-output correction, the temperature of
 *       the reading and its standard uncertainty in K (normal); the correction's change with
 *       temperature is added to the strain;
 *   <li><i>transverse sensitivity</i>: for a channel with a transverse correction, the standard
 *       uncertainty of Kt; the correction factor is re-evaluated.
 * </ul>
 * The model is first-order in the thermal part (the correction is taken at the strain of the
 * nominal channel) and exact otherwise. Sources not entered are not in the budget: a budget is
 * only as complete as its inputs. The stability of the gauge and the installation (bond,
 * alignment) are for the user to add as inputs of their own.
 *
 * <p>Immutable and thread-safe.
 */
public final class ChannelBudget {

    private final StrainChannel channel;
    private final long code;
    private final List<InputQuantity> inputs;
    private final double celsius;   // NaN without temperature

    private ChannelBudget(StrainChannel channel, long code, List<InputQuantity> inputs,
            double celsius) {
        this.channel = channel;
        this.code = code;
        this.inputs = inputs;
        this.celsius = celsius;
    }

    /**
     * The budget of {@code channel} reading {@code code}, with the resolution of the converter
     * as its first input.
     *
     * @throws NullPointerException     if {@code channel} is null
     * @throws IllegalArgumentException if the code has no strain
     */
    public static ChannelBudget of(StrainChannel channel, long code) {
        Objects.requireNonNull(channel, "channel");
        if (Double.isNaN(channel.toStrain(code))) {
            throw new IllegalArgumentException("code must give a strain: " + code);
        }
        List<InputQuantity> inputs = new ArrayList<>();
        inputs.add(InputQuantity.rectangular("resolution, codes", 0, 0.5));
        return new ChannelBudget(channel, code, inputs, Double.NaN);
    }

    private ChannelBudget with(InputQuantity input) {
        List<InputQuantity> more = new ArrayList<>(inputs);
        more.removeIf(q -> q.name().equals(input.name()));
        more.add(input);
        return new ChannelBudget(channel, code, more, celsius);
    }

    /**
     * A copy with the gauge factor's tolerance, {@code percent} at {@code coverageFactor}.
     *
     * @throws IllegalArgumentException if the tolerance is negative or k not positive
     */
    public ChannelBudget withGaugeFactorTolerance(double percent, double coverageFactor) {
        return with(InputQuantity.normal("gauge factor, relative", 1,
                Checks.nonNegativeFinite(percent, "percent") / 100, coverageFactor));
    }

    /**
     * A copy with the gain (span) accuracy of amplifier and converter, ± {@code percent}.
     *
     * @throws IllegalArgumentException if the accuracy is negative
     */
    public ChannelBudget withGainAccuracy(double percent) {
        return with(InputQuantity.rectangular("gain, relative", 1,
                Checks.nonNegativeFinite(percent, "percent") / 100));
    }

    /**
     * A copy with the accuracy of the excitation voltage, ± {@code percent} (rectangular), for
     * a converter that measures absolute voltage: the ratio the channel computes scales with the
     * excitation it assumes. A ratiometric converter measures against the excitation itself, so
     * its accuracy cancels there.
     *
     * @throws IllegalStateException    if the channel's converter is ratiometric
     * @throws IllegalArgumentException if the accuracy is negative
     */
    public ChannelBudget withExcitationAccuracy(double percent) {
        if (channel.input().isRatiometric()) {
            throw new IllegalStateException("the excitation cancels in a ratiometric channel");
        }
        return with(InputQuantity.rectangular("excitation, relative", 1,
                Checks.nonNegativeFinite(percent, "percent") / 100));
    }

    /**
     * A copy with an RMS noise of {@code rmsCodes} codes on the reading.
     *
     * @throws IllegalArgumentException if the noise is negative
     */
    public ChannelBudget withNoise(double rmsCodes) {
        return with(InputQuantity.ofStandardUncertainty("noise, codes", 0,
                Checks.nonNegativeFinite(rmsCodes, "rmsCodes")));
    }

    /**
     * A copy with a relative standard uncertainty of {@code percent} on every lead resistance.
     *
     * @throws IllegalArgumentException if the uncertainty is negative
     */
    public ChannelBudget withLeadResistanceUncertainty(double percent) {
        return with(InputQuantity.ofStandardUncertainty("lead resistance, relative", 1,
                Checks.nonNegativeFinite(percent, "percent") / 100));
    }

    /**
     * A copy with the standard uncertainty {@code kt} of the gauge's transverse sensitivity Kt
     * (as a fraction: 0.002 for 0.2 %), for a channel with a transverse correction: the
     * correction factor (1 − ν0·Kt)/(1 + Kt·εt/εa) is re-evaluated at the drawn Kt.
     *
     * @throws IllegalStateException    if the channel has no transverse correction
     * @throws IllegalArgumentException if the uncertainty is negative
     */
    public ChannelBudget withTransverseSensitivityUncertainty(double kt) {
        Checks.nonNegativeFinite(kt, "kt");
        if (channel.transverseRatio().isEmpty()) {
            throw new IllegalStateException("the channel has no transverse correction");
        }
        return with(InputQuantity.ofStandardUncertainty("transverse sensitivity Kt",
                gauge().transverseSensitivity(), kt));
    }

    private org.strainmath.bridge.StrainGauge gauge() {
        for (int arm = 1; arm <= 4; arm++) {
            if (channel.bridge().arm(arm).isActive()) {
                return channel.bridge().arm(arm).gauge().orElseThrow();
            }
        }
        throw new AssertionError("a bridge has an active arm");
    }

    /**
     * A copy for a reading at {@code celsius} °C known to {@code standardUncertainty} K, for a
     * channel with a thermal-output correction.
     *
     * @throws IllegalStateException    if the channel has no thermal-output correction
     * @throws IllegalArgumentException if a value is not finite or the uncertainty negative
     */
    public ChannelBudget withTemperature(double celsius, double standardUncertainty) {
        if (!channel.needsTemperature()) {
            throw new IllegalStateException("the channel has no thermal-output correction");
        }
        ChannelBudget next = with(InputQuantity.ofStandardUncertainty("temperature, °C",
                Checks.finite(celsius, "celsius"), standardUncertainty));
        return new ChannelBudget(channel, code, next.inputs, celsius);
    }

    /**
     * The budget: its model takes the inputs in the order they were added.
     *
     * @throws IllegalStateException if the channel needs a temperature and none was given
     */
    public UncertaintyBudget budget() {
        if (channel.needsTemperature() && Double.isNaN(celsius)) {
            throw new IllegalStateException("the channel corrects for thermal output: give the "
                    + "temperature with withTemperature");
        }
        List<String> names = new ArrayList<>();
        for (InputQuantity q : inputs) {
            names.add(q.name());
        }
        int resolution = names.indexOf("resolution, codes");
        int noise = names.indexOf("noise, codes");
        int factor = names.indexOf("gauge factor, relative");
        int gain = names.indexOf("gain, relative");
        int excitation = names.indexOf("excitation, relative");
        int leads = names.indexOf("lead resistance, relative");
        int temperature = names.indexOf("temperature, °C");
        int transverse = names.indexOf("transverse sensitivity Kt");
        double nu0 = gauge().calibrationPoissonRatio();
        double rho = channel.transverseRatio().orElse(0);
        Bridge bridge = channel.bridge();
        double perCode = channel.input().ratioPerCode().toVoltsPerVolt();
        double ratio = channel.input().toRatio(code);
        double constant = channel.transverseFactor() * channel.spanCorrection();
        MeasurementModel model = x -> {
            double codes = x[resolution] + (noise < 0 ? 0 : x[noise]);
            double r = (ratio + codes * perCode) / (gain < 0 ? 1 : x[gain])
                    / (excitation < 0 ? 1 : x[excitation]);
            Bridge b = leads < 0 ? bridge : scaledLeads(bridge, x[leads]);
            double strain = b.toStrain(r) * constant / (factor < 0 ? 1 : x[factor]);
            if (transverse >= 0) {
                double k = x[transverse];
                strain *= (1 - nu0 * k) / (1 + k * rho) / channel.transverseFactor();
            }
            if (temperature >= 0) {
                strain += channel.toStrain(code, x[temperature]) - channel.toStrain(code);
            }
            return strain;
        };
        return UncertaintyBudget.of(model, inputs.toArray(new InputQuantity[0]));
    }

    /** The bridge with every lead multiplied by {@code factor} (its zeroing kept). */
    private static Bridge scaledLeads(Bridge bridge, double factor) {
        Bridge b = bridge;
        for (int arm = 1; arm <= 4; arm++) {
            double lead = bridge.leadInArm(arm).toOhms();
            if (lead != 0) {
                b = b.withLeadInArm(arm, Resistance.ofOhms(lead * factor));
            }
        }
        double excitation = bridge.excitationLeads().toOhms();
        if (excitation != 0) {
            b = b.withExcitationLeads(Resistance.ofOhms(excitation / 2 * factor));
        }
        return b;
    }

    /** The inputs entered so far, in order. */
    public List<InputQuantity> inputs() {
        return List.copyOf(inputs);
    }
}
