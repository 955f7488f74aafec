package org.shapetrail.app;

import java.util.Map;
import java.util.Optional;
import org.shapetrail.history.HistoryBuilder;
import org.shapetrail.history.PersonHistory;
import org.shapetrail.store.RecordSource;
import org.shapetrail.store.StaffRole;

/**
 * A record as the workbench holds it once read: where it lives, its analyses, every person's computed
 * history, and what the person at this desk may do there (everything on a file; their account's role
 * on a server; empty for a login without one of the three roles, which only reads).
 */
public record Loaded(RecordSource source, HistoryBuilder builder, Map<Long, PersonHistory> histories,
        Optional<StaffRole> role, String actor) {
    /** For a server: who is signed in and as what, e.g. "ana (measurer)"; empty for a file. */
    public String account() {
        if (source.file().isPresent()) {
            return "";
        }
        return actor + " (" + role.map(StaffRole::shown).orElse(org.shapetrail.i18n.Messages.tr("role.reading")) + ")";
    }

    /** Whether this desk may enter visits and edit its own. */
    public boolean entersVisits() {
        return role.map(StaffRole::entersVisits).orElse(false);
    }

    /** Whether this desk may make and change training blocks. */
    public boolean managesBlocks() {
        return role.map(StaffRole::managesBlocks).orElse(false);
    }

    /** Whether this desk may add and change people, squads and measurers. */
    public boolean administers() {
        return role.map(StaffRole::administers).orElse(false);
    }
}
