package dev.ampsieve.commands;

import dev.ampsieve.catalog.Catalog;
import dev.ampsieve.catalog.Part;
import dev.ampsieve.failure.Refusal;
import dev.ampsieve.yaml.InputException;
import picocli.CommandLine.Parameters;

/** The {@code PART} argument of the one-part commands (a picocli mixin): an id, found in the catalog. */
public final class PartArgument {

    @Parameters(index = "0", paramLabel = "PART", description = "Part id from the catalog.")
    String id;

    /** The part (its measured lot read), or a one-line refusal naming the closest id. */
    public Part in(Catalog catalog) throws Refusal, InputException {
        return Parts.find(catalog, id);
    }
}
