package org.strainmath.material;

import org.strainmath.internal.SerialForms;
import static org.strainmath.material.ElasticConstant.BULK_MODULUS;
import static org.strainmath.material.ElasticConstant.LAME_FIRST_PARAMETER;
import static org.strainmath.material.ElasticConstant.POISSONS_RATIO;
import static org.strainmath.material.ElasticConstant.P_WAVE_MODULUS;
import static org.strainmath.material.ElasticConstant.SHEAR_MODULUS;
import static org.strainmath.material.ElasticConstant.YOUNGS_MODULUS;

import java.io.InvalidObjectException;
import java.io.ObjectInputStream;
import java.io.Serializable;
import java.util.EnumMap;
import java.util.Map;
import java.util.Objects;
import java.util.OptionalDouble;

import org.strainmath.internal.Checks;
import org.strainmath.internal.Format;
import org.strainmath.quantity.Stress;
import org.strainmath.quantity.Strain;
import org.strainmath.quantity.Temperature;

/**
 * An isotropic linear elastic material, from any two of its six elastic constants, with
 * Hooke's law in plane stress and in plane strain and, optionally, its coefficient of thermal
 * expansion.
 *
 * <pre>
 *   IsotropicMaterial steel = IsotropicMaterial.of(Stress.ofGigapascals(200), 0.30);
 *   steel.shearModulus();     // 76923.1 MPa
 *   steel.stressInPlaneStress(PlaneStrain.ofMicrostrain(500, -150, 0));
 *                             // uniaxial: σx = 100 MPa, σy = 0
 * </pre>
 *
 * <p>The relations between the constants (any text on elasticity, e.g. Timoshenko and
 * Goodier, <i>Theory of Elasticity</i>, 3rd ed., ch. 1; Sadd, <i>Elasticity</i>, table 4.1):
 * <pre>
 *   G = E / (2·(1 + ν))          K = E / (3·(1 − 2ν))
 *   λ = E·ν / ((1 + ν)·(1 − 2ν)) M = λ + 2G = E·(1 − ν) / ((1 + ν)·(1 − 2ν))
 *   E = 9KG / (3K + G)           ν = (3K − 2G) / (2·(3K + G))
 * </pre>
 * A given pair is first converted to K and G (in the forms that avoid cancellation), then the
 * others follow from them; the two given values are kept exactly as given.
 *
 * <p><b>Stability</b>: the material must store energy under any strain, which holds if and
 * only if K &gt; 0 and G &gt; 0, or equivalently E &gt; 0 and −1 &lt; ν &lt; 0.5. Moduli
 * E, G, K, M must be positive and finite, λ finite (it is negative when ν &lt; 0), ν in
 * (−1, 0.5). A pair that admits no stable material is rejected with a message naming both.
 *
 * <p><i>Accuracy</i>: E, G, K and M to a few ulp relative to themselves; ν and λ to a few ulp
 * of 1 and of the largest modulus (they pass through zero at ν = 0), from well-conditioned
 * pairs. A pair that nearly fixes no material (E near 3G, which is ν near 0.5) loses digits
 * as the problem itself does.
 *
 * <p>No table of named materials is built in: enter the constants of the part at hand.
 *
 * <p>Immutable and thread-safe.
 * Serializable, for a stream engine that ships configurations to other processes: the
 * stream holds the defining values only, checked again as the factories check them.
 */
public final class IsotropicMaterial implements Serializable {

    private final double youngs;
    private final double poisson;
    private final double shear;
    private final double bulk;
    private final double lame;
    private final double pWave;
    /** Coefficient of linear thermal expansion, 1/K; NaN when not given. */
    private final double alpha;

    @SuppressWarnings("serial") // never serialized: the serial form holds the defining values
    private final PlaneStiffness planeStress;
    @SuppressWarnings("serial") // never serialized: the serial form holds the defining values
    private final PlaneStiffness planeStrain;

