package org.quire.engine.budget;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Locale;
import java.util.Set;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.quire.engine.conformity.DecisionRule;
import org.quire.engine.conformity.MpeEnvelope;

/**
 * The flow points a budget is evaluated at across a meter's flow range: a table with one row per point. Each
 * row states the flow (for the report) and values for the table's columns; a column named after an input
 * gives that input's estimate at each point, a column {@code u(name)} its standard uncertainty. Inputs with a
 * column vary from point to point and are independent between points (a fresh reading at each flow); every
 * other input is common to all points (the same reference standard, the same calibration line), which is what
 * correlates the point results.
 *
 * <p>Optionally the table names the output to tabulate (default: the first) and, when that output is a
 * meter's error in percent of the reading, the maximum permissible errors and the decision rule for a
 * conformity decision at each point.
 *
 * <p>Immutable and thread-safe (rows are copied in and out).
 */
public final class FlowPoints {
    private static final Pattern U_COLUMN = Pattern.compile("u\\((.+)\\)");

    /** One row of the table: the flow and one value per column. */
    public record Row(double flow, double[] values) {
        public Row {
            values = values.clone();
        }

        @Override
        public double[] values() {
            return values.clone();
        }

        @Override
        public boolean equals(Object o) {
            return o instanceof Row && Double.compare(((Row) o).flow, flow) == 0
                    && java.util.Arrays.equals(((Row) o).values, values);
        }

        @Override
        public int hashCode() {
            return Double.hashCode(flow) * 31 + java.util.Arrays.hashCode(values);
        }
    }

    private final String flowUnit;
    private final String output;
    private final List<String> columns;
    private final List<Row> rows;
    private final MpeEnvelope envelope;
    private final DecisionRule rule;
    private final double temperature;

    private FlowPoints(String flowUnit, String output, List<String> columns, List<Row> rows, MpeEnvelope envelope,
            DecisionRule rule, double temperature) {
        this.flowUnit = flowUnit;
        this.output = output;
        this.columns = columns;
        this.rows = rows;
        this.envelope = envelope;
        this.rule = rule;
        this.temperature = temperature;
    }

    /**
     * @param flowUnit the unit of the flows, e.g. "m3/h"
     * @param columns input names, or {@code u(name)} for an input's standard uncertainty; each at most once
     * @param rows at least two rows, each with one finite value per column (standard uncertainties positive)
     *     and a finite flow
     * @throws IllegalArgumentException naming the column or row (from 1) at fault
     */
    public static FlowPoints of(String flowUnit, List<String> columns, List<Row> rows) {
        if (flowUnit == null) {
            throw new IllegalArgumentException("the flow unit of the flow points is missing");
        }
        if (columns == null || columns.isEmpty()) {
            throw new IllegalArgumentException("the flow points name no column: name at least one input whose "
                    + "estimate or standard uncertainty varies with the flow");
        }
        Set<String> seen = new HashSet<>();
        for (int c = 0; c < columns.size(); c++) {
            String name = columns.get(c);
            if (name == null || name.isBlank()) {
                throw new IllegalArgumentException("flow-point column " + (c + 1) + " has no name");
            }
            if (!seen.add(name)) {
                throw new IllegalArgumentException("flow-point column '" + name + "' is named twice");
            }
        }
        if (rows == null || rows.size() < 2) {
            throw new IllegalArgumentException("a flow range needs at least 2 flow points, got "
                    + (rows == null ? 0 : rows.size()));
        }
        List<Row> copy = new ArrayList<>();
        for (int i = 0; i < rows.size(); i++) {
            Row r = rows.get(i);
            if (r == null) {
                throw new IllegalArgumentException("flow point " + (i + 1) + " is missing");
            }
            if (!Double.isFinite(r.flow())) {
                throw new IllegalArgumentException("flow point " + (i + 1) + ": the flow must be a finite number, not "
                        + r.flow());
            }
            if (r.values.length != columns.size()) {
                throw new IllegalArgumentException(String.format(Locale.ROOT, "flow point %d has %d values, but the "
                        + "table has %d columns (%s)", i + 1, r.values.length, columns.size(), String.join(", ", columns)));
            }
            for (int c = 0; c < columns.size(); c++) {
                double v = r.values[c];
                if (!Double.isFinite(v)) {
                    throw new IllegalArgumentException("flow point " + (i + 1) + ", column '" + columns.get(c)
                            + "': not a finite number: " + v);
                }
                if (uncertaintyOf(columns.get(c)) != null && !(v > 0)) {
                    throw new IllegalArgumentException("flow point " + (i + 1) + ", column '" + columns.get(c)
                            + "': a standard uncertainty must be positive, not " + v);
                }
            }
            copy.add(r);
        }
        return new FlowPoints(flowUnit.strip(), "", List.copyOf(columns), List.copyOf(copy), null, null, Double.NaN);
    }

