package utdigit.web.batch;

import java.io.BufferedOutputStream;
import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.io.OutputStream;
import java.io.PushbackInputStream;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.util.ArrayDeque;
import java.util.List;
import java.util.Map;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.ConcurrentHashMap;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.Future;
import org.slf4j.Logger;
import org.slf4j.LoggerFactory;
import org.springframework.beans.factory.DisposableBean;
import org.springframework.boot.task.ThreadPoolTaskExecutorBuilder;
import org.springframework.scheduling.concurrent.ThreadPoolTaskExecutor;
import org.springframework.stereotype.Component;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.json.JsonMapper;
import tools.jackson.dataformat.csv.CsvMapper;
import utdigit.web.pipeline.Calculation;
import utdigit.web.pipeline.CalculationRunner;
import utdigit.web.problem.FieldError;
import utdigit.web.problem.InputProblem;
import utdigit.web.problem.Problems;
import utdigit.web.json.RecordMembers;
import utdigit.web.problem.ProblemType;
import utdigit.web.metrics.ServiceMetrics;
import utdigit.web.stamp.Stamped;

/**
 * The one streaming component behind every batch endpoint: reads rows one at a time in the body's
 * format, answers each through the same {@link CalculationRunner} path as the single endpoint (on
 * the shared worker threads, utdigit.batch.workers), and writes each answer as soon as it and every
 * row before it are computed, in input order. A row stays typed from its request record to its
 * stamped answer ({@link BatchRow}). Memory stays flat whatever the
 * number of rows. A bad row is answered INVALID with its problem and never stops the batch; a
 * limit reached mid-way ends the stream with one LIMIT_REACHED row naming the first row not
 * processed.
 */
@Component
class BatchProcessor implements DisposableBean {
    private static final Logger log = LoggerFactory.getLogger(BatchProcessor.class);

    /** The formats of a batch body and of its answer. */
    enum Format {
        JSON("application/json"), NDJSON("application/x-ndjson"), CSV("text/csv");

        final String mediaType;

        Format(String mediaType) {
            this.mediaType = mediaType;
        }
    }

    private final CalculationRunner runner;
    private final JsonMapper mapper;
    private final CsvMapper csv;
    private final BatchLimits limits;
    private final ServiceMetrics metrics;
    private final Map<String, RecordShape> requestShapes = new ConcurrentHashMap<>();
    private final Map<String, List<String>> answerColumns = new ConcurrentHashMap<>();
    /**
     * The threads that answer rows, shared by every batch: Spring's task executor, built by Spring
     * Boot's builder (not a bean: an Executor bean would replace the application's own); null: rows
     * are answered on the request's thread.
     */
    private final ThreadPoolTaskExecutor workers;

    BatchProcessor(CalculationRunner runner, JsonMapper mapper, BatchLimits limits, ServiceMetrics metrics,
                   ThreadPoolTaskExecutorBuilder executors) {
        this.runner = runner;
        this.mapper = mapper;
        this.csv = CsvMapper.builder().build();
        this.limits = limits;
        this.metrics = metrics;
        if (limits.workers() <= 1) {
            this.workers = null;
        } else {
            this.workers = executors.corePoolSize(limits.workers()).maxPoolSize(limits.workers())
                    .threadNamePrefix("batch-worker-").build();
            this.workers.setDaemon(true);
            this.workers.initialize();
        }
    }

    @Override
    public void destroy() {
        if (workers != null) {
            workers.shutdown(); // interrupts rows still being answered
        }
    }

    BatchLimits limits() {
        return limits;
    }

    /**
     * Opens the body: checks its format as a whole (a 400 {@link BatchBodyException} before any
     * row is answered) and returns its rows.
     */
    RowSource open(String calculation, Format format, InputStream body) {
        Calculation<?, ?> c = runner.calculation(calculation);
        InputStream in = new CountingInputStream(skipBom(body), limits.maxBodyBytes());
        return switch (format) {
            case JSON -> new JsonArraySource(mapper, in);
            case NDJSON -> new NdjsonSource(mapper, reader(in));
            case CSV -> new CsvSource(csv, reader(in), requestShapes.computeIfAbsent(calculation,
                    k -> RecordShape.ofRequest(c.requestType())));
        };
    }

    /** The sink for the accepted format. */
    RowSink sink(String calculation, Format format, OutputStream out) throws IOException {
        return switch (format) {
            case JSON -> new JsonArraySink(mapper, out);
            case NDJSON -> new NdjsonSink(mapper, out);
            case CSV -> new CsvSink(csv, mapper, out, answerColumns.computeIfAbsent(calculation,
                    k -> RecordShape.answerColumns(runner.calculation(k).answerType())));
        };
    }

