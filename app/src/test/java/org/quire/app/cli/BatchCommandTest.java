package org.quire.app.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** {@code quire batch}: one result line per data row, in order, with bad rows reported and kept. */
class BatchCommandTest {
    private static final Path TEMPLATE = Path.of(System.getProperty("quire.projectRoot", ".."), "budget-engine",
            "src", "test", "resources", "org", "quire", "engine", "document", "tvfl-gravimetric-water-v1.json");

    private static int run(ByteArrayOutputStream err, String... args) {
        return CommandLine.run(args, new PrintStream(new ByteArrayOutputStream(), true, StandardCharsets.UTF_8),
                new PrintStream(err, true, StandardCharsets.UTF_8));
    }

    /** The template's model at the estimates, written out here (TVFL procedure FP-03 as in the template). */
    private static double[] model(double m, double t, double v) {
        double rho = 998.2 * (1 - 2.1e-4 * (t - 20));
        double vref = 1000 * m * 1.00106 / rho;
        return new double[] {vref, 100 * (v - vref) / vref};
    }

    @Test
    void everyRowGivesOneLineInOrderAndBadRowsAreReportedWithTheirLineNumber(@TempDir Path dir) throws Exception {
        Path data = dir.resolve("runs.csv");
        StringBuilder s = new StringBuilder("id,m_net,T_tank,V_meter\n");
        for (int i = 1; i <= 200; i++) {
            s.append("run-").append(i).append(',').append(10 + i).append(',').append(i == 57 ? "60" : "20.5")
                    .append(',').append(10.02 + i).append('\n');
        }
        s.append("run-201,abc,20,30\n");
        Files.writeString(data, s);
        Path out = dir.resolve("results.csv");
        ByteArrayOutputStream err = new ByteArrayOutputStream();
        assertEquals(2, run(err, "batch", TEMPLATE.toString(), data.toString(), "-o", out.toString()));
        String messages = err.toString(StandardCharsets.UTF_8);
        assertTrue(messages.contains("runs.csv line 58: parameter 'T_tank' = 60.0 lies outside"), messages);
        assertTrue(messages.contains("runs.csv line 202: parameter 'm_net': \"abc\" is not a number"), messages);
        assertTrue(messages.contains("199 rows evaluated, 2 failed"), messages);
        List<String> lines = Files.readAllLines(out);
        assertEquals(202, lines.size());
        assertEquals("id,V_ref_estimate,V_ref_u,V_ref_k,V_ref_U,E_estimate,E_u,E_k,E_U,error", lines.get(0));
        for (int i = 1; i <= 200; i++) {
            String[] c = lines.get(i).split(",", -1);
            assertEquals("run-" + i, c[0]);
            if (i == 57) {
                assertTrue(c[1].isEmpty() && c[9].contains("outside its allowed range"), lines.get(i));
                continue;
            }
            double[] y = model(10 + i, 20.5, 10.02 + i);
            // printed with 10 significant digits: half a unit in the 10th digit
            assertEquals(y[0], Double.parseDouble(c[1]), 5e-10 * Math.abs(y[0]), lines.get(i));
            assertEquals(y[1], Double.parseDouble(c[5]), 5e-10 * Math.abs(y[1]) + 1e-12, lines.get(i));
            assertEquals(Double.parseDouble(c[3]) * Double.parseDouble(c[2]), Double.parseDouble(c[4]),
                    1e-9 * Double.parseDouble(c[4]));
            assertEquals("", c[9]);
        }
    }

    @Test
    void aColumnThatIsNoParameterStopsTheRunBeforeAnyRow(@TempDir Path dir) throws Exception {
        Path data = dir.resolve("runs.csv");
        Files.writeString(data, "id,m_net,T_tnak,V_meter\nrun-1,10,20,10\n");
        ByteArrayOutputStream err = new ByteArrayOutputStream();
        assertEquals(2, run(err, "batch", TEMPLATE.toString(), data.toString(), "-o",
                dir.resolve("r.csv").toString()));
        assertTrue(err.toString(StandardCharsets.UTF_8).contains("column 'T_tnak' is not a parameter"));
        assertTrue(Files.notExists(dir.resolve("r.csv")));
    }

