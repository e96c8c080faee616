package org.quire.engine.csv;

import java.io.IOException;
import java.io.StringReader;
import java.io.UncheckedIOException;
import java.nio.ByteBuffer;
import java.nio.charset.CharacterCodingException;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVRecord;

/**
 * The one CSV reader: RFC 4180 quoting (Apache Commons CSV), UTF-8 with or without a byte-order mark, lines
 * starting with {@code #} and blank lines skipped, cells trimmed. The separator ({@code ,} {@code ;} tab) is
 * stated or detected from the first row; the decimal mark is stated or detected from the whole file (a comma
 * only when the file proves it, see {@link CsvRow#number(int)}). Every row must have as many cells as the
 * header (or the first row); a row whose cells are all blank is skipped. Stateless and thread-safe.
 *
 * <p>References: RFC 4180, Common Format and MIME Type for Comma-Separated Values (CSV) Files.
 */
public final class CsvReader {
    private CsvReader() {
    }

    /**
     * Reads a CSV file of at most {@link CsvOptions#maxBytes()} bytes, UTF-8. The source name in messages is
     * the file's name.
     *
     * @throws IOException when the file cannot be read
     * @throws CsvException when the file is too large, not UTF-8, or not CSV as the options say
     */
    public static CsvTable read(Path file, CsvOptions options) throws IOException, CsvException {
        return parse(sourceName(file), readText(file, options), options);
    }

    static String sourceName(Path file) {
        return file.getFileName() == null ? file.toString() : file.getFileName().toString();
    }

    /** @return the text of a file of at most {@link CsvOptions#maxBytes()} bytes, strict UTF-8 */
    static String readText(Path file, CsvOptions options) throws IOException, CsvException {
        String name = sourceName(file);
        long size = Files.size(file);
        if (size > options.maxBytes()) {
            throw new CsvException(name, 0, 0, null, CsvMessages.tooLarge(size, options.maxBytes()));
        }
        byte[] bytes = Files.readAllBytes(file);
        String text;
        try {
            text = StandardCharsets.UTF_8.newDecoder().onMalformedInput(CodingErrorAction.REPORT)
                    .onUnmappableCharacter(CodingErrorAction.REPORT).decode(ByteBuffer.wrap(bytes)).toString();
        } catch (CharacterCodingException e) {
            throw new CsvException(name, 0, 0, null, CsvMessages.notUtf8());
        }
        return text;
    }

    /**
     * Parses CSV text.
     *
     * @param sourceName the name used in messages (a file name, {@code pasted text})
     * @param text the text, at most {@link CsvOptions#maxBytes()} characters
     * @param options separator, decimal mark, header
     * @return the table, its numbers not yet read (each is read, by the one rule, when asked for)
     * @throws CsvException when the text is empty, malformed, or a row has extra or missing cells
     */
    public static CsvTable parse(String sourceName, String text, CsvOptions options) throws CsvException {
        if (text.length() > options.maxBytes()) {
            throw new CsvException(sourceName, 0, 0, null, CsvMessages.tooLarge(text.length(), options.maxBytes()));
        }
        String body = text.startsWith("\uFEFF") ? text.substring(1) : text;
        int[] lineStarts = lineStarts(body);
        CsvOptions.Separator sep = options.separator() != null ? options.separator() : detect(body);
        CSVFormat format = CSVFormat.RFC4180.builder().setDelimiter(sep.character()).setQuote('"')
                .setCommentMarker('#').setIgnoreEmptyLines(true).setTrim(true).setIgnoreSurroundingSpaces(true)
                .get();
        List<Integer> lines = new ArrayList<>();
        List<List<String>> records = new ArrayList<>();
        try (CSVParser parser = CSVParser.builder().setReader(new StringReader(body)).setFormat(format).get()) {
            var it = parser.iterator();
            while (true) {
                CSVRecord r;
                try {
                    if (!it.hasNext()) {
                        break;
                    }
                    r = it.next();
                } catch (UncheckedIOException | IllegalStateException e) {
                    int line = (int) Math.min(Integer.MAX_VALUE, parser.getCurrentLineNumber() + 1);
                    throw new CsvException(sourceName, line, 0, null, CsvMessages.malformed(detail(e)));
                }
                List<String> cells = Arrays.asList(r.values());
                if (cells.stream().allMatch(String::isEmpty)) {
                    continue;
                }
                lines.add(lineOf(body, lineStarts, r.getCharacterPosition()));
                records.add(List.copyOf(cells));
            }
        } catch (IOException e) {
            throw new CsvException(sourceName, 0, 0, null, CsvMessages.malformed(detail(e)));
        }
        if (records.isEmpty()) {
            throw new CsvException(sourceName, 0, 0, null, CsvMessages.empty());
        }
        List<String> header = List.of();
        int first = 0;
        if (options.header()) {
            header = records.get(0);
            first = 1;
            Set<String> seen = new HashSet<>();
            for (int c = 0; c < header.size(); c++) {
                String h = header.get(c);
                if (h.isEmpty() && header.size() > 1) {
                    throw new CsvException(sourceName, lines.get(0), c + 1, null, CsvMessages.blankHeader());
                }
                if (!seen.add(h)) {
                    throw new CsvException(sourceName, lines.get(0), c + 1, h, CsvMessages.duplicateHeader(h));
                }
            }
        }
        int expected = records.get(0).size();
        for (int i = first; i < records.size(); i++) {
            List<String> cells = records.get(i);
            if (cells.size() != expected) {
                throw new CsvException(sourceName, lines.get(i), 0, null,
                        CsvMessages.cellCount(cells.size(), expected, header, separatorHint(records, sep)));
            }
        }
        return CsvTable.of(sourceName, sep, options.decimalMark(), options.header() ? lines.get(0) : 0, header,
                records.subList(first, records.size()),
                lines.subList(first, lines.size()));
    }

