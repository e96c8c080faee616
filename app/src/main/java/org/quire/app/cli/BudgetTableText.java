package org.quire.app.cli;

import java.util.Locale;
import org.quire.engine.gum.Contribution;
import org.quire.engine.gum.CorrelationTerm;
import org.quire.engine.gum.Figures;
import org.quire.engine.gum.GumResult;
import org.quire.engine.gum.HigherOrderTerms;
import org.quire.engine.gum.OutputResult;
import org.quire.engine.gum.Rounding;
import org.quire.engine.units.Units;

/** Formats a GUM result as the plain-text budget table the command line prints. */
final class BudgetTableText {
    private BudgetTableText() {
    }

    /**
     * The budget table by the engine's one rule for figures ({@link Figures}): estimates as entered, u(x_i), c_i
     * and u_i(y) to {@link Figures#WORKING_DIGITS} significant digits, shares to 0.1 %, and u_c, U and the result
     * rounded to the budget's significant digits (JCGM 100:2008 7.2.6), as the workbench's results show them.
     */
    static String format(String title, GumResult r) {
        StringBuilder s = new StringBuilder();
        int digits = r.settings().significantDigits();
        s.append("Budget: ").append(title.isEmpty() ? "(untitled)" : title).append('\n');
        for (String w : r.warnings()) {
            s.append("warning: ").append(w).append('\n');
        }
        for (OutputResult o : r.outputs()) {
            String shownUnit = Units.display(o.unit());
            String unit = o.unit().isEmpty() ? "" : " " + shownUnit;
            String perUnit = o.unit().isEmpty() ? "" : " [" + shownUnit + "]";
            s.append('\n').append("Output ").append(o.name()).append(perUnit).append('\n');
            s.append(String.format(Locale.ROOT, "  %-14s %-4s %-13s %16s %13s %13s %15s %6s %7s%n", "input", "type",
                    "distribution", "x_i", "u(x_i)", "c_i", "u_i(y)" + perUnit, "\u03bd_i", "share"));
            for (Contribution c : o.contributions()) {
                s.append(String.format(Locale.ROOT, "  %-14s %-4s %-13s %16s %13s %13s %15s %6s %7s%n",
                        c.input(), c.type(), c.distribution(), Figures.estimate(c.estimate()),
                        Figures.working(c.standardUncertainty()), Figures.working(c.sensitivity()), Figures.working(c.contribution()),
                        Figures.dof(c.dof()), Figures.percent(c.share()) + " %"));
            }
            for (CorrelationTerm t : o.correlationTerms()) {
                s.append(String.format(Locale.ROOT, "  correlation term %s, %s (r = %s): %s%s to u_c\u00b2(y)%n",
                        t.first(), t.second(), Figures.estimate(t.r()), Figures.working(t.variance()), squared(shownUnit)));
            }
            if (o.higherOrderTerms() == HigherOrderTerms.INCLUDED) {
                s.append(String.format(Locale.ROOT, "  higher-order terms: %s%s to u_c\u00b2(y)%n",
                        Figures.working(o.higherOrderVariance()), squared(shownUnit)));
            } else if (o.higherOrderTerms() == HigherOrderTerms.NOT_INCLUDED) {
                s.append("  higher-order terms: ").append(o.higherOrderTerms().text()).append('\n');
            }
            s.append(String.format(Locale.ROOT, "  estimate                           y = %s%s%n", Figures.estimate(o.estimate()), unit));
            s.append(String.format(Locale.ROOT, "  combined standard uncertainty u_c(y) = %s%s%n",
                    uncertainty(o.standardUncertainty(), digits), unit));
            String used = Double.isInfinite(o.effectiveDof()) || o.dofUsed() == o.effectiveDof() ? ""
                    : " (" + Figures.dof(o.dofUsed()) + " used)";
            s.append(String.format(Locale.ROOT, "  effective degrees of freedom   \u03bd_eff = %s%s%n", Figures.dof(o.effectiveDof()), used));
            s.append(String.format(Locale.ROOT, "  coverage factor                    k = %s (p = %s %%)%n",
                    Figures.coverageFactor(o.coverageFactor()), Figures.probability(o.coverageProbability())));
            s.append(String.format(Locale.ROOT, "  expanded uncertainty               U = %s%s%s%n",
                    uncertainty(o.expandedUncertainty(), digits), unit,
                    !Figures.relativeUncertaintyMeaningful(o.unit(), o.estimate(), o.expandedUncertainty()) ? ""
                            : " (" + uncertainty(100 * o.relativeExpandedUncertainty(), digits) + " % of |y|)"));
            s.append(String.format(Locale.ROOT, "  result: %s = (%s)%s, k = %s, p = %s %%%n", o.name(),
                    org.quire.engine.gum.Figures.statedResult(o.estimate(), o.expandedUncertainty(), digits), unit,
                    Figures.coverageFactor(o.coverageFactor()), Figures.probability(o.coverageProbability())));
            for (String w : o.warnings()) {
                s.append("  warning: ").append(w).append('\n');
            }
        }
        if (r.outputs().size() > 1) {
            s.append("\nCorrelation of the outputs\n");
            s.append(String.format(Locale.ROOT, "  %-12s", ""));
            for (OutputResult o : r.outputs()) {
                s.append(String.format(Locale.ROOT, " %10s", o.name()));
            }
            s.append('\n');
            for (int k = 0; k < r.outputs().size(); k++) {
                s.append(String.format(Locale.ROOT, "  %-12s", r.outputs().get(k).name()));
                for (int l = 0; l < r.outputs().size(); l++) {
                    s.append(String.format(Locale.ROOT, " %10.4f", r.correlation()[k][l]));
                }
                s.append('\n');
            }
        }
        return s.toString();
    }

    /** @return an uncertainty rounded to {@code digits} significant digits (JCGM 100:2008 7.2.6), as stated */
    static String uncertainty(double u, int digits) {
        return Double.isFinite(u) ? Rounding.uncertainty(u, digits).toPlainString() : Figures.sig(u, digits);
    }

    private static String squared(String unit) {
        return unit.isEmpty() ? "" : " (" + unit + ")\u00b2";
    }
}
