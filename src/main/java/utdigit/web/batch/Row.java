package utdigit.web.batch;

import java.util.List;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.util.TokenBuffer;
import utdigit.web.problem.FieldError;
import utdigit.web.problem.ProblemType;

/**
 * One input row: its 1-based number and its request, as the text of an NDJSON line or the tokens
 * of a JSON array element (both read into the request record directly; a tree only to explain one
 * that fails), as the tokens of a CSV row (read into the record directly), as a JSON tree (a row
 * being explained, or an element that is an array), or the reason it could not be read (a CSV cell
 * that is not a number, a line that is not JSON). {@code id} is the CSV row's sheet_id; otherwise
 * it is read from the request.
 */
record Row(long number, JsonNode body, String line, TokenBuffer element, TokenBuffer tokens, String id,
           ProblemType readProblem, String readDetail, List<FieldError> readErrors) {

    static Row of(long number, JsonNode body) {
        return new Row(number, body, null, null, null, null, null, null, List.of());
    }

    /** An NDJSON line, read into the request record directly (a tree only to explain a line that fails). */
    static Row ofLine(long number, String line) {
        return new Row(number, null, line, null, null, null, null, null, List.of());
    }

    /** A JSON array element's tokens, read into the request record directly (a tree only to explain one that fails). */
    static Row ofElement(long number, TokenBuffer element) {
        return new Row(number, null, null, element, null, null, null, null, List.of());
    }

    static Row of(long number, TokenBuffer tokens, String id) {
        return new Row(number, null, null, null, tokens, id, null, null, List.of());
    }

    static Row unreadable(long number, ProblemType type, String detail, List<FieldError> errors) {
        return new Row(number, null, null, null, null, null, type, detail, errors);
    }

    /** A row read in part (a CSV row with a bad cell): its id is still known. */
    static Row unreadable(long number, String id, ProblemType type, String detail, List<FieldError> errors) {
        return new Row(number, null, null, null, null, id, type, detail, errors);
    }

    boolean readable() {
        return readProblem == null;
    }
}
