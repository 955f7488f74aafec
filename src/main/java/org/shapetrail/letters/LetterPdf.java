package org.shapetrail.letters;

import java.awt.Color;
import java.io.IOException;
import java.io.InputStream;
import java.io.OutputStream;
import java.util.ArrayList;
import java.util.List;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.pdmodel.PDPage;
import org.apache.pdfbox.pdmodel.PDPageContentStream;
import org.apache.pdfbox.pdmodel.common.PDRectangle;
import org.apache.pdfbox.pdmodel.font.PDFont;
import org.apache.pdfbox.pdmodel.font.PDType0Font;
import org.shapetrail.chart.pdf.PdfChartRenderer;

/**
 * Lays a {@link Letter} out on A4 pages with embedded Liberation Sans (regular and bold, SIL Open Font
 * Licence; Latin, Greek and Cyrillic), at most {@link #MAX_PAGES} pages: text wraps within the margins,
 * the visit table keeps its latest rows when it would not fit, the cautions close the letter.
 */
public final class LetterPdf {
    public static final int MAX_PAGES = 2;
    /** Size of the square chart on the page, points. */
    public static final float CHART_PT = 260;
    static final float MARGIN = 56;
    static final float BODY = 10.5f;
    static final float LEADING = 14.5f;
    private static final Color INK = new Color(0x1d, 0x3b, 0x44);
    private static final Color MUTED = new Color(0x5e, 0x6e, 0x70);

    private final PDDocument doc;
    private final PDFont regular;
    private final PDFont bold;
    private PDPageContentStream cs;
    private float y;
    private int pages;

    private LetterPdf(PDDocument doc) throws IOException {
        this.doc = doc;
        this.regular = font(doc, "LiberationSans-Regular.ttf");
        this.bold = font(doc, "LiberationSans-Bold.ttf");
    }

    private static PDFont font(PDDocument doc, String name) throws IOException {
        try (InputStream in = LetterPdf.class.getResourceAsStream("fonts/" + name)) {
            if (in == null) {
                throw new IOException("font " + name + " is missing from the build");
            }
            return PDType0Font.load(doc, in);
        }
    }

    /** Adds the letter's pages to {@code doc}. */
    public static void append(PDDocument doc, Letter letter) throws IOException {
        LetterPdf l = new LetterPdf(doc);
        l.requireCovered(letter);
        l.layout(letter);
    }

    /**
     * Refuses, before anything is drawn, a letter with characters the embedded fonts lack (Liberation Sans
     * covers Latin, Greek and Cyrillic) or in a right-to-left script (not laid out here): a name would
     * otherwise print as empty boxes, or backwards, without a word.
     */
    private void requireCovered(Letter letter) {
        java.util.Set<Integer> missing = new java.util.TreeSet<>();
        boolean rtl = false;
        String all = letter.allText();
        for (int i = 0; i < all.length(); ) {
            int cp = all.codePointAt(i);
            i += Character.charCount(cp);
            if (cp == '\n' || cp == '\t') {
                continue;
            }
            byte dir = Character.getDirectionality(cp);
            if (dir == Character.DIRECTIONALITY_RIGHT_TO_LEFT || dir == Character.DIRECTIONALITY_RIGHT_TO_LEFT_ARABIC) {
                rtl = true;
                missing.add(cp);
            } else if (!covers(regular, cp) || !covers(bold, cp)) {
                missing.add(cp);
            }
        }
        if (!missing.isEmpty()) {
            StringBuilder chars = new StringBuilder();
            missing.stream().limit(8).forEach(cp -> chars.append(new String(Character.toChars(cp))).append(' ')
                    .append(String.format(java.util.Locale.ROOT, "(U+%04X) ", cp)));
            // told to the staff (the window's or the command's language), not to the family
            throw new UnwritableLetterException(org.shapetrail.i18n.Messages.tr("letters.unwritable",
                    letter.recipientName(), rtl ? org.shapetrail.i18n.Messages.tr("letters.rtl") : "",
                    chars.toString().strip()));
        }
    }

    private static boolean covers(PDFont f, int cp) {
        try {
            f.encode(new String(Character.toChars(cp)));
            return true;
        } catch (IllegalArgumentException | IOException e) {
            return false;
        }
    }

    /** Writes one letter as a PDF. */
    public static void write(Letter letter, OutputStream out) throws IOException {
        try (PDDocument doc = new PDDocument()) {
            append(doc, letter);
            doc.getDocumentInformation().setTitle(org.shapetrail.i18n.Messages.get(letter.language(), "letter.pdf.title",
                    letter.recipientName()));
            doc.save(out);
        }
    }

    private void newPage() throws IOException {
        if (cs != null) {
            cs.close();
        }
        PDPage page = new PDPage(PDRectangle.A4);
        doc.addPage(page);
        cs = new PDPageContentStream(doc, page);
        y = PDRectangle.A4.getHeight() - MARGIN;
        pages++;
    }

    private float width() {
        return PDRectangle.A4.getWidth() - 2 * MARGIN;
    }

