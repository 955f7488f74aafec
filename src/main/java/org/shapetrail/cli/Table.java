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
        int[] w = new int[header.size()];
        for (int i = 0; i < w.length; i++) {
            w[i] = header.get(i).length();
            for (List<String> r : rows) {
                w[i] = Math.max(w[i], r.get(i).length());
            }
        }
        line(out, header, w);
        for (List<String> r : rows) {
            line(out, r, w);
        }
        out.flush();
    }

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
