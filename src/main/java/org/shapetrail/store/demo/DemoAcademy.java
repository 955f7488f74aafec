package org.shapetrail.store.demo;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.sql.SQLException;
import java.time.LocalDate;
import java.time.LocalDateTime;
import java.time.temporal.ChronoUnit;
import java.util.ArrayList;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import java.util.Random;
import org.shapetrail.growth.PreeceBaines;
import org.shapetrail.measure.RepeatRule;
import org.shapetrail.measure.VisitCheck;
import org.shapetrail.measure.Sex;
import org.shapetrail.measure.Site;
import org.shapetrail.measure.SiteKind;
import org.shapetrail.measure.SiteTrials;
import org.shapetrail.somatotype.HeathCarter;
import org.shapetrail.somatotype.HeathCarterInput;
import org.shapetrail.somatotype.Rating;
import org.shapetrail.store.Consent;
import org.shapetrail.store.Database;
import org.shapetrail.store.Measurer;
import org.shapetrail.store.Membership;
import org.shapetrail.store.Person;
import org.shapetrail.store.RatingMethod;
import org.shapetrail.store.Squad;
import org.shapetrail.store.TrainingBlock;
import org.shapetrail.store.Tx;
import org.shapetrail.store.Visit;
import org.shapetrail.store.VisitRating;

/**
 * Builds the demo database of the invented Saltmarsh Bay Sports Academy: 40 juniors measured about every
 * 3½ months for three years, their stature following Preece-Baines model 1 with individual timing and
 * tempo; two measurers of different repeatability; a senior squad measured around a 10-week strength
 * block, in which some athletes were built to change and the rest not. Everyone is fictional. The same
 * seed always gives the same content.
 *
 * <p>Regenerate with {@code mvn -q compile exec:java -Dexec.mainClass=org.shapetrail.store.demo.DemoAcademy
 * -Dexec.args=sample-db/saltmarsh-bay.sqlite}.
 */
public final class DemoAcademy {
    public static final long SEED = 20230904L;
    public static final LocalDate RECORD_START = LocalDate.of(2023, 9, 4);
    public static final LocalDate RECORD_END = LocalDate.of(2026, 9, 30);
    public static final String BLOCK_NAME = "Winter strength block";
    public static final LocalDate BLOCK_START = LocalDate.of(2026, 1, 12);
    public static final LocalDate BLOCK_END = LocalDate.of(2026, 3, 22);
    /**
     * A junior squad's block between two of its usual measuring days (30 December and 15 April), for the
     * question whether a change is training or growth: nobody was built to change by it.
     */
    public static final String JUNIOR_BLOCK_NAME = "Rowing juniors winter block";
    public static final LocalDate JUNIOR_BLOCK_START = LocalDate.of(2026, 1, 5);
    public static final LocalDate JUNIOR_BLOCK_END = LocalDate.of(2026, 4, 10);

    private static final String[] FIRST_BOYS = {"Arlo", "Caspian", "Ewan", "Gideon", "Hollis", "Jory", "Marek",
        "Orrin", "Soren", "Ulric", "Xander", "Zeb", "Teodor", "Bram", "Lorcan", "Perrin", "Rafe", "Idris", "Mateus",
        "Cosmo", "Fitz", "Leif", "Noam", "Wystan"};
    private static final String[] FIRST_GIRLS = {"Bryony", "Delphine", "Fenna", "Ines", "Linnea", "Nell", "Posy",
        "Rosalind", "Tamsin", "Vesna", "Wren", "Yara", "Zoë", "Maren", "Oriel", "Saffi"};
    private static final String[] SURNAMES = {"Ashcombe", "Brinkwater", "Coldharbour", "Dunmore", "Elsworth",
        "Fallowfield", "Gorsedene", "Hatherleigh", "Inchmere", "Jessamy", "Kettleby", "Larkspurr", "Marshlow",
        "Nettlecombe", "Oakhanger", "Pennyfeather", "Quillby", "Rookwood", "Saltcote", "Thistlewood", "Underhay",
        "Vellacott", "Whitsand", "Yarrowby", "Zennor-Blythe", "Ambrosine", "Bellwether", "Cragside", "Drewsteign",
        "Evershot", "Foxwarren", "Greyling", "Hollowmead", "Ivybridge-Lane", "Juniperro", "Kingsmoor",
        "Lindqvist-Hale", "Moorcroft", "Norling", "Oxenhope"};

