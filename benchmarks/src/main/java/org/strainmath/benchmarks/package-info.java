/**
 * JMH benchmarks of the strainmath kernels. Each kernel stands beside its arithmetic floor and
 * the per-sample value-object path a user would otherwise write, measured in the same run.
 * Build with {@code mvn -B -pl benchmarks -am package -DskipTests}; run with
 * {@code java -jar benchmarks/target/benchmarks.jar}.
 */
package org.strainmath.benchmarks;
