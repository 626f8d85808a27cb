package dev.ampsieve.report;

import dev.ampsieve.catalog.Catalog;
import dev.ampsieve.catalog.CatalogLoader;
import dev.ampsieve.catalog.Part;
import dev.ampsieve.record.DecisionRecord;
import dev.ampsieve.stage.Stage;
import dev.ampsieve.stage.StageLoader;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

/** Records of the demo catalog's bridge stage, and a catalog holding one part with hostile strings. */
final class RecordFixtures {
    private RecordFixtures() {}

    static final Path BRIDGE = Path.of("demo-catalog/stages/bridge-amp.yaml");

    /** The title and notes of the hostile part, as a YAML double-quoted scalar gives them (\e is ESC). */
    static final String EVIL_TITLE = "<script>alert(1)</script>";

    static final String EVIL_NOTES = "a | b\u001b[31m red\nnext =cmd </script> --> x";

    /** zd-chop-01 of the demo catalog under another id, with hostile strings in title, notes and source. */
    static final String EVIL = """
            parts:
              - id: evil-01
                title: "<script>alert(1)</script>"
                architecture: chopper
                input: cmos
                price: {unit: 2.30, quantity: 1000, currency: USD}
                supply: {min: "2.7 V", max: "5.5 V"}
                temperature: {min: "-40 C", max: "125 C"}
                vos: {typ: "1 uV", max: "5 uV", max-over-temp: "7 uV"}
                vos-drift: {typ: "0.01 uV/C", max: "0.03 uV/C"}
                ib: {typ: "100 pA", max: "400 pA", max-over-temp: "1.5 nA"}
                ios: {typ: "150 pA", max: "600 pA", max-over-temp: "2 nA"}
                cmrr: {min: "120 dB", typ: "135 dB"}
                psrr: {min: "120 dB", typ: "135 dB"}
                aol: {min: "125 dB", typ: "140 dB"}
                gbw: "2 MHz"
                slew: "1 V/us"
                noise: {en: "22 nV/rtHz", en-corner: "0 Hz", in: "0.15 pA/rtHz"}
                long-term-drift: {value: "0.05 uV", per: "1000 h"}
                chopping-frequency: "100 kHz"
                input-headroom: {low: "-0.1 V", high: "-0.1 V"}
                output-headroom: {low: "0.03 V", high: "0.03 V"}
                source: "=cmd|calc"
                notes: "a | b\\e[31m red\\nnext =cmd </script> --> x"
            """;

    static DecisionRecord bridge() throws Exception {
        Catalog c = CatalogLoader.load(Path.of("demo-catalog"), false);
        Stage s = StageLoader.load(BRIDGE);
        return DecisionRecord.build(
                s, BRIDGE.toString(), "demo-catalog", c.parts(), null, false, "2026-12-02T08:00:00Z", "test");
    }

    static DecisionRecord evil(Path dir) throws Exception {
        Path cat = dir.resolve("evil-catalog");
        Files.createDirectories(cat);
        Files.writeString(cat.resolve("evil.yaml"), EVIL);
        Catalog c = CatalogLoader.load(cat, true);
        Part p = c.find("evil-01").orElseThrow();
        Stage s = StageLoader.load(BRIDGE);
        return DecisionRecord.build(
                s, BRIDGE.toString(), cat.toString(), c.parts(), List.of(p), false, "2026-12-02T08:00:00Z", "test");
    }

    static Path write(Path dir, String name, String text) throws IOException {
        Path f = dir.resolve(name);
        Files.writeString(f, text);
        return f;
    }
}
