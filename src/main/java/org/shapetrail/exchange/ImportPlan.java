package org.shapetrail.exchange;

import java.util.List;
import org.shapetrail.store.Person;
import org.shapetrail.store.Visit;

/**
 * The dry run of an import: every row's outcome with its line number and reason, the visits that would
 * be written, and the people and measurers that would be created. Nothing has been written.
 *
 * @param fileProblems problems of the whole file (no header, missing columns); none means rows were read
 */
public record ImportPlan(List<Column> columns, boolean longLayout, List<RowReport> rows, List<PlannedVisit> visits,
                         List<Person> newPeople, List<String> newMeasurers, List<String> fileProblems) {
    /** What happens to one row. */
    public enum Outcome {
        IMPORTED("imported"),
        SKIPPED("skipped"),
        REJECTED("rejected");

        private final String words;

        Outcome(String words) {
            this.words = words;
        }

        public String words() {
            return words;
        }
    }

    /** One row of the report. */
    public record RowReport(long line, Outcome outcome, String reason) {
    }

    /**
     * A visit to be written: the person is either existing (personId &gt; 0) or one of {@link #newPeople()}
     * (newPersonIndex ≥ 0); likewise the measurer.
     */
    public record PlannedVisit(long personId, int newPersonIndex, long measurerId, String newMeasurer, Visit visit) {
    }

    public ImportPlan {
        columns = List.copyOf(columns);
        rows = List.copyOf(rows);
        visits = List.copyOf(visits);
        newPeople = List.copyOf(newPeople);
        newMeasurers = List.copyOf(newMeasurers);
        fileProblems = List.copyOf(fileProblems);
    }

    public long count(Outcome o) {
        return rows.stream().filter(r -> r.outcome() == o).count();
    }

    /** True when the import can be committed: the file was read and no row is rejected. */
    public boolean canCommit() {
        return fileProblems.isEmpty() && count(Outcome.REJECTED) == 0;
    }

    /** A short account for a person, e.g. "120 rows: 118 imported, 2 skipped, 0 rejected". */
    public String summary() {
        if (!fileProblems.isEmpty()) {
            return "The file cannot be imported: " + String.join(" ", fileProblems);
        }
        return rows.size() + " rows: " + count(Outcome.IMPORTED) + " imported, " + count(Outcome.SKIPPED)
                + " skipped, " + count(Outcome.REJECTED) + " rejected; " + visits.size() + " visit(s), "
                + newPeople.size() + " new person(s), " + newMeasurers.size() + " new measurer(s)";
    }
}
