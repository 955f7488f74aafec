package org.shapetrail.app;

import org.shapetrail.store.RecordSource;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.time.LocalDate;
import java.util.List;
import java.util.Locale;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.shapetrail.measure.Sex;
import org.shapetrail.store.Database;

class PersonFormViewModelTest {
    @TempDir
    Path dir;

    @Test
    void everyProblemIsListedAndNothingIsSavedUntilTheyAreGone() {
        Path f = dir.resolve("p.sqlite");
        org.shapetrail.store.Squad squad;
        try (Database db = Database.open(f)) {
            squad = db.inTransaction(tx -> tx.squads().insert("Rowing juniors"));
        }
        PersonFormViewModel vm = new PersonFormViewModel(RecordSource.of(f), List.of(squad), Locale.UK, null);
        assertEquals(List.of("Enter the person's name.", "Choose the sex recorded for the growth equations.",
                "Enter the date of birth."), vm.problems);
        vm.name.set("Ada Pelling");
        vm.sex.set(Sex.FEMALE);
        vm.birth.set(LocalDate.of(2011, 5, 6));
        vm.father.set("1.82");
        assertEquals(List.of("Father's stature 1.82 looks like metres; enter it in cm, e.g. 182.0."), vm.problems);
        assertFalse(vm.canSave.get());
        vm.father.set("182.0");
        vm.predicted.set("171.5");
        vm.squad.set(squad);
        vm.letterLanguage.set("pt"); // the family reads Portuguese
        assertTrue(vm.canSave.get());
        var saved = vm.save().orElseThrow();
        try (Database db = Database.open(f)) {
            assertEquals(saved, db.inTransaction(tx -> tx.people().find(saved.id())).orElseThrow());
            assertEquals(1, db.inTransaction(tx -> tx.squads().membershipsOf(saved.id())).size());
        }
        assertEquals(171.5, saved.predictedAdultStatureCm());
        assertEquals("pt", saved.letterLanguage()); // and stored with the person (the equality above reads it back)
    }
}
