package dev.sheaf.curator.details;

import dev.sheaf.curator.session.Caution;
import dev.sheaf.curator.session.CuratorSession;
import dev.sheaf.curator.session.Selection;
import dev.sheaf.miner.mine.Harvest;
import dev.sheaf.vocab.Concept;
import dev.sheaf.vocab.Decision;
import dev.sheaf.vocab.Label;
import dev.sheaf.vocab.Vocabulary;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.stream.Collectors;
import javafx.beans.InvalidationListener;
import javafx.beans.property.ReadOnlyStringProperty;
import javafx.beans.property.ReadOnlyStringWrapper;
import javafx.collections.FXCollections;
import javafx.collections.ObservableList;

/**
 * The details of what is selected: a candidate term's figures and decision, or a concept's
 * labels, place and notes, with the caution for regulated-claim facets.
 */
public final class DetailsViewModel {
    /** One line of the details: a name and its value. */
    public record Fact(String name, String value) {
    }

    private final ReadOnlyStringWrapper heading = new ReadOnlyStringWrapper(this, "heading", "Nothing selected");
    private final ReadOnlyStringWrapper kind = new ReadOnlyStringWrapper(this, "kind", "");
    private final ReadOnlyStringWrapper caution = new ReadOnlyStringWrapper(this, "caution", "");
    private final ObservableList<Fact> facts = FXCollections.observableArrayList();
    private final InvalidationListener update = o -> update();
    private CuratorSession session;

    public void setSession(CuratorSession s) {
        if (session != null) {
            session.selection().focusProperty().removeListener(update);
            session.selection().termProperty().removeListener(update);
            session.selection().conceptProperty().removeListener(update);
            session.vocabularyProperty().removeListener(update);
        }
        session = s;
        if (s != null) {
            s.selection().focusProperty().addListener(update);
            s.selection().termProperty().addListener(update);
            s.selection().conceptProperty().addListener(update);
            s.vocabularyProperty().addListener(update);
        }
        update();
    }

