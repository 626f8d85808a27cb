package dev.ampsieve.commands;

import dev.ampsieve.budget.Basis;
import dev.ampsieve.budget.PartValues;
import dev.ampsieve.catalog.Catalog;
import dev.ampsieve.catalog.Part;
import dev.ampsieve.failure.ExitCode;
import dev.ampsieve.failure.Place;
import dev.ampsieve.failure.Refusal;
import dev.ampsieve.report.RigText;
import dev.ampsieve.rig.OffsetRig;
import dev.ampsieve.stage.Stage;
import dev.ampsieve.stage.StageLoader;
import dev.ampsieve.units.Dimension;
import dev.ampsieve.units.UnitException;
import dev.ampsieve.units.Units;
import java.nio.file.Path;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.ParentCommand;
import picocli.CommandLine.Spec;

/** {@code ampsieve offset-rig PART [--meter-range V] [--meter-resolution V]}: the offset test circuit for a part. */
@Command(
        name = "offset-rig",
        header = "Size the offset test circuit for a part and a meter.",
        mixinStandardHelpOptions = true,
        description = "Propose the circuit that measures a part's offset on the bench (how a measured lot file is"
                + " made): the part as a non-inverting amplifier of its own offset with a small R1 to ground, R2"
                + " from the output and Rp = R1 || R2 at the + input, E96 values, with the gain that brings the"
                + " worst datasheet offset into the meter's range with enough resolution, and the error the rig's"
                + " own resistors, bias currents and loop gain add to each reading. Figures are the catalog's at"
                + " 25 °C after the budget's missing-value rules (max-to-sigma 3).",
        footer = {
            "",
            "Examples:",
            "  ampsieve offset-rig prec-bip-01",
            "  ampsieve offset-rig prec-bip-01 --meter-range 200mV --meter-resolution 1uV --json"
        })
public final class OffsetRigCommand implements Callable<Integer> {

    /** A neutral stage for the part's figures: only the missing-value rules (max-to-sigma 3) matter here. */
    private static final String NEUTRAL_STAGE = "topology: follower\nlimit: \"1 V\"\n";

    @ParentCommand
    RootCommand root;

    @Spec
    CommandSpec spec;

    @Mixin
    PartArgument part;

    @Mixin
    JsonOption format;

    @Option(
            names = "--meter-range",
            paramLabel = "V",
            defaultValue = "2 V",
            description = "The meter's full scale (default: ${DEFAULT-VALUE}).")
    String range;

    @Option(
            names = "--meter-resolution",
            paramLabel = "V",
            defaultValue = "10 uV",
            description = "One count of the meter on that range (default: ${DEFAULT-VALUE}, a 5½-digit meter on 2 V).")
    String resolution;

    @Option(
            names = "--tolerance",
            paramLabel = "RATIO",
            defaultValue = "0.1 %",
            description = "The rig resistors' tolerance (default: ${DEFAULT-VALUE}).")
    String tolerance;

    @Override
    public Integer call() throws Exception {
        double r = quantity("--meter-range", range, Dimension.VOLTAGE, "2 V");
        double res = quantity("--meter-resolution", resolution, Dimension.VOLTAGE, "10 uV");
        double tol = quantity("--tolerance", tolerance, Dimension.RATIO, "0.1 %");
        if (!(r > 0) || !(res > 0) || !(res < r)) {
            throw new Refusal(
                    "--meter-resolution must be above 0 and below --meter-range; write for example"
                            + " '--meter-range 2V --meter-resolution 10uV'",
                    ExitCode.USAGE,
                    Place.field("--meter-resolution"));
        }
        if (!(tol >= 0 && tol < 0.1)) {
            throw new Refusal(
                    "--tolerance must be between 0 and 10 %; write for example '--tolerance 0.1%'",
                    ExitCode.USAGE, Place.field("--tolerance"));
        }
        Catalog catalog = root.catalog();
        Candidates.noteUnusedFiles(catalog, spec.commandLine().getErr());
        Part p = part.in(catalog);
        Stage neutral = StageLoader.parse(NEUTRAL_STAGE, Path.of("(offset-rig)"));
        PartValues v = PartValues.of(p, neutral);
        if (v.vos().basis() == Basis.MISSING || !(v.vos().bound() > 0)) {
            throw new Refusal(
                    "part '" + p.id() + "' has no offset figure to size the rig for; enter vos.max (or vos.typ)",
                    ExitCode.FINDINGS,
                    Place.field(p.id()));
        }
        OffsetRig rig = OffsetRig.plan(v, r, res, tol);
        spec.commandLine()
                .getOut()
                .print(format.json() ? RigText.json(p.id(), rig) : RigText.text(p.id(), rig, root.textWidth()));
        return ExitCode.OK.code();
    }

    private static double quantity(String option, String text, Dimension d, String example) throws Refusal {
        try {
            return Units.parse(text, d, example);
        } catch (UnitException e) {
            throw new Refusal(option + ": " + e.problem() + "; " + e.fix(), ExitCode.USAGE, Place.field(option));
        }
    }
}
