package org.shapetrail.app;

import static org.shapetrail.i18n.Messages.tr;

import org.shapetrail.store.RecordSource;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;
import javafx.beans.property.BooleanProperty;
import javafx.beans.property.ObjectProperty;
import javafx.beans.property.SimpleBooleanProperty;
import javafx.beans.property.SimpleObjectProperty;
import javafx.beans.property.SimpleStringProperty;
import javafx.beans.property.StringProperty;
import javafx.collections.FXCollections;
import javafx.collections.ObservableList;
import org.shapetrail.history.BlockReview;
import org.shapetrail.history.PersonHistory;
import org.shapetrail.history.VisitResult;
import org.shapetrail.store.Database;
import org.shapetrail.store.Person;
import org.shapetrail.store.Squad;
import org.shapetrail.store.TextRules;
import org.shapetrail.store.TrainingBlock;

/**
 * A new training block for a squad, or an edit of one: name, first and last day, aim, and for each member
 * the visits that count as before and after — by default the latest rated visit up to the start and the
 * earliest from the end (within {@link BlockReview#DEFAULT_WINDOW_DAYS} days), any of the member's rated
 * visits by choice. Every problem is listed; Save writes nothing until there is none.
 */
public final class BlockFormViewModel {
    /** One member of the squad during the block, with their choice of visits. */
    public static final class Member {
        final Person person;
        final List<VisitResult> rated;
        final ObjectProperty<VisitResult> before = new SimpleObjectProperty<>();
        final ObjectProperty<VisitResult> after = new SimpleObjectProperty<>();
        VisitResult defaultBefore;
        VisitResult defaultAfter;

        Member(Person person, List<VisitResult> rated) {
            this.person = person;
            this.rated = List.copyOf(rated);
        }

        public Person person() {
            return person;
        }

        public List<VisitResult> rated() {
            return rated;
        }

        public ObjectProperty<VisitResult> beforeProperty() {
            return before;
        }

        public ObjectProperty<VisitResult> afterProperty() {
            return after;
        }

        /** True when the member's visits differ from the default pair (so they are kept with the block). */
        boolean chosen() {
            return before.get() != null && after.get() != null
                    && (before.get() != defaultBefore || after.get() != defaultAfter);
        }
    }

    private final RecordSource file;
    private final Loaded loaded;
    private final Squad squad;
    private final TrainingBlock editing;
    final StringProperty name = new SimpleStringProperty("");
    final StringProperty aim = new SimpleStringProperty("");
    final ObjectProperty<LocalDate> start = new SimpleObjectProperty<>();
    final ObjectProperty<LocalDate> end = new SimpleObjectProperty<>();
    final ObservableList<Member> members = FXCollections.observableArrayList();
    final ObservableList<String> problems = FXCollections.observableArrayList();
    final BooleanProperty canSave = new SimpleBooleanProperty(false);
    final BooleanProperty saving = new SimpleBooleanProperty(false);

    public BlockFormViewModel(Loaded loaded, Squad squad, TrainingBlock editing) {
        this.file = loaded.source();
        this.loaded = loaded;
        this.squad = Objects.requireNonNull(squad, "squad");
        this.editing = editing;
        if (editing != null) {
            name.set(editing.name());
            aim.set(editing.aim());
            start.set(editing.startsOn());
            end.set(editing.endsOn());
        }
        start.addListener(o -> membersChanged());
        end.addListener(o -> membersChanged());
        name.addListener(o -> check());
        aim.addListener(o -> check());
        membersChanged();
    }

    public boolean isEdit() {
        return editing != null;
    }

    public Squad squad() {
        return squad;
    }

    public ObservableList<Member> members() {
        return members;
    }

    public ObservableList<String> problems() {
        return problems;
    }

    public StringProperty nameProperty() {
        return name;
    }

    public StringProperty aimProperty() {
        return aim;
    }

    public ObjectProperty<LocalDate> startProperty() {
        return start;
    }

    public ObjectProperty<LocalDate> endProperty() {
        return end;
    }

    public BooleanProperty canSaveProperty() {
        return canSave;
    }

    /** The draft block with the dates as they stand (or null while a date is missing or out of order). */
    private TrainingBlock dates() {
        if (start.get() == null || end.get() == null || end.get().isBefore(start.get())) {
            return null;
        }
        return new TrainingBlock(0, "draft", squad.id(), start.get(), end.get());
    }

