-- Schema version 2: a rater's visual or criterion rating of a visit, and training blocks.
CREATE TABLE visit_rating (
    visit_id   INTEGER PRIMARY KEY REFERENCES visit (id) ON DELETE CASCADE,
    endomorphy REAL NOT NULL CHECK (endomorphy BETWEEN 0 AND 20),
    mesomorphy REAL NOT NULL CHECK (mesomorphy BETWEEN 0 AND 20),
    ectomorphy REAL NOT NULL CHECK (ectomorphy BETWEEN 0 AND 20),
    rater      TEXT NOT NULL CHECK (length(trim(rater)) > 0),
    method     TEXT NOT NULL CHECK (method IN ('photographs', 'in person', 'criterion'))
);

CREATE TABLE training_block (
    id        INTEGER PRIMARY KEY,
    name      TEXT    NOT NULL CHECK (length(trim(name)) > 0),
    squad_id  INTEGER NOT NULL REFERENCES squad (id) ON DELETE CASCADE,
    starts_on TEXT    NOT NULL,
    ends_on   TEXT    NOT NULL,
    CHECK (ends_on >= starts_on)
);
