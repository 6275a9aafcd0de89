package org.ladderkin.io.json;

import com.fasterxml.jackson.core.JsonFactory;
import com.fasterxml.jackson.core.JsonLocation;
import com.fasterxml.jackson.core.JsonParseException;
import com.fasterxml.jackson.core.JsonParser;
import com.fasterxml.jackson.core.JsonToken;
import com.fasterxml.jackson.core.StreamReadFeature;
import com.fasterxml.jackson.core.exc.StreamReadException;
import java.io.IOException;
import java.nio.charset.CharacterCodingException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.ladderkin.io.InputException;
import org.ladderkin.io.SourceLocation;

/**
 * Reads a JSON document with Jackson's streaming parser into a tree of {@link Node}s that remember their line and
 * column. Binding to records is done by hand on that tree so that every complaint (unknown field, wrong type, value
 * out of range) can point at the exact place; Jackson's data binding loses positions once a value is constructed.
 * Strict: no comments, no duplicate keys, no trailing content, no NaN.
 */
public final class JsonTree {

    private static final JsonFactory FACTORY = JsonFactory.builder()
            .enable(StreamReadFeature.INCLUDE_SOURCE_IN_LOCATION)
            .build();

    private JsonTree() {
    }

    /** Reads and parses a file; {@code displayName} is how messages name it (usually the path the user typed). */
    public static Node read(Path file, String displayName) {
        String text;
        try {
            byte[] bytes = Files.readAllBytes(file);
            text = StandardCharsets.UTF_8.newDecoder().decode(java.nio.ByteBuffer.wrap(bytes)).toString();
        } catch (NoSuchFileException e) {
            throw new InputException(SourceLocation.of(displayName), null, "file not found");
        } catch (CharacterCodingException e) {
            throw new InputException(SourceLocation.of(displayName), null, "not UTF-8 text (save the file as UTF-8)");
        } catch (IOException e) {
            throw new InputException(SourceLocation.of(displayName), null, "cannot read file: " + e.getMessage());
        }
        return parse(text, displayName);
    }

    /** Parses JSON text; {@code displayName} names the source in messages. */
    public static Node parse(String text, String displayName) {
        if (text.startsWith("\uFEFF")) {
            text = text.substring(1);
        }
        try (JsonParser p = FACTORY.createParser(text)) {
            JsonToken first = p.nextToken();
            if (first == null) {
                throw new InputException(new SourceLocation(displayName, 1, 1), null, "empty file (expected a JSON object)");
            }
            Node root = readValue(p, displayName, "");
            JsonToken extra = p.nextToken();
            if (extra != null) {
                throw new InputException(at(displayName, p.currentTokenLocation()), null,
                        "unexpected content after the end of the document (only one JSON value is allowed)");
            }
            return root;
        } catch (JsonParseException e) {
            throw new InputException(at(displayName, e.getLocation()), null, "malformed JSON: " + e.getOriginalMessage());
        } catch (StreamReadException e) {
            throw new InputException(at(displayName, e.getLocation()), null, "malformed JSON: " + e.getOriginalMessage());
        } catch (IOException e) {
            throw new InputException(SourceLocation.of(displayName), null, "cannot read JSON: " + e.getMessage());
        }
    }

    private static Node readValue(JsonParser p, String file, String path) throws IOException {
        SourceLocation loc = at(file, p.currentTokenLocation());
        JsonToken t = p.currentToken();
        switch (t) {
            case START_OBJECT -> {
                Map<String, Node> fields = new LinkedHashMap<>();
                while (p.nextToken() == JsonToken.FIELD_NAME) {
                    String name = p.currentName();
                    String fieldPath = path.isEmpty() ? name : path + "." + name;
                    if (fields.containsKey(name)) {
                        throw new InputException(at(file, p.currentTokenLocation()), fieldPath,
                                "given twice in the same object (each field may appear once)");
                    }
                    p.nextToken();
                    fields.put(name, readValue(p, file, fieldPath));
                }
                return Node.object(loc, path, fields);
            }
            case START_ARRAY -> {
                List<Node> items = new ArrayList<>();
                int i = 0;
                while (p.nextToken() != JsonToken.END_ARRAY) {
                    items.add(readValue(p, file, path + "[" + i++ + "]"));
                }
                return Node.array(loc, path, items);
            }
            case VALUE_STRING -> {
                return Node.scalar(Node.Kind.STRING, loc, path, p.getText(), 0, false);
            }
            case VALUE_NUMBER_INT, VALUE_NUMBER_FLOAT -> {
                return Node.scalar(Node.Kind.NUMBER, loc, path, p.getText(), p.getDoubleValue(), false);
            }
            case VALUE_TRUE, VALUE_FALSE -> {
                return Node.scalar(Node.Kind.BOOLEAN, loc, path, p.getText(), 0, t == JsonToken.VALUE_TRUE);
            }
            case VALUE_NULL -> {
                return Node.scalar(Node.Kind.NULL, loc, path, "null", 0, false);
            }
            default -> throw new InputException(loc, path, "unexpected JSON token " + t);
        }
    }

    private static SourceLocation at(String file, JsonLocation l) {
        if (l == null || l.getLineNr() < 1) {
            return SourceLocation.of(file);
        }
        return new SourceLocation(file, l.getLineNr(), Math.max(l.getColumnNr(), 0));
    }
}
