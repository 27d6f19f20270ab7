package dev.sheaf.miner.label;

import dev.sheaf.miner.ingest.Field;
import dev.sheaf.miner.ingest.FieldKind;
import dev.sheaf.miner.ingest.Listing;
import dev.sheaf.miner.text.Analysis;
import dev.sheaf.miner.text.AnalysisProfile;
import dev.sheaf.miner.text.Dimension;
import dev.sheaf.miner.text.SegmentPart;
import dev.sheaf.miner.text.Segmenter;
import dev.sheaf.vocab.Concept;
import dev.sheaf.vocab.ConceptLabel;
import dev.sheaf.vocab.FacetProperties;
import dev.sheaf.vocab.LabelKind;
import dev.sheaf.vocab.ValueKind;
import dev.sheaf.vocab.Vocabulary;
import dev.sheaf.miner.text.Units;
import it.unimi.dsi.fastutil.ints.IntOpenHashSet;
import java.util.ArrayList;
import java.util.Collection;
import java.util.Collections;
import java.util.EnumMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Objects;
import java.util.Set;

/**
 * The labeling stage's front door: a vocabulary compiled into one matcher and run over every field
 * of a listing. Thread-safe: one instance serves every thread (each thread gets its own token
 * buffers), so {@code Ingest.run(l -> sink.accept(labeler.label(l)))} labels on all cores.
 *
 * <p><b>Tokens.</b> Every label (preferred, alternative and hidden, in every language) goes through
 * the same analysis profile the miner used — same tokenizer, possessives, lower case, folding and
 * unit splitting — with one difference: stop words and negation words stay in the token sequence
 * as ordinary tokens. The miner needs a removed stop word as a boundary so it never invents
 * n-grams; the labeler needs the full sequence so "made in USA", "no-see-um mesh" and "water
 * resistant" match exactly as written, and so it can see the negation words it decides polarity
 * with. A match never crosses a field, a spec key/value border or one of the profile's break
 * characters (docs/decisions/100-label-matching.md).
 *
 * <p><b>Matching.</b> Leftmost-longest, no overlaps: scanning each clause left to right, the
 * longest label starting at a token wins and the scan resumes after it ({@link LabelTrie}).
 *
 * <p><b>Polarity</b> ({@link Polarity}): see {@link LabelOptions} and docs/decisions/101. A label
 * that itself holds a negation ("non-slip", "PFC-free", "no-see-um") is matched whole by the
 * longest-match rule and so is a positive of that label.
 *
 * <p><b>Numbers</b>: spec rows whose key is a number facet's label (compared in spec-key form) are
 * read with {@code Quantities.parse} and converted to the facet's unit with {@code Units.convert};
 * quantities in running text go to a number facet named just before them, or to the only number
 * facet of their dimension (docs/decisions/102).
 *
 * <p>Assignments whose facet does not apply to the listing's category are kept and marked
 * ({@link Assignment#applies()} false) so they can be reported as likely errors.
 */
public final class Labeler {
    private final Vocabulary vocabulary;
    private final Analysis analysis;
    private final Analysis tokens;
    private final LabelOptions options;
    private final LabelTrie trie;

    private final String[] conceptIds;
    private final String[] conceptFacet;
    private final FacetProperties[][] conceptFacetProps;
    /** Per concept, the category keys where one of its facets applies; null when one applies everywhere. */
    private final java.util.Set<String>[] conceptCategoryKeys;
    private final boolean[] conceptReview;

    private final NumberFacet[] numberFacets;
    private final SpecKeyMatcher specKeyFacet;
    private final Map<Dimension, int[]> dimensionFacets;

    private final IntOpenHashSet negationIds = new IntOpenHashSet();
    private final IntOpenHashSet breakerIds = new IntOpenHashSet();
    private final IntOpenHashSet exceptionIds = new IntOpenHashSet();
    /** Per term id, which of the three sets above it is in ({@link #NEGATION}, {@link #BREAKER}, {@link #EXCEPTION}). */
    private final byte[] wordRoles;
    private static final byte NEGATION = 1;
    private static final byte BREAKER = 2;
    private static final byte EXCEPTION = 4;
    private final Set<String> negationWords;
    private final int longestNegationWord;
    /** The longest of the whole values {@code valueState} compares with ("unknown"). */
    private static final int LONGEST_FIXED_VALUE = 7;
    private final int nonId;
    private final int freeId;
    private final int lessId;
    private final int ofId;
    private final int fromId;
    private final int wId;
    private final int oId;

    private final List<String> notes = new ArrayList<>();
    private final int labelsCompiled;
    private final ThreadLocal<Worker> workers;