    private DemoAcademy() {
    }

    /** What a junior was built with, so that tests can check what the analyses find. */
    public record JuniorPlan(String name, Sex sex, LocalDate birthDate, String sport, PreeceBaines growth) {
        /** Age at peak height velocity of the generating curve, years. */
        public double ageAtPhv() {
            return growth.ageAtPeakVelocity();
        }
    }

    /** What a senior was built with. */
    public record SeniorPlan(String name, boolean builtToChange, boolean missesPostBlockVisit) {
    }

    /** The plan of the whole academy. */
    public record Plan(List<JuniorPlan> juniors, List<SeniorPlan> seniors) {
    }

    /** Repeatability of one measurer: standard deviation of a single trial, per kind of site. */
    record Noise(double skinfoldRelative, double girthRelative, double breadthRelative, double lengthCm,
                 double massKg) {
        double sd(Site site, double truth) {
            return switch (site.kind()) {
                case SKINFOLD -> skinfoldRelative * truth;
                case GIRTH -> girthRelative * truth;
                case BREADTH -> breadthRelative * truth;
                case LENGTH -> lengthCm;
                case MASS -> massKg;
            };
        }
    }

    static final Noise CAREFUL = new Noise(0.025, 0.004, 0.006, 0.15, 0.05);
    static final Noise NOVICE = new Noise(0.055, 0.009, 0.012, 0.30, 0.10);

    /** Body traits of one person that stay fixed; the measured values come from them and age. */
    private record Body(double bmiAt10, double bmiSlope, double fatLevel, double fatTrend, double humerusOffset,
                        double femurOffset, double armOffset, double calfOffset, double sittingRatio) {
    }

    public static void main(String[] args) throws IOException {
        Path target = Path.of(args.length > 0 ? args[0] : "sample-db/saltmarsh-bay.sqlite");
        generate(target);
        System.out.println("Wrote " + target.toAbsolutePath());
    }

    /** Writes the demo database to {@code target}, replacing any file there. */
    public static void generate(Path target) throws IOException {
        Files.deleteIfExists(target);
        Files.deleteIfExists(target.resolveSibling(target.getFileName() + "-wal"));
        Files.deleteIfExists(target.resolveSibling(target.getFileName() + "-shm"));
        try (Database db = Database.open(target)) {
            generateInto(db);
        }
    }

    /** Writes the demo academy into an open, empty record (a new file, or a server's empty schema). */
    public static void generateInto(Database db) {
        db.inTransaction(tx -> {
            build(tx, new Random(SEED + 1));
            return null;
        });
    }

    /** The plan alone, without writing anything (same seed, same draws as {@link #generate}). */
    public static Plan plan() {
        Random rnd = new Random(SEED);
        List<JuniorPlan> juniors = planJuniors(rnd);
        List<SeniorPlan> seniors = new ArrayList<>();
        for (int i = 0; i < 20; i++) {
            seniors.add(new SeniorPlan(seniorName(i), i % 5 < 2, i == 7 || i == 16));
        }
        return new Plan(juniors, seniors);
    }

