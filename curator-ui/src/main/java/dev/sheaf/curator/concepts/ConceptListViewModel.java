package dev.sheaf.curator.concepts;

import dev.sheaf.curator.session.CuratorSession;
import dev.sheaf.vocab.Concept;
import dev.sheaf.vocab.Vocabulary;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import java.util.stream.Collectors;
import javafx.beans.InvalidationListener;
import javafx.beans.property.ReadOnlyStringProperty;
import javafx.beans.property.ReadOnlyStringWrapper;
import javafx.beans.property.SimpleStringProperty;
import javafx.beans.property.StringProperty;
import javafx.collections.FXCollections;
import javafx.collections.ObservableList;

/**
 * A flat, searchable list of the vocabulary's concepts (facets first, then values by label), for
 * picking the concept a term joins as a label. The centre of the window shows it until a
 * hierarchy view is installed there.
 */
public final class ConceptListViewModel {
    /** One entry: id, label, and what it sits under. */
    public record Item(String id, String label, String context, boolean facet) {
    }

    private final ObservableList<Item> items = FXCollections.observableArrayList();
    private final StringProperty filter = new SimpleStringProperty(this, "filter", "");
    private final ReadOnlyStringWrapper summary = new ReadOnlyStringWrapper(this, "summary", "");
    private final InvalidationListener update = o -> update();
    private List<Item> all = List.of();
    private CuratorSession session;

    public ConceptListViewModel() {
        filter.addListener(o -> apply());
    }

    public void setSession(CuratorSession s) {
        if (session != null) {
            session.vocabularyProperty().removeListener(update);
        }
        session = s;
        if (s != null) {
            s.vocabularyProperty().addListener(update);
        }
        update();
    }

    private void update() {
        List<Item> l = new ArrayList<>();
        if (session != null) {
            Vocabulary v = session.vocabulary();
            String lang = v.defaultLanguage();
            for (Concept c : v.allConcepts()) {
                String ctx = c.isFacet() ? String.format(Locale.ROOT, "facet · %,d value%s%s", v.valuesOf(c.id()).size(),
                        v.valuesOf(c.id()).size() == 1 ? "" : "s",
                        c.facet().regulatedClaim() ? " · regulated claim" : "") : v.facetsOf(c.id()).stream().map(f -> f.displayLabel(lang))
                        .collect(Collectors.joining(", "));
                l.add(new Item(c.id(), c.displayLabel(lang), ctx.isEmpty() ? "not under a facet" : ctx, c.isFacet()));
            }
            l.sort(Comparator.comparing((Item i) -> !i.facet()).thenComparing(i -> i.label().toLowerCase(Locale.ROOT)));
        }
        all = l;
        apply();
    }

    private void apply() {
        String f = filter.get() == null ? "" : filter.get().strip().toLowerCase(Locale.ROOT);
        List<Item> out = new ArrayList<>();
        for (Item i : all) {
            if (f.isEmpty() || i.label().toLowerCase(Locale.ROOT).contains(f) || i.context().toLowerCase(Locale.ROOT).contains(f)) {
                out.add(i);
            }
        }
        items.setAll(out);
        summary.set(String.format(Locale.ROOT, "%,d of %,d concepts", out.size(), all.size()));
    }

    /** Makes a concept the selection (the target of Shift+K, and what details and evidence show). */
    public void select(Item i) {
        if (session != null && i != null) {
            session.selection().selectConcept(i.id());
        }
    }

    public ObservableList<Item> items() {
        return items;
    }

    public StringProperty filterProperty() {
        return filter;
    }

    public ReadOnlyStringProperty summaryProperty() {
        return summary.getReadOnlyProperty();
    }
}