    private Labeler(Vocabulary vocabulary, Analysis analysis, LabelOptions options) {
        this.vocabulary = Objects.requireNonNull(vocabulary, "vocabulary");
        this.analysis = Objects.requireNonNull(analysis, "analysis");
        this.options = Objects.requireNonNull(options, "options");
        this.tokens = Analysis.of(labelingProfile(analysis.profile()));
        Segmenter compileSegmenter = tokens.newSegmenter();

        for (String w : analysis.profile().negationWords()) {
            negationIds.add(wordId(compileSegmenter, w, "negation word"));
            if (w.indexOf('\'') >= 0) {
                negationIds.add(wordId(compileSegmenter, w.replace('\'', '\u2019'), "negation word"));
            }
        }
        this.negationWords = analysis.profile().negationWords();
        this.longestNegationWord = negationWords.stream().mapToInt(String::length).max().orElse(0);
        for (String w : options.scopeBreakers()) {
            breakerIds.add(wordId(compileSegmenter, w, "scope breaker"));
        }
        for (String w : options.cueExceptions()) {
            exceptionIds.add(wordId(compileSegmenter, w, "cue exception"));
        }
        this.wordRoles = wordRoles();
        nonId = wordId(compileSegmenter, "non", "affix");
        freeId = wordId(compileSegmenter, "free", "affix");
        lessId = wordId(compileSegmenter, "less", "affix");
        ofId = wordId(compileSegmenter, "of", "affix");
        fromId = wordId(compileSegmenter, "from", "affix");
        wId = wordId(compileSegmenter, "w", "affix");
        oId = wordId(compileSegmenter, "o", "affix");

        // concepts that can be assigned: every value, and yes/no facets (their own labels are the value)
        List<Concept> assignable = new ArrayList<>();
        for (Concept c : vocabulary.allConcepts()) {
            if (!c.isFacet() || c.facet().valueKind() == ValueKind.YES_NO) {
                assignable.add(c);
            }
        }
        int n = assignable.size();
        conceptIds = new String[n];
        conceptFacet = new String[n];
        conceptFacetProps = new FacetProperties[n][];
        @SuppressWarnings("unchecked")
        java.util.Set<String>[] categoryKeys = new java.util.Set[n];
        conceptCategoryKeys = categoryKeys;
        conceptReview = new boolean[n];
        LabelTrie.Builder tb = LabelTrie.builder();
        int compiled = 0;
        for (int i = 0; i < n; i++) {
            Concept c = assignable.get(i);
            conceptIds[i] = c.id();
            List<Concept> facets = vocabulary.facetsOf(c.id());
            conceptFacet[i] = facets.isEmpty() ? null : facets.get(0).id();
            conceptFacetProps[i] = new FacetProperties[facets.size()];
            java.util.Set<String> catKeys = facets.isEmpty() ? null : new java.util.HashSet<>();
            for (int k = 0; k < facets.size(); k++) {
                FacetProperties p = facets.get(k).facet();
                conceptFacetProps[i][k] = p;
                conceptReview[i] |= p.regulatedClaim();
                if (p.categories().isEmpty()) {
                    catKeys = null;
                } else if (catKeys != null) {
                    for (String x : p.categories()) {
                        catKeys.add(categoryKey(x));
                    }
                }
            }
            conceptCategoryKeys[i] = catKeys;
            for (ConceptLabel l : c.labels()) {
                int[] path = labelPath(compileSegmenter, c.id(), l);
                if (path != null) {
                    tb.add(path, (i << 2) | l.kind().ordinal());
                    compiled++;
                }
            }
        }

        // number facets: their labels are cues in running text and keys in spec tables
        List<NumberFacet> nfs = new ArrayList<>();
        SpecKeyMatcher keys = new SpecKeyMatcher();
        Map<Dimension, List<Integer>> byDim = new EnumMap<>(Dimension.class);
        for (Concept f : vocabulary.facets()) {
            if (f.facet().valueKind() != ValueKind.NUMBER) {
                continue;
            }
            int idx = nfs.size();
            Dimension dim = null;
            String unit = f.facet().unit();
            if (unit != null) {
                dim = Units.dimensionOf(unit).orElse(null);
                if (dim == null) {
                    notes.add("facet " + f.id() + " has unit \"" + unit + "\", which Sheaf cannot convert to; its values are read "
                            + "as written (quantities in exactly that unit, or a lone number in a spec value); known units are "
                            + "kg, g, lb, oz, m, cm, mm, in, L, mL, fl oz, gal, °C, °F, mm H2O, FP, lm, h, min, D, person, season");
                } else {
                    noteUnitReadOtherwise(f, unit, dim);
                }
            }
            nfs.add(new NumberFacet(f.id(), f.facet(), dim));
            if (dim != null) {
                byDim.computeIfAbsent(dim, k -> new ArrayList<>()).add(idx);
            }
            for (ConceptLabel l : f.labels()) {
                int[] path = labelPath(compileSegmenter, f.id(), l);
                if (path != null) {
                    tb.add(path, -(idx + 1));
                    compiled++;
                }
                keys.add(l.text(), idx);
            }
        }
        this.numberFacets = nfs.toArray(new NumberFacet[0]);
        this.specKeyFacet = keys;
        Map<Dimension, int[]> dims = new EnumMap<>(Dimension.class);
        byDim.forEach((d, l) -> dims.put(d, l.stream().mapToInt(Integer::intValue).toArray()));
        this.dimensionFacets = Collections.unmodifiableMap(dims);
        this.trie = tb.build();
        this.labelsCompiled = compiled;
        this.workers = ThreadLocal.withInitial(Worker::new);
    }

    /**
     * A note when a spec value in the facet's own unit, under one of the facet's labels as key, is
     * read as another dimension than the unit's: "Waterproof rating: 1000 mm" is a water column
     * (mm H2O, decision 062), so a waterproof facet in "mm" (a length) could take none of its values.
     */
    private void noteUnitReadOtherwise(Concept facet, String unit, Dimension dim) {
        for (ConceptLabel l : facet.labels()) {
            java.util.Optional<dev.sheaf.miner.text.Quantity> q = dev.sheaf.miner.text.Quantities.parse(l.text(), "1000 " + unit);
            if (q.isPresent() && q.get().dimension() != dim) {
                notes.add("facet " + facet.id() + " has unit \"" + unit + "\", a " + word(dim) + ", but under its label \""
                        + l.text() + "\" a value such as \"1000 " + unit + "\" is read as a " + word(q.get().dimension())
                        + " (" + q.get().unit() + "): such values cannot be converted to the facet's unit and are reported "
                        + "as unreadable; give the facet the unit \"" + q.get().unit() + "\"");
                return;
            }
        }
    }

    private byte[] wordRoles() {
        int max = -1;
        for (IntOpenHashSet set : List.of(negationIds, breakerIds, exceptionIds)) {
            for (int id : set) {
                max = Math.max(max, id);
            }
        }
        byte[] roles = new byte[max + 1];
        negationIds.forEach((int id) -> roles[id] |= NEGATION);
        breakerIds.forEach((int id) -> roles[id] |= BREAKER);
        exceptionIds.forEach((int id) -> roles[id] |= EXCEPTION);
        return roles;
    }

