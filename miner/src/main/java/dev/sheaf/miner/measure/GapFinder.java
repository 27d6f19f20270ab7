package dev.sheaf.miner.measure;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;

/**
 * Counts the words and phrases of feedback sentences that no vocabulary label covers
 * (docs/decisions/113-vocabulary-gaps.md). A token is a candidate word when it is
 * <ul>
 *   <li>a plain word for {@link MentionCues}: not a cue or hedge (more, less, too, not, a bit, kind of …),
 *       not a linking verb (is, feels, looks …);</li>
 *   <li>not a stop word, holds a letter, and is not inside a mention's span.</li>
 * </ul>
 * Phrases are runs of up to {@code maxWords} candidate words inside one clause: anything else is a
 * boundary, never glue, so "lighter than the old one" yields no phrase "old one" across a removed word
 * unless the two stand side by side. A phrase is dropped when a longer counted phrase holds it and has
 * the same frequency (it never occurs on its own). Ranked by frequency, then sentences, then term.
 * Not thread-safe: one finder per run.
 */
final class GapFinder {
    private final int maxWords;
    private final int minSentences;
    private final int limit;
    private final Set<String> stopWords;

    /** term → {frequency, sentences, last sentence index}. */
    private final Map<String, int[]> counts = new HashMap<>();
    private final Map<String, Integer> firstSentence = new HashMap<>();
    private final List<String> examples = new ArrayList<>();
    private final List<Long> exampleRows = new ArrayList<>();

    GapFinder(int maxWords, int minSentences, int limit, Set<String> stopWords) {
        this.maxWords = maxWords;
        this.minSentences = minSentences;
        this.limit = limit;
        this.stopWords = stopWords;
    }

    /** Adds one sentence; {@code covered} are the mention spans as {start, end} char offsets. */
    void add(String text, long row, CueTokens tokens, List<int[]> covered) {
        int index = examples.size();
        examples.add(text);
        exampleRows.add(row);
        int n = tokens.size();
        String[] word = new String[n];
        List<CueLexicon.Unit> units = CueLexicon.units(tokens, -1, -1);
        for (CueLexicon.Unit u : units) {
            if (u.role() != CueLexicon.Role.WORD) {
                continue;
            }
            int i = u.from();
            CueTokens.Token t = tokens.get(i);
            String w = FeedbackVocabulary.fold(t.norm());
            if (stopWords.contains(w) || stopWords.contains(t.norm()) || CueLexicon.COPULAS.contains(w) || w.equals(HedgeWords.ISH) || !hasLetter(w)
                    || overlaps(t.start(), t.end(), covered)) {
                continue;
            }
            word[i] = w;
        }
        for (int i = 0; i < n; i++) {
            if (word[i] == null) {
                continue;
            }
            StringBuilder b = new StringBuilder();
            for (int len = 1; len <= maxWords && i + len <= n; len++) {
                int k = i + len - 1;
                if (word[k] == null || (len > 1 && tokens.clauseBreak[k])) {
                    break;
                }
                if (len > 1) {
                    b.append(' ');
                }
                b.append(word[k]);
                String term = b.toString();
                int[] c = counts.computeIfAbsent(term, x -> new int[] {0, 0, -1});
                c[0]++;
                if (c[2] != index) {
                    c[1]++;
                    c[2] = index;
                }
                firstSentence.putIfAbsent(term, index);
            }
        }
    }

    /** The gap terms, ranked, at most {@code limit}. */
    List<GapTerm> result() {
        java.util.Set<String> subsumed = new java.util.HashSet<>();
        for (Map.Entry<String, int[]> e : counts.entrySet()) {
            String term = e.getKey();
            int sp = term.indexOf(' ');
            if (sp < 0) {
                continue;
            }
            int freq = e.getValue()[0];
            String prefix = term.substring(0, term.lastIndexOf(' '));
            String suffix = term.substring(sp + 1);
            for (String part : new String[] {prefix, suffix}) {
                int[] c = counts.get(part);
                if (c != null && c[0] == freq) {
                    subsumed.add(part);
                }
            }
        }
        List<GapTerm> out = new ArrayList<>();
        for (Map.Entry<String, int[]> e : counts.entrySet()) {
            int[] c = e.getValue();
            if (c[1] < minSentences || subsumed.contains(e.getKey())) {
                continue;
            }
            int first = firstSentence.get(e.getKey());
            int words = e.getKey().split(" ").length;
            out.add(new GapTerm(e.getKey(), words, c[0], c[1], examples.get(first), exampleRows.get(first)));
        }
        out.sort(Comparator.comparingInt((GapTerm g) -> -g.frequency()).thenComparingInt(g -> -g.sentences())
                .thenComparing(GapTerm::term));
        return out.size() > limit ? List.copyOf(out.subList(0, limit)) : List.copyOf(out);
    }

    private static boolean overlaps(int start, int end, List<int[]> covered) {
        for (int[] c : covered) {
            if (start < c[1] && c[0] < end) {
                return true;
            }
        }
        return false;
    }

    private static boolean hasLetter(String w) {
        for (int i = 0; i < w.length(); i++) {
            if (Character.isLetter(w.charAt(i))) {
                return true;
            }
        }
        return false;
    }
}
