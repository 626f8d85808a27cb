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
 * Whatever text a user types as a quantity, {@link Units#parse} gives a finite value within
 * 1e-100..1e100 in magnitude (never below absolute zero for a temperature) or a {@link UnitException} with a problem and a fix;
 * never another exception.
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
        out.addAll(List.of("10k", "2M", "110 dB", "1 V/mV", "300 K", "25 ppm/C", "0.5 V/us", "3 fA/√Hz", "1 month", "-40 °C"));
        return List.copyOf(out);
    }

    private static final Gen<String> TEXT = Generate.frequency(List.of(
            org.quicktheories.api.Pair.of(6, Mutations.mutated(examples(), 4)),
            org.quicktheories.api.Pair.of(2, Mutations.noise(24)),
            org.quicktheories.api.Pair.of(1, SourceDSL.strings().allPossible().ofLengthBetween(0, 16))));

    private static final Gen<Dimension> DIMENSION = Generate.enumValues(Dimension.class);

    @Test
    void anyTextParsesToAFiniteValueOrATypedError() {
        Props.theory(2000).forAll(TEXT, DIMENSION).checkAssert((text, d) -> Props.onlyTyped(text + " as " + d,
                UnitException.class, e -> !e.problem().isBlank() && !e.fix().isBlank(), () -> {
                    double v = Units.parse(text, d);
                    assertTrue(Double.isFinite(v), () -> Props.escape(text) + " as " + d + " gave " + v);
                    // within the range Units reads, so a value printed in percent or divided stays finite
                    assertTrue(Math.abs(v) <= 1e100 && (v == 0 || Math.abs(v) >= 1e-100),
                            () -> Props.escape(text) + " as " + d + " gave " + v);
                    if (d == Dimension.TEMPERATURE) {
                        assertTrue(v >= -273.15, () -> Props.escape(text) + " gave " + v + " °C");
                    }
                }));
    }
}
