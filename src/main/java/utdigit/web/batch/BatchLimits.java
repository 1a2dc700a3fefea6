package utdigit.web.batch;

import org.springframework.boot.context.properties.ConfigurationProperties;

/**
 * Limits of the batch endpoints (utdigit.batch.*, e.g. UTDIGIT_BATCH_MAX_ROWS).
 *
 * @param maxBodyBytes largest body accepted; a Content-Length above it is a 413 before any row,
 *     a chunked body that grows past it ends with a LIMIT_REACHED row
 * @param maxRows most rows answered; the next ends the stream with a LIMIT_REACHED row
 * @param flushEveryRows rows written between flushes of the answer (progress for the caller)
 * @param workers threads that answer the rows of all batches (a Spring task executor; the request's own
 *     thread reads the body and writes the answer in input order); 0 or 1 answers each row on the
 *     request's thread
 */
@ConfigurationProperties("utdigit.batch")
record BatchLimits(Long maxBodyBytes, Long maxRows, Integer flushEveryRows, Integer workers) {
    BatchLimits {
        maxBodyBytes = maxBodyBytes == null ? 2L * 1024 * 1024 * 1024 : maxBodyBytes;
        maxRows = maxRows == null ? 5_000_000L : maxRows;
        flushEveryRows = flushEveryRows == null ? 256 : flushEveryRows;
        workers = workers == null ? Runtime.getRuntime().availableProcessors() : workers;
        if (flushEveryRows < 1) {
            throw new IllegalArgumentException("utdigit.batch.flush-every-rows must be 1 or more, not " + flushEveryRows);
        }
        if (workers < 0) {
            throw new IllegalArgumentException("utdigit.batch.workers must be 0 or more, not " + workers);
        }
    }
}