    /** Whether term id {@code t} (a token, or {@link LabelTrie#BREAK}) has the role. */
    private boolean is(int t, byte role) {
        return t >= 0 && t < wordRoles.length && (wordRoles[t] & role) != 0;
    }

    /** A labeler with the default options. */
    public static Labeler of(Vocabulary vocabulary, Analysis analysis) {
        return new Labeler(vocabulary, analysis, LabelOptions.defaults());
    }

    public static Labeler of(Vocabulary vocabulary, Analysis analysis, LabelOptions options) {
        return new Labeler(vocabulary, analysis, options);
    }

    /**
     * The profile labels and listings are tokenized with for matching: the miner's profile with
     * stop words and negation words kept as plain tokens (see the class description).
     */
    static AnalysisProfile labelingProfile(AnalysisProfile p) {
        return p.toBuilder().name(p.name() + "+labeling").stopWords(Set.of()).negationWords(Set.of()).build();
    }

    public Vocabulary vocabulary() {
        return vocabulary;
    }

    /** The miner's analysis this labeler was built from. */
    public Analysis analysis() {
        return analysis;
    }

    public LabelOptions options() {
        return options;
    }

    /** Labels compiled into the matcher (concept labels and number-facet labels). */
    public int labelsCompiled() {
        return labelsCompiled;
    }

    /** Notes from compiling: labels that can never match, ambiguous spec keys, units Sheaf cannot convert. */
    public List<String> notes() {
        return Collections.unmodifiableList(notes);
    }

    /** Labels one listing. Safe to call from several threads at once. */
    public Assignments label(Listing listing) {
        return workers.get().label(Objects.requireNonNull(listing, "listing"));
    }

    private static int wordId(Segmenter s, String word, String what) {
        int[] id = {-1};
        int[] count = {0};
        s.analyze(0, SegmentPart.TEXT, word, (f, p, ids, st, en, len) -> {
            count[0] += len;
            id[0] = ids[0];
        });
        if (count[0] != 1) {
            throw new IllegalArgumentException(what + " \"" + word + "\" must be exactly one token under the analysis profile, "
                    + "but it is " + count[0] + "; list single words");
        }
        return id[0];
    }

    /** The token ids of a label, or null (with a note) when it can never match. */
    private int[] labelPath(Segmenter s, String conceptId, ConceptLabel l) {
        List<int[]> segments = new ArrayList<>(1);
        s.analyze(0, SegmentPart.TEXT, l.text(), (f, p, ids, st, en, len) -> segments.add(java.util.Arrays.copyOf(ids, len)));
        if (segments.isEmpty()) {
            notes.add("label \"" + l.text() + "\" of " + conceptId + " has no words under the analysis profile; it can never match");
            return null;
        }
        if (segments.size() == 1) {
            return segments.get(0);
        }
        // a label with a break character inside ("adj. hd") matches across a break in the text there
        it.unimi.dsi.fastutil.ints.IntArrayList path = new it.unimi.dsi.fastutil.ints.IntArrayList();
        for (int[] seg : segments) {
            if (!path.isEmpty()) {
                path.add(LabelTrie.BREAK);
            }
            path.addAll(it.unimi.dsi.fastutil.ints.IntArrayList.wrap(seg));
        }
        return path.toIntArray();
    }

    /**
     * As {@link #applies(FacetProperties, String)} for any of the concept's facets, with the concept's
     * category keys computed once and the listing's category key ({@link #categoryKey}) given, or null
     * when the listing has no category.
     */
    private boolean appliesToKey(int concept, String listingCategoryKey) {
        java.util.Set<String> keys = conceptCategoryKeys[concept];
        return keys == null || listingCategoryKey == null || keys.contains(listingCategoryKey);
    }

    /**
     * Whether a facet applies to a listing's category. A listing whose source gives no category
     * (the empty string) is unknown, not wrong: every facet applies to it, so it is never reported
     * as a category error and counts as applicable in fill rates.
     */
    public static boolean applies(FacetProperties facet, String category) {
        if (category == null || category.isEmpty() || facet.appliesTo(category)) {
            return true;
        }
        String key = categoryKey(category);
        for (String c : facet.categories()) {
            if (categoryKey(c).equals(key)) {
                return true;
            }
        }
        return false;
    }

    private static final java.util.concurrent.ConcurrentHashMap<String, String> CATEGORY_KEYS = new java.util.concurrent.ConcurrentHashMap<>();

    /**
     * A category name as compared and grouped: lower case (locale-free), every run of other
     * characters than letters and digits one hyphen, "&amp;" read as "and" — so a spec sheet's
     * "Sleeping Bags", a feed's "sleeping-bags" and "sleeping_bags" are one category (107).
     */
    public static String categoryKey(String category) {
        if (category.length() > 200) {
            return key(category);
        }
        return CATEGORY_KEYS.size() < 10_000 ? CATEGORY_KEYS.computeIfAbsent(category, Labeler::key) : key(category);
    }

    private static String key(String category) {
        String s = category.replace("&", " and ").toLowerCase(java.util.Locale.ROOT);
        StringBuilder b = new StringBuilder(s.length());
        for (int i = 0; i < s.length(); i++) {
            char ch = s.charAt(i);
            if (Character.isLetterOrDigit(ch)) {
                b.append(ch);
            } else if (b.length() > 0 && b.charAt(b.length() - 1) != '-') {
                b.append('-');
            }
        }
        if (b.length() > 0 && b.charAt(b.length() - 1) == '-') {
            b.setLength(b.length() - 1);
        }
        return b.toString();
    }

    /** A number facet as the labeler needs it. */
    private static final class NumberFacet {
        final String id;
        final FacetProperties props;
        final Dimension dimension;

