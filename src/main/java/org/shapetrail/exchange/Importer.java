package org.shapetrail.exchange;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.MalformedInputException;
import java.nio.file.Path;
import java.sql.SQLException;
import java.text.Normalizer;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.shapetrail.history.Academy;
import org.shapetrail.measure.DecimalStyle;
import org.shapetrail.store.Database;
import org.shapetrail.store.Person;
import org.shapetrail.store.Tx;
import org.shapetrail.store.Visit;
import org.shapetrail.store.VisitRepository;

/**
 * Imports visits from CSV. Either in two steps, as the wizard does: a dry run that reads every row,
 * matches people and measurers, checks every value with the core and reports each row as imported,
 * skipped or rejected, then, only when nothing is rejected, a commit of that plan in one transaction. Or in
 * one pass ({@link #importFile}), as {@code import --commit} does: read, check and write at once, kept only
 * when nothing is rejected. The reading itself is {@link ImportReading}.
 */
public final class Importer {
    private Importer() {
    }

    /** The dry run with the suggested column mapping. */
    public static ImportPlan dryRun(Path file, Academy existing, ImportOptions options) {
        return dryRun(file, existing, options, null);
    }

    /**
     * The dry run.
     *
     * @param columns the mapping to use (one per header, in order), or null for the suggestion
     */
    public static ImportPlan dryRun(Path file, Academy existing, ImportOptions options, List<Column> columns) {
        return read(file, existing, options, columns, null);
    }

    /**
     * Reads, checks and writes in one pass and one transaction: trials are written while the file is still
     * being read (on a second thread), and the transaction commits only when no row is rejected and every
     * visit passes the core's check; otherwise it is rolled back and nothing is written. The report is the
     * one a dry run gives; {@link ImportPlan#written()} says how many visits were written.
     *
     * @param columns the mapping to use (one per header, in order), or null for the suggestion
     */
    public static ImportPlan importFile(Database db, Path file, ImportOptions options, List<Column> columns) {
        try {
            return db.inTransaction(tx -> {
                Academy existing = Academy.load(db);
                VisitRepository.BulkWriter bulk = tx.visits().bulkWriter();
                try (bulk; ImportStream stream = new ImportStream(bulk)) {
                    ImportPlan plan = read(file, existing, options, columns, stream);
                    boolean write = plan.canCommit() && !plan.visits().isEmpty();
                    // a view: each visit is made when the writer looks at it, and dropped after
                    List<Visit> visits = new java.util.AbstractList<>() {
                        @Override
                        public Visit get(int i) {
                            return plan.visits().get(i).visit();
                        }

                        @Override
                        public int size() {
                            return plan.visits().size();
                        }
                    };
                    stream.drain();
                    if (!write) {
                        throw new NothingWritten(plan);
                    }
                    bulk.finish(visits);
                    return plan.withWritten(plan.visits().size());
                }
            });
        } catch (NothingWritten e) {
            return e.plan;
        }
    }

    /** Thrown inside the transaction to roll it back while keeping the report. */
    private static final class NothingWritten extends RuntimeException {
        private static final long serialVersionUID = 1L;
        private final transient ImportPlan plan;

        NothingWritten(ImportPlan plan) {
            super(null, null, false, false);
            this.plan = plan;
        }
    }

    private static ImportPlan read(Path file, Academy existing, ImportOptions options, List<Column> columns,
                                   ImportStream stream) {
        CsvInput.Format format;
        try {
            format = CsvInput.detect(file);
        } catch (MalformedInputException e) {
            return failed(List.of(), org.shapetrail.i18n.Messages.tr("import.notUtf8"));
        } catch (IOException e) {
            return failed(List.of(), org.shapetrail.i18n.Messages.tr("import.unreadable", e.getMessage()));
        }
        DecimalStyle decimals = options.decimals() != null ? options.decimals() : format.decimals();
        try (CsvRows rows = new CsvRows(file, format.delimiter())) {
            List<String> headers = rows.header();
            if (headers.isEmpty()) {
                return failed(List.of(), org.shapetrail.i18n.Messages.tr("import.empty"));
            }
            List<Column> cols = columns != null ? columns : ColumnMapper.suggest(headers);
            if (cols.size() != headers.size()) {
                return failed(cols, org.shapetrail.i18n.Messages.tr("import.mapping", cols.size(), headers.size()));
            }
            return new ImportReading(existing, options, decimals, cols, stream).read(rows);
        } catch (MalformedInputException e) {
            return failed(List.of(), org.shapetrail.i18n.Messages.tr("import.notUtf8"));
        } catch (IOException | UncheckedIOException | IllegalStateException | IllegalArgumentException e) {
            return failed(List.of(), org.shapetrail.i18n.Messages.tr("import.notCsv", e.getMessage()));
        }
    }

    private static ImportPlan failed(List<Column> cols, String why) {
        return ImportPlan.failed(cols, false, List.of(why));
    }

    /**
     * Writes a dry run's plan that {@link ImportPlan#canCommit()} in one transaction.
     *
     * @return the number of visits written
     * @throws IllegalStateException when the plan has rejected rows or file problems
     */
    public static int commit(Database db, ImportPlan plan) {
        if (!plan.canCommit()) {
            throw new IllegalStateException("An import with rejected rows is never written: " + plan.summary());
        }
        return db.inTransaction(tx -> tx.visits().insertAll(resolve(tx, plan)).size());
    }

    /** Creates the plan's new people and measurers and gives each visit its person's and measurer's ids. */
    private static List<Visit> resolve(Tx tx, ImportPlan plan) throws SQLException {
        Map<String, Long> measurers = new HashMap<>();
        for (String m : plan.newMeasurers()) {
            measurers.put(m, tx.measurers().insert(m, "").id());
        }
        List<Long> people = new ArrayList<>();
        for (Person p : plan.newPeople()) {
            people.add(tx.people().insert(p).id());
        }
        List<Visit> visits = new ArrayList<>(plan.visits().size());
        for (ImportPlan.PlannedVisit pv : plan.visits()) {
            long person = pv.personId() > 0 ? pv.personId() : people.get(pv.newPersonIndex());
            long measurer = pv.newMeasurer() != null ? measurers.get(pv.newMeasurer()) : pv.measurerId();
            Visit v = pv.visit();
            visits.add(new Visit(0, person, v.measuredAt(), measurer, v.context(), v.notes(), v.trials()));
        }
        return visits;
    }

    private static final java.util.regex.Pattern MARKS = java.util.regex.Pattern.compile("\\p{M}");
    private static final java.util.regex.Pattern SPACES = java.util.regex.Pattern.compile("\\s+");

    static String fold(String s) {
        String n = Normalizer.normalize(s == null ? "" : s.strip(), Normalizer.Form.NFD);
        return SPACES.matcher(MARKS.matcher(n).replaceAll("").toLowerCase(Locale.ROOT)).replaceAll(" ");
    }
}