    /** @return a copy tabulating the output named (empty: the budget's first output) */
    public FlowPoints withOutput(String name) {
        return new FlowPoints(flowUnit, name == null ? "" : name.strip(), columns, rows, envelope, rule, temperature);
    }

    /**
     * @param mpe the maximum permissible errors over the flow range (in the table's flow unit)
     * @param decisionRule the rule for the statement of conformity
     * @param celsius the liquid's temperature, °C, for limits that depend on it; NaN when not stated
     * @return a copy that decides conformity at each point; the tabulated output must be an error in percent
     */
    public FlowPoints withConformity(MpeEnvelope mpe, DecisionRule decisionRule, double celsius) {
        if (Double.isInfinite(celsius)) {
            throw new IllegalArgumentException("the liquid's temperature must be a finite number, not " + celsius);
        }
        if ((mpe == null) != (decisionRule == null)) {
            throw new IllegalArgumentException("a conformity decision needs both the maximum permissible errors and "
                    + "the decision rule");
        }
        return new FlowPoints(flowUnit, output, columns, rows, mpe, decisionRule, celsius);
    }

    /**
     * @param column a column name
     * @return the input name of a {@code u(name)} column, or null for an estimate column
     */
    public static String uncertaintyOf(String column) {
        Matcher m = U_COLUMN.matcher(column.strip());
        return m.matches() ? m.group(1).strip() : null;
    }

    /** @return the input a column refers to */
    public static String inputOf(String column) {
        String u = uncertaintyOf(column);
        return u == null ? column.strip() : u;
    }

    /** @return the names of the inputs that vary from point to point, in column order, each once */
    public List<String> varyingInputs() {
        List<String> out = new ArrayList<>();
        for (String c : columns) {
            String n = inputOf(c);
            if (!out.contains(n)) {
                out.add(n);
            }
        }
        return out;
    }

    /**
     * @param inputNames the budget's input names
     * @throws IllegalArgumentException naming a column that refers to no input
     */
    public void checkAgainst(List<String> inputNames) {
        for (String c : columns) {
            String n = inputOf(c);
            if (!inputNames.contains(n)) {
                throw new IllegalArgumentException("flow-point column '" + c + "': there is no input named '" + n
                        + "'" + org.quire.engine.model.Suggest.hint(n, inputNames));
            }
        }
    }

    public String flowUnit() {
        return flowUnit;
    }

    /** @return the output to tabulate; empty for the budget's first output */
    public String output() {
        return output;
    }

    public List<String> columns() {
        return columns;
    }

    public List<Row> rows() {
        return rows;
    }

    /** @return the envelope of maximum permissible errors, or null when no conformity decision is asked for */
    public MpeEnvelope envelope() {
        return envelope;
    }

    /** @return the liquid's temperature for the conformity decisions, °C; NaN when not stated */
    public double temperature() {
        return temperature;
    }

    /** @return the decision rule, or null when no conformity decision is asked for */
    public DecisionRule rule() {
        return rule;
    }

    @Override
    public boolean equals(Object o) {
        if (!(o instanceof FlowPoints)) {
            return false;
        }
        FlowPoints f = (FlowPoints) o;
        return flowUnit.equals(f.flowUnit) && output.equals(f.output) && columns.equals(f.columns)
                && rows.equals(f.rows) && java.util.Objects.equals(envelope, f.envelope)
                && java.util.Objects.equals(rule, f.rule);
    }

    @Override
    public int hashCode() {
        return java.util.Objects.hash(flowUnit, output, columns, rows);
    }
}
