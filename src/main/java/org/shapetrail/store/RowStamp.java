package org.shapetrail.store;

/**
 * What a person saw of a visit when they began to edit it: its row version, and who changed it last and
 * when (empty for a visit never changed since it was entered). A save that brings a stamp older than the
 * stored one is refused ({@link EditConflictException}), so that nobody's change is overwritten unseen.
 */
public record RowStamp(long visitId, int version, String changedBy, String changedAt) {
}
