/** From usage events to a sparse researcher × compound matrix of interaction strengths. */
package org.congener.core.interactions;
