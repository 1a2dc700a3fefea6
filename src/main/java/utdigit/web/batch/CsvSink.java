package utdigit.web.batch;

import java.io.IOException;
import java.io.OutputStream;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.springframework.http.ProblemDetail;
import tools.jackson.core.io.NumberOutput;
import tools.jackson.databind.SequenceWriter;
import tools.jackson.databind.SerializationFeature;
import tools.jackson.databind.json.JsonMapper;
import tools.jackson.databind.node.JsonNodeFactory;
import tools.jackson.dataformat.csv.CsvMapper;
import tools.jackson.dataformat.csv.CsvSchema;
import utdigit.web.problem.FieldError;
import utdigit.web.json.RecordMembers;
import utdigit.web.stamp.Stamped;

/**
 * Output rows as CSV with a fixed header per calculation: row, id, status, every result field it
 * can produce (flattened with dotted names), the warnings' codes, then the problem's type, detail
 * and pointers. A cell is empty where the row has no value; a value that does not exist (JSON null)
 * is empty too, with its warning in the warnings column. The cells are read from the typed answer
 * member by member ({@link RecordMembers}), not from a JSON tree.
 */
final class CsvSink implements RowSink {
    private static final JsonNodeFactory NODES = JsonNodeFactory.instance;

    private final List<String> resultColumns;
    private final String[][] resultPaths;
    /** Per column, the members to its cell, each remembering the accessor of the record type it last met. */
    private final Member[][] resultMembers;
    /** Per column, whether its path but the last name is that of the column before (the same parent). */
    private final boolean[] sameParent;
    private final SequenceWriter writer;
    private final JsonMapper mapper;

    CsvSink(CsvMapper csv, JsonMapper mapper, OutputStream out, List<String> resultColumns) throws IOException {
        this.mapper = mapper;
        this.resultColumns = resultColumns;
        this.resultPaths = resultColumns.stream().map(c -> c.split("\\.")).toArray(String[][]::new);
        this.resultMembers = new Member[resultPaths.length][];
        this.sameParent = new boolean[resultPaths.length];
        for (int i = 0; i < resultPaths.length; i++) {
            String[] path = resultPaths[i];
            resultMembers[i] = java.util.Arrays.stream(path).map(Member::new).toArray(Member[]::new);
            sameParent[i] = i > 0 && path.length > 1 && resultPaths[i - 1].length == path.length
                    && java.util.Arrays.equals(resultPaths[i - 1], 0, path.length - 1, path, 0, path.length - 1);
        }
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
    public void write(BatchRow row) throws IOException {
        List<String> cells = new ArrayList<>(resultColumns.size() + 6);
        cells.add(Long.toString(row.row()));
        cells.add(row.id() != null ? row.id() : "");
        cells.add(row.status());
        Stamped<?> result = row.result();
        Object parent = null;
        for (int i = 0; i < resultPaths.length; i++) {
            if (result == null) {
                cells.add("");
                continue;
            }
            String[] path = resultPaths[i];
            Member[] members = resultMembers[i];
            if (path.length == 2 && path[0].equals("stamp") && path[1].equals("sha256")) {
                cells.add(result.sha256());
                continue;
            }
            if (!sameParent[i]) {
                parent = result.answer();
                for (int m = 0; m < members.length - 1; m++) {
                    parent = members[m].of(parent);
                }
            }
            Object value = members[members.length - 1].of(parent);
            if (path.length == 1 && path[0].equals("warnings") && result.notRepresentable() != null) {
                String codes = value instanceof List<?> list ? list(list) : "";
                cells.add(codes.isEmpty() ? Stamped.NOT_REPRESENTABLE : codes + ";" + Stamped.NOT_REPRESENTABLE);
            } else {
                cells.add(value(value));
            }
        }
        ProblemDetail problem = row.problem();
        if (problem == null) {
            cells.add("");
            cells.add("");
            cells.add("");
        } else {
            cells.add(problem.getType() == null ? "" : problem.getType().toString());
            cells.add(problem.getDetail() == null ? "" : problem.getDetail());
            List<String> pointers = new ArrayList<>();
            Object errors = problem.getProperties() == null ? null : problem.getProperties().get("errors");
            if (errors instanceof Iterable<?> list) {
                for (Object e : list) {
                    pointers.add(e instanceof FieldError f && f.pointer() != null ? f.pointer() : "");
                }
            }
            cells.add(String.join(";", pointers));
        }
        writer.write(cells);
    }

    /**
     * One name of a dotted column: a member of a record or an entry of a map, null where there is
     * none. The accessor is looked up once per record type met (one type, in practice), not per cell.
     */
    private static final class Member {
        private final String name;
        private Class<?> type;
        private java.util.function.Function<Object, Object> accessor;

        Member(String name) {
            this.name = name;
        }

        Object of(Object value) {
            value = unwrap(value);
            if (value == null) {
                return null;
            }
            if (value instanceof Map<?, ?> map) {
                return map.get(name);
            }
            if (value.getClass() != type) {
                type = value.getClass();
                accessor = type.isRecord() ? RecordMembers.of(type).get(name) : null;
            }
            return accessor == null ? null : accessor.apply(value);
        }
    }

    private static Object unwrap(Object value) {
        return value instanceof Optional<?> o ? o.orElse(null) : value;
    }

    private String value(Object value) {
        value = unwrap(value);
        if (value == null) {
            return "";
        }
        if (value instanceof Double d) {
            // as the JSON answer writes it; a value with no finite form is null there (with its warning)
            return Double.isFinite(d) ? NumberOutput.toString(d == 0.0 ? 0.0 : d, true) : "";
        }
        if (value instanceof List<?> list) {
            return list(list);
        }
        if (value instanceof Enum<?> e) {
            return e.name();
        }
        if (value instanceof Map<?, ?> || value.getClass().isRecord()) {
            return json(value);
        }
        return value.toString(); // texts, integers, booleans
    }

    /**
     * A list in one cell, items separated by ';': warnings by their codes, findings as
     * [profile/]rule=verdict, tolerance checks as figure=WITHIN|OUTSIDE, profiles as id=verdict.
     */
    private String list(List<?> items) {
        List<String> parts = new ArrayList<>(items.size());
        for (Object item : items) {
            if (item == null) {
                parts.add("");
            } else if (!item.getClass().isRecord()) {
                parts.add(item instanceof Double d ? NODES.numberNode(d).asString() : value(item));
            } else if (has(item, "code")) {
                parts.add(text(item, "code"));
            } else if (has(item, "rule_id")) {
                parts.add((has(item, "profile_id") ? text(item, "profile_id") + "/" : "") + text(item, "rule_id") + "="
                        + text(item, "verdict"));
            } else if (has(item, "figure") && has(item, "within")) {
                parts.add(text(item, "figure") + "=" + (Boolean.TRUE.equals(unwrap(RecordMembers.get(item, "within")))
                        ? "WITHIN" : "OUTSIDE"));
            } else if (has(item, "id") && has(item, "verdict")) {
                parts.add(text(item, "id") + "=" + text(item, "verdict"));
            } else {
                parts.add(json(item));
            }
        }
        return String.join(";", parts);
    }

    private static boolean has(Object record, String name) {
        return RecordMembers.of(record.getClass()).containsKey(name) && RecordMembers.get(record, name) != null;
    }

    private String text(Object record, String name) {
        Object v = unwrap(RecordMembers.get(record, name));
        return v == null ? "" : v instanceof Enum<?> e ? e.name() : v.toString();
    }

    /** An object in one cell: its compact JSON (rare: the columns flatten records). */
    private String json(Object value) {
        return mapper.valueToTree(value).toString();
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
