package org.strainmath.fatigue;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.Test;
import org.strainmath.quantity.Stress;

/** S–N curves against the design codes' published curves and Basquin's law. */
class SnCurveTest {

    /** EN 1993-1-9 detail category 71 (m = 3 to 5·10⁶, m = 5 to the cut-off at 10⁸). */
    private static final SnCurve DETAIL_71 = SnCurve.ofRange(Stress.ofMegapascals(71), 2e6, 3)
            .withKnee(5e6, 5).withCutOffAt(1e8);

    @Test
    void eurocodeFatigueLimitAndCutOffAreTheStandardsFractionsOfTheCategory() {
        // EN 1993-1-9:2005, Figure 7.1 and 7.1(3)–(4) (from memory): Δσ_D = (2/5)^(1/3)·Δσ_C
        // = 0.737·Δσ_C at 5·10⁶ cycles, Δσ_L = (5/100)^(1/5)·Δσ_D = 0.549·Δσ_D at 10⁸.
        double d = DETAIL_71.rangeAt(5e6).toMegapascals();
        double l = DETAIL_71.cutOff().orElseThrow().toMegapascals();
        assertThat(d / 71).isCloseTo(0.737, within(5e-4));
        assertThat(l / d).isCloseTo(0.549, within(5e-4));
        assertThat(d).isCloseTo(71 * Math.cbrt(0.4), within(1e-12));
        assertThat(l).isCloseTo(d * Math.pow(0.05, 0.2), within(1e-12));
        // the cut-off is the range at 10⁸ on the second slope, and ranges below it do no damage
        assertThat(DETAIL_71.cyclesToFailure(Stress.ofMegapascals(l * 1.000001)))
                .isCloseTo(1e8, within(1e3));
        assertThat(DETAIL_71.cyclesToFailure(Stress.ofMegapascals(l * 0.999999))).isInfinite();
        // by hand: 71·0.4^(1/3) = 71·0.736806 = 52.3132; ·0.05^0.2 = ·0.549280 = 28.7346 MPa
        assertThat(DETAIL_71).hasToString("SnCurve[71.0 MPa at 2000000.0 cycles, m = 3.0; m = 5.0"
                + " below 52.3132 MPa (5000000.0 cycles); no damage below 28.7346 MPa]");
    }

    @Test
    void aCurveReadsBackItsDefinitionAndIsAValue() {
        // Definition: the values as given; built here, not in a constant, so that each test
        // run computes the knee and the cut-off anew.
        SnCurve curve = SnCurve.ofRange(Stress.ofMegapascals(71), 2e6, 3).withKnee(5e6, 5)
                .withCutOffAt(1e8);
        assertThat(curve.referenceRange()).isEqualTo(Stress.ofMegapascals(71));
        assertThat(curve.referenceCycles()).isEqualTo(2e6);
        assertThat(curve.slope()).isEqualTo(3.0);
        assertThat(curve.kneeCycles()).hasValue(5e6);
        assertThat(curve.secondSlope()).hasValue(5.0);
        assertThat(SnCurve.ofRange(Stress.ofMegapascals(71), 2e6, 3).kneeCycles()).isEmpty();
        assertThat(SnCurve.ofRange(Stress.ofMegapascals(71), 2e6, 3).secondSlope()).isEmpty();
        // By hand, on the second slope: Δσ(10⁷) = Δσ_D·(5·10⁶/10⁷)^(1/5) = 52.3132·0.870551
        // = 45.541 MPa; the cut-off itself still does damage, just below it none.
        assertThat(curve.rangeAt(1e7).toMegapascals()).isCloseTo(45.541, within(5e-4));
        Stress cutOff = curve.cutOff().orElseThrow();
        assertThat(curve.cyclesToFailure(cutOff)).isCloseTo(1e8, within(1e-4));
        assertThat(curve).isEqualTo(DETAIL_71).hasSameHashCodeAs(DETAIL_71).isNotEqualTo("curve");
        for (SnCurve other : new SnCurve[] {
            SnCurve.ofRange(Stress.ofMegapascals(80), 2e6, 3).withKnee(5e6, 5).withCutOffAt(1e8),
            SnCurve.ofRange(Stress.ofMegapascals(71), 1e6, 3).withKnee(5e6, 5).withCutOffAt(1e8),
            SnCurve.ofRange(Stress.ofMegapascals(71), 2e6, 4).withKnee(5e6, 5).withCutOffAt(1e8),
            SnCurve.ofRange(Stress.ofMegapascals(71), 2e6, 3).withKnee(1e7, 5).withCutOffAt(1e8),
            SnCurve.ofRange(Stress.ofMegapascals(71), 2e6, 3).withKnee(5e6, 4).withCutOffAt(1e8),
            SnCurve.ofRange(Stress.ofMegapascals(71), 2e6, 3).withKnee(5e6, 5)}) {
            assertThat(other).isNotEqualTo(curve);
            assertThat(other.hashCode()).isNotEqualTo(curve.hashCode());
        }
    }

    @Test
    void eurocodeLivesByHand() {
        // By hand: 100 MPa is above Δσ_D: N = 2·10⁶·(71/100)³ = 2·10⁶·0.357911 = 715 822;
        // 40 MPa is below it: N = 5·10⁶·(Δσ_D/40)⁵.
        assertThat(DETAIL_71.cyclesToFailure(100e6)).isCloseTo(715_822.0, within(1e-6));
        double d = 71 * Math.cbrt(0.4);
        double ratio = d / 40;
        assertThat(DETAIL_71.cyclesToFailure(40e6))
                .isCloseTo(5e6 * ratio * ratio * ratio * ratio * ratio, within(1e-3));
        assertThat(DETAIL_71.cyclesToFailure(Stress.ZERO)).isInfinite();
    }

