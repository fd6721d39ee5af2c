package org.flyloop.cli.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The report folder is replaced whole or not at all. */
class ReportWriterTest {

    @TempDir
    Path tmp;

    private static ReportInput input(String name) {
        return ReportInput.from(DesignScenarios.dcmOta(), name);
    }

    private static List<String> siblings(Path parent) throws IOException {
        try (Stream<Path> s = Files.list(parent)) {
            return s.map(p -> p.getFileName().toString()).sorted().toList();
        }
    }

    @Test
    void aSecondReportReplacesTheFirstAsAWhole() throws IOException {
        Path dir = tmp.resolve("out");
        ReportWriter.write(input("first spec"), dir);
        Files.writeString(dir.resolve("left-over.txt"), "from the first report");
        ReportWriter.write(input("second spec"), dir);
        String html = Files.readString(dir.resolve(HtmlPage.FILE));
        assertTrue(html.contains("second spec") && !html.contains("first spec"));
        assertFalse(Files.exists(dir.resolve("left-over.txt")), "nothing of the old folder survives");
        assertEquals(List.of("out"), siblings(tmp), "no temporary or previous folder left beside it");
    }

    @Test
    void aFailureMidWriteLeavesThePreviousReportIntact() throws IOException {
        Path dir = tmp.resolve("out");
        ReportWriter.write(input("first spec"), dir);
        byte[] before = Files.readAllBytes(dir.resolve(HtmlPage.FILE));
        List<String> filesBefore = siblings(dir);
        List<ReportPart> parts = new ArrayList<>(List.of(new PictureFiles(), new HtmlPage()));
        parts.add((report, d) -> {
            throw new IOException("disk full (simulated)");
        });
        parts.add(new MarkdownPage());
        ReportWriter failing = new ReportWriter(parts);
        IOException e = assertThrows(IOException.class, () -> failing.writeTo(input("second spec"), dir));
        assertEquals("disk full (simulated)", e.getMessage());
        assertTrue(java.util.Arrays.equals(before, Files.readAllBytes(dir.resolve(HtmlPage.FILE))));
        assertEquals(filesBefore, siblings(dir));
        assertEquals(List.of("out"), siblings(tmp), "the half-written folder is removed");
    }

    @Test
    void aFailureOnTheFirstWriteLeavesNoFolder() {
        Path dir = tmp.resolve("fresh");
        ReportWriter failing = new ReportWriter(List.of(new HtmlPage(), (report, d) -> {
            throw new IllegalStateException("renderer bug (simulated)");
        }));
        assertThrows(IllegalStateException.class, () -> failing.writeTo(input("x"), dir));
        assertFalse(Files.exists(dir));
    }

    @Test
    void refusesToReplaceAFolderOfOtherFiles() throws IOException {
        Path dir = Files.createDirectories(tmp.resolve("documents"));
        Files.writeString(dir.resolve("thesis.tex"), "precious");
        assertThrows(IOException.class, () -> ReportWriter.write(input("x"), dir));
        assertEquals("precious", Files.readString(dir.resolve("thesis.tex")));
    }

    @Test
    void defaultFolderIsNamedAfterTheSpec() {
        assertEquals(Path.of("flyloop-out", "charger-90-264V.v2"), ReportWriter.defaultDirectory("charger 90/264V.v2"));
        assertEquals(Path.of("flyloop-out", "report"), ReportWriter.defaultDirectory("../.."));
    }
}
