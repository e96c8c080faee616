package org.quire.app.fuzz;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.PrintStream;
import java.io.StringReader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.SplittableRandom;
import java.util.concurrent.ConcurrentHashMap;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.TimeoutException;
import java.util.concurrent.atomic.AtomicLongArray;
import java.util.stream.Stream;
import jakarta.json.Json;
import jakarta.json.JsonArray;
import jakarta.json.JsonArrayBuilder;
import jakarta.json.JsonObject;
import jakarta.json.JsonObjectBuilder;
import jakarta.json.JsonReader;
import jakarta.json.JsonValue;
import org.quire.app.cli.CommandLine;

/**
 * Runs Quire's commands in-process over mutated copies of the shipped templates and worked examples, and over
 * budgets with random model expressions, and counts exit statuses. Exit 0, 1 and 2 are answers; exit 3 (an
 * internal error), an uncaught throwable or a run past the time limit is a finding, kept with the input that
 * caused it. Mutations: deep nesting, numbers a double cannot hold or that overflow when squared, type swaps,
 * deleted and duplicated keys, byte flips and truncation, and models from a small grammar (cycles, long chains,
 * deep nesting, user functions nested or calling each other twice at every level).
 *
 * <p>Deterministic for a seed. Not thread-safe; each run is done on a worker thread so that a hang is caught.
 */
final class Fuzzer {
    static final int EXIT_KINDS = 4;
    private static final String[] HUGE = {"1e999999", "-1e999999", "1e308", "-1e308", "1.7976931348623157e308",
        "1e-400", "4.9e-324", "1e154", "1e200", "0", "-0", "1" + "0".repeat(400), "1e" + "0".repeat(80) + "1",
        "0." + "0".repeat(300) + "1", "123456789012345678901234567890", "1e-308", "2147483648", "-1"};

    private final Path work;
    private final List<Path> seeds;
    private final long timeoutMillis;
    private final ExecutorService pool = Executors.newCachedThreadPool(r -> {
        Thread t = new Thread(r, "fuzz-run");
        t.setDaemon(true);
        return t;
    });
    final AtomicLongArray exits = new AtomicLongArray(EXIT_KINDS);
    final java.util.concurrent.atomic.AtomicLong hangs = new java.util.concurrent.atomic.AtomicLong();
    final java.util.concurrent.atomic.AtomicLong files = new java.util.concurrent.atomic.AtomicLong();
    final java.util.concurrent.atomic.AtomicLong models = new java.util.concurrent.atomic.AtomicLong();
    final Map<String, String> findings = new ConcurrentHashMap<>();

    Fuzzer(Path projectRoot, Path work, long timeoutMillis) throws IOException {
        this.work = work;
        this.timeoutMillis = timeoutMillis;
        List<Path> s = new ArrayList<>();
        for (String dir : List.of("templates", "worked-examples")) {
            try (Stream<Path> files = Files.list(projectRoot.resolve(dir))) {
                files.filter(p -> p.toString().endsWith(".json")).sorted().forEach(s::add);
            }
        }
        if (s.isEmpty()) {
            throw new IllegalStateException("no templates or worked examples under " + projectRoot);
        }
        this.seeds = List.copyOf(s);
    }

    List<Path> seeds() {
        return seeds;
    }

    void shutdown() {
        pool.shutdownNow();
    }

