package dev.sheaf.miner.suggest;

import dev.sheaf.miner.ingest.EvidenceIndex;
import dev.sheaf.miner.mine.Harvest;
import dev.sheaf.miner.mine.VariantKey;
import dev.sheaf.miner.text.EvidenceLine;
import java.util.ArrayList;
import java.util.Collection;
import java.util.EnumMap;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.TreeMap;

/** Runs the merge kinds over the catalog and turns what they propose into suggestions. */
final class Kinds {
    private Kinds() {
    }

    static void run(Catalog c, Corpus.Result corpus, SuggestOptions o, Proposals p, Map<Suggestion.Kind, Integer> found,
                    List<String> notes) {
        Timer time = new Timer();
        Map<String, Proposals.Term> specTerms = specValueTerms(c);
        time.lap("spec values");
        if (o.kinds().contains(Suggestion.Kind.SAME_GROUP_KEY)) {
            found.put(Suggestion.Kind.SAME_GROUP_KEY, groupKeys(c, p));
        }
        time.lap("group keys");
        if (o.kinds().contains(Suggestion.Kind.SPELLING_VARIANT)) {
            found.put(Suggestion.Kind.SPELLING_VARIANT, spelling(c, specTerms, o, p));
        }
        time.lap("spelling");
        if (o.kinds().contains(Suggestion.Kind.ABBREVIATION)) {
            if (corpus == null) {
                notes.add("abbreviations: no listings were read, so definitions were looked for in the harvest's evidence lines only");
            }
            found.put(Suggestion.Kind.ABBREVIATION, abbreviations(c, corpus, p));
        }
        time.lap("abbreviations");
        ContextVectors.Vectors vectors = corpus == null ? null : ContextVectors.vectors(c.size(), corpus);
        time.lap("context vectors");
        if (o.kinds().contains(Suggestion.Kind.WORDNET_SYNONYM)) {
            found.put(Suggestion.Kind.WORDNET_SYNONYM, WordNetSynonyms.run(c, p, vectors, notes));
        }
        time.lap("wordnet");
        if (o.kinds().contains(Suggestion.Kind.DISTRIBUTIONAL)) {
            if (corpus == null) {
                notes.add("distributional: not run, it needs the listings (context vectors are counted in a pass over them)");
            } else {
                found.put(Suggestion.Kind.DISTRIBUTIONAL, ContextVectors.run(c, corpus, vectors, o, p));
            }
        }
        time.lap("distributional");
        if (o.kinds().contains(Suggestion.Kind.SAME_SPEC_KEY)) {
            found.put(Suggestion.Kind.SAME_SPEC_KEY, sameSpecKey(c, p));
        }
        time.lap("same spec key");
        notes.add("time: " + time);
    }

    /** Wall-clock laps, for the summary's notes. */
    static final class Timer {
        private long last = System.nanoTime();
        private final StringBuilder b = new StringBuilder();

        void lap(String what) {
            long now = System.nanoTime();
            b.append(b.length() == 0 ? "" : ", ").append(what).append(' ').append(String.format(Locale.ROOT, "%.2f s", (now - last) / 1e9));
            last = now;
        }

        @Override
        public String toString() {
            return b.toString();
        }
    }

    static Proposals.Term term(Catalog c, int i) {
        return new Proposals.Term(c.terms[i], c.shown[i], c.frequency[i], c.df[i]);
    }

    /** Candidates that share the harvest's variant group key. */
    private static int groupKeys(Catalog c, Proposals p) {
        Map<String, List<Integer>> groups = new LinkedHashMap<>();
        for (int i = 0; i < c.size(); i++) {
            String k = c.groupKeys[i];
            if (k == null) {
                k = VariantKey.of(c.terms[i]);
            }
            if (!k.isEmpty()) {
                groups.computeIfAbsent(k, x -> new ArrayList<>()).add(i);
            }
        }
        int n = 0;
        for (Map.Entry<String, List<Integer>> g : groups.entrySet()) {
            if (g.getValue().size() < 2) {
                continue;
            }
            List<Proposals.Term> ms = new ArrayList<>();
            StringBuilder forms = new StringBuilder();
            for (int i : g.getValue()) {
                ms.add(term(c, i));
                forms.append(forms.length() == 0 ? "" : ", ").append('"').append(c.shown[i]).append('"');
            }
            Map<String, Double> fig = new LinkedHashMap<>();
            fig.put("members", (double) ms.size());
            p.addGroup(ms, new Suggestion.Support(Suggestion.Kind.SAME_GROUP_KEY, 0.95,
                    "same variant group key '" + g.getKey() + "' (case, hyphen, spacing, plural or numeral differ): " + forms, fig));
            n++;
        }
        return n;
    }

