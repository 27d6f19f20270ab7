package dev.sheaf.miner.measure;

import java.util.ArrayList;
import java.util.Collection;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import java.util.TreeMap;
import java.util.TreeSet;
import java.util.regex.Pattern;

/**
 * The values one attribute takes, read as categories with an order and numbers where they have
 * them, and the metric alpha uses. See docs/decisions/071-value-scales-and-metrics.md.
 *
 * <p>Values are compared after stripping, collapsing inner white space and folding case
 * (Locale.ROOT). When every value is a present/absent word (present/absent, yes/no, true/false,
 * 1/0) the attribute is binary: present = 1, absent = 0. When every value is a plain decimal
 * number, categories are the distinct numbers ("2" and "2.0" are one grade). Otherwise values are
 * unordered categories.
 */
final class JudgmentScale {
    /** What the values looked like. */
    enum Kind {
        BINARY("present/absent"), GRADES("integer grades"), NUMBERS("numbers"), CATEGORIES("categories");

        final String label;

        Kind(String label) {
            this.label = label;
        }
    }

    private static final Set<String> PRESENT = Set.of("present", "yes", "true", "1");
    private static final Set<String> ABSENT = Set.of("absent", "no", "false", "0");
    private static final Pattern NUMBER = Pattern.compile("[+-]?(?:\\d+(?:\\.\\d*)?|\\.\\d+)(?:[eE][+-]?\\d+)?");
    private static final Pattern SPACES = Pattern.compile("\\s+");

    final Kind kind;
    final AgreementMetric metric;
    /** True when the metric came from the options, false when chosen from the values. */
    final boolean metricFromOptions;
    /** Why the metric differs from the one asked for, or null. */
    final String note;
    /** Category labels in category order (ascending for numbers). */
    final List<String> labels;
    /** The number of each category (NaN for unordered categories). */
    final double[] numbers;
    private final Map<String, Integer> indexByFolded;

    private JudgmentScale(Kind kind, AgreementMetric metric, boolean fromOptions, String note, List<String> labels,
                          double[] numbers, Map<String, Integer> indexByFolded) {
        this.kind = kind;
        this.metric = metric;
        this.metricFromOptions = fromOptions;
        this.note = note;
        this.labels = List.copyOf(labels);
        this.numbers = numbers;
        this.indexByFolded = indexByFolded;
    }

    int size() {
        return labels.size();
    }

    /** The category of a raw value; the value must be one the scale was built from. */
    int categoryOf(String raw) {
        Integer i = indexByFolded.get(fold(raw));
        if (i == null) {
            throw new IllegalArgumentException("value '" + raw + "' is not on this scale");
        }
        return i;
    }

    static String fold(String raw) {
        return SPACES.matcher(raw.strip()).replaceAll(" ").toLowerCase(Locale.ROOT);
    }

    /**
     * Reads the scale of one attribute's values.
     *
     * @param asked            the metric set by option, or null to choose from the values
     * @param ordinalMaxLevels integer values with at most this many distinct values are ordinal grades
     */
    static JudgmentScale of(Collection<String> rawValues, AgreementMetric asked, int ordinalMaxLevels) {
        Set<String> folded = new TreeSet<>();
        for (String v : rawValues) {
            folded.add(fold(v));
        }
        Map<String, Integer> index = new HashMap<>();
        List<String> labels = new ArrayList<>();
        Kind kind;
        double[] numbers;
        if (!folded.isEmpty() && folded.stream().allMatch(v -> PRESENT.contains(v) || ABSENT.contains(v))) {
            kind = Kind.BINARY;
            labels.add("absent");
            labels.add("present");
            numbers = new double[] {0, 1};
            for (String v : folded) {
                index.put(v, PRESENT.contains(v) ? 1 : 0);
            }
        } else if (!folded.isEmpty() && folded.stream().allMatch(v -> NUMBER.matcher(v).matches())) {
            TreeMap<Double, List<String>> byNumber = new TreeMap<>();
            for (String v : folded) {
                byNumber.computeIfAbsent(Double.parseDouble(v) + 0.0, x -> new ArrayList<>()).add(v); // + 0.0: -0 is 0
            }
            boolean integers = byNumber.keySet().stream().allMatch(d -> d == Math.rint(d) && Math.abs(d) < 1e15);
            kind = integers && byNumber.size() <= ordinalMaxLevels ? Kind.GRADES : Kind.NUMBERS;
            numbers = new double[byNumber.size()];
            int i = 0;
            for (Map.Entry<Double, List<String>> e : byNumber.entrySet()) {
                numbers[i] = e.getKey();
                labels.add(numberLabel(e.getKey()));
                for (String v : e.getValue()) {
                    index.put(v, i);
                }
                i++;
            }
        } else {
            kind = Kind.CATEGORIES;
            numbers = new double[folded.size()];
            int i = 0;
            for (String v : folded) {
                numbers[i] = Double.NaN;
                labels.add(v);
                index.put(v, i++);
            }
        }
        AgreementMetric auto = switch (kind) {
            case BINARY, CATEGORIES -> AgreementMetric.NOMINAL;
            case GRADES -> AgreementMetric.ORDINAL;
            case NUMBERS -> AgreementMetric.INTERVAL;
        };
        if (asked == null) {
            return new JudgmentScale(kind, auto, false, null, labels, numbers, index);
        }
        AgreementMetric used = asked;
        String note = null;
        if (asked.needsNumbers() && kind == Kind.CATEGORIES) {
            used = AgreementMetric.NOMINAL;
            note = "metric " + asked.label() + " was asked for, but the values are not numbers (e.g. '"
                    + labels.get(0) + "'); alpha uses the nominal metric. Use numeric grades for an ordered attribute";
        } else if (asked == AgreementMetric.RATIO && numbers.length > 0 && numbers[0] < 0) {
            used = AgreementMetric.INTERVAL;
            note = "metric ratio was asked for, but a value is negative (" + labels.get(0)
                    + "); ratio needs a true zero, so alpha uses the interval metric";
        }
        return new JudgmentScale(kind, used, true, note, labels, numbers, index);
    }

    private static String numberLabel(double d) {
        if (d == Math.rint(d) && Math.abs(d) < 1e15) {
            return Long.toString((long) d);
        }
        return Double.toString(d);
    }
}
