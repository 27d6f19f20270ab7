package dev.sheaf.curator.app;

import dev.sheaf.curator.session.Background;
import dev.sheaf.curator.session.RecentWorkspaces;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.Executor;
import java.util.concurrent.Executors;
import javafx.application.Application;
import javafx.application.Platform;
import javafx.scene.Scene;
import javafx.stage.Stage;

/** The JavaFX application: one main window; opens the workspace named on the command line. */
public final class CuratorApp extends Application {
    private MainViewModel vm;

    @Override
    public void start(Stage stage) {
        List<String> args = getParameters().getRaw();
        vm = newViewModel(RecentWorkspaces.forUser());
        MainView view = new MainView(vm);
        installPanels(view, vm);
        show(stage, view, vm);
        if (!args.isEmpty()) {
            vm.open(Path.of(args.get(0)));
        }
        screenshotWhenReady(stage, vm);
    }

    /**
     * With {@code -Dsheaf.curator.screenshot=FILE.png}: once the window is idle (workspace open or
     * none given, no background work), saves a picture of it there, so the real desktop can be seen
     * as a user sees it on a machine without a screen grabber (e.g. under xvfb-run).
     */
    private static void screenshotWhenReady(Stage stage, MainViewModel vm) {
        String file = System.getProperty("sheaf.curator.screenshot");
        if (file == null || file.isBlank()) {
            return;
        }
        javafx.animation.Timeline poll = new javafx.animation.Timeline();
        poll.getKeyFrames().add(new javafx.animation.KeyFrame(javafx.util.Duration.seconds(2), e -> {
            if (!vm.background().runningProperty().get()) {
                poll.stop();
                try {
                    System.err.println("sheaf curate: window picture saved to " + Screenshots.saveTo(stage.getScene(), Path.of(file)));
                } catch (java.io.IOException ex) {
                    System.err.println("sheaf curate: cannot save the window picture to " + file + ": " + ex.getMessage());
                }
            }
        }));
        poll.setCycleCount(javafx.animation.Animation.INDEFINITE);
        poll.play();
    }

    /** The view-model with a background worker and an evidence-query worker, reporting on the JavaFX thread. */
    public static MainViewModel newViewModel(RecentWorkspaces recent) {
        Executor queries = Executors.newSingleThreadExecutor(r -> {
            Thread t = new Thread(r, "sheaf-curator-evidence");
            t.setDaemon(true);
            return t;
        });
        return new MainViewModel(Background.withWorkerThread(Platform::runLater), queries, Platform::runLater, recent);
    }

    /**
     * Where further panels join the window: the vocabulary tree goes in the centre
     * ({@link MainView#setHierarchyView}), suggestions, checks and figures as side panels
     * ({@link MainView#addSidePanel}); each follows {@link MainViewModel#sessionProperty()}.
     */
    public static void installPanels(MainView view, MainViewModel vm) {
        dev.sheaf.curator.hierarchy.StructurePanels p = new dev.sheaf.curator.hierarchy.StructurePanels(vm.sessionProperty());
        // the concept finder sits above the tree and opens its matches only while something is typed
        dev.sheaf.curator.concepts.ConceptListView finder = dev.sheaf.curator.concepts.ConceptListView.finder(vm.sessionProperty());
        javafx.scene.layout.BorderPane centre = new javafx.scene.layout.BorderPane(p.hierarchy());
        centre.setTop(finder.node());
        finder.setOnChosen(() -> {
            javafx.scene.Node tree = centre.lookup("#hierarchy-tree");
            if (tree != null) {
                tree.requestFocus();
            }
        });
        view.setHierarchyView(centre);
        view.addSidePanel("Facet", p.facet());
        view.addSidePanel("Suggestions", p.suggestions());
        view.addSidePanel("Checks", p.checks());
        view.addSidePanel("Figures", p.figures());
    }

    /** Puts the view in the stage with the close guard (unsaved edits are asked about). */
    public static void show(Stage stage, MainView view, MainViewModel vm) {
        javafx.geometry.Rectangle2D screen = javafx.stage.Screen.getPrimary().getVisualBounds();
        Scene scene = new Scene(view.node(), Math.min(1360, screen.getWidth()), Math.min(820, screen.getHeight()));
        stage.setScene(scene);
        stage.titleProperty().bind(vm.titleProperty());
        stage.setMinWidth(900);
        stage.setMinHeight(560);
        stage.setOnCloseRequest(e -> {
            if (!view.confirmClose()) {
                e.consume();
            } else {
                vm.closeSession();
            }
        });
        stage.show();
    }

    @Override
    public void stop() {
        if (vm != null) {
            vm.closeSession();
        }
    }
}
