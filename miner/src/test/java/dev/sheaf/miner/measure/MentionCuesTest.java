package dev.sheaf.miner.measure;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/** One behaviour per test, with the offsets of every cue (0-based UTF-16, end exclusive). */
class MentionCuesTest {

    private static final MentionCues CUES = MentionCues.standard();

    /** The mention of the first occurrence of {@code term} in {@code sentence}. */
    private static Mention at(String sentence, String term) {
        int start = sentence.indexOf(term);
        assertTrue(start >= 0, () -> "'" + term + "' not in '" + sentence + "'");
        return CUES.read(sentence, new MentionSpan(start, start + term.length()));
    }

    private static Cue cue(CueKind kind, int start, int end, String text, String normal) {
        return new Cue(kind, start, end, text, normal);
    }

    @Test
    void readsAComparativeFormAsMoreOfItsBaseAndRecordsThan() {
        Mention m = at("Lighter than this one", "Lighter");
        assertEquals(Direction.MORE, m.direction());
        assertTrue(m.comparative());
        assertFalse(m.negated() || m.hedged() || m.excessive());
        assertEquals(List.of(cue(CueKind.DEGREE_FORM, 0, 7, "Lighter", "light"), cue(CueKind.THAN, 8, 12, "than", "than")),
                m.cues());
    }

    @Test
    void exposesTheBaseOfAComparativeForTheVocabularyLookUp() {
        Mention m = at("slightly roomier in the shoulders", "roomier");
        assertEquals("roomy", m.cues(CueKind.DEGREE_FORM).get(0).normal());
        assertEquals("roomy", ComparativeMorphology.base("roomier"));
    }

    @Test
    void readsASuperlativeAsMoreAndComparative() {
        Mention m = at("the lightest of the three", "lightest");
        assertEquals(Direction.MORE, m.direction());
        assertTrue(m.comparative());
        assertEquals(List.of(cue(CueKind.DEGREE_FORM, 4, 12, "lightest", "light")), m.cues());
    }

    @Test
    void readsMoreAndLessBeforeTheTerm() {
        Mention more = at("much more breathable", "breathable");
        assertEquals(Direction.MORE, more.direction());
        assertTrue(more.comparative());
        assertEquals(List.of(cue(CueKind.MORE, 5, 9, "more", "more")), more.cues());

        Mention less = at("less bulky than the old one", "bulky");
        assertEquals(Direction.LESS, less.direction());
        assertTrue(less.comparative());
        assertEquals(List.of(cue(CueKind.LESS, 0, 4, "less", "less"), cue(CueKind.THAN, 11, 15, "than", "than")),
                less.cues());

        Mention fewest = at("the fewest pockets", "pockets");
        assertEquals(Direction.LESS, fewest.direction());
    }

    @Test
    void readsNotAsXAsLessAndComparative() {
        Mention m = at("not as warm as I hoped", "warm");
        assertEquals(Direction.LESS, m.direction());
        assertTrue(m.comparative());
        assertTrue(m.negated());
        assertEquals(List.of(cue(CueKind.NEGATION, 0, 3, "not", "not"), cue(CueKind.EQUATIVE, 4, 6, "as", "as"),
                cue(CueKind.EQUATIVE, 12, 14, "as", "as")), m.cues());
        assertEquals(Direction.LESS, at("isn't quite as warm", "warm").direction());
    }

    @Test
    void readsAsXAsAsPresentAndComparativeButAPlainAsAsNothing() {
        Mention equal = at("as warm as the old one", "warm");
        assertEquals(Direction.PRESENT, equal.direction());
        assertTrue(equal.comparative());
        Mention plain = at("works as a pillow", "pillow");
        assertEquals(Direction.PRESENT, plain.direction());
        assertFalse(plain.comparative());
        assertEquals(List.of(), plain.cues());
    }

    @Test
    void readsTooXAsMoreAndExcessiveWithANote() {
        Mention m = at("hood is way too small", "small");
        assertEquals(Direction.MORE, m.direction());
        assertTrue(m.excessive());
        assertFalse(m.comparative());
        assertEquals(List.of(cue(CueKind.EXCESS, 12, 15, "too", "too")), m.cues());
        assertEquals(List.of("'too' marks an excess; counted as MORE"), m.notes());
        assertTrue(at("too much padding", "padding").excessive());
    }

    @Test
    void readsNotTooXAsPresentBecauseOnlyTheExcessIsDenied() {
        Mention m = at("not too heavy", "heavy");
        assertEquals(Direction.PRESENT, m.direction());
        assertFalse(m.excessive());
        assertTrue(m.negated());
    }

    @Test
    void readsPresenceCuesAsPresent() {
        Mention m = at("comes with a stuff sack", "stuff sack");
        assertEquals(Direction.PRESENT, m.direction());
        assertEquals(List.of(cue(CueKind.PRESENCE, 0, 10, "comes with", "comes with")), m.cues());
        for (String s : List.of("with a hood", "it has a hood", "includes a hood", "the hood")) {
            assertEquals(Direction.PRESENT, at(s, "hood").direction(), s);
        }
    }

