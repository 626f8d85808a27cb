package dev.ampsieve.catalog;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.ampsieve.yaml.InputException;
import dev.ampsieve.yaml.Problem;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The measured lot file: our CSV layout, values in SI, and every problem placed at file, line, column and column name. */
class LotReaderTest {

    private static final Path FILE = Path.of("lot.csv");

    private static Problem only(String text) {
        InputException e = assertThrows(InputException.class, () -> LotReader.parse(FILE, text));
        assertEquals(1, e.problems().size(), () -> e.problems().toString());
        return e.problems().get(0);
    }

    @Test
    void readsEveryColumnInSiUnits() throws InputException {
        MeasuredLot lot = LotReader.parse(FILE, """
                # bench of 2026-11-20
                unit, vos (uV), ib (nA), vos at 85 C (uV), ib at 85 C (pA)

                a1, 12.5, 0.7, 15, 900
                a2, -3, 1.25e0, -1.5, 1200
                a3,0,.5,+2,1e3
                """);
        assertEquals(List.of("a1", "a2", "a3"), lot.labels());
        assertArrayEquals(new double[] {12.5e-6, -3e-6, 0}, lot.vos(), 1e-18);
        assertArrayEquals(new double[] {0.7e-9, 1.25e-9, 0.5e-9}, lot.ib(), 1e-21);
        assertEquals(85.0, lot.second(), 0.0);
        assertArrayEquals(new double[] {15e-6, -1.5e-6, 2e-6}, lot.vosAt(), 1e-18);
        assertArrayEquals(new double[] {900e-12, 1200e-12, 1000e-12}, lot.ibAt(), 1e-21);
        assertEquals(3, lot.units());
    }

    @Test
    void onlyTheOffsetIsRequiredAndRowsAreNumberedWithoutALabel() throws InputException {
        MeasuredLot lot = LotReader.parse(FILE, "vos (mV)\n0.01\n-0.02\n0.005\n");
        assertEquals(List.of("1", "2", "3"), lot.labels());
        assertArrayEquals(new double[] {10e-6, -20e-6, 5e-6}, lot.vos(), 1e-18);
        assertEquals(0, lot.ib().length);
        assertTrue(Double.isNaN(lot.second()));
    }

    @Test
    void aCellThatIsNotANumberIsPlacedAtItsLineColumnAndHeading() {
        Problem p = only("unit, vos (uV)\na, 1\nb, 2\nc,  12 uV\n");
        assertEquals(4, p.line());
        assertEquals(5, p.column()); // "c,  12 uV": the cell's text starts at column 5
        assertEquals("vos", p.field());
        assertEquals("'12 uV' is not a plain number", p.message());
        assertTrue(p.fix().contains("no unit in the cell"), p.fix());
        assertEquals(FILE, p.file());
    }

    @Test
    void anUnknownColumnGetsTheNearestName() {
        Problem p = only("unit, vso (uV)\na, 1\n");
        assertEquals(1, p.line());
        assertEquals(7, p.column());
        assertEquals("unknown column 'vso'", p.message());
        assertEquals("did you mean 'vos'?", p.fix());
    }

    @Test
    void aQuantityColumnNeedsAUnitOfItsKind() {
        assertEquals("no unit for 'vos'", only("vos\n1\n2\n3\n").message());
        Problem wrong = only("vos (nA)\n1\n2\n3\n");
        assertEquals("'nA' is not a unit of voltage", wrong.message());
        assertEquals("write a unit such as 'uV'", wrong.fix());
    }

    @Test
    void aRowWithTheWrongNumberOfCells() {
        Problem p = only("vos (uV), ib (pA)\n1, 2\n3\n4, 5\n5, 6\n");
        assertEquals(3, p.line());
        assertEquals("this unit has 1 cells, the header 2", p.message());
    }

    @Test
    void theOffsetColumnIsRequired() {
        Problem p = only("unit, ib (pA)\na, 1\n");
        assertEquals("the header has no 'vos' column (the offset at 25 °C, required)", p.message());
        assertTrue(p.fix().startsWith("write a header such as 'unit, vos (uV)"), p.fix());
    }

    @Test
    void oneSecondTemperaturePerFile() {
        Problem p = only("vos (uV), vos at 85 C (uV), ib at -40 C (pA)\n1, 2, 3\n");
        assertEquals(29, p.column());
        assertEquals("a second temperature other than the first 'at' column's", p.message());
        assertEquals(
                "the second temperature is 25 °C, the temperature of the plain columns",
                only("vos (uV), vos at 25 C (uV)\n1, 2\n").message());
    }

    @Test
    void tooFewUnitsOrNoHeader() {
        assertEquals(
                "only 2 units; a fit needs at least 3", only("vos (uV)\n1\n2\n").message());
        assertEquals(
                "no header line (the file is empty or holds only comments)",
                only("# nothing yet\n\n").message());
    }

    @Test
    void theFileIsOnlyReadAndAFolderIsRefused(@TempDir Path dir) throws Exception {
        Path f = dir.resolve("lot.csv");
        byte[] bytes = "\uFEFFvos (uV)\n1\n2\n3\n".getBytes(StandardCharsets.UTF_8);
        Files.write(f, bytes);
        MeasuredLot lot = LotReader.read(f);
        assertEquals(3, lot.units()); // the byte-order mark is not part of the heading
        assertArrayEquals(bytes, Files.readAllBytes(f));
        assertEquals(List.of(f), Files.list(dir).toList()); // nothing written beside it
        InputException e = assertThrows(InputException.class, () -> LotReader.read(dir));
        assertTrue(e.getMessage().contains("not a regular file"), e.getMessage());
    }
}
