package dev.ampsieve.catalog;

import dev.ampsieve.units.Dimension;
import dev.ampsieve.units.UnitException;
import dev.ampsieve.units.Units;
import dev.ampsieve.yaml.BoundedFiles;
import dev.ampsieve.yaml.Fields;
import dev.ampsieve.yaml.InputException;
import dev.ampsieve.yaml.Located;
import dev.ampsieve.yaml.Problem;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * Reads a measured lot file: our own small CSV layout (README "Measured units").
 * <pre>
 *   # lines starting with '#' are comments; blank lines are skipped
 *   unit, vos (uV), ib (pA), vos at 85 C (uV), ib at 85 C (pA)
 *   u01, 12.5, 40, 31.0, 210
 * </pre>
 * The first other line is the header: comma-separated columns, each {@code unit} (a label, optional)
 * or a quantity {@code vos} / {@code ib} with its unit in parentheses, measured at 25 °C, or
 * {@code at T} for one second temperature (every such column the same T). {@code vos} at 25 °C is
 * required. Each further line is one unit: as many cells as the header, plain numbers in the
 * column's unit (no quotes, no units in cells). Every problem is reported with file, line,
 * column and the column's name; the file is only read.
 */
public final class LotReader {
    private LotReader() {}

    /** Largest lot file read (1 MiB holds some 30,000 units). */
    public static final long MAX_BYTES = 1L << 20;

    /** A normal fit needs at least this many units. */
    public static final int MIN_UNITS = 3;

    /** Problems reported before the reader stops listing them. */
    private static final int MAX_PROBLEMS = 20;

    static final String UNIT = "unit";
    static final String VOS = "vos";
    static final String IB = "ib";
    private static final List<String> NAMES = List.of(UNIT, VOS, IB);

    /** {@code name [at T] (unit)}. */
    private static final Pattern COLUMN =
            Pattern.compile("([A-Za-z][A-Za-z-]*)(?:\\s+at\\s+([^()]+?))?\\s*(?:\\(([^()]*)\\))?");

    private static final Pattern NUMBER = Pattern.compile("[-+]?(\\d+\\.?\\d*|\\.\\d+)([eE][-+]?\\d+)?");

    private static final String EXAMPLE_HEADER = "unit, vos (uV), ib (pA), vos at 85 C (uV)";

    /** One header column: what it holds and the factor from the file's unit to SI. */
    private record Column(String name, boolean second, double scale, String heading, int column) {}

    /**
     * Reads {@code file} ({@link BoundedFiles}: a regular file of at most {@link #MAX_BYTES}).
     *
     * @throws InputException with every problem found, each at its line and column
     */
    public static MeasuredLot read(Path file) throws InputException {
        String text = new String(BoundedFiles.read(file, MAX_BYTES, "CSV"), StandardCharsets.UTF_8);
        if (text.startsWith("\uFEFF")) {
            text = text.substring(1);
        }
        return parse(file, text);
    }

    /** Parses the text of a lot file named {@code file} (for messages). */
    static MeasuredLot parse(Path file, String text) throws InputException {
        List<Problem> problems = new ArrayList<>();
        String[] lines = text.split("\r\n|\r|\n", -1);
        List<Column> columns = null;
        double second = Double.NaN;
        List<String> labels = new ArrayList<>();
        Map<String, List<Double>> values = new HashMap<>();
        for (int i = 0; i < lines.length && problems.size() < MAX_PROBLEMS; i++) {
            String line = lines[i];
            if (line.isBlank() || line.stripLeading().startsWith("#")) {
                continue;
            }
            int lineNo = i + 1;
            List<int[]> spans = cells(line);
            if (columns == null) {
                columns = new ArrayList<>();
                second = header(file, lineNo, line, spans, columns, problems);
                // a heading already refused is the likelier slip: no second line for the same mistake
                if (problems.isEmpty() && columns.stream().noneMatch(c -> c.name.equals(VOS) && !c.second)) {
                    problems.add(Problem.error(
                            new Located(file, lineNo, 1),
                            "",
                            "the header has no 'vos' column (the offset at 25 °C, required)",
                            "write a header such as '" + EXAMPLE_HEADER + "'"));
                }
                if (!problems.isEmpty()) {
                    break;
                }
                continue;
            }
            if (spans.size() != columns.size()) {
                problems.add(Problem.error(
                        new Located(file, lineNo, 1),
                        "",
                        "this unit has " + spans.size() + " cells, the header " + columns.size(),
                        "give one value per header column, separated by commas"));
                continue;
            }
            String label = String.valueOf(labels.size() + 1);
            for (int c = 0; c < columns.size(); c++) {
                Column col = columns.get(c);
                String cell = line.substring(spans.get(c)[0], spans.get(c)[1]).strip();
                int at = spans.get(c)[0] + 1 + leading(line.substring(spans.get(c)[0], spans.get(c)[1]));
                if (col.name.equals(UNIT)) {
                    label = cell.isEmpty() ? label : cell;
                    continue;
                }
                if (!NUMBER.matcher(cell).matches()) {
                    problems.add(Problem.error(
                            new Located(file, lineNo, at),
                            col.heading,
                            cell.isEmpty() ? "empty cell" : "'" + cell + "' is not a plain number",
                            "write the value as a number in the column's unit, such as 12.5 (no unit in the cell)"));
                    continue;
                }
                double v = Double.parseDouble(cell) * col.scale;
                if (!Double.isFinite(v)) {
                    problems.add(Problem.error(
                            new Located(file, lineNo, at),
                            col.heading,
                            "'" + cell + "' is beyond the largest number",
                            "check the exponent"));
                    continue;
                }
                values.computeIfAbsent(key(col), k -> new ArrayList<>()).add(v);
            }
            labels.add(label);
        }
        if (columns == null) {
            problems.add(Problem.error(
                    Located.nowhere(file),
                    "",
                    "no header line (the file is empty or holds only comments)",
                    "start with a header such as '" + EXAMPLE_HEADER + "', then one line per unit"));
        } else if (problems.isEmpty() && labels.size() < MIN_UNITS) {
            problems.add(Problem.error(
                    Located.nowhere(file),
                    "",
                    "only " + labels.size() + " units; a fit needs at least " + MIN_UNITS,
                    "measure more units (30 or more give a useful confidence interval)"));
        }
        if (!problems.isEmpty()) {
            throw new InputException(problems);
        }
        return new MeasuredLot(
                file,
                labels,
                array(values.get(VOS)),
                array(values.get(IB)),
                second,
                array(values.get(VOS + "@")),
                array(values.get(IB + "@")));
    }

