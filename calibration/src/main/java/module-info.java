/**
 * strainmath calibration: shunt calibration, calibration fitting, transducer performance and
 * measurement uncertainty, on the bridges of {@code org.strainmath.core}.
 *
 * <p>The calibration code arrives with its own work items; until then the module declares its
 * place in the layering (it reads core, and whoever reads it reads core) and exports nothing.
 * Apache Commons Math is already on its dependency list for the fits to come.
 */
module org.strainmath.calibration {
    requires transitive org.strainmath.core;
}
