package org.flyloop.cli.report;

import java.util.List;
import org.flyloop.cli.plot.Drawing;

/** One piece of report content, rendered alike to HTML and Markdown. */
public sealed interface Block {

    /** How a paragraph reads: plain, a pass, a fail, or a caution. */
    enum Tone { PLAIN, PASS, FAIL, CAUTION }

    /** A paragraph of text. */
    record Paragraph(String text, Tone tone) implements Block {
    }

    /** A table; every row has as many cells as the header. */
    record Table(String caption, List<String> header, List<List<String>> rows) implements Block {
        public Table {
            header = List.copyOf(header);
            rows = rows.stream().map(List::copyOf).toList();
            for (List<String> r : rows) {
                if (r.size() != header.size()) {
                    throw new IllegalArgumentException("table '" + caption + "': row of " + r.size()
                            + " cells under " + header.size() + " headings");
                }
            }
        }
    }

    /** A bulleted list. */
    record Bullets(List<String> items) implements Block {
        public Bullets {
            items = List.copyOf(items);
        }
    }

    /**
     * A picture: inline SVG in HTML, a PNG beside the Markdown, both written to the report folder.
     *
     * @param fileName base file name, e.g. "loop-gain"
     * @param caption  caption
     * @param drawing  what to draw
     */
    record Picture(String fileName, String caption, Drawing drawing) implements Block {
    }
}
