package dev.ampsieve.commands;

import dev.ampsieve.catalog.Catalog;
import dev.ampsieve.catalog.Part;
import dev.ampsieve.failure.ExitCode;
import dev.ampsieve.failure.Place;
import dev.ampsieve.failure.Refusal;
import dev.ampsieve.text.Visible;
import dev.ampsieve.yaml.Fields;
import java.util.Optional;

/** Finding a part the user named, for every command that takes part ids. */
public final class Parts {
    private Parts() {}

    /** The part, or a one-line refusal (exit 1) naming the closest id. */
    public static Part find(Catalog catalog, String id) throws Refusal {
        Optional<Part> p = catalog.find(id);
        if (p.isPresent()) {
            return p.get();
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
}