    private void update() {
        List<Fact> f = new ArrayList<>();
        String cautionText = "";
        if (session == null) {
            heading.set("Nothing selected");
            kind.set("");
        } else if (session.selection().focus() == Selection.Focus.TERM && session.selection().term() != null) {
            String term = session.selection().term();
            Vocabulary v = session.vocabulary();
            heading.set(term);
            kind.set("Candidate term");
            Optional<Harvest.Candidate> oc = session.candidate(term);
            oc.ifPresent(c -> {
                f.add(new Fact("Rank", String.format(Locale.ROOT, "%,d", c.rank())));
                f.add(new Fact("Occurrences", String.format(Locale.ROOT, "%,d", c.frequency())));
                f.add(new Fact("Listings", String.format(Locale.ROOT, "%,d (%.1f%%)", c.df(), c.dfShare() * 100)));
                f.add(new Fact("Score", c.score() == null ? "not defined for one word" : String.format(Locale.ROOT, "%.3f", c.score())));
                Harvest.Scores s = c.scores();
                if (s.npmi() != null) {
                    f.add(new Fact("NPMI · LLR", String.format(Locale.ROOT, "%.3f · %.1f", s.npmi(), s.llr() == null ? Double.NaN : s.llr())));
                }
                if (!c.topCategories().isEmpty()) {
                    f.add(new Fact("Distinctive in", c.topCategories().stream()
                            .map(x -> String.format(Locale.ROOT, "%s (z %.1f)", x.category(), x.z())).collect(Collectors.joining(", "))));
                }
            });
            Optional<Decision> d = v.decision(term);
            if (d.isPresent()) {
                Decision x = d.get();
                String what = x.outcome().word() + (x.concept() != null ? " as " + v.displayLabel(x.concept()) : "")
                        + (x.reason() != null ? " — " + x.reason() : "");
                f.add(new Fact("Decision", what));
                if (x.concept() != null) {
                    cautionText = regulated(v, x.concept()) ? Caution.REGULATED_CLAIM : "";
                }
            } else {
                List<Concept> with = v.conceptsWithLabel(Label.of(term, v.defaultLanguage()));
                f.add(new Fact("Decision", with.isEmpty() ? "none yet (K keep, D drop, P park)"
                        : "none; already a label of " + with.stream().map(c -> c.displayLabel(v.defaultLanguage()))
                                .collect(Collectors.joining(", "))));
                for (Concept c : with) {
                    if (regulated(v, c.id())) {
                        cautionText = Caution.REGULATED_CLAIM;
                    }
                }
            }
        } else if (session.selection().focus() == Selection.Focus.CONCEPT && session.selection().concept() != null) {
            Vocabulary v = session.vocabulary();
            String id = session.selection().concept();
            Optional<Concept> oc = v.concept(id);
            if (oc.isEmpty()) {
                heading.set(v.displayLabel(id));
                kind.set("No longer in the vocabulary");
            } else {
                Concept c = oc.get();
                String lang = v.defaultLanguage();
                heading.set(c.displayLabel(lang));
                kind.set(c.isFacet() ? "Facet" : "Concept");
                f.add(new Fact("Id", c.id()));
                if (!c.isFacet()) {
                    List<Concept> facets = v.facetsOf(id);
                    f.add(new Fact("Facet", facets.isEmpty() ? "none yet (not under a facet)"
                            : facets.stream().map(x -> x.displayLabel(lang)).collect(Collectors.joining(", "))));
                    if (!c.broader().isEmpty() && !c.broader().equals(facets.stream().map(Concept::id)
                            .collect(Collectors.toCollection(java.util.TreeSet::new)))) {
                        f.add(new Fact("Broader", c.broader().stream().map(v::displayLabel).collect(Collectors.joining(", "))));
                    }
                } else {
                    f.add(new Fact("Values", String.format(Locale.ROOT, "%,d", v.valuesOf(id).size())));
                    f.add(new Fact("Kind", c.facet().valueKind().word() + (c.facet().multiValued() ? ", several per listing" : ", one per listing")));
                }
                if (!c.altLabels().isEmpty()) {
                    f.add(new Fact("Also called", c.altLabels().stream().map(Label::text).collect(Collectors.joining(", "))));
                }
                if (!c.hiddenLabels().isEmpty()) {
                    f.add(new Fact("Misspellings", c.hiddenLabels().stream().map(Label::text).collect(Collectors.joining(", "))));
                }
                c.definitions().values().stream().findFirst().ifPresent(t -> f.add(new Fact("Definition", t)));
                c.scopeNotes().values().stream().findFirst().ifPresent(t -> f.add(new Fact("Scope note", t)));
                if (c.provenance() != null && c.provenance().harvestTerm() != null) {
                    f.add(new Fact("From the harvest", "\"" + c.provenance().harvestTerm() + "\""));
                }
                cautionText = regulated(v, id) ? Caution.REGULATED_CLAIM : "";
            }
        } else {
            heading.set("Nothing selected");
            kind.set("Select a candidate or a concept to see its details and evidence.");
        }
        facts.setAll(f);
        caution.set(cautionText);
    }

    /** Whether a concept is, or is under, a facet marked as a regulated claim. */
    public static boolean regulated(Vocabulary v, String id) {
        Optional<Concept> c = v.concept(id);
        if (c.isPresent() && c.get().isFacet()) {
            return c.get().facet().regulatedClaim();
        }
        for (Concept f : v.facetsOf(id)) {
            if (f.facet().regulatedClaim()) {
                return true;
            }
        }
        return false;
    }

    public ReadOnlyStringProperty headingProperty() {
        return heading.getReadOnlyProperty();
    }

    /** "Candidate term", "Concept", "Facet", or a hint. */
    public ReadOnlyStringProperty kindProperty() {
        return kind.getReadOnlyProperty();
    }

    /** The regulated-claim caution, or "" when none applies. */
    public ReadOnlyStringProperty cautionProperty() {
        return caution.getReadOnlyProperty();
    }

    public ObservableList<Fact> facts() {
        return facts;
    }
}
