package org.strainmath.calibration;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.util.SplittableRandom;
import java.util.stream.Stream;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;
import org.strainmath.bridge.AdcInput;
import org.strainmath.bridge.Bridge;
import org.strainmath.bridge.StrainChannel;
import org.strainmath.bridge.StrainGauge;
import org.strainmath.quantity.Resistance;
import org.strainmath.quantity.Strain;

/** Shunt calibration through the exact bridge equation. */
class ShuntCalibrationTest {

    private static final Bridge QUARTER_120 = Bridge.quarter(StrainGauge.ofOhms(120, 2.0));
    private static final Bridge QUARTER_350 = Bridge.quarter(StrainGauge.ofOhms(350, 2.0));

    /** The textbook bridge equation at zero strain, by hand (R1R3 − R2R4)/((R1 + R2)(R3 + R4)). */
    private static double bridgeEquation(double r1, double r2, double r3, double r4) {
        return (r1 * r3 - r2 * r4) / ((r1 + r2) * (r3 + r4));
    }

    @Test
    void theIssueFiguresBothWays() {
        // ε = −Rg/(K(Rg + Rs)) (parallel resistance, common practice): 120 Ω, K = 2,
        // −1000 µε needs 59 880 Ω; 350 Ω needs 174 650 Ω.
        assertThat(ShuntCalibration.across(QUARTER_120, 1, Resistance.ofOhms(59_880))
                .equivalentStrain().toMicrostrain()).isCloseTo(-1000, within(1e-9));
        assertThat(ShuntCalibration.across(QUARTER_350, 1, Resistance.ofOhms(174_650))
                .equivalentStrain().toMicrostrain()).isCloseTo(-1000, within(1e-9));
        assertThat(ShuntCalibration.resistorFor(QUARTER_120, 1, Strain.ofMicrostrain(-1000),
                ShuntPosition.AT_GAUGE).toOhms()).isCloseTo(59_880, within(59_880 * 1e-12));
        assertThat(ShuntCalibration.resistorFor(QUARTER_350, 1, Strain.ofMicrostrain(-1000),
                ShuntPosition.AT_GAUGE).toOhms()).isCloseTo(174_650, within(174_650 * 1e-12));
    }

    static Stream<Arguments> gauges() {
        SplittableRandom random = new SplittableRandom(0x5407);
        return Stream.generate(() -> Arguments.of(random.nextDouble(100, 1000),
                random.nextDouble(1.8, 4.5), Math.exp(random.nextDouble(Math.log(2e3), Math.log(5e7)))))
                .limit(100);
    }

    @ParameterizedTest(name = "R={0} K={1} Rs={2}")
    @MethodSource("gauges")
    void acrossTheGaugeTheClosedFormIsExact(double r, double k, double rs) {
        Bridge quarter = Bridge.quarter(StrainGauge.ofOhms(r, k));
        double closedForm = -r / (k * (r + rs));
        ShuntCalibration shunt = ShuntCalibration.across(quarter, 1, Resistance.ofOhms(rs));
        // Tolerance: the shunted arm R·Rs/(R + Rs) is held as a double, so its change from R,
        // about R²/Rs, carries a relative error of ulp(R)·Rs/R², about 1.1e-16·Rs/R.
        double relative = 1e-14 + 4.4e-16 * rs / r;
        assertThat(shunt.equivalentStrain().value())
                .isCloseTo(closedForm, within(Math.abs(closedForm) * relative));
        assertThat(ShuntCalibration.resistorFor(quarter, 1, Strain.of(closedForm),
                ShuntPosition.AT_GAUGE).toOhms()).isCloseTo(rs, within(rs * 10 * relative));
        // The shunted reading is the bridge equation with R1 = R·Rs/(R + Rs).
        assertThat(shunt.shuntedReading().toVoltsPerVolt())
                .isCloseTo(bridgeEquation(r * rs / (r + rs), r, r, r), within(1e-15));
    }

    @Test
    void acrossTheAdjacentArmTheStrainIsTensile() {
        // Shunting arm 2 of a quarter bridge raises the output: it reads as tension (common
        // practice). Oracle: the bridge equation with R2 = R||Rs, and the bridge's own forward.
        ShuntCalibration shunt = ShuntCalibration.across(QUARTER_120, 2, Resistance.ofOhms(59_880));
        double parallel = 120.0 * 59_880 / (120 + 59_880);
        double expected = bridgeEquation(120, parallel, 120, 120);
        assertThat(shunt.shuntedReading().toVoltsPerVolt()).isCloseTo(expected, within(1e-16));
        assertThat(shunt.equivalentStrain().value()).isPositive();
        assertThat(QUARTER_120.toRatio(shunt.equivalentStrain().value())).isCloseTo(expected, within(1e-16));
        assertThat(shunt.outputChange()).isEqualTo(shunt.shuntedReading());
    }