    private static List<JuniorPlan> planJuniors(Random rnd) {
        List<JuniorPlan> out = new ArrayList<>();
        int boys = 0;
        int girls = 0;
        for (int i = 0; i < 40; i++) {
            boolean male = i % 5 != 1 && i % 5 != 3;
            Sex sex = male ? Sex.MALE : Sex.FEMALE;
            String first = male ? FIRST_BOYS[boys++] : FIRST_GIRLS[girls++];
            String name = i == 13 ? "Νεφέλη Ανδρέου" : first + " " + SURNAMES[i];
            // ages 10 to 15 at the start of the record, so that many pass their spurt during it
            double ageAtStart = 10.0 + (i % 6) + rnd.nextDouble() * 0.9;
            LocalDate birth = RECORD_START.minusDays(Math.round(ageAtStart * 365.25));
            String sport = i % 3 == 0 ? "rowing" : "football";
            PreeceBaines pb;
            if (male) {
                double h1 = 176 + rnd.nextGaussian() * 6;
                pb = new PreeceBaines(h1, h1 - (12.5 + rnd.nextGaussian()), 0.11 + rnd.nextGaussian() * 0.01,
                        1.2 + rnd.nextGaussian() * 0.12, 13.9 + rnd.nextGaussian() * 0.9);
            } else {
                double h1 = 164 + rnd.nextGaussian() * 5.5;
                pb = new PreeceBaines(h1, h1 - (11.5 + rnd.nextGaussian()), 0.11 + rnd.nextGaussian() * 0.01,
                        1.1 + rnd.nextGaussian() * 0.1, 11.9 + rnd.nextGaussian() * 0.9);
            }
            out.add(new JuniorPlan(name, sex, birth, sport, pb));
        }
        return out;
    }

    private static String seniorName(int i) {
        String[] first = {"Aldous", "Brigid", "Cormac", "Dagny", "Evander", "Freya", "Gwilym", "Hester", "Ivo", "Juno",
            "Kit", "Lowenna", "Magnus", "Niamh", "Osric", "Petra", "Ruairi", "Sigrid", "Tobias", "Verity"};
        String[] last = {"Ravensworth", "Seacombe", "Tidewell", "Undercliff", "Wavell", "Breakwater", "Cobbledick",
            "Dunesby", "Eelmere", "Ferriby", "Gullbrook", "Harbourne", "Jettison-Rowe", "Kelpford", "Lugworth",
            "Mudeford-Pike", "Netherhaven", "Oysterby", "Pebblewick", "Quayle-Marten"};
        return first[i] + " " + last[i];
    }