    private IsotropicMaterial(double[] six, double alpha) {
        this.youngs = six[0];
        this.poisson = six[1];
        this.shear = six[2];
        this.bulk = six[3];
        this.lame = six[4];
        this.pWave = six[5];
        this.alpha = alpha;
        double e = youngs;
        double v = poisson;
        double q = e / ((1 - v) * (1 + v));
        this.planeStress = PlaneStiffness.withCompliance(
                new double[] {q, v * q, 0, q, 0, shear},
                new double[] {1 / e, -v / e, 0, 1 / e, 0, 1 / shear});
        double s11 = (1 - v) * (1 + v) / e;
        double s12 = -v * (1 + v) / e;
        this.planeStrain = PlaneStiffness.withCompliance(
                new double[] {pWave, lame, 0, pWave, 0, shear},
                new double[] {s11, s12, 0, s11, 0, 1 / shear});
    }

    /**
     * The material of Young's modulus {@code youngsModulus} and Poisson's ratio
     * {@code poissonsRatio}, the pair a data sheet usually gives.
     *
     * @throws NullPointerException     if {@code youngsModulus} is null
     * @throws IllegalArgumentException if E is not positive or ν is not in (−1, 0.5)
     */
    public static IsotropicMaterial of(Stress youngsModulus, double poissonsRatio) {
        return fromPair(YOUNGS_MODULUS, youngsModulus.toPascals(), POISSONS_RATIO, poissonsRatio);
    }

    /**
     * The material of any two different elastic constants, moduli in Pa:
     * <pre>
     *   IsotropicMaterial.fromPair(SHEAR_MODULUS, 79.3e9, BULK_MODULUS, 160e9);
     * </pre>
     * Of the fifteen pairs, one has two stable solutions: E and M fix ν only up to the choice
     * of a root, one with ν ≥ 0 and one with ν &lt; 0 (the roots of 2M·ν² + (M − E)·ν + E − M
     * = 0). This method takes ν ≥ 0, the usual engineering material; for an auxetic material
     * use {@link #fromYoungsAndPWaveModulus} or another pair. And ν = 0 with λ = 0 fixes
     * nothing more (λ = 0 whenever ν = 0), so that pair is rejected.
     *
     * @throws NullPointerException     if a constant is null
     * @throws IllegalArgumentException if the constants are the same, a value is out of its
     *                                  range, or the pair admits no stable material
     */
    public static IsotropicMaterial fromPair(ElasticConstant first, double firstValue,
            ElasticConstant second, double secondValue) {
        Objects.requireNonNull(first, "first");
        Objects.requireNonNull(second, "second");
        if (first == second) {
            throw new IllegalArgumentException("the two constants must differ: both " + first);
        }
        checkValue(first, firstValue);
        checkValue(second, secondValue);
        Map<ElasticConstant, Double> given = new EnumMap<>(ElasticConstant.class);
        given.put(first, firstValue);
        given.put(second, secondValue);
        double[] kg = bulkAndShear(given, false);
        return complete(given, kg);
    }

    /**
     * The material of Young's modulus {@code youngsModulus} and P-wave modulus
     * {@code pWaveModulus} (Pa), on the branch of ν that {@code negativePoissonsRatio} selects
     * (see {@link #fromPair}). M = E gives ν = 0 on both branches.
     *
     * @throws IllegalArgumentException if a modulus is not positive and finite, or M &lt; E
     *                                  (no material)
     */
    public static IsotropicMaterial fromYoungsAndPWaveModulus(double youngsModulus,
            double pWaveModulus, boolean negativePoissonsRatio) {
        checkValue(YOUNGS_MODULUS, youngsModulus);
        checkValue(P_WAVE_MODULUS, pWaveModulus);
        Map<ElasticConstant, Double> given = new EnumMap<>(ElasticConstant.class);
        given.put(YOUNGS_MODULUS, youngsModulus);
        given.put(P_WAVE_MODULUS, pWaveModulus);
        return complete(given, bulkAndShear(given, negativePoissonsRatio));
    }

    private static void checkValue(ElasticConstant constant, double value) {
        String name = constant.argumentName();
        if (constant == POISSONS_RATIO) {
            Checks.inOpenInterval(value, -1.0, 0.5, name);
        } else if (constant == LAME_FIRST_PARAMETER) {
            Checks.finite(value, name);
        } else {
            Checks.positiveFinite(value, name);
        }
    }

