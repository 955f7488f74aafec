package org.shapetrail.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.Callable;
import org.shapetrail.history.Academy;
import org.shapetrail.history.AnalysisSettings;
import org.shapetrail.history.HistoryBuilder;
import org.shapetrail.history.PersonHistory;
import org.shapetrail.letters.LetterBatch;
import org.shapetrail.letters.LetterComposer;
import org.shapetrail.letters.LetterSettings;
import org.shapetrail.store.Database;
import picocli.CommandLine.ArgGroup;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/** {@code letters}: progress letters (PDF) for a person or a squad. */
@Command(name = "letters", mixinStandardHelpOptions = true,
        description = "Write progress letters (PDF) for a person or a squad: one file each and one combined file.")
final class LettersCommand implements Callable<Integer> {
    @Mixin
    DbOption db;

    @ArgGroup(exclusive = true, multiplicity = "1")
    Lookup.Who who;

    @Option(names = "--from", required = true, paramLabel = "DATE", description = "first day of the period, yyyy-mm-dd")
    LocalDate from;

    @Option(names = "--to", required = true, paramLabel = "DATE", description = "last day of the period, yyyy-mm-dd")
    LocalDate to;

    @Option(names = "--out", required = true, paramLabel = "FOLDER")
    Path out;

    @Option(names = "--academy", defaultValue = "Saltmarsh Bay Sports Academy")
    String academy;

    @Option(names = "--sender", defaultValue = "the academy physiotherapist", description = "who signs")
    String sender;

    @Option(names = "--role", defaultValue = "", description = "the sender's role, shown after the name")
    String role;

    @Option(names = "--contact", defaultValue = "via the academy office")
    String contact;

    @Option(names = "--skinfolds-for-under-16", description = "also describe skinfold thickness for juniors under 16")
    boolean skinfolds;

    @Option(names = "--lang", paramLabel = "en|es|pt", description = "write every letter in this language (default:"
            + " each person's letter language, else English)")
    String lang;

    @picocli.CommandLine.Mixin
    OverwriteOption overwrite;

    @Spec
    picocli.CommandLine.Model.CommandSpec spec;

    @Override
    public Integer call() throws Exception {
        PrintWriter o = spec.commandLine().getOut();
        List<PersonHistory> people = new ArrayList<>();
        HistoryBuilder b;
        try (Database d = db.open()) {
            Academy a = Academy.load(d);
            b = HistoryBuilder.of(a, AnalysisSettings.standard());
            people.addAll(who.histories(a, b, to));
        }
        if (lang != null && !org.shapetrail.i18n.Messages.LANGUAGES.contains(lang)) {
            throw new org.shapetrail.ShapetrailException("There is no letter language \"" + lang + "\": choose en, es or"
                    + " pt. Nothing was written.");
        }
        LetterComposer c = new LetterComposer(b, new LetterSettings(academy, sender, role, contact, from, to, skinfolds),
                Locale.UK);
        if (lang != null) {
            c = c.allIn(org.shapetrail.i18n.Messages.localeFor(lang, Locale.UK));
        }
        var result = LetterBatch.write(c, people, out, overwrite.overwrite, OverwriteOption.HOW, (done, total) -> {
            o.printf("\rLetters: %d of %d", done, total);
            o.flush();
        }, () -> false);
        o.println();
        o.println("Wrote " + result.letters().size() + " letter(s)" + (result.combined() == null ? "."
                : " and " + result.combined() + "."));
        result.refused().forEach(why -> spec.commandLine().getErr().println(why));
        return result.refused().isEmpty() ? 0 : 1;
    }
}
