package dev.sheaf.samples;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

/**
 * Broken files for the robustness demo (not a source in workspace.json): each one must end up as
 * a recorded problem, never stop a batch. {@link #EXPECTED} says which problem kind a reader
 * should record (kinds as in CONTRACTS.md).
 */
final class BadFiles {
    private BadFiles() {
    }

    record Bad(String file, String expectedProblem, String what) {
    }

    static final List<Bad> EXPECTED = List.of(
            new Bad("bad/empty.html", "empty", "zero bytes"),
            new Bad("bad/truncated.pdf", "corrupt", "a real spec sheet cut off after 40% of its bytes: no xref, no %%EOF, the page content cut mid-stream (lenient parsers open it and find no text)"),
            new Bad("bad/junk.html", "corrupt", "2 KiB of binary noise with NUL bytes behind an .html name"),
            new Bad("bad/latin1.txt", "encoding", "a supplier note in ISO-8859-1 with accented letters (invalid as UTF-8)"),
            new Bad("bad/broken-quote.csv", "parse", "a catalog export whose second record opens a quote that never closes"),
            new Bad("bad/not-a-zip.docx", "corrupt", "plain text behind a .docx name (a DOCX must be a zip package)"),
            new Bad("bad/broken-line.jsonl", "parse", "a feed whose line 3 of 5 is cut off mid-string; lines 1, 2, 4, 5 are valid"));

    static List<Path> write(Path badDir, Product sample, long seed) throws IOException {
        List<Path> out = new ArrayList<>();
        Path root = badDir.getParent();
        out.add(put(root, "bad/empty.html", new byte[0]));
        byte[] pdf = PdfSheet.render(sample);
        out.add(put(root, "bad/truncated.pdf", Arrays.copyOf(pdf, pdf.length * 2 / 5)));
        Rng r = Rng.of(seed, "junk", 0);
        byte[] junk = new byte[2048];
        for (int i = 0; i < junk.length; i++) {
            junk[i] = (byte) (i % 97 == 0 ? 0 : r.nextInt(256));
        }
        out.add(put(root, "bad/junk.html", junk));
        String latin = "Supplier note (Atelier Sénanque, Québec)\r\n"
                + "Article: Doudoune légère « Crêt de la Neige », duvet d'oie 800 cuin\r\n"
                + "Fibre content: 100% laine mérinos (merino wool) for the lining\r\n"
                + "Colour: Crème / Bleu glacier. Comfort from -5 °C; weight ½ kg; size Übergröße XL\r\n";
        out.add(put(root, "bad/latin1.txt", latin.getBytes(StandardCharsets.ISO_8859_1)));
        String csv = "sku,name,category,description,feature_1,feature_2,feature_3,Weight\r\n"
                + "FH-900001,Tarnwick Test 1 Tent,tents,A valid first row.,Freestanding design,,,1.2 kg\r\n"
                + "FH-900002,\"Larchmere 2 Tent, moss,tents,\"The quote before the name is never closed,,,,2 lb 10 oz\r\n"
                + "FH-900003,Tarnwick Test 3 Tent,tents,Swallowed by the open quote.,,,,1.4 kg\r\n";
        out.add(put(root, "bad/broken-quote.csv", csv.getBytes(StandardCharsets.UTF_8)));
        out.add(put(root, "bad/not-a-zip.docx", "This is not a Word document, only text with a .docx name.\n".getBytes(StandardCharsets.UTF_8)));
        String jsonl = "{\"id\":\"FH-900011\",\"category\":\"tents\",\"title\":\"Valid line one\",\"description\":\"A fine tent.\",\"bullets\":[],\"specs\":{\"Weight\":\"1.1 kg\"}}\n"
                + "{\"id\":\"FH-900012\",\"category\":\"tents\",\"title\":\"Valid line two\",\"description\":\"Another fine tent.\",\"bullets\":[],\"specs\":{}}\n"
                + "{\"id\":\"FH-900013\",\"category\":\"tents\",\"title\":\"Broken li\n"
                + "{\"id\":\"FH-900014\",\"category\":\"stoves\",\"title\":\"Valid line four\",\"description\":\"A stove.\",\"bullets\":[],\"specs\":{\"Weight\":\"85 g\"}}\n"
                + "{\"id\":\"FH-900015\",\"category\":\"stoves\",\"title\":\"Valid line five\",\"description\":\"Another stove.\",\"bullets\":[],\"specs\":{}}\n";
        out.add(put(root, "bad/broken-line.jsonl", jsonl.getBytes(StandardCharsets.UTF_8)));
        return out;
    }

    private static Path put(Path root, String rel, byte[] bytes) throws IOException {
        Path p = root.resolve(rel);
        Output.writeBytes(p, bytes);
        return p;
    }
}
