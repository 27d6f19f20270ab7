package dev.sheaf.samples;

import java.util.EnumSet;
import java.util.List;
import java.util.Objects;
import java.util.Set;

/**
 * One invented listing, fully worded: what every renderer (HTML page, CSV row, JSONL line, PDF or
 * DOCX sheet, text note) writes, plus the ground truth behind the words.
 *
 * @param shown     the traits the listing's words give evidence for (what a careful reader can tell)
 * @param variantOf id of the listing this one is a colour variant of, or null
 */
record Product(String id, Category category, Supplier supplier, String title, String description,
               List<String> bullets, List<Spec> specs, Facts facts, Set<Trait> shown, String colourName,
               String variantOf) {
    Product {
        Objects.requireNonNull(id, "id");
        Objects.requireNonNull(category, "category");
        Objects.requireNonNull(supplier, "supplier");
        Objects.requireNonNull(title, "title");
        Objects.requireNonNull(description, "description");
        Objects.requireNonNull(facts, "facts");
        Objects.requireNonNull(colourName, "colourName");
        bullets = List.copyOf(bullets);
        specs = List.copyOf(specs);
        shown = shown.isEmpty() ? Set.of() : java.util.Collections.unmodifiableSet(EnumSet.copyOf(shown));
        if (title.isBlank() || description.isBlank()) {
            throw new IllegalArgumentException("listing " + id + " needs a title and a description");
        }
        long distinctKeys = specs.stream().map(Spec::key).distinct().count();
        if (distinctKeys != specs.size()) {
            throw new IllegalArgumentException("listing " + id + " repeats a spec key: " + specs);
        }
    }

    Product withText(String newDescription, List<String> newBullets) {
        return new Product(id, category, supplier, title, newDescription, newBullets, specs, facts, shown, colourName, variantOf);
    }

    boolean shows(Trait t) {
        return shown.contains(t);
    }

    /** Everything a reader sees of this listing, as one string (for counting planted forms). */
    String allText() {
        StringBuilder sb = new StringBuilder(title).append('\n').append(description).append('\n');
        for (String b : bullets) {
            sb.append(b).append('\n');
        }
        for (Spec s : specs) {
            sb.append(s.key()).append(": ").append(s.value()).append('\n');
        }
        return sb.toString();
    }
}
