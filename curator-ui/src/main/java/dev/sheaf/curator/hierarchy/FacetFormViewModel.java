package dev.sheaf.curator.hierarchy;

import dev.sheaf.curator.session.Caution;
import dev.sheaf.curator.session.CuratorSession;
import dev.sheaf.vocab.Bucket;
import dev.sheaf.vocab.Concept;
import dev.sheaf.vocab.Edit;
import dev.sheaf.vocab.EditRefusedException;
import dev.sheaf.vocab.FacetProperties;
import dev.sheaf.vocab.ValueKind;
import dev.sheaf.vocab.Vocabulary;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Objects;
import java.util.Optional;
import java.util.TreeSet;
import javafx.beans.property.BooleanProperty;
import javafx.beans.property.ObjectProperty;
import javafx.beans.property.ReadOnlyBooleanProperty;
import javafx.beans.property.ReadOnlyBooleanWrapper;
import javafx.beans.property.ReadOnlyStringProperty;
import javafx.beans.property.ReadOnlyStringWrapper;
import javafx.beans.property.SimpleBooleanProperty;
import javafx.beans.property.SimpleObjectProperty;
import javafx.beans.property.SimpleStringProperty;
import javafx.beans.property.StringProperty;
import javafx.collections.FXCollections;
import javafx.collections.ObservableList;

/**
 * The side form with the properties of the facet the selection is in (the facet itself, or the
 * facet above the selected concept): value kind, single or multi-valued, the categories it
 * applies to, the unit of a number facet, and whether its values are a regulated claim. Toggles
 * and choices take effect at once; the categories and unit fields take effect on {@link #applyText()}
 * (Enter or leaving the field). Each change is one undoable edit.
 *
 * <p>{@link #cautionProperty()} holds the regulated-claim notice while such a facet is shown,
 * and {@link #regulatedProperty()} says so for styling.
 *
 * <p>A number facet has named ranges ({@link Bucket}s: from inclusive, to exclusive, either side
 * open): {@link #ranges()} lists them; {@link #addRange()} adds the one typed in the name, from and
 * to fields, {@link #removeRange(int)} takes one out. The vocabulary refuses overlapping or
 * same-named ranges and the form says why. UI thread only.
 */
public final class FacetFormViewModel {
    private final CuratorSession session;
    private final ReadOnlyStringWrapper facetId = new ReadOnlyStringWrapper(this, "facetId");
    private final ReadOnlyStringWrapper title = new ReadOnlyStringWrapper(this, "title", "No facet selected");
    private final ReadOnlyBooleanWrapper available = new ReadOnlyBooleanWrapper(this, "available");
    private final ObjectProperty<ValueKind> valueKind = new SimpleObjectProperty<>(this, "valueKind", ValueKind.TERM);
    private final BooleanProperty multiValued = new SimpleBooleanProperty(this, "multiValued");
    private final BooleanProperty regulated = new SimpleBooleanProperty(this, "regulated");
    private final StringProperty categories = new SimpleStringProperty(this, "categories", "");
    private final StringProperty unit = new SimpleStringProperty(this, "unit", "");
    private final ObservableList<String> ranges = FXCollections.observableArrayList();
    private final ObservableList<String> rangesView = FXCollections.unmodifiableObservableList(ranges);
    private final StringProperty rangeName = new SimpleStringProperty(this, "rangeName", "");
    private final StringProperty rangeFrom = new SimpleStringProperty(this, "rangeFrom", "");
    private final StringProperty rangeTo = new SimpleStringProperty(this, "rangeTo", "");
    private final ReadOnlyStringWrapper caution = new ReadOnlyStringWrapper(this, "caution", "");
    private final ReadOnlyStringWrapper message = new ReadOnlyStringWrapper(this, "message", "");
    private final CuratorSession.VocabularyListener onChange = c -> load();
    private boolean loading;

