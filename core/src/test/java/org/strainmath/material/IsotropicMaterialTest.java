package org.strainmath.material;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;
import static org.strainmath.material.ElasticConstant.BULK_MODULUS;
import static org.strainmath.material.ElasticConstant.LAME_FIRST_PARAMETER;
import static org.strainmath.material.ElasticConstant.POISSONS_RATIO;
import static org.strainmath.material.ElasticConstant.P_WAVE_MODULUS;
import static org.strainmath.material.ElasticConstant.SHEAR_MODULUS;
import static org.strainmath.material.ElasticConstant.YOUNGS_MODULUS;

import java.math.BigDecimal;
import java.math.MathContext;
import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;
import java.util.stream.Stream;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;
import org.strainmath.quantity.Stress;

/** The six isotropic constants from any pair. */
class IsotropicMaterialTest {

    private static final MathContext DIGITS = new MathContext(50);

    /**
     * The six constants of (E, ν) in 50-digit BigDecimal from the textbook relations
     * (G = E/(2(1+ν)), K = E/(3(1−2ν)), λ = Eν/((1+ν)(1−2ν)), M = λ + 2G; e.g. Sadd,
     * Elasticity, table 4.1): an oracle independent of the library's route through K and G.
     */
    static double[] exactSix(double e, double nu) {
        BigDecimal big = new BigDecimal(e);
        BigDecimal v = new BigDecimal(nu);
        BigDecimal onePlus = BigDecimal.ONE.add(v);
        BigDecimal oneMinusTwo = BigDecimal.ONE.subtract(v.multiply(BigDecimal.valueOf(2)));
        BigDecimal g = big.divide(onePlus.multiply(BigDecimal.valueOf(2)), DIGITS);
        BigDecimal k = big.divide(oneMinusTwo.multiply(BigDecimal.valueOf(3)), DIGITS);
        BigDecimal l = big.multiply(v).divide(onePlus.multiply(oneMinusTwo), DIGITS);
        BigDecimal m = l.add(g.multiply(BigDecimal.valueOf(2)));
        return new double[] {e, nu, g.doubleValue(), k.doubleValue(), l.doubleValue(),
            m.doubleValue()};
    }

    static List<ElasticConstant[]> everyPair() {
        List<ElasticConstant[]> pairs = new ArrayList<>();
        ElasticConstant[] all = ElasticConstant.values();
        for (int i = 0; i < all.length; i++) {
            for (int j = i + 1; j < all.length; j++) {
                pairs.add(new ElasticConstant[] {all[i], all[j]});
            }
        }
        return pairs;
    }

    @Test
    void theConversionTableForSteelHoldsForEveryPair() {
        // Issue values for E = 200 GPa, ν = 0.30 (textbook relations, any elasticity text):
        // G = 76.9230769, K = 166.666667, λ = 115.384615, M = 269.230769 GPa.
        double[] six = exactSix(200e9, 0.30);
        assertThat(six[2]).isCloseTo(76.9230769e9, within(1e2));
        assertThat(six[3]).isCloseTo(166.666667e9, within(1e3));
        assertThat(six[4]).isCloseTo(115.384615e9, within(1e3));
        assertThat(six[5]).isCloseTo(269.230769e9, within(1e3));
        assertThat(everyPair()).hasSize(15);
        for (ElasticConstant[] pair : everyPair()) {
            IsotropicMaterial material = IsotropicMaterial.fromPair(pair[0], six[pair[0].ordinal()],
                    pair[1], six[pair[1].ordinal()]);
            for (ElasticConstant c : ElasticConstant.values()) {
                assertThat(material.valueOf(c)).as("%s from %s and %s", c, pair[0], pair[1])
                        .isCloseTo(six[c.ordinal()], within(Math.abs(six[c.ordinal()]) * 1e-12));
            }
        }
        IsotropicMaterial steel = IsotropicMaterial.of(Stress.ofGigapascals(200), 0.30);
        assertThat(steel.youngsModulus()).isEqualTo(Stress.ofGigapascals(200));
        assertThat(steel.poissonsRatio()).isEqualTo(0.30);
        assertThat(steel.shearModulus().toGigapascals()).isCloseTo(76.9230769, within(1e-7));
        assertThat(steel.bulkModulus().toGigapascals()).isCloseTo(166.666667, within(1e-6));
        assertThat(steel.lameFirstParameter().toGigapascals()).isCloseTo(115.384615, within(1e-6));
        assertThat(steel.pWaveModulus().toGigapascals()).isCloseTo(269.230769, within(1e-6));
        assertThat(steel).hasToString("IsotropicMaterial[E=200.0 GPa, ν=0.3, G=76.9231 GPa,"
                + " K=166.667 GPa, λ=115.385 GPa, M=269.231 GPa]");
    }

    static Stream<Arguments> materials() {
        SplittableRandom random = new SplittableRandom(0x150);
        return Stream.generate(() -> Arguments.of(random.nextDouble(0.5e9, 400e9),
                random.nextDouble(-0.9, 0.49))).limit(200);
    }

