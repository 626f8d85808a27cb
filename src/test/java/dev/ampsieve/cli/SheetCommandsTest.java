package dev.ampsieve.cli;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.ampsieve.catalog.Catalog;
import dev.ampsieve.catalog.CatalogLoader;
import dev.ampsieve.catalog.Part;
import dev.ampsieve.catalog.Price;
import dev.ampsieve.failure.ExitCode;
import dev.ampsieve.yaml.Problem;
import java.lang.reflect.RecordComponent;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** import, export and new-part as a user runs them, on files in a temporary folder. */
class SheetCommandsTest {

    /** Two good rows and one with an impossible offset (2 V, above the catalog's 1 V error bound) in column 4. */
    private static final String CSV = "id,architecture,input,vos.max [mV],gbw [MHz],supply.min [V],supply.max [V],"
            + "temperature.min [C],temperature.max [C],price.unit,noise.en [nV/rtHz],vos-drift.max [uV/C]\r\n"
            + "good-01,standard,bipolar,0.5,1,4.5,36,-40,85,1.00,10,5\r\n"
            + "huge-02,standard,bipolar,2000,1,4.5,36,-40,85,1.00,10,5\r\n"
            + "good-03,standard,bipolar,1,3,4.5,36,-40,85,2.00,10,5\r\n";

    private static Path write(Path dir, String name, String text) throws Exception {
        Path f = dir.resolve(name);
        Files.writeString(f, text, StandardCharsets.UTF_8);
        return f;
    }

    private static List<String> names(Path dir) throws Exception {
        try (Stream<Path> s = Files.list(dir)) {
            return s.map(p -> p.getFileName().toString()).sorted().toList();
        }
    }

    @Test
    void badRowIsReportedAndTheOthersAreWrittenWithNoTemporaryFileLeft(@TempDir Path dir) throws Exception {
        Path csv = write(dir, "parts.csv", CSV);
        Path into = dir.resolve("catalog");
        CliRun r = CliRun.of("import", csv.toString(), "--into", into.toString());
        assertEquals(ExitCode.FINDINGS.code(), r.code(), r.toString());
        // the catalog's bound for vos (CatalogKeys.BOUNDS: error above 1 V), placed at row 3, column 4
        assertEquals(
                csv + ":3:4: vos.max: 2.00 V is above 1.00 V, impossible for an op amp (an offset of volts leaves"
                        + " no room for a signal); check the unit prefix (p, n, u, m, k, M) and the datasheet column; the largest"
                        + " size accepted here is 1.00 V",
                String.join(
                        "\n",
                        r.err()
                                .lines()
                                .filter(l -> !l.contains(": warning: "))
                                .toList())); // the minimal rows' absent-figure warnings aside
        assertEquals(
                csv + ": 3 row(s), 2 part file(s) written to " + into + ", 1 row(s) not written (see above)\n",
                r.out());
        assertEquals(List.of("good-01.yaml", "good-03.yaml"), names(into)); // nothing else: no temporary file
        Catalog c = CatalogLoader.load(into, true);
        assertEquals(0.5e-3, c.parts().get(0).vos().max(), 1e-15);
        assertEquals(3e6, c.parts().get(1).gbw(), 1e-6);
    }

    @Test
    void existingFileIsLeftAloneWithoutForceAndReplacedWithIt(@TempDir Path dir) throws Exception {
        Path csv = write(dir, "parts.csv", CSV);
        Path into = Files.createDirectory(dir.resolve("catalog"));
        byte[] mine =
                "# my own notes\nid: good-01\n".getBytes(StandardCharsets.UTF_8); // broken on purpose: no other key
        Files.write(into.resolve("good-01.yaml"), mine);

        CliRun r = CliRun.of("import", csv.toString(), "--into", into.toString());
        assertEquals(ExitCode.FINDINGS.code(), r.code(), r.toString());
        assertTrue(
                r.err()
                        .contains(
                                csv + ":2:1: id: " + into.resolve("good-01.yaml") + ": the file already exists and was"
                                        + " left as it was; add --force to replace it, or give the part another id\n"),
                r.err());
        assertArrayEquals(mine, Files.readAllBytes(into.resolve("good-01.yaml")));
        assertEquals(List.of("good-01.yaml", "good-03.yaml"), names(into));

        CliRun forced = CliRun.of("import", csv.toString(), "--into", into.toString(), "--force");
        assertTrue(Files.readString(into.resolve("good-01.yaml")).startsWith("# Imported from parts.csv, row 2"));
        assertEquals(List.of("good-01.yaml", "good-03.yaml"), names(into), forced.toString());
    }

