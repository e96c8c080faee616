package org.quire.engine.io;

import java.util.ArrayList;
import java.util.List;

/**
 * A scan of JSON text before it is parsed, so that the limits of the budget format are reported with the JSON
 * path where they are passed (the parser would fail deep inside, without one): nesting deeper than
 * {@link BudgetJson#MAX_DEPTH}, and numbers longer than {@link #MAX_NUMBER_CHARS} characters (more digits
 * than any measurement has, or an exponent no double can hold). Syntax errors are left to the parser.
 * Stateless and thread-safe.
 */
final class JsonLimits {
    /** The longest number token accepted: a double needs at most 17 significant digits and a 3-digit exponent. */
    static final int MAX_NUMBER_CHARS = 64;

    private JsonLimits() {
    }

    /** One open object or array: its path, and the key or index being read. */
    private static final class Level {
        final String path;
        final boolean array;
        int index;
        String key;

        Level(String path, boolean array) {
            this.path = path;
            this.array = array;
        }

        String child() {
            return array ? path + "[" + index + "]" : key == null ? path : path + "." + key;
        }
    }

    /**
     * @throws BudgetFormatException with the path of the first value nested too deeply or of a number too long
     */
    static void check(String text) throws BudgetFormatException {
        List<Level> stack = new ArrayList<>();
        String lastString = null;
        int n = text.length();
        for (int i = 0; i < n; i++) {
            char c = text.charAt(i);
            switch (c) {
                case '"': {
                    int j = i + 1;
                    StringBuilder s = new StringBuilder();
                    while (j < n && text.charAt(j) != '"') {
                        if (text.charAt(j) == '\\') {
                            j++;
                        }
                        if (j < n && s.length() < 200) {
                            s.append(text.charAt(j));
                        }
                        j++;
                    }
                    lastString = s.toString();
                    i = j;
                    break;
                }
                case ':':
                    if (!stack.isEmpty() && !top(stack).array) {
                        top(stack).key = lastString;
                    }
                    break;
                case ',':
                    if (!stack.isEmpty() && top(stack).array) {
                        top(stack).index++;
                    }
                    break;
                case '{':
                case '[': {
                    String path = stack.isEmpty() ? "$" : top(stack).child();
                    if (stack.size() >= BudgetJson.MAX_DEPTH) {
                        throw new BudgetFormatException(path, BudgetJson.tooDeep());
                    }
                    stack.add(new Level(path, c == '['));
                    break;
                }
                case '}':
                case ']':
                    if (!stack.isEmpty()) {
                        stack.remove(stack.size() - 1);
                    }
                    break;
                default:
                    if (c == '-' || (c >= '0' && c <= '9')) {
                        int j = i;
                        while (j < n && "+-.eE0123456789".indexOf(text.charAt(j)) >= 0) {
                            j++;
                        }
                        if (j - i > MAX_NUMBER_CHARS) {
                            String path = stack.isEmpty() ? "$" : top(stack).child();
                            throw new BudgetFormatException(path, "a number of " + (j - i) + " characters ("
                                    + text.substring(i, i + 20) + "...): more digits than a measurement has and "
                                    + "more than a number may have here (" + MAX_NUMBER_CHARS + ")");
                        }
                        i = j - 1;
                    }
                    break;
            }
        }
    }

    private static Level top(List<Level> stack) {
        return stack.get(stack.size() - 1);
    }
}
