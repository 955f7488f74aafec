package org.shapetrail.store;

/**
 * A save refused because someone else saved the same visit after this person began to edit it. Nothing
 * was overwritten; the message names who and when, and the caller offers to reload.
 */
public final class EditConflictException extends StoreException {
    private final RowStamp seen;
    private final RowStamp now;

    EditConflictException(RowStamp seen, RowStamp now) {
        super(now == null
                ? "This visit was deleted by someone else while you were editing it; nothing was saved. Reload to see"
                        + " the person's visits as they are now; what you typed is still in the form."
                : "This visit was changed by " + (now.changedBy().isBlank() ? "someone else" : now.changedBy())
                        + (now.changedAt().isBlank() ? "" : " at " + now.changedAt().replace('T', ' ').replace("Z", " UTC"))
                        + " while you were editing it, so your save was refused and nothing was overwritten. Reload to"
                        + " see their change, then make yours again; what you typed is still in the form.");
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
