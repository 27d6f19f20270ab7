package dev.sheaf.miner.ingest;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;

/** Spec lines, identifier pairs and lines of several pairs (docs/decisions/107). */
class SpecLinesTest {

    private static List<String> pairs(String line) {
        return SpecLines.pairs(line).stream().map(f -> f.key() + "=" + f.text()).toList();
    }

    @Test
    void aLineOfSeveralPairsIsSplitNeverGluedIntoOneKey() {
        assertEquals(List.of("SKU=FH-000104", "Supplier=Northwind Outfitters"), pairs("SKU FH-000104 · Supplier: Northwind Outfitters"));
        assertEquals(List.of("SKU=FH-000104", "Category=Tents"), pairs("SKU FH-000104  ·  Category: Tents"), "PDF spacing");
        assertEquals(List.of("Item no.=FH-001010", "Category=Backpacks"), pairs("Item no.: FH-001010    Category: Backpacks"),
                "a wide gap between pairs (DOCX)");
        assertEquals(List.of("ITEM NO=FH-000358", "CAT=Backpacks"), pairs("ITEM NO. FH-000358    CAT. Backpacks"),
                "no colons: identifier keys then values");
        assertEquals(List.of("Colour=red", "Weight=1.2 kg"), pairs("Colour: red | Weight: 1.2 kg"));
    }

    @Test
    void aSeparatorInsideAValueDoesNotSplitTheLine() {
        assertEquals(List.of("Features=waterproof · breathable"), pairs("Features: waterproof · breathable"),
                "'breathable' is not a pair, so the line is one spec");
        assertEquals(List.of("Weight=1.2 kg"), pairs("Weight:  1.2 kg"), "a gap after the colon");
        assertEquals(List.of(), pairs("Light · warm · packable"), "no pair at all");
    }

    @Test
    void bareIdentifiersNeedACodeLikeValueOrAnIdBesideThem() {
        assertEquals(List.of("SKU=FH-000104"), pairs("SKU FH-000104"));
        assertEquals(List.of(), pairs("Item no longer sold in stores"), "not a code: prose");
        assertEquals(List.of(), pairs("SKU list below"), "a listing id must hold a digit");
        assertEquals(List.of(), pairs("Cat. Tents"), "a bare category alone is not enough");
        assertEquals(List.of(), pairs("Supplier Northwind · Made in Portugal"));
    }

    @Test
    void identifierKeysAreKnownAndPropertiesAreNot() {
        assertEquals(SpecLines.Identifier.LISTING_ID, SpecLines.Identifier.of("SKU"));
        assertEquals(SpecLines.Identifier.LISTING_ID, SpecLines.Identifier.of("Item no."));
        assertEquals(SpecLines.Identifier.LISTING_ID, SpecLines.Identifier.of("Article number"));
        assertEquals(SpecLines.Identifier.LISTING_ID, SpecLines.Identifier.of("Art.-Nr."));
        assertEquals(SpecLines.Identifier.CATEGORY, SpecLines.Identifier.of("CAT."));
        assertEquals(SpecLines.Identifier.OTHER, SpecLines.Identifier.of("Supplier"));
        assertEquals(SpecLines.Identifier.OTHER, SpecLines.Identifier.of("Model no."));
        assertEquals(SpecLines.Identifier.OTHER, SpecLines.Identifier.of("EAN"));
        assertNull(SpecLines.Identifier.of("Weight"));
        assertNull(SpecLines.Identifier.of("Brand"), "a brand can be a facet");
    }

    @Test
    void clockTimesAndSentencesAreNotKeys() {
        assertNull(SpecLines.spec("Boils 1 L in 4:09 min"), "a time, not 'Boils 1 L in 4' = '09 min'");
        assertNull(SpecLines.spec("Bring a spare for the rain you need. Fiber content: 100% nylon"), "a sentence end inside the key");
        assertEquals("Boil time", SpecLines.spec("Boil time: 4 min 9 s").key());
        assertEquals("Weight (approx.)", SpecLines.spec("Weight (approx.): 480 g").key());
    }

    @Test
    void textIdComesFromAnIdentifierLineNearTheTopAndNoIdentifierIsASpec() {
        SpecLines.Parsed p = SpecLines.parse("""
                Northwind · Product specification sheet
                Tarn Bivy
                SKU FH-000104  ·  Category: Shelters
                Model no.: NW-88
                Weight: 480 g
                """, false);
        assertEquals("FH-000104", p.id());
        assertEquals("Shelters", p.category());
        assertEquals(List.of("Weight"), p.fields().stream().filter(f -> f.kind() == FieldKind.SPEC).map(Field::key).toList(),
                "SKU, category and model number are not specs");
    }

    @Test
    void aSkuFarDownTheTextIsNotTheListingsId() {
        StringBuilder t = new StringBuilder("Tarn Bivy\n");
        for (int i = 0; i < SpecLines.ID_LINES + 2; i++) {
            t.append("Line ").append(i).append(" of the description.\n");
        }
        t.append("Spare stake set: SKU FH-000999\nSKU: FH-000998\n");
        SpecLines.Parsed p = SpecLines.parse(t.toString(), false);
        assertNull(p.id(), "quoted further down, a SKU is usually another product's");
        assertTrue(p.fields().stream().noneMatch(f -> f.kind() == FieldKind.SPEC && f.key().equals("SKU")), p.fields().toString());
    }
}
