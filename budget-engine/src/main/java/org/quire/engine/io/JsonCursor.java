package org.quire.engine.io;

import jakarta.json.JsonArray;
import jakarta.json.JsonNumber;
import jakarta.json.JsonObject;
import jakarta.json.JsonString;
import jakarta.json.JsonValue;
import java.util.ArrayList;
import java.util.Collection;
import java.util.List;
import java.util.Set;
import org.quire.engine.model.Suggest;

/**
 * A JSON value with its path from the document root, for strict reading with errors that say where.
 * Immutable and thread-safe.
 */
public final class JsonCursor {
    private final JsonValue value;
    private final String path;

    private JsonCursor(JsonValue value, String path) {
        this.value = value;
        this.path = path;
    }

    /** @return a cursor at the root ({@code $}) */
    public static JsonCursor root(JsonValue value) {
        return new JsonCursor(value, "$");
    }

    public String path() {
        return path;
    }

    public JsonValue value() {
        return value;
    }

    public BudgetFormatException error(String message) {
        return new BudgetFormatException(path, message);
    }

    private static String kind(JsonValue v) {
        switch (v.getValueType()) {
            case OBJECT: return "an object";
            case ARRAY: return "an array";
            case STRING: return "a string";
            case NUMBER: return "a number";
            case TRUE: case FALSE: return "true/false";
            default: return "null";
        }
    }

    /** @return this value as an object */
    public JsonObject object() throws BudgetFormatException {
        if (value.getValueType() != JsonValue.ValueType.OBJECT) {
            throw error("expected an object, found " + kind(value));
        }
        return value.asJsonObject();
    }

    /** @return whether this object has the field */
    public boolean has(String key) throws BudgetFormatException {
        JsonValue v = object().get(key);
        return v != null && v.getValueType() != JsonValue.ValueType.NULL;
    }

    /** @return the field's cursor; error when missing */
    public JsonCursor get(String key) throws BudgetFormatException {
        JsonValue v = object().get(key);
        if (v == null || v.getValueType() == JsonValue.ValueType.NULL) {
            throw new BudgetFormatException(path, "the required field '" + key + "' is missing");
        }
        return new JsonCursor(v, path + "." + key);
    }

    /** @return the element's cursor */
    public List<JsonCursor> elements() throws BudgetFormatException {
        if (value.getValueType() != JsonValue.ValueType.ARRAY) {
            throw error("expected an array, found " + kind(value));
        }
        JsonArray a = value.asJsonArray();
        List<JsonCursor> out = new ArrayList<>();
        for (int i = 0; i < a.size(); i++) {
            out.add(new JsonCursor(a.get(i), path + "[" + i + "]"));
        }
        return out;
    }

    /** @return this value as a string */
    public String string() throws BudgetFormatException {
        if (value.getValueType() != JsonValue.ValueType.STRING) {
            throw error("expected a string, found " + kind(value));
        }
        return ((JsonString) value).getString();
    }

    /** @return this value as a finite number; the strings "inf" and "infinite" give infinity when allowed */
    public double number(boolean allowInfinite) throws BudgetFormatException {
        if (allowInfinite && value.getValueType() == JsonValue.ValueType.STRING) {
            String s = ((JsonString) value).getString().trim();
            if (s.equals("inf") || s.equals("infinite") || s.equals("\u221e")) {
                return Double.POSITIVE_INFINITY;
            }
        }
        if (value.getValueType() != JsonValue.ValueType.NUMBER) {
            throw error("expected a number, found " + kind(value)
                    + (value.getValueType() == JsonValue.ValueType.STRING ? " \"" + ((JsonString) value).getString() + "\"" : ""));
        }
        double d = ((JsonNumber) value).doubleValue();
        if (!Double.isFinite(d)) {
            throw error("number is out of range: " + value);
        }
        if (d == 0 && ((JsonNumber) value).bigDecimalValue().signum() != 0) {
            throw error("number is too small to hold, it would become 0: " + value);
        }
        return d;
    }

    /** @return this value as a whole number */
    public long integer() throws BudgetFormatException {
        double d = number(false);
        if (d != Math.rint(d) || Math.abs(d) > 9.007199254740992E15) {
            throw error("expected a whole number, found " + value);
        }
        return ((JsonNumber) value).longValue();
    }

    /** @return this value as true/false */
    public boolean bool() throws BudgetFormatException {
        if (value.getValueType() == JsonValue.ValueType.TRUE) {
            return true;
        }
        if (value.getValueType() == JsonValue.ValueType.FALSE) {
            return false;
        }
        throw error("expected true or false, found " + kind(value));
    }

    /** @return the optional string field, or {@code fallback} */
    public String string(String key, String fallback) throws BudgetFormatException {
        return has(key) ? get(key).string() : fallback;
    }

    /** Refuses any field not in {@code allowed}, suggesting the nearest allowed name. */
    public void onlyFields(Collection<String> allowed) throws BudgetFormatException {
        for (String k : object().keySet()) {
            if (!allowed.contains(k)) {
                throw new BudgetFormatException(path + "." + k, "unknown field '" + k + "'"
                        + Suggest.hint(k, allowed) + "; expected one of " + String.join(", ", sorted(allowed)));
            }
        }
    }

    private static List<String> sorted(Collection<String> c) {
        List<String> l = new ArrayList<>(c);
        java.util.Collections.sort(l);
        return l;
    }

    /** @return the depth of nesting of a value (a scalar has depth 0) */
    public static int depth(JsonValue v, int limit) {
        if (limit < 0) {
            return 1;
        }
        int d = 0;
        if (v.getValueType() == JsonValue.ValueType.OBJECT) {
            for (JsonValue c : v.asJsonObject().values()) {
                d = Math.max(d, 1 + depth(c, limit - 1));
            }
            return Math.max(d, 1);
        }
        if (v.getValueType() == JsonValue.ValueType.ARRAY) {
            for (JsonValue c : v.asJsonArray()) {
                d = Math.max(d, 1 + depth(c, limit - 1));
            }
            return Math.max(d, 1);
        }
        return 0;
    }

    /** @return the set of keys of this object */
    public Set<String> keys() throws BudgetFormatException {
        return object().keySet();
    }
}
