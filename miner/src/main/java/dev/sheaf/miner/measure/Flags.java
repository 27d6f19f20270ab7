package dev.sheaf.miner.measure;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Objects;
import java.util.TreeMap;
import java.util.TreeSet;
import java.util.function.Predicate;

/**
 * The flags stage's front door: every attribute that any input knows (feedback, judgments, fill
 * rates, overlaps, the vocabulary) is tested against {@link FlagThresholds}, and each flag carries
 * the figure that raised it, the edge, the comparison, an explanation with the edge's source, and
 * evidence (sentences, listings, labels). See docs/decisions/114-flags.md.
 *
 * <ul>
 *   <li><b>contested</b>: alpha below {@code alpha.tentative}; or, with at least
 *       {@code direction.minPairs} judged pairs, mean direction agreement below
 *       {@code direction.agreement} or a contradiction share above {@code direction.contradiction};</li>
 *   <li><b>vague</b> (with at least {@code mentions.min} mentions): hedge rate above
 *       {@code hedge.rate}; comparative share above {@code comparative.share} for a concept (not a
 *       number facet reached through a scale, which is compared by nature); and, when catalog facts were
 *       given, a checkable share below {@code grounding.checkable} or a grounding precision below
 *       {@code grounding.precision};</li>
 *   <li><b>thin</b>: fill rate below {@code fill.rate};</li>
 *   <li><b>overlapping</b>: Jaccard similarity above {@code overlap.jaccard} with another concept;</li>
 *   <li><b>ambiguous</b>: a label the vocabulary gives two or more concepts, or a share of mentions
 *       resolving to several concepts above {@code ambiguous.mentions};</li>
 *   <li><b>claim</b>: the concept is under a facet marked as a regulated claim.</li>
 * </ul>
 */
public final class Flags {
    private Flags() {
    }

    /** Evaluates every attribute the inputs know. */
    public static FlagReport evaluate(FlagInputs in, FlagThresholds t) {
        Objects.requireNonNull(in, "inputs");
        Objects.requireNonNull(t, "thresholds");
        FeedbackVocabulary vocabulary = in.vocabulary() != null ? in.vocabulary() : FeedbackVocabulary.empty();
        TreeSet<String> universe = new TreeSet<>();
        Map<String, ConsistencyAttribute> feedback = new TreeMap<>();
        if (in.consistency() != null) {
            in.consistency().attributes().forEach(a -> feedback.put(a.attribute(), a));
            universe.addAll(feedback.keySet());
        }
        if (in.agreement() != null) {
            in.agreement().attributes().forEach(a -> universe.add(a.attribute()));
        }
        in.fill().forEach(f -> universe.add(f.attribute()));
        in.overlaps().forEach(o -> {
            universe.add(o.a());
            universe.add(o.b());
        });
        for (FeedbackConcept c : vocabulary.concepts()) {
            if (c.regulatedClaim()) {
                universe.add(c.id());
            }
        }
        vocabulary.sharedLabels().forEach(s -> universe.addAll(s.conceptIds()));

        List<FlaggedAttribute> flagged = new ArrayList<>();
        for (String id : universe) {
            List<Flag> flags = new ArrayList<>();
            ConsistencyAttribute fb = feedback.get(id);
            List<FeedbackMention> mentions = fb == null ? List.of() : mentionsOf(in.consistency(), id);
            if (in.agreement() != null) {
                in.agreement().attribute(id).ifPresent(a -> alpha(id, a, t, flags));
            }
            if (fb != null) {
                direction(id, fb, t, flags);
                vague(id, fb, mentions, in.consistency().catalogGiven(), t, flags);
                ambiguousMentions(id, fb, mentions, t, flags);
            }
            in.fill().stream().filter(f -> f.attribute().equals(id)).findFirst().ifPresent(f -> thin(id, f, t, flags));
            for (FlagOverlap o : in.overlaps()) {
                if (o.a().equals(id) || o.b().equals(id)) {
                    overlap(id, o, vocabulary, t, flags);
                }
            }
            for (FeedbackVocabulary.SharedLabel s : vocabulary.sharedLabels(id)) {
                sharedLabel(id, s, vocabulary, flags);
            }
            vocabulary.concept(id).filter(FeedbackConcept::regulatedClaim).ifPresent(c -> claim(id, c, mentions, t, flags));
            if (!flags.isEmpty()) {
                flags.sort(Comparator.comparing(Flag::kind).thenComparing(Flag::criterion));
                flagged.add(new FlaggedAttribute(id, vocabulary.displayLabel(id), flags));
            }
        }
        List<String> notes = new ArrayList<>();
        if (in.agreement() == null) {
            notes.add("no judgments were given: contested rests on feedback direction agreement alone");
        }
        if (in.consistency() == null) {
            notes.add("no feedback was given: contested by direction, vague and ambiguous mentions were not evaluated");
        } else if (!in.consistency().catalogGiven()) {
            notes.add("no catalog facts were given with the feedback: the grounding criteria of vague were not evaluated");
        }
        if (in.fill().isEmpty()) {
            notes.add("no fill rates were given: thin was not evaluated");
        }
        if (in.overlaps().isEmpty()) {
            notes.add("no overlap pairs were given: overlapping was not evaluated");
        }
        if (in.vocabulary() == null) {
            notes.add("no vocabulary was given: shared labels and regulated claims were not evaluated");
        }
        return new FlagReport(flagged, universe.size(), t, notes);
    }

