/** The Kafka Streams topology, its state stores and the query API. */
package org.congener.streams;
