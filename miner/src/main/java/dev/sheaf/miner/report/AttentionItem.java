package dev.sheaf.miner.report;

import java.util.List;
import java.util.Objects;

/**
 * One entry of the summary's "most in need of attention" list.
 *
 * @param label   the attribute as shown
 * @param cardId  the id of its {@link AttributeCard} (the entry then links to it), or empty
 * @param reasons why it is listed, one short statement each (at least one)
 */
public record AttentionItem(String label, String cardId, List<String> reasons) {
    public AttentionItem {
        Objects.requireNonNull(label, "label");
        Objects.requireNonNull(cardId, "cardId");
        reasons = List.copyOf(reasons);
        if (label.isBlank() || reasons.isEmpty()) {
            throw new IllegalArgumentException("an attention item needs a label and at least one reason, got '" + label
                    + "' with " + reasons.size() + " reasons");
        }
    }
}
