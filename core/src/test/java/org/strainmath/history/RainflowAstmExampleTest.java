package org.strainmath.history;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.Map;
import java.util.TreeMap;

import org.junit.jupiter.api.Test;

/**
 * The worked examples of ASTM E1049-85 (reapproved 2017), <i>Standard Practices for Cycle
 * Counting in Fatigue Analysis</i>: the load history of its figures (points A to I at −2, 1,
 * −3, 5, −1, 3, −4, 4, −2 units) counted by rainflow counting, 5.4.4 (Fig. 6 and Table 4), and by
 * the simplified method for repeating histories, 5.4.3 (Fig. 5 and Table 3). The history and
 * the tables are from memory, not checked against the text at hand; each expected count was
 * also worked by hand from the steps of the section, as the comments show.
 */
class RainflowAstmExampleTest {

    /** Points A to I of the standard's example history, load units. */
    private static final double[] ASTM = {-2, 1, -3, 5, -1, 3, -4, 4, -2};

    @Test
    void rainflowCountingOfTheStandardsExampleGivesTable4() {
        Cycles cycles = Rainflow.astm().count(ASTM);
        // By hand, 5.4.4: A-B half (Y contains S), B-C half, E-F full (not at S), C-D half,
        // then step 6: D-G, G-H, H-I half.
        assertThat(RainflowReference.cycles(cycles)).containsExactly(
                new double[] {-2, 1, 0.5}, new double[] {1, -3, 0.5}, new double[] {-1, 3, 1.0},
                new double[] {-3, 5, 0.5}, new double[] {5, -4, 0.5}, new double[] {-4, 4, 0.5},
                new double[] {4, -2, 0.5});
        // Table 4: range 9: 0.5 (D-G); 8: 1.0 (C-D, G-H); 6: 0.5 (H-I); 4: 1.5 (B-C, E-F);
        // 3: 0.5 (A-B); no other range.
        assertThat(countsByRange(cycles)).containsExactlyInAnyOrderEntriesOf(
                Map.of(3.0, 0.5, 4.0, 1.5, 6.0, 0.5, 8.0, 1.0, 9.0, 0.5));
        assertThat(cycles.total()).isEqualTo(4.0);
        assertThat(cycles.fullCycles()).isEqualTo(1);
        assertThat(cycles.halfCycles()).isEqualTo(6);
    }

    @Test
    void theSameHistorySampledFinelyCountsTheSame() {
        // Ten samples per segment, on the straight lines between the points: the samples between
        // turning points are no reversals, so the count is Table 4's again.
        double[] fine = new double[(ASTM.length - 1) * 10 + 1];
        for (int s = 0; s + 1 < ASTM.length; s++) {
            for (int j = 0; j < 10; j++) {
                fine[10 * s + j] = ASTM[s] + (ASTM[s + 1] - ASTM[s]) * j / 10.0;
            }
        }
        fine[fine.length - 1] = ASTM[ASTM.length - 1];
        assertThat(Rainflow.astm().count(fine)).isEqualTo(Rainflow.astm().count(ASTM));
        assertThat(TurningPoints.of(fine).values()).containsExactly(ASTM);
    }

    @Test
    void theSimplifiedCountOfTheRepeatingHistoryGivesTable3() {
        Cycles cycles = Rainflow.astm().withResidue(Rainflow.Residue.REPEATED).count(ASTM);
        // By hand, 5.4.3: begin at D (5, the largest absolute value): D E F G H I(=A) B C D;
        // E-F (4) closes first, then I-B (3), H-C (7) and D-G (9). Table 3: one cycle each of
        // ranges 9, 7, 4 and 3.
        assertThat(countsByRange(cycles)).containsExactlyInAnyOrderEntriesOf(
                Map.of(3.0, 1.0, 4.0, 1.0, 7.0, 1.0, 9.0, 1.0));
        assertThat(cycles.halfCycles()).isZero();
    }

    @Test
    void withTheResidueDiscardedOnlyTheClosedCycleIsLeft() {
        Cycles cycles = Rainflow.astm().withResidue(Rainflow.Residue.DISCARDED).count(ASTM);
        // E-F is the one loop that closes in one pass (by hand).
        assertThat(RainflowReference.cycles(cycles)).containsExactly(new double[] {-1, 3, 1.0});
    }

    @Test
    void aGateOfFourUnitsDropsTheSmallReversals() {
        Rainflow gated = Rainflow.astm().withGate(4);
        // By hand: A (start); B and C stay within 4 of A; D rises 7 past A; E falls 6 from D, so
        // D is a peak; F rises only 4 from E (not more than the gate); G, H, I as before:
        // turning points A D G H I = -2, 5, -4, 4, -2.
        assertThat(TurningPoints.of(ASTM, 4).values()).containsExactly(-2, 5, -4, 4, -2);
        // 5.4.4 on them: A-D half (contains S), then step 6: D-G, G-H, H-I half.
        assertThat(RainflowReference.cycles(gated.count(ASTM))).containsExactly(
                new double[] {-2, 5, 0.5}, new double[] {5, -4, 0.5}, new double[] {-4, 4, 0.5},
                new double[] {4, -2, 0.5});
    }

    @Test
    void theCountAndItsSummariesPrintForAPerson() {
        Cycles cycles = Rainflow.astm().count(ASTM);
        assertThat(cycles).hasToString(
                "Cycles[1 full and 6 half, total 4.0, largest range 9.0]");
        assertThat(cycles.toList().get(0)).hasToString("Cycle[from=-2.0, to=1.0, count=0.5]");
        assertThat(Rainflow.astm().withGate(5e-6)).hasToString(
                "Rainflow[ASTM E1049-85 5.4.4, gate 5.0e-6, residue as half cycles]");
    }

    private static Map<Double, Double> countsByRange(Cycles cycles) {
        Map<Double, Double> byRange = new TreeMap<>();
        for (Cycle c : cycles.toList()) {
            byRange.merge(c.range(), c.count(), Double::sum);
        }
        return byRange;
    }
}
