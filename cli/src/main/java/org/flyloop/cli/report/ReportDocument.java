package org.flyloop.cli.report;

import java.util.ArrayList;
import java.util.List;

/**
 * A report's content independent of its format.
 *
 * @param title    document title
 * @param sections in order
 */
public record ReportDocument(String title, List<Section> sections) {

    /** The section ids, in the order they appear. */
    public static final List<String> SECTION_IDS = List.of("verdict", "spec", "operating-points", "stage",
            "compensator", "parts", "margins", "envelope", "warnings", "rules-of-thumb", "safety", "averaged-model");

    public ReportDocument {
        sections = List.copyOf(sections);
    }

    /** Every picture of the document, in order. */
    public List<Block.Picture> pictures() {
        List<Block.Picture> out = new ArrayList<>();
        for (Section s : sections) {
            for (Block b : s.blocks()) {
                if (b instanceof Block.Picture p) {
                    out.add(p);
                }
            }
        }
        return out;
    }
}