    /**
     * The separator of the first row that is not blank or a comment: the most frequent of tab, ';' and ','. A
     * first row with none of them is one column; then a tab anywhere makes the separator tab (so that a
     * mismatch is reported), otherwise ';' (a comma in a cell is then a decimal comma or an error by the
     * number rule, never a split).
     */
    static CsvOptions.Separator detect(String text) {
        int start = 0;
        while (start < text.length()) {
            int end = text.indexOf('\n', start);
            if (end < 0) {
                end = text.length();
            }
            String line = text.substring(start, end).strip();
            if (!line.isEmpty() && !line.startsWith("#")) {
                int[] counts = new int[3];
                boolean quoted = false;
                for (int i = 0; i < line.length(); i++) {
                    char ch = line.charAt(i);
                    if (ch == '"') {
                        quoted = !quoted;
                    } else if (!quoted && ch == '\t') {
                        counts[0]++;
                    } else if (!quoted && ch == ';') {
                        counts[1]++;
                    } else if (!quoted && ch == ',') {
                        counts[2]++;
                    }
                }
                if (counts[0] > 0 && counts[0] >= counts[1] && counts[0] >= counts[2]) {
                    return CsvOptions.Separator.TAB;
                }
                if (counts[1] > 0 && counts[1] >= counts[2]) {
                    return CsvOptions.Separator.SEMICOLON;
                }
                if (counts[2] > 0) {
                    return CsvOptions.Separator.COMMA;
                }
                // One column: no character splits it, a comma stays in the cell (and is read by the number rule).
                return text.indexOf('\t') >= 0 ? CsvOptions.Separator.TAB : CsvOptions.Separator.SEMICOLON;
            }
            start = end + 1;
        }
        return CsvOptions.Separator.COMMA;
    }

    /**
     * @return a note when the cells of the first row hold another separator character than the one in use (the
     *     file is then likely read with the wrong separator), or empty
     */
    static String separatorHint(List<List<String>> records, CsvOptions.Separator used) {
        Character other = otherSeparator(records.get(0), used);
        return other == null ? "" : " (" + CsvMessages.wrongSeparator(other, used) + ")";
    }

    static Character otherSeparator(List<String> cells, CsvOptions.Separator used) {
        for (CsvOptions.Separator s : CsvOptions.Separator.values()) {
            if (s == used || (s == CsvOptions.Separator.COMMA && cells.size() > 1)) {
                continue;
            }
            for (String c : cells) {
                if (c.indexOf(s.character()) >= 0) {
                    return s.character();
                }
            }
        }
        return null;
    }

    private static String detail(Exception e) {
        Throwable t = e;
        while (t.getCause() != null && t.getCause() != t) {
            t = t.getCause();
        }
        String m = t.getMessage() == null ? e.toString() : t.getMessage();
        return m.replaceAll("\\s+", " ");
    }

    private static int[] lineStarts(String text) {
        List<Integer> starts = new ArrayList<>();
        starts.add(0);
        for (int i = 0; i < text.length(); i++) {
            char c = text.charAt(i);
            if (c == '\n' || (c == '\r' && (i + 1 >= text.length() || text.charAt(i + 1) != '\n'))) {
                starts.add(i + 1);
            }
        }
        int[] a = new int[starts.size()];
        for (int i = 0; i < a.length; i++) {
            a[i] = starts.get(i);
        }
        return a;
    }

    /**
     * The line at which a record starts: the record's character position may point at blank or comment lines
     * that the parser skipped before it.
     */
    private static int lineOf(String text, int[] starts, long position) {
        int i = Arrays.binarySearch(starts, (int) Math.min(Integer.MAX_VALUE, position));
        int line = i >= 0 ? i : -i - 2;
        while (line + 1 < starts.length) {
            String l = text.substring(starts[line], starts[line + 1]);
            if (!l.isBlank() && !l.startsWith("#")) {
                break;
            }
            line++;
        }
        return line + 1;
    }
}
