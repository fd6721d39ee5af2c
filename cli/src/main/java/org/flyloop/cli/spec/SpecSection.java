package org.flyloop.cli.spec;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.util.ArrayList;
import java.util.Iterator;
import java.util.List;
import java.util.Optional;
import org.flyloop.spec.ValueRange;
import org.flyloop.units.QuantityFormatException;
import org.flyloop.units.QuantityParser;
import org.flyloop.units.Unit;

/**
 * One mapping of a spec (e.g. {@code stage}) with typed, located accessors. Every problem becomes
 * an {@link InputException} naming the file and the full key path. A section knows its keys, so
 * unknown ones are refused with a did-you-mean hint.
 */
public final class SpecSection {

    private final String source;
    private final String path;
    private final ObjectNode node;
    private final List<String> knownKeys;

    /**
     * @param source    file name for messages
     * @param path      key path of this section, e.g. {@code stage}
     * @param value     the section's node (must be a mapping)
     * @param knownKeys every key this section accepts, in the order the docs list them
     */
    public SpecSection(String source, String path, JsonNode value, List<String> knownKeys) {
        this.source = source;
        this.path = path;
        this.knownKeys = List.copyOf(knownKeys);
        if (value == null || !value.isObject()) {
            throw new InputException(source + ": " + path, "expected a mapping of keys, got " + describe(value),
                    "indent the keys " + String.join(", ", this.knownKeys) + " under " + path + ":");
        }
        this.node = (ObjectNode) value;
        rejectUnknownKeys();
    }

    /** True when the key is present (even with an empty value). */
    public boolean has(String key) {
        return node.has(key);
    }

    /** A required single quantity; see {@link QuantityParser} for the accepted text. */
    public double quantity(String key, Unit unit, Sign sign) {
        JsonNode v = node.get(key);
        if (v == null) {
            throw missing(key, unit.hint(null));
        }
        return checkedSign(key, scalarQuantity(key, v, unit), v.asText(), unit, sign);
    }

    /** An optional single quantity with a default used when the key is absent. */
    public double quantity(String key, Unit unit, Sign sign, double defaultValue) {
        return node.has(key) ? quantity(key, unit, sign) : defaultValue;
    }

    /**
     * A required range: one value, {@code [min, max]}, {@code [min, nominal, max]} or the text
     * {@code "min..max"}; every value must satisfy {@code sign}, and the list must ascend.
     */
    public ValueRange range(String key, Unit unit, Sign sign) {
        JsonNode v = node.get(key);
        String accepted = "write one value, [min, max], [min, nominal, max] or \"min..max\", e.g. "
                + rangeExample(unit);
        if (v == null) {
            throw missing(key, accepted);
        }
        List<Double> values = new ArrayList<>();
        if (v.isArray()) {
            if (v.size() < 2 || v.size() > 3) {
                throw at(key, "a list of " + v.size() + " value" + (v.size() == 1 ? "" : "s"), accepted);
            }
            for (int i = 0; i < v.size(); i++) {
                String itemKey = key + "[" + i + "]";
                values.add(checkedSign(itemKey, scalarQuantity(itemKey, v.get(i), unit), v.get(i).asText(), unit, sign));
            }
        } else if (v.isTextual() && v.asText().contains("..")) {
            String[] ends = v.asText().split("\\.\\.", -1);
            if (ends.length != 2) {
                throw at(key, "'" + v.asText() + "' is not a range", accepted);
            }
            for (String end : ends) {
                values.add(checkedSign(key, parse(key, end, unit), end.strip(), unit, sign));
            }
        } else {
            return ValueRange.of(checkedSign(key, scalarQuantity(key, v, unit), v.asText(), unit, sign));
        }
        for (int i = 1; i < values.size(); i++) {
            if (values.get(i) < values.get(i - 1)) {
                throw at(key, "the values do not ascend", "list them as min, nominal, max, e.g. " + rangeExample(unit));
            }
        }
        return values.size() == 2
                ? ValueRange.between(values.get(0), values.get(1))
                : new ValueRange(values.get(0), values.get(1), values.get(2));
    }

    /** A required word out of a fixed set, compared case-insensitively; returns the set's spelling. */
    public String word(String key, List<String> allowed) {
        JsonNode v = node.get(key);
        String accepted = "write " + String.join(" or ", allowed);
        if (v == null) {
            throw missing(key, accepted);
        }
        if (!v.isTextual()) {
            throw at(key, "expected a word, got " + describe(v), accepted);
        }
        String typed = v.asText().strip();
        for (String a : allowed) {
            if (a.equalsIgnoreCase(typed)) {
                return a;
            }
        }
        Optional<String> near = KeySuggester.closest(typed, allowed);
        throw at(key, "'" + typed + "' is not one of " + String.join(", ", allowed),
                near.map(n -> "did you mean " + n + "? ").orElse("") + accepted);
    }

    /** An optional word out of a fixed set, or {@code defaultWord} when the key is absent. */
    public String word(String key, List<String> allowed, String defaultWord) {
        return node.has(key) ? word(key, allowed) : defaultWord;
    }

