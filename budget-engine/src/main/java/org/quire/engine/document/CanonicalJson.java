package org.quire.engine.document;

import jakarta.json.JsonArray;
import jakarta.json.JsonNumber;
import jakarta.json.JsonObject;
import jakarta.json.JsonString;
import jakarta.json.JsonValue;
import java.math.BigDecimal;
import java.math.BigInteger;
import java.nio.charset.StandardCharsets;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import org.quire.engine.io.BudgetJson;

/**
 * The canonical text of a JSON value, from which content hashes are computed: the same content gives the same
 * text however the file was laid out.
 *
 * <p>The rules:
 * <ol>
 * <li>No whitespace outside strings.</li>
 * <li>Object members are sorted by their names, compared as sequences of UTF-16 code units (as
 *     {@link String#compareTo(String)} does); array elements keep their order.</li>
 * <li>Strings are written in double quotes; {@code "} and {@code \} are escaped with a backslash; the control
 *     characters U+0008, U+0009, U+000A, U+000C, U+000D as {@code \b \t \n \f \r}; the other characters below
 *     U+0020 as {@code \}{@code u00xx} with lowercase hex digits; every other character as itself. The text is
 *     encoded in UTF-8.</li>
 * <li>A number whose value is a whole number from -2^63 to 2^63 - 1 is written as that integer in decimal
 *     digits, with a leading {@code -} when negative and without leading zeros ({@code 3.0} and {@code 3e0}
 *     both give {@code 3}).</li>
 * <li>Any other number is first rounded to the nearest IEEE 754 binary64 value d, then written as the shortest
 *     decimal that reads back as d ({@link BudgetJson#decimal(double)}) in the form: an optional {@code -}, one
 *     nonzero digit, then {@code .} and further digits if there are any (no trailing zeros), then {@code E}
 *     and the decimal exponent, with {@code -} when negative and no {@code +} ({@code 0.25} gives
 *     {@code 2.5E-1}). A number too large for binary64 keeps its exact value in the same form.</li>
 * <li>{@code true}, {@code false} and {@code null} are written as such.</li>
 * </ol>
 * The rules follow the idea of RFC 8785 (JSON Canonicalization Scheme); numbers are written differently (RFC
 * 8785 uses the ECMAScript number-to-text algorithm), so the text is not RFC 8785 output. Which fields of a
 * document enter its hash is said by {@link BudgetDocument#contentJson()}.
 *
 * <p>References: RFC 8785 clause 3.2 (sorting, string escaping); RFC 8259 (JSON); FIPS 180-4 clause 6.2
 * (SHA-256).
 *
 * <p>Stateless and thread-safe.
 */
public final class CanonicalJson {
    private static final BigDecimal LONG_MIN = BigDecimal.valueOf(Long.MIN_VALUE);
    private static final BigDecimal LONG_MAX = BigDecimal.valueOf(Long.MAX_VALUE);

    private CanonicalJson() {
    }

    /** @return the canonical text of {@code value} */
    public static String write(JsonValue value) {
        StringBuilder s = new StringBuilder(4096);
        write(value, s);
        return s.toString();
    }

    /** @return the SHA-256 of the UTF-8 canonical text of {@code value}, as 64 lowercase hex digits */
    public static String sha256(JsonValue value) {
        return sha256Hex(write(value).getBytes(StandardCharsets.UTF_8));
    }

    /** @return the SHA-256 of {@code bytes} as 64 lowercase hex digits (FIPS 180-4) */
    public static String sha256Hex(byte[] bytes) {
        MessageDigest md;
        try {
            md = MessageDigest.getInstance("SHA-256");
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("every Java runtime provides SHA-256", e);
        }
        byte[] h = md.digest(bytes);
        StringBuilder s = new StringBuilder(64);
        for (byte b : h) {
            s.append(Character.forDigit((b >> 4) & 0xf, 16)).append(Character.forDigit(b & 0xf, 16));
        }
        return s.toString();
    }

    private static void write(JsonValue v, StringBuilder s) {
        switch (v.getValueType()) {
            case OBJECT: {
                JsonObject o = v.asJsonObject();
                List<String> keys = new ArrayList<>(o.keySet());
                Collections.sort(keys);
                s.append('{');
                for (int i = 0; i < keys.size(); i++) {
                    if (i > 0) {
                        s.append(',');
                    }
                    string(keys.get(i), s);
                    s.append(':');
                    write(o.get(keys.get(i)), s);
                }
                s.append('}');
                break;
            }
            case ARRAY: {
                JsonArray a = v.asJsonArray();
                s.append('[');
                for (int i = 0; i < a.size(); i++) {
                    if (i > 0) {
                        s.append(',');
                    }
                    write(a.get(i), s);
                }
                s.append(']');
                break;
            }
            case STRING:
                string(((JsonString) v).getString(), s);
                break;
            case NUMBER:
                s.append(number(((JsonNumber) v).bigDecimalValue()));
                break;
            case TRUE:
                s.append("true");
                break;
            case FALSE:
                s.append("false");
                break;
            default:
                s.append("null");
        }
    }

    /** @return the canonical text of a number (rules 4 and 5) */
    static String number(BigDecimal v) {
        if (v.signum() == 0) {
            return "0";
        }
        BigDecimal t = v.stripTrailingZeros();
        if (t.scale() <= 0 && t.compareTo(LONG_MIN) >= 0 && t.compareTo(LONG_MAX) <= 0) {
            return t.toBigIntegerExact().toString();
        }
        double d = v.doubleValue();
        BigDecimal shortest = Double.isFinite(d) ? BudgetJson.decimal(d).stripTrailingZeros() : t;
        if (shortest.signum() == 0) {
            return "0";
        }
        BigInteger digits = shortest.unscaledValue().abs();
        String ds = digits.toString();
        int exponent = ds.length() - 1 - shortest.scale();
        StringBuilder b = new StringBuilder();
        if (shortest.signum() < 0) {
            b.append('-');
        }
        b.append(ds.charAt(0));
        if (ds.length() > 1) {
            b.append('.').append(ds, 1, ds.length());
        }
        b.append('E').append(exponent);
        return b.toString();
    }

    private static void string(String v, StringBuilder s) {
        s.append('"');
        for (int i = 0; i < v.length(); i++) {
            char c = v.charAt(i);
            switch (c) {
                case '"': s.append("\\\""); break;
                case '\\': s.append("\\\\"); break;
                case '\b': s.append("\\b"); break;
                case '\t': s.append("\\t"); break;
                case '\n': s.append("\\n"); break;
                case '\f': s.append("\\f"); break;
                case '\r': s.append("\\r"); break;
                default:
                    if (c < 0x20) {
                        s.append(String.format(java.util.Locale.ROOT, "\\u%04x", (int) c));
                    } else {
                        s.append(c);
                    }
            }
        }
        s.append('"');
    }
}
