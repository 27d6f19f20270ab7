package dev.sheaf.miner.measure;

import java.util.ArrayList;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;

/**
 * Every edge that turns a figure into a flag, in one immutable, overridable configuration. It
 * embeds the {@link AgreementThresholds} (alpha verdicts, kappa bands) and adds the edges of the
 * feedback, coverage and overlap figures. {@link #DEFAULTS} cite their sources; override by key with
 * {@link #with(String, double)} or {@link #fromMap(Map)}; unknown keys are rejected by name.
 *
 * <p>A figure exactly at an edge never raises a flag: "below" edges flag {@code figure < edge},
 * "above" edges flag {@code figure > edge}.
 *
 * <table>
 * <caption>Keys, defaults and sources</caption>
 * <tr><th>key</th><th>default</th><th>flag</th><th>source</th></tr>
 * <tr><td>alpha.tentative</td><td>.667</td><td>contested when α below</td><td>Krippendorff 2004, Content Analysis 2nd ed. [mem]</td></tr>
 * <tr><td>alpha.reliable, kappa.*</td><td>.800; .20/.40/.60/.80</td><td>shown beside α and κ</td><td>Krippendorff 2004; Landis &amp; Koch 1977, Biometrics 33(1)</td></tr>
 * <tr><td>direction.agreement</td><td>.80</td><td>contested when mean pairwise direction agreement below</td><td>[practice]</td></tr>
 * <tr><td>direction.contradiction</td><td>.20</td><td>contested when the share of pairs with a contradiction is above</td><td>[practice]</td></tr>
 * <tr><td>direction.minPairs</td><td>3</td><td>direction figures judged only with at least this many pairs of two or more mentioners</td><td>[practice]</td></tr>
 * <tr><td>mentions.min</td><td>5</td><td>hedge, comparative and grounding figures judged only with at least this many mentions</td><td>[practice]</td></tr>
 * <tr><td>hedge.rate</td><td>.30</td><td>vague when the share of hedged mentions is above</td><td>[practice]</td></tr>
 * <tr><td>comparative.share</td><td>.80</td><td>vague when the share of comparative mentions is above (concepts only; number facets are compared by nature)</td><td>[practice]</td></tr>
 * <tr><td>grounding.precision</td><td>.70</td><td>vague when grounded / checked mentions is below</td><td>[practice]</td></tr>
 * <tr><td>grounding.checkable</td><td>.50</td><td>vague when the share of mentions the catalog can check at all is below</td><td>[practice]</td></tr>
 * <tr><td>fill.rate</td><td>.50</td><td>thin when below, among listings where the facet applies</td><td>[practice]</td></tr>
 * <tr><td>overlap.jaccard</td><td>.80</td><td>overlapping when the Jaccard similarity of listing sets is above</td><td>[practice]</td></tr>
 * <tr><td>ambiguous.mentions</td><td>0</td><td>ambiguous when the share of mentions resolving to several concepts is above</td><td>[practice]</td></tr>
 * <tr><td>evidence.limit</td><td>5</td><td>not an edge: sentences or listings each flag carries</td><td>—</td></tr>
 * </table>
 *
 * @param agreement              the alpha and kappa edges
 * @param directionAgreement     see the table
 * @param directionContradiction see the table
 * @param directionMinPairs      see the table
 * @param minMentions            see the table
 * @param hedgeRate              see the table
 * @param comparativeShare       see the table
 * @param groundingPrecision     see the table
 * @param groundingCheckable     see the table
 * @param fillRate               see the table
 * @param overlapJaccard         see the table
 * @param ambiguousMentions      see the table
 * @param evidenceLimit          see the table
 */