        NumberFacet(String id, FacetProperties props, Dimension dimension) {
            this.id = id;
            this.props = props;
            this.dimension = dimension;
        }
    }

    /** What a spec value says about the concept its key names. */
    private enum KeyState { POSITIVE, NEGATIVE, UNKNOWN }

    /** One thread's buffers and the per-listing scratch state. */
    private final class Worker implements dev.sheaf.miner.text.SegmentSink {
        private final Segmenter segmenter = tokens.newSegmenter();
        private final LabelMatches matches = new LabelMatches();
        private final NumberReader numbers = new NumberReader();
        private boolean[] matched = new boolean[64];

        private Listing listing;
        private Field field;
        private int bufField = -1;
        private SegmentPart bufPart;
        private int[] bIds = new int[256];
        private int[] bStarts = new int[256];
        private int[] bEnds = new int[256];
        private int bn;
        private KeyState keyState;
        private String keyCue;
        /** The spec field whose value {@link #keyState} describes; read only when a label matches in a key. */
        private int keyStateField;
        /** The listing's {@link #categoryKey}, or null when it has no category. */
        private String categoryKey;

        Assignments label(Listing l) {
            listing = l;
            keyStateField = -1;
            String category = l.category();
            categoryKey = category == null || category.isEmpty() ? null : categoryKey(category);
            matches.clear();
            numbers.clear();
            // one token stream for the whole listing; segments arrive per field and part, in order
            bufField = -1;
            bn = 0;
            segmenter.analyze(l, this);
            flush();
            List<Field> fields = l.fields();
            for (int fi = 0; fi < fields.size(); fi++) {
                Field f = fields.get(fi);
                if (f.kind() == FieldKind.SPEC) {
                    int[] nfs = numberFacets.length == 0 ? NO_FACETS : specKeyFacet.facetsOf(f.key());
                    if (nfs.length > 0) {
                        numbers.spec(nfs, fi, f, l.category());
                    } else {
                        numbers.text(fi, f, SegmentPart.SPEC_VALUE, f.text(), false, l.category());
                    }
                } else {
                    numbers.text(fi, f, SegmentPart.TEXT, f.text(), true, l.category());
                }
            }
            List<Assignment> out = matches.assignments(l, categoryKey);
            numbers.assignments(l, out);
            out.sort(ASSIGNMENT_ORDER);
            Assignments result = new Assignments(l.id(), l.category(), l.source(), l.locator(), out, numbers.invalid());
            listing = null;
            field = null;
            return result;
        }

        /**
         * What a spec value says about the concept its key names: negative only when the whole
         * value is a denial ("No", "None.", "Not included", "No hood" under "Hood") — a longer
         * value is a statement of its own ("Vegan: no animal-derived materials") and is matched
         * like any text; unknown for "-", "n/a", "?".
         */
        private void valueState(String key, String value) {
            if (plainStatement(value.strip())) {
                keyCue = null;
                keyState = KeyState.POSITIVE;
                return;
            }
            String v = value.strip().toLowerCase(Locale.ROOT);
            while (!v.isEmpty() && ".!;,".indexOf(v.charAt(v.length() - 1)) >= 0) {
                v = v.substring(0, v.length() - 1).strip();
            }
            keyCue = null;
            if (v.isEmpty() || v.equals("-") || v.equals("n/a") || v.equals("na") || v.equals("?") || v.equals("\u2014")
                    || v.equals("\u2013") || v.equals("unknown")) {
                keyState = KeyState.UNKNOWN;
                return;
            }
            // the first word, up to white space or , ; / (one word alone, or the word before "included",
            // "available" or the key itself, is a denial); a value of separators only says nothing
            int cut = 0;
            while (cut < v.length() && !valueSeparator(v.charAt(cut))) {
                cut++;
            }
            int more = cut;
            while (more < v.length() && valueSeparator(v.charAt(more))) {
                more++;
            }
            if (cut == 0 && more == v.length()) {
                keyState = KeyState.UNKNOWN;
                return;
            }
            String first = v.substring(0, cut);
            String rest = v.substring(cut).strip();
            boolean denial = cut > 0 && negationWords.contains(first) && (more == v.length() || rest.equals("included")
                    || rest.equals("available") || rest.equals(key.strip().toLowerCase(Locale.ROOT)));
            if (denial || v.equals("false") || v.equals("n") || v.equals("0") || v.equals("\u2717") || v.equals("\u2718")) {
                keyState = KeyState.NEGATIVE;
                keyCue = value.strip();
                return;
            }
            keyState = KeyState.POSITIVE;
        }

        /**
         * The common case of {@link #valueState} without lower-casing the value: longer than every
         * fixed word it is compared with once trailing punctuation and space are dropped (as there),
         * and its first word is
         * no negation word (lower case never shortens a text, so a first word longer than every
         * negation word is none).
         */
        private boolean plainStatement(String s) {
            int end = s.length();
            while (end > 0 && (".!;,".indexOf(s.charAt(end - 1)) >= 0 || Character.isWhitespace(s.charAt(end - 1)))) {
                end--;
            }
            if (end <= LONGEST_FIXED_VALUE) {
                return false;
            }
            int cut = 0;
            while (cut < end && !valueSeparator(s.charAt(cut))) {
                cut++;
            }
            return cut > 0 && (cut > longestNegationWord || !negationWords.contains(s.substring(0, cut).toLowerCase(Locale.ROOT)));
        }

