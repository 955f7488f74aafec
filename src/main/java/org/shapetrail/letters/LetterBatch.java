package org.shapetrail.letters;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.text.Normalizer;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.function.BiConsumer;
import java.util.function.BooleanSupplier;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.shapetrail.OutputFiles;
import org.shapetrail.history.PersonHistory;

/** Letters for many people at once: one PDF each and one combined file, with progress and cancellation. */
public final class LetterBatch {
    private LetterBatch() {
    }

    /**
     * What a batch wrote.
     *
     * @param letters one PDF per person written, in order
     * @param combined the combined file of all of them, or null when cancelled or none could be written
     * @param refused why each letter that could not be set was left out (see {@link UnwritableLetterException})
     */
    public record Result(List<Path> letters, Path combined, List<String> refused) {
        public Result {
            letters = List.copyOf(letters);
            refused = List.copyOf(refused);
        }
    }

    /** Name of the combined file in the folder. */
    public static final String COMBINED = "letters-all.pdf";

    /**
     * Writes every letter into {@code folder} and a combined {@value #COMBINED}. File names come from ids and
     * names reduced to ASCII letters and digits, so no name can place a file outside the folder. Existing
     * files are replaced only when {@code overwrite} is true; otherwise nothing is written.
     *
     * @param overwriteHow how the person asks to replace existing files, for the refusal's message
     * @param progress called after each letter with (done, total)
     * @param cancelled asked before each letter; when true the batch stops and the combined file is not written
     */
    public static Result write(LetterComposer composer, List<PersonHistory> people, Path folder, boolean overwrite,
                               String overwriteHow, BiConsumer<Integer, Integer> progress, BooleanSupplier cancelled)
            throws IOException {
        Path dir = folder.toAbsolutePath().normalize();
        List<Path> targets = new ArrayList<>();
        for (PersonHistory h : people) {
            Path f = dir.resolve(fileName(h.person().id(), h.person().displayName())).normalize();
            if (!dir.equals(f.getParent())) {
                throw new IllegalStateException("a letter's file name left its folder: " + f);
            }
            targets.add(f);
        }
        Path combined = dir.resolve(COMBINED);
        List<Path> all = new ArrayList<>(targets);
        all.add(combined);
        OutputFiles.refuseExisting(all, overwrite, overwriteHow);
        Files.createDirectories(dir);
        List<Path> written = new ArrayList<>();
        List<String> refused = new ArrayList<>();
        try (PDDocument together = new PDDocument()) {
            int i = 0;
            for (PersonHistory h : people) {
                if (cancelled.getAsBoolean()) {
                    return new Result(written, null, refused);
                }
                Letter l = composer.compose(h);
                try {
                    OutputFiles.writeWhole(targets.get(i), out -> LetterPdf.write(l, out));
                    LetterPdf.append(together, l);
                    written.add(targets.get(i));
                } catch (UnwritableLetterException e) {
                    refused.add(e.getMessage());
                }
                progress.accept(++i, people.size());
            }
            if (written.isEmpty()) {
                return new Result(written, null, refused);
            }
            OutputFiles.writeWhole(combined, together::save);
        }
        return new Result(written, combined, refused);
    }

    /** "letter-0012-zoe-greyling.pdf": ASCII, lower case, safe on every file system. */
    public static String fileName(long id, String name) {
        String ascii = Normalizer.normalize(name, Normalizer.Form.NFD).replaceAll("\\p{M}", "")
                .toLowerCase(Locale.ROOT).replaceAll("[^a-z0-9]+", "-").replaceAll("(^-|-$)", "");
        if (ascii.length() > 40) {
            ascii = ascii.substring(0, 40);
        }
        return String.format(Locale.ROOT, "letter-%04d%s.pdf", id, ascii.isEmpty() ? "" : "-" + ascii);
    }
}
