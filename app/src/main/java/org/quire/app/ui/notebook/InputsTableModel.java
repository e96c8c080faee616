package org.quire.app.ui.notebook;

import org.quire.app.ui.common.EditorContext;
import java.util.List;
import javax.swing.table.AbstractTableModel;
import org.quire.app.ui.common.Fmt;
import org.quire.engine.budget.Budget;
import org.quire.engine.budget.Correlation;
import org.quire.engine.budget.Evaluation;
import org.quire.engine.budget.InputQuantity;
import org.quire.engine.budget.TypeB;

/** The inputs table: an adapter over the budget's inputs; each edit goes through the document. */
final class InputsTableModel extends AbstractTableModel {
    static final int NAME = 0;
    static final int DESCRIPTION = 1;
    static final int UNIT = 2;
    static final int ESTIMATE = 3;
    static final int TYPE = 4;
    static final int DISTRIBUTION = 5;
    static final int U = 6;
    static final int DOF = 7;
    static final int SOURCE = 8;
    private static final String[] COLUMNS = {"Name", "Description", "Unit", "Estimate x\u1d62", "Evaluation",
        "Distribution", "Std. uncertainty u(x\u1d62)", "Degrees of freedom \u03bd\u1d62", "Source"};

    private final EditorContext ctx;
    private List<InputQuantity> rows = List.of();

    /** The merge key of the edits made now: "" for none, one key for all the cells of one paste. */
    private String mergeKey = "";

    InputsTableModel(EditorContext ctx) {
        this.ctx = ctx;
    }

    /** Runs the writes of one paste as one undo step. */
    void asOneEdit(Runnable writes) {
        String before = mergeKey;
        mergeKey = "paste@" + System.nanoTime();
        try {
            writes.run();
        } finally {
            mergeKey = before;
            ctx.document().history().breakMerge();
        }
    }

    void budgetChanged(Budget b) {
        if (b.inputs().size() != rows.size()) {
            rows = b.inputs();
            fireTableDataChanged();
            return;
        }
        List<InputQuantity> old = rows;
        rows = b.inputs();
        for (int i = 0; i < rows.size(); i++) {
            if (!rows.get(i).equals(old.get(i))) {
                fireTableRowsUpdated(i, i);
            }
        }
    }

    InputQuantity input(int row) { return rows.get(row); }

    /**
     * @return "locked by template ID vN" when the template the budget was made from locks the cell's field
     *     (recorded in its {@link org.quire.engine.document.TemplateOrigin}), else null
     */
    String lockReason(int r, int c) {
        org.quire.engine.document.TemplateOrigin o = ctx.document().content().templateOrigin();
        if (o == null || r < 0 || r >= rows.size()) {
            return null;
        }
        String n = rows.get(r).name();
        boolean locked;
        switch (c) {
            case NAME: locked = o.locksAnyOf(n); break;
            case DESCRIPTION: locked = o.isLocked(n, "description"); break;
            case UNIT: locked = o.isLocked(n, "unit"); break;
            case SOURCE: locked = o.isLocked(n, "source"); break;
            case ESTIMATE: locked = o.isLocked(n, "estimate") || o.isLocked(n, "evaluation"); break;
            default: locked = o.isLocked(n, "evaluation");
        }
        return locked ? o.lockReason() : null;
    }

    @Override public int getRowCount() { return rows.size(); }
    @Override public int getColumnCount() { return COLUMNS.length; }
    @Override public String getColumnName(int c) { return COLUMNS[c]; }

    @Override
    public boolean isCellEditable(int r, int c) {
        if (ctx.readOnly()) {
            return false;
        }
        Evaluation e = rows.get(r).evaluation();
        if (lockReason(r, c) != null) {
            return false;
        }
        switch (c) {
            case ESTIMATE: return EvaluationEdits.estimateEditable(e);
            case TYPE: return false;
            case DISTRIBUTION: return e instanceof TypeB;
            case U: return EvaluationEdits.uncertaintyEditable(e);
            case DOF: return EvaluationEdits.dofEditable(e);
            default: return true;
        }
    }

    @Override
    public Object getValueAt(int r, int c) {
        InputQuantity q = rows.get(r);
        Evaluation e = q.evaluation();
        switch (c) {
            case NAME: return q.name();
            case DESCRIPTION: return q.description();
            case UNIT: return q.unit();
            case ESTIMATE: return Fmt.num(e.estimate());
            case TYPE: return "Type " + e.type();
            case DISTRIBUTION: return e instanceof TypeB ? ((TypeB) e).distributionName() : e.distribution().shape();
            case U: return EvaluationEdits.uncertaintyEditable(e) ? Fmt.num(e.standardUncertainty())
                    : Fmt.working(e.standardUncertainty());
            case DOF: return Fmt.dof(e.dof());
            default: return q.source();
        }
    }

    @Override
    public void setValueAt(Object value, int r, int c) {
        InputQuantity q = rows.get(r);
        String text = value == null ? "" : value.toString().trim();
        String name = q.name();
        try {
            switch (c) {
                case NAME:
                    ctx.edit("Rename " + name + " to " + text, mergeKey, b -> rename(b, name, text));
                    break;
                case DESCRIPTION:
                    ctx.edit("Edit description of " + name, mergeKey, b -> b.withInput(name, q.withDescription(text)));
                    break;
                case UNIT:
                    ctx.edit("Edit unit of " + name, mergeKey, b -> b.withInput(name, q.withUnit(text)));
                    break;
                case SOURCE:
                    ctx.edit("Edit source of " + name, mergeKey, b -> b.withInput(name, q.withSource(text)));
                    break;
                case ESTIMATE: {
                    double x = Fmt.parse(text);
                    ctx.edit("Change estimate of " + name, mergeKey, b -> b.withInput(name,
                            q.withEvaluation(EvaluationEdits.withEstimate(q.evaluation(), x))));
                    break;
                }
                case U: {
                    double u = Fmt.parse(text);
                    ctx.edit("Change u of " + name, mergeKey, b -> b.withInput(name,
                            q.withEvaluation(EvaluationEdits.withStandardUncertainty(q.evaluation(), u))));
                    break;
                }
                case DOF: {
                    double nu = text.isEmpty() ? Double.POSITIVE_INFINITY : Fmt.parse(text);
                    ctx.edit("Change degrees of freedom of " + name, mergeKey, b -> b.withInput(name,
                            q.withEvaluation(EvaluationEdits.withDof(q.evaluation(), nu))));
                    break;
                }
                case DISTRIBUTION:
                    ctx.edit("Change distribution of " + name + " to " + text, mergeKey, b -> b.withInput(name,
                            q.withEvaluation(EvaluationEdits.withDistribution((TypeB) q.evaluation(), text))));
                    break;
                default:
                    break;
            }
        } catch (NumberFormatException e) {
            ctx.status(e.getMessage(), true);
        }
    }

    /** Renames an input and the correlations that name it; the model text is the engineer's to change. */
    static Budget rename(Budget b, String from, String to) {
        if (from.equals(to)) {
            return b;
        }
        InputQuantity q = b.input(from).withName(to);
        List<Correlation> cs = new java.util.ArrayList<>();
        for (Correlation c : b.correlations()) {
            cs.add(new Correlation(c.first().equals(from) ? to : c.first(), c.second().equals(from) ? to : c.second(),
                    c.r(), c.fromReadings(), c.justification()));
        }
        return b.withInput(from, q).withCorrelations(cs);
    }
}