        /**
         * Collects the segments of one field text into one token sequence with {@link LabelTrie#BREAK}
         * between them, so a label holding a break character can match across one; everything
         * else treats a BREAK as the end of a clause.
         */
        @Override
        public void segment(int fi, SegmentPart part, int[] ids, int[] starts, int[] ends, int n) {
            if (fi != bufField || part != bufPart) {
                flush();
                bufField = fi;
                bufPart = part;
            }
            int need = bn + n + 1;
            if (need > bIds.length) {
                int cap = Math.max(need, bIds.length * 2);
                bIds = java.util.Arrays.copyOf(bIds, cap);
                bStarts = java.util.Arrays.copyOf(bStarts, cap);
                bEnds = java.util.Arrays.copyOf(bEnds, cap);
            }
            if (bn > 0) {
                bIds[bn] = LabelTrie.BREAK;
                bStarts[bn] = bEnds[bn - 1];
                bEnds[bn] = starts[0];
                bn++;
            }
            System.arraycopy(ids, 0, bIds, bn, n);
            System.arraycopy(starts, 0, bStarts, bn, n);
            System.arraycopy(ends, 0, bEnds, bn, n);
            bn += n;
        }

        private void flush() {
            if (bn > 0) {
                match(bufField, bufPart, bIds, bStarts, bEnds, bn);
                bn = 0;
            }
        }

        private void match(int fi, SegmentPart part, int[] ids, int[] starts, int[] ends, int n) {
            field = listing.fields().get(fi);
            String text = part == SegmentPart.SPEC_KEY ? field.key() : field.text();
            if (matched.length < n) {
                matched = new boolean[Math.max(n, matched.length * 2)];
            }
            java.util.Arrays.fill(matched, 0, n, false);
            int i = 0;
            while (i < n) {
                long r = trie.longest(ids, i, n);
                if (r < 0) {
                    i++;
                    continue;
                }
                int end = (int) (r >>> 32);
                int[] entries = trie.entries((int) r);
                int startChar = starts[i];
                int endChar = ends[end - 1];
                if (entries[entries.length - 1] >= 0) {
                    Polarity pol;
                    String cue;
                    boolean skip = false;
                    if (part == SegmentPart.SPEC_KEY) {
                        if (keyStateField != fi) {
                            valueState(field.key(), field.text());
                            keyStateField = fi;
                        }
                        skip = keyState == KeyState.UNKNOWN;
                        pol = keyState == KeyState.NEGATIVE ? Polarity.NEGATED : Polarity.STATED;
                        cue = pol == Polarity.NEGATED ? keyCue : null;
                    } else {
                        cue = options.negation() ? negationCue(text, ids, starts, ends, n, i, end) : null;
                        pol = cue == null ? Polarity.STATED : Polarity.NEGATED;
                    }
                    if (!skip) {
                        for (int e : entries) {
                            if (e >= 0) {
                                matches.add(e >>> 2, e & 3, fi, part, startChar, endChar, pol, cue);
                            }
                        }
                    }
                }
                for (int e : entries) {
                    if (e < 0) {
                        numbers.cue(-e - 1, fi, part, endChar);
                    }
                }
                for (int k = i; k < end; k++) {
                    matched[k] = true;
                }
                i = end;
            }
        }

        /** The words that negate the match at tokens [i, end), or null when it is stated. */
        private String negationCue(String text, int[] ids, int[] starts, int[] ends, int n, int i, int end) {
            if (options.affixNegation()) {
                if (i > 0 && ids[i - 1] == nonId && !matched[i - 1] && joined(text, ends[i - 1], starts[i], true)) {
                    return text.substring(starts[i - 1], starts[i]);
                }
                if (end < n && ids[end] == freeId && joined(text, ends[end - 1], starts[end], true)) {
                    return text.substring(ends[end - 1], ends[end]);
                }
                if (end < n && ids[end] == lessId && joined(text, ends[end - 1], starts[end], false)) {
                    return text.substring(ends[end - 1], ends[end]);
                }
            }
            int stop = Math.max(0, i - 1 - options.negationWindow());
            for (int k = i - 1; k >= stop; k--) {
                if (matched[k]) {
                    continue;
                }
                int t = ids[k];
                if (t == LabelTrie.BREAK || is(t, BREAKER)) {
                    return null;
                }
                if (t == oId && k > 0 && ids[k - 1] == wId && slash(text, ends[k - 1], starts[k])) {
                    return text.substring(starts[k - 1], ends[k]); // "w/o": without
                }
                if (is(t, NEGATION)) {
                    if (k + 1 < n && hyphen(text, ends[k], starts[k + 1])) {
                        continue; // "no-see-um", "no-iron": a compound word, not a negation of what follows
                    }
                    if (k + 1 < i && is(ids[k + 1], EXCEPTION)) {
                        return null; // "not only waterproof"
                    }
                    return text.substring(starts[k], ends[k]);
                }
                if (t == freeId && k + 1 < i && (ids[k + 1] == ofId || ids[k + 1] == fromId)) {
                    return text.substring(starts[k], ends[k + 1]); // "free of PFCs"
                }
            }
            return null;
        }
    }

    /** Text between two tokens is a hyphen (or, when {@code spaceToo}, only white space). */
    private static boolean joined(String text, int from, int to, boolean spaceToo) {
        if (hyphen(text, from, to)) {
            return true;
        }
        if (!spaceToo || to <= from) {
            return false;
        }
        for (int k = from; k < to; k++) {
            if (!Character.isWhitespace(text.charAt(k)) && !Character.isSpaceChar(text.charAt(k))) {
                return false;
            }
        }
        return true;
    }

    private static boolean slash(String text, int from, int to) {
        return to - from == 1 && text.charAt(from) == '/';
    }

    /** What separates the words of a spec value when reading a denial: white space (regex \\s), comma, semicolon, slash. */
    private static boolean valueSeparator(char c) {
        return c == ' ' || c == '\t' || c == '\n' || c == '\u000B' || c == '\f' || c == '\r' || c == ',' || c == ';' || c == '/';
    }

    private static boolean hyphen(String text, int from, int to) {
        if (to - from != 1) {
            return false;
        }
        char c = text.charAt(from);
        return c == '-' || c == '\u2010' || c == '\u2011';
    }

