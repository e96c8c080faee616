package org.quire.engine.model;

/** A lexical token of the model language. */
record Token(Kind kind, String text, double number, SourcePosition at) {

    enum Kind { NUMBER, UNIT, NAME, PLUS, MINUS, STAR, SLASH, CARET, LPAREN, RPAREN, COMMA, EQUALS, NEWLINE, END }

    boolean is(Kind k) {
        return kind == k;
    }

    String describe() {
        switch (kind) {
            case NUMBER: return "number " + text;
            case NAME: return "name '" + text + "'";
            case UNIT: return "unit [" + text + "]";
            case NEWLINE: return "end of line";
            case END: return "end of model";
            default: return "'" + text + "'";
        }
    }
}
