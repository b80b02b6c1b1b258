/**
 * Material constitutive conversion: isotropic linear elasticity from any two elastic
 * constants, in-plane strain and stress states with their transformation and Mohr's circle,
 * Hooke's law in plane stress and plane strain, free thermal strain, and the orthotropic lamina
 * in plane stress (reduced stiffness Q and its transformed form Q̄).
 *
 * <p>Units: moduli and stresses in pascals (shown as MPa or GPa), strains in m/m (shown as
 * µε), engineering shear strain γxy = 2·εxy, angles counter-clockwise from the x axis.
 *
 * <p>No table of named materials is built in: elastic constants vary with alloy, temper and
 * product form, and a wrong preset is a silent error. Enter the constants from the data sheet
 * or the material certificate of the part at hand.
 */
package org.strainmath.material;