public record FlagThresholds(AgreementThresholds agreement, double directionAgreement, double directionContradiction,
                             int directionMinPairs, int minMentions, double hedgeRate, double comparativeShare,
                             double groundingPrecision, double groundingCheckable, double fillRate, double overlapJaccard,
                             double ambiguousMentions, int evidenceLimit) {

    /** The keys of the figures this record adds to {@link AgreementThresholds#KEYS}, in component order. */
    private static final List<String> OWN_KEYS = List.of("direction.agreement", "direction.contradiction",
            "direction.minPairs", "mentions.min", "hedge.rate", "comparative.share", "grounding.precision",
            "grounding.checkable", "fill.rate", "overlap.jaccard", "ambiguous.mentions", "evidence.limit");

    /** Every key {@link #with} and {@link #fromMap} accept: the agreement keys, then this record's own. */
    public static final List<String> KEYS = keys();

    /** Where each default comes from, by key; shown in reports beside the edge. */
    public static final Map<String, String> SOURCES = sources();

    public static final FlagThresholds DEFAULTS = new FlagThresholds(AgreementThresholds.DEFAULTS, 0.80, 0.20, 3, 5,
            0.30, 0.80, 0.70, 0.50, 0.50, 0.80, 0.0, 5);

    public FlagThresholds {
        Objects.requireNonNull(agreement, "agreement");
        double[] shares = {directionAgreement, directionContradiction, hedgeRate, comparativeShare, groundingPrecision,
            groundingCheckable, fillRate, overlapJaccard, ambiguousMentions};
        String[] names = {"direction.agreement", "direction.contradiction", "hedge.rate", "comparative.share",
            "grounding.precision", "grounding.checkable", "fill.rate", "overlap.jaccard", "ambiguous.mentions"};
        for (int i = 0; i < shares.length; i++) {
            if (!(shares[i] >= 0 && shares[i] <= 1)) {
                throw new IllegalArgumentException(names[i] + " is a share and must lie in [0, 1], got " + shares[i]);
            }
        }
        if (directionMinPairs < 1 || minMentions < 1) {
            throw new IllegalArgumentException("direction.minPairs and mentions.min must be at least 1, got "
                    + directionMinPairs + " and " + minMentions);
        }
        if (evidenceLimit < 0) {
            throw new IllegalArgumentException("evidence.limit must be >= 0, got " + evidenceLimit);
        }
    }

    private static List<String> keys() {
        List<String> k = new ArrayList<>(AgreementThresholds.KEYS);
        k.addAll(OWN_KEYS);
        return List.copyOf(k);
    }

    private static Map<String, String> sources() {
        Map<String, String> m = new LinkedHashMap<>();
        String kripp = "Krippendorff 2004, Content Analysis 2nd ed. [mem]";
        String lk = "Landis & Koch 1977, Biometrics 33(1) [pub]";
        m.put("alpha.reliable", kripp + ": rely on data at or above .800");
        m.put("alpha.tentative", kripp + ": below .667, treat the attribute as contested");
        for (String k : List.of("kappa.slight", "kappa.fair", "kappa.moderate", "kappa.substantial")) {
            m.put(k, lk + ": strength-of-agreement bands, shown beside every kappa");
        }
        m.put("direction.agreement", "[practice] raw agreement is not chance-corrected; with two directions in play "
                + "chance alone gives .50, and below .80 one pair of mentioners in five disagrees");
        m.put("direction.contradiction", "[practice] when more than one pair in five holds a more-vs-less or "
                + "present-vs-absent clash, people are not describing the same thing");
        m.put("direction.minPairs", "[practice] fewer pairs cannot tell a pattern from chance");
        m.put("mentions.min", "[practice] below five mentions a share moves by 20 points with one sentence");
        m.put("hedge.rate", "[practice] when nearly a third of uses are softened (a bit, kind of, I think), people are "
                + "unsure what the word commits them to");
        m.put("comparative.share", "[practice] a word used almost only relatively (lighter, the roomiest) has no absolute "
                + "meaning to label a listing with; prefer a number facet");
        m.put("grounding.precision", "[practice] catalog facts should back at least seven in ten of the uses they can check");
        m.put("grounding.checkable", "[practice] when the catalog can check fewer than half the uses, nothing ties the "
                + "word to listing facts");
        m.put("fill.rate", "[practice] a facet filled on fewer than half the listings it applies to cannot drive a filter");
        m.put("overlap.jaccard", "[practice] two concepts on more than four in five of the same listings act as one "
                + "filter; merge them or tell them apart");
        m.put("ambiguous.mentions", "[practice] any mention that resolves to two concepts is worth a qualifier; raise "
                + "the edge to tolerate a few");
        m.put("evidence.limit", "not an edge: how many sentences or listings each flag carries");
        return Collections.unmodifiableMap(m);
    }

    /** A copy with one edge changed; {@code key} is one of {@link #KEYS}. */
    public FlagThresholds with(String key, double value) {
        Objects.requireNonNull(key, "key");
        if (AgreementThresholds.KEYS.contains(key)) {
            return new FlagThresholds(agreement.with(key, value), directionAgreement, directionContradiction,
                    directionMinPairs, minMentions, hedgeRate, comparativeShare, groundingPrecision, groundingCheckable,
                    fillRate, overlapJaccard, ambiguousMentions, evidenceLimit);
        }
        int i = OWN_KEYS.indexOf(key);
        if (i < 0) {
            throw new IllegalArgumentException("unknown flag threshold '" + key + "'; known: " + KEYS);
        }
        double[] v = ownValues();
        if ((key.equals("direction.minPairs") || key.equals("mentions.min") || key.equals("evidence.limit"))
                && value != Math.rint(value)) {
            throw new IllegalArgumentException(key + " is a count and must be a whole number, got " + value);
        }
        v[i] = value;
        return new FlagThresholds(agreement, v[0], v[1], (int) v[2], (int) v[3], v[4], v[5], v[6], v[7], v[8], v[9],
                v[10], (int) v[11]);
    }

    /** The defaults with the given edges overridden; every key must be one of {@link #KEYS}. */
    public static FlagThresholds fromMap(Map<String, ? extends Number> overrides) {
        FlagThresholds t = DEFAULTS;
        for (Map.Entry<String, ? extends Number> e : overrides.entrySet()) {
            Objects.requireNonNull(e.getValue(), e.getKey());
            t = t.with(e.getKey(), e.getValue().doubleValue());
        }
        return t;
    }

    /** Every edge by key, in {@link #KEYS} order. */
    public Map<String, Double> asMap() {
        Map<String, Double> m = new LinkedHashMap<>(agreement.asMap());
        double[] v = ownValues();
        for (int i = 0; i < OWN_KEYS.size(); i++) {
            m.put(OWN_KEYS.get(i), v[i]);
        }
        return Collections.unmodifiableMap(m);
    }

    /** The alpha edge below which an attribute is contested (the tentative edge). */
    public double alphaContested() {
        return agreement.alphaTentative();
    }

    private double[] ownValues() {
        return new double[] {directionAgreement, directionContradiction, directionMinPairs, minMentions, hedgeRate,
            comparativeShare, groundingPrecision, groundingCheckable, fillRate, overlapJaccard, ambiguousMentions,
            evidenceLimit};
    }
}
