package org.quire.app.ui;

import java.io.IOException;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import java.util.concurrent.ExecutionException;
import org.quire.app.ui.common.GuardedWorker;
import org.quire.app.ui.common.WorkbenchPrefs;
import org.quire.app.ui.document.BudgetDocument;
import org.quire.app.ui.notebook.BudgetEditor;
import org.quire.app.ui.templates.NewFromTemplateDialog;
import org.quire.app.ui.templates.TemplateCatalog;
import org.quire.app.ui.templates.TemplateUpdateDialog;
import org.quire.engine.document.Template;
import org.quire.engine.document.TemplateChange;
import org.quire.engine.document.TemplateLibrary;

/**
 * The workbench's use of the template library: a new budget from a template, and the notice (with the
 * field-by-field changes) when a newer version of the template a budget follows is in the library.
 *
 * <p>Not thread-safe: call on the event thread.
 */
final class WorkbenchTemplates {
    private final WorkbenchFrame frame;
    private final WorkbenchPrefs prefs;

    WorkbenchTemplates(WorkbenchFrame frame, WorkbenchPrefs prefs) {
        this.frame = frame;
        this.prefs = prefs;
    }

    /** @return the templates of the shipped folder and the personal and team folders of the preferences */
    TemplateCatalog templates() {
        return TemplateCatalog.of(null, prefs.personalTemplates(), prefs.teamTemplates());
    }

    /**
     * File &gt; New from template: lists the catalogue off the event thread (the team folder may be a network
     * share), then offers it, asks for the parameters and opens the new budget.
     *
     * @param preselect the file to select in the list, or null
     */
    void newFromTemplate(Path preselect) {
        newFromTemplate(dlg -> {
            if (preselect != null) {
                dlg.select(preselect);
            }
        });
    }

    /** File &gt; New from template with the template of this id and version selected, when the library has it. */
    void newFromTemplate(String id, int version) {
        newFromTemplate(dlg -> dlg.selectTemplate(id, version));
    }

    private void newFromTemplate(java.util.function.Consumer<NewFromTemplateDialog> preselect) {
        TemplateCatalog catalog = templates();
        frame.status("Listing the templates\u2026", false);
        new GuardedWorker<TemplateCatalog.Listing, Void>() {
            @Override
            protected TemplateCatalog.Listing doInBackground() throws IOException {
                return catalog.list();
            }

            @Override
            protected void finished() {
                TemplateCatalog.Listing listing;
                try {
                    listing = get();
                } catch (InterruptedException e) {
                    Thread.currentThread().interrupt();
                    return;
                } catch (ExecutionException e) {
                    frame.status("", false);
                    frame.showError("Cannot list the templates", e.getCause().getMessage());
                    return;
                }
                frame.status("", false);
                offer(listing, preselect);
            }
        }.execute();
    }

    private void offer(TemplateCatalog.Listing listing, java.util.function.Consumer<NewFromTemplateDialog> preselect) {
        NewFromTemplateDialog dlg = new NewFromTemplateDialog(frame, listing, prefs.userName());
        preselect.accept(dlg);
        dlg.setVisible(true);
        if (dlg.created() == null) {
            return;
        }
        frame.open(new BudgetDocument(dlg.created(), null, "new from " + shortName(dlg.createdFrom()),
                prefs.userName()));
        frame.status("New budget from " + dlg.createdFrom().file().getFileName()
                + (dlg.createdFrom().isTemplate() ? "" : " (a plain budget: copied, no template origin recorded)"),
                false);
    }

    private static String shortName(TemplateCatalog.Entry e) {
        String n = String.valueOf(e.file().getFileName());
        return n.endsWith(".json") ? n.substring(0, n.length() - 5) : n;
    }

    /** Looks, off the event thread, for a newer version of the template the budget follows, and offers it. */
    void checkTemplate(BudgetEditor ed) {
        org.quire.engine.document.BudgetDocument content = ed.document().content();
        // a template opened as it is: its results are those of its example values, and it says so
        java.util.Optional<String> example = org.quire.engine.document.TemplateConformance.exampleFigures(content);
        if (example.isPresent()) {
            org.quire.engine.document.TemplateSpec t = content.template();
            ed.showNotice(org.quire.app.ui.common.Fmt.sentence(example.get()) + ".", "New budget from this template\u2026",
                    () -> newFromTemplate(t.id(), t.version()), false);
        }
        if (content.templateOrigin() == null) {
            return;
        }
        TemplateCatalog catalog = templates();
        new GuardedWorker<Optional<Template>, Void>() {
            @Override
            protected Optional<Template> doInBackground() throws Exception {
                return catalog.newerTemplate(content);
            }

            @Override
            protected void finished() {
                try {
                    Optional<Template> newer = get();
                    if (newer.isPresent() && frame.editors().contains(ed)) {
                        Template t = newer.get();
                        ed.showNotice("This budget follows template " + t.id() + " version "
                                + content.templateOrigin().version() + "; version " + t.version()
                                + " is in the library.", "Review the changes\u2026", () -> offerTemplateChanges(ed, t));
                    }
                } catch (InterruptedException e) {
                    Thread.currentThread().interrupt();
                } catch (ExecutionException e) {
                    frame.status("Cannot look for a newer template: " + e.getCause().getMessage(), true);
                }
            }
        }.execute();
    }

    /** Shows the changes a newer template brings, field by field, and takes the checked ones over. */
    void offerTemplateChanges(BudgetEditor ed, Template newer) {
        BudgetDocument doc = ed.document();
        List<TemplateChange> changes = TemplateLibrary.compare(doc.content(), newer);
        TemplateUpdateDialog dlg = new TemplateUpdateDialog(frame, newer, doc.content().templateOrigin().version(),
                changes);
        dlg.setVisible(true);
        List<TemplateChange> chosen = dlg.chosen();
        if (!chosen.isEmpty()) {
            ed.editDocument("Take over " + chosen.size() + " change(s) of template " + newer.id(), "",
                    d -> TemplateLibrary.adopt(d, newer, chosen, doc.user(), doc.now()));
        }
    }
}
