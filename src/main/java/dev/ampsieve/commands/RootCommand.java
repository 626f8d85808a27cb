package dev.ampsieve.commands;

import dev.ampsieve.catalog.Catalog;
import dev.ampsieve.catalog.CatalogLoader;
import dev.ampsieve.failure.ExitCode;
import dev.ampsieve.failure.Place;
import dev.ampsieve.failure.Refusal;
import dev.ampsieve.report.OutputStyle;
import dev.ampsieve.search.ParsedCache;
import dev.ampsieve.yaml.InputException;
import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Properties;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.IVersionProvider;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.ScopeType;
import picocli.CommandLine.Spec;

/**
 * {@code ampsieve}: the root of the command tree. Holds the options every command shares
 * (which catalog, strictness, verbosity) and the catalog once loaded. Its commands are added by
 * {@link Commands} (all of them, or on the command line only the one named: building each
 * command's model by reflection is most of picocli's start-up).
 */
@Command(
        name = "ampsieve",
        mixinStandardHelpOptions = true,
        versionProvider = RootCommand.Version.class,
        description =
                "Picks operational amplifiers for a stage by its full output error budget, computed from your own YAML catalog of datasheet values.",
        footer = {
            "",
            "Catalog folder: --catalog DIR, else $AMPSIEVE_CATALOG, else the demo catalog.",
            "Exit codes: 0 ok, 1 problems in your data or a 'no' answer, 2 usage error, 3 internal error.",
            "Reference: 'ampsieve help query', 'help stage-keys', 'help catalog-keys', 'help units'."
        })
public final class RootCommand implements Callable<Integer> {

    @Spec
    CommandSpec spec;

    @Option(
            names = "--catalog",
            paramLabel = "DIR",
            scope = ScopeType.INHERIT,
            description = "Folder of catalog YAML files (default: $AMPSIEVE_CATALOG, else demo-catalog).")
    Path catalogDir;

    @Option(
            names = "--strict",
            scope = ScopeType.INHERIT,
            description = "Refuse the whole catalog when any file has an error.")
    boolean strict;

    @Option(names = "--verbose", scope = ScopeType.INHERIT, description = "Show stack traces of internal errors.")
    boolean verbose;

    @Option(
            names = "--ascii",
            scope = ScopeType.INHERIT,
            description = "Draw charts with ASCII characters only (automatic when the terminal is not UTF-8).")
    boolean ascii;

    private Catalog catalog;
    private OutputStyle style;

    public boolean verbose() {
        return verbose;
    }

    /** No command: the usage. ({@code Main} opens the shell instead when there is a terminal.) */
    @Override
    public Integer call() {
        spec.commandLine().usage(spec.commandLine().getOut());
        return ExitCode.OK.code();
    }

    /** Width, charset and colours for text output: the shell's terminal, else what stdout looks like. */
    public OutputStyle outputStyle() {
        OutputStyle s = style != null ? style : OutputStyles.detect(System.getenv());
        return ascii ? s.withUnicode(false) : s;
    }

    /** Columns for text tables: the shell's terminal width; on the command line a fixed width that reads well in files. */
    public int textWidth() {
        return style != null ? style.width() : OutputStyle.TEXT_WIDTH;
    }

    /** The shell sets this before each line (the terminal may have been resized). */
    public void setOutputStyle(OutputStyle s) {
        this.style = s;
    }

    /** The front end's current stage (the shell's), used when a command is given no --stage FILE; null on the command line. */
    private StageSource currentStage;

    /** The shell hands its current stage to the commands this way, before it builds the tree. */
    public void useCurrentStage(StageSource source) {
        this.currentStage = source;
    }

    boolean hasCurrentStage() {
        return currentStage != null;
    }

    /** The current stage, or null when the front end has none to offer. */
    StageSource currentStage() {
        return currentStage;
    }

    /** Notes already printed by this root (stage warnings): the shell runs many commands, each note shows once. */
    private final java.util.Set<String> shownNotes = new java.util.HashSet<>();

