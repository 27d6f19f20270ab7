package dev.sheaf.miner.ingest;

import java.io.IOException;

/**
 * One listing per plain-text or Markdown file. Title: the first {@code #} heading (Markdown) or
 * the first non-empty line; "Key: value" lines are specs, {@code - x} / {@code * x} lines bullets,
 * other Markdown headings headings, Markdown pipe tables spec tables ({@code | Weight | 1.2 kg |};
 * a malformed one is read as text or as it stands, with a "parse" problem naming its line), the
 * rest paragraphs of text (see {@link SpecLines}). Like an
 * extracted document, at most {@link SourceFile#writeLimit()} characters are read ("too-large" beyond).
 */
final class TextReader implements ListingReader {
    @Override
    public String name() {
        return "text";
    }

    @Override
    public void read(SourceFile file) throws IOException {
        String text = file.readText(null, file.writeLimit());
        if (text == null) {
            return;
        }
        boolean markdown = file.extension().equals("md") || file.extension().equals("markdown");
        emit(file, text, markdown, "");
    }

    /** Shared with the document reader: text → one listing, or an "empty" problem. */
    static void emit(SourceFile file, String text, boolean markdown, String locator) {
        SpecLines.Parsed p = SpecLines.parse(text, markdown);
        for (SpecLines.LineProblem lp : p.problems()) {
            file.problem("line " + lp.line(), "parse", lp.reason());
        }
        if (p.fields().isEmpty()) {
            file.problem("", "empty", "no text found in the file; expected a title line and some product text");
            return;
        }
        file.emit(new Listing(p.id() == null ? file.stem() : p.id(), p.category() == null ? "" : p.category(),
                file.display(), locator, p.fields()));
    }
}
