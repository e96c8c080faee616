package org.quire.engine.io;

import jakarta.json.JsonArray;
import jakarta.json.JsonArrayBuilder;
import jakarta.json.JsonObject;
import jakarta.json.JsonObjectBuilder;
import jakarta.json.JsonValue;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import org.quire.engine.line.CalibrationData;
import org.quire.engine.line.CalibrationLine;
import org.quire.engine.line.CalibrationPoint;
import org.quire.engine.line.LineMethod;

/**
 * Reads and writes the {@code dataSets} of a budget file: calibration data sets with the method their
 * straight line is fitted by.
 *
 * <pre>
 * "dataSets": [
 *   {
 *     "name": "TV-EM-07 2026-11",
 *     "xUnit": "m3/h", "yUnit": "mV",
 *     "method": "WLS",                       OLS, WLS, GDR or GMR
 *     "referenceX": 20,                      optional: x0 of y = a + b (x - x0), or "mean"; default 0
 *     "points": [ {"x": 2.5, "y": 0.71, "u_x": 0.002, "u_y": 0.004}, ... ],   u_x, u_y optional (0)
 *     "covariance": [[...], ...]             optional: covariance matrix of the y values (n x n)
 *   }
 * ]
 * </pre>
 * Errors name the JSON path and, for a point, its number from 1. Stateless and thread-safe.
 */
public final class DataSetJson {
    static final Set<String> FIELDS = Set.of("name", "xUnit", "yUnit", "method", "referenceX", "points",
            "covariance");
    private static final Set<String> POINT_FIELDS = Set.of("x", "y", "u_x", "u_y");

    private DataSetJson() {
    }

    /** Reads a {@code dataSets} array; names must be unique. */
    public static List<CalibrationLine> readAll(JsonCursor array) throws BudgetFormatException {
        List<CalibrationLine> out = new ArrayList<>();
        List<String> names = new ArrayList<>();
        for (JsonCursor d : array.elements()) {
            CalibrationLine l = read(d);
            if (names.contains(l.name())) {
                throw new BudgetFormatException(d.path() + ".name", "data set '" + l.name() + "' is listed twice");
            }
            names.add(l.name());
            out.add(l);
        }
        return out;
    }

    /** Reads one data set object. */
    public static CalibrationLine read(JsonCursor d) throws BudgetFormatException {
        d.onlyFields(FIELDS);
        String name = d.get("name").string();
        if (name.isBlank()) {
            throw new BudgetFormatException(d.path() + ".name", "the data set's name must not be blank");
        }
        LineMethod method;
        try {
            method = LineMethod.parse(d.get("method").string());
        } catch (IllegalArgumentException e) {
            throw new BudgetFormatException(d.path() + ".method", e.getMessage());
        }
        List<CalibrationPoint> points = new ArrayList<>();
        List<JsonCursor> rows = d.get("points").elements();
        for (int i = 0; i < rows.size(); i++) {
            JsonCursor p = rows.get(i);
            p.onlyFields(POINT_FIELDS);
            double x = p.get("x").number(false);
            double y = p.get("y").number(false);
            double ux = p.has("u_x") ? p.get("u_x").number(false) : 0;
            double uy = p.has("u_y") ? p.get("u_y").number(false) : 0;
            try {
                points.add(CalibrationPoint.of(x, y, ux, uy));
            } catch (IllegalArgumentException e) {
                throw new BudgetFormatException(p.path(), "point " + (i + 1) + ": " + e.getMessage());
            }
        }
        CalibrationData data;
        try {
            data = CalibrationData.of(name, d.string("xUnit", ""), d.string("yUnit", ""), points);
        } catch (IllegalArgumentException e) {
            throw new BudgetFormatException(d.path() + ".points", e.getMessage());
        }
        if (d.has("covariance")) {
            List<JsonCursor> cr = d.get("covariance").elements();
            double[][] v = new double[cr.size()][];
            for (int i = 0; i < v.length; i++) {
                List<JsonCursor> cells = cr.get(i).elements();
                v[i] = new double[cells.size()];
                for (int j = 0; j < v[i].length; j++) {
                    v[i][j] = cells.get(j).number(false);
                }
            }
            try {
                data = data.withCovariance(v);
            } catch (IllegalArgumentException e) {
                throw new BudgetFormatException(d.path() + ".covariance", e.getMessage());
            }
        }
        CalibrationLine line;
        if (d.has("referenceX") && d.get("referenceX").value().getValueType() == JsonValue.ValueType.STRING) {
            String s = d.get("referenceX").string();
            if (!s.equals("mean")) {
                throw new BudgetFormatException(d.path() + ".referenceX", "referenceX must be a number or \"mean\", not \""
                        + s + "\"");
            }
            line = CalibrationLine.atMeanX(data, method);
        } else {
            line = CalibrationLine.of(data, method, d.has("referenceX") ? d.get("referenceX").number(false) : 0.0);
        }
        if (method.needsUy() || method.needsCovariance()) {
            try {
                line.fit();
            } catch (IllegalArgumentException | ArithmeticException e) {
                throw new BudgetFormatException(d.path(), "data set '" + name + "': " + e.getMessage());
            }
        }
        return line;
    }

    /** @return the data sets as a JSON array in the layout {@link #readAll} reads */
    public static JsonArray toJson(List<CalibrationLine> lines) {
        JsonArrayBuilder a = JsonSupport.JSON.createArrayBuilder();
        for (CalibrationLine l : lines) {
            a.add(toJson(l));
        }
        return a.build();
    }

    /** @return one data set as JSON */
    public static JsonObject toJson(CalibrationLine l) {
        CalibrationData data = l.data();
        JsonObjectBuilder o = JsonSupport.JSON.createObjectBuilder().add("name", data.name());
        if (!data.xUnit().isEmpty()) {
            o.add("xUnit", data.xUnit());
        }
        if (!data.yUnit().isEmpty()) {
            o.add("yUnit", data.yUnit());
        }
        o.add("method", l.method().abbreviation());
        if (l.referenceAtMeanX()) {
            o.add("referenceX", "mean");
        } else if (l.referenceX() != 0) {
            o.add("referenceX", l.referenceX());
        }
        JsonArrayBuilder pts = JsonSupport.JSON.createArrayBuilder();
        for (CalibrationPoint p : data.points()) {
            JsonObjectBuilder pb = JsonSupport.JSON.createObjectBuilder().add("x", p.x()).add("y", p.y());
            if (p.ux() != 0) {
                pb.add("u_x", p.ux());
            }
            if (p.uy() != 0) {
                pb.add("u_y", p.uy());
            }
            pts.add(pb);
        }
        o.add("points", pts);
        data.covariance().ifPresent(v -> o.add("covariance", ResultJson.matrix(v)));
        return o.build();
    }
}
