package dev.sheaf.curator.suggestions;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sheaf.curator.DemoWorkspace;
import dev.sheaf.curator.session.CuratorSession;
import dev.sheaf.miner.suggest.Suggestion;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The suggestions panel on the mined demo, synchronously. */
class SuggestionsViewModelTest {
    @TempDir
    Path dir;

    @Test
    void answeredSuggestionsDoNotComeBackAndUndoBringsThemBack() throws Exception {
        try (CuratorSession s = CuratorSession.open(DemoWorkspace.mined(dir.resolve("ws")))) {
            SuggestionsViewModel vm = new SuggestionsViewModel(s, Runnable::run, Runnable::run);
            assertFalse(vm.rows().isEmpty(), "the demo has variants to merge: " + vm.scopeProperty().get());
            assertTrue(vm.scopeProperty().get().contains("in all"));
            SuggestionsViewModel.Row first = vm.selectedProperty().get();
            assertNotNull(first);
            String key = first.suggestion().key();
            assertFalse(vm.preferredChoices().isEmpty());
            assertTrue(vm.accept(), vm.messageProperty().get());
            assertTrue(vm.rows().stream().noneMatch(r -> r.suggestion().key().equals(key)), "accepted: gone");
            s.undo();
            assertTrue(vm.rows().stream().anyMatch(r -> r.suggestion().key().equals(key)), "undone: back");
            vm.dispose();
        }
    }

    @Test
    void followsTheSelectedConcept() throws Exception {
        try (CuratorSession s = CuratorSession.open(DemoWorkspace.mined(dir.resolve("ws")))) {
            SuggestionsViewModel vm = new SuggestionsViewModel(s, Runnable::run, Runnable::run);
            Suggestion withConcept = vm.suggester().suggestions().stream().filter(x -> !x.conceptIds().isEmpty())
                    .findFirst().orElseThrow(() -> new AssertionError("no suggestion touches a concept of the demo"));
            String id = withConcept.conceptIds().get(0);
            s.selection().selectConcept(id);
            List<String> keys = vm.rows().stream().map(r -> r.suggestion().key()).toList();
            assertTrue(keys.contains(withConcept.key()));
            assertEquals(vm.suggester().forConcept(id).size(), vm.rows().size());
            assertTrue(vm.scopeProperty().get().contains(s.vocabulary().displayLabel(id)));
            vm.dispose();
        }
    }

    @Test
    void parentSuggestionsFollowTheSelectionAndPutUnderMovesTheChild() throws Exception {
        try (CuratorSession s = CuratorSession.open(DemoWorkspace.mined(dir.resolve("ws")))) {
            SuggestionsViewModel vm = new SuggestionsViewModel(s, Runnable::run, Runnable::run);
            assertFalse(vm.parents().isEmpty(), "the demo has parent suggestions: " + vm.parentScopeProperty().get());
            assertTrue(vm.parentScopeProperty().get().contains("in all"), vm.parentScopeProperty().get());
            // one whose parent is a concept already
            SuggestionsViewModel.ParentRow ready = vm.parents().stream()
                    .filter(r -> r.suggestion().parent().conceptId() != null).findFirst()
                    .orElseThrow(() -> new AssertionError("no parent suggestion with a concept as parent"));
            String parent = ready.suggestion().parent().conceptId();
            assertTrue(ready.text().startsWith(s.vocabulary().displayLabel(parent) + " ⊃ "), ready.text());
            vm.selectedParentProperty().set(ready);
            int before = s.vocabulary().size();
            assertTrue(vm.putUnder(false), vm.messageProperty().get());
            String child = ready.suggestion().child().conceptId();
            if (child == null) {
                assertEquals(before + 1, s.vocabulary().size(), "the plain term became a concept");
                child = s.vocabulary().decision(ready.suggestion().child().term()).orElseThrow().concept();
            }
            assertTrue(s.vocabulary().concept(child).orElseThrow().broader().contains(parent), "under the parent now");
            String key = ready.suggestion().key();
            assertTrue(vm.parents().stream().noneMatch(r -> r.suggestion().key().equals(key)), "answered: gone");
            s.undo();
            assertEquals(before, s.vocabulary().size());
            assertTrue(vm.parents().stream().anyMatch(r -> r.suggestion().key().equals(key)), "undone: back");

            // one whose parent is not in the vocabulary: refused with the way forward
            vm.parents().stream().filter(r -> r.suggestion().parent().conceptId() == null).findFirst().ifPresent(r -> {
                vm.selectedParentProperty().set(r);
                assertFalse(vm.putUnder(false));
                assertTrue(vm.messageProperty().get().contains("first"), vm.messageProperty().get());
            });

            // selecting the child concept narrows the list to its suggestions
            s.selection().selectConcept(parent);
            assertTrue(vm.parentScopeProperty().get().endsWith("for \"" + s.vocabulary().displayLabel(parent) + "\""),
                    vm.parentScopeProperty().get());
            assertEquals(vm.suggester().hierarchyForConcept(parent).size(), vm.parents().size());
            vm.dispose();
        }
    }
}
