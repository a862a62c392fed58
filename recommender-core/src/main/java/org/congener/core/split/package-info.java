/** Held-out splits of interaction logs: per-researcher time split and seeded leave-k-out. */
package org.congener.core.split;
