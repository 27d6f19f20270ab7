package dev.sheaf.miner.measure;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;

/**
 * {@link FeedbackTermFinder#exactLabels}: whole-token, leftmost-longest, case- and accent-insensitive
 * label matching. Immutable and thread-safe.
 */
final class FeedbackLabelMatcher implements FeedbackTermFinder {

    /** One label: the concept and the label as written. */
    private record Entry(String conceptId, String label) {
    }

    /** Normal-form label → concepts carrying it, in concept id order. */
    private final Map<String, List<Entry>> byLabel = new HashMap<>();
    private final int longest;

    FeedbackLabelMatcher(FeedbackVocabulary vocabulary) {
        Objects.requireNonNull(vocabulary, "vocabulary");
        int max = 0;
        for (FeedbackConcept c : vocabulary.concepts()) {
            for (Map.Entry<String, String> l : vocabulary.labelForms(c.id()).entrySet()) {
                byLabel.computeIfAbsent(l.getKey(), k -> new ArrayList<>()).add(new Entry(c.id(), l.getValue()));
                max = Math.max(max, l.getKey().split(" ").length);
            }
        }
        this.longest = max;
    }

    @Override
    public List<FeedbackTermHit> find(String sentence) {
        Objects.requireNonNull(sentence, "sentence");
        if (byLabel.isEmpty()) {
            return List.of();
        }
        CueTokens t = CueTokens.of(sentence);
        String[] words = new String[t.size()];
        for (int i = 0; i < words.length; i++) {
            words[i] = FeedbackVocabulary.fold(t.norm(i));
        }
        List<FeedbackTermHit> out = new ArrayList<>();
        int i = 0;
        while (i < words.length) {
            int matched = 0;
            List<Entry> entries = null;
            for (int len = Math.min(longest, words.length - i); len >= 1; len--) {
                if (crossesBreak(t, i, i + len)) {
                    continue;
                }
                List<Entry> e = byLabel.get(String.join(" ", Arrays.asList(words).subList(i, i + len)));
                if (e != null) {
                    matched = len;
                    entries = e;
                    break;
                }
            }
            if (entries == null) {
                i++;
                continue;
            }
            int start = t.get(i).start();
            int end = t.get(i + matched - 1).end();
            for (Entry e : entries) {
                out.add(new FeedbackTermHit(e.conceptId(), start, end, sentence.substring(start, end), e.label()));
            }
            i += matched;
        }
        return List.copyOf(out);
    }

    private static boolean crossesBreak(CueTokens t, int from, int to) {
        for (int k = from + 1; k < to; k++) {
            if (t.clauseBreak[k]) {
                return true;
            }
        }
        return false;
    }
}
