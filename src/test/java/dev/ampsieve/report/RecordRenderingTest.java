package dev.ampsieve.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

import dev.ampsieve.record.DecisionRecord;
import java.awt.image.BufferedImage;
import java.io.File;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.TimeUnit;
import javax.imageio.ImageIO;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.text.PDFTextStripper;
import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The HTML record as a browser draws and prints it: headless Chromium (Debian package
 * {@code chromium}, installed by .ci/run) renders it to PNG and PDF. Skipped with a message when
 * Chromium is missing, except under {@code CI=true}, where that fails (as the ngspice check does).
 */
class RecordRenderingTest {

    static final Path CHROMIUM = Path.of("/usr/bin/chromium");

    @TempDir
    static Path dir;

    static DecisionRecord record;
    static Path html;

    @BeforeAll
    static void write() throws Exception {
        if (!Files.isExecutable(CHROMIUM)) {
            if ("true".equals(System.getenv("CI"))) {
                fail("chromium is not installed at " + CHROMIUM
                        + " (CI=true: 'apt-get install chromium', as .ci/run does)");
            }
            Assumptions.abort("chromium is not installed at " + CHROMIUM
                    + "; install the Debian package chromium to run" + " the rendering checks of decision records");
        }
        record = RecordFixtures.bridge();
        html = dir.resolve("bridge.html");
        Files.writeString(html, RecordReport.html(record));
    }

    private static void chromium(String... args) throws Exception {
        List<String> cmd = new ArrayList<>(List.of(
                CHROMIUM.toString(),
                "--headless",
                "--no-sandbox",
                "--disable-gpu",
                "--no-first-run",
                "--disable-background-networking",
                "--disable-component-update",
                "--disable-sync",
                "--user-data-dir=" + Files.createTempDirectory(dir, "profile")));
        cmd.addAll(List.of(args));
        cmd.add(html.toUri().toString());
        Process p = new ProcessBuilder(cmd)
                .redirectErrorStream(true)
                .redirectOutput(dir.resolve("chromium.log").toFile())
                .start();
        if (!p.waitFor(180, TimeUnit.SECONDS)) {
            p.destroyForcibly();
            fail("chromium did not finish within 180 s");
        }
    }

    @Test
    void theScreenshotIsNotBlank() throws Exception {
        Path png = dir.resolve("bridge.png");
        chromium("--screenshot=" + png, "--window-size=1200,1600");
        BufferedImage img = ImageIO.read(png.toFile());
        assertEquals(1200, img.getWidth());
        // count the distinct colours over a grid of the page: text, tables and the caution box give many
        java.util.Set<Integer> colours = new java.util.HashSet<>();
        for (int y = 0; y < img.getHeight(); y += 3) {
            for (int x = 0; x < img.getWidth(); x += 3) {
                colours.add(img.getRGB(x, y));
            }
        }
        assertTrue(colours.size() > 10, "a blank page has one colour; seen " + colours.size());
    }

    @Test
    void eachPartStartsAPrintedPage() throws Exception {
        Path pdf = dir.resolve("bridge.pdf");
        chromium("--no-pdf-header-footer", "--print-to-pdf=" + pdf);
        try (PDDocument d = Loader.loadPDF(new File(pdf.toString()))) {
            int pages = d.getNumberOfPages();
            // the summary (stage, ranking, advice) fills at least one page, then each of three parts its own
            assertTrue(pages >= 4, "pages: " + pages);
            int last = 0;
            for (String id : List.of("zd-chop-01", "zd-az-06", "zd-chop-03")) {
                int page = firstLineMatch(d, "Part " + id + ":");
                assertTrue(page > last, id + " on page " + page + " after page " + last);
                last = page;
            }
            // and the stage file at the end follows the last part
            assertTrue(textOf(d, last, pages).contains("Stage file as re-read by recheck"));
        }
    }

    /** The page whose first line starts with {@code start}: a part heading right after a page break. */
    private static int firstLineMatch(PDDocument d, String start) throws Exception {
        for (int p = 1; p <= d.getNumberOfPages(); p++) {
            String first = textOf(d, p, p).strip().lines().findFirst().orElse("");
            if (first.startsWith(start)) {
                return p;
            }
        }
        fail("no page begins with " + start);
        return -1;
    }

    private static String textOf(PDDocument d, int from, int to) throws Exception {
        PDFTextStripper s = new PDFTextStripper();
        s.setStartPage(from);
        s.setEndPage(to);
        return s.getText(d);
    }
}
