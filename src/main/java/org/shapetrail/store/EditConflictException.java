package org.shapetrail.store;

/**
 * A save refused because someone else saved the same visit after this person began to edit it. Nothing
 * was overwritten; the message names who and when, and the caller offers to reload.
 */
public final class EditConflictException extends StoreException {
    private final RowStamp seen;
    private final RowStamp now;

    EditConflictException(RowStamp seen, RowStamp now) {
        super(now == null ? org.shapetrail.i18n.Messages.tr("conflict.deleted")
                : org.shapetrail.i18n.Messages.tr("conflict.changed", now.changedBy().isBlank()
                        ? org.shapetrail.i18n.Messages.tr("conflict.someone") : now.changedBy(), now.changedAt().isBlank()
                        ? "" : org.shapetrail.i18n.Messages.tr("conflict.at", now.changedAt().replace('T', ' ')
                        .replace("Z", " UTC"))));
        this.seen = seen;
        this.now = now;
    }

    /** The stamp the refused save brought. */
    public RowStamp seen() {
        return seen;
    }

    /** The stored stamp now, or null when the visit is gone. */
    public RowStamp now() {
        return now;
    }
}
