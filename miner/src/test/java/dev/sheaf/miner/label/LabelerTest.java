package dev.sheaf.miner.label;

import static dev.sheaf.miner.label.LabelFixtures.listing;
import static dev.sheaf.miner.label.LabelFixtures.text;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sheaf.miner.ingest.Field;
import dev.sheaf.miner.ingest.FieldKind;
import dev.sheaf.miner.ingest.Listing;
import dev.sheaf.miner.text.Analysis;
import dev.sheaf.miner.text.AnalysisProfile;
import dev.sheaf.miner.text.SegmentPart;
import dev.sheaf.vocab.Concept;
import dev.sheaf.vocab.LabelKind;
import dev.sheaf.vocab.SchemeInfo;
import dev.sheaf.vocab.Vocabulary;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.TreeMap;
import java.util.stream.Collectors;
import java.util.stream.IntStream;
import org.junit.jupiter.api.Test;

/** What the labeler assigns, with which polarity and evidence. */
class LabelerTest {
    private final Labeler labeler = Labeler.of(LabelFixtures.vocabulary(), Analysis.of(AnalysisProfile.defaults()));

    /** concept id → polarity word, for compact assertions. */
    private Map<String, String> concepts(Listing l) {
        Map<String, String> m = new TreeMap<>();
        for (Assignment a : labeler.label(l).assignments()) {
            if (!a.isNumber()) {
                m.put(a.conceptId(), a.polarity().word());
            }
        }
        return m;
    }

    private Map<String, String> concepts(String category, String text) {
        return concepts(text(category, text));
    }

    private Assignment only(Listing l, String conceptId) {
        List<Assignment> as = labeler.label(l).assignments().stream().filter(a -> a.conceptId().equals(conceptId)).toList();
        assertEquals(1, as.size(), "one assignment of " + conceptId + " in " + labeler.label(l));
        return as.get(0);
    }

    @Test
    void theLongestLabelWinsAndItsPartsAreNotAssigned() {
        assertEquals(Map.of("ripstop-nylon", "stated"), concepts("jackets", "Ripstop nylon shell"));
        Evidence e = only(text("jackets", "Ripstop nylon shell"), "ripstop-nylon").evidence().get(0);
        assertEquals(0, e.start());
        assertEquals(13, e.end());
        assertEquals("Ripstop nylon", e.text());
        assertEquals(LabelKind.PREFERRED, e.labelKind());
        assertEquals(SegmentPart.TEXT, e.part());
        assertEquals(FieldKind.DESCRIPTION, e.fieldKind());
    }

    @Test
    void matchesDoNotOverlapButEveryOccurrenceIsRecorded() {
        Listing l = listing("FH-2", "jackets", Field.of(FieldKind.TITLE, "Nylon anorak"),
                Field.of(FieldKind.DESCRIPTION, "A ripstop nylon body with nylon cuffs; more nylon inside."));
        assertEquals(Map.of("nylon", "stated", "ripstop-nylon", "stated"), concepts(l));
        Assignment nylon = only(l, "nylon");
        assertEquals(3, nylon.evidence().size());
        assertEquals(List.of(0, 1, 1), nylon.evidence().stream().map(Evidence::field).toList());
        assertEquals(List.of(0, 26, 44), nylon.evidence().stream().map(Evidence::start).toList());
        for (Evidence e : nylon.evidence()) {
            String src = l.fields().get(e.field()).text();
            assertEquals(src.substring(e.start(), e.end()), e.text());
        }
    }

    @Test
    void alternativeAndHiddenLabelsMatchAndSayWhichKindMatched() {
        Assignment alt = only(text("jackets", "Rip-stop nylon panels"), "ripstop-nylon");
        assertEquals(LabelKind.ALTERNATIVE, alt.evidence().get(0).labelKind());
        Assignment hidden = only(text("jackets", "tough ripstp nylon"), "ripstop-nylon");
        assertEquals(LabelKind.HIDDEN, hidden.evidence().get(0).labelKind());
        assertEquals("ripstp nylon", hidden.evidence().get(0).text());
    }

