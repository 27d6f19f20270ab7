package dev.sheaf.samples;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.HashMap;
import java.util.Map;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.Test;

/**
 * The committed judgments.csv reaches its planted agreement bands, measured by a reference
 * library: NLTK's {@code AnnotationTask.alpha} (Debian python3-nltk through /usr/bin/python3),
 * nominal for present/absent and facet values, interval for grades. Skips when NLTK is absent,
 * unless SHEAF_REQUIRE_REFERENCES=1.
 */
class AgreementBandsTest {
    // alpha >= .800 reliable; .667-.800 tentative; below: contested -- Krippendorff 2004, Content Analysis 2nd ed. [mem]
    static final double RELIABLE = 0.800;
    static final double TENTATIVE = 0.667;

    @Test
    void clearAttributesAreReliableAndContestedOnesAreNot() throws Exception {
        Path judgments = DemoSetTest.COMMITTED.resolve("judgments.csv");
        Path planted = DemoSetTest.COMMITTED.resolve("planted.json");
        assertTrue(Files.isRegularFile(judgments) && Files.isRegularFile(planted), "the committed demo set is missing");
        Map<String, Double> alpha = nltkAlpha(judgments);
        JsonNode attrs = new ObjectMapper().readTree(planted.toFile()).get("judgments").get("attributes");
        assertEquals(attrs.size(), alpha.size(), "every attribute measured: " + alpha);
        for (JsonNode a : attrs) {
            String id = a.get("id").asText();
            double v = alpha.get(id);
            switch (a.get("agreement").asText()) {
                case "clear": assertTrue(v > RELIABLE + 0.05, id + " is planted clear, alpha " + v); break;
                case "tentative": assertTrue(v > TENTATIVE - 0.07 && v < RELIABLE + 0.05, id + " is planted tentative, alpha " + v); break;
                default: assertTrue(v < TENTATIVE - 0.2, id + " is planted contested, alpha " + v); break;
            }
        }
    }

    private static Map<String, Double> nltkAlpha(Path judgments) throws Exception {
        String python = System.getenv().getOrDefault("SHEAF_PYTHON", "/usr/bin/python3");
        boolean required = "1".equals(System.getenv("SHEAF_REQUIRE_REFERENCES"));
        Path script = Files.createTempFile("alpha", ".py");
        try (InputStream in = AgreementBandsTest.class.getResourceAsStream("/agreement/alpha.py")) {
            Files.write(script, in.readAllBytes());
        }
        Process p;
        try {
            p = new ProcessBuilder(python, script.toString(), judgments.toString()).redirectErrorStream(false).start();
        } catch (IOException e) {
            if (required) {
                fail("SHEAF_REQUIRE_REFERENCES=1 but " + python + " cannot run: " + e.getMessage());
            }
            Assumptions.abort("no " + python + ": " + e.getMessage());
            return Map.of();
        }
        String stdout = new String(p.getInputStream().readAllBytes(), StandardCharsets.UTF_8);
        String stderr = new String(p.getErrorStream().readAllBytes(), StandardCharsets.UTF_8);
        assertTrue(p.waitFor(120, TimeUnit.SECONDS));
        Files.deleteIfExists(script);
        if (p.exitValue() == 3) {
            if (required) {
                fail("SHEAF_REQUIRE_REFERENCES=1 but NLTK is not importable by " + python + ": " + stderr);
            }
            Assumptions.abort("NLTK not importable by " + python);
        }
        assertEquals(0, p.exitValue(), stderr);
        Map<String, Double> alpha = new HashMap<>();
        for (String line : stdout.split("\n")) {
            if (!line.isBlank()) {
                String[] f = line.split("\t");
                alpha.put(f[0], Double.parseDouble(f[1]));
            }
        }
        return alpha;
    }
}
