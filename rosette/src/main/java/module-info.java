/**
 * strainmath rosette: rosette geometry and reduction, principal strains and stresses, and
 * equivalent stress, on the quantities and materials of {@code org.strainmath.core}.
 *
 * <p>Exported: {@link org.strainmath.rosette}.
 */
module org.strainmath.rosette {
    requires transitive org.strainmath.core;

    exports org.strainmath.rosette;
}
