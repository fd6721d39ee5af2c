package org.flyloop.cli.command;

import java.nio.file.Path;
import org.flyloop.cli.report.ReportWriter;
import org.flyloop.cli.spec.Spec;
import picocli.CommandLine.Option;

/** {@code --out [DIR]}: where a command writes its report, shared by design and check. */
public final class ReportOptions {

    @Option(names = "--out", arity = "0..1", paramLabel = "DIR", fallbackValue = "",
            description = "Write report.html, report.md, pictures and data/ into DIR "
                    + "(default flyloop-out/<spec name>/). An existing report there is replaced as a whole.")
    private String out;

    /** True when {@code --out} was given. */
    public boolean wanted() {
        return out != null;
    }

    /** The report directory: the one given, or flyloop-out/&lt;spec file name without extension&gt;. */
    public Path directory(Spec spec) {
        return out == null || out.isEmpty() ? ReportWriter.defaultDirectory(specName(spec)) : Path.of(out);
    }

    /** The spec file's name without its extension. */
    public static String specName(Spec spec) {
        String name = Path.of(spec.source()).getFileName().toString();
        int dot = name.lastIndexOf('.');
        return dot > 0 ? name.substring(0, dot) : name;
    }
}