    /** Runs one command line and counts its exit status; a hang or an uncaught throwable is a finding. */
    int run(String label, String input, String... args) {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        ByteArrayOutputStream err = new ByteArrayOutputStream();
        Future<Integer> f = pool.submit(() -> {
            try (PrintStream o = new PrintStream(out, true, StandardCharsets.UTF_8);
                    PrintStream e = new PrintStream(err, true, StandardCharsets.UTF_8)) {
                return CommandLine.run(args, o, e);
            }
        });
        int status;
        try {
            status = f.get(timeoutMillis, TimeUnit.MILLISECONDS);
        } catch (TimeoutException e) {
            f.cancel(true);
            hangs.incrementAndGet();
            findings.putIfAbsent("hang " + args[0], label + " " + String.join(" ", args) + "\n" + abbreviate(input));
            return -1;
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            return -1;
        } catch (java.util.concurrent.ExecutionException e) {
            status = 3;
            err.writeBytes(String.valueOf(e.getCause()).getBytes(StandardCharsets.UTF_8));
        }
        int kind = status >= 0 && status < EXIT_KINDS ? status : 3;
        exits.incrementAndGet(kind);
        if (kind == 3) {
            String msg = err.toString(StandardCharsets.UTF_8);
            String key = args[0] + ": " + msg.lines().filter(l -> l.contains("internal error") || l.contains("Exception")
                    || l.contains("Error")).findFirst().orElse(msg).replaceAll("[0-9.E-]+", "#");
            if (findings.putIfAbsent(key.length() > 300 ? key.substring(0, 300) : key,
                    label + " " + String.join(" ", args) + "\n" + msg + "\n" + abbreviate(input)) == null) {
                System.err.println("FINDING (new) " + key);
                keep(input, args);
            }
        }
        return kind;
    }

    /** Keeps the whole input of a new finding in target/fuzz-findings, so that it can be run again by hand. */
    private static void keep(String input, String... args) {
        if (input == null || input.isEmpty()) {
            return;
        }
        try {
            Path dir = Path.of("target", "fuzz-findings");
            Files.createDirectories(dir);
            Path kept = dir.resolve(args[0] + "-" + Integer.toHexString(input.hashCode()) + ".input");
            Files.writeString(kept, input);
            System.err.println("  input kept in " + kept.toAbsolutePath() + " (command: " + String.join(" ", args) + ")");
        } catch (IOException e) {
            System.err.println("  input not kept: " + e);
        }
    }

    private static String abbreviate(String s) {
        return s == null ? "" : s.length() > 4000 ? s.substring(0, 4000) + "..." : s;
    }

    /** Mutates one seed file, writes it and runs the commands on it ({@code all}: every command, else one). */
    void budgetCase(SplittableRandom rnd, int index, boolean all) throws IOException {
        Path seed = seeds.get(rnd.nextInt(seeds.size()));
        String text = Files.readString(seed);
        String mutated = mutate(text, rnd);
        Path f = work.resolve("b" + index + ".json");
        Files.writeString(f, mutated);
        files.incrementAndGet();
        List<String[]> commands = commands(f, index);
        if (all) {
            for (String[] c : commands) {
                run(seed.getFileName().toString(), mutated, c);
            }
        } else {
            run(seed.getFileName().toString(), mutated, commands.get(rnd.nextInt(commands.size())));
        }
        Files.deleteIfExists(f);
    }

    private List<String[]> commands(Path f, int index) {
        String file = f.toString();
        Path out = work.resolve("r" + index);
        return List.of(new String[] {"evaluate", file}, new String[] {"evaluate", file, "--format", "json"},
                new String[] {"montecarlo", file, "--trials", "300", "--seed", "1", "--quiet"},
                new String[] {"review", file}, new String[] {"range", file},
                new String[] {"report", file, "-o", out.resolve("r.html").toString()},
                new String[] {"template", "check", file},
                new String[] {"diff", seeds.get(index % seeds.size()).toString(), file});
    }