    /** By concept id, then (numbers of one facet) by value; a term, which has no value, first. */
    private static final java.util.Comparator<Assignment> ASSIGNMENT_ORDER = (a, b) -> {
        int c = a.conceptId().compareTo(b.conceptId());
        if (c != 0) {
            return c;
        }
        return Double.compare(a.value() == null ? Double.NEGATIVE_INFINITY : a.value(),
                b.value() == null ? Double.NEGATIVE_INFINITY : b.value());
    };

    private static final LabelKind[] LABEL_KINDS = LabelKind.values();
    private static final SegmentPart[] PARTS = SegmentPart.values();

    /**
     * The concept occurrences of one listing, grouped into assignments. Occurrences are kept as
     * primitive columns and become {@link Evidence} only when the listing's assignments are built;
     * they arrive in text order (field, then part, then offset), so sorting them by concept with the
     * arrival number as tie-break gives each concept its evidence in text order.
     */
    private final class LabelMatches {
        private long[] order = new long[64]; // concept << 32 | arrival
        private int[] fieldOf = new int[64];
        private int[] startOf = new int[64];
        private int[] endOf = new int[64];
        private byte[] partOf = new byte[64];
        private byte[] kindOf = new byte[64];
        private String[] cueOf = new String[64]; // null: stated
        private int n;

        void clear() {
            java.util.Arrays.fill(cueOf, 0, n, null);
            n = 0;
        }

        void add(int concept, int kind, int fi, SegmentPart part, int start, int end, Polarity pol, String cue) {
            if (n == order.length) {
                int cap = n * 2;
                order = java.util.Arrays.copyOf(order, cap);
                fieldOf = java.util.Arrays.copyOf(fieldOf, cap);
                startOf = java.util.Arrays.copyOf(startOf, cap);
                endOf = java.util.Arrays.copyOf(endOf, cap);
                partOf = java.util.Arrays.copyOf(partOf, cap);
                kindOf = java.util.Arrays.copyOf(kindOf, cap);
                cueOf = java.util.Arrays.copyOf(cueOf, cap);
            }
            if ((pol == Polarity.NEGATED) != (cue != null)) {
                throw new IllegalStateException("a negated occurrence needs its cue and a stated one none");
            }
            order[n] = ((long) concept << 32) | n;
            fieldOf[n] = fi;
            startOf[n] = start;
            endOf[n] = end;
            partOf[n] = (byte) part.ordinal();
            kindOf[n] = (byte) kind;
            cueOf[n] = cue;
            n++;
        }

        List<Assignment> assignments(Listing l, String listingCategoryKey) {
            List<Assignment> out = new ArrayList<>();
            if (n == 0) {
                return out;
            }
            java.util.Arrays.sort(order, 0, n);
            List<Field> fields = l.fields();
            int i = 0;
            while (i < n) {
                int c = (int) (order[i] >>> 32);
                int j = i;
                while (j < n && (int) (order[j] >>> 32) == c) {
                    j++;
                }
                boolean stated = false;
                Evidence[] ev = new Evidence[j - i];
                for (int k = i; k < j; k++) {
                    int o = (int) order[k];
                    Field f = fields.get(fieldOf[o]);
                    SegmentPart part = PARTS[partOf[o]];
                    String text = part == SegmentPart.SPEC_KEY ? f.key() : f.text();
                    String cue = cueOf[o];
                    Polarity pol = cue == null ? Polarity.STATED : Polarity.NEGATED;
                    ev[k - i] = new Evidence(fieldOf[o], f.kind(), f.key(), part, startOf[o], endOf[o],
                            text.substring(startOf[o], endOf[o]), LABEL_KINDS[kindOf[o]], pol, cue);
                    stated |= cue == null;
                }
                out.add(Assignment.term(conceptIds[c], conceptFacet[c], stated ? Polarity.STATED : Polarity.NEGATED,
                        ev.length == 1 ? List.of(ev[0]) : List.of(ev), appliesToKey(c, listingCategoryKey), conceptReview[c]));
                i = j;
            }
            return out;
        }
    }

    /** Numbers of one listing: spec values of number facets and cued quantities in text. */
    private final class NumberReader {
        private final List<int[]> cues = new ArrayList<>(); // facet, field, part, end char
        private final List<NumberValue> values = new ArrayList<>();
        private final List<InvalidValue> invalid = new ArrayList<>();
        private final Map<Conversion, Double> conversions = new java.util.HashMap<>();

        void clear() {
            cues.clear();
            values.clear();
            invalid.clear();
        }

        List<InvalidValue> invalid() {
            return invalid.isEmpty() ? List.of() : List.copyOf(invalid);
        }

        void cue(int facet, int fi, SegmentPart part, int endChar) {
            cues.add(new int[] {facet, fi, part.ordinal(), endChar});
        }

