package org.shapetrail.letters;

import org.shapetrail.ShapetrailException;

/** A letter that cannot be set faithfully (characters its fonts lack); nothing of it is written. */
public final class UnwritableLetterException extends ShapetrailException {
    public UnwritableLetterException(String message) {
        super(message);
    }
}
