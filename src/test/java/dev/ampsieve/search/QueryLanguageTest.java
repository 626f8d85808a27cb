package dev.ampsieve.search;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.ampsieve.testing.FixtureCatalog;
import dev.ampsieve.yaml.InputException;
import dev.ampsieve.yaml.Problem;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;

class QueryLanguageTest {

    private static Problem onlyProblem(String query) {
        InputException e = assertThrows(InputException.class, () -> QueryLanguage.parse(query));
        assertEquals(1, e.problems().size(), e.getMessage());
        Problem p = e.problems().get(0);
        assertTrue(p.isError());
        assertTrue(!p.toString().contains("\n"), "one line: " + p);
        return p;
    }

    @Test
    void unknownFieldSuggestsTheNearestName() {
        Problem p = onlyProblem("vso<10uV");
        assertEquals("unknown field 'vso'", p.message());
        assertEquals("did you mean 'vos'?", p.fix());
        assertEquals("query term 'vso<10uV'", p.field());
    }

    @Test
    void unknownFieldFarFromAnyNameSaysWhereTheFieldsAreListed() {
        // no field name is within edit distance 2 of "wobble": the fix points at the reference
        Problem p = onlyProblem("wobble>3");
        assertEquals("'ampsieve help query' lists every field", p.fix());
    }

    @Test
    void unknownFieldSuggestsByEditDistanceNotBySubstring() {
        // "nullpins" is one insertion from "null-pins"; "gbwx" one deletion from "gbw"
        assertEquals("did you mean 'null-pins'?", onlyProblem("nullpins:true").fix());
        assertEquals("did you mean 'gbw'?", onlyProblem("gbwx>1MHz").fix());
        // by hand: "pricequantity" is 1 edit from "price.quantity" and 4 from "price.unit" (q->., drop a, t, y),
        // within the 13/3 = 4 allowed; "price" itself, a substring, is 8 away and not offered
        assertEquals(
                "did you mean 'price.quantity' or 'price.unit'?",
                onlyProblem("pricequantity>10").fix());
        // by hand: "drif" is 1 from "drift" and 2 from "trim" (d->t, f->m), nearest first; others 3 or more
        assertEquals(
                "did you mean 'drift' or 'trim'?", onlyProblem("drif<1uV/C").fix());
    }

    @Test
    void everyCatalogKeyIsAQueryName() {
        // each key a catalog file may hold, as the user typed it, is searchable (dotted for section keys)
        java.util.Set<String> names = new java.util.HashSet<>(Schema.queryNames());
        for (String key : dev.ampsieve.catalog.CatalogKeys.PART_KEYS) {
            List<String> sub = dev.ampsieve.catalog.CatalogKeys.subKeys(key);
            if (sub.isEmpty() || key.equals("supply") || key.equals("temperature")) {
                assertTrue(names.contains(key), key);
            }
            for (String k : sub) {
                assertTrue(names.contains(key + "." + k), key + "." + k);
            }
        }
    }

    @Test
    void textFieldsAndBooleansParse() throws InputException {
        PartQuery q = QueryLanguage.parse("null-pins:true -notes:settling factory-trim:laser");
        PartQuery.KeywordIs pins = (PartQuery.KeywordIs) q.clauses().get(0);
        assertEquals(Schema.NULL_PINS, pins.field().name());
        assertEquals("true", pins.value());
        PartQuery.WordIn notes = (PartQuery.WordIn) q.clauses().get(1);
        assertEquals(Schema.NOTES, notes.field().name());
        assertTrue(notes.excluded());
        assertEquals(
                Schema.TRIM, ((PartQuery.KeywordIs) q.clauses().get(2)).field().name());
        assertEquals(
                "did you mean 'null-pins:true'?", onlyProblem("null-pins:treu").fix());
    }

    @Test
    void aliasIsAccepted() throws InputException {
        PartQuery q = QueryLanguage.parse("temp>=125C offset<1mV");
        assertEquals(
                Schema.TEMPERATURE,
                ((PartQuery.RatedAt) q.clauses().get(0)).field().name());
        assertEquals(
                Schema.VOS, ((PartQuery.NumberIs) q.clauses().get(1)).field().name());
    }

    @Test
    void wrongDimensionIsNamed() {
        Problem p = onlyProblem("vos<5nA");
        assertEquals("'5nA' is a current but a voltage belongs here", p.message());
        assertTrue(p.fix().contains("2.5 uV"), p.fix());
    }

    @Test
    void missingUnitIsAnError() {
        Problem p = onlyProblem("gbw>10");
        assertTrue(p.message().contains("has no unit"), p.message());
    }

    @Test
    void unitWrittenApartFromItsNumberIsJoined() throws InputException {
        PartQuery q = QueryLanguage.parse("gbw > 10 MHz chopper");
        assertEquals(2, q.clauses().size());
        PartQuery.NumberIs n = (PartQuery.NumberIs) q.clauses().get(0);
        assertEquals(PartQuery.Op.GT, n.op());
        assertEquals(10e6, n.lo(), 10e6 * 2e-9);
        assertEquals(Double.POSITIVE_INFINITY, n.hi());
        assertInstanceOf(PartQuery.Word.class, q.clauses().get(1));
    }

    @Test
    void keywordValueIsCheckedWithSuggestion() {
        Problem p = onlyProblem("input:cmso");
        assertEquals("'cmso' is not a value of 'input'", p.message());
        assertEquals("did you mean 'input:cmos'?", p.fix());
    }

    @Test
    void comparisonOnAWordFieldAndWordOnANumberAreRefused() {
        assertEquals(
                "'input' is a word field, not a number", onlyProblem("input<3").message());
        assertEquals("'vos' is a voltage, not a word", onlyProblem("vos:low").message());
    }

