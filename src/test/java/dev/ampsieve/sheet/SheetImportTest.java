package dev.ampsieve.sheet;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.ampsieve.catalog.Architecture;
import dev.ampsieve.catalog.InputType;
import dev.ampsieve.catalog.Part;
import dev.ampsieve.catalog.Price;
import dev.ampsieve.report.ProblemText;
import dev.ampsieve.yaml.Problem;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * A sheet written by hand the way an office suite saves "CSV (comma-separated), UTF-8": a byte
 * order mark, CR LF line ends, quotes only around cells holding a comma or a quote, an empty
 * cell where the sheet has no value, a µ in a header. Every expected value is read off the
 * fixture by hand.
 */
class SheetImportTest {

    /** Row 2 and 3 convert; row 4 has a current in the voltage column vos.max (column 5). */
    static final String FIXTURE = "\uFEFF"
            + "id,title,architecture,input,Vos max [µV],vos.typ [uV],gbw [MHz],supply.min [V],supply.max [V],"
            + "temperature.min [°C],temperature.max [°C],price.unit,price.quantity,packages,noise.en [nV/rtHz],notes\r\n"
            + "sheet-amp-01,\"Precision amp, low noise\",standard,bipolar,25,,1.2,4.5,36,-40,125,2.40,1000,"
            + "\"soic-8, msop-8\",9,=SUM(A1:A2)\r\n"
            + "sheet-amp-02,\"Chopper, \"\"zero-drift\"\"\",chopper,cmos,5,1,2,1.8,5.5,-40,125,3.10,100,sot-23-5,"
            + "22,\"'=HYPERLINK(\"\"x\"\")\"\r\n"
            + "sheet-amp-03,Bad row,standard,bipolar,2 mA,,1,4.5,36,-40,85,1.00,1000,,10,\r\n"
            + ",,,,,,,,,,,,,,,\r\n";

    private static SheetImport.Result convert(String text) {
        return SheetImport.convert(text, Path.of("parts.csv"));
    }

    @Test
    void officeSuiteSheetConvertsRowByRow() {
        SheetImport.Result r = convert(FIXTURE);
        assertEquals(3, r.dataRows()); // the all-empty last row is not a part
        assertEquals(
                List.of("sheet-amp-01", "sheet-amp-02"),
                r.rows().stream().map(SheetImport.Row::id).toList());

        SheetImport.Row one = r.rows().get(0);
        assertEquals(2, one.row());
        // the file as written: template key order, a unit on every value, the formula-like note a string
        assertEquals("""
                # Imported from parts.csv, row 2, by 'ampsieve import'. Every value carries its unit;
                # catalog-template/part.yaml explains each key.
                id: sheet-amp-01
                title: "Precision amp, low noise"
                architecture: standard
                input: bipolar
                packages: ["soic-8", "msop-8"]
                price:
                  unit: 2.40
                  quantity: 1000
                supply:
                  min: "4.5 V"
                  max: "36 V"
                temperature:
                  min: "-40 °C"
                  max: "125 °C"
                vos:
                  max: "25 µV"
                gbw: "1.2 MHz"
                noise:
                  en: "9 nV/rtHz"
                notes: "=SUM(A1:A2)"
                """, one.yaml());
        Part p = one.part();
        assertEquals("Precision amp, low noise", p.title());
        assertEquals(Architecture.STANDARD, p.architecture());
        assertEquals(InputType.BIPOLAR, p.input());
        assertEquals(null, p.vos().typ()); // the empty vos.typ cell leaves typ out
        assertEquals(25e-6, p.vos().max(), 1e-18); // 25 µV
        assertEquals(1.2e6, p.gbw(), 1e-6);
        assertEquals(4.5, p.supply().min(), 0);
        assertEquals(36, p.supply().max(), 0);
        assertEquals(-40, p.temperature().min(), 0);
        assertEquals(125, p.temperature().max(), 0);
        assertEquals(new Price(2.40, 1000, "USD"), p.price());
        assertEquals(List.of("soic-8", "msop-8"), p.packages());
        assertEquals(9e-9, p.noise().en(), 1e-21);
        assertEquals("=SUM(A1:A2)", p.notes()); // data, never a formula

        Part two = r.rows().get(1).part();
        assertEquals("Chopper, \"zero-drift\"", two.title());
        assertEquals(Architecture.CHOPPER, two.architecture());
        assertEquals(1e-6, two.vos().typ(), 1e-18);
        assertEquals(5e-6, two.vos().max(), 1e-18);
        assertEquals(new Price(3.10, 100, "USD"), two.price());
        assertEquals("=HYPERLINK(\"x\")", two.notes()); // the ' an export puts before a formula is taken off
    }

    @Test
    void badRowIsReportedAtItsRowAndColumnWithTheCatalogsWords() {
        List<String> errors = convert(FIXTURE).problems().stream()
                .filter(Problem::isError)
                .map(ProblemText::line)
                .toList();
        // the message and fix are those the catalog gives for "vos: {max: 2 mA}" (units.Units)
        assertEquals(
                List.of("parts.csv:4:5: vos.max: '2 mA' is a current but a voltage belongs here;"
                        + " write a voltage such as '2.5 uV'"),
                errors);
    }

