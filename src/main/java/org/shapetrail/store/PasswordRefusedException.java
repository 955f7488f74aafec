package org.shapetrail.store;

/** A server refused the password, or wanted one and got none: the window then asks for it. */
public final class PasswordRefusedException extends StoreException {
    public PasswordRefusedException(String message, Throwable cause) {
        super(message, cause);
    }
}
