package org.shapetrail.app;

import static org.shapetrail.i18n.Messages.tr;

import org.shapetrail.store.RecordSource;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import javafx.beans.property.BooleanProperty;
import javafx.beans.property.ObjectProperty;
import javafx.beans.property.SimpleBooleanProperty;
import javafx.beans.property.SimpleObjectProperty;
import javafx.beans.property.SimpleStringProperty;
import javafx.beans.property.StringProperty;
import javafx.collections.FXCollections;
import javafx.collections.ObservableList;
import org.shapetrail.measure.DecimalStyle;
import org.shapetrail.measure.Sex;
import org.shapetrail.store.Consent;
import org.shapetrail.store.Database;
import org.shapetrail.store.Membership;
import org.shapetrail.store.Person;
import org.shapetrail.store.Squad;

/**
 * Adding or editing a person: name, sex, date of birth, parents' statures, a predicted adult stature,
 * consents, and (for a new person) the squad they join. Every problem is listed; Save writes nothing
 * until there is none.
 */
public final class PersonFormViewModel {
    private final RecordSource file;
    private final Locale locale;
    private final Person editing;
    final StringProperty name = new SimpleStringProperty("");
    final ObjectProperty<Sex> sex = new SimpleObjectProperty<>();
    final ObjectProperty<LocalDate> birth = new SimpleObjectProperty<>();
    final StringProperty father = new SimpleStringProperty("");
    final StringProperty mother = new SimpleStringProperty("");
    final StringProperty predicted = new SimpleStringProperty("");
    /** The language of the person's letters: "" for the desk's, or en, es, pt (a family may read another). */
    final StringProperty letterLanguage = new SimpleStringProperty("");
    final BooleanProperty consentMeasurement = new SimpleBooleanProperty(false);
    final BooleanProperty consentPhotographs = new SimpleBooleanProperty(false);
    final BooleanProperty consentSharing = new SimpleBooleanProperty(false);
    final ObjectProperty<Squad> squad = new SimpleObjectProperty<>();
    final ObservableList<Squad> squads = FXCollections.observableArrayList();
    final ObservableList<String> problems = FXCollections.observableArrayList();
    final BooleanProperty canSave = new SimpleBooleanProperty(false);
    /** True while a save is being written (the view takes input away meanwhile). */
    final BooleanProperty saving = new SimpleBooleanProperty(false);

    public PersonFormViewModel(RecordSource file, List<Squad> squads, Locale locale, Person editing) {
        this.file = file;
        this.locale = locale;
        this.editing = editing;
        this.squads.setAll(squads);
        if (editing != null) {
            name.set(editing.displayName());
            sex.set(editing.sex());
            birth.set(editing.birthDate());
            father.set(text(editing.fatherStatureCm()));
            mother.set(text(editing.motherStatureCm()));
            predicted.set(text(editing.predictedAdultStatureCm()));
            letterLanguage.set(editing.letterLanguage());
            consentMeasurement.set(editing.consent().measurement());
            consentPhotographs.set(editing.consent().photographs());
            consentSharing.set(editing.consent().shareWithParent());
        }
        for (var p : List.of(name, father, mother, predicted)) {
            p.addListener(o -> check());
        }
        sex.addListener(o -> check());
        birth.addListener(o -> check());
        check();
    }

    private String text(Double v) {
        return v == null ? "" : Numbers.trial(locale, v);
    }

    private Double stature(String what, String t, List<String> out) {
        if (t == null || t.isBlank()) {
            return null;
        }
        char sep = DecimalStyle.of(locale).separator();
        try {
            double v = Double.parseDouble(t.strip().replace(sep, '.'));
            if (v < 3) {
                out.add(tr("form.metres", what, t.strip(), Numbers.fmt(locale, v * 100, 1)));
                return null;
            }
            if (v < 120 || v > 230) {
                out.add(tr("form.range", what, t.strip()));
                return null;
            }
            return v;
        } catch (NumberFormatException e) {
            out.add(tr("form.notNumber", what, t.strip()));
            return null;
        }
    }

    void check() {
        problems.setAll(validate().problems);
        canSave.set(problems.isEmpty());
    }

    private record Checked(Person person, List<String> problems) {
    }

    private Checked validate() {
        List<String> out = new ArrayList<>();
        if (name.get() == null || name.get().isBlank()) {
            out.add(tr("form.enterName"));
        } else {
            org.shapetrail.store.TextRules.problem(org.shapetrail.store.TextRules.Field.PERSON_NAME, name.get().strip())
                    .ifPresent(w -> out.add(Character.toUpperCase(w.charAt(0)) + w.substring(1) + "."));
        }
        if (sex.get() == null) {
            out.add(tr("form.chooseSex"));
        }
        if (birth.get() == null) {
            out.add(tr("form.enterBirth"));
        } else if (birth.get().isAfter(LocalDate.now())) {
            out.add(tr("form.futureBirth"));
        }
        Double f = stature(tr("form.fatherName"), father.get(), out);
        Double m = stature(tr("form.motherName"), mother.get(), out);
        Double p = stature(tr("form.predictedName"), predicted.get(), out);
        if (!out.isEmpty()) {
            return new Checked(null, out);
        }
        Consent c = new Consent(consentMeasurement.get(), consentPhotographs.get(), consentSharing.get());
        Person person = new Person(editing == null ? 0 : editing.id(), name.get().strip(), sex.get(), birth.get(), f, m,
                editing == null ? "" : editing.notes(), c, p, letterLanguage.get() == null ? "" : letterLanguage.get());
        return new Checked(person, out);
    }

    /** Saves, or refuses with every reason; returns the saved person. */
    public Optional<Person> save() {
        Checked c = validate();
        if (c.person() == null) {
            problems.setAll(c.problems());
            return Optional.empty();
        }
        Squad joins = squad.get();
        try {
            return Optional.of(OffFxThread.call(saving, () -> {
                try (Database db = file.open()) {
                    return db.inTransaction(tx -> {
                        if (editing == null) {
                            Person saved = tx.people().insert(c.person());
                            if (joins != null) {
                                tx.squads().addMember(new Membership(saved.id(), joins.id(), LocalDate.now(), null));
                            }
                            return saved;
                        }
                        tx.people().update(c.person());
                        return c.person();
                    });
                }
            }));
        } catch (RuntimeException e) {
            problems.setAll(List.of(Errors.describe(e)));
            return Optional.empty();
        }
    }

    public Locale locale() {
        return locale;
    }

    public boolean isEdit() {
        return editing != null;
    }
}
