/** Ranking metrics over top-k lists, AUC, and bootstrap confidence intervals over researchers. */
package org.congener.core.metrics;
