package org.flyloop.cli.spec;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.core.JsonToken;
import com.fasterxml.jackson.core.StreamReadFeature;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import com.fasterxml.jackson.databind.node.ObjectNode;
import com.fasterxml.jackson.dataformat.yaml.YAMLFactory;
import com.fasterxml.jackson.dataformat.yaml.YAMLParser;
import java.io.IOException;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * Reads a YAML spec document into a plain {@link JsonNode} tree of mappings, lists and text.
 *
 * <p>Safety: the document goes through Jackson's streaming YAML parser only, which reports
 * events and never constructs Java objects named in the document; no data binding is involved.
 * On top of that the reader refuses, with a one-line {@link InputException}:
 * <ul>
 *   <li>explicit tags ({@code !!javax.script.ScriptEngineManager ...}, {@code !!str}, {@code !x}):
 *       a spec has no use for them, so a tagged document is treated as hostile or mistaken;</li>
 *   <li>anchors and aliases ({@code &a}, {@code *a}), which a spec does not need and which
 *       enable exponential "billion laughs" expansion;</li>
 *   <li>duplicate keys at any level (strict detection: YAML would otherwise keep the last);</li>
 *   <li>a second document ({@code ---}), an empty document, and a top level that is not a
 *       mapping.</li>
 * </ul>
 *
 * <p>Every scalar becomes a text node holding its source text (so {@code 010} stays "010" and is
 * not read as YAML 1.1 octal, and {@code yes} stays "yes"); a YAML null ({@code ~}, {@code null})
 * becomes a null node. Interpreting the text is the job of the spec reader.
 */
public final class SafeYamlReader {

    private static final YAMLFactory FACTORY = YAMLFactory.builder()
            .enable(StreamReadFeature.STRICT_DUPLICATE_DETECTION)
            .build();
    private static final Pattern DUPLICATE = Pattern.compile("Duplicate (?:field|key) '([^']*)'");
    private static final JsonNodeFactory NODES = JsonNodeFactory.instance;

    private SafeYamlReader() {
    }

    /**
     * Parses {@code text} and returns its top-level mapping.
     *
     * @param source the file name used in messages
     * @throws InputException when the text is not YAML, is empty, is not a mapping, or uses a
     *                        refused feature (see class comment)
     */
    public static ObjectNode readMapping(String text, String source) {
        Builder b = new Builder(source);
        try (YAMLParser p = FACTORY.createParser(text)) {
            b.parser = p;
            JsonToken first = p.nextToken();
            if (first == null) {
                throw new InputException(source, "the file is empty",
                        "write a YAML mapping with sections stage: and control:");
            }
            if (first != JsonToken.START_OBJECT) {
                b.checkScalarOrOpen("");
                throw new InputException(source, "the top level is not a mapping of keys",
                        "write key: value lines, starting with stage: and control:");
            }
            ObjectNode root = b.readObject("");
            if (p.nextToken() != null) {
                throw new InputException(source, "more than one YAML document (---)",
                        "keep one spec per file");
            }
            return root;
        } catch (JsonProcessingException e) {
            throw b.translate(e);
        } catch (IOException e) {
            throw new InputException(source, "cannot read: " + e.getMessage(), null);
        }
    }

    /** One pass over the token stream, remembering where it is for messages. */
    private static final class Builder {
        private final String source;
        private YAMLParser parser;
        private String currentObjectPath = "";

        Builder(String source) {
            this.source = source;
        }

        ObjectNode readObject(String path) throws IOException {
            checkScalarOrOpen(path);
            ObjectNode node = NODES.objectNode();
            while (true) {
                currentObjectPath = path;
                JsonToken t = parser.nextToken();
                if (t == JsonToken.END_OBJECT) {
                    return node;
                }
                String key = parser.currentName();
                String childPath = path.isEmpty() ? key : path + "." + key;
                if (node.has(key)) {
                    throw duplicate(childPath);
                }
                parser.nextToken();
                node.set(key, readValue(childPath));
            }
        }

        private JsonNode readValue(String path) throws IOException {
            JsonToken t = parser.currentToken();
            if (t == JsonToken.START_OBJECT) {
                return readObject(path);
            }
            if (t == JsonToken.START_ARRAY) {
                checkScalarOrOpen(path);
                ArrayNode list = NODES.arrayNode();
                int i = 0;
                while (parser.nextToken() != JsonToken.END_ARRAY) {
                    list.add(readValue(path + "[" + i++ + "]"));
                }
                return list;
            }
            checkScalarOrOpen(path);
            return t == JsonToken.VALUE_NULL ? NODES.nullNode() : NODES.textNode(parser.getText());
        }

        /** Refuses tags, anchors and aliases on the current event. */
        void checkScalarOrOpen(String path) throws IOException {
            String where = path.isEmpty() ? source : source + ": " + path;
            if (parser.isCurrentAlias()) {
                throw new InputException(where, "YAML aliases (*" + parser.getText() + ") are not accepted",
                        "write the value out in full");
            }
            if (parser.getObjectId() != null) {
                throw new InputException(where, "YAML anchors (&" + parser.getObjectId() + ") are not accepted",
                        "write the value out in full");
            }
            String tag = parser.getTypeId();
            if (tag != null) {
                throw new InputException(where, "YAML tags (" + shortTag(tag) + ") are not accepted",
                        "write plain values without !! or !");
            }
        }

        private InputException duplicate(String path) {
            return new InputException(source + ": " + path, "duplicate key",
                    "write each key once (YAML would silently keep only the last)");
        }

        InputException translate(JsonProcessingException e) {
            String original = e.getOriginalMessage() == null ? "" : e.getOriginalMessage();
            Matcher dup = DUPLICATE.matcher(original);
            if (dup.find()) {
                String key = dup.group(1);
                return duplicate(currentObjectPath.isEmpty() ? key : currentObjectPath + "." + key);
            }
            String where = source;
            if (e.getLocation() != null && e.getLocation().getLineNr() > 0) {
                where += ": line " + e.getLocation().getLineNr();
            }
            return new InputException(where, "not valid YAML: " + lastProblemLine(original),
                    "write key: value lines, lists as [a, b], quote text containing ':' or '#'");
        }

        /** SnakeYAML puts the problem on the last unindented line of a multi-line message. */
        private static String lastProblemLine(String message) {
            String problem = "unreadable";
            for (String line : message.split("\\R")) {
                if (!line.isBlank() && !Character.isWhitespace(line.charAt(0))) {
                    problem = line.strip();
                }
            }
            return problem;
        }

        private static String shortTag(String tag) {
            String prefix = "tag:yaml.org,2002:";
            String shown = tag.startsWith(prefix) ? "!!" + tag.substring(prefix.length()) : tag;
            return shown.length() > 60 ? shown.substring(0, 57) + "..." : shown;
        }
    }
}
