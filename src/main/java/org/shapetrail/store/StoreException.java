package org.shapetrail.store;

import org.shapetrail.ShapetrailException;

/** A failure of the database file, worded for a person; wraps {@link java.sql.SQLException} at the store's edge. */
public class StoreException extends ShapetrailException {
    public StoreException(String message, Throwable cause) {
        super(message, cause);
    }

    public StoreException(String message) {
        super(message);
    }
}
