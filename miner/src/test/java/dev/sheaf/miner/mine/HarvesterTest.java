package dev.sheaf.miner.mine;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sheaf.miner.ingest.Field;
import dev.sheaf.miner.ingest.FieldKind;
import dev.sheaf.miner.ingest.Listing;
import dev.sheaf.miner.text.Analysis;
import dev.sheaf.miner.text.AnalysisProfile;
import dev.sheaf.miner.text.TokenSegment;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.stream.Collectors;
import java.util.stream.IntStream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The harvest against a brute-force oracle that counts every n-gram of every segment as strings:
 * frequencies, df, N and the scores must match exactly, for any thread count and with or without
 * spilling to disk.
 */
class HarvesterTest {
    @TempDir
    Path tmp;

    private static final List<Listing> CATALOG = RandomCatalog.make(42, 1500);

    /** Brute force: term → {tf, df}, plus N. */
    private static final class Oracle {
        final Map<String, long[]> counts = new HashMap<>();
        long n;

        Oracle(List<Listing> listings, int maxN) {
            Analysis a = Analysis.of(AnalysisProfile.defaults());
            for (Listing l : listings) {
                Set<String> seen = new HashSet<>();
                for (TokenSegment s : a.segments(l)) {
                    String[] t = s.terms();
                    n += t.length;
                    for (int len = 1; len <= maxN; len++) {
                        for (int i = 0; i + len <= t.length; i++) {
                            String g = String.join(" ", java.util.Arrays.copyOfRange(t, i, i + len));
                            long[] c = counts.computeIfAbsent(g, k -> new long[2]);
                            c[0]++;
                            if (seen.add(g)) {
                                c[1]++;
                            }
                        }
                    }
                }
            }
        }

        long tf(String g) {
            long[] c = counts.get(g);
            return c == null ? 0 : c[0];
        }
    }

    private Harvest mine(List<Listing> listings, HarvestOptions o, int threads, long budget) {
        Harvester h = Harvester.builder().options(o).threads(threads).tempRoot(tmp).memoryBudget(budget).build();
        try (Harvester.Run run = h.start()) {
            // feed from several threads, each source from one thread in order, as ingest does
            Map<String, List<Listing>> bySource = listings.stream().collect(Collectors.groupingBy(Listing::source));
            List<Thread> feeders = new ArrayList<>();
            for (List<Listing> part : bySource.values()) {
                Thread t = new Thread(() -> part.forEach(run::accept));
                feeders.add(t);
                t.start();
            }
            for (Thread t : feeders) {
                try {
                    t.join();
                } catch (InterruptedException e) {
                    throw new AssertionError(e);
                }
            }
            return run.finish();
        }
    }

    @Test
    void countsEveryNgramExactlyAsTheBruteForceOracle() {
        Oracle oracle = new Oracle(CATALOG, 3);
        HarvestOptions o = HarvestOptions.everything(3, 2);
        Harvest h = mine(CATALOG, o, 2, 256L << 20);
        assertEquals(oracle.n, h.corpus().tokens());
        long expected = oracle.counts.entrySet().stream().filter(e -> e.getValue()[0] >= 2).count();
        assertEquals(expected, h.candidates().size(), "every n-gram with frequency >= 2 is a candidate");
        for (Harvest.Candidate c : h.candidates()) {
            long[] want = oracle.counts.get(c.term());
            assertNotNull(want, c.term());
            assertEquals(want[0], c.frequency(), "tf of " + c.term());
            assertEquals(want[1], c.df(), "df of " + c.term());
        }
    }

