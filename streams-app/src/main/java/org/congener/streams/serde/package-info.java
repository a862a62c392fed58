/** Which serde reads and writes each topic, and how a rejected record is reported. */
package org.congener.streams.serde;
