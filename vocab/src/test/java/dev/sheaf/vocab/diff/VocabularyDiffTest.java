package dev.sheaf.vocab.diff;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import dev.sheaf.vocab.Concept;
import dev.sheaf.vocab.ConceptLabel;
import dev.sheaf.vocab.Decision;
import dev.sheaf.vocab.Edit;
import dev.sheaf.vocab.FacetProperties;
import dev.sheaf.vocab.Fixtures;
import dev.sheaf.vocab.Label;
import dev.sheaf.vocab.LabelKind;
import dev.sheaf.vocab.Vocabulary;
import java.util.List;
import org.junit.jupiter.api.Test;

class VocabularyDiffTest {
    private final Vocabulary old = Fixtures.fernhollow();

    @Test
    void noChangesBetweenEqualVersions() {
        VocabularyDiff d = VocabularyDiff.between(old, old);
        assertTrue(d.isEmpty());
        assertEquals("no changes", d.summary());
    }

    @Test
    void recognisesARenameByIdNotByLabel() {
        Vocabulary now = old.apply(Edit.rename("toggle", Label.of("toggle fastener")));
        VocabularyDiff d = VocabularyDiff.between(old, now);
        assertEquals(List.of(new Change.Renamed("toggle", "en", "toggle", "toggle fastener")), d.changes());
    }

    @Test
    void aRenameThatKeepsTheOldLabelReportsTheNewSynonym() {
        Vocabulary now = old.apply(Edit.rename("toggle", Label.of("toggle fastener"), true));
        VocabularyDiff d = VocabularyDiff.between(old, now);
        assertEquals(1, d.of(Change.Renamed.class).size());
        assertEquals(List.of(new ConceptLabel(LabelKind.ALTERNATIVE, Label.of("toggle"))),
                d.of(Change.LabelsChanged.class).get(0).added());
    }

    @Test
    void aDeletePlusAddWithTheSameLabelIsNotARename() {
        Vocabulary now = old.apply(Edit.delete("toggle"))
                .apply(Edit.addConcept(Concept.builder("toggle-2").prefLabel("toggle").broader("closure").build()));
        VocabularyDiff d = VocabularyDiff.between(old, now);
        assertEquals(1, d.of(Change.Removed.class).size());
        assertEquals(1, d.of(Change.Added.class).size());
        assertTrue(d.of(Change.Renamed.class).isEmpty());
    }

    @Test
    void aMergeIsOneEntryWithItsConsequencesFoldedIn() {
        Vocabulary now = old.apply(Edit.merge("polyester", "nylon"));
        VocabularyDiff d = VocabularyDiff.between(old, now);
        assertEquals(List.of(new Change.Merged("polyester", "polyester", "nylon", "nylon")), d.changes(),
                "no separate label or move entries for what the merge brought along");
    }

    @Test
    void aMergeRewiringNarrowerConceptsIsNotAMove() {
        Vocabulary now = old.apply(Edit.merge("nylon", "polyester"));
        VocabularyDiff d = VocabularyDiff.between(old, now);
        assertEquals(1, d.of(Change.Merged.class).size());
        assertTrue(d.of(Change.Moved.class).isEmpty(), d.changes().toString());
        assertTrue(d.of(Change.DecisionChanged.class).isEmpty());
    }

    @Test
    void recognisesASplitAndDoesNotReportTheMovedLabelsAsRemoved() {
        Vocabulary now = old.apply(Edit.split("zipper", List.of(Label.of("zip")), Label.of("zip")));
        VocabularyDiff d = VocabularyDiff.between(old, now);
        assertEquals(List.of(new Change.Split("zipper", "zipper", "zip", "zip", List.of("zip"))), d.changes());
    }

    @Test
    void reportsAddedRemovedMovedLabelsNotesFacetsAndDecisions() {
        Vocabulary now = old.apply(Edit.batch("many", List.of(
                Edit.addConcept(Concept.builder("mesh").prefLabel("mesh").broader("material").build()),
                Edit.delete("toggle"),
                Edit.moveUnder("ripstop-nylon", "material"),
                Edit.addLabel("zipper", LabelKind.HIDDEN, Label.of("ziper")),
                Edit.removeLabel("down", LabelKind.ALTERNATIVE, Label.of("down fill")),
                Edit.setScopeNote("zipper", "en", "Any toothed slide fastener."),
                Edit.setFacetProperties("closure", FacetProperties.terms().withMultiValued(true)),
                Edit.recordDecision(Decision.dropped("trail ready", "marketing phrase")))));
        VocabularyDiff d = VocabularyDiff.between(old, now);
        assertEquals(List.of("mesh"), d.of(Change.Added.class).stream().map(Change::id).toList());
        assertEquals(List.of("material"), d.of(Change.Added.class).get(0).under());
        assertEquals(List.of("toggle"), d.of(Change.Removed.class).stream().map(Change::id).toList());
        Change.Moved m = d.of(Change.Moved.class).get(0);
        assertEquals(List.of("nylon"), m.from());
        assertEquals(List.of("material"), m.to());
        assertEquals(2, d.of(Change.LabelsChanged.class).size());
        List<Change.Changed> other = d.of(Change.Changed.class);
        assertTrue(other.stream().anyMatch(c -> c.what().equals("scope note") && c.after().startsWith("Any toothed")));
        assertTrue(other.stream().anyMatch(c -> c.what().equals("multi-valued") && c.before().equals("no") && c.after().equals("yes")));
        Change.DecisionChanged dc = d.of(Change.DecisionChanged.class).get(0);
        assertEquals("parked", dc.before());
        assertEquals("dropped (marketing phrase)", dc.after());
        assertEquals("1 added, 1 removed, 1 moved, 2 with label changes, 2 changed, 1 candidate decision", d.summary());
    }

    @Test
    void rendersAChangelogInMarkdown() {
        Vocabulary now = old.apply(Edit.rename("toggle", Label.of("toggle fastener")))
                .apply(Edit.merge("polyester", "nylon"))
                .apply(Edit.addConcept(Concept.builder("mesh").prefLabel("mesh *air*").broader("material").build()));
        String md = VocabularyDiff.between(old, now).toMarkdown();
        assertTrue(md.startsWith("## Vocabulary changes: Fernhollow Outfitters attributes\n"), md);
        assertTrue(md.contains("### Added\n\n- **mesh \\*air\\*** under *Material*\n"), md);
        assertTrue(md.contains("### Renamed\n\n- **toggle** → **toggle fastener**\n"), md);
        assertTrue(md.contains("### Merged\n\n- **polyester** merged into **nylon**; its labels now lead there\n"), md);
        assertTrue(md.indexOf("### Added") < md.indexOf("### Renamed") && md.indexOf("### Renamed") < md.indexOf("### Merged"));
    }

    @Test
    void rendersTextWithIdsAndJsonWithKinds() throws Exception {
        Vocabulary now = old.apply(Edit.merge("polyester", "nylon"));
        VocabularyDiff d = VocabularyDiff.between(old, now);
        assertTrue(d.toText().contains("Merged:\n  \"polyester\" (polyester) merged into \"nylon\" (nylon)"), d.toText());
        JsonNode j = new ObjectMapper().readTree(d.toJson());
        assertEquals("merged", j.get("changes").get(0).get("kind").asText());
        assertEquals("nylon", j.get("changes").get(0).get("into").asText());
        assertEquals(1, j.get("counts").get("merged").asInt());
    }
}
