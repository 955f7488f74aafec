package org.shapetrail.letters;

import java.math.BigDecimal;
import java.math.RoundingMode;
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
        blockSection(h, first, skinfolds).ifPresent(sections::add);
        sections.add(new Letter.Section("What these numbers mean, and what they do not", List.of(
                "They describe body shape and size on the days of measuring. Shape changes with growth, training and"
                        + " time; there is no right or wrong shape for a sport or for a person.",
                "Every measurement has a small error. We call a change larger than the measurer's repeat error"
                        + " would usually give only when the measurer's own repeat measurements would produce a change"
                        + " that large by chance in fewer than 1 case in 20.")));
        String who = settings.sender() + (settings.senderRole().isBlank() ? "" : " (" + settings.senderRole() + ")");
        sections.add(new Letter.Section("Questions", List.of("Please contact " + who + ", " + settings.contact()
                + ", or your family doctor.")));
        List<List<String>> table = new ArrayList<>();
        if (!visits.isEmpty()) {
            List<String> head = new ArrayList<>(List.of("Date", "Age", "Height (cm)", "Muscle & bone",
                    "Slenderness"));
            if (skinfolds) {
                head.add("Skinfold rating");
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
        ps.add(SCALE + (skinfolds ? " They are muscle and bone build, slenderness (how long and lean the build is for"
                + " its height) and a skinfold rating (from the thickness of skinfolds under the skin)."
                : " They are muscle and bone build and slenderness (how long and lean the build is for its height);"
                + " at this age we describe only these two."));
        List<VisitResult> rated = visits.stream().filter(r -> r.somatotype() != null).toList();
        if (rated.isEmpty()) {
            ps.add("None of the measurements in this period was complete enough to describe body shape.");
            return new Letter.Section("Body shape", ps);
        }
        VisitResult a = rated.get(0);
        VisitResult b = rated.get(rated.size() - 1);
        Rating ra = a.somatotype().rating();
        if (rated.size() == 1) {
            ps.add("On " + a.visit().measuredAt().toLocalDate().format(dates) + ": muscle and bone build "
                    + n(ra.mesomorphy(), 1) + ", slenderness " + n(ra.ectomorphy(), 1)
                    + (skinfolds ? ", skinfold rating " + n(ra.endomorphy(), 1) : "") + ".");
            return new Letter.Section("Body shape", ps);
        }
        ps.add("From " + a.visit().measuredAt().toLocalDate().format(dates) + " to " + b.visit().measuredAt()
                .toLocalDate().format(dates) + ":");
        ps.addAll(componentSentences(builder.verdict(a, b), skinfolds));
        if (skinfolds) {
            ps.add("The chart shows each measurement as a point, joined in time order; a solid line marks a step"
                    + " larger than the measurer's repeat error would usually give for the three ratings together,"
                    + " dashed and dotted lines steps close to it or within it.");
        }
        return new Letter.Section("Body shape", ps);
    }

    /** What the letter says of the ratings' scale; no printed rating lies outside it (ratings are never below 0.1). */
    public static final String SCALE = "Body shape is described by ratings that start at 0.1 and have no fixed top;"
            + " most people lie between about 1 and 7.";

    /** How a letter reads one rating's change against the measurer's repeat error, judged on printed numbers too. */
    public enum ComponentReading {
        /** Beyond its MDC95, and the printed change is larger than the printed error. */
        LARGER(": larger than the measurer's repeat error would usually give (up to about %s)."),
        /** Within its MDC95, and the printed change is no larger than the printed error. */
        WITHIN(": within the measurer's repeat error (up to about %s), so it may be no real change at all."),
        /** The exact figures and the printed ones would tell different stories: said plainly. */
        CLOSE(": about the size of the measurer's repeat error (up to about %s), so it may or may not be a real"
                + " change.");

        private final String pattern;

        ComponentReading(String pattern) {
            this.pattern = pattern;
        }

        /** The reading's words with the printed repeat error. */
        public String words(String error) {
            return String.format(Locale.ROOT, pattern, error);
        }

        /**
         * The reading of a change: LARGER only when it is beyond its MDC95 and the printed numbers show more
         * than the printed error; WITHIN only when it is not and the printed numbers agree; CLOSE otherwise.
         */
        public static ComponentReading of(boolean beyond, BigDecimal printedChange, BigDecimal printedError) {
            int cmp = printedChange.abs().compareTo(printedError);
            if (beyond && cmp > 0) {
                return LARGER;
            }
            if (!beyond && cmp <= 0) {
                return WITHIN;
            }
            return CLOSE;
        }
    }

    /** The printed form of a value: one decimal, half up (as {@code %.1f} prints it). */
    static BigDecimal printed(double v) {
        return new BigDecimal(v).setScale(1, RoundingMode.HALF_UP);
    }

    /** The printed repeat error: one decimal, never shown below 0.1. */
    static BigDecimal printedError(double mdc95) {
        return printed(mdc95).max(new BigDecimal("0.1"));
    }

    /**
     * One sentence per rating the letter shows, each with the printed values, the printed change (the
     * difference of the printed values, so the reader's sum comes out), the printed repeat error and its
     * reading. The verdict on the three ratings together is not used: it would speak of a rating the letter
     * may leave out.
     */
    private List<String> componentSentences(ChangeVerdict v, boolean skinfolds) {
        List<String> out = new ArrayList<>();
        int[] shown = skinfolds ? new int[] {1, 2, 0} : new int[] {1, 2};
        for (int c : shown) {
            double from = c == 0 ? v.from().endomorphy() : c == 1 ? v.from().mesomorphy() : v.from().ectomorphy();
            double to = c == 0 ? v.to().endomorphy() : c == 1 ? v.to().mesomorphy() : v.to().ectomorphy();
            BigDecimal pf = printed(from);
            BigDecimal pt = printed(to);
            BigDecimal change = pt.subtract(pf);
            BigDecimal error = printedError(v.mdc95()[c]);
            ComponentReading reading = ComponentReading.of(v.componentBeyond(c), change, error);
            String name = COMPONENT_NAMES.get(c);
            String moved = change.signum() == 0 ? name + " stayed at " + n(to, 1)
                    : name + " went from " + n(from, 1) + " to " + n(to, 1) + ", a change of " + n(change.doubleValue(), 1);
            out.add(Character.toUpperCase(moved.charAt(0)) + moved.substring(1)
                    + reading.words(n(error.doubleValue(), 1)));
        }
        return out;
    }

    /** The letter's names of the ratings, by component index (endo, meso, ecto). */
    public static final List<String> COMPONENT_NAMES = List.of("skinfold rating", "muscle and bone build",
            "slenderness");

    /** A paragraph on each training block of the period the person took part in (visits near both ends). */
    private java.util.Optional<Letter.Section> blockSection(PersonHistory h, String first, boolean skinfolds) {
        List<String> ps = new ArrayList<>();
        for (var block : builder.academy().blocks()) {
            if (block.endsOn().isBefore(settings.from()) || block.startsOn().isAfter(settings.to())) {
                continue;
            }
            if (!org.shapetrail.history.BlockReview.members(builder.academy(), block).contains(h.person().id())) {
                continue;
            }
            var review = org.shapetrail.history.BlockReview.of(builder, block,
                    org.shapetrail.history.BlockReview.DEFAULT_WINDOW_DAYS, p -> p.id() == h.person().id() ? h
                            : histories.computeIfAbsent(p.id(), id -> builder.history(p)));
            review.athletes().stream().filter(a -> a.person().id() == h.person().id()).findFirst().ifPresent(a -> {
                ps.add(first + " took part in the " + block.name() + " (" + block.startsOn().format(dates) + " to "
                        + block.endsOn().format(dates) + "). Measured before it (" + a.before().visit().measuredAt()
                        .toLocalDate().format(dates) + ") and after it (" + a.after().visit().measuredAt().toLocalDate()
                        .format(dates) + "):");
                ps.addAll(componentSentences(a.change(), skinfolds));
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
        // the whole chart at print size, its corners named as the letter names the ratings, so nothing is cut off
        // the line styles are told in the paragraph above the chart, so the chart carries no key of its own
        SomatochartBuilder b = new SomatochartBuilder(h.person().displayName(), locale).withoutLegend()
                .withAxisNames("skinfold rating", "muscle and bone build", "slenderness")
                .path(h.person().displayName(), pts, verdicts, true);
        return org.shapetrail.chart.ChartPainter.laidOutFor(b::buildWhole, LetterPdf.CHART_PT, LetterPdf.CHART_PT);
    }
}
