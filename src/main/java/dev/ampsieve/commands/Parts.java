package dev.ampsieve.commands;

import dev.ampsieve.catalog.Catalog;
import dev.ampsieve.catalog.LotReader;
import dev.ampsieve.catalog.Measured;
import dev.ampsieve.catalog.Part;
import dev.ampsieve.failure.ExitCode;
import dev.ampsieve.failure.Place;
import dev.ampsieve.failure.Refusal;
import dev.ampsieve.text.Visible;
import dev.ampsieve.yaml.Fields;
import dev.ampsieve.yaml.InputException;
import dev.ampsieve.yaml.Located;
import dev.ampsieve.yaml.Problem;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

/** Finding a part the user named, for every command that takes part ids. */
public final class Parts {
    private Parts() {}

    /**
     * The part, its measured lot read ({@link #withLot}), or a one-line refusal (exit 1) naming the closest id.
     *
     * @throws InputException when the part's lot file cannot be used
     */
    public static Part find(Catalog catalog, String id) throws Refusal, InputException {
        Optional<Part> p = catalog.find(id);
        if (p.isPresent()) {
            return withLot(p.get());
        }
        String near = Fields.closest(id, catalog.parts().stream().map(Part::id).toList());
        String msg = "no part '" + Visible.of(id) + "' in the catalog "
                + Visible.of(catalog.root().toString())
                + (near != null ? "; did you mean '" + near + "'?" : "; 'ampsieve check' lists what was read");
        if (catalog.hasErrors()) {
            msg += " (some catalog files have errors and were left out: run 'ampsieve check')";
        }
        throw new Refusal(msg, ExitCode.FINDINGS, Place.field(id));
    }

    /**
     * The part with its measured lot's units read ({@link LotReader}); the part itself without a lot or
     * with one already read. Read here, when a budget needs it, not in the catalog parse: a changed lot
     * file is always read afresh and the parse (and its cache) stays cheap.
     *
     * @throws InputException the lot file's problems, then the catalog line that names it
     */
    public static Part withLot(Part p) throws InputException {
        Measured m = p.measured();
        if (m == null || m.lot() != null) {
            return p;
        }
        try {
            return p.withMeasured(m.withLot(LotReader.read(m.path())));
        } catch (InputException e) {
            List<Problem> all = new ArrayList<>(e.problems());
            all.add(Problem.error(
                    m.where(),
                    "measured.file",
                    "the measured lot of part '" + p.id() + "' cannot be used (see above)",
                    "fix the lot file, or remove 'measured' from the part"));
            throw new InputException(all);
        }
    }

    /** A lot file given on the command line ({@code --measured FILE}), read now, in place of the catalog's. */
    /** Each part with its measured lot read ({@link #withLot(Part)}), in order. */
    public static List<Part> withLots(List<Part> parts) throws InputException {
        List<Part> out = new ArrayList<>(parts.size());
        for (Part p : parts) {
            out.add(withLot(p));
        }
        return out;
    }

    public static Part withLot(Part p, Path file) throws InputException {
        return p.withMeasured(new Measured(file.toString(), file, Located.nowhere(file), LotReader.read(file)));
    }
}
