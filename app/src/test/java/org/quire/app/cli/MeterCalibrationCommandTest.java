package org.quire.app.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * {@code quire calibration build|evaluate|fleet}: the Tarrow Vale DN 80 calibration builds and evaluates, and bad
 * input (wrong separator, missing reading, undeclared input, CMC gap, MPE formula with wrong units, one run
 * without a stated repeatability) exits with status 2, names the file and the line/column or JSON path, and
 * writes nothing.
 */
class MeterCalibrationCommandTest {
    private static final Path ROOT = Path.of(System.getProperty("quire.projectRoot", ".."));
    private static final Path METHOD = ROOT.resolve("templates/tvfl-emf-gravimetric-calibration-run.json");
    private static final Path RUNS = ROOT.resolve("worked-examples/calibration/tarrow-vale-dn80-runs.csv");
    private static final Path JOB = ROOT.resolve("worked-examples/calibration/tarrow-vale-dn80-job.json");

    @TempDir
    Path dir;

    private record Result(int status, String out, String err) {
    }

    private static Result run(String... args) {
        ByteArrayOutputStream o = new ByteArrayOutputStream();
        ByteArrayOutputStream e = new ByteArrayOutputStream();
        int s = CommandLine.run(args, new PrintStream(o, true, StandardCharsets.UTF_8),
                new PrintStream(e, true, StandardCharsets.UTF_8));
        return new Result(s, o.toString(StandardCharsets.UTF_8), e.toString(StandardCharsets.UTF_8));
    }

    private Result build(Path runs, Path job, Path out) {
        return run("calibration", "build", METHOD.toString(), runs.toString(), "--job", job.toString(), "-o",
                out.toString());
    }

    @Test
    void theWorkedExampleBuildsAndEvaluatesWithTheNewConstantBesideTheOld() throws Exception {
        Path cal = dir.resolve("cal.json");
        Result b = build(RUNS, JOB, cal);
        assertEquals(0, b.status(), b.err());
        assertTrue(b.out().contains("5 as-found points (15 runs) and 5 as-left points"), b.out());
        Result e = run("calibration", "evaluate", cal.toString());
        assertEquals(0, e.status(), e.err());
        assertTrue(e.out().contains("as found:") && e.out().contains("as left (measured):"), e.out());
        assertTrue(e.out().contains("1.23450") && e.out().contains("1.23083"), e.out());
        Result j = run("calibration", "evaluate", cal.toString(), "--format", "json");
        assertEquals(0, j.status(), j.err());
        assertTrue(j.out().contains("\"newConstant\""), j.out());
        Result c = run("calibration", "evaluate", cal.toString(), "--format", "csv", "-o", dir.resolve("r.csv").toString());
        assertEquals(0, c.status(), c.err());
        assertTrue(Files.readString(dir.resolve("r.csv")).startsWith("series,point,row,flow,error"));
    }

    @Test
    void aRunsFileWithTheWrongSeparatorIsRefusedAndNothingIsWritten() throws Exception {
        Path semi = dir.resolve("runs.csv");
        Files.writeString(semi, Files.readString(RUNS).replace(',', ';'));
        Path cal = dir.resolve("cal.json");
        Result r = run("calibration", "build", METHOD.toString(), semi.toString(), "--job", JOB.toString(), "-o",
                cal.toString(), "--separator", "comma");
        assertEquals(2, r.status(), r.err());
        assertTrue(r.err().contains("runs.csv") && r.err().contains("separator"), r.err());
        assertFalse(Files.exists(cal));
    }

    @Test
    void aMissingReadingIsRefusedWithItsLineAndColumn() throws Exception {
        Path runs = dir.resolve("runs.csv");
        String text = Files.readString(RUNS).replace("as-found,P2,2,634.51,12.24,150.000,", "as-found,P2,2,634.51,12.24,,");
        Files.writeString(runs, text);
        Path cal = dir.resolve("cal.json");
        Result r = build(runs, JOB, cal);
        assertEquals(2, r.status(), r.err());
        assertTrue(r.err().contains("line 7, column 6 (t_c)") && r.err().contains("'t_c' is missing"), r.err());
        assertFalse(Files.exists(cal));
    }

    @Test
    void anUndeclaredInputIsNamedAtBuildAndRefusedAtEvaluation() throws Exception {
        Path job = dir.resolve("job.json");
        Files.writeString(job, Files.readString(JOB).replace(",\n    \"d_inst\": \"shared\"", ""));
        Path cal = dir.resolve("cal.json");
        Result b = build(RUNS, job, cal);
        assertEquals(0, b.status(), b.err());
        assertTrue(b.out().contains("declare in $.declarations") && b.out().endsWith("d_inst\n"), b.out());
        Path results = dir.resolve("out.txt");
        Result e = run("calibration", "evaluate", cal.toString(), "-o", results.toString());
        assertEquals(2, e.status(), e.err());
        assertTrue(e.err().contains("cal.json: $.declarations: ") && e.err().contains("not declared: d_inst"), e.err());
        assertFalse(Files.exists(results));
    }

