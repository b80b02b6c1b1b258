/**
 * The demo scenario of the README and the guide, runnable with
 * {@code mvn -B -q -Pdemo -DskipTests -pl docs -am verify}. Invented data only.
 */
package org.strainmath.docs;
