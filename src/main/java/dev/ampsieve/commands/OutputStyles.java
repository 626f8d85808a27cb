package dev.ampsieve.commands;

import dev.ampsieve.report.OutputStyle;
import java.nio.charset.Charset;
import java.util.Locale;
import java.util.Map;

/** How plain command-line output may look, judged from the environment (the shell asks its terminal instead). */
final class OutputStyles {
    private OutputStyles() {}

    /**
     * Width from $COLUMNS (else 80); Unicode when stdout's charset is UTF-8; colour only on a
     * console whose TERM is not dumb and without NO_COLOR (no-color.org: any non-empty value).
     */
    static OutputStyle detect(Map<String, String> env) {
        int width = 80;
        try {
            String cols = env.get("COLUMNS");
            if (cols != null) {
                width = Integer.parseInt(cols.strip());
            }
        } catch (NumberFormatException e) {
            // not a number: keep 80
        }
        // Java 17 names the console's charset in sun.stdout.encoding; else the default charset applies
        String enc = System.getProperty(
                "sun.stdout.encoding", Charset.defaultCharset().name());
        boolean unicode = enc.toUpperCase(Locale.ROOT).startsWith("UTF");
        String term = env.getOrDefault("TERM", "");
        String noColor = env.get("NO_COLOR");
        boolean color = System.console() != null
                && !term.isEmpty()
                && !term.startsWith("dumb")
                && (noColor == null || noColor.isEmpty());
        return new OutputStyle(width, unicode, color);
    }
}
