package dev.sheaf.curator.ui;

import dev.sheaf.curator.app.Screenshots;

import dev.sheaf.curator.app.CuratorApp;
import dev.sheaf.curator.app.MainView;
import dev.sheaf.curator.app.MainViewModel;
import dev.sheaf.curator.session.RecentWorkspaces;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.concurrent.Callable;
import java.util.concurrent.TimeUnit;
import javafx.stage.Stage;
import org.junit.jupiter.api.extension.ExtendWith;
import org.junit.jupiter.api.io.TempDir;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.util.WaitForAsyncUtils;

/** The whole curator window with every panel installed, as {@code ./sheaf curate} shows it, for the UI tests. */
@ExtendWith(ApplicationExtension.class)
abstract class WindowTestBase {
    @TempDir
    static Path tmp;
    MainViewModel vm;
    MainView view;
    Stage stage;

    /** Builds and shows the window; each test class calls it from its own {@code @Start} (TestFX looks for that method on the test class itself). */
    void showWindow(Stage stage) throws Exception {
        this.stage = stage;
        vm = CuratorApp.newViewModel(new RecentWorkspaces(Files.createTempDirectory("sheaf-config").resolve(RecentWorkspaces.FILE_NAME)));
        view = new MainView(vm);
        CuratorApp.installPanels(view, vm);
        CuratorApp.show(stage, view, vm);
    }

    /** The harvest's candidate table. */
    @SuppressWarnings("unchecked")
    static javafx.scene.control.TableView<dev.sheaf.curator.harvest.CandidateRow> table(FxRobot robot) {
        return robot.lookup("#harvest-table").queryAs(javafx.scene.control.TableView.class);
    }

    /** The vocabulary tree. */
    @SuppressWarnings("unchecked")
    static javafx.scene.control.TreeView<dev.sheaf.curator.hierarchy.TreeNode> tree(FxRobot robot) {
        return robot.lookup("#hierarchy-tree").queryAs(javafx.scene.control.TreeView.class);
    }

    /** Waits (up to 3 minutes: the machine may be busy) for a condition, then for the FX queue to drain. */
    static void waitUntil(Callable<Boolean> c) throws Exception {
        WaitForAsyncUtils.waitFor(180, TimeUnit.SECONDS, c);
        WaitForAsyncUtils.waitForFxEvents();
    }

    void openAndWait(FxRobot robot, Path ws) throws Exception {
        robot.interact(() -> vm.open(ws));
        waitUntil(() -> vm.session() != null && !vm.background().runningProperty().get());
    }

    void shot(FxRobot robot, String name) {
        WaitForAsyncUtils.waitForFxEvents();
        robot.interact(() -> {
            try {
                Screenshots.save(stage.getScene(), name);
            } catch (java.io.IOException e) {
                throw new java.io.UncheckedIOException(e);
            }
        });
    }
}
