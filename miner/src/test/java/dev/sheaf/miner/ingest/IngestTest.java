package dev.sheaf.miner.ingest;

import static dev.sheaf.miner.ingest.Fixtures.fixture;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.concurrent.ConcurrentHashMap;
import java.util.concurrent.CopyOnWriteArrayList;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.concurrent.atomic.AtomicLong;
import java.util.stream.Collectors;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The front door: walking, globs, one read per file, parallel sinks, limits and the problem log. */
class IngestTest {

    @Test
    void walksTheFixtureTreeAndReadsEveryKindOfFile() {
        Fixtures.Result r = Fixtures.read(Ingest.builder().source(new SourceSpec(fixture(""), List.of("**/*"), List.of("**/README*"), null))
                .workspaceRoot(fixture("")));
        Set<String> sources = r.listings().stream().map(Listing::source).collect(Collectors.toSet());
        assertTrue(sources.containsAll(Set.of("html/ridgeline-2p-tent.html", "csv/catalog-export.csv", "json/products.json",
                "jsonl/feed.jsonl", "text/trail-mug.txt", "markdown/daypack.md", "rtf/wool-socks.rtf", "encoding/latin1.csv")), sources.toString());
        assertEquals(14, r.summary().filesSeen(), "every fixture but the README");
        assertEquals(14, r.summary().filesRead());
        assertEquals(r.listings().size(), r.summary().listings());
        assertTrue(r.summary().bytesRead() > 3000, "bytes counted: " + r.summary().bytesRead());
        assertEquals(List.of("csv/catalog-export.csv", "jsonl/feed.jsonl", "tsv/stoves.tsv"),
                r.problems().stream().map(Problem::source).distinct().sorted().collect(Collectors.toList()),
                "only the planted problems: " + r.problems());
    }

    @Test
    void includeAndExcludeGlobsAreRelativeToTheSourceFolder() {
        Fixtures.Result r = Fixtures.read(Ingest.builder()
                .source(new SourceSpec(fixture(""), List.of("**/*.html", "*.txt", "text/*"), List.of("html/sideways*"), null))
                .workspaceRoot(fixture("")));
        assertEquals(Set.of("html/ridgeline-2p-tent.html", "text/trail-mug.txt"),
                r.listings().stream().map(Listing::source).collect(Collectors.toSet()),
                "*.txt matches only the top level, where there is no text file");
    }

    @Test
    void aFileNamedByTwoSourcesIsReadOnceWithTheMostSpecificMapping() {
        Path csv = fixture("csv/catalog-export.csv");
        ColumnMapping m = new ColumnMapping("sku", "name", null, null, List.of(), List.of("Colour"), List.of());
        Fixtures.Result r = Fixtures.read(Ingest.builder().source(SourceSpec.of(fixture("csv")))
                .source(SourceSpec.of(csv).withMapping(m)).source(SourceSpec.of(fixture("csv"))));
        assertEquals(3, r.listings().size(), "one read: " + r.ids());
        assertEquals(1, r.summary().filesSeen());
        assertEquals(List.of("Colour"), Fixtures.specKeys(r.byId("FH-B-001")), "the file's own source and mapping win");
    }