    @ParameterizedTest
    @ValueSource(strings = {"without a hood", "lacks a hood", "no hood", "has no hood", "doesn't have a hood",
            "does not have a hood", "doesn\u2019t have a hood", "doesnt have a hood", "comes without a hood",
            "free of any hood", "never had a hood", "the hood is missing", "hood not included", "hood-free design"})
    void readsAbsenceCuesAsAbsent(String sentence) {
        Mention m = at(sentence, "hood");
        assertEquals(Direction.ABSENT, m.direction(), () -> m.toString());
        assertTrue(m.negated());
    }

    @Test
    void readsIsNotXAsAbsentWithTheNegationsOffsets() {
        Mention m = at("the shell isn't waterproof", "waterproof");
        assertEquals(Direction.ABSENT, m.direction());
        assertEquals(List.of(cue(CueKind.NEGATION, 10, 15, "isn't", "isn't")), m.cues());
    }

    @Test
    void readsTheFreeSuffixAsAbsenceWithItsOwnOffsets() {
        Mention m = at("PFC-free coating", "PFC");
        assertEquals(Direction.ABSENT, m.direction());
        assertEquals(List.of(cue(CueKind.ABSENCE, 3, 8, "-free", "-free")), m.cues());
        assertEquals(Direction.PRESENT, at("PFC-free coating", "coating").direction());
    }

    @Test
    void cancelsADoubleNegation() {
        Mention m = at("not without a hood", "hood");
        assertEquals(Direction.PRESENT, m.direction());
        assertFalse(m.negated());
        assertEquals(List.of(cue(CueKind.NEGATION, 0, 3, "not", "not"), cue(CueKind.ABSENCE, 4, 11, "without", "without")),
                m.cues());
        assertEquals(List.of("2 negations cancel; polarity follows their count"), m.notes());
        assertEquals(Direction.PRESENT, at("it doesn't lack a hood", "hood").direction());
    }

    @Test
    void readsANegatedComparativeAsTheOtherDirection() {
        assertEquals(Direction.LESS, at("it is not lighter", "lighter").direction());
        assertEquals(Direction.LESS, at("no heavier than a bottle", "heavier").direction());
        assertEquals(Direction.MORE, at("not less bulky", "bulky").direction());
    }

    @Test
    void stopsNegationAtTheEndOfTheClause() {
        String s = "no hood, but pit zips; no pockets and a drawcord";
        assertEquals(Direction.ABSENT, at(s, "hood").direction());
        assertEquals(Direction.PRESENT, at(s, "pit zips").direction());
        assertEquals(Direction.ABSENT, at(s, "pockets").direction());
        assertEquals(Direction.PRESENT, at(s, "drawcord").direction());
        assertEquals(Direction.PRESENT, at("not heavy - the hood is great", "hood").direction());
        assertEquals(Direction.PRESENT, at("not heavy, though the hood is small", "hood").direction());
    }

    @Test
    void keepsNegationWithinItsWindowOfFiveWords() {
        assertEquals(Direction.ABSENT, at("there is not a single real hood", "hood").direction(),
                "four words between 'not' and the term");
        assertEquals(Direction.PRESENT, at("I would not say that this is my favourite hood", "hood").direction(),
                "seven words between 'not' and the term");
    }

    @Test
    void ignoresNegationLookAlikes() {
        for (String s : List.of("not only a hood but pit zips", "no doubt the hood is great",
                "whether or not the hood fits")) {
            Mention m = at(s, "hood");
            assertEquals(Direction.PRESENT, m.direction(), s);
            assertFalse(m.negated(), s);
        }
        Mention unsure = at("not sure the hood fits", "hood");
        assertEquals(Direction.PRESENT, unsure.direction());
        assertTrue(unsure.hedged());
        assertEquals(List.of(cue(CueKind.HEDGE, 0, 8, "not sure", "not sure")), unsure.cues());
    }

    @Test
    void marksDegreeHedgesBeforeGradableWordsWithTheirOffsets() {
        Mention m = at("a bit heavier than the other one", "heavier");
        assertTrue(m.hedged());
        assertEquals(cue(CueKind.HEDGE, 0, 5, "a bit", "a bit"), m.cues().get(0));
        assertTrue(at("kind of too bulky", "bulky").hedged());
        assertTrue(at("a tad narrow", "narrow").hedged());
        assertFalse(at("a little pocket on the belt", "pocket").hedged(), "'little' sizes a noun here");
        assertFalse(at("what kind of hood", "hood").hedged());
    }

    @Test
    void marksTheIshSuffixAsAHedge() {
        Mention joined = at("warmish but fine", "warmish");
        assertTrue(joined.hedged());
        assertEquals(List.of(cue(CueKind.HEDGE, 4, 7, "ish", "-ish")), joined.cues());
        Mention hyphen = at("warm-ish but fine", "warm");
        assertEquals(List.of(cue(CueKind.HEDGE, 4, 8, "-ish", "-ish")), hyphen.cues());
        assertFalse(at("matte finish", "finish").hedged());
    }

