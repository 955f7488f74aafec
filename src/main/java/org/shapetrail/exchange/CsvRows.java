package org.shapetrail.exchange;

import java.io.IOException;
import java.io.InputStream;
import java.nio.ByteBuffer;
import java.nio.charset.CharacterCodingException;
import java.nio.charset.CharsetDecoder;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.MalformedInputException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

/**
 * Reads the records of a CSV file for an import straight from its UTF-8 bytes, one reused row at a time,
 * making text of a cell only when it is asked for: a million-row file repeats the same names and dates on
 * every row, and comparing bytes is far cheaper than making strings of them.
 *
 * <p>The dialect is the one {@link CsvInput#parser} reads with Commons CSV, and {@code CsvRowsTest} checks
 * the two agree on random files: RFC 4180 quotes (a quoted cell may hold the delimiter, line breaks and
 * doubled quotes; only white space may follow the closing quote), CR, LF or CRLF line ends in any mix,
 * empty lines skipped, a byte-order mark skipped, every cell trimmed of white space and control characters
 * at both ends. Unlike Commons CSV, a record's {@link #line()} is the line it starts on, also for the last
 * line of a file without a final line break. Text that is not UTF-8 is refused.
 */
final class CsvRows implements AutoCloseable {
    private static final int QUOTE = '"';
    private final InputStream in;
    private final byte delimiter;
    private final CharsetDecoder strict = StandardCharsets.UTF_8.newDecoder()
            .onMalformedInput(CodingErrorAction.REPORT).onUnmappableCharacter(CodingErrorAction.REPORT);
    private byte[] buf;
    private int len;
    private boolean eof;
    private int pos;
    private long line = 1;
    private final List<String> header;

    // the current row: cell i spans [start[i], end[i]) of buf; escaped[i] when it holds doubled quotes
    private int cells;
    private int[] start = new int[16];
    private int[] end = new int[16];
    private boolean[] escaped = new boolean[16];
    private String[] text = new String[16];
    private long rowLine;

    CsvRows(Path file, char delimiter) throws IOException {
        this(file, delimiter, 1 << 20);
    }

    /** With a chosen first buffer size: tests use tiny ones so that records cross the buffer's end. */
    CsvRows(Path file, char delimiter, int bufferBytes) throws IOException {
        this.buf = new byte[Math.max(4, bufferBytes)]; // room for the byte-order mark
        if (delimiter > 127) {
            throw new IllegalArgumentException("The delimiter must be an ASCII character.");
        }
        this.in = Files.newInputStream(file);
        this.delimiter = (byte) delimiter;
        fill();
        if (len >= 3 && (buf[0] & 0xff) == 0xEF && (buf[1] & 0xff) == 0xBB && (buf[2] & 0xff) == 0xBF) {
            pos = 3;
        }
        List<String> names = new ArrayList<>();
        if (next()) {
            for (int i = 0; i < cells; i++) {
                names.add(get(i));
            }
        }
        header = List.copyOf(names);
    }

    /** The cells of the first record; empty for an empty file. */
    List<String> header() {
        return header;
    }

    /** Moves to the next record; false at the end of the file. */
    boolean next() throws IOException {
        while (true) {
            int from = pos;
            long lineBefore = line;
            int r = scan();
            if (r > 0) {
                checkUtf8(from, pos);
                return true;
            }
            if (r == 0) {
                return false;
            }
            // the record runs past the bytes read so far: keep it, read more and scan it again
            pos = from;
            line = lineBefore;
            compactAndFill();
        }
    }

    /** The number of cells in the current record. */
    int size() {
        return cells;
    }

    /** The line of the file on which the current record starts (the header is line 1). */
    long line() {
        return rowLine;
    }

    /** A cell's text, trimmed. */
    String get(int i) {
        String t = text[i];
        if (t == null) {
            t = decode(i);
            text[i] = t;
        }
        return t;
    }

    /** True when cell i holds exactly {@code bytes} (as given by {@link #bytes}); makes no text. */
    boolean sameBytes(int i, byte[] bytes) {
        if (escaped[i]) {
            return false;
        }
        int s = start[i];
        int n = end[i] - s;
        return n == bytes.length && Arrays.equals(buf, s, s + n, bytes, 0, n);
    }

    /** The single digit that cell i holds, or -1 when it holds anything else. */
    int digit(int i) {
        int s = start[i];
        return end[i] - s == 1 && !escaped[i] && buf[s] >= '0' && buf[s] <= '9' ? buf[s] - '0' : -1;
    }

