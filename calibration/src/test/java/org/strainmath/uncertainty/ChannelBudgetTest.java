package org.strainmath.uncertainty;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.Test;
import org.strainmath.bridge.AdcInput;
import org.strainmath.bridge.Bridge;
import org.strainmath.bridge.StrainChannel;
import org.strainmath.bridge.StrainGauge;
import org.strainmath.bridge.ThermalOutput;
import org.strainmath.quantity.Resistance;
import org.strainmath.quantity.Temperature;

/** The ready-made channel budget, source by source, on an invented channel of our own. */
class ChannelBudgetTest {

    private static final AdcInput ADC = AdcInput.ratiometric(24, 128);
    private static final Bridge QUARTER = Bridge.quarter(StrainGauge.ofOhms(350, 2.0));
    private static final StrainChannel CHANNEL = StrainChannel.of(QUARTER, ADC);
    /** About 1000 µε: 0.5 mV/V over 2^-23/128 V/V per code. */
    private static final long CODE = Math.round(0.5e-3 / ADC.ratioPerCode().toVoltsPerVolt());

    private static double share(UncertaintyResult r, String name) {
        return r.contributions().stream().filter(c -> c.input().name().equals(name))
                .findFirst().orElseThrow().contribution();
    }

    @Test
    void aOnePercentGaugeFactorToleranceIsAOnePercentStrainUncertainty() {
        // Common practice, no source: when the gauge-factor tolerance dominates, a 1 %
        // tolerance (one standard uncertainty) is a 1 % strain uncertainty.
        UncertaintyResult r = ChannelBudget.of(CHANNEL, CODE).withGaugeFactorTolerance(1, 1)
                .budget().evaluate(0.95);
        assertThat(r.estimate()).isCloseTo(CHANNEL.toStrain(CODE), within(1e-15));
        assertThat(r.combinedStandardUncertainty() / r.estimate()).isCloseTo(0.01, within(2e-5));
        assertThat(r.contributions().get(0).input().name()).isEqualTo("gauge factor, relative");
    }

    @Test
    void resolutionNoiseAndGainFollowTheirSmallSignalForms() {
        // Resolution ±½ code is u = 0.5/√3 codes (GUM 4.3.7); noise is its RMS in codes; both
        // convert by the strain per code (AdcInput.strainPerCode), to the quarter bridge's
        // nonlinearity at 1000 µε (0.2 %, the small-signal slope is not the slope there).
        // Gain: rectangular ±0.1 % of the reading, u = 0.001/√3 of the strain, to the same 0.2 %.
        UncertaintyResult r = ChannelBudget.of(CHANNEL, CODE).withNoise(3).withGainAccuracy(0.1)
                .budget().evaluate(0.95);
        double perCode = ADC.strainPerCode(QUARTER).value();
        double strain = CHANNEL.toStrain(CODE);
        assertThat(share(r, "resolution, codes")).isCloseTo(perCode * 0.5 / Math.sqrt(3), within(perCode * 0.01));
        assertThat(share(r, "noise, codes")).isCloseTo(perCode * 3, within(perCode * 0.03));
        assertThat(share(r, "gain, relative")).isCloseTo(strain * 0.001 / Math.sqrt(3), within(strain * 0.001 * 0.01));
    }

    @Test
    void leadResistanceActsThroughTheDesensitisation() {
        // Three-wire leads desensitise by Rg/(Rg + RL) (Window, Strain Gauge Technology): a
        // 10 % uncertainty of RL = 2 Ω moves the strain by about ε·(RL/Rg)·0.1.
        StrainChannel wired = StrainChannel.of(QUARTER.withThreeWireLeads(Resistance.ofOhms(2)), ADC);
        UncertaintyResult r = ChannelBudget.of(wired, CODE).withLeadResistanceUncertainty(10)
                .budget().evaluate(0.95);
        double strain = wired.toStrain(CODE);
        assertThat(share(r, "lead resistance, relative"))
                .isCloseTo(Math.abs(strain) * 2.0 / 352 * 0.1, within(Math.abs(strain) * 2.0 / 352 * 0.1 * 0.02));
    }

