package org.quire.engine.validate;

/**
 * The outcome of one check of a worked example: a published figure against the figure Quire computed.
 *
 * @param example the example file's name
 * @param source the publication and clause the expected figure comes from
 * @param figure what is checked, e.g. "u_c(l)"
 * @param expected the published figure (as text, as printed)
 * @param computed Quire's figure (as text)
 * @param tolerance the allowed difference, as text (e.g. "0.5e-6" or "0.1 %")
 * @param passed whether the difference is within the tolerance
 * @param message why the check failed, when it could not be computed; empty otherwise
 */
public record CheckOutcome(String example, String source, String figure, String expected, String computed,
        String tolerance, boolean passed, String message) {
}