    /**
     * A required number that may carry one of {@code unitWords} after it (e.g. {@code deg},
     * {@code dB}), compared case-insensitively; engineering suffixes are accepted as for any
     * number, a percent sign is not (55 % of a degree is never meant).
     *
     * @param hint the accepted-forms half of messages, e.g. {@code write degrees, e.g. 55 or 55deg}
     */
    public double labelledNumber(String key, List<String> unitWords, Sign sign, String hint) {
        JsonNode v = node.get(key);
        if (v == null) {
            throw missing(key, hint);
        }
        if (v.isNull()) {
            throw at(key, "no value", hint);
        }
        if (!v.isTextual()) {
            throw at(key, "expected a single value, got " + describe(v), hint);
        }
        String written = v.asText().strip();
        String number = written;
        for (String word : unitWords) {
            if (number.regionMatches(true, number.length() - word.length(), word, 0, word.length())) {
                number = number.substring(0, number.length() - word.length()).strip();
                break;
            }
        }
        if (number.contains("%")) {
            throw at(key, "a percentage does not fit here, got " + written, hint);
        }
        double value;
        try {
            value = QuantityParser.parse(number, Unit.DIMENSIONLESS);
        } catch (QuantityFormatException e) {
            throw at(key, e.problem(), hint);
        }
        if (!sign.admits(value)) {
            throw at(key, "must be " + sign.word() + ", got " + written, hint);
        }
        return value;
    }

    /** The raw node of a key (null when absent), for values with a shape of their own. */
    public JsonNode node(String key) {
        return node.get(key);
    }

    /**
     * One value of a list or other composite, parsed as a quantity but not sign-checked.
     *
     * @param itemKey the key path below this section used in messages, e.g. {@code lm[0]}
     */
    public double item(String itemKey, JsonNode value, Unit unit) {
        return scalarQuantity(itemKey, value, unit);
    }

    /** A nested mapping of this section as a section of its own, e.g. {@code feedback.parts}. */
    public SpecSection child(String key, List<String> childKeys) {
        return new SpecSection(source, childPath(key), node.get(key), childKeys);
    }

    /** The keys present, in file order. */
    public List<String> presentKeys() {
        List<String> keys = new ArrayList<>();
        node.fieldNames().forEachRemaining(keys::add);
        return keys;
    }

    /** Optional free text, one line; empty when absent. */
    public String text(String key) {
        JsonNode v = node.get(key);
        if (v == null || v.isNull()) {
            return "";
        }
        if (!v.isTextual()) {
            throw at(key, "expected text, got " + describe(v), "write one line of text, quoted if it holds ':' or '#'");
        }
        return v.asText().strip().replaceAll("\\s+", " ");
    }

    /** Refuses a key that does not apply in the present configuration. */
    public void refuse(String key, String why, String accepted) {
        if (node.has(key)) {
            throw at(key, why, accepted);
        }
    }

    /** An error located at a key of this section. */
    public InputException at(String key, String problem, String accepted) {
        return new InputException(source + ": " + childPath(key), problem, accepted);
    }

    private void rejectUnknownKeys() {
        Iterator<String> names = node.fieldNames();
        while (names.hasNext()) {
            String key = names.next();
            if (!knownKeys.contains(key)) {
                String all = path + " keys: " + String.join(", ", knownKeys);
                throw at(key, "unknown key", KeySuggester.closest(key, knownKeys)
                        .map(k -> "did you mean " + k + "? (" + all + ")").orElse(all));
            }
        }
    }

    private double scalarQuantity(String key, JsonNode v, Unit unit) {
        if (v.isNull()) {
            throw at(key, "no value", unit.hint(null));
        }
        if (!v.isTextual()) {
            throw at(key, "expected a single value, got " + describe(v), unit.hint(null));
        }
        return parse(key, v.asText(), unit);
    }

    private double parse(String key, String text, Unit unit) {
        try {
            return QuantityParser.parse(text, unit);
        } catch (QuantityFormatException e) {
            throw at(key, e.problem(), e.accepted());
        }
    }

    private double checkedSign(String key, double value, String written, Unit unit, Sign sign) {
        if (!sign.admits(value)) {
            throw at(key, "must be " + sign.word() + ", got " + written.strip(), unit.hint(null));
        }
        return value;
    }

    private InputException missing(String key, String accepted) {
        return at(key, "missing", accepted);
    }

    private String childPath(String key) {
        return path.isEmpty() ? key : path + "." + key;
    }

    private static String rangeExample(Unit unit) {
        return switch (unit) {
            case VOLT -> "[90, 230, 375]";
            case AMPERE -> "[0.1, 1, 2]";
            default -> "[1, 2]";
        };
    }

    /** A short name for what a node is, for "expected X, got Y" messages. */
    static String describe(JsonNode v) {
        if (v == null || v.isNull()) {
            return "nothing";
        }
        if (v.isObject()) {
            return "a mapping";
        }
        if (v.isArray()) {
            return "a list";
        }
        return "'" + v.asText() + "'";
    }

    /** Which signs a quantity may have. */
    public enum Sign {
        POSITIVE("positive"), ZERO_OR_POSITIVE("zero or positive");

        private final String word;

        Sign(String word) {
            this.word = word;
        }

        String word() {
            return word;
        }

        boolean admits(double v) {
            return switch (this) {
                case POSITIVE -> v > 0;
                case ZERO_OR_POSITIVE -> v >= 0;
            };
        }
    }
}
