package dev.sheaf.miner.cli;

import dev.sheaf.miner.mine.Harvest;
import dev.sheaf.miner.mine.HarvestFiles;
import dev.sheaf.miner.mine.HarvestOptions;
import dev.sheaf.miner.mine.Harvester;
import dev.sheaf.miner.suggest.HierarchySuggestion;
import dev.sheaf.miner.suggest.SuggestOptions;
import dev.sheaf.miner.suggest.Suggester;
import dev.sheaf.miner.suggest.Suggestion;
import dev.sheaf.miner.suggest.SuggestionFiles;
import dev.sheaf.miner.text.AnalysisProfile;
import dev.sheaf.vocab.Vocabulary;
import dev.sheaf.vocab.io.OutputSet;
import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.EnumSet;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** {@code sheaf suggest}: ranked merge and parent suggestions with reasons. A thin shell over {@link Suggester}. */
@Command(name = "suggest", mixinStandardHelpOptions = true, sortOptions = false,
        description = {
                "Suggest synonym and variant merges and parents for the terms of a harvest, each with its reason, counts and evidence.",
                "",
                "Merge kinds: same-group-key (case, hyphen, spacing, plural, numeral), spelling-variant (US/UK, doubled letters,",
                "misspellings), abbreviation (spelled out in the catalog, or initials), wordnet-synonym (senses that fit the catalog),",
                "distributional (same contexts: PPMI cosine), same-spec-key (both values of one spec key; corroborates the others).",
                "Parent kinds: facet-value (spec keys as facets, their values under them), head-modifier (\"two way zipper\" under",
                "\"zipper\"), subsumption (P(parent|child) >= 0.8 and P(child|parent) < 1 over listings).",
                "",
                "What the vocabulary already decided never comes back: dropped terms, terms already labels of one concept, and",
                "concepts related to each other or one under the other (kept apart).",
                "",
                "Writes suggestions.json and suggestions.csv to the output folder; prints the best of them as a table on stdout.",
                "Without a harvest the workspace's listings are mined first (and the harvest written). The listings are read once",
                "more for contexts, co-occurrence and abbreviations; --no-listings skips that (faster; fewer kinds)."},
        footer = {"",
                "Examples:",
                "  sheaf suggest --workspace sample-listings",
                "  sheaf suggest --workspace sample-listings --kind spelling-variant --kind abbreviation --limit 50",
                "  sheaf suggest --workspace sample-listings --term \"water resistant\"",
                "  sheaf suggest --harvest out/harvest.json --vocab shop.vocab.json catalog/ --out out/suggestions --min-score 0.7",
                "  sheaf suggest --workspace sample-listings --no-vocab --preset broad      everything, ignoring decisions",
                "",
                "Exit codes: 0 ok, 1 failure (unreadable harvest or vocabulary, cannot write), 2 usage, 3 input problems while",
                "reading listings (suggestions still written; see problems in the mine output)."})
final class SuggestCommand implements Callable<Integer> {
    @Spec
    CommandSpec spec;

    @Parameters(arity = "0..*", paramLabel = "SOURCE", description = "Listing files or folders the harvest was mined from (default: the workspace's sources).")
    List<Path> sources = new ArrayList<>();

    @Option(names = {"-w", "--workspace"}, paramLabel = "DIR",
            description = "Take the harvest, vocabulary, sources and output folder from DIR/workspace.json (default: the current folder when it has one).")
    Path workspace;

    @Option(names = "--harvest", paramLabel = "FILE", description = "The harvest.json to suggest for (default: the workspace's output folder/harvest.json).")
    Path harvest;

    @Option(names = "--vocab", paramLabel = "FILE", description = "The vocabulary whose decisions filter the suggestions (default: the workspace's).")
    Path vocab;

    @Option(names = "--no-vocab", description = "Ignore the vocabulary: suggest as if nothing were decided yet.")
    boolean noVocab;

    @Option(names = {"-o", "--out"}, paramLabel = "DIR", description = "Output folder (default: the workspace's output folder/suggestions, else out/suggestions).")
    Path out;

