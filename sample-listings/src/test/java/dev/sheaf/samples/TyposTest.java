package dev.sheaf.samples;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;

class TyposTest {
    private static Product listing(String description, List<String> bullets) {
        Facts f = Facts.builder().term(Trait.COLOUR, "green").build();
        return new Product("FH-000001", Category.TENTS, Supplier.TARNWICK, "Title", description, bullets,
                List.of(new Spec(SpecKey.WEIGHT, "Weight", "1 kg")), f, java.util.Set.of(), "Moss", null);
    }

    private static Typos.Typo typo(String wrong) {
        return Typos.ALL.stream().filter(t -> t.wrong().equals(wrong)).findFirst().orElseThrow();
    }

    @Test
    void replacesTheFirstWholeWordOccurrenceKeepingItsCase() {
        Product p = listing("Waterproof fly. Fully waterproof floor.", List.of());
        Product planted = Typos.plant(p, typo("waterproff"));
        assertEquals("Waterproff fly. Fully waterproof floor.", planted.description());
    }

    @Test
    void partOfALongerWordIsNotAnOccurrence() {
        Product p = listing("Separately sold stakes.", List.of("Separate pocket"));
        Product planted = Typos.plant(p, typo("seperate"));
        assertEquals("Separately sold stakes.", planted.description());
        assertEquals(List.of("Seperate pocket"), planted.bullets());
    }

    @Test
    void hyphenatedCompoundsCount() {
        Product p = listing("A water-resistant shell.", List.of());
        assertEquals("A water-resistent shell.", Typos.plant(p, typo("resistent")).description());
    }

    @Test
    void capitalsStayCapitals() {
        Product p = listing("Shell.", List.of("WP BREATHABLE MEMBRANE"));
        assertEquals(List.of("WP BREATHEABLE MEMBRANE"), Typos.plant(p, typo("breatheable")).bullets());
    }

    @Test
    void absentWordPlantsNothing() {
        Product p = listing("A tent.", List.of("Poles"));
        assertFalse(Typos.eligible(p, typo("zippper")));
        assertNull(Typos.plant(p, typo("zippper")));
    }

    @Test
    void everyTypoDiffersFromItsWordAndIsPlantedAtLeastOnce() {
        for (Typos.Typo t : Typos.ALL) {
            assertTrue(t.demoListings() >= 1);
            assertFalse(t.wrong().equalsIgnoreCase(t.right()));
        }
    }
}
