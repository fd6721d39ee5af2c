package org.flyloop.cli.report;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Map;
import org.flyloop.cli.plot.PlotFiles;

/** Every picture as {@code <name>.png} and {@code <name>.svg} beside the pages. */
public final class PictureFiles implements ReportPart {

    @Override
    public void writeInto(RenderedReport report, Path dir) throws IOException {
        for (Map.Entry<String, String> e : report.svg().entrySet()) {
            Files.writeString(dir.resolve(e.getKey() + ".svg"), "<?xml version=\"1.0\" encoding=\"UTF-8\"?>\n"
                    + e.getValue(), StandardCharsets.UTF_8);
            PlotFiles.writePng(report.png().get(e.getKey()), dir.resolve(e.getKey() + ".png"));
        }
    }
}