    private static void build(Tx tx, Random rnd) throws SQLException {
        Plan plan = plan();
        // keep the stream of draws independent of the plan's own generator
        Measurer careful = tx.measurers().insert("Imogen Tarrant", "ISAK level 3");
        Measurer novice = tx.measurers().insert("Oskar Blevins", "ISAK level 1");
        Squad u14 = tx.squads().insert("Football U14");
        Squad u16 = tx.squads().insert("Football U16");
        Squad u18 = tx.squads().insert("Football U18");
        Squad rowing = tx.squads().insert("Rowing juniors");
        Squad seniors = tx.squads().insert("Senior squad");

        List<Visit> visits = new ArrayList<>();
        List<LocalDate> sessions = sessions(rnd);
        LocalDate reliabilityDay = sessions.get(4);
        int index = 0;
        for (JuniorPlan jp : plan.juniors()) {
            boolean parents = rnd.nextDouble() < 0.6;
            Person p = Person.draft(jp.name(), jp.sex(), jp.birthDate())
                    .withConsent(new Consent(true, index % 9 == 0, true));
            if (index % 4 == 2) {
                // a predicted adult stature as a practitioner might enter it from another method
                p = p.withPredictedAdultStature(round1(jp.growth().adultStatureCm() + 1.5));
            }
            if (parents) {
                double father = 179 + rnd.nextGaussian() * 6;
                double mother = 165 + rnd.nextGaussian() * 6;
                p = p.withParents(round1(father), round1(mother));
            }
            if (index % 10 == 3) {
                p = p.withLetterLanguage(index % 20 == 3 ? "es" : "pt"); // families who read another language
            }
            p = tx.people().insert(p);
            memberships(tx, p, jp, u14, u16, u18, rowing);
            Body body = juniorBody(rnd, jp.sex());
            for (LocalDate day : sessions) {
                if (rnd.nextDouble() < 0.05) {
                    continue; // missed this session (injury, school trip)
                }
                double age = ChronoUnit.DAYS.between(jp.birthDate(), day) / 365.25;
                Map<Site, Double> truth = juniorTruth(body, jp, age, rnd);
                boolean byCareful = rnd.nextDouble() < 0.6;
                LocalDateTime when = day.atTime(9 + rnd.nextInt(3), rnd.nextInt(4) * 15);
                visits.add(measure(p.id(), when, byCareful ? careful : novice, context(day), truth, rnd));
                if (day.equals(reliabilityDay) && index < 24) {
                    visits.add(measure(p.id(), when.plusMinutes(30), byCareful ? novice : careful,
                            "reliability session", truth, rnd));
                }
            }
            index++;
        }

        for (int i = 0; i < plan.seniors().size(); i++) {
            SeniorPlan sp = plan.seniors().get(i);
            Sex sex = i % 2 == 0 ? Sex.MALE : Sex.FEMALE;
            LocalDate birth = LocalDate.of(1994 + rnd.nextInt(10), 1 + rnd.nextInt(12), 1 + rnd.nextInt(28));
            Person p = tx.people().insert(Person.draft(sp.name(), sex, birth)
                    .withConsent(new Consent(true, i % 4 == 0, false)));
            tx.squads().addMember(new Membership(p.id(), seniors.id(), LocalDate.of(2025, 7, 1),
                    i == 16 ? LocalDate.of(2026, 2, 20) : null));
            Map<Site, Double> truth = seniorTruth(rnd, sex);
            LocalDateTime autumn = LocalDateTime.of(2025, 9, 15 + i % 3, 17, 0);
            visits.add(measure(p.id(), autumn, careful, "pre-season", dayToDay(truth, rnd), rnd));
            LocalDateTime pre = LocalDateTime.of(2026, 1, 8 + i % 2, 17, (i % 4) * 15);
            Visit preVisit = measure(p.id(), pre, careful, "block start", dayToDay(truth, rnd), rnd);
            visits.add(preVisit);
            if (sp.builtToChange()) {
                truth = trained(truth);
            }
            if (!sp.missesPostBlockVisit()) {
                LocalDateTime post = LocalDateTime.of(2026, 3, 23 + i % 2, 17, (i % 4) * 15);
                visits.add(measure(p.id(), post, careful, "block end", dayToDay(truth, rnd), rnd));
            }
        }
        List<Visit> saved = tx.visits().insertAll(visits);
        tx.blocks().insert(new TrainingBlock(0, BLOCK_NAME, seniors.id(), BLOCK_START, BLOCK_END,
                "Upper-body and calf strength, three sessions a week for ten weeks", java.util.Map.of()));
        tx.blocks().insert(new TrainingBlock(0, JUNIOR_BLOCK_NAME, rowing.id(), JUNIOR_BLOCK_START, JUNIOR_BLOCK_END,
                "Ergometer endurance and general strength, three sessions a week", java.util.Map.of()));

        // a rater's in-person ratings beside the anthropometric ones, for the seniors' block-start visits
        int rated = 0;
        for (Visit v : saved) {
            if ("block start".equals(v.context()) && rated < 6) {
                Rating anthro = HeathCarter.rate(HeathCarterInput.fromFinalValues(VisitCheck.evaluate(v.trials()).finalValues())).rating();
                Rating byEye = new Rating(half(anthro.endomorphy() + rnd.nextGaussian() * 0.4),
                        half(anthro.mesomorphy() + rnd.nextGaussian() * 0.4),
                        half(anthro.ectomorphy() + rnd.nextGaussian() * 0.4));
                tx.visits().setRating(new VisitRating(v.id(), byEye, "Imogen Tarrant", RatingMethod.IN_PERSON));
                rated++;
            }
        }
    }

    private static double half(double v) {
        return Math.max(0.5, Math.round(v * 2) / 2.0);
    }

