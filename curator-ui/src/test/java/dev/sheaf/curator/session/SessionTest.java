package dev.sheaf.curator.session;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sheaf.curator.DemoWorkspace;
import dev.sheaf.miner.ingest.Workspace;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.CancellationException;
import java.util.concurrent.atomic.AtomicInteger;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class SessionTest {

    @Test
    void cancelledMiningWritesNothing(@TempDir Path tmp) throws Exception {
        Path ws = DemoWorkspace.fresh(tmp.resolve("ws"));
        AtomicInteger seen = new AtomicInteger();
        assertThrows(CancellationException.class, () -> Mining.mine(Workspace.load(ws), (p, d, t, l) -> { },
                () -> seen.incrementAndGet() > 20));
        assertFalse(Files.exists(ws.resolve("out/harvest.json")), "no harvest after a cancel");
        assertFalse(dev.sheaf.miner.ingest.EvidenceIndex.exists(ws.resolve("out/evidence")), "no evidence index after a cancel");
    }

    @Test
    void backgroundReportsProgressThenTheResultAndRefusesASecondJob() {
        List<Runnable> ui = new ArrayList<>();
        List<Runnable> work = new ArrayList<>();
        Background b = new Background(work::add, ui::add);
        List<Object> got = new ArrayList<>();
        b.submit("Counting", (p, c) -> {
            p.update("reading listings", 5, 10, 3);
            return 42;
        }, got::add, got::add);
        assertTrue(b.runningProperty().get());
        assertEquals("Counting", b.titleProperty().get());
        assertThrows(IllegalStateException.class, () -> b.submit("Another", (p, c) -> 1, x -> { }, x -> { }));
        work.remove(0).run();
        ui.forEach(Runnable::run);
        assertEquals(List.of(42), got);
        assertFalse(b.runningProperty().get(), "idle after the result");
    }

    @Test
    void aCancelledJobReportsACancellation() {
        Background b = new Background(Runnable::run, Runnable::run);
        List<Throwable> failed = new ArrayList<>();
        b.submit("Long", (p, c) -> {
            b.cancel();
            return c.getAsBoolean() ? null : "finished";
        }, x -> { }, failed::add);
        assertEquals(1, failed.size());
        assertTrue(failed.get(0) instanceof CancellationException);
    }

    @Test
    void recentWorkspacesKeepTheLatestFirstAtMostTenAndOnlyWorkspaces(@TempDir Path tmp) throws Exception {
        RecentWorkspaces r = new RecentWorkspaces(tmp.resolve("config/recent-workspaces.json"));
        assertEquals(List.of(), r.list(), "no file yet: empty");
        List<Path> dirs = new ArrayList<>();
        for (int i = 0; i < 12; i++) {
            Path d = tmp.resolve("ws" + i);
            Files.createDirectories(d);
            Files.writeString(d.resolve("workspace.json"), "{}");
            dirs.add(d);
            r.remember(d);
        }
        List<Path> l = r.list();
        assertEquals(RecentWorkspaces.MAX, l.size());
        assertEquals(dirs.get(11).toAbsolutePath().normalize(), l.get(0));
        r.remember(dirs.get(5));
        assertEquals(dirs.get(5).toAbsolutePath().normalize(), r.list().get(0), "reopened moves to the front");
        Files.delete(dirs.get(5).resolve("workspace.json"));
        assertFalse(r.list().contains(dirs.get(5).toAbsolutePath().normalize()), "a folder that is no longer a workspace is left out");
        Files.writeString(r.file(), "not json");
        assertEquals(List.of(), r.list(), "an unreadable file is an empty list");
    }
}
