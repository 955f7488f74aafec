package org.shapetrail.exchange;

/**
 * Neutralises text cells that a spreadsheet would run as a formula: a cell starting with =, +, -, @, tab
 * or carriage return gets a leading apostrophe (OWASP advice on CSV injection). A cell that itself starts
 * with an apostrophe before such a character, or before another apostrophe, gets one too, so that reading
 * back ({@link #untext}) gives every text exactly as it was. Numbers written by Shapetrail itself are not
 * text cells and are left as they are.
 */
public final class CsvSafety {
    private CsvSafety() {
    }

    private static boolean leader(char c) {
        return c == '=' || c == '+' || c == '-' || c == '@' || c == '\t' || c == '\r';
    }

    /** True when the cell starts with the apostrophe that {@link #text} adds (before a leader or an apostrophe). */
    private static boolean escaped(String cell) {
        return cell.length() >= 2 && cell.charAt(0) == '\'' && (leader(cell.charAt(1)) || cell.charAt(1) == '\'');
    }

    public static String text(String cell) {
        if (cell == null || cell.isEmpty()) {
            return cell == null ? "" : cell;
        }
        return leader(cell.charAt(0)) || escaped(cell) ? "'" + cell : cell;
    }

    /** Undoes {@link #text} on import: the apostrophe it added is dropped. */
    public static String untext(String cell) {
        return cell != null && escaped(cell) ? cell.substring(1) : cell;
    }
}
