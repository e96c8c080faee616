package org.quire.app.review;

import java.math.BigDecimal;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.regex.Pattern;
import org.quire.app.report.ReportBuilder;
import org.quire.engine.budget.Budget;
import org.quire.engine.budget.Correlation;
import org.quire.engine.budget.InputQuantity;
import org.quire.engine.budget.OutputQuantity;
import org.quire.engine.budget.TypeB;
import org.quire.engine.gum.Contribution;
import org.quire.engine.gum.Figures;
import org.quire.engine.gum.GumResult;
import org.quire.engine.gum.OutputResult;
import org.quire.engine.gum.Rounding;

/**
 * Fills the assessor's checklist from a budget and its GUM result: every input has a source; every Type B
 * evaluation states its basis; degrees of freedom are stated; units are given and consistent; dominant
 * contributions are explained; the Monte Carlo result agrees with the GUM result; correlations are justified;
 * figures are rounded properly; the evaluation raised no warnings; a budget made from a template keeps every
 * field the template locks (the engine's {@link org.quire.engine.document.TemplateConformance}: a changed
 * locked field is an item not met, so endorsing is refused until the assessor has marked it).
 *
 * <p>References: JCGM 100:2008 7.1.4 (document fully how each component was evaluated), 4.3.1 (the pool of
 * information behind a Type B evaluation), G.4.2 (degrees of freedom of a Type B evaluation), 5.2 (correlated
 * inputs), 7.2.6 (rounding, at most two significant digits; rounding up may be appropriate); JCGM 101:2008
 * clause 8 (validating the GUM uncertainty framework with the Monte Carlo method). The 25 % threshold for a
 * dominant contribution is common practice.
 *
 * <p>Stateless and thread-safe.
 */
public final class Checklist {
    /** A contribution whose share of u_c² exceeds this is dominant and must be explained (common practice). */
    public static final double DOMINANT_SHARE = 0.25;
    /** Rounding U to the nearest digit may lower it by at most this fraction before rounding up is suggested. */
    public static final double ROUNDING_LOSS = 0.05;

    private Checklist() {
    }

    /** @return the items, in a fixed order */
    public static List<CheckItem> evaluate(Budget b, GumResult gum, ReviewContext ctx) {
        List<CheckItem> items = new ArrayList<>();
        items.add(sources(b));
        items.add(typeBBasis(b));
        items.add(degreesOfFreedom(b));
        items.add(unitsGiven(b));
        items.add(unitsConsistent(b, ctx.units()));
        items.add(dominant(b, gum));
        items.add(monteCarlo(gum, ctx.monteCarlo()));
        items.add(correlations(b));
        items.add(rounding(gum));
        items.add(warnings(gum));
        items.add(templateLocks(ctx.template()));
        items.add(measuredValues(ctx.templateExample()));
        return items;
    }

    private static CheckItem sources(Budget b) {
        List<String> missing = new ArrayList<>();
        for (InputQuantity q : b.inputs()) {
            if (q.source().isBlank()) {
                missing.add(q.name());
            }
        }
        List<String> details = new ArrayList<>();
        missing.forEach(n -> details.add(n + ": no source given"));
        return new CheckItem("sources", "Every input states where its value comes from", "JCGM 100:2008 7.1.4",
                missing.isEmpty() ? Outcome.MET : Outcome.NOT_MET, details, missing);
    }

    private static CheckItem typeBBasis(Budget b) {
        List<String> details = new ArrayList<>();
        List<String> missing = new ArrayList<>();
        int typeB = 0;
        for (InputQuantity q : b.inputs()) {
            if (!(q.evaluation() instanceof TypeB)) {
                continue;
            }
            typeB++;
            String why = !q.source().isBlank() ? q.source() : q.notes();
            if (why.isBlank()) {
                missing.add(q.name());
                details.add(q.name() + ": " + q.evaluation().basis() + ", with no source or notes saying why");
            } else {
                details.add(q.name() + ": " + q.evaluation().basis() + " (" + why + ")");
            }
        }
        Outcome o = typeB == 0 ? Outcome.NOT_APPLICABLE : missing.isEmpty() ? Outcome.MET : Outcome.NOT_MET;
        return new CheckItem("type-b-basis", "Every Type B evaluation states its basis", "JCGM 100:2008 4.3.1",
                o, details, missing);
    }

