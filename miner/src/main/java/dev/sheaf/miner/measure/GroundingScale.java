package dev.sheaf.miner.measure;

import java.util.List;
import java.util.Objects;

/**
 * One entry of a {@link GroundingScales} file: gradable words (or concepts) that speak of a number
 * facet, and which way. "light" is weight {@link Direction#LESS}: "lighter" claims the target
 * weighs less than the reference. "warm" is comfort temperature {@link Direction#LESS}: a warmer
 * sleeping bag is rated for a lower temperature.
 *
 * @param facet     the number facet whose catalog values ground the words (a facet id)
 * @param direction {@link Direction#MORE} when more of the word means a larger value, {@link Direction#LESS} when smaller
 * @param words     base forms of gradable words ("light", "roomy"), in normal form; may be empty when concepts are given
 * @param concepts  concept ids whose comparative mentions speak of the facet; may be empty when words are given
 * @param note      why the direction is what it is, or the empty string
 */
public record GroundingScale(String facet, Direction direction, List<String> words, List<String> concepts, String note) {
    public GroundingScale {
        Objects.requireNonNull(facet, "facet");
        Objects.requireNonNull(direction, "direction");
        Objects.requireNonNull(note, "note");
        words = List.copyOf(words);
        concepts = List.copyOf(concepts);
        if (facet.isBlank()) {
            throw new IllegalArgumentException("a scale needs the id of a number facet; got a blank one");
        }
        if (direction != Direction.MORE && direction != Direction.LESS) {
            throw new IllegalArgumentException("a scale's direction is more or less; got " + direction);
        }
        if (words.isEmpty() && concepts.isEmpty()) {
            throw new IllegalArgumentException("scale for facet " + facet + " names no words and no concepts; give at least one");
        }
    }

    /**
     * The direction on this scale's facet of a mention read as {@code read} about the word: more of
     * "light" is less weight; "not light" (absent) is the opposite of the scale's direction.
     */
    public Direction onFacet(Direction read) {
        boolean same = read == Direction.MORE || read == Direction.PRESENT;
        return same ? direction : opposite(direction);
    }

    static Direction opposite(Direction d) {
        switch (d) {
            case MORE: return Direction.LESS;
            case LESS: return Direction.MORE;
            case PRESENT: return Direction.ABSENT;
            default: return Direction.PRESENT;
        }
    }
}