    private void layout(Letter letter) throws IOException {
        newPage();
        // heading: academy in bold, title large, recipient line; each wraps
        paragraph(letter.heading().get(0), bold, 11, MUTED, 0);
        paragraph(letter.heading().get(1), bold, 16, INK, 2);
        paragraph(letter.heading().get(2), regular, 11, INK, 6);
        rule();
        for (int i = 0; i < letter.sections().size(); i++) {
            Letter.Section s = letter.sections().get(i);
            if (!s.title().isEmpty()) {
                need(LEADING * 3);
                paragraph(s.title(), bold, 12.5f, INK, 3);
            }
            for (String p : s.paragraphs()) {
                paragraph(p, regular, BODY, INK, 5);
            }
            if (s.chartAfter()) {
                figures(letter);
            }
        }
        if (letter.sections().stream().noneMatch(Letter.Section::chartAfter)) {
            figures(letter);
        }
        need(LEADING * (letter.cautions().size() + 2));
        rule();
        for (String c : letter.cautions()) {
            paragraph(c, regular, 8.5f, MUTED, 1);
        }
        cs.close();
    }

    private void figures(Letter letter) throws IOException {
        if (letter.chart() != null) {
            float h = CHART_PT;
            need(h + 10);
            PdfChartRenderer.draw(letter.chart(), cs, regular, bold, MARGIN + (width() - h) / 2, y - h, h, h);
            y -= h + 10;
        }
        if (!letter.table().isEmpty()) {
            table(letter.table(), letter.language());
        }
    }

    private void table(List<List<String>> rows, java.util.Locale language) throws IOException {
        int cols = rows.get(0).size();
        float colW = width() / cols;
        float rowH = 13;
        // keep the header and as many of the latest rows as fit on this page or the next
        int room = (int) Math.floor((y - MARGIN - 90) / rowH) - 1;
        if (room < 3) {
            newPage();
            room = (int) Math.floor((y - MARGIN - 90) / rowH) - 1;
        }
        List<List<String>> body = rows.subList(1, rows.size());
        int omitted = Math.max(0, body.size() - room);
        List<List<String>> shown = new ArrayList<>(body.subList(omitted, body.size()));
        drawRow(rows.get(0), colW, bold, 8.5f);
        for (List<String> r : shown) {
            drawRow(r, colW, regular, 9);
        }
        if (omitted > 0) {
            paragraph(org.shapetrail.i18n.Messages.get(language, "letter.omitted", omitted), regular, 8.5f, MUTED,
                    2);
        }
        y -= 6;
    }

    private void drawRow(List<String> cells, float colW, PDFont f, float size) throws IOException {
        float x = MARGIN;
        for (String c : cells) {
            String t = fit(c, f, size, colW - 4);
            text(t, f, size, INK, x, y - size);
            x += colW;
        }
        y -= 13;
    }

    private String fit(String s, PDFont f, float size, float w) throws IOException {
        String t = s;
        while (t.length() > 1 && f.getStringWidth(t) / 1000 * size > w) {
            t = t.substring(0, t.length() - 2) + "…";
        }
        return t;
    }

    private void rule() throws IOException {
        cs.setStrokingColor(new Color(0xd8, 0xd1, 0xc2));
        cs.setLineWidth(0.8f);
        cs.moveTo(MARGIN, y - 2);
        cs.lineTo(MARGIN + width(), y - 2);
        cs.stroke();
        y -= 10;
    }

    private void need(float h) throws IOException {
        if (y - h < MARGIN) {
            if (pages >= MAX_PAGES) {
                return; // the caller shrinks what it draws; never a third page
            }
            newPage();
        }
    }

    /** Wrapped text; a line that would fall off the last page is not drawn. */
    private void paragraph(String text, PDFont f, float size, Color c, float after) throws IOException {
        float lead = size * 1.38f;
        for (String line : wrap(text, f, size, width())) {
            if (y - lead < MARGIN) {
                if (pages >= MAX_PAGES) {
                    return;
                }
                newPage();
            }
            text(line, f, size, c, MARGIN, y - size);
            y -= lead;
        }
        y -= after;
    }

    private void text(String s, PDFont f, float size, Color c, float x, float baseline) throws IOException {
        cs.beginText();
        cs.setFont(f, size);
        cs.setNonStrokingColor(c);
        cs.newLineAtOffset(x, baseline);
        cs.showText(s);
        cs.endText();
    }

    static List<String> wrap(String text, PDFont f, float size, float width) throws IOException {
        List<String> lines = new ArrayList<>();
        StringBuilder line = new StringBuilder();
        for (String word : text.split(" ")) {
            String candidate = line.length() == 0 ? word : line + " " + word;
            if (f.getStringWidth(candidate) / 1000 * size <= width) {
                line.setLength(0);
                line.append(candidate);
                continue;
            }
            if (line.length() > 0) {
                lines.add(line.toString());
                line.setLength(0);
            }
            // a single word wider than the line (a very long name) is cut into pieces that fit
            String w = word;
            while (f.getStringWidth(w) / 1000 * size > width) {
                int k = w.length() - 1;
                while (k > 1 && f.getStringWidth(w.substring(0, k)) / 1000 * size > width) {
                    k--;
                }
                lines.add(w.substring(0, k));
                w = w.substring(k);
            }
            line.append(w);
        }
        if (line.length() > 0) {
            lines.add(line.toString());
        }
        return lines;
    }
}
