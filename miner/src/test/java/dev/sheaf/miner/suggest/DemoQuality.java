package dev.sheaf.miner.suggest;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import dev.sheaf.miner.ingest.Field;
import dev.sheaf.miner.ingest.FieldKind;
import dev.sheaf.miner.ingest.Ingest;
import dev.sheaf.miner.ingest.Listing;
import dev.sheaf.miner.ingest.Workspace;
import dev.sheaf.miner.mine.Harvest;
import dev.sheaf.miner.mine.HarvestOptions;
import dev.sheaf.miner.mine.Harvester;
import dev.sheaf.miner.text.Analysis;
import dev.sheaf.miner.text.AnalysisProfile;
import dev.sheaf.miner.text.TokenSegment;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Collections;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import java.util.TreeSet;

/**
 * Suggestion quality on the demo catalog against what its generator planted
 * ({@code sample-listings/planted.json}: synonym groups, variant groups, abbreviations, misspellings).
 * Our own functional check on invented data, never an outside value.
 *
 * <p>Truth: forms of one planted group (groups sharing a form are joined) are the same concept;
 * each form is mapped to the harvest's form with the harvest's analysis, and only pairs of two
 * different harvest candidates count ("findable"). A suggested pair is judged only when both members
 * are planted forms (closed world over the planted forms): right when they are in one group, wrong
 * otherwise. A pair between two variant groups stands for every member of the two groups (the harvest
 * shows a group key's members as one entry). Run {@link #main} to print the table:
 * {@code mvn -o -q -B -pl miner -am test -Dtest=DemoSuggestionQualityTest -Dsurefire.failIfNoSpecifiedTests=false -Dsheaf.print=true}.
 */
final class DemoQuality {
    static final Path WORKSPACE = Path.of("..", "sample-listings");

    final Harvest harvest;
    final List<Listing> listings;
    final Suggester suggester;
    final Map<String, Integer> clusterOf = new HashMap<>();
    final Set<String> truth = new TreeSet<>();
    final Map<String, Set<String>> groupMates = new HashMap<>();

    DemoQuality() throws IOException {
        Workspace ws = Workspace.load(WORKSPACE);
        List<Listing> ls = Collections.synchronizedList(new ArrayList<>());
        Ingest.builder().sources(ws.sources()).workspaceRoot(ws.dir()).build().run(ls::add);
        ls.sort((a, b) -> (a.source() + a.locator() + a.id()).compareTo(b.source() + b.locator() + b.id()));
        listings = List.copyOf(ls);
        AnalysisProfile profile = AnalysisProfile.preset(ws.profile());
        harvest = Harvester.builder().profile(profile).options(HarvestOptions.defaults()).threads(2).build().harvest(listings);
        suggester = Suggester.builder(harvest).options(SuggestOptions.builder().minScore(0).build()).listings(listings).build();
        loadTruth(Analysis.of(profile));
    }

    private void loadTruth(Analysis a) throws IOException {
        JsonNode p = new ObjectMapper().readTree(Files.readString(WORKSPACE.resolve("planted.json")));
        List<List<String>> groups = new ArrayList<>();
        for (String k : List.of("synonymGroups", "variantGroups")) {
            for (JsonNode g : p.get(k)) {
                List<String> forms = new ArrayList<>();
                g.get("members").forEach(m -> forms.add(m.get("form").asText()));
                groups.add(forms);
            }
        }
        for (JsonNode ab : p.get("abbreviations")) {
            groups.add(List.of(ab.get("short").asText(), ab.get("long").asText()));
        }
        for (JsonNode m : p.get("misspellings")) {
            groups.add(List.of(m.get("form").asText(), m.get("correct").asText()));
        }
        Set<String> candidates = new TreeSet<>();
        harvest.candidates().forEach(c -> candidates.add(c.term()));
        // union-find over harvest forms
        Map<String, String> parent = new HashMap<>();
        for (List<String> g : groups) {
            String first = null;
            for (String f : g) {
                String t = form(a, f);
                if (t == null || !candidates.contains(t)) {
                    continue;
                }
                parent.putIfAbsent(t, t);
                if (first == null) {
                    first = t;
                } else {
                    parent.put(find(parent, t), find(parent, first));
                }
            }
        }
        Map<String, Integer> ids = new HashMap<>();
        for (String t : parent.keySet()) {
            clusterOf.put(t, ids.computeIfAbsent(find(parent, t), k -> ids.size()));
        }
        List<String> ts = new ArrayList<>(clusterOf.keySet());
        for (int i = 0; i < ts.size(); i++) {
            for (int j = i + 1; j < ts.size(); j++) {
                if (clusterOf.get(ts.get(i)).equals(clusterOf.get(ts.get(j)))) {
                    truth.add(pair(ts.get(i), ts.get(j)));
                }
            }
        }
        Map<String, List<String>> byKey = new HashMap<>();
        for (Harvest.Candidate c : harvest.candidates()) {
            if (c.groupKey() != null) {
                byKey.computeIfAbsent(c.groupKey(), k -> new ArrayList<>()).add(c.term());
            }
        }
        for (List<String> l : byKey.values()) {
            for (String t : l) {
                groupMates.put(t, new TreeSet<>(l));
            }
        }
    }

    private static String find(Map<String, String> parent, String t) {
        while (!parent.get(t).equals(t)) {
            t = parent.get(t);
        }
        return t;
    }