    /** Measurement sessions about every 3½ months across the record, each moved by up to a week. */
    private static List<LocalDate> sessions(Random rnd) {
        List<LocalDate> out = new ArrayList<>();
        LocalDate d = RECORD_START;
        while (!d.isAfter(RECORD_END)) {
            out.add(d.plusDays(rnd.nextInt(8)));
            d = d.plusDays(106);
        }
        return out;
    }

    private static String context(LocalDate day) {
        return switch (day.getMonthValue()) {
            case 8, 9 -> "pre-season";
            case 12, 1, 2 -> "mid-season";
            default -> "end of season";
        };
    }

    private static void memberships(Tx tx, Person p, JuniorPlan jp, Squad u14, Squad u16, Squad u18, Squad rowing)
            throws SQLException {
        if (jp.sport().equals("rowing")) {
            tx.squads().addMember(new Membership(p.id(), rowing.id(), RECORD_START, null));
            return;
        }
        Squad previous = null;
        LocalDate since = null;
        for (int year = 2023; year <= 2026; year++) {
            LocalDate seasonStart = LocalDate.of(year, 9, 1);
            long age = ChronoUnit.YEARS.between(jp.birthDate(), seasonStart);
            Squad s = age < 14 ? u14 : age < 16 ? u16 : u18;
            if (s != previous) {
                if (previous != null) {
                    tx.squads().addMember(new Membership(p.id(), previous.id(), since, seasonStart.minusDays(1)));
                }
                previous = s;
                since = year == 2023 ? RECORD_START : seasonStart;
            }
        }
        tx.squads().addMember(new Membership(p.id(), previous.id(), since, null));
    }

    private static Body juniorBody(Random rnd, Sex sex) {
        boolean male = sex == Sex.MALE;
        return new Body(17.0 + rnd.nextGaussian() * 1.4, (male ? 0.55 : 0.5) + rnd.nextGaussian() * 0.08,
                Math.exp(rnd.nextGaussian() * 0.25) * (male ? 8.5 : 10.5), male ? -0.03 : 0.04,
                rnd.nextGaussian() * 0.2, rnd.nextGaussian() * 0.25, rnd.nextGaussian() * 1.1,
                rnd.nextGaussian() * 0.9, rnd.nextGaussian() * 0.007);
    }

    private static Map<Site, Double> juniorTruth(Body b, JuniorPlan jp, double age, Random rnd) {
        double stature = jp.growth().statureCm(age);
        double theta = jp.growth().thetaYears();
        double sittingRatio = 0.524 + b.sittingRatio() - 0.012 * Math.exp(-Math.pow((age - theta + 0.5) / 1.5, 2));
        double bmi = b.bmiAt10() + b.bmiSlope() * (age - 10);
        double mass = bmi * Math.pow(stature / 100, 2) + rnd.nextGaussian() * 0.4; // day-to-day variation
        double fat = b.fatLevel() * Math.max(0.6, 1 + b.fatTrend() * (age - 10));
        Map<Site, Double> t = new EnumMap<>(Site.class);
        t.put(Site.BODY_MASS, mass);
        t.put(Site.STATURE, stature);
        t.put(Site.SITTING_HEIGHT, stature * sittingRatio);
        t.put(Site.TRICEPS, fat);
        t.put(Site.SUBSCAPULAR, fat * 0.78);
        t.put(Site.SUPRASPINALE, fat * 0.72);
        t.put(Site.MEDIAL_CALF, fat * 0.92);
        t.put(Site.ARM_FLEXED, 13 + 0.27 * mass + b.armOffset());
        t.put(Site.CALF, 19 + 0.25 * mass + b.calfOffset());
        t.put(Site.HUMERUS, 0.0395 * stature + b.humerusOffset());
        t.put(Site.FEMUR, 0.0545 * stature + b.femurOffset());
        return t;
    }