    @Test
    void anIdAlreadyInAnotherFileOfTheCatalogIsNotWrittenAgain(@TempDir Path dir) throws Exception {
        Path csv = write(dir, "parts.csv", CSV);
        Path into = Files.createDirectory(dir.resolve("catalog"));
        CliRun.of("import", csv.toString(), "--into", into.toString());
        Files.move(into.resolve("good-03.yaml"), into.resolve("renamed.yaml"));
        CliRun r = CliRun.of("import", csv.toString(), "--into", into.toString(), "--force");
        assertTrue(
                r.err()
                        .contains(csv + ":4:1: id: id 'good-03' is already in " + into.resolve("renamed.yaml") + ":3;"
                                + " not written; give the part another id, or remove the other one"),
                r.err());
        assertEquals(List.of("good-01.yaml", "renamed.yaml"), names(into));
    }

    /** The record with its file and line dropped: what a part is, not where it was read. */
    static Part unplaced(Part p) throws Exception {
        RecordComponent[] rc = Part.class.getRecordComponents();
        Object[] args = new Object[rc.length];
        Class<?>[] types = new Class<?>[rc.length];
        for (int i = 0; i < rc.length; i++) {
            types[i] = rc[i].getType();
            args[i] =
                    rc[i].getName().equals("where") ? null : rc[i].getAccessor().invoke(p);
            if (rc[i].getName().equals("measured") && p.measured() != null) {
                // the lot file as written survives; where it resolves depends on where the part file lies
                dev.ampsieve.catalog.Measured m = p.measured();
                args[i] = new dev.ampsieve.catalog.Measured(m.file(), null, null, m.lot());
            }
        }
        return Part.class.getDeclaredConstructor(types).newInstance(args);
    }

    private static List<Part> unplaced(Catalog c) throws Exception {
        List<Part> out = new java.util.ArrayList<>();
        for (Part p : c.parts().stream()
                .sorted(java.util.Comparator.comparing(Part::id))
                .toList()) {
            out.add(unplaced(p));
        }
        return out;
    }

    @Test
    void demoCatalogSurvivesExportAndImport(@TempDir Path dir) throws Exception {
        Path demo = dev.ampsieve.testing.DemoCatalog.copyTo(dir);
        Path csv = dir.resolve("demo.csv");
        CliRun e = CliRun.of("--catalog", demo.toString(), "export", "--csv", "--out", csv.toString());
        assertEquals(ExitCode.OK.code(), e.code(), e.toString());
        Path into = dir.resolve("again");
        CliRun i = CliRun.of("import", csv.toString(), "--into", into.toString());
        assertEquals(ExitCode.OK.code(), i.code(), i.toString());
        List<Part> before = unplaced(CatalogLoader.load(demo, false));
        assertEquals(48, before.size()); // the demo catalog's part count (ShippedCatalogsTest)
        assertEquals(before, unplaced(CatalogLoader.load(into, true)));
    }

