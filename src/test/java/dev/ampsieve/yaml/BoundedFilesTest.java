package dev.ampsieve.yaml;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTimeoutPreemptively;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.ampsieve.testing.SpecialFiles;
import java.nio.channels.ServerSocketChannel;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class BoundedFilesTest {

    @TempDir
    Path dir;

    private static Problem refusal(Path file) {
        InputException e = assertTimeoutPreemptively(
                SpecialFiles.HANG_GUARD,
                () -> assertThrows(InputException.class, () -> BoundedFiles.read(file, YamlFiles.MAX_BYTES)));
        assertEquals(1, e.problems().size(), e.getMessage());
        return e.problems().get(0);
    }

    @Test
    void aFileOfExactlyTheLimitIsReadAndOneByteMoreIsNot() throws Exception {
        Path ten = Files.writeString(dir.resolve("ten.yaml"), "a: 1234567"); // 10 bytes, counted by hand
        assertArrayEquals("a: 1234567".getBytes(StandardCharsets.US_ASCII), BoundedFiles.read(ten, 10));
        Path eleven = Files.writeString(dir.resolve("eleven.yaml"), "a: 12345678");
        Problem p = assertThrows(InputException.class, () -> BoundedFiles.read(eleven, 10))
                .problems()
                .get(0);
        assertEquals("file is over the limit of 10 bytes for one YAML file", p.message());
        assertEquals(eleven, p.file());
    }

    @Test
    void devZeroIsRefusedWithoutReadingIt() {
        Problem p = refusal(SpecialFiles.devZero());
        assertEquals(Path.of("/dev/zero"), p.file());
        assertEquals("/dev/zero: not a regular file (a character device); give a YAML file", p.toString());
    }

    @Test
    void aLinkIsJudgedByWhatItPointsTo() throws Exception {
        Path zero = Files.createSymbolicLink(dir.resolve("zero.yaml"), SpecialFiles.devZero());
        assertEquals("not a regular file (a character device)", refusal(zero).message());
        Path real = Files.writeString(dir.resolve("real.yaml"), "id: a\n");
        Path link = Files.createSymbolicLink(dir.resolve("link.yaml"), real);
        assertEquals("id: a\n", new String(BoundedFiles.read(link, 100), StandardCharsets.UTF_8));
    }

    @Test
    void aNamedPipeIsRefusedWithoutOpeningIt() throws Exception {
        // opening a pipe nobody writes to waits for ever: the guard turns a hang into a failure
        Path fifo = SpecialFiles.fifo(dir.resolve("stage.yaml"));
        assertEquals("not a regular file (a named pipe)", refusal(fifo).message());
    }

    @Test
    void aSocketAndAFolderAreRefused() throws Exception {
        Path sock = dir.resolve("s.yaml");
        try (ServerSocketChannel ch = SpecialFiles.socket(sock)) {
            assertTrue(ch.isOpen()); // the socket is listening while it is refused
            assertEquals("not a regular file (a socket)", refusal(sock).message());
        }
        Path folder = Files.createDirectory(dir.resolve("folder.yaml"));
        assertEquals("not a regular file (a folder)", refusal(folder).message());
    }

    @Test
    void theBytesReadCountNotTheSizeTheFileReports() throws Exception {
        // Linux /proc files report size 0 and still have content [from memory: proc(5)]
        Path status = Path.of("/proc/self/status");
        Assumptions.assumeTrue(Files.isRegularFile(status), "no /proc here: test skipped");
        assertEquals(0, Files.size(status));
        String text = new String(BoundedFiles.read(status, YamlFiles.MAX_BYTES), StandardCharsets.UTF_8);
        assertTrue(text.startsWith("Name:"), text);
    }
}
