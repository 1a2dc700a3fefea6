package utdigit.web.batch;

import java.io.Reader;
import java.util.ArrayList;
import java.util.List;
import tools.jackson.core.JacksonException;
import tools.jackson.databind.MappingIterator;
import tools.jackson.databind.node.JsonNodeFactory;
import tools.jackson.databind.node.ObjectNode;
import tools.jackson.dataformat.csv.CsvMapper;
import tools.jackson.dataformat.csv.CsvReadFeature;
import utdigit.web.common.FieldError;
import utdigit.web.common.JsonPointers;
import utdigit.web.common.ProblemType;

/**
 * Rows of a text/csv body (RFC 4180: a header row of field names, dotted for nested sections such
 * as {@code probe.frequency_mhz}; quoted fields; LF or CRLF; UTF-8, a BOM is skipped by the caller).
 * Each data row becomes the JSON request the single endpoint takes: an empty cell is an absent
 * field, a number column must hold a finite decimal number, an integer column a whole number.
 * A header naming an unknown column is a 400 before any row. A blank line is not a row (as in
 * NDJSON): it is skipped and not counted, so row numbers stay those of the data rows.
 */
final class CsvSource implements RowSource {
    private static final JsonNodeFactory NODES = JsonNodeFactory.instance;
    private static final java.util.regex.Pattern DECIMAL =
            java.util.regex.Pattern.compile("[-+]?(?:[0-9]+\\.?[0-9]*|\\.[0-9]+)(?:[eE][-+]?[0-9]+)?");

    private final MappingIterator<String[]> rows;
    private final String[] header;
    private final RecordShape shape;
    private long row;

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
            ObjectNode body = NODES.objectNode();
            List<FieldError> errors = new ArrayList<>();
            for (int i = 0; i < cells.length; i++) {
                String cell = cells[i];
                if (cell == null || cell.isEmpty()) {
                    continue;
                }
                put(body, header[i], cell, errors);
            }
            if (!errors.isEmpty()) {
                return Row.unreadable(row, body, ProblemType.INVALID_INPUT,
                        errors.size() == 1 ? errors.get(0).pointer() + ": " + errors.get(0).detail()
                                : errors.size() + " fields are invalid; see errors", errors);
            }
            return Row.of(row, body);
        } catch (JacksonException e) {
            CountingInputStream.rethrowIfLimit(e);
            row++;
            String detail = "the row is not well-formed CSV";
            return Row.unreadable(row, ProblemType.MALFORMED_BODY, detail, List.of(new FieldError("", detail)));
        }
    }

    private void put(ObjectNode body, String column, String cell, List<FieldError> errors) {
        String[] path = column.split("\\.");
        ObjectNode target = body;
        String pointer = "";
        for (int i = 0; i < path.length - 1; i++) {
            pointer = JsonPointers.child(pointer, path[i]);
            ObjectNode child = target.has(path[i]) ? (ObjectNode) target.get(path[i]) : target.putObject(path[i]);
            target = child;
        }
        String leaf = path[path.length - 1];
        pointer = JsonPointers.child(pointer, leaf);
        switch (shape.kind(column)) {
            case TEXT -> target.put(leaf, cell);
            case TEXT_LIST -> {
                var items = target.putArray(leaf);
                for (String item : cell.split(";", -1)) {
                    items.add(item.trim());
                }
            }
            case NUMBER -> {
                Double v = parseDecimal(cell.trim());
                if (v == null) {
                    errors.add(new FieldError(pointer, "must be a finite decimal number (column " + column + ")"));
                } else {
                    target.put(leaf, v);
                }
            }
            case INTEGER -> {
                Double v = parseDecimal(cell.trim());
                if (v == null || v != Math.rint(v) || Math.abs(v) > Integer.MAX_VALUE) {
                    errors.add(new FieldError(pointer, "must be a whole number (column " + column + ")"));
                } else {
                    target.put(leaf, v.intValue());
                }
            }
        }
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
