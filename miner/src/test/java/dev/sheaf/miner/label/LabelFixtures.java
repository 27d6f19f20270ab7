package dev.sheaf.miner.label;

import dev.sheaf.miner.ingest.Field;
import dev.sheaf.miner.ingest.FieldKind;
import dev.sheaf.miner.ingest.Listing;
import dev.sheaf.vocab.Bucket;
import dev.sheaf.vocab.Concept;
import dev.sheaf.vocab.FacetProperties;
import dev.sheaf.vocab.Retired;
import dev.sheaf.vocab.SchemeInfo;
import dev.sheaf.vocab.Vocabulary;
import java.util.ArrayList;
import java.util.List;

/** A small Fernhollow Outfitters vocabulary (invented) for labeling and coverage tests. */
public final class LabelFixtures {
    private LabelFixtures() {
    }

    public static Vocabulary vocabulary() {
        List<Concept> c = new ArrayList<>();
        c.add(facet("material", "material", FacetProperties.terms().withMultiValued(true)));
        c.add(value("ripstop-nylon", "material", "ripstop nylon").altLabel("rip-stop nylon").hiddenLabel("ripstp nylon").build());
        c.add(value("nylon", "material", "nylon").build());
        c.add(value("merino-wool", "material", "merino wool").altLabel("merino").build());
        c.add(value("mesh", "material", "mesh").build());
        c.add(value("no-see-um-mesh", "material", "no-see-um mesh").broader("mesh").build());

        c.add(facet("weather-protection", "weather protection",
                FacetProperties.terms().withMultiValued(true).withRegulatedClaim(true)));
        c.add(value("waterproof", "weather-protection", "waterproof").build());
        c.add(value("water-resistant", "weather-protection", "water resistant").build());
        c.add(value("windproof", "weather-protection", "windproof").build());

        c.add(facet("treatment", "treatment", FacetProperties.terms().withMultiValued(true)));
        c.add(value("pfc-free", "treatment", "PFC-free").build());
        c.add(value("dwr", "treatment", "DWR").altLabel("durable water repellent").build());

        c.add(facet("sole-grip", "sole grip", FacetProperties.terms().withCategories(List.of("footwear"))));
        c.add(value("non-slip", "sole-grip", "non-slip").build());

        c.add(facet("hood", "hood", FacetProperties.terms().withCategories(List.of("jackets"))));
        c.add(value("hooded", "hood", "hood").altLabel("hooded").build());
        c.add(value("removable-hood", "hood", "removable hood").build());

        c.add(facet("insulation", "insulation type", FacetProperties.terms()));
        c.add(value("insulated", "insulation", "insulated").altLabel("insulation").build());

        c.add(facet("origin", "origin", FacetProperties.terms()));
        c.add(value("made-in-usa", "origin", "made in USA").build());

        c.add(Concept.builder("packable").prefLabel("packable").altLabel("packs into its own pocket")
                .facet(FacetProperties.yesNo()).build());

        c.add(Concept.builder("weight").prefLabel("weight").altLabel("item weight")
                .facet(FacetProperties.number("kg", List.of(new Bucket("ultralight", null, 1.0), new Bucket("light", 1.0, 2.0),
                        new Bucket("standard", 2.0, null)))).build());
        c.add(Concept.builder("capacity").prefLabel("capacity").altLabel("volume")
                .facet(FacetProperties.number("L", List.of()).withCategories(List.of("packs"))).build());
        c.add(Concept.builder("comfort-rating").prefLabel("comfort rating").facet(FacetProperties.number("°C", List.of())).build());
        c.add(Concept.builder("lower-limit").prefLabel("lower limit").facet(FacetProperties.number("°C", List.of())).build());

        List<Retired> retired = List.of(new Retired("rip-stop", "ripstop-nylon", "rip-stop"),
                new Retired("old-ripstop", "rip-stop", "old ripstop"), new Retired("gone", null, "gone"));
        return Vocabulary.of(SchemeInfo.of("fernhollow", "Fernhollow Outfitters attributes"), c, retired, List.of());
    }

    private static Concept facet(String id, String label, FacetProperties p) {
        return Concept.builder(id).prefLabel(label).facet(p).build();
    }

    private static Concept.Builder value(String id, String facet, String label) {
        return Concept.builder(id).prefLabel(label).broader(facet);
    }

    public static Listing listing(String id, String category, Field... fields) {
        return new Listing(id, category, "catalog/feed.jsonl", "line 1", List.of(fields));
    }

    public static Listing text(String category, String text) {
        return listing("FH-1", category, Field.of(FieldKind.DESCRIPTION, text));
    }
}
