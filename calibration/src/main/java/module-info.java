/**
 * strainmath calibration: shunt calibration, calibration fitting, transducer performance and
 * measurement uncertainty, on the bridges of {@code org.strainmath.core}.
 *
 * <p>Exported: {@link org.strainmath.calibration}. Apache Commons Math is on the dependency
 * list for the fits to come.
 */
module org.strainmath.calibration {
    requires transitive org.strainmath.core;

    exports org.strainmath.calibration;
}
