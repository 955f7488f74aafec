package org.shapetrail.letters;

import java.time.LocalDate;
import java.time.format.DateTimeFormatter;
import java.time.format.FormatStyle;
import java.time.temporal.ChronoUnit;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.shapetrail.chart.ChartModel;
import org.shapetrail.chart.SomatochartBuilder;
import org.shapetrail.growth.MaturityEstimate;
import org.shapetrail.growth.MaturityStatus;
import org.shapetrail.history.HistoryBuilder;
import org.shapetrail.history.PersonHistory;
import org.shapetrail.history.VisitResult;
import org.shapetrail.measure.Site;
import org.shapetrail.noise.ChangeVerdict;
import org.shapetrail.noise.Verdict;
import org.shapetrail.somatotype.Rating;

/**
 * Writes a progress letter for a person and a period in neutral, plain words: growth, body shape and its
 * change with whether it is beyond measurement error, what the numbers mean and do not mean, whom to ask,
 * and the cautions. A pure function of the history: testable without PDF.
 */
public final class LetterComposer {
    /** Age below which the letter addresses the parents. */
    public static final double ADULT_AGE = 18;
    /** Age below which skinfold thickness is left out unless the sender asks for it. */
    public static final double SKINFOLD_AGE = 16;

    public static final List<String> CAUTIONS = List.of(
            "This letter is not a medical or nutritional assessment.",
            "Children grow at different rates; estimates of growth stage can be out by about half a year either way.",
            "Questions go to the club's qualified practitioner named above or to your family doctor.",
            "Local safeguarding and data-protection rules apply to these records.");

    private final HistoryBuilder builder;
    /** Histories of block members, computed once per composer (a squad's letters share them). */
    private final java.util.Map<Long, PersonHistory> histories = new java.util.concurrent.ConcurrentHashMap<>();
    private final LetterSettings settings;
    private final Locale locale;
    private final DateTimeFormatter dates;

    public LetterComposer(HistoryBuilder builder, LetterSettings settings, Locale locale) {
        this.builder = builder;
        this.settings = settings;
        this.locale = locale;
        this.dates = DateTimeFormatter.ofLocalizedDate(FormatStyle.LONG).withLocale(locale);
    }

    private String n(double v, int d) {
        return String.format(locale, "%." + d + "f", v);
    }

    private boolean inPeriod(VisitResult r) {
        LocalDate d = r.visit().measuredAt().toLocalDate();
        return !d.isBefore(settings.from()) && !d.isAfter(settings.to());
    }

    public Letter compose(PersonHistory h) {
        var p = h.person();
        String first = p.displayName().split(" ")[0];
        List<VisitResult> visits = h.visits().stream().filter(this::inPeriod).toList();
        double age = visits.isEmpty() ? h.latest().map(VisitResult::ageYears).orElse(ADULT_AGE)
                : visits.get(visits.size() - 1).ageYears();
        boolean junior = age < ADULT_AGE;
        boolean skinfolds = age >= SKINFOLD_AGE || settings.skinfoldsForUnder16();
        List<String> heading = List.of(settings.academy(), "Growth and body shape: progress letter",
                p.displayName() + " · " + settings.from().format(dates) + " to " + settings.to().format(dates));
        List<Letter.Section> sections = new ArrayList<>();
        String dear = junior ? "Dear parent or guardian of " + p.displayName() + "," : "Dear " + p.displayName() + ",";
        sections.add(new Letter.Section("", List.of(dear, "This letter summarises the measurements " + first
                + " had with us between " + settings.from().format(dates) + " and " + settings.to().format(dates)
                + ". It describes growth and body shape, compared with " + first + "'s own earlier measurements."
                + " It is not a judgement of health, fitness, talent or worth.")));
        if (visits.isEmpty()) {
            sections.add(new Letter.Section("Measurements", List.of("There were no measurements in this period, so"
                    + " there is nothing new to report. If you expected some, please ask us.")));
        } else {
            sections.add(growth(h, visits, first));
            sections.add(shape(h, visits, first, skinfolds));
        }
        blockSection(h, first).ifPresent(sections::add);
        sections.add(new Letter.Section("What these numbers mean, and what they do not", List.of(
                "They describe body shape and size on the days of measuring. Shape changes with growth, training and"
                        + " time; there is no right or wrong shape for a sport or for a person.",
                "Every measurement has a small error. We say a change is beyond measurement error only when it is"
                        + " larger than what the measurer's own repeat measurements would produce by chance in 19 out"
                        + " of 20 cases.")));
        String who = settings.sender() + (settings.senderRole().isBlank() ? "" : " (" + settings.senderRole() + ")");
        sections.add(new Letter.Section("Questions", List.of("Please contact " + who + ", " + settings.contact()
                + ", or your family doctor.")));
        List<List<String>> table = new ArrayList<>();
        if (!visits.isEmpty()) {
            List<String> head = new ArrayList<>(List.of("Date", "Age", "Height (cm)", "Muscle & bone",
                    "Slenderness"));
            if (skinfolds) {
                head.add("Skinfolds");
            }
            table.add(head);
            for (VisitResult r : visits) {
                List<String> row = new ArrayList<>();
                row.add(r.visit().measuredAt().toLocalDate().format(DateTimeFormatter.ofLocalizedDate(FormatStyle.MEDIUM)
                        .withLocale(locale)));
                row.add(n(r.ageYears(), 1));
                row.add(r.value(Site.STATURE).map(x -> n(x, 1)).orElse("—"));
                row.add(r.rating().map(s -> n(s.rating().mesomorphy(), 1)).orElse("—"));
                row.add(r.rating().map(s -> n(s.rating().ectomorphy(), 1)).orElse("—"));
                if (skinfolds) {
                    row.add(r.rating().map(s -> n(s.rating().endomorphy(), 1)).orElse("—"));
                }
                table.add(row);
            }
        }
        // the somatochart's positions depend on all three components, so it is shown only with skinfolds included
        return new Letter(p.displayName(), heading, sections, table, skinfolds ? chart(h, visits) : null, CAUTIONS);
    }

