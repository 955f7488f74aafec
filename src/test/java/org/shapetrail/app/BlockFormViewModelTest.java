package org.shapetrail.app;

import org.shapetrail.store.RecordSource;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.time.LocalDate;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.shapetrail.history.AnalysisSettings;
import org.shapetrail.history.BlockReview;
import org.shapetrail.history.VisitResult;
import org.shapetrail.store.ContentDigest;
import org.shapetrail.store.Database;
import org.shapetrail.store.Squad;
import org.shapetrail.store.TrainingBlock;
import org.shapetrail.store.demo.DemoAcademy;

/** Making and changing a training block in the app's form: defaults, choices, refusals, the saved block. */
class BlockFormViewModelTest {
    @TempDir
    Path dir;
    Path file;
    Loaded loaded;
    Squad u18;

    @BeforeEach
    void open() throws Exception {
        file = dir.resolve("demo.sqlite");
        DemoAcademy.generate(file);
        loaded = WorkbenchViewModel.load(RecordSource.of(file), AnalysisSettings.standard(), new TaskRunner.Progress() {
            @Override
            public void update(double done, double total, String message) {
            }

            @Override
            public boolean isCancelled() {
                return false;
            }
        });
        u18 = loaded.builder().academy().squads().stream().filter(s -> s.name().equals("Football U18")).findFirst()
                .orElseThrow();
    }

    BlockFormViewModel form() {
        BlockFormViewModel vm = new BlockFormViewModel(loaded, u18, null);
        vm.nameProperty().set("U18 pre-season block");
        // between two of the juniors' usual measuring days, 2025-06-04 and 2025-09-17 (sample-db/README.md)
        vm.startProperty().set(LocalDate.of(2025, 6, 9));
        vm.endProperty().set(LocalDate.of(2025, 9, 12));
        return vm;
    }

    @Test
    void eachMemberStartsWithTheLatestVisitUpToTheStartAndTheEarliestFromTheEnd() {
        BlockFormViewModel vm = form();
        assertFalse(vm.members().isEmpty());
        for (BlockFormViewModel.Member m : vm.members()) {
            VisitResult before = m.beforeProperty().get();
            VisitResult after = m.afterProperty().get();
            if (before != null) {
                long days = java.time.temporal.ChronoUnit.DAYS.between(before.visit().measuredAt().toLocalDate(),
                        vm.startProperty().get());
                assertTrue(days >= 0 && days <= BlockReview.DEFAULT_WINDOW_DAYS, m.person().displayName() + " " + days);
            }
            if (after != null) {
                long days = java.time.temporal.ChronoUnit.DAYS.between(vm.endProperty().get(),
                        after.visit().measuredAt().toLocalDate());
                assertTrue(days >= 0 && days <= BlockReview.DEFAULT_WINDOW_DAYS, m.person().displayName() + " " + days);
            }
        }
        assertEquals(List.of(), vm.problems());
        assertTrue(vm.canSaveProperty().get());
    }

    @Test
    void aSavedBlockKeepsOnlyTheChosenVisitsAndReviewsWithThem() {
        BlockFormViewModel vm = form();
        BlockFormViewModel.Member m = vm.members().stream().filter(x -> x.rated().size() >= 3
                && x.beforeProperty().get() != null).findFirst().orElseThrow();
        VisitResult earlier = m.rated().get(0);
        m.beforeProperty().set(earlier);
        TrainingBlock saved = vm.save().orElseThrow();
        assertEquals(Map.of(m.person().id(), new TrainingBlock.Pick(earlier.visit().id(),
                m.afterProperty().get().visit().id())), saved.picks());
        try (Database db = Database.open(file)) {
            TrainingBlock stored = db.inTransaction(tx -> tx.blocks().find(saved.id())).orElseThrow();
            assertEquals(saved, stored);
        }
        var review = BlockReview.of(loaded.builder(), saved, BlockReview.DEFAULT_WINDOW_DAYS);
        var athlete = review.athletes().stream().filter(a -> a.person().id() == m.person().id()).findFirst()
                .orElseThrow();
        assertEquals(earlier.visit().id(), athlete.before().visit().id());
    }

    @Test
    void aTakenNameBackwardsDatesOrABeforeAfterTheAfterAreRefusedAndNothingIsWritten() throws Exception {
        String before;
        try (Database db = Database.open(file)) {
            before = ContentDigest.of(db);
        }
        BlockFormViewModel vm = form();
        vm.nameProperty().set(" winter STRENGTH block ");
        assertTrue(vm.problems().contains("There is already a training block called winter STRENGTH block; give this"
                + " one another name."), vm.problems().toString());
        vm.nameProperty().set("New name");
        vm.endProperty().set(LocalDate.of(2025, 6, 1));
        assertTrue(vm.problems().contains("The last day (2025-06-01) is before the first day (2025-06-09)."),
                vm.problems().toString());
        vm.endProperty().set(LocalDate.of(2025, 9, 12));
        BlockFormViewModel.Member m = vm.members().stream().filter(x -> x.afterProperty().get() != null).findFirst()
                .orElseThrow();
        VisitResult after = m.afterProperty().get();
        m.afterProperty().set(m.beforeProperty().get());
        m.beforeProperty().set(after);
        assertTrue(vm.problems().stream().anyMatch(p -> p.startsWith(m.person().displayName() + ": the before visit")),
                vm.problems().toString());
        assertFalse(vm.canSaveProperty().get());
        assertTrue(vm.save().isEmpty());
        try (Database db = Database.open(file)) {
            assertEquals(before, ContentDigest.of(db));
        }
    }

    @Test
    void editingABlockKeepsItsChosenVisitsAndChangesItsDays() {
        TrainingBlock winter = loaded.builder().academy().blocks().stream()
                .filter(b -> b.name().equals(DemoAcademy.BLOCK_NAME)).findFirst().orElseThrow();
        Squad seniors = loaded.builder().academy().squad(winter.squadId()).orElseThrow();
        BlockFormViewModel vm = new BlockFormViewModel(loaded, seniors, winter);
        assertEquals(winter.aim(), vm.aimProperty().get());
        vm.endProperty().set(LocalDate.of(2026, 3, 21));
        TrainingBlock saved = vm.save().orElseThrow();
        assertEquals(winter.id(), saved.id());
        assertEquals(LocalDate.of(2026, 3, 21), saved.endsOn());
    }
}
