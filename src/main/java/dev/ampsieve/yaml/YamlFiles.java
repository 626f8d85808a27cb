package dev.ampsieve.yaml;

import java.io.IOException;
import java.io.Reader;
import java.io.StringReader;
import java.nio.ByteBuffer;
import java.nio.CharBuffer;
import java.nio.charset.CharsetDecoder;
import java.nio.charset.CoderResult;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Collections;
import java.util.HashMap;
import java.util.IdentityHashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.yaml.snakeyaml.DumperOptions;
import org.yaml.snakeyaml.LoaderOptions;
import org.yaml.snakeyaml.Yaml;
import org.yaml.snakeyaml.composer.Composer;
import org.yaml.snakeyaml.error.Mark;
import org.yaml.snakeyaml.error.MarkedYAMLException;
import org.yaml.snakeyaml.error.YAMLException;
import org.yaml.snakeyaml.events.AliasEvent;
import org.yaml.snakeyaml.events.CollectionEndEvent;
import org.yaml.snakeyaml.events.CollectionStartEvent;
import org.yaml.snakeyaml.events.Event;
import org.yaml.snakeyaml.events.ScalarEvent;
import org.yaml.snakeyaml.nodes.MappingNode;
import org.yaml.snakeyaml.nodes.NodeTuple;
import org.yaml.snakeyaml.nodes.ScalarNode;
import org.yaml.snakeyaml.nodes.SequenceNode;
import org.yaml.snakeyaml.parser.ParserImpl;
import org.yaml.snakeyaml.reader.ReaderException;
import org.yaml.snakeyaml.reader.StreamReader;
import org.yaml.snakeyaml.resolver.Resolver;

/**
 * Reads a YAML file into {@link Node}s that remember their line and column. Bounded on
 * purpose: only regular files are read, through {@link BoundedFiles} (never more than
 * {@link #MAX_BYTES} bytes, whatever size the file reports); documents with more than
 * {@link #MAX_ALIASES} aliases (the "billion laughs" expansion) or nested deeper than
 * {@link #MAX_DEPTH} are refused with a message naming the place, never expanded.
 */
public final class YamlFiles {

    /** Larger than any hand-typed catalog file by two orders of magnitude. */
    public static final long MAX_BYTES = 4L * 1024 * 1024;
    /** Aliases are legitimate for sharing a block of values; thousands are an attack. */
    public static final int MAX_ALIASES = 50;

    public static final int MAX_DEPTH = 30;
    private static final String TOO_DEEP = "refused: YAML nested more than " + MAX_DEPTH + " levels deep";

    private YamlFiles() {}

    /** Reads one file; every failure becomes an {@link InputException} naming the file (and the place, where there is one). */
    public static Node read(Path file) throws InputException {
        return parse(decode(BoundedFiles.read(file, MAX_BYTES), file), file);
    }

    /**
     * UTF-8 bytes to text. A byte that is not UTF-8 is reported at its line and column (counted
     * as {@link #placeOf} counts them), with the byte's value: a Latin-1 degree sign or a UTF-16
     * file shows up at once.
     */
    public static String decode(byte[] bytes, Path file) throws InputException {
        CharsetDecoder decoder = StandardCharsets.UTF_8
                .newDecoder()
                .onMalformedInput(CodingErrorAction.REPORT)
                .onUnmappableCharacter(CodingErrorAction.REPORT);
        ByteBuffer in = ByteBuffer.wrap(bytes);
        CharBuffer out = CharBuffer.allocate(bytes.length); // UTF-8 never gives more chars than bytes
        CoderResult r = decoder.decode(in, out, true);
        if (!r.isError()) {
            r = decoder.flush(out);
        }
        if (r.isError()) {
            int bad = in.position();
            String before = new String(bytes, 0, bad, StandardCharsets.UTF_8); // valid up to here
            String shown = before.startsWith("\uFEFF") ? before.substring(1) : before; // as parse() sees it
            throw new InputException(Problem.error(
                    placeOf(file, shown, shown.length()),
                    "",
                    String.format(java.util.Locale.ROOT, "not valid UTF-8 text (byte 0x%02X)", bytes[bad] & 0xff),
                    "save the file as UTF-8 (Latin-1, Windows-1252 and UTF-16 files are refused)"));
        }
        out.flip();
        return out.toString();
    }

    /**
     * The line and column of {@code text[end]}, counted the way SnakeYAML counts for its own
     * messages (1-based, columns in code points, a line ends at LF, CR, CR LF, NEL, LS or PS),
     * so every location in one file agrees.
     */
    static Located placeOf(Path file, CharSequence text, int end) {
        int line = 1;
        int column = 1;
        for (int i = 0; i < end; ) {
            int c = Character.codePointAt(text, i);
            i += Character.charCount(c);
            boolean lone = c == '\r' && (i >= text.length() || text.charAt(i) != '\n');
            if (c == '\n' || c == 0x85 || c == 0x2028 || c == 0x2029 || lone) {
                line++;
                column = 1;
            } else {
                column++;
            }
        }
        return new Located(file, line, column);
    }

