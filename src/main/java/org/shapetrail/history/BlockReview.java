package org.shapetrail.history;

import java.time.LocalDate;
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
 * A training block reviewed: for each member of the squad during the block, the rated visit nearest its
 * start and the one nearest its end, each within a window of days; the change with its verdict; members
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

    /** As above, taking each member's history from {@code histories} (already computed ones). */
    public static BlockReview of(HistoryBuilder b, TrainingBlock block, int windowDays,
                                 java.util.function.Function<Person, PersonHistory> histories) {
        Academy a = b.academy();
        List<Athlete> athletes = new ArrayList<>();
        List<Missing> missing = new ArrayList<>();
        List<Long> members = a.memberships().stream().filter(m -> m.squadId() == block.squadId())
                .filter(m -> overlaps(m, block)).map(Membership::personId).distinct().toList();
        for (long id : members) {
            Person p = a.person(id).orElseThrow();
            PersonHistory h = histories.apply(p);
            Optional<VisitResult> before = nearest(h.rated(), block.startsOn(), windowDays);
            Optional<VisitResult> after = nearest(h.rated(), block.endsOn(), windowDays);
            if (before.isEmpty() && after.isEmpty()) {
                missing.add(new Missing(p, "no rated visit within " + windowDays + " days of the start or the end"));
            } else if (before.isEmpty()) {
                missing.add(new Missing(p, "no rated visit within " + windowDays + " days of the start ("
                        + block.startsOn() + ")"));
            } else if (after.isEmpty()) {
                missing.add(new Missing(p, "no rated visit within " + windowDays + " days of the end ("
                        + block.endsOn() + ")"));
            } else if (before.get().visit().id() == after.get().visit().id()) {
                missing.add(new Missing(p, "the same visit is nearest to both the start and the end"));
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

    private static boolean overlaps(Membership m, TrainingBlock b) {
        return !m.joinedOn().isAfter(b.endsOn()) && (m.leftOn() == null || !m.leftOn().isBefore(b.startsOn()));
    }

    static Optional<VisitResult> nearest(List<VisitResult> rated, LocalDate day, int window) {
        return rated.stream()
                .filter(r -> Math.abs(ChronoUnit.DAYS.between(day, r.visit().measuredAt().toLocalDate())) <= window)
                .min(Comparator.comparingLong(r -> Math.abs(ChronoUnit.DAYS.between(day,
                        r.visit().measuredAt().toLocalDate()))));
    }
}