    @Test
    void atTheInstrumentTheLeadsDesensitiseTheCalibration() {
        // Three-wire quarter bridge, 350 Ω, 2 Ω per lead: shunted across gauge and lead, the
        // reading is the bridge equation with R1 = (Rg + RL)||Rs, R2 = R + RL. The arm then
        // changes by (Rg + RL)²/(Rg + RL + Rs) instead of Rg²/(Rg + Rs) at the gauge, so the
        // equivalent strain is larger by about ((Rg + RL)/Rg)² (derived from the parallel
        // resistance; common practice, no source).
        Bridge wired = QUARTER_350.withThreeWireLeads(Resistance.ofOhms(2));
        ShuntCalibration atInstrument = ShuntCalibration.across(wired, 1, Resistance.ofOhms(174_650),
                ShuntPosition.AT_INSTRUMENT);
        double r1 = 352.0 * 174_650 / (352 + 174_650);
        assertThat(atInstrument.shuntedReading().toVoltsPerVolt())
                .isCloseTo(bridgeEquation(r1, 352, 350, 350), within(1e-16));
        ShuntCalibration atGauge = ShuntCalibration.across(wired, 1, Resistance.ofOhms(174_650));
        double ratio = atInstrument.equivalentStrain().value() / atGauge.equivalentStrain().value();
        assertThat(ratio).isCloseTo(352.0 * 352 / (350 * 350), within(1e-4)).isGreaterThan(1);
        assertThat(atInstrument.toString()).contains("at the instrument");
    }

    @Test
    void aFullBridgeAndAZeroedBridgeWork() {
        Bridge full = Bridge.fullBending(StrainGauge.ofOhms(350, 2.1));
        ShuntCalibration shunt = ShuntCalibration.nearestIn(ResistorSeries.E96, full, 1,
                Strain.ofMicrostrain(-500), ShuntPosition.AT_GAUGE);
        // The exact resistor, then the nearest E96 value and the strain it really gives.
        Resistance exact = ShuntCalibration.resistorFor(full, 1, Strain.ofMicrostrain(-500), ShuntPosition.AT_GAUGE);
        assertThat(ShuntCalibration.across(full, 1, exact).equivalentStrain().toMicrostrain())
                .isCloseTo(-500, within(1e-9));
        assertThat(shunt.shunt()).isEqualTo(ResistorSeries.E96.nearest(exact));
        // Tolerance, by hand: E96 values lie 10^(1/96) ≈ 2.4 % apart, about 3 % at most after
        // rounding to three digits (IEC 60063; from memory), so the nearest lies within about 1.5 %
        // of the exact resistor, and the strain, nearly ∝ 1/Rs, within 1.5 % of 500 µε: 7.5 µε.
        assertThat(shunt.equivalentStrain().toMicrostrain()).isCloseTo(-500, within(10.0));
        // Zeroed by offset: the equivalent strain is measured from the zero, unchanged.
        Bridge zeroed = QUARTER_120.zeroedByOffset(org.strainmath.quantity.VoltageRatio.ofMillivoltsPerVolt(0.2));
        assertThat(ShuntCalibration.across(zeroed, 1, Resistance.ofOhms(59_880)).equivalentStrain()
                .toMicrostrain()).isCloseTo(-1000, within(1e-6));
    }

    @Test
    void aShuntCheckGivesTheSpanCorrection() {
        // The channel read 0.6 % low: span error −0.6 %, factor 1/0.994; the corrected
        // channel reads the expected strain (definition, common practice, no source).
        StrainChannel channel = StrainChannel.of(QUARTER_350, AdcInput.ratiometric(24, 128));
        ShuntCalibration shunt = ShuntCalibration.across(QUARTER_350, 1, Resistance.ofOhms(174_650));
        ShuntCheck check = ShuntCheck.of(channel, shunt, Strain.ofMicrostrain(-994));
        assertThat(check.expected().toMicrostrain()).isCloseTo(-1000, within(1e-9));
        assertThat(check.spanErrorPercent()).isCloseTo(-0.6, within(1e-9));
        assertThat(check.spanFactor()).isCloseTo(1 / 0.994, within(1e-12));
        StrainChannel corrected = check.correctedChannel();
        assertThat(corrected.spanCorrection()).isEqualTo(check.spanFactor());
        assertThat(-994e-6 * corrected.spanCorrection()).isCloseTo(-1000e-6, within(1e-15));
        assertThat(check.toString()).isEqualTo("ShuntCheck[expected -1000.0 µε, measured -994.0 µε,"
                + " span error -0.6 %, factor 1.00604]");
        assertThatThrownBy(() -> ShuntCheck.of(channel, shunt, Strain.ofMicrostrain(5)))
                .isInstanceOf(IllegalArgumentException.class)
                .hasMessage("measured must have the sign of the expected -1000.0 µε: 5.0 µε");
    }

