-- Schema version 5: a training block's aim, and the visits chosen as a member's before and after (when not
-- the default: the nearest rated visit up to the start and from the end).
ALTER TABLE training_block ADD COLUMN aim TEXT NOT NULL DEFAULT '';

CREATE TABLE block_pick (
    block_id        INTEGER NOT NULL REFERENCES training_block (id) ON DELETE CASCADE,
    person_id       INTEGER NOT NULL REFERENCES person (id) ON DELETE CASCADE,
    before_visit_id INTEGER NOT NULL REFERENCES visit (id) ON DELETE CASCADE,
    after_visit_id  INTEGER NOT NULL REFERENCES visit (id) ON DELETE CASCADE,
    PRIMARY KEY (block_id, person_id),
    CHECK (before_visit_id <> after_visit_id)
);
