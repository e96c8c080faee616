package org.quire.engine.calibration;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.quire.engine.csv.CsvException;
import org.quire.engine.csv.CsvRow;
import org.quire.engine.csv.CsvTable;
import org.quire.engine.document.Template;
import org.quire.engine.io.BudgetFormatException;

/**
 * The runs of a rig's log, read from a CSV table (through the one CSV reader, {@link
 * org.quire.engine.csv.CsvReader}) against a method template. Columns:
 * <ul>
 * <li>{@code point}: the flow point's label (required); rows of one point need not be adjacent;</li>
 * <li>{@code phase}: {@code as-found} or {@code as-left} (optional; without it every run is as found);</li>
 * <li>{@code meter}: the meter's identifier, for a fleet of meters in one file (optional);</li>
 * <li>{@code run}: the run's number in the log (optional, kept only as the row);</li>
 * <li>{@code constant}: the meter's calibration constant as found (optional; one value per meter);</li>
 * <li>one column per per-run quantity of the method (the template's parameters), every one required.</li>
 * </ul>
 * Any other column, a blank reading, a number the reader refuses, a phase other than the two, or two
 * constants for one meter is an error naming the file, line and column. Each run keeps its line as its
 * source row. Stateless and thread-safe.
 */
public final class RunsCsv {
    /** The columns that are not per-run quantities. */
    public static final List<String> FIXED_COLUMNS = List.of("point", "phase", "meter", "run", "constant");

    private RunsCsv() {
    }

    /**
     * The runs of one meter.
     *
     * @param meter the meter's identifier (empty without a meter column)
     * @param asFound the as-found points in order of first appearance
     * @param asLeft the as-left points in order of first appearance (empty when none)
     * @param constant the as-found calibration constant of the constant column, NaN without one
     * @param firstLine the line of the meter's first row
     */
    public record MeterRuns(String meter, List<FlowPoint> asFound, List<FlowPoint> asLeft, double constant,
            int firstLine) {
    }

    /**
     * @param table the CSV table, with a header
     * @param method the method template whose parameters are the per-run quantities
     * @return the runs per meter, in order of first appearance
     * @throws BudgetFormatException naming the file, line and column at fault (a CsvException for a cell)
     */
    public static List<MeterRuns> read(CsvTable table, Template method) throws BudgetFormatException {
        List<String> required = new ArrayList<>();
        required.add("point");
        required.addAll(method.parameterNames());
        table.requireColumns(required.toArray(new String[0]));
        List<String> header = table.header();
        for (int i = 0; i < header.size(); i++) {
            String h = header.get(i);
            if (!FIXED_COLUMNS.contains(h) && method.spec().parameter(h) == null) {
                throw new BudgetFormatException(table.sourceName() + ", header, column " + (i + 1) + " (" + h + ")",
                        "column '" + h + "' is neither a per-run quantity of method " + method.id()
                        + org.quire.engine.model.Suggest.hint(h, method.parameterNames()) + " (" + String.join(", ",
                                method.parameterNames()) + ") nor one of " + String.join(", ", FIXED_COLUMNS));
            }
        }
        boolean hasMeter = table.hasColumn("meter");
        boolean hasPhase = table.hasColumn("phase");
        boolean hasConstant = table.hasColumn("constant");
        Map<String, Map<String, List<Run>>> found = new LinkedHashMap<>();
        Map<String, Map<String, List<Run>>> left = new LinkedHashMap<>();
        Map<String, Double> constants = new LinkedHashMap<>();
        Map<String, Integer> first = new LinkedHashMap<>();
        for (CsvRow row : table.rows()) {
            String meter = hasMeter ? row.text("meter") : "";
            if (hasMeter && meter.isEmpty()) {
                throw row.problem(table.columnIndex("meter"), "the meter identifier is blank");
            }
            String point = row.text("point");
            if (point.isEmpty()) {
                throw row.problem(table.columnIndex("point"), "the flow point label is blank");
            }
            boolean asLeft = false;
            if (hasPhase) {
                String ph = row.text("phase");
                if (ph.equals("as-left")) {
                    asLeft = true;
                } else if (!ph.equals("as-found")) {
                    throw row.problem(table.columnIndex("phase"), "the phase must be 'as-found' or 'as-left', not '"
                            + ph + "'");
                }
            }
            if (hasConstant) {
                int col = table.columnIndex("constant");
                if (row.isBlank(col)) {
                    throw row.problem(col, "the calibration constant is blank");
                }
                double k = row.number(col);
                Double before = constants.putIfAbsent(meter, k);
                if (before != null && before != k) {
                    throw row.problem(col, "meter '" + meter + "' has the constant " + before + " on an earlier row "
                            + "and " + k + " here; a meter has one as-found constant");
                }
            }
            Map<String, Double> readings = new LinkedHashMap<>();
            for (String p : method.parameterNames()) {
                int col = table.columnIndex(p);
                if (row.isBlank(col)) {
                    throw row.problem(col, "the reading '" + p + "' is missing; every run must give each per-run "
                            + "quantity of the method");
                }
                readings.put(p, row.number(col));
            }
            first.putIfAbsent(meter, row.line());
            (asLeft ? left : found).computeIfAbsent(meter, m -> new LinkedHashMap<>())
                    .computeIfAbsent(point, k -> new ArrayList<>()).add(Run.of(row.line(), readings));
        }
        if (first.isEmpty()) {
            throw problem(table, "the file has no runs");
        }
        List<MeterRuns> out = new ArrayList<>();
        for (String meter : first.keySet()) {
            if (!found.containsKey(meter)) {
                throw problem(table, (meter.isEmpty() ? "the file" : "meter '" + meter + "'") + " has as-left runs "
                        + "but no as-found runs");
            }
            out.add(new MeterRuns(meter, points(found.get(meter)), points(left.getOrDefault(meter, Map.of())),
                    constants.getOrDefault(meter, Double.NaN), first.get(meter)));
        }
        return out;
    }

    private static List<FlowPoint> points(Map<String, List<Run>> m) {
        List<FlowPoint> out = new ArrayList<>();
        for (Map.Entry<String, List<Run>> e : m.entrySet()) {
            out.add(FlowPoint.of(e.getKey(), e.getValue()));
        }
        return out;
    }

    private static BudgetFormatException problem(CsvTable table, String reason) {
        return new BudgetFormatException(table.sourceName(), reason);
    }
}
