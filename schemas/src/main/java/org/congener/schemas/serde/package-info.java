/** Kafka serdes that write topic values as JSON and accept on read only what their schema allows. */
package org.congener.schemas.serde;
