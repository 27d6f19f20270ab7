package dev.sheaf.samples;

import com.fasterxml.jackson.databind.JsonNode;
import java.util.Iterator;
import java.util.Map;

/** Renders {@code sample-listings/README.md} from the ground truth, so the documented counts are the generated ones. */
final class Readme {
    private Readme() {
    }

    static String render(Planted planted) {
        JsonNode p = planted.root;
        JsonNode cat = p.get("catalog");
        StringBuilder b = new StringBuilder(32768);
        b.append("# Fernhollow Outfitters: the demo workspace\n\n");
        b.append("Fernhollow Outfitters is an invented outdoor-gear shop. Every product, supplier, place and person here is made up; ")
                .append("no real brand is named. This folder is a Sheaf workspace (`workspace.json`), so `./sheaf audit sample-listings` ")
                .append("and `./sheaf curate sample-listings` work on it. What is planted here is the **demo ground truth** for Sheaf's own ")
                .append("functional tests and suggestion-quality measurement; it is never an outside check value.\n\n");
        b.append("> This file, `planted.json` and everything under `catalog/` and `bad/` are generated. Do not edit them by hand: change the ")
                .append("generator (`src/main/java/dev/sheaf/samples/`) and run `./sheaf generate demo --out sample-listings --replace`. ")
                .append("With the default seed (").append(p.get("seed").asLong()).append(") the output is byte-for-byte the committed files; ")
                .append("`DemoSetTest` fails when they drift apart.\n\n");

        b.append("## What is here\n\n| path | what | count |\n|---|---|---|\n");
        JsonNode bf = cat.get("byFormat");
        row(b, "catalog/html/<category>/*.html", "product pages: title, meta description, headings, bullets; specs as a `<table>` of th/td rows, a `<dl>`, or \"Key: value\" lines; site navigation and footer boilerplate", bf.get("html").asInt());
        row(b, "catalog/feeds/catalog-export.csv", "the shop's catalog export: `sku,name,category,description,feature_1..3`, then one column per spec (RFC 4180, CRLF; every tenth description has a blank line inside its quoted cell; negative numbers use U+2212). Its column names are fixed, but the values are as the suppliers wrote them: `Volume (L)` may hold `45`, `45 L` or `2,750 cu in`", bf.get("csv").asInt());
        row(b, "catalog/feeds/partner-feed.jsonl", "a partner feed, one listing per line: `id, category, title, description, bullets[], specs{}`", bf.get("jsonl").asInt());
        row(b, "catalog/pdf/<category>/*.pdf", "supplier spec sheets (one page; specs as two columns without a colon)", bf.get("pdf").asInt());
        row(b, "catalog/docx/<category>/*.docx", "supplier product sheets (Word; specs in a table)", bf.get("docx").asInt());
        row(b, "catalog/text/<category>/*.txt", "buyer notes pasted from e-mail (\"Key: value\" specs, a signature)", bf.get("txt").asInt());
        row(b, "catalog/text/<category>/*.md", "wiki pages (specs as a Markdown table)", bf.get("md").asInt());
        row(b, "bad/", "broken files for the robustness demo (not a source in workspace.json)", p.get("badFiles").size());
        row(b, "feedback.csv", "shopper sentences comparing a target listing with a reference listing", p.get("feedback").get("sentences").asInt());
        row(b, "judgments.csv", "annotator judgments `item,annotator,attribute,value`", p.get("judgments").get("rows").asInt());
        row(b, "fernhollow-vocab-source.json", "the demo vocabulary in the generator's own form (facets and concepts); `fernhollow.vocab.json` is made from it", -1);
        row(b, "planted.json", "machine-readable ground truth: everything below, with counts and listing ids", -1);
        b.append("\nListings: **").append(cat.get("listings").asInt()).append("** in ").append(cat.get("byCategory").size())
                .append(" categories (").append(join(cat.get("byCategory"))).append(").\n");
        b.append("Suppliers: ").append(join(cat.get("bySupplier"))).append(".\n");
        b.append("One file is one listing for HTML, PDF, DOCX, txt and md. Category is the folder name, a `<meta name=\"category\">` in HTML, ")
                .append("a `Category:` line in sheets and notes, and the `category` field of the feeds.\n\n");

        b.append("## Planted in the catalog\n\n");
        b.append("Counts are listings whose own text (title, description, bullets, spec keys and values) holds the form as a whole word, ")
                .append("case-insensitively; page boilerplate (navigation, footer) is not counted.\n\n");
        b.append("### Synonyms and near-synonyms\n\n| group | kind | forms (listings) |\n|---|---|---|\n");
        for (JsonNode g : p.get("synonymGroups")) {
            b.append("| ").append(g.get("id").asText()).append(" | ").append(g.get("kind").asText()).append(" | ").append(forms(g.get("members"))).append(" |\n");
        }
        b.append("\n### Spelling, hyphenation, spacing and numeral variants\n\n| group | kind | forms (listings) |\n|---|---|---|\n");
        for (JsonNode g : p.get("variantGroups")) {
            b.append("| ").append(g.get("id").asText()).append(" | ").append(g.get("kind").asText()).append(" | ").append(forms(g.get("members"))).append(" |\n");
        }
        b.append("\nEach supplier has a habitual spelling (US or UK) and a habitual key for each spec; shop staff mix spellings in about 15% of ")
                .append("phrases and use another key form in about 30% of listings, so \"Weight\", \"Wt.\", \"Item weight\", \"Weight (approx.)\" and ")
                .append("\"Total weight\" all occur, as do \"Volume\"/\"Capacity\"/\"Pack volume\"/\"Vol.\", \"Color\"/\"Colour\"/\"Colorway\", ")
                .append("\"Waterproof rating\"/\"Hydrostatic head\"/\"Water column\", \"Fill power\"/\"Fill Power (FP)\"/\"Loft\" and more ")
                .append("(the CSV export alone uses one fixed column name per spec).\n\n");
        b.append("### Abbreviations\n\n| short | long | listings (short) | spelled out as (listings) |\n|---|---|---|---|\n");
        for (JsonNode a : p.get("abbreviations")) {
            b.append("| ").append(a.get("short").asText()).append(" | ").append(a.get("long").asText()).append(" | ").append(a.get("shortListings").asInt())
                    .append(" | ").append(a.has("spelledOutAs") ? "\"" + a.get("spelledOutAs").asText() + "\" (" + a.get("spelledOutListings").asInt() + ")" : "—").append(" |\n");
        }
        b.append("\n### Misspellings (planted at exact counts)\n\n| misspelling | correct | listings |\n|---|---|---|\n");
        int typoTotal = 0;
        for (JsonNode t : p.get("misspellings")) {
            b.append("| ").append(t.get("form").asText()).append(" | ").append(t.get("correct").asText()).append(" | ").append(t.get("listings").asInt()).append(" |\n");
            typoTotal += t.get("listings").asInt();
        }
        b.append("\nEach misspelling replaces the first whole-word occurrence of the correct word in one listing's description (else a bullet), ")
                .append("in ").append(typoTotal).append(" distinct listings; `planted.json` lists their ids. The misspelled forms occur nowhere else.\n\n");
        b.append("### Multiword terms\n\n").append(forms(p.get("multiwordTerms"))).append("\n\n");
        b.append("### Numbers with units, in mixed systems\n\n| dimension | form | listings | examples |\n|---|---|---|---|\n");
        for (Iterator<Map.Entry<String, JsonNode>> it = p.get("quantities").fields(); it.hasNext();) {
            Map.Entry<String, JsonNode> dim = it.next();
            for (Iterator<Map.Entry<String, JsonNode>> f = dim.getValue().fields(); f.hasNext();) {
                Map.Entry<String, JsonNode> form = f.next();
                StringBuilder ex = new StringBuilder();
                for (JsonNode e : form.getValue().get("examples")) {
                    ex.append(ex.length() == 0 ? "" : ", ").append('`').append(e.asText().replace("|", "\\|")).append('`');
                }
                b.append("| ").append(dim.getKey()).append(" | ").append(form.getKey()).append(" | ").append(form.getValue().get("listings").asInt())
                        .append(" | ").append(ex).append(" |\n");
            }
        }
        b.append("\nThe same quantity appears in several systems: metric suppliers write `1.24 kg` or `1,240 g`, imperial ones `2 lb 12 oz`, ")
                .append("`2.73 lb` or `43.7 oz`, dual ones `1.24 kg (2 lb 12 oz)`; volumes as `45 L`, `45l`, `45 litres`, `2,750 cu in`; ")
                .append("negative temperatures with `-` or U+2212. Footwear weights are per pair or per shoe, trekking poles per pair or per pole.\n\n");
        b.append("### Marketing fluff\n\n").append(forms(p.get("marketingFluff"))).append("\n\n");
        b.append("### Negations, and forms that only look negative\n\n| form | polarity | about | listings |\n|---|---|---|---|\n");
        for (JsonNode n : p.get("negations")) {
            b.append("| ").append(n.get("form").asText()).append(" | ").append(n.get("polarity").asText()).append(" | ").append(n.get("concept").asText())
                    .append(" | ").append(n.get("listings").asInt()).append(" |\n");
        }
        b.append("\n### Regulated claims (to be flagged for human review)\n\n| claim | forms (listings) |\n|---|---|\n");
        for (Iterator<Map.Entry<String, JsonNode>> it = p.get("regulatedClaims").fields(); it.hasNext();) {
            Map.Entry<String, JsonNode> e = it.next();
            b.append("| ").append(e.getKey()).append(" | ").append(forms(e.getValue())).append(" |\n");
        }
        b.append("\nThese are invented claims about invented products; in a real catalog they need compliance review under the applicable labelling rules.\n\n");
        JsonNode q = p.get("quirkySupplier");
        b.append("### The supplier who writes everything differently: ").append(q.get("name").asText()).append("\n\n");
        b.append(q.get("listings").asInt()).append(" listings (").append(join(q.get("byFormat"))).append("). ")
                .append("Style: ").append(q.get("ownStyle").asText()).append(". Units: ").append(q.get("ownUnits").asText()).append(".\n\n");
        b.append("Own keys (their key → the shop's column): ");
        StringBuilder keys = new StringBuilder();
        for (Iterator<Map.Entry<String, JsonNode>> it = q.get("ownKeys").fields(); it.hasNext();) {
            Map.Entry<String, JsonNode> e = it.next();
            keys.append(keys.length() == 0 ? "" : ", ").append('`').append(e.getKey()).append("` → ").append(e.getValue().asText());
        }
        b.append(keys).append(".\n\nOwn abbreviations (listings): ");
        StringBuilder ab = new StringBuilder();
        for (JsonNode a : q.get("ownAbbreviations")) {
            ab.append(ab.length() == 0 ? "" : ", ").append('`').append(a.get("short").asText()).append("` ").append(a.get("means").asText())
                    .append(" (").append(a.get("listings").asInt()).append(')');
        }
        b.append(ab).append(".\n\n");
        b.append("### Parent/child pairs\n\n| child | parent | listings (child / parent) |\n|---|---|---|\n");
        for (JsonNode pc : p.get("parentChild")) {
            b.append("| ").append(pc.get("child").asText()).append(" | ").append(pc.get("parent").asText()).append(" | ")
                    .append(pc.get("childListings").asInt()).append(" / ").append(pc.get("parentListings").asInt()).append(" |\n");
        }
        b.append("\n### Ambiguities\n\n| form | meanings | listings |\n|---|---|---|\n");
        for (JsonNode a : p.get("ambiguities")) {
            b.append("| ").append(a.get("form").asText()).append(" | ").append(a.get("meanings").asText()).append(" | ").append(a.get("listings").asInt()).append(" |\n");
        }
        b.append("\n### Near-duplicates and boilerplate\n\n")
                .append(p.get("colourVariants").size()).append(" HTML listings are colour variants of another HTML listing: the same copy, ")
                .append("the colour appended to the title and a different colour spec (`planted.json` → `colourVariants`). Every HTML page repeats ")
                .append("the site navigation (all category names) and the footer; every stove repeats a carbon-monoxide warning; invented ")
                .append("place names in field-test notes (\"Field-tested on the Skarnhope Ridge in horizontal sleet\") give a long tail of rare words.\n\n");
        b.append("### Broken files (`bad/`)\n\n| file | a reader should record | what |\n|---|---|---|\n");
        for (JsonNode x : p.get("badFiles")) {
            b.append("| ").append(x.get("file").asText()).append(" | ").append(x.get("expectedProblem").asText()).append(" | ").append(x.get("what").asText()).append(" |\n");
        }

        JsonNode fb = p.get("feedback");
        b.append("\n## feedback.csv\n\n");
        b.append("Header `pair_id,reference_id,target_id,annotator,sentence`. ").append(fb.get("sentences").asInt()).append(" sentences on ")
                .append(fb.get("pairs").asInt()).append(" pairs (3–5 shoppers each) by ").append(fb.get("shoppers").asInt())
                .append(" pseudonymous shoppers (`shopper-001` …). Reference and target are of the same category; \"this one\" is the reference, ")
                .append("and each sentence is about the target (\"lighter than this one and with a bigger hood\").\n\n")
                .append("A comparative (lighter, roomier, warmer, brighter, more compact …) is only made when both listings' text shows the ")
                .append("attribute and the values differ by more than 6%; a presence statement (has/lacks a hood, no pit zips, with a hip belt …) ")
                .append("only when the target's text says so. Each shopper has an accuracy between 72% and 97%, so most statements agree with the ")
                .append("specs and some contradict them. Comfort, coziness, sturdiness and overall quality (better, nicer, worse) have no anchor ")
                .append("in the catalog: they are the **vague, contested** attributes. Shoppers also differ in how much they hedge and misspell.\n\n");
        b.append("| attribute | kind | mentions | agrees with specs | contradicts specs | ungrounded |\n|---|---|---|---|---|---|\n");
        for (Iterator<Map.Entry<String, JsonNode>> it = fb.get("attributes").fields(); it.hasNext();) {
            Map.Entry<String, JsonNode> e = it.next();
            JsonNode t = e.getValue();
            b.append("| ").append(e.getKey()).append(" | ").append(t.get("kind").asText()).append(" | ").append(t.get("mentions").asInt()).append(" | ")
                    .append(t.get("agreesWithSpecs").asInt()).append(" | ").append(t.get("contradictsSpecs").asInt()).append(" | ")
                    .append(t.get("ungrounded").asInt()).append(" |\n");
        }
        b.append("\nSentences holding each form: hedges ").append(join(fb.get("hedges"))).append("; comparatives ").append(join(fb.get("comparativeForms")))
                .append("; superlatives ").append(join(fb.get("superlatives"))).append("; constructions ").append(join(fb.get("constructions"))).append(".\n\n");
        b.append("Misspellings (sentences): ");
        StringBuilder ts = new StringBuilder();
        for (JsonNode t : fb.get("misspellings")) {
            ts.append(ts.length() == 0 ? "" : ", ").append(t.get("form").asText()).append(" for ").append(t.get("correct").asText()).append(" (").append(t.get("sentences").asInt()).append(')');
        }
        b.append(ts).append(".\n\n");

        JsonNode j = p.get("judgments");
        b.append("## judgments.csv\n\n");
        b.append("Header `item,annotator,attribute,value`. ").append(j.get("items").asInt()).append(" listings (product pages and sheets) in 7 categories, each judged by ")
                .append(j.get("ratersPerItem").asInt()).append(" of ").append(j.get("raters").size()).append(" pseudonymous raters (`rater-A` … `rater-H`) on the ")
                .append("attributes that apply to its category: ").append(j.get("rows").asInt()).append(" rows; ").append(j.get("missing").asInt())
                .append(" judgments are missing (rows left out). Values: `present`/`absent`, a facet value (`nylon`, `down`, `three-season` …) or a grade `1`–`5`.\n\n")
                .append("**Clear** attributes follow the listing's text: a rater errs about 1% of the time, and when the text is silent nearly every rater says ")
                .append("absent. **Tentative** ones need interpretation (a weight class or warmth grade from stated figures, each rater slightly ")
                .append("biased). **Contested** ones have no anchor in the text: each rater has their own scale or leaning. Design bands ")
                .append("(Krippendorff 2004): clear well above 0.800, tentative between 0.667 and 0.800, contested well below 0.667; nominal alpha for ")
                .append("present/absent and facet values, interval alpha for grades. `AgreementBandsTest` checks the bands with NLTK.\n\n");
        b.append("| attribute | values | planted as | categories |\n|---|---|---|---|\n");
        for (JsonNode a : j.get("attributes")) {
            StringBuilder cs = new StringBuilder();
            for (JsonNode c : a.get("categories")) {
                cs.append(cs.length() == 0 ? "" : ", ").append(c.asText());
            }
            b.append("| ").append(a.get("id").asText()).append(" | ").append(a.get("values").asText()).append(" | ").append(a.get("agreement").asText())
                    .append(" | ").append(cs).append(" |\n");
        }
        b.append("\n## Scale corpora\n\n`./sheaf generate --listings N --format jsonl|folder --out PATH [--seed S]` writes the same shop at any size, ")
                .append("streaming (listing i depends only on the seed and i). Benchmark corpora go to /tmp or `bench/corpora/` (git-ignored), never here.\n\n");
        b.append("## Cautions\n\nMined labels are not verified product claims, and the regulated claims planted here (waterproof ratings, flame ")
                .append("resistance, UV protection, child safety, fibre content) stand for claims that need human review. Shopper and rater ids are pseudonyms.\n");
        return b.toString();
    }

    private static void row(StringBuilder b, String path, String what, int count) {
        b.append("| `").append(path).append("` | ").append(what).append(" | ").append(count < 0 ? "1 file" : Integer.toString(count)).append(" |\n");
    }

    private static String forms(JsonNode array) {
        StringBuilder s = new StringBuilder();
        for (JsonNode m : array) {
            s.append(s.length() == 0 ? "" : ", ").append(m.get("form").asText().replace("|", "\\|")).append(" (").append(m.get("listings").asInt()).append(')');
        }
        return s.toString();
    }

    private static String join(JsonNode object) {
        StringBuilder s = new StringBuilder();
        for (Iterator<Map.Entry<String, JsonNode>> it = object.fields(); it.hasNext();) {
            Map.Entry<String, JsonNode> e = it.next();
            s.append(s.length() == 0 ? "" : ", ").append(e.getKey()).append(' ').append(e.getValue().asText());
        }
        return s.toString();
    }
}