    @Test
    void standardSeriesFollowTheirConstructionRule() {
        // IEC 60063 construction: 10^(i/n) rounded to three digits; E192 lists 920 where the
        // rule gives 919 (values from memory).
        int[] e96 = ResistorSeries.E96.decadeValues();
        int[] e192 = ResistorSeries.E192.decadeValues();
        assertThat(e96).hasSize(96);
        assertThat(e192).hasSize(192);
        for (int i = 0; i < 96; i++) {
            assertThat(e96[i]).isEqualTo((int) Math.round(100 * Math.pow(10, i / 96.0)));
            assertThat(e192[2 * i]).isEqualTo(e96[i]);
        }
        for (int i = 0; i < 192; i++) {
            int rule = (int) Math.round(100 * Math.pow(10, i / 192.0));
            assertThat(e192[i]).isEqualTo(i == 185 ? 920 : rule);
        }
        assertThat(ResistorSeries.E96.nearest(Resistance.ofOhms(59_880))).isEqualTo(Resistance.ofOhms(60_400));
        assertThat(ResistorSeries.E192.nearest(Resistance.ofOhms(59_880))).isEqualTo(Resistance.ofOhms(59_700));
        assertThat(ResistorSeries.E96.nearest(Resistance.ofOhms(99.9))).isEqualTo(Resistance.ofOhms(100));
        assertThat(ResistorSeries.E96.nearest(Resistance.ofOhms(0.0987))).isEqualTo(Resistance.ofOhms(0.0976));
        assertThatThrownBy(() -> ResistorSeries.E96.nearest(Resistance.ZERO))
                .hasMessage("resistance must be > 0: 0.0 Ω");
    }

    @Test
    void badInputIsRefused() {
        assertThatThrownBy(() -> ShuntCalibration.across(QUARTER_120, 5, Resistance.ofOhms(1e5)))
                .isInstanceOf(IndexOutOfBoundsException.class);
        assertThatThrownBy(() -> ShuntCalibration.across(QUARTER_120, 1, Resistance.ZERO))
                .hasMessage("shunt must be > 0 and finite: 0.0 Ω");
        assertThatThrownBy(() -> ShuntCalibration.across(null, 1, Resistance.ofOhms(1)))
                .isInstanceOf(NullPointerException.class).hasMessage("bridge");
        assertThatThrownBy(() -> ShuntCalibration.resistorFor(QUARTER_120, 1, Strain.ofMicrostrain(1000),
                ShuntPosition.AT_GAUGE))
                .hasMessage("target must have the sign a shunt across arm 1 gives (compressive): 1000.0 µε");
        assertThatThrownBy(() -> ShuntCalibration.resistorFor(QUARTER_120, 2, Strain.ofMicrostrain(-1000),
                ShuntPosition.AT_GAUGE))
                .hasMessage("target must have the sign a shunt across arm 2 gives (tensile): -1000.0 µε");
        assertThatThrownBy(() -> ShuntCalibration.resistorFor(QUARTER_120, 1, Strain.ZERO, ShuntPosition.AT_GAUGE))
                .hasMessageStartingWith("target must have the sign");
        assertThatThrownBy(() -> ShuntCalibration.resistorFor(QUARTER_120, 1, Strain.ofPercent(-60),
                ShuntPosition.AT_GAUGE)).hasMessage("target is beyond what a shunt across arm 1 can give: -600000.0 µε");
    }

    @Test
    void textForAPerson() {
        assertThat(ShuntCalibration.across(QUARTER_120, 1, Resistance.ofOhms(59_880)))
                .hasToString("ShuntCalibration[59.88 kΩ across arm 1 at the gauge: -1000.0 µε, -0.500501 mV/V]");
    }
}
