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
import org.shapetrail.i18n.Messages;
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

    /** The keys' part for the ratings, by component index (endo, meso, ecto). */
    private static final List<String> COMPONENT_KEYS = List.of("endo", "meso", "ecto");

    /** The cautions at the foot of every letter, in English (see {@link #cautions(Locale)}). */
    public static final List<String> CAUTIONS = cautions(Locale.ENGLISH);

    /** The cautions at the foot of every letter, in a language. */
    public static List<String> cautions(Locale language) {
        return List.of(Messages.get(language, "letter.caution.medical"), Messages.get(language, "letter.caution.growth"),
                Messages.get(language, "letter.caution.questions"), Messages.get(language, "letter.caution.rules"));
    }

    private final HistoryBuilder builder;
    /** Histories of block members, computed once (a squad's letters share them, in every language). */
    private final java.util.Map<Long, PersonHistory> histories;
    private final LetterSettings settings;
    /** The desk's locale: the language of a letter whose person has none of their own. */
    private final Locale deskLocale;
    /** True when every letter is in the desk's language, whatever the person's (the letters command's --lang). */
    private final boolean oneLanguage;
    /** The language, numbers and dates this composer writes in. */
    private final Locale locale;
    private final DateTimeFormatter dates;

    public LetterComposer(HistoryBuilder builder, LetterSettings settings, Locale locale) {
        this(builder, new java.util.concurrent.ConcurrentHashMap<>(), settings, locale, false, locale);
    }

    private LetterComposer(HistoryBuilder builder, java.util.Map<Long, PersonHistory> histories,
            LetterSettings settings, Locale deskLocale, boolean oneLanguage, Locale locale) {
        this.builder = builder;
        this.histories = histories;
        this.settings = settings;
        this.deskLocale = deskLocale;
        this.oneLanguage = oneLanguage;
        this.locale = locale;
        this.dates = DateTimeFormatter.ofLocalizedDate(FormatStyle.LONG).withLocale(locale);
    }

    /** A composer that writes every letter in {@code language}, whatever language the people's letters are set to. */
    public LetterComposer allIn(Locale language) {
        return new LetterComposer(builder, histories, settings, language, true, language);
    }

    /** The same composer writing in another language (sharing what it has computed). */
    private LetterComposer in(Locale language) {
        return language.equals(locale) ? this : new LetterComposer(builder, histories, settings, deskLocale, oneLanguage,
                language);
    }

    private String n(double v, int d) {
        return String.format(locale, "%." + d + "f", v);
    }

    private String t(String key, Object... args) {
        return Messages.get(locale, key, args);
    }

    private boolean inPeriod(VisitResult r) {
        LocalDate d = r.visit().measuredAt().toLocalDate();
        return !d.isBefore(settings.from()) && !d.isAfter(settings.to());
    }

    /**
     * Composes the letter in the person's letter language (a family may read another language than the
     * staff), else in the desk's.
     */
    public Letter compose(PersonHistory h) {
        return in(oneLanguage ? deskLocale : Messages.localeFor(h.person().letterLanguage(), deskLocale)).composeHere(h);
    }

    private Letter composeHere(PersonHistory h) {
        var p = h.person();
        String first = p.displayName().split(" ")[0];
        List<VisitResult> visits = h.visits().stream().filter(this::inPeriod).toList();
        double age = visits.isEmpty() ? h.latest().map(VisitResult::ageYears).orElse(ADULT_AGE)
                : visits.get(visits.size() - 1).ageYears();
        boolean junior = age < ADULT_AGE;
        boolean skinfolds = age >= SKINFOLD_AGE || settings.skinfoldsForUnder16();
        List<String> heading = List.of(settings.academy(), t("letter.title"), t("letter.heading.period",
                p.displayName(), settings.from().format(dates), settings.to().format(dates)));
        List<Letter.Section> sections = new ArrayList<>();
        String dear = junior ? t("letter.dear.parent", p.displayName()) : t("letter.dear.adult", p.displayName());
        sections.add(new Letter.Section("", List.of(dear, t("letter.intro", first, settings.from().format(dates),
                settings.to().format(dates)))));
        if (visits.isEmpty()) {
            sections.add(new Letter.Section(t("letter.section.measurements"), List.of(t("letter.none"))));
        } else {
            sections.add(growth(h, visits, first));
            sections.add(shape(h, visits, first, skinfolds));
        }
        blockSection(h, first, skinfolds).ifPresent(sections::add);
        sections.add(new Letter.Section(t("letter.section.meaning"), List.of(t("letter.meaning.shape"),
                t("letter.meaning.error"))));
        String who = settings.senderRole().isBlank() ? settings.sender()
                : t("letter.sender.role", settings.sender(), settings.senderRole());
        sections.add(new Letter.Section(t("letter.section.questions"), List.of(t("letter.questions", who,
                settings.contact()))));
        List<List<String>> table = new ArrayList<>();
        if (!visits.isEmpty()) {
            List<String> head = new ArrayList<>(List.of(t("letter.table.date"), t("letter.table.age"),
                    t("letter.table.height"), t("letter.table.meso"), t("letter.table.ecto")));
            if (skinfolds) {
                head.add(t("letter.table.endo"));
            }
            table.add(head);
            for (VisitResult r : visits) {
                List<String> row = new ArrayList<>();
                // English "17 Sept 2025"; elsewhere the short numeric form, which fits the column ("17/09/2025")
                row.add(r.visit().measuredAt().toLocalDate().format(DateTimeFormatter.ofLocalizedDate(
                        locale.getLanguage().equals("en") ? FormatStyle.MEDIUM : FormatStyle.SHORT).withLocale(locale)));
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
        return new Letter(p.displayName(), heading, sections, table, skinfolds ? chart(h, visits) : null,
                cautions(locale), locale);
    }

    private Letter.Section growth(PersonHistory h, List<VisitResult> visits, String first) {
        List<String> ps = new ArrayList<>();
        List<VisitResult> st = visits.stream().filter(r -> r.value(Site.STATURE).isPresent()).toList();
        boolean adult = !visits.isEmpty() && visits.get(visits.size() - 1).ageYears() >= ADULT_AGE;
        if (adult && !st.isEmpty()) {
            VisitResult last = st.get(st.size() - 1);
            ps.add(t("letter.height.once", n(last.value(Site.STATURE).get(), 1),
                    last.visit().measuredAt().toLocalDate().format(dates)));
        } else if (st.size() >= 2) {
            VisitResult a = st.get(0);
            VisitResult b = st.get(st.size() - 1);
            double gain = b.value(Site.STATURE).get() - a.value(Site.STATURE).get();
            long days = ChronoUnit.DAYS.between(a.visit().measuredAt(), b.visit().measuredAt());
            String pace = days >= 90 ? t("letter.height.pace", n(gain / (days / 365.25), 1)) : "";
            ps.add(t(gain >= 0 ? "letter.height.gain" : "letter.height.change", n(a.value(Site.STATURE).get(), 1),
                    a.visit().measuredAt().toLocalDate().format(dates), n(b.value(Site.STATURE).get(), 1),
                    b.visit().measuredAt().toLocalDate().format(dates), n(gain, 1), Math.round(days / 30.44), pace));
        } else if (st.size() == 1) {
            ps.add(t("letter.height.once", n(st.get(0).value(Site.STATURE).get(), 1),
                    st.get(0).visit().measuredAt().toLocalDate().format(dates)));
        }
        MaturityEstimate m = h.growth().maturity();
        if (m != null && st.size() > 0) {
            String stage = t(m.status() == MaturityStatus.PRE_PHV ? "letter.stage.pre"
                    : m.status() == MaturityStatus.CIRCA_PHV ? "letter.stage.circa" : "letter.stage.post");
            ps.add(t("letter.stage", stage));
        }
        if (h.growth().rapidGrowth()) {
            ps.add(t("letter.rapid", first, n(builder.settings().alert().thresholdCmPerYear(), 0)));
        }
        return new Letter.Section(t("letter.section.growth"), ps);
    }

    private Letter.Section shape(PersonHistory h, List<VisitResult> visits, String first, boolean skinfolds) {
        List<String> ps = new ArrayList<>();
        ps.add(t("letter.scale") + " " + t(skinfolds ? "letter.scale.three" : "letter.scale.two"));
        List<VisitResult> rated = visits.stream().filter(r -> r.somatotype() != null).toList();
        if (rated.isEmpty()) {
            ps.add(t("letter.shape.none"));
            return new Letter.Section(t("letter.section.shape"), ps, true);
        }
        VisitResult a = rated.get(0);
        VisitResult b = rated.get(rated.size() - 1);
        Rating ra = a.somatotype().rating();
        if (rated.size() == 1) {
            String day = a.visit().measuredAt().toLocalDate().format(dates);
            ps.add(skinfolds ? t("letter.shape.once.skinfolds", day, n(ra.mesomorphy(), 1), n(ra.ectomorphy(), 1),
                    n(ra.endomorphy(), 1)) : t("letter.shape.once", day, n(ra.mesomorphy(), 1), n(ra.ectomorphy(), 1)));
            return new Letter.Section(t("letter.section.shape"), ps, true);
        }
        ps.add(t("letter.shape.span", a.visit().measuredAt().toLocalDate().format(dates),
                b.visit().measuredAt().toLocalDate().format(dates)));
        ps.addAll(componentSentences(builder.verdict(a, b), skinfolds));
        if (skinfolds) {
            ps.add(t("letter.chart.key"));
        }
        return new Letter.Section(t("letter.section.shape"), ps, true);
    }

    /** What the letter says of the ratings' scale; no printed rating lies outside it (ratings are never below 0.1). */
    public static final String SCALE = Messages.get(Locale.ENGLISH, "letter.scale");

    /** How a letter reads one rating's change against the measurer's repeat error, judged on printed numbers too. */
    public enum ComponentReading {
        /** Beyond its MDC95, and the printed change is larger than the printed error. */
        LARGER("letter.reading.larger"),
        /** Within its MDC95, and the printed change is no larger than the printed error. */
        WITHIN("letter.reading.within"),
        /** The exact figures and the printed ones would tell different stories: said plainly. */
        CLOSE("letter.reading.close");

        private final String key;

        ComponentReading(String key) {
            this.key = key;
        }

        /** The reading's words with the printed repeat error, in English. */
        public String words(String error) {
            return words(Locale.ENGLISH, error);
        }

        /** The reading's words with the printed repeat error, in a language. */
        public String words(Locale language, String error) {
            return Messages.get(language, key, error);
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
            String name = t("letter.component." + COMPONENT_KEYS.get(c) + ".subject");
            String moved = change.signum() == 0 ? t("letter.component.stayed", name, n(to, 1))
                    : t("letter.component.moved", name, n(from, 1), n(to, 1), n(change.doubleValue(), 1));
            out.add(Character.toUpperCase(moved.charAt(0)) + moved.substring(1)
                    + reading.words(locale, n(error.doubleValue(), 1)));
        }
        return out;
    }

    /** The letter's names of the ratings, by component index (endo, meso, ecto). */
    public static final List<String> COMPONENT_NAMES = componentNames(Locale.ENGLISH);

    /** The letter's names of the ratings in a language, by component index (endo, meso, ecto). */
    public static List<String> componentNames(Locale language) {
        return COMPONENT_KEYS.stream().map(k -> Messages.get(language, "letter.component." + k)).toList();
    }

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
                ps.add(t("letter.block", first, block.name(), block.startsOn().format(dates),
                        block.endsOn().format(dates), a.before().visit().measuredAt().toLocalDate().format(dates),
                        a.after().visit().measuredAt().toLocalDate().format(dates)));
                ps.addAll(componentSentences(a.change(), skinfolds));
            });
        }
        return ps.isEmpty() ? java.util.Optional.empty()
                : java.util.Optional.of(new Letter.Section(t("letter.section.block"), ps));
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
                .withAxisNames(t("letter.chart.endo"), t("letter.chart.meso"), t("letter.chart.ecto"))
                .path(h.person().displayName(), pts, verdicts, true);
        return org.shapetrail.chart.ChartPainter.laidOutFor(b::buildWhole, LetterPdf.CHART_PT, LetterPdf.CHART_PT);
    }
}