    /** An I/O failure in words: the exception's kind and the path or reason it gives. */
    public static String describe(IOException e) {
        String kind = switch (e.getClass().getSimpleName()) {
            case "NoSuchFileException" -> "no such file";
            case "AccessDeniedException" -> "permission denied";
            case "FileSystemLoopException" -> "folder links form a loop";
            default ->
                e.getClass()
                        .getSimpleName()
                        .replaceAll("Exception$", "")
                        .replaceAll("([a-z])([A-Z])", "$1 $2")
                        .toLowerCase(java.util.Locale.ROOT);
        };
        String msg = e.getMessage();
        return msg == null || msg.isBlank() ? kind : kind + ": " + msg;
    }

    /** Parses text; {@code file} is only used in messages and may be null. */
    public static Node parse(String text, Path file) throws InputException {
        if (text.length() > MAX_BYTES) {
            throw new InputException(Problem.error(
                    Located.nowhere(file),
                    "",
                    "text is " + text.length() + " characters, over the limit of " + MAX_BYTES
                            + " for one YAML document",
                    "split it into several files"));
        }
        if (text.startsWith("\uFEFF")) {
            text = text.substring(1); // a byte-order mark some editors write; not content
        }
        org.yaml.snakeyaml.nodes.Node root;
        try (Reader r = new StringReader(text)) {
            // what Yaml.compose does, with a resolver that tries no implicit types
            LoaderOptions options = options();
            root = new Composer(new ParserImpl(new StreamReader(r), options), new TextResolver(), options)
                    .getSingleNode();
        } catch (ReaderException e) {
            throw new InputException(badCharacter(file, text, e));
        } catch (MarkedYAMLException e) {
            Mark m = e.getProblemMark() != null ? e.getProblemMark() : e.getContextMark();
            String what = e.getProblem() != null ? e.getProblem() : e.getMessage();
            throw new InputException(Problem.error(
                    at(file, m),
                    "",
                    "YAML syntax: " + firstLine(what),
                    unclosed(e).orElse(syntaxFix(what))));
        } catch (YAMLException e) {
            throw new InputException(refusal(file, text, firstLine(e.getMessage())));
        } catch (IOException e) {
            throw new InputException(Problem.error(Located.nowhere(file), "", "cannot read (" + describe(e) + ")", ""));
        } catch (StackOverflowError e) {
            throw new InputException(Problem.error(limitAt(file, text, false), "", TOO_DEEP, "use fewer levels"));
        }
        if (root == null) {
            return new Node.Scalar(new Located(file, 1, 1), null, false);
        }
        return new Converter(file).convert(root, null, 0);
    }

    /**
     * A '{' or '[' left open is reported where the parser gave up, often the next line: point at
     * the bracket itself, which is where the fix goes.
     */
    private static java.util.Optional<String> unclosed(MarkedYAMLException e) {
        String ctx = e.getContext() == null ? "" : e.getContext();
        Mark open = e.getContextMark();
        if (open == null || !(ctx.contains("flow mapping") || ctx.contains("flow sequence"))) {
            return java.util.Optional.empty();
        }
        String bracket = ctx.contains("flow mapping") ? "{" : "[";
        String close = bracket.equals("{") ? "}" : "]";
        return java.util.Optional.of("the '" + bracket + "' opened at line " + (open.getLine() + 1) + ", column "
                + (open.getColumn() + 1) + " is not closed; end it with '" + close + "' on that line");
    }

    /** The fix for the syntax errors people actually make in hand-typed YAML. */
    private static String syntaxFix(String what) {
        String w = what == null ? "" : what.toLowerCase(java.util.Locale.ROOT);
        if (w.contains("tab")) {
            return "indent with spaces, not tabs";
        }
        if (w.contains("mapping values are not allowed")) {
            return "put a space after each ':' and quote values that contain ': ' (\"a: b\")";
        }
        if (w.contains("could not find expected ':'")) {
            return "write 'key: value' (a colon and a space after each key)";
        }
        if (w.contains("undefined alias") || w.contains("found undefined")) {
            return "define the anchor (&name) before using the alias (*name)";
        }
        if (w.contains("single document")) {
            return "keep one document per file (remove the extra '---')";
        }
        return "fix the YAML syntax here (indent with spaces, 'key: value', quote text containing ': ' or ' #')";
    }