    /** A budget with a random model over its inputs, run through evaluate or montecarlo. */
    void modelCase(SplittableRandom rnd, int index) throws IOException {
        int inputs = 1 + rnd.nextInt(4);
        StringBuilder model = new StringBuilder();
        String shape = ModelGrammar.model(rnd, inputs, model);
        JsonArrayBuilder in = Json.createArrayBuilder();
        for (int i = 1; i <= inputs; i++) {
            double est = rnd.nextInt(3) == 0 ? 0 : rnd.nextDouble() * 10 - 2;
            in.add(Json.createObjectBuilder().add("name", "X" + i).add("evaluation", Json.createObjectBuilder()
                    .add("type", "B").add("distribution", rnd.nextBoolean() ? "normal" : "rectangular")
                    .add("estimate", est).add(rnd.nextBoolean() ? "standardUncertainty" : "halfWidth",
                            rnd.nextInt(20) == 0 ? 1e300 : 0.01 + rnd.nextDouble())));
        }
        JsonArrayBuilder lines = Json.createArrayBuilder();
        model.toString().lines().forEach(lines::add);
        JsonObject b = Json.createObjectBuilder().add("format", "quire-budget").add("formatVersion", 1)
                .add("title", "fuzz model " + index).add("model", lines)
                .add("outputs", Json.createArrayBuilder().add(Json.createObjectBuilder().add("name", "Y")))
                .add("inputs", in).add("settings", Json.createObjectBuilder().add("coverageProbability", 0.95)).build();
        Path f = work.resolve("m" + index + ".json");
        String text = b.toString();
        Files.writeString(f, text);
        models.incrementAndGet();
        if (rnd.nextInt(4) == 0) {
            run("model " + shape, text, "montecarlo", f.toString(), "--trials", "200", "--seed", "2", "--quiet");
        } else {
            run("model " + shape, text, "evaluate", f.toString());
        }
        Files.deleteIfExists(f);
    }

    /** A batch run of the shipped gravimetric template over a small mutated CSV table, and a fit. */
    void csvCase(SplittableRandom rnd, int index, Path template) throws IOException {
        // the template's own values, its example readings of N_ind in one cell separated by ';'
        String[] cells = {"997.1", "20.42", "20.55", "280000", "72.0", "100650", "21.3", "0.48", "0.06",
            "10013.2;10009.6;10012.8;10010.1;10014.0", "10", "0.0002"};
        StringBuilder csv = new StringBuilder("id,I_net,t_tank,t_meter,p_meter,t_c,p_a,t_a,h_a,U_bal,N_ind,k_pulse,d_conv\n");
        for (int r = 0; r < 3; r++) {
            csv.append("TV-").append(r);
            for (String c : cells) {
                csv.append(',').append(rnd.nextInt(10) == 0 ? HUGE[rnd.nextInt(HUGE.length)] : c);
            }
            csv.append('\n');
        }
        String table = byteMutate(csv.toString(), rnd, 1 + rnd.nextInt(3));
        Path f = work.resolve("t" + index + ".csv");
        Files.writeString(f, table);
        run("batch", table, "batch", template.toString(), f.toString(), "-o", work.resolve("o" + index + ".csv").toString());
        String fit = byteMutate("x,y,u_y\n1,2.01,0.1\n2,3.98,0.1\n3,6.02,0.1\n4,8.1,0.1\n", rnd, 1 + rnd.nextInt(3));
        Files.writeString(f, fit);
        run("fit", fit, "fit", f.toString());
        Files.deleteIfExists(f);
        Files.deleteIfExists(work.resolve("o" + index + ".csv"));
    }

    static String mutate(String text, SplittableRandom rnd) {
        int kind = rnd.nextInt(10);
        if (kind >= 8) {
            return byteMutate(text, rnd, 1 + rnd.nextInt(8));
        }
        JsonValue root;
        try (JsonReader r = Json.createReader(new StringReader(text))) {
            root = r.readValue();
        }
        int steps = 1 + rnd.nextInt(3);
        for (int i = 0; i < steps; i++) {
            root = mutateTree(root, rnd, rnd.nextInt(6), 0);
        }
        String out = root.toString();
        if (kind == 7) {
            // a number the reader cannot hold, written in the text (JSON-P would refuse to build it)
            out = out.replaceFirst("(\"[A-Za-z]*\":)-?[0-9][0-9.eE+-]*", "$1" + HUGE[rnd.nextInt(HUGE.length)]);
        }
        if (kind == 6) {
            // a duplicated key
            out = out.replaceFirst("\\{\"", "{\"title\":\"dup\",\"");
        }
        return out;
    }

