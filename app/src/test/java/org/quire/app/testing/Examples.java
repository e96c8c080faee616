package org.quire.app.testing;

import java.io.IOException;
import java.nio.file.Path;
import java.time.LocalDate;
import org.quire.app.common.Engine;
import org.quire.app.report.CanonicalSha256;
import org.quire.app.report.DocumentInfo;
import org.quire.app.report.ReportBuilder;
import org.quire.app.report.ReportInput;
import org.quire.app.report.ReportModel;
import org.quire.engine.budget.Budget;
import org.quire.engine.gum.GumEvaluator;
import org.quire.engine.gum.GumResult;
import org.quire.engine.io.BudgetFormatException;
import org.quire.engine.io.BudgetJson;
import org.quire.engine.model.ModelException;

/** The worked examples of the project, for tests. */
public final class Examples {
    private Examples() {
    }

    /** @return the project's root folder (set by the build; the working folder's parent otherwise) */
    public static Path root() {
        String p = System.getProperty("quire.projectRoot");
        return p != null ? Path.of(p) : Path.of("..");
    }

    public static Path file(String name) {
        return root().resolve("worked-examples").resolve(name);
    }

    public static Budget budget(String name) throws IOException, BudgetFormatException {
        return BudgetJson.read(file(name));
    }

    public static GumResult gum(Budget b) throws ModelException {
        return GumEvaluator.evaluate(b, Engine.standard().library());
    }

    /** @return the report model of a worked example, dated 2026-03-02, for the invented Tarrow Vale laboratory */
    public static ReportModel report(String name) throws Exception {
        Budget b = budget(name);
        DocumentInfo d = DocumentInfo.forPlainBudget(b, CanonicalSha256.INSTANCE, LocalDate.of(2026, 3, 2))
                .withLaboratory("Tarrow Vale Flow Laboratory").withAuthor("R. Hollis")
                .withDeviceUnderTest("End gauge EG-50");
        return ReportBuilder.build(ReportInput.of(b, gum(b), d, org.quire.app.common.Engine.standard().library()));
    }
}
