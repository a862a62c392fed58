package org.congener.streams.processor;

/**
 * What the pending-lists store keeps for a researcher whose list is begun but not published: the
 * latest such event's id, its time and its record timestamp, as {@code timestamp at eventId} (the id
 * last, so it may hold spaces).
 */
record PendingMark(String eventId, long atEpochMs, long timestamp) {

    static String of(String eventId, long atEpochMs, long timestamp) {
        return timestamp + " " + atEpochMs + " " + eventId;
    }

    static PendingMark parse(String mark) {
        int first = mark.indexOf(' ');
        int second = mark.indexOf(' ', first + 1);
        if (first < 0 || second < 0) {
            throw new IllegalArgumentException("not a pending mark: " + mark);
        }
        return new PendingMark(mark.substring(second + 1), Long.parseLong(mark.substring(first + 1, second)),
                Long.parseLong(mark.substring(0, first)));
    }
}
