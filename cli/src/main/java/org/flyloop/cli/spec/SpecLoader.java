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
import java.util.Map;
import java.util.function.BiConsumer;
import org.flyloop.spec.ControlSpec;
import org.flyloop.spec.FeedbackSpec;
import org.flyloop.spec.SeriesSpec;
import org.flyloop.spec.StageSpec;
import org.flyloop.spec.TargetsSpec;
import org.flyloop.spec.TolerancesSpec;

/**
 * Turns a spec file into a checked {@link Spec}, or fails with one {@link InputException}.
 *
 * <p>The top level is a table of sections ({@link #SECTIONS}); each entry names the key, whether
 * it is required, and how to read it. Adding a section means adding a
 * reader class, one table entry and one field of {@link Spec}. Keys that are in no entry are
 * refused with a did-you-mean hint. Sections are read in table order, so a reader may use the
 * sections above it (feedback checks its reference against stage.vout; tolerances take the
 * capacitor tolerance and the CTR spread from feedback).
 *
 * <p>Reading is safe for untrusted files: see {@link SafeYamlReader}.
 */
public final class SpecLoader {

    /** Files larger than this are refused before parsing; a spec is a few hundred bytes. */
    static final long MAX_BYTES = 256 * 1024;

    private static final List<SectionEntry> SECTIONS = List.of(
            new SectionEntry("title", false, null, "one line of free text",
                    (in, draft) -> draft.title = in.topLevel("title").text("title")),
            new SectionEntry("stage", true, StageSectionReader.KEYS,
                    "the power stage: vin, vout, iout, fsw, lm, turns, cout, esr",
                    (in, draft) -> draft.stage = StageSectionReader.read(in.source, in.value)),
            new SectionEntry("control", true, ControlSectionReader.KEYS,
                    "the controller: scheme and ramp (voltage) or sense (current)",
                    (in, draft) -> draft.control = ControlSectionReader.read(in.source, in.value)),
            new SectionEntry("feedback", false, FeedbackSectionReader.KEYS, "the error amplifier and its network",
                    (in, draft) -> draft.feedback = FeedbackSectionReader.read(in.source, in.value, draft.stage)),
            new SectionEntry("targets", false, TargetsSectionReader.KEYS, "crossover and margins",
                    (in, draft) -> draft.targets = TargetsSectionReader.read(in.source, in.value)),
            new SectionEntry("series", false, SeriesSectionReader.KEYS, "E-series for resistors and capacitors",
                    (in, draft) -> draft.series = SeriesSectionReader.read(in.source, in.value)),
            new SectionEntry("tolerances", false, TolerancesSectionReader.KEYS, "component tolerances",
                    (in, draft) -> draft.tolerances = TolerancesSectionReader.read(in.source, in.value,
                            draft.feedback)));

    /** Mappings nested inside a section, by key path, with the keys they accept. */
    private static final Map<String, List<String>> NESTED = Map.of("feedback.parts", PartKeys.ALL);

    private SpecLoader() {
    }

    /** Reads and checks the spec file at {@code file}; messages name it as written. */
    public static Spec load(Path file) {
        return load(file, List.of());
    }

    /**
     * Reads the spec file at {@code file} with {@code --set path=value} overrides applied to the
     * YAML tree before any value is read, so an override is checked exactly like the file; see
     * {@link SpecOverrides}. The overrides are checked first, before the file is opened.
     */
    public static Spec load(Path file, List<String> overrides) {
        SpecOverrides parsed = SpecOverrides.parse(overrides);
        String source = file.toString();
        try {
            if (Files.isDirectory(file)) {
                throw new InputException(source, "is a directory", "give the path of a .yaml spec file");
            }
            if (Files.size(file) > MAX_BYTES) {
                throw new InputException(source, "larger than " + MAX_BYTES / 1024 + " KiB",
                        "a spec file is a short YAML mapping; check the path");
            }
            return read(Files.readString(file), source, parsed);
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
        return parse(text, source, List.of());
    }

    /** Reads and checks spec text with {@code --set} overrides (see {@link #load(Path, List)}). */
    public static Spec parse(String text, String source, List<String> overrides) {
        return read(text, source, SpecOverrides.parse(overrides));
    }

    /**
     * The known keys of the mapping at {@code mappingPath} ({@code []} for the top level), or null
     * when the path names a value rather than a mapping. Unknown paths also give null.
     */
    static List<String> knownKeys(List<String> mappingPath) {
        if (mappingPath.isEmpty()) {
            return SECTIONS.stream().map(SectionEntry::key).toList();
        }
        if (mappingPath.size() == 1) {
            return SECTIONS.stream().filter(e -> e.key.equals(mappingPath.get(0))).findFirst()
                    .map(SectionEntry::keys).orElse(null);
        }
        return NESTED.get(String.join(".", mappingPath));
    }

    private static Spec read(String text, String source, SpecOverrides overrides) {
        ObjectNode root = SafeYamlReader.readMapping(text, source);
        overrides.applyTo(root, source);
        try {
            return read(root, source);
        } catch (InputException e) {
            throw overrides.relocate(e, source);
        }
    }

    private static Spec read(ObjectNode root, String source) {
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
        return new Spec(draft.title, source, draft.stage, draft.control, draft.feedback, draft.targets,
                draft.series, draft.tolerances);
    }

    /**
     * One top-level key: its name, whether it must be present, the keys it accepts (null for a
     * plain value such as the title), a hint, and its reader.
     */
    private record SectionEntry(String key, boolean required, List<String> keys, String contents,
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
        FeedbackSpec feedback;
        TargetsSpec targets = TargetsSpec.defaults();
        SeriesSpec series = SeriesSpec.defaults();
        TolerancesSpec tolerances = TolerancesSpec.none();
    }
}