    private static Map<Site, Double> seniorTruth(Random rnd, Sex sex) {
        boolean male = sex == Sex.MALE;
        double stature = male ? 181 + rnd.nextGaussian() * 6 : 168 + rnd.nextGaussian() * 5;
        double bmi = (male ? 23.8 : 22.3) + rnd.nextGaussian() * 1.5;
        double mass = bmi * Math.pow(stature / 100, 2);
        double fat = Math.exp(rnd.nextGaussian() * 0.25) * (male ? 8.0 : 12.5);
        Map<Site, Double> t = new EnumMap<>(Site.class);
        t.put(Site.BODY_MASS, mass);
        t.put(Site.STATURE, stature);
        t.put(Site.SITTING_HEIGHT, stature * (0.525 + rnd.nextGaussian() * 0.007));
        t.put(Site.TRICEPS, fat);
        t.put(Site.SUBSCAPULAR, fat * 0.85);
        t.put(Site.SUPRASPINALE, fat * 0.75);
        t.put(Site.MEDIAL_CALF, fat * 0.9);
        t.put(Site.ARM_FLEXED, 13 + 0.26 * mass + rnd.nextGaussian());
        t.put(Site.CALF, 19 + 0.24 * mass + rnd.nextGaussian() * 0.8);
        t.put(Site.HUMERUS, 0.0385 * stature + rnd.nextGaussian() * 0.2);
        t.put(Site.FEMUR, 0.054 * stature + rnd.nextGaussian() * 0.25);
        return t;
    }

    /** Ten weeks of strength work in an athlete built to change: more muscle, thinner skinfolds. */
    private static Map<Site, Double> trained(Map<Site, Double> t) {
        Map<Site, Double> out = new EnumMap<>(t);
        out.put(Site.BODY_MASS, t.get(Site.BODY_MASS) + 1.5);
        out.put(Site.ARM_FLEXED, t.get(Site.ARM_FLEXED) + 2.5);
        out.put(Site.CALF, t.get(Site.CALF) + 1.5);
        for (Site s : List.of(Site.TRICEPS, Site.SUBSCAPULAR, Site.SUPRASPINALE, Site.MEDIAL_CALF)) {
            out.put(s, t.get(s) * 0.8);
        }
        return out;
    }

    /** Body mass varies from day to day (hydration, meals) by about half a kilogram. */
    private static Map<Site, Double> dayToDay(Map<Site, Double> t, Random rnd) {
        Map<Site, Double> out = new EnumMap<>(t);
        out.put(Site.BODY_MASS, t.get(Site.BODY_MASS) + rnd.nextGaussian() * 0.5);
        return out;
    }

    private static Visit measure(long personId, LocalDateTime when, Measurer m, String context,
                                 Map<Site, Double> truth, Random rnd) {
        Noise noise = m.name().equals("Imogen Tarrant") ? CAREFUL : NOVICE;
        List<SiteTrials> trials = new ArrayList<>();
        for (Map.Entry<Site, Double> e : truth.entrySet()) {
            Site site = e.getKey();
            double sd = noise.sd(site, e.getValue());
            double a = reading(site, e.getValue(), sd, rnd);
            double b = reading(site, e.getValue(), sd, rnd);
            if (RepeatRule.thirdTrialNeeded(site, a, b)) {
                trials.add(new SiteTrials(site, List.of(a, b, reading(site, e.getValue(), sd, rnd))));
            } else {
                trials.add(new SiteTrials(site, List.of(a, b)));
            }
        }
        return new Visit(0, personId, when, m.id(), context, "", trials);
    }

    /** One trial as the instrument shows it: skinfolds to 0.2 mm, everything else to 0.1. */
    private static double reading(Site site, double truth, double sd, Random rnd) {
        double v = truth + rnd.nextGaussian() * sd;
        if (site.kind() == SiteKind.SKINFOLD) {
            return Math.max(2.0, Math.round(v * 5) / 5.0);
        }
        return round1(v);
    }

    private static double round1(double v) {
        return Math.round(v * 10) / 10.0;
    }
}
