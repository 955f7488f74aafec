package org.shapetrail.history;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.stream.Collectors;
import org.shapetrail.store.Database;
import org.shapetrail.store.Measurer;
import org.shapetrail.store.Membership;
import org.shapetrail.store.Person;
import org.shapetrail.store.Squad;
import org.shapetrail.store.TrainingBlock;
import org.shapetrail.store.Visit;
import org.shapetrail.store.VisitRating;

/**
 * A snapshot of one Shapetrail file, read in one transaction: everything the analyses need, as plain
 * records. The views, the command line and the letters all start from one.
 */
public record Academy(List<Person> people, List<Measurer> measurers, List<Squad> squads,
                      List<Membership> memberships, List<Visit> visits, Map<Long, VisitRating> raterRatings,
                      List<TrainingBlock> blocks) {
    public Academy {
        people = List.copyOf(people);
        measurers = List.copyOf(measurers);
        squads = List.copyOf(squads);
        memberships = List.copyOf(memberships);
        visits = List.copyOf(visits);
        raterRatings = Map.copyOf(raterRatings);
        blocks = List.copyOf(blocks);
    }

    /** Reads the whole file. */
    public static Academy load(Database db) {
        return db.inTransaction(tx -> new Academy(tx.people().all(), tx.measurers().all(), tx.squads().all(),
                tx.squads().memberships(), tx.visits().all(), tx.visits().ratings(), tx.blocks().all()));
    }

    public Optional<Person> person(long id) {
        return people.stream().filter(p -> p.id() == id).findFirst();
    }

    public Measurer measurer(long id) {
        return measurers.stream().filter(m -> m.id() == id).findFirst()
                .orElseThrow(() -> new IllegalStateException("no measurer " + id));
    }

    public Optional<Squad> squad(long id) {
        return squads.stream().filter(s -> s.id() == id).findFirst();
    }

    /** Visits by person id, each list in time order. */
    public Map<Long, List<Visit>> visitsByPerson() {
        return visits.stream().collect(Collectors.groupingBy(Visit::personId, LinkedHashMap::new, Collectors.toList()));
    }

    /** The visits of one person in time order. */
    public List<Visit> visitsOf(long personId) {
        return visits.stream().filter(v -> v.personId() == personId).toList();
    }

    /** Ids of the people who belonged to the squad on {@code day}. */
    public List<Long> membersOn(long squadId, java.time.LocalDate day) {
        return memberships.stream().filter(m -> m.squadId() == squadId && m.covers(day)).map(Membership::personId)
                .distinct().toList();
    }

    /** Ids of the people who belonged to the squad at any time. */
    public List<Long> membersOf(long squadId) {
        return memberships.stream().filter(m -> m.squadId() == squadId).map(Membership::personId).distinct().toList();
    }
}
