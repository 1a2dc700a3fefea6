package utdigit.web.batch;

import java.io.Closeable;

/** Reads the rows of a batch body one at a time, never holding the whole body. */
interface RowSource extends Closeable {

    /** The next row, or null at the end of the body. */
    Row next();

    /**
     * Set when the body became unreadable mid-way (a JSON array broken after some rows): the
     * detail of why no further rows can be read; the batch then ends with a row saying so.
     */
    String fatal();

    @Override
    default void close() {}
}