    private Letter.Section growth(PersonHistory h, List<VisitResult> visits, String first) {
        List<String> ps = new ArrayList<>();
        List<VisitResult> st = visits.stream().filter(r -> r.value(Site.STATURE).isPresent()).toList();
        boolean adult = !visits.isEmpty() && visits.get(visits.size() - 1).ageYears() >= ADULT_AGE;
        if (adult && !st.isEmpty()) {
            VisitResult last = st.get(st.size() - 1);
            ps.add("Height was " + n(last.value(Site.STATURE).get(), 1) + " cm on " + last.visit().measuredAt()
                    .toLocalDate().format(dates) + ".");
        } else if (st.size() >= 2) {
            VisitResult a = st.get(0);
            VisitResult b = st.get(st.size() - 1);
            double gain = b.value(Site.STATURE).get() - a.value(Site.STATURE).get();
            long days = ChronoUnit.DAYS.between(a.visit().measuredAt(), b.visit().measuredAt());
            String pace = days >= 90 ? ", about " + n(gain / (days / 365.25), 1) + " cm a year" : "";
            ps.add("Height went from " + n(a.value(Site.STATURE).get(), 1) + " cm (" + a.visit().measuredAt()
                    .toLocalDate().format(dates) + ") to " + n(b.value(Site.STATURE).get(), 1) + " cm ("
                    + b.visit().measuredAt().toLocalDate().format(dates) + "): " + (gain >= 0 ? "a gain of " : "a change of ")
                    + n(gain, 1) + " cm in " + Math.round(days / 30.44) + " months" + pace + ".");
        } else if (st.size() == 1) {
            ps.add("Height was " + n(st.get(0).value(Site.STATURE).get(), 1) + " cm on "
                    + st.get(0).visit().measuredAt().toLocalDate().format(dates) + ".");
        }
        MaturityEstimate m = h.growth().maturity();
        if (m != null && st.size() > 0) {
            String stage = m.status() == MaturityStatus.PRE_PHV ? "before the fastest years of growth"
                    : m.status() == MaturityStatus.CIRCA_PHV ? "around the time of fastest growth (the growth spurt)"
                    : "past the fastest years of growth";
            ps.add("Estimated stage of growth: " + stage + ". This is an estimate from height, sitting height, body"
                    + " size and age; it can be out by about half a year either way, and children grow at different"
                    + " rates.");
        }
        if (h.growth().rapidGrowth()) {
            ps.add(first + " has been growing fast recently (more than " + n(builder.settings().alert()
                    .thresholdCmPerYear(), 0) + " cm a year). During fast growth, muscles, tendons and growth plates"
                    + " can be sensitive, so our physio keeps an eye on training load. If " + first + " mentions pain"
                    + " at the knees or heels, please let our physio know.");
        }
        return new Letter.Section("Growth", ps);
    }

