package dev.sheaf.miner.mine;

import dev.sheaf.miner.text.Dimension;
import dev.sheaf.miner.text.Quantities;
import dev.sheaf.miner.text.Quantity;
import dev.sheaf.miner.text.Units;
import java.text.Normalizer;
import java.util.ArrayList;
import java.util.Collection;
import java.util.Comparator;
import java.util.EnumMap;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;
import java.util.Set;

/**
 * Normalises raw spec keys and clusters them into facet candidates (docs/decisions/063-spec-key-clusters.md).
 *
 * <p><b>Normalising</b> ({@link #normalise}): Unicode NFKC, lower case with {@link Locale#ROOT}, a trailing
 * colon and a trailing unit suffix dropped ("WEIGHT (kg)", "Capacity [L]", "Weight, g", "Weight in grams"),
 * underscores and hyphens read as spaces, abbreviation dots dropped, spaces collapsed, and the catalog
 * abbreviations of {@link #ABBREVIATIONS} expanded ("Wt." → "weight", "Vol." → "volume").
 *
 * <p><b>Clustering</b> ({@link #cluster}): two keys fall in one cluster when, after normalising, they
 * agree once (1) modifiers that do not change the facet are dropped ({@link #NEUTRAL_MODIFIERS}: "item
 * weight" ≡ "weight", "main material" ≡ "material"), (2) words are reduced to their {@link VariantKey}
 * (plurals, case, hyphens), and (3) US/UK spellings are unified ({@link #SPELLINGS}: colour ≡ color).
 * Every other modifier keeps a key apart: "packed weight" and "trail weight" are facets of their own,
 * not "weight" (a shop lists both for one tent). (4) One-word keys in a {@link #SYNONYMS} set merge
 * (capacity ≡ volume) unless their values measure different dimensions — a tent's "Capacity: 2-person"
 * stays apart from a pack's "Volume: 20 L". Values also split a key group whose members measure
 * different dimensions.
 */
public final class SpecKeys {
    /**
     * Common catalog abbreviations in spec keys [practice] (seen in retail feeds and spec sheets; no
     * standard lists them). A dotted entry applies only when written with its dot ("No." but not "no").
     */
    static final Map<String, String> ABBREVIATIONS = Map.ofEntries(
            Map.entry("wt", "weight"), Map.entry("wgt", "weight"), Map.entry("vol", "volume"),
            Map.entry("dim", "dimensions"), Map.entry("dims", "dimensions"), Map.entry("qty", "quantity"),
            Map.entry("cap", "capacity"), Map.entry("temp", "temperature"), Map.entry("dia", "diameter"),
            Map.entry("diam", "diameter"), Map.entry("len", "length"), Map.entry("ht", "height"),
            Map.entry("hgt", "height"), Map.entry("pkg", "package"), Map.entry("pcs", "pieces"),
            Map.entry("incl", "included"), Map.entry("mfr", "manufacturer"), Map.entry("mat", "material"),
            Map.entry("matl", "material"), Map.entry("sz", "size"), Map.entry("approx", "approximate"),
            Map.entry("max", "maximum"), Map.entry("min", "minimum"), Map.entry("avg", "average"),
            Map.entry("hh", "hydrostatic head"), Map.entry("fp", "fill power"), Map.entry("no.", "number"));

    /** Modifiers that do not make a different facet [practice]: "Item weight" is the weight. */
    static final Set<String> NEUTRAL_MODIFIERS = Set.of("item", "product", "overall", "net", "actual", "nominal",
            "approximate", "main", "primary");

    /** US/UK spelling pairs unified for clustering only; the canonical name keeps the shop's own spelling. */
    static final Map<String, String> SPELLINGS = Map.of("colour", "color", "fibre", "fiber", "centre", "center",
            "grey", "gray", "aluminium", "aluminum", "metre", "meter", "litre", "liter", "colourway", "colorway");

    /** One-word keys that name one facet when their values agree in dimension [practice]. */
    static final List<Set<String>> SYNONYMS = List.of(Set.of("capacity", "volume"), Set.of("weight", "mass"));

