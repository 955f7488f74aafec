package org.shapetrail.cli;

import java.time.LocalDate;
import java.util.ArrayList;
import java.util.List;
import org.shapetrail.history.Academy;
import org.shapetrail.history.HistoryBuilder;
import org.shapetrail.history.PersonHistory;
import org.shapetrail.store.Person;
import org.shapetrail.store.Squad;
import org.shapetrail.store.StoreException;
import picocli.CommandLine.Option;

/** Finding people and squads named on the command line, with messages that list what there is. */
final class Lookup {
    private Lookup() {
    }

    static Person person(Academy a, long id) {
        return a.person(id).orElseThrow(() -> new StoreException(org.shapetrail.i18n.Messages.tr(
                "cli.person.none", String.valueOf(id))));
    }

    static Squad squad(Academy a, String name) {
        return a.squads().stream().filter(q -> q.name().equalsIgnoreCase(name.strip())).findFirst()
                .orElseThrow(() -> new StoreException(org.shapetrail.i18n.Messages.tr("cli.squad.list", name,
                        String.join(", ", a.squads().stream().map(Squad::name).toList()))));
    }

    /** {@code --person ID} or {@code --squad NAME}, exactly one (an exclusive argument group). */
    static final class Who {
        @Option(names = "--person", paramLabel = "ID")
        Long person;

        @Option(names = "--squad", paramLabel = "NAME")
        String squad;

        /** The histories of the person, or of the squad's members on {@code day}. */
        List<PersonHistory> histories(Academy a, HistoryBuilder b, LocalDate day) {
            List<PersonHistory> out = new ArrayList<>();
            if (person != null) {
                out.add(b.history(Lookup.person(a, person)));
            } else {
                for (long id : a.membersOn(Lookup.squad(a, squad).id(), day)) {
                    out.add(b.history(a.person(id).orElseThrow()));
                }
            }
            return out;
        }
    }
}
