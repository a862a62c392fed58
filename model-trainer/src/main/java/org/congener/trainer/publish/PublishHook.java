package org.congener.trainer.publish;

/**
 * Called by the publisher after each record it sends inside a transaction; lets a test stop a publish
 * half-way (by throwing) to check that the live version is left as it was.
 */
@FunctionalInterface
public interface PublishHook {
    PublishHook NONE = sent -> { };

    void afterRecord(int sent);
}
