-- Schema version 3 (PostgreSQL form: identity ids, double precision): a predicted adult stature entered by the user from another method (cm).
ALTER TABLE person ADD COLUMN predicted_adult_stature_cm DOUBLE PRECISION CHECK (predicted_adult_stature_cm IS NULL OR predicted_adult_stature_cm BETWEEN 120 AND 230);
