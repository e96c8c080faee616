package org.quire.engine.gum;

/**
 * One row of an uncertainty budget: an input's estimate and standard uncertainty, its sensitivity
 * coefficient and its contribution to the output's standard uncertainty.
 *
 * @param input the input's name
 * @param unit the input's unit as text
 * @param estimate x_i
 * @param standardUncertainty u(x_i)
 * @param sensitivity c_i = df/dx_i at the estimates (JCGM 100:2008 5.1.3, eq. 11a)
 * @param contribution u_i(y) = |c_i| u(x_i) (JCGM 100:2008 5.1.3, eq. 11b)
 * @param dof nu_i (infinite when u(x_i) is taken as exact)
 * @param share u_i(y)^2 / u_c(y)^2, the fraction of the combined variance (0 when u_c = 0)
 * @param type "A" or "B"
 * @param distribution the distribution's shape, e.g. "rectangular"
 */
public record Contribution(String input, String unit, double estimate, double standardUncertainty,
        double sensitivity, double contribution, double dof, double share, String type, String distribution) {
}