    @Test
    void dnvCurveDInAirMatchesTheTabulatedSecondIntercept() {
        // DNV-RP-C203 (2016), Table 2-1, curve D in air (from memory): log a1 = 12.164, m1 = 3
        // for N ≤ 10⁷; log a2 = 15.606, m2 = 5 for N > 10⁷; fatigue limit 52.63 MPa at 10⁷.
        // log N = log a − m·log Δσ with Δσ in MPa. Built from the first line and the knee only,
        // the curve must reproduce the second, tabulated line within the table's rounding.
        SnCurve d = SnCurve.ofRange(Stress.ofMegapascals(100), Math.pow(10, 12.164 - 6), 3)
                .withKnee(1e7, 5);
        // 10^((12.164 − 7)/3) = 52.64 MPa: the tabulated 52.63 to the table's rounding
        assertThat(d.rangeAt(1e7).toMegapascals()).isCloseTo(52.63, within(0.015));
        for (double mpa : new double[] {20, 30, 40, 50}) {
            double table = Math.pow(10, 15.606 - 5 * Math.log10(mpa));
            assertThat(d.cyclesToFailure(mpa * 1e6)).as("%s MPa", mpa)
                    .isCloseTo(table, within(table * 2e-3));
        }
        for (double mpa : new double[] {60, 100, 200}) {
            double table = Math.pow(10, 12.164 - 3 * Math.log10(mpa));
            assertThat(d.cyclesToFailure(mpa * 1e6)).isCloseTo(table, within(table * 1e-12));
        }
    }

    @Test
    void basquinsAmplitudeFormIsTheSameLawInRanges() {
        // σa = σf'·(2N)^b with σf' = 1000 MPa, b = -0.1 (invented constants): at 2N = 10⁶,
        // σa = 1000·10^-0.6 = 251.189 MPa by hand, so a range of 502.377 MPa lasts 5·10⁵ cycles.
        SnCurve basquin = SnCurve.ofBasquin(Stress.ofMegapascals(1000), -0.1);
        double range = 2 * 1000e6 * Math.pow(10, -0.6);
        assertThat(basquin.cyclesToFailure(range)).isCloseTo(5e5, within(5e5 * 1e-12));
        assertThat(basquin.slope()).isEqualTo(10.0);
        assertThat(basquin.rangeAt(5e5).toPascals()).isCloseTo(range, within(range * 1e-14));
    }

    @Test
    void theCurveIsContinuousAndDecreasing() {
        // Lives rise as the range falls, down to the cut-off (definition of an S–N curve).
        double previous = 0;
        for (double mpa = 500; mpa > 29; mpa *= 0.97) {
            double n = DETAIL_71.cyclesToFailure(mpa * 1e6);
            assertThat(n).as("%s MPa", mpa).isGreaterThan(previous).isFinite();
            previous = n;
        }
        double knee = DETAIL_71.rangeAt(5e6).toPascals();
        assertThat(DETAIL_71.cyclesToFailure(Math.nextDown(knee)))
                .isCloseTo(DETAIL_71.cyclesToFailure(knee), within(1e-6));
    }

    @Test
    void perCyclePathNeverThrowsAndBadCurvesAreRefused() {
        assertThat(DETAIL_71.cyclesToFailure(Double.NaN)).isNaN();
        assertThat(DETAIL_71.cyclesToFailure(-1.0)).isNaN();
        assertThat(DETAIL_71.cyclesToFailure(Double.POSITIVE_INFINITY)).isNaN();
        assertThat(StressLife.of(DETAIL_71).cyclesToFailure(0, Double.NEGATIVE_INFINITY)).isNaN();
        assertThatThrownBy(() -> SnCurve.ofRange(Stress.ZERO, 2e6, 3))
                .isInstanceOf(IllegalArgumentException.class)
                .hasMessage("range must be > 0 and finite: 0.0");
        assertThatThrownBy(() -> SnCurve.ofRange(Stress.ofMegapascals(-71), 2e6, 3))
                .hasMessage("range must be > 0 and finite: -7.1E7");
        assertThatThrownBy(() -> SnCurve.ofRange(Stress.ofMegapascals(71), 0, 3))
                .hasMessage("cycles must be > 0 and finite: 0.0");
        assertThatThrownBy(() -> SnCurve.ofRange(Stress.ofMegapascals(71), 2e6, Double.NaN))
                .hasMessage("slope must be > 0 and finite: NaN");
        assertThatThrownBy(() -> SnCurve.ofRange(Stress.ofMegapascals(71), 2e6, -3))
                .hasMessage("slope must be > 0 and finite: -3.0");
        assertThatThrownBy(() -> DETAIL_71.withKnee(5e6, 0))
                .hasMessage("secondSlope must be > 0 and finite: 0.0");
        assertThatThrownBy(() -> DETAIL_71.withKnee(Double.POSITIVE_INFINITY, 5))
                .hasMessage("cycles must be > 0 and finite: Infinity");
        assertThatThrownBy(() -> DETAIL_71.withCutOffAt(-1))
                .hasMessage("cycles must be > 0 and finite: -1.0");
        assertThatThrownBy(() -> SnCurve.ofBasquin(Stress.ofMegapascals(900), 0.1))
                .hasMessage("exponent must be in (-1, 0): 0.1");
        assertThatThrownBy(() -> DETAIL_71.cyclesToFailure(Stress.ofMegapascals(-1)))
                .hasMessage("range must be >= 0 and finite: -1000000.0");
    }
}
