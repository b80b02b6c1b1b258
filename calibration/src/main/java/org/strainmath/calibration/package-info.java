/**
 * Calibration: shunt calibration, least-squares calibration fits, transducer performance and
 * uncertainty budgets. Not exported yet.
 */
package org.strainmath.calibration;
