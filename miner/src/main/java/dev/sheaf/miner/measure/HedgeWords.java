package dev.sheaf.miner.measure;

import java.util.List;

/**
 * The one list of hedge words Sheaf recognises in feedback sentences; {@link MentionCues} uses it
 * both to mark a mention as hedged and to report the hedges of a sentence. Lower-case, one entry
 * per phrase, words separated by one space, matched on whole tokens (longest phrase first).
 *
 * <p>Two kinds, after Lakoff's "hedges" (1972) and Prince, Frader &amp; Bosk's split of hedges into
 * approximators and shields (1982) [mem]:
 * <ul>
 *   <li>{@link #DEGREE} (approximators) soften a gradable word they stand before: "a bit heavier",
 *       "slightly roomier", "kind of too bulky". They count only when, skipping intensifiers and
 *       articles, the next word is gradable: a degree cue (more, less, too, as …), a comparative
 *       form, or an adjective in WordNet. So "a little pocket" is no hedge. The suffix {@code -ish}
 *       ("warmish", "warm-ish") is a degree hedge too.</li>
 *   <li>{@link #EPISTEMIC} (shields) soften the whole statement ("I think", "maybe", "not sure"):
 *       they hedge every mention in their sentence segment, on either side of them; a segment ends
 *       at . ! ? ; or a contrast word (but, though, although, however, whereas, yet, except).</li>
 * </ul>
 * Deliberately absent: "quite" (an intensifier in American use, a softener in British use) and
 * "pretty" only as an adjective — "pretty warm" is listed, because the next-word rule above keeps
 * "pretty colours" out.
 */
final class HedgeWords {

    private HedgeWords() {
    }

    static final List<String> DEGREE = List.of(
            "a bit", "a little", "a little bit", "a wee bit", "a tad", "a touch", "a smidge",
            "slightly", "somewhat", "kind of", "kinda", "sort of", "sorta", "rather", "fairly",
            "pretty", "relatively", "reasonably", "moderately", "mildly", "marginally", "more or less",
            "almost", "nearly", "borderline", "semi");

    static final List<String> EPISTEMIC = List.of(
            "i think", "i guess", "i suppose", "i believe", "i feel", "i feel like", "i'd say", "i would say",
            "maybe", "perhaps", "probably", "possibly", "might", "may", "could be", "seems", "seem",
            "seemed", "seemingly", "apparently", "arguably", "presumably", "not sure", "not certain",
            "unsure", "i'm not sure", "if anything", "in my opinion", "imo", "imho");

    /** The suffix hedge, matched on a token ending or as a separate token after a hyphen. */
    static final String ISH = "ish";
}