    public FacetFormViewModel(CuratorSession session) {
        this.session = Objects.requireNonNull(session);
        session.addVocabularyListener(onChange);
        session.selection().conceptProperty().addListener((o, a, b) -> load());
        valueKind.addListener((o, a, b) -> {
            if (!loading && b != null) {
                change(p -> new FacetProperties(b, p.multiValued(), p.categories(),
                        b == ValueKind.NUMBER ? p.unit() : null, b == ValueKind.NUMBER ? p.buckets() : null, p.regulatedClaim()));
            }
        });
        multiValued.addListener((o, a, b) -> {
            if (!loading) {
                change(p -> p.withMultiValued(b));
            }
        });
        regulated.addListener((o, a, b) -> {
            if (!loading) {
                change(p -> p.withRegulatedClaim(b));
            }
        });
        load();
    }

    public void dispose() {
        session.removeVocabularyListener(onChange);
    }

    /** Reads the facet of the current selection into the form. */
    private void load() {
        loading = true;
        try {
            Vocabulary v = session.vocabulary();
            Optional<Concept> f = facetOfSelection(v);
            available.set(f.isPresent());
            if (f.isEmpty()) {
                facetId.set(null);
                title.set(session.selection().concept() == null ? "No facet selected"
                        : "\"" + v.displayLabel(session.selection().concept()) + "\" is under no facet");
                caution.set("");
                ranges.clear();
                return;
            }
            FacetProperties p = f.get().facet();
            facetId.set(f.get().id());
            title.set("Facet: " + f.get().displayLabel(v.defaultLanguage()));
            valueKind.set(p.valueKind());
            multiValued.set(p.multiValued());
            regulated.set(p.regulatedClaim());
            categories.set(String.join(", ", p.categories()));
            unit.set(p.unit() == null ? "" : p.unit());
            List<String> rs = new ArrayList<>();
            for (Bucket b : p.buckets()) {
                rs.add(describe(b, p.unit()));
            }
            ranges.setAll(rs);
            caution.set(p.regulatedClaim() ? Caution.REGULATED_CLAIM : "");
        } finally {
            loading = false;
        }
    }

    private Optional<Concept> facetOfSelection(Vocabulary v) {
        String id = session.selection().concept();
        return id == null ? Optional.empty() : v.facetOf(id);
    }

    /** Applies the categories and unit fields (comma-separated categories; empty means every category). */
    public boolean applyText() {
        if (facetId.get() == null) {
            return false;
        }
        TreeSet<String> cats = new TreeSet<>();
        for (String c : categories.get() == null ? new String[0] : categories.get().split(",")) {
            if (!c.isBlank()) {
                cats.add(c.strip());
            }
        }
        String u = unit.get() == null || unit.get().isBlank() ? null : unit.get().strip();
        return change(p -> new FacetProperties(p.valueKind(), p.multiValued(), cats,
                p.valueKind() == ValueKind.NUMBER ? u : null, p.buckets(), p.regulatedClaim()));
    }

    /** "light: from 0 to 1 kg", "heavy: 2 kg and more", "small: under 10 L". */
    public static String describe(Bucket b, String unit) {
        String u = unit == null ? "" : " " + unit;
        if (b.min() == null) {
            return b.label() + ": under " + number(b.max()) + u;
        }
        if (b.max() == null) {
            return b.label() + ": " + number(b.min()) + u + " and more";
        }
        return b.label() + ": from " + number(b.min()) + " to " + number(b.max()) + u;
    }

    private static String number(double d) {
        return d == Math.rint(d) && Math.abs(d) < 1e15 ? String.valueOf((long) d) : String.valueOf(d);
    }

    /** Adds the range typed in the name, from and to fields (either bound may stay empty); the fields clear when it is added. */
    public boolean addRange() {
        if (facetId.get() == null) {
            return false;
        }
        if (valueKind.get() != ValueKind.NUMBER) {
            message.set("Not done: ranges belong to number facets; set the values to numbers first");
            return false;
        }
        String name = rangeName.get() == null ? "" : rangeName.get().strip();
        if (name.isEmpty()) {
            message.set("Not done: give the range a name (e.g. light)");
            return false;
        }
        Double from;
        Double to;
        try {
            from = bound(rangeFrom.get(), "from");
            to = bound(rangeTo.get(), "to");
        } catch (IllegalArgumentException e) {
            message.set("Not done: " + e.getMessage());
            return false;
        }
        Bucket b;
        try {
            b = new Bucket(name, from, to);
        } catch (IllegalArgumentException e) {
            message.set("Not done: " + e.getMessage());
            return false;
        }
        boolean done = change(p -> {
            List<Bucket> bs = new ArrayList<>(p.buckets());
            bs.add(b);
            return new FacetProperties(p.valueKind(), p.multiValued(), p.categories(), p.unit(), bs, p.regulatedClaim());
        });
        if (done) {
            rangeName.set("");
            rangeFrom.set("");
            rangeTo.set("");
        }
        return done;
    }

