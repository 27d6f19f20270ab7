package dev.sheaf.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

import dev.sheaf.miner.ingest.Ingest;
import dev.sheaf.miner.ingest.IngestSummary;
import dev.sheaf.miner.ingest.Workspace;
import dev.sheaf.miner.ingest.Listing;
import dev.sheaf.miner.mine.Harvest;
import dev.sheaf.miner.mine.HarvestOptions;
import dev.sheaf.miner.mine.Harvester;
import dev.sheaf.miner.text.Analysis;
import dev.sheaf.miner.text.AnalysisProfile;
import dev.sheaf.miner.text.TokenSegment;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Collections;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The miner's bigram counts and scores against NLTK's, live: Debian's python3-nltk,
 * {@code nltk.collocations.BigramCollocationFinder} with {@code BigramAssocMeasures.pmi},
 * {@code .likelihood_ratio} and {@code .student_t} (../shared/CHECKS.md, "Reference library, live"),
 * fed with the SAME segments the miner counts in (one document per segment, via
 * {@code from_documents}), compared per bigram — never by rank — for every bigram with frequency ≥ 5.
 *
 * <p>NLTK's conventions, read in nltk/metrics/association.py (3.8): pmi = log2(c12·N) − log2(c1·c2);
 * likelihood_ratio = 2 Σ obs·ln(obs/(exp + 1e-20) + 1e-20) over the 2×2 cells; student_t =
 * (c12 − c1·c2/N) / √(c12 + 1e-20); N = the number of tokens (word_fd.N()), c1 and c2 the words'
 * total counts, c12 adjacent pairs inside one document. The miner uses the same definitions.
 *
 * <p>Skips when NLTK is missing, unless SHEAF_REQUIRE_REFERENCES=1 (CI), where it fails.
 */
class NltkCollocationCheckTest {
    /**
     * The corpus: the demo workspace's catalog (sample-listings/catalog, every format, with the CSV
     * feed's column mapping), read by the real ingest stage exactly as
     * {@code sheaf mine --workspace sample-listings} reads it.
     */
    static final Path WORKSPACE = Path.of("../sample-listings");
    static final int MIN_FREQUENCY = 5;
    private static final double REL = 1e-9;
    private static final double EPS = Math.ulp(1.0);

    @TempDir
    Path tmp;

    @Test
    void bigramCountsAndScoresAgreeWithNltkOnTheSameSegments() throws Exception {
        String python = System.getenv().getOrDefault("SHEAF_PYTHON", "/usr/bin/python3");
        requireNltk(python);
        List<Listing> listings = listings();
        assertTrue(listings.size() >= 100, "the corpus must not be trivially small, got " + listings.size());

        // 1. the miner's segments, dumped one per line
        AnalysisProfile profile = AnalysisProfile.defaults();
        Analysis analysis = Analysis.of(profile);
        Path segments = tmp.resolve("segments.txt");
        StringBuilder dump = new StringBuilder();
        long tokens = 0;
        for (Listing l : listings) {
            for (TokenSegment s : analysis.segments(l)) {
                dump.append(String.join(" ", s.terms())).append('\n');
                tokens += s.length();
            }
        }
        Files.writeString(segments, dump, StandardCharsets.UTF_8);

        // 2. NLTK on exactly those segments
        Path script = Path.of("src/test/resources/reference/nltk_bigrams.py").toAbsolutePath();
        Process p = new ProcessBuilder(python, script.toString(), segments.toString(), String.valueOf(MIN_FREQUENCY))
                .redirectErrorStream(false).start();
        byte[] stdout = p.getInputStream().readAllBytes();
        String stderr = new String(p.getErrorStream().readAllBytes(), StandardCharsets.UTF_8);
        assertTrue(p.waitFor(300, TimeUnit.SECONDS), "NLTK did not finish");
        assertEquals(0, p.exitValue(), "NLTK script failed: " + stderr);
        Map<String, double[]> nltk = new HashMap<>();
        Map<String, Long> nltkWords = new HashMap<>();
        long nltkN = -1;
        for (String line : new String(stdout, StandardCharsets.UTF_8).split("\n")) {
            if (line.isEmpty()) {
                continue;
            }
            String[] c = line.split("\t", -1);
            if (c[0].equals("#N")) {
                nltkN = Long.parseLong(c[1]);
            } else if (c[0].equals("#word")) {
                nltkWords.put(c[1], Long.parseLong(c[2]));
            } else {
                nltk.put(c[0] + " " + c[1], new double[] {Double.parseDouble(c[2]), Double.parseDouble(c[3]),
                        Double.parseDouble(c[4]), Double.parseDouble(c[5])});
            }
        }
        assertEquals(tokens, nltkN, "NLTK's N is the number of tokens in the segments");

        // 3. the miner's harvest of the same listings: every n-gram up to 2 words with frequency >= 5
        Harvest h = Harvester.builder().profile(profile).options(HarvestOptions.everything(2, MIN_FREQUENCY))
                .threads(2).tempRoot(tmp).build().harvest(listings);
        assertEquals(nltkN, h.corpus().tokens());
        Map<String, Harvest.Candidate> mined = new HashMap<>();
        for (Harvest.Candidate c : h.candidates()) {
            mined.put(c.term(), c);
        }

        // 4. per n-gram: the same bigrams, the same counts, the same scores
        int compared = 0;
        for (Map.Entry<String, double[]> e : nltk.entrySet()) {
            Harvest.Candidate c = mined.get(e.getKey());
            assertNotNull(c, "NLTK finds bigram '" + e.getKey() + "' with frequency " + (long) e.getValue()[0] + "; the miner does not");
            double[] ref = e.getValue();
            long c12 = c.frequency();
            assertEquals((long) ref[0], c12, "frequency of " + e.getKey());
            String[] w = e.getKey().split(" ");
            long c1 = mined.get(w[0]).frequency();
            long c2 = mined.get(w[1]).frequency();
            double n = nltkN;
            // tolerance: 1e-9 relative, widened only by the rounding error NLTK's own float formula can
            // carry (a few ulps of the magnitudes it adds and subtracts), which matters near zero
            double pmiTerms = Math.abs(Math.log(c12 * n) / Math.log(2)) + Math.abs(Math.log((double) c1 * c2) / Math.log(2));
            check("pmi", e.getKey(), ref[1], c.scores().pmi(), 16 * EPS * pmiTerms);
            if (!Double.isNaN(ref[2])) {
                check("likelihood_ratio", e.getKey(), ref[2], c.scores().llr(), 16 * EPS * llrTerms(c12, c1, c2, nltkN));
            }
            double tTerms = (c12 + (double) c1 * c2 / n) / Math.sqrt(c12);
            check("student_t", e.getKey(), ref[3], c.scores().tScore(), 16 * EPS * tTerms);
            compared++;
        }
        long minedBigrams = h.candidates().stream().filter(c -> c.n() == 2).count();
        assertEquals(nltk.size(), minedBigrams, "the miner finds bigrams with frequency >= 5 that NLTK does not");
        for (Map.Entry<String, Long> e : nltkWords.entrySet()) {
            Harvest.Candidate c = mined.get(e.getKey());
            assertNotNull(c, "word " + e.getKey());
            assertEquals((long) e.getValue(), c.frequency(), "frequency of word " + e.getKey());
        }
        assertTrue(compared >= 100, "only " + compared + " bigrams compared; the check needs a real corpus");
    }