    /**
     * K and G of a pair of constants, in forms without cancellation; NaN or a non-positive
     * value where the pair admits no stable material.
     */
    private static double[] bulkAndShear(Map<ElasticConstant, Double> given,
            boolean negativeBranch) {
        double e = given.getOrDefault(YOUNGS_MODULUS, Double.NaN);
        double v = given.getOrDefault(POISSONS_RATIO, Double.NaN);
        double g = given.getOrDefault(SHEAR_MODULUS, Double.NaN);
        double k = given.getOrDefault(BULK_MODULUS, Double.NaN);
        double l = given.getOrDefault(LAME_FIRST_PARAMETER, Double.NaN);
        double m = given.getOrDefault(P_WAVE_MODULUS, Double.NaN);
        boolean hasE = given.containsKey(YOUNGS_MODULUS);
        boolean hasV = given.containsKey(POISSONS_RATIO);
        boolean hasG = given.containsKey(SHEAR_MODULUS);
        boolean hasK = given.containsKey(BULK_MODULUS);
        boolean hasL = given.containsKey(LAME_FIRST_PARAMETER);
        if (hasE && hasV) {
            return new double[] {e / (3 * (1 - 2 * v)), e / (2 * (1 + v))};
        }
        if (hasE && hasG) {
            return new double[] {e * g / (3 * (3 * g - e)), g};
        }
        if (hasE && hasK) {
            return new double[] {k, 3 * k * e / (9 * k - e)};
        }
        if (hasE && hasL) {
            // R = √(E² + 9λ² + 2Eλ) > |E + 3λ| and > |3λ − E| for E > 0, λ ≠ 0: every such pair
            // is stable. K = (E + 3λ + R)/6 and G = (E − 3λ + R)/4, rationalised where the sum
            // would cancel.
            double r = Math.sqrt(e * e + 9 * l * l + 2 * e * l);
            double bulk = e + 3 * l >= 0 ? (e + 3 * l + r) / 6 : -2 * e * l / (3 * (r - e - 3 * l));
            double shear = 3 * l - e <= 0 ? (e - 3 * l + r) / 4 : 2 * e * l / (r + 3 * l - e);
            return new double[] {bulk, shear};
        }
        if (hasE) {
            // E and M: S = √((M − E)(9M − E)), real for M ≥ E; two roots in ν.
            double s = Math.sqrt((m - e) * (9 * m - e));
            if (negativeBranch) {
                return new double[] {2 * e * m / (3 * (3 * m - e + s)), (3 * m + e + s) / 8};
            }
            return new double[] {(3 * m - e + s) / 6, 2 * e * m / (3 * m + e + s)};
        }
        if (hasV && hasG) {
            return new double[] {2 * g * (1 + v) / (3 * (1 - 2 * v)), g};
        }
        if (hasV && hasK) {
            return new double[] {k, 3 * k * (1 - 2 * v) / (2 * (1 + v))};
        }
        if (hasV && hasL) {
            if (v == 0) {
                throw new IllegalArgumentException("poissonsRatio 0.0 and lameFirstParameter "
                        + valueText(LAME_FIRST_PARAMETER, l) + " do not fix a material: ν = 0"
                        + " makes λ = 0 for any G; give another pair");
            }
            return new double[] {l * (1 + v) / (3 * v), l * (1 - 2 * v) / (2 * v)};
        }
        if (hasV) {
            return new double[] {m * (1 + v) / (3 * (1 - v)), m * (1 - 2 * v) / (2 * (1 - v))};
        }
        if (hasG && hasK) {
            return new double[] {k, g};
        }
        if (hasG && hasL) {
            return new double[] {l + 2 * g / 3, g};
        }
        if (hasG) {
            return new double[] {m - 4 * g / 3, g};
        }
        if (hasK && hasL) {
            return new double[] {k, 1.5 * (k - l)};
        }
        if (hasK) {
            return new double[] {k, 0.75 * (m - k)};
        }
        return new double[] {(m + 2 * l) / 3, 0.5 * (m - l)};
    }

