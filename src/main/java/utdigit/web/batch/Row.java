package utdigit.web.batch;

import java.util.List;
import tools.jackson.databind.JsonNode;
import utdigit.web.common.FieldError;
import utdigit.web.common.ProblemType;

/**
 * One input row: its 1-based number and its body, or the reason it could not be read (a CSV cell
 * that is not a number, a line that is not JSON).
 */
record Row(long number, JsonNode body, ProblemType readProblem, String readDetail, List<FieldError> readErrors) {

    static Row of(long number, JsonNode body) {
        return new Row(number, body, null, null, List.of());
    }

    static Row unreadable(long number, ProblemType type, String detail, List<FieldError> errors) {
        return new Row(number, null, type, detail, errors);
    }

    /** A row read in part (a CSV row with a bad cell): the fields read still give its id. */
    static Row unreadable(long number, JsonNode partialBody, ProblemType type, String detail, List<FieldError> errors) {
        return new Row(number, partialBody, type, detail, errors);
    }

    boolean readable() {
        return readProblem == null;
    }
}
