/**
 * strainmath core: quantities with units, strain gauges, exact Wheatstone-bridge equations and
 * the per-sample kernels that convert blocks of bridge readings to strain.
 *
 * <p>Exported: {@link org.strainmath.quantity} (immutable quantities with units) and
 * {@link org.strainmath.bridge} (gauges, bridge arms, bridges and their block kernels). The
 * package {@code org.strainmath.internal} holds argument checks and formatting shared by the
 * exported packages and is not exported.
 */
module org.strainmath.core {
    exports org.strainmath.quantity;
    exports org.strainmath.bridge;
}