    private static String key(Column c) {
        return c.second ? c.name + "@" : c.name;
    }

    private static double[] array(List<Double> v) {
        return v == null
                ? new double[0]
                : v.stream().mapToDouble(Double::doubleValue).toArray();
    }

    /** Reads the header into {@code out}; returns the second temperature (NaN when none). */
    private static double header(
            Path file, int lineNo, String line, List<int[]> spans, List<Column> out, List<Problem> problems) {
        double second = Double.NaN;
        List<String> seen = new ArrayList<>();
        for (int[] span : spans) {
            String raw = line.substring(span[0], span[1]);
            String cell = raw.strip();
            int at = span[0] + 1 + leading(raw);
            Located where = new Located(file, lineNo, at);
            Matcher m = COLUMN.matcher(cell);
            if (!m.matches()) {
                problems.add(Problem.error(
                        where,
                        cell,
                        "'" + cell + "' is not a column heading",
                        "write 'vos (uV)', 'ib (pA)', 'vos at 85 C (uV)' or 'unit'"));
                continue;
            }
            String name = m.group(1).toLowerCase(java.util.Locale.ROOT);
            if (!NAMES.contains(name)) {
                String near = Fields.closest(name, NAMES);
                problems.add(Problem.error(
                        where,
                        cell,
                        "unknown column '" + name + "'",
                        near != null ? "did you mean '" + near + "'?" : "the columns are unit, vos and ib"));
                continue;
            }
            boolean isSecond = m.group(2) != null;
            if (name.equals(UNIT)) {
                if (isSecond || m.group(3) != null) {
                    problems.add(
                            Problem.error(where, cell, "the unit column takes no temperature or unit", "write 'unit'"));
                    continue;
                }
                out.add(new Column(UNIT, false, 1.0, UNIT, at));
                continue;
            }
            if (isSecond) {
                double t;
                try {
                    t = Units.parse(m.group(2), Dimension.TEMPERATURE, "85 C");
                } catch (UnitException e) {
                    problems.add(Problem.error(where, cell, e.problem(), e.fix()));
                    continue;
                }
                if (t == 25.0) {
                    problems.add(Problem.error(
                            where,
                            cell,
                            "the second temperature is 25 °C, the temperature of the plain columns",
                            "write the plain column ('" + name
                                    + " (uV)') for 25 °C, or the temperature you measured at"));
                    continue;
                }
                if (!Double.isNaN(second) && t != second) {
                    problems.add(Problem.error(
                            where,
                            cell,
                            "a second temperature other than the first 'at' column's",
                            "keep one second temperature per file (one file per temperature pair)"));
                    continue;
                }
                second = t;
            }
            String unit = m.group(3);
            Dimension d = name.equals(VOS) ? Dimension.VOLTAGE : Dimension.CURRENT;
            String example = name.equals(VOS) ? "uV" : "pA";
            if (unit == null || unit.isBlank()) {
                problems.add(Problem.error(
                        where,
                        cell,
                        "no unit for '" + name + "'",
                        "write the unit in parentheses, such as '" + name + " (" + example + ")'"));
                continue;
            }
            double scale;
            try {
                scale = Units.parse("1 " + unit.strip(), d, "1 " + example);
            } catch (UnitException e) {
                problems.add(Problem.error(
                        where,
                        cell,
                        "'" + unit.strip() + "' is not a unit of " + (d == Dimension.VOLTAGE ? "voltage" : "current"),
                        "write a unit such as '" + example + "'"));
                continue;
            }
            String heading = isSecond ? name + " at " + m.group(2).strip() : name;
            if (seen.contains(heading)) {
                problems.add(Problem.error(where, cell, "a second '" + heading + "' column", "keep one column each"));
                continue;
            }
            seen.add(heading);
            out.add(new Column(name, isSecond, scale, heading, at));
        }
        return second;
    }

    /** [start, end) of each comma-separated cell. */
    private static List<int[]> cells(String line) {
        List<int[]> out = new ArrayList<>();
        int start = 0;
        for (int i = 0; i <= line.length(); i++) {
            if (i == line.length() || line.charAt(i) == ',') {
                out.add(new int[] {start, i});
                start = i + 1;
            }
        }
        return out;
    }

    private static int leading(String s) {
        int n = 0;
        while (n < s.length() && Character.isWhitespace(s.charAt(n))) {
            n++;
        }
        return n;
    }
}