    private static CheckItem degreesOfFreedom(Budget b) {
        List<String> details = new ArrayList<>();
        List<String> assumed = new ArrayList<>();
        for (InputQuantity q : b.inputs()) {
            if (q.evaluation() instanceof TypeB && q.evaluation().standardUncertainty() > 0) {
                TypeB t = (TypeB) q.evaluation();
                boolean stated = t.parameters().containsKey("dof") || t.parameters().containsKey("relativeUncertaintyOfU");
                if (!stated) {
                    assumed.add(q.name());
                    details.add(q.name() + ": ν taken as infinite (u(x) treated as exactly known); confirm");
                }
            }
        }
        if (b.settings().hasFixedCoverageFactor() && !assumed.isEmpty()) {
            details.add("the coverage factor is fixed (k = " + Figures.estimate(b.settings().coverageFactor())
                    + "), so the degrees of freedom do not change U");
        }
        return new CheckItem("dof", "Degrees of freedom are stated for every input", "JCGM 100:2008 G.4.2",
                assumed.isEmpty() ? Outcome.MET : Outcome.TO_CONFIRM, details, assumed);
    }

    private static CheckItem unitsGiven(Budget b) {
        List<String> missing = new ArrayList<>();
        List<String> details = new ArrayList<>();
        for (InputQuantity q : b.inputs()) {
            if (q.unit().isBlank()) {
                missing.add(q.name());
                details.add("input " + q.name() + ": no unit (write 1 for a quantity of dimension one)");
            }
        }
        for (OutputQuantity o : b.outputs()) {
            if (o.unit().isBlank()) {
                details.add("output " + o.name() + ": no unit (write 1 for a quantity of dimension one)");
            }
        }
        return new CheckItem("units-given", "Every input and output has a unit", "JCGM 100:2008 7.2.2",
                details.isEmpty() ? Outcome.MET : Outcome.NOT_MET, details, missing);
    }

    private static CheckItem unitsConsistent(Budget b, UnitChecker checker) {
        if (checker == null) {
            return new CheckItem("units-consistent", "Units are consistent with the model", "SI Brochure (9th ed.) 5.4",
                    Outcome.NOT_RUN, List.of("no unit checker is available in this build"), List.of());
        }
        List<String> problems = checker.problems(b);
        return new CheckItem("units-consistent", "Units are consistent with the model", "SI Brochure (9th ed.) 5.4",
                problems.isEmpty() ? Outcome.MET : Outcome.NOT_MET, problems, List.of());
    }

    private static CheckItem dominant(Budget b, GumResult gum) {
        List<String> details = new ArrayList<>();
        List<String> unexplained = new ArrayList<>();
        for (OutputResult o : gum.outputs()) {
            for (Contribution c : o.contributions()) {
                if (c.share() > DOMINANT_SHARE) {
                    InputQuantity q = b.input(c.input());
                    boolean inNotes = mentions(b.notes(), c.input());
                    boolean explained = (q != null && !q.notes().isBlank()) || inNotes;
                    String share = Figures.percent(c.share()) + " % of u_c²(" + o.name() + ")";
                    if (explained) {
                        details.add(c.input() + ": " + share + ", explained in the "
                                + (inNotes ? "budget notes" : "input's notes"));
                    } else {
                        details.add(c.input() + ": " + share + ", not explained in the budget notes or the input's notes");
                        if (!unexplained.contains(c.input())) {
                            unexplained.add(c.input());
                        }
                    }
                }
            }
        }
        Outcome outcome = unexplained.isEmpty() ? Outcome.MET : Outcome.NOT_MET;
        if (details.isEmpty()) {
            details.add("no input contributes more than " + Figures.percent(DOMINANT_SHARE) + " % of u_c²");
        }
        return new CheckItem("dominant-explained", "Dominant contributions (over "
                + Figures.percent(DOMINANT_SHARE).replace(".0", "") + " % of u_c²) are explained in the notes",
                "common practice", outcome, details, unexplained);
    }

    /** @return whether {@code text} names {@code name} as a word */
    static boolean mentions(String text, String name) {
        return Pattern.compile("(?<![\\p{L}\\p{N}_])" + Pattern.quote(name) + "(?![\\p{L}\\p{N}_])").matcher(text).find();
    }

    private static CheckItem monteCarlo(GumResult gum, org.quire.engine.montecarlo.MonteCarloOutcome mc) {
        String title = "The Monte Carlo result agrees with the GUM result";
        String ref = "JCGM 101:2008 8";
        if (mc == null) {
            return new CheckItem("monte-carlo", title, ref, Outcome.NOT_RUN,
                    List.of("the Monte Carlo method was not run for this budget"), List.of());
        }
        List<String> details = new ArrayList<>();
        boolean all = true;
        for (OutputResult o : gum.outputs()) {
            var m = mc.output(o.name());
            if (m.isEmpty()) {
                all = false;
                details.add(o.name() + ": no Monte Carlo result");
                continue;
            }
            all &= m.get().comparison().validated();
            details.add(o.name() + ": " + m.get().comparison().reason());
        }
        return new CheckItem("monte-carlo", title, ref, all ? Outcome.MET : Outcome.NOT_MET, details, List.of());
    }

