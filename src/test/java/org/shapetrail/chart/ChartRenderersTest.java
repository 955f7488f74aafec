package org.shapetrail.chart;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.image.BufferedImage;
import java.io.ByteArrayInputStream;
import java.io.OutputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import javax.imageio.ImageIO;
import javax.xml.parsers.DocumentBuilderFactory;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.pdmodel.PDPage;
import org.apache.pdfbox.pdmodel.PDPageContentStream;
import org.apache.pdfbox.pdmodel.common.PDRectangle;
import org.apache.pdfbox.pdmodel.font.PDType0Font;
import org.apache.pdfbox.text.PDFTextStripper;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.shapetrail.chart.pdf.PdfChartRenderer;
import org.shapetrail.chart.png.PngRenderer;
import org.shapetrail.chart.svg.SvgRenderer;
import org.shapetrail.docs.Screenshots;
import org.shapetrail.history.Academy;
import org.shapetrail.history.AnalysisSettings;
import org.shapetrail.history.HistoryBuilder;
import org.shapetrail.history.PersonHistory;
import org.shapetrail.store.Database;
import org.shapetrail.store.demo.DemoAcademy;
import org.w3c.dom.Document;

/** The three file renderers on a fixed chart: a demo junior's migration path with noise ellipses. */
class ChartRenderersTest {
    static ChartModel chart;
    static int points;

    @BeforeAll
    static void build() throws Exception {
        Path f = Files.createTempDirectory("charts").resolve("demo.sqlite");
        DemoAcademy.generate(f);
        try (Database db = Database.open(f)) {
            HistoryBuilder b = HistoryBuilder.of(Academy.load(db), AnalysisSettings.standard());
            PersonHistory h = b.history(b.academy().people().stream()
                    .filter(p -> p.displayName().equals("Zeb Thistlewood")).findFirst().orElseThrow());
            chart = Charts.migration(h, true, java.util.Locale.ENGLISH);
            points = h.rated().size();
        }
    }

    @Test
    void svgIsWellFormedWithOneElementPerPoint() throws Exception {
        String svg = SvgRenderer.render(chart, 640, 640);
        Document d = DocumentBuilderFactory.newInstance().newDocumentBuilder()
                .parse(new ByteArrayInputStream(svg.getBytes(StandardCharsets.UTF_8)));
        var polys = d.getElementsByTagName("polygon");
        int markers = 0;
        for (int i = 0; i < polys.getLength(); i++) {
            if ("marker".equals(polys.item(i).getAttributes().getNamedItem("class").getNodeValue())) {
                markers++;
            }
        }
        assertEquals(points, markers);
        Files.writeString(Screenshots.folder().resolve("somatochart-junior.svg"), svg);
    }

    @Test
    void pngOfTheFixedChartMatchesTheStoredReference() throws Exception {
        BufferedImage img = PngRenderer.image(chart, 520, 560, 2);
        try (OutputStream out = Files.newOutputStream(Screenshots.folder().resolve("somatochart-junior.png"))) {
            ImageIO.write(img, "png", out);
        }
        BufferedImage ref = ImageIO.read(getClass().getResourceAsStream("somatochart-reference.png"));
        assertEquals(ref.getWidth(), img.getWidth());
        assertEquals(ref.getHeight(), img.getHeight());
        // tolerance: at most 1 % of pixels differ by more than 48 in any channel (font rasterisation may vary)
        long differing = 0;
        for (int y = 0; y < img.getHeight(); y++) {
            for (int x = 0; x < img.getWidth(); x++) {
                int a = img.getRGB(x, y);
                int b = ref.getRGB(x, y);
                for (int shift = 0; shift <= 16; shift += 8) {
                    if (Math.abs(((a >> shift) & 0xff) - ((b >> shift) & 0xff)) > 48) {
                        differing++;
                        break;
                    }
                }
            }
        }
        assertTrue(differing < 0.01 * img.getWidth() * img.getHeight(), differing + " pixels differ");
    }

    @Test
    void pdfPageHoldsVectorPathsAndTheAxisText() throws Exception {
        Path out = Screenshots.folder().resolve("somatochart-junior.pdf");
        try (PDDocument doc = new PDDocument()) {
            PDPage page = new PDPage(PDRectangle.A4);
            doc.addPage(page);
            var font = PDType0Font.load(doc, PDDocument.class.getResourceAsStream(
                    "/org/apache/pdfbox/resources/ttf/LiberationSans-Regular.ttf"));
            try (PDPageContentStream cs = new PDPageContentStream(doc, page)) {
                PdfChartRenderer.draw(chart, cs, font, font, 40, 200, 500, 540);
            }
            doc.save(out.toFile());
        }
        try (PDDocument doc = Loader.loadPDF(out.toFile())) {
            String text = new PDFTextStripper().getText(doc);
            for (String axis : List.of("ENDOMORPHY", "MESOMORPHY", "ECTOMORPHY")) {
                assertTrue(text.contains(axis), axis);
            }
            String ops = new String(doc.getPage(0).getContents().readAllBytes(), StandardCharsets.ISO_8859_1);
            assertTrue(ops.contains(" l\n") || ops.contains(" l "), "line-to operators");
            assertTrue(ops.contains(" m\n") || ops.contains(" m "), "move-to operators");
        }
    }
}
