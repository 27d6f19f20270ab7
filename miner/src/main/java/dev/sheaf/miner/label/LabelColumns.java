package dev.sheaf.miner.label;

import dev.sheaf.vocab.Bucket;
import dev.sheaf.vocab.Concept;
import dev.sheaf.vocab.FacetProperties;
import dev.sheaf.vocab.ValueKind;
import dev.sheaf.vocab.Vocabulary;
import it.unimi.dsi.fastutil.objects.Object2IntOpenHashMap;
import java.util.ArrayList;
import java.util.List;

/**
 * The columns of the label matrix and of the facet-value table, fixed by the vocabulary alone so
 * that two runs with one vocabulary give the same columns in the same order:
 * <ul>
 *   <li>matrix: every assignable concept (values and yes/no facets) by id, then every bucket of
 *       every number facet (facets by id, buckets by their lower bound), keyed
 *       {@code facetId#bucket label} ({@code #} never occurs in a concept id);</li>
 *   <li>facet values: every facet by id.</li>
 * </ul>
 */
final class LabelColumns {
    final List<String> keys = new ArrayList<>();
    final List<String> headers = new ArrayList<>();
    final List<String> conceptOf = new ArrayList<>();
    final List<String> facetOf = new ArrayList<>();
    final List<String> labelOf = new ArrayList<>();
    final List<FacetProperties[]> propsOf = new ArrayList<>();
    private final Object2IntOpenHashMap<String> index = new Object2IntOpenHashMap<>();

    final List<Concept> facets = new ArrayList<>();
    final List<String> facetHeaders = new ArrayList<>();

    private LabelColumns() {
        index.defaultReturnValue(-1);
    }

    static LabelColumns of(Vocabulary v) {
        LabelColumns c = new LabelColumns();
        for (Concept x : v.allConcepts()) {
            if (x.isFacet() && x.facet().valueKind() != ValueKind.YES_NO) {
                continue;
            }
            List<Concept> fs = v.facetsOf(x.id());
            FacetProperties[] props = fs.stream().map(Concept::facet).toArray(FacetProperties[]::new);
            String label = v.displayLabel(x.id());
            c.add(x.id(), label + " [" + x.id() + "]", x.id(), fs.isEmpty() ? null : fs.get(0).id(), label, props);
        }
        for (Concept f : v.facets()) {
            if (f.facet().valueKind() != ValueKind.NUMBER) {
                continue;
            }
            String fl = v.displayLabel(f.id());
            for (Bucket b : f.facet().buckets()) {
                String key = bucketKey(f.id(), b.label());
                c.add(key, fl + ": " + b.label() + " [" + key + "]", f.id(), f.id(), fl + ": " + b.label(),
                        new FacetProperties[] {f.facet()});
            }
        }
        for (Concept f : v.facets()) {
            c.facets.add(f);
            String unit = f.facet().unit();
            c.facetHeaders.add(v.displayLabel(f.id()) + (unit == null ? "" : " (" + unit + ")") + " [" + f.id() + "]");
        }
        return c;
    }

    static String bucketKey(String facetId, String bucket) {
        return facetId + "#" + bucket;
    }

    private void add(String key, String header, String concept, String facet, String label, FacetProperties[] props) {
        index.put(key, keys.size());
        keys.add(key);
        headers.add(header);
        conceptOf.add(concept);
        facetOf.add(facet);
        labelOf.add(label);
        propsOf.add(props);
    }

    int size() {
        return keys.size();
    }

    /** The matrix column of an assignment, or -1 (a number outside every bucket, or a facet with none). */
    int column(Assignment a) {
        if (a.isNumber()) {
            return a.bucket() == null ? -1 : index.getInt(bucketKey(a.conceptId(), a.bucket()));
        }
        return index.getInt(a.conceptId());
    }

    /** Whether column c's facet applies to a category (every category when the concept is under no facet). */
    boolean applies(int c, String category) {
        FacetProperties[] ps = propsOf.get(c);
        if (ps.length == 0) {
            return true;
        }
        for (FacetProperties p : ps) {
            if (p.appliesTo(category)) {
                return true;
            }
        }
        return false;
    }
}
