/**
 * Rosette reduction: from the readings of three or more gauges at known angles to the plane
 * strain state, principal strains and stresses, and equivalent stress. Not exported yet.
 */
package org.strainmath.rosette;
