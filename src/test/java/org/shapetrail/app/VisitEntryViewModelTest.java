package org.shapetrail.app;

import org.shapetrail.store.RecordSource;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.time.LocalDate;
import java.util.Locale;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.shapetrail.history.Academy;
import org.shapetrail.history.AnalysisSettings;
import org.shapetrail.history.HistoryBuilder;
import org.shapetrail.history.PersonHistory;
import org.shapetrail.measure.Site;
import org.shapetrail.store.ContentDigest;
import org.shapetrail.store.Database;
import org.shapetrail.store.demo.DemoAcademy;

class VisitEntryViewModelTest {
    @TempDir
    Path dir;

    Path file;
    HistoryBuilder builder;
    PersonHistory history;

    @BeforeEach
    void setUp() throws Exception {
        file = dir.resolve("demo.sqlite");
        DemoAcademy.generate(file);
        try (Database db = Database.open(file)) {
            builder = HistoryBuilder.of(Academy.load(db), AnalysisSettings.standard());
        }
        history = builder.history(builder.academy().people().stream()
                .filter(p -> p.displayName().equals("Freya Breakwater")).findFirst().orElseThrow());
    }

    VisitEntryViewModel form(Locale locale) {
        VisitEntryViewModel vm = new VisitEntryViewModel(RecordSource.of(file), builder, history, locale, null);
        vm.dateProperty().set(LocalDate.of(2026, 6, 1));
        return vm;
    }

    static void fill(VisitEntryViewModel vm, Site s, String a, String b) {
        vm.field(s).orElseThrow().first().set(a);
        vm.field(s).orElseThrow().second().set(b);
    }

    static void fillFull(VisitEntryViewModel vm) {
        fill(vm, Site.BODY_MASS, "61.2", "61.2");
        fill(vm, Site.STATURE, "168.4", "168.6");
        fill(vm, Site.SITTING_HEIGHT, "88.1", "88.3");
        fill(vm, Site.TRICEPS, "10.2", "10.4");
        fill(vm, Site.SUBSCAPULAR, "8.8", "9.0");
        fill(vm, Site.SUPRASPINALE, "7.4", "7.6");
        fill(vm, Site.MEDIAL_CALF, "9.0", "9.2");
        fill(vm, Site.ARM_FLEXED, "29.9", "30.0");
        fill(vm, Site.CALF, "34.6", "34.6");
        fill(vm, Site.HUMERUS, "6.5", "6.5");
        fill(vm, Site.FEMUR, "9.1", "9.1");
    }

    @Test
    void aCompleteVisitRatesLiveGetsAVerdictAndIsSavedWhole() {
        VisitEntryViewModel vm = form(Locale.UK);
        fillFull(vm);
        assertTrue(vm.canSaveProperty().get(), vm.problems().toString());
        assertTrue(vm.liveRatingProperty().get().startsWith("Somatotype "), vm.liveRatingProperty().get());
        // the previous rated visit of this person in the demo file is the block-end visit of 24 March 2026
        assertTrue(vm.liveVerdictProperty().get().startsWith("Against the visit of 24 Mar 2026: "),
                vm.liveVerdictProperty().get());
        var saved = vm.save().orElseThrow();
        try (Database db = Database.open(file)) {
            var v = db.inTransaction(tx -> tx.visits().find(saved.id())).orElseThrow();
            assertEquals(22, v.trialCount());
        }
    }

    @Test
    void aSkinfoldPairSixPercentApartAsksForAThirdTrialAndSaveIsRefusedWithNothingWritten() throws Exception {
        VisitEntryViewModel vm = form(Locale.UK);
        fillFull(vm);
        // 10.0 and 10.6: 0.6 / 10.3 = 5.8 % > 5 % (ISAK rule, common practice)
        fill(vm, Site.TRICEPS, "10.0", "10.6");
        assertTrue(vm.field(Site.TRICEPS).orElseThrow().thirdWanted().get());
        assertFalse(vm.canSaveProperty().get());
        String before;
        try (Database db = Database.open(file)) {
            before = ContentDigest.of(db);
        }
        assertTrue(vm.save().isEmpty());
        try (Database db = Database.open(file)) {
            assertEquals(before, ContentDigest.of(db));
        }
        vm.field(Site.TRICEPS).orElseThrow().third().set("10.2");
        assertTrue(vm.canSaveProperty().get(), vm.problems().toString());
    }

    @Test
    void aStatureInMetresIsFlaggedWithTheUnitHint() {
        VisitEntryViewModel vm = form(Locale.UK);
        fillFull(vm);
        fill(vm, Site.STATURE, "1.684", "1.686");
        assertEquals("Trial 1: Stature 1.684 looks like metres; enter 168.4 cm. "
                + "Trial 2: Stature 1.686 looks like metres; enter 168.6 cm.", vm.field(Site.STATURE).orElseThrow()
                .message().get());
        assertFalse(vm.canSaveProperty().get());
    }

