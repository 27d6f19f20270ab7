package dev.sheaf.vocab;

import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import java.util.TreeMap;

/** The invented Fernhollow Outfitters vocabulary the tests share (no outside values here). */
public final class Fixtures {
    private Fixtures() {
    }

    public static SchemeInfo scheme() {
        TreeMap<String, String> t = new TreeMap<>();
        t.put("en", "Fernhollow Outfitters attributes");
        t.put("de", "Fernhollow Merkmale");
        return new SchemeInfo("fernhollow", t, "https://fernhollow.example/vocab/", "en");
    }

    /** A clean vocabulary: no errors, no warnings (one note: the regulated waterproof rating). */
    public static Vocabulary fernhollow() {
        List<Concept> c = new ArrayList<>();
        c.add(Concept.builder("material").prefLabel("Material").prefLabel(Label.of("Material", "de"))
                .altLabel("Fabric").scopeNote("What the main body of the product is made of.")
                .facet(FacetProperties.terms().withMultiValued(true).withCategories(List.of("tents", "jackets", "backpacks")))
                .build());
        c.add(Concept.builder("closure").prefLabel("Closure")
                .facet(FacetProperties.terms()).build());
        c.add(Concept.builder("capacity").prefLabel("Capacity")
                .facet(FacetProperties.number("L", List.of(new Bucket("daypack", null, 30.0),
                        new Bucket("weekend", 30.0, 50.0), new Bucket("expedition", 50.0, null)))
                        .withCategories(List.of("backpacks")))
                .build());
        c.add(Concept.builder("waterproof-rating").prefLabel("Waterproof rating").altLabel("Hydrostatic head")
                .facet(FacetProperties.number("mm", List.of(new Bucket("showerproof", null, 1500.0),
                        new Bucket("waterproof", 1500.0, 10000.0), new Bucket("stormproof", 10000.0, null)))
                        .withRegulatedClaim(true))
                .build());
        c.add(Concept.builder("packable").prefLabel("Packable").facet(FacetProperties.yesNo()).build());

        c.add(Concept.builder("nylon").prefLabel("nylon").prefLabel(Label.of("Nylon", "de")).altLabel("polyamide")
                .broader("material").mapping(new Mapping(MatchKind.EXACT, "https://example.org/materials/nylon")).build());
        c.add(Concept.builder("ripstop-nylon").prefLabel("ripstop nylon").altLabel("rip-stop nylon")
                .hiddenLabel("ripstop nylong").broader("nylon")
                .definition("Nylon woven with a reinforcing grid so that tears do not spread.")
                .provenance(new Provenance("ripstop", Instant.parse("2025-03-01T10:00:00Z"), "curator-1")).build());
        c.add(Concept.builder("polyester").prefLabel("polyester").broader("material").build());
        c.add(Concept.builder("merino-wool").prefLabel("merino wool").altLabel("merino").broader("material").build());
        c.add(Concept.builder("down").prefLabel("down").altLabel("down fill").broader("material")
                .scopeNote("Insulating plumage; fill power is a separate facet.").build());

        c.add(Concept.builder("zipper").prefLabel("zipper").altLabel("zip").broader("closure").related("drawcord").build());
        c.add(Concept.builder("two-way-zipper").prefLabel("two-way zipper").altLabel("two-way zip").broader("zipper").build());
        c.add(Concept.builder("drawcord").prefLabel("drawcord").altLabel("drawstring").broader("closure").related("zipper").build());
        c.add(Concept.builder("hook-and-loop").prefLabel("hook-and-loop").altLabel("hook and loop fastener")
                .broader("closure").build());
        c.add(Concept.builder("toggle").prefLabel("toggle").broader("closure").build());

        List<Retired> r = List.of(new Retired("rip-stop", "ripstop-nylon", "rip-stop"));
        List<Decision> d = List.of(
                Decision.kept("rip stop", "ripstop-nylon").at(Instant.parse("2025-03-01T10:00:00Z"), "curator-1"),
                Decision.dropped("free shipping", "not a product attribute"),
                Decision.parked("trail ready"));
        return Vocabulary.of(scheme(), c, r, d);
    }
}
