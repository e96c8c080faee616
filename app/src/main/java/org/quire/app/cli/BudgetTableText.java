package org.quire.app.cli;

import java.util.Locale;
import org.quire.engine.gum.Contribution;
import org.quire.engine.gum.CorrelationTerm;
import org.quire.engine.gum.GumResult;
import org.quire.engine.gum.OutputResult;
import org.quire.engine.gum.Rounding;

/** Formats a GUM result as the plain-text budget table the command line prints. */
final class BudgetTableText {
    private BudgetTableText() {
    }

    static String format(String title, GumResult r) {
        StringBuilder s = new StringBuilder();
        int digits = r.settings().significantDigits();
        s.append("Budget: ").append(title.isEmpty() ? "(untitled)" : title).append('\n');
        for (String w : r.warnings()) {
            s.append("warning: ").append(w).append('\n');
        }
        for (OutputResult o : r.outputs()) {
            String unit = o.unit().isEmpty() ? "" : " " + o.unit();
            s.append('\n').append("Output ").append(o.name()).append(unit.isEmpty() ? "" : " [" + o.unit() + "]").append('\n');
            s.append(String.format(Locale.ROOT, "  %-14s %-4s %-13s %16s %12s %12s %12s %8s %7s%n", "input", "type",
                    "distribution", "x_i", "u(x_i)", "c_i", "u_i(y)", "nu_i", "share"));
            for (Contribution c : o.contributions()) {
                s.append(String.format(Locale.ROOT, "  %-14s %-4s %-13s %16s %12s %12s %12s %8s %6.1f%%%n",
                        c.input(), c.type(), c.distribution(), g(c.estimate(), 10), g(c.standardUncertainty(), 4),
                        g(c.sensitivity(), 4), g(c.contribution(), 4), dof(c.dof()), 100 * c.share()));
            }
            for (CorrelationTerm t : o.correlationTerms()) {
                s.append(String.format(Locale.ROOT, "  correlation term %s, %s (r = %s): %s to u_c^2%n", t.first(),
                        t.second(), g(t.r(), 3), g(t.variance(), 4)));
            }
            if (o.higherOrderTerms() == org.quire.engine.gum.HigherOrderTerms.INCLUDED) {
                s.append(String.format(Locale.ROOT, "  higher-order terms: %s to u_c^2%n", g(o.higherOrderVariance(), 4)));
            } else if (o.higherOrderTerms() == org.quire.engine.gum.HigherOrderTerms.NOT_INCLUDED) {
                s.append("  higher-order terms: ").append(o.higherOrderTerms().text()).append('\n');
            }
            s.append(String.format(Locale.ROOT, "  estimate                          y = %s%s%n", g(o.estimate(), 12), unit));
            s.append(String.format(Locale.ROOT, "  combined standard uncertainty   u_c = %s%s%n", g(o.standardUncertainty(), 5), unit));
            String used = Double.isInfinite(o.effectiveDof()) || o.dofUsed() == o.effectiveDof() ? ""
                    : " (" + dof(o.dofUsed()) + " used)";
            s.append(String.format(Locale.ROOT, "  effective degrees of freedom nu_eff = %s%s%n", dof(o.effectiveDof()), used));
            s.append(String.format(Locale.ROOT, "  coverage factor                   k = %s (p = %s %%)%n",
                    g(o.coverageFactor(), 4), g(100 * o.coverageProbability(), 4)));
            s.append(String.format(Locale.ROOT, "  expanded uncertainty              U = %s%s%s%n", g(o.expandedUncertainty(), 5), unit,
                    !org.quire.engine.gum.Figures.relativeUncertaintyMeaningful(o.unit(), o.estimate(),
                            o.expandedUncertainty()) ? ""
                            : String.format(Locale.ROOT, " (%s %% of |y|)", g(100 * o.relativeExpandedUncertainty(), 3))));
            s.append(String.format(Locale.ROOT, "  result: %s = (%s)%s, k = %s, p = %s %%%n", o.name(),
                    Rounding.format(o.estimate(), o.expandedUncertainty(), digits), unit, g(o.coverageFactor(), 3),
                    g(100 * o.coverageProbability(), 4)));
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

    static String g(double v, int sig) {
        if (Double.isNaN(v)) {
            return "-";
        }
        if (v == 0) {
            return "0";
        }
        return String.format(Locale.ROOT, "%." + sig + "g", v);
    }

    static String dof(double nu) {
        return org.quire.engine.gum.Figures.dofPlain(nu);
    }


}
