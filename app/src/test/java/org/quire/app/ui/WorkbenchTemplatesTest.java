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

    /**
     * A template of the proving-tank budget whose parameters are the tank's nominal volume V_20 and the meter's
     * indicated volumes V_ind (mean, s, n, with defaults); every other input is locked, so that no example value
     * is carried over unasked.
     */
    private static BudgetDocument template(int version, Budget b) {
        Instant t = Instant.parse("2026-01-15T09:00:00Z");
        List<String> locked = new java.util.ArrayList<>();
        for (String n : b.inputNames()) {
            if (!n.equals("V_20") && !n.equals("V_ind")) {
                locked.add(n);
            }
        }
        TemplateSpec spec = TemplateSpec.of("tvfl-tank", version).withDescription("Proving tank, one run")
                .withParameters(List.of(TemplateParameter.of("V_tank", "V_20", "estimate").withUnit("L")
                        .withDescription("volume of the tank at 20 \u00b0C from its certificate")
                        .withDefault(500.08).withRange(100, 1000),
                        TemplateParameter.of("V_ind", "V_ind", "estimate").withUnit("L").withDefault(498.946),
                        TemplateParameter.of("V_ind_s", "V_ind", "standardDeviation").withUnit("L").withDefault(0.054),
                        TemplateParameter.of("V_ind_n", "V_ind", "count").withDefault(5)))
                .withLocked(locked);
        return BudgetDocument.newDraft(b, "Template Keeper", t).withTemplate(spec, "Template Keeper", t);
    }

    /** @return a budget made from the proving-tank template with one run's invented values */
    private static BudgetDocument tankRun(org.quire.engine.document.Template shipped) {
        return shipped.instantiate(java.util.Map.of("V_20", 500.08, "h_neck", 0.62, "t_tank", 17.8, "t_meter", 17.5,
                "p_meter", 250000.0, "V_ind", 498.95, "V_ind_s", 0.054, "V_ind_n", 5.0), "Test Engineer",
                Instant.parse("2026-12-01T10:00:00Z"));
    }

    /**
     * A budget made from the shipped proving-tank template: the inputs its template locks are read-only in the
     * inspector and the inputs table, each with the reason "locked by template ID vN"; the inputs its
     * parameters set stay editable.
     */
    @Test
    void theFieldsTheTemplateLocksAreReadOnlyWithTheTemplateNamedAsTheReason(@TempDir Path dir) throws Exception {
        org.quire.engine.document.Template shipped = org.quire.engine.document.Template.of(base);
        BudgetDocument made = tankRun(shipped);
        Path file = dir.resolve("tank-run.json");
        DocumentStore.save(made, file);
        BudgetEditor ed = await(onEdt(() -> frame.open(file))).orElseThrow();
        String reason = "locked by template " + shipped.id() + " v" + shipped.version();
        onEdt(() -> { ed.selectInput("d_drain"); return null; });
        onEdt(() -> {
            JTextField source = named(frame.getContentPane(), "inspector:Source");
            assertTrue(!source.isEditable(), "the source of a locked input is read-only");
            assertEquals(reason, source.getToolTipText());
            java.awt.Container form = source.getParent();
            while (!form.getClass().getSimpleName().equals("InputInspector")) {
                form = form.getParent();
            }
            List<JTextField> all = new java.util.ArrayList<>();
            collect(form, all);
            assertTrue(all.size() >= 7, "the inspector's fields: " + all.size());
            for (JTextField f : all) {
                assertTrue(!f.isEditable(), "field " + f.getName() + " of the locked input d_drain is read-only");
            }
            JLabel lock = named(frame.getContentPane(), "inspectorLock");
            assertTrue(lock.isShowing(), "the inspector says the input is locked");
            assertTrue(lock.getText().startsWith("<html>Locked by template " + shipped.id() + " v"
                    + shipped.version() + ":"), lock.getText());
            assertTrue(lock.getText().contains("evaluation"), lock.getText());
            assertTrue(!((javax.swing.JComboBox<?>) named(frame.getContentPane(), "evaluationType")).isEnabled(),
                    "the evaluation of a locked input cannot be switched");
            JTable inputs = named(ed, "inputs");
            int row = -1;
            for (int r = 0; r < inputs.getRowCount(); r++) {
                if ("d_drain".equals(inputs.getModel().getValueAt(inputs.convertRowIndexToModel(r), 0))) {
                    row = r;
                }
            }
            assertTrue(row >= 0, "d_drain is in the inputs table");
            for (int c = 0; c < inputs.getColumnCount(); c++) {
                assertTrue(!inputs.isCellEditable(row, c), "column " + inputs.getColumnName(c) + " of d_drain is locked");
            }
            javax.swing.text.JTextComponent model = named(ed, "model");
            assertTrue(!model.isEditable(), "the template locks the model");
            assertEquals("The model is " + reason + " (the method's model): read-only.",
                    ((JLabel) named(ed, "modelHint")).getText());
            JTable outputs = named(ed, "outputs");
            assertTrue(!outputs.isCellEditable(0, 0), "the template locks the outputs");
            JTable correlations = named(ed, "correlations");
            if (correlations.getRowCount() > 1) {
                assertTrue(!correlations.isCellEditable(0, 2), "the template locks the correlations");
            }
            // the template locks the settings: coverage, digits, trials, seed and adaptive mode, with the reason
            assertTrue(shipped.spec().locked().contains("settings"), "the shipped template locks its settings");
            for (String name : List.of("coverageProbability", "significantDigits")) {
                javax.swing.JComponent c = named(ed, name);
                assertTrue(!c.isEnabled(), name + " is read-only");
                assertTrue(String.valueOf(c.getToolTipText()).startsWith(reason), c.getToolTipText());
            }
            assertEquals("Coverage and evaluation settings: " + reason + ", read-only.",
                    ((JLabel) named(ed, "resultsLock")).getText());
            assertTrue(((JLabel) named(ed, "resultsLock")).isVisible());
            for (String name : List.of("mcTrials", "mcSeed")) {
                JTextField f = named(ed, name);
                assertTrue(!f.isEditable(), name + " is read-only");
                assertTrue(String.valueOf(f.getToolTipText()).startsWith(reason), f.getToolTipText());
            }
            assertTrue(!((javax.swing.JCheckBox) named(ed, "mcAdaptive")).isEnabled(), "adaptive mode is read-only");
            assertEquals("Trials, seed and adaptive mode: " + reason + ", read-only.",
                    ((JLabel) named(ed, "mcLock")).getText());
            assertTrue(((JLabel) named(ed, "mcLock")).isVisible());
            return null;
        });
        onEdt(() -> { ed.selectInput("t_tank"); return null; });
        onEdt(() -> {
            JTextField source = named(frame.getContentPane(), "inspector:Source");
            assertTrue(source.isEditable(), "an input the parameters set stays editable");
            assertNull(source.getToolTipText());
            assertTrue(!((JLabel) named(frame.getContentPane(), "inspectorLock")).isShowing());
            return null;
        });
        onEdt(() -> { ed.selectInput("d_drain"); return null; });
        java.awt.image.BufferedImage shot = onEdt(() -> {
            frame.validate();
            java.awt.image.BufferedImage img = new java.awt.image.BufferedImage(frame.getWidth(), frame.getHeight(),
                    java.awt.image.BufferedImage.TYPE_INT_RGB);
            frame.paint(img.getGraphics());
            return img;
        });
        String out = System.getProperty("quire.screenshots");
        if (out != null) {
            javax.imageio.ImageIO.write(shot, "png", Path.of(out, "template-locks.png").toFile());
        }
    }

    /**
     * A budget made from the shipped proving-tank template whose locked drain allowance d_drain was narrowed from
     * a half-width of 0.03 L to 0.001 L, opened for review: the review panel shows the deviations the engine's
     * template check finds (computed here apart from the workbench), the same sentences {@code quire template
     * check} prints, and the checklist item of the template's locks is not met.
     */
    @Test
    void theReviewPanelShowsTheDeviationsFromTheTemplateThatTemplateCheckPrints(@TempDir Path dir) throws Exception {
        org.quire.engine.document.Template shipped = org.quire.engine.document.Template.of(base);
        BudgetDocument made = tankRun(shipped);
        org.quire.engine.budget.TypeB drain = (org.quire.engine.budget.TypeB) made.budget().input("d_drain").evaluation();
        assertEquals(0.03, drain.parameters().get("halfWidth"), "the template's drain allowance");
        BudgetDocument narrowed = made.withBudget(made.budget().withInput("d_drain", made.budget().input("d_drain")
                .withEvaluation(drain.with("halfWidth", 0.001))), "Test Engineer", made.modified());
        Path file = dir.resolve("tank-run-narrowed.json");
        DocumentStore.save(narrowed, file);
        org.quire.engine.document.TemplateConformance.Finding expected = org.quire.engine.document.TemplateConformance
                .check(DocumentStore.open(file), org.quire.engine.document.TemplateLibrary.withShipped(personal, null));
        assertEquals(org.quire.engine.document.TemplateConformance.State.DEVIATES, expected.state());
        assertEquals(1, expected.messages().size(), expected.messages().toString());
        assertTrue(expected.messages().get(0).contains("d_drain.evaluation.halfWidth"), expected.messages().get(0));

        java.io.ByteArrayOutputStream out = new java.io.ByteArrayOutputStream();
        java.io.ByteArrayOutputStream err = new java.io.ByteArrayOutputStream();
        int status = org.quire.app.cli.CommandLine.run(new String[] {"template", "check", file.toString(),
            "--personal", personal.toString()}, new java.io.PrintStream(out, true, java.nio.charset.StandardCharsets.UTF_8),
                new java.io.PrintStream(err, true, java.nio.charset.StandardCharsets.UTF_8));
        String printed = out.toString(java.nio.charset.StandardCharsets.UTF_8)
                + err.toString(java.nio.charset.StandardCharsets.UTF_8);
        assertEquals(2, status, printed);

        BudgetEditor ed = await(onEdt(() -> frame.open(file, true))).orElseThrow();
        waitForCurrentResult(ed);
        waitFor("the template check", () -> ed.reviewPanel().templateFinding() != null);
        onEdt(() -> {
            JLabel shown = named(ed, "templateFindings");
            assertTrue(shown.isVisible(), "the review panel shows the template check");
            assertTrue(shown.getText().contains("1 deviation from template " + shipped.id() + " v" + shipped.version()),
                    shown.getText());
            for (String m : expected.messages()) {
                assertTrue(shown.getText().contains(m), "shown: " + shown.getText() + "\nexpected: " + m);
                assertTrue(printed.contains(m), "template check prints: " + printed + "\nexpected: " + m);
            }
            JTable checklist = named(ed, "checklist");
            String outcome = null;
            for (int r = 0; r < checklist.getRowCount(); r++) {
                if ("The budget keeps every field its template locks".equals(checklist.getValueAt(r, 0))) {
                    outcome = String.valueOf(checklist.getValueAt(r, 2));
                }
            }
            assertEquals(org.quire.app.review.Outcome.NOT_MET.label(), outcome, "the checklist item of the locks");
            return null;
        });
    }

    private static void collect(java.awt.Container c, List<JTextField> out) {
        for (java.awt.Component k : c.getComponents()) {
            if (k instanceof JTextField && k.isShowing()) {
                out.add((JTextField) k);
            }
            if (k instanceof java.awt.Container) {
                collect((java.awt.Container) k, out);
            }
        }
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

    /**
     * The dialog takes the same path as {@code quire template new}: the shipped gravimetric template refuses a
     * budget without the meter's readings, and takes them typed in (separated by ';' or spaces), with the
     * laboratory and device of the new budget.
     */
    @Test
    void theDialogAsksForTheMetersReadingsAndTheLaboratoryAndCarriesNoneOfTheExample() throws Exception {
        NewFromTemplateDialog dlg = openDialog();
        java.util.Map<String, String> values = new java.util.LinkedHashMap<>();
        values.put("I_net", "398.75");
        values.put("t_tank", "19.8");
        values.put("t_meter", "19.9");
        values.put("p_meter", "260000");
        values.put("t_c", "28.8");
        values.put("p_a", "100900");
        values.put("t_a", "21.0");
        values.put("h_a", "0.5");
        values.put("U_bal", "0.04");
        values.put("k_pulse", "10");
        values.put("d_conv", "0.0002");
        onEdt(() -> {
            dlg.select(TemplateCatalog.shippedFolder().resolve("gravimetric-emf-flow-point.json"));
            values.forEach((k, v) -> ((JTextField) named(dlg.getContentPane(), "param:" + k)).setText(v));
            ((JButton) named(dlg.getContentPane(), "create")).doClick();
            return null;
        });
        String refusal = onEdt(() -> ((JLabel) named(dlg.getContentPane(), "error")).getText());
        assertTrue(refusal.contains("parameter 'N_ind' (the readings of input 'N_ind') must be given"), refusal);
        String out = System.getProperty("quire.screenshots");
        if (out != null) {
            java.awt.image.BufferedImage img = onEdt(() -> {
                java.awt.image.BufferedImage i = new java.awt.image.BufferedImage(dlg.getWidth(), dlg.getHeight(),
                        java.awt.image.BufferedImage.TYPE_INT_RGB);
                dlg.paint(i.getGraphics());
                return i;
            });
            javax.imageio.ImageIO.write(img, "png", Path.of(out, "new-from-template.png").toFile());
        }
        onEdt(() -> {
            ((JTextField) named(dlg.getContentPane(), "param:N_ind")).setText("4003.1; 4001.8 4002.6;4000.9  4003.4");
            ((JTextField) named(dlg.getContentPane(), "laboratory")).setText("Tarrow Vale Flow Laboratory");
            ((JTextField) named(dlg.getContentPane(), "device")).setText("TV-EM-100-09");
            ((JButton) named(dlg.getContentPane(), "create")).doClick();
            return null;
        });
        waitFor("the new budget", () -> frame.editors().size() == 1);
        BudgetDocument made = frame.editors().get(0).document().content();
        org.junit.jupiter.api.Assertions.assertArrayEquals(new double[] {4003.1, 4001.8, 4002.6, 4000.9, 4003.4},
                ((org.quire.engine.budget.TypeA) made.budget().input("N_ind").evaluation()).readings());
        assertEquals("Tarrow Vale Flow Laboratory", made.laboratory());
        assertEquals("TV-EM-100-09", made.deviceUnderTest());
        assertEquals("tvfl-gravimetric-emf-point", made.templateOrigin().id());
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
        onEdt(() -> {
            // without a template nothing locks the settings
            assertTrue(((javax.swing.JComponent) named(ed, "coverageProbability")).isEnabled());
            assertTrue(((JTextField) named(ed, "mcTrials")).isEditable());
            assertTrue(!((JLabel) named(ed, "resultsLock")).isVisible());
            assertTrue(!((JLabel) named(ed, "mcLock")).isVisible());
            return null;
        });
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

    @Test
    void aTemplateOpenedAsItIsSaysItsFiguresAreItsExamplesAndOffersANewBudget() throws Exception {
        Path file = personal.resolve("tvfl-tank-v1.json");
        BudgetEditor ed = await(onEdt(() -> frame.open(file))).orElseThrow();
        waitFor("the notice of a template's example figures", ed::noticeShown);
        onEdt(() -> {
            assertTrue(ed.noticeText().startsWith("This file is template "), ed.noticeText());
            assertTrue(ed.noticeText().contains("its figures are those of the template's example values, not of a "
                    + "measurement"), ed.noticeText());
            assertEquals("New budget from this template\u2026", ed.noticeAction().getText());
            return null;
        });
        EventQueue.invokeLater(() -> ed.noticeAction().doClick());
        NewFromTemplateDialog dlg = waitForWindow("newFromTemplate", NewFromTemplateDialog.class);
        onEdt(() -> {
            TemplateSpec opened = ed.document().content().template();
            assertTrue(dlg.selected() != null && dlg.selected().isTemplate(), "a template is selected");
            assertEquals(opened.id(), dlg.selected().template().id(), "the template opened is the one selected");
            assertEquals(opened.version(), dlg.selected().template().version());
            dlg.dispose();
            return null;
        });
        waitFor("the dialog closed", () -> !dlg.isShowing());
        assertTrue(onEdt(ed::noticeShown), "the finding stays after the dialog is cancelled");
    }

    @Test
    void twoNoticesAreShownTogetherAndEachIsDismissedOnItsOwn() throws Exception {
        // a template's example finding and a newer-version offer may both concern one budget: neither hides the
        // other (invented notices, the editor's own method)
        BudgetEditor ed = openDemo();
        onEdt(() -> {
            ed.showNotice("First notice: the figures are examples.", "Act on the first", () -> { }, false);
            ed.showNotice("Second notice: version 3 is in the library.", "Act on the second", () -> { });
            assertEquals("First notice: the figures are examples.\nSecond notice: version 3 is in the library.",
                    ed.noticeText());
            assertEquals("Act on the second", ed.noticeAction().getText(), "the newest notice's action");
            ed.noticeAction().doClick(); // an offer: its notice goes, the first stays
            assertEquals("First notice: the figures are examples.", ed.noticeText());
            assertTrue(ed.noticeShown());
            ed.noticeAction().doClick(); // a finding: it stays after its action
            assertTrue(ed.noticeShown(), "a finding stays after its action");
            return null;
        });
    }
}