    /** Takes out the range at {@code index} of {@link #ranges()}. */
    public boolean removeRange(int index) {
        if (facetId.get() == null || index < 0 || index >= ranges.size()) {
            return false;
        }
        return change(p -> {
            List<Bucket> bs = new ArrayList<>(p.buckets());
            bs.remove(index);
            return new FacetProperties(p.valueKind(), p.multiValued(), p.categories(), p.unit(), bs, p.regulatedClaim());
        });
    }

    private static Double bound(String text, String which) {
        String t = text == null ? "" : text.strip().replace(',', '.');
        if (t.isEmpty()) {
            return null;
        }
        try {
            double d = Double.parseDouble(t);
            if (!Double.isFinite(d)) {
                throw new NumberFormatException();
            }
            return d;
        } catch (NumberFormatException e) {
            throw new IllegalArgumentException(String.format(Locale.ROOT, "\"%s\" in '%s' is not a number", text.strip(), which));
        }
    }

    private boolean change(java.util.function.UnaryOperator<FacetProperties> how) {
        String id = facetId.get();
        if (id == null) {
            return false;
        }
        Vocabulary v = session.vocabulary();
        FacetProperties before = v.concept(id).map(Concept::facet).orElse(null);
        if (before == null) {
            return false;
        }
        FacetProperties after;
        try {
            after = how.apply(before);
        } catch (IllegalArgumentException e) {
            message.set("Not done: " + e.getMessage());
            load();
            return false;
        }
        if (after.equals(before)) {
            return false;
        }
        try {
            Edit e = Edit.setFacetProperties(id, after);
            String d = e.describe(v);
            session.apply(e);
            message.set(d);
            return true;
        } catch (EditRefusedException e) {
            message.set("Not done: " + String.join("; ", e.problems()));
            load();
            return false;
        }
    }

    /** The facet shown, or null. */
    public ReadOnlyStringProperty facetIdProperty() {
        return facetId.getReadOnlyProperty();
    }

    /** "Facet: Material", or why no form is shown. */
    public ReadOnlyStringProperty titleProperty() {
        return title.getReadOnlyProperty();
    }

    /** Whether a facet is shown (the form is enabled). */
    public ReadOnlyBooleanProperty availableProperty() {
        return available.getReadOnlyProperty();
    }

    public ObjectProperty<ValueKind> valueKindProperty() {
        return valueKind;
    }

    /** The kinds offered, in the order shown. */
    public List<ValueKind> valueKinds() {
        return List.of(ValueKind.values());
    }

    public BooleanProperty multiValuedProperty() {
        return multiValued;
    }

    public BooleanProperty regulatedProperty() {
        return regulated;
    }

    /** Comma-separated listing categories; empty means every category. */
    public StringProperty categoriesProperty() {
        return categories;
    }

    /** The unit of a number facet ("L", "kg"); ignored for other kinds. */
    public StringProperty unitProperty() {
        return unit;
    }

    /** The ranges of a number facet as shown ("light: from 0 to 1 kg"), in order. */
    public ObservableList<String> ranges() {
        return rangesView;
    }

    /** The name of the range to add. */
    public StringProperty rangeNameProperty() {
        return rangeName;
    }

    /** The lower bound (inclusive) of the range to add; empty for none. */
    public StringProperty rangeFromProperty() {
        return rangeFrom;
    }

    /** The upper bound (exclusive) of the range to add; empty for none. */
    public StringProperty rangeToProperty() {
        return rangeTo;
    }

    /** The regulated-claim notice while such a facet is shown, else "". */
    public ReadOnlyStringProperty cautionProperty() {
        return caution.getReadOnlyProperty();
    }

    /** What the last change did or why it was refused. */
    public ReadOnlyStringProperty messageProperty() {
        return message.getReadOnlyProperty();
    }
}