    private static final double[] POWERS_OF_TEN = {1e0, 1e1, 1e2, 1e3, 1e4, 1e5, 1e6, 1e7, 1e8, 1e9, 1e10, 1e11,
        1e12, 1e13, 1e14, 1e15};

    /**
     * Cell i as a number when it is a plain decimal (optional sign, digits, at most one {@code separator},
     * at most 15 digits in all), else NaN, and the caller reads its text instead. The value equals
     * {@link Double#parseDouble}'s: the digits m and the power 10^k are exact doubles, and one IEEE division
     * rounds m / 10^k correctly (Clinger's fast path).
     */
    double plainDecimal(int i, char separator) {
        int s = start[i];
        int e = end[i];
        if (escaped[i] || s == e) {
            return Double.NaN;
        }
        boolean negative = false;
        if (buf[s] == '-' || buf[s] == '+') {
            negative = buf[s] == '-';
            s++;
        }
        long m = 0;
        int digits = 0;
        int fraction = -1;
        for (int k = s; k < e; k++) {
            byte b = buf[k];
            if (b >= '0' && b <= '9') {
                m = m * 10 + (b - '0');
                if (++digits > 15) {
                    return Double.NaN;
                }
                if (fraction >= 0) {
                    fraction++;
                }
            } else if (b == separator && fraction < 0) {
                fraction = 0;
            } else {
                return Double.NaN;
            }
        }
        if (digits == 0) {
            return Double.NaN;
        }
        double v = fraction > 0 ? m / POWERS_OF_TEN[fraction] : m;
        return negative ? -v : v;
    }

    private byte[] remembered = new byte[256];
    private int[] rememberedEnd = new int[16];
    private boolean rememberedValid;

    /**
     * Remembers the bytes of the given cells of this record, for {@link #sameAsRemembered} on a later one;
     * a cell with doubled quotes cannot be compared as bytes, so nothing is remembered then.
     */
    void remember(int[] columns) {
        rememberedValid = false;
        int n = 0;
        for (int c : columns) {
            if (escaped[c]) {
                return;
            }
            n += end[c] - start[c];
        }
        if (remembered.length < n) {
            remembered = new byte[n * 2];
        }
        if (rememberedEnd.length < columns.length) {
            rememberedEnd = new int[columns.length];
        }
        int at = 0;
        for (int k = 0; k < columns.length; k++) {
            int c = columns[k];
            int len = end[c] - start[c];
            System.arraycopy(buf, start[c], remembered, at, len);
            at += len;
            rememberedEnd[k] = at;
        }
        rememberedValid = true;
    }

    /** True when the given cells hold the same bytes as when {@link #remember} was last called with them. */
    boolean sameAsRemembered(int[] columns) {
        if (!rememberedValid) {
            return false;
        }
        int at = 0;
        for (int k = 0; k < columns.length; k++) {
            int c = columns[k];
            int len = end[c] - start[c];
            if (escaped[c] || rememberedEnd[k] - at != len
                    || !Arrays.equals(buf, start[c], end[c], remembered, at, at + len)) {
                return false;
            }
            at += len;
        }
        return true;
    }

    /** The raw bytes of cell i, for {@link #sameBytes}; null for a cell with doubled quotes. */
    byte[] bytes(int i) {
        return escaped[i] ? null : Arrays.copyOfRange(buf, start[i], end[i]);
    }

    @Override
    public void close() throws IOException {
        in.close();
    }

    /** Refuses a record whose bytes are not UTF-8 (only records with a byte above 127 need looking at). */
    private void checkUtf8(int from, int to) throws MalformedInputException {
        for (int k = from; k < to; k++) {
            if (buf[k] < 0) {
                try {
                    strict.decode(ByteBuffer.wrap(buf, from, to - from));
                } catch (MalformedInputException ex) {
                    throw ex;
                } catch (CharacterCodingException ex) {
                    throw new MalformedInputException(1);
                }
                return;
            }
        }
    }

    private String decode(int i) {
        int s = start[i];
        int e = end[i];
        boolean ascii = true;
        for (int k = s; k < e; k++) {
            if (buf[k] < 0) {
                ascii = false;
                break;
            }
        }
        // the record's bytes were found to be UTF-8 by next()
        String raw = new String(buf, s, e - s, ascii ? StandardCharsets.ISO_8859_1 : StandardCharsets.UTF_8);
        if (escaped[i]) {
            raw = raw.replace("\"\"", "\"");
        }
        return raw.trim();
    }