    @Test
    void caseAndDiacriticsDoNotMatter() {
        assertEquals(Map.of("merino-wool", "stated"), concepts("tops", "MERINO WOOL base layer"));
        assertEquals(Map.of("merino-wool", "stated"), concepts("tops", "Mérino Wool base layer"));
        assertEquals(Map.of("merino-wool", "stated"), concepts("tops", "soft merino"));
    }

    @Test
    void caseFoldingIgnoresATurkishDefaultLocale() {
        Locale saved = Locale.getDefault();
        try {
            Locale.setDefault(Locale.forLanguageTag("tr-TR"));
            // built and run under a Turkish default: "INSULATED".toLowerCase() would give a dotless ı there
            Labeler turkish = Labeler.of(LabelFixtures.vocabulary(), Analysis.of(AnalysisProfile.defaults()));
            Assignments a = turkish.label(listing("FH-3", "jackets", Field.of(FieldKind.TITLE, "INSULATED PARKA"),
                    Field.spec("ITEM WEIGHT", "1.4 KG")));
            assertEquals(List.of("insulated", "weight"), a.assignments().stream().map(Assignment::conceptId).toList());
            assertEquals(1.4, a.assignments().get(1).value());
        } finally {
            Locale.setDefault(saved);
        }
    }

    @Test
    void stopWordsInsideALabelMustBeThereAsWritten() {
        assertEquals(Map.of("made-in-usa", "stated"), concepts("packs", "Proudly made in USA"));
        // "the" is a stop word to the miner; for the labeler it is a token, so the label does not match
        assertEquals(Map.of(), concepts("packs", "Proudly made in the USA"));
        assertEquals(Map.of("water-resistant", "stated"), concepts("packs", "Water-resistant base"));
    }

    @Test
    void aLabelHoldingANegationWordIsAPositiveOfThatLabel() {
        assertEquals(Map.of("no-see-um-mesh", "stated"), concepts("tents", "No-see-um mesh door"));
        assertEquals(Map.of("non-slip", "stated"), concepts("footwear", "Non-slip rubber sole"));
        assertEquals(Map.of("pfc-free", "stated", "dwr", "stated"), concepts("jackets", "PFC-free DWR finish"));
    }

    @Test
    void negationWordsBeforeAMatchNegateItWithinTheClause() {
        assertEquals(Map.of("hooded", "negated"), concepts("jackets", "No hood"));
        assertEquals(Map.of("waterproof", "negated"), concepts("jackets", "This shell is not waterproof"));
        assertEquals(Map.of("insulated", "negated"), concepts("jackets", "Made without any insulation"));
        assertEquals(Map.of("removable-hood", "negated"), concepts("jackets", "It doesn't have a removable hood"));
        Assignment a = only(text("jackets", "Made without any insulation"), "insulated");
        assertEquals("without", a.evidence().get(0).cue());
        assertEquals(Polarity.NEGATED, a.evidence().get(0).polarity());
    }

    @Test
    void negationScopeEndsAtPunctuationAtButAndAtTheWindow() {
        assertEquals(Map.of("waterproof", "stated", "windproof", "negated"), concepts("jackets", "Waterproof, not windproof"));
        assertEquals(Map.of("hooded", "negated", "insulated", "stated"), concepts("jackets", "No hood but insulated"));
        assertEquals(Map.of("hooded", "negated", "insulated", "stated"), concepts("jackets", "No hood and insulated"));
        // "or" continues the scope: both are denied
        assertEquals(Map.of("hooded", "negated", "insulated", "negated"), concepts("jackets", "no hood or insulation"));
        // five tokens between the cue and the match: beyond the default window of 3
        assertEquals(Map.of("hooded", "stated"), concepts("jackets", "No frills at all in this hood"));
        assertEquals(Map.of("waterproof", "stated", "windproof", "stated"),
                concepts("jackets", "Not only waterproof but also windproof"));
    }