    private static IsotropicMaterial complete(Map<ElasticConstant, Double> given, double[] kg) {
        double k = kg[0];
        double g = kg[1];
        if (!(k > 0 && g > 0) || k == Double.POSITIVE_INFINITY || g == Double.POSITIVE_INFINITY) {
            StringBuilder pair = new StringBuilder();
            for (Map.Entry<ElasticConstant, Double> entry : given.entrySet()) {
                pair.append(pair.length() == 0 ? "" : " and ").append(entry.getKey().argumentName())
                        .append(' ').append(valueText(entry.getKey(), entry.getValue()));
            }
            throw new IllegalArgumentException(pair + " admit no stable material (it needs K > 0"
                    + " and G > 0, i.e. E > 0 and -1 < ν < 0.5): they give K = "
                    + valueText(BULK_MODULUS, k) + ", G = " + valueText(SHEAR_MODULUS, g));
        }
        double[] six = {9 * k * g / (3 * k + g), (3 * k - 2 * g) / (2 * (3 * k + g)), g, k,
            k - 2 * g / 3, k + 4 * g / 3};
        for (Map.Entry<ElasticConstant, Double> entry : given.entrySet()) {
            six[entry.getKey().ordinal()] = entry.getValue();
        }
        return new IsotropicMaterial(six, Double.NaN);
    }

    private static String valueText(ElasticConstant constant, double value) {
        return constant.isModulus() ? Format.withUnit(value * 1e-9, "GPa") : Format.number(value);
    }

    /**
     * A copy with the coefficient of linear thermal expansion {@code perKelvin} (1/K; about
     * 12e-6 for carbon steel and 23e-6 for aluminium alloys, from memory: take the value of the
     * material at hand). May be negative or zero.
     *
     * @throws IllegalArgumentException if {@code perKelvin} is NaN or infinite
     */
    public IsotropicMaterial withThermalExpansion(double perKelvin) {
        return new IsotropicMaterial(six(), Checks.finite(perKelvin, "perKelvin"));
    }

    private double[] six() {
        return new double[] {youngs, poisson, shear, bulk, lame, pWave};
    }

    // ---------------------------------------------------------------- constants

    /** Young's modulus E. */
    public Stress youngsModulus() {
        return Stress.ofPascals(youngs);
    }

    /** Poisson's ratio ν. */
    public double poissonsRatio() {
        return poisson;
    }

    /** The shear modulus G. */
    public Stress shearModulus() {
        return Stress.ofPascals(shear);
    }

    /** The bulk modulus K. */
    public Stress bulkModulus() {
        return Stress.ofPascals(bulk);
    }

    /** Lamé's first parameter λ (negative when ν &lt; 0). */
    public Stress lameFirstParameter() {
        return Stress.ofPascals(lame);
    }

    /** The P-wave modulus M = λ + 2G. */
    public Stress pWaveModulus() {
        return Stress.ofPascals(pWave);
    }

    /**
     * The value of {@code constant}: Pa for a modulus, plain for Poisson's ratio.
     *
     * @throws NullPointerException if {@code constant} is null
     */
    public double valueOf(ElasticConstant constant) {
        return six()[constant.ordinal()];
    }

    /** The coefficient of linear thermal expansion, 1/K, if one was given. */
    public OptionalDouble thermalExpansion() {
        return Double.isNaN(alpha) ? OptionalDouble.empty() : OptionalDouble.of(alpha);
    }

    // ---------------------------------------------------------------- Hooke's law

    /**
     * The stiffness in plane stress (σz = τxz = τyz = 0, a thin plate or a free surface, where
     * strain gauges are):
     * <pre>
     *   Q11 = Q22 = E / (1 − ν²)    Q12 = ν·E / (1 − ν²)    Q66 = G    Q16 = Q26 = 0
     * </pre>
     * (e.g. Timoshenko and Goodier, <i>Theory of Elasticity</i>, 3rd ed., § 7; compliance
     * S11 = 1/E, S12 = −ν/E, S66 = 1/G in closed form).
     */
    public PlaneStiffness planeStressStiffness() {
        return planeStress;
    }

    /**
     * The stiffness in plane strain (εz = γxz = γyz = 0, a long body restrained along z):
     * <pre>
     *   Q11 = Q22 = M = λ + 2G      Q12 = λ      Q66 = G      Q16 = Q26 = 0
     * </pre>
     * (compliance S11 = (1 − ν²)/E, S12 = −ν(1 + ν)/E, S66 = 1/G in closed form).
     */
    public PlaneStiffness planeStrainStiffness() {
        return planeStrain;
    }

