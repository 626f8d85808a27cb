package dev.ampsieve.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.ampsieve.testing.DemoCatalog;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * {@code record} and {@code recheck} end to end: one record of the demo bridge stage, re-checked
 * against copies of the demo catalog edited the way a datasheet revision would.
 */
class RecordCommandTest {

    @TempDir
    static Path dir;

    static final String STAGE = "demo-catalog/stages/bridge-amp.yaml";
    static Path catalog;
    static Path record;

    @BeforeAll
    static void writeRecord() throws Exception {
        catalog = DemoCatalog.copyTo(dir.resolve("recorded"));
        record = dir.resolve("bridge.html");
        CliRun r = CliRun.of("--catalog", catalog.toString(), "record", "--stage", STAGE, "--html", record.toString());
        assertEquals(0, r.code(), r.toString());
    }

    /** A fresh copy of the demo catalog for one test to edit. */
    private static Path copy(String name) throws Exception {
        return DemoCatalog.copyTo(dir.resolve(name));
    }

    @Test
    void nothingChangedHoldsWithTheRecordedCatalog() {
        // no --catalog: the folder the record names
        CliRun r = CliRun.of("recheck", record.toString());
        assertEquals(0, r.code(), r.toString());
        assertTrue(r.out().startsWith(record + ": holds"), r.out());
        assertTrue(r.out().contains("checked against " + catalog), r.out());
    }

    @Test
    void anEditedFieldIsNamedWithOldAndNewValues() throws Exception {
        Path c = copy("edited");
        Path f = c.resolve("zero-drift/chopper.yaml");
        String text = Files.readString(f);
        // zd-chop-01's datasheet revision: vos max 5 -> 50 uV, over temperature 7 -> 60 uV; and a comment
        String edited = text.replace(
                "vos: {typ: \"1 uV\", max: \"5 uV\", max-over-temp: \"7 uV\"}",
                "# revision C\n    vos: {typ: \"1 uV\", max: \"50 uV\", max-over-temp: \"60 uV\"}");
        assertTrue(!edited.equals(text), "the fixture line is in the demo file");
        Files.writeString(f, edited);
        CliRun r = CliRun.of("--catalog", c.toString(), "recheck", record.toString());
        assertEquals(1, r.code(), r.toString());
        assertTrue(
                r.out()
                        .contains("zd-chop-01: catalog entry changed:\n    vos.max: 5.00 µV -> 50.0 µV\n"
                                + "    vos.max-over-temp: 7.00 µV -> 60.0 µV\n"),
                r.out());
        // initial offset 97.61 × 50 µV = 4.88 mV now exceeds the resistor-ratio term's 1.65 mV (by hand)
        assertTrue(r.out().contains("zd-chop-01: largest term resistor ratio -> initial offset"), r.out());
    }

    @Test
    void aChangedStringReachesTheTerminalOnlyAsEscapes() throws Exception {
        Path c = copy("hostile");
        Path f = c.resolve("zero-drift/chopper.yaml");
        // the chopper file's sources (zd-chop-01 among them) gain an ESC sequence (YAML's \e) that would turn a
        // terminal red
        Files.writeString(
                f, Files.readString(f).replace("source: invented demo data", "source: \"invented demo data\\e[31m\""));
        CliRun r = CliRun.of("--catalog", c.toString(), "recheck", record.toString());
        assertEquals(1, r.code(), r.toString());
        assertTrue(
                r.out().contains("    source: \"invented demo data\" -> \"invented demo data\\x1b[31m\"\n"), r.out());
        assertTrue(!r.out().contains("\u001b"), "no raw ESC");
    }

    @Test
    void aCommentOnlyEditChangesNothing() throws Exception {
        Path c = copy("commented");
        Path f = c.resolve("zero-drift/chopper.yaml");
        Files.writeString(
                f,
                "# checked against the current revisions\n"
                        + Files.readString(f)
                                .replace("gbw: \"2 MHz\"", "gbw: \"2000 kHz\"  # same value, other prefix"));
        CliRun r = CliRun.of("--catalog", c.toString(), "recheck", record.toString());
        assertEquals(0, r.code(), r.toString());
    }

    @Test
    void aRemovedPartIsReported() throws Exception {
        Path c = copy("removed");
        Path f = c.resolve("zero-drift/auto-zero.yaml");
        String text = Files.readString(f);
        int from = text.indexOf("  - id: zd-az-06");
        int to = text.indexOf("\n  - id:", from + 1);
        Files.writeString(f, text.substring(0, from) + (to < 0 ? "" : text.substring(to + 1)));
        CliRun r = CliRun.of("--catalog", c.toString(), "recheck", record.toString());
        assertEquals(1, r.code(), r.toString());
        assertTrue(r.out().contains("  zd-az-06: no longer in the catalog\n"), r.out());
    }

