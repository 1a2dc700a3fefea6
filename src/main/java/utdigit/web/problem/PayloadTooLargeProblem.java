package utdigit.web.problem;

/** A request body over the service's limit; answered as a 413 problem. */
public final class PayloadTooLargeProblem extends RuntimeException {
    public PayloadTooLargeProblem(String detail) {
        super(detail, null, false, false);
    }
}
