package dev.sheaf.vocab;

import java.util.ArrayList;
import java.util.Collection;
import java.util.Collections;
import java.util.Comparator;
import java.util.List;
import java.util.Objects;
import java.util.Optional;
import java.util.SortedSet;
import java.util.TreeSet;

/**
 * What a shop needs to know about a facet besides its labels.
 *
 * <p>Defaults ({@link #terms()}): term values, single-valued, applies to every category, not a
 * regulated claim.
 *
 * @param valueKind term, number or yes/no
 * @param multiValued whether a listing may carry several values (materials: yes; closure: often no)
 * @param categories listing categories the facet applies to; empty means every category
 * @param unit the unit of a number facet ("kg", "L", "mm"); null for other kinds or unitless counts
 * @param buckets named ranges of a number facet, sorted by lower bound, not overlapping; empty otherwise
 * @param regulatedClaim whether values are regulated or safety claims (waterproof ratings, flame
 *     resistance, UV protection, child safety, fibre content) that need compliance review before they ship
 */
public record FacetProperties(ValueKind valueKind, boolean multiValued, SortedSet<String> categories,
                              String unit, List<Bucket> buckets, boolean regulatedClaim) {

    private static final Comparator<Bucket> BY_MIN =
            Comparator.comparing(Bucket::min, Comparator.nullsFirst(Comparator.naturalOrder()));

    public FacetProperties {
        Objects.requireNonNull(valueKind, "valueKind");
        TreeSet<String> cats = new TreeSet<>();
        for (String c : categories == null ? List.<String>of() : categories) {
            cats.add(Label.checkText(c, "category"));
        }
        categories = Collections.unmodifiableSortedSet(cats);
        List<Bucket> bs = new ArrayList<>(buckets == null ? List.of() : buckets);
        if (unit != null) {
            unit = Label.checkText(unit, "unit");
        }
        if (valueKind != ValueKind.NUMBER && (unit != null || !bs.isEmpty())) {
            throw new IllegalArgumentException("a unit and buckets belong to number facets only; this facet's value kind is "
                    + valueKind.word());
        }
        bs.sort(BY_MIN);
        TreeSet<String> names = new TreeSet<>();
        for (int i = 0; i < bs.size(); i++) {
            Bucket b = bs.get(i);
            if (!names.add(b.label())) {
                throw new IllegalArgumentException("two buckets are named \"" + b.label() + "\"; bucket names must differ");
            }
            if (i > 0) {
                Bucket prev = bs.get(i - 1);
                if (prev.max() == null || b.min() == null || prev.max() > b.min()) {
                    throw new IllegalArgumentException("buckets \"" + prev.label() + "\" and \"" + b.label()
                            + "\" overlap; each bucket's min must be at or above the previous bucket's max");
                }
            }
        }
        buckets = List.copyOf(bs);
    }

    /** Term values, single-valued, every category, not regulated. */
    public static FacetProperties terms() {
        return new FacetProperties(ValueKind.TERM, false, null, null, null, false);
    }

    /** A number facet in {@code unit} (may be null) with optional buckets. */
    public static FacetProperties number(String unit, Collection<Bucket> buckets) {
        return new FacetProperties(ValueKind.NUMBER, false, null, unit, buckets == null ? null : List.copyOf(buckets), false);
    }

    /** A yes/no facet. */
    public static FacetProperties yesNo() {
        return new FacetProperties(ValueKind.YES_NO, false, null, null, null, false);
    }

    public FacetProperties withMultiValued(boolean multi) {
        return new FacetProperties(valueKind, multi, categories, unit, buckets, regulatedClaim);
    }

    public FacetProperties withCategories(Collection<String> cats) {
        return new FacetProperties(valueKind, multiValued, cats == null ? null : new TreeSet<>(cats), unit, buckets, regulatedClaim);
    }

    public FacetProperties withRegulatedClaim(boolean regulated) {
        return new FacetProperties(valueKind, multiValued, categories, unit, buckets, regulated);
    }

    /** Whether the facet applies to listings of {@code category} (every category when none are named). */
    public boolean appliesTo(String category) {
        return categories.isEmpty() || category != null && categories.contains(category);
    }

    /** The bucket a number falls in, if any. */
    public Optional<Bucket> bucketFor(double value) {
        for (Bucket b : buckets) {
            if (b.contains(value)) {
                return Optional.of(b);
            }
        }
        return Optional.empty();
    }
}
