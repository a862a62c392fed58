/** The query API over HTTP: latest suggestions per researcher and health, JSON, always with the safety caution. */
package org.congener.streams.api;
