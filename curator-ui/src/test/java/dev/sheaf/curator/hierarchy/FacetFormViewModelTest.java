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
}