    /** "(L x W x H)": the order of a dimensions value, not part of the key's name. */
    private static final java.util.regex.Pattern AXIS_ORDER = java.util.regex.Pattern.compile("[a-z](\\s*[x×]\\s*[a-z])+");
    private static final Set<String> APPROX_SUFFIX = Set.of("approx", "approx.", "approximate", "approximately", "ca", "ca.");

    private SpecKeys() {
    }

    /** The canonical form of a raw spec key ("WEIGHT (kg)" → "weight", "Packed Wt" → "packed weight"); may be empty. */
    public static String normalise(String rawKey) {
        return analyse(rawKey).normalised;
    }

    /** Clusters raw keys by name alone; see the class description. Counts must be at least 1. */
    public static List<SpecKeyCluster> cluster(Map<String, Long> rawKeyCounts) {
        return cluster(rawKeyCounts, Map.of());
    }

    /**
     * Clusters raw keys using sample values too: a key's values that {@link Quantities#parse(String, String)}
     * reads tell its dimension (the dimension of at least half of its sampled values), which splits and
     * gates merges as the class description says.
     *
     * @param rawKeyCounts  raw key → how many listings carry it (at least 1)
     * @param sampleValues  raw key → some of its values (any number; keys may be missing)
     * @return clusters, most frequent first, then by name; keys that normalise to nothing are left out
     */
    public static List<SpecKeyCluster> cluster(Map<String, Long> rawKeyCounts, Map<String, ? extends Collection<String>> sampleValues) {
        Objects.requireNonNull(rawKeyCounts, "rawKeyCounts");
        Objects.requireNonNull(sampleValues, "sampleValues");
        // 1. group by cluster key
        Map<String, List<Entry>> byKey = new LinkedHashMap<>();
        for (Map.Entry<String, Long> e : new java.util.TreeMap<>(rawKeyCounts).entrySet()) {
            String raw = Objects.requireNonNull(e.getKey(), "raw key");
            long count = Objects.requireNonNull(e.getValue(), "count of " + raw);
            if (count < 1) {
                throw new IllegalArgumentException("count of spec key '" + raw + "' must be at least 1, got " + count
                        + "; leave unseen keys out of the map");
            }
            Analysis a = analyse(raw);
            if (a.normalised.isEmpty()) {
                continue;
            }
            Dimension dim = a.unitDimension != null ? a.unitDimension : valueDimension(raw, sampleValues.get(raw));
            byKey.computeIfAbsent(a.clusterKey, k -> new ArrayList<>()).add(new Entry(raw, a.normalised, count, dim));
        }
        // 2. split each group by dimension; members with no dimension join the largest part
        List<Group> groups = new ArrayList<>();
        for (Map.Entry<String, List<Entry>> e : byKey.entrySet()) {
            groups.addAll(splitByDimension(e.getKey(), e.getValue()));
        }
        // 3. merge one-word synonym groups whose dimensions agree (or are unknown)
        for (Set<String> synonyms : SYNONYMS) {
            Group target = null;
            for (Group g : new ArrayList<>(groups)) {
                if (!synonyms.contains(g.key)) {
                    continue;
                }
                if (target == null) {
                    target = g;
                } else if (target.dimension == null || g.dimension == null || target.dimension == g.dimension) {
                    target.entries.addAll(g.entries);
                    if (target.dimension == null) {
                        target.dimension = g.dimension;
                    }
                    groups.remove(g);
                }
            }
        }
        List<SpecKeyCluster> out = new ArrayList<>(groups.size());
        for (Group g : groups) {
            out.add(g.toCluster());
        }
        out.sort(Comparator.comparingLong(SpecKeyCluster::count).reversed().thenComparing(SpecKeyCluster::name)
                .thenComparing(c -> c.dimension().map(Enum::ordinal).orElse(-1)));
        return List.copyOf(out);
    }

    // ------------------------------------------------------------------ normalising

    /** The normalised form, the clustering key and the dimension named by a removed unit suffix. */
    static final class Analysis {
        final String normalised;
        final String clusterKey;
        final Dimension unitDimension;

