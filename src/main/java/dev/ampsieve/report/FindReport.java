package dev.ampsieve.report;

import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import dev.ampsieve.catalog.Part;
import dev.ampsieve.search.PartDocuments;
import dev.ampsieve.text.Visible;
import java.util.List;

/** What {@code ampsieve find} prints: the matching parts with their key figures. */
public final class FindReport {
    private FindReport() {}

    /** @param parts the matches, most relevant first */
    public static String text(String query, List<Part> parts) {
        return text(query, parts, TextTable.WIDTH);
    }

    /** @param width columns the table fits in (the terminal's, in the shell) */
    public static String text(String query, List<Part> parts, int width) {
        StringBuilder o = new StringBuilder();
        o.append(headline(query, parts.size()))
                .append(parts.isEmpty() ? "." : ", most relevant first, then cheapest:")
                .append('\n');
        if (!parts.isEmpty()) {
            String cur = Figures.currency(parts);
            TextTable t = new TextTable()
                    .left("id")
                    .right(cur.isEmpty() ? "price" : "price " + cur)
                    .right("vos")
                    .right("drift")
                    .right("ib")
                    .right("gbw")
                    .right("en")
                    .right("supply");
            int idWidth = 2;
            for (Part p : parts) {
                t.row(
                        p.id(),
                        Figures.price(p)
                                + (cur.isEmpty() && p.price() != null
                                        ? " " + p.price().currency()
                                        : ""),
                        Figures.vos(p),
                        Figures.drift(p),
                        Figures.ib(p),
                        Figures.gbw(p),
                        Figures.en(p),
                        Figures.supply(p));
                idWidth = Math.max(idWidth, p.id().length());
            }
            // the title goes on its own line under the figures, so neither has to be cut short
            List<String> lines = t.lines(width);
            o.append(lines.get(0)).append('\n');
            String indent = " ".repeat(idWidth + 2);
            for (int i = 0; i < parts.size(); i++) {
                o.append(lines.get(i + 1)).append('\n');
                String title = Visible.of(parts.get(i).title());
                if (!title.isBlank()) {
                    o.append(TextTable.cut(indent + title, width)).append('\n');
                }
            }
            o.append(
                    "vos, drift, ib: guaranteed maximum, else typical; en: white noise density; supply: total, V+ to V-.\n");
            if (parts.stream().anyMatch(p -> p.price() != null && p.price().hasBreaks())) {
                o.append("price (from N): the part has price breaks; this is the unit price for orders from N up,"
                        + " and rank uses the break for the stage's quantity.\n");
            }
        }
        o.append('\n').append(Caution.TEXT).append('\n');
        return Wrap.prose(Visible.lines(o.toString()), width);
    }

    /** "no part matches 'q'", "1 part matches 'q'", "3 parts match 'q'"; without a query "... in the catalog". */
    static String headline(String query, int n) {
        String count = n == 0 ? "no part" : n == 1 ? "1 part" : n + " parts";
        if (query.isBlank()) {
            return count + " in the catalog";
        }
        return count + (n == 1 || n == 0 ? " matches '" : " match '") + Visible.of(query) + "'";
    }

    /** JSON: {query, count, parts[{id, title, architecture, input, price, currency, figures in SI...}], caution}. */
    public static String json(String query, List<Part> parts) {
        ObjectNode o = JsonSupport.object();
        o.put("query", query);
        o.put("count", parts.size());
        ArrayNode arr = o.putArray("parts");
        for (Part p : parts) {
            ObjectNode n = arr.addObject();
            n.put("id", p.id());
            n.put("title", p.title());
            JsonSupport.put(
                    n,
                    "architecture",
                    p.architecture() == null ? null : p.architecture().key());
            JsonSupport.put(n, "input", p.input() == null ? null : p.input().key());
            putValue(n, "vosV", "vos", p);
            putValue(n, "driftVPerC", "drift", p);
            putValue(n, "ibA", "ib", p);
            putValue(n, "gbwHz", "gbw", p);
            putValue(n, "enVPerRtHz", "en", p);
            putValue(n, "supplyMinV", "supply.min", p);
            putValue(n, "supplyMaxV", "supply.max", p);
            putValue(n, "price", "price", p);
            JsonSupport.put(n, "currency", p.price() == null ? null : p.price().currency());
            n.put(
                    "file",
                    p.where() == null || p.where().file() == null
                            ? null
                            : p.where().file().toString());
        }
        return JsonSupport.render(o);
    }

    private static void putValue(ObjectNode n, String key, String field, Part p) {
        Double v = PartDocuments.valueOf(field, p);
        JsonSupport.put(n, key, v == null ? Double.NaN : v);
    }
}
