package org.flyloop.cli.report;

import java.io.IOException;
import java.nio.file.Path;

/** One kind of file a report consists of (the HTML page, the Markdown page, pictures, data). */
@FunctionalInterface
public interface ReportPart {

    /** Writes this part of {@code report} into {@code dir}, which exists and is private to this write. */
    void writeInto(RenderedReport report, Path dir) throws IOException;
}
