/** End-to-end harness of the streams app through a real embedded broker. */
package org.congener.bench.streams;
