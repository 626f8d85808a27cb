package dev.ampsieve.yaml;

import java.io.IOException;
import java.io.Reader;
import java.io.StringReader;
import java.nio.charset.CharacterCodingException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Collections;
import java.util.IdentityHashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.yaml.snakeyaml.LoaderOptions;
import org.yaml.snakeyaml.Yaml;
import org.yaml.snakeyaml.error.Mark;
import org.yaml.snakeyaml.error.MarkedYAMLException;
import org.yaml.snakeyaml.error.YAMLException;
import org.yaml.snakeyaml.nodes.MappingNode;
import org.yaml.snakeyaml.nodes.NodeTuple;
import org.yaml.snakeyaml.nodes.ScalarNode;
import org.yaml.snakeyaml.nodes.SequenceNode;
import org.yaml.snakeyaml.DumperOptions;

/**
 * Reads a YAML file into {@link Node}s that remember their line and column. Bounded on
 * purpose: files over {@link #MAX_BYTES} and documents with more than {@link #MAX_ALIASES}
 * aliases (the "billion laughs" expansion) are refused with a message, never parsed.
 */
public final class YamlFiles {

    /** Larger than any hand-typed catalog file by two orders of magnitude. */
    public static final long MAX_BYTES = 4L * 1024 * 1024;
    /** Aliases are legitimate for sharing a block of values; thousands are an attack. */
    public static final int MAX_ALIASES = 50;
    public static final int MAX_DEPTH = 30;

    private YamlFiles() {
    }

    /** Reads one file; every failure becomes an {@link InputException} naming the file. */
    public static Node read(Path file) throws InputException {
        long size;
        try {
            size = Files.size(file);
        } catch (IOException e) {
            throw new InputException(Problem.error(Located.nowhere(file), "", "cannot read the file (" + describe(e) + ")",
                    "check that it exists and is readable"));
        }
        if (size > MAX_BYTES) {
            throw new InputException(Problem.error(Located.nowhere(file), "",
                    "file is " + size + " bytes, over the limit of " + MAX_BYTES + " bytes (4 MiB) for one YAML file",
                    "split it into several files (sub-folders are fine)"));
        }
        String text;
        try {
            byte[] bytes = Files.readAllBytes(file);
            text = StandardCharsets.UTF_8.newDecoder().decode(java.nio.ByteBuffer.wrap(bytes)).toString();
        } catch (CharacterCodingException e) {
            throw new InputException(Problem.error(Located.nowhere(file), "", "file is not valid UTF-8 text",
                    "save it as UTF-8"));
        } catch (IOException e) {
            throw new InputException(Problem.error(Located.nowhere(file), "", "cannot read the file (" + describe(e) + ")",
                    "check that it exists and is readable"));
        }
        return parse(text, file);
    }

    /** An I/O failure in words: the exception's kind and the path or reason it gives. */
    public static String describe(IOException e) {
        String kind = switch (e.getClass().getSimpleName()) {
            case "NoSuchFileException" -> "no such file";
            case "AccessDeniedException" -> "permission denied";
            case "FileSystemLoopException" -> "folder links form a loop";
            default -> e.getClass().getSimpleName().replaceAll("Exception$", "").replaceAll("([a-z])([A-Z])", "$1 $2")
                    .toLowerCase(java.util.Locale.ROOT);
        };
        String msg = e.getMessage();
        return msg == null || msg.isBlank() ? kind : kind + ": " + msg;
    }