    private Letter.Section shape(PersonHistory h, List<VisitResult> visits, String first, boolean skinfolds) {
        List<String> ps = new ArrayList<>();
        ps.add("Body shape is described by three numbers, each on a scale from about 1 to 7: muscle and bone build,"
                + " slenderness (how long and lean the build is for its height)"
                + (skinfolds ? ", and skinfold thickness under the skin." : ". At this age we describe only these"
                + " two."));
        List<VisitResult> rated = visits.stream().filter(r -> r.somatotype() != null).toList();
        if (rated.isEmpty()) {
            ps.add("None of the measurements in this period was complete enough to describe body shape.");
            return new Letter.Section("Body shape", ps);
        }
        VisitResult a = rated.get(0);
        VisitResult b = rated.get(rated.size() - 1);
        Rating ra = a.somatotype().rating();
        Rating rb = b.somatotype().rating();
        if (rated.size() == 1) {
            ps.add("On " + a.visit().measuredAt().toLocalDate().format(dates) + ": muscle and bone build "
                    + n(ra.mesomorphy(), 1) + ", slenderness " + n(ra.ectomorphy(), 1)
                    + (skinfolds ? ", skinfold thickness " + n(ra.endomorphy(), 1) : "") + ".");
            return new Letter.Section("Body shape", ps);
        }
        ps.add("From " + a.visit().measuredAt().toLocalDate().format(dates) + " to " + b.visit().measuredAt()
                .toLocalDate().format(dates) + ": muscle and bone build went from " + n(ra.mesomorphy(), 1) + " to "
                + n(rb.mesomorphy(), 1) + ", slenderness from " + n(ra.ectomorphy(), 1) + " to " + n(rb.ectomorphy(), 1)
                + (skinfolds ? ", skinfold thickness from " + n(ra.endomorphy(), 1) + " to " + n(rb.endomorphy(), 1) : "")
                + ".");
        ChangeVerdict v = builder.verdict(a, b);
        ps.add(switch (v.verdict()) {
            case BEYOND_NOISE -> "This change is larger than measurement error: it is a real change in body shape.";
            case BORDERLINE -> "This change is close to the size of measurement error, so it may or may not be real.";
            case WITHIN_NOISE -> "This change is within measurement error: it may be no real change at all.";
        });
        if (skinfolds) {
            ps.add("The chart shows each measurement as a point, joined in time order; a solid line marks a step"
                    + " larger than measurement error, dotted and dashed lines steps within or close to it.");
        }
        return new Letter.Section("Body shape", ps);
    }

    /** A paragraph on each training block of the period the person took part in (visits near both ends). */
    private java.util.Optional<Letter.Section> blockSection(PersonHistory h, String first) {
        List<String> ps = new ArrayList<>();
        for (var block : builder.academy().blocks()) {
            if (block.endsOn().isBefore(settings.from()) || block.startsOn().isAfter(settings.to())) {
                continue;
            }
            boolean member = builder.academy().memberships().stream().anyMatch(m -> m.personId() == h.person().id()
                    && m.squadId() == block.squadId() && !m.joinedOn().isAfter(block.endsOn())
                    && (m.leftOn() == null || !m.leftOn().isBefore(block.startsOn())));
            if (!member) {
                continue;
            }
            var review = org.shapetrail.history.BlockReview.of(builder, block,
                    org.shapetrail.history.BlockReview.DEFAULT_WINDOW_DAYS, p -> p.id() == h.person().id() ? h
                            : histories.computeIfAbsent(p.id(), id -> builder.history(p)));
            review.athletes().stream().filter(a -> a.person().id() == h.person().id()).findFirst().ifPresent(a -> {
                String words = switch (a.change().verdict()) {
                    case BEYOND_NOISE -> "a change in body shape larger than measurement error";
                    case BORDERLINE -> "a change close to the size of measurement error";
                    case WITHIN_NOISE -> "no change beyond measurement error";
                };
                ps.add(first + " took part in the " + block.name() + " (" + block.startsOn().format(dates) + " to "
                        + block.endsOn().format(dates) + "). Measured before and after it, " + first + " showed "
                        + words + ": muscle and bone build " + n(a.change().from().mesomorphy(), 1) + " to "
                        + n(a.change().to().mesomorphy(), 1) + ".");
            });
        }
        return ps.isEmpty() ? java.util.Optional.empty()
                : java.util.Optional.of(new Letter.Section("Training block", ps));
    }

    private ChartModel chart(PersonHistory h, List<VisitResult> visits) {
        List<SomatochartBuilder.PathPoint> pts = new ArrayList<>();
        List<Verdict> verdicts = new ArrayList<>();
        VisitResult prev = null;
        for (VisitResult r : visits) {
            if (r.somatotype() == null) {
                continue;
            }
            pts.add(new SomatochartBuilder.PathPoint(r.visit().measuredAt().toLocalDate(), r.somatotype().rating(),
                    r.covariance(), null));
            if (prev != null) {
                verdicts.add(builder.verdict(prev, r).verdict());
            }
            prev = r;
        }
        if (pts.isEmpty()) {
            return null;
        }
        return new SomatochartBuilder(h.person().displayName(), locale).path(h.person().displayName(), pts, verdicts,
                true).buildAroundData(7, LetterPdf.CHART_PT);
    }
}