    @Test
    void reversedRangeEmptyValueAndNegatedComparison() {
        assertEquals(
                "the lower end is above the upper end",
                onlyProblem("gbw=10MHz..1MHz").message());
        assertEquals("no value after '<'", onlyProblem("vos<").message());
        assertEquals("a range takes '=', not '<'", onlyProblem("gbw<1MHz..2MHz").message());
        assertEquals(
                "a comparison cannot be excluded with '-'",
                onlyProblem("-vos<1uV").message());
    }

    @Test
    void everyBadTermIsReportedOnItsOwnLine() {
        InputException e = assertThrows(InputException.class, () -> QueryLanguage.parse("vso<1uV chopper ib<2V"));
        assertEquals(
                List.of("query term 'vso<1uV'", "query term 'ib<2V'"),
                e.problems().stream().map(Problem::field).toList());
    }

    @Test
    void strictAndInclusiveBoundsDifferOnlyAtTheValue() throws InputException {
        PartQuery.NumberIs lt =
                (PartQuery.NumberIs) QueryLanguage.parse("vos<10uV").clauses().get(0);
        PartQuery.NumberIs le =
                (PartQuery.NumberIs) QueryLanguage.parse("vos<=10uV").clauses().get(0);
        double ten = 10e-6;
        assertTrue(lt.hi() < ten && le.hi() >= ten);
        assertEquals(ten, lt.hi(), ten * 2e-9);
        assertEquals(ten, le.hi(), ten * 2e-9);
    }

    @Test
    void sameValueSpeltTwoWaysComparesEqual() throws InputException {
        // 10 * 1e-6 and 0.01 * 1e-3 differ in the last binary digit
        PartQuery.NumberIs q =
                (PartQuery.NumberIs) QueryLanguage.parse("vos=0.01mV").clauses().get(0);
        double catalogValue = 10 * 1e-6;
        assertTrue(q.lo() <= catalogValue && catalogValue <= q.hi());
    }

    @Test
    void emptyAndPunctuationOnlyQueriesMatchEverything() throws InputException {
        assertTrue(QueryLanguage.parse("").isEmpty());
        assertTrue(QueryLanguage.parse("  , ").isEmpty());
    }

    @Test
    void helpNamesEveryNumericFieldAndFitsIn100Columns() {
        String all = String.join(" ", QueryLanguage.helpLines());
        String numbers = all.substring(all.indexOf("Numbers:") + 8, all.indexOf("Aliases:"));
        List<String> listed = List.of(numbers.strip().replaceAll("\\.$", "").split("\\s+"));
        assertEquals(Schema.NUMERIC.stream().map(Schema.Numeric::name).toList(), listed);
        for (String alias : Schema.ALIASES.keySet()) {
            assertTrue(all.substring(all.indexOf("Aliases:")).contains(alias), alias);
        }
        for (String line : QueryLanguage.helpLines()) {
            assertTrue(line.length() <= 100, line);
            assertTrue(!line.contains("%"), "picocli formats the footer: " + line);
        }
    }

    // Regression cases found by QueryLanguageProperties: Lucene refuses a query of more than 1024
    // clauses with IndexSearcher.TooManyClauses, which reached the user as an internal error.

    @Test
    void aQueryOfMoreThan64TermsIsRefusedAsAWhole() {
        Problem p = onlyProblem("vos<1V ".repeat(1100));
        assertEquals("query", p.field());
        assertEquals("too many terms (1100; at most 64)", p.message());
    }

    @Test
    void sixtyFourTermsStillRun() throws Exception {
        try (PartIndex index = PartIndex.inMemory(FixtureCatalog.catalog(Path.of("no-such-folder")))) {
            // every fixture part lacks a vos of 2 V or more, so none matches; the point is that the search runs
            assertEquals(List.of(), index.search(QueryLanguage.parse("vos>=2V ".repeat(64))));
            // 64 exclusions of a word no part has: every one of the eight fixture parts remains
            assertEquals(
                    8,
                    index.search(QueryLanguage.parse("-nosuchword ".repeat(64))).size());
        }
    }

    @Test
    void aWordOfMoreThan197HyphenatedPiecesIsRefused() {
        // "a-a-...-a" with 1101 pieces: 1101 piece searches plus the whole, joined and pieced forms
        Problem p = onlyProblem("a-".repeat(1100) + "a");
        assertEquals("query", p.field());
        assertEquals("the words are too many or too long (1104 word searches; at most 200)", p.message());
    }

    @Test
    void aWordOf197PiecesStillRuns() throws Exception {
        try (PartIndex index = PartIndex.inMemory(FixtureCatalog.catalog(Path.of("no-such-folder")))) {
            // 197 pieces + 3 = 200 word searches, the most allowed; no fixture part has the piece "zq"
            assertEquals(List.of(), index.search(QueryLanguage.parse("zq-".repeat(196) + "zq")));
        }
    }

    @Test
    void theExampleInAFixIsInTheFieldsOwnRange() {
        // a supply is volts: the fix shows 5 V, not the microvolts of an offset
        assertEquals(
                "write a voltage with its unit, such as '5 V'",
                onlyProblem("supply>=5").fix());
        assertEquals(
                "write a voltage with its unit, such as '5 V'",
                onlyProblem("supply.min<3").fix());
        assertEquals(
                "write a voltage with its unit, such as '2.5 uV'",
                onlyProblem("vos<10").fix());
    }

    @Test
    void aUnitWrittenApartInTheWrongCaseGetsThePrefixFix() {
        Problem p = onlyProblem("vos<10 UV");
        assertEquals("query term 'vos<10 UV'", p.field());
        assertEquals("write '10uV' (prefixes are case-sensitive: m milli, M mega, k kilo, u micro)", p.fix());
    }
}