    /**
     * Tags every plain scalar a string. The converter below reads each scalar's text and style,
     * never its tag, while SnakeYAML's own resolver tried its regular expressions (bool, int,
     * float, null, timestamp, merge ...) on every plain scalar of a file to choose one: a few
     * per cent of parsing a catalog, for nothing. Explicit tags ({@code !!int}) are untouched.
     */
    private static final class TextResolver extends Resolver {
        @Override
        protected void addImplicitResolvers() {
            // none: a plain scalar is resolved as a string
        }
    }

    private static LoaderOptions options() {
        LoaderOptions options = new LoaderOptions();
        options.setMaxAliasesForCollections(MAX_ALIASES);
        options.setAllowDuplicateKeys(true); // we report duplicates ourselves, with both lines
        options.setNestingDepthLimit(MAX_DEPTH);
        options.setCodePointLimit((int) MAX_BYTES);
        options.setAllowRecursiveKeys(false);
        return options;
    }

    /**
     * SnakeYAML refuses control characters (YAML allows only its "printable" set) with
     * a position in its own buffer; the place is found again here by the same rule, so the user
     * sees the line and column. A NUL most often means the file is not text or is UTF-16.
     */
    private static Problem badCharacter(Path file, String text, ReaderException e) {
        int i = 0;
        while (i < text.length()) {
            int c = text.codePointAt(i);
            if (!printable(c)) {
                break;
            }
            i += Character.charCount(c);
        }
        int c = i < text.length() ? text.codePointAt(i) : e.getCodePoint();
        Located at = i < text.length() ? placeOf(file, text, i) : Located.nowhere(file);
        String name = String.format(java.util.Locale.ROOT, "U+%04X", c) + (c == 0 ? " (NUL)" : "");
        return Problem.error(
                at,
                "",
                "control character " + name + " is not allowed in YAML",
                c == 0
                        ? "remove it; a file with NULs is not text, or was saved as UTF-16 (save it as UTF-8)"
                        : "remove it (write it as an escape such as \"\\t\" inside double quotes if it belongs there)");
    }

    /** SnakeYAML's printable set (StreamReader.isPrintable): tab, LF, CR, NEL and non-control characters. */
    private static boolean printable(int c) {
        return c == 0x9
                || c == 0xA
                || c == 0xD
                || c == 0x85
                || (c >= 0x20 && c <= 0x7E)
                || (c >= 0xA0 && c <= 0xD7FF)
                || (c >= 0xE000 && c <= 0xFFFD)
                || (c >= 0x10000 && c <= 0x10FFFF);
    }

    /**
     * Limits enforced by SnakeYAML's composer arrive without a position; say which limit it was,
     * and where, found by reading the parser's events again (cheap: events are never expanded).
     */
    private static Problem refusal(Path file, String text, String what) {
        String w = what == null ? "" : what.toLowerCase(java.util.Locale.ROOT);
        if (w.contains("alias")) {
            return Problem.error(
                    limitAt(file, text, true),
                    "",
                    "refused: more than " + MAX_ALIASES
                            + " aliases to lists or mappings (an alias-expansion bomb looks like this)",
                    "write the values out instead of using *aliases");
        }
        if (w.contains("code point") || w.contains("exceeds the limit")) {
            return Problem.error(
                    Located.nowhere(file),
                    "",
                    "refused: the document is over " + MAX_BYTES + " characters",
                    "split it into several files");
        }
        if (w.contains("nesting depth")) {
            return Problem.error(limitAt(file, text, false), "", TOO_DEEP, "use fewer levels");
        }
        return Problem.error(Located.nowhere(file), "", "YAML: " + what, "fix the YAML syntax");
    }

    /**
     * Where a composer limit is first passed: the alias beyond {@link #MAX_ALIASES} aliases to
     * lists or mappings (scalar aliases are not counted, as in SnakeYAML's Composer), or the
     * list or mapping that opens level {@link #MAX_DEPTH} + 1. Nowhere if not found.
     */
    private static Located limitAt(Path file, String text, boolean aliases) {
        Map<String, Boolean> anchorIsCollection = new HashMap<>();
        int count = 0;
        int depth = 0;
        try {
            for (Event e : new Yaml(options()).parse(new StringReader(text))) {
                if (e instanceof CollectionStartEvent start) {
                    depth++;
                    if (!aliases && depth > MAX_DEPTH) {
                        return at(file, start.getStartMark());
                    }
                    if (start.getAnchor() != null) {
                        anchorIsCollection.put(start.getAnchor(), true);
                    }
                } else if (e instanceof CollectionEndEvent) {
                    depth--;
                } else if (e instanceof ScalarEvent s && s.getAnchor() != null) {
                    anchorIsCollection.put(s.getAnchor(), false);
                } else if (e instanceof AliasEvent a && Boolean.TRUE.equals(anchorIsCollection.get(a.getAnchor()))) {
                    count++;
                    if (aliases && count > MAX_ALIASES) {
                        return at(file, a.getStartMark());
                    }
                }
            }
        } catch (YAMLException | StackOverflowError e) {
            // the place is a courtesy; the refusal stands without it
        }
        return Located.nowhere(file);
    }

