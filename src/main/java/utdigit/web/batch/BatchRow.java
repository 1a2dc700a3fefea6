package utdigit.web.batch;

import org.springframework.http.ProblemDetail;
import utdigit.web.stamp.Stamped;

/**
 * One answer row of a batch, written by the service's JSON mapper as it is (absent members
 * omitted): {row, id?, status, first_unprocessed_row?, result | problem}.
 *
 * @param result the single endpoint's typed, stamped answer (status OK)
 * @param problem the row's problem (status INVALID or LIMIT_REACHED)
 */
record BatchRow(long row, String id, String status, Long firstUnprocessedRow, Stamped<?> result,
                ProblemDetail problem) {
    static final String OK = "OK";
    static final String INVALID = "INVALID";
    static final String LIMIT_REACHED = "LIMIT_REACHED";
}
