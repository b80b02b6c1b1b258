package org.strainmath.bridge;

import java.math.BigDecimal;
import java.math.MathContext;

/**
 * Test oracle: the bridge equation r = (R1·R3 − R2·R4)/((R1 + R2)·(R3 + R4)) evaluated in
 * 50-digit {@code BigDecimal} from the four arm resistances R_i = R0_i·(1 + K_i·m_i·ε), with
 * every double input taken exactly. Independent of the library's composed coefficients.
 */
final class ExactBridge {

    static final MathContext DIGITS_50 = new MathContext(50);

    private ExactBridge() {
    }

    static BigDecimal armResistance(BridgeArm arm, double strain) {
        BigDecimal r0 = new BigDecimal(arm.nominalResistance().toOhms());
        if (!arm.isActive()) {
            return r0;
        }
        BigDecimal k = new BigDecimal(arm.gauge().orElseThrow().gaugeFactor());
        BigDecimal m = new BigDecimal(arm.strainMultiple());
        return r0.multiply(BigDecimal.ONE.add(k.multiply(m).multiply(new BigDecimal(strain))));
    }

    static BigDecimal ratio(Bridge bridge, double strain) {
        BigDecimal r1 = armResistance(bridge.arm(1), strain);
        BigDecimal r2 = armResistance(bridge.arm(2), strain);
        BigDecimal r3 = armResistance(bridge.arm(3), strain);
        BigDecimal r4 = armResistance(bridge.arm(4), strain);
        return r1.multiply(r3).subtract(r2.multiply(r4))
                .divide(r1.add(r2).multiply(r3.add(r4)), DIGITS_50);
    }

    /**
     * The reading of a wired bridge: the two dividers with the leads in the arms, times the
     * share Rb/(Rb + Le) of the excitation that reaches the bridge, in 50 digits.
     */
    static BigDecimal wiredRatio(Bridge bridge, double strain) {
        BigDecimal[] r = new BigDecimal[4];
        for (int i = 0; i < 4; i++) {
            r[i] = armResistance(bridge.arm(i + 1), strain)
                    .add(new BigDecimal(bridge.leadInArm(i + 1).toOhms()));
        }
        BigDecimal s12 = r[0].add(r[1]);
        BigDecimal s34 = r[2].add(r[3]);
        BigDecimal dividers = r[0].divide(s12, DIGITS_50).subtract(r[3].divide(s34, DIGITS_50));
        BigDecimal rb = s12.multiply(s34).divide(s12.add(s34), DIGITS_50);
        BigDecimal le = new BigDecimal(bridge.excitationLeads().toOhms());
        return dividers.multiply(rb).divide(rb.add(le), DIGITS_50);
    }
}
