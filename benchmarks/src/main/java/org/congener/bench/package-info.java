/** JMH benchmarks of the hot paths. */
package org.congener.bench;
