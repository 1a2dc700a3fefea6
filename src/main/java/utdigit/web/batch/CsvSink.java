package utdigit.web.batch;

import java.io.IOException;
import java.io.OutputStream;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import tools.jackson.core.io.NumberOutput;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.SequenceWriter;
import tools.jackson.databind.SerializationFeature;
import tools.jackson.databind.node.ObjectNode;
import tools.jackson.dataformat.csv.CsvMapper;
import tools.jackson.dataformat.csv.CsvSchema;

/**
 * Output rows as CSV with a fixed header per calculation: row, id, status, every result field it
 * can produce (flattened with dotted names), the warnings' codes, then the problem's type, detail
 * and pointers. A cell is empty where the row has no value; a value that does not exist (JSON null)
 * is empty too, with its warning in the warnings column.
 */
final class CsvSink implements RowSink {
    private final List<String> resultColumns;
    private final String[][] resultPaths;
    private final SequenceWriter writer;

    CsvSink(CsvMapper csv, OutputStream out, List<String> resultColumns) throws IOException {
        this.resultColumns = resultColumns;
        this.resultPaths = resultColumns.stream().map(c -> c.split("\\.")).toArray(String[][]::new);
        List<String> header = new ArrayList<>();
        header.add("row");
        header.add("id");
        header.add("status");
        for (String c : resultColumns) {
            header.add(c);
        }
        header.add("problem.type");
        header.add("problem.detail");
        header.add("problem.pointers");
        CsvSchema.Builder schema = CsvSchema.builder();
        header.forEach(schema::addColumn);
        // The header is written as the first record, not by the schema: Jackson writes a schema's header
        // only with the first row, and an answer of zero rows must still carry it.
        // No flush after each row (Jackson's default for a sequence): the batch flushes every few hundred rows.
        this.writer = csv.writerFor(List.class).with(schema.build().withoutHeader())
                .without(SerializationFeature.FLUSH_AFTER_WRITE_VALUE).writeValues(out);
        writer.write(header);
    }

    @Override
    public void write(ObjectNode row) throws IOException {
        List<String> cells = new ArrayList<>(resultColumns.size() + 6);
        cells.add(row.get("row").asString());
        cells.add(row.has("id") ? row.get("id").asString() : "");
        cells.add(row.get("status").asString());
        JsonNode result = row.get("result");
        for (String[] path : resultPaths) {
            cells.add(result == null ? "" : cell(result, path));
        }
        JsonNode problem = row.get("problem");
        if (problem == null) {
            cells.add("");
            cells.add("");
            cells.add("");
        } else {
            cells.add(problem.path("type").asString(""));
            cells.add(problem.path("detail").asString(""));
            List<String> pointers = new ArrayList<>();
            for (JsonNode e : problem.path("errors")) {
                pointers.add(e.path("pointer").asString(""));
            }
            cells.add(String.join(";", pointers));
        }
        writer.write(cells);
    }

    private static String cell(JsonNode result, String[] path) {
        JsonNode node = result;
        for (String part : path) {
            node = node == null ? null : node.get(part);
        }
        if (node == null || node.isNull()) {
            return "";
        }
        if (node.isArray()) {
            List<String> parts = new ArrayList<>();
            for (JsonNode item : node) {
                if (item.has("code")) {
                    parts.add(item.get("code").asString());
                } else if (item.has("rule_id")) {
                    parts.add((item.has("profile_id") ? item.get("profile_id").asString() + "/" : "")
                            + item.get("rule_id").asString() + "=" + item.path("verdict").asString());
                } else if (item.has("figure") && item.has("within")) {
                    parts.add(item.get("figure").asString() + "=" + (item.get("within").asBoolean() ? "WITHIN" : "OUTSIDE"));
                } else if (item.has("id") && item.has("verdict")) {
                    parts.add(item.get("id").asString() + "=" + item.get("verdict").asString());
                } else {
                    parts.add(item.isValueNode() ? item.asString() : item.toString());
                }
            }
            return String.join(";", parts);
        }
        if (node.isObject()) {
            return node.toString();
        }
        if (node.isDouble()) {
            return NumberOutput.toString(node.doubleValue(), true); // as the JSON answer writes it
        }
        return node.asString();
    }

    @Override
    public void flush() throws IOException {
        writer.flush();
    }

    @Override
    public void finish() throws IOException {
        writer.flush();
    }

}
