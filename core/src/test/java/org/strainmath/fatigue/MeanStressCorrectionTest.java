package org.strainmath.fatigue;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.Test;
import org.strainmath.quantity.Stress;

/**
 * The mean-stress corrections by hand from their published equations (Goodman's line
 * σa/σar + σm/σu = 1, Gerber's parabola σa/σar + (σm/σu)² = 1, Morrow's σa/σar + σm/σf' = 1, SWT's
 * σar = √(σmax·σa); e.g. Dowling, <i>Mechanical Behavior of Materials</i>, the chapter on mean
 * stress, equation numbers from memory).
 */
class MeanStressCorrectionTest {

    private static final MeanStressCorrection GOODMAN = MeanStressCorrection.goodman(
            Stress.ofMegapascals(400));
    private static final MeanStressCorrection GERBER = MeanStressCorrection.gerber(
            Stress.ofMegapascals(400));
    private static final MeanStressCorrection MORROW = MeanStressCorrection.morrow(
            Stress.ofMegapascals(900));
    private static final MeanStressCorrection SWT = MeanStressCorrection.smithWatsonTopper();

    @Test
    void aTensileMeanByHand() {
        // σa = 100 MPa about σm = 100 MPa, σu = 400 MPa, σf' = 900 MPa (invented):
        // Goodman 100/(1 - 0.25) = 133.333; Gerber 100/(1 - 0.0625) = 106.667;
        // Morrow 100/(1 - 1/9) = 112.5; SWT √(200·100) = 141.421 MPa.
        assertThat(GOODMAN.equivalentAmplitude(100e6, 100e6)).isCloseTo(400e6 / 3, within(1e-6));
        assertThat(GERBER.equivalentAmplitude(100e6, 100e6)).isCloseTo(1600e6 / 15, within(1e-6));
        assertThat(MORROW.equivalentAmplitude(100e6, 100e6)).isCloseTo(112.5e6, within(1e-6));
        assertThat(SWT.equivalentAmplitude(100e6, 100e6)).isCloseTo(Math.sqrt(2e16), within(1e-6));
        assertThat(MeanStressCorrection.none().equivalentAmplitude(100e6, 100e6)).isEqualTo(100e6);
        assertThat(GOODMAN.equivalentAmplitude(Stress.ofMegapascals(100), Stress.ofMegapascals(100)))
                .hasToString("133.333 MPa");
    }

    @Test
    void atZeroMeanEveryCorrectionIsTheAmplitude() {
        // Definition: every mean-stress correction is the identity at zero mean (each published
        // form reduces to σa there, by hand).
        for (MeanStressCorrection c : new MeanStressCorrection[] {GOODMAN, GERBER, MORROW, SWT,
            MeanStressCorrection.none()}) {
            assertThat(c.equivalentAmplitude(123e6, 0)).as("%s", c).isCloseTo(123e6, within(1e-7));
        }
    }

    @Test
    void compressiveMeansAndTheLimits() {
        // Goodman and Gerber give no credit for a compressive mean (common practice, no source);
        // Morrow does: 100/(1 + 1/9) = 90 MPa by hand; SWT: σmax = 0, no damage.
        assertThat(GOODMAN.equivalentAmplitude(100e6, -100e6)).isEqualTo(100e6);
        assertThat(GERBER.equivalentAmplitude(100e6, -100e6)).isEqualTo(100e6);
        assertThat(MORROW.equivalentAmplitude(100e6, -100e6)).isCloseTo(90e6, within(1e-6));
        assertThat(SWT.equivalentAmplitude(100e6, -100e6)).isZero();
        // a mean at the strength leaves no life
        assertThat(GOODMAN.equivalentAmplitude(10e6, 400e6)).isInfinite();
        assertThat(GERBER.equivalentAmplitude(10e6, 500e6)).isInfinite();
        assertThat(MORROW.equivalentAmplitude(10e6, 900e6)).isInfinite();
        // NaN in, NaN out
        assertThat(GOODMAN.equivalentAmplitude(Double.NaN, 0)).isNaN();
        assertThat(SWT.equivalentAmplitude(1, Double.NaN)).isNaN();
        assertThat(MORROW.equivalentAmplitude(-1, 0)).isNaN();
        assertThat(MeanStressCorrection.none().equivalentAmplitude(1, Double.POSITIVE_INFINITY))
                .isNaN();
        assertThatThrownBy(() -> GOODMAN.equivalentAmplitude(Stress.ofMegapascals(10),
                Stress.ofMegapascals(400))).isInstanceOf(IllegalArgumentException.class)
                .hasMessage("mean must leave the material a fatigue strength under Goodman"
                        + " (σu = 400.0 MPa): 400.0 MPa");
    }

    @Test
    void badStrengthsAreRefused() {
        assertThatThrownBy(() -> MeanStressCorrection.goodman(Stress.ZERO))
                .hasMessage("ultimate must be > 0 and finite: 0.0");
        assertThatThrownBy(() -> MeanStressCorrection.gerber(null))
                .isInstanceOf(NullPointerException.class).hasMessage("ultimate");
        assertThatThrownBy(() -> MeanStressCorrection.morrow(Stress.ofMegapascals(-5)))
                .hasMessage("coefficient must be > 0 and finite: -5000000.0");
        assertThat(GERBER).hasToString("Gerber (σu = 400.0 MPa)");
        assertThat(MORROW).hasToString("Morrow (σf' = 900.0 MPa)");
        assertThat(SWT).hasToString("Smith–Watson–Topper");
        assertThat(MeanStressCorrection.goodman(Stress.ofMegapascals(400))).isEqualTo(GOODMAN)
                .hasSameHashCodeAs(GOODMAN).isNotEqualTo(GERBER);
    }
}
