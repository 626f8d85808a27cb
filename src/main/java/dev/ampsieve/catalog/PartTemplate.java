package dev.ampsieve.catalog;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * A new part file made from the catalog template ({@code catalog-template/part.yaml}, which the
 * build puts into the jar): every comment kept, the id filled in, the values a part cannot do
 * without left empty for the user to type ({@link #TO_TYPE}), and every optional key commented
 * out with the template's invented example. So a new file never enters a ranking with invented
 * figures: until the empty values are typed, {@code check} names each one as an error.
 */
public final class PartTemplate {
    private PartTemplate() {}

    /** Where the build puts the template in the jar. */
    static final String RESOURCE = "/dev/ampsieve/template/part.yaml";

    /** Key paths left empty: the values a part cannot load without (vos needs typ or max: max is asked for). */
    public static final Set<String> TO_TYPE = Set.of(
            CatalogKeys.ARCHITECTURE,
            CatalogKeys.INPUT,
            CatalogKeys.GBW,
            "price.unit",
            "price.quantity",
            "supply.min",
            "supply.max",
            "temperature.min",
            "temperature.max",
            "vos.max");

    private static final Pattern TOP = Pattern.compile("^([a-z][a-z-]*):(.*)$");
    private static final Pattern SUB = Pattern.compile("^  ([a-z][a-z-]*):(.*)$");

    /** The template's text as shipped in the jar. */
    public static String text() {
        try (InputStream in = PartTemplate.class.getResourceAsStream(RESOURCE)) {
            if (in == null) {
                throw new IllegalStateException("the jar has no " + RESOURCE + " (built without its resources?)");
            }
            return new String(in.readAllBytes(), StandardCharsets.UTF_8);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /** The new part file for {@code id}, which must already be valid ({@link CatalogLoader#idProblem}). */
    public static String forId(String id) {
        List<String> out = new ArrayList<>();
        out.add("# Written by 'ampsieve new-part " + id + "' from the catalog template.");
        out.add("# Type each value left empty (architecture, input, price, supply,");
        out.add("# temperature, vos.max, gbw); 'ampsieve check' names those still empty.");
        out.add("# Optional keys are commented out with the template's INVENTED example");
        out.add("# values: remove the '# ' of each one your datasheet gives, and type its figure.");
        out.add("#");
        String top = null;
        boolean keep = false; // the current top-level key stays (required) rather than being commented out
        for (String line : text().split("\n", -1)) {
            Matcher t = TOP.matcher(line);
            Matcher s = SUB.matcher(line);
            if (line.startsWith("#") || line.isBlank()) {
                out.add(line);
            } else if (t.matches()) {
                top = t.group(1);
                boolean section = !CatalogKeys.subKeys(top).isEmpty();
                keep = CatalogKeys.REQUIRED.contains(top);
                if (top.equals(CatalogKeys.ID)) {
                    out.add(CatalogKeys.ID + ": " + id);
                } else if (keep && (section || TO_TYPE.contains(top))) {
                    out.add(top + ":");
                } else {
                    out.add("# " + line);
                }
            } else if (keep && top != null && s.matches()) {
                String path = CatalogKeys.path(top, s.group(1));
                out.add(TO_TYPE.contains(path) ? "  " + s.group(1) + ":" : "  # " + line.substring(2));
            } else {
                out.add("# " + line); // the rest of a commented-out key (a folded text, a list)
            }
        }
        return String.join("\n", out);
    }
}
