/**
 * strainmath rosette: rosette geometry and reduction, principal strains and stresses, and
 * equivalent stress, on the quantities of {@code org.strainmath.core}.
 *
 * <p>The reduction itself arrives with its own work item; until then the module declares its
 * place in the layering (it reads core, and whoever reads it reads core) and exports nothing.
 */
module org.strainmath.rosette {
    requires transitive org.strainmath.core;
}
