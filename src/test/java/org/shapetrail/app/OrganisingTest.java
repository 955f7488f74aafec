package org.shapetrail.app;

import org.shapetrail.store.RecordSource;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.time.LocalDate;
import java.util.List;
import java.util.Optional;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.shapetrail.measure.Sex;
import org.shapetrail.store.ContentDigest;
import org.shapetrail.store.Database;
import org.shapetrail.store.Membership;
import org.shapetrail.store.Person;
import org.shapetrail.store.Squad;

class OrganisingTest {
    @TempDir
    Path dir;

    @Test
    void aNewFileGetsItsMeasurerAndSquadsAndNamesAreNotRepeated() {
        Path file = dir.resolve("new.sqlite");
        Database.open(file).close(); // New file… creates it
        assertEquals(Optional.empty(), Organising.addMeasurer(RecordSource.of(file), " Ida Marram ", "ISAK level 2"));
        assertEquals(Optional.of("There is already a measurer called ida marram in this file."),
                Organising.addMeasurer(RecordSource.of(file), "ida marram", ""));
        assertEquals(Optional.of("The measurer needs a name."), Organising.addMeasurer(RecordSource.of(file), "  ", ""));
        assertEquals(Optional.empty(), Organising.addSquad(RecordSource.of(file), "Under-14"));
        assertEquals(Optional.of("There is already a squad called UNDER-14 in this file."),
                Organising.addSquad(RecordSource.of(file), "UNDER-14"));
        try (Database db = Database.open(file)) {
            assertEquals("Ida Marram", db.inTransaction(tx -> tx.measurers().all()).get(0).name());
            assertEquals(List.of("Under-14"), db.inTransaction(tx -> tx.squads().all()).stream().map(Squad::name).toList());
        }
    }

    @Test
    void movingToAnotherSquadEndsTheOpenMembershipTheDayBefore() {
        Path file = dir.resolve("move.sqlite");
        Database.open(file).close();
        Organising.addSquad(RecordSource.of(file), "Under-14");
        Organising.addSquad(RecordSource.of(file), "Under-15");
        long person;
        Squad u14;
        Squad u15;
        try (Database db = Database.open(file)) {
            person = db.inTransaction(tx -> tx.people().insert(Person.draft("Tamsin Reedbed", Sex.FEMALE,
                    LocalDate.of(2011, 5, 6))).id());
            List<Squad> squads = db.inTransaction(tx -> tx.squads().all());
            u14 = squads.get(0);
            u15 = squads.get(1);
            db.inTransaction(tx -> {
                tx.squads().addMember(new Membership(person, u14.id(), LocalDate.of(2024, 9, 1), null));
                return null;
            });
        }
        assertEquals(Optional.empty(), Organising.moveToSquad(RecordSource.of(file), person, u15, LocalDate.of(2025, 9, 1)));
        try (Database db = Database.open(file)) {
            assertEquals(List.of(new Membership(person, u14.id(), LocalDate.of(2024, 9, 1), LocalDate.of(2025, 8, 31)),
                    new Membership(person, u15.id(), LocalDate.of(2025, 9, 1), null)),
                    db.inTransaction(tx -> tx.squads().membershipsOf(person)));
        }
        String before;
        try (Database db = Database.open(file)) {
            before = ContentDigest.of(db);
        }
        assertEquals(Optional.of("The person is already in Under-15."),
                Organising.moveToSquad(RecordSource.of(file), person, u15, LocalDate.of(2026, 1, 1)));
        assertTrue(Organising.moveToSquad(RecordSource.of(file), person, u14, LocalDate.of(2025, 9, 1)).orElseThrow()
                .startsWith("A membership starting on 2025-09-01 is already recorded"));
        try (Database db = Database.open(file)) {
            assertEquals(before, ContentDigest.of(db), "a refused move writes nothing");
        }
        assertTrue(Organising.leave(RecordSource.of(file), person, LocalDate.of(2025, 6, 30)).orElseThrow()
                .startsWith("A membership starting on 2025-09-01 is recorded"));
        assertEquals(Optional.empty(), Organising.leave(RecordSource.of(file), person, LocalDate.of(2026, 7, 31)));
        try (Database db = Database.open(file)) {
            assertEquals(new Membership(person, u15.id(), LocalDate.of(2025, 9, 1), LocalDate.of(2026, 7, 31)),
                    db.inTransaction(tx -> tx.squads().membershipsOf(person)).get(1));
        }
        assertEquals(Optional.of("The person is in no squad on 2026-08-01."),
                Organising.leave(RecordSource.of(file), person, LocalDate.of(2026, 8, 1)));
    }
}
