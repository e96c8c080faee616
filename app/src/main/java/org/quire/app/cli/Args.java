package org.quire.app.cli;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;

/** Command-line arguments: positional words, {@code --option value} pairs and {@code --flag}s. */
final class Args {
    private final List<String> positional = new ArrayList<>();
    private final Map<String, String> options = new LinkedHashMap<>();
    private final Map<String, List<String>> every = new LinkedHashMap<>();

    /**
     * @param args the words after the command name
     * @param withValue options that take a value
     * @param flags options that take none
     */
    Args(String[] args, int from, Set<String> withValue, Set<String> flags) throws UsageException {
        for (int i = from; i < args.length; i++) {
            String a = args[i];
            if (a.startsWith("--")) {
                String name = a.substring(2);
                String value = null;
                int eq = name.indexOf('=');
                if (eq >= 0) {
                    value = name.substring(eq + 1);
                    name = name.substring(0, eq);
                }
                if (withValue.contains(name)) {
                    if (value == null) {
                        if (i + 1 >= args.length) {
                            throw new UsageException("option --" + name + " needs a value");
                        }
                        value = args[++i];
                    }
                    options.put(name, value);
                    every.computeIfAbsent(name, k -> new ArrayList<>()).add(value);
                } else if (flags.contains(name)) {
                    if (value != null) {
                        throw new UsageException("option --" + name + " takes no value");
                    }
                    options.put(name, "true");
                } else {
                    List<String> known = new ArrayList<>(withValue);
                    known.addAll(flags);
                    throw new UsageException("unknown option --" + name
                            + (known.isEmpty() ? "" : "; known options: --" + String.join(", --", known)));
                }
            } else if (a.equals("-o") && withValue.contains("output")) {
                if (i + 1 >= args.length) {
                    throw new UsageException("option -o needs a file name");
                }
                options.put("output", args[++i]);
            } else {
                positional.add(a);
            }
        }
    }

    List<String> positional() {
        return positional;
    }

    /** @return every value given for an option that may be repeated, in order; empty when not given */
    List<String> all(String option) {
        return every.getOrDefault(option, List.of());
    }

    boolean has(String option) {
        return options.containsKey(option);
    }

    String get(String option, String fallback) {
        return options.getOrDefault(option, fallback);
    }

    double number(String option, double fallback) throws UsageException {
        String v = options.get(option);
        if (v == null) {
            return fallback;
        }
        try {
            double d = Double.parseDouble(v.trim());
            if (!Double.isFinite(d)) {
                throw new NumberFormatException();
            }
            return d;
        } catch (NumberFormatException e) {
            throw new UsageException("--" + option + " needs a number, not '" + v + "'");
        }
    }

    /** @return the option as a date written YYYY-MM-DD, or {@code fallback} when not given */
    java.time.LocalDate date(String option, java.time.LocalDate fallback) throws UsageException {
        if (!options.containsKey(option)) {
            return fallback;
        }
        try {
            return java.time.LocalDate.parse(options.get(option));
        } catch (java.time.format.DateTimeParseException e) {
            throw new UsageException("--" + option + " needs a date written YYYY-MM-DD, not '" + options.get(option) + "'");
        }
    }

    long integer(String option, long fallback) throws UsageException {
        String v = options.get(option);
        if (v == null) {
            return fallback;
        }
        try {
            String t = v.trim().replace("_", "");
            if (t.matches("[0-9.]+[eE][0-9]+")) {
                double d = Double.parseDouble(t);
                if (d != Math.rint(d) || d > Long.MAX_VALUE) {
                    throw new NumberFormatException();
                }
                return (long) d;
            }
            return Long.parseLong(t);
        } catch (NumberFormatException e) {
            throw new UsageException("--" + option + " needs a whole number, not '" + v + "'");
        }
    }

    void expectPositional(int count, String usage) throws UsageException {
        if (positional.size() != count) {
            throw new UsageException((positional.size() < count ? "missing argument" : "too many arguments: "
                    + String.join(" ", positional.subList(Math.min(count, positional.size()), positional.size())))
                    + "\nusage: " + usage);
        }
    }
}
