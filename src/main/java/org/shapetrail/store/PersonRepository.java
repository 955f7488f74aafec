package org.shapetrail.store;

import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Statement;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.shapetrail.measure.Sex;

/** People: insert, update, find, list and erase (with everything that hangs on them). */
public final class PersonRepository {
    private static final String COLUMNS = "id, display_name, sex, birth_date, father_stature_cm, mother_stature_cm,"
            + " notes, consent_measurement, consent_photographs, consent_share_with_parent, predicted_adult_stature_cm,"
            + " letter_language";
    private final Connection c;

    PersonRepository(Connection c) {
        this.c = c;
    }

    /** Saves a new person (id 0) and returns it with its id. */
    public Person insert(Person p) throws SQLException {
        try (PreparedStatement ps = c.prepareStatement("INSERT INTO person (display_name, sex, birth_date,"
                + " father_stature_cm, mother_stature_cm, notes, consent_measurement, consent_photographs,"
                + " consent_share_with_parent, predicted_adult_stature_cm, letter_language)"
                + " VALUES (?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?)",
                Statement.RETURN_GENERATED_KEYS)) {
            bind(ps, p);
            ps.executeUpdate();
            return p.withId(Sql.generatedId(ps));
        }
    }

    /** Replaces the stored fields of an existing person. */
    public void update(Person p) throws SQLException {
        try (PreparedStatement ps = c.prepareStatement("UPDATE person SET display_name = ?, sex = ?, birth_date = ?,"
                + " father_stature_cm = ?, mother_stature_cm = ?, notes = ?, consent_measurement = ?,"
                + " consent_photographs = ?, consent_share_with_parent = ?, predicted_adult_stature_cm = ?,"
                + " letter_language = ? WHERE id = ?")) {
            bind(ps, p);
            ps.setLong(12, p.id());
            if (ps.executeUpdate() != 1) {
                throw new StoreException(org.shapetrail.i18n.Messages.tr("store.noPerson", String.valueOf(p.id())));
            }
        }
    }

    private static void bind(PreparedStatement ps, Person p) throws SQLException {
        ps.setString(1, TextRules.require(TextRules.Field.PERSON_NAME, p.displayName()));
        ps.setString(2, p.sex().code());
        ps.setString(3, p.birthDate().toString());
        Sql.setNullableDouble(ps, 4, p.fatherStatureCm());
        Sql.setNullableDouble(ps, 5, p.motherStatureCm());
        ps.setString(6, TextRules.require(TextRules.Field.NOTES, p.notes()));
        ps.setInt(7, p.consent().measurement() ? 1 : 0);
        ps.setInt(8, p.consent().photographs() ? 1 : 0);
        ps.setInt(9, p.consent().shareWithParent() ? 1 : 0);
        Sql.setNullableDouble(ps, 10, p.predictedAdultStatureCm());
        ps.setString(11, p.letterLanguage());
    }

    public Optional<Person> find(long id) throws SQLException {
        try (PreparedStatement ps = c.prepareStatement("SELECT " + COLUMNS + " FROM person WHERE id = ?")) {
            ps.setLong(1, id);
            try (ResultSet rs = ps.executeQuery()) {
                return rs.next() ? Optional.of(read(rs)) : Optional.empty();
            }
        }
    }

    /** Everyone, by name. */
    public List<Person> all() throws SQLException {
        List<Person> out = new ArrayList<>();
        try (PreparedStatement ps = c.prepareStatement("SELECT " + COLUMNS + " FROM person ORDER BY display_name, id");
             ResultSet rs = ps.executeQuery()) {
            while (rs.next()) {
                out.add(read(rs));
            }
        }
        return out;
    }

    /**
     * Erases the person and everything that refers to them (visits, trials, ratings, memberships).
     *
     * @return true when a person was erased
     */
    public boolean erase(long id) throws SQLException {
        try (PreparedStatement ps = c.prepareStatement("DELETE FROM person WHERE id = ?")) {
            ps.setLong(1, id);
            return ps.executeUpdate() == 1;
        }
    }

    static Person read(ResultSet rs) throws SQLException {
        return new Person(rs.getLong("id"), rs.getString("display_name"), Sex.ofCode(rs.getString("sex")),
                LocalDate.parse(rs.getString("birth_date")), Sql.nullableDouble(rs, "father_stature_cm"),
                Sql.nullableDouble(rs, "mother_stature_cm"), rs.getString("notes"),
                new Consent(rs.getInt("consent_measurement") == 1, rs.getInt("consent_photographs") == 1,
                        rs.getInt("consent_share_with_parent") == 1), Sql.nullableDouble(rs, "predicted_adult_stature_cm"),
                rs.getString("letter_language"));
    }
}
