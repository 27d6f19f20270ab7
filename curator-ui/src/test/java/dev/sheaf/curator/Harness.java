package dev.sheaf.curator;

import dev.sheaf.curator.app.MainViewModel;
import dev.sheaf.curator.harvest.CandidateRow;
import dev.sheaf.curator.session.Background;
import dev.sheaf.curator.session.Notice;
import dev.sheaf.curator.session.RecentWorkspaces;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

/** A main view-model that runs every job at once on the calling thread, with the notices it posted. */
public final class Harness {
    final MainViewModel vm;
    final List<Notice> notices = new ArrayList<>();

    public Harness(Path config) {
        vm = new MainViewModel(new Background(Runnable::run, Runnable::run), Runnable::run, Runnable::run,
                new RecentWorkspaces(config.resolve(RecentWorkspaces.FILE_NAME)));
        vm.addNoticeListener(notices::add);
    }

    CandidateRow row(String term) {
        return vm.harvest().rows().stream().filter(r -> r.term().equals(term)).findFirst()
                .orElseThrow(() -> new AssertionError("no candidate '" + term + "' in the harvest"));
    }

    /** The first candidate (harvest order) not yet decided and not a label in the vocabulary. */
    CandidateRow undecided(int skip) {
        return vm.harvest().rows().stream().filter(r -> r.state() == dev.sheaf.curator.harvest.DecisionState.UNDECIDED)
                .skip(skip).findFirst().orElseThrow();
    }
}
