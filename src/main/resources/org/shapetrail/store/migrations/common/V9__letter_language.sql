-- Schema version 9: the language of a person's letters (a family may read another language than the
-- staff): en, es or pt, or empty for the desk's own.
ALTER TABLE person ADD COLUMN letter_language TEXT NOT NULL DEFAULT '' CHECK (letter_language IN ('', 'en', 'es', 'pt'));