    /**
     * The stress of {@code strain} in plane stress: σ = Q·ε with {@link #planeStressStiffness()}.
     *
     * @throws NullPointerException if {@code strain} is null
     */
    public PlaneStress stressInPlaneStress(PlaneStrain strain) {
        return planeStress.stressOf(strain);
    }

    /**
     * The strain of {@code stress} in plane stress:
     * <pre>
     *   εx = (σx − ν·σy)/E      εy = (σy − ν·σx)/E      γxy = τxy/G
     * </pre>
     *
     * @throws NullPointerException if {@code stress} is null
     */
    public PlaneStrain strainInPlaneStress(PlaneStress stress) {
        return planeStress.strainOf(stress);
    }

    /**
     * The out-of-plane strain εz in plane stress, from the in-plane strains:
     * <pre>
     *   εz = −ν/(1 − ν) · (εx + εy)
     * </pre>
     *
     * @throws NullPointerException if {@code strain} is null
     */
    public Strain outOfPlaneStrainInPlaneStress(PlaneStrain strain) {
        return Strain.of(-poisson / (1 - poisson) * (strain.exx() + strain.eyy()));
    }

    /**
     * The out-of-plane strain εz in plane stress, from the in-plane stresses:
     * εz = −ν/E · (σx + σy).
     *
     * @throws NullPointerException if {@code stress} is null
     */
    public Strain outOfPlaneStrainInPlaneStress(PlaneStress stress) {
        return Strain.of(-poisson / youngs * (stress.sxx() + stress.syy()));
    }

    /**
     * The stress of {@code strain} in plane strain: σ = Q·ε with {@link #planeStrainStiffness()}.
     *
     * @throws NullPointerException if {@code strain} is null
     */
    public PlaneStress stressInPlaneStrain(PlaneStrain strain) {
        return planeStrain.stressOf(strain);
    }

    /**
     * The strain of {@code stress} in plane strain (εz = 0).
     *
     * @throws NullPointerException if {@code stress} is null
     */
    public PlaneStrain strainInPlaneStrain(PlaneStress stress) {
        return planeStrain.strainOf(stress);
    }

    /**
     * The out-of-plane stress σz that holds εz = 0, from the in-plane strains:
     * σz = λ·(εx + εy).
     *
     * @throws NullPointerException if {@code strain} is null
     */
    public Stress outOfPlaneStressInPlaneStrain(PlaneStrain strain) {
        return Stress.ofPascals(lame * (strain.exx() + strain.eyy()));
    }

    /**
     * The out-of-plane stress σz that holds εz = 0, from the in-plane stresses:
     * σz = ν·(σx + σy).
     *
     * @throws NullPointerException if {@code stress} is null
     */
    public Stress outOfPlaneStressInPlaneStrain(PlaneStress stress) {
        return Stress.ofPascals(poisson * (stress.sxx() + stress.syy()));
    }

    // ---------------------------------------------------------------- thermal strain

    /**
     * The free thermal strain α·(T − T0) of this material between {@code reference} and
     * {@code actual}: the strain of an unrestrained body, equal in every direction, without
     * shear, and without stress.
     *
     * @throws NullPointerException  if a temperature is null
     * @throws IllegalStateException if no coefficient of thermal expansion was given
     */
    public Strain freeThermalStrain(Temperature reference, Temperature actual) {
        return Strain.of(requireAlpha() * kelvinAbove(actual, reference));
    }

    /**
     * The mechanical (stress-producing) strain of a measured total strain: the free thermal
     * strain α·(T − T0) taken from both normal strains, the shear strain unchanged:
     * <pre>
     *   εx,mech = εx − α·(T − T0)    εy,mech = εy − α·(T − T0)    γxy,mech = γxy
     * </pre>
     * Use it for a reading that contains the substrate's free expansion: a gauge whose thermal
     * output was removed by a measured curve on a reference material of zero expansion, or a
     * total strain from another method. A self-temperature-compensated gauge matched to this
     * substrate, or a thermal-output correction measured on this substrate, already leaves the
     * free expansion out of the reading: subtracting it again would count it twice.
     *
     * @throws NullPointerException  if an argument is null
     * @throws IllegalStateException if no coefficient of thermal expansion was given
     */
    public PlaneStrain mechanicalStrain(PlaneStrain total, Temperature reference,
            Temperature actual) {
        double free = requireAlpha() * kelvinAbove(actual, reference);
        return new PlaneStrain(total.exx() - free, total.eyy() - free, total.gxy());
    }

