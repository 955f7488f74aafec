package org.shapetrail.store;

/** Another program holds the database file's write lock for longer than the busy timeout. */
public final class FileBusyException extends StoreException {
    public FileBusyException(String file, Throwable cause) {
        super(org.shapetrail.i18n.Messages.tr("store.busy", file), cause);
    }
}
