/**
 * strainmath core: quantities with units, strain gauges, exact Wheatstone-bridge equations, the
 * per-sample kernels that convert blocks of bridge readings to strain, material constitutive
 * conversion, and the counting and fatigue damage of strain and stress histories.
 *
 * <p>Exported: {@link org.strainmath.quantity} (immutable quantities with units),
 * {@link org.strainmath.bridge} (gauges, bridge arms, bridges, channels and their block
 * kernels) and {@link org.strainmath.material} (elastic constants, plane strain and stress
 * states, Hooke's law, the orthotropic lamina), {@link org.strainmath.history} (turning points,
 * rainflow counting, histograms of cycles) and {@link org.strainmath.fatigue} (S–N and
 * strain–life curves, mean-stress corrections, Palmgren–Miner damage). The
 * package {@code org.strainmath.internal} holds argument checks, formatting and kernel helpers;
 * it is exported only to the rosette and calibration modules of this library.
 */
module org.strainmath.core {
    exports org.strainmath.quantity;
    exports org.strainmath.bridge;
    exports org.strainmath.material;
    exports org.strainmath.history;
    exports org.strainmath.fatigue;
    // Argument checks, formatting and kernel helpers, shared with the other library modules
    // only.
    exports org.strainmath.internal to org.strainmath.rosette, org.strainmath.calibration;
}
