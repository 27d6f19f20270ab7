package dev.sheaf.samples;

/**
 * Plain-text and Markdown listings: a buyer's note pasted from an e-mail (txt) and a page from the
 * shop's wiki (md, with the specs as a Markdown table: a fourth spec shape).
 */
final class TextNote {
    private TextNote() {
    }

    static String plain(Product p) {
        StringBuilder t = new StringBuilder(1024);
        t.append("Product note: ").append(p.title()).append('\n');
        t.append("SKU: ").append(p.id()).append('\n');
        t.append("Category: ").append(p.category().id).append('\n');
        t.append("Supplier: ").append(p.supplier().name()).append("\n\n");
        t.append(wrap(p.description(), 78)).append("\n\n");
        if (!p.bullets().isEmpty()) {
            t.append("Features:\n");
            for (String b : p.bullets()) {
                t.append("  - ").append(b).append('\n');
            }
            t.append('\n');
        }
        t.append("Specs:\n");
        for (Spec s : p.specs()) {
            t.append("  ").append(s.key()).append(": ").append(s.value()).append('\n');
        }
        t.append("\n-- \nsent from the Fernhollow buying desk\n");
        return t.toString();
    }

    static String markdown(Product p) {
        StringBuilder t = new StringBuilder(1024);
        t.append("# ").append(p.title()).append("\n\n");
        t.append("**SKU:** ").append(p.id()).append("  \n");
        t.append("**Category:** ").append(p.category().id).append("  \n");
        t.append("**Supplier:** ").append(p.supplier().name()).append("\n\n");
        t.append(p.description()).append("\n\n");
        if (!p.bullets().isEmpty()) {
            t.append("## Features\n\n");
            for (String b : p.bullets()) {
                t.append("- ").append(b).append('\n');
            }
            t.append('\n');
        }
        t.append("## Specifications\n\n| Spec | Value |\n|---|---|\n");
        for (Spec s : p.specs()) {
            t.append("| ").append(s.key().replace("|", "\\|")).append(" | ").append(s.value().replace("|", "\\|")).append(" |\n");
        }
        return t.toString();
    }

    /** Greedy word wrap at {@code width} columns (words are never split). */
    static String wrap(String text, int width) {
        StringBuilder out = new StringBuilder(text.length() + 16);
        int col = 0;
        for (String word : text.split(" ")) {
            if (col > 0 && col + 1 + word.length() > width) {
                out.append('\n');
                col = 0;
            } else if (col > 0) {
                out.append(' ');
                col++;
            }
            out.append(word);
            col += word.length();
        }
        return out.toString();
    }
}