    private static String firstLine(String s) {
        if (s == null) {
            return "syntax error";
        }
        int nl = s.indexOf('\n');
        return nl < 0 ? s : s.substring(0, nl);
    }

    private static Located at(Path file, Mark m) {
        return m == null ? Located.nowhere(file) : new Located(file, m.getLine() + 1, m.getColumn() + 1);
    }

    /**
     * Where a node sits, as {@code parts[3].vos.typ}: a key ({@code key}) or an item ({@code index}
     * when {@code key} is null) below {@code parent} (null at the root). Spelt out only for a
     * message: joining the text for every node of a catalog cost more than the message ever did.
     */
    private record Where(Where parent, String key, int index) {
        static String text(Where w) {
            if (w == null) {
                return "";
            }
            String up = text(w.parent);
            if (w.key == null) {
                return up + "[" + w.index + "]";
            }
            return up.isEmpty() ? w.key : up + "." + w.key;
        }
    }

    /**
     * Turns SnakeYAML's node graph into {@link Node}s. An alias is the same SnakeYAML node
     * reached twice; converting it once and sharing the result keeps the tree as small as
     * the file, so nested aliases (each doubling the expanded size) cost nothing.
     */
    private static final class Converter {
        private final Path file;
        private final Map<org.yaml.snakeyaml.nodes.Node, Node> done = new IdentityHashMap<>();
        private final Set<org.yaml.snakeyaml.nodes.Node> open = Collections.newSetFromMap(new IdentityHashMap<>());

        Converter(Path file) {
            this.file = file;
        }

        Node convert(org.yaml.snakeyaml.nodes.Node n, Where path, int depth) throws InputException {
            Node seen = done.get(n);
            if (seen != null) {
                return seen;
            }
            Located loc = at(file, n.getStartMark());
            if (open.contains(n)) {
                throw new InputException(Problem.error(
                        loc,
                        Where.text(path),
                        "an alias refers to a value that contains it",
                        "write the values out instead of the self-referring *alias"));
            }
            if (depth > MAX_DEPTH) {
                throw new InputException(Problem.error(loc, Where.text(path), TOO_DEEP, "use fewer levels"));
            }
            open.add(n);
            Node result = build(n, path, depth, loc);
            open.remove(n);
            done.put(n, result);
            return result;
        }

        private Node build(org.yaml.snakeyaml.nodes.Node n, Where path, int depth, Located loc) throws InputException {
            if (n instanceof ScalarNode s) {
                boolean quoted = s.getScalarStyle() != DumperOptions.ScalarStyle.PLAIN;
                String v = s.getValue();
                boolean isNull = !quoted
                        && (v.isEmpty() || v.equals("~") || v.equals("null") || v.equals("Null") || v.equals("NULL"));
                return new Node.Scalar(loc, isNull ? null : v, quoted);
            }
            if (n instanceof SequenceNode seq) {
                List<Node> items = new ArrayList<>();
                List<org.yaml.snakeyaml.nodes.Node> values = seq.getValue();
                for (int i = 0; i < values.size(); i++) {
                    items.add(convert(values.get(i), new Where(path, null, i), depth + 1));
                }
                return new Node.Seq(loc, items);
            }
            MappingNode map = (MappingNode) n;
            Map<String, Node> entries = new LinkedHashMap<>();
            Map<String, Located> keyAt = new LinkedHashMap<>();
            for (NodeTuple t : map.getValue()) {
                Located kLoc = at(file, t.getKeyNode().getStartMark());
                if (!(t.getKeyNode() instanceof ScalarNode key)) {
                    throw new InputException(Problem.error(
                            kLoc,
                            Where.text(path),
                            "a key must be a plain word, found a list or mapping",
                            "write 'name: value'"));
                }
                String k = key.getValue();
                Where kPath = new Where(path, k, 0);
                if (entries.containsKey(k)) {
                    Located first = keyAt.get(k);
                    throw new InputException(Problem.error(
                            kLoc,
                            Where.text(kPath),
                            "key written twice (first on line " + first.line() + ")",
                            "keep one of them"));
                }
                keyAt.put(k, kLoc);
                entries.put(k, convert(t.getValueNode(), kPath, depth + 1));
            }
            return new Node.Mapping(loc, entries, keyAt);
        }
    }
}
