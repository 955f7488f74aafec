package org.shapetrail.exchange;

import java.util.AbstractList;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.RandomAccess;
import org.shapetrail.exchange.ImportPlan.Outcome;
import org.shapetrail.exchange.ImportPlan.RowReport;

/**
 * The outcome of every row of an import, kept compactly: a row that belongs to a visit only points at the
 * visit, whose outcome is known when the whole file has been read; a row with an outcome of its own
 * (skipped, or rejected before it could be placed) keeps its report.
 */
final class RowLog {
    private int[] lines = new int[1024];
    private int[] refs = new int[1024]; // ≥ 0: index of the row's visit; < 0: -(index into own) - 1
    private final List<RowReport> own = new ArrayList<>();
    private int size;

    void visitRow(long line, int visit) {
        grow();
        lines[size] = lineNumber(line);
        refs[size++] = visit;
    }

    void ownRow(long line, Outcome outcome, String reason) {
        grow();
        own.add(new RowReport(line, outcome, reason));
        lines[size] = lineNumber(line);
        refs[size++] = -own.size();
    }

    int size() {
        return size;
    }

    private static int lineNumber(long line) {
        if (line > Integer.MAX_VALUE) {
            throw new IllegalArgumentException("A file of more than " + Integer.MAX_VALUE + " lines is too long to import.");
        }
        return (int) line;
    }

    private void grow() {
        if (size == lines.length) {
            lines = Arrays.copyOf(lines, size * 2);
            refs = Arrays.copyOf(refs, size * 2);
        }
    }

    /**
     * The rows with their final outcomes.
     *
     * @param visitReasons per visit: null when it is imported, otherwise why it is rejected
     */
    Rows resolve(String[] visitReasons) {
        return new Rows(Arrays.copyOf(lines, size), Arrays.copyOf(refs, size), List.copyOf(own), visitReasons.clone());
    }

    /** The report of every row, made on demand from the compact log. */
    static final class Rows extends AbstractList<RowReport> implements RandomAccess {
        static final Rows NONE = new Rows(new int[0], new int[0], List.of(), new String[0]);
        private final int[] lines;
        private final int[] refs;
        private final List<RowReport> own;
        private final String[] visitReasons;
        private final long[] counts = new long[Outcome.values().length];

        private Rows(int[] lines, int[] refs, List<RowReport> own, String[] visitReasons) {
            this.lines = lines;
            this.refs = refs;
            this.own = own;
            this.visitReasons = visitReasons;
            for (int r : refs) {
                Outcome o = r < 0 ? own.get(-r - 1).outcome()
                        : visitReasons[r] == null ? Outcome.IMPORTED : Outcome.REJECTED;
                counts[o.ordinal()]++;
            }
        }

        @Override
        public RowReport get(int i) {
            int r = refs[i];
            if (r < 0) {
                return own.get(-r - 1);
            }
            String why = visitReasons[r];
            return why == null ? new RowReport(lines[i], Outcome.IMPORTED, "")
                    : new RowReport(lines[i], Outcome.REJECTED, why);
        }

        @Override
        public int size() {
            return refs.length;
        }

        long count(Outcome o) {
            return counts[o.ordinal()];
        }

        /**
         * The rows not imported, each visit once: a rejected visit's rows share one report naming all its
         * lines (e.g. "lines 5–14"), so a bad value is told once with its reasons, not once per row.
         */
        List<ImportPlan.Finding> findings() {
            record Entry(List<Long> lines, Outcome outcome, String reason) {
            }
            List<Entry> out = new ArrayList<>();
            java.util.Map<Integer, Entry> entryOfVisit = new java.util.HashMap<>();
            for (int i = 0; i < refs.length; i++) {
                int r = refs[i];
                if (r < 0) {
                    RowReport own = this.own.get(-r - 1);
                    Entry last = out.isEmpty() ? null : out.get(out.size() - 1);
                    if (i > 0 && refs[i - 1] < 0 && last != null && last.outcome() == own.outcome()
                            && last.reason().equals(own.reason())) {
                        // following rows of one visit that could not be placed share their reason: told once
                        last.lines().add(own.line());
                    } else {
                        out.add(new Entry(new ArrayList<>(List.of(own.line())), own.outcome(), own.reason()));
                    }
                } else if (visitReasons[r] != null) {
                    Entry e = entryOfVisit.get(r);
                    if (e == null) {
                        e = new Entry(new ArrayList<>(), Outcome.REJECTED, visitReasons[r]);
                        entryOfVisit.put(r, e);
                        out.add(e);
                    }
                    e.lines().add((long) lines[i]);
                }
            }
            return out.stream().map(e -> new ImportPlan.Finding(e.lines(), e.outcome(), e.reason())).toList();
        }
    }
}
