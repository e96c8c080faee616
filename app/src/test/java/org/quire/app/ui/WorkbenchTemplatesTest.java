package org.quire.app.ui;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.EventQueue;
import java.nio.file.Path;
import java.time.Instant;
import java.util.List;
import javax.swing.JButton;
import javax.swing.JLabel;
import javax.swing.JTable;
import javax.swing.JTextField;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.quire.app.ui.notebook.BudgetEditor;
import org.quire.app.ui.templates.NewFromTemplateDialog;
import org.quire.app.ui.templates.TemplateCatalog;
import org.quire.app.ui.templates.TemplateUpdateDialog;
import org.quire.engine.budget.Budget;
import org.quire.engine.document.BudgetDocument;
import org.quire.engine.document.DocumentStore;
import org.quire.engine.document.TemplateParameter;
import org.quire.engine.document.TemplateSpec;

/**
 * File &gt; New from template: a template with a parameter from the personal folder, a shipped plain budget, and
 * the notice when the template a budget follows has a newer version.
 */
class WorkbenchTemplatesTest extends GuiTestSupport {
    private static final String SHIPPED = "volumetric-proving-tank.json";
    @TempDir
    Path personal;
    private BudgetDocument base;

    @BeforeEach
    void personalTemplate() throws Exception {
        node.put("personalTemplateFolder", personal.toString());
        Path shipped = TemplateCatalog.shippedFolder();
        assertNotNull(shipped, "the shipped templates are bundled with the application");
        base = DocumentStore.open(shipped.resolve(SHIPPED));
        DocumentStore.save(template(1, base.budget()), personal.resolve("tvfl-tank-v1.json"));
    }

    /** A template of the proving-tank budget whose one parameter is the tank's nominal volume V_20. */
    private static BudgetDocument template(int version, Budget b) {
        Instant t = Instant.parse("2026-01-15T09:00:00Z");
        TemplateSpec spec = TemplateSpec.of("tvfl-tank", version).withDescription("Proving tank, one run")
                .withParameters(List.of(TemplateParameter.of("V_tank", "V_20", "estimate").withUnit("L")
                        .withDescription("volume of the tank at 20 \u00b0C from its certificate")
                        .withDefault(500.08).withRange(100, 1000)));
        return BudgetDocument.newDraft(b, "Template Keeper", t).withTemplate(spec, "Template Keeper", t);
    }

    private NewFromTemplateDialog openDialog() throws Exception {
        EventQueue.invokeLater(() -> frame.newFromTemplate(null));
        return waitForWindow("newFromTemplate", NewFromTemplateDialog.class);
    }

    @Test
    void newBudgetFromATemplateAsksForItsParameterRecordsItsOriginAndShowsResults() throws Exception {
        NewFromTemplateDialog dlg = openDialog();
        onEdt(() -> {
            dlg.select(personal.resolve("tvfl-tank-v1.json"));
            JTextField v = named(dlg.getContentPane(), "param:V_tank");
            assertEquals("500.08", v.getText(), "the default is offered");
            v.setText("2000");
            ((JButton) named(dlg.getContentPane(), "create")).doClick();
            return null;
        });
        String refusal = onEdt(() -> ((JLabel) named(dlg.getContentPane(), "error")).getText());
        assertTrue(refusal.contains("V_tank") && refusal.contains("outside its allowed range"),
                "a value out of range is refused in the dialog: " + refusal);
        onEdt(() -> {
            ((JTextField) named(dlg.getContentPane(), "param:V_tank")).setText("250.04");
            ((JButton) named(dlg.getContentPane(), "create")).doClick();
            return null;
        });
        waitFor("the new budget", () -> frame.editors().size() == 1);
        BudgetEditor ed = frame.editors().get(0);
        BudgetDocument made = ed.document().content();
        assertEquals("tvfl-tank", made.templateOrigin().id());
        assertEquals(1, made.templateOrigin().version());
        assertEquals(250.04, made.budget().input("V_20").evaluation().estimate(), 0.0);
        assertEquals("Test Engineer", made.author());
        assertNull(ed.document().file(), "not saved yet");
        waitForCurrentResult(ed);
        assertNotNull(ed.latest().result(), "the engine evaluated the new budget");
        assertNotNull(onEdt(() -> ed.resultSummary("E")), "its result is shown");
    }

    @Test
    void aPlainBudgetInTheLibraryIsCopiedAsANewDraftWithoutOrigin() throws Exception {
        // every shipped file is a template now; a plain budget in a library folder is still offered
        Path plain = personal.resolve("plain-tank.json");
        DocumentStore.save(BudgetDocument.newDraft(base.budget(), "Template Keeper",
                Instant.parse("2026-01-15T09:00:00Z")), plain);
        NewFromTemplateDialog dlg = openDialog();
        onEdt(() -> {
            dlg.select(plain);
            ((JButton) named(dlg.getContentPane(), "create")).doClick();
            return null;
        });
        waitFor("the new budget", () -> frame.editors().size() == 1);
        BudgetEditor ed = frame.editors().get(0);
        assertEquals(base.budget(), ed.document().budget());
        assertNull(ed.document().content().templateOrigin());
        assertEquals(1, ed.document().content().revision());
        waitForCurrentResult(ed);
        assertNotNull(onEdt(() -> ed.resultSummary("E")));
    }

    @Test
    void aNewerTemplateVersionIsOfferedAndCheckedChangesAreTakenOver() throws Exception {
        NewFromTemplateDialog dlg = openDialog();
        onEdt(() -> {
            dlg.select(personal.resolve("tvfl-tank-v1.json"));
            ((JTextField) named(dlg.getContentPane(), "param:V_tank")).setText("250.04");
            ((JButton) named(dlg.getContentPane(), "create")).doClick();
            return null;
        });
        waitFor("the new budget", () -> frame.editors().size() == 1);
        BudgetEditor first = frame.editors().get(0);
        Path file = personal.resolve("tank-run.json");
        assertTrue(await(onEdt(() -> frame.saveTo(first, file))));
        onEdt(() -> { frame.forceClose(first); return null; });
        Budget v2 = base.budget().withInput("h_neck", base.budget().input("h_neck")
                .withSource("TVFL neck scale, recalibrated 2026"));
        DocumentStore.save(template(2, v2), personal.resolve("tvfl-tank-v2.json"));

        BudgetEditor ed = await(onEdt(() -> frame.open(file))).orElseThrow();
        waitFor("the notice of template version 2", ed::noticeShown);
        EventQueue.invokeLater(() -> ed.noticeAction().doClick());
        TemplateUpdateDialog upd = waitForWindow("templateUpdate", TemplateUpdateDialog.class);
        JTable changes = upd.table();
        assertEquals(1, (int) onEdt(changes::getRowCount), "one difference: the source of h_neck");
        assertEquals("h_neck", onEdt(() -> changes.getValueAt(0, 2)));
        assertEquals("source changed", onEdt(() -> changes.getValueAt(0, 1)));
        onEdt(() -> {
            changes.setValueAt(Boolean.TRUE, 0, 0);
            ((JButton) named(upd.getContentPane(), "adopt")).doClick();
            return null;
        });
        waitFor("the change taken over", () -> ed.document().budget().input("h_neck").source()
                .equals("TVFL neck scale, recalibrated 2026"));
        assertEquals(2, ed.document().content().templateOrigin().version(), "the budget now follows version 2");
        assertEquals(250.04, ed.document().budget().input("V_20").evaluation().estimate(), 0.0,
                "the user's parameter value is kept");
        assertTrue(ed.document().isDirty());
    }
}
