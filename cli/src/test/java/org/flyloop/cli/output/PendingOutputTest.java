package org.flyloop.cli.output;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import org.flyloop.cli.spec.InputException;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class PendingOutputTest {

    @TempDir
    Path dir;

    @Test
    void nothingIsWrittenBeforeCommit() throws IOException {
        Path csv = dir.resolve("bode.csv");
        StringWriter out = new StringWriter();
        PendingOutput pending = new PendingOutput().print("table\n").file(csv, "f,mag\n");
        assertFalse(Files.exists(csv));
        assertEquals("", out.toString());
        pending.commit(new PrintWriter(out));
        assertEquals("f,mag\n", Files.readString(csv));
        assertEquals("table\n", out.toString());
        try (var listing = Files.list(dir)) {
            assertEquals(1, listing.count(), "no temporary file left behind");
        }
    }

    @Test
    void unwritableFileIsAnInputErrorAndPrintsNothing() {
        StringWriter out = new StringWriter();
        PendingOutput pending = new PendingOutput().print("table\n").file(dir.resolve("missing/dir/x.csv"), "x");
        assertThrows(InputException.class, () -> pending.commit(new PrintWriter(out)));
        assertEquals("", out.toString());
    }
}
