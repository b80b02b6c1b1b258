/**
 * Internals of strainmath core, not exported: the one place where arguments are checked
 * ({@link org.strainmath.internal.Checks}) and numbers are formatted for people
 * ({@link org.strainmath.internal.Format}).
 */
package org.strainmath.internal;
