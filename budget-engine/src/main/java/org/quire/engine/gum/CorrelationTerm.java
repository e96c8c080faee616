package org.quire.engine.gum;

/**
 * The part of u_c^2(y) that the correlation of two inputs adds: 2 c_i c_j u(x_i) u(x_j) r(x_i, x_j)
 * (JCGM 100:2008 5.2.2, eq. 16).
 *
 * @param first one input
 * @param second the other input
 * @param r their correlation coefficient
 * @param variance the term's contribution to u_c^2(y); may be negative
 */
public record CorrelationTerm(String first, String second, double r, double variance) {
}
