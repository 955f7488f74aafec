package org.shapetrail.store;

import java.util.LinkedHashMap;
import java.util.Map;

/**
 * Reads the one-level JSON objects the server writes into the audit trail (a row's columns: strings,
 * numbers, booleans, null) into their text values, in order. Nested values are not expected and are
 * refused.
 */
final class FlatJson {
    private final String s;
    private int i;

    private FlatJson(String s) {
        this.s = s;
    }

    /** The object's members as text (null for JSON null); an empty map for null or blank input. */
    static Map<String, String> read(String json) {
        Map<String, String> out = new LinkedHashMap<>();
        if (json == null || json.isBlank()) {
            return out;
        }
        FlatJson p = new FlatJson(json);
        p.skip();
        p.expect('{');
        p.skip();
        if (p.peek() == '}') {
            return out;
        }
        while (true) {
            p.skip();
            String key = p.string();
            p.skip();
            p.expect(':');
            p.skip();
            out.put(key, p.value());
            p.skip();
            char c = p.next();
            if (c == '}') {
                return out;
            }
            if (c != ',') {
                throw new IllegalArgumentException("expected , or } at " + (p.i - 1) + " in " + json);
            }
        }
    }

    private String value() {
        char c = peek();
        if (c == '"') {
            return string();
        }
        int start = i;
        while (i < s.length() && ",}".indexOf(s.charAt(i)) < 0 && !Character.isWhitespace(s.charAt(i))) {
            if (s.charAt(i) == '{' || s.charAt(i) == '[') {
                throw new IllegalArgumentException("nested value at " + i);
            }
            i++;
        }
        String word = s.substring(start, i);
        return word.equals("null") ? null : word;
    }

    private String string() {
        expect('"');
        StringBuilder sb = new StringBuilder();
        while (true) {
            char c = next();
            if (c == '"') {
                return sb.toString();
            }
            if (c != '\\') {
                sb.append(c);
                continue;
            }
            char e = next();
            switch (e) {
                case 'n' -> sb.append('\n');
                case 't' -> sb.append('\t');
                case 'r' -> sb.append('\r');
                case 'b' -> sb.append('\b');
                case 'f' -> sb.append('\f');
                case 'u' -> {
                    sb.append((char) Integer.parseInt(s.substring(i, i + 4), 16));
                    i += 4;
                }
                default -> sb.append(e);
            }
        }
    }

    private void skip() {
        while (i < s.length() && Character.isWhitespace(s.charAt(i))) {
            i++;
        }
    }

    private char peek() {
        if (i >= s.length()) {
            throw new IllegalArgumentException("unexpected end of " + s);
        }
        return s.charAt(i);
    }

    private char next() {
        char c = peek();
        i++;
        return c;
    }

    private void expect(char c) {
        if (next() != c) {
            throw new IllegalArgumentException("expected " + c + " at " + (i - 1) + " in " + s);
        }
    }
}
