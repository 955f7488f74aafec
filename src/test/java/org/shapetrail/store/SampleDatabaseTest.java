package org.shapetrail.store;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.time.LocalDate;
import java.time.temporal.ChronoUnit;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.stream.Collectors;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.shapetrail.somatotype.EndomorphyVariant;
import org.shapetrail.somatotype.SomatotypeRater;
import org.shapetrail.store.demo.DemoAcademy;

/** The demo database in sample-db/: what it holds, that it is sound, and that it regenerates exactly. */
class SampleDatabaseTest {
    static final Path COMMITTED = Path.of("sample-db", "saltmarsh-bay.sqlite");

    @TempDir
    static Path dir;

    static Path regenerated;

    @BeforeAll
    static void regenerate() throws Exception {
        regenerated = dir.resolve("again.sqlite");
        DemoAcademy.generate(regenerated);
    }

    @Test
    void regenerationGivesTheCommittedContentExactly() throws Exception {
        Path copy = dir.resolve("committed-copy.sqlite");
        Files.copy(COMMITTED, copy);
        try (Database a = Database.open(copy); Database b = Database.open(regenerated)) {
            assertEquals(ContentDigest.of(a), ContentDigest.of(b),
                    "sample-db/ is out of date: regenerate it with the command in sample-db/README.md");
        }
    }

    @Test
    void holdsFortyJuniorsAndTwentySeniorsWithTheirSquadsAndTheBlock() {
        try (Database db = Database.open(regenerated)) {
            List<Person> people = db.inTransaction(tx -> tx.people().all());
            // issue text for the demo academy: about 40 juniors aged 10-17 and a senior squad of about 20
            assertEquals(60, people.size());
            LocalDate start = DemoAcademy.RECORD_START;
            long juniors = people.stream().filter(p -> ChronoUnit.YEARS.between(p.birthDate(), start) < 18).count();
            assertEquals(40, juniors);
            long juniorsAged10To17 = people.stream()
                    .mapToLong(p -> ChronoUnit.YEARS.between(p.birthDate(), start)).filter(a -> a >= 10 && a <= 17)
                    .count();
            assertEquals(40, juniorsAged10To17);
            assertEquals(List.of("Football U14", "Football U16", "Football U18", "Rowing juniors", "Senior squad"),
                    db.inTransaction(tx -> tx.squads().all()).stream().map(Squad::name).toList());
            List<TrainingBlock> blocks = db.inTransaction(tx -> tx.blocks().all());
            // the seniors' block and the rowing juniors' block (sample-db/README.md)
            assertEquals(List.of(DemoAcademy.JUNIOR_BLOCK_NAME, DemoAcademy.BLOCK_NAME),
                    blocks.stream().map(TrainingBlock::name).toList());
            // a 10-week block, first to last day: 10 × 7 − 1 = 69 days (derived)
            assertEquals(69, ChronoUnit.DAYS.between(blocks.get(1).startsOn(), blocks.get(1).endsOn()));
            // two measurers with different repeatability (issue text)
            assertEquals(2, db.inTransaction(tx -> tx.measurers().all()).size());
        }
    }

    @Test
    void juniorsAreMeasuredEveryThreeToFourMonthsOverThreeYears() {
        try (Database db = Database.open(regenerated)) {
            List<Visit> visits = db.inTransaction(tx -> tx.visits().all());
            Map<Long, List<Visit>> byPerson = visits.stream().collect(Collectors.groupingBy(Visit::personId));
            List<Long> gaps = new ArrayList<>();
            for (long id = 1; id <= 40; id++) {
                List<Visit> vs = byPerson.get(id).stream().filter(v -> !v.context().equals("reliability session"))
                        .toList();
                assertTrue(vs.size() >= 8, "junior " + id + " has " + vs.size() + " visits");
                long span = ChronoUnit.DAYS.between(vs.get(0).measuredAt(), vs.get(vs.size() - 1).measuredAt());
                assertTrue(span > 2.5 * 365, "junior " + id + " spans " + span + " days");
                for (int i = 1; i < vs.size(); i++) {
                    gaps.add(ChronoUnit.DAYS.between(vs.get(i - 1).measuredAt(), vs.get(i).measuredAt()));
                }
            }
            double median = gaps.stream().sorted().toList().get(gaps.size() / 2);
            assertTrue(median >= 90 && median <= 125, "median interval " + median + " days");
        }
    }

    @Test
    void everyVisitRatesWithoutAValidationErrorAndNoVisitIsIncomplete() {
        try (Database db = Database.open(regenerated)) {
            List<Visit> visits = db.inTransaction(tx -> tx.visits().all());
            assertTrue(visits.size() > 450, visits.size() + " visits");
            for (Visit v : visits) {
                SomatotypeRater.Outcome o = SomatotypeRater.rate(v.trials(), EndomorphyVariant.HEIGHT_CORRECTED);
                assertTrue(o.rated(), "visit " + v.id() + ": " + o.problems());
            }
            assertEquals(List.of(), db.inTransaction(tx -> tx.visits().incompleteVisits()));
            long thirds = visits.stream().flatMap(v -> v.trials().stream()).filter(t -> t.values().size() == 3).count();
            assertTrue(thirds > 100, "some third trials are stored: " + thirds);
        }
    }

    @Test
    void twoMeasurersMeasuredTheSamePeopleOnTheReliabilityDay() {
        try (Database db = Database.open(regenerated)) {
            List<Visit> visits = db.inTransaction(tx -> tx.visits().all());
            long repeated = visits.stream().filter(v -> v.context().equals("reliability session")).count();
            assertTrue(repeated >= 20, repeated + " repeated visits");
        }
    }
}
