package org.shapetrail.store;

/** Another program holds the database file's write lock for longer than the busy timeout. */
public final class FileBusyException extends StoreException {
    public FileBusyException(String file, Throwable cause) {
        super("The file " + file + " is busy: another program is writing to it. Nothing was saved; try again in a"
                + " moment.", cause);
    }
}