    /**
     * Answers every row of {@code rows} into {@code sink}, in order. This thread reads the rows and
     * writes the answers; with workers configured, the rows in between are answered on the worker
     * threads, at most {@link #WINDOW} rows ahead of the one being written, so memory stays flat.
     */
    long process(String calculation, RowSource rows, RowSink answers, OutputStream flushTarget) throws IOException {
        return process(runner.calculation(calculation), rows, answers, flushTarget);
    }

    private <Q, A> long process(Calculation<Q, A> c, RowSource rows, RowSink answers, OutputStream flushTarget)
            throws IOException {
        String calculation = c.name();
        InOrder pending = new InOrder(counted(calculation, answers), flushTarget);
        long answered = 0;
        try (rows) {
            while (true) {
                if (answered >= limits.maxRows()) {
                    Row next = nextOrLimit(rows);
                    if (next != null) {
                        pending.add(limitRow(answered + 1, "the batch row limit (" + limits.maxRows()
                                + ") is reached"));
                    }
                    break;
                }
                Row row;
                try {
                    row = rows.next();
                } catch (RuntimeException e) {
                    if (hasLimitCause(e)) {
                        pending.add(limitRow(answered + 1, "the batch body limit (" + limits.maxBodyBytes()
                                + " bytes) is reached"));
                        break;
                    }
                    throw e;
                }
                if (row == null) {
                    if (rows.fatal() != null) {
                        pending.add(problemRow(answered + 1, null, ProblemType.MALFORMED_BODY, rows.fatal(),
                                List.of(new FieldError("", rows.fatal()))));
                    }
                    break;
                }
                if (workers == null) {
                    pending.add(answer(c, row));
                } else {
                    pending.add(workers.submit(() -> answer(c, row)));
                }
                answered++;
            }
            pending.drain();
        } catch (IOException | RuntimeException | Error e) {
            pending.cancel();
            throw e;
        }
        answers.finish();
        return answered;
    }

    /** Rows answered ahead of the one being written, at most. */
    static final int WINDOW = 256;

    /** The answers not yet written, oldest first; written in input order as they complete. */
    private final class InOrder {
        private final ArrayDeque<Future<BatchRow>> queue = new ArrayDeque<>();
        private final RowSink sink;
        private final OutputStream flushTarget;
        private long written;

        InOrder(RowSink sink, OutputStream flushTarget) {
            this.sink = sink;
            this.flushTarget = flushTarget;
        }

        void add(BatchRow done) throws IOException {
            add(CompletableFuture.completedFuture(done));
        }

        void add(Future<BatchRow> answer) throws IOException {
            queue.add(answer);
            // write what is already done; wait for the oldest only when the window is full
            while (!queue.isEmpty() && (queue.size() > WINDOW || queue.peek().isDone())) {
                write(result(queue.poll()));
            }
        }

        void drain() throws IOException {
            while (!queue.isEmpty()) {
                write(result(queue.poll()));
            }
        }

        /**
         * The batch ends early (its client went away, or the body failed): rows not started never
         * start, and rows being answered are interrupted, which stops the core's searches.
         */
        void cancel() {
            queue.forEach(f -> f.cancel(true));
            queue.clear();
        }

        private BatchRow result(Future<BatchRow> answer) {
            try {
                return answer.get();
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
                throw new IllegalStateException("interrupted while waiting for a batch row", e);
            } catch (ExecutionException e) {
                throw e.getCause() instanceof RuntimeException r ? r : new IllegalStateException(e.getCause());
            }
        }

        private void write(BatchRow row) throws IOException {
            sink.write(row);
            if (++written % limits.flushEveryRows() == 0) {
                sink.flush();
                flushTarget.flush();
            }
        }
    }

    /** {@code sink}, counting every row it writes by its status ({@link ServiceMetrics#BATCH_ROWS}). */
    private RowSink counted(String calculation, RowSink sink) {
        return new RowSink() {
            @Override
            public void write(BatchRow outputRow) throws IOException {
                sink.write(outputRow);
                metrics.batchRow(calculation, outputRow.status());
            }

            @Override
            public void flush() throws IOException {
                sink.flush();
            }

            @Override
            public void finish() throws IOException {
                sink.finish();
            }
        };
    }

    private static Row nextOrLimit(RowSource rows) {
        try {
            return rows.next();
        } catch (RuntimeException e) {
            return Row.of(-1, null);
        }
    }