    /** Spec values as terms (harvest form, rows as frequency), for the kinds that compare values too. */
    private static Map<String, Proposals.Term> specValueTerms(Catalog c) {
        Map<String, Proposals.Term> out = new HashMap<>();
        for (Harvest.SpecFacet f : c.harvest.specFacets()) {
            for (Harvest.SpecValueCount v : f.values()) {
                if (v.si() != null) {
                    continue;
                }
                String form = c.formOf(v.value());
                if (form == null || c.indexOf(form) >= 0) {
                    continue;
                }
                out.merge(form, new Proposals.Term(form, v.value(), v.rows(), v.rows()),
                        (a, b) -> new Proposals.Term(a.term(), a.shown(), a.frequency() + b.frequency(), a.df() + b.df()));
            }
        }
        return out;
    }

    /** US/UK patterns and doubled letters (shared skeleton), then misspellings (small edit distance, rare form). */
    private static int spelling(Catalog c, Map<String, Proposals.Term> specTerms, SuggestOptions o, Proposals p) {
        List<Proposals.Term> all = new ArrayList<>();
        for (int i = 0; i < c.size(); i++) {
            all.add(term(c, i));
        }
        all.addAll(new TreeMap<>(specTerms).values());
        // 1. skeletons: one representative (most frequent) per variant group key inside each skeleton
        Map<String, Map<String, Proposals.Term>> bySkeleton = new LinkedHashMap<>();
        for (Proposals.Term t : all) {
            String[] toks = t.term().split(" ");
            StringBuilder sk = new StringBuilder();
            for (String w : toks) {
                sk.append(sk.length() == 0 ? "" : " ").append(Spelling.skeleton(w));
            }
            String key = VariantKey.of(sk.toString());
            String group = VariantKey.of(t.term());
            if (key.isEmpty() || key.equals(group)) {
                // no rule changed it: it can still be the other side of a pair, keyed by its own group
            }
            bySkeleton.computeIfAbsent(key, k -> new LinkedHashMap<>()).merge(group, t,
                    (a, b) -> Proposals.MEMBER_ORDER.compare(a, b) <= 0 ? a : b);
        }
        int n = 0;
        for (Map<String, Proposals.Term> groups : bySkeleton.values()) {
            if (groups.size() < 2) {
                continue;
            }
            List<Proposals.Term> reps = new ArrayList<>(groups.values());
            reps.sort(Proposals.MEMBER_ORDER);
            for (int a = 0; a < reps.size(); a++) {
                for (int b = a + 1; b < reps.size(); b++) {
                    Proposals.Term x = reps.get(a);
                    Proposals.Term y = reps.get(b);
                    List<String> rules = rulesBetween(x.term(), y.term());
                    if (rules.isEmpty()) {
                        continue;
                    }
                    Map<String, Double> fig = new LinkedHashMap<>();
                    fig.put("edit distance", (double) Spelling.distance(x.term(), y.term()));
                    double score = rules.contains("doubled letters") && rules.size() == 1 ? 0.8 : 0.9;
                    p.addPair(x, y, new Suggestion.Support(Suggestion.Kind.SPELLING_VARIANT, score,
                            "spelling variants (" + String.join(", ", rules) + "): \"" + x.shown() + "\" and \"" + y.shown() + "\"", fig), null);
                    n++;
                }
            }
        }
        n += misspellings(c, o, p);
        return n;
    }

    private static List<String> rulesBetween(String a, String b) {
        String[] ta = a.split(" ");
        String[] tb = b.split(" ");
        List<String> out = new ArrayList<>();
        if (ta.length != tb.length) {
            // hyphen/spacing differs as well: compare the joined words
            for (String r : Spelling.rulesBetween(a.replace(" ", ""), b.replace(" ", ""))) {
                if (!out.contains(r)) {
                    out.add(r);
                }
            }
            return out;
        }
        for (int i = 0; i < ta.length; i++) {
            if (!ta[i].equals(tb[i])) {
                for (String r : Spelling.rulesBetween(ta[i], tb[i])) {
                    if (!out.contains(r)) {
                        out.add(r);
                    }
                }
            }
        }
        return out;
    }

