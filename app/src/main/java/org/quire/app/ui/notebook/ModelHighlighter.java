package org.quire.app.ui.notebook;

import java.awt.Color;
import java.util.HashSet;
import java.util.Set;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import javax.swing.text.SimpleAttributeSet;
import javax.swing.text.StyleConstants;
import javax.swing.text.StyledDocument;
import org.quire.app.ui.common.Colors;

/**
 * Syntax colouring of model text: comments, numbers (with the unit in brackets written after one, coloured
 * like the number), operators, names of calls, and the names an equation defines. Colouring only: the meaning of the text is the engine's {@code ModelCompiler}'s business.
 */
final class ModelHighlighter {
    private static final Pattern TOKEN = Pattern.compile(
            "(?<comment>#[^\\n]*)|(?<unit>\\[[^\\]\\n]*\\])"
                    + "|(?<number>(?<![\\p{L}_\\d])\\d+(\\.\\d*)?([eE][+-]?\\d+)?|\\.\\d+([eE][+-]?\\d+)?)"
                    + "|(?<name>[\\p{L}_][\\p{L}\\p{N}_]*)|(?<op>[-+*/^=(),\u00d7\u00b7\u00f7\u2212])");
    private static final Pattern DEFINED = Pattern.compile("(?m)^\\s*([\\p{L}_][\\p{L}\\p{N}_]*)\\s*(\\([^)]*\\))?\\s*=");

    private ModelHighlighter() {
    }

    static void apply(StyledDocument doc, String text) {
        Set<String> defined = new HashSet<>();
        Matcher d = DEFINED.matcher(text);
        while (d.find()) {
            defined.add(d.group(1));
        }
        doc.setCharacterAttributes(0, text.length(), style(Colors.get("Quire.syntax.name"), false), true);
        Matcher m = TOKEN.matcher(text);
        while (m.find()) {
            Color c;
            boolean bold = false;
            if (m.group("comment") != null) {
                c = Colors.get("Quire.syntax.comment");
            } else if (m.group("number") != null || m.group("unit") != null) {
                c = Colors.get("Quire.syntax.number");
            } else if (m.group("op") != null) {
                c = Colors.get("Quire.syntax.operator");
            } else {
                int after = m.end();
                while (after < text.length() && text.charAt(after) == ' ') {
                    after++;
                }
                boolean call = after < text.length() && text.charAt(after) == '(';
                if (defined.contains(m.group())) {
                    c = Colors.get("Quire.syntax.defined");
                    bold = !call;
                } else if (call) {
                    c = Colors.get("Quire.syntax.function");
                } else {
                    continue;
                }
            }
            doc.setCharacterAttributes(m.start(), m.end() - m.start(), style(c, bold), false);
        }
    }

    private static SimpleAttributeSet style(Color c, boolean bold) {
        SimpleAttributeSet a = new SimpleAttributeSet();
        StyleConstants.setForeground(a, c);
        StyleConstants.setBold(a, bold);
        return a;
    }
}
