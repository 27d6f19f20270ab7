package dev.sheaf.miner.measure;

import dev.sheaf.miner.label.Assignment;
import dev.sheaf.miner.label.Assignments;
import dev.sheaf.miner.label.AssignmentsJsonl;
import dev.sheaf.vocab.Vocabulary;
import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Collection;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.Set;

/**
 * Catalog facts for grounding, from the labeling stage's {@code assignments.jsonl} read with
 * {@link AssignmentsJsonl#read} (ids merged away since resolve to today's concepts):
 * <ul>
 *   <li>a stated concept is carried, and so are the concepts above it in the vocabulary (a listing
 *       with a helmet-compatible hood has a hood);</li>
 *   <li>a concept with only negated occurrences is lacked;</li>
 *   <li>a number facet's value is in the facet's unit; a range counts as its midpoint, and several
 *       values of one facet in one listing as their median.</li>
 * </ul>
 * Only the listings feedback speaks of are kept, so a catalog of any size fits in memory.
 *
 * @param catalog  the facts of the kept listings
 * @param listings listings read
 * @param kept     listings kept (named by the feedback)
 * @param problems lines and ids the reader left out, as it reports them
 */
public record GroundingAssignments(GroundingCatalog catalog, long listings, int kept, List<String> problems) {
    public GroundingAssignments {
        Objects.requireNonNull(catalog, "catalog");
        problems = List.copyOf(problems);
    }

    /**
     * Reads {@code file} against {@code vocabulary}, keeping the listings in {@code wanted}.
     *
     * @throws IOException when the file cannot be read at all (bad lines are problems, not errors)
     */
    public static GroundingAssignments read(Path file, Vocabulary vocabulary, Collection<String> wanted) throws IOException {
        Set<String> keep = new HashSet<>(wanted);
        List<GroundingListing> out = new ArrayList<>();
        AssignmentsJsonl.ReadSummary s = AssignmentsJsonl.read(file, vocabulary, a -> {
            if (keep.contains(a.listingId())) {
                out.add(listing(a, vocabulary));
            }
        });
        List<String> problems = new ArrayList<>(s.problems());
        Map<String, GroundingListing> unique = new HashMap<>();
        for (GroundingListing l : out) {
            if (unique.putIfAbsent(l.id(), l) != null) {
                problems.add("listing " + l.id() + " appears more than once in " + file.getFileName() + "; the first is used");
            }
        }
        return new GroundingAssignments(GroundingCatalog.of(unique.values()), s.listings(), unique.size(), problems);
    }

    /** The facts of one labeled listing. */
    static GroundingListing listing(Assignments a, Vocabulary vocabulary) {
        Set<String> stated = new HashSet<>();
        Set<String> negated = new HashSet<>();
        Map<String, List<Double>> values = new HashMap<>();
        for (Assignment x : a.assignments()) {
            if (x.isNumber()) {
                values.computeIfAbsent(x.conceptId(), k -> new ArrayList<>()).add((x.value() + x.valueMax()) / 2);
            } else if (x.isStated()) {
                stated.add(x.conceptId());
                stated.addAll(vocabulary.ancestors(x.conceptId()));
            } else {
                negated.add(x.conceptId());
            }
        }
        negated.removeAll(stated);
        Map<String, Double> numbers = new HashMap<>();
        values.forEach((facet, v) -> numbers.put(facet, median(v)));
        return new GroundingListing(a.listingId(), a.category(), stated, negated, numbers);
    }

    private static double median(List<Double> v) {
        List<Double> s = new ArrayList<>(v);
        s.sort(null);
        int n = s.size();
        return n % 2 == 1 ? s.get(n / 2) : (s.get(n / 2 - 1) + s.get(n / 2)) / 2;
    }
}
