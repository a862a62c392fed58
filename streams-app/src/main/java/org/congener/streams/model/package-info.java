/** Published model versions assembled into immutable live snapshots; no Kafka import here. */
package org.congener.streams.model;
