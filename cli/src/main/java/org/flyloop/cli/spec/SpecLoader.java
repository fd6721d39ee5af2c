package org.flyloop.cli.spec;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.IOException;
import java.nio.charset.CharacterCodingException;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Iterator;
import java.util.List;
import java.util.function.BiConsumer;
import org.flyloop.spec.ControlSpec;
import org.flyloop.spec.StageSpec;

/**
 * Turns a spec file into a checked {@link Spec}, or fails with one {@link InputException}.
 *
 * <p>The top level is a table of sections ({@link #SECTIONS}); each entry names the key, whether
 * it is required, and how to read it. Adding a section (e.g. {@code feedback}) means adding a
 * reader class, one table entry and one field of {@link Spec}. Keys that are in no entry are
 * refused with a did-you-mean hint.
 *
 * <p>Reading is safe for untrusted files: see {@link SafeYamlReader}.
 */
public final class SpecLoader {

    /** Files larger than this are refused before parsing; a spec is a few hundred bytes. */
    static final long MAX_BYTES = 256 * 1024;

    private static final List<SectionEntry> SECTIONS = List.of(
            new SectionEntry("title", false, "one line of free text",
                    (in, draft) -> draft.title = in.topLevel("title").text("title")),
            new SectionEntry("stage", true, "the power stage: vin, vout, iout, fsw, lm, turns, cout, esr",
                    (in, draft) -> draft.stage = StageSectionReader.read(in.source, in.value)),
            new SectionEntry("control", true, "the controller: scheme and ramp (voltage) or sense (current)",
                    (in, draft) -> draft.control = ControlSectionReader.read(in.source, in.value)));

    private SpecLoader() {
    }

    /** Reads and checks the spec file at {@code file}; messages name it as written. */
    public static Spec load(Path file) {
        String source = file.toString();
        try {
            if (Files.isDirectory(file)) {
                throw new InputException(source, "is a directory", "give the path of a .yaml spec file");
            }
            if (Files.size(file) > MAX_BYTES) {
                throw new InputException(source, "larger than " + MAX_BYTES / 1024 + " KiB",
                        "a spec file is a short YAML mapping; check the path");
            }
            return parse(Files.readString(file), source);
        } catch (NoSuchFileException e) {
            throw new InputException(source, "no such file", "give the path of a .yaml spec file, e.g. examples/telecom-5v.yaml");
        } catch (CharacterCodingException e) {
            throw new InputException(source, "not UTF-8 text", "save the spec as UTF-8");
        } catch (IOException e) {
            throw new InputException(source, "cannot read: " + e.getClass().getSimpleName(), "check the path and permissions");
        }
    }

    /** Reads and checks spec text; {@code source} names it in messages. */
    public static Spec parse(String text, String source) {
        ObjectNode root = SafeYamlReader.readMapping(text, source);
        List<String> known = new ArrayList<>();
        SECTIONS.forEach(e -> known.add(e.key));
        Iterator<String> names = root.fieldNames();
        while (names.hasNext()) {
            String key = names.next();
            if (!known.contains(key)) {
                String all = "sections: " + String.join(", ", known);
                throw new InputException(source + ": " + key, "unknown key", KeySuggester.closest(key, known)
                        .map(k -> "did you mean " + k + "? (" + all + ")").orElse(all));
            }
        }
        Draft draft = new Draft();
        for (SectionEntry entry : SECTIONS) {
            JsonNode value = root.get(entry.key);
            if (value == null) {
                if (entry.required) {
                    throw new InputException(source + ": " + entry.key, "missing section",
                            "add " + entry.key + ": with " + entry.contents);
                }
                continue;
            }
            entry.reader.accept(new SectionInput(source, root, value), draft);
        }
        return new Spec(draft.title, source, draft.stage, draft.control);
    }

    /** One top-level key: its name, whether it must be present, a hint, and its reader. */
    private record SectionEntry(String key, boolean required, String contents,
                                BiConsumer<SectionInput, Draft> reader) {
    }

    /** What a section reader gets: the file name, the whole top level, and its own value. */
    private record SectionInput(String source, ObjectNode root, JsonNode value) {
        /** The top level as a section, for scalar top-level keys such as {@code title}. */
        SpecSection topLevel(String key) {
            ObjectNode only = root.objectNode();
            only.set(key, value);
            return new SpecSection(source, "", only, List.of(key));
        }
    }

    /** Values collected while the table is walked; turned into an immutable {@link Spec} at the end. */
    private static final class Draft {
        String title = "";
        StageSpec stage;
        ControlSpec control;
    }
}
