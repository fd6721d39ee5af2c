package org.flyloop.cli.command;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.flyloop.cli.spec.Spec;
import org.flyloop.cli.spec.SpecLoader;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/**
 * Options every spec-reading command shares: the spec file, {@code --set} overrides,
 * {@code --json} and {@code --quiet}.
 */
public final class SpecFileOptions {

    @Parameters(index = "0", paramLabel = "SPEC", description = "Spec file (YAML), e.g. examples/telecom-5v.yaml.")
    private Path specFile;

    @Option(names = "--set", paramLabel = "PATH=VALUE",
            description = "Change one spec value without editing the file, e.g. --set stage.cout=470u or "
                    + "--set feedback.parts.r_zero=22k. Repeatable; applied in order, a later one winning.")
    private List<String> overrides = new ArrayList<>();

    @Option(names = "--json", description = "Print JSON (SI units) instead of a table.")
    private boolean json;

    @Option(names = {"-q", "--quiet"}, description = "Print the results only: no title, no caution line.")
    private boolean quiet;

    /**
     * Reads and checks the spec file with the {@code --set} overrides applied; bad input becomes
     * a one-line error (exit 2).
     */
    public Spec loadSpec() {
        return SpecLoader.load(specFile, overrides);
    }

    public boolean json() {
        return json;
    }

    public boolean quiet() {
        return quiet;
    }
}
