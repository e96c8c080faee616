package org.quire.app.cli;

import java.io.IOException;
import java.nio.file.InvalidPathException;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.nio.file.Paths;
import org.quire.engine.budget.Budget;
import org.quire.engine.io.BudgetFormatException;
import org.quire.engine.io.BudgetJson;

/** Loading of budget files for commands, with messages that name the file. */
final class Files {
    private Files() {
    }

    static Path path(String name) throws UsageException {
        try {
            return Paths.get(name);
        } catch (InvalidPathException e) {
            throw new UsageException("'" + name + "' is not a valid file name");
        }
    }

    static Budget loadBudget(String name) throws UsageException, FileProblem {
        Path p = path(name);
        if (java.nio.file.Files.isDirectory(p)) {
            throw new UsageException("'" + name + "' is a folder, not a budget file");
        }
        try {
            return BudgetJson.read(p);
        } catch (NoSuchFileException e) {
            throw new UsageException("no such file: " + name);
        } catch (IOException e) {
            throw new FileProblem(name, "cannot read the file: " + e.getMessage());
        } catch (BudgetFormatException e) {
            throw new FileProblem(name, e.getMessage());
        }
    }

    /**
     * @return the budget document in the file; a file of format version 1 is migrated (revision 1, draft, no
     *     history), see {@link org.quire.engine.document.DocumentStore#open}
     */
    static org.quire.engine.document.BudgetDocument loadDocument(String name) throws UsageException, FileProblem {
        Path p = path(name);
        if (java.nio.file.Files.isDirectory(p)) {
            throw new UsageException("'" + name + "' is a folder, not a budget file");
        }
        try {
            return org.quire.engine.document.DocumentStore.open(p);
        } catch (NoSuchFileException e) {
            throw new UsageException("no such file: " + name);
        } catch (IOException e) {
            throw new FileProblem(name, "cannot read the file: " + e.getMessage());
        } catch (BudgetFormatException e) {
            throw new FileProblem(name, e.getMessage());
        }
    }

    /**
     * @return whether {@code name} is a calibration file ({@code "format": "quire-calibration"}); false for anything
     *     else, whose own reader then says what is wrong with it
     */
    static boolean isCalibration(String name) throws UsageException {
        Path p = path(name);
        if (!java.nio.file.Files.isRegularFile(p)) {
            return false;
        }
        try {
            jakarta.json.JsonObject o = org.quire.engine.io.BudgetJson.parseObject(
                    org.quire.engine.io.BudgetJson.readText(p));
            return o.get("format") instanceof jakarta.json.JsonString f
                    && f.getString().equals(org.quire.engine.calibration.CalibrationJson.FORMAT);
        } catch (IOException | BudgetFormatException | RuntimeException e) {
            return false;
        }
    }

    /** @return the model's problems, each on its own line with the file, the model line and column */
    static FileProblem modelProblem(String file, org.quire.engine.model.ModelException e) {
        StringBuilder s = new StringBuilder();
        for (org.quire.engine.model.ModelProblem p : e.problems()) {
            if (s.length() > 0) {
                s.append('\n').append(file).append(": ");
            }
            s.append(p.line() > 0 ? "model line " + p.line() + ", column " + p.column() + ": " : "")
                    .append(p.isError() ? "" : "warning: ").append(p.message());
        }
        return new FileProblem(file, s.toString());
    }

    /** A file that could be opened but not used. */
    static final class FileProblem extends Exception {
        private static final long serialVersionUID = 1L;

        FileProblem(String file, String message) {
            super(file + ": " + message);
        }

        /** A CSV problem, whose message already names the file, line and column. */
        FileProblem(org.quire.engine.csv.CsvException e) {
            super(e.getMessage(), e);
        }
    }

    /**
     * The findings of a budget file as to its template, for the commands that print results: that the file is a
     * template, whose figures are its example values, and the engine's template check of a budget made from a
     * template ({@link org.quire.engine.document.TemplateConformance}).
     *
     * @return one sentence per finding; empty for a budget that keeps every locked field or has no template
     */
    static java.util.List<String> templateFindings(String file, org.quire.engine.budget.Budget b) throws Exception {
        if (!b.extensions().containsKey("templateOrigin") && !b.extensions().containsKey("template")) {
            return java.util.List.of();
        }
        org.quire.engine.document.BudgetDocument d = loadDocument(file);
        java.util.List<String> out = new java.util.ArrayList<>();
        org.quire.engine.document.TemplateConformance.exampleFigures(d).ifPresent(out::add);
        if (d.templateOrigin() != null) {
            out.addAll(org.quire.engine.document.TemplateConformance.check(d, TemplateCommand.Folders.preferred())
                    .messages());
        }
        return out;
    }
}
