package org.shapetrail.letters;

import java.io.IOException;
import java.io.OutputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.text.Normalizer;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.function.BiConsumer;
import java.util.function.BooleanSupplier;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.shapetrail.history.PersonHistory;

/** Letters for many people at once: one PDF each and one combined file, with progress and cancellation. */
public final class LetterBatch {
    private LetterBatch() {
    }

    /**
     * Writes every letter into {@code folder} and a combined {@code letters-all.pdf}.
     *
     * @param progress called after each letter with (done, total)
     * @param cancelled asked before each letter; when true the batch stops and the combined file is not written
     * @return the files written, the combined file last
     */
    public static List<Path> write(LetterComposer composer, List<PersonHistory> people, Path folder,
                                   BiConsumer<Integer, Integer> progress, BooleanSupplier cancelled) throws IOException {
        Files.createDirectories(folder);
        List<Path> written = new ArrayList<>();
        try (PDDocument all = new PDDocument()) {
            int i = 0;
            for (PersonHistory h : people) {
                if (cancelled.getAsBoolean()) {
                    return written;
                }
                Letter l = composer.compose(h);
                Path f = folder.resolve(fileName(h.person().id(), h.person().displayName()));
                try (OutputStream out = Files.newOutputStream(f)) {
                    LetterPdf.write(l, out);
                }
                LetterPdf.append(all, l);
                written.add(f);
                progress.accept(++i, people.size());
            }
            Path combined = folder.resolve("letters-all.pdf");
            all.save(combined.toFile());
            written.add(combined);
        }
        return written;
    }

    /** "letter-0012-zoe-greyling.pdf": ASCII, lower case, safe on every file system. */
    static String fileName(long id, String name) {
        String ascii = Normalizer.normalize(name, Normalizer.Form.NFD).replaceAll("\\p{M}", "")
                .toLowerCase(Locale.ROOT).replaceAll("[^a-z0-9]+", "-").replaceAll("(^-|-$)", "");
        if (ascii.length() > 40) {
            ascii = ascii.substring(0, 40);
        }
        return String.format(Locale.ROOT, "letter-%04d%s.pdf", id, ascii.isEmpty() ? "" : "-" + ascii);
    }
}