    /**
     * Scans one record from {@link #pos}: 1 when a record was read, 0 at the end of the file, -1 when the
     * bytes read so far end inside the record.
     */
    private int scan() throws IOException {
        // skip empty lines
        while (true) {
            if (pos >= len) {
                return eof ? 0 : -1;
            }
            byte b = buf[pos];
            if (b == '\n') {
                pos++;
                line++;
            } else if (b == '\r') {
                if (pos + 1 >= len && !eof) {
                    return -1;
                }
                pos += pos + 1 < len && buf[pos + 1] == '\n' ? 2 : 1;
                line++;
            } else {
                break;
            }
        }
        rowLine = line;
        cells = 0;
        while (true) {
            if (cells == start.length) {
                growCells();
            }
            int c = cells;
            escaped[c] = false;
            text[c] = null;
            int s = pos;
            // leading white space stays part of a simple cell (as in Commons CSV); skip it to find a quote
            if (pos < len && buf[pos] == QUOTE) {
                pos++;
                int qs = pos;
                long quoteLine = line;
                while (true) {
                    if (pos >= len) {
                        if (eof) {
                            throw new IOException(org.shapetrail.i18n.Messages.tr("csv.unclosed",
                                    String.valueOf(quoteLine)));
                        }
                        return -1;
                    }
                    byte b = buf[pos];
                    if (b == QUOTE) {
                        if (pos + 1 >= len && !eof) {
                            return -1;
                        }
                        if (pos + 1 < len && buf[pos + 1] == QUOTE) {
                            escaped[c] = true;
                            pos += 2;
                            continue;
                        }
                        break;
                    }
                    if (b == '\n' || (b == '\r' && !(pos + 1 < len && buf[pos + 1] == '\n'))) {
                        line++;
                    }
                    pos++;
                }
                start[c] = qs;
                end[c] = pos;
                pos++; // the closing quote
                // only white space may follow, up to the delimiter or the end of the line
                while (pos < len && buf[pos] != delimiter && buf[pos] != '\n' && buf[pos] != '\r') {
                    if (!Character.isWhitespace((char) (buf[pos] & 0xff))) {
                        throw new IOException(org.shapetrail.i18n.Messages.tr("csv.afterQuote", String.valueOf(line)));
                    }
                    pos++;
                }
            } else {
                while (pos < len && buf[pos] != delimiter && buf[pos] != '\n' && buf[pos] != '\r') {
                    pos++;
                }
                start[c] = s;
                end[c] = pos;
            }
            if (pos >= len && !eof) {
                return -1;
            }
            // trim the bytes of a cell without doubled quotes here, so that equal cells have equal bytes
            if (!escaped[c]) {
                while (start[c] < end[c] && (buf[start[c]] & 0xff) <= ' ') {
                    start[c]++;
                }
                while (end[c] > start[c] && (buf[end[c] - 1] & 0xff) <= ' ') {
                    end[c]--;
                }
            }
            cells++;
            if (pos >= len) {
                return 1; // end of file ends the record
            }
            byte b = buf[pos];
            if (b == delimiter) {
                pos++;
                continue;
            }
            if (b == '\r') {
                if (pos + 1 >= len && !eof) {
                    return -1;
                }
                pos += pos + 1 < len && buf[pos + 1] == '\n' ? 2 : 1;
            } else {
                pos++;
            }
            line++;
            return 1;
        }
    }

    private void growCells() {
        int n = start.length * 2;
        start = Arrays.copyOf(start, n);
        end = Arrays.copyOf(end, n);
        escaped = Arrays.copyOf(escaped, n);
        text = Arrays.copyOf(text, n);
    }

    private void compactAndFill() throws IOException {
        if (pos > 0) {
            System.arraycopy(buf, pos, buf, 0, len - pos);
            len -= pos;
            pos = 0;
        }
        if (len == buf.length) {
            buf = Arrays.copyOf(buf, buf.length * 2);
        }
        fill();
    }

    private void fill() throws IOException {
        while (len < buf.length && !eof) {
            int n = in.read(buf, len, buf.length - len);
            if (n < 0) {
                eof = true;
            } else {
                len += n;
            }
        }
    }
}
