package org.congener.schemas;

/** What a researcher did with a compound; each kind weighs differently in the interaction strength. */
public enum UsageKind {
    ORDER, WITHDRAWAL, USAGE_LOG, VIEW
}
