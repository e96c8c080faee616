package org.quire.app.cli;

/** Quoting of CSV cells (RFC 4180). */
final class Csv {
    private Csv() {
    }

    static String cell(String s) {
        if (s.contains(",") || s.contains("\"") || s.contains("\n") || s.contains("\r")) {
            return "\"" + s.replace("\"", "\"\"") + "\"";
        }
        return s;
    }
}
