package org.shapetrail.noise;

import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import org.shapetrail.measure.Site;

/**
 * Whose repeatability a result rests on: a measurer's TEM per site, each taken from their own repeats or,
 * where they have too few, from the defaults (and marked so).
 *
 * @param measurer the measurer's name
 * @param sites the error per site; every site is present
 */
public record ErrorProfile(String measurer, Map<Site, SiteError> sites) {
    public ErrorProfile {
        Objects.requireNonNull(measurer, "measurer");
        sites = Map.copyOf(sites);
        for (Site s : Site.values()) {
            if (!sites.containsKey(s)) {
                throw new IllegalArgumentException("the error profile lacks " + s.label());
            }
        }
    }

    /** A profile made of defaults only (a measurer with no repeats at all, or an unknown measurer). */
    public static ErrorProfile defaultsFor(String measurer, DefaultErrors defaults) {
        Map<Site, SiteError> m = new EnumMap<>(Site.class);
        for (Site s : Site.values()) {
            m.put(s, defaults.forSite(s));
        }
        return new ErrorProfile(measurer, m);
    }

    /**
     * Builds a measurer's profile from their repeated trials per site; a site with fewer than
     * {@code defaults.minPeople()} people falls back to the default.
     */
    public static ErrorProfile fromRepeats(String measurer, Map<Site, List<Tem.Subject>> repeats,
                                           DefaultErrors defaults) {
        Map<Site, SiteError> m = new EnumMap<>(Site.class);
        for (Site s : Site.values()) {
            List<Tem.Subject> subjects = repeats.getOrDefault(s, List.of());
            if (subjects.isEmpty()) {
                m.put(s, defaults.forSite(s));
                continue;
            }
            Tem.Estimate e = Tem.estimate(subjects);
            if (e.people() < defaults.minPeople()) {
                m.put(s, defaults.forSite(s));
            } else {
                m.put(s, new SiteError(s, e.duplicateTem(), e.relativeTemPercent(), e.people(), false));
            }
        }
        return new ErrorProfile(measurer, m);
    }

    public SiteError at(Site s) {
        return sites.get(s);
    }

    /** True when any of the given sites relies on a default TEM. */
    public boolean usesDefaults(Iterable<Site> which) {
        for (Site s : which) {
            if (sites.get(s).fromDefaults()) {
                return true;
            }
        }
        return false;
    }

    /** Words for "whose repeatability", e.g. "Imogen Tarrant's own TEM" or "default TEMs (… had too few repeats)". */
    public String describe(Iterable<Site> which) {
        boolean any = false;
        boolean all = true;
        for (Site s : which) {
            boolean d = sites.get(s).fromDefaults();
            any |= d;
            all &= d;
        }
        if (!any) {
            return org.shapetrail.i18n.Messages.tr("basis.own", measurer);
        }
        if (all) {
            return org.shapetrail.i18n.Messages.tr("basis.defaults", measurer);
        }
        return org.shapetrail.i18n.Messages.tr("basis.mixed", measurer);
    }
}
