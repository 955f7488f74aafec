-- Schema version 4: the copies of the file Shapetrail made, so an erasure can say which still hold the data.
CREATE TABLE backup_record (
    id      INTEGER PRIMARY KEY,
    path    TEXT NOT NULL,
    made_at TEXT NOT NULL,
    kind    TEXT NOT NULL CHECK (kind IN ('backup', 'before migration'))
);
