package dev.sheaf.curator.hierarchy;

import dev.sheaf.curator.checks.ChecksView;
import dev.sheaf.curator.checks.ChecksViewModel;
import dev.sheaf.curator.figures.AuditFlags;
import dev.sheaf.curator.figures.FiguresView;
import dev.sheaf.curator.figures.FiguresViewModel;
import dev.sheaf.curator.figures.IndexLookup;
import dev.sheaf.curator.session.CuratorSession;
import dev.sheaf.curator.suggestions.SuggestionsView;
import dev.sheaf.curator.suggestions.SuggestionsViewModel;
import java.io.Closeable;
import java.io.IOException;
import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import java.util.function.Function;
import javafx.beans.value.ObservableValue;
import javafx.scene.Node;
import javafx.scene.control.Label;
import javafx.scene.control.ScrollPane;
import javafx.scene.layout.StackPane;

/**
 * The structure panels for the open session: the hierarchy, the facet form, and the
 * suggestions, checks and figures. Each panel is a {@link Slot} that makes its view-model and view
 * for each session the window opens, and lets go of the old ones (listeners, background runs,
 * index readers) when the session closes.
 */
public final class StructurePanels {
    private final Slot hierarchy;
    private final Slot facet;
    private final Slot suggestions;
    private final Slot checks;
    private final Slot figures;

    public StructurePanels(ObservableValue<CuratorSession> session) {
        hierarchy = new Slot(session, s -> {
            HierarchyViewModel h = new HierarchyViewModel(s);
            return new Built(new HierarchyView(h), List.of(h::dispose));
        });
        facet = new Slot(session, s -> {
            FacetFormViewModel f = new FacetFormViewModel(s);
            ScrollPane scroll = new ScrollPane(new FacetFormView(f));
            scroll.setFitToWidth(true);
            return new Built(scroll, List.of(f::dispose));
        });
        suggestions = new Slot(session, s -> {
            SuggestionsViewModel vm = new SuggestionsViewModel(s);
            return new Built(new SuggestionsView(vm), List.of(vm::dispose));
        });
        checks = new Slot(session, s -> {
            ChecksViewModel vm = new ChecksViewModel(s);
            return new Built(new ChecksView(vm), List.of(vm::dispose));
        });
        figures = new Slot(session, s -> {
            IndexLookup lookup = null;
            AuditFlags flags = null;
            try {
                lookup = IndexLookup.of(s).orElse(null);
                flags = AuditFlags.read(s.workspace().output()).orElse(null);
            } catch (IOException e) {
                // the figures say that they are unknown; the rest of the window works on
            }
            FiguresViewModel vm = new FiguresViewModel(s, lookup, flags);
            IndexLookup l = lookup;
            List<Runnable> done = new ArrayList<>();
            done.add(vm::dispose);
            if (l != null) {
                done.add(() -> closeQuietly(l));
            }
            return new Built(new FiguresView(vm), done);
        });
        // a harvest mined after opening brings a new evidence index: count with it
        session.addListener((o, a, b) -> {
            if (b != null) {
                b.harvestProperty().addListener((p, x, y) -> figures.rebuild(b));
            }
        });
        if (session.getValue() != null) {
            session.getValue().harvestProperty().addListener((p, x, y) -> figures.rebuild(session.getValue()));
        }
    }

    /** The hierarchy tree: the window's centre. */
    public Node hierarchy() {
        return hierarchy.node;
    }

    /** The properties form of the selected facet, with the regulated-claim caution: a side panel. */
    public Node facet() {
        return facet.node;
    }

    public Node suggestions() {
        return suggestions.node;
    }

    public Node checks() {
        return checks.node;
    }

    public Node figures() {
        return figures.node;
    }

    private static void closeQuietly(Closeable c) {
        try {
            c.close();
        } catch (IOException ignored) {
            // a reader that fails to close holds no data of ours
        }
    }

    /** A view and what to call when it is let go. */
    record Built(Node view, List<Runnable> dispose) {
    }

    /** One panel that follows the session: rebuilt when another workspace opens, a hint while none is open. */
    static final class Slot {
        final StackPane node = new StackPane();
        private final Function<CuratorSession, Built> make;
        private Built current;

        Slot(ObservableValue<CuratorSession> session, Function<CuratorSession, Built> make) {
            this.make = Objects.requireNonNull(make);
            node.getStyleClass().add("structure-slot");
            session.addListener((o, a, b) -> rebuild(b));
            rebuild(session.getValue());
        }

        void rebuild(CuratorSession s) {
            if (current != null) {
                current.dispose().forEach(Runnable::run);
                current = null;
            }
            if (s == null) {
                Label l = new Label("Open a workspace (Ctrl+O)");
                l.getStyleClass().add("key-hint");
                node.getChildren().setAll(l);
                return;
            }
            current = make.apply(s);
            node.getChildren().setAll(current.view());
        }
    }
}
