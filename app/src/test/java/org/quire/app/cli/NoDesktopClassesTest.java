package org.quire.app.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.TimeUnit;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * The command line loads no class of the desktop toolkit: a short command spent part of its start loading
 * {@code java.awt} classes named by the entry point's workbench code (issue 16). Each case starts the program in
 * a JVM of its own, as a user's shell does, with {@code -verbose:class}, and reads the name of every class it
 * loaded.
 */
class NoDesktopClassesTest {
    /** A line of {@code -verbose:class} (unified logging): {@code [0.012s][info][class,load] NAME source: ...}. */
    private static final Pattern LOADED = Pattern.compile("\\[class,load\\] (\\S+) ");
    private static final List<String> DESKTOP = List.of("javax.swing.", "java.awt.", "com.formdev.");

    @TempDir
    Path folder;

    @ParameterizedTest
    @ValueSource(strings = {
        "evaluate worked-examples/jcgm100-h1-end-gauge.json",
        "evaluate worked-examples/jcgm100-h2-resistance-reactance.json --format json",
        "montecarlo templates/gravimetric-emf-flow-point.json --trials 20000",
        "montecarlo worked-examples/jcgm101-9.3-mass-calibration.json --trials 20000 --seed 1",
        "batch templates/gravimetric-emf-flow-point.json ROWS -o OUT",
        "fit worked-examples/iso-ts-28037-clause6-wls.csv --method WLS",
        "--help"})
    void aCommandLoadsNoSwingAwtOrLookAndFeelClass(String command) throws Exception {
        Path root = CommandLineTest.root().toAbsolutePath().normalize();
        Path rows = folder.resolve("rows.csv");
        // one invented flow point of the fictional Tarrow Vale rig, in the template's parameters
        Files.writeString(rows, "id,I_net,t_tank,t_meter,p_meter,t_c,p_a,t_a,h_a,U_bal,N_ind,k_pulse,d_conv\n"
                + "TV-1,398.75,19.8,19.9,260000,28.8,100900,21.0,0.5,0.04,3990.1;3987.6;3988.9;3986.2;3989.4,10,"
                + "0.0002\n");
        List<String> cmd = new ArrayList<>(List.of(Path.of(System.getProperty("java.home"), "bin", "java")
                .toString(), "-verbose:class", "-cp", System.getProperty("java.class.path"), "org.quire.app.Main"));
        for (String w : command.split(" ")) {
            cmd.add(w.equals("ROWS") ? rows.toString() : w.equals("OUT") ? folder.resolve("out.csv").toString()
                    : w.startsWith("worked-examples/") || w.startsWith("templates/") ? root.resolve(w).toString() : w);
        }
        Path out = folder.resolve("stdout.txt");
        Path err = folder.resolve("stderr.txt");
        Process p = new ProcessBuilder(cmd).directory(folder.toFile()).redirectOutput(out.toFile())
                .redirectError(err.toFile()).start();
        assertTrue(p.waitFor(300, TimeUnit.SECONDS), "the JVM did not end: " + command);
        String stdout = Files.readString(out, StandardCharsets.UTF_8);
        assertEquals(0, p.exitValue(), command + "\n" + Files.readString(err, StandardCharsets.UTF_8));
        List<String> loaded = new ArrayList<>();
        List<String> desktop = new ArrayList<>();
        Matcher m = LOADED.matcher(stdout);
        while (m.find()) {
            loaded.add(m.group(1));
            if (DESKTOP.stream().anyMatch(m.group(1)::startsWith)) {
                desktop.add(m.group(1));
            }
        }
        // the log was read: the entry point itself is among the classes loaded
        assertTrue(loaded.contains("org.quire.app.Main"), "no class-loading log read for " + command);
        assertEquals(List.of(), desktop, command + " loads desktop classes");
    }
}
