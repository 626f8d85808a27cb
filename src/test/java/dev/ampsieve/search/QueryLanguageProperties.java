package dev.ampsieve.search;

import dev.ampsieve.testing.FixtureCatalog;
import dev.ampsieve.testing.Mutations;
import dev.ampsieve.testing.Props;
import dev.ampsieve.yaml.InputException;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.quicktheories.api.Pair;
import org.quicktheories.core.Gen;
import org.quicktheories.generators.Generate;
import org.quicktheories.generators.SourceDSL;
import org.quicktheories.impl.Constraint;

/**
 * Whatever a user types after {@code find}, {@link QueryLanguage#parse} gives a query that the
 * index can run, or an {@link InputException} whose every problem names the term and says what
 * to write; never another exception.
 */
class QueryLanguageProperties {

    /** The README's and the grammar help's examples, and the golden queries. */
    static final List<String> EXAMPLES = List.of(
            "zero-drift 'vos<10uV' 'supply>=5V'",
            "zero-drift vos<10uV supply>=5V sot-23",
            "input:cmos architecture:zero-drift package:sot-23 tag:x rail:output trim:laser",
            "field=lo..hi",
            "supply=4.5V..5.5V",
            "temperature>=125C",
            "temp<=-55C",
            "temperature=-40C..125C",
            "vos<10uV",
            "vos<=10uV",
            "vos.max<200uV",
            "vos.typ<=10uV",
            "drift<1uV/C",
            "ib<1nA",
            "en<=10nV/rtHz",
            "cmrr>=100dB",
            "cmrr>90",
            "aol=100dB",
            "gbw=1MHz..10MHz",
            "gbw=10MHz..",
            "gbw=..1MHz",
            "gbw=1000kHz",
            "slew>=10V/us",
            "input:jfet price<2",
            "price<0.5",
            "iq<100uA",
            "fchop>1kHz",
            "channels>=2",
            "supply>5.5V",
            "supply<1.8V",
            "vos < 10 uV",
            "input:cmos gbw = 1MHz .. 20MHz",
            "-chopper rail:input",
            "id:px-404",
            "package:sot-23-5",
            "offset<1mV tc<=0.5uV/C quiescent<1mA pkg:msop-8 arch:chopper",
            "in<1pA/rtHz en.corner<10Hz in.corner<=100Hz ios.max<1nA ib.maxtemp<5nA aging<1uV vos.maxtemp<50uV",
            "psrr.min>100dB cmrr.typ>=120dB aol.min>=110dB supply.min<=3V supply.max>=36V temperature.min<=-40C");

    /** Many examples in a row, or one word of many hyphenated pieces: queries longer than anyone types. */
    private static final Gen<String> LONG = in -> {
        int n = (int) in.next(Constraint.between(0, 600));
        if (Mutations.pick(in, 2) == 0) {
            return "a-".repeat(n * 2) + "a";
        }
        StringBuilder b = new StringBuilder();
        for (int i = 0; i < n; i++) {
            b.append(EXAMPLES.get(Mutations.pick(in, EXAMPLES.size()))).append(' ');
        }
        return b.toString();
    };

    private static final Gen<String> QUERY = Generate.frequency(List.of(
            Pair.of(1, LONG),
            Pair.of(6, Mutations.mutated(EXAMPLES, 5)),
            Pair.of(2, Mutations.noise(40)),
            Pair.of(1, SourceDSL.strings().allPossible().ofLengthBetween(0, 30))));

    private static PartIndex index;

    @BeforeAll
    static void build() {
        index = PartIndex.inMemory(FixtureCatalog.catalog(Path.of("no-such-folder")));
    }

    @AfterAll
    static void close() throws Exception {
        index.close();
    }

    @Test
    void anyQueryRunsOrIsRefusedWithTypedProblems() {
        Props.theory(1000)
                .forAll(QUERY)
                .checkAssert(q -> Props.onlyTyped(
                        q,
                        InputException.class,
                        QueryLanguageProperties::sound,
                        () -> index.search(QueryLanguage.parse(q))));
    }

    /** Every problem is an error that names the query term (or the whole query) and gives a message and a fix. */
    static boolean sound(InputException e) {
        return !e.problems().isEmpty()
                && e.problems().stream()
                        .allMatch(p -> p.isError()
                                && (p.field().startsWith("query term '")
                                        || p.field().equals("query"))
                                && !p.message().isBlank()
                                && !p.fix().isBlank());
    }
}
