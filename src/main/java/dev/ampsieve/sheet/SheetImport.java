package dev.ampsieve.sheet;

import com.fasterxml.jackson.core.JsonLocation;
import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.MappingIterator;
import com.fasterxml.jackson.databind.RuntimeJsonMappingException;
import com.fasterxml.jackson.dataformat.csv.CsvMapper;
import com.fasterxml.jackson.dataformat.csv.CsvParser;
import dev.ampsieve.catalog.CatalogKeys;
import dev.ampsieve.catalog.CatalogLoader;
import dev.ampsieve.catalog.Part;
import dev.ampsieve.text.FormulaCells;
import dev.ampsieve.units.UnitException;
import dev.ampsieve.units.Units;
import dev.ampsieve.yaml.InputException;
import dev.ampsieve.yaml.Located;
import dev.ampsieve.yaml.Problem;
import dev.ampsieve.yaml.YamlFiles;
import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * A spreadsheet export (CSV, a header row, one part a row) into catalog part files: each row
 * becomes YAML text in the template's key order, with a unit on every value, and is read back
 * with the catalog's own rules ({@link CatalogLoader#readPart}), so a row the catalog would
 * refuse is never written. A catalog problem is reported at the row and column it came from
 * ({@code file.csv:row:col: field: problem; fix}); rows and columns are counted as a
 * spreadsheet counts them (the header is row 1, the first column 1).
 *
 * <p>Cells: empty means the key is absent; a bare number takes the header's unit
 * ({@code vos.max [uV]}), a cell with its own unit keeps it ({@code 2.5 mV}); decimal point only;
 * lists ({@code packages}, {@code tags}) separated by {@code ;}, or by {@code ,} when the cell has no
 * {@code ;}; price breaks as {@code 1: 2.10; 1000: 1.25}. A leading {@code '} that export put before
 * a formula-like cell is taken off ({@link FormulaCells#restore}); no cell is ever evaluated.
 */
public final class SheetImport {
    private SheetImport() {}

    /** Larger than any hand-kept parts list (a thousand parts is about half a MiB). */
    public static final long MAX_BYTES = 16L * 1024 * 1024;

    /**
     * One row that converted.
     *
     * @param row  spreadsheet row number (the header is 1)
     * @param idColumn column of the id, for messages about writing the file
     * @param yaml the part file's text
     * @param part the part as the catalog reads that text
     */
    public record Row(int row, int idColumn, String id, String yaml, Part part) {}

    /** Rows that converted, and every problem (errors for rows that did not, warnings for rows that did). */
    public record Result(List<Row> rows, List<Problem> problems, int dataRows) {
        public boolean headerFailed() {
            return dataRows < 0;
        }
    }

    /** Reads a CSV file through the bounded reader and converts it; see {@link #convert}. */
    public static Result read(Path csv) throws InputException {
        byte[] bytes = dev.ampsieve.yaml.BoundedFiles.read(csv, MAX_BYTES, "CSV");
        return convert(YamlFiles.decode(bytes, csv), csv);
    }

    private static final Pattern UNIT_IN_HEADER = Pattern.compile("^(.*?)\\s*[\\[(]\\s*([^\\])]*?)\\s*[\\])]\\s*$");
    private static final Pattern DECIMAL_COMMA = Pattern.compile("[-+]?\\d+,\\d+(\\s.*)?");
    private static final Pattern BREAK = Pattern.compile("\\s*([^:]+?)\\s*:\\s*(.+?)\\s*");

    /** A header cell that names a column: where it is, and the unit its bare numbers take. */
    private record Heading(Columns.Column column, int col, String unit) {}

    /** A cell's text (formula mark taken off) and its 1-based column. */
    private record Cell(String text, int col) {}

    /** @param text the file's text, already decoded (a leading byte order mark is skipped) */
    public static Result convert(String text, Path csv) {
        if (text.startsWith("\uFEFF")) {
            text = text.substring(1);
        }
        List<Problem> problems = new ArrayList<>();
        List<String[]> records = new ArrayList<>();
        CsvMapper mapper = new CsvMapper();
        mapper.enable(CsvParser.Feature.WRAP_AS_ARRAY);
        try (MappingIterator<String[]> it = mapper.readerFor(String[].class).readValues(text)) {
            while (it.hasNextValue()) {
                records.add(it.nextValue());
            }
        } catch (IOException | RuntimeJsonMappingException e) {
            JsonLocation loc = e instanceof JsonProcessingException j
                    ? j.getLocation()
                    : e.getCause() instanceof JsonProcessingException j ? j.getLocation() : null;
            String why = e instanceof JsonProcessingException j ? j.getOriginalMessage() : e.getMessage();
            problems.add(Problem.error(
                    loc == null ? Located.nowhere(csv) : new Located(csv, loc.getLineNr(), loc.getColumnNr()),
                    "",
                    "not readable as CSV (" + why + ")",
                    "save the sheet as CSV with comma separators and double quotes around cells that hold commas"));
            return new Result(List.of(), problems, -1);
        }
        if (records.isEmpty()) {
            problems.add(Problem.error(
                    Located.nowhere(csv),
                    "",
                    "the file is empty",
                    "export the sheet with a header row naming catalog keys (vos.max [uV], gbw [MHz], ...)"));
            return new Result(List.of(), problems, -1);
        }
        String[] header = records.get(0);
        if (header.length == 1 && header[0] != null && (header[0].contains(";") || header[0].contains("\t"))) {
            problems.add(Problem.error(
                    new Located(csv, 1, 1),
                    "",
                    "the header is one cell holding " + (header[0].contains(";") ? "semicolons" : "tabs")
                            + ": the sheet was saved with another separator",
                    "save it as CSV with commas as separators and a decimal point"));
            return new Result(List.of(), problems, -1);
        }
        List<Heading> headings = headings(header, records, csv, problems);
        if (problems.stream().anyMatch(Problem::isError)) {
            return new Result(List.of(), problems, -1);
        }
        List<Row> rows = new ArrayList<>();
        Map<String, Integer> ids = new HashMap<>();
        int dataRows = 0;
        for (int r = 1; r < records.size(); r++) {
            String[] cells = records.get(r);
            if (blank(cells)) {
                continue;
            }
            dataRows++;
            Row row = row(r + 1, cells, headings, csv, problems);
            if (row != null) {
                Integer first = ids.putIfAbsent(row.id(), row.row());
                if (first != null) {
                    problems.add(Problem.error(
                            new Located(csv, row.row(), row.idColumn()),
                            CatalogKeys.ID,
                            "id '" + row.id() + "' is already used in row " + first,
                            "give each part its own id"));
                } else {
                    rows.add(row);
                }
            }
        }
        return new Result(rows, problems, dataRows);
    }

    private static boolean blank(String[] cells) {
        for (String c : cells) {
            if (c != null && !c.isBlank()) {
                return false;
            }
        }
        return true;
    }

    private static List<Heading> headings(String[] header, List<String[]> records, Path csv, List<Problem> problems) {
        List<Heading> out = new ArrayList<>();
        Map<Columns.Column, Integer> seen = new HashMap<>();
        for (int i = 0; i < header.length; i++) {
            int col = i + 1;
            Located at = new Located(csv, 1, col);
            String h = FormulaCells.restore(header[i] == null ? "" : header[i]).strip();
            if (h.isEmpty()) {
                if (columnHasData(records, i)) {
                    problems.add(Problem.error(
                            at,
                            "",
                            "this column has values but no header",
                            "name it with a catalog key such as 'vos.max [uV]' (README, \"Spreadsheets\")"));
                }
                out.add(null);
                continue;
            }
            String name = h;
            String unit = null;
            Matcher m = UNIT_IN_HEADER.matcher(h);
            if (m.matches()) {
                name = m.group(1);
                unit = m.group(2).isBlank() ? null : m.group(2);
            }
            Columns.Column c = Columns.find(name);
            if (c == null) {
                String near = dev.ampsieve.yaml.Fields.closest(
                        name, Columns.ALL.stream().map(Columns.Column::path).toList());
                problems.add(Problem.error(
                        at,
                        "",
                        "unknown column '" + name + "'",
                        near != null
                                ? "did you mean '" + near + "'?"
                                : "name it with a catalog key path such as 'vos.max' or 'noise.en'"
                                        + " (README, \"Spreadsheets\"), or delete the column"));
                out.add(null);
                continue;
            }
            Integer before = seen.put(c, col);
            if (before != null) {
                problems.add(Problem.error(
                        at,
                        c.path(),
                        "a second column for " + c.path() + " (the first is column " + before + ")",
                        "keep one of them"));
            }
            if (unit != null && c.kind() != Columns.Kind.QUANTITY) {
                problems.add(Problem.error(
                        at,
                        c.path(),
                        "takes no unit, but the header gives '" + unit + "'",
                        "write the header as '" + c.path() + "'"));
            } else if (unit != null) {
                try {
                    Units.parse("1 " + unit, c.dimension());
                } catch (UnitException e) {
                    problems.add(Problem.error(
                            at,
                            c.path(),
                            "header unit: " + e.problem(),
                            e.fix().replace("write ", "write in brackets ")));
                }
            }
            out.add(new Heading(c, col, unit));
        }
        if (!seen.containsKey(Columns.of(CatalogKeys.ID))) {
            problems.add(Problem.error(
                    new Located(csv, 1, 0),
                    CatalogKeys.ID,
                    "no id column",
                    "add a column 'id' with a name for each part (lowercase letters, digits, dashes)"));
        }
        return out;
    }

    private static boolean columnHasData(List<String[]> records, int i) {
        for (int r = 1; r < records.size(); r++) {
            String[] cells = records.get(r);
            if (i < cells.length && cells[i] != null && !cells[i].isBlank()) {
                return true;
            }
        }
        return false;
    }

    /** One row to YAML, read back with the catalog's rules; null (and problems) when it does not convert. */
    private static Row row(int rowNo, String[] cells, List<Heading> headings, Path csv, List<Problem> problems) {
        Map<String, Cell> byPath = new LinkedHashMap<>();
        Map<String, String> units = new HashMap<>();
        List<Problem> own = new ArrayList<>();
        for (int i = 0; i < cells.length; i++) {
            String raw = cells[i] == null ? "" : cells[i];
            if (raw.isBlank()) {
                continue;
            }
            Heading h = i < headings.size() ? headings.get(i) : null;
            if (h == null) {
                own.add(Problem.error(
                        new Located(csv, rowNo, i + 1),
                        "",
                        "a value in a column without a header",
                        "give the column a header, or delete the value"));
                continue;
            }
            String t = FormulaCells.restore(raw);
            if (h.column().kind() != Columns.Kind.TEXT) {
                t = t.strip();
            }
            byPath.put(h.column().path(), new Cell(t, h.col()));
            units.put(h.column().path(), h.unit());
        }
        Cell idCell = byPath.get(CatalogKeys.ID);
        int idCol = idCell == null ? 0 : idCell.col();
        String id = idCell == null ? null : idCell.text().strip();
        Path target = Path.of("row.yaml"); // only for the reader's messages, which are placed in the CSV instead
        StringBuilder y = new StringBuilder();
        y.append("# Imported from ")
                .append(oneLine(
                        csv.getFileName() == null
                                ? csv.toString()
                                : csv.getFileName().toString()))
                .append(", row ")
                .append(rowNo)
                .append(", by 'ampsieve import'. Every value carries its unit;\n")
                .append("# catalog-template/part.yaml explains each key.\n");
        int line = 2;
        Map<Integer, Integer> columnOfLine = new HashMap<>();
        for (String key : CatalogKeys.PART_KEYS) {
            List<String> sub = CatalogKeys.subKeys(key);
            if (sub.isEmpty()) {
                Cell c = byPath.get(key);
                if (c != null) {
                    y.append(key)
                            .append(": ")
                            .append(scalar(Columns.of(key), c, units.get(key), csv, rowNo, own))
                            .append('\n');
                    columnOfLine.put(++line, c.col());
                }
                continue;
            }
            Cell breaks = key.equals(CatalogKeys.PRICE) ? byPath.get(Columns.PRICE_BREAKS) : null;
            if (breaks != null) {
                line = priceBreaks(y, line, breaks, byPath, columnOfLine, csv, rowNo, own);
                continue;
            }
            boolean any = sub.stream().anyMatch(s -> byPath.containsKey(CatalogKeys.path(key, s)));
            if (!any) {
                continue;
            }
            y.append(key).append(":\n");
            Cell firstCell = sub.stream()
                    .map(s -> byPath.get(CatalogKeys.path(key, s)))
                    .filter(c -> c != null)
                    .findFirst()
                    .get();
            columnOfLine.put(++line, firstCell.col());
            for (String s : sub) {
                String p = CatalogKeys.path(key, s);
                Cell c = byPath.get(p);
                if (c != null) {
                    y.append("  ")
                            .append(s)
                            .append(": ")
                            .append(scalar(Columns.of(p), c, units.get(p), csv, rowNo, own))
                            .append('\n');
                    columnOfLine.put(++line, c.col());
                }
            }
        }
        if (!own.isEmpty()) {
            problems.addAll(own);
            return null;
        }
        CatalogLoader.PartText read = CatalogLoader.readPart(y.toString(), target);
        boolean failed = false;
        for (Problem p : read.problems()) {
            int col = columnOf(p, byPath, columnOfLine);
            problems.add(p.at(csv, rowNo, col, p.field()));
            failed |= p.isError();
        }
        if (failed || read.part() == null) {
            return null;
        }
        return new Row(rowNo, idCol, read.part().id(), y.toString(), read.part());
    }

    /** The CSV column a catalog problem belongs to: by its field path, else by the YAML line; 0 when neither. */
    private static int columnOf(Problem p, Map<String, Cell> byPath, Map<Integer, Integer> columnOfLine) {
        String field = p.field();
        if (field.startsWith(CatalogKeys.PRICE + "[") && byPath.containsKey(Columns.PRICE_BREAKS)) {
            return byPath.get(Columns.PRICE_BREAKS).col();
        }
        String plain = field.replaceAll("\\[\\d+]", "");
        if (byPath.containsKey(plain)) {
            return byPath.get(plain).col();
        }
        for (Map.Entry<String, Cell> e : byPath.entrySet()) {
            if (e.getKey().startsWith(plain + ".")) {
                return e.getValue().col(); // a problem with a whole section: its first column
            }
        }
        if (!field.isEmpty() && !CatalogKeys.ID.equals(field)) {
            return 0; // a key the sheet has no column for (a required one missing)
        }
        return columnOfLine.getOrDefault(p.line(), 0);
    }

    private static String scalar(Columns.Column c, Cell cell, String unit, Path csv, int rowNo, List<Problem> own) {
        String t = cell.text();
        return switch (c.kind()) {
            case TEXT -> c.path().equals(CatalogKeys.ID) ? YamlText.word(t) : YamlText.quoted(t);
            case WORD -> YamlText.word(t);
            case BOOLEAN -> YamlText.bool(t);
            case INTEGER -> YamlText.integer(t);
            case NUMBER -> {
                commaCheck(c, cell, csv, rowNo, own);
                yield YamlText.number(t);
            }
            case LIST -> list(t);
            case QUANTITY -> {
                commaCheck(c, cell, csv, rowNo, own);
                String u = unit != null ? unit : null;
                yield YamlText.quoted(YamlText.NUMBER.matcher(t).matches() && u != null ? t + " " + u : t);
            }
            case BREAKS -> throw new IllegalStateException("breaks are written by priceBreaks");
        };
    }

    private static void commaCheck(Columns.Column c, Cell cell, Path csv, int rowNo, List<Problem> own) {
        if (DECIMAL_COMMA.matcher(cell.text()).matches()) {
            own.add(Problem.error(
                    new Located(csv, rowNo, cell.col()),
                    c.path(),
                    "'" + cell.text() + "' has a decimal comma",
                    "write a decimal point: '" + cell.text().replaceFirst(",", ".") + "' (or export the sheet with"
                            + " a decimal point)"));
        }
    }

    /** {@code a; b} (or {@code a, b} when there is no {@code ;}) as a YAML flow list of quoted items. */
    static List<String> items(String t) {
        String sep = t.contains(";") ? ";" : ",";
        List<String> out = new ArrayList<>();
        for (String s : t.split(Pattern.quote(sep))) {
            if (!s.isBlank()) {
                out.add(s.strip());
            }
        }
        return out;
    }

    private static String list(String t) {
        return "[" + String.join(", ", items(t).stream().map(YamlText::quoted).toList()) + "]";
    }

    private static int priceBreaks(
            StringBuilder y,
            int line,
            Cell breaks,
            Map<String, Cell> byPath,
            Map<Integer, Integer> columnOfLine,
            Path csv,
            int rowNo,
            List<Problem> own) {
        Located at = new Located(csv, rowNo, breaks.col());
        for (String other : List.of("price.unit", "price.quantity")) {
            if (byPath.containsKey(other)) {
                own.add(Problem.error(
                        at,
                        Columns.PRICE_BREAKS,
                        "given together with " + other,
                        "give either one price (price.unit, price.quantity) or the breaks, not both"));
                return line;
            }
        }
        List<String[]> pairs = new ArrayList<>();
        for (String item : breaks.text().split(";")) {
            if (item.isBlank()) {
                continue;
            }
            Matcher m = BREAK.matcher(item);
            if (!m.matches()) {
                own.add(Problem.error(
                        at,
                        Columns.PRICE_BREAKS,
                        "'" + item.strip() + "' is not 'quantity: unit price'",
                        "write the breaks as '1: 2.10; 100: 1.60; 1000: 1.25'"));
                return line;
            }
            pairs.add(new String[] {m.group(1), m.group(2)});
        }
        Cell currency = byPath.get("price.currency");
        y.append(CatalogKeys.PRICE).append(":\n");
        columnOfLine.put(++line, breaks.col());
        for (int i = 0; i < pairs.size(); i++) {
            y.append("  - {quantity: ")
                    .append(YamlText.integer(pairs.get(i)[0]))
                    .append(", unit: ")
                    .append(YamlText.number(pairs.get(i)[1]));
            if (i == 0 && currency != null) {
                y.append(", currency: ").append(YamlText.quoted(currency.text()));
            }
            y.append("}\n");
            columnOfLine.put(++line, breaks.col());
        }
        return line;
    }

    private static String oneLine(String s) {
        return s.replaceAll("[\\p{Cntrl}\\u2028\\u2029]", "?");
    }
}
