package dev.sheaf.curator.figures;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sheaf.curator.DemoWorkspace;
import dev.sheaf.curator.session.CuratorSession;
import dev.sheaf.miner.mine.Harvest;
import dev.sheaf.vocab.Concept;
import dev.sheaf.vocab.Edit;
import dev.sheaf.vocab.FacetProperties;
import dev.sheaf.vocab.Label;
import dev.sheaf.vocab.LabelKind;
import dev.sheaf.vocab.SchemeInfo;
import dev.sheaf.vocab.Vocabulary;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Live figures: exact on a small fake catalog, consistent with the evidence index on the mined demo. */
class FiguresViewModelTest {
    @TempDir
    Path dir;

    /** Four listings: two tents, two packs; "ripstop" in t1 and p1, "rip-stop" in t2. */
    static final class Fake implements ListingLookup {
        final Map<String, List<String>> ids = Map.of("ripstop", List.of("t1", "p1"), "rip stop", List.of("t2"),
                "mesh", List.of("p2"));
        final Map<String, String> cats = Map.of("t1", "tents", "t2", "tents", "p1", "packs", "p2", "packs");

        @Override
        public List<String> listingIds(String phrase) {
            return ids.getOrDefault(phrase, List.of());
        }

        @Override
        public Optional<String> category(String id) {
            return Optional.ofNullable(cats.get(id));
        }

        @Override
        public long listings() {
            return 4;
        }
    }

    static Vocabulary fabrics(FacetProperties p) {
        Vocabulary v = Vocabulary.empty(SchemeInfo.of("t", "T"));
        v = v.apply(Edit.addConcept(Concept.builder("fabric").prefLabel("fabric").facet(p).build()));
        v = v.apply(Edit.addConcept(Concept.builder("ripstop").prefLabel("ripstop").altLabel("rip stop").broader("fabric").build()));
        return v.apply(Edit.addConcept(Concept.builder("mesh").prefLabel("mesh").broader("fabric").build()));
    }

    static Harvest.CorpusStats stats() {
        return new Harvest.CorpusStats(4, 0, 0, 0, 0, 1, List.of(new Harvest.CategoryCount("packs", 2),
                new Harvest.CategoryCount("tents", 2)), List.of(), 0, 0);
    }

    @Test
    void coveredIsTheUnionOfTheLabelsListings() throws Exception {
        ConceptFigures f = FigureCalculator.compute(fabrics(FacetProperties.terms()), "ripstop", new Fake(), stats(), null, () -> false);
        assertEquals(3, f.covered(), "t1, p1 for ripstop and t2 for rip stop");
        assertEquals(List.of(new ConceptFigures.LabelCount("ripstop", 2), new ConceptFigures.LabelCount("rip stop", 1)), f.perLabel());
        assertEquals(4, f.filled(), "every listing carries a fabric value");
        assertEquals(4, f.eligible());
        assertEquals("", f.flagsSource());
    }

    @Test
    void fillCountsOnlyTheCategoriesWhereTheFacetApplies() throws Exception {
        Vocabulary v = fabrics(FacetProperties.terms().withCategories(List.of("tents")));
        ConceptFigures f = FigureCalculator.compute(v, "mesh", new Fake(), stats(), null, () -> false);
        assertEquals(1, f.covered());
        assertEquals(2, f.filled(), "t1 and t2; the packs do not count");
        assertEquals(2, f.eligible());
        assertEquals(1.0, f.fillRate());
        assertEquals(List.of(new ConceptFigures.CategoryFill("tents", 2, 2)), f.byCategory());
    }

    @Test
    void figuresFollowTheSelectionAndTheEdits() throws Exception {
        try (CuratorSession s = CuratorSession.open(DemoWorkspace.mined(dir.resolve("ws")));
             IndexLookup lookup = IndexLookup.of(s).orElseThrow()) {
            FiguresViewModel vm = new FiguresViewModel(s, lookup, null, Runnable::run, Runnable::run);
            assertNull(vm.figuresProperty().get());
            s.selection().selectConcept("aluminium");
            ConceptFigures f = vm.figuresProperty().get();
            assertNotNull(f);
            long alone = s.listingsWith("aluminium");
            assertTrue(alone > 0, "the demo mentions aluminium");
            assertEquals(alone, f.perLabel().get(0).listings(), "the index's count for the preferred label");
            assertTrue(f.covered() >= alone);
            assertTrue(f.filled() <= f.eligible() && f.eligible() <= f.listings());
            // a label that other listings use raises the count at once
            s.apply(Edit.addLabel("aluminium", LabelKind.ALTERNATIVE, Label.of("buckle")));
            ConceptFigures g = vm.figuresProperty().get();
            assertTrue(g.covered() > f.covered(), f.covered() + " -> " + g.covered());
            s.selection().selectConcept(null);
            assertNull(vm.figuresProperty().get());
            vm.dispose();
        }
    }

    @Test
    void readsFlagsFromTheAuditTable() throws Exception {
        Path out = dir.resolve("out");
        java.nio.file.Files.createDirectories(out.resolve("audit/tables"));
        java.nio.file.Files.writeString(out.resolve(AuditFlags.TABLE),
                "attribute,flag,criterion,figure,comparison,threshold\nfabric,thin,fill rate,0.12,below,0.3\n");
        AuditFlags flags = AuditFlags.read(out).orElseThrow();
        assertEquals(List.of("thin: fill rate 0.12 below 0.3"), flags.flagsOf("Fabric"));
        ConceptFigures f = FigureCalculator.compute(fabrics(FacetProperties.terms()), "mesh", new Fake(), stats(), flags, () -> false);
        assertEquals(List.of("thin: fill rate 0.12 below 0.3 (on the facet fabric)"), f.flags());
        assertTrue(AuditFlags.read(dir.resolve("nothing")).isEmpty());
    }
}
