package org.shapetrail.exchange;

import java.io.IOException;
import java.io.PushbackReader;
import java.io.Reader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVParser;
import org.shapetrail.measure.DecimalStyle;

/**
 * Opens a CSV as spreadsheets write it: UTF-8 with or without a byte-order mark, comma, semicolon or tab
 * as the delimiter (decided from the header line), any line endings. A semicolon file is taken to use the
 * decimal comma unless the caller says otherwise.
 */
public final class CsvInput {
    private CsvInput() {
    }

    /** What was found about the file's format. */
    public record Format(char delimiter, DecimalStyle decimals) {
    }

    /** Reads the first line to decide the delimiter. */
    public static Format detect(Path file) throws IOException {
        try (Reader r = open(file)) {
            StringBuilder line = new StringBuilder();
            int c;
            while ((c = r.read()) != -1 && c != '\n' && c != '\r') {
                line.append((char) c);
            }
            String h = line.toString();
            long commas = h.chars().filter(ch -> ch == ',').count();
            long semis = h.chars().filter(ch -> ch == ';').count();
            long tabs = h.chars().filter(ch -> ch == '\t').count();
            char d = tabs > commas && tabs > semis ? '\t' : semis > commas ? ';' : ',';
            return new Format(d, d == ';' ? DecimalStyle.COMMA : DecimalStyle.POINT);
        }
    }

    static Reader open(Path file) throws IOException {
        PushbackReader r = new PushbackReader(Files.newBufferedReader(file, StandardCharsets.UTF_8), 1);
        int c = r.read();
        if (c != -1 && c != '\uFEFF') {
            r.unread(c);
        }
        return r;
    }

    /** A parser with a header row. */
    public static CSVParser parser(Path file, char delimiter) throws IOException {
        return CSVParser.parse(open(file), CSVFormat.DEFAULT.builder().setDelimiter(delimiter).setHeader()
                .setSkipHeaderRecord(true).setIgnoreEmptyLines(true).setTrim(true).setAllowMissingColumnNames(true)
                .get());
    }
}
