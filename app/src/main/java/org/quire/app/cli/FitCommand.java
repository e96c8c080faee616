package org.quire.app.cli;

import java.io.IOException;
import java.io.PrintStream;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.util.Locale;
import org.quire.engine.csv.CalibrationCsv;
import org.quire.engine.line.CalibrationData;
import org.quire.engine.line.CalibrationPoint;
import org.quire.engine.line.LineEstimate;
import org.quire.engine.line.LineFit;
import org.quire.engine.line.LineFitter;
import org.quire.engine.line.LineMethod;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.ParentCommand;
import picocli.CommandLine.Parameters;

/**
 * {@code quire fit DATA.csv}: fits a straight line to a calibration CSV and prints the parameters, the chi-squared
 * check and the standardized residuals, and optionally x inferred from a new indication (inverse use) or y
 * predicted at x.
 */
@Command(name = "fit", mixinStandardHelpOptions = true, sortOptions = false,
        description = {"Fit a straight line y = a + b (x - x0) to a calibration CSV file (columns x, y, u_x, u_y; "
                + "ISO/TS 28037:2010): parameters and their uncertainties and covariance, the chi-squared check "
                + "and the standardized residuals.",
            "With --predict, x for a new indication (inverse use); with --at, y at a given x."},
        footerHeading = "%nExamples:%n",
        footer = {"  quire fit calibration.csv --method WLS",
            "  quire fit calibration.csv --method GDR --x0 mean --predict 12.5 --u-predict 0.02",
            "  quire fit calibration.csv --at 40"})
final class FitCommand implements Callable<Integer> {
    @ParentCommand
    QuireCommand quire;

    @Parameters(paramLabel = "DATA.csv", description = "the calibration data: columns x, y and optionally u_x, u_y")
    String file;

    @Option(names = "--method", paramLabel = "METHOD",
            description = "OLS, WLS, GDR or GMR (ISO/TS 28037:2010); default: WLS when every point has u_y, else OLS")
    String method;

    @Option(names = "--x0", paramLabel = "X|mean", description = "the reference x0 of the line, a number or 'mean'; default 0")
    String x0;

    @Option(names = "--predict", paramLabel = "Y0", converter = Options.FiniteNumber.class,
            description = "a new indication y0: infer x from it (inverse use)")
    Double predict;

    @Option(names = "--u-predict", paramLabel = "U", converter = Options.FiniteNumber.class,
            description = "the standard uncertainty of --predict Y0; default 0")
    Double uPredict;

    @Option(names = "--at", paramLabel = "X", converter = Options.FiniteNumber.class,
            description = "predict y at this x (forward use)")
    Double at;

    @Override
    public Integer call() throws Exception {
        PrintStream out = quire.out;
        if (uPredict != null && predict == null) {
            throw new UsageException("--u-predict gives the uncertainty of --predict Y0; give --predict too");
        }
        CalibrationData data = load(file);
        LineMethod method;
        if (this.method != null) {
            try {
                method = LineMethod.parse(this.method);
            } catch (IllegalArgumentException e) {
                throw new UsageException("--method: " + e.getMessage());
            }
        } else {
            method = data.points().stream().allMatch(p -> p.uy() > 0) ? LineMethod.WEIGHTED_LEAST_SQUARES
                    : LineMethod.ORDINARY_LEAST_SQUARES;
        }
        double reference = 0;
        if (x0 != null) {
            if (x0.equals("mean")) {
                reference = data.points().stream().mapToDouble(CalibrationPoint::x).average().orElse(0);
            } else {
                try {
                    reference = new Options.FiniteNumber().convert(x0);
                } catch (picocli.CommandLine.TypeConversionException e) {
                    throw new UsageException("--x0 " + e.getMessage() + " or 'mean'");
                }
            }
        }
        LineFit fit;
        try {
            fit = LineFitter.of(method).withReferenceX(reference).fit(data);
        } catch (IllegalArgumentException | ArithmeticException e) {
            throw new Files.FileProblem(file, e.getMessage());
        }
        out.print(format(fit));
        if (at != null) {
            double x = at;
            LineEstimate e = fit.valueAt(x);
            out.printf(Locale.ROOT, "%nforward use: at x = %s, y = %s with u(y) = %s (nu = %s)%n", g(x), g(e.value()),
                    g(e.standardUncertainty()), dof(e.dof()));
        }
        if (predict != null) {
            double y0 = predict;
            double u0 = uPredict == null ? 0 : uPredict;
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
        // six significant digits: enough to check a fit against ISO/TS 28037's worked examples
        return org.quire.engine.gum.Figures.sig(v, 6);
    }

    /** @return degrees of freedom by the one rule ({@link org.quire.engine.gum.Figures#dof}: ∞ where infinite) */
    static String dof(double v) {
        return org.quire.engine.gum.Figures.dof(v);
    }
}