    @Test
    void theWindowIsConfigurable() {
        Labeler wide = Labeler.of(LabelFixtures.vocabulary(), Analysis.of(AnalysisProfile.defaults()),
                LabelOptions.builder().negationWindow(6).build());
        assertEquals(Polarity.NEGATED, wide.label(text("jackets", "No frills at all in this hood")).assignments().get(0).polarity());
        Labeler literal = Labeler.of(LabelFixtures.vocabulary(), Analysis.of(AnalysisProfile.defaults()),
                LabelOptions.preset("literal"));
        assertEquals(Polarity.STATED, literal.label(text("jackets", "No hood")).assignments().get(0).polarity());
    }

    @Test
    void freeAndLessAfterAndNonBeforeAMatchNegateIt() {
        assertEquals(Map.of("dwr", "negated"), concepts("jackets", "DWR-free finish"));
        assertEquals(Map.of("dwr", "negated"), concepts("jackets", "DWR free finish"));
        assertEquals(Map.of("hooded", "negated"), concepts("jackets", "A hood-less design"));
        assertEquals(Map.of("insulated", "negated"), concepts("jackets", "Non-insulated shell"));
        assertEquals(Map.of("dwr", "negated"), concepts("jackets", "free of DWR"));
        assertEquals("-free", only(text("jackets", "DWR-free finish"), "dwr").evidence().get(0).cue());
        assertEquals("Non-", only(text("jackets", "Non-insulated shell"), "insulated").evidence().get(0).cue());
        // "-less" needs the hyphen: "hood less" is not "hoodless"
        assertEquals(Map.of("hooded", "stated"), concepts("jackets", "hood less bulky than before"));
    }

    @Test
    void aHyphenatedNegationWordIsPartOfACompoundNotACue() {
        // no vocabulary label for "no-see-um": its "no" still must not deny the mesh after it
        Vocabulary v = Vocabulary.of(SchemeInfo.of("t", "t"), List.of(Concept.builder("mesh").prefLabel("mesh").build()),
                List.of(), List.of());
        Labeler l = Labeler.of(v, Analysis.of(AnalysisProfile.defaults()));
        assertEquals(Polarity.STATED, l.label(text("tents", "no-see-um mesh")).assignments().get(0).polarity());
    }

    @Test
    void aSpecKeyTakesItsPolarityFromTheValue() {
        assertEquals(Map.of("hooded", "negated"), concepts(listing("FH-4", "jackets", Field.spec("Hood", "No"))));
        assertEquals(Map.of("waterproof", "stated"), concepts(listing("FH-4", "jackets", Field.spec("Waterproof", "Yes"))));
        assertEquals(Map.of(), concepts(listing("FH-4", "jackets", Field.spec("Hood", "n/a"))));
        assertEquals(Map.of("hooded", "negated"), concepts(listing("FH-4", "jackets", Field.spec("Hood", "No hood"))));
        assertEquals(Map.of("waterproof", "negated"), concepts(listing("FH-4", "jackets", Field.spec("Waterproof", "Not included"))));
        // a longer value is a statement of its own, not a denial of the key
        assertEquals(Map.of("packable", "stated"),
                concepts(listing("FH-4", "jackets", Field.spec("Packable", "no stuff sack needed, packs small"))));
        Assignment a = only(listing("FH-4", "jackets", Field.spec("Hood", "None.")), "hooded");
        Evidence e = a.evidence().get(0);
        assertEquals(SegmentPart.SPEC_KEY, e.part());
        assertEquals("Hood", e.key());
        assertEquals("None.", e.cue());
    }

    @Test
    void aSpecValueOfSeparatorsOnlySaysNothingAboutItsKey() {
        // it used to stop the labeler (the value split into no words at all)
        assertEquals(Map.of(), concepts(listing("FH-4", "jackets", Field.spec("Hood", "/"))));
        assertEquals(Map.of(), concepts(listing("FH-4", "jackets", Field.spec("Hood", " , ; "))));
        // a long value that starts with a separator is a statement; one starting with a negation word is read as before
        assertEquals(Map.of("hooded", "stated"), concepts(listing("FH-4", "jackets", Field.spec("Hood", "/ detachable, stows in collar"))));
        assertEquals(Map.of("hooded", "negated"), concepts(listing("FH-4", "jackets", Field.spec("Hood", "NONE, ;"))));
        assertEquals(Map.of("hooded", "negated"), concepts(listing("FH-4", "jackets", Field.spec("Hood", "without hood"))));
        assertEquals(Map.of("hooded", "stated"), concepts(listing("FH-4", "jackets", Field.spec("Hood", "Unknown colour"))));
        assertEquals(Map.of(), concepts(listing("FH-4", "jackets", Field.spec("Hood", "Unknown."))));
    }