    @Test
    void withTheMonteCarloMethodEveryRowGetsItsIntervalAndTheGumCheck(@TempDir Path dir) throws Exception {
        Path data = dir.resolve("runs.csv");
        Files.writeString(data, "id,m_net,T_tank,V_meter\nrun-1,1000,20.5,1002.6\nrun-2,500,20.5,501.2\n");
        Path out = dir.resolve("results.csv");
        ByteArrayOutputStream err = new ByteArrayOutputStream();
        assertEquals(0, run(err, "batch", TEMPLATE.toString(), data.toString(), "-o", out.toString(), "--mc",
                "--trials", "20000", "--seed", "5"), err.toString(StandardCharsets.UTF_8));
        List<String> lines = Files.readAllLines(out);
        assertEquals("id,V_ref_estimate,V_ref_u,V_ref_k,V_ref_U,V_ref_mc_low,V_ref_mc_high,V_ref_gum_check,"
                + "E_estimate,E_u,E_k,E_U,E_mc_low,E_mc_high,E_gum_check,error", lines.get(0));
        for (int i = 1; i <= 2; i++) {
            String[] c = lines.get(i).split(",", -1);
            double y = Double.parseDouble(c[1]);
            double bigU = Double.parseDouble(c[4]);
            double low = Double.parseDouble(c[5]);
            double high = Double.parseDouble(c[6]);
            // the Monte Carlo interval surrounds the estimate and is about as wide as the GUM interval
            assertTrue(low < y && y < high, lines.get(i));
            assertEquals(2 * bigU, high - low, 0.3 * bigU, lines.get(i));
            // the verdict follows from the row's own figures by JCGM 101:2008 8.2: d_low = |y - U - y_low| and
            // d_high = |y + U - y_high| against delta from u at n_dig = 2 (7.9.2: u = c x 10^l, delta = 10^l / 2)
            double u = Double.parseDouble(c[2]);
            double delta = 0.5 * Math.pow(10, Math.floor(Math.log10(u)) - 1);
            boolean validated = Math.abs(y - bigU - low) <= delta && Math.abs(y + bigU - high) <= delta;
            assertEquals(validated ? "validated" : "not-validated", c[7], lines.get(i));
        }
        ByteArrayOutputStream err2 = new ByteArrayOutputStream();
        assertEquals(2, run(err2, "batch", TEMPLATE.toString(), data.toString(), "-o", out.toString(), "--trials", "5"));
        assertTrue(err2.toString(StandardCharsets.UTF_8).contains("go with --mc"));
    }

    @Test
    void theShippedGravimetricTemplateRunsOverAFleetTable(@TempDir Path dir) throws Exception {
        Path template = Path.of(System.getProperty("quire.projectRoot", ".."), "templates", "gravimetric-emf-flow-point.json");
        Path data = dir.resolve("fleet.csv");
        // row 1: the template's own values (its example readings of N_ind in one cell, separated by ';');
        // row 2: a temperature outside the parameter's range
        String own = ",0.06,10013.2;10009.6;10012.8;10010.1;10014.0,10,0.0002\n";
        Files.writeString(data, "id,I_net,t_tank,t_meter,p_meter,t_c,p_a,t_a,h_a,U_bal,N_ind,k_pulse,d_conv\n"
                + "TV-1,997.1,20.42,20.55,280000,72.0,100650,21.3,0.48" + own
                + "TV-2,997.1,50,20.55,280000,72.0,100650,21.3,0.48" + own);
        Path out = dir.resolve("results.csv");
        ByteArrayOutputStream err = new ByteArrayOutputStream();
        assertEquals(2, run(err, "batch", template.toString(), data.toString(), "-o", out.toString()));
        List<String> lines = Files.readAllLines(out);
        String[] c = lines.get(1).split(",", -1);
        // E and u(E) of the template at its own values, from the independent GUM script named in
        // ShippedTemplatesTest (app/src/test/resources/templates-check): 0.120164490 %, 0.0292704 %
        assertEquals(0.120164490, Double.parseDouble(c[1]), 5e-9);
        assertEquals(0.0292704, Double.parseDouble(c[2]), 5e-8);
        assertTrue(lines.get(2).contains("t_tank"), lines.get(2));
        assertTrue(err.toString(StandardCharsets.UTF_8).contains("rows per second"));
    }

