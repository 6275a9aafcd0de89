package org.ladderkin.io;

import com.fasterxml.jackson.core.JsonGenerator;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.IOException;
import java.nio.file.Path;

/**
 * Writes JSON documents that ladderkin produces (resolved plans, results). Keys carry their unit
 * ({@code pulseEnergyNj}, {@code tauAuger2Ps}); numbers keep full double precision.
 */
public final class ResolvedJson {

    private static final ObjectMapper MAPPER = new ObjectMapper()
            .enable(SerializationFeature.INDENT_OUTPUT)
            .enable(JsonGenerator.Feature.WRITE_BIGDECIMAL_AS_PLAIN);

    private ResolvedJson() {
    }

    /** A new empty object, to be filled and written. */
    public static ObjectNode object() {
        return JsonNodeFactory.instance.objectNode();
    }

    /** A new empty array. */
    public static ArrayNode array() {
        return JsonNodeFactory.instance.arrayNode();
    }

    /** Pretty JSON text with a final newline. */
    public static String toText(ObjectNode node) {
        try {
            return MAPPER.writeValueAsString(node) + System.lineSeparator();
        } catch (IOException e) {
            throw new IllegalStateException("cannot serialise JSON", e);
        }
    }

    /** Writes {@code node} to {@code file} atomically. */
    public static void write(Path file, ObjectNode node) throws IOException {
        AtomicFiles.writeString(file, toText(node));
    }
}
