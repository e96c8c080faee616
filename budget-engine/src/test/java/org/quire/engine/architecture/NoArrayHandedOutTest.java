package org.quire.engine.architecture;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;

/**
 * The engine's values are immutable (DEVELOPERS.md, Shape): no public method hands out an array the value keeps.
 * The engine's sources are read: every public method without parameters that returns an array must build or copy
 * what it returns (not {@code return field;}), and a record with an array component must override that
 * component's accessor (the generated one hands out the array itself). The same holds for what a record is built
 * from: its compact constructor must copy an array component.
 */
class NoArrayHandedOutTest {
    private static final Pattern ARRAY_GETTER = Pattern.compile(
            "public\\s+(?:static\\s+)?(?:final\\s+)?[\\w<>]+\\s*(?:\\[\\])+\\s+(\\w+)\\(\\)\\s*\\{");
    private static final Pattern BARE_RETURN = Pattern.compile(
            "return\\s+(?:this\\.)?([A-Za-z_]\\w*)(?:\\[[^\\]]*\\])?\\s*;");
    private static final Pattern RECORD = Pattern.compile("record\\s+(\\w+)\\s*\\(([^)]*)\\)");
    private static final Pattern ARRAY_COMPONENT = Pattern.compile("[\\w<>]+\\s*(?:\\[\\])+\\s+(\\w+)");

    private static Path sources() {
        Path p = Path.of("src", "main", "java");
        return Files.isDirectory(p) ? p : Path.of("budget-engine", "src", "main", "java");
    }

    private static String body(String text, int open) {
        int depth = 0;
        for (int i = open; i < text.length(); i++) {
            char c = text.charAt(i);
            if (c == '{') {
                depth++;
            } else if (c == '}' && --depth == 0) {
                return text.substring(open, i + 1);
            }
        }
        return text.substring(open);
    }

    @Test
    void noPublicMethodHandsOutAnArrayItKeeps() throws IOException {
        List<String> leaks = new ArrayList<>();
        int getters = 0;
        int records = 0;
        List<Path> files;
        try (Stream<Path> s = Files.walk(sources())) {
            files = s.filter(f -> f.toString().endsWith(".java")).toList();
        }
        for (Path f : files) {
            String text = Files.readString(f);
            Matcher g = ARRAY_GETTER.matcher(text);
            while (g.find()) {
                getters++;
                String b = body(text, g.end() - 1);
                Matcher ret = BARE_RETURN.matcher(b);
                boolean kept = false;
                while (ret.find()) {
                    // returning a local array the method built is fine; returning a field is not
                    kept |= !Pattern.compile("\\[\\]\\s+" + ret.group(1) + "\\s*=").matcher(b).find();
                }
                if (kept) {
                    leaks.add(f.getFileName() + ": " + g.group(1) + "() returns an array it keeps: " + b.strip());
                }
            }
            Matcher r = RECORD.matcher(text);
            while (r.find()) {
                Matcher a = ARRAY_COMPONENT.matcher(r.group(2));
                while (a.find()) {
                    records++;
                    String name = a.group(1);
                    if (!Pattern.compile("public\\s+[\\w<>]+\\s*(?:\\[\\])+\\s+" + name + "\\(\\)").matcher(text).find()) {
                        leaks.add(f.getFileName() + ": record " + r.group(1) + " hands out its array component "
                                + name + " (override the accessor to return a copy)");
                    }
                    if (!Pattern.compile(name + "\\s*=\\s*[^;]*(clone\\(\\)|copy\\()").matcher(text).find()) {
                        leaks.add(f.getFileName() + ": record " + r.group(1) + " keeps the array " + name
                                + " it was built from (copy it in the compact constructor)");
                    }
                }
            }
        }
        assertTrue(getters >= 10 && records >= 4, "the scan found the engine's array accessors (" + getters
                + " getters, " + records + " array components)");
        assertEquals(List.of(), leaks);
    }
}