    @Test
    void temperatureActsThroughTheThermalCorrection() {
        // Oracle: the channel's own thermal correction, differenced over ±1 K by hand.
        StrainChannel thermal = CHANNEL.withThermalOutput(ThermalOutput.ofCelsius(-30, 2.1, -0.045),
                Temperature.ofCelsius(20));
        UncertaintyResult r = ChannelBudget.of(thermal, CODE).withTemperature(60, 1).budget()
                .evaluate(0.95);
        double slope = (thermal.toStrain(CODE, 61) - thermal.toStrain(CODE, 59)) / 2;
        assertThat(share(r, "temperature, °C")).isCloseTo(Math.abs(slope), within(Math.abs(slope) * 1e-6));
        assertThat(r.estimate()).isCloseTo(thermal.toStrain(CODE, 60), within(1e-15));
        assertThatThrownBy(() -> ChannelBudget.of(CHANNEL, CODE).withTemperature(20, 1))
                .isInstanceOf(IllegalStateException.class)
                .hasMessage("the channel has no thermal-output correction");
        assertThatThrownBy(() -> ChannelBudget.of(thermal, CODE).budget())
                .isInstanceOf(IllegalStateException.class);
        assertThatThrownBy(() -> ChannelBudget.of(CHANNEL, (1L << 23) - 1))
                .hasMessage("code must give a strain: 8388607");
        assertThatThrownBy(() -> ChannelBudget.of(CHANNEL, CODE).withNoise(-1))
                .hasMessage("rmsCodes must be >= 0 and finite: -1.0");
    }

    @Test
    void transverseSensitivityActsThroughTheCorrectionFactor() {
        // f(Kt) = (1 − ν0·Kt)/(1 + Kt·ρ) (ASTM E251 model, StrainGauge): the contribution is
        // |ε·d ln f/dKt|·u = |ε·(−ν0/(1 − ν0Kt) − ρ/(1 + Kt·ρ))|·u, by hand.
        StrainGauge gauge = StrainGauge.ofOhms(350, 2.0).withTransverseSensitivity(0.01);
        StrainChannel corrected = StrainChannel.of(Bridge.quarter(gauge), ADC).withTransverseCorrection(-0.3);
        UncertaintyResult r = ChannelBudget.of(corrected, CODE).withTransverseSensitivityUncertainty(0.003)
                .budget().evaluate(0.95);
        double strain = corrected.toStrain(CODE);
        double slope = -0.285 / (1 - 0.285 * 0.01) + 0.3 / (1 - 0.01 * 0.3);
        assertThat(share(r, "transverse sensitivity Kt")).isCloseTo(Math.abs(strain * slope) * 0.003,
                within(Math.abs(strain * slope) * 0.003 * 1e-4));
        assertThatThrownBy(() -> ChannelBudget.of(CHANNEL, CODE).withTransverseSensitivityUncertainty(0.003))
                .isInstanceOf(IllegalStateException.class).hasMessage("the channel has no transverse correction");
    }

    @Test
    void excitationCountsOnlyForAnAbsoluteConverter() {
        // An absolute converter computes the ratio with the excitation it assumes: ±0.2 % of
        // excitation is u = 0.002/√3 of the reading, so of the strain to first order (to the
        // bridge's nonlinearity, 0.2 % here). Ratiometric: it cancels (common practice).
        AdcInput absolute = AdcInput.absolute(24, 128, org.strainmath.quantity.Voltage.ofVolts(2.5),
                org.strainmath.quantity.Voltage.ofVolts(5));
        StrainChannel channel = StrainChannel.of(QUARTER, absolute);
        long code = Math.round(0.5e-3 / absolute.ratioPerCode().toVoltsPerVolt());
        UncertaintyResult r = ChannelBudget.of(channel, code).withExcitationAccuracy(0.2).budget()
                .evaluate(0.95);
        double strain = channel.toStrain(code);
        assertThat(share(r, "excitation, relative"))
                .isCloseTo(strain * 0.002 / Math.sqrt(3), within(strain * 0.002 / Math.sqrt(3) * 0.01));
        assertThatThrownBy(() -> ChannelBudget.of(CHANNEL, CODE).withExcitationAccuracy(0.2))
                .isInstanceOf(IllegalStateException.class)
                .hasMessage("the excitation cancels in a ratiometric channel");
    }
}
