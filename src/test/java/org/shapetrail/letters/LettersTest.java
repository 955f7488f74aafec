package org.shapetrail.letters;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.image.BufferedImage;
import java.io.ByteArrayOutputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.LocalDate;
import java.time.LocalDateTime;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import javax.imageio.ImageIO;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.rendering.PDFRenderer;
import org.apache.pdfbox.text.PDFTextStripper;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.shapetrail.docs.Screenshots;
import org.shapetrail.history.Academy;
import org.shapetrail.history.AnalysisSettings;
import org.shapetrail.history.HistoryBuilder;
import org.shapetrail.history.PersonHistory;
import org.shapetrail.history.VisitResult;
import org.shapetrail.measure.Sex;
import org.shapetrail.measure.Site;
import org.shapetrail.store.Database;
import org.shapetrail.store.Person;
import org.shapetrail.store.Visit;
import org.shapetrail.store.demo.DemoAcademy;

class LettersTest {
    static Path file;
    static HistoryBuilder builder;
    static final LetterSettings YEAR = new LetterSettings("Saltmarsh Bay Sports Academy", "Morwenna Tregear",
            "Academy physiotherapist", "physio@saltmarsh-bay.example", LocalDate.of(2025, 9, 1),
            LocalDate.of(2026, 8, 31), false);

    @BeforeAll
    static void load() throws Exception {
        file = Files.createTempDirectory("letters").resolve("demo.sqlite");
        DemoAcademy.generate(file);
        try (Database db = Database.open(file)) {
            // a person with a very long name and many visits in the period, for the layout checks
            long measurer = db.inTransaction(tx -> tx.measurers().all().get(0).id());
            db.inTransaction(tx -> {
                Person p = tx.people().insert(Person.draft("Maximiliana Bartholomea Fenwick-Ashcombe-Trevelyan-"
                        + "Pendragon-Saltcote-Underhay von Wellinghurst", Sex.FEMALE, LocalDate.of(2011, 4, 2)));
                List<Visit> vs = new ArrayList<>();
                for (int i = 0; i < 30; i++) {
                    var base = tx.visits().ofPerson(5).get(0).trials();
                    vs.add(new Visit(0, p.id(), LocalDateTime.of(2025, 9, 2, 9, 0).plusDays(11L * i), measurer, "", "",
                            base));
                }
                tx.visits().insertAll(vs);
                return null;
            });
            builder = HistoryBuilder.of(Academy.load(db), AnalysisSettings.standard());
        }
    }

    static PersonHistory history(String name) {
        return builder.history(builder.academy().people().stream().filter(p -> p.displayName().startsWith(name))
                .findFirst().orElseThrow());
    }

    static byte[] pdf(Letter l) throws Exception {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        LetterPdf.write(l, out);
        return out.toByteArray();
    }

    static String text(byte[] pdf) throws Exception {
        try (PDDocument d = Loader.loadPDF(pdf)) {
            return new PDFTextStripper().getText(d).replace('\u00a0', ' ');
        }
    }

    @Test
    void theFiguresInTheLetterAreTheCoresResults() throws Exception {
        PersonHistory h = history("Zeb Thistlewood");
        String t = text(pdf(new LetterComposer(builder, YEAR, Locale.UK).compose(h)));
        List<VisitResult> inPeriod = h.visits().stream().filter(v -> !v.visit().measuredAt().toLocalDate()
                .isBefore(YEAR.from()) && !v.visit().measuredAt().toLocalDate().isAfter(YEAR.to())).toList();
        for (VisitResult v : inPeriod) {
            String stature = String.format(Locale.UK, "%.1f", v.value(Site.STATURE).get());
            assertTrue(t.contains(stature), "stature " + stature + " in the letter");
            String meso = String.format(Locale.UK, "%.1f", v.somatotype().rating().mesomorphy());
            assertTrue(t.contains(meso), "mesomorphy " + meso);
        }
        double gain = inPeriod.get(inPeriod.size() - 1).value(Site.STATURE).get() - inPeriod.get(0).value(Site.STATURE).get();
        assertTrue(t.contains("a gain of " + String.format(Locale.UK, "%.1f", gain) + " cm"), t);
    }

    @Test
    void everyDemoLetterAvoidsTheBannedWordsCarriesTheCautionsAndFitsOnTwoPages() throws Exception {
        LetterComposer c = new LetterComposer(builder, YEAR, Locale.UK);
        for (var p : builder.academy().people()) {
            Letter letter = c.compose(builder.history(p));
            byte[] bytes = pdf(letter);
            String t = text(bytes);
            assertEquals(List.of(), Wording.bannedIn(t, letter.language()), p.displayName());
            for (String caution : LetterComposer.cautions(letter.language())) {
                assertTrue(t.replace("\n", " ").replace("  ", " ").contains(caution.substring(0, 30)),
                        p.displayName() + ": " + caution);
            }
            try (PDDocument d = Loader.loadPDF(bytes)) {
                assertTrue(d.getNumberOfPages() <= LetterPdf.MAX_PAGES, p.displayName() + " " + d.getNumberOfPages());
            }
        }
    }

