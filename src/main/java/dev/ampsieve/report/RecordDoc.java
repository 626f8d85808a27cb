package dev.ampsieve.report;

import java.util.List;

/**
 * A decision record as a list of blocks, written once ({@link RecordContent}) and laid out by
 * both {@link RecordHtml} and {@link RecordMarkdown}, so the two carry the same content. Every
 * string here is raw (data as it came); each writer escapes for its own format.
 */
final class RecordDoc {
    private RecordDoc() {}

    sealed interface Block permits Heading, Para, Table, Chart, Pre, PageBreak {}

    /** @param anchor an id for links, or null */
    record Heading(int level, String text, String anchor) implements Block {}

    /** @param kind "caution", "note" or null for plain prose */
    record Para(String text, String kind) implements Block {
        Para(String text) {
            this(text, null);
        }
    }

    /** @param numeric per column: right-aligned figures */
    record Table(List<String> head, List<List<String>> rows, List<Boolean> numeric) implements Block {
        Table {
            head = List.copyOf(head);
            rows = rows.stream().map(List::copyOf).toList();
            numeric = List.copyOf(numeric);
        }
    }

    /** An SVG chart (HTML only; Markdown gives {@code text}, what it shows, in its place). */
    record Chart(String svg, String text) implements Block {}

    /** Preformatted text (the stage file). */
    record Pre(String text) implements Block {}

    /** Each part of the record starts on a new printed page. */
    record PageBreak() implements Block {}
}
