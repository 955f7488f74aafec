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
@Command(name = "letters", mixinStandardHelpOptions = true)
final class LettersCommand implements Callable<Integer> {
    @Mixin
    DbOption db;

    @ArgGroup(exclusive = true, multiplicity = "1")
    Lookup.Who who;

    @Option(names = "--from", required = true, paramLabel = "DATE")
    LocalDate from;

    @Option(names = "--to", required = true, paramLabel = "DATE")
    LocalDate to;

    @Option(names = "--out", required = true, paramLabel = "FOLDER")
    Path out;

    @Option(names = "--academy", defaultValue = "Saltmarsh Bay Sports Academy") // not words: a name (the sample's)
    String academy;

    @Option(names = "--sender")
    String sender;

    @Option(names = "--role", defaultValue = "")
    String role;

    @Option(names = "--contact")
    String contact;

    @Option(names = "--skinfolds-for-under-16")
    boolean skinfolds;

    @Option(names = "--letter-lang", paramLabel = "en|es|pt")
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
            throw new org.shapetrail.ShapetrailException(org.shapetrail.i18n.Messages.tr("cli.letters.badLang", lang));
        }
        // a person without a letter language of their own gets the command's language (British English by default)
        Locale here = org.shapetrail.i18n.Messages.languageOf(org.shapetrail.i18n.Messages.current()).equals("en")
                ? Locale.UK : org.shapetrail.i18n.Messages.current();
        LetterComposer c = new LetterComposer(b, new LetterSettings(academy,
                sender != null ? sender : org.shapetrail.i18n.Messages.tr("preview.role"), role,
                contact != null ? contact : org.shapetrail.i18n.Messages.tr("preview.contact"), from, to, skinfolds),
                here);
        if (lang != null) {
            c = c.allIn(org.shapetrail.i18n.Messages.localeFor(lang, here));
        }
        var result = LetterBatch.write(c, people, out, overwrite.overwrite, OverwriteOption.how(), (done, total) -> {
            o.print("\r" + org.shapetrail.i18n.Messages.tr("cli.letters.progress", done, total));
            o.flush();
        }, () -> false);
        o.println();
        o.println(result.combined() == null ? org.shapetrail.i18n.Messages.tr("cli.letters.wrote", result.letters().size())
                : org.shapetrail.i18n.Messages.tr("cli.letters.wroteAll", result.letters().size(), result.combined()));
        result.refused().forEach(why -> spec.commandLine().getErr().println(why));
        return result.refused().isEmpty() ? 0 : 1;
    }
}