        /**
         * A spec row whose key is a number facet's label. When the key names several facets, the
         * first one whose dimension the value measures (and which applies to the category) wins.
         * The value is read strictly first ({@code Quantities.parse}: one quantity, perhaps restated
         * in other units); failing that, the quantities in it are taken — the first one, plus any
         * later one in the same unit with another number ("Fly 2,000 mm / floor 6,000 mm": two
         * values), while a later one in another unit is a restatement ("350 g (12.4 oz) per shoe");
         * a facet whose unit Sheaf does not know takes a lone number ("R 6.2", "50+").
         */
        void spec(int[] candidates, int fi, Field f, String category) {
            String value = f.text();
            if (value.isBlank()) {
                return;
            }
            java.util.Optional<dev.sheaf.miner.text.Quantity> strict = dev.sheaf.miner.text.Quantities.parse(f.key(), value);
            List<dev.sheaf.miner.text.Quantity> found = strict.isPresent() ? List.of(strict.get())
                    : dev.sheaf.miner.text.Quantities.find(value);
            int nf = pick(candidates, found, category);
            NumberFacet facet = numberFacets[nf];
            List<dev.sheaf.miner.text.Quantity> usable = new ArrayList<>();
            for (dev.sheaf.miner.text.Quantity q : found) {
                if (facet.dimension == null ? facet.props.unit() == null || q.unit().equalsIgnoreCase(facet.props.unit())
                        : q.dimension() == facet.dimension) {
                    usable.add(q);
                }
            }
            if (!usable.isEmpty()) {
                String firstUnit = usable.get(0).unit();
                for (dev.sheaf.miner.text.Quantity q : usable) {
                    if (q == usable.get(0) || q.unit().equals(firstUnit)) {
                        add(nf, q.value(), q.valueMax(), q.unit(), new Evidence(fi, f.kind(), f.key(), SegmentPart.SPEC_VALUE,
                                q.start(), q.end(), q.surface(), null, Polarity.STATED, null), fi, f, value);
                    }
                }
                return;
            }
            String plain = value.strip();
            String unit = SpecKeyForms.unitSuffix(f.key());
            if (PLAIN_NUMBER.matcher(plain).matches() && (unit != null || facet.dimension == null)) {
                int start = value.indexOf(plain);
                double v = Double.parseDouble(plain.replace(",", ""));
                add(nf, v, v, unit != null ? unit : facet.props.unit(), new Evidence(fi, f.kind(), f.key(), SegmentPart.SPEC_VALUE,
                        start, start + plain.length(), plain, null, Polarity.STATED, null), fi, f, value);
                return;
            }
            if (facet.dimension == null && found.isEmpty()) {
                java.util.regex.Matcher m = NUMBER_IN_TEXT.matcher(value);
                if (m.find()) {
                    int start = m.start();
                    int end = m.end();
                    if (!m.find()) {
                        double v = Double.parseDouble(value.substring(start, end).replace(",", ""));
                        add(nf, v, v, facet.props.unit(), new Evidence(fi, f.kind(), f.key(), SegmentPart.SPEC_VALUE, start, end,
                                value.substring(start, end), null, Polarity.STATED, null), fi, f, value);
                        return;
                    }
                }
            }
            String reason;
            if (!found.isEmpty() && facet.dimension != null) {
                reason = "expected a " + word(facet.dimension) + " in " + facet.props.unit() + ", found a "
                        + word(found.get(0).dimension()) + " (\"" + found.get(0).surface() + "\")";
            } else {
                reason = "expected " + (facet.props.unit() == null ? "a number" : "a number with a unit, such as \"1.2 "
                        + facet.props.unit() + "\"") + ", found \"" + value.strip() + "\"";
            }
            invalid.add(new InvalidValue(facet.id, fi, f.key(), value, reason));
        }

        /** The candidate facet whose dimension the value measures and which applies, else the first. */
        private int pick(int[] candidates, List<dev.sheaf.miner.text.Quantity> found, String category) {
            if (candidates.length == 1) {
                return candidates[0];
            }
            for (dev.sheaf.miner.text.Quantity q : found) {
                for (int c : candidates) {
                    if (numberFacets[c].dimension == q.dimension() && applies(numberFacets[c].props, category)) {
                        return c;
                    }
                }
            }
            for (int c : candidates) {
                if (applies(numberFacets[c].props, category)) {
                    return c;
                }
            }
            return candidates[0];
        }

        /**
         * Quantities in running text, or in a spec value whose key names no number facet; there the
         * key says what the number is ("Packed weight: 3 kg" is not the weight), so only a facet label
         * inside the value links it, never the dimension alone.
         */
        void text(int fi, Field f, SegmentPart part, String text, boolean byDimension, String category) {
            if (numberFacets.length == 0 || !hasDigit(text)
                    || !(byDimension && options.quantityByDimension() && !dimensionFacets.isEmpty()) && !hasCue(fi, part)) {
                return; // no quantity here could go to a facet: neither a cue before it nor its dimension alone
            }
            for (dev.sheaf.miner.text.Quantity q : dev.sheaf.miner.text.Quantities.find(text)) {
                int nf = cuedFacet(fi, part, text, q);
                if (nf < 0 && byDimension && options.quantityByDimension()) {
                    nf = onlyFacetOf(q.dimension(), category);
                }
                if (nf < 0) {
                    continue;
                }
                add(nf, q.value(), q.valueMax(), q.unit(), new Evidence(fi, f.kind(), f.key(), part, q.start(), q.end(),
                        q.surface(), null, Polarity.STATED, null), fi, f, null);
            }
        }

        /** The one number facet of this dimension that applies to the category, or -1 (none, or several). */
        private int onlyFacetOf(Dimension d, String category) {
            int[] fs = dimensionFacets.get(d);
            if (fs == null) {
                return -1;
            }
            int found = -1;
            for (int f : fs) {
                if (applies(numberFacets[f].props, category)) {
                    if (found >= 0) {
                        return -1;
                    }
                    found = f;
                }
            }
            return found;
        }

        private boolean hasCue(int fi, SegmentPart part) {
            for (int[] c : cues) {
                if (c[1] == fi && c[2] == part.ordinal()) {
                    return true;
                }
            }
            return false;
        }

        private int cuedFacet(int fi, SegmentPart part, String text, dev.sheaf.miner.text.Quantity q) {
            for (int k = cues.size() - 1; k >= 0; k--) {
                int[] c = cues.get(k);
                if (c[1] != fi || c[2] != part.ordinal() || c[3] > q.start()) {
                    continue;
                }
                if (!closeBefore(text, c[3], q.start())) {
                    return -1;
                }
                NumberFacet facet = numberFacets[c[0]];
                if (facet.dimension == null || facet.dimension == q.dimension()) {
                    return c[0];
                }
            }
            return -1;
        }

