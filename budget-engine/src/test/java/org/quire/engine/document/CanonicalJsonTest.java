package org.quire.engine.document;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import jakarta.json.Json;
import jakarta.json.JsonValue;
import java.io.StringReader;
import java.math.BigDecimal;
import java.nio.charset.StandardCharsets;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;
import org.quire.engine.io.BudgetJson;

/** The canonical JSON text (our rules, after RFC 8785) and SHA-256 (FIPS 180-4). */
class CanonicalJsonTest {

    private static JsonValue parse(String s) {
        return Json.createReader(new StringReader(s)).readValue();
    }

    @Test
    void sha256OfAbcIsThePublishedExampleDigest() {
        // FIPS 180-2 Appendix B.1 (one-block message "abc"), from memory; the same example in FIPS 180-4's
        // published example files
        assertEquals("ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad",
                CanonicalJson.sha256Hex("abc".getBytes(StandardCharsets.US_ASCII)));
    }

    @Test
    void membersAreSortedByUtf16CodeUnitsAndWhitespaceIsDropped() {
        // RFC 8785 3.2.3: sorting by UTF-16 code units puts "B" (U+0042) before "a" (U+0061) and
        // U+20AC before U+FB33 before U+1F600 (surrogate D83D)
        assertEquals("{\"B\":1,\"a\":[3,2,{\"c\":true,\"d\":null}]}",
                CanonicalJson.write(parse(" { \"a\" : [ 3 , 2 , {\"d\":null, \"c\":true} ],\n \"B\":1 }")));
        assertEquals("{\"\u20ac\":1,\"\ud83d\ude00\":3,\"\ufb33\":2}",
                CanonicalJson.write(parse("{\"\ufb33\":2,\"\ud83d\ude00\":3,\"\u20ac\":1}")));
    }

    @Test
    void stringsEscapeOnlyQuoteBackslashAndControlCharacters() {
        assertEquals("\"a\\\"b\\\\c\\n\\t\\u001f/\u00e9\"",
                CanonicalJson.write(Json.createValue("a\"b\\c\n\t\u001f/\u00e9")));
    }

    @Test
    void numbersWithEqualValuesHaveOneText() {
        assertEquals("3", CanonicalJson.write(parse("3.0")));
        assertEquals("3", CanonicalJson.write(parse("3e0")));
        assertEquals("3", CanonicalJson.write(parse("0.3E1")));
        assertEquals("-12", CanonicalJson.write(parse("-12.000")));
        assertEquals("0", CanonicalJson.write(parse("-0.0")));
        assertEquals("2.5E-1", CanonicalJson.write(parse("0.25")));
        assertEquals("2.5E-1", CanonicalJson.write(parse("25e-2")));
        assertEquals("1.15E-5", CanonicalJson.write(parse("0.0000115")));
        assertEquals("9007199254740993", CanonicalJson.write(parse("9007199254740993")));
        assertEquals("1E20", CanonicalJson.write(parse("1e20")));
        assertEquals("9223372036854775807", CanonicalJson.write(parse("9223372036854775807")));
        assertEquals("9.223372036854776E18", CanonicalJson.write(parse("9223372036854775808")));
        // not representable in binary64: rounded to the nearest double first (0.1 + 2^-60 is 0.1's double)
        assertEquals("1E-1", CanonicalJson.write(parse("0.1000000000000000000000001")));
    }

    @Test
    void shortestDecimalReadsBackExactlyAndDoesNotDependOnDoubleToString() {
        // Double.toString(2.82879384806159E17) gives 2.82879384806159008E17 on Java 17 (seen here; fixed in
        // Java 19, JDK-4511638 from memory); the shortest decimal that reads back has 15 digits
        BigDecimal d = BudgetJson.decimal(2.82879384806159E17);
        assertEquals(0, d.compareTo(new BigDecimal("2.82879384806159E17")));
        assertEquals(0, BudgetJson.decimal(0.1).compareTo(new BigDecimal("0.1")));
        assertEquals(16, BudgetJson.decimal(1.0 / 3).precision());
        SplittableRandom r = new SplittableRandom(7);
        for (int i = 0; i < 2000; i++) {
            double v = Double.longBitsToDouble(r.nextLong());
            if (!Double.isFinite(v) || v == 0) {
                continue;
            }
            BigDecimal b = BudgetJson.decimal(v).stripTrailingZeros();
            assertEquals(v, b.doubleValue(), "round trip of " + v);
            assertTrue(b.precision() <= 17);
            if (b.precision() > 1) {
                BigDecimal shorter = new BigDecimal(v).round(new java.math.MathContext(b.precision() - 1));
                assertTrue(shorter.doubleValue() != v, "a shorter decimal reads back for " + v);
            }
        }
    }
}