    private static List<FeedbackMention> mentionsOf(ConsistencyReport r, String id) {
        return r.mentions().stream().filter(m -> m.attribute().equals(id)).toList();
    }

    private static void alpha(String id, AgreementAttribute a, FlagThresholds t, List<Flag> flags) {
        double alpha = a.alpha().alpha();
        if (Double.isNaN(alpha) || !(alpha < t.alphaContested())) {
            return;
        }
        BootstrapInterval ci = a.alphaInterval();
        String interval = ci.defined() ? " [" + num(ci.low()) + ", " + num(ci.high()) + "]" : "";
        String fleiss = a.fleiss().defined()
                ? " Fleiss' kappa " + num(a.fleiss().kappa()) + " (" + a.fleiss().band().label() + ", Landis & Koch 1977)."
                : "";
        String text = "Krippendorff's alpha " + num(alpha) + interval + " (" + a.metric().label() + ") is below "
                + num(t.alphaContested()) + ", the tentative edge (Krippendorff 2004): annotators disagree when applying it."
                + fleiss + " Write a sharper definition or split the attribute, then judge again.";
        List<FlagEvidence> ev = List.of(new FlagEvidence(FlagEvidence.JUDGMENTS, a.items() + " items, " + a.judgments()
                + " judgments, " + a.annotators() + " annotators", "agreement"));
        flags.add(new Flag(FlagKind.CONTESTED, id, "alpha", alpha, t.alphaContested(), "<", "alpha.tentative", text, ev));
    }

    private static void direction(String id, ConsistencyAttribute a, FlagThresholds t, List<Flag> flags) {
        ConsistencyAgreement g = a.agreement();
        if (g.pairsJudged() < t.directionMinPairs()) {
            return;
        }
        List<FlagEvidence> ev = contradictionEvidence(a, t.evidenceLimit());
        if (g.meanAgreement() < t.directionAgreement()) {
            flags.add(new Flag(FlagKind.CONTESTED, id, "direction-agreement", g.meanAgreement(), t.directionAgreement(), "<",
                    "direction.agreement", "People who mention it in the same pair agree on its direction "
                    + pct(g.meanAgreement()) + " of the time over " + g.pairsJudged() + " pairs, below "
                    + pct(t.directionAgreement()) + " " + source("direction.agreement") + ".", ev));
        }
        if (g.contradictionShare() > t.directionContradiction()) {
            flags.add(new Flag(FlagKind.CONTESTED, id, "contradictions", g.contradictionShare(), t.directionContradiction(),
                    ">", "direction.contradiction", g.contradictoryPairs() + " of " + g.pairsJudged() + " pairs ("
                    + pct(g.contradictionShare()) + ") hold a contradiction (more vs less, or present vs absent), above "
                    + pct(t.directionContradiction()) + " " + source("direction.contradiction") + ".", ev));
        }
    }

    private static List<FlagEvidence> contradictionEvidence(ConsistencyAttribute a, int limit) {
        List<FlagEvidence> ev = new ArrayList<>();
        for (ConsistencyContradiction c : a.contradictions()) {
            for (ConsistencyContradiction.Side s : c.sides()) {
                if (ev.size() >= limit) {
                    return ev;
                }
                ev.add(new FlagEvidence(FlagEvidence.SENTENCE, s.sentence(), "row " + s.row() + ", pair " + c.pairId() + ", "
                        + s.annotator() + ": " + s.direction().name().toLowerCase(Locale.ROOT)));
            }
        }
        return ev;
    }

