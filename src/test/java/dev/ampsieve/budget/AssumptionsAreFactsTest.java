package dev.ampsieve.budget;

import static org.junit.jupiter.api.Assertions.assertFalse;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * The missing-value rules return facts ({@link Assumption}); only the report words them (issue 11).
 * A source scan of the classes that used to build the warnings' sentences: none formats a figure
 * for reading. (The error terms and the constraint details are converted separately.)
 */
class AssumptionsAreFactsTest {

    @Test
    void theRulesNeverFormatFigures() throws IOException {
        for (String name :
                List.of("PartValues", "Assumed", "OperatingFigures", "BudgetCalculator", "Budget", "Assumption")) {
            String src = Files.readString(Path.of("src/main/java/dev/ampsieve/budget/" + name + ".java"));
            assertFalse(src.contains("Units.format"), name + " formats a figure: return it as a fact instead");
            assertFalse(src.contains("import dev.ampsieve.units.Units;"), name + " imports Units");
        }
    }
}
