package dev.sheaf.curator.figures;

import dev.sheaf.curator.figures.ConceptFigures.CategoryFill;
import dev.sheaf.curator.figures.ConceptFigures.LabelCount;
import dev.sheaf.miner.mine.Harvest;
import dev.sheaf.vocab.Concept;
import dev.sheaf.vocab.ConceptLabel;
import dev.sheaf.vocab.FacetProperties;
import dev.sheaf.vocab.Vocabulary;
import java.io.IOException;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import java.util.TreeMap;
import java.util.concurrent.CancellationException;
import java.util.function.BooleanSupplier;

/**
 * Computes {@link ConceptFigures} from a vocabulary snapshot, the listing lookup, the harvest's
 * listings per category and the audit's flags. A listing counts as covered when any label of
 * the concept (preferred, alternative or hidden) occurs in its fields as a phrase, as the
 * evidence index finds it; the facet is filled in a listing when any label of any of its values
 * does. Fill is over the categories the facet applies to, counted from the harvest's corpus
 * statistics ({@code corpus}; null leaves the fill unknown). Checks {@code cancelled} between queries.
 */
final class FigureCalculator {
    private FigureCalculator() {
    }

    static ConceptFigures compute(Vocabulary v, String id, ListingLookup lookup, Harvest.CorpusStats corpus, AuditFlags flags,
                                  BooleanSupplier cancelled) throws IOException {
        Concept c = v.concept(id).orElseThrow(() -> new IllegalArgumentException("no concept " + id));
        String lang = v.defaultLanguage();
        List<LabelCount> perLabel = new ArrayList<>();
        long covered = -1;
        long listings = corpus != null ? corpus.listings() : -1;
        if (lookup != null) {
            listings = lookup.listings();
            Set<String> ids = new HashSet<>();
            for (String phrase : phrases(c)) {
                stopIf(cancelled);
                List<String> hit = lookup.listingIds(phrase);
                perLabel.add(new LabelCount(phrase, hit.size()));
                ids.addAll(hit);
            }
            covered = ids.size();
        }
        Optional<Concept> facet = v.facetOf(id);
        String facetLabel = facet.map(f -> f.displayLabel(lang)).orElse("");
        List<String> cats = facet.map(f -> List.copyOf(f.facet().categories())).orElse(List.of());
        long filled = -1;
        long eligible = -1;
        List<CategoryFill> byCategory = new ArrayList<>();
        if (facet.isPresent() && lookup != null && corpus != null) {
            FacetProperties p = facet.get().facet();
            Map<String, Long> perCat = new TreeMap<>();
            for (Harvest.CategoryCount cc : corpus.categories()) {
                if (p.appliesTo(cc.name())) {
                    perCat.put(cc.name(), cc.listings());
                }
            }
            Set<String> withValue = new HashSet<>();
            for (Concept value : v.valuesOf(facet.get().id())) {
                for (String phrase : phrases(value)) {
                    stopIf(cancelled);
                    withValue.addAll(lookup.listingIds(phrase));
                }
            }
            Map<String, Long> filledPerCat = new TreeMap<>();
            for (String lid : withValue) {
                stopIf(cancelled);
                String cat = lookup.category(lid).orElse(null);
                if (cat != null && perCat.containsKey(cat)) {
                    filledPerCat.merge(cat, 1L, Long::sum);
                }
            }
            filled = 0;
            eligible = 0;
            for (Map.Entry<String, Long> e : perCat.entrySet()) {
                long f = filledPerCat.getOrDefault(e.getKey(), 0L);
                byCategory.add(new CategoryFill(e.getKey(), f, e.getValue()));
                filled += f;
                eligible += e.getValue();
            }
        }
        List<String> fl = new ArrayList<>();
        if (flags != null) {
            fl.addAll(flags.flagsOf(c.displayLabel(lang)));
            if (facet.isPresent() && !facet.get().id().equals(id)) {
                for (String f : flags.flagsOf(facetLabel)) {
                    fl.add(f + " (on the facet " + facetLabel + ")");
                }
            }
        }
        boolean regulated = facet.map(f -> f.facet().regulatedClaim()).orElse(false);
        return new ConceptFigures(id, c.displayLabel(lang), covered, listings, perLabel, facetLabel, cats, filled, eligible,
                byCategory, fl, flags == null ? "" : flags.source().toString(), regulated);
    }

    /** The concept's label texts, preferred first, without repeats. */
    static List<String> phrases(Concept c) {
        Set<String> out = new LinkedHashSet<>();
        for (ConceptLabel l : c.labels()) {
            out.add(l.label().text());
        }
        return List.copyOf(out);
    }

    private static void stopIf(BooleanSupplier cancelled) {
        if (cancelled.getAsBoolean()) {
            throw new CancellationException("a newer figure request replaced this one");
        }
    }
}
