/** A real single-node Kafka broker in KRaft mode, started in-process on 127.0.0.1. */
package org.congener.broker;