    /**
     * Misspellings: two words at a small restricted edit distance (at most one edit per
     * {@code 1/maxEditShare} letters, at least one), the rarer written at most a quarter as often,
     * and — when WordNet is there — not both real words. Whole terms are paired when they differ in
     * that one word ("sleeing bag" / "sleeping bag").
     */
    private static int misspellings(Catalog c, SuggestOptions o, Proposals p) {
        // word frequencies: a one-word candidate's own count, else the most frequent candidate holding the word
        Map<String, Long> freq = new HashMap<>();
        for (int i = 0; i < c.size(); i++) {
            for (String w : c.tokens[i]) {
                if (Spelling.isWord(w) && w.length() >= o.minEditLength()) {
                    long f = c.tokens[i].length == 1 ? c.frequency[i] : 0;
                    freq.merge(w, f, Math::max);
                }
            }
        }
        Map<String, List<String>> byDeletion = new HashMap<>();
        for (String w : new TreeMap<>(freq).keySet()) {
            byDeletion.computeIfAbsent(w, k -> new ArrayList<>()).add(w);
            for (String d : Spelling.deletions(w)) {
                List<String> l = byDeletion.computeIfAbsent(d, k -> new ArrayList<>());
                if (!l.contains(w)) {
                    l.add(w);
                }
            }
        }
        Map<String, String> pairs = new TreeMap<>();
        for (List<String> ws : byDeletion.values()) {
            for (int a = 0; a < ws.size(); a++) {
                for (int b = a + 1; b < ws.size(); b++) {
                    String x = ws.get(a);
                    String y = ws.get(b);
                    String k = x.compareTo(y) < 0 ? x + " " + y : y + " " + x;
                    pairs.putIfAbsent(k, k);
                }
            }
        }
        // multiword candidates by (position, other words) so a word pair finds the term pairs it makes
        Map<String, List<Integer>> slots = new HashMap<>();
        Map<String, List<Integer>> holding = new HashMap<>();
        for (int i = 0; i < c.size(); i++) {
            String[] t = c.tokens[i];
            if (t.length < 2) {
                continue;
            }
            for (int k = 0; k < t.length; k++) {
                slots.computeIfAbsent(slotKey(t, k), x -> new ArrayList<>()).add(i);
                List<Integer> h = holding.computeIfAbsent(t[k], x -> new ArrayList<>());
                if (h.isEmpty() || h.get(h.size() - 1) != i) {
                    h.add(i);
                }
            }
        }
        int n = 0;
        for (String k : pairs.keySet()) {
            String[] xy = k.split(" ");
            String x = xy[0];
            String y = xy[1];
            if (Spelling.skeleton(x).equals(Spelling.skeleton(y))) {
                continue; // a pattern variant, proposed above
            }
            int len = Math.min(x.length(), y.length());
            int d = Spelling.distance(x, y);
            if (d < 1 || d > Math.max(1, (int) Math.floor(len * o.maxEditShare()))) {
                continue;
            }
            long fx = freq.get(x);
            long fy = freq.get(y);
            String common = fx >= fy ? x : y;
            String rare = fx >= fy ? y : x;
            long fc = Math.max(fx, fy);
            long fr = Math.min(fx, fy);
            if (fc == 0 || fr * 4 > fc) {
                continue;
            }
            WordNetSynonyms.Known known = WordNetSynonyms.known(rare, common);
            if (known == WordNetSynonyms.Known.BOTH) {
                continue; // two real words ("hiking" / "biking")
            }
            double ratio = (double) fr / fc;
            double score = 0.5 + 0.25 * (1 - ratio) + (known == WordNetSynonyms.Known.SECOND_ONLY ? 0.2 : 0);
            Map<String, Double> fig = new LinkedHashMap<>();
            fig.put("edit distance", (double) d);
            fig.put("frequency ratio", ratio);
            String why = "likely misspelling: \"" + rare + "\" is " + d + " edit" + (d == 1 ? "" : "s") + " from \"" + common
                    + "\" and written " + String.format(Locale.ROOT, "%.0f", 1 / Math.max(ratio, 1e-9)) + "× less often"
                    + (known == WordNetSynonyms.Known.SECOND_ONLY ? "; WordNet knows \"" + common + "\" but not \"" + rare + "\"" : "");
            int ic = c.indexOf(common);
            int ir = c.indexOf(rare);
            if (ic >= 0 && ir >= 0) {
                p.addPair(term(c, ic), term(c, ir), new Suggestion.Support(Suggestion.Kind.SPELLING_VARIANT, clamp(score), why, fig), null);
                n++;
            }
            // the terms that differ only in this word
            for (int i : holding.getOrDefault(rare, List.of())) {
                String[] t = c.tokens[i];
                for (int pos = 0; pos < t.length; pos++) {
                    if (!t[pos].equals(rare)) {
                        continue;
                    }
                    for (int j : slots.getOrDefault(slotKey(t, pos), List.of())) {
                        if (j != i && c.tokens[j].length == t.length && c.tokens[j][pos].equals(common)) {
                            p.addPair(term(c, j), term(c, i), new Suggestion.Support(Suggestion.Kind.SPELLING_VARIANT,
                                    clamp(score), why, fig), null);
                            n++;
                        }
                    }
                }
            }
        }
        return n;
    }