    @Option(names = "--kind", paramLabel = "KIND", description = "Show and write only these kinds (merge or parent kinds, repeatable; default: all).")
    List<String> kinds = new ArrayList<>();

    @Option(names = "--preset", paramLabel = "NAME", defaultValue = "default", description = "Options preset: default, precise (min score 0.7), broad (0.3). Default: ${DEFAULT-VALUE}.")
    String preset;

    @Option(names = "--min-score", paramLabel = "X", description = "Lowest combined score to keep, 0..1 (default: the preset's, " + SuggestOptions.DEFAULT_MIN_SCORE + ").")
    Double minScore;

    @Option(names = "--subsumption", paramLabel = "X", description = "Subsumption threshold P(parent|child), in (0.5, 1] (default: " + SuggestOptions.DEFAULT_SUBSUMPTION + ").")
    Double subsumption;

    @Option(names = "--limit", paramLabel = "N", defaultValue = "25", description = "Rows of each table on stdout (files hold everything). Default: ${DEFAULT-VALUE}.")
    int limit;

    @Option(names = "--term", paramLabel = "TERM", description = "Only suggestions that involve this term (any written form).")
    String term;

    @Option(names = "--concept", paramLabel = "ID", description = "Only suggestions that involve this concept of the vocabulary.")
    String concept;

    @Option(names = "--no-listings", description = "Do not read the listings: only the kinds that need the harvest alone run.")
    boolean noListings;

    @Option(names = {"-t", "--threads"}, paramLabel = "N", description = "Threads for reading listings (default: one per core).")
    Integer threads;

