package org.quire.app.cli;

import java.io.IOException;
import java.io.PrintStream;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.util.Locale;
import java.util.Set;
import org.quire.engine.line.CalibrationCsv;
import org.quire.engine.line.CalibrationData;
import org.quire.engine.line.CalibrationPoint;
import org.quire.engine.line.LineEstimate;
import org.quire.engine.line.LineFit;
import org.quire.engine.line.LineFitter;
import org.quire.engine.line.LineMethod;

/**
 * {@code quire fit DATA.csv [--method OLS|WLS|GDR] [--x0 X|mean] [--predict Y0 --u-predict U] [--at X]}: fits a
 * straight line to a calibration CSV and prints the parameters, the chi-squared check and the standardized
 * residuals, and optionally x inferred from a new indication (inverse use) or y predicted at x.
 */
final class FitCommand {
    static final String USAGE = "quire fit DATA.csv [--method OLS|WLS|GDR] [--x0 X|mean] [--predict Y0 --u-predict U]"
            + " [--at X]";

    private FitCommand() {
    }

    static int run(String[] argv, PrintStream out) throws Exception {
        Args a = new Args(argv, 1, Set.of("method", "x0", "predict", "u-predict", "at"), Set.of());
        a.expectPositional(1, USAGE);
        String file = a.positional().get(0);
        if (a.has("u-predict") && !a.has("predict")) {
            throw new UsageException("--u-predict gives the uncertainty of --predict Y0; give --predict too");
        }
        CalibrationData data = load(file);
        LineMethod method;
        if (a.has("method")) {
            try {
                method = LineMethod.parse(a.get("method", ""));
            } catch (IllegalArgumentException e) {
                throw new UsageException("--method: " + e.getMessage());
            }
        } else {
            method = data.points().stream().allMatch(p -> p.uy() > 0) ? LineMethod.WEIGHTED_LEAST_SQUARES
                    : LineMethod.ORDINARY_LEAST_SQUARES;
        }
        double x0 = 0;
        if (a.has("x0")) {
            if (a.get("x0", "").equals("mean")) {
                x0 = data.points().stream().mapToDouble(CalibrationPoint::x).average().orElse(0);
            } else {
                x0 = a.number("x0", 0);
            }
        }
        LineFit fit;
        try {
            fit = LineFitter.of(method).withReferenceX(x0).fit(data);
        } catch (IllegalArgumentException | ArithmeticException e) {
            throw new Files.FileProblem(file, e.getMessage());
        }
        out.print(format(fit));
        if (a.has("at")) {
            double x = a.number("at", 0);
            LineEstimate e = fit.valueAt(x);
            out.printf(Locale.ROOT, "%nforward use: at x = %s, y = %s with u(y) = %s (nu = %s)%n", g(x), g(e.value()),
                    g(e.standardUncertainty()), dof(e.dof()));
        }
        if (a.has("predict")) {
            double y0 = a.number("predict", 0);
            double u0 = a.number("u-predict", 0);
            if (u0 < 0) {
                throw new UsageException("--u-predict must not be negative, not " + u0);
            }
            LineEstimate e;
            try {
                e = fit.inverse(y0, u0);
            } catch (ArithmeticException ex) {
                throw new Files.FileProblem(file, ex.getMessage());
            }
            out.printf(Locale.ROOT, "%ninverse use: for y0 = %s with u(y0) = %s, x = %s with u(x) = %s (nu = %s)%n",
                    g(y0), g(u0), g(e.value()), g(e.standardUncertainty()), dof(e.dof()));
        }
        return 0;
    }

    private static CalibrationData load(String file) throws UsageException, Files.FileProblem {
        Path p = Files.path(file);
        try {
            return CalibrationCsv.read(p, "", "");
        } catch (NoSuchFileException e) {
            throw new UsageException("no such file: " + file);
        } catch (org.quire.engine.csv.CsvException e) {
            throw new Files.FileProblem(e);
        } catch (IOException e) {
            throw new Files.FileProblem(file, "cannot read the file: " + e.getMessage());
        }
    }

    static String format(LineFit f) {
        StringBuilder s = new StringBuilder();
        s.append(String.format(Locale.ROOT, "data set: %s, %d points%n", f.data().name(), f.data().size()));
        s.append(String.format(Locale.ROOT, "line: y = a + b (x - x0), x0 = %s, fitted by %s (%s)%n",
                g(f.referenceX()), f.method().title(), f.method().abbreviation()));
        s.append(String.format(Locale.ROOT, "  a = %s   u(a) = %s%n", g(f.intercept()), g(f.interceptUncertainty())));
        s.append(String.format(Locale.ROOT, "  b = %s   u(b) = %s%n", g(f.slope()), g(f.slopeUncertainty())));
        s.append(String.format(Locale.ROOT, "  cov(a, b) = %s   r(a, b) = %.4f%n", g(f.covariance()), f.correlation()));
        if (f.method() == LineMethod.ORDINARY_LEAST_SQUARES) {
            s.append(String.format(Locale.ROOT, "  s = %s from the residuals, nu = %d: u(a) and u(b) are Type A%n",
                    g(f.residualStandardDeviation()), f.dof()));
        } else {
            s.append("  u(a) and u(b) from the stated uncertainties (Type B, infinite degrees of freedom)\n");
        }
        if (Double.isNaN(f.chiSquared())) {
            s.append("chi-squared check: not assessed (no u(y) stated at every point)\n");
        } else {
            s.append(String.format(Locale.ROOT, "chi-squared check: chi2 = %s, %s %% quantile of chi2(%d) = %s: %s%n",
                    g(f.chiSquared()), g(100 * f.consistencyProbability()), f.dof(), g(f.chiSquaredQuantile()),
                    f.consistency().label()));
        }
        s.append(String.format(Locale.ROOT, "%n%5s %14s %14s %14s %14s%n", "point", "x", "y", "residual",
                "standardized"));
        double[] r = f.residuals();
        double[] z = f.standardizedResiduals();
        for (int i = 0; i < r.length; i++) {
            CalibrationPoint p = f.data().points().get(i);
            s.append(String.format(Locale.ROOT, "%5d %14s %14s %14s %14.3f%s%n", i + 1, g(p.x()), g(p.y()), g(r[i]),
                    z[i], Math.abs(z[i]) > 2 ? "  |z| > 2" : ""));
        }
        for (String n : f.notes()) {
            s.append("note: ").append(n).append('\n');
        }
        return s.toString();
    }

    static String g(double v) {
        return String.format(Locale.ROOT, "%.6g", v);
    }

    static String dof(double v) {
        return Double.isInfinite(v) ? "inf" : String.format(Locale.ROOT, "%.1f", v);
    }
}
