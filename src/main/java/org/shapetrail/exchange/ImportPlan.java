package org.shapetrail.exchange;

import java.util.List;
import org.shapetrail.store.Person;
import org.shapetrail.store.Visit;

/**
 * The outcome of reading an import: every row's outcome with its line number and reason, the visits that
 * would be written, and the people and measurers that would be created. After a dry run nothing has been
 * written; after {@link Importer#importFile} {@link #written()} says how many visits were.
 */
public final class ImportPlan {
    /** What happens to one row. */
    public enum Outcome {
        IMPORTED, SKIPPED, REJECTED;

        /** "imported", "skipped", "rejected" in the reader's language. */
        public String words() {
            return org.shapetrail.i18n.Messages.tr("import.outcome." + name());
        }
    }

    /** One row of the report. */
    public record RowReport(long line, Outcome outcome, String reason) {
    }

    /** Rows with one outcome and reason: a row of its own, or all the rows of one visit. */
    public record Finding(List<Long> lines, Outcome outcome, String reason) {
        public Finding {
            lines = List.copyOf(lines);
        }

        /** "line 7", "lines 5–14" or "lines 3, 8–9": runs of following lines joined. */
        public String where() {
            StringBuilder sb = new StringBuilder();
            for (int i = 0; i < lines.size(); ) {
                int j = i;
                while (j + 1 < lines.size() && lines.get(j + 1) == lines.get(j) + 1) {
                    j++;
                }
                if (i > 0) {
                    sb.append(", ");
                }
                sb.append(lines.get(i));
                if (j > i) {
                    sb.append('–').append(lines.get(j));
                }
                i = j + 1;
            }
            return org.shapetrail.i18n.Messages.tr("import.where", lines.size(), sb.toString());
        }

        /** E.g. "lines 5–14: rejected — Triceps trial 2 …". */
        public String describe() {
            // a one-line finding need not repeat its line inside the reason
            String own = org.shapetrail.i18n.Messages.tr("reading.line", String.valueOf(lines.get(0)));
            String why = lines.size() == 1 && reason.startsWith(own) ? reason.substring(own.length()) : reason;
            return where() + ": " + outcome.words() + (why.isEmpty() ? "" : " — " + why);
        }
    }

    /**
     * A visit to be written: the person is either existing (personId &gt; 0) or one of {@link #newPeople()}
     * (newPersonIndex ≥ 0); likewise the measurer.
     */
    public record PlannedVisit(long personId, int newPersonIndex, long measurerId, String newMeasurer, Visit visit) {
    }

    private final List<Column> columns;
    private final boolean longLayout;
    private final RowLog.Rows rows;
    private final List<PlannedVisit> visits;
    private final List<Person> newPeople;
    private final List<String> newMeasurers;
    private final List<String> fileProblems;
    private final int written;

    ImportPlan(List<Column> columns, boolean longLayout, RowLog.Rows rows, List<PlannedVisit> visits,
               List<Person> newPeople, List<String> newMeasurers, List<String> fileProblems, int written) {
        this.columns = List.copyOf(columns);
        this.longLayout = longLayout;
        this.rows = rows;
        // not copied: the importer's list makes each visit on demand, and nothing changes it
        this.visits = java.util.Collections.unmodifiableList(visits);
        this.newPeople = List.copyOf(newPeople);
        this.newMeasurers = List.copyOf(newMeasurers);
        this.fileProblems = List.copyOf(fileProblems);
        this.written = written;
    }

    static ImportPlan failed(List<Column> columns, boolean longLayout, List<String> fileProblems) {
        return new ImportPlan(columns, longLayout, RowLog.Rows.NONE, List.of(), List.of(), List.of(), fileProblems, 0);
    }

    ImportPlan withWritten(int visitsWritten) {
        return new ImportPlan(columns, longLayout, rows, visits, newPeople, newMeasurers, fileProblems, visitsWritten);
    }

    /** The column mapping used. */
    public List<Column> columns() {
        return columns;
    }

    /** True for a row per trial (a site column and a value column), false for a row per visit. */
    public boolean longLayout() {
        return longLayout;
    }

    /** Every data row in file order, with its outcome; made on demand, so a million rows cost little. */
    public List<RowReport> rows() {
        return rows;
    }

    /** The rows not imported, each visit once with all its lines (see {@link Finding}). */
    public List<Finding> findings() {
        return rows.findings();
    }

    public List<PlannedVisit> visits() {
        return visits;
    }

    public List<Person> newPeople() {
        return newPeople;
    }

    public List<String> newMeasurers() {
        return newMeasurers;
    }

    /** Problems of the whole file (no header, missing columns); none means the rows were read. */
    public List<String> fileProblems() {
        return fileProblems;
    }

    /** Visits written by this import: 0 after a dry run or when nothing could be written. */
    public int written() {
        return written;
    }

    public long count(Outcome o) {
        return rows.count(o);
    }

    /** True when the import can be committed: the file was read and no row is rejected. */
    public boolean canCommit() {
        return fileProblems.isEmpty() && count(Outcome.REJECTED) == 0;
    }

    /** A short account for a person, e.g. "120 rows: 118 imported, 2 skipped, 0 rejected". */
    public String summary() {
        if (!fileProblems.isEmpty()) {
            return org.shapetrail.i18n.Messages.tr("import.cannot", String.join(" ", fileProblems));
        }
        return org.shapetrail.i18n.Messages.tr("import.summary", rows.size(), count(Outcome.IMPORTED),
                count(Outcome.SKIPPED), count(Outcome.REJECTED), visits.size(), newPeople.size(), newMeasurers.size());
    }
}
