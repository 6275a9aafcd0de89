package org.ladderkin.io.json;

import com.fasterxml.jackson.core.JsonFactory;
import com.fasterxml.jackson.core.JsonLocation;
import com.fasterxml.jackson.core.JsonParser;
import com.fasterxml.jackson.core.JsonPointer;
import com.fasterxml.jackson.core.JsonToken;
import com.fasterxml.jackson.core.StreamReadFeature;
import com.fasterxml.jackson.core.exc.StreamReadException;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.IOException;
import java.nio.charset.CharacterCodingException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.util.HashMap;
import java.util.Map;
import org.ladderkin.io.InputException;
import org.ladderkin.io.InputProblem;
import org.ladderkin.io.SourceLocation;

/**
 * A JSON document read once with Jackson's streaming parser into an ordinary Jackson tree plus a table of where each
 * value started ({@link SourcePositions}, keyed by JSON Pointer). {@link Node} reads records from the pair by hand so
 * that every complaint (unknown field, wrong type, value out of range) can point at the exact place; Jackson's data
 * binding loses positions once a value is constructed. The desktop planner edits the Jackson tree itself and keeps
 * the positions of the values it has not touched. Strict: no comments, no duplicate keys, no trailing content, no NaN.
 *
 * @param json        the document
 * @param positions   where its values started in the text
 * @param displayName how messages name the document (usually the path the user typed)
 */
public record JsonTree(JsonNode json, SourcePositions positions, String displayName) {

    // the document's text stays out of Jackson's locations and messages: a message names the place, never echoes it
    private static final JsonFactory FACTORY = JsonFactory.builder()
            .disable(StreamReadFeature.INCLUDE_SOURCE_IN_LOCATION)
            .build();
    private static final JsonNodeFactory NODES = JsonNodeFactory.instance;

    public JsonTree {
        java.util.Objects.requireNonNull(json, "json");
        java.util.Objects.requireNonNull(positions, "positions");
        java.util.Objects.requireNonNull(displayName, "displayName");
    }

    /** The root as a located {@link Node}, ready for a codec. */
    public Node root() {
        return Node.of(json, positions, displayName);
    }

    /** Reads and parses a file; {@code displayName} is how messages name it (usually the path the user typed). */
    public static Node read(Path file, String displayName) {
        return load(file, displayName).root();
    }

    /** Parses JSON text; {@code displayName} names the source in messages. */
    public static Node parse(String text, String displayName) {
        return of(text, displayName).root();
    }

    /** Reads and parses a file into a tree with positions. */
    public static JsonTree load(Path file, String displayName) {
        String text;
        try {
            byte[] bytes = Files.readAllBytes(file);
            text = StandardCharsets.UTF_8.newDecoder().decode(java.nio.ByteBuffer.wrap(bytes)).toString();
        } catch (NoSuchFileException e) {
            throw new InputException(SourceLocation.of(displayName), null, InputProblem.NOT_FOUND, "file not found");
        } catch (CharacterCodingException e) {
            throw new InputException(SourceLocation.of(displayName), null, InputProblem.UNREADABLE,
                    "not UTF-8 text (save the file as UTF-8)");
        } catch (IOException e) {
            throw new InputException(SourceLocation.of(displayName), null, InputProblem.UNREADABLE,
                    "cannot read file: " + e.getMessage());
        }
        return of(text, displayName);
    }

    /** Parses JSON text into a tree with positions. */
    public static JsonTree of(String text, String displayName) {
        if (text.startsWith("\uFEFF")) {
            text = text.substring(1);
        }
        try (JsonParser p = FACTORY.createParser(text)) {
            JsonToken first = p.nextToken();
            if (first == null) {
                throw new InputException(new SourceLocation(displayName, 1, 1), null, InputProblem.EMPTY,
                        "empty file (expected a JSON object)");
            }
            Map<JsonPointer, SourcePositions.Entry> table = new HashMap<>();
            JsonNode root = readValue(p, displayName, JsonPointer.empty(), "", table);
            JsonToken extra = p.nextToken();
            if (extra != null) {
                throw new InputException(at(displayName, p.currentTokenLocation()), null, InputProblem.BAD_SYNTAX,
                        "unexpected content after the end of the document (only one JSON value is allowed)");
            }
            return new JsonTree(root, new SourcePositions(Map.copyOf(table)), displayName);
        } catch (StreamReadException e) {
            // no cause attached: Jackson's exception carries its processor and the document's text
            throw new InputException(at(displayName, e.getLocation()), null, InputProblem.BAD_SYNTAX,
                    "malformed JSON: " + JsonSyntax.describe(e.getOriginalMessage()));
        } catch (IOException e) {
            throw new InputException(SourceLocation.of(displayName), null, InputProblem.UNREADABLE,
                    "cannot read the JSON text");
        }
    }

    private static JsonNode readValue(JsonParser p, String file, JsonPointer pointer, String path,
                                      Map<JsonPointer, SourcePositions.Entry> table) throws IOException {
        JsonLocation start = p.currentTokenLocation();
        JsonToken t = p.currentToken();
        String literal = null;
        JsonNode value;
        switch (t) {
            case START_OBJECT -> {
                ObjectNode object = NODES.objectNode();
                while (p.nextToken() == JsonToken.FIELD_NAME) {
                    String name = p.currentName();
                    String fieldPath = path.isEmpty() ? name : path + "." + name;
                    if (object.has(name)) {
                        throw new InputException(at(file, p.currentTokenLocation()), fieldPath, InputProblem.DUPLICATE,
                                "given twice in the same object (each field may appear once)");
                    }
                    p.nextToken();
                    object.set(name, readValue(p, file, pointer.appendProperty(name), fieldPath, table));
                }
                value = object;
            }
            case START_ARRAY -> {
                ArrayNode array = NODES.arrayNode();
                int i = 0;
                while (p.nextToken() != JsonToken.END_ARRAY) {
                    array.add(readValue(p, file, pointer.appendIndex(i), path + "[" + i + "]", table));
                    i++;
                }
                value = array;
            }
            case VALUE_STRING -> value = NODES.textNode(p.getText());
            case VALUE_NUMBER_INT -> {
                literal = p.getText();
                // the node types Jackson's own readTree picks, so a saved document writes its numbers back unchanged
                value = switch (p.getNumberType()) {
                    case INT -> NODES.numberNode(p.getIntValue());
                    case LONG -> NODES.numberNode(p.getLongValue());
                    default -> NODES.numberNode(p.getBigIntegerValue());
                };
            }
            case VALUE_NUMBER_FLOAT -> {
                literal = p.getText();
                value = NODES.numberNode(p.getDoubleValue());
            }
            case VALUE_TRUE, VALUE_FALSE -> value = NODES.booleanNode(t == JsonToken.VALUE_TRUE);
            case VALUE_NULL -> value = NODES.nullNode();
            default -> throw new InputException(at(file, start), path, InputProblem.BAD_SYNTAX, "unexpected JSON token " + t);
        }
        if (start != null && start.getLineNr() >= 1) {
            table.put(pointer, new SourcePositions.Entry(start.getLineNr(), Math.max(start.getColumnNr(), 0), literal));
        }
        return value;
    }

    private static SourceLocation at(String file, JsonLocation l) {
        if (l == null || l.getLineNr() < 1) {
            return SourceLocation.of(file);
        }
        return new SourceLocation(file, l.getLineNr(), Math.max(l.getColumnNr(), 0));
    }
}
