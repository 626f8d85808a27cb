package dev.ampsieve.search;

import java.io.IOException;
import java.io.Reader;
import java.util.Iterator;
import org.apache.lucene.analysis.Analyzer;
import org.apache.lucene.analysis.Tokenizer;
import org.apache.lucene.analysis.tokenattributes.CharTermAttribute;

/**
 * Feeds {@link Words#terms} to Lucene, so the index and the query parser cannot disagree on
 * what a word is. Small on purpose: lucene-core ships no tokenizer that keeps hyphenated words.
 */
final class WordAnalyzer extends Analyzer {

    @Override
    protected TokenStreamComponents createComponents(String fieldName) {
        return new TokenStreamComponents(new WordTokenizer());
    }

    private static final class WordTokenizer extends Tokenizer {
        private final CharTermAttribute term = addAttribute(CharTermAttribute.class);
        private Iterator<String> pending;

        @Override
        public boolean incrementToken() throws IOException {
            clearAttributes();
            if (pending == null) {
                pending = Words.terms(readAll(input)).iterator();
            }
            if (!pending.hasNext()) {
                return false;
            }
            term.append(pending.next());
            return true;
        }

        @Override
        public void reset() throws IOException {
            super.reset();
            pending = null;
        }

        private static String readAll(Reader r) throws IOException {
            StringBuilder sb = new StringBuilder();
            char[] buf = new char[1024];
            for (int n; (n = r.read(buf)) > 0; ) {
                sb.append(buf, 0, n);
            }
            return sb.toString();
        }
    }
}
