package dev.sheaf.curator.hierarchy;

import dev.sheaf.curator.session.Caution;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sheaf.curator.DemoWorkspace;
import dev.sheaf.curator.session.CuratorSession;
import dev.sheaf.vocab.FacetProperties;
import dev.sheaf.vocab.ValueKind;
import java.nio.file.Path;
import java.util.Set;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The facet properties form and its regulated-claim caution, without a display. */
class FacetFormViewModelTest {
    @TempDir
    Path dir;
    CuratorSession session;
    FacetFormViewModel vm;

    @BeforeEach
    void open() throws Exception {
        session = CuratorSession.open(DemoWorkspace.fresh(dir.resolve("ws")));
        vm = new FacetFormViewModel(session);
    }

    @AfterEach
    void close() throws Exception {
        vm.dispose();
        session.close();
    }

    private FacetProperties props(String id) {
        return session.vocabulary().concept(id).orElseThrow().facet();
    }

    @Test
    void showsTheFacetOfTheSelectedConcept() {
        assertFalse(vm.availableProperty().get());
        session.selection().selectConcept("aluminium");
        assertEquals("material", vm.facetIdProperty().get());
        assertTrue(vm.availableProperty().get());
        assertEquals(props("material").multiValued(), vm.multiValuedProperty().get());
    }

    @Test
    void cautionShowsForRegulatedFacetsOnly() {
        session.selection().selectConcept("100-nylon");
        assertTrue(vm.regulatedProperty().get());
        assertEquals(Caution.REGULATED_CLAIM, vm.cautionProperty().get());
        assertTrue(vm.cautionProperty().get().contains("not verified product claims"));
        assertTrue(vm.cautionProperty().get().contains("compliance review"));
        session.selection().selectConcept("black");
        assertEquals("", vm.cautionProperty().get());
    }

    @Test
    void markingAFacetRegulatedShowsTheCautionAndIsUndoable() {
        session.selection().selectConcept("colour");
        vm.regulatedProperty().set(true);
        assertTrue(props("colour").regulatedClaim());
        assertEquals(Caution.REGULATED_CLAIM, vm.cautionProperty().get());
        session.undo();
        assertFalse(props("colour").regulatedClaim());
        assertFalse(vm.regulatedProperty().get(), "the form follows undo");
        assertEquals("", vm.cautionProperty().get());
    }

    @Test
    void togglesAndCategoriesEditInPlace() {
        session.selection().selectConcept("colour");
        boolean before = vm.multiValuedProperty().get();
        vm.multiValuedProperty().set(!before);
        assertEquals(!before, props("colour").multiValued());
        vm.categoriesProperty().set(" tents , packs,, ");
        assertTrue(vm.applyText());
        assertEquals(Set.of("tents", "packs"), props("colour").categories());
        assertEquals("packs, tents", vm.categoriesProperty().get());
        vm.categoriesProperty().set("");
        assertTrue(vm.applyText());
        assertTrue(props("colour").categories().isEmpty(), "empty means every category");
    }

    @Test
    void changingTheValueKindKeepsTheFacetValid() {
        session.selection().selectConcept("colour");
        vm.valueKindProperty().set(ValueKind.NUMBER);
        vm.unitProperty().set("mm");
        assertTrue(vm.applyText());
        assertEquals("mm", props("colour").unit());
        vm.valueKindProperty().set(ValueKind.YES_NO);
        assertEquals(ValueKind.YES_NO, props("colour").valueKind());
        assertNull(props("colour").unit(), "a unit belongs to number facets only");
    }

    @Test
    void addsAndRemovesRangesOfANumberFacetAsUndoableEdits() {
        // the demo's fill power ranges: under 650, 650–749, 750–849, 850 and up (sample-listings/fernhollow.vocab.json)
        session.selection().selectConcept("fill-power");
        assertEquals(ValueKind.NUMBER, vm.valueKindProperty().get());
        assertEquals(java.util.List.of("under 650: under 650 cuin/oz", "650–749: from 650 to 750 cuin/oz",
                "750–849: from 750 to 850 cuin/oz", "850 and up: 850 cuin/oz and more"), vm.ranges());

        // split the open top range in two: take it out, then add 850–949 and 950 and up
        assertTrue(vm.removeRange(3));
        assertEquals(3, props("fill-power").buckets().size());
        vm.rangeNameProperty().set("850–949");
        vm.rangeFromProperty().set("850");
        vm.rangeToProperty().set("950");
        assertTrue(vm.addRange(), vm.messageProperty().get());
        assertEquals("", vm.rangeNameProperty().get(), "the fields clear after adding");
        vm.rangeNameProperty().set("950 and up");
        vm.rangeFromProperty().set(" 950,0 ");
        assertTrue(vm.addRange(), vm.messageProperty().get());
        var bs = props("fill-power").buckets();
        assertEquals(5, bs.size());
        assertEquals(new dev.sheaf.vocab.Bucket("850–949", 850.0, 950.0), bs.get(3));
        assertEquals(new dev.sheaf.vocab.Bucket("950 and up", 950.0, null), bs.get(4));
        assertEquals("950 and up: 950 cuin/oz and more", vm.ranges().get(4));

        session.undo();
        assertEquals(4, vm.ranges().size(), "undo takes the last range out");
        session.undo();
        session.undo();
        assertEquals("850 and up: 850 cuin/oz and more", vm.ranges().get(3), "and brings the removed one back");
        session.redo();
        assertEquals(3, props("fill-power").buckets().size());
    }

    @Test
    void refusesRangesThatOverlapOrAreNotNumbers() {
        session.selection().selectConcept("fill-power");
        var bs = props("fill-power").buckets();
        vm.rangeNameProperty().set("x");
        vm.rangeFromProperty().set("abc");
        assertFalse(vm.addRange());
        assertEquals("Not done: \"abc\" in 'from' is not a number", vm.messageProperty().get());
        vm.rangeNameProperty().set(bs.get(0).label());
        vm.rangeFromProperty().set("");
        vm.rangeToProperty().set("1");
        assertFalse(vm.addRange(), "same name and overlapping");
        assertTrue(vm.messageProperty().get().startsWith("Not done:"));
        vm.rangeNameProperty().set("");
        assertFalse(vm.addRange());
        assertEquals("Not done: give the range a name (e.g. light)", vm.messageProperty().get());
        vm.rangeNameProperty().set("backwards");
        vm.rangeFromProperty().set("5");
        vm.rangeToProperty().set("2");
        assertFalse(vm.addRange());
        assertTrue(vm.messageProperty().get().contains("must be below"), vm.messageProperty().get());
        assertEquals(bs, props("fill-power").buckets(), "nothing changed");
        session.selection().selectConcept("colour");
        vm.rangeNameProperty().set("light");
        vm.rangeToProperty().set("1");
        vm.rangeFromProperty().set("");
        assertFalse(vm.addRange(), "a term facet has no ranges");
        assertTrue(vm.ranges().isEmpty());
    }
}
