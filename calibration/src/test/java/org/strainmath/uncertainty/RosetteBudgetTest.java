package org.strainmath.uncertainty;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.Test;
import org.strainmath.rosette.Rosette;

/** Rosette stress budgets against Hooke's law by hand, on an invented uniaxial state. */
class RosetteBudgetTest {

    private static final double E = 200e9;
    private static final double NU = 0.3;
    /** Uniaxial 100 MPa along gauge a: εa = σ/E, εc = −ν·σ/E, εb = (1 − ν)·σ/(2E). */
    private static final double EA = 100e6 / E;
    private static final double EC = -NU * 100e6 / E;
    private static final double EB = (1 - NU) * 100e6 / (2 * E);

    @Test
    void stressesScaleWithTheModulus() {
        // Hooke's law: for fixed strains every stress is proportional to E, so a 1 % standard
        // uncertainty of E alone is 1 % of von Mises.
        RosetteBudget budget = RosetteBudget.of(Rosette.rectangular(),
                InputQuantity.ofStandardUncertainty("a", EA, 0),
                InputQuantity.ofStandardUncertainty("b", EB, 0),
                InputQuantity.ofStandardUncertainty("c", EC, 0))
                .withMaterial(InputQuantity.ofStandardUncertainty("E", E, 0.01 * E),
                        InputQuantity.ofStandardUncertainty("ν", NU, 0));
        UncertaintyResult r = budget.vonMises().evaluate(0.95);
        assertThat(r.estimate()).isCloseTo(100e6, within(1e-3));
        assertThat(r.combinedStandardUncertainty()).isCloseTo(1e6, within(1e6 * 1e-6));
    }

    @Test
    void aReadingActsThroughHookesLawAndTheVonMisesForm() {
        // At a uniaxial state along gauge a (σ2 = 0): ∂σvm/∂εa = E/(1 − ν²)·(1 − ν/2), from
        // ∂σvm/∂σ1 = 1, ∂σvm/∂σ2 = −1/2, σ1 = E/(1 − ν²)(ε1 + νε2), σ2 = E/(1 − ν²)(ε2 + νε1).
        double u = 2e-6;
        RosetteBudget budget = RosetteBudget.of(Rosette.rectangular(),
                InputQuantity.ofStandardUncertainty("a", EA, u),
                InputQuantity.ofStandardUncertainty("b", EB, 0),
                InputQuantity.ofStandardUncertainty("c", EC, 0))
                .withMaterial(InputQuantity.ofStandardUncertainty("E", E, 0),
                        InputQuantity.ofStandardUncertainty("ν", NU, 0));
        UncertaintyResult r = budget.vonMises().evaluate(0.95);
        double expected = E / (1 - NU * NU) * (1 - NU / 2) * u;
        assertThat(r.combinedStandardUncertainty()).isCloseTo(expected, within(expected * 1e-4));
        assertThat(budget.largerPrincipalStress().evaluate(0.95).estimate()).isCloseTo(100e6, within(1e-3));
        assertThat(budget.smallerPrincipalStress().evaluate(0.95).estimate()).isCloseTo(0, within(1e-3));
        assertThat(budget.tresca().evaluate(0.95).estimate()).isCloseTo(100e6, within(1e-3));
    }

    @Test
    void badInputIsRefused() {
        InputQuantity a = InputQuantity.ofStandardUncertainty("a", EA, 1e-6);
        assertThatThrownBy(() -> RosetteBudget.of(Rosette.rectangular(), a, a))
                .hasMessage("readings must be one per gauge, 3: 2");
        assertThatThrownBy(() -> RosetteBudget.of(Rosette.tee(), a,
                InputQuantity.ofStandardUncertainty("b", EC, 1e-6)).vonMises())
                .isInstanceOf(IllegalStateException.class)
                .hasMessage("the budget needs the material: use withMaterial");
    }
}
