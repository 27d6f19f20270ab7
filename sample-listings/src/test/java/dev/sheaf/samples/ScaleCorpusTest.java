package dev.sheaf.samples;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.stream.Collectors;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class ScaleCorpusTest {
    private static final ScaleCorpus.Progress QUIET = (n, b) -> { };
    private static final java.util.regex.Pattern NON_LETTERS = java.util.regex.Pattern.compile("[^\\p{L}]+");

    @TempDir
    Path tmp;

    @Test
    void sameSeedGivesTheSameBytesAndASmallerCorpusIsAPrefix() throws IOException {
        Path a = tmp.resolve("a.jsonl");
        Path b = tmp.resolve("b.jsonl");
        Path small = tmp.resolve("small.jsonl");
        ScaleCorpus.jsonl(3000, 42, a, QUIET);
        ScaleCorpus.jsonl(3000, 42, b, QUIET);
        ScaleCorpus.jsonl(1234, 42, small, QUIET);
        byte[] big = Files.readAllBytes(a);
        assertArrayEquals(big, Files.readAllBytes(b));
        byte[] prefix = Files.readAllBytes(small);
        assertArrayEquals(prefix, Arrays.copyOf(big, prefix.length));
        assertEquals('\n', big[prefix.length - 1]);
    }

    @Test
    void theNumberOfThreadsDoesNotChangeTheBytes() throws IOException {
        Path one = tmp.resolve("one.jsonl");
        Path three = tmp.resolve("three.jsonl");
        ScaleCorpus.jsonl(2100, 9, one, QUIET, 1);
        ScaleCorpus.jsonl(2100, 9, three, QUIET, 3);
        assertArrayEquals(Files.readAllBytes(one), Files.readAllBytes(three));
    }

    @Test
    void anotherSeedGivesAnotherCorpus() throws IOException {
        Path a = tmp.resolve("a.jsonl");
        Path b = tmp.resolve("b.jsonl");
        ScaleCorpus.jsonl(200, 42, a, QUIET);
        ScaleCorpus.jsonl(200, 43, b, QUIET);
        assertFalse(Arrays.equals(Files.readAllBytes(a), Files.readAllBytes(b)));
    }

    @Test
    void jsonlLinesFollowTheContractAtAbout430BytesEach() throws IOException {
        Path f = tmp.resolve("c.jsonl");
        long bytes = ScaleCorpus.jsonl(8_000, 42, f, QUIET);
        assertEquals(Files.size(f), bytes);
        double perListing = bytes / 8_000.0;
        assertTrue(perListing > 360 && perListing < 500, "bytes per listing: " + perListing);
        ObjectMapper m = new ObjectMapper();
        List<String> lines = Files.readAllLines(f, StandardCharsets.UTF_8);
        assertEquals(8_000, lines.size());
        Set<String> titles = new HashSet<>();
        Set<String> categories = new HashSet<>();
        Map<String, Integer> words = new HashMap<>();
        int typos = 0;
        List<java.util.regex.Pattern> typoForms = Typos.ALL.stream().map(t -> CatalogText.word(t.wrong())).collect(Collectors.toList());
        for (int i = 0; i < lines.size(); i++) {
            JsonNode n = m.readTree(lines.get(i));
            assertEquals(ProductFactory.id(i + 1), n.get("id").asText());
            titles.add(n.get("title").asText());
            categories.add(n.get("category").asText());
            String body = n.get("title").asText() + " " + n.get("description").asText();
            for (String w : NON_LETTERS.split(body.toLowerCase(java.util.Locale.ROOT))) {
                if (!w.isEmpty()) {
                    words.merge(w, 1, Integer::sum);
                }
            }
            String lower = lines.get(i).toLowerCase(java.util.Locale.ROOT);
            for (int k = 0; k < Typos.ALL.size(); k++) {
                // cheap prefilter before the whole-word check
                if (lower.contains(Typos.ALL.get(k).wrong()) && typoForms.get(k).matcher(lines.get(i)).find()) {
                    typos++;
                }
            }
        }
        assertEquals(Category.values().length, categories.size());
        assertTrue(titles.size() > 7_000, "thousands of distinct product names: " + titles.size());
        long rare = words.values().stream().filter(c -> c == 1).count();
        assertTrue(words.size() > 3_000 && rare > 1_000, "a long tail of rare words: " + words.size() + " distinct, " + rare + " seen once");
        assertTrue(typos > 40 && typos < 130, "about 1% of listings carry a misspelling: " + typos);
    }

    @Test
    void folderCorpusHoldsMostlyHtmlInSubFoldersOfAtMost1000Files() throws IOException {
        Path dir = tmp.resolve("corpus");
        ScaleCorpus.folder(1100, 42, dir, QUIET);
        Map<String, Long> perFolder;
        List<Path> files;
        try (Stream<Path> s = Files.walk(dir)) {
            files = s.filter(Files::isRegularFile).collect(Collectors.toList());
        }
        assertEquals(1100, files.size());
        perFolder = files.stream().collect(Collectors.groupingBy(p -> p.getParent().getFileName().toString(), Collectors.counting()));
        assertEquals(Set.of("0000", "0001"), perFolder.keySet());
        perFolder.values().forEach(c -> assertTrue(c <= ScaleCorpus.FILES_PER_FOLDER));
        Map<String, Long> kinds = files.stream().collect(Collectors.groupingBy(p -> p.toString().substring(p.toString().lastIndexOf('.') + 1), Collectors.counting()));
        assertTrue(kinds.get("html") > 900, kinds.toString());
        assertTrue(kinds.keySet().containsAll(Set.of("txt", "md", "pdf", "docx")), kinds.toString());
        Path pdf = files.stream().filter(p -> p.toString().endsWith(".pdf")).findFirst().orElseThrow();
        assertTrue(CatalogText.textOf(pdf).contains("Specifications"));
    }
}