    /** The members for the dates as they stand, each with the default pair, or the pair kept with the block. */
    private void membersChanged() {
        TrainingBlock d = dates();
        Map<Long, VisitResult[]> kept = new HashMap<>();
        for (Member m : members) {
            if (m.chosen()) {
                kept.put(m.person.id(), new VisitResult[] {m.before.get(), m.after.get()});
            }
        }
        List<Member> out = new ArrayList<>();
        if (d != null) {
            for (long id : BlockReview.members(loaded.builder().academy(), d)) {
                PersonHistory h = loaded.histories().get(id);
                Member m = new Member(h.person(), h.rated());
                m.defaultBefore = BlockReview.defaultBefore(m.rated, d, BlockReview.DEFAULT_WINDOW_DAYS).orElse(null);
                m.defaultAfter = BlockReview.defaultAfter(m.rated, d, BlockReview.DEFAULT_WINDOW_DAYS).orElse(null);
                VisitResult[] pair = kept.get(id);
                TrainingBlock.Pick stored = editing == null || !members.isEmpty() ? null : editing.picks().get(id);
                if (pair == null && stored != null) {
                    pair = new VisitResult[] {visit(m, stored.beforeVisitId()), visit(m, stored.afterVisitId())};
                }
                m.before.set(pair != null ? pair[0] : m.defaultBefore);
                m.after.set(pair != null ? pair[1] : m.defaultAfter);
                m.before.addListener(o -> check());
                m.after.addListener(o -> check());
                out.add(m);
            }
        }
        out.sort(java.util.Comparator.comparing(m -> m.person.displayName()));
        members.setAll(out);
        check();
    }

    private static VisitResult visit(Member m, long id) {
        return m.rated.stream().filter(r -> r.visit().id() == id).findFirst().orElse(null);
    }

    private List<String> validate() {
        List<String> out = new ArrayList<>();
        String n = name.get() == null ? "" : name.get().strip();
        if (n.isEmpty()) {
            out.add(tr("blockform.enterName"));
        } else {
            TextRules.problem(TextRules.Field.BLOCK_NAME, n).ifPresent(w -> out.add(sentence(w)));
            boolean taken = loaded.builder().academy().blocks().stream().anyMatch(b -> b.name().strip()
                    .equalsIgnoreCase(n) && (editing == null || b.id() != editing.id()));
            if (taken) {
                out.add(tr("blockform.nameTaken", n));
            }
        }
        TextRules.problem(TextRules.Field.BLOCK_AIM, aim.get()).ifPresent(w -> out.add(sentence(w)));
        if (start.get() == null) {
            out.add(tr("blockform.enterFirst"));
        }
        if (end.get() == null) {
            out.add(tr("blockform.enterLast"));
        }
        if (start.get() != null && end.get() != null && end.get().isBefore(start.get())) {
            out.add(tr("blockform.order", end.get(), start.get()));
        }
        for (Member m : members) {
            if (m.before.get() != null && m.after.get() != null
                    && !m.before.get().visit().measuredAt().isBefore(m.after.get().visit().measuredAt())) {
                out.add(tr("blockform.visitOrder", m.person.displayName(), m.before.get().visit().measuredAt()
                        .toLocalDate(), m.after.get().visit().measuredAt().toLocalDate()));
            }
        }
        return out;
    }

    private static String sentence(String w) {
        return Character.toUpperCase(w.charAt(0)) + w.substring(1) + ".";
    }

    private void check() {
        List<String> p = validate();
        problems.setAll(p);
        canSave.set(p.isEmpty());
    }

    /** The block as it would be saved: chosen pairs kept, default pairs left to the default. */
    TrainingBlock block() {
        Map<Long, TrainingBlock.Pick> picks = new HashMap<>();
        for (Member m : members) {
            if (m.chosen()) {
                picks.put(m.person.id(), new TrainingBlock.Pick(m.before.get().visit().id(), m.after.get().visit().id()));
            }
        }
        return new TrainingBlock(editing == null ? 0 : editing.id(), name.get().strip(), squad.id(), start.get(),
                end.get(), aim.get(), picks);
    }

    /** Saves the block whole, or refuses with every reason and writes nothing. */
    public Optional<TrainingBlock> save() {
        List<String> p = validate();
        if (!p.isEmpty()) {
            problems.setAll(p);
            return Optional.empty();
        }
        TrainingBlock b = block();
        try {
            return Optional.of(OffFxThread.call(saving, () -> {
                try (Database db = file.open()) {
                    return db.inTransaction(tx -> {
                        if (editing == null) {
                            return tx.blocks().insert(b);
                        }
                        tx.blocks().update(b);
                        return b;
                    });
                }
            }));
        } catch (RuntimeException e) {
            problems.setAll(List.of(Errors.describe(e)));
            return Optional.empty();
        }
    }
}