    private static String slotKey(String[] t, int k) {
        StringBuilder b = new StringBuilder().append(k).append(':');
        for (int i = 0; i < t.length; i++) {
            b.append(i == k ? "_" : t[i]).append(' ');
        }
        return b.toString();
    }

    /**
     * Short forms and their expansions: defined in the text ("durable water repellent (DWR)", or
     * "DWR (durable water repellent)"), or — weaker — a one-word candidate that spells the initials of
     * a multiword candidate ("ccf" / "closed cell foam").
     */
    private static int abbreviations(Catalog c, Corpus.Result corpus, Proposals p) {
        Map<String, Corpus.Definition> defs;
        if (corpus != null) {
            defs = corpus.definitions();
        } else {
            defs = new HashMap<>();
            for (int i = 0; i < c.size(); i++) {
                for (EvidenceLine e : c.evidence(i)) {
                    String text = e.left() + " " + e.match() + " " + e.right();
                    Abbreviations.scan(text, (sf, lf, s, t) -> {
                        String a = c.formOf(sf);
                        String b = c.formOf(lf);
                        if (a != null && b != null && !a.equals(b)) {
                            Corpus.Definition d = defs.computeIfAbsent(a + "\u0001" + b, k -> new Corpus.Definition(a, b));
                            d.listings++;
                            if (d.first == null) {
                                d.first = e;
                            }
                        }
                    });
                }
            }
        }
        int n = 0;
        java.util.Set<String> defined = new java.util.HashSet<>();
        for (Corpus.Definition d : new TreeMap<>(defs).values()) {
            int s = c.indexOf(d.shortForm);
            int l = c.indexOf(d.longForm);
            if (s < 0 || l < 0) {
                continue;
            }
            Map<String, Double> fig = new LinkedHashMap<>();
            fig.put("listings defining it", (double) d.listings);
            double score = 0.8 + 0.15 * (1 - 1.0 / (1 + d.listings));
            p.addPair(term(c, l), term(c, s), new Suggestion.Support(Suggestion.Kind.ABBREVIATION, score,
                    "\"" + c.shown[s] + "\" is spelled out as \"" + c.shown[l] + "\" in " + d.listings + " listing"
                            + (d.listings == 1 ? "" : "s"), fig), d.first);
            defined.add(d.shortForm);
            n++;
        }
        // initials
        Map<String, List<Integer>> byInitials = new HashMap<>();
        for (int i = 0; i < c.size(); i++) {
            String[] t = c.tokens[i];
            if (t.length < 2 || t.length > 5) {
                continue;
            }
            StringBuilder b = new StringBuilder();
            for (String w : t) {
                b.append(w.charAt(0));
            }
            byInitials.computeIfAbsent(b.toString(), k -> new ArrayList<>()).add(i);
        }
        for (int i = 0; i < c.size(); i++) {
            String[] t = c.tokens[i];
            if (t.length != 1 || defined.contains(c.terms[i]) || t[0].length() < 2 || t[0].length() > 5 || !looksShort(c.shown[i])) {
                continue;
            }
            List<Integer> longs = byInitials.getOrDefault(t[0], List.of());
            for (int l : longs) {
                Map<String, Double> fig = new LinkedHashMap<>();
                fig.put("expansions with these initials", (double) longs.size());
                double score = longs.size() == 1 ? 0.5 : 0.4 / longs.size() + 0.1;
                p.addPair(term(c, l), term(c, i), new Suggestion.Support(Suggestion.Kind.ABBREVIATION, score,
                        "\"" + c.shown[i] + "\" spells the initials of \"" + c.shown[l] + "\"" + (longs.size() == 1 ? ""
                                : " (one of " + longs.size() + " terms with these initials)"), fig), null);
                n++;
            }
        }
        return n;
    }