    private static boolean hasLimitCause(Throwable e) {
        for (Throwable t = e; t != null; t = t.getCause()) {
            if (t instanceof CountingInputStream.LimitExceeded) {
                return true;
            }
        }
        return false;
    }

    /** One row's answer: OK with the single endpoint's answer, or INVALID with its problem. */
    <Q, A> BatchRow answer(Calculation<Q, A> c, Row row) {
        if (row.line() != null || row.element() != null) {
            // An NDJSON line or a JSON array element: read into the request record directly; one that
            // fails is explained as before, from its tree (the same problems and pointers).
            try {
                Q request = runner.read(c, row.line() != null ? mapper.createParser(row.line()) : row.element().asParser());
                if (request != null) { // null is answered as a tree: "must be a JSON object"
                    return answered(c, row, printable(RecordMembers.get(request, ID)), request);
                }
            } catch (InputProblem | tools.jackson.core.JacksonException unread) {
                String notJson = row.line() == null ? null : NdjsonSource.unreadable(mapper, row.line());
                if (notJson != null) { // a line's own JSON problem (an element's tokens are JSON)
                    return problemRow(row.number(), null, ProblemType.MALFORMED_BODY, notJson,
                            List.of(new FieldError("", notJson)));
                }
            }
            row = Row.of(row.number(), row.line() != null ? mapper.readTree(row.line())
                    : (JsonNode) mapper.readTree(row.element().asParser()));
        }
        JsonNode body = row.body();
        String id = row.id() != null ? row.id() : body != null && body.path(ID).isString()
                ? printable(body.get(ID).stringValue()) : null;
        if (!row.readable()) {
            return problemRow(row.number(), id, row.readProblem(), row.readDetail(), row.readErrors());
        }
        try {
            return answered(c, row, id, row.tokens() != null ? runner.read(c, row.tokens().asParser())
                    : runner.read(c, body));
        } catch (InputProblem p) {
            return problemRow(row.number(), id, p.type(), p.getMessage(), p.errors());
        } catch (RuntimeException e) {
            return failed(c, row, id, e);
        }
    }

    private static BatchRow failed(Calculation<?, ?> c, Row row, String id, RuntimeException e) {
        log.error("unexpected failure on batch row {} of {}", row.number(), c.name(), e);
        return problemRow(row.number(), id, ProblemType.INTERNAL_ERROR,
                "the service could not answer this row; the failure is logged", List.of());
    }

    /** The id of a row: its request's sheet_id, when it has one. */
    private static final String ID = "sheet_id";

    private static String printable(Object id) {
        return id instanceof String s ? utdigit.web.stamp.IJson.printable(s) : null;
    }

    /** A row whose request was read: OK with its answer, or INVALID with its problem. */
    private <Q, A> BatchRow answered(Calculation<Q, A> c, Row row, String id, Q request) {
        try {
            Stamped<A> result = runner.run(c, request);
            return new BatchRow(row.number(), id, BatchRow.OK, null, result, null);
        } catch (InputProblem p) {
            return problemRow(row.number(), id, p.type(), p.getMessage(), p.errors());
        } catch (RuntimeException e) {
            return failed(c, row, id, e);
        }
    }

    private static BatchRow problemRow(long number, String id, ProblemType type, String detail, List<FieldError> errors) {
        return new BatchRow(number, id, BatchRow.INVALID, null, null, Problems.body(type, detail, errors, null));
    }

    private static BatchRow limitRow(long firstUnprocessed, String why) {
        return new BatchRow(firstUnprocessed, null, BatchRow.LIMIT_REACHED, firstUnprocessed, null,
                Problems.body(ProblemType.PAYLOAD_TOO_LARGE, why + "; row " + firstUnprocessed
                        + " and every later row were not processed: resume from row " + firstUnprocessed,
                        List.of(), null));
    }

    private static BufferedReader reader(InputStream in) {
        return new BufferedReader(new InputStreamReader(in, StandardCharsets.UTF_8), 1 << 16);
    }

    /** Skips a UTF-8 byte-order mark. */
    static InputStream skipBom(InputStream in) {
        PushbackInputStream p = new PushbackInputStream(in, 3);
        try {
            byte[] head = new byte[3];
            int n = p.readNBytes(head, 0, 3);
            boolean bom = n == 3 && (head[0] & 0xFF) == 0xEF && (head[1] & 0xFF) == 0xBB && (head[2] & 0xFF) == 0xBF;
            if (!bom && n > 0) {
                p.unread(head, 0, n);
            }
            return p;
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    static OutputStream buffered(OutputStream out) {
        return new BufferedOutputStream(out, 1 << 16);
    }
}
