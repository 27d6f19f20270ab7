package dev.sheaf.miner.measure;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;

/**
 * Checks the morphology against WordNet's own exception list, in two copies nobody here wrote:
 * Debian's (package wordnet-base) and the one in the extjwnl data artifact.
 * Princeton University, "WordNet", 2010 [pub].
 */
class ComparativeWordNetReferenceTest {

    private static final Path DEBIAN_ADJ_EXC = Path.of("/usr/share/wordnet/adj.exc");

    @Test
    void mapsEveryFormInDebiansAdjExcToEachOfItsListedBases() throws IOException {
        boolean required = "1".equals(System.getenv("SHEAF_REQUIRE_REFERENCES"));
        if (!Files.isReadable(DEBIAN_ADJ_EXC)) {
            if (required) {
                fail("SHEAF_REQUIRE_REFERENCES=1 but " + DEBIAN_ADJ_EXC + " is missing; install it with "
                        + "'apt-get install -y wordnet-base'");
            }
            assumeTrue(false, DEBIAN_ADJ_EXC + " absent (apt-get install -y wordnet-base)");
        }
        Map<String, List<String>> debian = parse(Files.readAllLines(DEBIAN_ADJ_EXC, StandardCharsets.US_ASCII));
        assertTrue(debian.size() > 1400, "expected WordNet's ~1490 adjective exceptions, read " + debian.size());
        assertEveryEntryMaps(debian);
    }

    @Test
    void mapsEveryFormInTheArtifactsAdjExcToEachOfItsListedBases() throws IOException {
        Map<String, List<String>> artifact = ComparativeLexicon.readExceptions("adj.exc");
        assertTrue(artifact.size() > 1400, "expected WordNet's ~1490 adjective exceptions, read " + artifact.size());
        assertEveryEntryMaps(artifact);
    }

    @Test
    void readsASampleOfRegularFormsToTheirWordNetAdjectives() {
        // Regular English comparison [practice]; each base is a WordNet adjective (Princeton
        // University, "WordNet", 2010 [pub]) and none of the forms is in adj.exc.
        String[][] sample = {
                {"lighter", "light"}, {"lightest", "light"}, {"warmer", "warm"}, {"warmest", "warm"},
                {"softer", "soft"}, {"thicker", "thick"}, {"cheaper", "cheap"}, {"cheapest", "cheap"},
                {"longer", "long"}, {"shorter", "short"}, {"smaller", "small"}, {"taller", "tall"},
                {"tighter", "tight"}, {"looser", "loose"}, {"wider", "wide"}, {"widest", "wide"},
                {"simpler", "simple"}, {"quieter", "quiet"}, {"stiffer", "stiff"}, {"deeper", "deep"},
                {"harder", "hard"}, {"cleaner", "clean"}, {"finer", "fine"}, {"safer", "safe"},
                {"boxier", "boxy"}, {"squishier", "squishy"}, {"fewer", "few"}, {"older", "old"}};
        List<String> wrong = new ArrayList<>();
        for (String[] s : sample) {
            DegreeReading r = ComparativeMorphology.wordNet().best(s[0]);
            Degree expected = s[0].endsWith("est") ? Degree.SUPERLATIVE : Degree.COMPARATIVE;
            if (!r.base().equals(s[1]) || r.degree() != expected || r.source() != DegreeReading.Source.RULE) {
                wrong.add(s[0] + " -> " + r);
            }
        }
        assertEquals(List.of(), wrong);
    }

    private static void assertEveryEntryMaps(Map<String, List<String>> exceptions) {
        List<String> wrong = new ArrayList<>();
        exceptions.forEach((form, bases) -> {
            List<DegreeReading> readings = ComparativeMorphology.wordNet().readings(form);
            for (String base : bases) {
                Degree expected = base.equals(form) ? Degree.POSITIVE
                        : form.endsWith("st") ? Degree.SUPERLATIVE
                        : form.endsWith("er") || form.equals("worse") ? Degree.COMPARATIVE : Degree.POSITIVE;
                boolean found = readings.stream().anyMatch(r -> r.base().equals(base) && r.degree() == expected);
                if (!found) {
                    wrong.add(form + " -> " + base + " " + expected + ", got " + readings);
                }
            }
            if (bases.contains(form) && readings.get(0).inflected()) {
                wrong.add(form + " is listed as its own base but reads first as " + readings.get(0));
            }
        });
        assertEquals(List.of(), wrong, () -> wrong.size() + " of " + exceptions.size() + " forms differ");
    }

    private static Map<String, List<String>> parse(List<String> lines) {
        Map<String, List<String>> out = new LinkedHashMap<>();
        for (String line : lines) {
            String[] f = line.strip().split(" +");
            if (f.length >= 2) {
                List<String> bases = out.computeIfAbsent(f[0], k -> new ArrayList<>());
                for (int i = 1; i < f.length; i++) {
                    bases.add(f[i]);
                }
            }
        }
        return out;
    }
}
