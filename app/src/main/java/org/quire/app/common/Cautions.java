package org.quire.app.common;

/** The cautions every report, the About box and the README state, in one place. */
public final class Cautions {
    private Cautions() {
    }

    /** One paragraph. */
    public static final String TEXT = "Results computed by Quire support, and do not replace, the laboratory's "
            + "accredited procedure and the review of a qualified person. Flow figures may feed billing, custody "
            + "transfer, dosing and safety decisions: check them before use. Local regulations and the "
            + "legal-metrology authorities take precedence over anything this program computes.";
}
