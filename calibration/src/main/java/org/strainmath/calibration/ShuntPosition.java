package org.strainmath.calibration;

/** Where a shunt resistor is connected across a bridge arm. */
public enum ShuntPosition {

    /** At the gauge: across the arm's own resistance, its lead wire outside the shunt. */
    AT_GAUGE,

    /**
     * At the instrument end of the cable: across the arm and its lead wire together, as when
     * the shunt sits in the instrument. The arm then changes by about ((R + RL)/R)² more than
     * with the shunt at the gauge; the equivalent strain accounts for the lead exactly.
     */
    AT_INSTRUMENT
}