    @Test
    void extraCellsAWrongSeparatorAndAmbiguousNumbersAreNeverIgnored(@TempDir Path dir) throws Exception {
        Path data = dir.resolve("runs.csv");
        Path out = dir.resolve("r.csv");
        // issue 11/12: an extra cell in a row stops the run with the line, nothing written
        Files.writeString(data, "id,m_net,T_tank,V_meter\nrun-1,1000,20.5,1002.6\nrun-2,500,20.5,501.2,7\n");
        ByteArrayOutputStream err = new ByteArrayOutputStream();
        assertEquals(2, run(err, "batch", TEMPLATE.toString(), data.toString(), "-o", out.toString()));
        String m = err.toString(StandardCharsets.UTF_8);
        assertTrue(m.contains("runs.csv, line 3: the row has 5 cells, but the header has 4"), m);
        assertTrue(Files.notExists(out));
        // a tab-separated table read as comma-separated would be one column; detection reads it right, and
        // a decimal comma that could be a thousands group is refused for its row
        Files.writeString(data, "id\tm_net\tT_tank\tV_meter\nrun-1\t1000\t20.5\t1002.6\nrun-2\t1,002\t20.5\t501.2\n");
        err.reset();
        assertEquals(2, run(err, "batch", TEMPLATE.toString(), data.toString(), "-o", out.toString()));
        m = err.toString(StandardCharsets.UTF_8);
        assertTrue(m.contains("runs.csv line 3: parameter 'm_net': \"1,002\" is ambiguous"), m);
    }
    /**
     * Every row of a batch is the budget a user would make from the template with that row's values: here each
     * row is also made by {@code quire template new} (the values applied to the template, written to a budget
     * file) and evaluated by {@code quire evaluate --format json} (the file read back by the normal load path,
     * compiled and evaluated on its own), and the figures must agree to the batch's 10 printed digits. The
     * values are invented flow points of the Tarrow Vale gravimetric rig.
     */
    @Test
    void everyRowEqualsTheEvaluationOfTheBudgetMadeFromTheTemplateWithItsValues(@TempDir Path dir) throws Exception {
        Path template = Path.of(System.getProperty("quire.projectRoot", ".."), "templates",
                "gravimetric-emf-flow-point.json");
        String[] header = {"I_net", "t_tank", "t_meter", "p_meter", "t_c", "p_a", "t_a", "h_a", "U_bal", "N_ind",
            "k_pulse", "d_conv"};
        String[][] rows = {
            {"850.741", "19.32", "18.75", "261690", "140.569", "100946", "19.55", "0.55", "0.0510",
                "8508.2;8517.8;8523.1;8500.3;8516.5", "10", "0.0002"},
            {"218.231", "17.72", "18.02", "185488", "230.722", "98861", "22.74", "0.68", "0.0131",
                "2184.1;2183.7;2178.9;2178.2;2181.3", "10", "0.0002"},
            {"1933.05", "23.1", "22.64", "390100", "31.5", "102870", "18.2", "0.31", "0.116",
                "19322.4;19340.2;19329.9;19335.0", "10", "0.0003"},
        };
        StringBuilder csv = new StringBuilder("id," + String.join(",", header) + "\n");
        for (int r = 0; r < rows.length; r++) {
            csv.append("P").append(r + 1).append(',').append(String.join(",", rows[r])).append('\n');
        }
        Path data = dir.resolve("points.csv");
        Files.writeString(data, csv);
        Path out = dir.resolve("results.csv");
        ByteArrayOutputStream err = new ByteArrayOutputStream();
        assertEquals(0, run(err, "batch", template.toString(), data.toString(), "-o", out.toString(), "-q"),
                err.toString(StandardCharsets.UTF_8));
        List<String> lines = Files.readAllLines(out);
        assertEquals("id,E_estimate,E_u,E_k,E_U,q_estimate,q_u,q_k,q_U,error", lines.get(0));
        for (int r = 0; r < rows.length; r++) {
            List<String> args = new java.util.ArrayList<>(List.of("template", "new", template.toString(), "-o",
                    dir.resolve("p" + r + ".json").toString()));
            for (int c = 0; c < header.length; c++) {
                if (header[c].equals("N_ind")) {
                    Path readings = dir.resolve("n" + r + ".csv");
                    Files.writeString(readings, "reading\n" + rows[r][c].replace(';', '\n') + "\n");
                    args.addAll(List.of("--readings", "N_ind=" + readings));
                } else {
                    args.addAll(List.of("--set", header[c] + "=" + rows[r][c]));
                }
            }
            assertEquals(0, run(err, args.toArray(String[]::new)), err.toString(StandardCharsets.UTF_8));
            ByteArrayOutputStream json = new ByteArrayOutputStream();
            assertEquals(0, CommandLine.run(new String[] {"evaluate", dir.resolve("p" + r + ".json").toString(),
                "--format", "json"}, new PrintStream(json, true, StandardCharsets.UTF_8),
                    new PrintStream(err, true, StandardCharsets.UTF_8)), err.toString(StandardCharsets.UTF_8));
            jakarta.json.JsonArray outputs;
            try (jakarta.json.JsonReader reader = jakarta.json.Json.createReader(
                    new java.io.StringReader(json.toString(StandardCharsets.UTF_8)))) {
                outputs = reader.readObject().getJsonArray("outputs");
            }
            String[] cells = lines.get(r + 1).split(",", -1);
            assertEquals("P" + (r + 1), cells[0]);
            assertEquals("", cells[9], lines.get(r + 1));
            assertEquals(2, outputs.size());
            for (int k = 0; k < 2; k++) {
                jakarta.json.JsonObject o = outputs.getJsonObject(k);
                assertEquals(k == 0 ? "E" : "q", o.getString("name"));
                String[] fields = {"estimate", "standardUncertainty", "coverageFactor", "expandedUncertainty"};
                for (int f = 0; f < 4; f++) {
                    double expected = o.getJsonNumber(fields[f]).doubleValue();
                    double printed = Double.parseDouble(cells[1 + 4 * k + f]);
                    // printed with 10 significant digits: half a unit in the 10th digit
                    assertEquals(expected, printed, 5e-10 * Math.abs(expected), "row " + (r + 1) + " "
                            + o.getString("name") + " " + fields[f]);
                }
            }
        }
    }
}
