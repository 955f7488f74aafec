package org.shapetrail.store;

import java.sql.Connection;

/** The repositories of one open transaction; valid only inside {@link Database#inTransaction}. */
public final class Tx {
    private final Connection connection;

    Tx(Connection connection) {
        this.connection = connection;
    }

    Connection connection() {
        return connection;
    }

    public PersonRepository people() {
        return new PersonRepository(connection);
    }

    public SquadRepository squads() {
        return new SquadRepository(connection);
    }

    public MeasurerRepository measurers() {
        return new MeasurerRepository(connection);
    }

    public VisitRepository visits() {
        return new VisitRepository(connection);
    }

    /** The audit trail (written by a server; empty on a file). */
    public AuditTrail trail() {
        return new AuditTrail(connection);
    }

    public TrainingBlockRepository blocks() {
        return new TrainingBlockRepository(connection);
    }
}
