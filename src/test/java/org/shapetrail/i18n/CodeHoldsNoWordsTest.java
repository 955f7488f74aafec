package org.shapetrail.i18n;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;

/**
 * No text a person reads is written in the code that shows it (the window, the charts, the command line):
 * every string literal there is a key, an id, a style class, a settings name or a format pattern, never
 * words. Words come from the bundles (Messages.tr, and picocli's help from the same bundles), so they follow
 * the chosen language.
 */
class CodeHoldsNoWordsTest {
    /**
     * The code that builds what a person sees: the window, the chart labels (not the SVG and PNG writers,
     * whose literals are markup) and the command line.
     */
    static final List<Path> VIEW_CODE = List.of(Path.of("src/main/java/org/shapetrail/app"),
            Path.of("src/main/java/org/shapetrail/chart"), Path.of("src/main/java/org/shapetrail/chart/fx"),
            Path.of("src/main/java/org/shapetrail/cli"));
    /**
     * A program fault's message (a broken invariant, never a person's mistake) is for the developer; a
     * picocli parameter label (FILE, DATE) is the placeholder the usage line shows, as the trade of command
     * lines writes it.
     */
    static final Pattern PROGRAM_FAULT = Pattern.compile("throw new (IllegalArgument|IllegalState|NullPointer)"
            + "Exception|requireNonNull|paramLabel");
    /** A String.format pattern of specifiers alone, e.g. "%-6s %-32s %d%n" (a table's layout, no words). */
    static final Pattern FORMAT_ONLY = Pattern.compile("(%[-0-9.]*[a-z%]\\s*)+");
    /**
     * A literal that is code, not words: keys, ids, style classes, settings names. No white space, and
     * either not starting with a capital or holding a dot, underscore, hash, colon or slash ("lastFile",
     * "window.tab.person", "#search"); a capitalised word alone ("Help") is words. A lone lower-case word
     * passes as code: the check's blind spot, caught by the GUI tests in other languages.
     */
    static final Pattern CODE_LIKE = Pattern.compile("(?![A-Z][^._#:/]*$)\\S*");
    static final Pattern LITERAL = Pattern.compile("\"((?:[^\"\\\\\\n]|\\\\.)*)\"");
    /** A line that says why its literal is not words (a date pattern, a file pattern, a brand name). */
    static final String NOT_WORDS = "// not words";

    static String withoutComments(String code) {
        // block comments and javadoc, then line comments outside string literals
        String noBlocks = Pattern.compile("/\\*.*?\\*/", Pattern.DOTALL).matcher(code).replaceAll(m ->
                "\n".repeat((int) m.group().chars().filter(c -> c == '\n').count()));
        StringBuilder out = new StringBuilder();
        for (String line : noBlocks.split("\n", -1)) {
            out.append(line.contains(NOT_WORDS) ? "" : stripLineComment(line)).append('\n');
        }
        return out.toString();
    }

    static String stripLineComment(String line) {
        boolean inString = false;
        for (int i = 0; i < line.length(); i++) {
            char c = line.charAt(i);
            if (c == '\\' && inString) {
                i++;
            } else if (c == '"') {
                inString = !inString;
            } else if (!inString && c == '/' && i + 1 < line.length() && line.charAt(i + 1) == '/') {
                return line.substring(0, i);
            }
        }
        return line;
    }

    static List<String> wordsIn(Path file) throws IOException {
        String[] lines = withoutComments(Files.readString(file, StandardCharsets.UTF_8)).split("\n", -1);
        List<String> found = new ArrayList<>();
        for (int n = 0; n < lines.length; n++) {
            if (PROGRAM_FAULT.matcher(lines[n]).find()) {
                continue;
            }
            Matcher m = LITERAL.matcher(lines[n]);
            while (m.find()) {
                String text = m.group(1);
                if (text.codePoints().anyMatch(Character::isLetter) && !CODE_LIKE.matcher(text).matches()
                        && !FORMAT_ONLY.matcher(text).matches()) {
                    found.add(file.getFileName() + ":" + (n + 1) + " \"" + text + "\"");
                }
            }
        }
        return found;
    }

    @Test
    void theViewCodeHoldsNoWords() throws IOException {
        List<String> found = new ArrayList<>();
        int files = 0;
        for (Path dir : VIEW_CODE) {
            try (Stream<Path> s = Files.list(dir)) {
                for (Path f : s.filter(p -> p.toString().endsWith(".java")).sorted().toList()) {
                    files++;
                    found.addAll(wordsIn(f));
                }
            }
        }
        assertTrue(files > 40, "the scan found the view code (" + files + " files)");
        assertEquals(List.of(), found, found.size() + " literals with words in the view code; put them in the bundles");
    }

    @Test
    void theScanSeesWordsAndLetsCodeBe() throws IOException {
        // the scan itself: a label's words are found, keys and ids are not (derivation: the rule above)
        Path f = Files.createTempFile("View", ".java");
        try {
            Files.writeString(f, String.join("\n",
                    "class View {",
                    "  void build() {",
                    "    label.setText(\"Save the visit\");",
                    "    label.setId(\"save-visit\");",
                    "    label.setText(Messages.tr(\"visit.save\"));",
                    "    // a comment with \"Words in quotes\" is not code",
                    "    java.time.format.DateTimeFormatter.ofPattern(\"d MMM yyyy\"); // not words: a date pattern",
                    "    status.set(\"Opening \" + name);",
                    "  }",
                    "}"));
            List<String> found = wordsIn(f);
            assertEquals(2, found.size(), found.toString());
            assertTrue(found.get(0).contains(":3 \"Save the visit\""), found.toString());
            assertTrue(found.get(1).contains(":8 \"Opening \""), found.toString());
        } finally {
            Files.delete(f);
        }
    }
}
