package org.shapetrail.letters;

import java.awt.image.BufferedImage;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.util.ArrayList;
import java.util.List;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.rendering.PDFRenderer;

/** The pages of a letter as images, exactly as the PDF will print, for the preview before export. */
public final class LetterPreview {
    private LetterPreview() {
    }

    public static List<BufferedImage> pages(Letter letter, float dpi) throws IOException {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        LetterPdf.write(letter, out);
        List<BufferedImage> pages = new ArrayList<>();
        try (PDDocument d = Loader.loadPDF(out.toByteArray())) {
            PDFRenderer r = new PDFRenderer(d);
            for (int i = 0; i < d.getNumberOfPages(); i++) {
                pages.add(r.renderImageWithDPI(i, dpi));
            }
        }
        return pages;
    }
}