        Analysis(String normalised, String clusterKey, Dimension unitDimension) {
            this.normalised = normalised;
            this.clusterKey = clusterKey;
            this.unitDimension = unitDimension;
        }
    }

    static Analysis analyse(String rawKey) {
        Objects.requireNonNull(rawKey, "rawKey");
        String s = Normalizer.normalize(rawKey, Normalizer.Form.NFKC).toLowerCase(Locale.ROOT).strip();
        while (s.endsWith(":")) {
            s = s.substring(0, s.length() - 1).strip();
        }
        Dimension unitDim = null;
        // trailing "(kg)", "[L]", "(approx.)", ", g", " in grams": at most two suffixes ("Weight (kg) (approx.)")
        for (int round = 0; round < 2; round++) {
            Suffix suffix = unitSuffix(s);
            if (suffix == null) {
                break;
            }
            s = suffix.rest;
            if (unitDim == null) {
                unitDim = suffix.dimension;
            }
        }
        StringBuilder words = new StringBuilder();
        for (String token : s.replace('_', ' ').replace('-', ' ').split("\\s+")) {
            String bare = stripPunctuation(token);
            String expanded = token.endsWith(".") ? ABBREVIATIONS.get(bare + ".") : null;
            if (expanded == null) {
                expanded = ABBREVIATIONS.get(bare);
            }
            String t = expanded != null ? expanded : bare;
            if (!t.isEmpty()) {
                if (words.length() > 0) {
                    words.append(' ');
                }
                words.append(t);
            }
        }
        String normalised = words.toString();
        return new Analysis(normalised, clusterKey(normalised), unitDim);
    }

    /** Drops neutral modifiers (unless nothing else is left), reduces each word to its variant key, unifies spellings. */
    static String clusterKey(String normalised) {
        if (normalised.isEmpty()) {
            return "";
        }
        String[] words = normalised.split(" ");
        List<String> kept = new ArrayList<>(words.length);
        for (String w : words) {
            if (!NEUTRAL_MODIFIERS.contains(w)) {
                kept.add(w);
            }
        }
        if (kept.isEmpty()) {
            kept = List.of(words);
        }
        StringBuilder key = new StringBuilder();
        for (String w : kept) {
            String v = VariantKey.of(w);
            if (v.isEmpty()) {
                continue;
            }
            if (key.length() > 0) {
                key.append(' ');
            }
            key.append(SPELLINGS.getOrDefault(v, v));
        }
        return key.toString();
    }

    private static final class Suffix {
        final String rest;
        final Dimension dimension;

        Suffix(String rest, Dimension dimension) {
            this.rest = rest;
            this.dimension = dimension;
        }
    }

    /** A removable trailing unit suffix of s, or null. Never removes everything. */
    private static Suffix unitSuffix(String s) {
        if (s.endsWith(")") || s.endsWith("]")) {
            char open = s.endsWith(")") ? '(' : '[';
            int at = s.lastIndexOf(open);
            if (at > 0) {
                String inner = s.substring(at + 1, s.length() - 1).strip();
                String rest = s.substring(0, at).strip();
                Optional<Dimension> d = unitList(inner);
                if (!rest.isEmpty() && (d.isPresent() || APPROX_SUFFIX.contains(inner) || AXIS_ORDER.matcher(inner).matches())) {
                    return new Suffix(rest, d.orElse(null));
                }
            }
            return null;
        }
        int comma = s.lastIndexOf(',');
        if (comma > 0) {
            Optional<Dimension> d = unitList(s.substring(comma + 1).strip());
            if (d.isPresent()) {
                return new Suffix(s.substring(0, comma).strip(), d.get());
            }
        }
        int in = s.lastIndexOf(" in ");
        if (in > 0) {
            Optional<Dimension> d = unitList(s.substring(in + 4).strip());
            if (d.isPresent()) {
                return new Suffix(s.substring(0, in).strip(), d.get());
            }
        }
        return null;
    }