    /**
     * The mechanical strain along one direction: {@code total} − α·(T − T0), with the cautions
     * of {@link #mechanicalStrain(PlaneStrain, Temperature, Temperature)}.
     *
     * @throws NullPointerException  if an argument is null
     * @throws IllegalStateException if no coefficient of thermal expansion was given
     */
    public Strain mechanicalStrain(Strain total, Temperature reference, Temperature actual) {
        return Strain.of(total.value() - requireAlpha() * kelvinAbove(actual, reference));
    }

    private static double kelvinAbove(Temperature actual, Temperature reference) {
        Objects.requireNonNull(reference, "reference");
        return Objects.requireNonNull(actual, "actual").kelvinAbove(reference);
    }

    private double requireAlpha() {
        if (Double.isNaN(alpha)) {
            throw new IllegalStateException(
                    "no coefficient of thermal expansion: use withThermalExpansion first");
        }
        return alpha;
    }

    // ---------------------------------------------------------------- object

    @Override
    public boolean equals(Object o) {
        if (!(o instanceof IsotropicMaterial)) {
            return false;
        }
        IsotropicMaterial other = (IsotropicMaterial) o;
        return java.util.Arrays.equals(six(), other.six())
                && Double.compare(alpha, other.alpha) == 0;
    }

    @Override
    public int hashCode() {
        return 31 * java.util.Arrays.hashCode(six()) + Double.hashCode(alpha);
    }

    /**
     * All six constants and the expansion if given:
     * {@code IsotropicMaterial[E=200.0 GPa, ν=0.3, G=76.9231 GPa, K=166.667 GPa,
     * λ=115.385 GPa, M=269.231 GPa]}.
     */
    @Override
    public String toString() {
        StringBuilder text = new StringBuilder("IsotropicMaterial[");
        double[] six = six();
        for (ElasticConstant constant : ElasticConstant.values()) {
            text.append(constant.ordinal() == 0 ? "" : ", ").append(constant.symbol()).append('=')
                    .append(valueText(constant, six[constant.ordinal()]));
        }
        if (!Double.isNaN(alpha)) {
            text.append(", α=").append(Format.number(alpha)).append(" /K");
        }
        return text.append(']').toString();
    }

    // ---------------------------------------------------------------- serial form

    private static final long serialVersionUID = 1L;

    /** Writes the serial form ({@link Serial}): the defining values only. */
    private Object writeReplace() {
        return new Serial(six(), alpha);
    }

    /** A stream must hold the serial form, never the fields of this class. */
    private void readObject(ObjectInputStream in) throws InvalidObjectException {
        throw SerialForms.proxyRequired("IsotropicMaterial");
    }

    /**
     * The serial form of a IsotropicMaterial: its defining values, rebuilt on reading through the checks
     * of the factories.
     */
    private static final class Serial implements Serializable {
        private static final long serialVersionUID = 1L;
        private final double[] six;
        private final double alpha;

        Serial(double[] six, double alpha) {
            this.six = six;
            this.alpha = alpha;
        }

        private Object readResolve() throws InvalidObjectException {
            return SerialForms.rebuild("IsotropicMaterial", () -> {
                if (six.length != 6) {
                    throw new IllegalArgumentException("six must hold six constants: "
                            + six.length);
                }
                // The six as they were, so that a copy computes the same bits; they must be
                // one material's, as E and ν give it, to a few ulp.
                double[] expected = of(Stress.ofPascals(six[0]), six[1]).six();
                for (int k = 0; k < 6; k++) {
                    if (!(Math.abs(six[k] - expected[k]) <= 1e-12 * Math.abs(expected[k]))) {
                        throw new IllegalArgumentException("six must be the constants of one"
                                + " material: constant " + k + " is " + six[k] + ", E and ν give "
                                + expected[k]);
                    }
                }
                if (!Double.isNaN(alpha)) {
                    Checks.finite(alpha, "perKelvin");        // NaN: no expansion given
                }
                return new IsotropicMaterial(six.clone(), alpha);
            });
        }
    }
}