    private static void vague(String id, ConsistencyAttribute a, List<FeedbackMention> mentions, boolean catalog,
                              FlagThresholds t, List<Flag> flags) {
        if (a.mentions() < t.minMentions()) {
            return;
        }
        if (a.hedgeRate() > t.hedgeRate()) {
            flags.add(new Flag(FlagKind.VAGUE, id, "hedge-rate", a.hedgeRate(), t.hedgeRate(), ">", "hedge.rate",
                    a.hedged() + " of " + a.mentions() + " mentions (" + pct(a.hedgeRate()) + ") are hedged, above "
                    + pct(t.hedgeRate()) + " " + source("hedge.rate") + ".",
                    sentences(mentions, FeedbackMention::hedged, t.evidenceLimit())));
        }
        boolean numberFacet = ConsistencyAttribute.KIND_SCALE.equals(a.kind())
                || mentions.stream().anyMatch(m -> id.equals(m.scaleFacet()));
        if (!numberFacet && a.comparativeShare() > t.comparativeShare()) {
            flags.add(new Flag(FlagKind.VAGUE, id, "comparative-share", a.comparativeShare(), t.comparativeShare(), ">",
                    "comparative.share", a.comparative() + " of " + a.mentions() + " mentions (" + pct(a.comparativeShare())
                    + ") are only comparative, above " + pct(t.comparativeShare()) + " " + source("comparative.share") + ".",
                    sentences(mentions, FeedbackMention::comparative, t.evidenceLimit())));
        }
        if (!catalog) {
            return;
        }
        GroundingSummary g = a.grounding();
        double checkable = (double) g.checked() / g.mentions();
        if (checkable < t.groundingCheckable()) {
            flags.add(new Flag(FlagKind.VAGUE, id, "grounding-checkable", checkable, t.groundingCheckable(), "<",
                    "grounding.checkable", "The catalog can check " + g.checked() + " of " + g.mentions() + " mentions ("
                    + pct(checkable) + "), below " + pct(t.groundingCheckable()) + " " + source("grounding.checkable")
                    + ". Add a scale or a catalog field that carries it, or drop it.",
                    reasons(mentions, m -> !m.grounding().checked(), t.evidenceLimit())));
        } else if (g.checked() >= t.minMentions() && g.precision() < t.groundingPrecision()) {
            flags.add(new Flag(FlagKind.VAGUE, id, "grounding-precision", g.precision(), t.groundingPrecision(), "<",
                    "grounding.precision", g.grounded() + " of " + g.checked() + " checkable mentions ("
                    + pct(g.precision()) + ") agree with the catalog, below " + pct(t.groundingPrecision()) + " "
                    + source("grounding.precision") + ".",
                    reasons(mentions, m -> m.grounding().outcome() == GroundingOutcome.NOT_GROUNDED, t.evidenceLimit())));
        }
    }

    private static void ambiguousMentions(String id, ConsistencyAttribute a, List<FeedbackMention> mentions,
                                          FlagThresholds t, List<Flag> flags) {
        if (a.mentions() == 0 || !(a.ambiguousShare() > t.ambiguousMentions())) {
            return;
        }
        TreeSet<String> others = new TreeSet<>();
        mentions.forEach(m -> others.addAll(m.alsoConcepts()));
        List<FlagEvidence> ev = new ArrayList<>();
        others.forEach(o -> ev.add(new FlagEvidence(FlagEvidence.CONCEPT, o, "the same words also resolve to it")));
        ev.addAll(sentences(mentions, FeedbackMention::ambiguous, t.evidenceLimit()));
        flags.add(new Flag(FlagKind.AMBIGUOUS, id, "ambiguous-mentions", a.ambiguousShare(), t.ambiguousMentions(), ">",
                "ambiguous.mentions", a.ambiguous() + " of " + a.mentions() + " mentions (" + pct(a.ambiguousShare())
                + ") resolve to several concepts (" + String.join(", ", others) + "), above " + pct(t.ambiguousMentions())
                + " " + source("ambiguous.mentions") + ".", ev));
    }

    private static void thin(String id, FlagFill f, FlagThresholds t, List<Flag> flags) {
        double rate = f.rate();
        if (Double.isNaN(rate) || !(rate < t.fillRate())) {
            return;
        }
        List<FlagEvidence> ev = new ArrayList<>();
        for (String l : f.unfilledSample()) {
            if (ev.size() >= t.evidenceLimit()) {
                break;
            }
            ev.add(new FlagEvidence(FlagEvidence.LISTING, l, "applies, no value"));
        }
        flags.add(new Flag(FlagKind.THIN, id, "fill-rate", rate, t.fillRate(), "<", "fill.rate", f.filled() + " of "
                + f.applicable() + " listings where it applies carry a value (" + pct(rate) + "), below " + pct(t.fillRate())
                + " " + source("fill.rate") + ".", ev));
    }