    @Test
    void awkwardTextAndPriceBreaksSurviveExportAndImport(@TempDir Path dir) throws Exception {
        Path cat = Files.createDirectory(dir.resolve("cat"));
        write(cat, "odd.yaml", """
                id: odd-01
                title: "=1+2, a title a spreadsheet would compute"
                architecture: standard
                input: jfet
                tags: ["-minus", "'quoted", "@at"]
                price:
                  - {quantity: 1, unit: 2.10, currency: EUR}
                  - {quantity: 1000, unit: 1.25}
                supply: {min: "4.5 V", max: "36 V"}
                temperature: {min: "-40 C", max: "85 C"}
                vos: {typ: "0.0025 mV", max: "3.3 uV"}
                ib: {typ: "-1.5 pA"}
                gbw: "1.5 MHz"
                noise: {en: "7.7 nV/rtHz"}
                notes: "first line\\nsecond line, with \\"quotes\\""
                """);
        Path csv = dir.resolve("odd.csv");
        assertEquals(
                ExitCode.OK.code(),
                CliRun.of("--catalog", cat.toString(), "export", "--csv", "--out", csv.toString())
                        .code());
        String sheet = Files.readString(csv);
        // defused for a spreadsheet: title, and the list cell that starts with '-'
        assertTrue(sheet.contains("\"'=1+2, a title a spreadsheet would compute\""), sheet);
        assertTrue(sheet.contains("'-minus; 'quoted; @at"), sheet);
        assertTrue(sheet.contains(",EUR,\"1: 2.1; 1000: 1.25\","), sheet);
        Path into = dir.resolve("again");
        CliRun i = CliRun.of("import", csv.toString(), "--into", into.toString());
        assertEquals(ExitCode.OK.code(), i.code(), i.toString());
        Part back = CatalogLoader.load(into, true).parts().get(0);
        assertEquals(unplaced(CatalogLoader.load(cat, true).parts().get(0)), unplaced(back));
        assertEquals("=1+2, a title a spreadsheet would compute", back.title());
        assertEquals(List.of("-minus", "'quoted", "@at"), back.tags());
        assertEquals(new Price(List.of(new Price.Break(1, 2.10), new Price.Break(1000, 1.25)), "EUR"), back.price());
    }

    @Test
    void exportRefusesToReplaceAFileWithoutForce(@TempDir Path dir) throws Exception {
        Path out = write(dir, "mine.csv", "keep me\n");
        CliRun r = CliRun.of("export", "--csv", "--out", out.toString());
        assertEquals(ExitCode.FINDINGS.code(), r.code());
        assertEquals(
                out + ": the file already exists and was left as it was; add --force to replace it, or give another"
                        + " --out FILE\n",
                r.err());
        assertEquals("keep me\n", Files.readString(out));
        assertEquals(
                ExitCode.OK.code(),
                CliRun.of("export", "--csv", "--out", out.toString(), "--force").code());
        assertTrue(Files.readString(out).startsWith("id,title,architecture,input,"));
        assertEquals(List.of("mine.csv"), names(dir));
    }

    @Test
    void newPartLeavesExactlyTheRequiredValuesToType(@TempDir Path dir) throws Exception {
        CliRun r = CliRun.of("new-part", "lownoise-01", "--into", dir.toString());
        assertEquals(ExitCode.OK.code(), r.code(), r.toString());
        Path f = dir.resolve("lownoise-01.yaml");
        Catalog c = CatalogLoader.load(dir, false);
        assertEquals(List.of(), c.parts());
        // one error per value every part needs (CatalogKeys.REQUIRED), and nothing else
        assertEquals(
                List.of(
                        "architecture: required field is missing; add 'architecture: standard'",
                        "input: required field is missing; add 'input: bipolar'",
                        "price.unit: required field is missing; add 'unit: 1.20'",
                        "supply.min: required field is missing; add 'min: 4.5 V'",
                        "supply.max: required field is missing; add 'max: 36 V'",
                        "temperature.min: required field is missing; add 'min: -40 C'",
                        "temperature.max: required field is missing; add 'max: 85 C'",
                        "vos: neither typ nor max is given; add 'max: 2.5 uV' from the datasheet's 25 °C column (typ when it gives"
                                + " no max)",
                        "gbw: required field is missing; add 'gbw: 1 MHz'"),
                c.problems().stream()
                        .map(p -> p.field() + ": " + p.message() + "; " + p.fix())
                        .toList());
        List<String> lines = Files.readAllLines(f);
        assertTrue(lines.contains("id: lownoise-01"));
        for (Problem p : c.problems()) {
            if (!p.field().equals("vos")) { // each is reported on its own empty line
                String key = p.field().substring(p.field().lastIndexOf('.') + 1);
                assertEquals(key + ":", lines.get(p.line() - 1).strip(), p.toString());
            }
        }

        // typed in, the part loads with those values and none of the template's invented optional ones
        String typed = Files.readString(f)
                .replace("architecture:\n", "architecture: standard\n")
                .replace("input:\n", "input: bipolar\n")
                .replace("  unit:\n", "  unit: 1.20\n")
                .replace("  quantity:\n", "  quantity: 100\n")
                .replace("supply:\n  min:\n  max:\n", "supply:\n  min: 4.5 V\n  max: 36 V\n")
                .replace("temperature:\n  min:\n  max:\n", "temperature:\n  min: -40 C\n  max: 85 C\n")
                .replace("  max:\n", "  max: 25 uV\n")
                .replace("gbw:\n", "gbw: 2 MHz\n");
        Files.writeString(f, typed);
        Catalog done = CatalogLoader.load(dir, true);
        Part p = done.parts().get(0);
        assertEquals(new Price(1.20, 100, "USD"), p.price());
        assertEquals(25e-6, p.vos().max(), 1e-18);
        assertNull(p.vos().typ());
        assertNull(p.slew());
        assertNull(p.noise().en());
        assertEquals("", p.title());
    }

