package org.congener.streams.serde;

/** A topic value could not be parsed or failed validation; {@link #reason()} goes into the dead letter. */
public final class RecordRejectedException extends RuntimeException {

    public RecordRejectedException(String reason) {
        super(reason);
    }

    public RecordRejectedException(String reason, Throwable cause) {
        super(reason, cause);
    }

    public String reason() {
        return getMessage();
    }
}
