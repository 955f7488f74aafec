package org.shapetrail.bench;

import java.nio.file.Files;
import java.nio.file.Path;
import java.time.LocalDate;
import java.util.List;
import java.util.Locale;
import org.shapetrail.history.Academy;
import org.shapetrail.history.AnalysisSettings;
import org.shapetrail.history.HistoryBuilder;
import org.shapetrail.history.PersonHistory;
import org.shapetrail.letters.LetterBatch;
import org.shapetrail.letters.LetterComposer;
import org.shapetrail.letters.LetterSettings;
import org.shapetrail.store.Database;
import org.shapetrail.store.demo.DemoAcademy;

/**
 * Harness for docs/performance.md: 40 demo people's letters (one PDF each and the combined file),
 * histories computed beforehand. Run with
 * {@code mvn -q test-compile exec:java -Dexec.classpathScope=test -Dexec.mainClass=org.shapetrail.bench.LettersBenchmark}.
 */
public final class LettersBenchmark {
    private LettersBenchmark() {
    }

    public static void main(String[] args) throws Exception {
        Path dir = Files.createTempDirectory("letters-bench");
        Path f = dir.resolve("demo.sqlite");
        DemoAcademy.generate(f);
        HistoryBuilder b;
        try (Database db = Database.open(f)) {
            b = HistoryBuilder.of(Academy.load(db), AnalysisSettings.standard());
        }
        List<PersonHistory> forty = b.academy().people().subList(0, 40).stream().map(b::history).toList();
        LetterComposer c = new LetterComposer(b, new LetterSettings("Saltmarsh Bay Sports Academy", "Morwenna Tregear",
                "Academy physiotherapist", "the office", LocalDate.of(2025, 9, 1), LocalDate.of(2026, 8, 31), false),
                Locale.UK);
        int[] run = {0};
        Harness.time("40 letters", 1, 5, () -> LetterBatch.write(c, forty, dir.resolve("run" + run[0]++),
                false, "", (d, t) -> { }, () -> false));
    }
}