    @Test
    void decimalCommaIsNamed() {
        String csv = "id,architecture,input,vos.max [uV],gbw [MHz],supply.min [V],supply.max [V],temperature.min [C],"
                + "temperature.max [C],price.unit\n"
                + "comma-01,standard,bipolar,\"2,5\",1,4.5,36,-40,85,1.00\n";
        SheetImport.Result r = convert(csv);
        assertEquals(List.of(), r.rows());
        assertEquals(
                "parts.csv:2:4: vos.max: '2,5' has a decimal comma; write a decimal point: '2.5' (or export the"
                        + " sheet with a decimal point)",
                r.problems().get(0).toString());
    }

    @Test
    void unitInTheCellWinsAndMissingRequiredKeyHasNoColumn() {
        String csv = "id,architecture,input,vos.max [uV],supply.min [V],supply.max [V],temperature.min [C],"
                + "temperature.max [C],price.unit,gbw\n"
                + "cell-unit-01,standard,bipolar,0.5 mV,4.5,36,-40,85,1.00,3 MHz\n"
                + "no-gbw-01,standard,bipolar,500,4.5,36,-40,85,1.00,\n";
        SheetImport.Result r = convert(csv);
        assertEquals(500e-6, r.rows().get(0).part().vos().max(), 1e-18); // "0.5 mV" kept, header unit unused
        assertEquals(3e6, r.rows().get(0).part().gbw(), 1e-6); // no header unit: the cell carries it
        // the catalog's own message; no column to point at, so the place is the row
        assertEquals(
                List.of("parts.csv:3: gbw: required field is missing; add 'gbw: 1 MHz'"),
                r.problems().stream()
                        .filter(Problem::isError)
                        .map(ProblemText::line)
                        .toList());
    }

    @Test
    void headerProblemsStopBeforeAnyRow() {
        SheetImport.Result r = convert("id,vos mx [uV],gbw [uA]\nx-01,1,1\n");
        assertTrue(r.headerFailed());
        assertEquals(
                List.of(
                        "parts.csv:1:2: unknown column 'vos mx'; did you mean 'vos.max'?",
                        "parts.csv:1:3: gbw: header unit: '1 uA' is a current but a frequency belongs here;"
                                + " write in brackets a frequency such as '1.5 MHz'"),
                r.problems().stream().map(ProblemText::line).toList());
    }

    @Test
    void semicolonSeparatedSheetIsNamed() {
        SheetImport.Result r = convert("id;architecture;vos.max [uV]\r\nx-01;standard;2,5\r\n");
        assertEquals(
                List.of("parts.csv:1:1: the header is one cell holding semicolons: the sheet was saved with another"
                        + " separator; save it as CSV with commas as separators and a decimal point"),
                r.problems().stream().map(ProblemText::line).toList());
    }

    @Test
    void malformedQuotingIsPlaced() {
        SheetImport.Result r = convert("id,title\nx-01,\"never closed\n");
        assertTrue(r.headerFailed());
        assertTrue(
                r.problems().get(0).toString().startsWith("parts.csv:3:"),
                r.problems().toString());
    }

    @Test
    void commonSpellingsAndPriceBreaks() {
        String csv = "Part,Architecture,Input,VOS_MAX [uV],GBW [MHz],Vs min [V],Vs max [V],Tmin [C],Tmax [C],"
                + "Currency,Breaks\n"
                + "alias-01,standard,bipolar,100,1,4.5,36,-40,85,EUR,\"1: 2.10; 100: 1.60; 1000: 1.25\"\n";
        SheetImport.Result r = convert(csv);
        assertEquals(List.of(), r.problems().stream().filter(Problem::isError).toList());
        Price price = r.rows().get(0).part().price();
        assertEquals(
                List.of(new Price.Break(1, 2.10), new Price.Break(100, 1.60), new Price.Break(1000, 1.25)),
                price.breaks());
        assertEquals("EUR", price.currency());
        assertTrue(
                r.rows()
                        .get(0)
                        .yaml()
                        .contains("price:\n  - {quantity: 1, unit: 2.10, currency: \"EUR\"}\n"
                                + "  - {quantity: 100, unit: 1.60}\n  - {quantity: 1000, unit: 1.25}\n"),
                r.rows().get(0).yaml());
    }

    @Test
    void readsThroughTheBoundedReader(@TempDir Path dir) throws Exception {
        Path f = dir.resolve("parts.csv");
        Files.write(f, FIXTURE.getBytes(StandardCharsets.UTF_8));
        assertEquals(2, SheetImport.read(f).rows().size());
        Path folder = Files.createDirectory(dir.resolve("folder.csv"));
        dev.ampsieve.yaml.InputException e = org.junit.jupiter.api.Assertions.assertThrows(
                dev.ampsieve.yaml.InputException.class, () -> SheetImport.read(folder));
        assertEquals(
                folder + ": not a regular file (a folder); give a CSV file",
                e.problems().get(0).toString());
    }
}