    @Test
    void scoresFollowTheFormulasOnTheOracleCounts() {
        Oracle oracle = new Oracle(CATALOG, 3);
        Harvest h = mine(CATALOG, HarvestOptions.everything(3, 3), 2, 256L << 20);
        int checked = 0;
        for (Harvest.Candidate c : h.candidates()) {
            String[] t = c.term().split(" ");
            if (t.length == 1) {
                assertNull(c.scores().pmi());
                assertNull(c.scores().cValue());
                continue;
            }
            double pmi = Double.POSITIVE_INFINITY;
            double llr = Double.POSITIVE_INFINITY;
            for (int split = 1; split < t.length; split++) {
                long c1 = oracle.tf(String.join(" ", java.util.Arrays.copyOfRange(t, 0, split)));
                long c2 = oracle.tf(String.join(" ", java.util.Arrays.copyOfRange(t, split, t.length)));
                pmi = Math.min(pmi, Association.pmi(c.frequency(), c1, c2, oracle.n));
                llr = Math.min(llr, Association.logLikelihood(c.frequency(), c1, c2, oracle.n));
            }
            assertEquals(pmi, c.scores().pmi(), 0.0, c.term());
            assertEquals(llr, c.scores().llr(), 0.0, c.term());
            checked++;
        }
        assertTrue(checked > 100, "checked " + checked);
    }

    @Test
    void theHarvestDoesNotDependOnThreadsOrSpilling() {
        HarvestOptions o = HarvestOptions.builder().minFrequency(3).minDf(2).limit(0).build();
        String one = HarvestFiles.toJson(mine(CATALOG, o, 1, 256L << 20));
        String three = HarvestFiles.toJson(mine(CATALOG, o, 3, 256L << 20));
        // a 1 MiB budget forces token-store and count-run spills
        String spilled = HarvestFiles.toJson(mine(CATALOG, o, 2, 1L << 20));
        assertEquals(one, three);
        assertEquals(one, spilled);
    }

    @Test
    void prunesOnlyWhatCannotReachTheMinimums() {
        Oracle oracle = new Oracle(CATALOG, 3);
        Harvest h = mine(CATALOG, HarvestOptions.everything(3, 7).toBuilder().minDf(4).build(), 2, 256L << 20);
        Set<String> got = h.candidates().stream().map(Harvest.Candidate::term).collect(Collectors.toSet());
        for (Map.Entry<String, long[]> e : oracle.counts.entrySet()) {
            boolean qualifies = e.getValue()[0] >= 7 && e.getValue()[1] >= 4;
            assertEquals(qualifies, got.contains(e.getKey()), e.getKey() + " " + java.util.Arrays.toString(e.getValue()));
        }
    }

    @Test
    void ranksByScoreThenFrequencyThenTerm() {
        Harvest h = mine(CATALOG, HarvestOptions.builder().minFrequency(2).minDf(1).rankBy(Score.PMI).limit(0).build(), 2, 256L << 20);
        Comparator<Harvest.Candidate> order = Comparator
                .comparing((Harvest.Candidate c) -> c.score() == null ? Double.NEGATIVE_INFINITY : c.score()).reversed()
                .thenComparing(Comparator.comparingLong(Harvest.Candidate::frequency).reversed())
                .thenComparing(Harvest.Candidate::term);
        List<Harvest.Candidate> sorted = new ArrayList<>(h.candidates());
        sorted.sort(order);
        assertEquals(sorted, h.candidates());
        IntStream.range(0, h.candidates().size()).forEach(i -> assertEquals(i + 1, h.candidates().get(i).rank()));
    }

    @Test
    void theLimitKeepsTheTopOfTheFullRanking() {
        HarvestOptions all = HarvestOptions.builder().minFrequency(2).minDf(1).limit(0).build();
        List<Harvest.Candidate> full = mine(CATALOG, all, 2, 256L << 20).candidates();
        List<Harvest.Candidate> top = mine(CATALOG, all.toBuilder().limit(25).build(), 2, 256L << 20).candidates();
        assertEquals(25, top.size());
        for (int i = 0; i < 25; i++) {
            assertEquals(full.get(i).term(), top.get(i).term());
        }
    }

    @Test
    void filtersDropBoilerplateNumbersQuantitiesAndUnassociatedPairs() {
        Harvest h = mine(CATALOG, HarvestOptions.builder().minFrequency(2).minDf(1).limit(0).build(), 2, 256L << 20);
        for (Harvest.Candidate c : h.candidates()) {
            assertTrue(c.dfShare() <= 0.5, c.term());
            assertTrue(c.term().codePoints().anyMatch(Character::isLetter), c.term());
            assertFalse(c.term().matches("[0-9.,]+( (kg|lb|mm|g|oz))+"), "quantity " + c.term());
            if (c.n() > 1) {
                assertTrue(c.scores().npmi() > 0, c.term());
            }
        }
    }