    @Override
    public Integer call() {
        PrintWriter stdout = spec.commandLine().getOut();
        PrintWriter err = spec.commandLine().getErr();
        long t0 = System.nanoTime();
        Path ws = workspace;
        if (ws == null && Files.isRegularFile(Path.of("workspace.json")) && harvest == null) {
            ws = Path.of(".");
        }
        if (ws == null && harvest == null) {
            return usage(err, "give --workspace DIR, or --harvest FILE (with SOURCEs for the listing kinds)");
        }
        if (ws != null && !Files.isRegularFile(ws.resolve("workspace.json"))) {
            return usage(err, "'" + ws + "' holds no workspace.json; give a workspace folder, or --harvest FILE");
        }
        for (Path s : sources) {
            if (!Files.exists(s)) {
                return usage(err, "source '" + s + "' does not exist; give existing listing files or folders");
            }
        }
        SuggestOptions options;
        EnumSet<Suggestion.Kind> mergeKinds = EnumSet.noneOf(Suggestion.Kind.class);
        EnumSet<HierarchySuggestion.Kind> parentKinds = EnumSet.noneOf(HierarchySuggestion.Kind.class);
        try {
            for (String k : kinds) {
                for (String w : k.split(",")) {
                    kind(w, mergeKinds, parentKinds);
                }
            }
            SuggestOptions.Builder b = SuggestOptions.preset(preset).toBuilder();
            if (minScore != null) {
                b.minScore(minScore);
            }
            if (subsumption != null) {
                b.subsumption(subsumption);
            }
            if (!kinds.isEmpty()) {
                // merge kinds corroborate each other, so all run; the filter applies to what is shown and written
                b.hierarchyKinds(parentKinds.isEmpty() && mergeKinds.isEmpty() ? EnumSet.allOf(HierarchySuggestion.Kind.class) : parentKinds);
            }
            options = b.build();
            if (limit < 0) {
                throw new IllegalArgumentException("--limit must be 0 or more, got " + limit);
            }
        } catch (IllegalArgumentException e) {
            return usage(err, e.getMessage());
        }

        ListingFeed feed = ListingFeeds.DEFAULT;
        ListingFeed.Job job = null;
        Harvest h;
        Vocabulary v = null;
        Path outDir;
        AnalysisProfile profile = null;
        try {
            if (!sources.isEmpty()) {
                job = feed.fromArguments(sources, List.of(), List.of(), null);
            } else if (ws != null) {
                job = feed.fromWorkspace(ws);
            }
            Path wsOut = job != null && job.output() != null ? job.output() : null;
            Path harvestFile = harvest != null ? harvest : wsOut != null ? wsOut.resolve(HarvestFiles.JSON) : null;
            outDir = out != null ? out : wsOut != null ? wsOut.resolve("suggestions") : Path.of("out", "suggestions");
            if (ws != null) {
                profile = LabelCommand.workspace(ws, false) == null ? null : profileOf(ws);
            }
            if (harvestFile != null && Files.isRegularFile(harvestFile)) {
                h = HarvestFiles.readJson(harvestFile);
            } else if (job != null && harvest == null) {
                err.println("sheaf suggest: no harvest at " + harvestFile + "; mining the listings first (as 'sheaf mine' would) …");
                err.flush();
                h = mine(job, profile == null ? AnalysisProfile.defaults() : profile);
                Harvest mined = h;
                OutputSet.writeAll(harvestFile.getParent(), set -> HarvestFiles.write(mined, harvestFile.getParent()));
                err.println("sheaf suggest: wrote the harvest to " + harvestFile.getParent());
            } else {
                err.println("sheaf suggest: harvest " + harvestFile + " does not exist; run 'sheaf mine' first or give --harvest FILE");
                return ExitCodes.FAILURE;
            }
            Path vf = vocab != null ? vocab : ws != null ? dev.sheaf.miner.ingest.Workspace.load(ws).vocabulary() : null;
            if (!noVocab && vf != null) {
                v = LabelCommand.Vocabularies.read(vf);
            }
        } catch (LabelCommand.VocabularyUnreadable e) {
            err.println("sheaf suggest: " + e.getMessage());
            return ExitCodes.FAILURE;
        } catch (IllegalArgumentException e) {
            return usage(err, e.getMessage());
        } catch (IOException e) {
            err.println("sheaf suggest: " + e.getMessage());
            return ExitCodes.FAILURE;
        }

        Suggester.Builder sb = Suggester.builder(h).vocabulary(v).options(options);
        ListingFeed.Summary read = null;
        if (!noListings && job != null) {
            int n = threads != null ? threads : Runtime.getRuntime().availableProcessors();
            if (n < 1 || n > 255) {
                return usage(err, "--threads must be from 1 to 255, got " + n);
            }
            try {
                read = job.run(n, sb, (a, b, c, d) -> { });
            } catch (IOException e) {
                err.println("sheaf suggest: reading the listings stopped: " + e.getMessage());
                return ExitCodes.FAILURE;
            }
        }
        Suggester s;
        try {
            s = sb.build();
        } catch (RuntimeException e) {
            err.println("sheaf suggest: the suggester failed: " + e.getMessage());
            return ExitCodes.FAILURE;
        }
        List<Suggestion> merges = new ArrayList<>(term != null ? s.forTerm(term) : concept != null ? s.forConcept(concept) : s.suggestions());
        List<HierarchySuggestion> parents = new ArrayList<>(term != null ? s.hierarchyForTerm(term)
                : concept != null ? s.hierarchyForConcept(concept) : s.hierarchy());
        if (!kinds.isEmpty()) {
            merges.removeIf(x -> x.support().stream().noneMatch(k -> mergeKinds.contains(k.kind())));
            parents.removeIf(x -> !parentKinds.contains(x.kind()));
        }
        try {
            OutputSet.writeAll(outDir, set -> SuggestionFiles.write(merges, parents, outDir));
        } catch (IOException e) {
            err.println("sheaf suggest: cannot write to " + outDir + ": " + e.getMessage() + "; check that the folder is writable");
            return ExitCodes.FAILURE;
        }
        print(stdout, merges, parents);
        stdout.flush();
        for (String note : s.summary().notes()) {
            err.println("sheaf suggest: note: " + note);
        }
        err.printf(Locale.ROOT, "sheaf suggest: %,d merges and %,d parents from %,d candidates%s in %.1f s (suggesting %.1f s); wrote %s and %s in %s%n",
                merges.size(), parents.size(), s.summary().candidates(),
                read == null ? "" : String.format(Locale.ROOT, " and %,d listings", read.listings()),
                (System.nanoTime() - t0) / 1e9, s.summary().elapsed().toMillis() / 1000.0, SuggestionFiles.JSON, SuggestionFiles.CSV, outDir);
        if (read != null && !read.problems().isEmpty()) {
            err.printf(Locale.ROOT, "sheaf suggest: %d input problem(s) while reading the listings (run 'sheaf mine' to list them)%n", read.problems().size());
            return ExitCodes.PROBLEMS;
        }
        return ExitCodes.OK;
    }

