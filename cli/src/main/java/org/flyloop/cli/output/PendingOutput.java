package org.flyloop.cli.output;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.LinkedHashMap;
import java.util.Map;
import org.flyloop.cli.spec.InputException;

/**
 * Everything a command will print and every file it will write, held back until the whole
 * computation has succeeded. A command that fails half-way therefore leaves stdout empty and
 * writes no partial files; options that add output (a CSV, a netlist) add to this instead of
 * writing directly.
 *
 * <p>Files are written to a temporary sibling and moved into place, so a reader never sees a
 * half-written file.
 */
public final class PendingOutput {

    private final StringBuilder text = new StringBuilder();
    private final Map<Path, String> files = new LinkedHashMap<>();

    /** Appends text for stdout. */
    public PendingOutput print(String s) {
        text.append(s);
        return this;
    }

    /** Schedules a UTF-8 file; a later call for the same path replaces the content. */
    public PendingOutput file(Path path, String content) {
        files.put(path, content);
        return this;
    }

    /** The text scheduled for stdout so far. */
    public String text() {
        return text.toString();
    }

    /**
     * Writes the files, then prints the text.
     *
     * @throws InputException when a file cannot be written (e.g. its directory does not exist)
     */
    public void commit(PrintWriter out) {
        for (Map.Entry<Path, String> f : files.entrySet()) {
            write(f.getKey(), f.getValue());
        }
        out.print(text);
        out.flush();
    }

    private static void write(Path path, String content) {
        Path absolute = path.toAbsolutePath();
        Path tmp = null;
        try {
            tmp = Files.createTempFile(absolute.getParent(), "." + absolute.getFileName(), ".tmp");
            Files.writeString(tmp, content, StandardCharsets.UTF_8);
            try {
                Files.move(tmp, absolute, StandardCopyOption.REPLACE_EXISTING, StandardCopyOption.ATOMIC_MOVE);
            } catch (AtomicMoveNotSupportedException e) {
                Files.move(tmp, absolute, StandardCopyOption.REPLACE_EXISTING);
            }
        } catch (IOException e) {
            if (tmp != null) {
                try {
                    Files.deleteIfExists(tmp);
                } catch (IOException ignored) {
                    // The original failure is the one worth reporting.
                }
            }
            throw new InputException(path.toString(), "cannot write: " + e.getClass().getSimpleName(),
                    "check that the directory exists and is writable");
        }
    }
}
