package org.shapetrail.store;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Objects;

/**
 * One line of a server's audit trail: who (the login), when (UTC), what was done to which row, and the
 * row's values before and after. An erasure leaves a line with no person and no values.
 */
public record AuditEntry(long id, String at, String who, String action, String entity, Long personId, Long visitId,
        Map<String, String> oldValues, Map<String, String> newValues) {
    /** Bookkeeping columns not worth a reader's attention in a change summary. */
    private static final java.util.Set<String> QUIET = java.util.Set.of("row_version", "changed_by", "changed_at",
            "entered_by", "trial_count");

    public AuditEntry {
        oldValues = oldValues == null ? Map.of() : java.util.Collections.unmodifiableMap(new java.util.LinkedHashMap<>(oldValues));
        newValues = newValues == null ? Map.of() : java.util.Collections.unmodifiableMap(new java.util.LinkedHashMap<>(newValues));
    }

    /** What the row is, in words: "visit 12", "trial 12 triceps 2", "rating of visit 12", "person 3". */
    public String what() {
        Map<String, String> v = newValues.isEmpty() ? oldValues : newValues;
        return switch (entity) {
            case "trial" -> org.shapetrail.i18n.Messages.tr("trail.trials", String.valueOf(visitId));
            case "rating" -> org.shapetrail.i18n.Messages.tr("trail.rating", v.get("visit_id"));
            case "person" -> action.equals("erasure") ? org.shapetrail.i18n.Messages.tr("trail.erased")
                    : org.shapetrail.i18n.Messages.tr("trail.person", v.get("id"));
            case "visit" -> org.shapetrail.i18n.Messages.tr("trail.visit", v.get("id"));
            default -> entity + " " + v.get("id");
        };
    }

    /** The fields that differ, as "name: old → new"; for an insert or delete, the row's main values. */
    public List<String> changes() {
        List<String> out = new ArrayList<>();
        if (action.equals("update")) {
            for (var e : newValues.entrySet()) {
                String before = oldValues.get(e.getKey());
                if (!QUIET.contains(e.getKey()) && !Objects.equals(before, e.getValue())) {
                    out.add(e.getKey() + ": " + shown(before) + " → " + shown(e.getValue()));
                }
            }
            for (var e : oldValues.entrySet()) {
                if (!QUIET.contains(e.getKey()) && !newValues.containsKey(e.getKey())) {
                    out.add(e.getKey() + ": " + shown(e.getValue()) + " → (none)");
                }
            }
            return out;
        }
        Map<String, String> v = action.equals("insert") ? newValues : oldValues;
        if (entity.equals("trial")) {
            // one line per visit: every reading, "site #trial value unit", in the site's order of the form
            v.forEach((k, val) -> out.add(k + " " + val));
            return out;
        }
        for (var e : v.entrySet()) {
            if (!QUIET.contains(e.getKey()) && !e.getKey().equals("id") && e.getValue() != null
                    && !e.getValue().isEmpty()) {
                out.add(e.getKey() + " " + shown(e.getValue()));
            }
        }
        return out;
    }

    /** The lines as a person reads them: one per change, its values indented below. */
    public static String asText(List<AuditEntry> lines) {
        if (lines.isEmpty()) {
            return org.shapetrail.i18n.Messages.tr("trail.nothing") + "\n";
        }
        StringBuilder sb = new StringBuilder();
        for (AuditEntry e : lines) {
            sb.append(String.format("%s  %-16s %-7s %s%n", e.at().replace('T', ' ').replace("Z", " UTC"), e.who(),
                    e.action(), e.what()));
            for (String c : e.changes()) {
                sb.append("      ").append(c).append(System.lineSeparator());
            }
        }
        return sb.toString();
    }

    private static String shown(String v) {
        return v == null ? "(none)" : v.isEmpty() ? "(empty)" : v;
    }
}
