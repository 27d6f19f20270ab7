package dev.sheaf.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.fail;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import dev.sheaf.miner.measure.SurfaceForms;
import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Random;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Surface-form entropy against Debian's python3-nltk ({@code nltk.probability.entropy} of the
 * maximum-likelihood distribution, i.e. −Σ p log2 p), run through /usr/bin/python3 on 300 random
 * count sets. Skips when NLTK is absent, unless SHEAF_REQUIRE_REFERENCES=1, where it fails.
 */
class ConsistencyReferenceCheckTest {
    private static final int SETS = 300;
    private static final double TOLERANCE = 1e-12;

    @TempDir
    Path tmp;

    @Test
    void surfaceFormEntropyMatchesNltk() throws IOException, InterruptedException {
        Random r = new Random(1_2024L);
        List<Map<String, Integer>> sets = new ArrayList<>();
        ObjectNode in = new ObjectMapper().createObjectNode();
        ArrayNode list = in.putArray("sets");
        for (int i = 0; i < SETS; i++) {
            Map<String, Integer> counts = new LinkedHashMap<>();
            int forms = 1 + r.nextInt(12);
            for (int f = 0; f < forms; f++) {
                counts.put("form" + f, 1 + r.nextInt(r.nextBoolean() ? 5 : 500));
            }
            sets.add(counts);
            ObjectNode o = list.addObject();
            counts.forEach(o::put);
        }
        JsonNode ref = reference(in);
        JsonNode entropies = ref.get("entropies");
        assertEquals(SETS, entropies.size());
        for (int i = 0; i < SETS; i++) {
            double ours = SurfaceForms.of(sets.get(i)).entropyBits();
            double theirs = entropies.get(i).asDouble();
            assertEquals(theirs, ours, TOLERANCE * Math.max(1, Math.abs(theirs)), "set " + i + ": " + sets.get(i));
        }
    }

    private JsonNode reference(ObjectNode input) throws IOException, InterruptedException {
        String python = System.getenv().getOrDefault("SHEAF_PYTHON", "/usr/bin/python3");
        if (!Files.isExecutable(Path.of(python))) {
            skipOrFail(python + " is not there");
        }
        Path script = tmp.resolve("reference_entropy.py");
        try (InputStream s = getClass().getResourceAsStream("/consistency/reference_entropy.py")) {
            Files.copy(s, script, StandardCopyOption.REPLACE_EXISTING);
        }
        Path in = tmp.resolve("in.json");
        Path out = tmp.resolve("out.json");
        Files.writeString(in, new ObjectMapper().writeValueAsString(input), StandardCharsets.UTF_8);
        Process p = new ProcessBuilder(python, script.toString(), in.toString(), out.toString())
                .redirectErrorStream(true).redirectOutput(tmp.resolve("python.log").toFile()).start();
        if (!p.waitFor(5, TimeUnit.MINUTES)) {
            p.destroyForcibly();
            fail("the reference script did not finish in 5 minutes");
        }
        if (p.exitValue() == 3) {
            skipOrFail("python3-nltk is missing for " + python + " (apt-get install -y python3-nltk)");
        }
        assertEquals(0, p.exitValue(), "the reference script failed:\n" + Files.readString(tmp.resolve("python.log")));
        return new ObjectMapper().readTree(out.toFile());
    }

    private static void skipOrFail(String why) {
        if ("1".equals(System.getenv("SHEAF_REQUIRE_REFERENCES"))) {
            fail("SHEAF_REQUIRE_REFERENCES=1 but " + why);
        }
        Assumptions.abort(why);
    }
}
