/** Checks a topic value against its JSON Schema and names each broken rule with its JSON pointer. */
package org.congener.schemas.validation;
