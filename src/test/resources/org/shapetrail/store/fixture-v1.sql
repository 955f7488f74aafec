-- Rows as schema version 1 stored them (invented test data).
INSERT INTO person (id, display_name, sex, birth_date, notes) VALUES (1, 'Hesper Wellinghurst', 'M', '2010-06-15', '');
INSERT INTO measurer (id, name, accreditation) VALUES (1, 'Ada Quarrington', 'ISAK level 2');
INSERT INTO visit (id, person_id, measured_at, measurer_id, context, notes, trial_count) VALUES (1, 1, '2024-03-04T10:15:00', 1, 'pre-season', '', 2);
INSERT INTO trial (visit_id, site, trial_no, value, unit) VALUES (1, 'stature', 1, 150.1, 'cm');
INSERT INTO trial (visit_id, site, trial_no, value, unit) VALUES (1, 'stature', 2, 150.3, 'cm');