    @Test
    void aCheaperFittingPartIsReported() throws Exception {
        Path c = copy("cheaper");
        String chop = Files.readString(c.resolve("zero-drift/chopper.yaml"));
        int from = chop.indexOf("  - id: zd-chop-01");
        int to = chop.indexOf("\n  - id:", from + 1);
        // the same figures as zd-chop-01 (which fits) at 1.00 instead of 2.30: it fits, and is cheaper
        String twin = chop.substring(from, to)
                .replace("id: zd-chop-01", "id: zd-chop-09")
                .replace("price: {unit: 2.30", "price: {unit: 1.00");
        Files.writeString(c.resolve("zero-drift/twin.yaml"), "parts:\n" + twin + "\n");
        CliRun r = CliRun.of("--catalog", c.toString(), "recheck", record.toString());
        assertEquals(1, r.code(), r.toString());
        assertTrue(
                r.out()
                        .contains("zd-chop-09 now fits at 1.00 USD, cheaper than the recorded cheapest fitting part"
                                + " zd-chop-01 at 2.30 USD"),
                r.out());
    }

    @Test
    void aFileThatIsNotARecordIsRefusedByName() throws Exception {
        Path notes = dir.resolve("notes.md");
        Files.writeString(notes, "# my notes\n");
        CliRun r = CliRun.of("recheck", notes.toString(), record.toString());
        assertEquals(1, r.code(), r.toString());
        assertTrue(r.err().contains(notes + ": is not an ampsieve decision record"), r.err());
        assertTrue(r.err().contains("give an .html or .md file written by 'ampsieve record'"), r.err());
        // the other record is still checked
        assertTrue(r.out().contains(record + ": holds"), r.out());
    }

    @Test
    void aDamagedBlockIsNamedWithTheFix() throws Exception {
        Path bad = dir.resolve("damaged.md");
        Files.writeString(
                bad, "# a record\n<!-- ampsieve-decision-record\n{\"recordFormat\": 1, \"kind\": \"shortlist\"\n-->\n");
        CliRun r = CliRun.of("recheck", bad.toString());
        assertEquals(1, r.code(), r.toString());
        assertTrue(r.err().startsWith(bad + ": ampsieve-decision-record: the record's block is damaged ("), r.err());
        assertTrue(
                r.err()
                        .contains(
                                "write the record again with 'ampsieve record', or restore the file from version control"),
                r.err());
    }

    @Test
    void anotherFileIsNeverOverwrittenWithoutForce() throws Exception {
        Path mine = dir.resolve("mine.html");
        Files.writeString(mine, "<p>my own page</p>\n");
        CliRun r = CliRun.of("--catalog", catalog.toString(), "record", "--stage", STAGE, "--html", mine.toString());
        assertEquals(1, r.code(), r.toString());
        assertTrue(
                r.err()
                        .contains(mine + ": exists and is not an ampsieve decision record; left as it was;"
                                + " choose another name, or add --force to replace it"),
                r.err());
        assertEquals("<p>my own page</p>\n", Files.readString(mine));
        CliRun forced = CliRun.of(
                "--catalog", catalog.toString(), "record", "--stage", STAGE, "--md", mine.toString(), "--force");
        assertEquals(0, forced.code(), forced.toString());
        assertTrue(Files.readString(mine).startsWith("# Part selection record for bridge-amp.yaml"));
    }

    @Test
    void aPreviousRecordIsReplacedAndAChangeRecordReChecks() throws Exception {
        Path md = dir.resolve("change.md");
        Files.writeString(md, "placeholder <!-- ampsieve-decision-record\n{}\n-->\n");
        CliRun r = CliRun.of(
                "--catalog",
                catalog.toString(),
                "record",
                "--stage",
                STAGE,
                "--change",
                "prec-bip-02",
                "zd-chop-01",
                "--md",
                md.toString());
        assertEquals(0, r.code(), r.toString());
        String text = Files.readString(md);
        assertTrue(text.startsWith("# Part change record: prec-bip-02 to zd-chop-01 for bridge-amp.yaml"));
        assertTrue(text.contains("## Change from prec-bip-02 to zd-chop-01"));
        assertEquals(0, CliRun.of("recheck", md.toString()).code());
    }

    @Test
    void anUnknownPartIsNamedWithTheClosestId() {
        CliRun r = CliRun.of(
                "--catalog",
                catalog.toString(),
                "record",
                "--stage",
                STAGE,
                "--parts",
                "zd-chop-1",
                "--html",
                dir.resolve("x.html").toString());
        assertEquals(1, r.code(), r.toString());
        assertTrue(r.err().contains("no part 'zd-chop-1' in the catalog"), r.err());
        assertTrue(!Files.exists(dir.resolve("x.html")));
    }
}
