-- Schema version 1: people, squads, measurers, visits and their raw trials.
CREATE TABLE person (
    id                        INTEGER PRIMARY KEY,
    display_name              TEXT    NOT NULL CHECK (length(trim(display_name)) > 0),
    sex                       TEXT    NOT NULL CHECK (sex IN ('F', 'M')),
    birth_date                TEXT    NOT NULL,
    father_stature_cm         REAL,
    mother_stature_cm         REAL,
    notes                     TEXT    NOT NULL DEFAULT '',
    consent_measurement       INTEGER NOT NULL DEFAULT 0 CHECK (consent_measurement IN (0, 1)),
    consent_photographs       INTEGER NOT NULL DEFAULT 0 CHECK (consent_photographs IN (0, 1)),
    consent_share_with_parent INTEGER NOT NULL DEFAULT 0 CHECK (consent_share_with_parent IN (0, 1))
);

CREATE TABLE squad (
    id   INTEGER PRIMARY KEY,
    name TEXT NOT NULL UNIQUE CHECK (length(trim(name)) > 0)
);

CREATE TABLE membership (
    person_id INTEGER NOT NULL REFERENCES person (id) ON DELETE CASCADE,
    squad_id  INTEGER NOT NULL REFERENCES squad (id) ON DELETE CASCADE,
    joined_on TEXT    NOT NULL,
    left_on   TEXT,
    PRIMARY KEY (person_id, squad_id, joined_on),
    CHECK (left_on IS NULL OR left_on >= joined_on)
);

CREATE TABLE measurer (
    id            INTEGER PRIMARY KEY,
    name          TEXT NOT NULL UNIQUE CHECK (length(trim(name)) > 0),
    accreditation TEXT NOT NULL DEFAULT ''
);

CREATE TABLE visit (
    id          INTEGER PRIMARY KEY,
    person_id   INTEGER NOT NULL REFERENCES person (id) ON DELETE CASCADE,
    measured_at TEXT    NOT NULL,
    measurer_id INTEGER NOT NULL REFERENCES measurer (id),
    context     TEXT    NOT NULL DEFAULT '',
    notes       TEXT    NOT NULL DEFAULT '',
    trial_count INTEGER NOT NULL CHECK (trial_count >= 0)
);
CREATE INDEX visit_by_person ON visit (person_id, measured_at);
CREATE INDEX visit_by_measurer ON visit (measurer_id);

CREATE TABLE trial (
    visit_id INTEGER NOT NULL REFERENCES visit (id) ON DELETE CASCADE,
    site     TEXT    NOT NULL,
    trial_no INTEGER NOT NULL CHECK (trial_no BETWEEN 1 AND 3),
    value    REAL    NOT NULL,
    unit     TEXT    NOT NULL CHECK (unit IN ('cm', 'mm', 'kg')),
    PRIMARY KEY (visit_id, site, trial_no)
) WITHOUT ROWID;
