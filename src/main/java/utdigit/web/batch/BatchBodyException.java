package utdigit.web.batch;

/** A batch body that is malformed as a whole, found before any row is answered: a 400. */
final class BatchBodyException extends RuntimeException {
    private final String pointer;

    BatchBodyException(String detail, String pointer) {
        super(detail, null, false, false);
        this.pointer = pointer;
    }

    String pointer() {
        return pointer;
    }
}
