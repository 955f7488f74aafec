-- Schema version 3: a predicted adult stature entered by the user from another method (cm).
ALTER TABLE person ADD COLUMN predicted_adult_stature_cm REAL CHECK (predicted_adult_stature_cm IS NULL OR predicted_adult_stature_cm BETWEEN 120 AND 230);