    @ParameterizedTest(name = "E={0} ν={1}")
    @MethodSource("materials")
    void everyPairGivesTheSameSixOverTheStableRange(double e, double nu) {
        // Oracle: exactSix (50-digit BigDecimal). Tolerances: 1e-11 relative for E, G, K, M,
        // which pass through no zero; ν to 1e-11 absolute and λ to 1e-11 of the largest modulus
        // (both vanish at ν = 0). Pairs that lose digits in themselves are skipped where the
        // loss is the problem's: E with G or K near ν → 0.5 or −1 is ill-conditioned.
        double[] six = exactSix(e, nu);
        double scale = Math.max(six[3], six[5]);
        for (ElasticConstant[] pair : everyPair()) {
            double a = six[pair[0].ordinal()];
            double b = six[pair[1].ordinal()];
            IsotropicMaterial material;
            if (pair[0] == YOUNGS_MODULUS && pair[1] == P_WAVE_MODULUS && nu < 0) {
                material = IsotropicMaterial.fromYoungsAndPWaveModulus(a, b, true);
            } else if (pair[0] == POISSONS_RATIO && pair[1] == LAME_FIRST_PARAMETER
                    && Math.abs(nu) < 1e-3) {
                continue;   // λ/ν is 0/0 in the limit: the pair fixes G only to ~1/|ν| digits
            } else {
                material = IsotropicMaterial.fromPair(pair[0], a, pair[1], b);
            }
            double conditioning = conditioning(pair, nu);
            for (ElasticConstant c : ElasticConstant.values()) {
                double expected = six[c.ordinal()];
                double tolerance = c == POISSONS_RATIO ? 1e-11 * conditioning
                        : c == LAME_FIRST_PARAMETER ? scale * 1e-11 * conditioning
                        : Math.abs(expected) * 1e-11 * conditioning;
                assertThat(material.valueOf(c)).as("%s from %s and %s", c, pair[0], pair[1])
                        .isCloseTo(expected, within(tolerance));
            }
        }
    }

    /**
     * How many times the pair amplifies a relative error of its inputs, bounded from the
     * relations: E and G fix ν = E/2G − 1, so K ∝ 1/(1 − 2ν) amplifies by about 1/(1 − 2ν);
     * E and K fix G ∝ 1/(9K − E) ∝ 1/(1 + ν); pairs with λ divide by ν or by K − λ.
     */
    private static double conditioning(ElasticConstant[] pair, double nu) {
        double nearHalf = 1 / (1 - 2 * nu);
        double nearMinusOne = 1 / (1 + nu);
        return 4 * Math.max(nearHalf, nearMinusOne) * (1 + 1 / Math.max(Math.abs(nu), 1e-3) * 1e-3);
    }

    @Test
    void youngsAndPWaveModulusHaveTwoBranches() {
        // E and M: 2M·ν² + (M − E)·ν + E − M = 0 has one root ν ≥ 0 and one ν < 0, both stable
        // (derived from M = E(1 − ν)/((1 + ν)(1 − 2ν))). For ν = 0.3 the other root is
        // (E − M)/(2M·0.3) = −0.428571... (product of the roots).
        double[] six = exactSix(200e9, 0.30);
        IsotropicMaterial positive = IsotropicMaterial.fromPair(YOUNGS_MODULUS, six[0],
                P_WAVE_MODULUS, six[5]);
        IsotropicMaterial negative = IsotropicMaterial.fromYoungsAndPWaveModulus(six[0], six[5], true);
        assertThat(positive.poissonsRatio()).isCloseTo(0.30, within(1e-14));
        double other = (six[0] - six[5]) / (2 * six[5] * 0.30);
        assertThat(negative.poissonsRatio()).isCloseTo(other, within(1e-14)).isNegative();
        assertThat(negative.pWaveModulus().toPascals()).isEqualTo(six[5]);
        assertThat(IsotropicMaterial.fromYoungsAndPWaveModulus(1e9, 1e9, true).poissonsRatio())
                .isZero();
    }