    private static double llrTerms(long c12, long c1, long c2, long n) {
        long[] obs = {c12, c1 - c12, c2 - c12, n - c1 - c2 + c12};
        double[] exp = {(double) c1 * c2 / n, (double) c1 * (n - c2) / n, (double) (n - c1) * c2 / n,
            (double) (n - c1) * (n - c2) / n};
        double s = 0;
        for (int i = 0; i < 4; i++) {
            if (obs[i] > 0) {
                s += Math.abs(obs[i] * Math.log(obs[i] / exp[i])) + obs[i];
            }
        }
        return 2 * s;
    }

    private static void check(String measure, String bigram, double ref, Double mine, double floatFloor) {
        assertNotNull(mine, measure + " of " + bigram);
        double tol = REL * Math.abs(ref) + floatFloor;
        if (Math.abs(ref - mine) > tol) {
            fail(measure + " of '" + bigram + "': NLTK " + ref + ", miner " + mine + " (difference " + Math.abs(ref - mine)
                    + " > tolerance " + tol + ")");
        }
    }

    private static void requireNltk(String python) throws InterruptedException {
        boolean present;
        try {
            Process p = new ProcessBuilder(python, "-c", "import nltk.collocations").redirectErrorStream(true).start();
            p.getInputStream().readAllBytes();
            present = p.waitFor(60, TimeUnit.SECONDS) && p.exitValue() == 0;
        } catch (IOException e) {
            present = false;
        }
        if (!present) {
            String msg = "NLTK is not importable by " + python + " (apt-get install python3-nltk)";
            if ("1".equals(System.getenv("SHEAF_REQUIRE_REFERENCES"))) {
                fail(msg + "; SHEAF_REQUIRE_REFERENCES=1 requires this reference check to run");
            }
            Assumptions.abort(msg);
        }
    }

    /** The corpus's listings through the ingest stage (the order of listings does not matter to counts). */
    static List<Listing> listings() throws IOException {
        List<Listing> out = Collections.synchronizedList(new ArrayList<>());
        Workspace ws = Workspace.load(WORKSPACE);
        IngestSummary r = Ingest.builder().sources(ws.sources()).workspaceRoot(WORKSPACE).build().run(out::add);
        assertTrue(r.problems().isEmpty(), "the demo catalog must read without problems, got " + r.problems());
        return out;
    }
}
