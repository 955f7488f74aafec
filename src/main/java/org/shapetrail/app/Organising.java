package org.shapetrail.app;

import static org.shapetrail.i18n.Messages.tr;

import org.shapetrail.store.RecordSource;
import java.time.LocalDate;
import java.util.Locale;
import java.util.Optional;
import org.shapetrail.store.Database;
import org.shapetrail.store.Membership;
import org.shapetrail.store.Squad;

/**
 * The small organising changes of a file: a new measurer, a new squad, a person moving to another squad
 * from a date. Each is checked first and written in one transaction; a refusal is a sentence naming the
 * value and what to do, and nothing is written.
 */
final class Organising {
    private Organising() {
    }

    /** The outcome: empty when done, else why nothing was written. */
    static Optional<String> addMeasurer(RecordSource file, String name, String accreditation) {
        String n = name == null ? "" : name.strip();
        if (n.isEmpty()) {
            return Optional.of(tr("organise.measurerName"));
        }
        try (Database db = file.open()) {
            return db.inTransaction(tx -> {
                if (tx.measurers().all().stream().anyMatch(m -> same(m.name(), n))) {
                    return Optional.of(tr("organise.measurerTaken", n));
                }
                tx.measurers().insert(n, accreditation == null ? "" : accreditation.strip());
                return Optional.<String>empty();
            });
        }
    }

    static Optional<String> addSquad(RecordSource file, String name) {
        String n = name == null ? "" : name.strip();
        if (n.isEmpty()) {
            return Optional.of(tr("organise.squadName"));
        }
        try (Database db = file.open()) {
            return db.inTransaction(tx -> {
                if (tx.squads().all().stream().anyMatch(s -> same(s.name(), n))) {
                    return Optional.of(tr("organise.squadTaken", n));
                }
                tx.squads().insert(n);
                return Optional.<String>empty();
            });
        }
    }

    /**
     * Moves a person to {@code squad} from {@code from}: every membership still open on that day ends the
     * day before (a membership that would only start on or after it is refused, as it would overlap).
     */
    static Optional<String> moveToSquad(RecordSource file, long personId, Squad squad, LocalDate from) {
        if (squad == null) {
            return Optional.of(tr("organise.chooseSquad"));
        }
        if (from == null) {
            return Optional.of(tr("organise.chooseDay", squad.name()));
        }
        try (Database db = file.open()) {
            return db.inTransaction(tx -> {
                java.util.List<Membership> open = tx.squads().membershipsOf(personId).stream()
                        .filter(m -> m.leftOn() == null || !m.leftOn().isBefore(from)).toList();
                for (Membership m : open) { // every refusal before anything is written
                    if (!m.joinedOn().isBefore(from)) {
                        return Optional.of(tr("organise.afterStart", m.joinedOn()));
                    }
                    if (m.squadId() == squad.id() && m.leftOn() == null) {
                        return Optional.of(tr("organise.already", squad.name()));
                    }
                }
                for (Membership m : open) {
                    tx.squads().endMembership(m, from.minusDays(1));
                }
                tx.squads().addMember(new Membership(personId, squad.id(), from, null));
                return Optional.<String>empty();
            });
        }
    }

    /**
     * Ends every membership of a person still open on {@code lastDay} with that day, when they leave the
     * academy (or the squads it keeps); their visits stay.
     */
    static Optional<String> leave(RecordSource file, long personId, LocalDate lastDay) {
        if (lastDay == null) {
            return Optional.of(tr("organise.chooseLast"));
        }
        try (Database db = file.open()) {
            return db.inTransaction(tx -> {
                java.util.List<Membership> open = tx.squads().membershipsOf(personId).stream()
                        .filter(m -> m.leftOn() == null || m.leftOn().isAfter(lastDay)).toList();
                if (open.isEmpty()) {
                    return Optional.of(tr("organise.noSquadOn", lastDay));
                }
                for (Membership m : open) {
                    if (lastDay.isBefore(m.joinedOn())) {
                        return Optional.of(tr("organise.lastBeforeStart", m.joinedOn()));
                    }
                }
                for (Membership m : open) {
                    tx.squads().endMembership(m, lastDay);
                }
                return Optional.<String>empty();
            });
        }
    }

    private static boolean same(String a, String b) {
        return a.strip().toLowerCase(Locale.ROOT).equals(b.strip().toLowerCase(Locale.ROOT));
    }
}
