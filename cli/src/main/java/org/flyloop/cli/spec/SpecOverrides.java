package org.flyloop.cli.spec;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Optional;

/**
 * Command-line {@code --set path=value} overrides of spec values, e.g. {@code stage.cout=470u},
 * {@code feedback.parts.r_zero=22k} or {@code stage.vin=[90, 264]}.
 *
 * <p>The path is a dotted chain of known keys (sections, their keys, and the part names under
 * {@code feedback.parts}); the value is written as in the spec file, as one line of YAML, so lists
 * and mappings take the flow forms {@code [a, b]} and {@code {k: v}}. Overrides are applied in
 * order (a later one wins) to the YAML tree before any value is read, so every override passes
 * the very same checks as the file, and an override that restates the file's value yields an equal
 * {@link Spec}. A path into a section the file lacks creates the section; only known keys can be
 * created, so a misspelt path is refused instead of silently adding nothing.
 *
 * <p>Errors are one-line {@link InputException}s located at {@code --set <path>}, both for a bad
 * path or value text and for a value the section reader later refuses.
 */
public final class SpecOverrides {

    private static final String OPTION = "--set";
    private static final String FORM = "write --set path=value, e.g. --set stage.cout=470u";

    private final List<Setting> settings;

    private SpecOverrides(List<Setting> settings) {
        this.settings = List.copyOf(settings);
    }

    /** No overrides. */
    public static SpecOverrides none() {
        return new SpecOverrides(List.of());
    }

    /**
     * Checks the syntax and key paths of {@code path=value} settings; nothing here needs the file.
     *
     * @throws InputException for text without {@code =}, an empty or unknown path (with a
     *                        did-you-mean among the keys at that level), a path through a value,
     *                        or a value that is not one line of YAML
     */
    public static SpecOverrides parse(List<String> settings) {
        List<Setting> parsed = new ArrayList<>();
        for (String setting : settings) {
            parsed.add(parseOne(setting));
        }
        return new SpecOverrides(parsed);
    }

    /** True when there is nothing to override. */
    public boolean isEmpty() {
        return settings.isEmpty();
    }

    /** The overridden key paths, in the order given (a path set twice appears twice). */
    public List<String> paths() {
        return settings.stream().map(Setting::dotted).toList();
    }

    /**
     * Writes every override into {@code root}, creating missing mappings along its path.
     *
     * @throws InputException when the file holds something other than a mapping where the path
     *                        needs one (e.g. {@code feedback.parts: 5} and {@code --set feedback.parts.r_zero=1k})
     */
    public void applyTo(ObjectNode root, String source) {
        for (Setting o : settings) {
            ObjectNode node = root;
            for (int i = 0; i < o.path.size() - 1; i++) {
                String key = o.path.get(i);
                JsonNode child = node.get(key);
                if (child == null) {
                    child = node.putObject(key);
                } else if (!child.isObject()) {
                    String where = String.join(".", o.path.subList(0, i + 1));
                    throw new InputException(source + ": " + where, "expected a mapping of keys, got "
                            + SpecSection.describe(child), "fix the file before " + OPTION + " " + o.dotted());
                }
                node = (ObjectNode) child;
            }
            node.set(o.path.get(o.path.size() - 1), o.value.deepCopy());
        }
    }

    /**
     * The same error located at {@code --set <key path>} when it concerns an overridden value (the
     * key itself or anything inside it); any other error is returned unchanged.
     */
    public InputException relocate(InputException e, String source) {
        String prefix = source + ": ";
        if (!e.where().startsWith(prefix)) {
            return e;
        }
        String keyPath = e.where().substring(prefix.length());
        for (Setting o : settings) {
            String p = o.dotted();
            if (keyPath.equals(p) || keyPath.startsWith(p + ".") || keyPath.startsWith(p + "[")) {
                return new InputException(OPTION + " " + keyPath, e.problem(), e.accepted());
            }
        }
        return e;
    }

    private static Setting parseOne(String setting) {
        if (setting.contains("\n") || setting.contains("\r")) {
            throw new InputException(OPTION + " " + shown(setting), "spans more than one line", FORM);
        }
        int eq = setting.indexOf('=');
        if (eq < 0) {
            throw new InputException(OPTION + " " + shown(setting), "no '=' between key path and value", FORM);
        }
        String dotted = setting.substring(0, eq).strip();
        if (dotted.isEmpty()) {
            throw new InputException(OPTION + " " + shown(setting), "no key path before '='", FORM);
        }
        List<String> path = Arrays.asList(dotted.split("\\.", -1));
        checkPath(dotted, path);
        return new Setting(path, readValue(dotted, setting.substring(eq + 1)));
    }

    /** Every step must be a known key of the mapping above it, and only the last may be a value. */
    private static void checkPath(String dotted, List<String> path) {
        for (int i = 0; i < path.size(); i++) {
            List<String> above = path.subList(0, i);
            String here = String.join(".", path.subList(0, i + 1));
            List<String> known = SpecLoader.knownKeys(above);
            if (known == null) {
                String value = String.join(".", above);
                throw new InputException(OPTION + " " + dotted, value + " holds a value, not keys",
                        "write " + OPTION + " " + value + "=VALUE");
            }
            String key = path.get(i);
            if (key.isBlank()) {
                throw new InputException(OPTION + " " + dotted, "empty key in the path", FORM);
            }
            if (!known.contains(key)) {
                String level = above.isEmpty() ? "sections" : String.join(".", above) + " keys";
                String all = level + ": " + String.join(", ", known);
                Optional<String> near = KeySuggester.closest(key, known);
                String prefix = above.isEmpty() ? "" : String.join(".", above) + ".";
                throw new InputException(OPTION + " " + here, "unknown key",
                        near.map(k -> "did you mean " + prefix + k + "? (" + all + ")").orElse(all));
            }
        }
    }

    /** The value text read as the value of a one-key YAML document, with the same safety rules as a file. */
    private static JsonNode readValue(String dotted, String valueText) {
        String where = OPTION + " " + dotted;
        ObjectNode doc;
        try {
            doc = SafeYamlReader.readMapping("value: " + valueText + "\n", where);
        } catch (InputException e) {
            throw new InputException(where, e.problem(),
                    "write the value as in the spec file: lists as [a, b], text holding ':' or '#' in quotes");
        }
        if (doc.size() != 1 || !doc.has("value")) {
            throw new InputException(where, "the value is not one YAML value",
                    "write the value as in the spec file: lists as [a, b], text holding ':' or '#' in quotes");
        }
        return doc.get("value");
    }

    private static String shown(String s) {
        String oneLine = s.replaceAll("\\s+", " ").strip();
        return oneLine.length() > 40 ? oneLine.substring(0, 37) + "..." : oneLine;
    }

    /** One parsed override: its key path and its YAML value. */
    private record Setting(List<String> path, JsonNode value) {
        String dotted() {
            return String.join(".", path);
        }
    }
}
