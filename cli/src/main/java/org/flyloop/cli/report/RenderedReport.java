package org.flyloop.cli.report;

import java.awt.image.BufferedImage;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.Map;
import org.flyloop.cli.plot.PlotFiles;

/**
 * A report with its content laid out and every picture rendered once, to SVG and PNG, before
 * anything is written; the format writers only copy from here.
 *
 * @param input    what the report shows
 * @param document its content
 * @param svg      picture file name to SVG element
 * @param png      picture file name to image
 */
public record RenderedReport(ReportInput input, ReportDocument document, Map<String, String> svg,
                             Map<String, BufferedImage> png) {

    public RenderedReport {
        svg = Collections.unmodifiableMap(new LinkedHashMap<>(svg));
        png = Collections.unmodifiableMap(new LinkedHashMap<>(png));
    }

    /** Lays out and renders {@code input}. */
    public static RenderedReport of(ReportInput input) {
        ReportDocument doc = ReportOutline.build(input);
        Map<String, String> svg = new LinkedHashMap<>();
        Map<String, BufferedImage> png = new LinkedHashMap<>();
        for (Block.Picture p : doc.pictures()) {
            if (svg.containsKey(p.fileName())) {
                throw new IllegalStateException("two pictures named " + p.fileName());
            }
            svg.put(p.fileName(), PlotFiles.svg(p.drawing()));
            png.put(p.fileName(), PlotFiles.png(p.drawing()));
        }
        return new RenderedReport(input, doc, svg, png);
    }
}
