package org.shapetrail.history;

import java.time.temporal.ChronoUnit;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Optional;
import org.shapetrail.groups.BlockResult;
import org.shapetrail.groups.GroupTests;
import org.shapetrail.noise.ChangeVerdict;
import org.shapetrail.noise.Verdict;
import org.shapetrail.somatotype.Rating;
import org.shapetrail.store.Membership;
import org.shapetrail.store.Person;
import org.shapetrail.store.TrainingBlock;

/**
 * A training block reviewed: for each member of the squad during the block, the visits chosen for the
 * block or by default the rated visit nearest the start from before it and nearest the end from after it,
 * each within a window of days; the change with its verdict; members
 * without both visits listed by name with the reason; and the group statistics.
 *
 * @param result the group statistics, or null when fewer than two athletes have both visits
 */
public record BlockReview(TrainingBlock block, int windowDays, List<Athlete> athletes, List<Missing> missing,
                          BlockResult result) {
    /** Default window around the block's first and last day, days. */
    public static final int DEFAULT_WINDOW_DAYS = 21;

    /** An athlete with both visits. */
    public record Athlete(Person person, VisitResult before, VisitResult after, ChangeVerdict change) {
    }

    /** A member left out, and why. */
    public record Missing(Person person, String reason) {
    }

    public static BlockReview of(HistoryBuilder b, TrainingBlock block, int windowDays) {
        return of(b, block, windowDays, b::history);
    }

    /**
     * As above, taking each member's history from {@code histories} (already computed ones). A member's
     * visits are those chosen for the block, or by default the latest rated visit in the {@code windowDays}
     * up to the start and the earliest in the {@code windowDays} from the end.
     */
    public static BlockReview of(HistoryBuilder b, TrainingBlock block, int windowDays,
                                 java.util.function.Function<Person, PersonHistory> histories) {
        Academy a = b.academy();
        List<Athlete> athletes = new ArrayList<>();
        List<Missing> missing = new ArrayList<>();
        for (long id : members(a, block)) {
            Person p = a.person(id).orElseThrow();
            PersonHistory h = histories.apply(p);
            TrainingBlock.Pick pick = block.picks().get(id);
            Optional<VisitResult> before;
            Optional<VisitResult> after;
            if (pick != null) {
                before = h.rated().stream().filter(r -> r.visit().id() == pick.beforeVisitId()).findFirst();
                after = h.rated().stream().filter(r -> r.visit().id() == pick.afterVisitId()).findFirst();
                if (before.isEmpty() || after.isEmpty()) {
                    missing.add(new Missing(p, org.shapetrail.i18n.Messages.tr("block.pickUnrated")));
                    continue;
                }
            } else {
                before = defaultBefore(h.rated(), block, windowDays);
                after = defaultAfter(h.rated(), block, windowDays);
            }
            if (before.isEmpty() && after.isEmpty()) {
                missing.add(new Missing(p, org.shapetrail.i18n.Messages.tr("block.noneEither", windowDays)));
            } else if (before.isEmpty()) {
                missing.add(new Missing(p, org.shapetrail.i18n.Messages.tr("block.noneBefore", windowDays,
                        block.startsOn())));
            } else if (after.isEmpty()) {
                missing.add(new Missing(p, org.shapetrail.i18n.Messages.tr("block.noneAfter", windowDays,
                        block.endsOn())));
            } else {
                athletes.add(new Athlete(p, before.get(), after.get(), b.verdict(before.get(), after.get())));
            }
        }
        athletes.sort(Comparator.comparing(x -> x.person().displayName()));
        missing.sort(Comparator.comparing(x -> x.person().displayName()));
        BlockResult result = null;
        if (athletes.size() >= 2) {
            List<Rating> bs = athletes.stream().map(x -> x.before().somatotype().rating()).toList();
            List<Rating> as = athletes.stream().map(x -> x.after().somatotype().rating()).toList();
            List<Verdict> vs = athletes.stream().map(x -> x.change().verdict()).toList();
            result = GroupTests.block(bs, as, vs);
        }
        return new BlockReview(block, windowDays, athletes, missing, result);
    }

    /** Ids of the people who belonged to the block's squad at some time during the block. */
    public static List<Long> members(Academy a, TrainingBlock block) {
        return a.memberships().stream().filter(m -> m.squadId() == block.squadId()).filter(m -> overlaps(m, block))
                .map(Membership::personId).distinct().toList();
    }

    /** The default before visit: the latest rated one on or before the start, at most {@code window} days before. */
    public static Optional<VisitResult> defaultBefore(List<VisitResult> rated, TrainingBlock block, int window) {
        return rated.stream().filter(r -> {
            long d = ChronoUnit.DAYS.between(r.visit().measuredAt().toLocalDate(), block.startsOn());
            return d >= 0 && d <= window;
        }).reduce((x, y) -> y);
    }

    /** The default after visit: the earliest rated one on or after the end, at most {@code window} days after. */
    public static Optional<VisitResult> defaultAfter(List<VisitResult> rated, TrainingBlock block, int window) {
        return rated.stream().filter(r -> {
            long d = ChronoUnit.DAYS.between(block.endsOn(), r.visit().measuredAt().toLocalDate());
            return d >= 0 && d <= window;
        }).findFirst();
    }

    private static boolean overlaps(Membership m, TrainingBlock b) {
        return !m.joinedOn().isAfter(b.endsOn()) && (m.leftOn() == null || !m.leftOn().isBefore(b.startsOn()));
    }

}
