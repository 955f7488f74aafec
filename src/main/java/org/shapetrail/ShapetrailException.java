package org.shapetrail;

/** The one unchecked exception root of the project: every failure a caller may show a person derives from it. */
public class ShapetrailException extends RuntimeException {
    public ShapetrailException(String message) {
        super(message);
    }

    public ShapetrailException(String message, Throwable cause) {
        super(message, cause);
    }
}
