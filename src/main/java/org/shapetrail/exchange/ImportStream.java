package org.shapetrail.exchange;

import java.sql.SQLException;
import java.time.LocalDateTime;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.concurrent.ArrayBlockingQueue;
import java.util.concurrent.BlockingQueue;
import org.shapetrail.measure.Problem;
import org.shapetrail.measure.Site;
import org.shapetrail.measure.SiteTrials;
import org.shapetrail.store.Person;
import org.shapetrail.store.VisitRepository;

/**
 * Hands what an import reads to a second thread that writes it, so that reading and checking overlap with
 * SQLite's work: new people and measurers, each visit's row and then its trials, in that order, through a
 * {@link VisitRepository.BulkWriter}. When the reader finds a rejection it {@link #stop}s the stream: the
 * transaction will be rolled back, so the rest need not be written.
 */
final class ImportStream implements AutoCloseable {
    private static final int CHUNK = 4096;
    /** Chunks waiting for the writer (about 100 kB each) before the reader waits. */
    private static final int QUEUED = 16;
    private static final Object END = new Object();

    /** What the reader gave, in order: at each place either an item (person, measurer, visit row) or a trial. */
    private static final class Chunk {
        final Object[] item = new Object[CHUNK];
        final long[] visit = new long[CHUNK];
        final Site[] site = new Site[CHUNK];
        final int[] trialNo = new int[CHUNK];
        final double[] value = new double[CHUNK];
        int n;
    }

    private record NewPerson(Person draft) {
    }

    private record NewMeasurer(String name) {
    }

    /** A visit's row: the person is existing (personId &gt; 0) or new (its index); likewise the measurer. */
    private record VisitRow(long id, long personId, int newPerson, long measurerId, String newMeasurer,
                            LocalDateTime when, String context, int trialCount) {
    }

    private final VisitRepository.BulkWriter writer;
    private final BlockingQueue<Object> queue = new ArrayBlockingQueue<>(QUEUED);
    private final Thread thread;
    private volatile SQLException failure;
    private Chunk current = new Chunk();
    private boolean stopped;
    private boolean ended;
    // the writer's own: ids of the people and measurers it created
    private final List<Long> newPeople = new ArrayList<>();
    private final Map<String, Long> newMeasurers = new HashMap<>();

    ImportStream(VisitRepository.BulkWriter writer) {
        this.writer = writer;
        this.thread = new Thread(this::writeAll, "import-writer");
        this.thread.setDaemon(true);
        this.thread.start();
    }

    /** The id the writer gives the visit numbered {@code index} (from 0) in the order of the plan. */
    long visitId(int index) {
        return writer.firstId() + index;
    }

    /** A new person, numbered in the order given (from 0). */
    void person(Person draft) {
        send(new NewPerson(draft));
    }

    void measurer(String name) {
        send(new NewMeasurer(name));
    }

    /** The row of the visit numbered {@code index}; before any of its trials. */
    void visit(int index, long personId, int newPerson, long measurerId, String newMeasurer, LocalDateTime when,
               String context, int trialCount) {
        send(new VisitRow(visitId(index), personId, newPerson, measurerId, newMeasurer, when, context, trialCount));
    }

    /** One trial of a visit whose row was given. */
    void trial(int visitIndex, Site site, int trialNo, double value) {
        if (stopped) {
            return;
        }
        Chunk c = current;
        c.visit[c.n] = visitId(visitIndex);
        c.site[c.n] = site;
        c.trialNo[c.n] = trialNo;
        c.value[c.n] = value;
        advance();
    }

    private void send(Object item) {
        if (stopped) {
            return;
        }
        current.item[current.n] = item;
        advance();
    }

    private void advance() {
        if (++current.n == CHUNK) {
            put(current);
            current = new Chunk();
        }
    }

    /**
     * Checks a visit's trials with the core through the store's writer (reader thread), which then does not
     * check them again before the commit.
     */
    List<Problem> check(int visitIndex, List<SiteTrials> trials) {
        return writer.check(visitIndex, trials);
    }

    /** Nothing more will be written: the import is going to be rolled back. */
    void stop() {
        stopped = true;
    }

    boolean stopped() {
        return stopped;
    }

    /** Waits until everything handed over is written; passes on the writer's failure. */
    void drain() throws SQLException {
        if (!ended) {
            ended = true;
            if (!stopped && current.n > 0) {
                put(current);
            }
            put(END);
        }
        try {
            thread.join();
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new SQLException("The import was interrupted.", e);
        }
        if (failure != null) {
            throw failure;
        }
    }

    private void put(Object item) {
        if (failure != null) {
            stopped = true; // the writer has failed: the transaction is lost, only the report is left
        }
        try {
            queue.put(item);
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            stopped = true;
        }
    }

    private void writeAll() {
        try {
            while (true) {
                Object item = queue.take();
                if (item == END) {
                    return;
                }
                if (failure == null) {
                    try {
                        write((Chunk) item);
                    } catch (SQLException | RuntimeException e) {
                        failure = e instanceof SQLException s ? s : new SQLException(e.getMessage(), e);
                    }
                }
            }
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
        }
    }

    private void write(Chunk c) throws SQLException {
        for (int i = 0; i < c.n; i++) {
            Object item = c.item[i];
            if (item == null) {
                writer.trial(c.visit[i], c.site[i], c.trialNo[i], c.value[i]);
            } else {
                write(item);
            }
        }
    }

    private void write(Object item) throws SQLException {
        if (item instanceof VisitRow v) {
            long person = v.personId() > 0 ? v.personId() : newPeople.get(v.newPerson());
            long measurer = v.newMeasurer() != null ? newMeasurers.get(v.newMeasurer()) : v.measurerId();
            writer.visit(v.id(), person, v.when(), measurer, v.context(), "", v.trialCount());
        } else if (item instanceof NewPerson p) {
            newPeople.add(writer.person(p.draft()));
        } else if (item instanceof NewMeasurer m) {
            newMeasurers.put(m.name(), writer.measurer(m.name()));
        }
    }

    @Override
    public void close() {
        try {
            stopped = true;
            drain();
        } catch (SQLException ignored) {
            // reported by drain() on the normal path; here the import has already failed
        }
    }
}
