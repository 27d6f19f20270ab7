package dev.sheaf.samples;

import com.fasterxml.jackson.core.util.DefaultIndenter;
import com.fasterxml.jackson.core.util.DefaultPrettyPrinter;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.nio.charset.StandardCharsets;

/** Pretty JSON with "\n" line ends on every platform (Jackson's default indenter uses the system separator). */
final class Json {
    private Json() {
    }

    private static final ObjectMapper MAPPER = new ObjectMapper();

    static byte[] pretty(JsonNode node) throws IOException {
        DefaultIndenter indent = new DefaultIndenter("  ", "\n");
        DefaultPrettyPrinter printer = new DefaultPrettyPrinter().withObjectIndenter(indent).withArrayIndenter(indent);
        String s = MAPPER.writer(printer).writeValueAsString(node) + "\n";
        return s.getBytes(StandardCharsets.UTF_8);
    }
}