    /** Decision 049: text on (nearly) every page of one kind of source is site template, dropped below the df cap. */
    @Test
    void siteTemplateOfOneKindOfSourceIsDroppedButAttributesStay() {
        List<Listing> listings = new ArrayList<>();
        for (int i = 0; i < 60; i++) { // 60 pages, each its own file, each with the shop's footer
            listings.add(new Listing("p" + i, "tents", "site/p" + i + ".html", "",
                    List.of(Field.of(FieldKind.TITLE, (i % 2 == 0 ? "ripstop nylon tent " : "cotton canvas tent ") + i),
                            Field.of(FieldKind.TEXT, "copyright hollowmere traders"))));
        }
        for (int i = 0; i < 70; i++) { // one feed without the footer
            listings.add(new Listing("f" + i, "tents", "feed.jsonl", "line " + (i + 1),
                    List.of(Field.of(FieldKind.TITLE, (i % 2 == 0 ? "ripstop nylon shelter" : "mesh inner shelter")))));
        }
        HarvestOptions o = HarvestOptions.builder().minFrequency(2).minDf(2).limit(0).build();
        Set<String> terms = mine(listings, o, 2, 256L << 20).candidates().stream().map(Harvest.Candidate::term)
                .collect(Collectors.toSet());
        // 60 of 130 listings is under the 0.5 cap, but 60 of 60 HTML pages is template
        assertFalse(terms.contains("hollowmere traders"), "site template kept: " + terms);
        assertFalse(terms.contains("copyright"), "site template kept: " + terms);
        // an attribute on half the pages stays, and so does one on most listings of the whole corpus
        assertTrue(terms.contains("cotton canvas"), terms.toString());
        assertTrue(terms.contains("ripstop nylon"), terms.toString());
        // with the cap off (share 1) nothing is dropped as template either
        Set<String> all = mine(listings, HarvestOptions.builder().minFrequency(2).minDf(2).limit(0).maxDfShare(1).build(), 1,
                256L << 20).candidates().stream().map(Harvest.Candidate::term).collect(Collectors.toSet());
        assertTrue(all.contains("hollowmere traders"), all.toString());
    }

    /** Decision 052: "d nylon" of "70D nylon" is a quantity's tail; "nylon" and a unit that mostly leads ("upf") stay. */
    @Test
    void quantityTailsAreDroppedButTheTermsAfterThemStay() {
        List<Listing> listings = new ArrayList<>();
        for (int i = 0; i < 30; i++) {
            listings.add(new Listing("q" + i, "jackets", "feed.jsonl", "line " + (i + 1),
                    List.of(Field.of(FieldKind.TITLE, "Tarn shell " + i),
                            Field.of(FieldKind.BULLET, (i % 2 == 0 ? "70D" : "40D") + " ripstop nylon shell"),
                            Field.of(FieldKind.BULLET, "upf 50 sun hood"),
                            Field.of(FieldKind.TEXT, i % 3 == 0 ? "ripstop nylon keeps its shape" : "packs small"))));
        }
        HarvestOptions o = HarvestOptions.builder().minFrequency(2).minDf(2).limit(0).maxDfShare(1).build();
        Set<String> terms = mine(listings, o, 2, 256L << 20).candidates().stream().map(Harvest.Candidate::term)
                .collect(Collectors.toSet());
        assertFalse(terms.contains("d ripstop nylon"), terms.toString());
        assertFalse(terms.contains("d ripstop"), terms.toString());
        assertTrue(terms.contains("ripstop nylon"), terms.toString());
        assertTrue(terms.contains("ripstop nylon shell"), terms.toString());
        assertTrue(terms.contains("sun hood"), terms.toString());
        Set<String> kept = mine(listings, HarvestOptions.builder().minFrequency(2).minDf(2).limit(0).maxDfShare(1)
                .dropQuantities(false).build(), 1, 256L << 20).candidates().stream().map(Harvest.Candidate::term)
                .collect(Collectors.toSet());
        assertTrue(kept.contains("d ripstop nylon"), kept.toString());
    }

