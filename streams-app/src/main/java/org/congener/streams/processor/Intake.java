package org.congener.streams.processor;

import org.congener.schemas.DeadLetter;
import org.congener.schemas.UsageEvent;

/** The outcome of reading one raw usage event: an accepted event or its dead letter (never both). */
public record Intake(UsageEvent event, DeadLetter deadLetter) {

    public static Intake accepted(UsageEvent event) {
        return new Intake(event, null);
    }

    public static Intake rejected(DeadLetter deadLetter) {
        return new Intake(null, deadLetter);
    }

    public boolean isAccepted() {
        return event != null;
    }
}
