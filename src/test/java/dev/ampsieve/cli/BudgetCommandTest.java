package dev.ampsieve.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import dev.ampsieve.catalog.Catalog;
import dev.ampsieve.fixtures.PartFixture;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;

class BudgetCommandTest {

    private static Catalog catalog() {
        PartFixture a = PartFixture.ideal();
        a.id = "prec-amp-01";
        PartFixture b = PartFixture.ideal();
        b.id = "fast-amp-02";
        return new Catalog(Path.of("cat"), List.of(a.build(), b.build()), List.of(), 1);
    }

    @Test
    void unknownPartSuggestsTheClosestId() {
        UserException e = assertThrows(UserException.class, () -> BudgetCommand.find(catalog(), "prec-amp01"));
        assertEquals("no part 'prec-amp01' in the catalog cat; did you mean 'prec-amp-01'?", e.getMessage());
        assertEquals(ExitCode.FINDINGS, e.exitCode());
    }

    @Test
    void farOffIdsGetNoGuess() {
        UserException e = assertThrows(UserException.class, () -> BudgetCommand.find(catalog(), "zzzzzzzzzz"));
        assertEquals("no part 'zzzzzzzzzz' in the catalog cat; 'ampsieve check' lists what was read", e.getMessage());
    }

    @Test
    void knownPartIsFound() {
        assertEquals("fast-amp-02", BudgetCommand.find(catalog(), "fast-amp-02").id());
    }
}
