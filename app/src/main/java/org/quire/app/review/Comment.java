package org.quire.app.review;

import java.util.Objects;

/**
 * An assessor's comment attached to part of a budget.
 *
 * @param target what the comment is about
 * @param author who wrote it
 * @param text the comment
 */
public record Comment(Target target, String author, String text) {

    /** What a comment is attached to. */
    public enum Kind {
        /** An input quantity, by name. */
        INPUT,
        /** A section of the budget or report, by heading (model, purpose, settings ...). */
        SECTION,
        /** A checklist item, by id. */
        ITEM
    }

    /**
     * @param kind input, section or checklist item
     * @param name the input's name, the section's heading or the item's id
     */
    public record Target(Kind kind, String name) {
        public Target {
            Objects.requireNonNull(kind, "kind");
            if (name == null || name.isBlank()) {
                throw new IllegalArgumentException("a comment's target needs a name");
            }
        }

        public static Target input(String name) { return new Target(Kind.INPUT, name); }
        public static Target section(String heading) { return new Target(Kind.SECTION, heading); }
        public static Target item(String id) { return new Target(Kind.ITEM, id); }
    }

    public Comment {
        Objects.requireNonNull(target, "target");
        author = author == null ? "" : author.strip();
        if (text == null || text.isBlank()) {
            throw new IllegalArgumentException("a comment needs text");
        }
        text = text.strip();
    }
}
