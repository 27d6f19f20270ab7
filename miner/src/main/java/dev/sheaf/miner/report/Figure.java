package dev.sheaf.miner.report;

import java.util.Objects;

/**
 * A chart with its title and its how-to-read sentence. The SVG must come from {@link Charts} (or
 * pass the same check): it is embedded as markup, so it is checked against an allow-list of SVG
 * elements and attributes, with no scripts, event handlers, links or external references.
 *
 * @param id        the figure's id; must equal the id of the SVG's root element
 * @param title     the caption
 * @param svg       an {@code <svg>} element
 * @param howToRead what the figure measures, its method and thresholds
 */
public record Figure(String id, String title, String svg, HowToRead howToRead) implements Block {
    public Figure {
        Ids.require(id, "figure");
        Objects.requireNonNull(title, "title");
        Objects.requireNonNull(svg, "svg");
        Objects.requireNonNull(howToRead, "howToRead");
        if (title.isBlank()) {
            throw new IllegalArgumentException("figure '" + id + "' needs a title");
        }
        String rootId = SvgCheck.check(svg);
        if (!id.equals(rootId)) {
            throw new IllegalArgumentException("figure '" + id + "' holds an SVG whose root id is '" + rootId
                    + "'; render the chart with the figure's id so element ids stay unique in the page");
        }
    }
}
