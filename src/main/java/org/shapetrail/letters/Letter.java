package org.shapetrail.letters;

import java.util.List;
import org.shapetrail.chart.ChartModel;

/**
 * A composed letter, independent of PDF: heading lines, sections of paragraphs, a small table of visits,
 * the chart of the period (or null), and the cautions at the foot.
 */
public record Letter(String recipientName, List<String> heading, List<Section> sections, List<List<String>> table,
                     ChartModel chart, List<String> cautions, java.util.Locale language) {
    /** A titled run of paragraphs; the chart, when there is one, follows the section that says so. */
    public record Section(String title, List<String> paragraphs, boolean chartAfter) {
        public Section {
            paragraphs = List.copyOf(paragraphs);
        }

        public Section(String title, List<String> paragraphs) {
            this(title, paragraphs, false);
        }
    }

    public Letter {
        heading = List.copyOf(heading);
        sections = List.copyOf(sections);
        table = List.copyOf(table);
        cautions = List.copyOf(cautions);
    }

    /** All the words of the letter, for checks of wording. */
    public String allText() {
        StringBuilder sb = new StringBuilder(String.join("\n", heading));
        for (Section s : sections) {
            sb.append('\n').append(s.title());
            for (String p : s.paragraphs()) {
                sb.append('\n').append(p);
            }
        }
        for (List<String> r : table) {
            sb.append('\n').append(String.join(" ", r));
        }
        sb.append('\n').append(String.join("\n", cautions));
        return sb.toString();
    }
}