    @Test
    void newPartRefusesABadIdAndAnExistingFile(@TempDir Path dir) throws Exception {
        CliRun bad = CliRun.of("new-part", "My_Part", "--into", dir.toString());
        assertEquals(ExitCode.FINDINGS.code(), bad.code());
        assertEquals(
                "id: 'My_Part' is not a valid id (lowercase letters, digits and single dashes, at most 64"
                        + " characters); write for example 'my-part'\n",
                bad.err());
        assertEquals(List.of(), names(dir));
        Path f = write(dir, "amp-01.yaml", "mine\n");
        CliRun again = CliRun.of("new-part", "amp-01", "--into", dir.toString());
        assertEquals(ExitCode.FINDINGS.code(), again.code());
        assertEquals(
                f + ": the file already exists and was left as it was; choose another id, or edit the file that is"
                        + " there\n",
                again.err());
        assertEquals("mine\n", Files.readString(f));
    }

    @Test
    void exportWritesNoWhereALinkPoints(@TempDir Path dir) throws Exception {
        Path victim = write(dir, "victim.txt", "precious\n");
        Path link = Files.createSymbolicLink(dir.resolve("out.csv"), victim);
        CliRun r = CliRun.of("export", "--csv", "--out", link.toString(), "--force");
        assertEquals(ExitCode.FINDINGS.code(), r.code());
        assertEquals(link + ": is a link; left as it was; give the name of a regular file\n", r.err());
        assertEquals("precious\n", Files.readString(victim));
        assertTrue(Files.isSymbolicLink(link));
    }

    @Test
    void importReadsOnlyARegularFile() {
        CliRun r = CliRun.of("import", "/dev/zero", "--into", "/nonexistent-never-made");
        assertEquals(ExitCode.FINDINGS.code(), r.code());
        assertEquals("/dev/zero: not a regular file (a character device); give a CSV file\n", r.err());
        assertTrue(!Files.exists(Path.of("/nonexistent-never-made")));
    }

    @Test
    void exportToTheTerminalEndsLinesWithLineFeedsOnly() {
        CliRun r = CliRun.of("export", "--csv");
        assertEquals(ExitCode.OK.code(), r.code(), r.err());
        assertTrue(
                r.out()
                        .startsWith(
                                "id,title,architecture,input,factory-trim,null-pins,channels,packages,tags,price.unit,"
                                        + "price.quantity,price.currency,price.breaks,\"supply.min [V]\",\"supply.max [V]\","),
                r.out());
        assertEquals(49, r.outLines().size()); // the header and the demo catalog's 48 parts
        assertTrue(!r.out().contains("\r"));
    }
}
