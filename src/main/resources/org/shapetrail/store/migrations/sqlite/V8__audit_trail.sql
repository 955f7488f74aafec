-- Schema version 8 (SQLite form): the audit trail's table. A file has no accounts (its one user may do
-- everything), so nothing writes to it here; on a server, triggers fill it (postgresql/V8). One schema
-- for both engines, so that a record moved between them keeps its shape.
CREATE TABLE audit_entry (
    id         INTEGER PRIMARY KEY,
    at         TEXT    NOT NULL,
    who        TEXT    NOT NULL,
    action     TEXT    NOT NULL CHECK (action IN ('insert', 'update', 'delete', 'erasure')),
    entity     TEXT    NOT NULL CHECK (entity IN ('person', 'visit', 'trial', 'rating')),
    person_id  INTEGER,
    visit_id   INTEGER,
    old_values TEXT,
    new_values TEXT
);
CREATE INDEX audit_by_person ON audit_entry (person_id, id);
CREATE INDEX audit_by_visit ON audit_entry (visit_id, id);
CREATE INDEX audit_by_time ON audit_entry (at);
