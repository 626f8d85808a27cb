package dev.ampsieve.stage;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.nio.file.Path;
import org.junit.jupiter.api.Test;

/** {@link Stage#toBuilder()} copies every value and changes only what it is told. */
class StageBuilderCopyTest {

    @Test
    void aCopyWithNothingChangedEqualsTheOriginal() throws Exception {
        // the demo bridge stage sets most keys, trim and criterion included
        Stage s = StageLoader.load(Path.of("demo-catalog/stages/bridge-amp.yaml"));
        assertEquals(s, s.toBuilder().build());
    }

    @Test
    void oneValueChangedLeavesTheOthers() throws Exception {
        Stage s = StageLoader.load(Path.of("demo-catalog/stages/bridge-amp.yaml"));
        Stage t = s.toBuilder().rf(2 * s.rf()).build();
        assertEquals(2 * s.rf(), t.rf());
        // everything else as before: changing rf back gives the original record
        assertEquals(s, t.toBuilder().rf(s.rf()).build());
    }
}