    private static JsonValue mutateTree(JsonValue v, SplittableRandom rnd, int op, int depth) {
        boolean here = depth > 6 || rnd.nextInt(4) == 0;
        if (v.getValueType() == JsonValue.ValueType.OBJECT && !v.asJsonObject().isEmpty()) {
            JsonObject o = v.asJsonObject();
            List<String> keys = new ArrayList<>(o.keySet());
            String key = keys.get(rnd.nextInt(keys.size()));
            JsonObjectBuilder b = Json.createObjectBuilder(o);
            if (here && op == 0) {
                b.remove(key);
            } else if (here) {
                b.add(key, replace(o.get(key), rnd, op));
            } else {
                b.add(key, mutateTree(o.get(key), rnd, op, depth + 1));
            }
            return b.build();
        }
        if (v.getValueType() == JsonValue.ValueType.ARRAY && !v.asJsonArray().isEmpty()) {
            JsonArray a = v.asJsonArray();
            int k = rnd.nextInt(a.size());
            JsonArrayBuilder b = Json.createArrayBuilder();
            for (int i = 0; i < a.size(); i++) {
                if (i != k) {
                    b.add(a.get(i));
                } else if (here && op == 0) {
                    continue;
                } else if (here && op == 1) {
                    b.add(a.get(i)).add(a.get(i));
                } else {
                    b.add(here ? replace(a.get(i), rnd, op) : mutateTree(a.get(i), rnd, op, depth + 1));
                }
            }
            return b.build();
        }
        return replace(v, rnd, op);
    }

    private static JsonValue replace(JsonValue v, SplittableRandom rnd, int op) {
        switch (op) {
            case 2: {
                JsonValue w = v;
                int n = 20 + rnd.nextInt(30);
                for (int i = 0; i < n; i++) {
                    w = rnd.nextBoolean() ? Json.createArrayBuilder().add(w).build()
                            : Json.createObjectBuilder().add("x", w).build();
                }
                return w;
            }
            case 3: {
                double[] d = {1e308, -1e308, 1e154, 1e-308, 0, -1, Double.MAX_VALUE, 1e20, 1e-20, 0.5, 2, 1e6};
                return Json.createValue(d[rnd.nextInt(d.length)]);
            }
            case 4: {
                JsonValue[] t = {JsonValue.NULL, JsonValue.TRUE, JsonValue.EMPTY_JSON_ARRAY, JsonValue.EMPTY_JSON_OBJECT,
                    Json.createValue("1,002"), Json.createValue(""), Json.createValue(7), Json.createValue("x")};
                return t[rnd.nextInt(t.length)];
            }
            default:
                if (v.getValueType() == JsonValue.ValueType.NUMBER) {
                    double d = ((jakarta.json.JsonNumber) v).doubleValue() * (rnd.nextBoolean() ? -1 : 1e150);
                    return Json.createValue(Double.isFinite(d) ? d : 1e308);
                }
                if (v.getValueType() == JsonValue.ValueType.STRING) {
                    String s = ((jakarta.json.JsonString) v).getString();
                    return Json.createValue(rnd.nextBoolean() ? ModelGrammar.expression(rnd, 3, 4) : s + s);
                }
                return JsonValue.NULL;
        }
    }

    static String byteMutate(String text, SplittableRandom rnd, int n) {
        StringBuilder s = new StringBuilder(text);
        String chars = "{}[],:\"0123456789.eE-+; \n\t\\a";
        for (int i = 0; i < n && s.length() > 0; i++) {
            int at = rnd.nextInt(s.length());
            switch (rnd.nextInt(4)) {
                case 0 -> s.setCharAt(at, chars.charAt(rnd.nextInt(chars.length())));
                case 1 -> s.insert(at, chars.charAt(rnd.nextInt(chars.length())));
                case 2 -> s.deleteCharAt(at);
                default -> s.setLength(at);
            }
        }
        return s.toString();
    }

    String summary() {
        return String.format(java.util.Locale.ROOT, "%d mutated budget files, %d random models; exit 0: %d, exit 1: "
                + "%d, exit 2: %d, exit 3: %d, hangs: %d", files.get(), models.get(), exits.get(0), exits.get(1),
                exits.get(2), exits.get(3), hangs.get());
    }
}
