package org.counterpoise.io.export;

import static org.junit.jupiter.api.Assertions.assertEquals;

import com.google.gson.GsonBuilder;
import com.google.gson.JsonArray;
import com.google.gson.JsonObject;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * The table written row by row is the table written whole: the JSON against Gson's own
 * pretty-printing of the whole array (an independent route), and the streamed text and CSV
 * against the whole-table methods.
 */
class OptimumTableTest {
    private static final List<OptimumTable.Row> ROWS = List.of(
            new OptimumTable.Row(0.05, 0.02, 0.9487268205541150, 0.1265161207087662, 5.236098680676630,
                    "one interior peak and one band end", true),
            new OptimumTable.Row(0.1, 0.0, 0.9090909090909091, 0.1684150472270, 4.582575694955840, "", false),
            new OptimumTable.Row(0.2, 0.05, 0.8, 0.2, Double.POSITIVE_INFINITY, "two equal interior peaks", true));

    @Test
    void streamedJsonIsGsonsPrettyPrintOfTheWholeArray() {
        JsonArray array = new JsonArray();
        for (OptimumTable.Row r : ROWS) {
            JsonObject o = new JsonObject();
            JsonNumbers.put(o, "mass_ratio", r.massRatio());
            JsonNumbers.put(o, "structure_damping_ratio", r.structureDamping());
            JsonNumbers.put(o, "tuning_ratio", r.tuningRatio());
            JsonNumbers.put(o, "absorber_damping_ratio", r.absorberDamping());
            JsonNumbers.put(o, "peak", r.value());
            if (!r.activeSet().isEmpty()) {
                o.addProperty("active_set", r.activeSet());
            }
            o.addProperty("converged", r.converged());
            o.addProperty("status", r.converged() ? "certified" : "not found");
            array.add(o);
        }
        String whole = new GsonBuilder().setPrettyPrinting().serializeNulls().disableHtmlEscaping().create()
                .toJson(array) + "\n";
        assertEquals(whole, OptimumTable.json(ROWS, "peak"));
        assertEquals(whole, streamed(OptimumTable.Format.JSON));
        assertEquals("[]\n", OptimumTable.json(List.of(), "peak"));
    }

    @Test
    void streamedTextAndCsvAreTheWholeTables() {
        assertEquals(OptimumTable.text(ROWS, "peak"), streamed(OptimumTable.Format.TEXT));
        assertEquals(OptimumTable.csv(ROWS, "peak"), streamed(OptimumTable.Format.CSV));
        assertEquals("mass_ratio,structure_damping_ratio,tuning_ratio,absorber_damping_ratio,peak,converged",
                OptimumTable.csv(ROWS, "peak").lines().findFirst().orElseThrow());
    }

    private static String streamed(OptimumTable.Format format) {
        StringWriter text = new StringWriter();
        PrintWriter out = new PrintWriter(text);
        OptimumTable.Streamed table = new OptimumTable.Streamed(format, "peak");
        out.print(table.start());
        for (OptimumTable.Row r : ROWS) {
            out.print(table.row(r));
        }
        out.print(table.end());
        out.flush();
        return text.toString();
    }
}
