package org.shapetrail.exchange;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.shapetrail.measure.Site;

/**
 * Suggests what each column holds from its header: names as spreadsheets write them ("Height (cm)",
 * "Triceps 1", "DOB", "Weight [kg]"), a unit in brackets, a trial number at the end. The suggestion is
 * shown to the user, who can correct it before the dry run.
 */
public final class ColumnMapper {
    private static final Pattern UNIT = Pattern.compile("[\\(\\[]\\s*([a-zA-Z]+)\\s*[\\)\\]]");
    private static final Pattern TRIAL = Pattern.compile("^(.*?)[\\s_-]*(?:t|trial|toma|medicao|medicion)?\\s*([123])$");
    private static final Map<String, Site> SITE_WORDS = siteWords();
    private static final Map<String, Column.Role> ROLE_WORDS = roleWords();

    private ColumnMapper() {
    }

    private static Map<String, Site> siteWords() {
        Map<String, Site> m = new LinkedHashMap<>();
        for (Site s : Site.values()) {
            m.put(s.code().replace('_', ' '), s);
            m.put(norm(s.label()), s);
            // a Spanish or Portuguese spreadsheet's headers: the sites as the window names them in each language
            for (String lang : org.shapetrail.i18n.Messages.LANGUAGES) {
                String named = org.shapetrail.i18n.Messages.get(Locale.forLanguageTag(lang), "site." + s.code());
                m.putIfAbsent(norm(named), s);
                m.putIfAbsent(norm(named.replaceFirst("^(Pliegue|Prega|Perímetro|Diámetro|Diâmetro) (del |de la |de |do |da )?",
                        "")), s);
            }
        }
        for (String w : List.of("talla", "altura", "peso", "masa", "massa")) {
            m.putIfAbsent(w, w.equals("talla") || w.equals("altura") ? Site.STATURE : Site.BODY_MASS);
        }
        m.put("height", Site.STATURE);
        m.put("stretch stature", Site.STATURE);
        m.put("mass", Site.BODY_MASS);
        m.put("weight", Site.BODY_MASS);
        m.put("body weight", Site.BODY_MASS);
        m.put("tri", Site.TRICEPS);
        m.put("triceps sf", Site.TRICEPS);
        m.put("subscap", Site.SUBSCAPULAR);
        m.put("supra", Site.SUPRASPINALE);
        m.put("calf skinfold", Site.MEDIAL_CALF);
        m.put("medial calf skinfold", Site.MEDIAL_CALF);
        m.put("humerus breadth", Site.HUMERUS);
        m.put("biepicondylar humerus", Site.HUMERUS);
        m.put("femur breadth", Site.FEMUR);
        m.put("biepicondylar femur", Site.FEMUR);
        m.put("arm flexed", Site.ARM_FLEXED);
        m.put("flexed arm", Site.ARM_FLEXED);
        m.put("arm flexed girth", Site.ARM_FLEXED);
        m.put("arm girth flexed", Site.ARM_FLEXED);
        m.put("calf girth", Site.CALF);
        m.put("calf", Site.CALF);
        m.put("sitting height", Site.SITTING_HEIGHT);
        m.put("arm relaxed", Site.ARM_RELAXED);
        m.put("waist", Site.WAIST);
        m.put("hip", Site.HIP);
        return m;
    }

