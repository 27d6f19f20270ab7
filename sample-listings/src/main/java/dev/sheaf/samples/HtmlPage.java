package dev.sheaf.samples;

import java.util.List;
import java.util.Locale;

/**
 * A product page as the shop's web site serves it: site header and navigation, breadcrumb, title,
 * meta description, headings, bullet list and a spec block in one of three shapes — a table of
 * th/td rows, a definition list, or "Key: value" lines — plus footer boilerplate. Two page
 * templates (an older and a newer one) differ in markup, as on a real site that was redesigned.
 */
final class HtmlPage {
    /** The three shapes of a spec block. */
    enum SpecShape { TABLE, DEFINITION_LIST, LINES }

    private HtmlPage() {
    }

    static String render(Product p, SpecShape shape, boolean newTemplate) {
        StringBuilder h = new StringBuilder(4096);
        String title = esc(p.title());
        h.append("<!DOCTYPE html>\n<html lang=\"en\">\n<head>\n<meta charset=\"utf-8\">\n");
        h.append("<title>").append(title).append(" | Fernhollow Outfitters</title>\n");
        h.append("<meta name=\"description\" content=\"").append(esc(firstSentence(p.description()))).append("\">\n");
        h.append("<meta name=\"category\" content=\"").append(p.category().id).append("\">\n");
        h.append("<link rel=\"canonical\" href=\"https://fernhollow.example/p/").append(p.id().toLowerCase(Locale.ROOT)).append("\">\n");
        h.append("</head>\n<body>\n");
        h.append("<header class=\"site\"><a href=\"/\">Fernhollow Outfitters</a>\n<nav>");
        for (Category c : Category.values()) {
            h.append("<a href=\"/c/").append(c.id).append("\">").append(c.label).append("</a> ");
        }
        h.append("</nav></header>\n");
        h.append("<nav class=\"breadcrumb\"><a href=\"/\">Home</a> &rsaquo; <a href=\"/c/").append(p.category().id).append("\">")
                .append(p.category().label).append("</a> &rsaquo; ").append(title).append("</nav>\n");
        if (newTemplate) {
            h.append("<main>\n<article class=\"product\" data-sku=\"").append(p.id()).append("\">\n");
        } else {
            h.append("<div id=\"content\">\n<div class=\"product-page\">\n");
        }
        h.append("<h1>").append(title).append("</h1>\n");
        h.append("<p class=\"sku\">SKU ").append(p.id()).append(" &middot; Supplier: ").append(esc(p.supplier().name())).append("</p>\n");
        h.append(newTemplate ? "<h2>Overview</h2>\n" : "<h3>Description</h3>\n");
        List<String> paragraphs = paragraphs(p.description());
        for (String para : paragraphs) {
            h.append("<p>").append(esc(para)).append("</p>\n");
        }
        if (!p.bullets().isEmpty()) {
            h.append(newTemplate ? "<h2>Features</h2>\n" : "<h3>Key features</h3>\n").append("<ul>\n");
            for (String b : p.bullets()) {
                h.append("<li>").append(esc(b)).append("</li>\n");
            }
            h.append("</ul>\n");
        }
        h.append(newTemplate ? "<h2>Specifications</h2>\n" : "<h3>Tech specs</h3>\n");
        switch (shape) {
            case TABLE:
                h.append("<table class=\"specs\">\n<tbody>\n");
                for (Spec s : p.specs()) {
                    h.append("<tr><th>").append(esc(s.key())).append("</th><td>").append(esc(s.value())).append("</td></tr>\n");
                }
                h.append("</tbody>\n</table>\n");
                break;
            case DEFINITION_LIST:
                h.append("<dl class=\"specs\">\n");
                for (Spec s : p.specs()) {
                    h.append("<dt>").append(esc(s.key())).append("</dt><dd>").append(esc(s.value())).append("</dd>\n");
                }
                h.append("</dl>\n");
                break;
            default:
                h.append("<div class=\"specs\">\n<p>\n");
                for (int i = 0; i < p.specs().size(); i++) {
                    Spec s = p.specs().get(i);
                    h.append(esc(s.key())).append(": ").append(esc(s.value())).append(i + 1 < p.specs().size() ? "<br>\n" : "\n");
                }
                h.append("</p>\n</div>\n");
                break;
        }
        h.append(newTemplate ? "</article>\n</main>\n" : "</div>\n</div>\n");
        h.append("<footer>\n<p>Free returns within 30 days. Questions? Ask our team in store or by email.</p>\n");
        h.append("<p>&copy; Fernhollow Outfitters</p>\n</footer>\n</body>\n</html>\n");
        return h.toString();
    }

    static String firstSentence(String description) {
        int dot = description.indexOf(". ");
        return dot < 0 ? description : description.substring(0, dot + 1);
    }

    /** Splits a long description into two paragraphs at a sentence boundary near the middle. */
    static List<String> paragraphs(String description) {
        if (description.length() < 320) {
            return List.of(description);
        }
        int mid = description.indexOf(". ", description.length() / 2);
        if (mid < 0) {
            return List.of(description);
        }
        return List.of(description.substring(0, mid + 1), description.substring(mid + 2));
    }

    static String esc(String s) {
        StringBuilder b = new StringBuilder(s.length() + 16);
        for (int i = 0; i < s.length(); i++) {
            char c = s.charAt(i);
            switch (c) {
                case '&': b.append("&amp;"); break;
                case '<': b.append("&lt;"); break;
                case '>': b.append("&gt;"); break;
                case '"': b.append("&quot;"); break;
                default: b.append(c);
            }
        }
        return b.toString();
    }
}
