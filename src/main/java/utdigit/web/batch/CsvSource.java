package utdigit.web.batch;

import java.io.Reader;
import java.util.ArrayList;
import java.util.List;
import tools.jackson.core.JacksonException;
import tools.jackson.databind.MappingIterator;
import tools.jackson.databind.util.TokenBuffer;
import tools.jackson.dataformat.csv.CsvMapper;
import tools.jackson.dataformat.csv.CsvReadFeature;
import utdigit.web.problem.FieldError;
import utdigit.web.stamp.IJson;
import utdigit.web.json.JsonPointers;
import utdigit.web.problem.ProblemType;

/**
 * Rows of a text/csv body (RFC 4180: a header row of field names, dotted for nested sections such
 * as {@code probe.frequency_mhz}; quoted fields; LF or CRLF; UTF-8, a BOM is skipped by the caller).
 * Each data row becomes the tokens of the JSON request the single endpoint takes, read into its
 * request record as JSON is (no tree): an empty cell is an absent field, a number column must hold
 * a finite decimal number, an integer column a whole number.
 * A header naming an unknown column is a 400 before any row. A blank line is not a row (as in
 * NDJSON): it is skipped and not counted, so row numbers stay those of the data rows.
 */
final class CsvSource implements RowSource {
    /** The column of a row's id (technique sheets). */
    private static final String ID_COLUMN = "sheet_id";
    private static final java.util.regex.Pattern DECIMAL =
            java.util.regex.Pattern.compile("[-+]?(?:[0-9]+\\.?[0-9]*|\\.[0-9]+)(?:[eE][-+]?[0-9]+)?");

    private final MappingIterator<String[]> rows;
    private final String[] header;
    private final RecordShape shape;
    /** The request's members as the header gives them: leaves and nested sections (dotted columns). */
    private final Member plan;
    private final int idColumn;
    /** The JSON Pointer of each column's field. */
    private final String[] pointers;
    private long row;

    /**
     * A member of the request: a leaf (its column) or a section (its members, in the order the header
     * first names them). A section is written only when one of its cells is not empty.
     */
    private record Member(String name, String pointer, int column, List<Member> members) {
        boolean anyValue(Object[] values) {
            if (column >= 0) {
                return values[column] != null;
            }
            for (Member m : members) {
                if (m.anyValue(values)) {
                    return true;
                }
            }
            return false;
        }
    }

    private static Member plan(String[] header) {
        Member root = new Member("", "", -1, new ArrayList<>());
        for (int i = 0; i < header.length; i++) {
            String[] path = header[i].split("\\.");
            Member section = root;
            for (int k = 0; k < path.length - 1; k++) {
                Member child = null;
                for (Member m : section.members()) {
                    if (m.name().equals(path[k]) && m.column() < 0) {
                        child = m;
                    }
                }
                if (child == null) {
                    child = new Member(path[k], JsonPointers.child(section.pointer(), path[k]), -1, new ArrayList<>());
                    section.members().add(child);
                }
                section = child;
            }
            String leaf = path[path.length - 1];
            section.members().add(new Member(leaf, JsonPointers.child(section.pointer(), leaf), i, List.of()));
        }
        return root;
    }

    CsvSource(CsvMapper csv, Reader reader, RecordShape shape) {
        this.shape = shape;
        try {
            this.rows = csv.readerFor(String[].class).with(CsvReadFeature.WRAP_AS_ARRAY).readValues(reader);
            if (!rows.hasNext()) {
                throw new BatchBodyException("the CSV body is empty: a header row of field names is required", "");
            }
            this.header = rows.next();
        } catch (JacksonException e) {
            CountingInputStream.rethrowIfLimit(e);
            throw new BatchBodyException("the body is not well-formed CSV", "");
        }
        List<String> unknown = new ArrayList<>();
        java.util.Set<String> seen = new java.util.HashSet<>();
        for (int i = 0; i < header.length; i++) {
            header[i] = header[i].trim();
            if (!shape.has(header[i])) {
                unknown.add(header[i]);
            }
            if (!seen.add(header[i])) {
                throw new BatchBodyException("column " + header[i] + " appears twice in the header", "");
            }
        }
        if (!unknown.isEmpty()) {
            throw new BatchBodyException("unknown column(s) " + String.join(", ", unknown)
                    + "; the columns of this calculation are: " + String.join(", ", shape.names()), "");
        }
        this.plan = plan(header);
        this.pointers = new String[header.length];
        for (int i = 0; i < header.length; i++) {
            String pointer = "";
            for (String part : header[i].split("\\.")) {
                pointer = JsonPointers.child(pointer, part);
            }
            pointers[i] = pointer;
        }
        this.idColumn = List.of(header).indexOf(ID_COLUMN);
    }

