package dev.sheaf.miner.mine;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.util.Objects;
import org.apache.lucene.analysis.Analyzer;
import org.apache.lucene.analysis.LowerCaseFilter;
import org.apache.lucene.analysis.TokenStream;
import org.apache.lucene.analysis.Tokenizer;
import org.apache.lucene.analysis.en.EnglishMinimalStemFilter;
import org.apache.lucene.analysis.en.EnglishPossessiveFilter;
import org.apache.lucene.analysis.en.KStemFilter;
import org.apache.lucene.analysis.miscellaneous.ASCIIFoldingFilter;
import org.apache.lucene.analysis.miscellaneous.ConditionalTokenFilter;
import org.apache.lucene.analysis.standard.StandardTokenizer;
import org.apache.lucene.analysis.tokenattributes.CharTermAttribute;

/**
 * The group key shared by spelling variants of one candidate term, so the harvest can show
 * "Two-Way Zippers", "two way zipper", "twoway zippers" and "2-way zipper" as one entry.
 *
 * <p>What the key ignores (docs/decisions/064-variant-keys.md):
 * <ul>
 *   <li>case and diacritics (Lucene {@code LowerCaseFilter}, {@code ASCIIFoldingFilter}: locale-free);</li>
 *   <li>hyphens, spaces and other punctuation between words: words are split by Lucene's
 *       {@code StandardTokenizer} (UAX #29) and joined with nothing, so "two-way", "two way" and "twoway" agree;</li>
 *   <li>possessive {@code 's} ({@code EnglishPossessiveFilter});</li>
 *   <li>plural endings of words of four or more letters ending in -s (not -ss, -us, -is): first Lucene's
 *       {@code KStemFilter} (boxes → box, ties → tie, batteries → battery), then {@code EnglishMinimalStemFilter}
 *       for plurals KStem's lexicon keeps (stakes → stake, boots → boot). Only -s words are stemmed: KStem
 *       would also map quilted → quilt and padded → pad, which are different products here;</li>
 *   <li>numerals 1–10 written as digits or words: the digits become words (2-way ≡ two-way).</li>
 * </ul>
 * Not ignored: US/UK spelling (colour/color, fibre/fiber) and synonyms — those are suggestions for a
 * curator, made later, not identities. Known collisions of the plural rule: shorts/short, pants/pant, news/new.
 *
 * <p>Thread-safe (Lucene's analyzer keeps per-thread token streams).
 */
public final class VariantKey {
    private static final String[] NUMBER_WORDS = {"one", "two", "three", "four", "five", "six", "seven", "eight", "nine", "ten"};

    private static final Analyzer ANALYZER = new Analyzer() {
        @Override
        protected TokenStreamComponents createComponents(String fieldName) {
            Tokenizer source = new StandardTokenizer();
            TokenStream s = new LowerCaseFilter(source);
            s = new ASCIIFoldingFilter(s);
            s = new EnglishPossessiveFilter(s);
            s = new PluralOnly(s, KStemFilter::new);
            s = new PluralOnly(s, EnglishMinimalStemFilter::new);
            return new TokenStreamComponents(source, s);
        }
    };

    private VariantKey() {
    }

    /** The variant group key of {@code term}; empty when the term has no word or number in it. */
    public static String of(String term) {
        Objects.requireNonNull(term, "term");
        StringBuilder key = new StringBuilder(term.length());
        try (TokenStream ts = ANALYZER.tokenStream("term", term)) {
            CharTermAttribute t = ts.addAttribute(CharTermAttribute.class);
            ts.reset();
            while (ts.incrementToken()) {
                key.append(numeralAsWord(t));
            }
            ts.end();
        } catch (IOException e) {
            throw new UncheckedIOException("reading a string cannot fail", e);
        }
        return key.toString();
    }

    private static CharSequence numeralAsWord(CharTermAttribute t) {
        int n = t.length();
        if (n == 1 && t.charAt(0) >= '1' && t.charAt(0) <= '9') {
            return NUMBER_WORDS[t.charAt(0) - '1'];
        }
        if (n == 2 && t.charAt(0) == '1' && t.charAt(1) == '0') {
            return NUMBER_WORDS[9];
        }
        return t;
    }

    /** Applies a stemmer only to words of four or more letters that end in -s but not -ss, -us or -is. */
    private static final class PluralOnly extends ConditionalTokenFilter {
        private final CharTermAttribute term = addAttribute(CharTermAttribute.class);

        PluralOnly(TokenStream in, java.util.function.Function<TokenStream, TokenStream> stemmer) {
            super(in, stemmer);
        }

        @Override
        protected boolean shouldFilter() {
            int n = term.length();
            if (n < 4 || term.charAt(n - 1) != 's') {
                return false;
            }
            char before = term.charAt(n - 2);
            return before != 's' && before != 'u' && before != 'i';
        }
    }
}
