package utdigit.web.batch;

import org.springframework.boot.context.properties.ConfigurationProperties;

/**
 * Limits of the batch endpoints (utdigit.batch.*, e.g. UTDIGIT_BATCH_MAX_ROWS).
 *
 * @param maxBodyBytes largest body accepted; a Content-Length above it is a 413 before any row,
 *     a chunked body that grows past it ends with a LIMIT_REACHED row
 * @param maxRows most rows answered; the next ends the stream with a LIMIT_REACHED row
 * @param flushEveryRows rows written between flushes of the answer (progress for the caller)
 */
@ConfigurationProperties("utdigit.batch")
record BatchLimits(Long maxBodyBytes, Long maxRows, Integer flushEveryRows) {
    BatchLimits {
        maxBodyBytes = maxBodyBytes == null ? 2L * 1024 * 1024 * 1024 : maxBodyBytes;
        maxRows = maxRows == null ? 5_000_000L : maxRows;
        flushEveryRows = flushEveryRows == null ? 256 : flushEveryRows;
    }
}