    private static AnalysisProfile profileOf(Path ws) throws IOException {
        dev.sheaf.miner.ingest.Workspace w = dev.sheaf.miner.ingest.Workspace.load(ws);
        return w.profileFile().isPresent() ? AnalysisProfile.load(w.profileFile().get()) : AnalysisProfile.preset(w.profile());
    }

    private static Harvest mine(ListingFeed.Job job, AnalysisProfile profile) throws IOException {
        int n = Runtime.getRuntime().availableProcessors();
        try (Harvester.Run run = Harvester.builder().profile(profile).options(HarvestOptions.defaults()).threads(n)
                .sources(job.sourceNames()).build().start()) {
            job.run(n, run, (a, b, c, d) -> { });
            return run.finish();
        }
    }

    private static void kind(String w, EnumSet<Suggestion.Kind> merge, EnumSet<HierarchySuggestion.Kind> parent) {
        try {
            merge.add(Suggestion.Kind.ofWord(w));
        } catch (IllegalArgumentException e) {
            try {
                parent.add(HierarchySuggestion.Kind.ofWord(w));
            } catch (IllegalArgumentException e2) {
                throw new IllegalArgumentException("--kind " + w + " is not a kind; merge kinds: same-group-key, spelling-variant, abbreviation, "
                        + "wordnet-synonym, distributional, same-spec-key; parent kinds: facet-value, head-modifier, subsumption");
            }
        }
    }

    private void print(PrintWriter o, List<Suggestion> merges, List<HierarchySuggestion> parents) {
        o.printf(Locale.ROOT, "merge suggestions (%,d; best %d)%n", merges.size(), Math.min(limit, merges.size()));
        o.printf(Locale.ROOT, "%4s  %-5s  %-18s  %-46s  %s%n", "rank", "score", "kind", "members", "reason");
        for (int i = 0; i < Math.min(limit, merges.size()); i++) {
            Suggestion s = merges.get(i);
            List<String> ms = new ArrayList<>();
            for (Suggestion.Member m : s.members()) {
                ms.add(m.shown() + (m.conceptId() == null ? "" : " [" + m.conceptId() + "]"));
            }
            o.printf(Locale.ROOT, "%4d  %.2f   %-18s  %-46s  %s%n", i + 1, s.score(), s.kind().word(), cut(String.join(" | ", ms), 46),
                    cut(s.reason(), 110));
        }
        o.println();
        o.printf(Locale.ROOT, "parent suggestions (%,d; best %d)%n", parents.size(), Math.min(limit, parents.size()));
        o.printf(Locale.ROOT, "%4s  %-5s  %-13s  %-24s  %-30s  %-18s  %s%n", "rank", "score", "kind", "parent", "child", "listings p/c/both", "reason");
        for (int i = 0; i < Math.min(limit, parents.size()); i++) {
            HierarchySuggestion h = parents.get(i);
            o.printf(Locale.ROOT, "%4d  %.2f   %-13s  %-24s  %-30s  %-18s  %s%n", i + 1, h.score(), h.kind().word(),
                    cut((h.parent().facet() ? "facet " : "") + h.parent().shown(), 24), cut(h.child().shown(), 30),
                    h.counts().parentListings() + "/" + h.counts().childListings() + "/" + h.counts().bothListings(), cut(h.reason(), 90));
        }
    }

    private static String cut(String s, int n) {
        return s.length() <= n ? s : s.substring(0, n - 1) + "…";
    }

    private int usage(PrintWriter err, String message) {
        err.println("sheaf suggest: " + message);
        err.println("Try 'sheaf suggest --help'.");
        return ExitCodes.USAGE;
    }
}
