package org.strainmath.uncertainty;

/**
 * The probability distribution assigned to an input quantity, which the Monte Carlo
 * propagation samples (JCGM 101:2008, 6.4) and from which a Type B standard uncertainty
 * follows (JCGM 100:2008, 4.3).
 */
public enum Distribution {

    /** Gaussian, standard deviation u. */
    NORMAL,
    /** Uniform over estimate ± a: u = a/√3 (GUM 4.3.7). */
    RECTANGULAR,
    /** Triangular (symmetric) over estimate ± a: u = a/√6 (GUM 4.3.9). */
    TRIANGULAR,
    /** U-shaped (arcsine) over estimate ± a: u = a/√2 (e.g. a sinusoid's amplitude; JCGM 101, 6.4.6). */
    U_SHAPED,
    /**
     * Scaled and shifted Student t with n − 1 degrees of freedom, for the mean of n
     * observations (Type A; JCGM 101, 6.4.9).
     */
    STUDENT_T
}
