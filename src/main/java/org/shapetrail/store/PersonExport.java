package org.shapetrail.store;

import java.sql.SQLException;
import java.util.List;
import java.util.Map;
import org.shapetrail.measure.SiteTrials;

/**
 * One person's complete record as JSON (right of access): the person, memberships, and every visit with
 * its raw trials, measurer and rater's rating. Derived results are left out: they are recomputed from
 * the trials.
 */
public final class PersonExport {
    /** Format tag written at the top of every export. */
    public static final String FORMAT = "shapetrail-person-record/1";

    private PersonExport() {
    }

    /** The JSON text of one person's record. */
    public static String toJson(Tx tx, long personId) throws SQLException {
        Person p = tx.people().find(personId)
                .orElseThrow(() -> new StoreException(org.shapetrail.i18n.Messages.tr("store.noPerson", String.valueOf(personId))));
        Map<Long, Measurer> measurers = new java.util.HashMap<>();
        for (Measurer m : tx.measurers().all()) {
            measurers.put(m.id(), m);
        }
        Map<Long, Squad> squads = new java.util.HashMap<>();
        for (Squad s : tx.squads().all()) {
            squads.put(s.id(), s);
        }
        Map<Long, VisitRating> ratings = tx.visits().ratings();
        List<Visit> visits = tx.visits().ofPerson(personId);
        Json j = new Json().open('{');
        j.field("format", FORMAT);
        j.key("person").open('{')
                .field("id", p.id())
                .field("displayName", p.displayName())
                .field("sex", p.sex().code())
                .field("birthDate", p.birthDate().toString())
                .field("fatherStatureCm", p.fatherStatureCm())
                .field("motherStatureCm", p.motherStatureCm())
                .field("predictedAdultStatureCm", p.predictedAdultStatureCm())
                .field("letterLanguage", p.letterLanguage())
                .field("notes", p.notes());
        j.key("consent").open('{')
                .field("measurement", p.consent().measurement())
                .field("photographs", p.consent().photographs())
                .field("shareWithParent", p.consent().shareWithParent())
                .close('}');
        j.close('}');
        j.key("memberships").open('[');
        for (Membership m : tx.squads().membershipsOf(personId)) {
            j.open('{').field("squad", squads.get(m.squadId()).name()).field("joinedOn", m.joinedOn().toString())
                    .field("leftOn", m.leftOn() == null ? null : m.leftOn().toString()).close('}');
        }
        j.close(']');
        j.key("visits").open('[');
        for (Visit v : visits) {
            Measurer m = measurers.get(v.measurerId());
            j.open('{').field("id", v.id()).field("measuredAt", v.measuredAt().format(VisitRepository.TIME))
                    .field("measurer", m.name()).field("measurerAccreditation", m.accreditation())
                    .field("context", v.context()).field("notes", v.notes());
            j.key("trials").open('[');
            for (SiteTrials t : v.trials()) {
                j.open('{').field("site", t.site().code()).field("unit", t.site().unit().symbol());
                j.key("values").open('[');
                for (double d : t.values()) {
                    j.value(d);
                }
                j.close(']').close('}');
            }
            j.close(']');
            VisitRating r = ratings.get(v.id());
            if (r != null) {
                j.key("raterRating").open('{').field("endomorphy", r.rating().endomorphy())
                        .field("mesomorphy", r.rating().mesomorphy()).field("ectomorphy", r.rating().ectomorphy())
                        .field("rater", r.rater()).field("method", r.method().code()).close('}');
            }
            j.close('}');
        }
        j.close(']');
        j.close('}');
        return j + "\n";
    }
}