    @Test
    void aWordThatStartsManyLabelsFindsEachOfThemAndTheLongest() {
        // more than eight labels continue "pack" (the trie searches a long run of children by halving)
        List<Concept> cs = new ArrayList<>();
        String[] next = {"cover", "liner", "strap", "frame", "lid", "pocket", "zip", "belt", "harness", "sack", "weight", "volume"};
        for (String w : next) {
            cs.add(Concept.builder("pack-" + w).prefLabel("pack " + w).build());
        }
        cs.add(Concept.builder("pack").prefLabel("pack").build());
        cs.add(Concept.builder("pack-lid-pocket").prefLabel("pack lid pocket").build());
        Labeler l = Labeler.of(Vocabulary.of(SchemeInfo.of("t", "t"), cs, List.of(), List.of()), Analysis.of(AnalysisProfile.defaults()));
        for (String w : next) {
            assertEquals(List.of("pack-" + w), ids(l, "Pack " + w), w);
        }
        assertEquals(List.of("pack"), ids(l, "pack bag"));
        assertEquals(List.of("pack"), ids(l, "pack. cover"), "a break in the text is no edge of the trie");
        assertEquals(List.of("pack-lid-pocket"), ids(l, "pack lid pocket"));
        assertEquals(List.of("pack", "pack-lid"), ids(l, "pack lid, pack"));
    }

    @Test
    void yesNoFacetsAreAssignedThroughTheirOwnLabels() {
        assertEquals(Map.of("packable", "stated"), concepts("jackets", "Packs into its own pocket"));
        assertEquals(Map.of("packable", "negated"), concepts("jackets", "Not packable"));
    }

    @Test
    void aConceptWhoseFacetDoesNotApplyIsKeptAndMarked() {
        Assignment a = only(text("jackets", "non-slip cuffs"), "non-slip");
        assertFalse(a.applies());
        assertEquals("sole-grip", a.facetId());
        assertTrue(only(text("footwear", "non-slip sole"), "non-slip").applies());
        assertEquals(1, labeler.label(text("jackets", "non-slip cuffs")).categoryErrors().size());
    }

    @Test
    void regulatedClaimsAreMarkedForReview() {
        assertTrue(only(text("jackets", "fully waterproof"), "waterproof").review());
        assertFalse(only(text("jackets", "ripstop nylon"), "ripstop-nylon").review());
    }

    @Test
    void specNumbersAreConvertedToTheFacetUnitAndBucketed() {
        Assignment w = only(listing("FH-5", "tents", Field.spec("Packed Weight", "3 kg"), Field.spec("Weight", "2 lb 10 oz")), "weight");
        // 2 lb 10 oz = 42 oz = 42 × 0.028349523125 kg = 1.19067997125 kg exactly (NIST SP 811 (2008), Appendix B [mem])
        assertEquals(1.19067997125, w.value(), 1e-12);
        assertEquals("kg", w.unit());
        assertEquals("light", w.bucket());
        Evidence e = w.evidence().get(0);
        assertEquals(1, e.field());
        assertEquals(SegmentPart.SPEC_VALUE, e.part());
        assertEquals("2 lb 10 oz", e.text());
        assertNull(e.labelKind());

        Assignment grams = only(listing("FH-6", "tents", Field.spec("Weight (g)", "850")), "weight");
        assertEquals(0.85, grams.value(), 1e-12);
        assertEquals("ultralight", grams.bucket());
        Assignment keyed = only(listing("FH-6", "tents", Field.spec("ITEM WEIGHT:", "2.5 kg")), "weight");
        assertEquals("standard", keyed.bucket());
    }

