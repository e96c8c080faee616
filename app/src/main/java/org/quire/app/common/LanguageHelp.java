package org.quire.app.common;

import java.util.List;
import org.quire.engine.model.LanguageReference;

/**
 * The reference of the model language as the command line ({@code quire help model|units|functions}) and the
 * workbench's Help menu show it: the engine's generated text ({@link LanguageReference}) for the application's
 * function library, followed by the cautions. One place, so the two never differ.
 */
public final class LanguageHelp {
    /** The topics, in the order shown. */
    public static final List<String> TOPICS = List.of("model", "units", "functions");

    private LanguageHelp() {
    }

    /**
     * @param topic one of {@link #TOPICS}
     * @param engine whose function set the {@code functions} topic lists
     * @return the reference text of the topic, ending with the cautions
     */
    public static String text(String topic, Engine engine) {
        String text;
        switch (topic) {
            case "model":
                text = LanguageReference.model();
                break;
            case "units":
                text = LanguageReference.units();
                break;
            case "functions":
                text = LanguageReference.functions(engine.library());
                break;
            default:
                throw new IllegalArgumentException("topic must be one of " + TOPICS + ", not '" + topic + "'");
        }
        return text + "\n" + Cautions.TEXT + "\n";
    }
}
