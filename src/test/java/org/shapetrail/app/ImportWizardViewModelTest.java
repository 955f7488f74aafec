package org.shapetrail.app;

import org.shapetrail.store.RecordSource;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.shapetrail.exchange.Column;
import org.shapetrail.measure.Site;
import org.shapetrail.store.Database;

class ImportWizardViewModelTest {
    @TempDir
    Path dir;

    @Test
    void suggestsTheMappingChecksWithoutWritingAndImportsOnlyWhenAllowed() throws Exception {
        Path db = dir.resolve("w.sqlite");
        Database.open(db).close();
        Path csv = dir.resolve("sheet.csv");
        Files.writeString(csv, "Name,DOB,Sex,Date,Tester,Height (cm),Shoe size\n"
                + "Ada Pelling,2010-03-04,F,2024-01-10,Ada Quarrington,150.2,36\n");
        ImportWizardViewModel vm = new ImportWizardViewModel(RecordSource.of(db), csv);
        assertEquals(Column.Role.NAME, vm.mapping().get(0).get().role());
        assertEquals(Site.STATURE, vm.mapping().get(5).get().site());
        assertEquals(Column.Role.IGNORED, vm.mapping().get(6).get().role());
        vm.dryRun();
        // new person and measurer not allowed yet: the row is rejected and Import stays off
        assertFalse(vm.canCommitProperty().get());
        assertTrue(vm.report().get(0).startsWith("line 2: rejected — Ada Pelling (born 2010-03-04) is not in the file"),
                vm.report().toString());
        vm.createMissingProperty().set(true);
        assertFalse(vm.canCommitProperty().get(), "a changed option asks for a new check");
        vm.dryRun(new DirectTaskRunner());
        assertTrue(vm.canCommitProperty().get(), vm.summaryProperty().get());
        try (Database d = Database.open(db)) {
            assertEquals(0, (int) d.inTransaction(tx -> tx.visits().count()), "the check wrote nothing");
        }
        boolean[] done = {false};
        vm.commit(new DirectTaskRunner(), () -> done[0] = true);
        assertTrue(done[0]);
        assertEquals("Imported 1 visit.", // one visit, in the singular (import.done's plural wording)
                vm.summaryProperty().get());
        try (Database d = Database.open(db)) {
            assertEquals(1, (int) d.inTransaction(tx -> tx.visits().count()));
        }
    }
}
