/**
 * Measurement uncertainty per JCGM 100:2008 (the GUM): input quantities with their standard
 * uncertainties (Type A from observations, Type B from stated distributions), a measurement
 * model, the combined and expanded uncertainty with effective degrees of freedom, the budget as
 * a table, and the Monte Carlo propagation of JCGM 101:2008 as a cross-check.
 */
package org.strainmath.uncertainty;
