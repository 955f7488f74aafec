package org.shapetrail.app;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.shapetrail.history.AnalysisSettings;
import org.shapetrail.store.demo.DemoAcademy;

class WorkbenchViewModelTest {
    @TempDir
    Path dir;

    DirectTaskRunner runner = new DirectTaskRunner();
    WorkbenchViewModel vm = new WorkbenchViewModel(runner);

    @BeforeEach
    void open() throws Exception {
        Path f = dir.resolve("demo.sqlite");
        DemoAcademy.generate(f);
        vm.open(f);
    }

    @Test
    void aNewFileStartsEmptyAndAnExistingOneIsNeverOverwritten() throws Exception {
        Path fresh = dir.resolve("our-academy.sqlite");
        vm.createAndOpen(fresh);
        assertEquals("", vm.errorProperty().get());
        assertEquals(0, vm.rows().size());
        assertEquals(fresh, vm.loadedProperty().get().source().file().orElseThrow());
        Path demo = dir.resolve("demo.sqlite");
        long size = java.nio.file.Files.size(demo);
        vm.createAndOpen(demo);
        assertEquals("The file demo.sqlite already exists; choose a new name, or open it with Open file….",
                vm.errorProperty().get());
        assertEquals(fresh, vm.loadedProperty().get().source().file().orElseThrow(), "the open file stays open");
        assertEquals(size, java.nio.file.Files.size(demo));
    }

    @Test
    void listsEveryoneAndFiltersAsYouType() {
        assertEquals(60, /* the demo academy: 40 juniors + 20 seniors */ vm.rows().size());
        vm.searchProperty().set("zoe");
        assertEquals(1, vm.rows().size());
        assertEquals("Zoë Greyling", vm.rows().get(0).name());
    }

    @Test
    void rapidGrowthFilterKeepsOnlyAlertedJuniors() {
        vm.rapidOnlyProperty().set(true);
        assertTrue(vm.rows().stream().allMatch(PersonRow::rapidGrowth));
        assertTrue(vm.rows().size() >= 1);
    }

    @Test
    void squadFilterKeepsItsCurrentMembers() {
        vm.squadProperty().set("Senior squad");
        // 20 seniors, one of whom left the squad on 2026-02-20 (demo database)
        assertEquals(19, vm.rows().size());
    }

    @Test
    void aCancelledRecomputationKeepsTheEarlierResults() {
        var before = vm.loadedProperty().get();
        runner.cancelAfterUpdates(5);
        vm.recompute(AnalysisSettings.standard());
        assertTrue(before == vm.loadedProperty().get(), "the earlier results are still shown");
        assertEquals("Recomputing was cancelled; the earlier results stay.", vm.statusProperty().get());
    }

    @Test
    void aMissingFileIsReportedByItsPathAndNothingIsCreated() {
        java.nio.file.Path missing = dir.resolve("no-such-folder").resolve("y.sqlite");
        vm.open(missing);
        assertEquals("There is no Shapetrail file at " + missing.toAbsolutePath() + " (the folder "
                + missing.toAbsolutePath().getParent() + " does not exist); check the path. Nothing was created: to"
                + " start a new file, use New file… in the app.", vm.errorProperty().get());
        assertEquals(60, vm.rows().size(), "the open file stays open");
        assertTrue(!java.nio.file.Files.exists(missing.getParent()));
    }
}
