package org.flyloop.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * One real process per outcome, so that {@code main}'s exit status and stream handling are
 * checked as a shell sees them (the in-process tests cannot observe {@code System.exit}).
 */
class MainProcessTest {

    @TempDir
    Path dir;

    private record Outcome(int exit, String out, String err) {
    }

    private Outcome run(String... args) throws IOException, InterruptedException {
        List<String> cmd = new ArrayList<>(List.of(Path.of(System.getProperty("java.home"), "bin", "java").toString(),
                "-XX:TieredStopAtLevel=1", "-cp", System.getProperty("java.class.path"), Main.class.getName()));
        cmd.addAll(List.of(args));
        Process p = new ProcessBuilder(cmd).redirectInput(ProcessBuilder.Redirect.from(new java.io.File("/dev/null")))
                .start();
        byte[] out = p.getInputStream().readAllBytes();
        byte[] err = p.getErrorStream().readAllBytes();
        return new Outcome(p.waitFor(), new String(out, StandardCharsets.UTF_8), new String(err, StandardCharsets.UTF_8));
    }

    @Test
    void exitStatusReachesTheShell() throws Exception {
        Outcome ok = run("stage", Path.of("..", "examples", "telecom-5v.yaml").toString(), "--json");
        assertEquals(0, ok.exit(), ok.err());
        assertTrue(ok.out().startsWith("{\"points\":["), ok.out());

        Path bad = dir.resolve("bad.yaml");
        Files.writeString(bad, "stage: {vin: 1M}\n");
        Outcome fail = run("stage", bad.toString());
        assertEquals(2, fail.exit());
        assertEquals("", fail.out());
        assertEquals(1, fail.err().split("\\R").length, fail.err());
        assertTrue(fail.err().startsWith("flyloop: " + bad + ": stage.vin: '1M': M is ambiguous"), fail.err());
    }
}
