-- Schema version 6: facts about the file itself, e.g. which Shapetrail brought it to its schema, so that an
-- older Shapetrail can name the version a newer file needs.
CREATE TABLE file_meta (
    key   TEXT PRIMARY KEY,
    value TEXT NOT NULL
);
