package org.strainmath.material;

/**
 * The six constants of isotropic linear elasticity; any two of them fix the other four
 * ({@link IsotropicMaterial#fromPair}). Moduli are in pascals, Poisson's ratio is
 * dimensionless.
 */
public enum ElasticConstant {

    /** Young's modulus E, Pa: uniaxial stress over the strain it causes. */
    YOUNGS_MODULUS("youngsModulus", "E"),
    /** Poisson's ratio ν: minus the lateral over the axial strain in uniaxial stress. */
    POISSONS_RATIO("poissonsRatio", "ν"),
    /** Shear modulus G (Lamé's second parameter μ), Pa. */
    SHEAR_MODULUS("shearModulus", "G"),
    /** Bulk modulus K, Pa: hydrostatic pressure over the volume strain. */
    BULK_MODULUS("bulkModulus", "K"),
    /** Lamé's first parameter λ, Pa; negative for a material with ν &lt; 0. */
    LAME_FIRST_PARAMETER("lameFirstParameter", "λ"),
    /** P-wave modulus M = λ + 2G, Pa: the uniaxial-strain (constrained) modulus. */
    P_WAVE_MODULUS("pWaveModulus", "M");

    private final String argumentName;
    private final String symbol;

    ElasticConstant(String argumentName, String symbol) {
        this.argumentName = argumentName;
        this.symbol = symbol;
    }

    /** The usual symbol: E, ν, G, K, λ or M. */
    public String symbol() {
        return symbol;
    }

    /** The name messages use for a value of this constant, e.g. {@code youngsModulus}. */
    String argumentName() {
        return argumentName;
    }

    /** Whether the constant is a modulus in pascals (all but Poisson's ratio). */
    public boolean isModulus() {
        return this != POISSONS_RATIO;
    }
}
