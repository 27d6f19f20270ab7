package dev.sheaf.miner.text;

import java.io.IOException;
import java.io.StringReader;
import java.io.UncheckedIOException;
import java.util.ArrayList;
import java.util.List;
import org.apache.lucene.analysis.LowerCaseFilter;
import org.apache.lucene.analysis.TokenStream;
import org.apache.lucene.analysis.Tokenizer;
import org.apache.lucene.analysis.miscellaneous.ASCIIFoldingFilter;
import org.apache.lucene.analysis.tokenattributes.CharTermAttribute;

/** Runs a configured word (stop word, unit, negation) through tokenizer, lower case and folding, so it is stored the way the chain will see it. */
final class WordProbe {
    private final AnalysisProfile.TokenizerKind kind;
    private final boolean folding;
    private final int maxLength;

    WordProbe(AnalysisProfile.TokenizerKind kind, boolean folding, int maxLength) {
        this.kind = kind;
        this.folding = folding;
        this.maxLength = maxLength;
    }

    List<String> tokens(String word) {
        Tokenizer src = Analysis.newTokenizer(kind, maxLength);
        TokenStream ts = new LowerCaseFilter(src);
        if (folding) {
            ts = new ASCIIFoldingFilter(ts);
        }
        List<String> out = new ArrayList<>();
        try {
            src.setReader(new StringReader(word));
            CharTermAttribute t = ts.addAttribute(CharTermAttribute.class);
            ts.reset();
            while (ts.incrementToken()) {
                out.add(t.toString());
            }
            ts.end();
            ts.close();
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        return out;
    }
}