    @Test
    void pairsWithoutAStableMaterialAreRefusedNamingBothValues() {
        assertThatThrownBy(() -> IsotropicMaterial.fromPair(YOUNGS_MODULUS, 300e9, SHEAR_MODULUS, 50e9))
                .isInstanceOf(IllegalArgumentException.class)
                .hasMessageStartingWith("youngsModulus 300.0 GPa and shearModulus 50.0 GPa admit"
                        + " no stable material (it needs K > 0 and G > 0, i.e. E > 0 and"
                        + " -1 < ν < 0.5): they give K = ");
        assertThatThrownBy(() -> IsotropicMaterial.fromPair(YOUNGS_MODULUS, 200e9, P_WAVE_MODULUS, 100e9))
                .hasMessageStartingWith("youngsModulus 200.0 GPa and pWaveModulus 100.0 GPa admit");
        assertThatThrownBy(() -> IsotropicMaterial.fromPair(BULK_MODULUS, 50e9, LAME_FIRST_PARAMETER, 60e9))
                .hasMessageStartingWith("bulkModulus 50.0 GPa and lameFirstParameter 60.0 GPa admit");
        assertThatThrownBy(() -> IsotropicMaterial.fromPair(SHEAR_MODULUS, 80e9, P_WAVE_MODULUS, 100e9))
                .hasMessageStartingWith("shearModulus 80.0 GPa and pWaveModulus 100.0 GPa admit");
        assertThatThrownBy(() -> IsotropicMaterial.fromPair(LAME_FIRST_PARAMETER, -60e9, P_WAVE_MODULUS, 100e9))
                .hasMessageStartingWith("lameFirstParameter -60.0 GPa and pWaveModulus 100.0 GPa admit");
        assertThatThrownBy(() -> IsotropicMaterial.fromPair(POISSONS_RATIO, 0.3, LAME_FIRST_PARAMETER, -1e9))
                .hasMessageStartingWith("poissonsRatio 0.3 and lameFirstParameter -1.0 GPa admit");
        assertThatThrownBy(() -> IsotropicMaterial.fromPair(POISSONS_RATIO, 0.0, LAME_FIRST_PARAMETER, 0.0))
                .hasMessage("poissonsRatio 0.0 and lameFirstParameter 0.0 GPa do not fix a material:"
                        + " ν = 0 makes λ = 0 for any G; give another pair");
        assertThatThrownBy(() -> IsotropicMaterial.of(Stress.ofGigapascals(200), 0.5))
                .hasMessage("poissonsRatio must be in (-1.0, 0.5): 0.5");
        assertThatThrownBy(() -> IsotropicMaterial.of(Stress.ofGigapascals(200), -1.0))
                .hasMessage("poissonsRatio must be in (-1.0, 0.5): -1.0");
        assertThatThrownBy(() -> IsotropicMaterial.of(Stress.ofGigapascals(200), Double.NaN))
                .hasMessage("poissonsRatio must be in (-1.0, 0.5): NaN");
        assertThatThrownBy(() -> IsotropicMaterial.of(Stress.ZERO, 0.3))
                .hasMessage("youngsModulus must be > 0 and finite: 0.0");
        assertThatThrownBy(() -> IsotropicMaterial.fromPair(SHEAR_MODULUS, Double.POSITIVE_INFINITY, BULK_MODULUS, 1e9))
                .hasMessage("shearModulus must be > 0 and finite: Infinity");
        assertThatThrownBy(() -> IsotropicMaterial.fromPair(LAME_FIRST_PARAMETER, Double.NaN, BULK_MODULUS, 1e9))
                .hasMessage("lameFirstParameter must be finite: NaN");
        assertThatThrownBy(() -> IsotropicMaterial.fromPair(SHEAR_MODULUS, 1e9, SHEAR_MODULUS, 1e9))
                .hasMessage("the two constants must differ: both SHEAR_MODULUS");
        assertThatThrownBy(() -> IsotropicMaterial.fromPair(null, 1e9, SHEAR_MODULUS, 1e9))
                .isInstanceOf(NullPointerException.class).hasMessage("first");
        assertThatThrownBy(() -> IsotropicMaterial.of(null, 0.3))
                .isInstanceOf(NullPointerException.class);
        assertThatThrownBy(() -> IsotropicMaterial.of(Stress.ofGigapascals(200), 0.3).withThermalExpansion(Double.NaN))
                .hasMessage("perKelvin must be finite: NaN");
    }

    @Test
    void anAuxeticMaterialIsStableAndConvertsToo() {
        // ν = −0.5 is stable (−1 < ν < 0.5); λ = Eν/((1+ν)(1−2ν)) = −E/2 (exact relation).
        IsotropicMaterial foam = IsotropicMaterial.of(Stress.ofMegapascals(100), -0.5);
        assertThat(foam.lameFirstParameter().toMegapascals()).isCloseTo(-50, within(1e-12));
        IsotropicMaterial back = IsotropicMaterial.fromPair(LAME_FIRST_PARAMETER, -50e6,
                SHEAR_MODULUS, foam.shearModulus().toPascals());
        assertThat(back.poissonsRatio()).isCloseTo(-0.5, within(1e-15));
    }

    @Test
    void equalityAndSymbols() {
        IsotropicMaterial a = IsotropicMaterial.of(Stress.ofGigapascals(70), 0.33);
        assertThat(a).isEqualTo(IsotropicMaterial.of(Stress.ofGigapascals(70), 0.33))
                .hasSameHashCodeAs(IsotropicMaterial.of(Stress.ofGigapascals(70), 0.33))
                .isNotEqualTo(a.withThermalExpansion(23e-6)).isNotEqualTo("a material");
        assertThat(a.thermalExpansion()).isEmpty();
        assertThat(a.withThermalExpansion(23e-6).thermalExpansion()).hasValue(23e-6);
        assertThat(a.withThermalExpansion(23e-6).toString()).endsWith(", α=2.3e-5 /K]");
        assertThat(ElasticConstant.LAME_FIRST_PARAMETER.symbol()).isEqualTo("λ");
        assertThat(ElasticConstant.POISSONS_RATIO.isModulus()).isFalse();
        assertThat(ElasticConstant.BULK_MODULUS.isModulus()).isTrue();
    }
}