    private static Map<String, Column.Role> roleWords() {
        Map<String, Column.Role> m = new LinkedHashMap<>();
        for (String w : List.of("id", "person id", "person", "athlete id", "player id")) {
            m.put(w, Column.Role.PERSON_ID);
        }
        for (String w : List.of("id persona", "id pessoa", "id deportista", "id atleta")) {
            m.put(w, Column.Role.PERSON_ID);
        }
        for (String w : List.of("nombre", "nome", "deportista", "atleta", "jugador", "jogador")) {
            m.put(w, Column.Role.NAME);
        }
        for (String w : List.of("fecha de nacimiento", "data de nascimento", "nacimiento", "nascimento")) {
            m.put(w, Column.Role.BIRTH_DATE);
        }
        for (String w : List.of("sexo", "genero")) {
            m.put(w, Column.Role.SEX);
        }
        for (String w : List.of("fecha", "data", "fecha de la visita", "data da visita")) {
            m.put(w, Column.Role.DATE);
        }
        for (String w : List.of("hora", "hora de la visita", "hora da visita")) {
            m.put(w, Column.Role.TIME);
        }
        for (String w : List.of("evaluador", "avaliador", "medidor", "antropometrista", "medido por")) {
            m.put(w, Column.Role.MEASURER);
        }
        for (String w : List.of("contexto", "sesion", "sessao")) {
            m.put(w, Column.Role.CONTEXT);
        }
        for (String w : List.of("medida", "toma", "medicion", "medicao", "valor", "unidad", "unidade")) {
            m.put(w, switch (w) {
                case "medida" -> Column.Role.SITE_NAME;
                case "valor" -> Column.Role.VALUE;
                case "unidad", "unidade" -> Column.Role.UNIT;
                default -> Column.Role.TRIAL_NUMBER;
            });
        }
        for (String w : List.of("name", "athlete", "player", "display name", "full name")) {
            m.put(w, Column.Role.NAME);
        }
        for (String w : List.of("dob", "date of birth", "birth date", "birthdate", "born")) {
            m.put(w, Column.Role.BIRTH_DATE);
        }
        for (String w : List.of("sex", "gender")) {
            m.put(w, Column.Role.SEX);
        }
        for (String w : List.of("letter language", "letters in", "language of letters")) {
            m.put(w, Column.Role.LETTER_LANGUAGE);
        }
        for (String w : List.of("date", "visit date", "measured on", "test date", "session date")) {
            m.put(w, Column.Role.DATE);
        }
        m.put("time", Column.Role.TIME);
        for (String w : List.of("measurer", "tester", "measured by", "anthropometrist")) {
            m.put(w, Column.Role.MEASURER);
        }
        for (String w : List.of("context", "session", "phase", "occasion")) {
            m.put(w, Column.Role.CONTEXT);
        }
        m.put("site", Column.Role.SITE_NAME);
        m.put("measure", Column.Role.SITE_NAME);
        for (String w : List.of("trial", "trial number", "repeat")) {
            m.put(w, Column.Role.TRIAL_NUMBER);
        }
        m.put("value", Column.Role.VALUE);
        m.put("unit", Column.Role.UNIT);
        return m;
    }

    /** Lower case, accents off ("Tríceps" as "triceps"), anything but letters and digits a single space. */
    static String norm(String s) {
        String plain = java.text.Normalizer.normalize(s, java.text.Normalizer.Form.NFD).replaceAll("\\p{M}", "");
        return plain.toLowerCase(Locale.ROOT).replaceAll("[^a-z0-9]+", " ").strip();
    }

    /** The suggested column for one header. */
    public static Column suggest(String header) {
        String h = CsvSafety.untext(header == null ? "" : header.strip());
        InputUnit unit = null;
        Matcher um = UNIT.matcher(h);
        if (um.find()) {
            unit = InputUnit.parse(um.group(1)).orElse(null);
            h = (h.substring(0, um.start()) + h.substring(um.end())).strip();
        }
        // unit as a suffix, e.g. stature_cm or triceps_mm_1
        String n = norm(h);
        Matcher sfx = Pattern.compile("^(.*) (mm|cm|m|kg|lb|in)( [123])?$").matcher(n);
        if (unit == null && sfx.matches()) {
            unit = InputUnit.parse(sfx.group(2)).orElse(null);
            n = sfx.group(1) + (sfx.group(3) == null ? "" : sfx.group(3));
        }
        Column.Role role = ROLE_WORDS.get(n);
        if (role != null) {
            return new Column(header, role, null, 0, null);
        }
        Site site = SITE_WORDS.get(n);
        if (site != null) {
            return new Column(header, Column.Role.SITE_VALUE, site, 0, fitting(unit, site));
        }
        Matcher t = TRIAL.matcher(n);
        if (t.matches()) {
            Site s = SITE_WORDS.get(t.group(1).strip());
            if (s != null) {
                return new Column(header, Column.Role.SITE_VALUE, s, Integer.parseInt(t.group(2)), fitting(unit, s));
            }
        }
        return new Column(header, Column.Role.IGNORED, null, 0, null);
    }

    private static InputUnit fitting(InputUnit u, Site s) {
        return u != null && u.fits(s) ? u : null;
    }

    /** Suggestions for all headers. */
    public static List<Column> suggest(List<String> headers) {
        List<Column> out = new ArrayList<>();
        for (String h : headers) {
            out.add(suggest(h));
        }
        return out;
    }

    /** A site named in a long-layout cell ("triceps", "Stature", "medial calf skinfold"). */
    public static Optional<Site> siteNamed(String cell) {
        return Optional.ofNullable(SITE_WORDS.get(norm(cell == null ? "" : cell)));
    }
}