    @Test
    void sinkIsCalledFromSeveralThreadsButEachFileInOrderFromOneThread(@TempDir Path dir) throws IOException {
        for (int f = 0; f < 24; f++) {
            StringBuilder b = new StringBuilder("id,title\n");
            for (int row = 0; row < 20; row++) {
                b.append("F").append(f).append("-").append(row).append(",Item ").append(row).append('\n');
            }
            Files.writeString(dir.resolve("part-" + f + ".csv"), b, StandardCharsets.UTF_8);
        }
        AtomicInteger inSink = new AtomicInteger();
        AtomicInteger maxInSink = new AtomicInteger();
        Map<String, List<Integer>> rowsByFile = new ConcurrentHashMap<>();
        Map<String, Set<String>> threadsByFile = new ConcurrentHashMap<>();
        IngestSummary s = Ingest.builder().source(SourceSpec.of(dir)).threads(4).build().run(l -> {
            int now = inSink.incrementAndGet();
            maxInSink.accumulateAndGet(now, Math::max);
            try {
                Thread.sleep(1);
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
            }
            rowsByFile.computeIfAbsent(l.source(), k -> new CopyOnWriteArrayList<>()).add(Integer.parseInt(l.locator().substring(4)));
            threadsByFile.computeIfAbsent(l.source(), k -> ConcurrentHashMap.newKeySet()).add(Thread.currentThread().getName());
            inSink.decrementAndGet();
        });
        assertEquals(480, s.listings());
        assertTrue(maxInSink.get() > 1, "the sink was never entered by two threads at once");
        for (Map.Entry<String, List<Integer>> e : rowsByFile.entrySet()) {
            List<Integer> sorted = new ArrayList<>(e.getValue());
            sorted.sort(null);
            assertEquals(sorted, e.getValue(), "rows of " + e.getKey() + " in file order");
            assertEquals(1, threadsByFile.get(e.getKey()).size(), "one thread per file");
        }
    }

    @Test
    void aSinkFailureStopsTheRunAndIsRethrown() {
        IllegalStateException boom = new IllegalStateException("disk full");
        IllegalStateException thrown = assertThrows(IllegalStateException.class,
                () -> Ingest.builder().source(SourceSpec.of(fixture("csv"))).build().run(l -> {
                    throw boom;
                }));
        assertSame(boom, thrown);
    }

    @Test
    void aParseOverTheTimeLimitBecomesATimeoutProblem(@TempDir Path dir) throws IOException {
        Path pdf = Fixtures.write(dir, "slow.pdf", Fixtures.pdf(List.of("Slow Sheet", "Weight: 1 kg"), null));
        Fixtures.Result r = Fixtures.read(Ingest.builder().source(SourceSpec.of(pdf)).perFileTimeout(Duration.ofNanos(1)));
        assertTrue(r.listings().isEmpty());
        assertEquals(List.of("timeout"), r.problemKinds());
    }

    @Test
    void anEncryptedPdfIsAnEncryptedProblem(@TempDir Path dir) throws IOException {
        Path pdf = Fixtures.write(dir, "locked.pdf", Fixtures.pdf(List.of("Locked Sheet", "Weight: 1 kg"), "secret"));
        Fixtures.Result r = Fixtures.read(pdf);
        assertTrue(r.listings().isEmpty());
        assertEquals(List.of("encrypted"), r.problemKinds());
    }

    @Test
    void extractedTextBeyondTheWriteLimitIsTruncatedAndReported(@TempDir Path dir) throws IOException {
        Path pdf = Fixtures.write(dir, "long.pdf", Fixtures.pdf(List.of("Long Sheet", "Weight: 1 kg", "Colour: moss green"), null));
        Fixtures.Result r = Fixtures.read(Ingest.builder().source(SourceSpec.of(pdf)).maxTextChars(20));
        assertEquals(List.of("too-large"), r.problemKinds());
        assertEquals("Long Sheet", r.only().title(), "what was read is kept");
    }

    @Test
    void binaryJunkNamedHtmlAmongGoodPagesIsReportedAndTheGoodPagesAreRead(@TempDir Path dir) throws IOException {
        Files.copy(fixture("html/ridgeline-2p-tent.html"), dir.resolve("good.html"));
        byte[] junk = new byte[2000];
        for (int i = 0; i < junk.length; i++) {
            junk[i] = (byte) (i % 7 == 0 ? 0 : 'A' + i % 26);
        }
        Files.write(dir.resolve("junk.html"), junk);
        Fixtures.Result r = Fixtures.read(Ingest.builder().source(SourceSpec.of(dir)).workspaceRoot(dir));
        assertEquals(List.of("FH-T-0042"), r.ids());
        assertEquals(List.of(new Problem("junk.html", "", "corrupt", r.problems().get(0).reason())), r.problems());
        assertTrue(r.problems().get(0).reason().contains("binary"), r.problems().get(0).reason());
    }

