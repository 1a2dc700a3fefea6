/**
 * JMH benchmarks of the calculation core, the sheet validation and the stamp path. Built and run
 * only with the Maven profile {@code jmh} (see src/bench/jmh.sh); never part of {@code mvn verify}.
 * Inputs are our own example numbers, held in {@code @State} fields so that nothing is constant
 * folded; every result goes back to JMH so that nothing is eliminated.
 */
package utdigit.bench;
