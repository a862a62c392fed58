/** Wire contracts of every Congener topic: value records, their JSON Schemas, serdes and validation. */
package org.congener.schemas;