    /** The dimension when every part of "kg", "g / oz", "in x in" is a unit of one dimension; else empty. */
    private static Optional<Dimension> unitList(String inner) {
        if (inner.isEmpty() || inner.length() > 24) {
            return Optional.empty();
        }
        Dimension dim = null;
        for (String part : inner.split("\\s*[/,x×]\\s*|\\s+or\\s+")) {
            if (part.isEmpty()) {
                continue;
            }
            Optional<Dimension> d = Units.dimensionOf(part);
            if (d.isEmpty() || (dim != null && dim != d.get())) {
                return Optional.empty();
            }
            dim = d.get();
        }
        return Optional.ofNullable(dim);
    }

    private static String stripPunctuation(String token) {
        int b = 0;
        int e = token.length();
        while (b < e && !Character.isLetterOrDigit(token.codePointAt(b))) {
            b++;
        }
        while (e > b && !Character.isLetterOrDigit(token.codePointBefore(e))) {
            e--;
        }
        return token.substring(b, e).replace(".", "");
    }

    // ------------------------------------------------------------------ dimensions and groups

    private static Dimension valueDimension(String rawKey, Collection<String> values) {
        if (values == null || values.isEmpty()) {
            return null;
        }
        Map<Dimension, Integer> votes = new EnumMap<>(Dimension.class);
        for (String v : values) {
            if (v == null) {
                continue;
            }
            Optional<Quantity> q = Quantities.parse(rawKey, v);
            q.ifPresent(quantity -> votes.merge(quantity.dimension(), 1, Integer::sum));
        }
        Dimension best = null;
        int bestVotes = 0;
        for (Map.Entry<Dimension, Integer> e : votes.entrySet()) {
            if (e.getValue() > bestVotes) {
                best = e.getKey();
                bestVotes = e.getValue();
            }
        }
        return 2 * bestVotes >= values.size() ? best : null;
    }

    private static List<Group> splitByDimension(String key, List<Entry> entries) {
        Map<Dimension, Group> parts = new EnumMap<>(Dimension.class);
        List<Entry> unknown = new ArrayList<>();
        for (Entry e : entries) {
            if (e.dimension == null) {
                unknown.add(e);
            } else {
                parts.computeIfAbsent(e.dimension, d -> new Group(key, d)).entries.add(e);
            }
        }
        if (parts.isEmpty()) {
            Group g = new Group(key, null);
            g.entries.addAll(unknown);
            return List.of(g);
        }
        Group largest = null;
        for (Group g : parts.values()) {
            if (largest == null || g.total() > largest.total()) {
                largest = g;
            }
        }
        largest.entries.addAll(unknown);
        return new ArrayList<>(parts.values());
    }

    private static final class Entry {
        final String raw;
        final String normalised;
        final long count;
        final Dimension dimension;

        Entry(String raw, String normalised, long count, Dimension dimension) {
            this.raw = raw;
            this.normalised = normalised;
            this.count = count;
            this.dimension = dimension;
        }
    }

    private static final class Group {
        final String key;
        Dimension dimension;
        final List<Entry> entries = new ArrayList<>();

        Group(String key, Dimension dimension) {
            this.key = key;
            this.dimension = dimension;
        }

        long total() {
            long t = 0;
            for (Entry e : entries) {
                t += e.count;
            }
            return t;
        }

        SpecKeyCluster toCluster() {
            Map<String, Long> byForm = new HashMap<>();
            for (Entry e : entries) {
                byForm.merge(e.normalised, e.count, Long::sum);
            }
            String name = null;
            long best = -1;
            for (Map.Entry<String, Long> f : byForm.entrySet()) {
                String n = f.getKey();
                long c = f.getValue();
                if (c > best || (c == best && (n.length() < name.length() || (n.length() == name.length() && n.compareTo(name) < 0)))) {
                    name = n;
                    best = c;
                }
            }
            List<SpecKeyCluster.Member> members = new ArrayList<>(entries.size());
            for (Entry e : entries) {
                members.add(new SpecKeyCluster.Member(e.raw, e.normalised, e.count));
            }
            members.sort(Comparator.comparingLong(SpecKeyCluster.Member::count).reversed().thenComparing(SpecKeyCluster.Member::rawKey));
            return new SpecKeyCluster(name, members, total(), Optional.ofNullable(dimension));
        }
    }
}
