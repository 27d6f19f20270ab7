package dev.sheaf.miner.report;

import java.util.ArrayList;
import java.util.List;
import java.util.Objects;

/**
 * A titled part of the report, listed in the table of contents.
 *
 * @param id     the element id (a-z, 0-9, '-')
 * @param title  the heading
 * @param blocks what it holds, in order
 */
public record Section(String id, String title, List<Block> blocks) {
    public Section {
        Ids.require(id, "section");
        Objects.requireNonNull(title, "title");
        blocks = List.copyOf(blocks);
        if (title.isBlank()) {
            throw new IllegalArgumentException("section '" + id + "' needs a title");
        }
    }

    public static Builder builder(String id, String title) {
        return new Builder(id, title);
    }

    /** Collects blocks in order. */
    public static final class Builder {
        private final String id;
        private final String title;
        private final List<Block> blocks = new ArrayList<>();

        private Builder(String id, String title) {
            this.id = id;
            this.title = title;
        }

        public Builder text(String paragraph) {
            blocks.add(new Paragraph(paragraph));
            return this;
        }

        public Builder add(Block block) {
            blocks.add(Objects.requireNonNull(block, "block"));
            return this;
        }

        public Section build() {
            return new Section(id, title, blocks);
        }
    }
}