    @Override
    public Row next() {
        try {
            String[] cells;
            do {
                if (!rows.hasNext()) {
                    return null;
                }
                cells = rows.next();
            } while (cells.length == 1 && cells[0].isEmpty());
            row++;
            if (cells.length != header.length) {
                String detail = "the row has " + cells.length + " cells; the header has " + header.length;
                return Row.unreadable(row, ProblemType.INVALID_INPUT, detail, List.of(new FieldError("", detail)));
            }
            String id = idColumn >= 0 && cells[idColumn] != null && !cells[idColumn].isEmpty() && shape.kind(ID_COLUMN) == RecordShape.Kind.TEXT
                    ? IJson.printable(cells[idColumn]) : null;
            List<FieldError> errors = new ArrayList<>();
            Object[] values = values(cells, errors);
            if (errors.isEmpty()) {
                TokenBuffer tokens = TokenBuffer.forGeneration();
                write(plan, values, tokens);
                return Row.of(row, tokens, id);
            }
            return Row.unreadable(row, id, ProblemType.INVALID_INPUT,
                    errors.size() == 1 ? errors.get(0).pointer() + ": " + errors.get(0).detail()
                            : errors.size() + " fields are invalid; see errors", errors);
        } catch (JacksonException e) {
            CountingInputStream.rethrowIfLimit(e);
            row++;
            String detail = "the row is not well-formed CSV";
            return Row.unreadable(row, ProblemType.MALFORMED_BODY, detail, List.of(new FieldError("", detail)));
        }
    }

    /**
     * The value of each cell, in header order: null for an empty cell, a Double, an Integer, a
     * String or a list of Strings by the column's kind; a cell that is not of its kind adds an error.
     */
    private Object[] values(String[] cells, List<FieldError> errors) {
        Object[] values = new Object[cells.length];
        for (int i = 0; i < cells.length; i++) {
            String cell = cells[i];
            if (cell == null || cell.isEmpty()) {
                continue;
            }
            String column = header[i];
            values[i] = switch (shape.kind(column)) {
                case TEXT -> cell;
                case TEXT_LIST -> {
                    List<String> items = new ArrayList<>();
                    for (String item : cell.split(";", -1)) {
                        items.add(item.trim());
                    }
                    yield items;
                }
                case NUMBER -> {
                    Double v = parseDecimal(cell.trim());
                    if (v == null) {
                        errors.add(new FieldError(pointers[i], "must be a finite decimal number (column " + column + ")"));
                    }
                    yield v;
                }
                case INTEGER -> {
                    Double v = parseDecimal(cell.trim());
                    if (v == null || v != Math.rint(v) || Math.abs(v) > Integer.MAX_VALUE) {
                        errors.add(new FieldError(pointers[i], "must be a whole number (column " + column + ")"));
                        yield null;
                    }
                    yield v.intValue();
                }
            };
        }
        return values;
    }

    /** The tokens of a section: its given values, and its sections with a given value. */
    private static void write(Member section, Object[] values, TokenBuffer out) {
        out.writeStartObject();
        for (Member m : section.members()) {
            if (m.column() < 0) {
                if (m.anyValue(values)) {
                    out.writeName(m.name());
                    write(m, values, out);
                }
                continue;
            }
            Object v = values[m.column()];
            if (v == null) {
                continue;
            }
            out.writeName(m.name());
            if (v instanceof Double d) {
                out.writeNumber(d);
            } else if (v instanceof Integer n) {
                out.writeNumber(n);
            } else if (v instanceof List<?> items) {
                out.writeStartArray();
                for (Object item : items) {
                    out.writeString((String) item);
                }
                out.writeEndArray();
            } else {
                out.writeString((String) v);
            }
        }
        out.writeEndObject();
    }

    /** A decimal number as JSON writes it (no NaN, Infinity, hex or type suffixes); null otherwise. */
    static Double parseDecimal(String text) {
        if (!DECIMAL.matcher(text).matches()) {
            return null;
        }
        double v = Double.parseDouble(text);
        return Double.isFinite(v) ? v : null;
    }

    @Override
    public String fatal() {
        return null;
    }

    @Override
    public void close() {
        rows.close();
    }
}
