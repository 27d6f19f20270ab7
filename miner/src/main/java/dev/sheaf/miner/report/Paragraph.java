package dev.sheaf.miner.report;

import java.util.Objects;

/**
 * A paragraph of plain text (escaped when written; no markup is interpreted).
 *
 * @param text the text
 */
public record Paragraph(String text) implements Block {
    public Paragraph {
        Objects.requireNonNull(text, "text");
    }
}