    private static CheckItem correlations(Budget b) {
        String title = "Every correlation between inputs is justified";
        if (b.correlations().isEmpty()) {
            return new CheckItem("correlations-justified", title, "JCGM 100:2008 5.2", Outcome.NOT_APPLICABLE,
                    List.of("the budget states no correlations"), List.of());
        }
        List<String> details = new ArrayList<>();
        List<String> names = new ArrayList<>();
        boolean all = true;
        for (Correlation c : b.correlations()) {
            String pair = "r(" + c.first() + ", " + c.second() + ")";
            if (c.justification().isBlank()) {
                all = false;
                details.add(pair + ": no justification");
                names.add(c.first());
                names.add(c.second());
            } else {
                details.add(pair + ": " + c.justification());
            }
        }
        return new CheckItem("correlations-justified", title, "JCGM 100:2008 5.2",
                all ? Outcome.MET : Outcome.NOT_MET, details, names);
    }

    private static CheckItem rounding(GumResult gum) {
        int digits = gum.settings().significantDigits();
        List<String> details = new ArrayList<>();
        boolean confirm = digits > 2;
        if (confirm) {
            details.add("uncertainties are reported to " + digits + " significant digits; 7.2.6 says at most two "
                    + "usually suffice");
        }
        for (OutputResult o : gum.outputs()) {
            double big = o.expandedUncertainty();
            details.add(o.name() + ": " + ReportBuilder.statement(o, digits).plain());
            if (big > 0 && Double.isFinite(big)) {
                BigDecimal rounded = Rounding.uncertainty(big, digits);
                double loss = (big - rounded.doubleValue()) / big;
                if (loss > ROUNDING_LOSS) {
                    confirm = true;
                    details.add(String.format(Locale.ROOT, "%s: rounding U to %s lowers it by %.1f %%; consider "
                            + "rounding up", o.name(), rounded.toPlainString(), 100 * loss));
                }
            }
        }
        return new CheckItem("rounding", "Reported figures are rounded properly", "JCGM 100:2008 7.2.6",
                confirm ? Outcome.TO_CONFIRM : Outcome.MET, details, List.of());
    }

    private static CheckItem templateLocks(org.quire.engine.document.TemplateConformance.Finding f) {
        String title = "The budget keeps every field its template locks";
        String ref = "common practice";
        if (f == null) {
            return new CheckItem("template-locks", title, ref, Outcome.NOT_RUN,
                    List.of("the budget was not checked against its template"), List.of());
        }
        switch (f.state()) {
            case NOT_FROM_TEMPLATE:
                return new CheckItem("template-locks", title, ref, Outcome.NOT_APPLICABLE,
                        List.of("the budget was not made from a template"), List.of());
            case FOLLOWS:
                return new CheckItem("template-locks", title, ref, Outcome.MET, List.of("every field locked by "
                        + "template " + f.origin().id() + " v" + f.origin().version() + " keeps its value"), List.of());
            case TEMPLATE_NOT_FOUND:
                return new CheckItem("template-locks", title, ref, Outcome.TO_CONFIRM, f.messages(), List.of());
            default: {
                List<String> inputs = new ArrayList<>();
                for (org.quire.engine.document.TemplateConformance.Deviation d : f.deviations()) {
                    String n = d.field().contains(".") ? d.field().substring(0, d.field().indexOf('.')) : d.field();
                    if (!org.quire.engine.document.TemplateSpec.BUDGET_PARTS.contains(n) && !inputs.contains(n)) {
                        inputs.add(n);
                    }
                }
                return new CheckItem("template-locks", title, ref, Outcome.NOT_MET, f.messages(), inputs);
            }
        }
    }

    /** A template evaluated as it is gives the figures of its example values: never endorsed as a measurement's. */
    private static CheckItem measuredValues(String templateExample) {
        String title = "The figures are of a measurement, not of a template's example values";
        if (templateExample != null) {
            return new CheckItem("measured-values", title, "common practice", Outcome.NOT_MET,
                    List.of(templateExample), List.of());
        }
        return new CheckItem("measured-values", title, "common practice", Outcome.MET,
                List.of("the file is a budget, not a template"), List.of());
    }

    private static CheckItem warnings(GumResult gum) {
        List<String> all = new ArrayList<>(gum.warnings());
        for (OutputResult o : gum.outputs()) {
            o.warnings().forEach(w -> all.add(o.name() + ": " + w));
        }
        return new CheckItem("warnings", "The evaluation raised no warnings", "common practice",
                all.isEmpty() ? Outcome.MET : Outcome.TO_CONFIRM, all, List.of());
    }
}
