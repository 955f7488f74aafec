-- Schema version 8 (PostgreSQL form): staff roles with the server's own grants and row-level rules, the
-- audit trail written by triggers, change notices for open windows, and erasure.
--
-- Three group roles, shared by the academies on one server (grants are per schema, so a role reaches
-- only the records it was granted on): shapetrail_measurer enters and edits their own visits,
-- shapetrail_coach reads everything and manages training blocks, shapetrail_admin manages people,
-- squads, measurers and accounts and may erase. The schema's owner (who ran this migration) counts as an
-- administrator. Staff log in as themselves: a login role that is a member of one of these.

DO $$
DECLARE r TEXT;
BEGIN
    FOREACH r IN ARRAY ARRAY['shapetrail_measurer', 'shapetrail_coach', 'shapetrail_admin'] LOOP
        IF NOT EXISTS (SELECT 1 FROM pg_roles WHERE rolname = r) THEN
            BEGIN
                EXECUTE format('CREATE ROLE %I NOLOGIN', r);
            EXCEPTION WHEN duplicate_object THEN
                NULL; -- made meanwhile by another academy's migration
            END;
        END IF;
    END LOOP;
END $$;

-- the trail: who (the login that made the change), when (the transaction's time, UTC), what, old and new values
CREATE TABLE audit_entry (
    id         BIGINT GENERATED ALWAYS AS IDENTITY PRIMARY KEY,
    at         TEXT   NOT NULL DEFAULT to_char(now() AT TIME ZONE 'UTC', 'YYYY-MM-DD"T"HH24:MI:SS"Z"'),
    who        TEXT   NOT NULL DEFAULT session_user,
    action     TEXT   NOT NULL CHECK (action IN ('insert', 'update', 'delete', 'erasure')),
    entity     TEXT   NOT NULL CHECK (entity IN ('person', 'visit', 'trial', 'rating')),
    person_id  BIGINT,
    visit_id   BIGINT,
    old_values TEXT,
    new_values TEXT
);
CREATE INDEX audit_by_person ON audit_entry (person_id, id);
CREATE INDEX audit_by_visit ON audit_entry (visit_id, id);
CREATE INDEX audit_by_time ON audit_entry (at);

CREATE FUNCTION audit_person(entity TEXT, j JSONB) RETURNS BIGINT LANGUAGE sql STABLE
SET search_path FROM CURRENT AS $$
    SELECT CASE entity WHEN 'person' THEN (j ->> 'id')::BIGINT
                       WHEN 'visit' THEN (j ->> 'person_id')::BIGINT
                       ELSE (SELECT v.person_id FROM visit v WHERE v.id = (j ->> 'visit_id')::BIGINT) END
$$;

CREATE FUNCTION audit_visit(entity TEXT, j JSONB) RETURNS BIGINT LANGUAGE sql IMMUTABLE AS $$
    SELECT CASE entity WHEN 'person' THEN NULL WHEN 'visit' THEN (j ->> 'id')::BIGINT
                       ELSE (j ->> 'visit_id')::BIGINT END
$$;

CREATE FUNCTION audit_key(entity TEXT, j JSONB) RETURNS TEXT LANGUAGE sql IMMUTABLE AS $$
    SELECT CASE entity WHEN 'trial' THEN (j ->> 'visit_id') || '/' || (j ->> 'site') || '/' || (j ->> 'trial_no')
                       WHEN 'rating' THEN j ->> 'visit_id'
                       ELSE j ->> 'id' END
$$;

-- statement-level triggers with transition tables: one INSERT into the trail per statement, however many rows
CREATE FUNCTION audit_inserted() RETURNS trigger LANGUAGE plpgsql SECURITY DEFINER
SET search_path FROM CURRENT AS $$
BEGIN
    IF TG_ARGV[0] = 'trial' THEN
        -- a visit's trials make one line per visit and statement (an import writes a million), holding
        -- every reading as "site #trial": "value unit"
        INSERT INTO audit_entry (action, entity, person_id, visit_id, new_values)
        SELECT 'insert', 'trial', v.person_id, r.visit_id, r.j::TEXT
        FROM (SELECT n.visit_id, jsonb_object_agg(n.site || ' #' || n.trial_no, n.value || ' ' || n.unit) AS j
              FROM new_rows n GROUP BY n.visit_id) r
        LEFT JOIN visit v ON v.id = r.visit_id;
    ELSE
        INSERT INTO audit_entry (action, entity, person_id, visit_id, new_values)
        SELECT 'insert', TG_ARGV[0], audit_person(TG_ARGV[0], r.j), audit_visit(TG_ARGV[0], r.j), r.j::TEXT
        FROM (SELECT to_jsonb(n) AS j FROM new_rows n) r;
    END IF;
    RETURN NULL;
END $$;

CREATE FUNCTION audit_updated() RETURNS trigger LANGUAGE plpgsql SECURITY DEFINER
SET search_path FROM CURRENT AS $$
BEGIN
    IF TG_ARGV[0] = 'trial' THEN
        INSERT INTO audit_entry (action, entity, person_id, visit_id, old_values, new_values)
        SELECT 'update', 'trial', v.person_id, n.visit_id, o.j::TEXT, n.j::TEXT
        FROM (SELECT x.visit_id, jsonb_object_agg(x.site || ' #' || x.trial_no, x.value || ' ' || x.unit) AS j
              FROM old_rows x GROUP BY x.visit_id) o
        JOIN (SELECT x.visit_id, jsonb_object_agg(x.site || ' #' || x.trial_no, x.value || ' ' || x.unit) AS j
              FROM new_rows x GROUP BY x.visit_id) n ON n.visit_id = o.visit_id
        LEFT JOIN visit v ON v.id = n.visit_id
        WHERE o.j IS DISTINCT FROM n.j;
        RETURN NULL;
    END IF;
    INSERT INTO audit_entry (action, entity, person_id, visit_id, old_values, new_values)
    SELECT 'update', TG_ARGV[0], audit_person(TG_ARGV[0], n.j), audit_visit(TG_ARGV[0], n.j), o.j::TEXT, n.j::TEXT
    FROM (SELECT to_jsonb(x) AS j FROM old_rows x) o
    JOIN (SELECT to_jsonb(x) AS j FROM new_rows x) n ON audit_key(TG_ARGV[0], o.j) = audit_key(TG_ARGV[0], n.j)
    WHERE o.j IS DISTINCT FROM n.j;
    RETURN NULL;
END $$;

CREATE FUNCTION audit_deleted() RETURNS trigger LANGUAGE plpgsql SECURITY DEFINER
SET search_path FROM CURRENT AS $$
BEGIN
    IF TG_ARGV[0] = 'trial' THEN
        INSERT INTO audit_entry (action, entity, person_id, visit_id, old_values)
        SELECT 'delete', 'trial', v.person_id, r.visit_id, r.j::TEXT
        FROM (SELECT x.visit_id, jsonb_object_agg(x.site || ' #' || x.trial_no, x.value || ' ' || x.unit) AS j
              FROM old_rows x GROUP BY x.visit_id) r
        LEFT JOIN visit v ON v.id = r.visit_id;
        RETURN NULL;
    END IF;
    INSERT INTO audit_entry (action, entity, person_id, visit_id, old_values)
    SELECT 'delete', TG_ARGV[0], audit_person(TG_ARGV[0], r.j), audit_visit(TG_ARGV[0], r.j), r.j::TEXT
    FROM (SELECT to_jsonb(o) AS j FROM old_rows o) r;
    RETURN NULL;
END $$;

CREATE TRIGGER person_added AFTER INSERT ON person REFERENCING NEW TABLE AS new_rows
    FOR EACH STATEMENT EXECUTE FUNCTION audit_inserted('person');
CREATE TRIGGER person_changed AFTER UPDATE ON person REFERENCING OLD TABLE AS old_rows NEW TABLE AS new_rows
    FOR EACH STATEMENT EXECUTE FUNCTION audit_updated('person');
CREATE TRIGGER person_removed AFTER DELETE ON person REFERENCING OLD TABLE AS old_rows
    FOR EACH STATEMENT EXECUTE FUNCTION audit_deleted('person');
CREATE TRIGGER visit_added AFTER INSERT ON visit REFERENCING NEW TABLE AS new_rows
    FOR EACH STATEMENT EXECUTE FUNCTION audit_inserted('visit');
CREATE TRIGGER visit_changed AFTER UPDATE ON visit REFERENCING OLD TABLE AS old_rows NEW TABLE AS new_rows
    FOR EACH STATEMENT EXECUTE FUNCTION audit_updated('visit');
CREATE TRIGGER visit_removed AFTER DELETE ON visit REFERENCING OLD TABLE AS old_rows
    FOR EACH STATEMENT EXECUTE FUNCTION audit_deleted('visit');
CREATE TRIGGER trial_added AFTER INSERT ON trial REFERENCING NEW TABLE AS new_rows
    FOR EACH STATEMENT EXECUTE FUNCTION audit_inserted('trial');
CREATE TRIGGER trial_changed AFTER UPDATE ON trial REFERENCING OLD TABLE AS old_rows NEW TABLE AS new_rows
    FOR EACH STATEMENT EXECUTE FUNCTION audit_updated('trial');
CREATE TRIGGER trial_removed AFTER DELETE ON trial REFERENCING OLD TABLE AS old_rows
    FOR EACH STATEMENT EXECUTE FUNCTION audit_deleted('trial');
CREATE TRIGGER rating_added AFTER INSERT ON visit_rating REFERENCING NEW TABLE AS new_rows
    FOR EACH STATEMENT EXECUTE FUNCTION audit_inserted('rating');
CREATE TRIGGER rating_changed AFTER UPDATE ON visit_rating REFERENCING OLD TABLE AS old_rows NEW TABLE AS new_rows
    FOR EACH STATEMENT EXECUTE FUNCTION audit_updated('rating');
CREATE TRIGGER rating_removed AFTER DELETE ON visit_rating REFERENCING OLD TABLE AS old_rows
    FOR EACH STATEMENT EXECUTE FUNCTION audit_deleted('rating');

-- a visit's stamps are the server's: who entered it stays, who changed it is the login that did
CREATE FUNCTION visit_stamps() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
    IF TG_OP = 'INSERT' THEN
        NEW.entered_by := session_user;
    ELSE
        NEW.entered_by := OLD.entered_by;
        NEW.changed_by := session_user;
        NEW.changed_at := to_char(now() AT TIME ZONE 'UTC', 'YYYY-MM-DD"T"HH24:MI:SS"Z"');
    END IF;
    RETURN NEW;
END $$;
CREATE TRIGGER visit_stamped BEFORE INSERT OR UPDATE ON visit FOR EACH ROW EXECUTE FUNCTION visit_stamps();

-- open windows hear of saved changes (LISTEN shapetrail_change; the payload names the schema and table)
CREATE FUNCTION notify_change() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
    PERFORM pg_notify('shapetrail_change', TG_TABLE_SCHEMA || ' ' || TG_TABLE_NAME);
    RETURN NULL;
END $$;
CREATE TRIGGER person_notice AFTER INSERT OR UPDATE OR DELETE ON person FOR EACH STATEMENT EXECUTE FUNCTION notify_change();
CREATE TRIGGER visit_notice AFTER INSERT OR UPDATE OR DELETE ON visit FOR EACH STATEMENT EXECUTE FUNCTION notify_change();
CREATE TRIGGER rating_notice AFTER INSERT OR UPDATE OR DELETE ON visit_rating FOR EACH STATEMENT EXECUTE FUNCTION notify_change();
CREATE TRIGGER block_notice AFTER INSERT OR UPDATE OR DELETE ON training_block FOR EACH STATEMENT EXECUTE FUNCTION notify_change();
CREATE TRIGGER membership_notice AFTER INSERT OR UPDATE OR DELETE ON membership FOR EACH STATEMENT EXECUTE FUNCTION notify_change();

-- who may do what, enforced by the server whatever program connects
CREATE FUNCTION visit_entered_by(visit BIGINT) RETURNS TEXT LANGUAGE sql STABLE SECURITY DEFINER
SET search_path FROM CURRENT AS $$
    SELECT v.entered_by FROM visit v WHERE v.id = visit
$$;

ALTER TABLE visit ENABLE ROW LEVEL SECURITY;
CREATE POLICY visit_seen ON visit FOR SELECT USING (true);
CREATE POLICY visit_own_added ON visit FOR INSERT TO shapetrail_measurer WITH CHECK (entered_by = session_user);
CREATE POLICY visit_own_changed ON visit FOR UPDATE TO shapetrail_measurer
    USING (entered_by = session_user) WITH CHECK (entered_by = session_user);
CREATE POLICY visit_own_removed ON visit FOR DELETE TO shapetrail_measurer USING (entered_by = session_user);
CREATE POLICY visit_admin ON visit FOR ALL TO shapetrail_admin USING (true) WITH CHECK (true);

ALTER TABLE trial ENABLE ROW LEVEL SECURITY;
CREATE POLICY trial_seen ON trial FOR SELECT USING (true);
CREATE POLICY trial_own ON trial FOR ALL TO shapetrail_measurer
    USING (visit_entered_by(visit_id) = session_user) WITH CHECK (visit_entered_by(visit_id) = session_user);
CREATE POLICY trial_admin ON trial FOR ALL TO shapetrail_admin USING (true) WITH CHECK (true);

ALTER TABLE visit_rating ENABLE ROW LEVEL SECURITY;
CREATE POLICY rating_seen ON visit_rating FOR SELECT USING (true);
CREATE POLICY rating_own ON visit_rating FOR ALL TO shapetrail_measurer
    USING (visit_entered_by(visit_id) = session_user) WITH CHECK (visit_entered_by(visit_id) = session_user);
CREATE POLICY rating_admin ON visit_rating FOR ALL TO shapetrail_admin USING (true) WITH CHECK (true);

-- erasure: the person's rows, then their lines of the trail, leaving one line that an erasure happened
CREATE FUNCTION erase_person(pid BIGINT) RETURNS INTEGER LANGUAGE plpgsql SECURITY DEFINER
SET search_path FROM CURRENT AS $$
DECLARE
    visits BIGINT[];
    n INTEGER;
BEGIN
    IF NOT (pg_has_role(session_user, 'shapetrail_admin', 'MEMBER')
            OR session_user = (SELECT tableowner FROM pg_tables WHERE schemaname = current_schema() AND tablename = 'person')) THEN
        RAISE EXCEPTION 'only an administrator may erase a person' USING ERRCODE = '42501';
    END IF;
    SELECT coalesce(array_agg(id), '{}') INTO visits FROM visit WHERE person_id = pid;
    DELETE FROM person WHERE id = pid;
    GET DIAGNOSTICS n = ROW_COUNT;
    DELETE FROM audit_entry WHERE person_id = pid OR visit_id = ANY (visits);
    IF n > 0 THEN
        INSERT INTO audit_entry (action, entity) VALUES ('erasure', 'person');
    END IF;
    RETURN n;
END $$;

DO $$
DECLARE
    s TEXT := quote_ident(current_schema());
BEGIN
    EXECUTE 'GRANT USAGE ON SCHEMA ' || s || ' TO shapetrail_measurer, shapetrail_coach, shapetrail_admin';
    EXECUTE 'GRANT SELECT ON ALL TABLES IN SCHEMA ' || s || ' TO shapetrail_measurer, shapetrail_coach, shapetrail_admin';
    EXECUTE 'GRANT INSERT, UPDATE, DELETE ON visit, trial, visit_rating TO shapetrail_measurer';
    EXECUTE 'GRANT INSERT, UPDATE, DELETE ON training_block, block_pick TO shapetrail_coach';
    EXECUTE 'GRANT INSERT, UPDATE, DELETE ON person, squad, membership, measurer, visit, trial, visit_rating,'
        || ' training_block, block_pick, backup_record TO shapetrail_admin';
    EXECUTE 'GRANT USAGE, SELECT, UPDATE ON ALL SEQUENCES IN SCHEMA ' || s || ' TO shapetrail_measurer, shapetrail_coach, shapetrail_admin';
    EXECUTE 'REVOKE ALL ON FUNCTION erase_person(BIGINT) FROM PUBLIC';
    EXECUTE 'GRANT EXECUTE ON FUNCTION erase_person(BIGINT) TO shapetrail_admin';
END $$;