    /** Decision 051: a term seen (nearly) only as a whole section heading is a part of the page, not an attribute. */
    @Test
    void sectionHeadingsAreDroppedButAttributesThatAreAlsoHeadingsStay() {
        List<Listing> listings = new ArrayList<>();
        for (int i = 0; i < 40; i++) {
            List<Field> fields = new ArrayList<>();
            fields.add(Field.of(FieldKind.TITLE, (i % 2 == 0 ? "ripstop nylon tent " : "cotton canvas tent ") + i));
            fields.add(Field.of(FieldKind.HEADING, "Key features"));
            fields.add(Field.of(FieldKind.BULLET, i % 3 == 0 ? "insulated hood" : "two way zip"));
            if (i % 4 == 0) {
                fields.add(Field.of(FieldKind.HEADING, "Insulated hood")); // a heading, but mostly seen in bullets
            }
            // a heading that is two segments is not a section heading
            fields.add(Field.of(FieldKind.HEADING, "Care; storage"));
            fields.add(Field.of(FieldKind.TEXT, i % 5 == 0 ? "storage sack included" : "pitch in minutes"));
            listings.add(new Listing("p" + i, "tents", "site/p" + i + ".html", "", fields));
        }
        HarvestOptions on = HarvestOptions.builder().minFrequency(2).minDf(2).limit(0).maxDfShare(1).build();
        Set<String> terms = mine(listings, on, 2, 256L << 20).candidates().stream().map(Harvest.Candidate::term)
                .collect(Collectors.toSet());
        assertFalse(terms.contains("key features"), "section heading kept: " + terms);
        assertFalse(terms.contains("features"), "a word only seen in a heading is a part of the page: " + terms);
        assertFalse(terms.contains("key"), "a word only seen in a heading is a part of the page: " + terms);
        // 10 of 24 occurrences of "insulated hood" are headings: far below 0.9, an attribute
        assertTrue(terms.contains("insulated hood"), terms.toString());
        // "care" and "storage" are each one segment of a two-segment heading, so neither is in a section heading
        assertTrue(terms.contains("storage"), terms.toString());
        assertTrue(terms.contains("care"), terms.toString());
        Set<String> kept = mine(listings, HarvestOptions.builder().minFrequency(2).minDf(2).limit(0).maxDfShare(1)
                .dropHeadings(false).build(), 1, 256L << 20).candidates().stream().map(Harvest.Candidate::term)
                .collect(Collectors.toSet());
        assertTrue(kept.contains("key features"), kept.toString());
    }

    @Test
    void evidenceLinesAreTheFirstListingsInSourceOrderWithExactOffsets() {
        Harvest h = mine(CATALOG, HarvestOptions.builder().minFrequency(2).minDf(1).limit(200).evidence(3).build(), 2, 256L << 20);
        Map<String, Listing> byId = CATALOG.stream().collect(Collectors.toMap(Listing::id, l -> l));
        Analysis a = Analysis.of(AnalysisProfile.defaults());
        Map<Listing, List<String>> segs = new HashMap<>();
        for (Listing l : CATALOG) {
            segs.put(l, a.segments(l).stream().map(s -> " " + String.join(" ", s.terms()) + " ").collect(Collectors.toList()));
        }
        for (Harvest.Candidate c : h.candidates()) {
            assertEquals(Math.min(3, c.df()), c.evidence().size(), c.term());
            // expected: listings containing the term, ordered by (source, position in source)
            List<Listing> containing = CATALOG.stream().filter(l -> segs.get(l).stream().anyMatch(x -> x.contains(" " + c.term() + " ")))
                    .sorted(Comparator.comparing(Listing::source).thenComparingInt(l -> Integer.parseInt(l.id().substring(1))))
                    .limit(3).collect(Collectors.toList());
            for (int i = 0; i < c.evidence().size(); i++) {
                var e = c.evidence().get(i);
                assertEquals(containing.get(i).id(), e.listingId(), c.term());
                Listing l = byId.get(e.listingId());
                String text = l.fields().stream().filter(f -> e.field().equals("spec-key") ? f.kind() == FieldKind.SPEC && f.key().contains(e.match())
                        : f.kind().label().equals(e.field()) && f.text().length() >= e.end() && f.text().substring(e.start(), e.end()).equals(e.match()))
                        .map(f -> e.field().equals("spec-key") ? f.key() : f.text()).findFirst().orElseThrow();
                assertEquals(e.match(), text.substring(e.start(), e.end()));
            }
        }
    }

