package org.shapetrail.store;

import java.util.Locale;

/** A minimal JSON writer for the person export: objects, arrays, strings, numbers, booleans and null. */
final class Json {
    private final StringBuilder sb = new StringBuilder();
    private boolean needComma;
    private int depth;

    Json open(char bracket) {
        comma();
        sb.append(bracket);
        depth++;
        needComma = false;
        return this;
    }

    Json close(char bracket) {
        depth--;
        newline();
        sb.append(bracket);
        needComma = true;
        return this;
    }

    Json key(String k) {
        comma();
        string(k);
        sb.append(": ");
        needComma = false;
        return this;
    }

    Json value(Object v) {
        comma();
        if (v == null) {
            sb.append("null");
        } else if (v instanceof Boolean b) {
            sb.append(b);
        } else if (v instanceof Number n) {
            double d = n.doubleValue();
            if (n instanceof Long || n instanceof Integer) {
                sb.append(n);
            } else if (Double.isFinite(d)) {
                sb.append(String.format(Locale.ROOT, "%s", Double.toString(d)));
            } else {
                sb.append("null");
            }
        } else {
            string(v.toString());
        }
        needComma = true;
        return this;
    }

    Json field(String k, Object v) {
        return key(k).value(v);
    }

    private void comma() {
        if (needComma) {
            sb.append(',');
        }
        if (depth > 0 && (sb.length() == 0 || sb.charAt(sb.length() - 1) != ' ')) {
            newline();
        }
        needComma = false;
    }

    private void newline() {
        sb.append('\n');
        sb.append("  ".repeat(Math.max(0, depth)));
    }

    private void string(String s) {
        sb.append('"');
        for (int i = 0; i < s.length(); i++) {
            char ch = s.charAt(i);
            switch (ch) {
                case '"' -> sb.append("\\\"");
                case '\\' -> sb.append("\\\\");
                case '\n' -> sb.append("\\n");
                case '\r' -> sb.append("\\r");
                case '\t' -> sb.append("\\t");
                default -> {
                    if (ch < 0x20) {
                        sb.append(String.format(Locale.ROOT, "\\u%04x", (int) ch));
                    } else {
                        sb.append(ch);
                    }
                }
            }
        }
        sb.append('"');
    }

    @Override
    public String toString() {
        return sb.toString();
    }
}
