package org.strainmath.fatigue;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.Test;
import org.strainmath.quantity.Stress;

/**
 * Worked examples of two textbooks, checked to the digits they print:
 * <ul>
 * <li>Budynas and Nisbett, <i>Shigley's Mechanical Engineering Design</i>, 8th ed., problems
 * 6-20 and 6-30, as worked in the book's instructor's solutions manual, chapter 6 (the values
 * read from a copy of the manual; the edition from memory, not checked against the printed
 * book). The manual rounds its intermediate values to four or five digits, so its lives are
 * checked to 0.1 %. The book writes the S–N line in amplitudes of fully reversed stress,
 * Sf = a·N^b with N in cycles; here it is {@code SnCurve.ofRange(2a, 1, −1/b)}, the same line
 * in ranges, with the manual's a and b as given.
 * <li>Dowling, <i>Mechanical Behavior of Materials</i>, chapter 9 (stress-based approach), the
 * example just before Example 9.4: AISI 4340 steel, σf' = 1758 MPa and b = −0.0977, a cycle of
 * σa = 450 MPa about σm = 200 MPa, with Morrow's and with the Smith–Watson–Topper mean-stress
 * equation (values read from a copy of the book; its edition and the example's number not
 * checked). Its lives are given to three digits.
 * </ul>
 */
class TextbookExamplesTest {

    private static double ksi(double value) {
        return Stress.ofKsi(value).toPascals();
    }

    @Test
    void problem6to20GoodmanGivesAFiniteLifeAndGerberNone() {
        // Sut = 188.1 kpsi, Se = 34.22 kpsi, a = 625.8 kpsi, b = −0.210 36; σa = 23.18 kpsi about
        // σm = 69.54 kpsi. Manual: Goodman Sf = σa/(1 − σm/Sut) = 36.78 kpsi, N = 710 000
        // cycles; Gerber predicts infinite life (its equivalent amplitude, 26.85 kpsi by hand,
        // lies below Se).
        SnCurve curve = SnCurve.ofRange(Stress.ofKsi(2 * 625.8), 1, 1 / 0.21036)
                .withCutOff(Stress.ofKsi(2 * 34.22));
        Stress ultimate = Stress.ofKsi(188.1);
        MeanStressCorrection goodman = MeanStressCorrection.goodman(ultimate);
        MeanStressCorrection gerber = MeanStressCorrection.gerber(ultimate);
        assertThat(goodman.equivalentAmplitude(ksi(23.18), ksi(69.54)))
                .isCloseTo(ksi(36.78), within(ksi(0.005)));
        assertThat(gerber.equivalentAmplitude(ksi(23.18), ksi(69.54)))
                .isCloseTo(ksi(26.85), within(ksi(0.005)));

        Stress range = Stress.ofKsi(2 * 23.18);
        Stress mean = Stress.ofKsi(69.54);
        assertThat(StressLife.of(curve).withMeanStressCorrection(goodman).cyclesToFailure(range, mean))
                .isCloseTo(710_000, within(710.0));
        assertThat(StressLife.of(curve).withMeanStressCorrection(gerber).cyclesToFailure(range, mean))
                .isInfinite();
    }

    @Test
    void problem6to30MinersRuleLeavesTheCyclesOfTheThirdLevel() {
        // Sut = 76 kpsi, f = 0.9, Se = 30 kpsi: a = 155.95 kpsi, b = −0.119 31. Fully reversed
        // 48, 38 and 32 kpsi: N1 = 19 460, N2 = 137 880, N3 = 582 150 cycles. After 4000 cycles
        // at 48 and 60 000 at 38 kpsi, Miner's rule leaves n3 = 209 160 cycles at 32 kpsi.
        StressLife life = StressLife.of(SnCurve.ofRange(Stress.ofKsi(2 * 155.95), 1, 1 / 0.11931));
        double n1 = life.cyclesToFailure(Stress.ofKsi(96), Stress.ZERO);
        double n2 = life.cyclesToFailure(Stress.ofKsi(76), Stress.ZERO);
        double n3 = life.cyclesToFailure(Stress.ofKsi(64), Stress.ZERO);
        assertThat(n1).isCloseTo(19_460, within(19.5));
        assertThat(n2).isCloseTo(137_880, within(138.0));
        assertThat(n3).isCloseTo(582_150, within(582.0));

        DamageSum sum = DamageSum.of(life);
        sum.accept(ksi(-48), ksi(48), 4000);
        sum.accept(ksi(38), ksi(-38), 60_000);
        assertThat((1 - sum.damage()) * n3).isCloseTo(209_160, within(209.0));
        // and the third level's cycles bring the sum to 1 (Miner's failure criterion)
        sum.accept(ksi(-32), ksi(32), (1 - sum.damage()) * n3);
        assertThat(sum.damage()).isCloseTo(1.0, within(1e-12));
    }

    @Test
    void dowlingsMorrowAndSmithWatsonTopperLivesOfAisi4340() {
        // Basquin in reversals, σa = σf'·(2Nf)^b. Book: Morrow σar = σa/(1 − σm/σf') = 507.8 MPa,
        // Nf = 166 000 cycles; SWT with σmax = 650 MPa, σar = √(σmax·σa), Nf = 86 900 cycles.
        SnCurve basquin = SnCurve.ofBasquin(Stress.ofMegapascals(1758), -0.0977);
        MeanStressCorrection morrow = MeanStressCorrection.morrow(Stress.ofMegapascals(1758));
        MeanStressCorrection swt = MeanStressCorrection.smithWatsonTopper();
        assertThat(morrow.equivalentAmplitude(450e6, 200e6)).isCloseTo(507.8e6, within(0.05e6));
        Stress range = Stress.ofMegapascals(900);
        Stress mean = Stress.ofMegapascals(200);
        assertThat(StressLife.of(basquin).withMeanStressCorrection(morrow).cyclesToFailure(range, mean))
                .isCloseTo(166_000, within(500.0));
        assertThat(StressLife.of(basquin).withMeanStressCorrection(swt).cyclesToFailure(range, mean))
                .isCloseTo(86_900, within(50.0));
        // A later example of the same chapter (the first test of its Table E9.5): Morrow's σar of
        // σa = 379 MPa about σm = 621 MPa is 586.0 MPa.
        assertThat(morrow.equivalentAmplitude(379e6, 621e6)).isCloseTo(586.0e6, within(0.05e6));
    }
}
