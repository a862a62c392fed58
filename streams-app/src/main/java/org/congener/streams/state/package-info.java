/** Per-researcher and per-group state kept in RocksDB, in a compact binary form (no JSON in stores). */
package org.congener.streams.state;
