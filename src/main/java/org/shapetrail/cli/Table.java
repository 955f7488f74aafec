package org.shapetrail.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.UncheckedIOException;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVPrinter;

/** A report table written as aligned text or CSV; one place for both so every report reads the same. */
final class Table {
    private final List<String> header;
    private final List<List<String>> rows = new ArrayList<>();

    Table(String... header) {
        this.header = List.of(header);
    }

    Table row(Object... cells) {
        List<String> r = new ArrayList<>();
        for (Object c : cells) {
            r.add(c == null ? "" : c.toString());
        }
        rows.add(r);
        return this;
    }

    /**
     * The per-component tests as a table; {@code header} names the columns (they differ between paired and
     * independent tests), {@code dfDecimals} 0 for whole degrees of freedom, 1 for Welch's.
     */
    static Table componentTests(List<org.shapetrail.groups.ComponentTest> tests, int dfDecimals, String... header) {
        Table t = new Table(header);
        for (org.shapetrail.groups.ComponentTest c : tests) {
            t.row(c.component().label(), num(c.meanDifference(), 3), num(c.t(), 2), num(c.df(), dfDecimals),
                    num(c.pValue(), 4), num(c.effectSize(), 2), num(c.effectLow(), 2), num(c.effectHigh(), 2));
        }
        return t;
    }

    static String num(double v, int decimals) {
        return Double.isFinite(v) ? String.format(Locale.ROOT, "%." + decimals + "f", v) : "";
    }

    void write(PrintWriter out, OutputFormat format) {
        if (format == OutputFormat.CSV) {
            try {
                CSVPrinter p = new CSVPrinter(out, CSVFormat.DEFAULT.builder().setRecordSeparator("\n").get());
                p.printRecord(header);
                for (List<String> r : rows) {
                    p.printRecord(r);
                }
                p.flush();
            } catch (IOException e) {
                throw new UncheckedIOException(e);
            }
            return;
        }
        // the aligned text is for reading: its numbers take the decimal separator of the command's language
        // (CSV keeps the decimal point of the documented formats)
        char sep = org.shapetrail.measure.Numbers.separator();
        List<List<String>> rows = this.rows.stream().map(r -> r.stream().map(c -> shown(c, sep)).toList()).toList();
        List<String> shownHeader = header.stream().map(h -> org.shapetrail.i18n.Messages.has("cli.col." + h)
                ? org.shapetrail.i18n.Messages.tr("cli.col." + h) : h).toList();
        int[] w = new int[header.size()];
        for (int i = 0; i < w.length; i++) {
            w[i] = shownHeader.get(i).length();
            for (List<String> r : rows) {
                w[i] = Math.max(w[i], r.get(i).length());
            }
        }
        line(out, shownHeader, w);
        for (List<String> r : rows) {
            line(out, r, w);
        }
        out.flush();
    }

    /** A number (or a rating like 2.5-4.0-3.1, or 6.1 ± 1.4) with the language's decimal separator. */
    static String shown(String cell, char sep) {
        String word = WORDS.get(cell);
        if (word != null) {
            return org.shapetrail.i18n.Messages.tr(word);
        }
        java.util.regex.Matcher day = DAY.matcher(cell);
        if (day.matches()) {
            // a day as the command's language writes it ("24 mar 2026"); the CSV keeps ISO dates
            return java.time.LocalDate.parse(day.group(1)).format(java.time.format.DateTimeFormatter.ofLocalizedDate(
                    java.time.format.FormatStyle.MEDIUM).withLocale(org.shapetrail.i18n.Messages.current()))
                    + (day.group(2) == null ? "" : day.group(2));
        }
        var site = org.shapetrail.measure.Site.byCode(cell);
        if (site.isPresent()) {
            return site.get().shown();
        }
        if (sep == '.' || !NUMBERS.matcher(cell).matches()) {
            return cell;
        }
        return cell.replaceAll("(?<=\\d)\\.(?=\\d)", String.valueOf(sep));
    }

    /** An ISO day, alone or before a note in brackets ("2026-03-24", "2026-03-24 (first)"). */
    private static final java.util.regex.Pattern DAY = java.util.regex.Pattern.compile(
            "(\\d{4}-\\d{2}-\\d{2})( \\(.*\\))?"); // not words: a pattern

    /** The code words the CSV formats hold, and their keys for the aligned text. */
    private static final java.util.Map<String, String> WORDS = java.util.Map.ofEntries(
            java.util.Map.entry("endomorphy", "component.endomorphy"), java.util.Map.entry("mesomorphy", "component.mesomorphy"),
            java.util.Map.entry("ectomorphy", "component.ectomorphy"), java.util.Map.entry("yes", "cli.yes"),
            java.util.Map.entry("no", "cli.no"),
            java.util.Map.entry(org.shapetrail.noise.Verdict.BEYOND_NOISE.words(), "verdict.BEYOND_NOISE"),
            java.util.Map.entry(org.shapetrail.noise.Verdict.BORDERLINE.words(), "verdict.BORDERLINE"),
            java.util.Map.entry(org.shapetrail.noise.Verdict.WITHIN_NOISE.words(), "verdict.WITHIN_NOISE"),
            java.util.Map.entry(org.shapetrail.noise.TemTargets.Standing.WITHIN_TARGET.words(), "tem.WITHIN_TARGET"),
            java.util.Map.entry(org.shapetrail.noise.TemTargets.Standing.ENTRY_LEVEL_ONLY.words(), "tem.ENTRY_LEVEL_ONLY"),
            java.util.Map.entry(org.shapetrail.noise.TemTargets.Standing.OUTSIDE.words(), "tem.OUTSIDE"));
    /** Cells made of numbers only: "1.43", "-0.5", "2.5-4.0-3.1", "6.1 ± 1.4", "12.5 %". */
    private static final java.util.regex.Pattern NUMBERS = java.util.regex.Pattern.compile(
            "[-+]?\\d+(\\.\\d+)?(\\s*[-–±/]\\s*[-+]?\\d+(\\.\\d+)?)*(\\s*%)?");

    private static void line(PrintWriter out, List<String> cells, int[] w) {
        StringBuilder sb = new StringBuilder();
        for (int i = 0; i < cells.size(); i++) {
            String c = cells.get(i);
            sb.append(c).append(" ".repeat(w[i] - c.length()));
            if (i + 1 < cells.size()) {
                sb.append("  ");
            }
        }
        out.println(sb.toString().stripTrailing());
    }
}
