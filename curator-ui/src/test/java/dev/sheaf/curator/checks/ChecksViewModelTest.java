package dev.sheaf.curator.checks;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sheaf.curator.DemoWorkspace;
import dev.sheaf.curator.checks.ChecksViewModel.CheckRow;
import dev.sheaf.curator.session.CuratorSession;
import dev.sheaf.vocab.Edit;
import dev.sheaf.vocab.Severity;
import dev.sheaf.vocab.VocabularyChecker;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The checks list follows edits and jumps to concepts; runs synchronously here. */
class ChecksViewModelTest {
    @TempDir
    Path dir;
    CuratorSession session;
    ChecksViewModel vm;

    @BeforeEach
    void open() throws Exception {
        session = CuratorSession.open(DemoWorkspace.fresh(dir.resolve("ws")));
        vm = new ChecksViewModel(session, Runnable::run, Runnable::run);
    }

    @AfterEach
    void close() throws Exception {
        vm.dispose();
        session.close();
    }

    @Test
    void listsWhatTheCheckerFinds() {
        assertEquals(VocabularyChecker.check(session.vocabulary()).findings().size(), vm.rows().size());
        assertEquals(VocabularyChecker.check(session.vocabulary()).summary().isEmpty(), false);
    }

    @Test
    void recomputesAfterAnEditAndJumpsToTheConcept() {
        int before = vm.rows().size();
        // an unfiled value: a concept under no facet is something the checks report
        session.apply(Edit.move("aluminium", List.of()));
        assertTrue(vm.rows().size() > before, "a value under no facet adds a finding: " + vm.rows());
        CheckRow row = vm.rows().stream().filter(r -> r.concepts().contains("aluminium")).findFirst().orElseThrow();
        assertTrue(vm.jumpTo(row));
        assertEquals("aluminium", session.selection().concept());
        session.undo();
        assertEquals(before, vm.rows().size());
    }

    @Test
    void errorsComeFirst() {
        List<Severity> s = new ArrayList<>();
        vm.rows().forEach(r -> s.add(r.severity()));
        List<Severity> sorted = new ArrayList<>(s);
        sorted.sort(null);
        assertEquals(sorted, s);
        assertFalse(vm.jumpTo(null));
    }

    @Test
    void aNewerRunReplacesAnOlderOne() {
        List<Runnable> queued = new ArrayList<>();
        LatestRun<Integer> run = new LatestRun<>(queued::add, Runnable::run);
        List<Integer> got = new ArrayList<>();
        run.start(c -> 1, got::add, e -> { });
        run.start(c -> 2, got::add, e -> { });
        queued.forEach(Runnable::run);
        assertEquals(List.of(2), got, "the first run was cancelled before it delivered");
        assertFalse(run.runningProperty().get());
    }
}