    @Test
    void nothingRunsOffThePageForALongNameManyVisitsOrNoVisits() throws Exception {
        LetterSettings empty = new LetterSettings("Saltmarsh Bay Sports Academy", "Morwenna Tregear", "", "the office",
                LocalDate.of(2020, 1, 1), LocalDate.of(2020, 12, 31), false);
        List<Letter> cases = List.of(
                new LetterComposer(builder, YEAR, Locale.UK).compose(history("Maximiliana")),
                new LetterComposer(builder, YEAR, Locale.UK).compose(history("Freya Breakwater")),
                new LetterComposer(builder, empty, Locale.UK).compose(history("Arlo Ashcombe")));
        int k = 0;
        for (Letter l : cases) {
            try (PDDocument d = Loader.loadPDF(pdf(l))) {
                assertTrue(d.getNumberOfPages() <= 2);
                for (int i = 0; i < d.getNumberOfPages(); i++) {
                    BufferedImage img = new PDFRenderer(d).renderImageWithDPI(i, 72);
                    ImageIO.write(img, "png", Screenshots.folder().resolve("letter-case" + k + "-page" + (i + 1) + ".png")
                            .toFile());
                    // margin band of 40 pt (the layout keeps 56 pt) must be blank on all four sides
                    int band = 40;
                    for (int y = 0; y < img.getHeight(); y++) {
                        for (int x = 0; x < img.getWidth(); x++) {
                            boolean inBand = x < band || y < band || x >= img.getWidth() - band
                                    || y >= img.getHeight() - band;
                            if (inBand) {
                                assertEquals(0xffffff, img.getRGB(x, y) & 0xffffff,
                                        "case " + k + " page " + (i + 1) + " ink at " + x + "," + y);
                            }
                        }
                    }
                }
            }
            k++;
        }
    }

    @Test
    void accentedAndGreekNamesAreSetInTheEmbeddedFont() throws Exception {
        for (String name : List.of("Zoë Greyling", "Νεφέλη Ανδρέου")) {
            byte[] bytes = pdf(new LetterComposer(builder, YEAR, Locale.UK).compose(history(name)));
            assertTrue(text(bytes).contains(name), name);
            try (PDDocument d = Loader.loadPDF(bytes)) {
                var fonts = d.getPage(0).getResources().getFontNames();
                boolean embedded = false;
                for (var f : fonts) {
                    var font = d.getPage(0).getResources().getFont(f);
                    embedded |= font.isEmbedded() && font.getName().contains("LiberationSans");
                }
                assertTrue(embedded, "Liberation Sans embedded");
            }
        }
    }

    @Test
    void aSeniorInTheBlockGetsTheBlockSectionWithTheVerdict() {
        PersonHistory h = history("Freya Breakwater");
        Letter l = new LetterComposer(builder, YEAR, Locale.UK).compose(h);
        var review = org.shapetrail.history.BlockReview.of(builder, builder.academy().blocks().stream().filter(x -> x.name().equals(org.shapetrail.store.demo.DemoAcademy.BLOCK_NAME)).findFirst().orElseThrow(), 21);
        var me = review.athletes().stream().filter(a -> a.person().id() == h.person().id()).findFirst().orElseThrow();
        String text = l.allText();
        assertTrue(text.contains("took part in the Winter strength block"), text);
        String from = String.format(Locale.UK, "%.1f", me.change().from().mesomorphy());
        String to = String.format(Locale.UK, "%.1f", me.change().to().mesomorphy());
        assertTrue(text.contains("Muscle and bone build went from " + from + " to " + to)
                || from.equals(to) && text.contains("Muscle and bone build stayed at " + to), text);
    }

    @Test
    void underSixteensAreDescribedWithoutSkinfoldsUnlessAsked() {
        PersonHistory h = history("Lorcan Zennor-Blythe");
        Letter without = new LetterComposer(builder, YEAR, Locale.UK).compose(h);
        assertTrue(!without.allText().contains("skinfold") && without.chart() == null, without.allText());
        LetterSettings with = new LetterSettings(YEAR.academy(), YEAR.sender(), YEAR.senderRole(), YEAR.contact(),
                YEAR.from(), YEAR.to(), true);
        assertTrue(new LetterComposer(builder, with, Locale.UK).compose(h).allText().contains("skinfold rating"));
    }

    @Test
    void aBatchWritesOneFileEachAndACombinedFile() throws Exception {
        Path out = Files.createTempDirectory("batch");
        List<PersonHistory> people = List.of(history("Zeb Thistlewood"), history("Zoë Greyling"));
        int[] last = {0};
        var result = LetterBatch.write(new LetterComposer(builder, YEAR, Locale.UK), people, out, false, "",
                (done, total) -> last[0] = done, () -> false);
        List<Path> files = new ArrayList<>(result.letters());
        files.add(result.combined());
        assertEquals(3, files.size());
        assertEquals(2, last[0]);
        assertTrue(files.get(0).getFileName().toString().endsWith("-zeb-thistlewood.pdf"));
        assertTrue(files.get(1).getFileName().toString().endsWith("-zoe-greyling.pdf"));
        try (PDDocument all = Loader.loadPDF(files.get(2).toFile())) {
            int pages = 0;
            for (int i = 0; i < 2; i++) {
                try (PDDocument one = Loader.loadPDF(files.get(i).toFile())) {
                    pages += one.getNumberOfPages();
                }
            }
            assertEquals(pages, all.getNumberOfPages());
        }
    }
}
