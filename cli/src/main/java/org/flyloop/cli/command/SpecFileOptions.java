package org.flyloop.cli.command;

import java.nio.file.Path;
import org.flyloop.cli.spec.Spec;
import org.flyloop.cli.spec.SpecLoader;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/** Options every spec-reading command shares: the spec file, {@code --json}, {@code --quiet}. */
public final class SpecFileOptions {

    @Parameters(index = "0", paramLabel = "SPEC", description = "Spec file (YAML), e.g. examples/telecom-5v.yaml.")
    private Path specFile;

    @Option(names = "--json", description = "Print JSON (SI units) instead of a table.")
    private boolean json;

    @Option(names = {"-q", "--quiet"}, description = "Print the results only: no title, no caution line.")
    private boolean quiet;

    /** Reads and checks the spec file; bad input becomes a one-line error (exit 2). */
    public Spec loadSpec() {
        return SpecLoader.load(specFile);
    }

    public boolean json() {
        return json;
    }

    public boolean quiet() {
        return quiet;
    }
}
