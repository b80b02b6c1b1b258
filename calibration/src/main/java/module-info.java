/**
 * strainmath calibration: shunt calibration, calibration fitting, transducer performance and
 * measurement uncertainty, on the bridges of {@code org.strainmath.core}.
 *
 * <p>Exported: {@link org.strainmath.calibration} and {@link org.strainmath.uncertainty}. Apache Commons Math does the QR
 * decomposition and the distributions; SLF4J carries one warning, for a fit of a degree above
 * three.
 */
module org.strainmath.calibration {
    requires transitive org.strainmath.core;
    requires transitive org.strainmath.rosette;
    requires commons.math3;
    requires org.slf4j;

    exports org.strainmath.calibration;
    exports org.strainmath.uncertainty;
}
