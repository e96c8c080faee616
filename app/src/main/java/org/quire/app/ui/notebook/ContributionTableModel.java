package org.quire.app.ui.notebook;

import java.util.List;
import javax.swing.table.AbstractTableModel;
import org.quire.app.ui.common.Fmt;
import org.quire.engine.gum.Contribution;
import org.quire.engine.gum.OutputResult;
import org.quire.engine.units.Units;

/**
 * The budget table of one output: the engine's contribution rows, as they are, with their units; or, as the
 * total row under it, the combined figures.
 */
final class ContributionTableModel extends AbstractTableModel {
    static final int INPUT = 0;
    static final int EVALUATION = 1;
    static final int DISTRIBUTION = 2;
    static final int ESTIMATE = 3;
    static final int U = 4;
    static final int SENSITIVITY = 5;
    static final int CONTRIBUTION = 6;
    static final int DOF = 7;
    static final int SHARE = 8;
    private List<Contribution> rows = List.of();
    private OutputResult total;
    private String outputUnit = "";
    private final boolean totalRow;
    /** The evaluation written short: "A" or "B" under the header "Type" (a narrow column), else "Type A". */
    private boolean shortEvaluation;

    /** @param totalRow whether this model is the one-row total under the table */
    ContributionTableModel(boolean totalRow) {
        this.totalRow = totalRow;
    }

    void set(OutputResult o) {
        rows = o.contributions();
        total = o;
        outputUnit = o.unit();
        fireTableDataChanged();
    }

    /**
     * @param on whether the evaluation column writes "B" rather than "Type B" (its header then says "Type"; the
     *     copy and the tooltips keep the full words)
     */
    void shortEvaluation(boolean on) {
        shortEvaluation = on;
    }

    @Override public int getRowCount() { return totalRow ? (total == null ? 0 : 1) : rows.size(); }
    @Override public int getColumnCount() { return 9; }

    @Override
    public String getColumnName(int c) {
        String yu = outputUnit.isBlank() ? "" : " / " + Units.display(outputUnit);
        // two lines a header (the copy and the tooltip read them as one), so the table fits a 1366-pixel screen
        switch (c) {
            case 0: return "Input";
            case 1: return "Evaluation";
            case 2: return "Distribution";
            case 3: return "<html>Estimate<br>x\u1d62</html>";
            case 4: return "<html>Std. uncertainty<br>u(x\u1d62)</html>";
            case 5: return "<html>Sensitivity<br>c\u1d62</html>";
            case 6: return "<html>Contribution<br>u\u1d62(y)" + yu + "</html>";
            case 7: return "\u03bd\u1d62";
            default: return "<html>Share of combined<br>variance / %</html>";
        }
    }

    @Override
    public Class<?> getColumnClass(int c) {
        return c <= 2 ? String.class : Double.class;
    }

    Contribution row(int r) { return rows.get(r); }

    /** @return the text of a cell as shown, with the unit where it varies from row to row */
    String shown(int r, int c) {
        if (!totalRow && c == EVALUATION && shortEvaluation) {
            return rows.get(r).type();
        }
        return full(r, c);
    }

    /** @return the text of a cell written in full ("Type B" even where the column shows "B"): its tooltip */
    String full(int r, int c) {
        if (!totalRow && (c == ESTIMATE || c == U || c == SENSITIVITY)) {
            return withUnit(figure(r, c), unit(r, c));
        }
        return figure(r, c);
    }

    /** @return the unit a cell shows after its figure, as displayed; "" for none */
    String unit(int r, int c) {
        if (totalRow || !(c == ESTIMATE || c == U || c == SENSITIVITY)) {
            return "";
        }
        Contribution k = rows.get(r);
        String u = c == SENSITIVITY ? sensitivityUnit(k.unit()) : k.unit();
        return u == null || u.isBlank() || u.equals("1") || figure(r, c).isEmpty() ? "" : Units.display(u);
    }

    /** @return a cell's figure (or words) without its unit */
    String figure(int r, int c) {
        if (totalRow) {
            switch (c) {
                case 0: return "Combined";
                case 6: return Fmt.working(total.standardUncertainty());
                case 7: return Fmt.dof(total.effectiveDof());
                case 8: return Fmt.percent(1.0).replace(" %", "");
                default: return "";
            }
        }
        Contribution k = rows.get(r);
        switch (c) {
            case 0: return k.input();
            case 1: return "Type " + k.type();
            case 2: return org.quire.engine.budget.TypeB.DISTRIBUTIONS.contains(k.distribution())
                    ? org.quire.engine.budget.TypeB.screenName(k.distribution()) : k.distribution();
            case 3: return Fmt.num(k.estimate());
            case 4: return Fmt.working(k.standardUncertainty());
            case 5: return Fmt.working(k.sensitivity());
            case 6: return Fmt.working(k.contribution());
            case 7: return Fmt.dof(k.dof());
            default: return Fmt.percent(k.share()).replace(" %", "");
        }
    }

    /** @return the unit of c_i = unit(y) / unit(x_i), by the engine's unit algebra; "" when a unit is not one */
    private String sensitivityUnit(String inputUnit) {
        try {
            return Units.display(Units.parse(outputUnit.isBlank() ? "1" : outputUnit)
                    .divide(Units.parse(inputUnit.isBlank() ? "1" : inputUnit)).symbol());
        } catch (RuntimeException e) {
            return "";
        }
    }

    private static String withUnit(String v, String u) {
        return u.isEmpty() || v.isEmpty() ? v : v + " " + u;
    }

    @Override
    public Object getValueAt(int r, int c) {
        if (totalRow) {
            return shown(r, c);
        }
        Contribution k = rows.get(r);
        switch (c) {
            case 0: return k.input();
            case 1: return "Type " + k.type();
            case 2: return k.distribution();
            case 3: return k.estimate();
            case 4: return k.standardUncertainty();
            case 5: return k.sensitivity();
            case 6: return k.contribution();
            case 7: return k.dof();
            default: return k.share();
        }
    }
}