    /** True the first time {@code note} is offered to this root. */
    boolean firstTime(String note) {
        return shownNotes.add(note);
    }

    /**
     * The catalog folder after applying --catalog, then $AMPSIEVE_CATALOG, then the demo catalog.
     * An empty --catalog or AMPSIEVE_CATALOG gives the empty path here; {@link #catalog()} refuses it.
     */
    public Path catalogDir() {
        return chooseCatalog(catalogDir, System.getenv(CATALOG_VARIABLE), System.getProperty("ampsieve.home"));
    }

    static final String CATALOG_VARIABLE = "AMPSIEVE_CATALOG";

    /**
     * Where a new part file goes by default: the catalog folder the user chose (--catalog, else
     * $AMPSIEVE_CATALOG), else the current folder; never the demo catalog, which is not theirs.
     */
    public Path chosenCatalogDir() throws Refusal {
        String env = System.getenv(CATALOG_VARIABLE);
        String empty = emptyCatalogChoice(catalogDir, env);
        if (empty != null) {
            throw new Refusal(empty, ExitCode.USAGE, Place.field("--catalog"));
        }
        return catalogDir != null ? catalogDir : env != null ? Path.of(env) : Path.of(".");
    }

    public static Path chooseCatalog(Path option, String env, String home) {
        if (option != null) {
            return option;
        }
        if (env != null) {
            return Path.of(env.isBlank() ? "" : env);
        }
        if (home != null) {
            Path demo = Path.of(home, "demo-catalog");
            if (Files.isDirectory(demo)) {
                return demo;
            }
        }
        return Path.of("demo-catalog");
    }

    /**
     * Why the catalog choice is unusable, or null. An empty name is refused rather than read as
     * the current folder (which is what Path.of("") means) or, for the variable, quietly replaced
     * by the demo catalog: an empty AMPSIEVE_CATALOG usually comes from a script whose own
     * variable was unset, and ranking invented parts as if they were the user's would be worse
     * than stopping.
     */
    public static String emptyCatalogChoice(Path option, String env) {
        if (option != null) {
            return option.toString().isBlank()
                    ? "--catalog was given an empty folder name; give the catalog folder (--catalog DIR), or leave the"
                            + " option out to use $" + CATALOG_VARIABLE + " or the demo catalog"
                    : null;
        }
        return env != null && env.isBlank()
                ? CATALOG_VARIABLE
                        + " is set but empty; set it to the catalog folder, or unset it to use the demo catalog"
                : null;
    }

    /**
     * Loads the catalog once per command tree; problems stay on the result for the caller to show.
     *
     * @throws Refusal (exit code 2) when --catalog or AMPSIEVE_CATALOG is empty
     */
    public Catalog catalog() throws InputException, Refusal {
        if (catalog == null) {
            String empty = emptyCatalogChoice(catalogDir, System.getenv(CATALOG_VARIABLE));
            if (empty != null) {
                throw new Refusal(empty, ExitCode.USAGE, Place.field("--catalog"));
            }
            Path dir = catalogDir();
            // unchanged files come from the parsed-catalog cache beside the index (none: parsed)
            catalog = CatalogLoader.load(dir, strict, ParsedCache.forCatalog(dir));
        }
        return catalog;
    }

    /** Forgets the loaded catalog (the shell calls this when files changed). */
    public void forgetCatalog() {
        catalog = null;
    }

    /** Reads the version Maven wrote into the jar. */
    public static final class Version implements IVersionProvider {
        @Override
        public String[] getVersion() {
            Properties p = new Properties();
            try (InputStream in = RootCommand.class.getResourceAsStream("/dev/ampsieve/version.properties")) {
                if (in != null) {
                    p.load(in);
                }
            } catch (IOException e) {
                // no version file: report as unknown rather than fail --version
            }
            return new String[] {"ampsieve " + p.getProperty("version", "unknown")};
        }
    }
}