    /** Parses text; {@code file} is only used in messages and may be null. */
    public static Node parse(String text, Path file) throws InputException {
        if (text.length() > MAX_BYTES) {
            throw new InputException(Problem.error(Located.nowhere(file), "",
                    "text is " + text.length() + " characters, over the limit of " + MAX_BYTES + " for one YAML document",
                    "split it into several files"));
        }
        if (text.startsWith("\uFEFF")) {
            text = text.substring(1); // a byte-order mark some editors write; not content
        }
        LoaderOptions options = new LoaderOptions();
        options.setMaxAliasesForCollections(MAX_ALIASES);
        options.setAllowDuplicateKeys(true); // we report duplicates ourselves, with both lines
        options.setNestingDepthLimit(MAX_DEPTH);
        options.setCodePointLimit((int) MAX_BYTES);
        options.setAllowRecursiveKeys(false);
        Yaml yaml = new Yaml(options);
        org.yaml.snakeyaml.nodes.Node root;
        try (Reader r = new StringReader(text)) {
            root = yaml.compose(r);
        } catch (MarkedYAMLException e) {
            Mark m = e.getProblemMark() != null ? e.getProblemMark() : e.getContextMark();
            String what = e.getProblem() != null ? e.getProblem() : e.getMessage();
            throw new InputException(Problem.error(at(file, m), "", "YAML syntax: " + firstLine(what),
                    unclosed(e).orElse(syntaxFix(what))));
        } catch (YAMLException e) {
            throw new InputException(refusal(file, firstLine(e.getMessage())));
        } catch (IOException e) {
            throw new InputException(Problem.error(Located.nowhere(file), "", "cannot read (" + describe(e) + ")", ""));
        } catch (StackOverflowError e) {
            throw new InputException(Problem.error(Located.nowhere(file), "", "YAML nested too deeply",
                    "use at most " + MAX_DEPTH + " levels"));
        }
        if (root == null) {
            return new Node.Scalar(new Located(file, 1, 1), null, false);
        }
        return new Converter(file).convert(root, "", 0);
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

    /** Limits enforced by SnakeYAML itself arrive without a position; say which limit it was. */
    private static Problem refusal(Path file, String what) {
        String w = what == null ? "" : what.toLowerCase(java.util.Locale.ROOT);
        if (w.contains("alias")) {
            return Problem.error(Located.nowhere(file), "",
                    "refused: more than " + MAX_ALIASES + " aliases to lists or mappings (an alias-expansion bomb looks like this)",
                    "write the values out instead of using *aliases");
        }
        if (w.contains("code point") || w.contains("exceeds the limit")) {
            return Problem.error(Located.nowhere(file), "", "refused: the document is over " + MAX_BYTES + " characters",
                    "split it into several files");
        }
        if (w.contains("nesting depth")) {
            return Problem.error(Located.nowhere(file), "", "refused: YAML nested more than " + MAX_DEPTH + " levels deep",
                    "use fewer levels");
        }
        return Problem.error(Located.nowhere(file), "", "YAML: " + what, "fix the YAML syntax");
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

        Node convert(org.yaml.snakeyaml.nodes.Node n, String path, int depth) throws InputException {
            Node seen = done.get(n);
            if (seen != null) {
                return seen;
            }
            Located loc = at(file, n.getStartMark());
            if (open.contains(n)) {
                throw new InputException(Problem.error(loc, path, "an alias refers to a value that contains it",
                        "write the values out instead of the self-referring *alias"));
            }
            if (depth > MAX_DEPTH) {
                throw new InputException(Problem.error(loc, path, "YAML nested too deeply", "use at most " + MAX_DEPTH + " levels"));
            }
            open.add(n);
            Node result = build(n, path, depth, loc);
            open.remove(n);
            done.put(n, result);
            return result;
        }

        private Node build(org.yaml.snakeyaml.nodes.Node n, String path, int depth, Located loc) throws InputException {
            if (n instanceof ScalarNode s) {
                boolean quoted = s.getScalarStyle() != DumperOptions.ScalarStyle.PLAIN;
                String v = s.getValue();
                boolean isNull = !quoted && (v.isEmpty() || v.equals("~") || v.equals("null") || v.equals("Null") || v.equals("NULL"));
                return new Node.Scalar(loc, isNull ? null : v, quoted);
            }
            if (n instanceof SequenceNode seq) {
                List<Node> items = new ArrayList<>();
                List<org.yaml.snakeyaml.nodes.Node> values = seq.getValue();
                for (int i = 0; i < values.size(); i++) {
                    items.add(convert(values.get(i), path + "[" + i + "]", depth + 1));
                }
                return new Node.Seq(loc, items);
            }
            MappingNode map = (MappingNode) n;
            Map<String, Node> entries = new LinkedHashMap<>();
            Map<String, Located> keyAt = new LinkedHashMap<>();
            for (NodeTuple t : map.getValue()) {
                Located kLoc = at(file, t.getKeyNode().getStartMark());
                if (!(t.getKeyNode() instanceof ScalarNode key)) {
                    throw new InputException(Problem.error(kLoc, path, "a key must be a plain word, found a list or mapping",
                            "write 'name: value'"));
                }
                String k = key.getValue();
                String kPath = path.isEmpty() ? k : path + "." + k;
                if (entries.containsKey(k)) {
                    Located first = keyAt.get(k);
                    throw new InputException(Problem.error(kLoc, kPath, "key written twice (first on line " + first.line() + ")",
                            "keep one of them"));
                }
                keyAt.put(k, kLoc);
                entries.put(k, convert(t.getValueNode(), kPath, depth + 1));
            }
            return new Node.Mapping(loc, entries, keyAt);
        }
    }
}