    @Test
    void aMissingSourceIsAProblemNotAnException(@TempDir Path dir) {
        Fixtures.Result r = Fixtures.read(Ingest.builder().source(SourceSpec.of(dir.resolve("nope"))).workspaceRoot(dir));
        assertEquals(List.of(new Problem("nope", "", "unreadable", r.problems().get(0).reason())), r.problems());
    }

    @Test
    void symbolicLinkLoopsAreNotFollowed(@TempDir Path dir) throws IOException {
        Path sub = Files.createDirectories(dir.resolve("a/b"));
        Files.copy(fixture("text/trail-mug.txt"), sub.resolve("mug.txt"));
        Files.createSymbolicLink(sub.resolve("loop"), dir.resolve("a"));
        Fixtures.Result r = Fixtures.read(Ingest.builder().source(SourceSpec.of(dir)).workspaceRoot(dir));
        assertEquals(List.of("FH-M-020"), r.ids());
        assertEquals(List.of("unreadable"), r.problemKinds());
        assertTrue(r.problems().get(0).reason().contains("loop"), r.problems().get(0).reason());
    }

    @Test
    void progressIsReportedPerListingAndPerFile() {
        AtomicLong calls = new AtomicLong();
        AtomicLong lastFiles = new AtomicLong();
        AtomicLong maxListings = new AtomicLong();
        IngestSummary s = Ingest.builder().source(SourceSpec.of(fixture("csv"))).source(SourceSpec.of(fixture("jsonl")))
                .onProgress((files, listings, bytes, problems) -> {
                    calls.incrementAndGet();
                    lastFiles.accumulateAndGet(files, Math::max);
                    maxListings.accumulateAndGet(listings, Math::max);
                }).build().run(l -> { });
        assertEquals(s.listings() + s.filesSeen(), calls.get(), "one call per listing and one per file");
        assertEquals(2, lastFiles.get());
        assertEquals(6, maxListings.get());
    }

    @Test
    void problemLogWritesASpreadsheetSafeCsv(@TempDir Path dir) throws IOException {
        Path out = dir.resolve("out/problems.csv");
        ProblemLog.write(out, List.of(new Problem("feeds/a.csv", "row 17", "parse", "=HYPERLINK(\"x\") is not a row"),
                new Problem("b.pdf", "", "encrypted", "locked, save an unprotected copy")));
        List<String> lines = Files.readAllLines(out, StandardCharsets.UTF_8);
        assertEquals("source,position,kind,reason", lines.get(0));
        assertEquals("feeds/a.csv,row 17,parse,\"'=HYPERLINK(\"\"x\"\") is not a row\"", lines.get(1),
                "a leading = is neutralised (OWASP \"CSV Injection\" [pub])");
        assertEquals("b.pdf,,encrypted,\"locked, save an unprotected copy\"", lines.get(2));
        assertFalse(Files.list(out.getParent()).anyMatch(p -> p.getFileName().toString().endsWith(".tmp")), "no temp file left");
    }

    @Test
    void misuseIsAnException() {
        assertThrows(IllegalStateException.class, () -> Ingest.builder().build());
        assertThrows(IllegalArgumentException.class, () -> Ingest.builder().threads(0));
        assertThrows(IllegalArgumentException.class, () -> Ingest.builder().maxFileBytes(0));
        assertThrows(IllegalArgumentException.class, () -> new Problem("a", "", "odd", "x"));
        assertThrows(IllegalArgumentException.class, () -> new SourceSpec(Path.of("."), List.of(" "), List.of(), null));
    }
}
