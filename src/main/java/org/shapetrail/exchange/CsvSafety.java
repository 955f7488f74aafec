package org.shapetrail.exchange;

/**
 * Neutralises text cells that a spreadsheet would run as a formula: a cell starting with =, +, -, @, tab
 * or carriage return gets a leading apostrophe (OWASP advice on CSV injection). Numbers written by
 * Shapetrail itself are not text cells and are left as they are.
 */
public final class CsvSafety {
    private CsvSafety() {
    }

    public static String text(String cell) {
        if (cell == null || cell.isEmpty()) {
            return cell == null ? "" : cell;
        }
        char c = cell.charAt(0);
        if (c == '=' || c == '+' || c == '-' || c == '@' || c == '\t' || c == '\r') {
            return "'" + cell;
        }
        return cell;
    }

    /** Undoes {@link #text} on import: a leading apostrophe before a formula character is dropped. */
    public static String untext(String cell) {
        if (cell != null && cell.length() >= 2 && cell.charAt(0) == '\'') {
            char c = cell.charAt(1);
            if (c == '=' || c == '+' || c == '-' || c == '@' || c == '\t' || c == '\r') {
                return cell.substring(1);
            }
        }
        return cell;
    }
}