    /** Written mostly in capitals ("DWR", "UPF"): how a short form is shown. */
    private static boolean looksShort(String shown) {
        int upper = 0;
        int letters = 0;
        for (int i = 0; i < shown.length(); i++) {
            char ch = shown.charAt(i);
            if (Character.isLetter(ch)) {
                letters++;
                if (Character.isUpperCase(ch)) {
                    upper++;
                }
            }
        }
        return letters >= 2 && upper * 2 > letters;
    }

    /** Corroboration: both members are values under one spec key (e.g. both written as a "Colour"). */
    private static int sameSpecKey(Catalog c, Proposals p) {
        Map<String, Map<String, Long>> facetsOf = new HashMap<>();
        for (Harvest.SpecFacet f : c.harvest.specFacets()) {
            for (Harvest.SpecValueCount v : f.values()) {
                String form = c.formOf(v.value());
                if (form != null && v.si() == null) {
                    facetsOf.computeIfAbsent(form, k -> new TreeMap<>()).merge(f.name(), v.rows(), Long::sum);
                }
            }
        }
        int n = 0;
        for (Proposals.Entry e : new ArrayList<>(p.entries())) {
            List<String> ts = new ArrayList<>(e.members.keySet());
            String shared = null;
            long rows = 0;
            for (int a = 0; a < ts.size() && shared == null; a++) {
                Map<String, Long> fa = facetsOf.get(ts.get(a));
                if (fa == null) {
                    continue;
                }
                for (int b = a + 1; b < ts.size() && shared == null; b++) {
                    Map<String, Long> fb = facetsOf.get(ts.get(b));
                    if (fb == null) {
                        continue;
                    }
                    for (Map.Entry<String, Long> k : fa.entrySet()) {
                        if (fb.containsKey(k.getKey())) {
                            shared = k.getKey();
                            rows = k.getValue() + fb.get(k.getKey());
                            break;
                        }
                    }
                }
            }
            if (shared != null) {
                Map<String, Double> fig = new LinkedHashMap<>();
                fig.put("spec rows", (double) rows);
                p.corroborate(e, new Suggestion.Support(Suggestion.Kind.SAME_SPEC_KEY, 0.5,
                        "both written as values of the spec key '" + shared + "' (" + rows + " rows)", fig));
                n++;
            }
        }
        return n;
    }

    static double clamp(double v) {
        return Math.max(0, Math.min(1, v));
    }

    /** The raw suggestions: members ordered, supports strongest first, score the noisy-or. */
    static List<Suggestion> toSuggestions(Catalog c, Proposals p, SuggestOptions o, EvidenceIndex index) {
        List<Suggestion> out = new ArrayList<>();
        for (Proposals.Entry e : p.entries()) {
            List<Proposals.Term> ts = new ArrayList<>(e.members.values());
            ts.sort(Proposals.MEMBER_ORDER);
            List<Suggestion.Member> ms = new ArrayList<>();
            List<String> terms = new ArrayList<>();
            for (Proposals.Term t : ts) {
                ms.add(new Suggestion.Member(t.term(), t.shown(), null, t.frequency(), t.df()));
                terms.add(t.term());
            }
            List<Suggestion.Support> sup = new ArrayList<>(e.support.values());
            sup.sort((a, b) -> a.score() != b.score() ? Double.compare(b.score(), a.score()) : a.kind().compareTo(b.kind()));
            double miss = 1;
            StringBuilder reason = new StringBuilder();
            for (Suggestion.Support s : sup) {
                miss *= 1 - s.score();
                reason.append(reason.length() == 0 ? "" : "; ").append(s.reason());
            }
            double score = clamp(1 - miss);
            out.add(new Suggestion(sup.get(0).kind(), ms, score, reason.toString(), sup,
                    Suggester.evidence(c, terms, e.evidence, o.evidenceLines(), index)));
        }
        return out;
    }

    /** Counts per kind of a collection of suggestions (for summaries). */
    static Map<Suggestion.Kind, Integer> countByKind(Collection<Suggestion> ss) {
        Map<Suggestion.Kind, Integer> m = new EnumMap<>(Suggestion.Kind.class);
        for (Suggestion s : ss) {
            for (Suggestion.Support x : s.support()) {
                m.merge(x.kind(), 1, Integer::sum);
            }
        }
        return m;
    }
}