    @Test
    void spreadsEpistemicHedgesOverTheSegmentButNotPastAContrast() {
        String s = "I think it is warmer, and lighter, but the hood is small";
        assertTrue(at(s, "warmer").hedged());
        assertTrue(at(s, "lighter").hedged());
        assertFalse(at(s, "hood").hedged());
        assertTrue(at("it's lighter, I think", "lighter").hedged());
    }

    @Test
    void marksAComparativeModifierOrPredicateWithoutChangingDirection() {
        Mention bigger = at("lighter than this one and with a bigger hood", "hood");
        assertEquals(Direction.PRESENT, bigger.direction());
        assertTrue(bigger.comparative());
        assertEquals(List.of(cue(CueKind.PRESENCE, 26, 30, "with", "with"), cue(CueKind.DEGREE_FORM, 33, 39, "bigger", "big")),
                bigger.cues());
        Mention predicate = at("the hood is smaller", "hood");
        assertTrue(predicate.comparative());
        assertEquals(Direction.PRESENT, predicate.direction());
    }

    @Test
    void readsSufficiencyAndItsNegation() {
        assertEquals(Direction.PRESENT, at("warm enough for autumn", "warm").direction());
        assertEquals(Direction.LESS, at("not warm enough", "warm").direction());
        assertEquals(Direction.LESS, at("not enough pockets", "pockets").direction());
    }

    @Test
    void readsAnUnknownErWordBeforeThanAsAComparative() {
        Mention m = at("grippier than my old pair", "grippier");
        assertEquals(Direction.MORE, m.direction());
        assertEquals("grippy", m.cues(CueKind.DEGREE_FORM).get(0).normal());
        assertEquals(1, m.notes().size());
        Mention water = at("more water than expected", "water");
        assertEquals(Direction.MORE, water.direction());
        assertEquals(List.of(), water.cues(CueKind.DEGREE_FORM), "'water' is no comparative of 'wat'");
    }

    @Test
    void usesTheCallersKnownTerms() {
        MentionCues vocab = MentionCues.using(ComparativeMorphology.wordNet().withKnownTerms(List.of("grippy", "lighter")));
        assertEquals(Direction.MORE, vocab.read("grippier soles", new MentionSpan(0, 8)).direction());
        assertEquals(Direction.PRESENT, CUES.read("grippier soles", new MentionSpan(0, 8)).direction());
        assertEquals(Direction.PRESENT, vocab.read("a lighter for the stove", new MentionSpan(2, 9)).direction(),
                "a known label is not taken apart");
    }

    @Test
    void readsEachSpanOfASentenceInOrder() {
        String s = "fewer pockets but a bigger hood";
        List<Mention> ms = CUES.read(s, List.of(new MentionSpan(27, 31), new MentionSpan(6, 13)));
        assertEquals(List.of("hood", "pockets"), ms.stream().map(Mention::text).toList());
        assertEquals(List.of(Direction.PRESENT, Direction.LESS), ms.stream().map(Mention::direction).toList());
        assertEquals(List.of(), CUES.read(s, List.of()));
    }

    @Test
    void readsASpanWithoutWordsAsAPlainMention() {
        Mention m = CUES.read("no hood !!!", new MentionSpan(8, 11));
        assertEquals(Direction.PRESENT, m.direction());
        assertEquals(List.of(), m.cues());
        assertEquals(1, m.notes().size());
    }

    @Test
    void rejectsSpansOutsideTheSentenceAsMisuse() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> CUES.read("no hood", new MentionSpan(3, 8)));
        assertTrue(e.getMessage().contains("ends past the sentence"), e.getMessage());
        assertThrows(IllegalArgumentException.class, () -> new MentionSpan(4, 4));
        assertThrows(IllegalArgumentException.class, () -> new MentionSpan(-1, 2));
        assertThrows(NullPointerException.class, () -> CUES.read(null, List.of()));
    }

    @Test
    void publishesOneHedgeListWithoutDuplicates() {
        List<String> words = MentionCues.hedgeWords();
        assertTrue(words.containsAll(List.of("a bit", "a little", "slightly", "kind of", "sort of", "somewhat", "rather",
                "fairly", "a tad", "maybe", "i think", "-ish")), words::toString);
        assertEquals(words.size(), new java.util.HashSet<>(words).size());
        for (String w : words) {
            if (!w.equals("-ish")) {
                assertEquals(List.of(cue(CueKind.HEDGE, 0, w.length(), w, w)),
                        CUES.hedges(w + " warmer").stream().filter(c -> c.start() == 0).toList(), w);
            }
        }
    }

    @Test
    void reportsTheHedgesOfASentence() {
        List<Cue> hedges = CUES.hedges("I think it's kind of warmish, a little pocket, a bit heavier, sort of a hood");
        assertEquals(List.of(cue(CueKind.HEDGE, 0, 7, "I think", "i think"), cue(CueKind.HEDGE, 13, 20, "kind of", "kind of"),
                cue(CueKind.HEDGE, 25, 28, "ish", "-ish"), cue(CueKind.HEDGE, 47, 52, "a bit", "a bit")), hedges);
        assertEquals(List.of(), CUES.hedges("with a hood and pit zips"));
    }
}
