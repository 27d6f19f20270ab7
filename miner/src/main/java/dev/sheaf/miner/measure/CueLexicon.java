package dev.sheaf.miner.measure;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;

/**
 * The cue words other than hedges (those are in {@link HedgeWords}) and the phrase matcher that
 * groups a sentence's tokens into cue units, longest phrase first. All entries are lower-case
 * whole tokens as {@link CueTokens} produces them.
 */
final class CueLexicon {

    /** What a unit does for the mention it stands near. */
    enum Role {
        /** The matched span itself. */
        SPAN,
        HEDGE_DEGREE, HEDGE_EPISTEMIC,
        /** not, never, any {@code n't} word: negates a term that follows within the window. */
        NEGATION,
        /** no, without, lacks: marks the following term absent (and negates it). */
        ABSENCE_BEFORE,
        /** "not included", "absent": marks the preceding term absent. */
        ABSENCE_AFTER,
        /** "missing", "lacking": either side. */
        ABSENCE_EITHER,
        /** with, has, includes: a term stated present (recorded, direction unchanged). */
        PRESENCE,
        MORE, MOST, LESS, LEAST, EXCESS, SUFFICIENT, EQUATIVE, THAN,
        /** Skipped between a degree cue and its term: very, much, way, even. */
        INTENSIFIER,
        /** Skipped likewise: a, an, the, of, any. */
        FILLER,
        /** "on the", skipped only in "on the heavy side". */
        SIDE_OPEN,
        /** A word that ends a clause (and, but, though …). */
        CLAUSE_BREAK,
        /** A contrast word: ends a clause and a sentence segment (but, though, however …). */
        SEGMENT_BREAK,
        /** Looks like a cue but is not one here: "not only", "no doubt", "as well". */
        NEUTRAL,
        WORD
    }

    /** A run of tokens {@code [from, to)} with one role; {@code start}/{@code end}: char offsets. */
    record Unit(Role role, int from, int to, int start, int end, String norm) {
    }

    static final int MAX_PHRASE = 4;

    /** Linking verbs before a predicate comparative: "the hood is smaller", "it feels lighter". */
    static final Set<String> COPULAS = Set.of("is", "was", "are", "were", "be", "been", "being", "feels", "feel",
            "felt", "looks", "look", "looked", "runs", "run", "ran", "fits", "fit", "seems", "seem", "seemed",
            "gets", "got", "became", "becomes");

    private static final Map<String, Role> PHRASES = new HashMap<>();

    private static void put(Role role, String... phrases) {
        for (String p : phrases) {
            Role old = PHRASES.put(p, role);
            if (old != null && old != role) {
                throw new IllegalStateException("cue phrase '" + p + "' is listed as both " + old + " and " + role);
            }
        }
    }

    /** Misspelt contractions seen in shoppers' text; the apostrophe forms end in n't and are caught by rule. */
    private static final Set<String> BARE_CONTRACTIONS = Set.of(
            "dont", "doesnt", "didnt", "isnt", "wasnt", "arent", "werent", "hasnt", "havent", "hadnt",
            "wont", "cant", "couldnt", "wouldnt", "shouldnt", "aint");

    static {
        HedgeWords.DEGREE.forEach(p -> put(Role.HEDGE_DEGREE, p));
        HedgeWords.EPISTEMIC.forEach(p -> put(Role.HEDGE_EPISTEMIC, p));
        put(Role.NEGATION, "not", "never", "cannot", "nor", "neither", "no longer");
        BARE_CONTRACTIONS.forEach(p -> put(Role.NEGATION, p));
        put(Role.ABSENCE_BEFORE, "no", "without", "lacks", "lack", "lacked", "free of", "none", "zero", "sans",
                "comes without", "came without");
        put(Role.ABSENCE_AFTER, "not included", "not provided", "absent");
        put(Role.ABSENCE_EITHER, "missing", "lacking");
        put(Role.PRESENCE, "with", "has", "have", "had", "having", "includes", "include", "included",
                "including", "features", "featuring", "comes with", "came with", "come with", "offers",
                "contains", "got");
        put(Role.MORE, "more");
        put(Role.MOST, "most");
        put(Role.LESS, "less", "fewer");
        put(Role.LEAST, "least", "fewest");
        put(Role.EXCESS, "too", "too much", "too many", "overly", "excessively");
        put(Role.SUFFICIENT, "enough");
        put(Role.EQUATIVE, "as");
        put(Role.THAN, "than");
        put(Role.INTENSIFIER, "very", "really", "much", "way", "far", "even", "so", "quite", "extremely",
                "super", "a lot", "lots", "a great deal", "significantly", "noticeably", "considerably",
                "definitely", "totally", "just", "still", "by far", "incredibly", "seriously",
                "substantially", "twice", "a whole lot");
        put(Role.FILLER, "a", "an", "the", "of", "any");
        put(Role.SIDE_OPEN, "on the");
        put(Role.CLAUSE_BREAK, "and", "while", "because", "since", "unlike", "which", "who");
        put(Role.SEGMENT_BREAK, "but", "though", "although", "however", "yet", "whereas", "except");
        put(Role.NEUTRAL, "not only", "not just", "no doubt", "no matter", "not to mention", "no problem",
                "or not", "if not", "nothing but", "as well", "as well as", "such as", "as far as");
    }

    private CueLexicon() {
    }

    /**
     * Groups {@code tokens} into units; tokens {@code [spanFrom, spanTo)} form one {@link Role#SPAN}
     * unit and never join a phrase (pass an empty range, e.g. {@code -1, -1}, for none).
     */
    static List<Unit> units(CueTokens tokens, int spanFrom, int spanTo) {
        List<Unit> out = new ArrayList<>();
        int n = tokens.size();
        int i = 0;
        while (i < n) {
            if (i == spanFrom && spanTo > spanFrom) {
                out.add(unit(tokens, Role.SPAN, spanFrom, spanTo));
                i = spanTo;
                continue;
            }
            int limit = i < spanFrom ? spanFrom : n;
            Unit found = null;
            for (int len = Math.min(MAX_PHRASE, limit - i); len >= 1 && found == null; len--) {
                if (len > 1 && crossesBreak(tokens, i, i + len)) {
                    continue;
                }
                Role role = PHRASES.get(join(tokens, i, i + len));
                if (role != null) {
                    found = unit(tokens, role, i, i + len);
                }
            }
            if (found == null) {
                String w = tokens.norm(i);
                Role role = w.endsWith("n't") ? Role.NEGATION : Role.WORD;
                found = unit(tokens, role, i, i + 1);
            }
            out.add(found);
            i = found.to();
        }
        return out;
    }

    private static boolean crossesBreak(CueTokens tokens, int from, int to) {
        for (int k = from + 1; k < to; k++) {
            if (tokens.clauseBreak[k]) {
                return true;
            }
        }
        return false;
    }

    private static Unit unit(CueTokens tokens, Role role, int from, int to) {
        return new Unit(role, from, to, tokens.get(from).start(), tokens.get(to - 1).end(), join(tokens, from, to));
    }

    private static String join(CueTokens tokens, int from, int to) {
        if (to - from == 1) {
            return tokens.norm(from);
        }
        StringBuilder b = new StringBuilder();
        for (int k = from; k < to; k++) {
            if (k > from) {
                b.append(' ');
            }
            b.append(tokens.norm(k));
        }
        return b.toString();
    }
}
