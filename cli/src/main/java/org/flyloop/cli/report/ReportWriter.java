package org.flyloop.cli.report;

import java.io.IOException;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.FileVisitResult;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.SimpleFileVisitor;
import java.nio.file.StandardCopyOption;
import java.nio.file.attribute.BasicFileAttributes;
import java.util.List;
import java.util.UUID;
import java.util.stream.Stream;

/**
 * Writes a report folder: {@code report.html}, {@code report.md}, the pictures as PNG and SVG, and
 * {@code data/} with every curve as CSV and the result as JSON.
 *
 * <p>All files are first written into a temporary sibling folder; only when every file is written
 * does that folder take the target's name (a rename), and a previous report there is moved aside
 * first and deleted after. A failure while writing leaves the previous report untouched and removes
 * the temporary folder. An existing folder is only ever replaced when it holds a flyloop report
 * (its marker file) or is empty, so pointing the output at a folder of other files fails instead
 * of deleting them.
 */
public final class ReportWriter {

    /** Marker file that identifies a folder written by this class. */
    public static final String MARKER = ".flyloop-report";
    /** Folder the commands write into by default; the spec name is appended. */
    public static final Path DEFAULT_ROOT = Path.of("flyloop-out");

    private final List<ReportPart> parts;

    ReportWriter(List<ReportPart> parts) {
        this.parts = List.copyOf(parts);
    }

    /** The standard report: pictures, HTML page, Markdown page, data. */
    public static ReportWriter standard() {
        return new ReportWriter(List.of(new PictureFiles(), new HtmlPage(), new MarkdownPage(), new DataFiles()));
    }

    /**
     * Writes the standard report of {@code input} into {@code dir}, replacing a previous report
     * there as a whole.
     *
     * @return the report folder
     * @throws IOException when a file cannot be written (the previous report, if any, is intact),
     *                     or {@code dir} exists and is neither empty nor a flyloop report
     */
    public static Path write(ReportInput input, Path dir) throws IOException {
        return standard().writeTo(input, dir);
    }

    /** {@code flyloop-out/<spec name>}, with the name reduced to safe file-name characters. */
    public static Path defaultDirectory(String specName) {
        String safe = specName.replaceAll("[^A-Za-z0-9._-]+", "-").replaceAll("^[.-]+", "");
        return DEFAULT_ROOT.resolve(safe.isEmpty() ? "report" : safe);
    }

    /** As {@link #write}, with this writer's parts. */
    public Path writeTo(ReportInput input, Path dir) throws IOException {
        Path target = dir.toAbsolutePath().normalize();
        Path parent = target.getParent();
        if (parent == null) {
            throw new IOException("cannot write a report over the file-system root");
        }
        checkReplaceable(target);
        RenderedReport rendered = RenderedReport.of(input);
        Files.createDirectories(parent);
        Path temp = Files.createTempDirectory(parent, "." + target.getFileName() + ".writing-");
        try {
            for (ReportPart p : parts) {
                p.writeInto(rendered, temp);
            }
            Files.writeString(temp.resolve(MARKER), "written by flyloop; this whole folder is replaced on rewrite\n");
            replace(temp, target);
        } catch (IOException | RuntimeException e) {
            deleteTree(temp);
            throw e;
        }
        return target;
    }

    private static void checkReplaceable(Path target) throws IOException {
        if (!Files.exists(target)) {
            return;
        }
        if (!Files.isDirectory(target)) {
            throw new IOException(target + " exists and is not a folder");
        }
        if (Files.exists(target.resolve(MARKER))) {
            return;
        }
        try (Stream<Path> s = Files.list(target)) {
            if (s.findAny().isPresent()) {
                throw new IOException("refusing to replace " + target + ": it holds files but no flyloop report");
            }
        }
    }

    /** Renames {@code temp} to {@code target}; a previous {@code target} is moved aside, then deleted. */
    private static void replace(Path temp, Path target) throws IOException {
        if (!Files.exists(target)) {
            move(temp, target);
            return;
        }
        Path old = target.resolveSibling("." + target.getFileName() + ".previous-" + UUID.randomUUID());
        move(target, old);
        try {
            move(temp, target);
        } catch (IOException e) {
            move(old, target);
            throw e;
        }
        deleteTree(old);
    }

    private static void move(Path from, Path to) throws IOException {
        try {
            Files.move(from, to, StandardCopyOption.ATOMIC_MOVE);
        } catch (AtomicMoveNotSupportedException e) {
            Files.move(from, to);
        }
    }

    static void deleteTree(Path root) throws IOException {
        if (!Files.exists(root)) {
            return;
        }
        Files.walkFileTree(root, new SimpleFileVisitor<>() {
            @Override
            public FileVisitResult visitFile(Path file, BasicFileAttributes attrs) throws IOException {
                Files.delete(file);
                return FileVisitResult.CONTINUE;
            }

            @Override
            public FileVisitResult postVisitDirectory(Path d, IOException e) throws IOException {
                if (e != null) {
                    throw e;
                }
                Files.delete(d);
                return FileVisitResult.CONTINUE;
            }
        });
    }
}
