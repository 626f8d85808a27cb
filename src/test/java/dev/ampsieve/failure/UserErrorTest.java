package dev.ampsieve.failure;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import dev.ampsieve.units.UnitException;
import dev.ampsieve.yaml.InputException;
import dev.ampsieve.yaml.Located;
import dev.ampsieve.yaml.Problem;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;

/** The error model's shapes: each carries a typed place and an exit code of the one enum. */
class UserErrorTest {

    @Test
    void exitCodesKeepTheirNumbers() {
        // the numbers scripts rely on, as the command line's --help footer states them
        assertEquals(
                List.of(0, 1, 2, 3),
                List.of(ExitCode.OK.code(), ExitCode.FINDINGS.code(), ExitCode.USAGE.code(), ExitCode.INTERNAL.code()));
    }

    @Test
    void findingsInAFileArePlacedAtTheFirstProblem() {
        Path f = Path.of("amp.yaml");
        InputException e = new InputException(List.of(
                Problem.error(new Located(f, 5, 6), "gbw", "wrong unit", "write a frequency"),
                Problem.error(new Located(f, 9, 1), "vos.max", "missing", "")));
        assertEquals(new Place(f, 5, 6, "gbw"), e.place());
        assertEquals(ExitCode.FINDINGS, e.exitCode());
        assertEquals(
                List.of("amp.yaml:5:6: gbw: wrong unit; write a frequency", "amp.yaml:9:1: vos.max: missing"),
                e.lines());
    }

    @Test
    void aValueWithoutAPlaceSaysSo() {
        UnitException e = new UnitException("'3 kV' is a voltage", "write a resistance");
        assertEquals(Place.NONE, e.place());
        assertEquals(ExitCode.FINDINGS, e.exitCode());
        assertEquals(List.of("'3 kV' is a voltage; write a resistance"), e.lines());
    }

    @Test
    void aRefusalCarriesItsOwnCodeAndPlace() {
        Refusal r = new Refusal("--top must be 1 or more, not 0", ExitCode.USAGE, Place.field("--top"));
        assertEquals(ExitCode.USAGE, r.exitCode());
        assertEquals(new Place(null, 0, 0, "--top"), r.place());
        assertEquals(ExitCode.FINDINGS, new Refusal("no part 'x'").exitCode());
        // a control character the user typed is shown, never sent to the terminal
        assertEquals(List.of("no part 'a\\x1bb'"), new Refusal("no part 'a\u001bb'").lines());
    }

    @Test
    void aRefusalIsNeverASuccessNorAnInternalError() {
        assertThrows(IllegalArgumentException.class, () -> new Refusal("fine", ExitCode.OK));
        assertThrows(IllegalArgumentException.class, () -> new Refusal("bug", ExitCode.INTERNAL));
    }

    @Test
    void aPlaceHasNoColumnWithoutALine() {
        assertEquals(new Place(Path.of("s.yaml"), 0, 0, ""), new Place(Path.of("s.yaml"), 0, 7, null));
        assertEquals(Place.of(Path.of("s.yaml")), new Place(Path.of("s.yaml"), -3, 2, ""));
    }
}
