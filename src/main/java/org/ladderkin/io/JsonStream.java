package org.ladderkin.io;

import com.fasterxml.jackson.core.JsonGenerator;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import java.io.IOException;
import java.io.Writer;

/**
 * A JSON document written as it is produced, for outputs too large to build as a tree first (a simulated sweep holds
 * tens of thousands of numbers). The text is byte for byte what {@link ResolvedJson#toText} gives for the same
 * content: same indentation, numbers as {@link Double#toString}.
 */
public final class JsonStream {

    private static final ObjectMapper MAPPER = new ObjectMapper()
            .enable(SerializationFeature.INDENT_OUTPUT)
            .enable(JsonGenerator.Feature.WRITE_BIGDECIMAL_AS_PLAIN);

    private JsonStream() {
    }

    /**
     * A pretty-printing generator over {@code out}; the caller writes one document and closes it, which flushes but
     * leaves {@code out} open.
     */
    public static JsonGenerator open(Writer out) throws IOException {
        JsonGenerator g = MAPPER.writer().createGenerator(out);
        g.disable(JsonGenerator.Feature.AUTO_CLOSE_TARGET);
        return g;
    }
}