    @Test
    void categoryDistinctiveTermsGetPositiveLogOddsZ() {
        List<Listing> ls = new ArrayList<>();
        for (int i = 0; i < 400; i++) {
            String cat = i % 2 == 0 ? "tents" : "jackets";
            String text = cat.equals("tents") ? "freestanding dome with vestibule" : "insulated hood with pit zips";
            ls.add(new Listing("x" + i, cat, "s", "", List.of(Field.of(FieldKind.DESCRIPTION, text + " and reflective trim"))));
        }
        Harvest h = mine(ls, HarvestOptions.builder().maxDfShare(1).limit(0).build(), 2, 256L << 20);
        Harvest.Candidate dome = h.candidates().stream().filter(c -> c.term().equals("freestanding dome")).findFirst().orElseThrow();
        assertEquals("tents", dome.topCategories().get(0).category());
        assertEquals(200, dome.topCategories().get(0).df());
        assertTrue(dome.topCategories().get(0).z() > 5);
        assertEquals(1, dome.topCategories().size(), "jackets never use it, so only one positive z");
        Harvest.Candidate trim = h.candidates().stream().filter(c -> c.term().equals("reflective trim")).findFirst().orElseThrow();
        assertTrue(trim.topCategories().isEmpty(), "a term used equally everywhere is distinctive nowhere");
    }

    @Test
    void specRowsBecomeFacetsWithValueCounts() {
        Harvest h = mine(CATALOG, HarvestOptions.defaults(), 2, 256L << 20);
        // The facet clusters every key that spells weight; count the catalog rows under those keys.
        Harvest.SpecFacet weight = h.specFacets().stream()
                .filter(f -> f.keys().stream().anyMatch(k -> k.key().equals("Weight"))).findFirst().orElseThrow();
        java.util.Set<String> keys = new java.util.HashSet<>();
        weight.keys().forEach(k -> keys.add(k.key()));
        long weightRows = CATALOG.stream().flatMap(l -> l.fields().stream())
                .filter(f -> f.kind() == FieldKind.SPEC && keys.contains(f.key())).count();
        assertEquals("weight", weight.name().toLowerCase(java.util.Locale.ROOT));
        assertEquals(weightRows, weight.rows());
        assertEquals(weightRows, weight.values().stream().mapToLong(Harvest.SpecValueCount::rows).sum());
    }

    @Test
    void anEmptyCorpusGivesAnEmptyHarvest() {
        Harvest h = mine(List.of(), HarvestOptions.defaults(), 2, 256L << 20);
        assertEquals(0, h.corpus().listings());
        assertTrue(h.candidates().isEmpty());
        Listing blank = new Listing("b", "", "s", "", List.of(Field.of(FieldKind.TITLE, " . , the and")));
        Harvest h2 = mine(List.of(blank), HarvestOptions.defaults(), 1, 256L << 20);
        assertEquals(1, h2.corpus().listings());
        assertEquals(0, h2.corpus().tokens());
    }

    @Test
    void aRunClosedWithoutFinishingStopsItsThreads() throws InterruptedException {
        Harvester h = Harvester.builder().threads(2).tempRoot(tmp).build();
        Harvester.Run run = h.start();
        CATALOG.subList(0, 300).forEach(run);
        run.close();
        Thread.sleep(100);
        assertTrue(Thread.getAllStackTraces().keySet().stream().noneMatch(t -> t.getName().startsWith("sheaf-mine-") && t.isAlive()),
                "worker threads must end when the run is closed");
        try (java.util.stream.Stream<Path> left = java.nio.file.Files.list(tmp)) {
            assertEquals(0, left.count(), "temporary files must be removed");
        } catch (java.io.IOException e) {
            throw new AssertionError(e);
        }
    }
}
