package org.congener.core.interactions;

/**
 * One aggregated researcher–compound cell before it enters a matrix: the summed strength and the
 * time of the latest event (epoch milliseconds), which the time split orders by.
 */
public record Interaction(int user, int item, double strength, long lastTimeMillis) {
}
