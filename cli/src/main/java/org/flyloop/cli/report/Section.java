package org.flyloop.cli.report;

import java.util.List;

/**
 * A report section.
 *
 * @param id     anchor id, stable (tests and links rely on it)
 * @param title  heading
 * @param blocks content in order
 */
public record Section(String id, String title, List<Block> blocks) {

    public Section {
        blocks = List.copyOf(blocks);
    }
}
