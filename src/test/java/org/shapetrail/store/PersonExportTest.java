package org.shapetrail.store;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.nio.file.Path;
import java.time.LocalDate;
import java.time.LocalDateTime;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.shapetrail.measure.Sex;
import org.shapetrail.measure.Site;
import org.shapetrail.measure.SiteTrials;

class PersonExportTest {
    @TempDir
    Path dir;

    @Test
    void exportHoldsThePersonMembershipsVisitsAndRawTrials() {
        try (Database db = Database.open(dir.resolve("x.sqlite"))) {
            String json = db.inTransaction(tx -> {
                Person p = tx.people().insert(new Person(0, "Zoë \"Zo\" Quennell", Sex.FEMALE, LocalDate.of(2011, 2, 28),
                        null, 165.5, "left-handed", new Consent(true, false, true), null));
                Squad s = tx.squads().insert("Rowing juniors");
                tx.squads().addMember(new Membership(p.id(), s.id(), LocalDate.of(2024, 9, 1), null));
                Measurer m = tx.measurers().insert("Ada Quarrington", "ISAK level 2");
                tx.visits().insert(new Visit(0, p.id(), LocalDateTime.of(2024, 9, 3, 9, 30), m.id(), "pre-season", "",
                        List.of(SiteTrials.of(Site.STATURE, 150.1, 150.3))));
                return PersonExport.toJson(tx, p.id());
            });
            String expected = """
                    {
                      "format": "shapetrail-person-record/1",
                      "person": {
                        "id": 1,
                        "displayName": "Zoë \\"Zo\\" Quennell",
                        "sex": "F",
                        "birthDate": "2011-02-28",
                        "fatherStatureCm": null,
                        "motherStatureCm": 165.5,
                        "predictedAdultStatureCm": null,
                        "letterLanguage": "",
                        "notes": "left-handed",
                        "consent": {
                          "measurement": true,
                          "photographs": false,
                          "shareWithParent": true
                        }
                      },
                      "memberships": [
                        {
                          "squad": "Rowing juniors",
                          "joinedOn": "2024-09-01",
                          "leftOn": null
                        }
                      ],
                      "visits": [
                        {
                          "id": 1,
                          "measuredAt": "2024-09-03T09:30:00",
                          "measurer": "Ada Quarrington",
                          "measurerAccreditation": "ISAK level 2",
                          "context": "pre-season",
                          "notes": "",
                          "trials": [
                            {
                              "site": "stature",
                              "unit": "cm",
                              "values": [
                                150.1,
                                150.3
                              ]
                            }
                          ]
                        }
                      ]
                    }
                    """;
            assertEquals(expected, json);
        }
    }
}
