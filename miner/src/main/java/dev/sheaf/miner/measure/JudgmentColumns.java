package dev.sheaf.miner.measure;

import java.util.LinkedHashSet;
import java.util.List;
import java.util.Locale;
import java.util.Objects;
import java.util.Set;

/**
 * Which header names hold the four judgment columns. Names are matched ignoring case and
 * surrounding spaces; other columns in the file are ignored.
 *
 * @param item      the item id column; default {@code item}
 * @param annotator the annotator id column; default {@code annotator}
 * @param attribute the attribute column (concept or facet id or label); default {@code attribute}
 * @param value     the judged value column; default {@code value}
 */
public record JudgmentColumns(String item, String annotator, String attribute, String value) {
    /** {@code item,annotator,attribute,value}. */
    public static final JudgmentColumns DEFAULT = new JudgmentColumns("item", "annotator", "attribute", "value");

    public JudgmentColumns {
        Set<String> seen = new LinkedHashSet<>();
        for (String c : new String[] {item, annotator, attribute, value}) {
            Objects.requireNonNull(c, "column name");
            if (c.isBlank()) {
                throw new IllegalArgumentException("a judgment column name must not be blank");
            }
            if (!seen.add(key(c))) {
                throw new IllegalArgumentException("each judgment column needs its own header name; '" + c.strip()
                        + "' is given twice");
            }
        }
        item = item.strip();
        annotator = annotator.strip();
        attribute = attribute.strip();
        value = value.strip();
    }

    /** The names in file order of meaning: item, annotator, attribute, value. */
    public List<String> names() {
        return List.of(item, annotator, attribute, value);
    }

    static String key(String headerName) {
        return headerName.strip().toLowerCase(Locale.ROOT);
    }
}
