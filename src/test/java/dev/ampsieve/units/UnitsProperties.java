package dev.ampsieve.units;

import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.ampsieve.testing.Mutations;
import dev.ampsieve.testing.Props;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Set;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.Test;
import org.quicktheories.core.Gen;
import org.quicktheories.generators.Generate;
import org.quicktheories.generators.SourceDSL;

/**
 * Whatever text a user types as a quantity, {@link Units#parse} gives a finite value (never
 * below absolute zero for a temperature) that {@link Units#format} prints without failing, or a
 * {@link UnitException} with a problem and a fix; never another exception. (Field-specific
 * bounds, such as "vos above 1 V", are the catalog's and the stage's, tested there.)
 */
class UnitsProperties {

    /** Every quoted quantity in the demo catalog and stages, and each dimension's own example. */
    static List<String> examples() {
        Set<String> out = new LinkedHashSet<>();
        Pattern quoted = Pattern.compile("\"([-+]?[0-9.][^\"]*)\"");
        List<String> texts = new ArrayList<>(Mutations.yamlTexts(Path.of("demo-catalog"), false));
        texts.addAll(Mutations.yamlTexts(Path.of("demo-catalog"), true));
        for (String t : texts) {
            Matcher m = quoted.matcher(t);
            while (m.find()) {
                out.add(m.group(1));
            }
        }
        for (Dimension d : Dimension.values()) {
            out.add(d.example());
        }
        out.addAll(List.of(
                "10k", "2M", "110 dB", "1 V/mV", "300 K", "25 ppm/C", "0.5 V/us", "3 fA/√Hz", "1 month", "-40 °C"));
        return List.copyOf(out);
    }

    private static final Gen<String> TEXT = Generate.frequency(List.of(
            org.quicktheories.api.Pair.of(6, Mutations.mutated(examples(), 4)),
            org.quicktheories.api.Pair.of(2, Mutations.noise(24)),
            org.quicktheories.api.Pair.of(1, SourceDSL.strings().allPossible().ofLengthBetween(0, 16))));

    private static final Gen<Dimension> DIMENSION = Generate.enumValues(Dimension.class);

    @Test
    void anyTextParsesToAFiniteValueOrATypedError() {
        Props.theory(2000)
                .forAll(TEXT, DIMENSION)
                .checkAssert((text, d) -> Props.onlyTyped(
                        text + " as " + d,
                        UnitException.class,
                        e -> !e.problem().isBlank() && !e.fix().isBlank(),
                        () -> {
                            double v = Units.parse(text, d);
                            assertTrue(Double.isFinite(v), () -> Props.escape(text) + " as " + d + " gave " + v);
                            // printing it back never fails, even where percent or ppm overflow a double
                            assertTrue(
                                    !Units.format(v, d).isBlank(),
                                    () -> Props.escape(text) + " as " + d + " printed blank");
                            if (d == Dimension.TEMPERATURE) {
                                assertTrue(v >= -273.15, () -> Props.escape(text) + " gave " + v + " °C");
                            }
                        }));
    }
}