    @Test
    void aCmcTableWithAGapInTheJobIsRefusedWithItsJsonPath() throws Exception {
        Path job = dir.resolve("job.json");
        Files.writeString(job, Files.readString(JOB).replace("{\"from\": 10, \"to\": 50", "{\"from\": 12, \"to\": 50"));
        Path cal = dir.resolve("cal.json");
        Result r = build(RUNS, job, cal);
        assertEquals(2, r.status(), r.err());
        assertTrue(r.err().contains("job.json: $.cmc.ranges: CMC table: range 1 ends at 10 m³/h but range 2 starts at "
                + "12 m³/h: the table has a gap"), r.err());
        assertFalse(Files.exists(cal));
    }

    @Test
    void anMpeFormulaWithWrongUnitsIsRefusedWithItsJsonPath() throws Exception {
        Path job = dir.resolve("job.json");
        Files.writeString(job, Files.readString(JOB).replace("\"velocityUnit\": \"mm/s\"", "\"velocityUnit\": \"mm\""));
        Path cal = dir.resolve("cal.json");
        Result r = build(RUNS, job, cal);
        assertEquals(2, r.status(), r.err());
        assertTrue(r.err().contains("job.json: $.conformity.mpeFormula: MPE formula, velocityUnit: 'mm' is not a velocity"),
                r.err());
        assertFalse(Files.exists(cal));
    }

    @Test
    void aPointWithOneRunAndNoStatedRepeatabilityIsRefused() throws Exception {
        Path runs = dir.resolve("runs.csv");
        StringBuilder s = new StringBuilder();
        for (String line : Files.readAllLines(RUNS)) {
            if (!(line.startsWith("as-found,P5,2") || line.startsWith("as-found,P5,3"))) {
                s.append(line).append('\n');
            }
        }
        Files.writeString(runs, s);
        Path cal = dir.resolve("cal.json");
        assertEquals(0, build(runs, JOB, cal).status());
        Result e = run("calibration", "evaluate", cal.toString());
        assertEquals(2, e.status(), e.err());
        assertTrue(e.err().contains("$.asFound[4]: as-found point 5 'P5' (source row 15) has one run, so its "
                + "repeatability is undefined"), e.err());
    }

    /**
     * @return a fleet file of two meters, A and B, with the as-found runs of the worked example each; B without
     *     runs 2 and 3 of point 5 when {@code bWithOneRunAtP5}
     */
    private Path fleet(String name, boolean bWithOneRunAtP5) throws Exception {
        StringBuilder s = new StringBuilder("meter,constant,phase,point,run,I_full,I_empty,t_c,t_tank,t_meter,p_meter,N_p\n");
        for (String line : Files.readAllLines(RUNS)) {
            if (line.startsWith("as-found")) {
                s.append("A,1.2345,").append(line).append('\n');
                if (!bWithOneRunAtP5 || !(line.startsWith("as-found,P5,2") || line.startsWith("as-found,P5,3"))) {
                    s.append("B,1.1000,").append(line).append('\n');
                }
            }
        }
        return Files.writeString(dir.resolve(name), s);
    }

    @Test
    void aFleetGivesOneRowPerMeterAndPointAndAVerdictPerMeter() throws Exception {
        Path out = dir.resolve("fleet-results.csv");
        Result r = run("calibration", "fleet", METHOD.toString(), fleet("fleet.csv", false).toString(), "--job",
                JOB.toString(), "-o", out.toString());
        assertEquals(0, r.status(), r.err());
        var lines = Files.readAllLines(out);
        assertEquals(1 + 2 * (5 + 1), lines.size(), String.join("\n", lines));
        assertTrue(lines.get(6).startsWith("A,verdict,as left (predicted),"), lines.get(6));
        assertTrue(lines.get(12).startsWith("B,verdict,") && lines.get(12).contains(",1.100000000,"), lines.get(12));
    }

    @Test
    void aFleetWithARefusedMeterWritesTheOthersAndEndsWithTheUserErrorStatus() throws Exception {
        // meter B lacks runs 2 and 3 of point 5 (one run, no stated repeatability: refused as above); A is whole
        Path out = dir.resolve("fleet-b-results.csv");
        Result r = run("calibration", "fleet", METHOD.toString(), fleet("fleet-b-refused.csv", true).toString(),
                "--job", JOB.toString(), "-o", out.toString());
        assertEquals(2, r.status(), "a refused meter is bad input (exit status 2): " + r.err());
        assertTrue(r.err().contains("1 of 2 meters evaluated"), r.err());
        var lines = Files.readAllLines(out);
        assertTrue(lines.stream().anyMatch(l -> l.startsWith("A,verdict,")), "meter A's results are written");
        assertTrue(lines.stream().anyMatch(l -> l.startsWith("B,") && l.contains("has one run")),
                "meter B's row says why: " + String.join("\n", lines));
    }
}
