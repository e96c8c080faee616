package org.quire.app.architecture;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.Deque;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeMap;
import java.util.TreeSet;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;

/**
 * The packages of the engine and of the application form no cycle: a package may use another only if that one
 * does not use it back, directly or through others. Dependencies are read from the sources: every import and
 * every fully qualified name {@code org.quire....Type} outside comments and string literals. The strongly
 * connected components of that graph (Tarjan's algorithm, R. Tarjan, SIAM J. Comput. 1 (1972) 146-160) must all
 * be single packages.
 */
class PackageCycleTest {
    private static final Pattern PACKAGE = Pattern.compile("(?m)^package ([\\w.]+);");
    private static final Pattern REFERENCE = Pattern.compile("\\b(org\\.quire(?:\\.[a-z]\\w*)+)\\.[A-Z]");
    private static final Pattern COMMENT_OR_STRING = Pattern.compile(
            "/\\*.*?\\*/|//[^\\n]*|\"(?:\\\\.|[^\"\\\\])*\"|'(?:\\\\.|[^'\\\\])'", Pattern.DOTALL);

    private static Path root() {
        return Path.of(System.getProperty("quire.projectRoot", ".."));
    }

    /** @return package -> packages it uses, among the packages of the sources given */
    static Map<String, Set<String>> graph(Map<String, String> sources) {
        Map<String, Set<String>> g = new TreeMap<>();
        Map<String, String> cleaned = new HashMap<>();
        for (Map.Entry<String, String> e : sources.entrySet()) {
            String text = COMMENT_OR_STRING.matcher(e.getValue()).replaceAll(" ");
            Matcher p = PACKAGE.matcher(text);
            if (p.find()) {
                g.computeIfAbsent(p.group(1), k -> new TreeSet<>());
                cleaned.put(e.getKey(), text);
            }
        }
        for (String text : cleaned.values()) {
            Matcher p = PACKAGE.matcher(text);
            p.find();
            String from = p.group(1);
            Matcher r = REFERENCE.matcher(text);
            while (r.find()) {
                String to = r.group(1);
                if (!to.equals(from) && g.containsKey(to)) {
                    g.get(from).add(to);
                }
            }
        }
        return g;
    }

    /** @return the cycles: strongly connected components of more than one package, each with its edges */
    static List<String> cycles(Map<String, Set<String>> g) {
        Map<String, Integer> index = new HashMap<>();
        Map<String, Integer> low = new HashMap<>();
        Deque<String> stack = new ArrayDeque<>();
        Set<String> onStack = new TreeSet<>();
        List<String> found = new ArrayList<>();
        int[] counter = {0};
        for (String v : g.keySet()) {
            if (!index.containsKey(v)) {
                strongConnect(v, g, index, low, stack, onStack, found, counter);
            }
        }
        return found;
    }

    private static void strongConnect(String v, Map<String, Set<String>> g, Map<String, Integer> index,
            Map<String, Integer> low, Deque<String> stack, Set<String> onStack, List<String> found, int[] counter) {
        index.put(v, counter[0]);
        low.put(v, counter[0]++);
        stack.push(v);
        onStack.add(v);
        for (String w : g.get(v)) {
            if (!index.containsKey(w)) {
                strongConnect(w, g, index, low, stack, onStack, found, counter);
                low.put(v, Math.min(low.get(v), low.get(w)));
            } else if (onStack.contains(w)) {
                low.put(v, Math.min(low.get(v), index.get(w)));
            }
        }
        if (low.get(v).equals(index.get(v))) {
            Set<String> component = new TreeSet<>();
            String w;
            do {
                w = stack.pop();
                onStack.remove(w);
                component.add(w);
            } while (!w.equals(v));
            if (component.size() > 1) {
                StringBuilder s = new StringBuilder("cycle among " + component + ":");
                for (String a : component) {
                    for (String b : g.get(a)) {
                        if (component.contains(b)) {
                            s.append("\n  ").append(a).append(" -> ").append(b);
                        }
                    }
                }
                found.add(s.toString());
            }
        }
    }

    private static Map<String, String> read(Path dir) throws IOException {
        Map<String, String> m = new TreeMap<>();
        try (Stream<Path> s = Files.walk(dir)) {
            for (Path p : s.filter(f -> f.toString().endsWith(".java")).toList()) {
                m.put(p.toString(), Files.readString(p, StandardCharsets.UTF_8));
            }
        }
        return m;
    }

    @Test
    void theEnginesPackagesFormNoCycle() throws IOException {
        Map<String, Set<String>> g = graph(read(root().resolve("budget-engine/src/main/java")));
        assertTrue(g.size() > 10, "the engine's packages were found: " + g.keySet());
        List<String> c = cycles(g);
        assertTrue(c.isEmpty(), String.join("\n", c));
    }

    @Test
    void theApplicationsPackagesFormNoCycle() throws IOException {
        Map<String, Set<String>> g = graph(read(root().resolve("app/src/main/java")));
        assertTrue(g.size() > 10, "the application's packages were found: " + g.keySet());
        List<String> c = cycles(g);
        assertTrue(c.isEmpty(), String.join("\n", c));
    }

    @Test
    void aCycleIsFoundThroughImportsAndQualifiedNamesButNotThroughComments() {
        Map<String, String> src = new TreeMap<>();
        src.put("A.java", "package org.quire.x.a;\nimport org.quire.x.b.B;\nclass A {}\n");
        src.put("B.java", "package org.quire.x.b;\nclass B { org.quire.x.c.C c; }\n");
        src.put("C.java", "package org.quire.x.c;\n/** see {@link org.quire.x.d.D} */\nclass C {"
                + " String s = \"org.quire.x.d.D\"; org.quire.x.a.A a; }\n");
        src.put("D.java", "package org.quire.x.d;\n// org.quire.x.a.A in a comment\nclass D {}\n");
        Map<String, Set<String>> g = graph(src);
        assertEquals(Set.of(), g.get("org.quire.x.d"), "comments are not dependencies");
        assertEquals(Set.of("org.quire.x.a"), g.get("org.quire.x.c"), "strings and Javadoc are not dependencies");
        List<String> c = cycles(g);
        assertEquals(1, c.size(), c.toString());
        assertTrue(c.get(0).startsWith("cycle among [org.quire.x.a, org.quire.x.b, org.quire.x.c]"), c.get(0));
        src.remove("C.java");
        assertTrue(cycles(graph(src)).isEmpty());
    }
}
