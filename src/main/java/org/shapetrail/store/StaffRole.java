package org.shapetrail.store;

import java.util.Locale;
import java.util.Optional;

/**
 * What a staff account on a server may do; each is a PostgreSQL group role whose grants and row-level
 * rules the server enforces (postgresql/V8__audit_trail.sql), whatever program connects. A file has no
 * accounts: its one user is an administrator.
 */
public enum StaffRole {
    /** Enters visits, and edits and deletes the visits they entered. */
    MEASURER("measurer", "shapetrail_measurer"),
    /** Reads everything, makes training blocks and writes letters. */
    COACH("coach", "shapetrail_coach"),
    /** People, squads, measurers, accounts and erasure, and everything a measurer and a coach may do. */
    ADMINISTRATOR("administrator", "shapetrail_admin");

    private final String word;
    private final String serverRole;

    StaffRole(String word, String serverRole) {
        this.word = word;
        this.serverRole = serverRole;
    }

    /** The word a person reads and types: measurer, coach, administrator. */
    public String word() {
        return word;
    }

    /** The PostgreSQL group role. */
    /** The role's name in the reader's language (the word typed stays {@link #word}). */
    public String shown() {
        return org.shapetrail.i18n.Messages.tr("role." + word);
    }

    public String serverRole() {
        return serverRole;
    }

    public static Optional<StaffRole> byWord(String w) {
        for (StaffRole r : values()) {
            if (r.word.equals(w.strip().toLowerCase(Locale.ROOT)) || r.serverRole.equals(w.strip())) {
                return Optional.of(r);
            }
        }
        return Optional.empty();
    }

    /** Whether this role may enter visits and edit its own. */
    public boolean entersVisits() {
        return this == MEASURER || this == ADMINISTRATOR;
    }

    /** Whether this role may make and change training blocks. */
    public boolean managesBlocks() {
        return this == COACH || this == ADMINISTRATOR;
    }

    /** Whether this role may add and change people, squads, measurers and accounts, and erase. */
    public boolean administers() {
        return this == ADMINISTRATOR;
    }
}
