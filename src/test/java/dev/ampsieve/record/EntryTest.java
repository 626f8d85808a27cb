package dev.ampsieve.record;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;

import dev.ampsieve.catalog.Catalog;
import dev.ampsieve.catalog.CatalogLoader;
import dev.ampsieve.catalog.Part;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The canonical catalog entry and its hash: values count, the way the file is written does not. */
class EntryTest {

    @TempDir
    Path dir;

    private static final String PART = """
            parts:
              - id: t-01
                title: Test part
                architecture: standard
                input: bipolar
                price: {unit: 2.30, quantity: 1000, currency: USD}
                supply: {min: "2.7 V", max: "5.5 V"}
                temperature: {min: "-40 C", max: "125 C"}
                vos: {typ: "1 uV", max: "5 uV"}
                gbw: "2 MHz"
                source: invented
            """;

    private Part load(String yaml) throws Exception {
        Path d = Files.createTempDirectory(dir, "c");
        Files.writeString(d.resolve("p.yaml"), yaml);
        Catalog c = CatalogLoader.load(d, true);
        return c.find("t-01").orElseThrow();
    }

    @Test
    void hashIsSha256OfTheCanonicalLines() {
        // printf 'id=x\n' | sha256sum (GNU coreutils 9), run by hand
        assertEquals("6f66afbc2b1ea552d0692a13fd5b19551b5a16b8b85e3c300fb40836c1cbe9a6", Entry.hash(Map.of("id", "x")));
        Map<String, String> m = new LinkedHashMap<>();
        m.put("id", "a\nb");
        m.put("notes", "c\\d");
        // printf 'id=a\\nb\nnotes=c\\\\d\n' | sha256sum: a line feed written \n, a backslash \\
        assertEquals("8af213511d67a2a39eea95a982ba0710c0cf23fc4184119a26eef2af89366054", Entry.hash(m));
    }

    @Test
    void commentsLayoutAndUnitPrefixDoNotChangeTheHashAValueDoes() throws Exception {
        Part a = load(PART);
        // the same values: a comment, flow map written as a block, 5 uV written 0.005 mV, 2 MHz as 2000 kHz
        Part b = load(PART.replace(
                        "    vos: {typ: \"1 uV\", max: \"5 uV\"}\n",
                        "    # checked against revision B\n    vos:\n      max: \"0.005 mV\"\n      typ: \"1 uV\"\n")
                .replace("\"2 MHz\"", "\"2000 kHz\""));
        Part c = load(PART.replace("max: \"5 uV\"", "max: \"6 uV\""));
        assertEquals(Entry.of(a).sha256(), Entry.of(b).sha256());
        assertNotEquals(Entry.of(a).sha256(), Entry.of(c).sha256());
        // the field in SI volts (BigDecimal's own form of 5e-6), and the price break by its quantity
        assertEquals("0.000005", Entry.of(a).fields().get("vos.max"));
        assertEquals("0.000006", Entry.of(c).fields().get("vos.max"));
        assertEquals("2.3", Entry.of(a).fields().get("price.break.1000"));
        assertEquals("invented", Entry.of(a).fields().get("source"));
    }

    @Test
    void aLotMeasuredAgainChangesTheEntryThoughTheYamlDoesNot() throws Exception {
        Path d = Files.createTempDirectory(dir, "m");
        Files.writeString(d.resolve("p.yaml"), PART + "    measured: {file: lot.csv}\n");
        String lot = "unit, vos (uV)\n1, 1.0\n2, -2.0\n3, 0.5\n";
        Files.writeString(d.resolve("lot.csv"), lot);
        Part a = CatalogLoader.load(d, true).find("t-01").orElseThrow();
        Entry ea = Entry.of(a);
        assertEquals("lot.csv", ea.fields().get("measured.file"));
        // the SHA-256 of the lot's bytes (java.security.MessageDigest, a second method to the code's own read)
        String expected = java.util.HexFormat.of()
                .formatHex(java.security.MessageDigest.getInstance("SHA-256")
                        .digest(lot.getBytes(java.nio.charset.StandardCharsets.UTF_8)));
        assertEquals(expected, ea.fields().get("measured.sha256"));
        // unit 2 measured again: the YAML is untouched, the entry (and so a re-check) sees the change
        Files.writeString(d.resolve("lot.csv"), lot.replace("-2.0", "-2.5"));
        Entry eb = Entry.of(CatalogLoader.load(d, true).find("t-01").orElseThrow());
        assertNotEquals(ea.sha256(), eb.sha256());
        assertEquals(
                java.util.List.of(new Finding.FieldChange(
                        "measured.sha256",
                        ea.fields().get("measured.sha256"),
                        eb.fields().get("measured.sha256"))),
                Recheck.changes(ea.fields(), eb.fields()));
    }
}