    private static void overlap(String id, FlagOverlap o, FeedbackVocabulary v, FlagThresholds t, List<Flag> flags) {
        if (!(o.jaccard() > t.overlapJaccard())) {
            return;
        }
        String other = o.other(id);
        List<FlagEvidence> ev = new ArrayList<>();
        ev.add(new FlagEvidence(FlagEvidence.CONCEPT, other, v.displayLabel(other)));
        for (String l : o.sharedSample()) {
            if (ev.size() > t.evidenceLimit()) {
                break;
            }
            ev.add(new FlagEvidence(FlagEvidence.LISTING, l, "carries both"));
        }
        flags.add(new Flag(FlagKind.OVERLAPPING, id, "jaccard:" + other, o.jaccard(), t.overlapJaccard(), ">",
                "overlap.jaccard", "It labels nearly the same listings as " + other + ": Jaccard " + num(o.jaccard()) + " ("
                + o.shared() + " shared), above " + num(t.overlapJaccard()) + " " + source("overlap.jaccard") + ".", ev));
    }

    private static void sharedLabel(String id, FeedbackVocabulary.SharedLabel s, FeedbackVocabulary v, List<Flag> flags) {
        List<FlagEvidence> ev = new ArrayList<>();
        ev.add(new FlagEvidence(FlagEvidence.LABEL, s.label(), "carried by " + s.conceptIds().size() + " concepts"));
        for (String c : s.conceptIds()) {
            if (!c.equals(id)) {
                ev.add(new FlagEvidence(FlagEvidence.CONCEPT, c, v.displayLabel(c)));
            }
        }
        flags.add(new Flag(FlagKind.AMBIGUOUS, id, "shared-label:" + s.label(), s.conceptIds().size(), 1, ">", "",
                "The label \"" + s.label() + "\" belongs to " + s.conceptIds().size() + " concepts (" + String.join(", ",
                s.conceptIds()) + "): a matcher cannot tell them apart. Give each a qualifier (ANSI/NISO Z39.19 homographs).",
                ev));
    }

    private static void claim(String id, FeedbackConcept c, List<FeedbackMention> mentions, FlagThresholds t,
                              List<Flag> flags) {
        String facet = c.facetId() == null ? id : c.facetId();
        List<FlagEvidence> ev = new ArrayList<>();
        ev.add(new FlagEvidence(FlagEvidence.CONCEPT, facet, "facet marked regulatedClaim"));
        ev.addAll(sentences(mentions, m -> true, t.evidenceLimit()));
        flags.add(new Flag(FlagKind.CLAIM, id, "regulated-claim", 1, Double.NaN, "is", "",
                "A regulated or safety claim (facet " + facet + "): labels mined from text are not verified product claims. "
                + "Defer to the applicable labelling rules and a compliance review before it ships.", ev));
    }

    private static List<FlagEvidence> sentences(List<FeedbackMention> mentions, Predicate<FeedbackMention> which, int limit) {
        List<FlagEvidence> ev = new ArrayList<>();
        for (FeedbackMention m : mentions) {
            if (ev.size() >= limit) {
                break;
            }
            if (which.test(m)) {
                ev.add(FlagEvidence.sentence(m));
            }
        }
        return ev;
    }

    private static List<FlagEvidence> reasons(List<FeedbackMention> mentions, Predicate<FeedbackMention> which, int limit) {
        List<FlagEvidence> ev = new ArrayList<>();
        for (FeedbackMention m : mentions) {
            if (ev.size() >= limit) {
                break;
            }
            if (which.test(m)) {
                ev.add(new FlagEvidence(FlagEvidence.SENTENCE, m.sentence(), "row " + m.row() + ", pair " + m.pairId() + ", "
                        + m.annotator() + ": " + m.grounding().reason()));
            }
        }
        return ev;
    }

    private static String source(String key) {
        String s = FlagThresholds.SOURCES.get(key);
        return s == null ? "" : "(" + s + ")";
    }

    private static String num(double v) {
        return String.format(Locale.ROOT, "%.3f", v);
    }

    private static String pct(double v) {
        return String.format(Locale.ROOT, "%.0f%%", v * 100);
    }
}