    @Test
    void specKeysThatClusterWithAFacetLabelGoToThatFacet() {
        for (String key : List.of("Wt.", "Weights", "Mass", "Net weight", "WEIGHT (kg)")) {
            assertEquals(1.2, only(listing("FH-6", "tents", Field.spec(key, "1.2 kg")), "weight").value(), key);
        }
        // a modifier that makes another facet keeps the key apart
        assertTrue(labeler.label(listing("FH-6", "tents", Field.spec("Trail weight", "1.2 kg"))).assignments().isEmpty());
    }

    @Test
    void quantitiesInTextGoToANamedFacetOrTheOnlyFacetOfTheirDimension() {
        Assignment w = only(text("tents", "Weighs 1.2 kg all in"), "weight");
        assertEquals(1.2, w.value());
        Assignment cap = only(text("packs", "A volume of 45 L and a weight of 3.3 lb"), "capacity");
        assertEquals(45.0, cap.value());
        Assignment comfort = only(text("sleeping-bags", "Comfort rating 5°C, lower limit -1 °C"), "comfort-rating");
        assertEquals(5.0, comfort.value());
        assertEquals(-1.0, only(text("sleeping-bags", "Comfort rating 5°C, lower limit -1 °C"), "lower-limit").value());
        // two temperature facets: a temperature with no facet label before it goes nowhere
        assertTrue(labeler.label(text("sleeping-bags", "Good down to -9 °C")).assignments().isEmpty());
        // the label must be close: a sentence end in between breaks the link
        Assignments far = labeler.label(text("sleeping-bags", "See the comfort rating. It is 5°C"));
        assertTrue(far.assignments().stream().noneMatch(Assignment::isNumber));
    }

    @Test
    void theSameNumberInTwoPlacesIsOneValueAndDifferentNumbersAreTwo() {
        Listing same = listing("FH-7", "tents", Field.spec("Weight", "1.19 kg"), Field.of(FieldKind.BULLET, "Only 2 lb 10 oz"));
        Assignment w = only(same, "weight");
        assertEquals(2, w.evidence().size());
        Listing two = listing("FH-8", "tents", Field.spec("Weight", "1.2 kg"), Field.of(FieldKind.BULLET, "weighs 1.5 kg"));
        assertEquals(List.of(1.2, 1.5), labeler.label(two).assignments().stream().map(Assignment::value).toList());
    }

    @Test
    void unreadableSpecValuesOfNumberFacetsAreRecorded() {
        Assignments a = labeler.label(listing("FH-9", "tents", Field.spec("Weight", "featherlight"),
                Field.spec("Capacity", "84 x 52 x 40 in")));
        assertTrue(a.assignments().isEmpty());
        assertEquals(List.of("weight", "capacity"), a.invalid().stream().map(InvalidValue::facetId).toList());
        assertTrue(a.invalid().get(0).reason().contains("featherlight"));
        assertFalse(a.isEmpty());
        Assignments wrongDim = labeler.label(listing("FH-9", "tents", Field.spec("Weight", "40 cm")));
        assertTrue(wrongDim.invalid().get(0).reason().contains("mass"), wrongDim.invalid().toString());
    }

    @Test
    void labelsThatCanNeverMatchAreNoted() {
        Vocabulary v = Vocabulary.of(SchemeInfo.of("t", "t"),
                List.of(Concept.builder("dots").prefLabel("...").build(), Concept.builder("ok").prefLabel("nylon").build()),
                List.of(), List.of());
        Labeler l = Labeler.of(v, Analysis.of(AnalysisProfile.defaults()));
        assertEquals(1, l.notes().size(), l.notes().toString());
        assertTrue(l.notes().get(0).contains("\"...\""));
        assertEquals(1, l.labelsCompiled());
    }