    @Test
    void decimalCommaParsesUnderGermanAndIsRefusedUnderEnglish() {
        VisitEntryViewModel de = form(Locale.GERMANY);
        fill(de, Site.TRICEPS, "10,2", "10,4");
        assertEquals("", de.field(Site.TRICEPS).orElseThrow().message().get());
        VisitEntryViewModel en = form(Locale.UK);
        fill(en, Site.TRICEPS, "1,5", "1.5");
        assertTrue(en.field(Site.TRICEPS).orElseThrow().message().get()
                .contains("uses ',' as the decimal separator; enter 1.5 mm."), en.field(Site.TRICEPS).orElseThrow()
                .message().get());
    }

    @Test
    void aRaterRatingIsComparedByItsSad() {
        VisitEntryViewModel vm = form(Locale.UK);
        fillFull(vm);
        vm.raterEndoProperty().set("2.5");
        vm.raterMesoProperty().set("4.5");
        vm.raterEctoProperty().set("2.5");
        vm.raterNameProperty().set("Imogen Tarrant");
        assertTrue(vm.raterComparisonProperty().get().startsWith("Rater's 2.5-4.5-2.5 lies at SAD "),
                vm.raterComparisonProperty().get());
    }

    @Test
    void aVisitInTheFutureOrBeforeBirthIsRefusedWithTheDateAndNothingIsWritten() throws Exception {
        String before;
        try (Database db = Database.open(file)) {
            before = ContentDigest.of(db);
        }
        VisitEntryViewModel vm = form(Locale.UK);
        fillFull(vm);
        LocalDate tomorrow = LocalDate.now().plusDays(1);
        vm.dateProperty().set(tomorrow);
        assertFalse(vm.canSaveProperty().get());
        assertTrue(vm.problems().contains("The visit date " + tomorrow + " is in the future (today is " + LocalDate.now()
                + "); enter the day of the measurements."), vm.problems().toString());
        assertTrue(vm.save().isEmpty());
        vm.dateProperty().set(LocalDate.of(2001, 1, 1));
        assertTrue(vm.problems().contains("The visit date 2001-01-01 is before the date of birth "
                + history.person().birthDate() + "; check both dates."), vm.problems().toString());
        assertTrue(vm.save().isEmpty());
        vm.dateProperty().set(LocalDate.of(2026, 6, 1));
        vm.contextProperty().set("pre\u0000season");
        assertTrue(vm.save().isEmpty());
        assertTrue(vm.problems().contains("The context holds a control character (U+0000) at character 4: remove it."),
                vm.problems().toString());
        try (Database db = Database.open(file)) {
            assertEquals(before, ContentDigest.of(db));
        }
    }

    @Test
    void aVisitTodaySoonAfterTheLastOneMustBeConfirmedAndTheFormNamesThePerson() throws Exception {
        // a visit of Freya 10 days ago, so that today's new visit is less than four weeks after it (issue rule)
        LocalDate tenDaysAgo = LocalDate.now().minusDays(10);
        VisitEntryViewModel first = form(Locale.UK);
        fillFull(first);
        first.dateProperty().set(tenDaysAgo);
        assertTrue(first.save().isPresent(), first.problems().toString());
        try (Database db = Database.open(file)) {
            builder = HistoryBuilder.of(Academy.load(db), AnalysisSettings.standard());
        }
        history = builder.history(history.person());
        VisitEntryViewModel vm = form(Locale.UK);
        assertTrue(vm.heading().startsWith("Freya Breakwater · "), vm.heading());
        assertTrue(vm.heading().endsWith(" years · Senior squad"), vm.heading());
        fillFull(vm);
        vm.dateProperty().set(LocalDate.now());
        assertEquals("Freya Breakwater was last measured 10 days ago (" + tenDaysAgo + "). Is this visit really theirs,"
                + " today?", vm.dateQuestionProperty().get());
        assertFalse(vm.canSaveProperty().get());
        assertTrue(vm.problems().contains("Confirm the date: " + vm.dateQuestionProperty().get()), vm.problems().toString());
        vm.dateConfirmedProperty().set(true);
        assertTrue(vm.canSaveProperty().get(), vm.problems().toString());
        // changing the date asks again
        vm.dateProperty().set(LocalDate.now().minusDays(1));
        vm.dateProperty().set(LocalDate.now());
        assertFalse(vm.dateConfirmedProperty().get());
        assertFalse(vm.canSaveProperty().get());
    }
}
