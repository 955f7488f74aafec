package org.shapetrail.history;

import java.time.LocalDate;
import java.util.ArrayList;
import java.util.EnumMap;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.shapetrail.measure.RepeatRule;
import org.shapetrail.measure.Site;
import org.shapetrail.measure.SiteTrials;
import org.shapetrail.noise.DefaultErrors;
import org.shapetrail.noise.ErrorProfile;
import org.shapetrail.noise.Tem;
import org.shapetrail.noise.TemTargets;
import org.shapetrail.store.Measurer;
import org.shapetrail.store.Visit;

/**
 * Each measurer's repeatability, computed from the repeated trials stored in the file: their TEM per
 * site (defaults where they have too few people), and the inter-measurer TEM where two measurers
 * measured the same person on the same day.
 */
public final class NoiseModel {
    private final Map<Long, ErrorProfile> profiles;
    private final Map<Long, Map<Site, Tem.Estimate>> estimates;
    private final Map<Long, Measurer> measurers;
    private final List<InterMeasurer> inter;
    private final DefaultErrors defaults;

    private NoiseModel(Map<Long, ErrorProfile> profiles, Map<Long, Map<Site, Tem.Estimate>> estimates,
                       Map<Long, Measurer> measurers, List<InterMeasurer> inter, DefaultErrors defaults) {
        this.profiles = profiles;
        this.estimates = estimates;
        this.measurers = measurers;
        this.inter = inter;
        this.defaults = defaults;
    }

    /** One row of a TEM report. */
    public record TemRow(Measurer measurer, Site site, Tem.Estimate estimate, TemTargets.Standing standing,
                         boolean usesDefault) {
    }

    /** Inter-measurer TEM of one site for one pair of measurers. */
    public record InterMeasurer(Measurer first, Measurer second, Site site, int pairs, double tem,
                                double relativePercent) {
    }

    public static NoiseModel build(Academy academy, DefaultErrors defaults) {
        Map<Long, Measurer> measurers = new LinkedHashMap<>();
        for (Measurer m : academy.measurers()) {
            measurers.put(m.id(), m);
        }
        Map<Long, Map<Site, List<Tem.Subject>>> repeats = new HashMap<>();
        for (Visit v : academy.visits()) {
            for (SiteTrials t : v.trials()) {
                if (t.values().size() >= 2) {
                    repeats.computeIfAbsent(v.measurerId(), k -> new EnumMap<>(Site.class))
                            .computeIfAbsent(t.site(), k -> new ArrayList<>())
                            .add(new Tem.Subject(v.personId(), t.values()));
                }
            }
        }
        Map<Long, ErrorProfile> profiles = new HashMap<>();
        Map<Long, Map<Site, Tem.Estimate>> estimates = new HashMap<>();
        for (Measurer m : measurers.values()) {
            Map<Site, List<Tem.Subject>> r = repeats.getOrDefault(m.id(), Map.of());
            profiles.put(m.id(), ErrorProfile.fromRepeats(m.name(), r, defaults));
            Map<Site, Tem.Estimate> e = new EnumMap<>(Site.class);
            r.forEach((site, subjects) -> e.put(site, Tem.estimate(subjects)));
            estimates.put(m.id(), e);
        }
        return new NoiseModel(profiles, estimates, measurers, interMeasurer(academy, measurers), defaults);
    }

    private static List<InterMeasurer> interMeasurer(Academy academy, Map<Long, Measurer> measurers) {
        // same person, same day, two different measurers
        record Key(long person, LocalDate day) {
        }
        Map<Key, List<Visit>> sameDay = new LinkedHashMap<>();
        for (Visit v : academy.visits()) {
            sameDay.computeIfAbsent(new Key(v.personId(), v.measuredAt().toLocalDate()), k -> new ArrayList<>()).add(v);
        }
        record Pair(long a, long b, Site site) {
        }
        Map<Pair, List<double[]>> values = new LinkedHashMap<>();
        for (List<Visit> vs : sameDay.values()) {
            for (int i = 0; i < vs.size(); i++) {
                for (int j = i + 1; j < vs.size(); j++) {
                    Visit x = vs.get(i);
                    Visit y = vs.get(j);
                    if (x.measurerId() == y.measurerId()) {
                        continue;
                    }
                    Visit first = x.measurerId() < y.measurerId() ? x : y;
                    Visit second = first == x ? y : x;
                    for (SiteTrials t : first.trials()) {
                        var other = second.trialsAt(t.site());
                        var a = RepeatRule.apply(t).value();
                        if (other.isPresent() && a.isPresent()) {
                            var b = RepeatRule.apply(other.get()).value();
                            if (b.isPresent()) {
                                values.computeIfAbsent(new Pair(first.measurerId(), second.measurerId(), t.site()),
                                        k -> new ArrayList<>()).add(new double[] {a.getAsDouble(), b.getAsDouble()});
                            }
                        }
                    }
                }
            }
        }
        List<InterMeasurer> out = new ArrayList<>();
        values.forEach((k, pairs) -> {
            List<Double> a = pairs.stream().map(p -> p[0]).toList();
            List<Double> b = pairs.stream().map(p -> p[1]).toList();
            double tem = Tem.between(a, b);
            double mean = pairs.stream().mapToDouble(p -> (p[0] + p[1]) / 2).average().orElse(Double.NaN);
            out.add(new InterMeasurer(measurers.get(k.a()), measurers.get(k.b()), k.site(), pairs.size(), tem,
                    tem / mean * 100));
        });
        return out;
    }

    /** The profile used for a visit by this measurer. */
    public ErrorProfile profileOf(long measurerId) {
        ErrorProfile p = profiles.get(measurerId);
        if (p == null) {
            return ErrorProfile.defaultsFor(org.shapetrail.i18n.Messages.tr("basis.unknownMeasurer"), defaults);
        }
        return p;
    }

    /** Per measurer and site with repeats: TEM, relative TEM, standing against the targets. */
    public List<TemRow> temReport() {
        List<TemRow> rows = new ArrayList<>();
        for (Measurer m : measurers.values()) {
            Map<Site, Tem.Estimate> e = estimates.getOrDefault(m.id(), Map.of());
            for (Site s : Site.values()) {
                Tem.Estimate est = e.get(s);
                if (est == null) {
                    continue;
                }
                rows.add(new TemRow(m, s, est, TemTargets.standing(s.kind(), est.relativeTemPercent()),
                        profiles.get(m.id()).at(s).fromDefaults()));
            }
        }
        return rows;
    }

    public List<InterMeasurer> interMeasurer() {
        return inter;
    }

    public DefaultErrors defaults() {
        return defaults;
    }
}