    @Test
    void aWaterproofRatingIsAWaterColumnNotALength() {
        // the quantity reader takes "20,000 mm" under a waterproof key as mm H2O (decision 062); a facet in
        // plain "mm" (a length) can take none of those values, and says so when compiled
        java.util.function.Function<String, Labeler> withUnit = unit -> Labeler.of(Vocabulary.of(SchemeInfo.of("t", "t"), List.of(
                Concept.builder("waterproof-rating").prefLabel("Waterproof rating").altLabel("hydrostatic head")
                        .facet(dev.sheaf.vocab.FacetProperties.number(unit, List.of(new dev.sheaf.vocab.Bucket("10,000 mm and up", 10000.0, null))))
                        .build(),
                Concept.builder("pole-diameter").prefLabel("Pole diameter")
                        .facet(dev.sheaf.vocab.FacetProperties.number("mm", List.of())).build()), List.of(), List.of()),
                Analysis.of(AnalysisProfile.defaults()));
        Listing l = listing("T", "tents", Field.spec("Waterproof rating", "20,000 mm"), Field.spec("Pole diameter", "8.5 mm"),
                Field.of(FieldKind.BULLET, "Fly with a 3,000mm hydrostatic head"));

        Labeler mm = withUnit.apply("mm");
        assertEquals(1, mm.notes().size(), mm.notes().toString());
        assertTrue(mm.notes().get(0).contains("waterproof-rating") && mm.notes().get(0).contains("\"mm H2O\""), mm.notes().get(0));
        Assignments wrong = mm.label(l);
        assertEquals(1, wrong.invalid().size(), wrong.toString());
        assertTrue(wrong.invalid().get(0).reason().contains("water column"), wrong.invalid().get(0).reason());

        Labeler water = withUnit.apply("mm H2O");
        assertEquals(List.of(), water.notes());
        Assignments right = water.label(l);
        assertEquals(List.of(), right.invalid());
        List<Assignment> ratings = right.assignments().stream().filter(a -> a.conceptId().equals("waterproof-rating")).toList();
        assertEquals(List.of(3000.0, 20000.0), ratings.stream().map(Assignment::value).toList());
        assertEquals("mm H2O", ratings.get(1).unit());
        assertEquals("10,000 mm and up", ratings.get(1).bucket());
        assertEquals("3,000mm", ratings.get(0).evidence().get(0).text());
        assertEquals(8.5, right.assignments().stream().filter(a -> a.conceptId().equals("pole-diameter")).findFirst().orElseThrow().value());
    }

    @Test
    void aLabelWithABreakCharacterMatchesAcrossABreakThereAndNowhereElse() {
        Vocabulary v = Vocabulary.of(SchemeInfo.of("t", "t"), List.of(
                Concept.builder("adjustable-hood").prefLabel("adjustable hood").altLabel("adj. hd").build(),
                Concept.builder("blend").prefLabel("88% nylon, 12% elastane").build(),
                Concept.builder("hd").prefLabel("hd").build()), List.of(), List.of());
        Labeler l = Labeler.of(v, Analysis.of(AnalysisProfile.defaults()));
        assertEquals(List.of("adjustable-hood"), ids(l, "ADJ. HD, 2W zip"));
        assertEquals(List.of("blend"), ids(l, "Shell: 88% nylon, 12% elastane"));
        // a break in the text stops what has none in the label, and ends a negation's scope
        assertEquals(List.of("hd"), ids(l, "adj hd"), "no break in the text: the label with one does not match");
        assertEquals(Polarity.STATED, l.label(text("jackets", "No zips. Hd")).assignments().get(0).polarity());
    }

    private static List<String> ids(Labeler l, String text) {
        return l.label(text("jackets", text)).assignments().stream().map(Assignment::conceptId).toList();
    }

    @Test
    void withoutWrittenWSlashONegates() {
        assertEquals(Map.of("hooded", "negated"), concepts("jackets", "Shell jkt w/o hood"));
        assertEquals("W/O", only(text("jackets", "W/O HOOD"), "hooded").evidence().get(0).cue());
    }

