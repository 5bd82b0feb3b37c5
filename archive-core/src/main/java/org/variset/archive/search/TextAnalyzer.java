package org.variset.archive.search;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.util.ArrayList;
import java.util.List;
import org.apache.lucene.analysis.Analyzer;
import org.apache.lucene.analysis.LowerCaseFilter;
import org.apache.lucene.analysis.TokenStream;
import org.apache.lucene.analysis.en.EnglishMinimalStemFilter;
import org.apache.lucene.analysis.miscellaneous.ASCIIFoldingFilter;
import org.apache.lucene.analysis.standard.StandardTokenizer;
import org.apache.lucene.analysis.tokenattributes.CharTermAttribute;

/**
 * The analysis of free text (notes and the catch-all text field): Unicode word boundaries (UAX #29), lower case,
 * accents folded, and English plurals reduced ({@code hooks} to {@code hook}); no stop words, so a name such as "The
 * Den" is found as written.
 */
final class TextAnalyzer extends Analyzer {
    @Override
    protected TokenStreamComponents createComponents(String fieldName) {
        StandardTokenizer source = new StandardTokenizer();
        TokenStream s = new LowerCaseFilter(source);
        s = new ASCIIFoldingFilter(s);
        s = new EnglishMinimalStemFilter(s);
        return new TokenStreamComponents(source, s);
    }

    /** The tokens of a text as this analyzer makes them. */
    List<String> tokens(String field, String text) {
        List<String> out = new ArrayList<>();
        try (TokenStream ts = tokenStream(field, text)) {
            CharTermAttribute t = ts.addAttribute(CharTermAttribute.class);
            ts.reset();
            while (ts.incrementToken()) {
                out.add(t.toString());
            }
            ts.end();
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        return out;
    }
}
