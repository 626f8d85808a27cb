package dev.ampsieve.yaml;

import java.io.IOException;
import java.io.Reader;
import java.io.StringReader;
import java.nio.charset.CharacterCodingException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
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
            throw new InputException(Problem.error(Located.nowhere(file), "", "cannot read the file (" + e.getMessage() + ")",
                    "check that it exists and is readable"));
        }
        if (size > MAX_BYTES) {
            throw new InputException(Problem.error(Located.nowhere(file), "",
                    "file is " + size + " bytes, over the " + MAX_BYTES + "-byte limit for one YAML file",
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
            throw new InputException(Problem.error(Located.nowhere(file), "", "cannot read the file (" + e.getMessage() + ")",
                    "check that it exists and is readable"));
        }
        return parse(text, file);
    }

    /** Parses text; {@code file} is only used in messages and may be null. */
    public static Node parse(String text, Path file) throws InputException {
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
            String fix = "fix the YAML syntax here (indent with spaces, 'key: value', quote text containing ': ' or '#')";
            if (what != null && what.contains("aliases")) {
                fix = "use at most " + MAX_ALIASES + " aliases; write the values out";
            }
            throw new InputException(Problem.error(at(file, m), "", "YAML " + firstLine(what), fix));
        } catch (YAMLException e) {
            String what = firstLine(e.getMessage());
            String fix = "fix the YAML syntax";
            if (what != null && what.toLowerCase(java.util.Locale.ROOT).contains("alias")) {
                fix = "use at most " + MAX_ALIASES + " aliases; write the values out";
            } else if (what != null && what.toLowerCase(java.util.Locale.ROOT).contains("code point")) {
                fix = "split the file into smaller ones";
            }
            throw new InputException(Problem.error(Located.nowhere(file), "", "YAML " + what, fix));
        } catch (IOException e) {
            throw new InputException(Problem.error(Located.nowhere(file), "", "cannot read (" + e.getMessage() + ")", ""));
        } catch (StackOverflowError e) {
            throw new InputException(Problem.error(Located.nowhere(file), "", "YAML nested too deeply",
                    "use at most " + MAX_DEPTH + " levels"));
        }
        if (root == null) {
            return new Node.Scalar(new Located(file, 1, 1), null, false);
        }
        return convert(root, file, 0);
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

    private static Node convert(org.yaml.snakeyaml.nodes.Node n, Path file, int depth) throws InputException {
        Located loc = at(file, n.getStartMark());
        if (depth > MAX_DEPTH) {
            throw new InputException(Problem.error(loc, "", "YAML nested too deeply", "use at most " + MAX_DEPTH + " levels"));
        }
        if (n instanceof ScalarNode s) {
            boolean quoted = s.getScalarStyle() != DumperOptions.ScalarStyle.PLAIN;
            String v = s.getValue();
            boolean isNull = !quoted && (v.isEmpty() || v.equals("~") || v.equals("null") || v.equals("Null") || v.equals("NULL"));
            return new Node.Scalar(loc, isNull ? null : v, quoted);
        }
        if (n instanceof SequenceNode seq) {
            List<Node> items = new ArrayList<>();
            for (org.yaml.snakeyaml.nodes.Node item : seq.getValue()) {
                items.add(convert(item, file, depth + 1));
            }
            return new Node.Seq(loc, items);
        }
        MappingNode map = (MappingNode) n;
        Map<String, Node> entries = new LinkedHashMap<>();
        Map<String, Located> keyAt = new LinkedHashMap<>();
        for (NodeTuple t : map.getValue()) {
            Located kLoc = at(file, t.getKeyNode().getStartMark());
            if (!(t.getKeyNode() instanceof ScalarNode key)) {
                throw new InputException(Problem.error(kLoc, "", "a key must be a plain word", "write 'name: value'"));
            }
            String k = key.getValue();
            if (entries.containsKey(k)) {
                Located first = keyAt.get(k);
                throw new InputException(Problem.error(kLoc, k, "key written twice (first on line " + first.line() + ")",
                        "keep one of them"));
            }
            keyAt.put(k, kLoc);
            entries.put(k, convert(t.getValueNode(), file, depth + 1));
        }
        return new Node.Mapping(loc, entries, keyAt);
    }
}
