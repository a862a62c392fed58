/** Benchmarks of the factorisation code: fold-in latency (JMH) and the ALS fit beside Spark MLlib. */
package org.congener.bench.factorisation;