        /** At most quantityWindow words and no sentence end between a cue and a quantity. */
        private boolean closeBefore(String text, int from, int to) {
            int words = 0;
            boolean inWord = false;
            for (int k = from; k < to; k++) {
                char ch = text.charAt(k);
                if (Character.isLetterOrDigit(ch)) {
                    if (!inWord) {
                        words++;
                        inWord = true;
                    }
                } else {
                    inWord = false;
                    if (ch == '!' || ch == '?' || ch == ';' || ch == '\n' || ch == '\r'
                            || ch == '.' && !(k > from && k + 1 < to && Character.isDigit(text.charAt(k - 1))
                            && Character.isDigit(text.charAt(k + 1)))) {
                        if (ch != '.' || !abbreviationDot(text, from, k)) {
                            return false;
                        }
                    }
                }
            }
            return words <= options.quantityWindow();
        }

        private void add(int nf, double value, double valueMax, String unit, Evidence ev, int fi, Field f, String specValue) {
            NumberFacet facet = numberFacets[nf];
            double v = value;
            double vmax = valueMax;
            String u = unit;
            String target = facet.props.unit();
            if (target != null && u != null && !u.equalsIgnoreCase(target)) {
                if (facet.dimension == null) {
                    if (specValue != null) {
                        invalid.add(new InvalidValue(facet.id, fi, f.key(), specValue, "facet " + facet.id + " is in \"" + target
                                + "\", which Sheaf cannot convert to, and the value is in " + u));
                    }
                    return;
                }
                v = convert(value, u, target);
                vmax = valueMax == value ? v : convert(valueMax, u, target);
                u = target;
            } else if (target != null) {
                u = target;
            }
            for (NumberValue nv : values) {
                if (nv.facet == nf && same(nv.value, v) && same(nv.valueMax, vmax)) {
                    nv.evidence.add(ev);
                    return;
                }
            }
            values.add(new NumberValue(nf, v, vmax, u, ev));
        }

        /** {@link Units#convert}, remembered: a catalog repeats the same few values and units. */
        private double convert(double value, String from, String to) {
            Conversion key = new Conversion(value, from, to);
            Double hit = conversions.get(key);
            if (hit != null) {
                return hit;
            }
            double v = Units.convert(value, from, to);
            if (conversions.size() >= CONVERSION_CACHE) {
                conversions.clear();
            }
            conversions.put(key, v);
            return v;
        }

        private boolean same(double a, double b) {
            double scale = Math.max(Math.abs(a), Math.abs(b));
            return a == b || Math.abs(a - b) <= options.sameValueTolerance() * scale;
        }

        void assignments(Listing l, List<Assignment> out) {
            for (NumberValue nv : values) {
                NumberFacet facet = numberFacets[nv.facet];
                double mid = (nv.value + nv.valueMax) / 2;
                String bucket = facet.props.bucketFor(mid).map(dev.sheaf.vocab.Bucket::label).orElse(null);
                nv.evidence.sort(java.util.Comparator.comparingInt(Evidence::field).thenComparingInt(e -> e.part().ordinal())
                        .thenComparingInt(Evidence::start));
                out.add(new Assignment(facet.id, facet.id, Polarity.STATED, nv.evidence, nv.value, nv.valueMax, nv.unit, bucket,
                        applies(facet.props, l.category()), facet.props.regulatedClaim()));
            }
        }
    }

    private static boolean abbreviationDot(String text, int from, int dot) {
        // "approx. 1.2 kg", "ca. 40 L": a dot right after a short lower-case word is an abbreviation, not a sentence end
        int k = dot - 1;
        while (k >= from && Character.isLetter(text.charAt(k))) {
            k--;
        }
        String w = text.substring(k + 1, dot).toLowerCase(Locale.ROOT);
        return w.equals("approx") || w.equals("ca") || w.equals("appr") || w.equals("est");
    }

    private static boolean hasDigit(String s) {
        for (int i = 0; i < s.length(); i++) {
            char c = s.charAt(i);
            if (c >= '0' && c <= '9' || c >= '\u00bc' && c <= '\u00be' || c >= '\u2150' && c <= '\u215e') {
                return true;
            }
        }
        return false;
    }

    private static String word(Dimension d) {
        return d.name().toLowerCase(Locale.ROOT).replace('_', ' ');
    }

    private static final int[] NO_FACETS = new int[0];

    /** Conversions a worker remembers before it starts afresh. */
    private static final int CONVERSION_CACHE = 4096;

    private record Conversion(double value, String from, String to) {
    }

    /** A number in running text: digits with optional thousands commas and a decimal part. */
    private static final java.util.regex.Pattern NUMBER_IN_TEXT = java.util.regex.Pattern.compile(
            "(?<![0-9.,])[0-9]{1,3}(,[0-9]{3})+(\\.[0-9]+)?(?![0-9])|(?<![0-9.,])[0-9]+(\\.[0-9]+)?(?![0-9])");

    private static final java.util.regex.Pattern PLAIN_NUMBER = java.util.regex.Pattern.compile("[0-9]{1,3}(,[0-9]{3})+(\\.[0-9]+)?|[0-9]+(\\.[0-9]+)?");

    private static final class NumberValue {
        final int facet;
        final double value;
        final double valueMax;
        final String unit;
        final List<Evidence> evidence = new ArrayList<>(2);

        NumberValue(int facet, double value, double valueMax, String unit, Evidence first) {
            this.facet = facet;
            this.value = value;
            this.valueMax = valueMax;
            this.unit = unit;
            evidence.add(first);
        }
    }

    /** Ids of every concept the labeler can assign, in vocabulary order (values and yes/no facets). */
    public List<String> assignableConcepts() {
        return List.of(conceptIds);
    }

    /** Ids of the number facets. */
    public List<String> numberFacets() {
        List<String> out = new ArrayList<>();
        for (NumberFacet f : numberFacets) {
            out.add(f.id);
        }
        return out;
    }

}
