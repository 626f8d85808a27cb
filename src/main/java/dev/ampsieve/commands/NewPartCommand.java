package dev.ampsieve.commands;

import dev.ampsieve.catalog.CatalogLoader;
import dev.ampsieve.catalog.PartTemplate;
import dev.ampsieve.failure.ExitCode;
import dev.ampsieve.text.Visible;
import dev.ampsieve.yaml.AtomicFiles;
import dev.ampsieve.yaml.InputException;
import dev.ampsieve.yaml.Located;
import dev.ampsieve.yaml.Problem;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.ParentCommand;
import picocli.CommandLine.Spec;

/** {@code ampsieve new-part ID [--into DIR]}: a commented part file to fill in. */
@Command(
        name = "new-part",
        header = "Write a new part file to fill in, from the catalog template.",
        mixinStandardHelpOptions = true,
        description = "Write ID.yaml with every key of the catalog template and its explanation: the id filled in, the"
                + " values every part needs (architecture, input, price, supply, temperature, vos.max, gbw) left empty"
                + " for you to type, and the optional keys commented out with invented examples. Until the empty"
                + " values are typed, 'check' names each one, and the part stays out of every ranking. An existing"
                + " file is never replaced. DIR defaults to the catalog folder given with --catalog or"
                + " $AMPSIEVE_CATALOG, else the current folder (never the demo catalog).",
        footer = {
            "",
            "Example:",
            "  ampsieve --catalog my-catalog new-part lownoise-01",
            "  (type the datasheet's figures into my-catalog/lownoise-01.yaml)",
            "  ampsieve --catalog my-catalog check"
        })
public final class NewPartCommand implements Callable<Integer> {

    @ParentCommand
    RootCommand root;

    @Spec
    CommandSpec spec;

    @Parameters(
            index = "0",
            paramLabel = "ID",
            description = "The part's id: lowercase letters, digits and single dashes.")
    String id;

    @Option(names = "--into", paramLabel = "DIR", description = "Folder to write ID.yaml into (made if missing).")
    Path into;

    @Override
    public Integer call() throws Exception {
        Problem bad = CatalogLoader.idProblem(id, Located.nowhere(null));
        if (bad != null) {
            throw new InputException(bad);
        }
        Path dir = into != null ? into : root.chosenCatalogDir();
        ImportCommand.prepare(dir);
        Path target = dir.resolve(id + ".yaml");
        AtomicFiles.write(target, PartTemplate.forId(id), false, "choose another id, or edit the file that is there");
        root.forgetCatalog();
        PrintWriter out = spec.commandLine().getOut();
        out.println("Wrote " + Visible.of(target.toString())
                + ": type the values left empty; 'ampsieve check' lists them.");
        out.flush();
        return ExitCode.OK.code();
    }
}