    static String form(Analysis a, String text) {
        List<TokenSegment> segs = a.segments(new Listing("-", "", "-", "", List.of(Field.of(FieldKind.TEXT, text))));
        return segs.size() == 1 ? String.join(" ", segs.get(0).terms()) : null;
    }

    static String pair(String a, String b) {
        return a.compareTo(b) < 0 ? a + " | " + b : b + " | " + a;
    }

    /** Precision, recall and counts at one threshold; {@code kind} null for the combined score. */
    record Point(double threshold, int judged, int right, int truthPairs, int found) {
        double precision() {
            return judged == 0 ? 1 : (double) right / judged;
        }

        double recall() {
            return truthPairs == 0 ? 0 : (double) found / truthPairs;
        }
    }

    Point at(double t, Suggestion.Kind kind) {
        Set<String> predicted = new TreeSet<>();
        for (Suggestion s : suggester.suggestions()) {
            double score = kind == null ? s.score() : s.scoreOf(kind);
            if (score < t || score == 0) {
                continue;
            }
            List<String> ms = s.terms();
            for (int i = 0; i < ms.size(); i++) {
                for (int j = i + 1; j < ms.size(); j++) {
                    for (String x : groupMates.getOrDefault(ms.get(i), Set.of(ms.get(i)))) {
                        for (String y : groupMates.getOrDefault(ms.get(j), Set.of(ms.get(j)))) {
                            if (!x.equals(y)) {
                                predicted.add(pair(x, y));
                            }
                        }
                    }
                }
            }
        }
        int judged = 0;
        int right = 0;
        for (String p : predicted) {
            String[] xy = p.split(" \\| ");
            if (clusterOf.containsKey(xy[0]) && clusterOf.containsKey(xy[1])) {
                judged++;
                if (truth.contains(p)) {
                    right++;
                }
            }
        }
        return new Point(t, judged, right, truth.size(), right);
    }

    String table() {
        StringBuilder b = new StringBuilder();
        double t = SuggestOptions.DEFAULT_MIN_SCORE;
        b.append(String.format(Locale.ROOT, "demo suggestion quality at the default threshold %.2f (%d findable planted pairs, %d listings, %d candidates)%n",
                t, truth.size(), listings.size(), harvest.candidates().size()));
        b.append(String.format(Locale.ROOT, "%-18s %9s %7s %7s %7s%n", "kind", "precision", "recall", "judged", "right"));
        for (Suggestion.Kind k : Suggestion.Kind.values()) {
            Point p = at(t, k);
            b.append(String.format(Locale.ROOT, "%-18s %9.3f %7.3f %7d %7d%n", k.word(), p.precision(), p.recall(), p.judged(), p.right()));
        }
        Point all = at(t, null);
        b.append(String.format(Locale.ROOT, "%-18s %9.3f %7.3f %7d %7d%n", "all (combined)", all.precision(), all.recall(), all.judged(), all.right()));
        b.append("precision-recall curve over the combined score\n");
        for (double x = 0.2; x <= 0.96; x += 0.05) {
            Point p = at(x, null);
            b.append(String.format(Locale.ROOT, "  score >= %.2f  precision %.3f  recall %.3f  (%d judged)%n", x, p.precision(), p.recall(), p.judged()));
        }
        b.append("missed (at the default threshold):\n");
        Set<String> found = new TreeSet<>();
        for (Suggestion s : suggester.suggestions()) {
            if (s.score() < t) {
                continue;
            }
            List<String> ms = s.terms();
            for (int i = 0; i < ms.size(); i++) {
                for (int j = i + 1; j < ms.size(); j++) {
                    for (String x : groupMates.getOrDefault(ms.get(i), Set.of(ms.get(i)))) {
                        for (String y : groupMates.getOrDefault(ms.get(j), Set.of(ms.get(j)))) {
                            if (!x.equals(y)) {
                                found.add(pair(x, y));
                            }
                        }
                    }
                }
            }
        }
        for (String p : truth) {
            if (!found.contains(p)) {
                b.append("  ").append(p).append(below(p)).append('\n');
            }
        }
        b.append("wrong (at the default threshold):\n");
        for (String p : found) {
            String[] xy = p.split(" \\| ");
            if (clusterOf.containsKey(xy[0]) && clusterOf.containsKey(xy[1]) && !truth.contains(p)) {
                b.append("  ").append(p).append('\n');
            }
        }
        return b.toString();
    }

    /** The best score below the threshold the pair got, and from which kinds, for the "missed" list. */
    private String below(String p) {
        String[] xy = p.split(" \\| ");
        for (Suggestion s : suggester.suggestions()) {
            if (s.terms().contains(xy[0]) && s.terms().contains(xy[1])) {
                StringBuilder k = new StringBuilder();
                s.support().forEach(x -> k.append(' ').append(x.kind().word()).append(String.format(Locale.ROOT, " %.2f", x.score())));
                return String.format(Locale.ROOT, "   (scored %.2f:%s)", s.score(), k);
            }
        }
        return "";
    }

    public static void main(String[] args) throws IOException {
        long t0 = System.nanoTime();
        DemoQuality q = new DemoQuality();
        System.out.print(q.table());
        q.suggester.summary().notes().forEach(System.out::println);
        System.out.printf(Locale.ROOT, "suggester: %.1f s of %.1f s%n", q.suggester.summary().elapsed().toMillis() / 1000.0, (System.nanoTime() - t0) / 1e9);
    }
}