    @Test
    void categoriesMatchWhateverTheirCaseAndSeparators() {
        assertTrue(only(text("Footwear", "non-slip sole"), "non-slip").applies(), "a spec sheet's 'Footwear' is the vocabulary's 'footwear'");
        assertFalse(only(text("Rain Jackets", "non-slip cuffs"), "non-slip").applies());
        assertEquals("sleeping-bags", Labeler.categoryKey("Sleeping Bags"));
        assertEquals("sleeping-bags", Labeler.categoryKey("sleeping_bags"));
        assertEquals("stoves-and-cookware", Labeler.categoryKey("Stoves & Cookware"));
        assertEquals(Labeler.categoryKey("SLEEPING BAGS"), Labeler.categoryKey("sleeping-bags"));
    }

    @Test
    void aListingWithNoCategoryIsNeverACategoryError() {
        Assignment a = only(text("", "non-slip cuffs"), "non-slip");
        assertTrue(a.applies(), "the category is unknown, not wrong");
    }

    @Test
    void theDimensionFallbackOnlyConsidersFacetsThatApplyToTheCategory() {
        // capacity (L) applies to packs only: a litre in a stove listing is no pack volume
        assertTrue(labeler.label(text("stoves", "Boils 1 L in 3 min")).assignments().isEmpty());
        assertEquals(30.0, only(text("packs", "Holds 30 L of gear"), "capacity").value());
        // but a named facet still takes its number, and is then a likely error
        Assignment cued = only(text("stoves", "capacity 1 L"), "capacity");
        assertFalse(cued.applies());
    }

    @Test
    void specValuesWithWordsAroundOrSeveralUnitsAreStillRead() {
        Assignment shoe = only(listing("F", "footwear", Field.spec("Weight", "350 g (12.4 oz) per shoe, size 9")), "weight");
        assertEquals(0.35, shoe.value(), 1e-12);
        assertEquals(1, shoe.evidence().size());
        assertEquals("350 g", shoe.evidence().get(0).text());
        Assignments two = labeler.label(listing("T", "tents", Field.spec("Weight", "body 1.2 kg / fly 0.4 kg")));
        assertEquals(List.of(0.4, 1.2), two.assignments().stream().map(Assignment::value).toList(), "same unit twice: two values");
        Assignment comfort = only(listing("S", "sleeping-bags", Field.spec("Comfort rating", "Comfort 1 °C / 34 °F")), "comfort-rating");
        assertEquals(1.0, comfort.value(), 1e-12, "34 °F restates 1 °C");
    }

    @Test
    void aFacetInAUnitSheafDoesNotKnowTakesALoneNumber() {
        Vocabulary v = Vocabulary.of(SchemeInfo.of("t", "t"), List.of(Concept.builder("r-value").prefLabel("R-value")
                .facet(dev.sheaf.vocab.FacetProperties.number("m²·K/W", List.of())).build()), List.of(), List.of());
        Labeler l = Labeler.of(v, Analysis.of(AnalysisProfile.defaults()));
        assertEquals(6.2, l.label(listing("P", "sleeping-pads", Field.spec("R-value", "R 6.2"))).assignments().get(0).value());
        assertEquals("m²·K/W", l.label(listing("P", "sleeping-pads", Field.spec("R value", "4.5"))).assignments().get(0).unit());
        assertEquals(1, l.label(listing("P", "sleeping-pads", Field.spec("R-value", "R 2 to R 4"))).invalid().size());
        assertEquals(1, l.notes().size(), "the unit is noted once");
    }

    @Test
    void manyThreadsGetTheSameAnswersAsOne() {
        List<Listing> ls = new ArrayList<>();
        String[] texts = {"Ripstop nylon, no hood", "Not waterproof; merino wool", "PFC-free DWR. Weighs 900 g",
            "Made in USA with non-slip sole", "hood-less, packable, water resistant"};
        for (int i = 0; i < 2000; i++) {
            ls.add(listing("FH-" + i, i % 2 == 0 ? "jackets" : "footwear", Field.of(FieldKind.DESCRIPTION, texts[i % texts.length])));
        }
        List<Assignments> one = ls.stream().map(labeler::label).toList();
        List<Assignments> many = IntStream.range(0, ls.size()).parallel().mapToObj(i -> labeler.label(ls.get(i)))
                .collect(Collectors.toList());
        assertEquals(one, many);
    }
}
