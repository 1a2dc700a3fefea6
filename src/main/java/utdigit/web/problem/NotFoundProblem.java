package utdigit.web.problem;

/** A GET for an id that does not exist; answered as a 404 problem. */
public final class NotFoundProblem extends RuntimeException {
    public NotFoundProblem(String detail) {
        super(detail, null, false, false);
    }
}
