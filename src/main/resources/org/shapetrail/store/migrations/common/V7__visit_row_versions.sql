-- Schema version 7: each visit's row version, and who entered it and who last changed it when, so that
-- two people editing the same visit at once never silently overwrite each other (the second save is
-- refused, naming the first; optimistic concurrency).
ALTER TABLE visit ADD COLUMN row_version INTEGER NOT NULL DEFAULT 1;
ALTER TABLE visit ADD COLUMN entered_by TEXT NOT NULL DEFAULT '';
ALTER TABLE visit ADD COLUMN changed_by TEXT NOT NULL DEFAULT '';
ALTER TABLE visit ADD COLUMN changed_at TEXT NOT NULL DEFAULT '';
